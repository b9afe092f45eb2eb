/**
 * Power: the smallest change a design can detect (minimum detectable effect, MDE) and the size a
 * design needs to detect a given change, at a two-sided level alpha and a power (default 0.8).
 * Each function names its method; each is checked against statsmodels in test/stats/power.test.ts.
 *
 * MEANS OF REPEATS (Welch-style) and PAIRED t. The power of the t test whose standard error is SE
 * and degrees of freedom ν (Welch–Satterthwaite for two means, n − 1 paired) against a true
 * difference δ is the noncentral-t probability of |T'| > t(1 − α/2; ν) with noncentrality δ/SE
 * (`tTestPower`); MDE = λ*·SE where λ* gives the requested power. This is the construction of
 * statsmodels' TTestIndPower / TTestPower (exact for equal variances; for unequal ones it is the
 * usual Welch approximation through ν) and the noncentral-t form behind Cohen's (1988, ch. 2)
 * tables; as ν → ∞ it becomes the normal-approximation formula n = (z(1 − α/2) + z(power))²·
 * (σ₁² + σ₂²)/δ² (Chow, Shao & Wang, Sample Size Calculations in Clinical Research, 2nd ed. 2008,
 * §3.2; from memory), which is what binomial noise alone (ν = ∞) gets. The plain normal formula is
 * not used at small ν: with 3 repeats per run it promises an MDE 26% smaller than the t test can
 * deliver, and 50% smaller with 2.
 */
import { illinois } from './bracket-root.js';
import { normalCdf, normalQuantile } from './distributions.js';
import { noncentralityFor, tTestPower } from './noncentral-t.js';
import { satterthwaite, type SplitNoise } from './split-noise.js';
import { assertAlpha, assertFinite, assertProbability } from './validate.js';

/** More repeats than this are not suggested (`beyond-limit`). */
export const MAX_REPEATS = 1000;

function assertPower(power: number, alpha: number): void {
  if (!(power > alpha / 2 && power < 1)) {
    throw new RangeError(`power must be in (alpha/2, 1), e.g. 0.8; got ${power}`);
  }
}

/** Noise of one arm as `splitNoise` describes it; only the fields used here. */
export type ArmNoise = Pick<
  SplitNoise,
  'known' | 'variance' | 'df' | 'perRepeat' | 'fixed' | 'basis'
>;

/**
 * Smallest |candidate − baseline| this design (the repeats it has) detects with the given power:
 * λ*·sqrt(v_b + v_c), λ* from the noncentral t with the Welch–Satterthwaite ν (module note). Null
 * when either arm's noise is not known. When an arm's noise misses a component
 * (`basis.missing` not empty) the true MDE is larger than this: report it as "at least".
 */
export function mdeMeans(
  baseline: ArmNoise,
  candidate: ArmNoise,
  alpha: number,
  power = 0.8,
): number | null {
  assertAlpha(alpha);
  assertPower(power, alpha);
  if (!baseline.known || !candidate.known) return null;
  const df = satterthwaite([
    { variance: baseline.variance, df: baseline.df },
    { variance: candidate.variance, df: candidate.df },
  ]);
  return noncentralityFor(power, df, alpha) * Math.sqrt(baseline.variance + candidate.variance);
}

/** Why no number of repeats can be given. */
export type NoRepeatsReason =
  /** The observed change is 0: nothing to detect. */
  | 'no-change'
  /** The noise of a run is not known at all: measure it first (≥ 2 repeats give a spread). */
  | 'noise-unknown'
  /** The part that repeats do not reduce (a fixed evaluation set's sampling noise) alone hides the change: more rows are needed, not more seeds. */
  | 'fixed-noise'
  /** More than MAX_REPEATS would be needed. */
  | 'beyond-limit';

export type RepeatsNeeded =
  | {
      repeats: number;
      /**
       * True when a run's noise misses a component (`basis.missing`: one repeat, so no seed spread;
       * or fixed rows without σ²). The answer then assumes that component is 0, so at least this
       * many repeats are needed.
       */
      lowerBound: boolean;
    }
  | { repeats: null; reason: NoRepeatsReason };

/**
 * Smallest number of repeats k ≥ 2, the same for both runs, at which the t test detects the
 * observed change `delta` with the given power (module note). At k repeats an arm's variance is
 * perRepeat/k + fixed; the seed part then has k − 1 df when it was estimated from a spread (its own
 * df when it is the sampling floor), the fixed part keeps its df. `fixed-noise` holds even when a
 * component is missing (a missing component only adds noise). Null with a reason (see
 * `NoRepeatsReason`).
 */
export function repeatsNeeded(
  delta: number,
  baseline: ArmNoise,
  candidate: ArmNoise,
  alpha: number,
  power = 0.8,
): RepeatsNeeded {
  assertAlpha(alpha);
  assertPower(power, alpha);
  assertFinite('delta', delta);
  if (delta === 0) return { repeats: null, reason: 'no-change' };
  const arms = [baseline, candidate];
  if (arms.some((a) => !a.known)) return { repeats: null, reason: 'noise-unknown' };
  const lowerBound = arms.some((a) => a.basis.missing.length > 0);
  const target = Math.abs(delta);
  const fixedOnly = arms.reduce((s, a) => s + a.fixed.variance, 0);
  if (fixedOnly > 0) {
    const dfFixed = satterthwaite(arms.map((a) => a.fixed).filter((f) => f.variance > 0));
    if (tTestPower(target / Math.sqrt(fixedOnly), dfFixed, alpha) < power) {
      return { repeats: null, reason: 'fixed-noise' };
    }
  }
  const reaches = (k: number): boolean => {
    const parts = arms.flatMap((a) => {
      const seedDf = a.basis.seed === 'spread' && !a.basis.floored ? k - 1 : a.perRepeat.df;
      return [
        { variance: a.perRepeat.variance / k, df: seedDf },
        { variance: a.fixed.variance, df: a.fixed.df },
      ];
    });
    const variance = parts.reduce((s, p) => s + p.variance, 0);
    return tTestPower(target / Math.sqrt(variance), satterthwaite(parts), alpha) >= power;
  };
  // Power rises with k (less variance, more df), so the first k that reaches it is found by
  // doubling and then bisection.
  if (reaches(2)) return { repeats: 2, lowerBound };
  let lo = 2;
  let hi = 4;
  while (!reaches(hi)) {
    if (hi >= MAX_REPEATS) return { repeats: null, reason: 'beyond-limit' };
    lo = hi;
    hi = Math.min(MAX_REPEATS, hi * 2);
  }
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (reaches(mid)) hi = mid;
    else lo = mid;
  }
  return { repeats: hi, lowerBound };
}

// ---------------------------------------------------------------------------------------------
// Two independent proportions: Fleiss, Levin & Paik (2003), Statistical Methods for Rates and
// Proportions, 3rd ed., §4.2, without continuity correction (from memory): the pooled rate under the
// null, the separate rates under the alternative. It is the normal approximation for the pooled
// two-proportion z test; statsmodels' power_proportions_2indep computes the same.
// ---------------------------------------------------------------------------------------------

function twoProportionPower(p1: number, p2: number, n1: number, n2: number, alpha: number): number {
  const pooled = (n1 * p1 + n2 * p2) / (n1 + n2);
  const sdNull = Math.sqrt(pooled * (1 - pooled) * (1 / n1 + 1 / n2));
  const sdAlt = Math.sqrt((p1 * (1 - p1)) / n1 + (p2 * (1 - p2)) / n2);
  if (sdAlt === 0) return p1 === p2 ? alpha : 1;
  const z = normalQuantile(1 - alpha / 2);
  const d = Math.abs(p2 - p1);
  // Both tails of the two-sided test (the far one is negligible at useful power).
  return normalCdf((d - z * sdNull) / sdAlt) + normalCdf((-d - z * sdNull) / sdAlt);
}

/**
 * Power of the two-sided pooled z test of rates p1 (n1 rows) and p2 (n2 rows) at level alpha
 * (Fleiss, Levin & Paik 2003, §4.2, from memory; both tails).
 */
export function powerTwoProportions(
  p1: number,
  p2: number,
  n1: number,
  n2: number,
  alpha: number,
): number {
  assertAlpha(alpha);
  assertProbability('p1', p1);
  assertProbability('p2', p2);
  assertRows('n1', n1);
  assertRows('n2', n2);
  return twoProportionPower(p1, p2, n1, n2, alpha);
}

/**
 * Rows per run needed to detect rates p1 → p2 (baseline n, candidate ratio·n):
 * n = [z(1 − α/2)·sqrt((1 + 1/r)·p̄q̄) + z(power)·sqrt(p1q1 + p2q2/r)]² / δ², p̄ = (p1 + r·p2)/(1 + r)
 * (Fleiss, Levin & Paik 2003, §4.2, without continuity correction, from memory; one tail, as
 * statsmodels' samplesize_proportions_2indep_onetail). Rounded up. Null when p1 = p2.
 */
export function rowsNeededTwoProportions(
  p1: number,
  p2: number,
  alpha: number,
  power = 0.8,
  ratio = 1,
): number | null {
  assertAlpha(alpha);
  assertPower(power, alpha);
  assertProbability('p1', p1);
  assertProbability('p2', p2);
  if (!(ratio > 0) || !Number.isFinite(ratio)) {
    throw new RangeError(`ratio must be a positive number; got ${ratio}`);
  }
  if (p1 === p2) return null;
  const pooled = (p1 + ratio * p2) / (1 + ratio);
  const sdNull = Math.sqrt(pooled * (1 - pooled) * (1 + 1 / ratio));
  const sdAlt = Math.sqrt(p1 * (1 - p1) + (p2 * (1 - p2)) / ratio);
  const n =
    ((normalQuantile(1 - alpha / 2) * sdNull + normalQuantile(power) * sdAlt) / (p2 - p1)) ** 2;
  return Math.ceil(n - 1e-9);
}

/**
 * Smallest increase and smallest decrease of the rate from p1 that n1 baseline and n2 candidate
 * rows detect with the given power (pooled z test, `powerTwoProportions`), as positive numbers;
 * null in a direction where even a rate of 1 (or 0) would not reach the power.
 */
export function mdeTwoProportions(
  p1: number,
  n1: number,
  n2: number,
  alpha: number,
  power = 0.8,
): { increase: number | null; decrease: number | null } {
  assertAlpha(alpha);
  assertPower(power, alpha);
  assertProbability('p1', p1);
  assertRows('n1', n1);
  assertRows('n2', n2);
  const solve = (end: 0 | 1): number | null => {
    // f(t) = power at the rate p1 + t·(end − p1), minus the target.
    const f = (t: number): number =>
      twoProportionPower(p1, p1 + t * (end - p1), n1, n2, alpha) - power;
    if (end === p1 || f(1) < 0) return null;
    // First crossing of the target on a grid (power is not guaranteed monotone near the ends),
    // then a bracketing root search inside that cell.
    const steps = 256;
    let prev = 0;
    let fPrev = f(0);
    for (let i = 1; i <= steps; i++) {
      const t = i / steps;
      const ft = f(t);
      // Inside the cell the root is narrowed to 1e-13 relative (the reported rates carry far fewer
      // digits) by regula falsi, which needs about 6–10 evaluations of the power where bisection
      // to the same width needed about 45, each two normal CDFs (issue 14, start-up). The end
      // kept is the one where the power reaches the target.
      if (ft >= 0) return illinois(f, prev, fPrev, t, ft, 1e-13, 200).hi * Math.abs(end - p1);
      prev = t;
      fPrev = ft;
    }
    return null;
  };
  return { increase: solve(1), decrease: solve(0) };
}

function assertRows(name: string, n: number): void {
  if (!(n > 0) || !Number.isFinite(n)) throw new RangeError(`${name} must be > 0; got ${n}`);
}

// ---------------------------------------------------------------------------------------------
// Paired designs (the same rows scored by both runs).
// ---------------------------------------------------------------------------------------------

/**
 * Rows needed for McNemar's test to detect discordant rates p10 (baseline right, candidate wrong)
 * and p01 (the reverse): with ψ = p10 + p01 and δ = p01 − p10,
 * n = [z(1 − α/2)·√ψ + z(power)·√(ψ − δ²)]² / δ² (Connor 1987, "Sample size for testing
 * differences in proportions for the paired-sample design", Biometrics 43:207–211; from memory).
 * Rounded up. Null when p10 = p01.
 */
export function rowsNeededMcNemar(
  p10: number,
  p01: number,
  alpha: number,
  power = 0.8,
): number | null {
  assertAlpha(alpha);
  assertPower(power, alpha);
  assertProbability('p10', p10);
  assertProbability('p01', p01);
  if (p10 + p01 > 1) throw new RangeError(`p10 + p01 must not exceed 1; got ${p10 + p01}`);
  if (p10 === p01) return null;
  const psi = p10 + p01;
  const delta = p01 - p10;
  const n =
    (normalQuantile(1 - alpha / 2) * Math.sqrt(psi) +
      normalQuantile(power) * Math.sqrt(psi - delta * delta)) **
      2 /
    (delta * delta);
  return Math.ceil(n - 1e-9);
}

/**
 * Smallest |p01 − p10| (the change in the proportion correct) that McNemar's test detects on n
 * paired rows with discordant proportion ψ, by Connor's (1987) formula solved for δ (bisection on
 * δ in (0, ψ]). Null when ψ = 0 (no discordant rows: no information) or when even δ = ψ (every
 * discordant row in one direction) is not enough.
 */
export function mdeMcNemar(
  discordant: number,
  n: number,
  alpha: number,
  power = 0.8,
): number | null {
  assertAlpha(alpha);
  assertPower(power, alpha);
  assertProbability('discordant', discordant);
  assertRows('n', n);
  if (discordant === 0) return null;
  const za = normalQuantile(1 - alpha / 2);
  const zb = normalQuantile(power);
  // Connor's n as a function of δ falls as δ grows; find where it equals the n we have.
  const needs = (d: number): number =>
    (za * Math.sqrt(discordant) + zb * Math.sqrt(Math.max(0, discordant - d * d))) ** 2 / (d * d);
  if (needs(discordant) > n) return null;
  let lo = 0;
  let hi = discordant;
  for (let i = 0; i < 100; i++) {
    const mid = (lo + hi) / 2;
    if (needs(mid) <= n) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * Paired t on n per-example differences with standard deviation sd: MDE = λ*·sd/√n, λ* from the
 * noncentral t with n − 1 df (module note; statsmodels' TTestPower). Null when sd is 0 or n < 2.
 */
export function mdePaired(sd: number, n: number, alpha: number, power = 0.8): number | null {
  assertAlpha(alpha);
  assertPower(power, alpha);
  if (!(sd >= 0) || !Number.isFinite(sd)) throw new RangeError(`sd must be >= 0; got ${sd}`);
  if (!(n >= 2) || sd === 0) return null;
  return (noncentralityFor(power, n - 1, alpha) * sd) / Math.sqrt(n);
}

/**
 * Smallest n ≥ 2 paired rows at which the paired t test detects `delta` with the given power
 * (noncentral t, n − 1 df); null when delta is 0 or sd is 0.
 */
export function pairsNeeded(delta: number, sd: number, alpha: number, power = 0.8): number | null {
  assertAlpha(alpha);
  assertPower(power, alpha);
  assertFinite('delta', delta);
  if (!(sd >= 0) || !Number.isFinite(sd)) throw new RangeError(`sd must be >= 0; got ${sd}`);
  if (delta === 0 || sd === 0) return null;
  const effect = Math.abs(delta) / sd;
  const reaches = (n: number): boolean => tTestPower(effect * Math.sqrt(n), n - 1, alpha) >= power;
  if (reaches(2)) return 2;
  // The normal formula is a lower bound; step up from it, then back while a smaller n still works.
  const z = normalQuantile(1 - alpha / 2) + normalQuantile(power);
  let n = Math.max(3, Math.ceil((z / effect) ** 2));
  while (!reaches(n)) n++;
  while (n > 2 && reaches(n - 1)) n--;
  return n;
}
