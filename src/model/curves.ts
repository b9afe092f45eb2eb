/**
 * Curve evidence (learning curve, regularization sweep, epoch curve) for one run.
 * Each member is present only where the artifact has that curve. Built by `analyzeCurves`
 * (./index.ts). Values named `validation`/`train` are in metric units; the power-law parameters
 * describe the *error* curve (error = value for minimize, 1 − value for maximized metrics whose
 * best is 1, −value otherwise; see error-scale.ts).
 */
import type { Interval } from '../stats/types.js';

export interface CurveSkipped {
  /** Why the curve was not analysed (too short, fit did not converge, …). */
  skipped: string;
}

export interface EpochsEvidence {
  /** x of the lowest validation value. */
  bestX: number;
  bestValidation: number;
  finalX: number;
  finalValidation: number;
  /** Prechelt's generalization loss at the last point, in percent. */
  /** Null when the best validation error is exactly 0 (GL is relative to it, so undefined). */
  gl: number | null;
  /** Prechelt's progress quotient GL/P_k at the last strip end (k = 5); null without train values. */
  pq: number | null;
  /** The run ends past the validation minimum with GL > 5 (Prechelt's GL_5 would have stopped it). */
  stoppedLate: boolean;
  /**
   * Train and validation both still falling over the last 5 points, the last validation within 1 %
   * of the best (GL ≤ 1) and training progress P_5 ≥ 0.1 per mille. False without train values.
   */
  stoppedEarly: boolean;
  /**
   * x at which each of Prechelt's criteria (GL_1…GL_5, PQ_0.5…PQ_3 with train values, UP_2…UP_8)
   * would have stopped the run; null when it never fired.
   */
  stopsAt?: Record<string, number | null>;
  /** Chart-ready downsampled points (LTTB, ≤ 60, first/last/minimum kept). */
  chart: { x: number; train?: number; validation: number }[];
}

export interface LearningCurveProjection {
  x: number;
  validation: number;
  ci: Interval;
}

/**
 * Power-law fit of validation error against training examples: error(m) = a·m^(−b) + c, by
 * Levenberg–Marquardt. `projections` are at 2× and 4× the largest m (never further), in metric
 * units, each with a 95% delta-method interval for the fitted curve.
 */
export interface LearningCurveEvidence {
  a: number;
  /** Exponent, > 0. */
  b: number;
  /** Asymptotic error (error units). */
  c: number;
  r2: number;
  /** Residual standard deviation of the fit (error units). */
  residual: number;
  projections: LearningCurveProjection[];
  /** Train/validation gap at the right end: still closing (more data helps) or flat. */
  gapTrend: 'closing' | 'flat' | 'unknown';
  /** Relative change of the gap per doubling of m over the last points; null when unknown. */
  gapChangePerDoubling?: number | null;
  /** c back in metric units: the level more data approaches. */
  asymptote?: number;
  chart: { x: number; train?: number; validation: number }[];
}

export interface RegularizationEvidence {
  /** x of the lowest validation error, refined by a parabola in log x when interior. */
  bestX: number;
  /** Lowest observed validation value (metric units). */
  bestValidation: number;
  /** Where the run's own lambda sits relative to bestX. */
  side: 'below' | 'above' | 'at' | 'unknown';
  suggestedX: number;
  /** The minimum lies at an end of the sweep: extend it (suggestedX is one grid step beyond). */
  atEdge: 'low' | 'high' | null;
  /** bestX comes from the parabola through the minimum and its neighbours. */
  refined?: boolean;
  chart: { x: number; train?: number; validation: number }[];
}

export interface CurvesReport {
  epochs?: EpochsEvidence | CurveSkipped;
  training_examples?: LearningCurveEvidence | CurveSkipped;
  regularization?: RegularizationEvidence | CurveSkipped;
}
