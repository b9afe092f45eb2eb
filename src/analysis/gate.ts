/** The gate (`fail-on`): which outcomes fail the required status check. Pure. */
import type { FailOn, Gate, GateReason, Review } from '../model/review.js';
import { COST_OUTCOME_FIELDS, COST_RATIO_OUTCOME } from '../model/settings.js';

type Outcome = Pick<Review, 'movement' | 'validation' | 'slices' | 'candidate'> &
  Partial<Pick<Review, 'guardrails' | 'cost'>>;

function guardrailsWith(r: Outcome, call: 'inferior' | 'undetermined'): string[] {
  return (r.guardrails ?? []).filter((g) => g.nonInferiority === call).map((g) => g.name);
}

/** `FIELD-ratio>X` fires when the cost ratio's estimate exceeds X. */
function costRule(policy: string): ((r: Outcome) => GateReason | null) | undefined {
  const match = COST_RATIO_OUTCOME.exec(policy);
  if (match === null) return undefined;
  const field = COST_OUTCOME_FIELDS.get(match[1] as 'train-seconds');
  const limit = Number(match[2]);
  return (r) => {
    const ratio = field === undefined ? undefined : r.cost?.[field]?.ratio;
    return ratio !== undefined && ratio > limit ? { outcome: policy, ratio } : null;
  };
}

/** Each outcome's test: the reason it fired, or null. `none` never fires. */
const RULES = new Map<FailOn, (r: Outcome) => GateReason | null>([
  ['worse-validation', (r) => fired(r.validation.change === 'worse', 'worse-validation')],
  ['toward-overfitting', (r) => fired(r.movement === 'toward-overfitting', 'toward-overfitting')],
  [
    'toward-underfitting',
    (r) => fired(r.movement === 'toward-underfitting', 'toward-underfitting'),
  ],
  ['worse-on-both', (r) => fired(r.movement === 'worse-on-both', 'worse-on-both')],
  ['any-movement', (r) => fired(r.movement !== 'no-significant-change', 'any-movement')],
  [
    'slice-regression',
    (r) => {
      const slices = r.slices.filter((s) => s.change === 'worse').length;
      return slices > 0 ? { outcome: 'slice-regression', slices } : null;
    },
  ],
  [
    'high-bias',
    (r) =>
      fired(
        r.candidate.diagnosis === 'high-bias' || r.candidate.diagnosis === 'high-bias-and-variance',
        'high-bias',
      ),
  ],
  [
    'high-variance',
    (r) =>
      fired(
        r.candidate.diagnosis === 'high-variance' ||
          r.candidate.diagnosis === 'high-bias-and-variance',
        'high-variance',
      ),
  ],
  ['data-mismatch', (r) => fired(r.candidate.diagnosis === 'data-mismatch', 'data-mismatch')],
  [
    'validation-overfit',
    (r) => fired(r.candidate.components.overfit.present, 'validation-overfit'),
  ],
  [
    'guardrail-regression',
    (r) => {
      const names = guardrailsWith(r, 'inferior');
      return names.length > 0 ? { outcome: 'guardrail-regression', guardrails: names } : null;
    },
  ],
  [
    'guardrail-undetermined',
    (r) => {
      const names = guardrailsWith(r, 'undetermined');
      return names.length > 0 ? { outcome: 'guardrail-undetermined', guardrails: names } : null;
    },
  ],
  ['none', () => null],
]);

function fired(condition: boolean, outcome: FailOn): GateReason | null {
  return condition ? { outcome } : null;
}

/** The gate for `failOn`: the outcomes that fired, in the policy's order; pass when none did. */
export function applyGate(review: Outcome, failOn: readonly FailOn[]): Gate {
  const reasons: GateReason[] = [];
  for (const policy of failOn) {
    const rule = RULES.get(policy) ?? costRule(policy);
    const reason = rule?.(review) ?? null;
    if (reason !== null) reasons.push(reason);
  }
  return { pass: reasons.length === 0, reasons, failOn: [...failOn] };
}
