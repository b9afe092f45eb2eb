/**
 * What a pull request did to the hyperparameters, as codes: each changed knob with its role, the
 * direction it moved, the factor, and the effect on the model (more regularization, fewer
 * features, less data…). Unknown names come back with role null, never dropped, so the review can
 * ask for a config mapping. Pure.
 *
 * Comparison rules:
 * - Nested objects are flattened to dotted paths (`{optimizer: {lr: 0.1}}` → `optimizer.lr`), at
 *   most `MAX_DEPTH` levels; a literal key wins over a nested path spelling the same.
 * - Numbers compare by value; a string that is exactly a decimal number ("1e-3", as YAML 1.1
 *   readers leave it) compares as that number, while `from`/`to` keep the artifact's own value.
 * - A layer-size array (domain `units`, e.g. `hidden_layer_sizes`) compares by its total units:
 *   widening a layer or adding one raises it; `[100]` → `[50, 50]` is `changed` with equal size.
 * - A "no limit" value (`max_depth: null`; LightGBM's `max_depth: -1`) is larger than any number.
 * - A count-or-fraction knob moved between its two forms (`min_samples_leaf` 5 → 0.05) is `changed`:
 *   a fraction of an unknown total does not compare with a count.
 * - Anything else compares as canonical JSON: `changed` when it differs.
 */
import type { HyperparameterRole } from '../../model/hyperparameter-roles.js';
import { BUILT_IN_VOCABULARY, resolveKnob, type Vocabulary } from './resolve-knob.js';

export type JsonValue =
  null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };

export type ChangeDirection = 'raised' | 'lowered' | 'changed' | 'added' | 'removed';

export type ChangeEffect =
  | 'more-regularization'
  | 'less-regularization'
  | 'more-capacity'
  | 'less-capacity'
  | 'more-features'
  | 'fewer-features'
  | 'higher-degree'
  | 'lower-degree'
  | 'more-data'
  | 'less-data'
  | 'longer-training'
  | 'shorter-training'
  | 'later-stopping'
  | 'earlier-stopping'
  | 'larger-steps'
  | 'smaller-steps';

/**
 * Which way the effect pushes the model, as common practice has it:
 * - `toward-overfitting`: lower bias, higher variance (more capacity, features, degree, training
 *   length; less regularization);
 * - `toward-underfitting`: the reverse;
 * - `less-variance` / `more-variance`: more / less training data (variance moves; bias does not
 *   improve with data).
 * A learning-rate change has no fixed pull (null).
 */
export type ChangePull =
  'toward-overfitting' | 'toward-underfitting' | 'less-variance' | 'more-variance';

export type ChangeOrigin = 'built-in' | 'config' | 'ambiguous' | 'unknown';

export interface PrChange {
  /** The artifact's key; nested keys joined by `.`. */
  hyperparameter: string;
  role: HyperparameterRole | null;
  /** Raising the value lowers the role (C). False when the role is unknown. */
  inverse: boolean;
  /** Where the role came from; `ambiguous` and `unknown` have role null. */
  origin: ChangeOrigin;
  /** Absent when the key was added. */
  from?: JsonValue;
  /** Absent when the key was removed. */
  to?: JsonValue;
  direction: ChangeDirection;
  /** to / from of the compared values, when both are finite and positive. */
  ratio?: number;
  /** Total units of layer-size arrays, when either side is an array. */
  totalUnits?: { from: number; to: number };
  /** Which side means "no limit". */
  unlimited?: 'from' | 'to';
  effect: ChangeEffect | null;
  pull: ChangePull | null;
}

/** Deepest nesting flattened into dotted paths; deeper objects compare whole. */
export const MAX_DEPTH = 8;

const EFFECTS: Record<
  Exclude<HyperparameterRole, 'inert'>,
  readonly [ChangeEffect, ChangeEffect]
> = {
  regularization: ['more-regularization', 'less-regularization'],
  capacity: ['more-capacity', 'less-capacity'],
  features: ['more-features', 'fewer-features'],
  'polynomial-degree': ['higher-degree', 'lower-degree'],
  'data-size': ['more-data', 'less-data'],
  epochs: ['longer-training', 'shorter-training'],
  'early-stopping-patience': ['later-stopping', 'earlier-stopping'],
  'learning-rate': ['larger-steps', 'smaller-steps'],
};

/** The effect of moving a knob of this role; null for `changed`, `added`, `removed` and `inert`. */
export function effectOf(
  role: HyperparameterRole | null,
  inverse: boolean,
  direction: ChangeDirection,
): ChangeEffect | null {
  if (role === null || role === 'inert') return null;
  if (direction !== 'raised' && direction !== 'lowered') return null;
  const [up, down] = EFFECTS[role];
  return (direction === 'raised') !== inverse ? up : down;
}

const PULLS: Record<ChangeEffect, ChangePull | null> = {
  'more-regularization': 'toward-underfitting',
  'less-regularization': 'toward-overfitting',
  'more-capacity': 'toward-overfitting',
  'less-capacity': 'toward-underfitting',
  'more-features': 'toward-overfitting',
  'fewer-features': 'toward-underfitting',
  'higher-degree': 'toward-overfitting',
  'lower-degree': 'toward-underfitting',
  'more-data': 'less-variance',
  'less-data': 'more-variance',
  'longer-training': 'toward-overfitting',
  'shorter-training': 'toward-underfitting',
  'later-stopping': 'toward-overfitting',
  'earlier-stopping': 'toward-underfitting',
  'larger-steps': null,
  'smaller-steps': null,
};

export function pullOf(effect: ChangeEffect | null): ChangePull | null {
  return effect === null ? null : PULLS[effect];
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** JSON-safe copy: non-finite numbers and non-JSON values become null. */
function toJson(v: unknown): JsonValue {
  if (v === null || typeof v === 'boolean' || typeof v === 'string') return v;
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  if (Array.isArray(v)) return v.map(toJson);
  if (isPlainObject(v)) {
    const out: { [key: string]: JsonValue } = {};
    for (const [k, x] of Object.entries(v))
      Object.defineProperty(out, k, {
        value: toJson(x),
        enumerable: true,
        writable: true,
        configurable: true,
      });
    return out;
  }
  return null;
}

/** Flattened path → value. Literal keys are written last so they win over nested spellings. */
function flatten(params: Record<string, unknown>): Map<string, unknown> {
  const nested = new Map<string, unknown>();
  const walk = (obj: Record<string, unknown>, prefix: string, depth: number): void => {
    for (const [key, value] of Object.entries(obj)) {
      const path = `${prefix}.${key}`;
      if (isPlainObject(value) && depth < MAX_DEPTH && Object.keys(value).length > 0)
        walk(value, path, depth + 1);
      else nested.set(path, value);
    }
  };
  const literal = new Map<string, unknown>();
  for (const [key, value] of Object.entries(params)) {
    if (isPlainObject(value) && Object.keys(value).length > 0) walk(value, key, 1);
    else literal.set(key, value);
  }
  return new Map([...nested, ...literal]);
}

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

function asNumber(v: unknown): number | null {
  if (typeof v === 'number') return Number.isFinite(v) ? v : null;
  if (typeof v === 'string' && DECIMAL.test(v.trim())) {
    const n = Number(v.trim());
    return Number.isFinite(n) ? n : null;
  }
  return null;
}

/** Canonical JSON with sorted keys, for "did it change" of non-numeric values. */
function canonical(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canonical).join(',')}]`;
  if (isPlainObject(v))
    return `{${Object.keys(v)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${canonical(v[k])}`)
      .join(',')}}`;
  return JSON.stringify(toJson(v));
}

interface Measure {
  value: number;
  unlimited: boolean;
  units: boolean;
}

function measure(v: unknown, resolution: ReturnType<typeof resolveKnob>): Measure | null {
  const spec =
    resolution.status === 'built-in' || resolution.status === 'config' ? resolution.spec : null;
  if (spec?.unlimited !== undefined) {
    const n = asNumber(v);
    if (v === null || (spec.unlimited === 'null-or-non-positive' && n !== null && n <= 0))
      return { value: Infinity, unlimited: true, units: false };
  }
  if (spec?.domain === 'units' && Array.isArray(v)) {
    let total = 0;
    for (const x of v) {
      const n = asNumber(x);
      if (n === null) return null;
      total += n;
    }
    return { value: total, unlimited: false, units: true };
  }
  const n = asNumber(v);
  return n === null ? null : { value: n, unlimited: false, units: false };
}

function change(
  key: string,
  inB: boolean,
  b: unknown,
  inC: boolean,
  c: unknown,
  vocabulary: Vocabulary,
): PrChange | null {
  const resolution = resolveKnob(key, vocabulary);
  const known = resolution.status === 'built-in' || resolution.status === 'config';
  const role = known ? resolution.spec.role : null;
  const inverse = known ? resolution.spec.inverse : false;
  const base = {
    hyperparameter: key,
    role,
    inverse,
    origin: resolution.status,
    ...(inB ? { from: toJson(b) } : {}),
    ...(inC ? { to: toJson(c) } : {}),
  };
  const direction = (d: ChangeDirection): PrChange => {
    const effect = effectOf(role, inverse, d);
    return { ...base, direction: d, effect, pull: pullOf(effect) };
  };
  if (!inB) return direction('added');
  if (!inC) return direction('removed');
  const mb = measure(b, resolution);
  const mc = measure(c, resolution);
  if (mb === null || mc === null)
    return canonical(b) === canonical(c) ? null : direction('changed');
  // A count and a fraction of a total (min_samples_leaf 5 vs 0.05) do not compare by size.
  if (known && resolution.spec.domain === 'count-or-fraction' && mb.value < 1 !== mc.value < 1)
    return direction('changed');
  if (mb.value === mc.value) {
    // Same size, other shape ([100] → [50, 50]) is a change; "1e-3" → 0.001 or null → -1 for a
    // "no limit" knob is the same value written another way.
    const reshaped = (mb.units || mc.units) && canonical(b) !== canonical(c);
    return reshaped ? direction('changed') : null;
  }
  const out = direction(mc.value > mb.value ? 'raised' : 'lowered');
  if (mb.value > 0 && mc.value > 0 && Number.isFinite(mb.value) && Number.isFinite(mc.value))
    out.ratio = mc.value / mb.value;
  if (mb.units || mc.units) out.totalUnits = { from: mb.value, to: mc.value };
  if (mb.unlimited) out.unlimited = 'from';
  else if (mc.unlimited) out.unlimited = 'to';
  return out;
}

/**
 * The changed hyperparameters between baseline and candidate, sorted by key. Unchanged keys are
 * left out; added, removed and unknown keys are kept.
 */
export function prChanges(
  baseline: Record<string, unknown> | undefined,
  candidate: Record<string, unknown> | undefined,
  vocabulary: Vocabulary = BUILT_IN_VOCABULARY,
): PrChange[] {
  const b = flatten(baseline ?? {});
  const c = flatten(candidate ?? {});
  const keys = [...new Set([...b.keys(), ...c.keys()])].sort();
  const out: PrChange[] = [];
  for (const key of keys) {
    const x = change(key, b.has(key), b.get(key), c.has(key), c.get(key), vocabulary);
    if (x !== null) out.push(x);
  }
  return out;
}
