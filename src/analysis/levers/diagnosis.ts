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
import { epochMinimum, type CurveEvidence, type Drafts, type LeverContext } from './context.js';
import { numericChange, sweepSuggestion } from './own-change.js';
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
  const pulled = new Map(ctx.pulled.map((p) => [p.lever, p]));
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
        draft.evidence.push({ kind: 'already-pulled', ...numericChange(p) });
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
      draft.evidence.push({
        kind: 'learning-curve',
        fromX: Math.max(...lc.chart.map((p) => p.x)),
        atX: twice.x,
        current: ctx.candidate.splits.find((s) => s.split === 'validation')?.mean ?? 0,
        projected: twice.validation,
        ci: twice.ci,
        r2: lc.r2,
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

/** A sweep whose minimum lies on this lever's side raises it; on the other side, lowers it. */
function sharpenBySweep(
  id: 'stronger-regularization' | 'weaker-regularization',
  draft: Draft,
  ctx: LeverContext,
  sweep: RegularizationEvidence,
): void {
  // The candidate's strength below the minimum calls for stronger regularization, above for weaker.
  const wants = id === 'stronger-regularization' ? 'below' : 'above';
  const supports = sweep.side === 'unknown' ? null : sweep.side === wants;
  if (supports === null && sweep.atEdge === null) return;
  const key = ctx.regularization?.key;
  draft.evidence.push({
    kind: 'sweep-minimum',
    hyperparameter: key ?? null,
    bestX: sweep.bestX,
    bestValidation: sweep.bestValidation,
    current: ctx.regularization?.value ?? null,
    suggestedX: sweep.suggestedX,
    side: sweep.side,
    supports,
    atEdge: sweep.atEdge,
  });
  if (supports === true) {
    draft.score += SCORE.SWEEP_AGREES_BONUS;
    if (key !== undefined) draft.suggestion = sweepSuggestion(key, sweep);
  } else if (supports === false) draft.score -= SCORE.SWEEP_DISAGREES_PENALTY;
}
