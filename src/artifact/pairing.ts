/**
 * The pairing loop of pairPredictions (predictions.ts): two files read side by side, a row of each
 * per step; rows with the same id pair at once, rows out of step meet in the id table.
 */
import type { MetricKind } from '../model/run.js';
import { RunningStats } from '../stats/index.js';
import { IdBatch, MEET_BASE, MEET_CAND } from './id-batch.js';
import type { IdTable } from './id-tables.js';
import { IdOrder, idSteps, sameIds } from './id-compare.js';
import { BASE, CAND, INLINE_ID_BYTES } from './id-tables.js';
import { lockstepRows } from './lockstep.js';
import { NEED, ROW, type PredictionLines } from './prediction-lines.js';

/** `run()` results. */
export const DONE = 0;
export const NEED_A = 1;
export const NEED_B = 2;
/** Steps of one pairing step. */
const ADVANCE_A = 0;
const ADVANCE_B = 1;
const PAIR = 2;
/** Loss differences are handed to RunningStats in batches (a double argument is an allocation). */
const BATCH = 4096;
/**
 * Table operations are batched over `window` steps and applied in order of table regions of
 * 2^regionBits slots (16 slots, a few cache lines: a batch then sweeps the table from one end to
 * the other, which the processor's prefetching follows; regions of 4096 slots measured about 4 %
 * slower on shuffled ids). Once the table has `growFrom` slots or more (2^21 slots of 20 bytes:
 * larger than a processor's last-level cache), the window doubles, up to `maxWindow`, while the
 * table has more than 16 slots per step of it: a batch then still lands on a few neighbouring
 * slots per page, where a fixed window of 32,768 steps spread its probes over a table of tens of
 * millions of slots one page apart (10M shuffled ids: 8.5 s of CPU with 32,768, 5.8 s with
 * 262,144; 280 MB peak). A smaller table gains nothing from a larger batch and pays for its memory.
 * Smaller windows only for tests: they reorder operations much more.
 */
export interface PairingTuning {
  window: number;
  regionBits: number;
  maxWindow: number;
  growFrom: number;
}
export const TUNING: PairingTuning = {
  window: 32768,
  regionBits: 4,
  maxWindow: 262144,
  growFrom: 1 << 21,
};
/**
 * The first windows are this many steps at most, so that settling a window (rare in a long run of
 * paired rows) has run a few times before V8 compiles the loop; otherwise the compiled loop is
 * thrown away at the first full window and recompiled (see WARM_READS in prediction-lines.ts).
 */
const WARM_WINDOW = 256;
const WARM_SETTLES = 8;
/** Likewise, the first WARM_FLUSHES batches of loss differences hold WARM_BATCH values at most. */
const WARM_BATCH = 64;
const WARM_FLUSHES = 8;
/** Table slots per step of the window below which the window doubles (see PairingTuning). */
const SLOTS_PER_STEP = 16;
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
export class Pairing {
  rows = 0;
  baselineOnly = 0;
  candidateOnly = 0;
  readonly diffs = new RunningStats();
  /**
   * Each file's own rows, paired or not (they must reproduce the artifact's split value): n, mean
   * and M2 of the baseline's values at 0–2, of the candidate's at 3–5. Welford's update, the same
   * arithmetic in the same order as RunningStats.push (stats/descriptive.ts), inline: a double
   * argument is an allocation per call.
   */
  readonly sides = new Float64Array(6);
  /** Files (BASE | CAND) whose ids stopped increasing. */
  unordered = 0;
  batch: IdBatch;
  /** Whether each file has a current row (false once it ended). */
  hasA = true;
  hasB = true;
  private phase = ADVANCE_A;
  /** Steps taken (a row of each file per step); the step the current window started at. */
  step = 0;
  windowStart = 0;
  /** Losses: pairs of the window by (step − windowStart) · 3 + k; NaN for none. */
  ring: Float64Array;
  window: number;
  /** Losses: pairs go through `ring` (some rows were out of step), else straight to `pending`. */
  ringUsed = false;
  strict = false;
  private settles = 0;
  /** The last step's rows had the same id (then each file's previous id is the same too). */
  lockstep = false;
  readonly orderA = new IdOrder();
  readonly orderB = new IdOrder();
  /** Loss differences not yet handed to `diffs`. */
  readonly pending = new Float64Array(BATCH);
  pendingCount = 0;
  /** Differences that fill a batch: WARM_BATCH for the first WARM_FLUSHES batches, then BATCH. */
  batchOf = WARM_BATCH;
  private flushes = 0;
  readonly proportion: boolean;

  constructor(
    readonly a: PredictionLines,
    readonly b: PredictionLines,
    readonly table: IdTable,
    kind: MetricKind,
    private readonly tuning: PairingTuning,
  ) {
    this.proportion = kind === 'proportion';
    this.window = Math.min(tuning.window, WARM_WINDOW);
    this.batch = new IdBatch(2 * tuning.window);
    this.ring = new Float64Array(this.proportion ? 0 : 3 * tuning.window).fill(Number.NaN);
  }

  run(): number {
    const { a, b } = this;
    let batch = this.batch;
    for (;;) {
      if (this.phase === ADVANCE_A) {
        if (this.lockstep && this.unordered === 0 && !this.strict) {
          lockstepRows(this);
          batch = this.batch;
        }
        if (this.hasA) {
          const r = a.advance();
          if (r === NEED) return NEED_A;
          this.hasA = r === ROW;
          if (this.hasA) {
            const s = this.sides;
            const x = a.value;
            const n = (s[0] as number) + 1;
            s[0] = n;
            const delta = x - (s[1] as number);
            s[1] = (s[1] as number) + delta / n;
            s[2] = (s[2] as number) + delta * (x - (s[1] as number));
          }
        }
        this.phase = ADVANCE_B;
      }
      if (this.phase === ADVANCE_B) {
        if (this.hasB) {
          const r = b.advance();
          if (r === NEED) return NEED_B;
          this.hasB = r === ROW;
          if (this.hasB) {
            const s = this.sides;
            const x = b.value;
            const n = (s[3] as number) + 1;
            s[3] = n;
            const delta = x - (s[4] as number);
            s[4] = (s[4] as number) + delta / n;
            s[5] = (s[5] as number) + delta * (x - (s[4] as number));
          }
        }
        this.phase = PAIR;
      }
      const hasA = this.hasA;
      const hasB = this.hasB;
      if (!hasA && !hasB) return DONE;
      const same =
        hasA && hasB && sameIds(a.keyView, a.keyStart, a.keyLen, b.keyView, b.keyStart, b.keyLen);
      // In lockstep (this step's ids and the last step's are the same in both files), the
      // candidate's id follows its last one as the baseline's does: one comparison serves both.
      let steps = -1;
      if (hasA && (this.unordered & BASE) === 0) {
        steps = idSteps(a.keyView, a.keyStart, a.keyLen, a.prevView, a.prevStart, a.prevLen);
        if (!this.orderA.take(steps)) this.unordered |= BASE;
      }
      if (hasB && (this.unordered & CAND) === 0) {
        if (!(same && this.lockstep && steps >= 0))
          steps = idSteps(b.keyView, b.keyStart, b.keyLen, b.prevView, b.prevStart, b.prevLen);
        if (!this.orderB.take(steps)) this.unordered |= CAND;
      }
      this.lockstep = same;
      const step = this.step;
      if (!this.proportion && !this.strict) {
        if ((hasA && !(Math.abs(a.value) <= HUGE)) || (hasB && !(Math.abs(b.value) <= HUGE)))
          this.strict = true;
      }
      if (same) {
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
          if (this.pendingCount === this.batchOf) this.flush();
        }
      } else {
        this.ringUsed = !this.proportion;
        if (hasA) {
          if (a.keyLen <= INLINE_ID_BYTES) {
            if (this.proportion)
              batch.add(MEET_BASE | (a.value << 2), a.key, a.keyStart, a.keyLen, step);
            else {
              batch.add(MEET_BASE, a.key, a.keyStart, a.keyLen, step);
              batch.values[batch.size - 1] = a.value;
            }
          } else this.now(MEET_BASE, a, step);
        }
        if (hasB) {
          if (b.keyLen <= INLINE_ID_BYTES) {
            if (this.proportion)
              batch.add(MEET_CAND | (b.value << 2), b.key, b.keyStart, b.keyLen, step);
            else {
              batch.add(MEET_CAND, b.key, b.keyStart, b.keyLen, step);
              batch.values[batch.size - 1] = b.value;
            }
          } else this.now(MEET_CAND, b, step);
        }
      }
      this.step++;
      if (this.strict || this.step - this.windowStart === this.window || batch.full) {
        this.settle();
        batch = this.batch;
      }
      this.phase = ADVANCE_A;
    }
  }

  /**
   * A long id's table operation, at once (the table keeps long ids apart, in a Map, and needs no
   * hash for them).
   */
  private now(kind: number, lines: PredictionLines, step: number): void {
    const table = this.table;
    table.incoming = lines.value;
    table.incomingStep = step;
    const base = kind === MEET_BASE;
    if (table.meetLong(base ? BASE : CAND, lines.key, lines.keyStart, lines.keyLen))
      this.paired(base, step);
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
          if (this.pendingCount === this.batchOf) this.flush();
          ring[i] = Number.NaN;
        }
      }
    }
    this.windowStart = this.step;
    const { table, tuning } = this;
    if (++this.settles === WARM_SETTLES) this.window = tuning.window;
    if (
      this.window < tuning.maxWindow &&
      table.slots >= tuning.growFrom &&
      table.slots > SLOTS_PER_STEP * this.window
    ) {
      // Nothing waits in the batch or the ring now: both start afresh, larger.
      while (this.window < tuning.maxWindow && table.slots > SLOTS_PER_STEP * this.window)
        this.window = Math.min(tuning.maxWindow, 2 * this.window);
      this.batch = new IdBatch(2 * this.window, this.batch.idWidth);
      if (!this.proportion) this.ring = new Float64Array(3 * this.window).fill(Number.NaN);
    }
  }

  applyBatch(): void {
    const { batch, table } = this;
    if (batch.size === 0) return;
    table.widen(batch.longest);
    // When about a row per step waits, the ids are shuffled: then rows wait up to half the file at
    // once (a random order), and the table may as well grow to that in one step.
    // Not in the first (warm) windows: the first few hundred rows foretell the row count badly
    // (ids in order start short), and a table sized from them was 17 % larger on 10M rows.
    const rows = Math.max(this.estimate(this.a), this.estimate(this.b));
    table.expected = this.step >= this.tuning.window && table.size > this.step / 2 ? rows / 2 : 0;
    // A small table grows once for the whole batch (not by doubling through it).
    if (table.slots < 2 * batch.size) table.reserve(table.size + batch.size);
    batch.sort(table, this.tuning.regionBits, !this.proportion);
    const keys = batch.keyWords;
    for (let r = 0; r < batch.size; r++) {
      table.incoming = this.proportion ? batch.bit(r) : batch.value(r);
      const step = batch.step(r);
      table.incomingStep = step;
      const base = batch.kind(r) === MEET_BASE;
      const side = base ? BASE : CAND;
      if (table.meet(side, keys, batch.keyWord(r), batch.len(r), batch.hash(r)))
        this.paired(base, step);
    }
    batch.clear();
  }

  /** About how many rows a file has, from its size and the bytes per row so far; 0 if unknown. */
  private estimate(lines: PredictionLines): number {
    const size = lines.size;
    return size === null || lines.rows === 0 ? 0 : (size * lines.rows) / lines.consumed;
  }

  /** One table operation; a pair it makes goes to the counts or the ring. */
  /** A pair the table made, of the row read at `step` (from the baseline if `base`): counts it. */
  private paired(base: boolean, step: number): void {
    const table = this.table;
    {
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

  /** Count, mean and sample variance of one file's rows (0 baseline, 1 candidate), as RunningStats gives them. */
  side(i: 0 | 1): { n: number; mean: number; variance: number } {
    const s = this.sides;
    const n = s[3 * i] as number;
    const m2 = s[3 * i + 2] as number;
    return {
      n,
      mean: n > 0 ? (s[3 * i + 1] as number) : 0,
      variance: n > 1 ? Math.max(0, m2 / (n - 1)) : 0,
    };
  }

  /** RunningStats refuses a non-finite value: let it throw now, as it would have. */
  private refuse(d: number): void {
    this.flush();
    this.diffs.push(d);
  }

  flush(): void {
    this.diffs.pushAll(this.pending, this.pendingCount);
    this.pendingCount = 0;
    if (++this.flushes === WARM_FLUSHES) this.batchOf = BATCH;
  }
}
