/**
 * The noise of a split's mean value over k repeats (seeds), and a Welch-style test of two such
 * means. Pure; no artifact types (the caller maps a split onto these inputs).
 *
 * THE RULE (quotable). A repeat's value y_r on the evaluation set varies for two reasons: the seed
 * (initialisation, data order; variance τ² per repeat) and which rows happen to be in the evaluation
 * set (sampling variance σ² of one evaluation, known from the binomial p(1 − p)/N for a proportion
 * on N examples, or s²/N from N per-example values). With s² the sample variance of the k repeat
 * values:
 *
 * - `fixed` rows (every repeat scored the same rows; the default): y_r = μ + S + e_r with one shared
 *   sampling error S. S cancels out of the spread between repeats, so s² estimates τ² alone, and it
 *   does not average out over repeats. By the law of total variance,
 *   Var(ȳ) = E[Var(ȳ | S)] + Var(E[ȳ | S]) = τ²/k + σ², estimated by s²/k + σ².
 * - `per-repeat` rows (each repeat drew its own evaluation rows): y_r = μ + S_r + e_r, so s² already
 *   estimates τ² + σ² ≥ σ²; Var(ȳ) = s²/k, never taken below σ²/k (a spread below the sampling noise
 *   is chance, not precision).
 *
 * Sources: the law of total variance / one-way random-effects variance components (Searle, Casella &
 * McCulloch, Variance Components, Wiley 1992, ch. 3, from memory); Bouthillier et al. (2021),
 * "Accounting for Variance in Machine Learning Benchmarks", MLSys, which measure the data-sampling
 * part as a major source of benchmark variance and show that seed-only repeats on a fixed split
 * leave it out (from memory). Effective degrees of freedom of a sum of variance estimates:
 * Welch–Satterthwaite, ν = (Σ aᵢ)² / Σ (aᵢ²/νᵢ) (Satterthwaite 1946, Biometrics Bulletin 2:110–114;
 * Welch 1947, Biometrika 34:28–35); a model-based binomial σ² has ν = ∞.
 *
 * A zero spread is not zero noise: with s² = 0 (or one repeat) the noise is σ² where σ² is known,
 * and unknown (`known: false`) where it is not — a continuous metric without per-example values —
 * and the caller then cannot call a change. A spread at floating-point round-off
 * (sd ≤ 1e-12 × the largest |value|) counts as zero, so identical runs that differ by 1e-17 do not
 * become "precise".
 *
 * Comparing two runs on the same fixed rows: treating their means as independent (as
 * `compareSplitMeans` does) counts the shared rows' sampling error in both, which is conservative;
 * only a paired test on per-example values can use the shared rows to cancel it.
 */
import { mean, sampleVariance } from './descriptive.js';
import { tCdf, tQuantile } from './distributions.js';
import type { TestResult } from './types.js';
import { assertAlpha, assertFiniteValues, assertProbability } from './validate.js';

/** `fixed`: every repeat scored the same rows; `per-repeat`: each drew its own rows. */
export type EvaluationRows = 'fixed' | 'per-repeat';

/** Sampling variance of ONE repeat's split value, from the evaluation set. */
export interface SamplingVariance {
  /** σ²: variance of one evaluation's value over draws of the evaluation rows (≥ 0). */
  variance: number;
  /** Degrees of freedom of σ²: ∞ for the binomial model, N − 1 from N per-example values. */
  df: number;
  source: 'binomial' | 'per-example';
}

/**
 * A spread at or below this fraction of the largest |value| (or of the operands the values were
 * computed from, `SplitNoiseInput.magnitude`) is floating-point round-off.
 */
export const ROUNDOFF_RELATIVE = 1e-12;

/**
 * σ² = p(1 − p)/N for a rate p measured on N examples (binomial; df ∞). At p = 0 or 1 that is 0,
 * which would make a perfect score look noiseless; there the Agresti–Coull adjusted rate
 * p̃ = (Np + 2)/(N + 4) gives σ² = p̃(1 − p̃)/(N + 4) instead (Agresti & Coull 1998, "Approximate is
 * better than exact for interval estimation of binomial proportions", Am. Stat. 52:119–126, the
 * "add two successes and two failures" rule; from memory). RangeError for p outside [0, 1] or
 * N not a positive integer.
 */
export function binomialSamplingVariance(rate: number, examples: number): SamplingVariance {
  assertProbability('rate', rate);
  if (!Number.isSafeInteger(examples) || examples < 1) {
    throw new RangeError(`examples must be a positive integer; got ${examples}`);
  }
  if (rate > 0 && rate < 1) {
    return { variance: (rate * (1 - rate)) / examples, df: Infinity, source: 'binomial' };
  }
  const adjusted = (examples * rate + 2) / (examples + 4);
  return {
    variance: (adjusted * (1 - adjusted)) / (examples + 4),
    df: Infinity,
    source: 'binomial',
  };
}

/** How the split value is built from the per-example values. */
export type ExampleAggregate = 'mean' | 'rmse' | 'sum';

/**
 * σ² of a split value built from N per-example values with sample mean m and sample variance s²
 * (e.g. a `RunningStats`): `mean` → s²/N; `sum` → N·s²; `rmse` (per-example values are squared
 * errors, the split value is √m) → s²/(4Nm) by the delta method (Var √X ≈ Var X / (4 E X); common
 * practice). df = N − 1. N < 2, or m ≤ 0 for `rmse`, gives σ² = NaN (cannot be known).
 */
export function perExampleSamplingVariance(
  summary: { n: number; mean: number; variance: number },
  aggregate: ExampleAggregate = 'mean',
): SamplingVariance {
  const { n, mean: m, variance: s2 } = summary;
  if (!Number.isSafeInteger(n) || n < 0) {
    throw new RangeError(`per-example count must be a non-negative integer; got ${n}`);
  }
  if (n < 2 || !(s2 >= 0) || !Number.isFinite(s2)) {
    return { variance: NaN, df: Math.max(0, n - 1), source: 'per-example' };
  }
  let variance: number;
  if (aggregate === 'mean') variance = s2 / n;
  else if (aggregate === 'sum') variance = n * s2;
  else variance = m > 0 ? s2 / (4 * n * m) : NaN;
  return { variance, df: n - 1, source: 'per-example' };
}

export interface SplitNoiseInput {
  /** One value per repeat (seed); at least one. */
  values: readonly number[];
  /** σ² of one repeat's value when it can be known; null or absent when not. */
  sampling?: SamplingVariance | null;
  /** @default 'fixed' */
  evaluationRows?: EvaluationRows;
  /**
   * The largest |operand| the values were computed from, when they are sums or differences of
   * larger numbers (validation − train): their round-off is relative to that, not to the values.
   * @default the largest |value|
   */
  magnitude?: number;
}

/** How `splitNoise` formed the variance (codes, for the review model). */
export interface NoiseBasis {
  rows: EvaluationRows;
  /** The seed spread: estimated from ≥ 2 repeats, zero (incl. round-off), or not estimable. */
  seed: 'spread' | 'zero-spread' | 'one-repeat';
  sampling: 'binomial' | 'per-example' | 'unknown';
  /** Per-repeat rows: the spread was below the sampling noise and σ²/k was used instead. */
  floored: boolean;
  /**
   * Components that belong in the variance but could not be estimated, so the real noise may be
   * larger: `seed` (one repeat: τ² unknown), `sampling` (σ² unknown where the spread does not hold
   * it: fixed rows, or a single repeat). Empty when the variance is complete.
   */
  missing: ('seed' | 'sampling')[];
}

export interface SplitNoise {
  mean: number;
  repeats: number;
  /** Variance of `mean`; NaN when not known. */
  variance: number;
  /** Welch–Satterthwaite effective df of `variance` (∞ when it is binomial σ² alone); NaN when not known. */
  df: number;
  /** False when neither the spread nor σ² gives a variance > 0: the caller reports `undetermined`. */
  known: boolean;
  /** Part of `variance` that shrinks as 1/k with more repeats: its per-repeat value, and its df. */
  perRepeat: { variance: number; df: number };
  /** Part that more repeats do not reduce (fixed rows' σ²), and its df; variance 0 when none. */
  fixed: { variance: number; df: number };
  basis: NoiseBasis;
}

/**
 * Variance of a split's mean over its repeats by the rule in this module's header, with its
 * effective degrees of freedom. RangeError for no values or a non-finite value.
 */
export function splitNoise(input: SplitNoiseInput): SplitNoise {
  const { values } = input;
  if (values.length === 0) throw new RangeError('splitNoise needs at least one value');
  assertFiniteValues('values', values);
  const rows = input.evaluationRows ?? 'fixed';
  const k = values.length;
  const m = mean(values);
  const sampling = usable(input.sampling);
  const samplingCode = sampling ? sampling.source : 'unknown';
  const spread = k >= 2 ? spreadVariance(values, input.magnitude ?? 0) : NaN;
  const seed: NoiseBasis['seed'] = k < 2 ? 'one-repeat' : spread === 0 ? 'zero-spread' : 'spread';

  let perRepeat = { variance: 0, df: Infinity };
  let fixed = { variance: 0, df: Infinity };
  let floored = false;
  const missing: NoiseBasis['missing'] = [];
  if (k >= 2) perRepeat = { variance: spread, df: k - 1 };
  else missing.push('seed');
  if (!sampling && (rows === 'fixed' || k < 2)) missing.push('sampling');
  if (rows === 'fixed') {
    if (sampling) fixed = { variance: sampling.variance, df: sampling.df };
  } else {
    if (sampling && !(k >= 2 && spread >= sampling.variance)) {
      floored = k >= 2;
      perRepeat = { variance: sampling.variance, df: sampling.df };
    }
  }
  const parts = [
    { variance: perRepeat.variance / k, df: perRepeat.df },
    { variance: fixed.variance, df: fixed.df },
  ];
  const variance = parts[0]!.variance + parts[1]!.variance;
  const known = variance > 0 && Number.isFinite(variance);
  const basis: NoiseBasis = { rows, seed, sampling: samplingCode, floored, missing };
  return {
    mean: m,
    repeats: k,
    variance: known ? variance : NaN,
    df: known ? satterthwaite(parts) : NaN,
    known,
    perRepeat,
    fixed,
    basis,
  };
}

/** σ² that can be used: finite and > 0 (a zero σ² says nothing about the noise). */
function usable(s: SamplingVariance | null | undefined): SamplingVariance | null {
  if (!s || !(s.variance > 0 && Number.isFinite(s.variance))) return null;
  if (!(s.df > 0)) throw new RangeError(`sampling df must be > 0; got ${s.df}`);
  return s;
}

/** Sample variance, or 0 when the spread is floating-point round-off (see ROUNDOFF_RELATIVE). */
function spreadVariance(values: readonly number[], magnitude: number): number {
  const s2 = sampleVariance(values);
  const scale = Math.max(magnitude, ...values.map(Math.abs));
  return Math.sqrt(s2) <= ROUNDOFF_RELATIVE * scale ? 0 : s2;
}

/**
 * Welch–Satterthwaite effective degrees of freedom of a sum of independent variance estimates
 * aᵢ with dfᵢ: (Σ aᵢ)² / Σ (aᵢ²/dfᵢ). Components with df = ∞ add nothing to the denominator; all
 * ∞ (or all aᵢ = 0 but one with df ∞) gives ∞. Source: Satterthwaite (1946); Welch (1947).
 */
export function satterthwaite(parts: readonly { variance: number; df: number }[]): number {
  let total = 0;
  let denominator = 0;
  for (const { variance, df } of parts) {
    if (!(variance >= 0) || !(df > 0)) {
      throw new RangeError(`each part needs variance >= 0 and df > 0; got ${variance}, ${df}`);
    }
    total += variance;
    if (variance > 0 && Number.isFinite(df)) denominator += (variance * variance) / df;
  }
  if (total === 0) return NaN;
  return denominator === 0 ? Infinity : (total * total) / denominator;
}

/**
 * Welch-style test of candidate.mean − baseline.mean from two `splitNoise` results: variance
 * v_b + v_c, Welch–Satterthwaite df over both (Welch 1947), two-sided p from Student's t (the
 * normal when df is ∞: then `test` is `z-binomial`, else `welch-t`). When either noise is not
 * known: interval and p null, `test` `none` — the caller reports `undetermined`.
 */
export function compareSplitMeans(
  baseline: SplitNoise,
  candidate: SplitNoise,
  alpha: number,
): TestResult {
  assertAlpha(alpha);
  const estimate = candidate.mean - baseline.mean;
  if (!baseline.known || !candidate.known) return { estimate, ci: null, p: null, test: 'none' };
  const variance = baseline.variance + candidate.variance;
  const df = satterthwaite([
    { variance: baseline.variance, df: baseline.df },
    { variance: candidate.variance, df: candidate.df },
  ]);
  const se = Math.sqrt(variance);
  const statistic = estimate / se;
  const half = tQuantile(1 - alpha / 2, df) * se;
  const p = Math.min(1, 2 * tCdf(-Math.abs(statistic), df));
  const test = df === Infinity ? 'z-binomial' : 'welch-t';
  return {
    estimate,
    ci: [estimate - half, estimate + half],
    p,
    test,
    statistic,
    ...(df === Infinity ? {} : { df }),
  };
}
