/**
 * Curve evidence (learning curve, regularization sweep, epoch curve) for one run.
 * Each member is present only where the artifact has that curve.
 */
import type { Interval } from '../../stats/types.js';

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
  gl: number;
  /** Prechelt's progress quotient GL/P_k at the last strip end (k = 5); null without train values. */
  pq: number | null;
  stoppedLate: boolean;
  stoppedEarly: boolean;
  /** Chart-ready downsampled points (LTTB, ≤ 60, first/last/minimum kept). */
  chart: { x: number; train?: number; validation: number }[];
}

export interface LearningCurveProjection {
  x: number;
  validation: number;
  ci: Interval;
}

export interface LearningCurveEvidence {
  a: number;
  b: number;
  c: number;
  r2: number;
  /** Residual standard deviation of the fit. */
  residual: number;
  projections: LearningCurveProjection[];
  /** Train/validation gap at the right end: still closing (more data helps) or flat. */
  gapTrend: 'closing' | 'flat' | 'unknown';
  chart: { x: number; train?: number; validation: number }[];
}

export interface RegularizationEvidence {
  bestX: number;
  bestValidation: number;
  /** Where the run's own lambda sits relative to bestX. */
  side: 'below' | 'above' | 'at' | 'unknown';
  suggestedX: number;
  /** The minimum lies at an end of the sweep: extend it. */
  atEdge: 'low' | 'high' | null;
  chart: { x: number; train?: number; validation: number }[];
}

export interface CurvesReport {
  epochs?: EpochsEvidence | CurveSkipped;
  training_examples?: LearningCurveEvidence | CurveSkipped;
  regularization?: RegularizationEvidence | CurveSkipped;
}
