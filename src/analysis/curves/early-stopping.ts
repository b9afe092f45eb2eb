/**
 * Early-stopping evidence from an epoch curve, after Prechelt (1998), "Early Stopping — But When?",
 * Neural Networks: Tricks of the Trade, LNCS 1524, pp. 55–69 (definitions in VALUES.md §8).
 *
 * Errors here are already errors (lower is better; see error-scale.ts). A "strip" is k consecutive
 * points of the curve (Prechelt's epochs; a curve logged every few epochs has one point per
 * evaluation). Index t below is 0-based; Prechelt's epoch t is our t + 1, and strip ends are the
 * points whose 1-based position is a multiple of k.
 *
 * - E_opt(t) = min_{t' ≤ t} E_va(t'); GL(t) = 100·(E_va(t)/E_opt(t) − 1), in percent. Written as
 *   100·(E_va − E_opt)/|E_opt| so a negated metric does not flip its sign; E_opt = 0 gives 0 when
 *   E_va = 0, else +∞.
 * - P_k(t) = 1000·(Σ_{strip} E_tr / (k·min_{strip} E_tr) − 1), in per mille, over the k points
 *   ending at t (defined from t = k − 1 on).
 * - PQ(t) = GL(t)/P_k(t) at strip ends.
 * - Criteria: GL_α stops at the first t with GL(t) > α; PQ_α at the first strip end with PQ > α;
 *   UP_s at the first strip end where E_va rose over each of s successive strips.
 *
 * Verdicts:
 * - `stoppedLate`: the last point lies after the validation minimum and GL(last) > 5, i.e. even the
 *   most tolerant generalization-loss criterion of Prechelt's grid (GL_5) says the run ends
 *   overfitted.
 * - `stoppedEarly`: over the last strip (k points) both the training and the validation error fall
 *   (negative least-squares slope against the point index), the last validation error is within
 *   1 % of the best so far (GL(last) ≤ 1, so not even GL_1, the most sensitive criterion of the
 *   grid, would stop), and training still progresses by Prechelt's own bar (P_k(last) ≥ 0.1, his
 *   "progress has stalled" stop). Needs train values. (The combination is ours.)
 */
export const STRIP = 5;
/** Prechelt's (1998) parameter grid (VALUES.md §8, from memory there). */
export const GL_ALPHAS = [1, 2, 3, 5] as const;
export const PQ_ALPHAS = [0.5, 0.75, 1, 2, 3] as const;
export const UP_STRIPS = [2, 3, 4, 6, 8] as const;
/** stoppedLate fires above this generalization loss (GL_5, the largest α of the grid). */
export const LATE_GL = 5;
/** stoppedEarly needs GL(last) at most this (GL_1, the smallest α of the grid). */
export const EARLY_GL = 1;
/** Prechelt's stalled-progress bar for P_5, in per mille. */
export const PROGRESS_STALLED = 0.1;

/** GL(t) for every t, in percent. */
export function generalizationLoss(validation: readonly number[]): number[] {
  let best = Infinity;
  return validation.map((v) => {
    best = Math.min(best, v);
    if (best === 0) return v === 0 ? 0 : Infinity;
    return (100 * (v - best)) / Math.abs(best);
  });
}

/** P_k(t) for every t, in per mille; null for t < k − 1. */
export function trainingProgress(train: readonly number[], k = STRIP): (number | null)[] {
  return train.map((_, t) => (t < k - 1 ? null : windowProgress(train, t, k)));
}

/** PQ(t) = GL(t)/P_k(t) at strip ends, null elsewhere. P_k = 0 gives +∞ (or 0 when GL = 0). */
export function progressQuotient(
  validation: readonly number[],
  train: readonly number[],
  k = STRIP,
): (number | null)[] {
  return quotients(generalizationLoss(validation), trainingProgress(train, k), k);
}

/** PQ from GL and P_k already computed. */
function quotients(
  gl: readonly number[],
  progress: readonly (number | null)[],
  k: number,
): (number | null)[] {
  return gl.map((g, t) => {
    const p = progress[t];
    if ((t + 1) % k !== 0 || p === null || p === undefined) return null;
    if (p === 0) return g === 0 ? 0 : Infinity;
    return g / p;
  });
}

/** First index where GL > α, or null. */
export function glStop(validation: readonly number[], alpha: number): number | null {
  const t = generalizationLoss(validation).findIndex((g) => g > alpha);
  return t < 0 ? null : t;
}

/** First strip end where PQ > α, or null. */
export function pqStop(
  validation: readonly number[],
  train: readonly number[],
  alpha: number,
  k = STRIP,
): number | null {
  const t = progressQuotient(validation, train, k).findIndex((q) => q !== null && q > alpha);
  return t < 0 ? null : t;
}

/** First strip end t where E_va rose over each of s successive strips (E_va(t) > E_va(t − k) …). */
export function upStop(validation: ArrayLike<number>, s: number, k = STRIP): number | null {
  let run = 0;
  for (let t = 2 * k - 1; t < validation.length; t += k) {
    run = (validation[t] as number) > (validation[t - k] as number) ? run + 1 : 0;
    if (run >= s) return t;
  }
  return null;
}

export interface EpochVerdict {
  bestIndex: number;
  gl: number | null;
  /** PQ at the last strip end; null without train values or before the first strip end. */
  pq: number | null;
  stoppedLate: boolean;
  stoppedEarly: boolean;
  /** Index at which each of Prechelt's criteria would have stopped (null: never fired). */
  stopsAt: Record<string, number | null>;
}

/**
 * The verdict in one pass over the curve, without an array per criterion: GL, P_k and PQ are
 * computed point by point, with the same operations in the same order as the functions above
 * (which define them and serve as the reference in the tests), so the numbers are identical.
 * Linear in the number of points (P_k sums k values per strip end).
 */
export function epochVerdict(
  validation: ArrayLike<number>,
  train: ArrayLike<number> | null,
): EpochVerdict {
  const n = validation.length;
  const last = n - 1;
  const k = STRIP;
  let bestIndex = 0;
  let best = Infinity;
  let gl = 0;
  let pq: number | null = null;
  let lastProgress: number | null = null;
  const glStops: (number | null)[] = GL_ALPHAS.map(() => null);
  const pqStops: (number | null)[] = PQ_ALPHAS.map(() => null);
  for (let t = 0; t < n; t++) {
    const v = validation[t] as number;
    if (v < (validation[bestIndex] as number)) bestIndex = t;
    best = Math.min(best, v);
    gl = best === 0 ? (v === 0 ? 0 : Infinity) : (100 * (v - best)) / Math.abs(best);
    for (let a = 0; a < GL_ALPHAS.length; a++)
      if (glStops[a] === null && gl > (GL_ALPHAS[a] as number)) glStops[a] = t;
    if (train === null || t < k - 1 || ((t + 1) % k !== 0 && t !== last)) continue;
    const progress = windowProgress(train, t, k);
    if (t === last) lastProgress = progress;
    if ((t + 1) % k !== 0) continue;
    const q = progress === 0 ? (gl === 0 ? 0 : Infinity) : gl / progress;
    pq = q;
    for (let a = 0; a < PQ_ALPHAS.length; a++)
      if (pqStops[a] === null && q > (PQ_ALPHAS[a] as number)) pqStops[a] = t;
  }
  const stopsAt: Record<string, number | null> = {};
  GL_ALPHAS.forEach((alpha, a) => (stopsAt[`GL_${alpha}`] = glStops[a] ?? null));
  let stoppedEarly = false;
  if (train) {
    PQ_ALPHAS.forEach((alpha, a) => (stopsAt[`PQ_${alpha}`] = pqStops[a] ?? null));
    stoppedEarly =
      n >= STRIP &&
      gl <= EARLY_GL &&
      slope(validation, n - STRIP) < 0 &&
      slope(train, n - STRIP) < 0 &&
      lastProgress !== null &&
      lastProgress >= PROGRESS_STALLED;
  }
  for (const s of UP_STRIPS) stopsAt[`UP_${s}`] = upStop(validation, s);
  return {
    bestIndex,
    // GL is relative to the best validation error; with a best of exactly 0 it is undefined.
    gl: Number.isFinite(gl) ? gl : null,
    pq: pq !== null && Number.isFinite(pq) ? pq : null,
    stoppedLate: bestIndex < last && gl > LATE_GL,
    stoppedEarly,
    stopsAt,
  };
}

/** P_k(t) of trainingProgress, for one t ≥ k − 1. */
function windowProgress(train: ArrayLike<number>, t: number, k: number): number {
  let sum = 0;
  let min = Infinity;
  for (let i = t - k + 1; i <= t; i++) {
    sum += train[i] as number;
    min = Math.min(min, train[i] as number);
  }
  if (min === 0) return sum === 0 ? 0 : Infinity;
  return 1000 * (sum / (k * min) - 1);
}

/** Least-squares slope against the index of the values from `from` (≥ 0) to the end. */
function slope(all: ArrayLike<number>, from: number): number {
  const n = all.length - from;
  const mx = (n - 1) / 2;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += all[from + i] as number;
  const my = sum / n;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < n; i++) {
    sxy += (i - mx) * ((all[from + i] as number) - my);
    sxx += (i - mx) ** 2;
  }
  return sxx > 0 ? sxy / sxx : 0;
}
