/**
 * Lever scores: an ordinal rank, higher first. Only the order matters, so each value is placed
 * relative to the others. Three bands:
 * - 85–100: the PR's own change demonstrably moved the model the wrong way; undoing or countering
 *   it is the most specific advice there is.
 * - about 35–72: levers for the candidate's diagnosis, adjusted by curve evidence.
 * - 15–30: levers that only add evidence or that a secondary finding suggests.
 */

/** The validation change is undetermined: more seeds come before any other lever. */
export const REPEAT_FIRST = 110;
/** Reverse an own regularization change that overshot (its effect is measured in this very PR). */
export const REVERSE_OWN_CHANGE = 100;
/** Keep the PR's capacity change and regularize harder, with the sweep pointing the same way. */
export const COUNTER_WITH_SWEEP = 95;
/** Step the PR's capacity change back: specific, but it gives up what the change was for. */
export const STEP_BACK_CAPACITY = 90;
/** Keep the PR's capacity change and regularize harder, without a sweep to say how much. */
export const COUNTER_WITHOUT_SWEEP = 85;

/** The first diagnosis lever of the first target (the larger component). */
export const DIAGNOSIS_BASE = 60;
/** Second target of a high-bias-and-variance diagnosis: below every lever of the first. */
export const SECOND_TARGET_STEP = 20;
/** Within a target, catalogue order breaks ties; small enough that evidence outweighs it. */
export const CATALOGUE_STEP = 2;

/** The learning curve's gap is still closing: more data is likely to help. */
export const GAP_CLOSING_BONUS = 8;
/** The gap is flat at the right end: more data will help little, so it sinks below the others. */
export const GAP_FLAT_PENALTY = 25;
/** The learning curve's projection at 2× data has an interval that includes today's value. */
export const PROJECTION_INCLUDES_TODAY_PENALTY = 25;
/** The regularization sweep has its minimum on this lever's side. */
export const SWEEP_AGREES_BONUS = 10;
/** The sweep's minimum is on the other side: pulling this lever would move away from it. */
export const SWEEP_DISAGREES_PENALTY = 20;
/** The epoch curve confirms the epoch lever (trained past the minimum, or still improving). */
export const EPOCH_CONFIRMED_BONUS = 12;
/** An epoch lever the epoch curve does not confirm (or with no epoch curve). */
export const EPOCH_UNCONFIRMED_PENALTY = 15;
/** Weakening regularization when the candidate names none and has no sweep: nothing to weaken. */
export const NOTHING_TO_WEAKEN_PENALTY = 10;
/** The PR already pulled this lever: judge its effect before pulling it further. */
export const ALREADY_PULLED_PENALTY = 30;

/** An epoch lever the curve supports although the diagnosis did not call for it. */
export const EPOCH_CURVE_ALONE = 35;
/** Align training data when data mismatch is the diagnosis (the largest component). */
export const MISMATCH_DIAGNOSED = 70;
/** Align training data when mismatch is present but another component is larger. */
export const MISMATCH_PRESENT = 30;
/** Test error well above validation error: the validation set may be overused. */
export const VALIDATION_OVERFIT = 40;
/** No reference level: bias is unknown, which a number in the config fixes. */
export const SUPPLY_REFERENCE = 20;
/** Unknown noise: more seeds make changes testable. Last, because it changes no model. */
export const ADD_REPEATS = 15;
