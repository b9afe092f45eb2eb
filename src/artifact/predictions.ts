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
import { RunningStats } from '../stats/index.js';
import type { PairedPredictions } from '../analysis/review.js';
import {
  BASE,
  CAND,
  HashSet64,
  INLINE_ID_BYTES,
  IdOrder,
  IdTable,
  hashId,
  hashed,
  sameBytes,
} from './id-tables.js';
import { IdBatch, MEET_BASE, MEET_CAND } from './id-batch.js';
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

/** `run()` results. */
const DONE = 0;
const NEED_A = 1;
const NEED_B = 2;
/** Steps of one pairing step. */
const ADVANCE_A = 0;
const ADVANCE_B = 1;
const PAIR = 2;
/** Loss differences are handed to RunningStats in batches (a double argument is an allocation). */
const BATCH = 4096;
/**
 * Table operations are batched over `window` steps and grouped by table regions of 2^regionBits
 * slots (about 100 KB). Smaller values only for tests: they reorder operations much more.
 */
export interface PairingTuning {
  window: number;
  regionBits: number;
}
const TUNING: PairingTuning = { window: 32768, regionBits: 12 };
/** Loss values beyond this can overflow a difference: then pairs are settled step by step. */
const HUGE = 8e307;

/**
 * The pairing loop, synchronous between reads: `run()` pairs rows until a file needs more bytes or
 * a file's ids stop increasing, and says which. Rows out of step go to the id table in batches
 * (id-batch.ts). Pairs go to the counts (proportions) or to RunningStats (losses) in the original
 * reader's order: a pair counts at the step its second row was read, the pair of the step's own
 * rows first, then the baseline row's, then the candidate row's; a window of steps is held in
 * `ring` until its batch is applied.
 */
class Pairing {
  rows = 0;
  baselineOnly = 0;
  candidateOnly = 0;
  readonly diffs = new RunningStats();
  /** Files (BASE | CAND) whose ids stopped increasing. */
  unordered = 0;
  readonly batch: IdBatch;
  private hasA = true;
  private hasB = true;
  private phase = ADVANCE_A;
  private step = 0;
  private windowStart = 0;
  /** Losses: pairs of the window by (step − windowStart) · 3 + k; NaN for none. */
  private readonly ring: Float64Array;
  private ringUsed = false;
  private strict = false;
  private readonly orderA = new IdOrder();
  private readonly orderB = new IdOrder();
  private readonly pending = new Float64Array(BATCH);
  private pendingCount = 0;
  private readonly proportion: boolean;

  constructor(
    readonly a: PredictionLines,
    readonly b: PredictionLines,
    readonly table: IdTable,
    kind: MetricKind,
    private readonly tuning: PairingTuning,
    /** File sizes in bytes, when known. */
    private readonly sizes: readonly [number | null, number | null],
  ) {
    this.proportion = kind === 'proportion';
    this.batch = new IdBatch(2 * tuning.window);
    this.ring = new Float64Array(this.proportion ? 0 : 3 * tuning.window).fill(Number.NaN);
  }

  run(): number {
    const { a, b, batch } = this;
    for (;;) {
      if (this.phase === ADVANCE_A) {
        if (this.hasA) {
          const r = a.advance();
          if (r === NEED) return NEED_A;
          this.hasA = r === ROW;
        }
        this.phase = ADVANCE_B;
      }
      if (this.phase === ADVANCE_B) {
        if (this.hasB) {
          const r = b.advance();
          if (r === NEED) return NEED_B;
          this.hasB = r === ROW;
        }
        this.phase = PAIR;
      }
      const hasA = this.hasA;
      const hasB = this.hasB;
      if (!hasA && !hasB) return DONE;
      if (
        hasA &&
        (this.unordered & BASE) === 0 &&
        !this.orderA.next(a.key, a.keyStart, a.keyLen, a.prevKey, a.prevStart, a.prevLen)
      )
        this.unordered |= BASE;
      if (
        hasB &&
        (this.unordered & CAND) === 0 &&
        !this.orderB.next(b.key, b.keyStart, b.keyLen, b.prevKey, b.prevStart, b.prevLen)
      )
        this.unordered |= CAND;
      const step = this.step;
      if (!this.proportion && !this.strict) {
        if ((hasA && !(Math.abs(a.value) <= HUGE)) || (hasB && !(Math.abs(b.value) <= HUGE)))
          this.strict = true;
      }
      if (hasA && hasB && sameBytes(a.key, a.keyStart, a.keyLen, b.key, b.keyStart, b.keyLen)) {
        this.rows++;
        const x = a.value;
        const y = b.value;
        if (this.proportion) {
          if (x === 1 && y === 0) this.baselineOnly++;
          else if (x === 0 && y === 1) this.candidateOnly++;
        } else if (this.ringUsed) this.ring[(step - this.windowStart) * 3] = y - x;
        else {
          // Inline, not this.push(d): a double argument is an allocation per call.
          const d = y - x;
          if (d - d !== 0) this.refuse(d);
          this.pending[this.pendingCount++] = d;
          if (this.pendingCount === BATCH) this.flush();
        }
      } else {
        this.ringUsed = !this.proportion;
        if (hasA) {
          hashId(a.key, a.keyStart, a.keyLen);
          if (a.keyLen <= INLINE_ID_BYTES) {
            if (this.proportion)
              batch.add(MEET_BASE | (a.value << 2), a.key, a.keyStart, a.keyLen, hashed.a, step);
            else {
              batch.add(MEET_BASE, a.key, a.keyStart, a.keyLen, hashed.a, step);
              batch.values[batch.size - 1] = a.value;
            }
          } else this.now(MEET_BASE, a, step);
        }
        if (hasB) {
          hashId(b.key, b.keyStart, b.keyLen);
          if (b.keyLen <= INLINE_ID_BYTES) {
            if (this.proportion)
              batch.add(MEET_CAND | (b.value << 2), b.key, b.keyStart, b.keyLen, hashed.a, step);
            else {
              batch.add(MEET_CAND, b.key, b.keyStart, b.keyLen, hashed.a, step);
              batch.values[batch.size - 1] = b.value;
            }
          } else this.now(MEET_CAND, b, step);
        }
      }
      this.step++;
      if (this.strict || this.step - this.windowStart === this.tuning.window || batch.full)
        this.settle();
      this.phase = ADVANCE_A;
    }
  }

  /** A long id's table operation, at once (the table keeps long ids apart, in a Map). */
  private now(kind: number, lines: PredictionLines, step: number): void {
    this.table.incoming = lines.value;
    this.table.incomingStep = step;
    this.apply(kind, lines.key, lines.keyStart, lines.keyLen, hashed.a, step);
  }

  /** Applies the batch and hands on the pairs of the window's steps, in order. */
  settle(): void {
    this.applyBatch();
    if (this.ringUsed) {
      const ring = this.ring;
      const stop = (this.step - this.windowStart) * 3;
      for (let i = 0; i < stop; i++) {
        const d = ring[i] as number;
        if (d === d) {
          if (d - d !== 0) this.refuse(d);
          this.pending[this.pendingCount++] = d;
          if (this.pendingCount === BATCH) this.flush();
          ring[i] = Number.NaN;
        }
      }
    }
    this.windowStart = this.step;
  }

  applyBatch(): void {
    const { batch, table } = this;
    if (batch.size === 0) return;
    table.widen(batch.longest);
    // When about a row per step waits, the ids are shuffled: then rows wait up to half the file at
    // once (a random order), and the table may as well grow to that in one step.
    const rows = Math.max(this.estimate(this.a, 0), this.estimate(this.b, 1));
    table.expected = table.size > this.step / 2 ? rows / 2 : 0;
    // A small table grows once for the whole batch (not by doubling through it).
    if (table.slots < 2 * batch.size) table.reserve(table.size + batch.size);
    const order = batch.sorted(table, this.tuning.regionBits);
    const keys = batch.keys;
    for (let i = 0; i < batch.size; i++) {
      const r = order[i] as number;
      table.incoming = this.proportion ? batch.bit(r) : batch.value(r);
      const step = batch.step(r);
      table.incomingStep = step;
      this.apply(batch.kind(r), keys, batch.keyStart(r), batch.len(r), batch.hash(r), step);
    }
    batch.clear();
  }

  /** About how many rows a file has, from its size and the bytes per row so far; 0 if unknown. */
  private estimate(lines: PredictionLines, i: 0 | 1): number {
    const size = this.sizes[i];
    return size === null || size === undefined || lines.rows === 0
      ? 0
      : (size * lines.rows) / lines.consumed;
  }

  /** One table operation; a pair it makes goes to the counts or the ring. */
  private apply(
    kind: number,
    key: Uint8Array,
    start: number,
    len: number,
    hash: number,
    step: number,
  ): void {
    const table = this.table;
    {
      const base = kind === MEET_BASE;
      if (!table.meet(base ? BASE : CAND, key, start, len, hash)) return;
      this.rows++;
      const x = base ? table.incoming : table.partner;
      const y = base ? table.partner : table.incoming;
      if (this.proportion) {
        if (x === 1 && y === 0) this.baselineOnly++;
        else if (x === 0 && y === 1) this.candidateOnly++;
        return;
      }
      // The pair counts when its second row was read; the baseline's row first at equal steps.
      const later = step > table.partnerStep;
      const at = later ? step : table.partnerStep;
      const k = base === later ? 1 : 2;
      this.ring[(at - this.windowStart) * 3 + k] = y - x;
    }
  }

  /** RunningStats refuses a non-finite value: let it throw now, as it would have. */
  private refuse(d: number): void {
    this.flush();
    this.diffs.push(d);
  }

  flush(): void {
    const { pending, diffs } = this;
    for (let i = 0; i < this.pendingCount; i++) diffs.push(pending[i] as number);
    this.pendingCount = 0;
  }
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
