/**
 * Power of a two-sided t test from the noncentral t distribution, for any df ≥ 1 (fractional, as
 * Welch–Satterthwaite gives) and any noncentrality.
 *
 * With T' = (Z + λ)/S, S = sqrt(V/ν), V ~ χ²(ν) independent of Z ~ N(0, 1), and c = t(1 − α/2; ν):
 *
 *   power(λ) = P(T' > c) + P(T' < −c) = E[Φ(λ − cS)] + E[Φ(−λ − cS)],
 *
 * the expectation over S taken by the composite midpoint rule on a range that holds all but a
 * negligible part of S's density f_S(s) = 2νs·f_χ²(νs²; ν). This is the definition of the noncentral
 * t (e.g. Johnson, Kotz & Balakrishnan, Continuous Univariate Distributions vol. 2, ch. 31, from
 * memory), integrated directly. jStat's `noncentralt.cdf` is not used: its Poisson series stops after
 * 200 terms and returns nonsense once λ²/2 passes about 150 (λ > 17), which two repeats at α = 0.01
 * need (λ ≈ 80 at ν = 1). Accuracy against SciPy's `nct` is checked in test/stats/power.test.ts.
 */
import jStat from './vendor/jstat-subset.js';
import { illinois } from './bracket-root.js';
import { normalCdf, normalQuantile, tQuantile } from './distributions.js';

/** Above this df the t is the normal (as in distributions.ts). */
const NORMAL_DF = 1e7;
const NODES = 1000;

interface Quadrature {
  s: Float64Array;
  w: Float64Array;
}

const cache = new Map<number, Quadrature>();

/**
 * Midpoint nodes and weights for E[g(S)], S = sqrt(χ²(ν)/ν). When the range starts at 0 (small ν,
 * where f_S(s) ∝ s^(ν−1) near 0 has an unbounded derivative for ν < 2) the nodes are graded,
 * s = lo + (hi − lo)·x², which makes the integrand in x smooth enough for the midpoint rule.
 */
function quadrature(df: number): Quadrature {
  const hit = cache.get(df);
  if (hit) return hit;
  const spread = 1 / Math.sqrt(2 * df);
  const lo = Math.max(0, 1 - 10 * spread);
  const hi = Math.sqrt((df + 12 * Math.sqrt(2 * df) + 60) / df);
  const graded = lo === 0;
  const s = new Float64Array(NODES);
  const w = new Float64Array(NODES);
  const logConst = Math.log(2 * df) - (df / 2) * Math.log(2) - jStat.gammaln(df / 2);
  let total = 0;
  for (let i = 0; i < NODES; i++) {
    const x = (i + 0.5) / NODES;
    const si = graded ? lo + (hi - lo) * x * x : lo + (hi - lo) * x;
    const dsdx = graded ? 2 * (hi - lo) * x : hi - lo;
    const v = df * si * si;
    // log f_S(s) = log(2νs) + (ν/2 − 1)·log(νs²) − νs²/2 − (ν/2)·log 2 − lnΓ(ν/2)
    const logDensity = logConst + Math.log(si) + (df / 2 - 1) * Math.log(v) - v / 2;
    s[i] = si;
    w[i] = (Math.exp(logDensity) * dsdx) / NODES;
    total += w[i] as number;
  }
  // Normalise away the (tiny) mass outside the range and the rule's own error in the total.
  for (let i = 0; i < NODES; i++) w[i] = (w[i] as number) / total;
  if (cache.size > 64) cache.clear();
  cache.set(df, { s, w });
  return { s, w };
}

/**
 * Two-sided power of a t test with df degrees of freedom (≥ 1; ∞ or > 1e7 for the z test) at level
 * alpha when the true standardized effect is λ (noncentrality, effect / standard error).
 */
export function tTestPower(ncp: number, df: number, alpha: number): number {
  if (!Number.isFinite(ncp)) throw new RangeError(`noncentrality must be finite; got ${ncp}`);
  if (!(df >= 1)) throw new RangeError(`degrees of freedom must be >= 1; got ${df}`);
  const lambda = Math.abs(ncp);
  if (df > NORMAL_DF) {
    const z = normalQuantile(1 - alpha / 2);
    return normalCdf(lambda - z) + normalCdf(-lambda - z);
  }
  const c = tQuantile(1 - alpha / 2, df);
  const { s, w } = quadrature(df);
  let power = 0;
  for (let i = 0; i < NODES; i++) {
    const cs = c * (s[i] as number);
    power += (w[i] as number) * (normalCdf(lambda - cs) + normalCdf(-lambda - cs));
  }
  return Math.min(1, Math.max(0, power));
}

/**
 * The noncentrality λ > 0 at which `tTestPower` reaches `power` (power rises with λ). The smallest
 * detectable effect is then λ × the standard error. Bracketed from the Student-quantile
 * approximation t(1 − α/2; ν) + t(power; ν), then solved by the Illinois variant of regula falsi
 * (`bracket-root.ts`) to 1e-10 relative.
 */
export function noncentralityFor(power: number, df: number, alpha: number): number {
  if (!(power > alpha / 2 && power < 1)) {
    throw new RangeError(`power must be in (alpha/2, 1); got ${power}`);
  }
  const f = (lambda: number): number => tTestPower(lambda, df, alpha) - power;
  const guess =
    df > NORMAL_DF
      ? normalQuantile(1 - alpha / 2) + normalQuantile(power)
      : tQuantile(1 - alpha / 2, df) + tQuantile(power, df);
  let a = Math.max(0, guess * 0.9);
  let fa = f(a);
  while (fa > 0 && a > 0) {
    a = a > 1e-3 ? a / 2 : 0;
    fa = f(a);
  }
  if (fa > 0) return 0; // power already reached at λ = 0 (only when power ≤ alpha)
  let b = Math.max(guess * 1.1, a + 1e-3);
  let fb = f(b);
  while (fb < 0) {
    a = b;
    fa = fb;
    b *= 2;
    if (b > 1e8) throw new RangeError('power cannot be reached');
    fb = f(b);
  }
  if (fa === 0) return a;
  const root = illinois(f, a, fa, b, fb, 1e-10, 100);
  return (root.lo + root.hi) / 2;
}
