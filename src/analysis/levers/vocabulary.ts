/**
 * The hyperparameter vocabulary: knob names → role, direction, value domain and scale, for the
 * common names of scikit-learn, the gradient-boosting libraries (XGBoost, LightGBM, CatBoost) and
 * deep-learning trainers. Where a name means different things in different libraries, the
 * scikit-learn meaning is chosen and the other reading is written in `caveat`; where the readings
 * pull in opposite directions the name is listed as ambiguous and resolves to no role, so the
 * review asks for a config mapping instead of guessing.
 *
 * Matching (see `normaliseName`): case-insensitive; `-` and `_` alike; camelCase split at its
 * humps (`learningRate` = `learning_rate`); a path (`model.C`, `optimizer/lr`, scikit-learn's
 * pipeline `clf__C`) is looked up whole first, then by its last segment. The config's
 * `hyperparameters` map overrides any built-in name (`mergeRoles`).
 *
 * `source` names where each direction is written: scikit-learn entries are checked against the
 * library's own parameter constraints and docstrings (test/fixtures/levers/sklearn-parameters.json);
 * the rest are marked "common practice". Pure data and pure functions.
 */
import type {
  HyperparameterRole,
  HyperparameterRolesConfig,
  KnobScale,
  KnobSpec,
  UnlimitedWhen,
  ValueDomain,
} from './roles.js';

/** A group of names sharing one meaning. */
export interface VocabularyGroup {
  names: readonly string[];
  role: HyperparameterRole;
  inverse: boolean;
  domain: ValueDomain;
  scale: KnobScale;
  unlimited?: UnlimitedWhen;
  source: string;
  caveat?: string;
}

/** Names whose common readings pull in different directions: no role until the config maps one. */
export interface AmbiguousGroup {
  names: readonly string[];
  /** The competing readings, one short phrase each. */
  readings: readonly string[];
  source: string;
}

const SKLEARN = 'scikit-learn';
const COMMON = 'common practice';

export const VOCABULARY: readonly VocabularyGroup[] = [
  // Regularization: higher = stronger.
  {
    names: ['alpha'],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} Ridge, Lasso, ElasticNet, SGDClassifier, MLPClassifier (alpha); XGBoost alpha (L1)`,
    caveat: 'some texts and optimisers use alpha for a learning rate or a smoothing constant',
  },
  {
    names: [
      'lambda',
      'reg_lambda',
      'lambda_l2',
      'l2',
      'l2_penalty',
      'l2_reg',
      'l2_regularization',
      'l2_leaf_reg',
      'ridge_alpha',
    ],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} HistGradientBoosting (l2_regularization); XGBoost, LightGBM, CatBoost L2 terms; ${COMMON} (lambda)`,
  },
  {
    names: ['reg_alpha', 'lambda_l1', 'l1', 'l1_penalty', 'l1_reg'],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `XGBoost, LightGBM L1 terms; ${COMMON}`,
  },
  {
    names: ['reg', 'regularization', 'reg_strength', 'regularization_strength', 'penalty_strength'],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: COMMON,
  },
  {
    names: ['weight_decay'],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${COMMON} (PyTorch and Keras optimisers)`,
  },
  {
    names: ['ccp_alpha', 'min_impurity_decrease'],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} decision trees and forests (pruning and split thresholds)`,
  },
  {
    names: [
      'min_child_weight',
      'min_sum_hessian_in_leaf',
      'min_split_loss',
      'min_split_gain',
      'min_gain_to_split',
    ],
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `XGBoost, LightGBM ("larger is more conservative"); ${COMMON}`,
  },
  {
    names: ['min_samples_leaf', 'min_samples_split'],
    role: 'regularization',
    inverse: false,
    domain: 'count-or-fraction',
    scale: 'linear',
    source: `${SKLEARN} decision trees, forests, gradient boosting`,
  },
  {
    names: ['min_child_samples', 'min_data_in_leaf'],
    role: 'regularization',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `LightGBM; ${COMMON}`,
  },
  {
    names: ['dropout', 'dropout_rate', 'label_smoothing'],
    role: 'regularization',
    inverse: false,
    domain: 'fraction',
    scale: 'linear',
    source: COMMON,
  },
  // Inverse regularization: lower = stronger.
  {
    names: ['C'],
    role: 'regularization',
    inverse: true,
    domain: 'positive',
    scale: 'log',
    source: `${SKLEARN} LogisticRegression, SVC, LinearSVC: "Inverse of regularization strength"`,
  },
  {
    names: [
      'subsample',
      'bagging_fraction',
      'colsample_bytree',
      'colsample_bylevel',
      'colsample_bynode',
      'feature_fraction',
    ],
    role: 'regularization',
    inverse: true,
    domain: 'fraction',
    scale: 'linear',
    source: `${SKLEARN} GradientBoosting (subsample < 1 "leads to a reduction of variance"); XGBoost, LightGBM row and column sampling`,
  },
  // Capacity: higher = more.
  {
    names: ['max_depth', 'max_leaves'],
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    unlimited: 'null-or-non-positive',
    source: `${SKLEARN} trees (None = unlimited); XGBoost, LightGBM (0 or below = no limit)`,
  },
  {
    names: ['max_leaf_nodes'],
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    unlimited: 'null',
    source: `${SKLEARN} trees, HistGradientBoosting (None = unlimited)`,
  },
  {
    names: ['num_leaves', 'depth'],
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `LightGBM (num_leaves), CatBoost (depth); ${COMMON}`,
  },
  {
    names: ['n_estimators', 'num_boost_round', 'num_iterations', 'num_round', 'nrounds'],
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} GradientBoosting (boosting stages); XGBoost, LightGBM rounds; ${COMMON}`,
    caveat:
      'in bagging ensembles (random forests) more trees mostly average variance away and do not overfit: map it as inert there',
  },
  {
    names: ['hidden_layer_sizes', 'layers', 'hidden_layers', 'layer_sizes'],
    role: 'capacity',
    inverse: false,
    domain: 'units',
    scale: 'linear',
    source: `${SKLEARN} MLPClassifier, MLPRegressor ("number of neurons in the ith hidden layer")`,
    caveat: 'an array is compared by its total units; a single number by itself',
  },
  {
    names: [
      'n_layers',
      'num_layers',
      'hidden_units',
      'hidden_size',
      'hidden_dim',
      'units',
      'n_units',
      'num_units',
      'width',
      'd_model',
      'model_size',
      'params',
      'parameters',
      'n_params',
      'num_params',
    ],
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
  {
    names: ['n_neighbors'],
    role: 'capacity',
    inverse: true,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} KNeighbors*; ${COMMON} (more neighbours = a smoother fit)`,
  },
  // Features and polynomial degree.
  {
    names: ['features', 'n_features', 'num_features', 'feature_count'],
    role: 'features',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
  {
    names: ['n_features_to_select'],
    role: 'features',
    inverse: false,
    domain: 'count-or-fraction',
    scale: 'linear',
    source: `${SKLEARN} RFE`,
  },
  {
    names: ['degree', 'polynomial_degree', 'poly_degree'],
    role: 'polynomial-degree',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} PolynomialFeatures, SVC (poly kernel)`,
  },
  // Data size.
  {
    names: [
      'train_examples',
      'training_examples',
      'n_train',
      'num_train',
      'train_samples',
      'n_samples',
      'num_samples',
      'dataset_size',
      'data_size',
    ],
    role: 'data-size',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
  {
    names: ['train_size'],
    role: 'data-size',
    inverse: false,
    domain: 'count-or-fraction',
    scale: 'linear',
    source: `${SKLEARN} train_test_split (an int is a count, a float a fraction)`,
  },
  {
    names: ['train_fraction'],
    role: 'data-size',
    inverse: false,
    domain: 'fraction',
    scale: 'linear',
    source: COMMON,
  },
  // Training length.
  {
    names: [
      'epochs',
      'num_epochs',
      'n_epochs',
      'max_epochs',
      'steps',
      'max_steps',
      'num_steps',
      'train_steps',
      'iterations',
      'n_iter',
    ],
    role: 'epochs',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
    caveat: "CatBoost's iterations counts trees (capacity); both mean more fitting",
  },
  {
    names: ['max_iter'],
    role: 'epochs',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} MLP and SGD (epochs for stochastic solvers), LogisticRegression (solver iterations)`,
    caveat:
      'in HistGradientBoosting it counts trees (capacity); for a convex solver that converged it changes nothing',
  },
  {
    names: ['tol'],
    role: 'epochs',
    inverse: true,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} solvers ("tolerance for stopping criteria"); ${COMMON} (a smaller tolerance trains longer)`,
  },
  {
    names: [
      'patience',
      'early_stopping_patience',
      'early_stopping_rounds',
      'early_stopping_round',
      'n_iter_no_change',
      'stopping_rounds',
    ],
    role: 'early-stopping-patience',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} SGD, MLP, GradientBoosting (n_iter_no_change); XGBoost, LightGBM, Keras; ${COMMON}`,
  },
  // Step size.
  {
    names: ['learning_rate', 'learning_rate_init', 'lr', 'eta', 'base_lr', 'max_lr'],
    role: 'learning-rate',
    inverse: false,
    domain: 'positive',
    scale: 'log',
    source: `${SKLEARN} GradientBoosting, HistGradientBoosting (shrinkage), MLP (learning_rate_init); XGBoost eta`,
    caveat: "scikit-learn MLP's learning_rate is a schedule name, compared as text",
  },
  // Known and not a bias/variance knob.
  {
    names: [
      'random_state',
      'seed',
      'random_seed',
      'n_jobs',
      'nthread',
      'num_threads',
      'verbose',
      'verbosity',
    ],
    role: 'inert',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
];

export const AMBIGUOUS: readonly AmbiguousGroup[] = [
  {
    names: ['gamma'],
    readings: [
      'scikit-learn SVC: RBF kernel coefficient, higher = more capacity',
      'XGBoost: minimum split loss, higher = stronger regularization',
    ],
    source: `${SKLEARN} SVC; XGBoost`,
  },
  {
    names: ['max_features'],
    readings: [
      'scikit-learn trees and forests: features sampled per split, lower = stronger regularization',
      'CountVectorizer, SelectFromModel: how many features the model gets',
    ],
    source: SKLEARN,
  },
  {
    names: ['max_samples'],
    readings: [
      'scikit-learn forests and bagging: bootstrap sample per tree, lower = more randomisation',
      'not the size of the training set',
    ],
    source: SKLEARN,
  },
  {
    names: ['n_components'],
    readings: ['PCA: features kept', 'GaussianMixture: mixture components (capacity)'],
    source: SKLEARN,
  },
  {
    names: ['rate', 'decay'],
    readings: ['dropout rate or weight decay (regularization)', 'learning rate or its decay'],
    source: COMMON,
  },
  {
    names: ['epsilon', 'eps'],
    readings: ['SVR: tube width, higher = less capacity', 'optimisers: a numerical constant'],
    source: COMMON,
  },
];

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
