/**
 * Is the train/validation gap of a learning curve still closing at its right end?
 *
 * Rule (ours, stated so it can be argued with): take the last GAP_POINTS points that have a train
 * value, gap = validation error − train error. Fit a least-squares line of gap against log2(m) and
 * divide its slope by the mean gap over those points: the relative change of the gap per doubling
 * of the training set.
 * - `closing`: the gap shrinks by at least 5 % per doubling (more data still helps);
 * - `flat`: it changes by less than 5 % either way, or the mean gap is already under 5 % of the
 *   mean validation error (nothing left to close; with a high validation error, a high-bias sign);
 * - `unknown`: fewer than 3 points with train values, or a widening gap (neither sign).
 */
export const GAP_POINTS = 4;
const RELATIVE_CHANGE = 0.05;

export interface GapTrend {
  trend: 'closing' | 'flat' | 'unknown';
  /** Relative change of the gap per doubling of m; null when not computed. */
  changePerDoubling: number | null;
}

export function gapTrend(
  points: readonly { x: number; trainError?: number; validationError: number }[],
): GapTrend {
  const withTrain = points.flatMap((p) =>
    p.trainError === undefined
      ? []
      : [{ x: p.x, gap: p.validationError - p.trainError, v: p.validationError }],
  );
  const tail = withTrain.slice(-GAP_POINTS);
  if (tail.length < 3) return { trend: 'unknown', changePerDoubling: null };
  const lx = tail.map((p) => Math.log2(p.x));
  const meanX = lx.reduce((s, v) => s + v, 0) / tail.length;
  const meanGap = tail.reduce((s, p) => s + p.gap, 0) / tail.length;
  const meanV = tail.reduce((s, p) => s + p.v, 0) / tail.length;
  let sxx = 0;
  let sxy = 0;
  tail.forEach((p, i) => {
    sxx += ((lx[i] as number) - meanX) ** 2;
    sxy += ((lx[i] as number) - meanX) * (p.gap - meanGap);
  });
  if (Math.abs(meanGap) <= RELATIVE_CHANGE * Math.abs(meanV)) {
    return { trend: 'flat', changePerDoubling: meanGap !== 0 ? sxy / sxx / Math.abs(meanGap) : 0 };
  }
  const change = sxy / sxx / Math.abs(meanGap);
  if (change <= -RELATIVE_CHANGE) return { trend: 'closing', changePerDoubling: change };
  if (change < RELATIVE_CHANGE) return { trend: 'flat', changePerDoubling: change };
  return { trend: 'unknown', changePerDoubling: change };
}
