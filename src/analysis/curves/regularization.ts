/**
 * Regularization sweep: where validation error is lowest, and where the run's own λ sits.
 *
 * - The lowest observed validation error (first one on ties) picks a grid point. When it has a
 *   neighbour on each side, the minimum is refined by the parabola in log x through it and its two
 *   neighbours (unequal spacing allowed); the vertex always lies between the neighbours because
 *   the middle value is the lowest of the three (common practice: successive parabolic
 *   interpolation, as in Brent's method).
 * - A minimum at either end of the sweep is not refined: `atEdge` says which end, and the
 *   suggestion is one grid step further out (the ratio of the last two x values), i.e. "extend the
 *   sweep", not an invented optimum.
 * - `side`: the run's λ against bestX, `at` when |ln λ − ln bestX| is within a quarter of the local
 *   grid step in ln x (finer than the sweep can resolve).
 * Needs x > 0 (log axis) and at least 3 points.
 */
import type { CurveSkipped } from '../../model/curves.js';

export const MIN_REGULARIZATION_POINTS = 3;

export interface RegularizationResult {
  bestIndex: number;
  bestX: number;
  /** Parabola vertex used (interior minimum with distinct neighbours). */
  refined: boolean;
  side: 'below' | 'above' | 'at' | 'unknown';
  suggestedX: number;
  atEdge: 'low' | 'high' | null;
}

export function regularizationMinimum(
  x: readonly number[],
  validationError: readonly number[],
  lambda: number | undefined,
): RegularizationResult | CurveSkipped {
  const n = x.length;
  if (n < MIN_REGULARIZATION_POINTS) {
    return { skipped: 'too-few-points', points: n, needs: MIN_REGULARIZATION_POINTS };
  }
  let i = 0;
  validationError.forEach((v, j) => {
    if (v < (validationError[i] as number)) i = j;
  });
  const lx = x.map(Math.log);
  let atEdge: 'low' | 'high' | null = null;
  let logBest = lx[i] as number;
  let refined = false;
  let suggestedX: number;
  let step: number;
  if (i === 0) {
    atEdge = 'low';
    step = (lx[1] as number) - (lx[0] as number);
    suggestedX = Math.exp((lx[0] as number) - step);
  } else if (i === n - 1) {
    atEdge = 'high';
    step = (lx[n - 1] as number) - (lx[n - 2] as number);
    suggestedX = Math.exp((lx[n - 1] as number) + step);
  } else {
    const [x0, x1, x2] = [lx[i - 1], lx[i], lx[i + 1]] as [number, number, number];
    const [y0, y1, y2] = [validationError[i - 1], validationError[i], validationError[i + 1]] as [
      number,
      number,
      number,
    ];
    step = (x2 - x0) / 2;
    // Vertex of the parabola through three points (unequal spacing).
    const num = (x1 - x0) ** 2 * (y1 - y2) - (x1 - x2) ** 2 * (y1 - y0);
    const den = (x1 - x0) * (y1 - y2) - (x1 - x2) * (y1 - y0);
    if (den !== 0) {
      logBest = x1 - num / (2 * den);
      refined = true;
    }
    suggestedX = Math.exp(logBest);
  }
  const bestX = refined ? Math.exp(logBest) : (x[i] as number);
  let side: RegularizationResult['side'] = 'unknown';
  if (lambda !== undefined && lambda > 0 && Number.isFinite(lambda)) {
    const distance = Math.log(lambda) - Math.log(bestX);
    side = Math.abs(distance) <= Math.abs(step) / 4 ? 'at' : distance < 0 ? 'below' : 'above';
  }
  return { bestIndex: i, bestX, refined, side, suggestedX, atEdge };
}
