/**
 * Curve evidence (learning curve, regularization sweep, epoch curve) for one run, as it appears in
 * the review. Each member is present only where the artifact has that curve. Built by
 * `analyzeCurves` (src/analysis/curves/index.ts). Values named `validation`/`train` are in metric
 * units; the power-law parameters describe the *error* curve (error = value for minimize,
 * 1 − value for maximized metrics whose best is 1, −value otherwise; see error-scale.ts).
 * The types come from the review schema (review.generated.ts).
 */
export type {
  ChartPoint,
  CurveSkipped,
  CurvesReport,
  EpochsEvidence,
  LearningCurveEvidence,
  LearningCurveProjection,
  RegularizationEvidence,
} from './review.generated.js';
