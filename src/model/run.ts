/**
 * The run artifact, format `fitgap-run/1` (see schema/fitgap-run-1.schema.json).
 * One JSON document per training run. The JSON Schema and these types agree; the schema is the
 * source of truth for validation, these types are what the rest of the code sees once a document
 * has passed it.
 */

/** `minimize` for error rate, RMSE, loss; `maximize` for accuracy, R², AUC. */
export type Goal = 'minimize' | 'maximize';
/** `proportion`: a rate over `examples` independent examples, in [0, 1]. */
export type MetricKind = 'proportion' | 'continuous';
export type SplitName = 'train' | 'train_dev' | 'validation' | 'test';
export const SPLIT_NAMES: readonly SplitName[] = ['train', 'train_dev', 'validation', 'test'];

export interface Metric {
  name: string;
  goal: Goal;
  kind: MetricKind;
  /** Best possible value (1 for accuracy and R², 100 for a 0–100 score, 0 for an error). */
  best?: number;
  /** Unit of the values, for labels. */
  unit?: string;
}

/** `fixed`: every repeat was evaluated on the same rows; `per-repeat`: each drew its own rows. */
export type EvaluationRows = 'fixed' | 'per-repeat';

export interface Split {
  /** Number of examples the value was measured on (needed for binomial noise on one repeat). */
  examples?: number;
  /** One value per repeat (seed); position i is the same trained model in every split. */
  values: number[];
  /** Default `fixed`. */
  evaluationRows?: EvaluationRows;
}

export interface CurvePoint {
  x: number;
  train?: number;
  validation: number;
}

export type CurveName = 'epochs' | 'training_examples' | 'regularization';
export const CURVE_NAMES: readonly CurveName[] = ['epochs', 'training_examples', 'regularization'];

/** Where a curve's validation values came from. Default `held-out`. */
export type CurveSource = 'held-out' | 'cross-validation';

export type Curves = Partial<Record<CurveName, CurvePoint[]>> & {
  sources?: Partial<Record<CurveName, CurveSource>>;
};

export interface Slice {
  name: string;
  examples?: number;
  train?: number;
  validation: number;
}

export interface PredictionsRef {
  split: SplitName;
  /** Relative to the artifact's folder; must stay inside it. */
  path: string;
  /** How per-example `loss` aggregates to the split value (continuous metrics). Default `mean`. */
  aggregate?: 'mean' | 'rmse' | 'sum';
  /** 0-based repeat the predictions belong to. Default 0. */
  repeat?: number;
}

export type Hyperparameters = Record<string, unknown>;

/** A metric that must not get worse by more than `margin` (its own units). */
export interface Guardrail {
  metric: Metric;
  splits: { validation: Split; test?: Split };
  /** Non-inferiority margin: the largest acceptable worsening. */
  margin?: number;
}

/** What a run cost. Lists hold one value per repeat. All values > 0. */
export interface Cost {
  trainSeconds?: number[];
  inferenceMs?: number[];
  parameters?: number;
  memoryMb?: number;
}

export type CostField = keyof Cost;
export const COST_FIELDS: readonly CostField[] = [
  'trainSeconds',
  'inferenceMs',
  'parameters',
  'memoryMb',
];

export interface RunArtifact {
  format: 'fitgap-run/1';
  run: { name: string; commit?: string; createdAt?: string };
  metric: Metric;
  reference?: number;
  splits: {
    train: Split;
    validation: Split;
    train_dev?: Split;
    test?: Split;
  };
  hyperparameters?: Hyperparameters;
  curves?: Curves;
  slices?: Slice[];
  predictions?: PredictionsRef;
  guardrails?: Guardrail[];
  cost?: Cost;
}
