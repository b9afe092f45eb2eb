/**
 * What to try next (DESIGN.md §7): levers ranked by score, from the PR's own change when it
 * overshot, from the candidate's diagnosis sharpened by its curves, and from secondary findings;
 * each with the evidence behind it as data. Pure.
 */
import type { Lever, NonLever } from '../../model/review.js';
import { knobOf } from '../hyperparameters.js';
import { Drafts, curveEvidence, type LeverContext } from './context.js';
import { diagnosisLevers } from './diagnosis.js';
import { ownChangeLevers } from './own-change.js';
import { secondaryLevers } from './secondary.js';

export type { LeverContext } from './context.js';

export function chooseLevers(ctx: LeverContext): { levers: Lever[]; nonLevers: NonLever[] } {
  const curves = curveEvidence(ctx.candidate.curves);
  const drafts = new Drafts();
  ownChangeLevers(ctx, curves, drafts);
  diagnosisLevers(ctx, curves, drafts);
  secondaryLevers(ctx, curves, drafts);
  return { levers: drafts.ranked(), nonLevers: nonLevers(ctx) };
}

/**
 * Shrinking the training set lowers training error but does not cure high bias (common practice):
 * said for a biased candidate, and when the PR itself shrank the training set.
 */
function nonLevers(ctx: LeverContext): NonLever[] {
  const biased =
    ctx.candidate.diagnosis === 'high-bias' || ctx.candidate.diagnosis === 'high-bias-and-variance';
  const shrank = ctx.changes.some((c) => c.kind === 'lowered' && knobOf(c.key) === 'data');
  return biased || shrank ? ['smaller-training-set'] : [];
}
