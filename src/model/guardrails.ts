/**
 * Guardrail metrics and cost in the review model. The types come from the review schema
 * (review.generated.ts); this module names the few the analysis needs.
 */
import type { CostChange, GuardrailReview, Review } from './review.generated.js';

export type {
  CostChange,
  GuardrailChange,
  GuardrailProblem,
  GuardrailReview,
} from './review.generated.js';
export type NonInferiority = NonNullable<GuardrailReview['nonInferiority']>;
export type MarginSource = NonNullable<GuardrailReview['marginSource']>;
export type CostReview = NonNullable<Review['cost']>;
export type CostCall = CostChange['call'];
