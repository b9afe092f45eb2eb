/**
 * Pairs two predictions CSVs (`id,correct` or `id,loss`) by id without keeping a row per example,
 * and checks one such file on its own. Both files are read side by side, a row of each per step
 * (prediction-lines.ts reads the bytes): rows with the same id at the same step pair at once,
 * comparing id bytes; rows out of step wait in an open-addressing table keyed on the id bytes until
 * their partner shows up (id-tables.ts).
 *
 * A file is read only through its `open()`, which the io layer provides (it opens and checks the
 * file on every call); nothing here opens a path.
 *
 * A repeated id is an error, and nothing is kept to find one while it cannot be there:
 * - a file whose ids keep increasing (by bytes, or by length then bytes) has none;
 * - when only one file's ids do not, a repeat in it either meets its own waiting row in the table
 *   or is left waiting at the end (its partner, once in the other file, is taken);
 * - when neither's do, or in the two cases above, the files whose ids do not increase are read
 *   again: 64-bit hashes of every id, then the lines of the ids whose hash repeats.
 */
import type { Readable } from 'node:stream';
import type { MetricKind } from '../model/run.js';
import { InputError, quote, type Issue } from '../model/errors.js';
import type { PairedPredictions } from '../model/review.js';
import { IdOrder } from './id-compare.js';
import { BASE, CAND, HashSet64, IdTable, hashId, hashed } from './id-tables.js';
import { DONE, NEED_A, Pairing, TUNING, type PairingTuning } from './pairing.js';
import {
  NEED,
  ROW,
  PredictionLines,
  lazyReader,
  streamReader,
  type ByteReader,
} from './prediction-lines.js';

export type { PairingTuning } from './pairing.js';

export interface PredictionsFile {
  /** Name shown in messages. */
  file: string;
  /**
   * Opens the file afresh for one pass (the io layer applies its checks; another pass looks for
   * duplicate ids). The stream yields bytes; read errors arrive through it as `InputError`s.
   */
  open: () => Promise<Readable>;
  /**
   * The same file for one pass as bytes read into the reader's own buffer (no buffer allocated per
   * read), opened afresh and under the same checks on every call. Used instead of `open` when given.
   */
  openBytes?: () => Promise<ByteReader>;
}

/** A fresh reader of the file, from its start. */
function lines(f: PredictionsFile, kind: MetricKind): PredictionLines {
  const reader = f.openBytes === undefined ? streamReader(f.open) : lazyReader(f.openBytes);
  return new PredictionLines(reader, f.file, kind);
}

/** Takes the next row, reading as needed (one `await` per chunk read, not per row). */
async function row(reader: PredictionLines): Promise<boolean> {
  let r = reader.advance();
  while (r === NEED) {
    await reader.fill();
    r = reader.advance();
  }
  return r === ROW;
}

/** Every repeated id of one file, with the line it first appeared on (two reads). */
async function repeatedIds(f: PredictionsFile, kind: MetricKind): Promise<Issue[]> {
  const hashes = new HashSet64();
  const suspects = new Set<string>();
  let reader = lines(f, kind);
  try {
    while (await row(reader)) {
      hashId(reader.key, reader.keyStart, reader.keyLen);
      if (!hashes.add(hashed.a, hashed.b)) suspects.add(`${hashed.a},${hashed.b}`);
    }
  } finally {
    await reader.close();
  }
  const firstLine = new Map<string, number>();
  const issues: Issue[] = [];
  if (suspects.size === 0) return issues;
  reader = lines(f, kind);
  try {
    while (await row(reader)) {
      hashId(reader.key, reader.keyStart, reader.keyLen);
      if (!suspects.has(`${hashed.a},${hashed.b}`)) continue;
      const id = reader.id();
      const first = firstLine.get(id);
      if (first === undefined) firstLine.set(id, reader.line);
      else
        issues.push({
          file: f.file,
          pointer: `line ${reader.line}`,
          expected: `must have a unique id (also on line ${first})`,
          got: quote(id),
        });
    }
  } finally {
    await reader.close();
  }
  return issues;
}

/**
 * Reads one predictions file through to check it (header, values, unique ids, at least one row).
 * A file whose ids keep increasing is read once; any other is read again for repeated ids.
 */
export async function checkPredictions(source: PredictionsFile, kind: MetricKind): Promise<void> {
  const reader = lines(source, kind);
  const order = new IdOrder();
  let increasing = true;
  try {
    while (await row(reader)) {
      if (
        increasing &&
        !order.next(
          reader.keyView,
          reader.keyStart,
          reader.keyLen,
          reader.prevView,
          reader.prevStart,
          reader.prevLen,
        )
      )
        increasing = false;
    }
  } finally {
    await reader.close();
  }
  if (increasing) return;
  const issues = await repeatedIds(source, kind);
  if (issues.length > 0) throw new InputError(issues);
}

/** Pairs baseline and candidate predictions by id, streaming both files. */
export async function pairPredictions(
  baseline: PredictionsFile,
  candidate: PredictionsFile,
  kind: MetricKind,
  tuning: PairingTuning = TUNING,
): Promise<
  PairedPredictions & {
    unmatched: { baseline: number; candidate: number };
    sides: NonNullable<PairedPredictions['sides']>;
  }
> {
  const a = lines(baseline, kind);
  const b = lines(candidate, kind);
  try {
    const table = new IdTable(kind === 'continuous');
    const pairing = new Pairing(a, b, table, kind, tuning);
    for (let r = pairing.run(); r !== DONE; r = pairing.run()) {
      if (r === NEED_A) await a.fill();
      else await b.fill();
    }
    pairing.settle();
    pairing.flush();

    const unordered = pairing.unordered;
    if (
      table.repeated !== 0 ||
      unordered === (BASE | CAND) ||
      (unordered === BASE && table.waitingBase > 0) ||
      (unordered === CAND && table.waitingCand > 0)
    ) {
      const issues: Issue[] = [];
      if ((unordered & BASE) !== 0) issues.push(...(await repeatedIds(baseline, kind)));
      if ((unordered & CAND) !== 0) issues.push(...(await repeatedIds(candidate, kind)));
      if (issues.length > 0) throw new InputError(issues);
    }

    const unmatched = { baseline: table.waitingBase, candidate: table.waitingCand };
    const { rows, diffs } = pairing;
    // Each file's own rows, paired or not: they must reproduce the artifact's split value.
    const sides = { baseline: pairing.side(0), candidate: pairing.side(1) };
    if (kind === 'proportion')
      return {
        kind,
        rows,
        baselineOnly: pairing.baselineOnly,
        candidateOnly: pairing.candidateOnly,
        unmatched,
        sides,
      };
    return {
      sides,
      kind,
      rows,
      meanDiff: diffs.n > 0 ? diffs.mean : 0,
      varDiff: diffs.n > 1 ? diffs.variance : 0,
      unmatched,
    };
  } finally {
    await a.close();
    await b.close();
  }
}
