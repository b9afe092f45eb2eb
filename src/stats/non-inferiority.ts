/**
 * Non-inferiority of a guardrail metric, by the confidence-interval approach (ICH E9 §3.3.2 and
 * ICH E10 §1.5; Wellek, Testing Statistical Hypotheses of Equivalence and Noninferiority, 2nd ed.,
 * 2010, ch. 2): with `worsening` the candidate's change in the harmful direction and `margin` the
 * largest worsening still acceptable,
 *
 * - non-inferior when the one-sided upper (1 − alpha) confidence bound of the worsening is below
 *   the margin, which is the one-sided test of H0: worsening ≥ margin at level alpha;
 * - inferior when the one-sided lower (1 − alpha) bound is above the margin (H0: worsening ≤ margin);
 * - otherwise undetermined.
 *
 * The two bounds together are the two-sided 1 − 2·alpha interval (a 90% interval at alpha 0.05).
 * `df` null means a normal reference distribution (z); otherwise Student's t with `df`.
 */
import { holmAdjust } from './holm.js';
import { normalCdf, normalQuantile, tCdf, tQuantile } from './distributions.js';
import type { Interval } from './types.js';
import { mean, sampleVariance } from './descriptive.js';
import { assertAlpha, assertFinite, assertFiniteValues, assertMinLength } from './validate.js';

export interface WorseningEstimate {
  /** Candidate's worsening, in the metric's units (positive = worse). */
  estimate: number;
  /** Its standard error; 0 when every value agreed (then the bounds collapse on the estimate). */
  se: number;
  /** Degrees of freedom of a t reference; null for a normal (z) reference. */
  df: number | null;
}

export interface NonInferiorityTest {
  /** One-sided (1 − alpha) lower and upper bounds of the worsening. */
  bounds: Interval;
  /** One-sided p of H0: worsening ≥ margin (small → non-inferior). */
  pNonInferior: number;
  /** One-sided p of H0: worsening ≤ margin (small → inferior). */
  pInferior: number;
}

export type NonInferiorityCall = 'non-inferior' | 'inferior' | 'undetermined';

/**
 * The worsening mean(candidate) − mean(baseline) of a minimized metric from per-repeat values, with
 * Welch's standard error and Welch–Satterthwaite df (NIST/SEMATECH e-Handbook §1.3.5.3). Needs at
 * least two finite values per side. For a maximized metric pass the values negated.
 */
export function welchWorsening(
  baseline: readonly number[],
  candidate: readonly number[],
): WorseningEstimate {
  for (const [name, values] of [
    ['baseline', baseline],
    ['candidate', candidate],
  ] as const) {
    assertMinLength(name, values, 2);
    assertFiniteValues(name, values);
  }
  const v1 = sampleVariance(baseline) / baseline.length;
  const v2 = sampleVariance(candidate) / candidate.length;
  const se2 = v1 + v2;
  const df =
    se2 === 0
      ? baseline.length + candidate.length - 2
      : (se2 * se2) / ((v1 * v1) / (baseline.length - 1) + (v2 * v2) / (candidate.length - 1));
  return { estimate: mean(candidate) - mean(baseline), se: Math.sqrt(se2), df };
}

function upperTail(statistic: number, df: number | null): number {
  return df === null ? normalCdf(-statistic) : tCdf(-statistic, df);
}

/** One-sided tests of a worsening against a margin, and the matching one-sided bounds. */
export function nonInferiorityTest(
  worsening: WorseningEstimate,
  margin: number,
  alpha: number,
): NonInferiorityTest {
  assertAlpha(alpha);
  assertFinite('worsening estimate', worsening.estimate);
  assertFinite('margin', margin);
  const { estimate, se, df } = worsening;
  if (!(se >= 0) || !Number.isFinite(se)) {
    throw new RangeError(`standard error must be a finite number >= 0; got ${se}`);
  }
  if (df !== null && !(df > 0)) throw new RangeError(`df must be > 0 or null; got ${df}`);
  if (se === 0) {
    const below = estimate < margin;
    const above = estimate > margin;
    return {
      bounds: [estimate, estimate],
      pNonInferior: below ? 0 : 1,
      pInferior: above ? 0 : 1,
    };
  }
  const quantile = df === null ? normalQuantile(1 - alpha) : tQuantile(1 - alpha, df);
  const statistic = (estimate - margin) / se;
  return {
    bounds: [estimate - quantile * se, estimate + quantile * se],
    pNonInferior: upperTail(-statistic, df),
    pInferior: upperTail(statistic, df),
  };
}

/**
 * Calls for several guardrails at once, each family of one-sided p-values Holm-adjusted across the
 * guardrails (Holm 1979), so the chance of calling any non-inferior guardrail wrongly stays at most
 * alpha. A null test (noise unknown or no margin) is `null` and takes no part in the adjustment.
 */
export function nonInferiorityCalls(
  tests: readonly (NonInferiorityTest | null)[],
  alpha: number,
): { call: NonInferiorityCall | null; pNonInferior: number | null; pInferior: number | null }[] {
  assertAlpha(alpha);
  const nonInferior = holmAdjust(tests.map((t) => (t === null ? null : t.pNonInferior)));
  const inferior = holmAdjust(tests.map((t) => (t === null ? null : t.pInferior)));
  return tests.map((t, i) => {
    if (t === null) return { call: null, pNonInferior: null, pInferior: null };
    const pNi = nonInferior[i] ?? 1;
    const pInf = inferior[i] ?? 1;
    const call: NonInferiorityCall =
      pNi < alpha ? 'non-inferior' : pInf < alpha ? 'inferior' : 'undetermined';
    return { call, pNonInferior: pNi, pInferior: pInf };
  });
}
