/** The gate (`fail-on`): which outcomes fail the required status check. Pure. */
import type { Gate, Review } from '../model/review.js';

type Outcome = Pick<Review, 'movement' | 'validation' | 'slices' | 'candidate' | 'settings'>;

const RULES: Record<string, (r: Outcome) => string | null> = {
  'worse-validation': (r) =>
    r.validation.change === 'worse' ? 'validation got significantly worse' : null,
  'toward-overfitting': (r) =>
    r.movement === 'toward-overfitting' ? 'the change moved toward overfitting' : null,
  'toward-underfitting': (r) =>
    r.movement === 'toward-underfitting' ? 'the change moved toward underfitting' : null,
  'worse-on-both': (r) =>
    r.movement === 'worse-on-both' ? 'bias and variance both got worse' : null,
  'any-movement': (r) =>
    r.movement !== 'no-significant-change' ? `the model moved (${r.movement})` : null,
  'slice-regression': (r) => {
    const worse = r.slices.filter((s) => s.change === 'worse');
    return worse.length > 0 ? `${worse.length} slice(s) regressed significantly` : null;
  },
  'high-bias': (r) =>
    r.candidate.diagnosis === 'high-bias' || r.candidate.diagnosis === 'high-bias-and-variance'
      ? 'the candidate has high bias'
      : null,
  'high-variance': (r) =>
    r.candidate.diagnosis === 'high-variance' || r.candidate.diagnosis === 'high-bias-and-variance'
      ? 'the candidate has high variance'
      : null,
  'data-mismatch': (r) =>
    r.candidate.diagnosis === 'data-mismatch' ? 'the candidate shows data mismatch' : null,
  'validation-overfit': (r) =>
    r.candidate.components.overfit.present
      ? 'the candidate overfits the validation set (test error well above validation)'
      : null,
  none: () => null,
};

export function applyGate(review: Outcome): Gate {
  const failOn = review.settings.failOn;
  const reasons: string[] = [];
  for (const policy of failOn) {
    const reason = RULES[policy]?.(review) ?? null;
    if (reason !== null) reasons.push(`${policy}: ${reason}`);
  }
  return { pass: reasons.length === 0, reasons, failOn: [...failOn] };
}
