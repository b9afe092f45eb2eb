/**
 * Difference of two independent proportions, candidate − baseline, with an interval that does not
 * collapse at 0 or 1 and a p-value whose decision always agrees with it.
 *
 * Interval: Newcombe's hybrid score interval (Newcombe 1998, "Interval estimation for the
 * difference between independent proportions: comparison of eleven methods", Statistics in
 * Medicine 17:873–890, method 10). With Wilson score limits [l₁, u₁] for the baseline rate p₁ and
 * [l₂, u₂] for the candidate rate p₂ at the same z, and δ = p₂ − p₁:
 *
 *   L = δ − sqrt((p₂ − l₂)² + (u₁ − p₁)²),   U = δ + sqrt((u₂ − p₂)² + (p₁ − l₁)²).
 *
 * Because each Wilson interval has positive width at 0/n and n/n, so does this one: 540/540
 * against 375/375 gives about [−0.0101, +0.0071], not [0, 0].
 *
 * p-value: the smallest two-sided level at which the interval excludes 0. The Wilson intervals are
 * nested in z (a larger z never narrows them), so L(z) falls and U(z) rises with z, and there is one
 * z* at which the bound nearer 0 touches it: L(z*) = 0 when δ > 0, U(z*) = 0 when δ < 0. Then
 * p = 2Φ(−z*), and for every alpha, p < alpha ⇔ 0 ∉ [L, U] at z(1 − alpha/2) (test–interval
 * duality; e.g. Casella & Berger, Statistical Inference, 2nd ed., §9.2, from memory). z* is found by
 * bisection. δ = 0 gives p = 1 (the interval always contains its own estimate).
 */
import { normalCdf, normalQuantile } from './distributions.js';
import { wilsonAtZ } from './proportions.js';
import type { Interval } from './types.js';
import { assertAlpha, assertCount } from './validate.js';

/** Result of `newcombeDifference`. `test` is its own literal, not a `TestName`. */
export interface ProportionDifference {
  /** p₂ − p₁ (candidate rate − baseline rate). */
  estimate: number;
  /** Newcombe hybrid score interval at 1 − alpha. */
  ci: Interval;
  /** Two-sided p-value by inverting the interval; p < alpha exactly when 0 ∉ ci. */
  p: number;
  /** Signed z*: the normal quantile at which the interval's bound reaches 0 (sign of the estimate). */
  statistic: number;
  test: 'newcombe-score';
}

interface Counts {
  x1: number;
  n1: number;
  x2: number;
  n2: number;
}

function checkRate(x: number, xName: string, n: number, nName: string): void {
  assertCount(xName, x);
  assertCount(nName, n);
  if (n === 0) throw new RangeError(`${nName} must be at least 1; got 0`);
  if (x > n) throw new RangeError(`${xName} (${x}) must not exceed ${nName} (${n})`);
}

/** [L, U] of Newcombe's method 10 at normal quantile z. */
function boundsAtZ({ x1, n1, x2, n2 }: Counts, z: number): Interval {
  const p1 = x1 / n1;
  const p2 = x2 / n2;
  const [l1, u1] = wilsonAtZ(x1, n1, z);
  const [l2, u2] = wilsonAtZ(x2, n2, z);
  const delta = p2 - p1;
  return [delta - Math.hypot(p2 - l2, u1 - p1), delta + Math.hypot(u2 - p2, p1 - l1)];
}

/**
 * Newcombe's hybrid score interval (method 10) for x2/n2 − x1/n1 at 1 − alpha. Baseline x1 of n1,
 * candidate x2 of n2. RangeError for negative or non-integer counts, n = 0, or x > n.
 */
export function newcombeInterval(
  x1: number,
  n1: number,
  x2: number,
  n2: number,
  alpha: number,
): Interval {
  assertAlpha(alpha);
  checkRate(x1, 'x1', n1, 'n1');
  checkRate(x2, 'x2', n2, 'n2');
  return boundsAtZ({ x1, n1, x2, n2 }, normalQuantile(1 - alpha / 2));
}

/**
 * Newcombe's interval for candidate − baseline plus the p-value that inverts it (module note):
 * for every alpha, `p < alpha` exactly when the interval at that alpha excludes 0 (up to the
 * bisection's 1e-13 relative precision in z*). Baseline x1 of n1, candidate x2 of n2.
 * RangeError for negative or non-integer counts, n = 0, or x > n.
 */
export function newcombeDifference(
  x1: number,
  n1: number,
  x2: number,
  n2: number,
  alpha: number,
): ProportionDifference {
  const ci = newcombeInterval(x1, n1, x2, n2, alpha);
  const counts = { x1, n1, x2, n2 };
  const estimate = x2 / n2 - x1 / n1;
  if (estimate === 0) return { estimate, ci, p: 1, statistic: 0, test: 'newcombe-score' };
  const zStar = crossingZ(counts, estimate > 0);
  const p = Math.min(1, 2 * normalCdf(-zStar));
  return { estimate, ci, p, statistic: Math.sign(estimate) * zStar, test: 'newcombe-score' };
}

/**
 * The z > 0 at which the lower bound (positive estimate) or the upper bound (negative estimate)
 * reaches 0. At z = 0 the interval is [δ, δ], so the bound is on the estimate's side of 0; as z
 * grows both Wilson intervals widen to [0, 1] and the bound crosses 0 (for δ > 0 the limit of L is
 * δ − hypot(p₂, 1 − p₁) < 0). The bound is monotone in z, so bisection finds the crossing.
 */
function crossingZ(counts: Counts, positive: boolean): number {
  const beyond = (z: number): boolean => {
    const [low, high] = boundsAtZ(counts, z);
    return positive ? low <= 0 : high >= 0;
  };
  let lo = 0;
  let hi = 1;
  while (!beyond(hi)) {
    lo = hi;
    hi *= 2;
    if (hi > 1e12) return hi; // unreachable for finite counts; p is 0 long before
  }
  for (let i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (beyond(mid)) hi = mid;
    else lo = mid;
  }
  return (lo + hi) / 2;
}
