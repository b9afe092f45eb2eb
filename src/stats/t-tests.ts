/**
 * t tests on a difference candidate − baseline. `alpha` is the two-sided level (0.05 → 95% interval).
 *
 * Zero standard error (every value in each group equal, or all paired differences equal) is defined
 * rather than divided by: the interval collapses to [estimate, estimate], p = 1 when the estimate is
 * exactly 0 and p = 0 otherwise, and `statistic` and `df` are left out (a t of ±∞ or 0/0 is not a
 * number a reader should see).
 */
import { tCdf, tQuantile } from './distributions.js';
import { mean, sampleVariance } from './descriptive.js';
import type { Interval, TestResult, TestName } from './types.js';
import { assertAlpha, assertFinite, assertFiniteValues, assertMinLength } from './validate.js';

interface TSummary {
  estimate: number;
  ci: Interval;
  p: number;
  df?: number;
  statistic?: number;
}

/** Two-sided t inference from an estimate, its squared standard error and df. */
function tInference(estimate: number, se2: number, df: number, alpha: number): TSummary {
  assertFinite('estimate', estimate);
  if (!Number.isFinite(se2)) {
    throw new RangeError(`standard error is not finite (${se2}); values too large to combine`);
  }
  if (se2 === 0) {
    return { estimate, ci: [estimate, estimate], p: estimate === 0 ? 1 : 0 };
  }
  const se = Math.sqrt(se2);
  const statistic = estimate / se;
  const half = tQuantile(1 - alpha / 2, df) * se;
  const p = Math.min(1, 2 * tCdf(-Math.abs(statistic), df));
  return { estimate, ci: [estimate - half, estimate + half], p, df, statistic };
}

function toResult(summary: TSummary, test: TestName): TestResult {
  return { ...summary, test };
}

/**
 * Welch's t test for mean(candidate) − mean(baseline), Welch–Satterthwaite df. Needs at least two
 * finite values in each group (RangeError otherwise). Both variances 0: see the module note. One
 * variance 0: df is n − 1 of the other group, as the formula gives.
 */
export function welchT(
  baseline: readonly number[],
  candidate: readonly number[],
  alpha: number,
): TestResult {
  assertAlpha(alpha);
  checkGroup('baseline', baseline);
  checkGroup('candidate', candidate);
  const n1 = baseline.length;
  const n2 = candidate.length;
  const v1 = sampleVariance(baseline) / n1;
  const v2 = sampleVariance(candidate) / n2;
  const se2 = v1 + v2;
  const df = se2 === 0 ? n1 + n2 - 2 : (se2 * se2) / ((v1 * v1) / (n1 - 1) + (v2 * v2) / (n2 - 1));
  return toResult(tInference(mean(candidate) - mean(baseline), se2, df, alpha), 'welch-t');
}

/**
 * Paired t on per-example differences (candidate − baseline) summarised by `RunningStats` or any
 * `{ n, mean, variance }` with sample variance. Needs n >= 2 and a finite mean and variance >= 0.
 * All differences equal (variance 0): see the module note.
 */
export function pairedT(
  diffs: { n: number; mean: number; variance: number },
  alpha: number,
): TestResult {
  assertAlpha(alpha);
  const { n, mean: m, variance } = diffs;
  if (!Number.isSafeInteger(n) || n < 2) {
    throw new RangeError(`pairedT needs at least 2 paired differences; got n = ${n}`);
  }
  assertFinite('pairedT mean', m);
  if (!(variance >= 0) || !Number.isFinite(variance)) {
    throw new RangeError(`pairedT variance must be a finite number >= 0; got ${variance}`);
  }
  return toResult(tInference(m, variance / n, n - 1, alpha), 'paired-t');
}

/**
 * One-sample t on values (H0: mean 0): the mean, its two-sided 1 − alpha interval, the two-sided p
 * and the one-sided p for H1: mean > 0, df = n − 1. Needs n >= 2 finite values. All values equal
 * (variance 0): interval [mean, mean]; pTwoSided = 1 if the mean is 0 else 0; pGreater = 0 for a
 * positive mean, 0.5 for a zero mean (half of the two-sided 1, as at t = 0), 1 for a negative mean.
 */
export function oneSampleT(
  values: readonly number[],
  alpha: number,
): { estimate: number; ci: Interval; pTwoSided: number; pGreater: number; df: number } {
  assertAlpha(alpha);
  checkGroup('values', values);
  const n = values.length;
  const df = n - 1;
  const summary = tInference(mean(values), sampleVariance(values) / n, df, alpha);
  const { estimate, ci, p } = summary;
  let pGreater: number;
  if (summary.statistic === undefined) pGreater = estimate > 0 ? 0 : estimate === 0 ? 0.5 : 1;
  else pGreater = tCdf(-summary.statistic, df);
  return { estimate, ci, pTwoSided: p, pGreater, df };
}

function checkGroup(name: string, values: readonly number[]): void {
  assertMinLength(name, values, 2);
  assertFiniteValues(name, values);
}
