/**
 * Tests on proportions and on a normal approximation. `alpha` is the two-sided level. Estimates are
 * candidate − baseline.
 */
import { binomialCdf, normalCdf, normalQuantile } from './distributions.js';
import type { Interval, TestName, TestResult } from './types.js';
import { assertAlpha, assertCount, assertFinite, assertProbability } from './validate.js';

/**
 * Normal-approximation (z) test of `estimate` with the given variance of the estimate:
 * z = estimate/sqrt(variance), two-sided p = 2Φ(−|z|), interval estimate ± z(1 − α/2)·sqrt(variance).
 * Variance 0: interval [estimate, estimate], p = 1 if the estimate is 0 else 0, no `statistic`.
 * RangeError for a non-finite estimate or a negative or non-finite variance.
 */
export function normalTest(
  estimate: number,
  variance: number,
  alpha: number,
  test: TestName = 'z-binomial',
): TestResult {
  assertAlpha(alpha);
  assertFinite('normalTest estimate', estimate);
  if (!(variance >= 0) || !Number.isFinite(variance)) {
    throw new RangeError(`normalTest variance must be a finite number >= 0; got ${variance}`);
  }
  if (variance === 0) {
    return { estimate, ci: [estimate, estimate], p: estimate === 0 ? 1 : 0, test };
  }
  const se = Math.sqrt(variance);
  const statistic = estimate / se;
  const half = normalQuantile(1 - alpha / 2) * se;
  const p = Math.min(1, 2 * normalCdf(-Math.abs(statistic)));
  return { estimate, ci: [estimate - half, estimate + half], p, test, statistic };
}

/** Binomial variance of a rate, p(1 − p)/n. p in [0, 1], n > 0 (RangeError otherwise). */
export function binomialVariance(p: number, n: number): number {
  assertProbability('binomialVariance p', p);
  if (!(n > 0) || !Number.isFinite(n)) {
    throw new RangeError(`binomialVariance n must be a positive number; got ${n}`);
  }
  return (p * (1 - p)) / n;
}

function checkRate(x: number, xName: string, n: number, nName: string): void {
  assertCount(xName, x);
  assertCount(nName, n);
  if (n === 0) throw new RangeError(`${nName} must be at least 1; got 0`);
  if (x > n) throw new RangeError(`${xName} (${x}) must not exceed ${nName} (${n})`);
}

/**
 * Two-proportion z test of p2 − p1 (baseline x1/n1, candidate x2/n2). `pooledZ` (also `statistic`)
 * uses the pooled standard error sqrt(p̂(1 − p̂)(1/n1 + 1/n2)), p̂ = (x1 + x2)/(n1 + n2), and gives
 * the two-sided p; pooledZ² is Pearson's X² for the 2×2 table. The interval is the unpooled Wald
 * interval, estimate ± z·sqrt(p1q1/n1 + p2q2/n2), so p and interval can disagree near alpha.
 * Degenerate: both rates 0 or both 1 → estimate 0, pooledZ 0, p 1, interval [0, 0]. One rate 0 and
 * the other 1 → the Wald interval collapses to [estimate, estimate] (a known Wald weakness).
 * RangeError for negative or non-integer counts, n = 0, or x > n.
 */
export function twoProportionZ(
  x1: number,
  n1: number,
  x2: number,
  n2: number,
  alpha: number,
): TestResult & { pooledZ: number } {
  assertAlpha(alpha);
  checkRate(x1, 'x1', n1, 'n1');
  checkRate(x2, 'x2', n2, 'n2');
  const p1 = x1 / n1;
  const p2 = x2 / n2;
  const estimate = p2 - p1;
  const pooled = (x1 + x2) / (n1 + n2);
  const se0 = Math.sqrt(pooled * (1 - pooled) * (1 / n1 + 1 / n2));
  if (se0 === 0) {
    return {
      estimate,
      ci: [estimate, estimate],
      p: 1,
      test: 'z-binomial',
      statistic: 0,
      pooledZ: 0,
    };
  }
  const pooledZ = estimate / se0;
  const p = Math.min(1, 2 * normalCdf(-Math.abs(pooledZ)));
  const half =
    normalQuantile(1 - alpha / 2) * Math.sqrt((p1 * (1 - p1)) / n1 + (p2 * (1 - p2)) / n2);
  return {
    estimate,
    ci: [estimate - half, estimate + half],
    p,
    test: 'z-binomial',
    statistic: pooledZ,
    pooledZ,
  };
}

/**
 * Wilson score interval for successes/n: (x + z²/2 ± z·sqrt(x(n − x)/n + z²/4)) / (n + z²),
 * z = z(1 − α/2). The bounds are exactly 0 when x = 0 and exactly 1 when x = n, and always within
 * [0, 1]. n = 0 (no trials) gives [0, 1], the formula's limit. RangeError for negative or
 * non-integer counts or successes > n.
 */
export function wilsonInterval(successes: number, n: number, alpha: number): Interval {
  assertAlpha(alpha);
  return wilsonAtZ(successes, n, normalQuantile(1 - alpha / 2));
}

/**
 * The Wilson score interval at a given normal quantile z ≥ 0 instead of a level (see
 * `wilsonInterval`). The intervals are nested in z: a larger z never gives a narrower interval,
 * which is what lets `newcombeDifference` invert its interval into a p-value.
 */
export function wilsonAtZ(successes: number, n: number, z: number): Interval {
  assertCount('successes', successes);
  assertCount('n', n);
  if (successes > n) throw new RangeError(`successes (${successes}) must not exceed n (${n})`);
  if (!(z >= 0) || !Number.isFinite(z)) {
    throw new RangeError(`z must be a finite number >= 0; got ${z}`);
  }
  if (n === 0) return [0, 1];
  const z2 = z * z;
  const centre = (successes + z2 / 2) / (n + z2);
  const half = (z / (n + z2)) * Math.sqrt((successes * (n - successes)) / n + z2 / 4);
  const low = successes === 0 ? 0 : Math.max(0, centre - half);
  const high = successes === n ? 1 : Math.min(1, centre + half);
  return [low, high];
}

/**
 * McNemar exact conditional test. b = baseline right & candidate wrong, c = baseline wrong &
 * candidate right, n = paired rows. estimate (c − b)/n = change in the proportion correct; CI: Wald
 * interval for paired proportions, estimate ± z·sqrt(((b + c)/n − estimate²)/n), clipped to
 * [−1, 1]; p = min(1, 2·BinomCDF(min(b, c); b + c, 0.5)); b + c = 0 → p = 1 and interval [0, 0].
 * No `statistic` (the test is exact). RangeError for negative or non-integer counts, n = 0, or
 * b + c > n.
 */
export function mcnemarExact(b: number, c: number, n: number, alpha: number): TestResult {
  assertAlpha(alpha);
  assertCount('b (baseline right, candidate wrong)', b);
  assertCount('c (baseline wrong, candidate right)', c);
  assertCount('n (paired rows)', n);
  if (n === 0) throw new RangeError('mcnemarExact needs at least one paired row; got n = 0');
  if (b + c > n) {
    throw new RangeError(`discordant pairs b + c (${b} + ${c}) must not exceed n (${n})`);
  }
  const estimate = (c - b) / n;
  const discordant = b + c;
  if (discordant === 0) return { estimate: 0, ci: [0, 0], p: 1, test: 'mcnemar-exact' };
  const p = Math.min(1, 2 * binomialCdf(Math.min(b, c), discordant, 0.5));
  const variance = Math.max(0, (discordant / n - estimate * estimate) / n);
  const half = normalQuantile(1 - alpha / 2) * Math.sqrt(variance);
  const ci: Interval = [Math.max(-1, estimate - half), Math.min(1, estimate + half)];
  return { estimate, ci, p, test: 'mcnemar-exact' };
}
