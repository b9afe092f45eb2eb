/**
 * Pairs two predictions CSVs (`id,correct` or `id,loss`) by id without keeping a row per example.
 * Both files are read side by side, a row of each per step (prediction-lines.ts reads the bytes):
 * rows with the same id at the same step pair at once, comparing id bytes; rows out of step wait in
 * an open-addressing table keyed on the id bytes until their partner shows up (id-tables.ts).
 *
 * A repeated id is an error, and nothing is kept to find one while it cannot be there:
 * - a file whose ids keep increasing (by bytes, or by length then bytes) has none;
 * - when only one file's ids do not, a repeat in it either meets its own waiting row in the table
 *   or is left waiting at the end (its partner, once in the other file, is taken);
 * - when neither's do, or in the two cases above, the files whose ids do not increase are read
 *   again: 64-bit hashes of every id, then the lines of the ids whose hash repeats.
 */
import { open, type FileHandle } from 'node:fs/promises';
import type { MetricKind } from './types.js';
import { InputError, quote, type Issue } from '../errors.js';
import type { PairedPredictions } from '../analysis/review.js';
import { BASE, CAND, HashSet64, IdTable, hashId, hashed } from './id-tables.js';
import { DONE, NEED_A, Pairing, TUNING, type PairingTuning } from './pairing.js';
import {
  NEED,
  ROW,
  PredictionLines,
  handleReader,
  iterableReader,
  type ByteReader,
  type PredictionsSource,
} from './prediction-lines.js';

export type { PredictionsSource } from './prediction-lines.js';
export type { PairingTuning } from './pairing.js';

export interface PredictionsFile {
  /** Path to open when there is no `source`. */
  path?: string;
  /** Name shown in messages. */
  file: string;
  /** The file, already opened by the caller (which then decides what may be read). */
  source?: PredictionsSource;
}

/** Fresh readers of one file from its start, and its size when known. */
interface Opened {
  reader: () => ByteReader;
  size: number | null;
}

async function openFile(f: PredictionsFile, opened: FileHandle[]): Promise<Opened> {
  const source = f.source;
  if (typeof source === 'function') return { reader: () => iterableReader(source), size: null };
  let handle: FileHandle;
  if (source !== undefined) handle = source;
  else {
    if (f.path === undefined) throw new TypeError(`predictions file ${f.file}: no path or source`);
    handle = await open(f.path, 'r');
    opened.push(handle);
  }
  const size = (await handle.stat()).size;
  return { reader: () => handleReader(handle), size };
}

/** Takes the next row, reading as needed (one `await` per MiB, not per row). */
async function row(lines: PredictionLines): Promise<boolean> {
  let r = lines.advance();
  while (r === NEED) {
    await lines.fill();
    r = lines.advance();
  }
  return r === ROW;
}

/** Every repeated id of one file, with the line it first appeared on (two reads). */
async function repeatedIds(o: Opened, file: string, kind: MetricKind): Promise<Issue[]> {
  const hashes = new HashSet64();
  const suspects = new Set<string>();
  let lines = new PredictionLines(o.reader(), file, kind);
  try {
    while (await row(lines)) {
      hashId(lines.key, lines.keyStart, lines.keyLen);
      if (!hashes.add(hashed.a, hashed.b)) suspects.add(`${hashed.a},${hashed.b}`);
    }
  } finally {
    await lines.close();
  }
  const firstLine = new Map<string, number>();
  const issues: Issue[] = [];
  if (suspects.size === 0) return issues;
  lines = new PredictionLines(o.reader(), file, kind);
  try {
    while (await row(lines)) {
      hashId(lines.key, lines.keyStart, lines.keyLen);
      if (!suspects.has(`${hashed.a},${hashed.b}`)) continue;
      const id = lines.id();
      const first = firstLine.get(id);
      if (first === undefined) firstLine.set(id, lines.line);
      else
        issues.push({
          file,
          pointer: `line ${lines.line}`,
          expected: `must have a unique id (also on line ${first})`,
          got: quote(id),
        });
    }
  } finally {
    await lines.close();
  }
  return issues;
}

/** Pairs baseline and candidate predictions by id, streaming both files. */
export async function pairPredictions(
  baseline: PredictionsFile,
  candidate: PredictionsFile,
  kind: MetricKind,
  tuning: PairingTuning = TUNING,
): Promise<PairedPredictions & { unmatched: { baseline: number; candidate: number } }> {
  const opened: FileHandle[] = [];
  let a: PredictionLines | null = null;
  let b: PredictionLines | null = null;
  try {
    const base = await openFile(baseline, opened);
    const cand = await openFile(candidate, opened);
    a = new PredictionLines(base.reader(), baseline.file, kind);
    b = new PredictionLines(cand.reader(), candidate.file, kind);
    const table = new IdTable(kind === 'continuous');
    const pairing = new Pairing(a, b, table, kind, tuning, [base.size, cand.size]);
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
      if ((unordered & BASE) !== 0) issues.push(...(await repeatedIds(base, baseline.file, kind)));
      if ((unordered & CAND) !== 0) issues.push(...(await repeatedIds(cand, candidate.file, kind)));
      if (issues.length > 0) throw new InputError(issues);
    }

    const unmatched = { baseline: table.waitingBase, candidate: table.waitingCand };
    const { rows, diffs } = pairing;
    if (kind === 'proportion')
      return {
        kind,
        rows,
        baselineOnly: pairing.baselineOnly,
        candidateOnly: pairing.candidateOnly,
        unmatched,
      };
    return {
      kind,
      rows,
      meanDiff: diffs.n > 0 ? diffs.mean : 0,
      varDiff: diffs.n > 1 ? diffs.variance : 0,
      unmatched,
    };
  } finally {
    await a?.close();
    await b?.close();
    for (const handle of opened) await handle.close();
  }
}
