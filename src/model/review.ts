/**
 * The review model: every code and number behind a fitgap review, and the artifact strings it
 * quotes; never a sentence (the report writes those). Its JSON form is the report
 * `fitgap-review/1`. The types come from schema/fitgap-review-1.schema.json, the one source of
 * truth (generated into review.generated.ts); this module adds the few types that never reach
 * JSON (src/validate/review.ts checks that the schema and the code's own lists agree).
 */
import type { Review, SplitName } from './review.generated.js';

export type * from './review.generated.js';

/** A change with its unit in its type: metric units or shortfall units (up = worse). */
export type Delta = Review['validation']['delta'] | NonNullable<Review['bias']['delta']>;

export type NonLever = Review['nonLevers'][number];
export type RunWarning = Review['baseline']['warnings'][number];
export type GateReason = Review['gate']['reasons'][number];
export type Note = Review['notes'][number];
export type NoteCode = Note['code'];
export type LeverEvidence = Review['levers'][number]['evidence'][number];
export type EvidenceKind = LeverEvidence['kind'];
export type ReferenceSource = Review['baseline']['referenceSource'];

/** Summary of paired per-example predictions, computed by the streaming CSV reader. */
export interface PairedPredictions {
  kind: 'proportion' | 'continuous';
  /** Rows present in both files (paired by id). */
  rows: number;
  /** Proportion: baseline correct & candidate wrong. */
  baselineOnly?: number;
  /** Proportion: baseline wrong & candidate correct. */
  candidateOnly?: number;
  /** Continuous: mean and sample variance of (candidate loss − baseline loss). */
  meanDiff?: number;
  varDiff?: number;
  /** The split both prediction files are for. */
  split?: SplitName;
  /** How per-example `loss` aggregates to the split value (continuous). Default `mean`. */
  aggregate?: 'mean' | 'rmse' | 'sum';
  /** The repeat the predictions belong to. Default 0. */
  repeat?: number;
  /** Each file's own rows (all of them, paired or not): count, mean, sample variance. */
  sides?: { baseline: ExampleStats; candidate: ExampleStats };
  /** Ids only partly match: not paired (rows 0); the sides still give the sampling noise. */
  partial?: boolean;
}

/** Count, mean and sample variance of one file's per-example values. */
export interface ExampleStats {
  n: number;
  mean: number;
  variance: number;
}
