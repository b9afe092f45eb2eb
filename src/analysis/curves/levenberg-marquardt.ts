/**
 * Nonlinear least squares by Levenberg–Marquardt, with box bounds, an honest convergence verdict
 * and the parameter covariance s²·(JᵀJ)⁻¹ for intervals.
 *
 * Why our own instead of the `ml-levenberg-marquardt` package (v5.1.0): it has no convergence
 * test — it stops when the RSS falls below an absolute `errorTolerance` or at `maxIterations`, so a
 * stall and a fit look the same — its damping is additive (λI, not scaled to the Jacobian columns)
 * and its finite-difference step is absolute, so results depend on the units of the parameters
 * (with its defaults, NIST Misra1a from start 1 ends with b2 off by a factor of ~4400 after 100
 * iterations), and it returns no covariance.
 *
 * Method (common practice, after Moré (1978) / MINPACK `lmder`; citations from memory):
 * - residuals r = y − f(x; p); step from the damped problem min ‖J δ − r‖² + μ‖D δ‖², solved by QR
 *   of the augmented matrix [J D⁻¹; √μ I]. D holds the largest column norms of J seen so far
 *   (Marquardt's scaling, so the method does not depend on the units of the parameters).
 * - gain ratio ρ = actual / predicted reduction; accept when ρ > 1e-4; μ update after Nielsen
 *   (1999): accepted μ·max(1/3, 1 − (2ρ − 1)³), rejected μ·ν with ν doubling.
 * - bounds: parameters at a bound whose gradient pushes outward are held fixed for the step; the
 *   trial point is clipped into the box and the predicted reduction is taken for the clipped step.
 *
 * Convergence rule (the verdict `converged`; Bates & Watts 1981, Technometrics 23:179–183, from
 * memory, is also the criterion of R's `nls`), decided at the final point, not from why the loop
 * stopped — a loop can stop because steps became tiny on a plateau, which is not a fit:
 * 1. Stationarity: the Bates & Watts (1981) relative offset
 *    (‖Q₁ᵀr‖/√p) / (‖Q₂ᵀr‖/√(n − p)) ≤ 1e-5 over the free parameters (Q₁ spans the columns of J).
 *    It is unit-free and says the remaining distance to the least-squares point is a negligible
 *    fraction of the statistical uncertainty. A zero-residual fit (‖r‖ ≤ 1e-10·‖y‖) also counts.
 * 2. No plateau: moving any free parameter by ±10 % of max(|p_j|, |start_j|) must change the RSS
 *    (by more than 1e-12 relative). If it does not, the model does not depend on that parameter
 *    here (BoxBOD start 1 stalls at b2 ≈ 111 where exp(−b2·x) ≈ 0), and the point is not a fit.
 * 3. The Jacobian of the free parameters has full rank (else the parameters are not identifiable),
 *    and the loop did not run out of iterations.
 */
import { inverseOfRtR, qrLeastSquares } from './qr.js';

export type Model = (params: readonly number[], x: number) => number;
/** Partial derivatives of the model with respect to each parameter at x. */
export type ModelJacobian = (params: readonly number[], x: number) => number[];

export interface LeastSquaresProblem {
  model: Model;
  /** Analytic Jacobian; central finite differences when absent. */
  jacobian?: ModelJacobian;
  x: readonly number[];
  y: readonly number[];
  start: readonly number[];
  /** Box bounds per parameter (±Infinity where absent). */
  bounds?: { lower?: readonly number[]; upper?: readonly number[] };
  /** @default 1000 */
  maxIterations?: number;
  /** Parameter names for messages; `p1`, `p2`, … when absent. */
  names?: readonly string[];
}

export type StopReason =
  'gradient' | 'reduction' | 'step' | 'damping' | 'max-iterations' | 'non-finite';

export interface LeastSquaresFit {
  params: number[];
  rss: number;
  iterations: number;
  /** See the convergence rule in this file's header. */
  converged: boolean;
  /** Why the iteration loop ended. */
  stop: StopReason;
  /** One sentence: why the fit is (not) trusted. */
  reason: string;
  /** Bates–Watts relative offset at the final point; null when undefined (no residual dof). */
  relativeOffset: number | null;
  /** Parameters held at a bound at the end (zero rows and columns in the covariance). */
  atBound: boolean[];
  /** Parameters on which the RSS does not depend at the final point (plateau). */
  flat: boolean[];
  /** n − number of free parameters. */
  dof: number;
  /** sqrt(rss / dof); NaN without dof. */
  residualSd: number;
  /** s²·(JᵀJ)⁻¹ over the free parameters, in parameter order; null when singular or no dof. */
  covariance: number[][] | null;
}

const ACCEPT_RATIO = 1e-4;
const FTOL = 1e-15;
const XTOL = 1e-15;
const GTOL = 1e-15;
const OFFSET_TOLERANCE = 1e-5;
const PLATEAU_PROBE = 0.1;

interface State {
  r: number[];
  rss: number;
}

export function fitLeastSquares(problem: LeastSquaresProblem): LeastSquaresFit {
  const { x, y, start, model } = problem;
  const nParams = start.length;
  const lower = start.map((_, j) => problem.bounds?.lower?.[j] ?? -Infinity);
  const upper = start.map((_, j) => problem.bounds?.upper?.[j] ?? Infinity);
  const clamp = (p: readonly number[]): number[] =>
    p.map((v, j) => Math.min(Math.max(v, lower[j] as number), upper[j] as number));
  const evaluate = (p: readonly number[]): State => {
    const r = y.map((yi, i) => yi - model(p, x[i] as number));
    let rss = 0;
    for (const ri of r) rss += ri * ri;
    return { r, rss };
  };
  const jacobianAt = (p: readonly number[]): number[][] =>
    x.map((xi) =>
      problem.jacobian
        ? problem.jacobian(p, xi)
        : centralDifference(model, p, xi, start, lower, upper),
    );

  let p = clamp(start);
  let state = evaluate(p);
  if (!Number.isFinite(state.rss)) {
    return verdict(problem, p, state, 0, 'non-finite', lower, upper, evaluate, jacobianAt);
  }
  const maxIterations = problem.maxIterations ?? 1000;
  let mu = 1e-3;
  let nu = 2;
  const d = new Array<number>(nParams).fill(0);
  let stop: StopReason = 'max-iterations';
  let iteration = 0;
  outer: for (; iteration < maxIterations; iteration++) {
    const jac = jacobianAt(p);
    const { gradient, norms } = gradientAndNorms(jac, state.r);
    const free = freeParameters(p, gradient, lower, upper);
    if (free.length === 0 || state.rss === 0) {
      stop = 'gradient';
      break;
    }
    let cosine = 0;
    for (const j of free) {
      d[j] = Math.max(d[j] as number, norms[j] as number);
      if ((norms[j] as number) > 0)
        cosine = Math.max(
          cosine,
          Math.abs(gradient[j] as number) / ((norms[j] as number) * Math.sqrt(state.rss)),
        );
    }
    if (cosine <= GTOL) {
      stop = 'gradient';
      break;
    }
    for (;;) {
      const delta = dampedStep(jac, state.r, free, d, mu);
      const trial = clamp(p.map((v, j) => v + (delta[j] ?? 0)));
      const step = trial.map((v, j) => v - (p[j] as number));
      const predicted = predictedReduction(jac, state.r, step, state.rss);
      const trialState = evaluate(trial);
      const actual = state.rss - trialState.rss;
      const rho = predicted > 0 && Number.isFinite(trialState.rss) ? actual / predicted : -1;
      const stepNorm = scaledNorm(step, d);
      const tinyStep = stepNorm <= XTOL * (scaledNorm(p, d) + XTOL);
      if (rho > ACCEPT_RATIO) {
        const before = state.rss;
        p = trial;
        state = trialState;
        mu *= Math.max(1 / 3, 1 - (2 * rho - 1) ** 3);
        nu = 2;
        if (actual <= FTOL * before && predicted <= FTOL * before) {
          stop = 'reduction';
          iteration++;
          break outer;
        }
        if (tinyStep) {
          stop = 'step';
          iteration++;
          break outer;
        }
        break;
      }
      mu *= nu;
      nu *= 2;
      if (tinyStep) {
        stop = 'step';
        break outer;
      }
      if (!(mu < 1e100)) {
        stop = 'damping';
        break outer;
      }
    }
  }
  return verdict(problem, p, state, iteration, stop, lower, upper, evaluate, jacobianAt);
}

function centralDifference(
  model: Model,
  p: readonly number[],
  xi: number,
  start: readonly number[],
  lower: readonly number[],
  upper: readonly number[],
): number[] {
  return p.map((pj, j) => {
    const scale = pj !== 0 ? Math.abs(pj) : start[j] !== 0 ? Math.abs(start[j] as number) : 1;
    const h = 6.0554544523933395e-6 * scale; // cbrt(machine epsilon)
    const up = Math.min(pj + h, upper[j] as number);
    const down = Math.max(pj - h, lower[j] as number);
    const pu = p.slice();
    pu[j] = up;
    const pd = p.slice();
    pd[j] = down;
    return (model(pu, xi) - model(pd, xi)) / (up - down);
  });
}

function gradientAndNorms(
  jac: readonly (readonly number[])[],
  r: readonly number[],
): { gradient: number[]; norms: number[] } {
  const nParams = jac[0]?.length ?? 0;
  const gradient = new Array<number>(nParams).fill(0);
  const norms = new Array<number>(nParams).fill(0);
  jac.forEach((row, i) => {
    for (let j = 0; j < nParams; j++) {
      gradient[j] = (gradient[j] as number) + (row[j] as number) * (r[i] as number);
      norms[j] = Math.hypot(norms[j] as number, row[j] as number);
    }
  });
  return { gradient, norms };
}

/** Parameters not pinned at a bound by a gradient that pushes outward (+gradient lowers the RSS). */
function freeParameters(
  p: readonly number[],
  gradient: readonly number[],
  lower: readonly number[],
  upper: readonly number[],
): number[] {
  const free: number[] = [];
  p.forEach((v, j) => {
    const g = gradient[j] as number;
    const pinned = (v <= (lower[j] as number) && g < 0) || (v >= (upper[j] as number) && g > 0);
    if (!pinned) free.push(j);
  });
  return free;
}

function dampedStep(
  jac: readonly (readonly number[])[],
  r: readonly number[],
  free: readonly number[],
  d: readonly number[],
  mu: number,
): number[] {
  const scale = free.map((j) => ((d[j] as number) > 0 ? (d[j] as number) : 1));
  const rows: number[][] = jac.map((row) =>
    free.map((j, k) => (row[j] as number) / (scale[k] as number)),
  );
  const sq = Math.sqrt(mu);
  free.forEach((_, k) => rows.push(free.map((__, c) => (c === k ? sq : 0))));
  const rhs = [...r, ...free.map(() => 0)];
  const z = qrLeastSquares(rows, rhs).x;
  const delta = new Array<number>(d.length).fill(0);
  if (z) free.forEach((j, k) => (delta[j] = (z[k] as number) / (scale[k] as number)));
  return delta;
}

function predictedReduction(
  jac: readonly (readonly number[])[],
  r: readonly number[],
  step: readonly number[],
  rss: number,
): number {
  let linear = 0;
  jac.forEach((row, i) => {
    let jd = 0;
    step.forEach((s, j) => (jd += (row[j] as number) * s));
    const ri = (r[i] as number) - jd;
    linear += ri * ri;
  });
  return rss - linear;
}

function scaledNorm(v: readonly number[], d: readonly number[]): number {
  let s = 0;
  v.forEach((vi, j) => (s = Math.hypot(s, vi * ((d[j] as number) > 0 ? (d[j] as number) : 1))));
  return s;
}

function verdict(
  problem: LeastSquaresProblem,
  p: number[],
  state: State,
  iterations: number,
  stop: StopReason,
  lower: readonly number[],
  upper: readonly number[],
  evaluate: (p: readonly number[]) => State,
  jacobianAt: (p: readonly number[]) => number[][],
): LeastSquaresFit {
  const n = problem.y.length;
  const nParams = p.length;
  const base = { params: p, rss: state.rss, iterations, stop };
  if (!Number.isFinite(state.rss)) {
    return {
      ...base,
      converged: false,
      reason: 'the model is not finite at the starting values',
      relativeOffset: null,
      atBound: p.map(() => false),
      flat: p.map(() => false),
      dof: n - nParams,
      residualSd: NaN,
      covariance: null,
    };
  }
  const jac = jacobianAt(p);
  const { gradient, norms } = gradientAndNorms(jac, state.r);
  const free = freeParameters(p, gradient, lower, upper);
  const atBound = p.map((_, j) => !free.includes(j));
  const dof = n - free.length;
  const residualSd = dof > 0 ? Math.sqrt(state.rss / dof) : NaN;

  const flat = p.map((pj, j) => {
    if (!free.includes(j)) return false;
    if (norms[j] === 0) return true;
    const h = PLATEAU_PROBE * Math.max(Math.abs(pj), Math.abs(problem.start[j] as number));
    if (h === 0) return false;
    const probe = (v: number): number => {
      const q = p.slice();
      q[j] = Math.min(Math.max(v, lower[j] as number), upper[j] as number);
      return evaluate(q).rss;
    };
    const change = Math.max(
      Math.abs(probe(pj + h) - state.rss),
      Math.abs(probe(pj - h) - state.rss),
    );
    return !(change > 1e-12 * state.rss);
  });

  const scaled = jac.map((row) =>
    free.map((j) => ((norms[j] as number) > 0 ? (row[j] as number) / (norms[j] as number) : 0)),
  );
  const qr = free.length > 0 && n >= free.length ? qrLeastSquares(scaled, state.r) : null;
  let relativeOffset: number | null = null;
  if (qr && dof > 0) {
    const q1 = Math.hypot(...qr.qtb.slice(0, free.length));
    const q2 = Math.hypot(...qr.qtb.slice(free.length));
    if (q2 > 0) relativeOffset = q1 / Math.sqrt(free.length) / (q2 / Math.sqrt(dof));
  }
  const yNorm = Math.hypot(...problem.y);
  const zeroResidual = Math.sqrt(state.rss) <= 1e-10 * yNorm;
  const inverse = qr ? inverseOfRtR(qr.r) : null;
  let covariance: number[][] | null = null;
  if (inverse && dof > 0) {
    const s2 = state.rss / dof;
    covariance = p.map(() => new Array<number>(nParams).fill(0));
    free.forEach((j, a) =>
      free.forEach((k, b) => {
        (covariance as number[][])[j]![k] =
          (s2 * (inverse[a]![b] as number)) / ((norms[j] as number) * (norms[k] as number));
      }),
    );
  }

  let reason: string;
  let converged = false;
  const flatAt = flat.flatMap((f, j) =>
    f ? [`${problem.names?.[j] ?? `p${j + 1}`} = ${(p[j] as number).toPrecision(4)}`] : [],
  );
  if (stop === 'max-iterations') reason = `no convergence within ${iterations} iterations`;
  else if (flatAt.length > 0)
    reason = `stalled on a plateau: the residual sum of squares does not change with ${flatAt.join(', ')}`;
  else if (qr && !inverse) reason = 'the parameters are not identifiable here (singular Jacobian)';
  else if (zeroResidual) {
    converged = true;
    reason = 'zero-residual fit';
  } else if (relativeOffset !== null && relativeOffset <= OFFSET_TOLERANCE) {
    converged = true;
    reason = `stationary (relative offset ${relativeOffset.toExponential(1)})`;
  } else if (relativeOffset === null)
    reason = 'no residual degrees of freedom to judge convergence';
  else
    reason = `stopped without reaching a stationary point (relative offset ${relativeOffset.toExponential(1)} > ${OFFSET_TOLERANCE})`;
  return { ...base, converged, reason, relativeOffset, atBound, flat, dof, residualSd, covariance };
}
