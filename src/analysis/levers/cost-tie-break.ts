/**
 * Cost as the tie-break between levers the evidence ranks alike: the lever that trains for less
 * comes first, and says so. What each lever does to the cost of training is common practice:
 * fewer features, a smaller model and earlier stopping train for less; a regularization strength
 * or a data alignment leaves the cost about the same; more data, more features, a bigger model,
 * more epochs or more repeats train for more. Pure.
 */
import type { Lever, LeverId } from '../../model/review.js';
import type { LeverTieBreak } from './resolve.js';

export type TrainingCost = 'less' | 'same' | 'more';

const TRAINING_COST = new Map<LeverId, TrainingCost>([
  ['fewer-features', 'less'],
  ['smaller-model', 'less'],
  ['early-stopping', 'less'],
  ['stronger-regularization', 'same'],
  ['weaker-regularization', 'same'],
  ['align-training-data', 'same'],
  ['supply-reference', 'same'],
  ['bigger-validation-set', 'same'],
  ['more-data', 'more'],
  ['more-features', 'more'],
  ['richer-features', 'more'],
  ['bigger-model', 'more'],
  ['train-longer', 'more'],
  ['add-repeats', 'more'],
  ['repeat-with-seeds', 'more'],
]);

const RANK: Record<TrainingCost, number> = { less: 0, same: 1, more: 2 };

export function trainingCost(id: LeverId): TrainingCost {
  return TRAINING_COST.get(id) ?? 'same';
}

/** Cheaper first among levers of equal score. */
export const cheaperFirst: LeverTieBreak = (a, b) =>
  RANK[trainingCost(a.id)] - RANK[trainingCost(b.id)];

/**
 * Each lever that comes right before a lever of the same score only because it trains for less
 * gets a `cheaper-than` evidence item naming the other.
 */
export function markCheaperTies(levers: readonly Lever[]): Lever[] {
  return levers.map((lever, i) => {
    const next = levers[i + 1];
    if (next === undefined || next.score !== lever.score) return lever;
    const mine = trainingCost(lever.id);
    if (mine === 'more' || RANK[mine] >= RANK[trainingCost(next.id)]) return lever;
    return {
      ...lever,
      evidence: [...lever.evidence, { kind: 'cheaper-than', over: next.id, training: mine }],
    };
  });
}
