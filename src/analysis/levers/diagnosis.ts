/**
 * Levers for the candidate's diagnosis (high variance, high bias, or both, larger first), each
 * sharpened by the candidate's curves: the learning curve for more data, the regularization sweep
 * for either regularization lever, the epoch curve for the epoch levers. Pure.
 */
import type {
  Diagnosis,
  LeverEvidence,
  LeverId,
  RegularizationEvidence,
  RunSummary,
  Suggestion,
} from '../../model/review.js';
import { BY_TARGET } from './catalogue.js';
import {
  epochMinimum,
  sweepEvidence,
  sweepSuggestion,
  sweepWants,
  type CurveEvidence,
  type Drafts,
  type LeverContext,
} from './context.js';
import { PULLS, comparedValues } from './own-change.js';
import * as SCORE from './scores.js';

type Target = 'variance' | 'bias';

/** The components the diagnosis calls for, larger first. */
export function targets(diagnosis: Diagnosis, run: RunSummary): Target[] {
  const b = run.components.bias.value ?? 0;
  const v = run.components.variance.value ?? 0;
  switch (diagnosis) {
    case 'high-variance':
      return ['variance'];
    case 'high-bias':
      return ['bias'];
    case 'high-bias-and-variance':
      return b >= v ? ['bias', 'variance'] : ['variance', 'bias'];
    default:
      return [];
  }
}

interface Draft {
  score: number;
  evidence: LeverEvidence[];
  suggestion?: Suggestion;
}

export function diagnosisLevers(ctx: LeverContext, curves: CurveEvidence, drafts: Drafts): void {
  const pulled = new Map<LeverId, LeverEvidence>();
  for (const c of ctx.changes) {
    const id = c.effect === null ? null : PULLS[c.effect];
    const v = comparedValues(c);
    if (id === null || v === null || v.from === null || v.to === null || pulled.has(id)) continue;
    if (c.direction !== 'raised' && c.direction !== 'lowered') continue;
    const { hyperparameter, direction } = c;
    pulled.set(id, { kind: 'already-pulled', hyperparameter, from: v.from, to: v.to, direction });
  }
  targets(ctx.candidate.diagnosis, ctx.candidate).forEach((target, t) => {
    const component = ctx.candidate.components[target];
    const base: LeverEvidence[] =
      component.value === null
        ? []
        : [
            {
              kind: 'diagnosis',
              component: target,
              value: component.value,
              errorLevel: ctx.candidate.errorLevel,
            },
          ];
    BY_TARGET[target].forEach((id, i) => {
      const draft: Draft = {
        score: SCORE.DIAGNOSIS_BASE - t * SCORE.SECOND_TARGET_STEP - i * SCORE.CATALOGUE_STEP,
        evidence: [...base],
      };
      sharpen(id, draft, ctx, curves);
      const p = pulled.get(id);
      if (p !== undefined) {
        draft.score -= SCORE.ALREADY_PULLED_PENALTY;
        draft.evidence.push(p);
      }
      drafts.add(id, draft.score, draft.evidence, draft.suggestion);
    });
  });
}

/** Adjusts a diagnosis lever's score and evidence by what the curves say about it. */
function sharpen(id: LeverId, draft: Draft, ctx: LeverContext, curves: CurveEvidence): void {
  if (id === 'more-data' && curves.learning !== null) {
    const lc = curves.learning;
    const twice = lc.projections[0];
    if (twice !== undefined) {
      const current = ctx.candidate.splits.find((s) => s.split === 'validation')?.mean ?? 0;
      const includesToday = twice.ci[0] <= current && current <= twice.ci[1];
      if (includesToday) draft.score -= SCORE.PROJECTION_INCLUDES_TODAY_PENALTY;
      draft.evidence.push({
        kind: 'learning-curve',
        fromX: Math.max(...lc.chart.map((p) => p.x)),
        atX: twice.x,
        current,
        projected: twice.validation,
        ci: twice.ci,
        r2: lc.r2,
        includesToday,
      });
    }
    if (lc.gapTrend === 'flat') {
      draft.score -= SCORE.GAP_FLAT_PENALTY;
      draft.evidence.push({ kind: 'gap-trend', trend: 'flat' });
    } else if (lc.gapTrend === 'closing') {
      draft.score += SCORE.GAP_CLOSING_BONUS;
      draft.evidence.push({ kind: 'gap-trend', trend: 'closing' });
    }
  }
  if (
    (id === 'stronger-regularization' || id === 'weaker-regularization') &&
    curves.sweep !== null
  ) {
    sharpenBySweep(id, draft, ctx, curves.sweep);
  }
  const epochs = curves.epochs;
  if (id === 'early-stopping') {
    if (epochs !== null && epochs.stoppedLate) {
      draft.score += SCORE.EPOCH_CONFIRMED_BONUS;
      draft.evidence.push(epochMinimum(epochs, ctx.goal));
    } else {
      draft.score -= SCORE.EPOCH_UNCONFIRMED_PENALTY;
      draft.evidence.push({ kind: 'epoch-curve-silent', curve: epochs !== null });
    }
  }
  if (id === 'train-longer') {
    if (epochs !== null && epochs.stoppedEarly) {
      draft.score += SCORE.EPOCH_CONFIRMED_BONUS;
      draft.evidence.push({ kind: 'still-improving', epoch: epochs.finalX });
    } else {
      draft.score -= SCORE.EPOCH_UNCONFIRMED_PENALTY;
      draft.evidence.push({ kind: 'epoch-curve-silent', curve: epochs !== null });
    }
  }
  if (id === 'weaker-regularization' && ctx.regularization === undefined && curves.sweep === null) {
    draft.score -= SCORE.NOTHING_TO_WEAKEN_PENALTY;
  }
}

/** A sweep whose minimum lies on this lever's side raises it and sets its value; the other side rules it out (./resolve.ts). */
function sharpenBySweep(
  id: 'stronger-regularization' | 'weaker-regularization',
  draft: Draft,
  ctx: LeverContext,
  sweep: RegularizationEvidence,
): void {
  const lever = id === 'stronger-regularization' ? 'stronger' : 'weaker';
  const wants = sweepWants(sweep, ctx.regularization);
  if (wants === null && sweep.atEdge === null) return;
  draft.evidence.push(sweepEvidence(sweep, ctx.regularization, lever));
  if (wants === lever) {
    draft.score += SCORE.SWEEP_AGREES_BONUS;
    const knob = ctx.regularization;
    const suggestion = knob === undefined ? undefined : sweepSuggestion(sweep, knob, lever);
    if (suggestion !== undefined) draft.suggestion = suggestion;
  } else if (wants !== null) draft.score -= SCORE.SWEEP_DISAGREES_PENALTY;
}
