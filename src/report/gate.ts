/** The gate in words: one line per `fail-on` outcome that fired. */
import type { FailOn, GateReason, Review } from '../model/review.js';
import type { Escape } from './escape.js';
import { count, fixed } from './format.js';
import { MOVEMENT_TITLE, say, type Words } from './words.js';

const OUTCOME_SENTENCE: Words<FailOn> = new Map<FailOn, string>([
  ['worse-validation', 'validation got significantly worse'],
  ['toward-overfitting', 'the change moved toward overfitting'],
  ['toward-underfitting', 'the change moved toward underfitting'],
  ['worse-on-both', 'bias and variance both got worse'],
  ['high-bias', 'the candidate has high bias'],
  ['high-variance', 'the candidate has high variance'],
  ['data-mismatch', 'the candidate shows data mismatch'],
  [
    'validation-overfit',
    'the candidate overfits the validation set (test error well above validation)',
  ],
]);

function reasonSentence(reason: GateReason, review: Review, esc: Escape): string {
  if (reason.outcome === 'any-movement')
    return `the model moved (${say(MOVEMENT_TITLE, review.movement, esc)})`;
  if (reason.outcome === 'slice-regression') {
    const n = reason.slices ?? 0;
    return `${count(n)} ${n === 1 ? 'slice' : 'slices'} regressed significantly`;
  }
  if (reason.outcome === 'guardrail-regression' || reason.outcome === 'guardrail-undetermined') {
    const names = (reason.guardrails ?? []).map((n) => esc(n, 60)).join(', ');
    return reason.outcome === 'guardrail-regression'
      ? `guardrail worse beyond its margin (${names})`
      : `cannot tell whether a guardrail stays within its margin (${names})`;
  }
  if (reason.ratio !== undefined) return `the cost ratio is ×${fixed(reason.ratio, 2)}`;
  return OUTCOME_SENTENCE.get(reason.outcome) ?? 'fired';
}

/** `worse-validation: validation got significantly worse`, one per outcome that fired. */
export function gateReasonLines(review: Review, esc: Escape): string[] {
  return review.gate.reasons.map(
    (reason) => `${esc(reason.outcome, 60)}: ${reasonSentence(reason, review, esc)}`,
  );
}

/** The gate's outcome in one sentence (without the leading "Gate passed/failed"). */
export function gateSentence(review: Review, esc: Escape): string {
  const gate = review.gate;
  if (!gate.pass) return `${gateReasonLines(review, esc).join('; ')}.`;
  if (gate.failOn.length === 0) return 'no fail-on policy is set.';
  return `none of fail-on (${gate.failOn.map((p) => esc(p, 60)).join(', ')}) applies.`;
}
