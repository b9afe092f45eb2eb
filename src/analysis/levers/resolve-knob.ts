/**
 * What a hyperparameter name means: the built-in vocabulary (./vocabulary.ts) with the config's
 * `hyperparameters` map laid over it. Pure.
 *
 * Matching (`normaliseName`): case-insensitive; `-` and `_` alike; camelCase split at its humps
 * (`learningRate` = `learning_rate`); a path (`model.C`, `optimizer/lr`, scikit-learn's pipeline
 * `clf__C`) is looked up whole first, then by its last segment.
 */
import type {
  HyperparameterRole,
  HyperparameterRolesConfig,
  KnobSpec,
} from '../../model/hyperparameter-roles.js';
import { AMBIGUOUS, VOCABULARY, type VocabularyGroup } from './vocabulary.js';

/**
 * The comparable form of a name: camelCase humps become `_`, lower case, `-` becomes `_`.
 * Path separators (`.`, `/`, `__`) are kept for `lastSegment`.
 */
export function normaliseName(name: string): string {
  return name
    .replace(/([a-z0-9])([A-Z])/g, '$1_$2')
    .toLowerCase()
    .replace(/-/g, '_');
}

/** The last segment of a normalised path (`model.c` → `c`, `clf__c` → `c`), or null without one. */
export function lastSegment(normalised: string): string | null {
  const parts = normalised.split(/\.|\/|__/).filter((p) => p !== '');
  const last = parts[parts.length - 1];
  return parts.length > 1 && last !== undefined ? last : null;
}

export type KnobOrigin = 'built-in' | 'config';

export type VocabularyItem =
  | { kind: 'knob'; origin: KnobOrigin; spec: KnobSpec }
  | { kind: 'ambiguous'; readings: readonly string[] };

/** Normalised name → meaning. Built by `builtInVocabulary` and `mergeRoles`. */
export type Vocabulary = ReadonlyMap<string, VocabularyItem>;

function specOf(group: VocabularyGroup): KnobSpec {
  return {
    role: group.role,
    inverse: group.inverse,
    domain: group.domain,
    scale: group.scale,
    ...(group.unlimited === undefined ? {} : { unlimited: group.unlimited }),
  };
}

export function builtInVocabulary(): Vocabulary {
  const map = new Map<string, VocabularyItem>();
  for (const group of VOCABULARY)
    for (const name of group.names)
      map.set(normaliseName(name), { kind: 'knob', origin: 'built-in', spec: specOf(group) });
  for (const group of AMBIGUOUS)
    for (const name of group.names)
      map.set(normaliseName(name), { kind: 'ambiguous', readings: group.readings });
  return map;
}

export const BUILT_IN_VOCABULARY: Vocabulary = builtInVocabulary();

const COUNT_ROLES: ReadonlySet<HyperparameterRole> = new Set([
  'capacity',
  'features',
  'polynomial-degree',
  'data-size',
  'epochs',
  'early-stopping-patience',
]);

/** The knob a config entry describes, with the defaults documented on `HyperparameterRoleConfig`. */
export function specFromConfig(entry: HyperparameterRolesConfig[string]): KnobSpec {
  const integer = entry.integer ?? COUNT_ROLES.has(entry.role);
  return {
    role: entry.role,
    inverse: entry.inverse ?? false,
    domain: integer ? 'count' : 'non-negative',
    scale: entry.scale ?? (integer ? 'linear' : 'log'),
  };
}

/**
 * Config keys that normalise to the same name (`C` and `c`): the config loader should reject them,
 * since only the last of each group takes effect in `mergeRoles`.
 */
export function configRoleConflicts(config: HyperparameterRolesConfig): string[][] {
  const groups = new Map<string, string[]>();
  for (const key of Object.keys(config)) {
    const n = normaliseName(key);
    groups.set(n, [...(groups.get(n) ?? []), key]);
  }
  return [...groups.values()].filter((g) => g.length > 1);
}

/** The config's roles laid over a vocabulary: a config name replaces a built-in one. */
export function mergeRoles(
  base: Vocabulary,
  config: HyperparameterRolesConfig | undefined,
): Vocabulary {
  if (config === undefined) return base;
  const map = new Map(base);
  for (const [key, entry] of Object.entries(config))
    map.set(normaliseName(key), { kind: 'knob', origin: 'config', spec: specFromConfig(entry) });
  return map;
}

export type KnobResolution =
  | { status: KnobOrigin; matched: string; spec: KnobSpec }
  | { status: 'ambiguous'; matched: string; readings: readonly string[] }
  | { status: 'unknown' };

/** What a hyperparameter name means: the whole normalised name first, then its last segment. */
export function resolveKnob(
  name: string,
  vocabulary: Vocabulary = BUILT_IN_VOCABULARY,
): KnobResolution {
  const whole = normaliseName(name);
  for (const candidate of [whole, lastSegment(whole)]) {
    if (candidate === null) continue;
    const item = vocabulary.get(candidate);
    if (item === undefined) continue;
    return item.kind === 'knob'
      ? { status: item.origin, matched: candidate, spec: item.spec }
      : { status: 'ambiguous', matched: candidate, readings: item.readings };
  }
  return { status: 'unknown' };
}
