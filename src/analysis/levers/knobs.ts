/**
 * The run's knobs as the lever rules see them: its hyperparameters without the keys the Python
 * writer adds about them (`inverse_knobs`, `curve_knobs`), the vocabulary with the writer's
 * `inverse_knobs` laid over it, the knob the regularization sweep varies, and the roles the run's
 * knobs cover. Pure.
 */
import type { HyperparameterRole, KnobSpec } from '../../model/hyperparameter-roles.js';
import type { Hyperparameters } from '../../model/run.js';
import { normaliseName, resolveKnob, type Vocabulary } from './resolve-knob.js';

/** Keys the Python writer adds inside `hyperparameters`: facts about the knobs, not knobs. */
export const WRITER_KEYS: readonly string[] = ['inverse_knobs', 'curve_knobs'];

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** The hyperparameters without the writer's keys. */
export function knobValues(h: Hyperparameters | undefined): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(h ?? {}))
    if (!WRITER_KEYS.includes(key))
      Object.defineProperty(out, key, {
        value,
        enumerable: true,
        writable: true,
        configurable: true,
      });
  return out;
}

/**
 * The vocabulary with the writer's `inverse_knobs` names (of both runs) marked inverse: a name the
 * vocabulary knows keeps its role and becomes inverse; an unknown one becomes an inverse
 * regularization strength, which is what the writer lists there.
 */
export function runVocabulary(
  base: Vocabulary,
  ...runs: (Hyperparameters | undefined)[]
): Vocabulary {
  const names = runs.flatMap((h) => {
    const list = h?.['inverse_knobs'];
    return Array.isArray(list) ? list.filter((x): x is string => typeof x === 'string') : [];
  });
  if (names.length === 0) return base;
  const map = new Map(base);
  for (const name of names) {
    const r = resolveKnob(name, base);
    const spec: KnobSpec =
      r.status === 'built-in' || r.status === 'config'
        ? { ...r.spec, inverse: true }
        : { role: 'regularization', inverse: true, domain: 'positive', scale: 'log' };
    map.set(normaliseName(name), { kind: 'knob', origin: 'built-in', spec });
  }
  return map;
}

export interface RegularizationKnob {
  key: string;
  value: number;
  /** Raising the value weakens regularization (C): the sweep's x runs the other way. */
  inverse: boolean;
}

/**
 * The knob the candidate's regularization sweep varies: the one `curve_knobs.regularization` names,
 * else the first numeric regularization knob that is not a fraction (dropout is not a strength on
 * the sweep's scale).
 */
export function regularizationKnob(
  h: Hyperparameters | undefined,
  vocabulary: Vocabulary,
): RegularizationKnob | undefined {
  const params = knobValues(h);
  const curveKnobs = h?.['curve_knobs'];
  const named = isRecord(curveKnobs) ? curveKnobs['regularization'] : undefined;
  const of = (key: string): RegularizationKnob | undefined => {
    const value = params[key];
    if (typeof value !== 'number' || !Number.isFinite(value)) return undefined;
    const r = resolveKnob(key, vocabulary);
    const inverse = (r.status === 'built-in' || r.status === 'config') && r.spec.inverse;
    return { key, value, inverse };
  };
  if (typeof named === 'string' && Object.hasOwn(params, named)) return of(named);
  for (const key of Object.keys(params)) {
    const r = resolveKnob(key, vocabulary);
    if (r.status !== 'built-in' && r.status !== 'config') continue;
    if (r.spec.role !== 'regularization' || r.spec.domain === 'fraction') continue;
    const knob = of(key);
    if (knob !== undefined) return knob;
  }
  return undefined;
}

/** The roles the run's known knobs cover (inert included). Empty when the run names none. */
export function runRoles(
  h: Hyperparameters | undefined,
  vocabulary: Vocabulary,
): Set<HyperparameterRole> {
  const roles = new Set<HyperparameterRole>();
  for (const key of Object.keys(knobValues(h))) {
    const r = resolveKnob(key, vocabulary);
    if (r.status === 'built-in' || r.status === 'config') roles.add(r.spec.role);
  }
  return roles;
}

/** The spec of a knob, or null when the vocabulary does not know it. */
export function specOf(key: string, vocabulary: Vocabulary): KnobSpec | null {
  const r = resolveKnob(key, vocabulary);
  return r.status === 'built-in' || r.status === 'config' ? r.spec : null;
}
