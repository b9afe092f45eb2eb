/**
 * Ratio of two positive quantities (a cost: training seconds, inference milliseconds) with a
 * confidence interval from Welch's t on the logarithms: the interval of ln(candidate) − ln(baseline)
 * exponentiated, i.e. the ratio of geometric means (common practice for positive, right-skewed
 * measurements such as times; the log scale makes the ratio symmetric: swapping the runs inverts the
 * ratio and its interval).
 */
import { welchT } from './t-tests.js';
import type { Interval } from './types.js';
import { assertAlpha } from './validate.js';

export interface RatioEstimate {
  /** candidate / baseline: ratio of geometric means (of the single values with one repeat). */
  ratio: number;
  /** 1 − alpha interval of the ratio; null with fewer than two values on a side. */
  ci: Interval | null;
  /** Two-sided p of H0: ratio = 1; null when `ci` is. */
  p: number | null;
}

function geometricMean(values: readonly number[]): number {
  if (values.length === 1) return values[0] as number;
  let sum = 0;
  for (const v of values) sum += Math.log(v);
  return Math.exp(sum / values.length);
}

/** Needs at least one positive finite value per side (RangeError otherwise). */
export function logRatio(
  baseline: readonly number[],
  candidate: readonly number[],
  alpha: number,
): RatioEstimate {
  assertAlpha(alpha);
  for (const [name, values] of [
    ['baseline', baseline],
    ['candidate', candidate],
  ] as const) {
    if (values.length === 0) throw new RangeError(`${name} needs at least 1 value; got 0`);
    values.forEach((v, i) => {
      if (!(v > 0) || !Number.isFinite(v)) {
        throw new RangeError(`${name}[${i}] must be a positive finite number; got ${v}`);
      }
    });
  }
  const ratio = geometricMean(candidate) / geometricMean(baseline);
  if (baseline.length < 2 || candidate.length < 2) return { ratio, ci: null, p: null };
  const test = welchT(baseline.map(Math.log), candidate.map(Math.log), alpha);
  const ci = test.ci;
  return {
    ratio,
    ci: ci === null ? null : [Math.exp(ci[0]), Math.exp(ci[1])],
    p: test.p,
  };
}
