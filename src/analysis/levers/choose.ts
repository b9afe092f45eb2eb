/**
 * What to try next (DESIGN.md §7): levers from the PR's own change when it moved the model the
 * way it went, from the candidate's diagnosis sharpened by its curves, and from secondary
 * findings; then every lever its own evidence rules out is dropped and only one direction per knob
 * kept (./resolve.ts). Each lever carries its evidence as data. Pure.
 */
import type { Lever, NonLever } from '../../model/review.js';
import { Drafts, curveEvidence, type LeverContext } from './context.js';
import { diagnosisLevers } from './diagnosis.js';
import { ownChangeLevers } from './own-change.js';
import { cheaperFirst, markCheaperTies } from './cost-tie-break.js';
import { resolveLevers, type LeverTieBreak } from './resolve.js';
import { secondaryLevers } from './secondary.js';

export type { LeverContext } from './context.js';
export type { LeverTieBreak } from './resolve.js';

/** Levers of equal score are ordered by `tieBreak`; by default the one that trains for less first. */
export function chooseLevers(
  ctx: LeverContext,
  tieBreak: LeverTieBreak = cheaperFirst,
): { levers: Lever[]; nonLevers: NonLever[] } {
  const curves = curveEvidence(ctx.candidate.curves);
  const drafts = new Drafts();
  ownChangeLevers(ctx, curves, drafts);
  diagnosisLevers(ctx, curves, drafts);
  secondaryLevers(ctx, curves, drafts);
  const levers = resolveLevers(drafts.ranked(), ctx.roles, tieBreak);
  return {
    levers: tieBreak === cheaperFirst ? markCheaperTies(levers) : levers,
    nonLevers: nonLevers(ctx),
  };
}

/**
 * Shrinking the training set lowers training error but does not cure high bias (common practice):
 * said for a biased candidate, and when the PR itself shrank the training set.
 */
function nonLevers(ctx: LeverContext): NonLever[] {
  const biased =
    ctx.candidate.diagnosis === 'high-bias' || ctx.candidate.diagnosis === 'high-bias-and-variance';
  const shrank = ctx.changes.some((c) => c.effect === 'less-data');
  return biased || shrank ? ['smaller-training-set'] : [];
}
