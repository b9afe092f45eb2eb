/**
 * The lockstep loop of the pairing (pairing.ts): the common case of `Pairing.run()` in one tight
 * loop over the two files' buffers. It reads and writes the pairing's state through
 * `LockstepState` (the `Pairing` itself) and the readers' rows through `PredictionLines.took`.
 */
import { idSteps, sameIds, type IdOrder } from './id-compare.js';
import type { PredictionLines } from './prediction-lines.js';

/** In place of a loss reader for 0/1 files (never called). */
const noDecimal = (): number => -1;
const NO_VALUE = new Float64Array(1);

/** Steps of one call of the lockstep loop (see `lockstepRows`). */
const BLOCK = 2048;

/** The state of `Pairing` that the lockstep loop reads and advances (see pairing.ts). */
export interface LockstepState {
  readonly a: PredictionLines;
  readonly b: PredictionLines;
  readonly proportion: boolean;
  readonly sides: Float64Array;
  readonly orderA: IdOrder;
  readonly orderB: IdOrder;
  readonly pending: Float64Array;
  readonly ring: Float64Array;
  hasA: boolean;
  hasB: boolean;
  ringUsed: boolean;
  pendingCount: number;
  batchOf: number;
  step: number;
  window: number;
  windowStart: number;
  rows: number;
  baselineOnly: number;
  candidateOnly: number;
  settle(): void;
  flush(): void;
}

/**
 * The common case of `Pairing.run()` in one loop: both files in step (the last rows had the same
 * id) and ids increasing. Each row pair is read from the two buffers by the byte path's rules,
 * and taken only when the rows are `ID,V\n` lines wholly in their buffers (V: 0 or 1, or a loss
 * the byte path reads) with the same id, following the last one in order; the pair then counts
 * exactly as one step of `run()` counts it (the same Welford updates, counts, differences and
 * order checks; the window settles and the batch of differences flushes at the same steps).
 * Anything else stops the loop before that row, and `run()` reads it. Why: one loop without a
 * call (0/1 values) or a field write per row is about 1.6 times as fast as the general step,
 * and V8 compiles it sooner (issue 14). The loop itself is in `lockstepBlock`, which stops at
 * the end of a window or batch, so that V8 compiles it without the settling code (a compile of
 * the two together took 36 ms).
 */
export function lockstepRows(st: LockstepState): void {
  const { a, b } = st;
  if (a.pending !== null || b.pending !== null || !st.hasA || !st.hasB) return;
  // Losses: only through the WebAssembly readers (else run() reads them, by readDecimal).
  if (!st.proportion && (a.decimals === null || b.decimals === null)) return;
  for (;;) {
    const room = st.window - (st.step - st.windowStart);
    if (room < 1) return; // not expected: run() settles after a full window
    // Blocks of at most BLOCK steps: once V8 has compiled the loop, the next block runs the
    // compiled code, without waiting for a replacement of the running one (on-stack replacement).
    // Losses: a block also ends where the batch of differences is full, flushed here.
    const free = st.proportion || st.ringUsed ? BLOCK : st.batchOf - st.pendingCount;
    if (free < 1) return; // not expected: run() flushes a full batch at once
    const block = Math.min(room, BLOCK, free);
    const taken = lockstepBlock(st, block);
    if (!st.proportion && st.pendingCount === st.batchOf) st.flush();
    if (taken < block) return;
    if (taken === room) st.settle();
  }
}

/** Up to `room` steps of `lockstepRows`; how many were taken. */
function lockstepBlock(st: LockstepState, room: number): number {
  const { a, b } = st;
  const ba = a.buf;
  const bb = b.buf;
  const va = a.view;
  const vb = b.view;
  const ea = a.end;
  const eb = b.end;
  const s = st.sides;
  const orderA = st.orderA;
  const orderB = st.orderB;
  // Losses: the readers of the two buffers (decimal-wasm.ts); unused for 0/1.
  const readA = a.decimals === null ? noDecimal : a.decimals.read;
  const readB = b.decimals === null ? noDecimal : b.decimals.read;
  const outA = a.decimals === null ? NO_VALUE : a.decimals.out;
  const outB = b.decimals === null ? NO_VALUE : b.decimals.out;
  let pa = a.pos;
  let pb = b.pos;
  // The previous row (of both files: the same id).
  let prevView = a.keyView;
  let prevStart = a.keyStart;
  let prevLen = a.keyLen;
  // The last rows taken (their ids have the same length in both files) and the ones before.
  let lastA = 0;
  let lastB = 0;
  let lastLen = 0;
  let beforeA = 0;
  let beforeB = 0;
  let beforeLen = 0;
  let x = 0;
  let y = 0;
  let count = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  const proportion = st.proportion;
  const ringUsed = st.ringUsed;
  const ring = st.ring;
  const pending = st.pending;
  let pendingCount = st.pendingCount;
  let step = st.step;
  const windowStart = st.windowStart;
  while (count < room) {
    // Row of the baseline: ID up to the comma, then 0 or 1, then a newline, all in the buffer.
    let p = pa;
    let c = p < ea ? (ba[p] as number) : 0;
    while (c > 32 && c < 127 && c !== 44) c = ++p < ea ? (ba[p] as number) : 0;
    const len = p - pa;
    if (c !== 44 || len === 0) break;
    let nextA: number;
    let xv: number;
    if (proportion) {
      if (p + 2 >= ea) break;
      const xa = ba[p + 1] as number;
      if ((xa !== 48 && xa !== 49) || ba[p + 2] !== 10) break;
      xv = xa - 48;
      nextA = p + 3;
    } else {
      // A plain decimal within ±1e15 and a newline (decimal.wat), else −1; −2 (Number() must
      // read it) is left to run() too.
      nextA = readA(p + 1, ea);
      if (nextA < 0) break;
      xv = outA[0] as number;
    }
    // Row of the candidate: the same id bytes (compared a word at a time, so they are as valid as
    // the baseline's), then a comma, then its value the same way.
    const q = pb + len;
    if (q >= eb || bb[q] !== 44 || !sameIds(va, pa, len, vb, pb, len)) break;
    let nextB: number;
    let yv: number;
    if (proportion) {
      if (q + 2 >= eb) break;
      const yb = bb[q + 1] as number;
      if ((yb !== 48 && yb !== 49) || bb[q + 2] !== 10) break;
      yv = yb - 48;
      nextB = q + 3;
    } else {
      nextB = readB(q + 1, eb);
      if (nextB < 0) break;
      yv = outB[0] as number;
    }
    const code = idSteps(va, pa, len, prevView, prevStart, prevLen);
    if (!orderA.take(code) || !orderB.take(code)) break;
    // Taken: the same arithmetic, in the same order, as run().
    x = xv;
    y = yv;
    let n = (s[0] as number) + 1;
    s[0] = n;
    let delta = x - (s[1] as number);
    s[1] = (s[1] as number) + delta / n;
    s[2] = (s[2] as number) + delta * (x - (s[1] as number));
    n = (s[3] as number) + 1;
    s[3] = n;
    delta = y - (s[4] as number);
    s[4] = (s[4] as number) + delta / n;
    s[5] = (s[5] as number) + delta * (y - (s[4] as number));
    if (proportion) {
      if (x === 1 && y === 0) baselineOnly++;
      else if (x === 0 && y === 1) candidateOnly++;
    } else if (ringUsed) ring[(step - windowStart) * 3] = y - x;
    else {
      // Within ±1e15 on the byte path: never HUGE (run()'s strict mode) and always finite.
      pending[pendingCount++] = y - x;
    }
    step++;
    beforeA = lastA;
    beforeB = lastB;
    beforeLen = lastLen;
    lastA = pa;
    lastB = pb;
    lastLen = len;
    prevView = va;
    prevStart = pa;
    prevLen = len;
    pa = nextA;
    pb = nextB;
    count++;
  }
  if (count > 0) {
    st.rows += count;
    st.step = step;
    st.pendingCount = pendingCount;
    st.baselineOnly += baselineOnly;
    st.candidateOnly += candidateOnly;
    a.took(count, lastA, lastLen, x, beforeA, beforeLen, pa);
    b.took(count, lastB, lastLen, y, beforeB, beforeLen, pb);
  }
  return count;
}
