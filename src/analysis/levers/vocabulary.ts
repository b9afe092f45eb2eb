/**
 * The hyperparameter vocabulary: knob names → role, direction, value domain and scale, for the
 * common names of scikit-learn, the gradient-boosting libraries (XGBoost, LightGBM, CatBoost) and
 * deep-learning trainers. Where a name means different things in different libraries, the
 * scikit-learn meaning is chosen and the other reading is written in `caveat`; where the readings
 * pull in opposite directions the name is listed in `AMBIGUOUS` and resolves to no role, so the
 * review asks for a config mapping instead of guessing. Lookup and the config overlay live in
 * ./resolve-knob.ts; the README table is generated from here (scripts/vocabulary-table.mjs).
 *
 * `source` names where each direction is written: scikit-learn entries are checked against the
 * library's own parameter constraints and docstrings (test/fixtures/levers/sklearn-parameters.json);
 * the rest are marked "common practice". Names are written as they match, up to case. Pure data.
 */
import type {
  HyperparameterRole,
  KnobScale,
  UnlimitedWhen,
  ValueDomain,
} from '../../model/hyperparameter-roles.js';

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

/** A name list written as one line of words. */
const words = (list: string): readonly string[] => list.split(/\s+/).filter((w) => w !== '');

const SKLEARN = 'scikit-learn';
const COMMON = 'common practice';

export const VOCABULARY: readonly VocabularyGroup[] = [
  // Regularization: higher = stronger.
  {
    names: words('alpha'),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} Ridge, Lasso, ElasticNet, SGDClassifier, MLPClassifier (alpha); XGBoost alpha (L1)`,
    caveat: 'some texts and optimisers use alpha for a learning rate or a smoothing constant',
  },
  {
    names: words(
      'lambda reg_lambda lambda_l2 l2 l2_penalty l2_reg l2_regularization l2_leaf_reg ridge_alpha',
    ),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} HistGradientBoosting (l2_regularization); XGBoost, LightGBM, CatBoost L2 terms; ${COMMON} (lambda)`,
  },
  {
    names: words('reg_alpha lambda_l1 l1 l1_penalty l1_reg'),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `XGBoost, LightGBM L1 terms; ${COMMON}`,
  },
  {
    names: words('reg regularization reg_strength regularization_strength penalty_strength'),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: COMMON,
  },
  {
    names: words('weight_decay'),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${COMMON} (PyTorch and Keras optimisers)`,
  },
  {
    names: words('ccp_alpha min_impurity_decrease'),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} decision trees and forests (pruning and split thresholds)`,
  },
  {
    names: words(
      'min_child_weight min_sum_hessian_in_leaf min_split_loss min_split_gain min_gain_to_split',
    ),
    role: 'regularization',
    inverse: false,
    domain: 'non-negative',
    scale: 'log',
    source: `XGBoost, LightGBM ("larger is more conservative"); ${COMMON}`,
  },
  {
    names: words('min_samples_leaf min_samples_split'),
    role: 'regularization',
    inverse: false,
    domain: 'count-or-fraction',
    scale: 'linear',
    source: `${SKLEARN} decision trees, forests, gradient boosting`,
  },
  {
    names: words('min_child_samples min_data_in_leaf'),
    role: 'regularization',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `LightGBM; ${COMMON}`,
  },
  {
    names: words('dropout dropout_rate label_smoothing'),
    role: 'regularization',
    inverse: false,
    domain: 'fraction',
    scale: 'linear',
    source: COMMON,
  },
  // Inverse regularization: lower = stronger.
  {
    names: words('C'),
    role: 'regularization',
    inverse: true,
    domain: 'positive',
    scale: 'log',
    source: `${SKLEARN} LogisticRegression, SVC, LinearSVC: "Inverse of regularization strength"`,
  },
  {
    names: words(
      'subsample bagging_fraction colsample_bytree colsample_bylevel colsample_bynode feature_fraction',
    ),
    role: 'regularization',
    inverse: true,
    domain: 'fraction',
    scale: 'linear',
    source: `${SKLEARN} GradientBoosting (subsample < 1 "leads to a reduction of variance"); XGBoost, LightGBM row and column sampling`,
  },
  // Capacity: higher = more.
  {
    names: words('max_depth max_leaves'),
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    unlimited: 'null-or-non-positive',
    source: `${SKLEARN} trees (None = unlimited); XGBoost, LightGBM (0 or below = no limit)`,
  },
  {
    names: words('max_leaf_nodes'),
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    unlimited: 'null',
    source: `${SKLEARN} trees, HistGradientBoosting (None = unlimited)`,
  },
  {
    names: words('num_leaves depth'),
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `LightGBM (num_leaves), CatBoost (depth); ${COMMON}`,
  },
  {
    names: words('n_estimators num_boost_round num_iterations num_round nrounds'),
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} GradientBoosting (boosting stages); XGBoost, LightGBM rounds; ${COMMON}`,
    caveat:
      'in bagging ensembles (random forests) more trees mostly average variance away and do not overfit: map it as inert there',
  },
  {
    names: words('hidden_layer_sizes layer_sizes'),
    role: 'capacity',
    inverse: false,
    domain: 'units',
    scale: 'linear',
    source: `${SKLEARN} MLPClassifier, MLPRegressor ("number of neurons in the ith hidden layer")`,
    caveat:
      'an array is compared by its total units, a single number as one layer of that many units (scikit-learn accepts both)',
  },
  {
    names: words(
      'n_layers num_layers layers hidden_layers hidden_units hidden_size hidden_dim units n_units num_units width d_model model_size params parameters n_params num_params',
    ),
    role: 'capacity',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
  {
    names: words('n_neighbors'),
    role: 'capacity',
    inverse: true,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} KNeighbors*; ${COMMON} (more neighbours = a smoother fit)`,
  },
  // Features and polynomial degree.
  {
    names: words('features n_features num_features feature_count'),
    role: 'features',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
  {
    names: words('n_features_to_select'),
    role: 'features',
    inverse: false,
    domain: 'count-or-fraction',
    scale: 'linear',
    source: `${SKLEARN} RFE`,
  },
  {
    names: words('degree polynomial_degree poly_degree'),
    role: 'polynomial-degree',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} PolynomialFeatures, SVC (poly kernel)`,
  },
  // Data size.
  {
    names: words(
      'train_examples training_examples n_train num_train train_samples n_samples num_samples dataset_size data_size',
    ),
    role: 'data-size',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
  {
    names: words('train_size'),
    role: 'data-size',
    inverse: false,
    domain: 'count-or-fraction',
    scale: 'linear',
    source: `${SKLEARN} train_test_split (an int is a count, a float a fraction)`,
  },
  {
    names: words('train_fraction'),
    role: 'data-size',
    inverse: false,
    domain: 'fraction',
    scale: 'linear',
    source: COMMON,
  },
  // Training length.
  {
    names: words(
      'epochs num_epochs n_epochs max_epochs steps max_steps num_steps train_steps iterations n_iter',
    ),
    role: 'epochs',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
    caveat:
      "CatBoost's iterations counts trees (capacity); both mean more fitting. A scikit-learn Pipeline's steps is a list of estimators, compared as text",
  },
  {
    names: words('max_iter'),
    role: 'epochs',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} MLP and SGD (epochs for stochastic solvers), LogisticRegression (solver iterations)`,
    caveat:
      'in HistGradientBoosting it counts trees (capacity); for a convex solver that converged it changes nothing',
  },
  {
    names: words('tol'),
    role: 'epochs',
    inverse: true,
    domain: 'non-negative',
    scale: 'log',
    source: `${SKLEARN} solvers ("tolerance for stopping criteria"); ${COMMON} (a smaller tolerance trains longer)`,
  },
  {
    names: words(
      'patience early_stopping_patience early_stopping_rounds early_stopping_round n_iter_no_change stopping_rounds',
    ),
    role: 'early-stopping-patience',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: `${SKLEARN} SGD, MLP, GradientBoosting (n_iter_no_change); XGBoost, LightGBM, Keras; ${COMMON}`,
  },
  // Step size.
  {
    names: words('learning_rate learning_rate_init lr eta base_lr max_lr'),
    role: 'learning-rate',
    inverse: false,
    domain: 'positive',
    scale: 'log',
    source: `${SKLEARN} GradientBoosting, HistGradientBoosting (shrinkage), MLP (learning_rate_init); XGBoost eta`,
    caveat: "scikit-learn MLP's learning_rate is a schedule name, compared as text",
  },
  // Known and not a bias/variance knob.
  {
    names: words('random_state seed random_seed n_jobs nthread num_threads verbose verbosity'),
    role: 'inert',
    inverse: false,
    domain: 'count',
    scale: 'linear',
    source: COMMON,
  },
];

export const AMBIGUOUS: readonly AmbiguousGroup[] = [
  {
    names: words('gamma'),
    readings: [
      'scikit-learn SVC: RBF kernel coefficient, higher = more capacity',
      'XGBoost: minimum split loss, higher = stronger regularization',
    ],
    source: `${SKLEARN} SVC; XGBoost`,
  },
  {
    names: words('max_features'),
    readings: [
      'scikit-learn trees and forests: features sampled per split, lower = stronger regularization',
      'CountVectorizer, SelectFromModel: how many features the model gets',
    ],
    source: SKLEARN,
  },
  {
    names: words('max_samples'),
    readings: [
      'scikit-learn forests and bagging: bootstrap sample per tree, lower = more randomisation',
      'not the size of the training set',
    ],
    source: SKLEARN,
  },
  {
    names: words('n_components'),
    readings: ['PCA: features kept', 'GaussianMixture: mixture components (capacity)'],
    source: SKLEARN,
  },
  {
    names: words('rate decay'),
    readings: ['dropout rate or weight decay (regularization)', 'learning rate or its decay'],
    source: COMMON,
  },
  {
    names: words('epsilon eps'),
    readings: ['SVR: tube width, higher = less capacity', 'optimisers: a numerical constant'],
    source: COMMON,
  },
];
