/**
 * Levers from the PR's own hyperparameter change when it moved the model the wrong way: reverse
 * an overshooting regularization change (try a value between old and new), or step back or
 * counter a capacity increase that raised variance. Pure.
 */
import type { LeverEvidence, LeverId } from '../../model/review.js';
import type { PulledLever } from '../hyperparameters.js';
import { between, type CurveEvidence, type Drafts, type LeverContext } from './context.js';
import {
  COUNTER_WITHOUT_SWEEP,
  COUNTER_WITH_SWEEP,
  REVERSE_OWN_CHANGE,
  STEP_BACK_CAPACITY,
} from './scores.js';

const CAPACITY_LEVERS: ReadonlySet<LeverId> = new Set([
  'richer-features',
  'more-features',
  'bigger-model',
]);

/** A pulled lever's change as numbers (levers are pulled only by numeric changes). */
export function numericChange(p: PulledLever): {
  hyperparameter: string;
  from: number;
  to: number;
  direction: 'raised' | 'lowered';
} {
  return {
    hyperparameter: p.change.key,
    from: Number(p.change.baseline),
    to: Number(p.change.candidate),
    direction: p.change.kind === 'lowered' ? 'lowered' : 'raised',
  };
}

export function ownChangeLevers(ctx: LeverContext, curves: CurveEvidence, drafts: Drafts): void {
  const towardBias = ctx.movement === 'toward-underfitting' || ctx.movement === 'worse-on-both';
  const towardVariance = ctx.movement === 'toward-overfitting' || ctx.movement === 'worse-on-both';
  const biasChange: LeverEvidence = {
    kind: 'component-change',
    component: 'bias',
    delta: ctx.bias,
  };
  const varianceChange: LeverEvidence = {
    kind: 'component-change',
    component: 'variance',
    delta: ctx.variance,
  };
  for (const p of ctx.pulled) {
    const { baseline: from, candidate: to, key } = p.change;
    if (typeof from !== 'number' || typeof to !== 'number') continue;
    const change: LeverEvidence = { kind: 'pr-change', ...numericChange(p) };
    const midway = {
      hyperparameter: key,
      value: between(from, to),
      basis: 'between-old-and-new',
    } as const;
    if (p.lever === 'stronger-regularization' && towardBias) {
      drafts.add('weaker-regularization', REVERSE_OWN_CHANGE, [change, biasChange], midway);
    }
    if (p.lever === 'weaker-regularization' && towardVariance) {
      drafts.add('stronger-regularization', REVERSE_OWN_CHANGE, [change, varianceChange], midway);
    }
    if (CAPACITY_LEVERS.has(p.lever) && towardVariance) {
      const back: LeverId = p.lever === 'bigger-model' ? 'smaller-model' : 'fewer-features';
      drafts.add(back, STEP_BACK_CAPACITY, [change, varianceChange], midway);
      counterCapacity(ctx, curves, drafts, [change, varianceChange]);
    }
  }
}

/** Keep the new capacity and regularize harder, by as much as the sweep says when it agrees. */
function counterCapacity(
  ctx: LeverContext,
  curves: CurveEvidence,
  drafts: Drafts,
  evidence: LeverEvidence[],
): void {
  const sweep = curves.sweep;
  if (sweep === null || sweep.side !== 'below') {
    drafts.add('stronger-regularization', COUNTER_WITHOUT_SWEEP, evidence);
    return;
  }
  const key = ctx.regularization?.key;
  drafts.add(
    'stronger-regularization',
    COUNTER_WITH_SWEEP,
    [
      ...evidence,
      {
        kind: 'sweep-minimum',
        hyperparameter: key ?? null,
        bestX: sweep.bestX,
        bestValidation: sweep.bestValidation,
        current: ctx.regularization?.value ?? null,
        suggestedX: sweep.suggestedX,
        side: sweep.side,
        supports: true,
        atEdge: sweep.atEdge,
      },
    ],
    key === undefined ? undefined : sweepSuggestion(key, sweep),
  );
}

/** The sweep's suggestion: its minimum, or one grid step beyond the end it lies at. */
export function sweepSuggestion(
  key: string,
  sweep: { suggestedX: number; atEdge: 'low' | 'high' | null },
): { hyperparameter: string; value: number; basis: 'sweep-minimum' | 'beyond-sweep-edge' } {
  return {
    hyperparameter: key,
    value: sweep.suggestedX,
    basis: sweep.atEdge === null ? 'sweep-minimum' : 'beyond-sweep-edge',
  };
}
