/** The headline: how the change moved the model in the bias/variance plane (DESIGN.md §5). Pure. */
import type { Call, Movement, ValidationChange } from '../model/review.js';

type KnownCall = Exclude<Call, 'undetermined'>;

const TABLE: Record<KnownCall, Record<KnownCall, Movement>> = {
  down: { down: 'better-on-both', flat: 'away-from-underfitting', up: 'toward-overfitting' },
  flat: { down: 'away-from-overfitting', flat: 'no-significant-change', up: 'toward-overfitting' },
  up: { down: 'toward-underfitting', flat: 'toward-underfitting', up: 'worse-on-both' },
};

/**
 * Movement from the calls on Δbias (rows) and Δvariance (columns), both in shortfall units;
 * `undetermined` when either call is (a movement is never read off an axis whose noise is unknown).
 */
export function movementOf(biasCall: Call, varianceCall: Call): Movement {
  if (biasCall === 'undetermined' || varianceCall === 'undetermined') return 'undetermined';
  return TABLE[biasCall][varianceCall];
}

/** Validation change from the call on Δvalidation in shortfall units (up = worse). */
export function validationChangeOf(shortfallCall: Call): ValidationChange {
  if (shortfallCall === 'undetermined') return 'undetermined';
  return shortfallCall === 'up' ? 'worse' : shortfallCall === 'down' ? 'better' : 'flat';
}
