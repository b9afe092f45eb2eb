/**
 * The review model: every number behind a fitgap review. Pure data; renderers (markdown, text,
 * JSON) are functions of it. Its JSON form is the report `fitgap-review/1` (DESIGN.md §8).
 */
import type { Goal, MetricKind, SplitName } from './run.js';
import type { Interval, TestName } from '../stats/types.js';
import type { CurvesReport } from './curves.js';

export type Call = 'up' | 'down' | 'flat';

/** A change candidate − baseline with its noise. Components are in shortfall units (up = worse). */
export interface Delta {
  estimate: number;
  ci: Interval | null;
  p: number | null;
  test: TestName;
  /** `up`/`down` only when significant at alpha and at least min-effect in size. */
  call: Call;
}

export type Movement =
  | 'better-on-both'
  | 'away-from-underfitting'
  | 'toward-overfitting'
  | 'away-from-overfitting'
  | 'no-significant-change'
  | 'toward-underfitting'
  | 'worse-on-both';

export type ValidationChange = 'better' | 'worse' | 'flat';

export type Diagnosis =
  'good-fit' | 'high-bias' | 'high-variance' | 'data-mismatch' | 'high-bias-and-variance';

export type ComponentName = 'bias' | 'variance' | 'mismatch' | 'overfit';

/** One error component of one run (DESIGN.md §3), in shortfall units of the metric. */
export interface Component {
  name: ComponentName;
  /** Mean over repeats; null when it cannot be computed (no reference, no train_dev, no test). */
  value: number | null;
  /** Why the value is null, in one sentence. */
  unavailable?: string;
  /** 1 − alpha interval of the value where its noise is known. */
  ci: Interval | null;
  /** One-sided p-value of value > 0, where its noise is known. */
  p: number | null;
  /** At least gap-tolerance × error level, at least min-effect, and significant where testable. */
  present: boolean;
}

export interface SplitSummary {
  split: SplitName;
  /** Mean over repeats, in metric units. */
  mean: number;
  /** Sample standard deviation over repeats (null with one repeat). */
  sd: number | null;
  repeats: number;
  examples: number | null;
  /** Interval of the mean: t over repeats, or Wilson for one proportion with examples. */
  ci: Interval | null;
}

export interface RunSummary {
  name: string;
  commit: string | null;
  createdAt: string | null;
  /** Reference level used (artifact, config override, or the 0 default); null when unknown. */
  reference: number | null;
  referenceSource: 'artifact' | 'config' | 'default' | 'unknown';
  splits: SplitSummary[];
  /** Validation error level e (DESIGN.md §6). */
  errorLevel: number;
  components: Record<ComponentName, Component>;
  diagnosis: Diagnosis;
  /** Bias could not be judged (no reference): the diagnosis rests on variance and mismatch only. */
  biasUnknown: boolean;
  warnings: string[];
  curves: CurvesReport;
}

export interface SplitChange {
  split: SplitName;
  baseline: number;
  candidate: number;
  /** Candidate − baseline in metric units (not shortfall). */
  delta: Delta;
}

export interface SliceChange {
  name: string;
  examples: number | null;
  baseline: number;
  candidate: number;
  /** Candidate − baseline validation value, metric units. */
  delta: Delta;
  /** Holm–Bonferroni adjusted p over all slices; null when untestable. */
  pAdjusted: number | null;
  /** worse / better / flat after adjustment. */
  change: ValidationChange;
  /** Regressed significantly while the aggregate validation improved. */
  hiddenRegression: boolean;
}

export interface HyperparameterChange {
  key: string;
  baseline: unknown;
  candidate: unknown;
  /** 'raised' / 'lowered' for numbers; 'changed', 'added', 'removed' otherwise. */
  kind: 'raised' | 'lowered' | 'changed' | 'added' | 'removed';
}

export type LeverId =
  | 'more-data'
  | 'fewer-features'
  | 'stronger-regularization'
  | 'smaller-model'
  | 'early-stopping'
  | 'more-features'
  | 'richer-features'
  | 'weaker-regularization'
  | 'bigger-model'
  | 'train-longer'
  | 'align-training-data'
  | 'bigger-validation-set'
  | 'add-repeats'
  | 'supply-reference';

export interface Lever {
  id: LeverId;
  /** One line, citing numbers. */
  reason: string;
  /** The facts behind the reason, one short line each. */
  evidence: string[];
}

export interface Gate {
  pass: boolean;
  /** One line per failed policy entry; empty when pass. */
  reasons: string[];
  /** The policy applied. */
  failOn: string[];
}

export interface ReviewSettings {
  alpha: number;
  minEffect: number;
  gapTolerance: number;
  failOn: string[];
}

export interface Review {
  format: 'fitgap-review/1';
  metric: { name: string; goal: Goal; kind: MetricKind };
  settings: ReviewSettings;
  movement: Movement;
  validation: { change: ValidationChange; delta: Delta };
  /** Change in avoidable bias; estimate null-free but test `none` when bias is unknown. */
  bias: { delta: Delta | null };
  variance: { delta: Delta };
  mismatch: { delta: Delta | null };
  overfit: { delta: Delta | null };
  splits: SplitChange[];
  baseline: RunSummary;
  candidate: RunSummary;
  slices: SliceChange[];
  hyperparameters: HyperparameterChange[];
  levers: Lever[];
  /** Shortening the training set does not cure high bias, said when relevant (common practice). */
  nonLevers: string[];
  gate: Gate;
  /** Plain statements about what could not be known and what to supply. */
  notes: string[];
  /** Paired-prediction evidence on the validation change, when both runs shipped predictions. */
  paired: {
    rows: number;
    test: TestName;
    discordant?: { baselineOnly: number; candidateOnly: number };
  } | null;
}

/** Summary of paired per-example predictions, computed by the streaming CSV reader. */
export interface PairedPredictions {
  kind: 'proportion' | 'continuous';
  /** Rows present in both files (paired by id). */
  rows: number;
  /** Proportion: baseline correct & candidate wrong. */
  baselineOnly?: number;
  /** Proportion: baseline wrong & candidate correct. */
  candidateOnly?: number;
  /** Continuous: mean and sample variance of (candidate loss − baseline loss). */
  meanDiff?: number;
  varDiff?: number;
  /** The split both prediction files are for. */
  split?: SplitName;
}
