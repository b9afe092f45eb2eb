/**
 * Builds the review model from two validated runs. Pure: no I/O, no environment, no clock.
 * (Stub: being implemented in the core issue.)
 */
import type { RunArtifact } from '../artifact/types.js';
import type { Review, ReviewSettings } from './types.js';

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
}

export interface ReviewInput {
  baseline: RunArtifact;
  candidate: RunArtifact;
  settings: ReviewSettings & { reference?: number };
  paired?: PairedPredictions;
}

export function buildReview(_input: ReviewInput): Review {
  throw new Error('buildReview: not implemented yet');
}
