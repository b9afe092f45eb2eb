/**
 * Learning-curve fit: validation error as a power law in training examples,
 * e(m) = a·m^(−b) + c (Cortes et al. 1994; Hestness et al. 2017 — forms in VALUES.md §7),
 * by nonlinear least squares with `fitLeastSquares`.
 *
 * - Internally m is scaled by its largest value M: e = A·(m/M)^(−b) + c with A = a·M^(−b), which
 *   keeps the Jacobian well conditioned for m in the millions; `a` is reported unscaled.
 * - Bounds: b ≥ 1e-9 (b > 0), c within the caller's error range (see error-scale.ts); a is free
 *   (a < 0 describes a curve that rises with more data, which is then projected as such).
 * - Starting values: for each of three trial asymptotes c0 (the lower bound when finite, halfway
 *   to the smallest error, just below it), a straight line through log(e − c0) against log m gives
 *   −b and log A. The converged fit with the lowest RSS wins.
 * - Projections at 2× and 4× the largest m (never further), with a confidence interval for the
 *   fitted curve by the delta method: Var ê(m) = gᵀ Σ g with Σ = s²(JᵀJ)⁻¹ from the fit and
 *   g = ∂e/∂(A, b, c), times Student's t with the fit's residual degrees of freedom. It is an
 *   interval for the expected error, not for one future noisy measurement (common practice).
 * - When the asymptote c ends at a bound of the error range (most often c = 0), the fitter holds
 *   it fixed and its covariance has no row for c; an interval from that covariance treats c = 0 as
 *   known, and in simulation (true asymptote at or just above 0) it covered the truth only 77–86%
 *   of the time at nominal 95% when c sat at the bound. Instead Σ is then taken over all three
 *   parameters, s²(JᵀJ)⁻¹ from the full Jacobian at the fitted point with s² = RSS/(n − 3) and t
 *   with n − 3 df: the covariance of the unconstrained estimate, as SciPy's curve_fit reports with
 *   bounds. It is a conservative basis: in the linearised model the bounded fit is the projection
 *   of the unconstrained one onto a convex set that holds the truth, so it is never farther from
 *   the truth in the metric of JᵀJ (projection onto a convex set is non-expansive; common
 *   practice). Measured in the same simulation: 99% coverage when c sits at the bound, 96% over
 *   all curves (test/analysis/curves/power-law.test.ts).
 */
import type { Interval } from '../../stats/types.js';
import { tQuantile } from '../../stats/distributions.js';
import { fitLeastSquares, type LeastSquaresFit } from './levenberg-marquardt.js';
import { inverseOfRtR, qrLeastSquares } from './qr.js';

export interface PowerLawOptions {
  /** Range of the error (and so of c); intervals are clipped to it. */
  lower: number;
  upper: number;
  /** Multiples of the largest m to project at; each must be in (1, 4]. @default [2, 4] */
  multiples?: readonly number[];
  /** Confidence level of the intervals. @default 0.95 */
  level?: number;
}

export interface PowerLawFit {
  a: number;
  b: number;
  c: number;
  r2: number;
  /** Residual standard deviation, sqrt(RSS / dof). */
  residual: number;
  rss: number;
  dof: number;
  /** Parameters held at a bound (b at 0+, c at the edge of the error range). */
  atBound: { b: boolean; c: boolean };
  /**
   * Covariance behind the projection intervals: `free` (the fitter's, over the parameters not at a
   * bound) or `full` (all three, used when c is at its bound; df n − 3). See the module note.
   */
  intervalCovariance: 'free' | 'full';
  projections: { x: number; error: number; ci: Interval }[];
}

export const MIN_POWER_LAW_POINTS = 4;
const MAX_MULTIPLE = 4;

export function fitPowerLaw(
  m: readonly number[],
  e: readonly number[],
  options: PowerLawOptions,
): PowerLawFit | { skipped: string } {
  if (m.length < MIN_POWER_LAW_POINTS) {
    return { skipped: `needs at least ${MIN_POWER_LAW_POINTS} points, has ${m.length}` };
  }
  const multiples = options.multiples ?? [2, 4];
  const bad = multiples.find((k) => !(k > 1 && k <= MAX_MULTIPLE));
  if (bad !== undefined)
    throw new RangeError(`projection multiple must be in (1, ${MAX_MULTIPLE}]; got ${bad}`);
  const big = Math.max(...m);
  const u = m.map((mi) => mi / big);
  const model = (p: readonly number[], ui: number): number =>
    (p[0] as number) * ui ** -(p[1] as number) + (p[2] as number);
  const jacobian = (p: readonly number[], ui: number): number[] => {
    const pow = ui ** -(p[1] as number);
    return [pow, -(p[0] as number) * pow * Math.log(ui), 1];
  };
  const bounds = {
    lower: [-Infinity, 1e-9, options.lower],
    upper: [Infinity, Infinity, options.upper],
  };

  let best: LeastSquaresFit | null = null;
  let lastFailure = '';
  for (const start of startingValues(u, e, options.lower)) {
    const fit = fitLeastSquares({
      model,
      jacobian,
      x: u,
      y: e,
      start,
      bounds,
      names: ['a', 'b', 'c'],
    });
    if (!fit.converged) lastFailure = fit.reason;
    else if (!best || fit.rss < best.rss) best = fit;
  }
  if (!best) return { skipped: `the power-law fit did not converge (${lastFailure})` };
  const [bigA, b, c] = best.params as [number, number, number];
  const meanE = e.reduce((s, v) => s + v, 0) / e.length;
  const tss = e.reduce((s, v) => s + (v - meanE) ** 2, 0);
  const level = options.level ?? 0.95;
  const cAtBound = best.atBound[2] === true && best.atBound[1] !== true;
  const full = cAtBound
    ? fullCovariance(
        u.map((ui) => jacobian([bigA, b, c], ui)),
        best.rss,
      )
    : null;
  const cov = full ? full.covariance : best.covariance;
  const dof = full ? full.dof : best.dof;
  const t = dof > 0 ? tQuantile(1 - (1 - level) / 2, dof) : NaN;
  const projections = multiples.map((k) => {
    const error = model([bigA, b, c], k);
    const g = jacobian([bigA, b, c], k);
    let variance = NaN;
    if (cov) {
      variance = 0;
      for (let i = 0; i < 3; i++)
        for (let j = 0; j < 3; j++)
          variance += (g[i] as number) * (cov[i]?.[j] as number) * (g[j] as number);
    }
    const half = t * Math.sqrt(Math.max(variance, 0));
    const ci: Interval = [
      Math.max(options.lower, error - half),
      Math.min(options.upper, error + half),
    ];
    return { x: k * big, error, ci };
  });
  return {
    a: bigA * big ** b,
    b,
    c,
    r2: tss > 0 ? 1 - best.rss / tss : NaN,
    residual: best.residualSd,
    rss: best.rss,
    dof: best.dof,
    atBound: { b: best.atBound[1] === true, c: best.atBound[2] === true },
    intervalCovariance: full ? 'full' : 'free',
    projections,
  };
}

/**
 * s²·(JᵀJ)⁻¹ over every column of `jac` (n rows × p columns) with s² = rss/(n − p), through QR of
 * the column-scaled Jacobian (as the fitter does, so the units of the parameters do not matter).
 * Null when n ≤ p or JᵀJ is singular.
 */
function fullCovariance(
  jac: readonly (readonly number[])[],
  rss: number,
): { covariance: number[][]; dof: number } | null {
  const n = jac.length;
  const p = jac[0]?.length ?? 0;
  const dof = n - p;
  if (dof <= 0) return null;
  const norms = Array.from({ length: p }, (_, j) => Math.hypot(...jac.map((row) => row[j] ?? 0)));
  if (norms.some((v) => !(v > 0) || !Number.isFinite(v))) return null;
  const scaled = jac.map((row) => row.map((v, j) => v / (norms[j] as number)));
  const inverse = inverseOfRtR(qrLeastSquares(scaled, new Array<number>(n).fill(0)).r);
  if (!inverse) return null;
  const s2 = rss / dof;
  const covariance = inverse.map((row, j) =>
    row.map((v, k) => (s2 * v) / ((norms[j] as number) * (norms[k] as number))),
  );
  return { covariance, dof };
}

/** Starting (A, b, c) triples from a log-log line at three trial asymptotes. */
function startingValues(u: readonly number[], e: readonly number[], lower: number): number[][] {
  const minE = Math.min(...e);
  const range = Math.max(...e) - minE || Math.abs(minE) || 1;
  const trial = Number.isFinite(lower)
    ? [lower, (lower + minE) / 2, minE - 0.05 * range]
    : [minE - range, minE - 0.1 * range, minE - 0.01 * range];
  return trial.map((raw) => {
    const c0 = Number.isFinite(lower) ? Math.max(raw, lower) : raw;
    const pts = u.flatMap((ui, i) =>
      (e[i] as number) - c0 > 0 ? [[Math.log(ui), Math.log((e[i] as number) - c0)] as const] : [],
    );
    let slope = NaN;
    let intercept = NaN;
    if (pts.length >= 2) {
      const mx = pts.reduce((s, p) => s + p[0], 0) / pts.length;
      const my = pts.reduce((s, p) => s + p[1], 0) / pts.length;
      const sxx = pts.reduce((s, p) => s + (p[0] - mx) ** 2, 0);
      const sxy = pts.reduce((s, p) => s + (p[0] - mx) * (p[1] - my), 0);
      slope = sxx > 0 ? sxy / sxx : NaN;
      intercept = my - slope * mx;
    }
    const b0 = slope < 0 ? -slope : 0.5;
    const a0 = Number.isFinite(intercept) && slope < 0 ? Math.exp(intercept) : Math.max(...e) - c0;
    return [a0, b0, c0];
  });
}
