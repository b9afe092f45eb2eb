/**
 * Gate policy names (`fail-on`) and settings defaults. Pure.
 */
import type { ReviewSettings } from './review.js';

/** Outcomes that `fail-on` can name. */
export const FAIL_ON_VALUES = [
  'worse-validation',
  'toward-overfitting',
  'toward-underfitting',
  'worse-on-both',
  'any-movement',
  'slice-regression',
  'high-bias',
  'high-variance',
  'data-mismatch',
  'validation-overfit',
  'guardrail-regression',
  'guardrail-undetermined',
  'none',
] as const;

/** Cost fields as `fail-on` names them (`train-seconds-ratio>2`), mapped to the run format's keys. */
export const COST_OUTCOME_FIELDS = new Map([
  ['train-seconds', 'trainSeconds'],
  ['inference-ms', 'inferenceMs'],
  ['parameters', 'parameters'],
  ['memory-mb', 'memoryMb'],
] as const);

/** `FIELD-ratio>X`: fails when candidate / baseline of that cost exceeds X. */
export const COST_RATIO_OUTCOME =
  /^(train-seconds|inference-ms|parameters|memory-mb)-ratio>((?:0|[1-9][0-9]*)(?:\.[0-9]+)?)$/;

export type FailOn = (typeof FAIL_ON_VALUES)[number] | `${string}-ratio>${string}`;

export function isFailOn(value: string): value is FailOn {
  return (FAIL_ON_VALUES as readonly string[]).includes(value) || COST_RATIO_OUTCOME.test(value);
}

export const DEFAULT_SETTINGS: ReviewSettings = {
  alpha: 0.05,
  minEffect: 0,
  gapTolerance: 0.1,
  failOn: ['worse-validation'],
};
