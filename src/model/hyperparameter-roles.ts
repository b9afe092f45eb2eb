/**
 * What a hyperparameter does to a model, as codes: its role, whether raising it lowers that role
 * (an inverse knob such as scikit-learn's `C`), the values it can take and the scale on which a
 * person tunes it. Shared by the built-in vocabulary (./vocabulary.ts) and the config's
 * `hyperparameters` map. Types only plus the config's JSON Schema fragment; no logic.
 */
/**
 * - `regularization`: a penalty or constraint strength; higher = stronger (with `inverse`, lower = stronger).
 * - `capacity`: model size or flexibility (depth, leaves, units, layers, boosting rounds).
 * - `features`: how many input features the model sees.
 * - `polynomial-degree`: the degree of polynomial or interaction terms.
 * - `data-size`: how many training examples.
 * - `epochs`: how long training runs (epochs, solver iterations, steps).
 * - `early-stopping-patience`: how long training waits without improvement before stopping.
 * - `learning-rate`: the optimiser's step size (boosting: shrinkage).
 * - `inert`: known, and not a bias/variance knob (seeds, threads, logging).
 */
export const HYPERPARAMETER_ROLES = [
  'regularization',
  'capacity',
  'features',
  'polynomial-degree',
  'data-size',
  'epochs',
  'early-stopping-patience',
  'learning-rate',
  'inert',
] as const;
export type HyperparameterRole = (typeof HYPERPARAMETER_ROLES)[number];

/**
 * The values a knob takes.
 * - `count`: an integer ≥ 0 (depth, leaves, rounds, epochs, features).
 * - `count-or-fraction`: an integer ≥ 1, or a fraction in (0, 1) of some total (scikit-learn's
 *   `min_samples_leaf`, `train_size`, `n_features_to_select` accept both).
 * - `fraction`: a real in [0, 1] (dropout, subsample).
 * - `non-negative`: a real ≥ 0 (most penalty strengths).
 * - `positive`: a real > 0 (`C`, learning rates).
 * - `units`: a count, or an array of counts compared by their total (see pr-changes.ts).
 */
export const VALUE_DOMAINS = [
  'count',
  'count-or-fraction',
  'fraction',
  'non-negative',
  'positive',
  'units',
] as const;
export type ValueDomain = (typeof VALUE_DOMAINS)[number];

/** `log`: tuned by factors (geometric midpoints); `linear`: tuned by steps (arithmetic midpoints). */
export const KNOB_SCALES = ['log', 'linear'] as const;
export type KnobScale = (typeof KNOB_SCALES)[number];

/** Values that mean "no limit", compared as larger than any number. */
export type UnlimitedWhen = 'null' | 'null-or-non-positive';

/** Everything the analysis needs to know about one knob. */
export interface KnobSpec {
  role: HyperparameterRole;
  /** Raising the value lowers the role's quantity: a higher `C` is weaker regularization. */
  inverse: boolean;
  domain: ValueDomain;
  scale: KnobScale;
  unlimited?: UnlimitedWhen;
}

/**
 * One entry of the config's `hyperparameters` map, e.g.
 * `hyperparameters: { my_penalty: { role: regularization, inverse: false } }`.
 */
export interface HyperparameterRoleConfig {
  role: HyperparameterRole;
  /** @default false */
  inverse?: boolean;
  /** Integer-valued (a count). @default true for count-like roles, false for regularization and learning-rate */
  integer?: boolean;
  /** @default `linear` for integers, `log` otherwise */
  scale?: KnobScale;
}

export type HyperparameterRolesConfig = Record<string, HyperparameterRoleConfig>;

/** Largest number of names the config may map; a bound on untrusted input. */
export const MAX_CONFIG_ROLES = 200;

/**
 * The JSON Schema of the config's `hyperparameters` property. schema/fitgap-config.schema.json
 * holds the same object, and `HyperparameterRolesConfig` is its type: tests keep all three equal
 * (ajv's JSONSchemaType would demand `nullable` on the optional members, which the schema must not
 * allow).
 */
export const HYPERPARAMETER_ROLES_SCHEMA = {
  type: 'object',
  description:
    "Roles of hyperparameter names fitgap does not know, or knows differently: each name maps to a role and whether raising it lowers that role (`inverse`, as scikit-learn's C). Names match case-insensitively with '-' and '_' alike; a dotted or `__` path also matches by its last segment. Overrides the built-in vocabulary (README 'Hyperparameter vocabulary').",
  maxProperties: MAX_CONFIG_ROLES,
  propertyNames: { type: 'string', minLength: 1, maxLength: 200 },
  additionalProperties: {
    type: 'object',
    required: ['role'],
    additionalProperties: false,
    properties: {
      role: {
        type: 'string',
        enum: [...HYPERPARAMETER_ROLES],
        description: 'What the knob controls.',
      },
      inverse: {
        type: 'boolean',
        description:
          'Raising the value lowers the role (a smaller C is stronger regularization). Default false.',
      },
      integer: {
        type: 'boolean',
        description:
          'The knob takes integers (suggestions are rounded to integers). Default: true for capacity, features, polynomial-degree, data-size, epochs and early-stopping-patience.',
      },
      scale: {
        type: 'string',
        enum: [...KNOB_SCALES],
        description:
          'How the knob is tuned: `log` (by factors; geometric midpoints) or `linear` (by steps). Default: linear for integers, log otherwise.',
      },
    },
  },
} as const;
