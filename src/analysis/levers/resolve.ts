/**
 * The last step of choosing levers: drop every lever its own evidence rules out, keep one direction
 * per knob, and order what is left. Pure.
 *
 * Ruled out (common practice):
 * - a regularization lever the sweep points away from, or any when the candidate sits at the
 *   sweep's minimum (a measured curve beats the PR's change and the diagnosis);
 * - an epoch lever the epoch curve does not confirm, or, without an epoch curve, for a run whose
 *   known knobs include nothing that trains longer or stops earlier (a closed-form ridge);
 * - a capacity, feature or regularization lever of the diagnosis for a run whose known knobs have
 *   no such role (no "add polynomial terms" for a pixel MLP). A run that names no known knob keeps
 *   them: nothing says they are meaningless.
 */
import type { HyperparameterRole } from '../../model/hyperparameter-roles.js';
import type { Lever, LeverId } from '../../model/review.js';

/** Levers that pull the same knobs opposite ways: only the higher-ranked of each pair is kept. */
export const OPPOSITES: readonly (readonly [LeverId, LeverId])[] = [
  ['stronger-regularization', 'weaker-regularization'],
  ['bigger-model', 'smaller-model'],
  ['train-longer', 'early-stopping'],
  ['more-features', 'fewer-features'],
  ['richer-features', 'fewer-features'],
];

/** The roles that make a lever meaningful; levers not listed always are. */
const NEEDS: Partial<Record<LeverId, readonly HyperparameterRole[]>> = {
  'bigger-model': ['capacity'],
  'smaller-model': ['capacity'],
  'more-features': ['features', 'polynomial-degree'],
  'fewer-features': ['features', 'polynomial-degree'],
  'richer-features': ['features', 'polynomial-degree'],
  'weaker-regularization': ['regularization'],
  'train-longer': ['epochs', 'early-stopping-patience'],
  'early-stopping': ['epochs', 'early-stopping-patience'],
};

export function ruledOut(lever: Lever, roles: ReadonlySet<HyperparameterRole>): boolean {
  const own = lever.evidence.some((e) => e.kind === 'pr-change');
  for (const e of lever.evidence) {
    if (e.kind === 'sweep-minimum' && e.supports === false) return true;
    if (e.kind === 'epoch-curve-silent' && e.curve) return true;
  }
  const measured = lever.evidence.some(
    (e) => e.kind === 'sweep-minimum' || e.kind === 'epoch-minimum' || e.kind === 'still-improving',
  );
  const needs = NEEDS[lever.id];
  if (own || measured || needs === undefined || roles.size === 0) return false;
  return !needs.some((r) => roles.has(r));
}

/** Orders levers: higher score first, then the tie-break (e.g. the cheaper lever), then drafting order. */
export type LeverTieBreak = (a: Lever, b: Lever) => number;

export function resolveLevers(
  drafted: readonly Lever[],
  roles: ReadonlySet<HyperparameterRole>,
  tieBreak: LeverTieBreak = () => 0,
): Lever[] {
  const ranked = [...drafted].sort((a, b) => b.score - a.score || tieBreak(a, b));
  const kept: Lever[] = [];
  const taken = new Set<LeverId>();
  for (const lever of ranked) {
    if (ruledOut(lever, roles)) continue;
    const opposite = OPPOSITES.some(
      ([a, b]) => (a === lever.id && taken.has(b)) || (b === lever.id && taken.has(a)),
    );
    if (opposite) continue;
    kept.push(lever);
    taken.add(lever.id);
  }
  return kept;
}
