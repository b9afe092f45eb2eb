/**
 * Curve evidence for one run: learning curve (power-law projection), regularization sweep (sweet
 * spot) and epoch curve (early stopping). Pure: no I/O, no environment, no clock.
 *
 * Curves arrive validated (x strictly increasing and finite; x > 0 for regularization). Values are
 * in metric units; the analysis runs on errors — value for `minimize`; 1 − value for `maximize`
 * when the best value is 1 (proportions, and continuous metrics whose values are all ≤ 1); −value
 * otherwise (error-scale.ts). Power-law parameters a, b, c and the residual are in those error
 * units; every value reported back (projections, best/final validation, charts) is in metric units.
 */
import type { CurvePoint, Curves, Goal, MetricKind } from '../../model/run.js';
import type { Interval } from '../../stats/types.js';
import { epochVerdict } from './early-stopping.js';
import { errorScale, type ErrorScale } from './error-scale.js';
import { gapTrend } from './gap-trend.js';
import { downsampleKeeping } from './lttb.js';
import { MIN_POWER_LAW_POINTS, fitPowerLaw } from './power-law.js';
import { regularizationMinimum } from './regularization.js';
import { sweepSuggestion } from '../levers/rounding.js';
import type {
  CurvesReport,
  CurveSkipped,
  EpochsEvidence,
  LearningCurveEvidence,
  RegularizationEvidence,
} from '../../model/curves.js';

export type * from '../../model/curves.js';
export { fitLeastSquares } from './levenberg-marquardt.js';
export type { LeastSquaresFit, LeastSquaresProblem } from './levenberg-marquardt.js';
export { generalizationLoss, progressQuotient, trainingProgress } from './early-stopping.js';
export { downsampleKeeping, lttbIndices } from './lttb.js';

/** An epoch curve needs a best and a final point. */
const MIN_EPOCH_POINTS = 2;

/** Charts carry at most this many points (LTTB). */
export const CHART_POINTS = 60;

export interface CurvesContext {
  /** The run's own regularization strength (`hyperparameters.lambda`). */
  lambda?: number;
  kind: MetricKind;
  goal: Goal;
}

export function analyzeCurves(curves: Curves | undefined, context: CurvesContext): CurvesReport {
  const report: CurvesReport = {};
  if (!curves) return report;
  const range = { min: Infinity, max: -Infinity };
  for (const curve of [curves.epochs, curves.training_examples, curves.regularization]) {
    if (curve === undefined) continue;
    for (let i = 0; i < curve.length; i++) {
      const p = curve[i] as CurvePoint;
      range.min = Math.min(range.min, p.validation, p.train ?? Infinity);
      range.max = Math.max(range.max, p.validation, p.train ?? -Infinity);
    }
  }
  const scale = errorScale(context, range);
  if (curves.epochs) report.epochs = analyzeEpochs(curves.epochs, scale);
  if (curves.training_examples)
    report.training_examples = analyzeLearningCurve(curves.training_examples, scale);
  if (curves.regularization)
    report.regularization = analyzeRegularization(curves.regularization, scale, context.lambda);
  return report;
}

/** The points a chart shows: LTTB on the validation errors, keeping `keep`. */
function chart(
  points: readonly CurvePoint[],
  scale: ErrorScale,
  keep: number[],
  columns: Columns = columnsOf(points, scale),
): EpochsEvidence['chart'] {
  const { xs, validation } = columns;
  const picked = downsampleKeeping(xs, validation, Math.min(CHART_POINTS, points.length), keep);
  return picked.map((i) => {
    const p = points[i] as CurvePoint;
    return p.train === undefined
      ? { x: p.x, validation: p.validation }
      : { x: p.x, train: p.train, validation: p.validation };
  });
}

/** A curve as columns: x, validation errors, and train errors (null when a point has none). */
interface Columns {
  xs: Float64Array;
  validation: Float64Array;
  train: Float64Array | null;
}

/** The columns of a curve in one pass over its points. */
function columnsOf(points: readonly CurvePoint[], scale: ErrorScale): Columns {
  const n = points.length;
  const xs = new Float64Array(n);
  const validation = new Float64Array(n);
  let train: Float64Array | null = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const p = points[i] as CurvePoint;
    xs[i] = p.x;
    validation[i] = scale.toError(p.validation);
    if (train === null) continue;
    if (p.train === undefined) train = null;
    else train[i] = scale.toError(p.train);
  }
  return { xs, validation, train };
}

/** Epoch curves may be long (a loss logged per step): columns read once, then one pass each. */
function analyzeEpochs(
  points: readonly CurvePoint[],
  scale: ErrorScale,
): EpochsEvidence | CurveSkipped {
  if (points.length < MIN_EPOCH_POINTS)
    return { skipped: 'too-few-points', points: points.length, needs: MIN_EPOCH_POINTS };
  const columns = columnsOf(points, scale);
  const verdict = epochVerdict(columns.validation, columns.train);
  const best = points[verdict.bestIndex] as CurvePoint;
  const final = points[points.length - 1] as CurvePoint;
  return {
    bestX: best.x,
    bestValidation: best.validation,
    finalX: final.x,
    finalValidation: final.validation,
    gl: verdict.gl,
    pq: verdict.pq,
    stoppedLate: verdict.stoppedLate,
    stoppedEarly: verdict.stoppedEarly,
    stopsAt: Object.fromEntries(
      Object.entries(verdict.stopsAt).map(([k, t]) => [
        k,
        t === null ? null : (points[t] as CurvePoint).x,
      ]),
    ),
    chart: chart(points, scale, [verdict.bestIndex], columns),
  };
}

function analyzeLearningCurve(
  points: readonly CurvePoint[],
  scale: ErrorScale,
): LearningCurveEvidence | CurveSkipped {
  const m = points.map((p) => p.x);
  const e = points.map((p) => scale.toError(p.validation));
  const tooFew = {
    skipped: 'too-few-points',
    points: m.length,
    needs: MIN_POWER_LAW_POINTS,
  } as const;
  if (m.length < MIN_POWER_LAW_POINTS) return tooFew;
  const fit = fitPowerLaw(m, e, { lower: scale.lower, upper: scale.upper });
  if ('skipped' in fit) return { ...tooFew, skipped: 'fit-failed' };
  const gap = gapTrend(
    points.map((p) =>
      p.train === undefined
        ? { x: p.x, validationError: scale.toError(p.validation) }
        : {
            x: p.x,
            trainError: scale.toError(p.train),
            validationError: scale.toError(p.validation),
          },
    ),
  );
  let bestIndex = 0;
  e.forEach((v, i) => {
    if (v < (e[bestIndex] as number)) bestIndex = i;
  });
  return {
    a: fit.a,
    b: fit.b,
    c: fit.c,
    r2: fit.r2,
    residual: fit.residual,
    projections: fit.projections.map((p) => {
      const ends = [scale.fromError(p.ci[0]), scale.fromError(p.ci[1])].sort(
        (u, v) => u - v,
      ) as Interval;
      return { x: p.x, validation: scale.fromError(p.error), ci: ends };
    }),
    gapTrend: gap.trend,
    gapChangePerDoubling: gap.changePerDoubling,
    asymptote: scale.fromError(fit.c),
    chart: chart(points, scale, [bestIndex]),
  };
}

function analyzeRegularization(
  points: readonly CurvePoint[],
  scale: ErrorScale,
  lambda: number | undefined,
): RegularizationEvidence | CurveSkipped {
  const result = regularizationMinimum(
    points.map((p) => p.x),
    points.map((p) => scale.toError(p.validation)),
    lambda,
  );
  if ('skipped' in result) return result;
  return {
    bestX: result.bestX,
    bestValidation: (points[result.bestIndex] as CurvePoint).validation,
    side: result.side,
    // The strength a person would type: the same value the regularization lever suggests.
    suggestedX: sweepSuggestion(
      result.atEdge === null ? result.bestX : result.suggestedX,
      result.atEdge === null ? points.map((p) => p.x) : null,
    ),
    atEdge: result.atEdge,
    refined: result.refined,
    chart: chart(points, scale, [result.bestIndex]),
  };
}
