/**
 * Distribution functions, thin over jStat. No special function is written here: every CDF and
 * quantile is a jStat call. Where a jStat entry point is inaccurate, a different jStat entry point
 * (the regularized incomplete beta) is used through a textbook identity, and the reason is noted.
 * The jStat functions called are copied verbatim into vendor/jstat-subset.js (loading all of jStat
 * took 6–10 ms of every review's start-up); the tests check them against the jstat package.
 */
import jStat from './vendor/jstat-subset.js';
import { assertProbability } from './validate.js';

/**
 * Above this many degrees of freedom Student's t is replaced by the standard normal. jStat's
 * quantile loses accuracy beyond about 3e7 df (1.5e-3 off at 1e8), and the incomplete beta loses
 * digits in its log-gamma terms; the normal's own error here is below 2e-8 absolute (bound from
 * φ(x)(x³ + x)/(4ν), the first term of the expansion of the t CDF in 1/ν).
 */
const NORMAL_DF = 1e7;

/** jStat.binomial.cdf is accurate to its 1e-10 rounding; below this value its relative error grows. */
const BINOMIAL_TAIL = 1e-4;

function assertDf(df: number): void {
  if (!(df > 0)) throw new RangeError(`degrees of freedom must be > 0; got ${df}`);
}

function assertOpenProbability(p: number): void {
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be in (0, 1) for a quantile; got ${p}`);
}

function ibeta(x: number, a: number, b: number): number {
  const value = jStat.ibeta(x, a, b);
  if (value === false) throw new RangeError(`incomplete beta argument must be in [0, 1]; got ${x}`);
  return Math.min(1, Math.max(0, value));
}

/**
 * Standard normal CDF Φ(x) (jStat, via erf). Accurate to about 1e-16 absolute, so tails below
 * ~1e-15 are not resolved relatively and may come back as 0.
 */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) throw new RangeError('normalCdf: x must be a number; got NaN');
  if (x === Infinity) return 1;
  if (x === -Infinity) return 0;
  return Math.min(1, Math.max(0, jStat.normal.cdf(x, 0, 1)));
}

/**
 * Quantiles already computed, by p (and df): a review asks for the same few (0.975 for every 95 %
 * interval) hundreds of times, and jStat's inverses cost tens of microseconds each before the JIT
 * has compiled them (145 calls of Φ⁻¹(0.975): 6 ms of a 0.1 s review). Pure functions: the cache
 * changes no value. Cleared when it holds CACHE_SIZE entries.
 */
const quantiles = new Map<string, number>();
const CACHE_SIZE = 256;

function cached(key: string, compute: () => number): number {
  const hit = quantiles.get(key);
  if (hit !== undefined) return hit;
  const value = compute();
  if (quantiles.size >= CACHE_SIZE) quantiles.clear();
  quantiles.set(key, value);
  return value;
}

/** Standard normal quantile Φ⁻¹(p), p in (0, 1) (jStat, via erfc⁻¹). */
export function normalQuantile(p: number): number {
  assertOpenProbability(p);
  return cached(`n ${p}`, () => jStat.normal.inv(p, 0, 1) + 0);
}

/**
 * Student's t CDF P(T <= x) with `df` > 0 (fractional df allowed, as Welch produces).
 *
 * Computed as ½·I_{ν/(ν+x²)}(ν/2, ½) for the lower tail (Abramowitz & Stegun 26.7.1 in the form used
 * by most libraries) with jStat's incomplete beta. jStat's own `studentt.cdf` is not used: for large
 * df it evaluates the incomplete beta at its centre, where jStat's 100-step continued fraction has
 * not converged (it returns 0.483 for P(T <= 0 | 1e6) and −1.49 at 1e8). For df > 1e7 the standard
 * normal is used (see NORMAL_DF). Accuracy about 3e-7 relative, also deep in the tails: jStat's
 * continued fraction stops at a relative step of 3e-7 (the Numerical Recipes setting).
 */
export function tCdf(x: number, df: number): number {
  if (Number.isNaN(x)) throw new RangeError('tCdf: x must be a number; got NaN');
  assertDf(df);
  if (x === Infinity) return 1;
  if (x === -Infinity) return 0;
  if (df > NORMAL_DF) return normalCdf(x);
  const lowerTail = 0.5 * ibeta(df / (df + x * x), df / 2, 0.5);
  return x < 0 ? lowerTail : 1 - lowerTail;
}

/**
 * Student's t quantile for p in (0, 1), df > 0 (jStat `studentt.inv`, about 1e-7 relative; the
 * standard normal for df > 1e7, see NORMAL_DF).
 */
export function tQuantile(p: number, df: number): number {
  assertOpenProbability(p);
  assertDf(df);
  if (df > NORMAL_DF) return normalQuantile(p);
  return cached(`t ${p} ${df}`, () => jStat.studentt.inv(p, df) + 0);
}

/**
 * Binomial CDF P(X <= k), X ~ Binomial(n, p); k is floored, k < 0 gives 0 and k >= n gives 1.
 *
 * jStat's `binomial.cdf` is accurate but rounds its result to 1e-10 absolute, which would turn an
 * exact McNemar p of 1e-15 into 0. Below 1e-4 the identity P(X <= k) = I_{1−p}(n − k, k + 1) is used
 * with jStat's incomplete beta, which is accurate in the tails (its continued fraction only fails to
 * converge near the centre of large distributions, where `binomial.cdf` is used). Relative accuracy
 * about 1e-6 or better up to n = 1e8 (checked against SciPy on a grid).
 */
export function binomialCdf(k: number, n: number, p: number): number {
  if (Number.isNaN(k)) throw new RangeError('binomialCdf: k must be a number; got NaN');
  if (!Number.isSafeInteger(n) || n < 0) {
    throw new RangeError(`binomialCdf: n must be a non-negative integer; got ${n}`);
  }
  assertProbability('binomialCdf: p', p);
  const kk = Math.floor(k);
  if (kk < 0) return 0;
  if (kk >= n) return 1;
  if (p === 0) return 1;
  if (p === 1) return 0;
  const rounded = jStat.binomial.cdf(kk, n, p);
  if (rounded >= BINOMIAL_TAIL) return Math.min(1, rounded);
  return ibeta(1 - p, n - kk, kk + 1);
}
