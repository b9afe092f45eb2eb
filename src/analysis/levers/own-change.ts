/**
 * Levers from the PR's own hyperparameter changes: a change is the suspect when its pull matches
 * how the model moved (more regularization and toward underfitting; more capacity, features,
 * degree, epochs or less data and toward overfitting). The lever undoes it, with a value back
 * toward the baseline; a regularization sweep on the same knob, being measured, decides the value
 * instead (and rules the lever out when it points the other way: see ./resolve.ts). Pure.
 */
import type { KnobSpec } from '../../model/hyperparameter-roles.js';
import type { LeverEvidence, LeverId, Suggestion } from '../../model/review.js';
import type { ChangeEffect, ChangePull, JsonValue, PrChange } from './pr-changes.js';
import {
  sweepEvidence,
  sweepSuggestion,
  sweepWants,
  type CurveEvidence,
  type Drafts,
  type LeverContext,
} from './context.js';
import { specOf } from './knobs.js';
import { between, isIntegerKnob, roundSuggestion } from './rounding.js';
import {
  COUNTER_WITHOUT_SWEEP,
  COUNTER_WITH_SWEEP,
  REVERSE_OWN_CHANGE,
  STEP_BACK_CAPACITY,
} from './scores.js';

/** The lever that undoes a change's effect (common practice); null where none does. */
export const UNDO: Readonly<Record<ChangeEffect, LeverId | null>> = {
  'more-regularization': 'weaker-regularization',
  'less-regularization': 'stronger-regularization',
  'more-capacity': 'smaller-model',
  'less-capacity': 'bigger-model',
  'more-features': 'fewer-features',
  'fewer-features': 'more-features',
  'higher-degree': 'fewer-features',
  'lower-degree': 'richer-features',
  'more-data': null,
  'less-data': 'more-data',
  'longer-training': 'early-stopping',
  'shorter-training': 'train-longer',
  'later-stopping': 'early-stopping',
  'earlier-stopping': 'train-longer',
  'larger-steps': null,
  'smaller-steps': null,
};

/** The lever a change itself pulled (more data pulls `more-data`); null where none. */
export const PULLS: Readonly<Record<ChangeEffect, LeverId | null>> = {
  'more-regularization': 'stronger-regularization',
  'less-regularization': 'weaker-regularization',
  'more-capacity': 'bigger-model',
  'less-capacity': 'smaller-model',
  'more-features': 'more-features',
  'fewer-features': 'fewer-features',
  'higher-degree': 'richer-features',
  'lower-degree': 'fewer-features',
  'more-data': 'more-data',
  'less-data': null,
  'longer-training': 'train-longer',
  'shorter-training': 'early-stopping',
  'later-stopping': 'train-longer',
  'earlier-stopping': 'early-stopping',
  'larger-steps': null,
  'smaller-steps': null,
};

/** Effects that add capacity: countered by regularizing harder as well as by stepping back. */
const ADDS_CAPACITY: ReadonlySet<ChangeEffect> = new Set([
  'more-capacity',
  'more-features',
  'higher-degree',
]);

/** Whether a change's pull matches the movement (less data counts for toward-overfitting). */
export function isSuspect(pull: ChangePull | null, ctx: Pick<LeverContext, 'movement'>): boolean {
  if (pull === null) return false;
  const towardBias = ctx.movement === 'toward-underfitting' || ctx.movement === 'worse-on-both';
  const towardVariance = ctx.movement === 'toward-overfitting' || ctx.movement === 'worse-on-both';
  if (pull === 'toward-underfitting') return towardBias;
  return towardVariance && pull !== 'less-variance';
}

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function num(v: JsonValue | undefined): number | null {
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  if (typeof v === 'string' && DECIMAL.test(v.trim())) return Number(v.trim());
  return null;
}

/** A numeric change as compared: values (total units for layer sizes; null = no limit). */
export function comparedValues(c: PrChange): { from: number | null; to: number | null } | null {
  if (c.totalUnits !== undefined) return { from: c.totalUnits.from, to: c.totalUnits.to };
  const from = c.unlimited === 'from' ? null : num(c.from);
  const to = c.unlimited === 'to' ? null : num(c.to);
  if ((from === null && c.unlimited !== 'from') || (to === null && c.unlimited !== 'to'))
    return null;
  return { from, to };
}

export function changeEvidence(c: PrChange): LeverEvidence | null {
  const v = comparedValues(c);
  if (v === null || c.role === null || c.effect === null) return null;
  if (c.direction !== 'raised' && c.direction !== 'lowered') return null;
  return {
    kind: 'pr-change',
    hyperparameter: c.hyperparameter,
    from: v.from,
    to: v.to,
    direction: c.direction,
    role: c.role,
    effect: c.effect,
    ...(c.totalUnits === undefined ? {} : { totalUnits: true }),
  };
}

/**
 * A value back toward the baseline: a rounded value between the two on the knob's scale, or the
 * baseline itself when none is worth typing; for a knob the PR set to "no limit", a finite limit
 * twice the finite side (and so beyond the baseline). Undefined for learning rates.
 */
export function stepBack(c: PrChange, spec: KnobSpec): Suggestion | undefined {
  if (spec.role === 'learning-rate' || spec.role === 'inert') return undefined;
  const v = comparedValues(c);
  if (v === null) return undefined;
  const totalUnits = c.totalUnits === undefined ? {} : { totalUnits: true };
  const finite = v.from ?? v.to;
  if (finite === null) return undefined;
  const integer = isIntegerKnob(spec, [finite]);
  if (v.from === null || v.to === null) {
    const value = roundSuggestion(Math.max(finite * 2, integer ? finite + 1 : finite), {
      integer,
    });
    return { hyperparameter: c.hyperparameter, value, basis: 'finite-limit', ...totalUnits };
  }
  const value = between(v.from, v.to, {
    scale: spec.scale,
    integer: isIntegerKnob(spec, [v.from, v.to]),
  });
  return value === null
    ? { hyperparameter: c.hyperparameter, value: v.from, basis: 'back-to-baseline', ...totalUnits }
    : { hyperparameter: c.hyperparameter, value, basis: 'between-old-and-new', ...totalUnits };
}

export function ownChangeLevers(ctx: LeverContext, curves: CurveEvidence, drafts: Drafts): void {
  const counters: LeverEvidence[][] = [];
  const drafted = new Set<LeverId>();
  for (const c of ctx.changes) {
    if (c.effect === null || !isSuspect(c.pull, ctx)) continue;
    const id = UNDO[c.effect];
    const spec = specOf(c.hyperparameter, ctx.vocabulary);
    const change = changeEvidence(c);
    if (id === null || spec === null || change === null) continue;
    const moved: LeverEvidence = {
      kind: 'component-change',
      component: c.pull === 'toward-underfitting' ? 'bias' : 'variance',
      delta: c.pull === 'toward-underfitting' ? ctx.bias : ctx.variance,
    };
    if (ADDS_CAPACITY.has(c.effect)) counters.push([change, moved]);
    const existing = drafts.get(id);
    if (existing !== undefined && drafted.has(id)) {
      // A second change behind the same lever (features and degree both raised): one lever, both
      // changes in its evidence, the first change's value.
      existing.evidence.splice(1, 0, change);
      continue;
    }
    drafted.add(id);
    let suggestion = stepBack(c, spec);
    const evidence = [change, moved];
    const regularizing = id === 'stronger-regularization' || id === 'weaker-regularization';
    if (regularizing && curves.sweep !== null) {
      const lever = id === 'stronger-regularization' ? 'stronger' : 'weaker';
      evidence.push(sweepEvidence(curves.sweep, ctx.regularization, lever));
      const knob = ctx.regularization;
      if (
        knob !== undefined &&
        knob.key === c.hyperparameter &&
        sweepWants(curves.sweep, knob) === lever
      )
        suggestion = sweepSuggestion(curves.sweep, knob, lever) ?? suggestion;
    }
    drafts.add(id, regularizing ? REVERSE_OWN_CHANGE : STEP_BACK_CAPACITY, evidence, suggestion);
  }
  const first = counters[0];
  if (first !== undefined) counterCapacity(ctx, curves, drafts, first);
}

/** Keep the new capacity and regularize harder, by as much as the sweep says when it agrees. */
function counterCapacity(
  ctx: LeverContext,
  curves: CurveEvidence,
  drafts: Drafts,
  evidence: LeverEvidence[],
): void {
  const sweep = curves.sweep;
  const knob = ctx.regularization;
  if (sweep === null || sweepWants(sweep, knob) !== 'stronger') {
    if (ctx.roles.size === 0 || ctx.roles.has('regularization'))
      drafts.add('stronger-regularization', COUNTER_WITHOUT_SWEEP, evidence);
    return;
  }
  drafts.add(
    'stronger-regularization',
    COUNTER_WITH_SWEEP,
    [...evidence, sweepEvidence(sweep, knob, 'stronger')],
    knob === undefined ? undefined : sweepSuggestion(sweep, knob, 'stronger'),
  );
}
