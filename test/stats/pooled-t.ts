/**
 * The equal-variance (pooled) two-sample t test, built from the public distribution functions. It
 * lives with the tests: reviews use Welch's test (DESIGN.md §4 has no pooled test); it is here so
 * that NIST's printed pooled example checks `tCdf` and `tQuantile` end to end.
 */
import { mean, sampleVariance, tCdf, tQuantile } from '../../src/stats/index.js';

export interface PooledT {
  estimate: number;
  ci: [number, number];
  p: number;
  df: number;
  statistic: number;
  /** s_p = sqrt(((n1 − 1)s1² + (n2 − 1)s2²) / (n1 + n2 − 2)). */
  pooledSd: number;
}

/** mean(candidate) − mean(baseline) with df = n1 + n2 − 2 (common practice). */
export function pooledT(baseline: number[], candidate: number[], alpha: number): PooledT {
  const n1 = baseline.length;
  const n2 = candidate.length;
  const df = n1 + n2 - 2;
  const pooledVar =
    ((n1 - 1) * sampleVariance(baseline) + (n2 - 1) * sampleVariance(candidate)) / df;
  const se = Math.sqrt(pooledVar * (1 / n1 + 1 / n2));
  const estimate = mean(candidate) - mean(baseline);
  const statistic = estimate / se;
  const half = tQuantile(1 - alpha / 2, df) * se;
  const p = Math.min(1, 2 * tCdf(-Math.abs(statistic), df));
  return {
    estimate,
    ci: [estimate - half, estimate + half],
    p,
    df,
    statistic,
    pooledSd: Math.sqrt(pooledVar),
  };
}
