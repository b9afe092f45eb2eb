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
  'none',
] as const;

export type FailOn = (typeof FAIL_ON_VALUES)[number];

export function isFailOn(value: string): value is FailOn {
  return (FAIL_ON_VALUES as readonly string[]).includes(value);
}

export const DEFAULT_SETTINGS: ReviewSettings = {
  alpha: 0.05,
  minEffect: 0,
  gapTolerance: 0.1,
  failOn: ['worse-validation'],
};
