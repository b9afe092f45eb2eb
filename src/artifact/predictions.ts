/**
 * Pairs two predictions CSVs (`id,correct` or `id,loss`) by id without keeping a row per example.
 * Both files are read side by side, a row of each per step (prediction-lines.ts reads the bytes):
 * rows with the same id at the same step pair at once, comparing id bytes; only rows out of step
 * wait, in an open-addressing table keyed on the id bytes, until their partner shows up. A file
 * whose ids keep increasing cannot repeat one, so it needs no record of its ids; from the first id
 * out of order a set of 64-bit id hashes (rebuilt from the start of the file) catches repeats, and
 * a second read of that file confirms them by id and names the lines.
 */
import { open, type FileHandle } from 'node:fs/promises';
import type { MetricKind } from './types.js';
import { InputError, quote, type Issue } from '../errors.js';
import { RunningStats } from '../stats/index.js';
import type { PairedPredictions } from '../analysis/review.js';
import {
  BASE,
  CAND,
  HashSet64,
  IdOrder,
  WaitingTable,
  hashId,
  hashed,
  sameBytes,
} from './id-tables.js';
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

export interface PredictionsFile {
  /** Path to open when there is no `source`. */
  path?: string;
  /** Name shown in messages. */
  file: string;
  /** The file, already opened by the caller (which then decides what may be read). */
  source?: PredictionsSource;
}

type Readers = () => ByteReader;

/** A function giving a fresh reader of the file from its start, each time it is called. */
function readersOf(f: PredictionsFile, opened: FileHandle[]): Promise<Readers> | Readers {
  const source = f.source;
  if (typeof source === 'function') return () => iterableReader(source);
  if (source !== undefined) return () => handleReader(source);
  if (f.path === undefined) throw new TypeError(`predictions file ${f.file}: no path or source`);
  return open(f.path, 'r').then((handle) => {
    opened.push(handle);
    return () => handleReader(handle);
  });
}

/** Reads more and takes the next row; for after `advance()` returned NEED (once per MiB). */
async function refill(lines: PredictionLines): Promise<boolean> {
  let r = NEED;
  while (r === NEED) {
    await lines.fill();
    r = lines.advance();
  }
  return r === ROW;
}

async function row(lines: PredictionLines): Promise<boolean> {
  const r = lines.advance();
  return r === NEED ? refill(lines) : r === ROW;
}

/** Repeated-id bookkeeping of one file. */
class Repeats {
  private readonly order = new IdOrder();
  /** Hashes of every id so far, once the ids stopped increasing. */
  seen: HashSet64 | null = null;
  /** Hashes seen twice: the ids to confirm. */
  readonly suspects = new Set<string>();

  constructor(
    private readonly readers: Readers,
    private readonly file: string,
    private readonly kind: MetricKind,
  ) {}

  /** False while the ids keep increasing; then every row needs its hash `add`ed. */
  needsHash(lines: PredictionLines): boolean {
    return (
      this.seen !== null ||
      !this.order.next(
        lines.key,
        lines.keyStart,
        lines.keyLen,
        lines.prevKey,
        lines.prevStart,
        lines.prevLen,
      )
    );
  }

  /** At the first id out of order: hashes every earlier id of the file. */
  async start(rowsBefore: number): Promise<void> {
    this.seen = new HashSet64();
    const again = new PredictionLines(this.readers(), this.file, this.kind);
    try {
      for (let n = rowsBefore; n > 0 && (await row(again)); n--) {
        hashId(again.key, again.keyStart, again.keyLen);
        this.add(hashed.a, hashed.b);
      }
    } finally {
      await again.close();
    }
  }

  add(a: number, b: number): void {
    if (!(this.seen as HashSet64).add(a, b)) this.suspects.add(`${a},${b}`);
  }

  /** Re-reads the file: a line per repeated id, naming its first line. */
  async issues(): Promise<Issue[]> {
    if (this.suspects.size === 0) return [];
    const firstLine = new Map<string, number>();
    const issues: Issue[] = [];
    const lines = new PredictionLines(this.readers(), this.file, this.kind);
    try {
      while (await row(lines)) {
        hashId(lines.key, lines.keyStart, lines.keyLen);
        if (!this.suspects.has(`${hashed.a},${hashed.b}`)) continue;
        const id = lines.id();
        const first = firstLine.get(id);
        if (first === undefined) firstLine.set(id, lines.line);
        else
          issues.push({
            file: this.file,
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
}

/** Pairs baseline and candidate predictions by id, streaming both files. */
export async function pairPredictions(
  baseline: PredictionsFile,
  candidate: PredictionsFile,
  kind: MetricKind,
): Promise<PairedPredictions & { unmatched: { baseline: number; candidate: number } }> {
  const opened: FileHandle[] = [];
  let a: PredictionLines | null = null;
  let b: PredictionLines | null = null;
  try {
    const baseReaders = await readersOf(baseline, opened);
    const candReaders = await readersOf(candidate, opened);
    a = new PredictionLines(baseReaders(), baseline.file, kind);
    b = new PredictionLines(candReaders(), candidate.file, kind);
    const baseRepeats = new Repeats(baseReaders, baseline.file, kind);
    const candRepeats = new Repeats(candReaders, candidate.file, kind);
    const waiting = new WaitingTable(kind === 'continuous');
    let rows = 0;
    let baselineOnly = 0;
    let candidateOnly = 0;
    const diffs = new RunningStats();
    const pair = (x: number, y: number): void => {
      rows++;
      if (kind === 'proportion') {
        if (x === 1 && y === 0) baselineOnly++;
        else if (x === 0 && y === 1) candidateOnly++;
      } else diffs.push(y - x);
    };

    let hasA = await row(a);
    let hasB = await row(b);
    while (hasA || hasB) {
      const together =
        hasA && hasB && sameBytes(a.key, a.keyStart, a.keyLen, b.key, b.keyStart, b.keyLen);
      if (together) pair(a.value, b.value);
      if (hasA) {
        const needsHash = baseRepeats.needsHash(a);
        if (needsHash && baseRepeats.seen === null) await baseRepeats.start(a.rows - 1);
        if (needsHash || !together) hashId(a.key, a.keyStart, a.keyLen);
        if (needsHash) baseRepeats.add(hashed.a, hashed.b);
        if (!together && waiting.meet(BASE, a.key, a.keyStart, a.keyLen, hashed.a, a.value))
          pair(a.value, waiting.partner);
      }
      if (hasB) {
        const needsHash = candRepeats.needsHash(b);
        if (needsHash && candRepeats.seen === null) await candRepeats.start(b.rows - 1);
        if (needsHash || !together) hashId(b.key, b.keyStart, b.keyLen);
        if (needsHash) candRepeats.add(hashed.a, hashed.b);
        if (!together && waiting.meet(CAND, b.key, b.keyStart, b.keyLen, hashed.a, b.value))
          pair(waiting.partner, b.value);
      }
      if (hasA) {
        const r = a.advance();
        hasA = r === NEED ? await refill(a) : r === ROW;
      }
      if (hasB) {
        const r = b.advance();
        hasB = r === NEED ? await refill(b) : r === ROW;
      }
    }

    const issues = [...(await baseRepeats.issues()), ...(await candRepeats.issues())];
    if (issues.length > 0) throw new InputError(issues);

    const unmatched = { baseline: waiting.waitingBase, candidate: waiting.waitingCand };
    if (kind === 'proportion') return { kind, rows, baselineOnly, candidateOnly, unmatched };
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
