/* Generated from schema/fitgap-review-1.schema.json by scripts/review-types.mjs: do not edit; run `npm run schema:types`. */

/**
 * An outcome the gate can fail on (`fail-on`). A cost outcome `FIELD-ratio>X` (`train-seconds`, `inference-ms`, `parameters`, `memory-mb`) fires when candidate / baseline of that cost exceeds X.
 */
export type FailOn =
  | (
      | 'worse-validation'
      | 'toward-overfitting'
      | 'toward-underfitting'
      | 'worse-on-both'
      | 'any-movement'
      | 'slice-regression'
      | 'high-bias'
      | 'high-variance'
      | 'data-mismatch'
      | 'validation-overfit'
      | 'guardrail-regression'
      | 'guardrail-undetermined'
      | 'none'
    )
  | string;
/**
 * How the change moved the model in the bias/variance plane, from the calls on Δbias and Δvariance. `undetermined` when either call is undetermined.
 */
export type Movement =
  | 'better-on-both'
  | 'away-from-underfitting'
  | 'toward-overfitting'
  | 'away-from-overfitting'
  | 'no-significant-change'
  | 'toward-underfitting'
  | 'worse-on-both'
  | 'undetermined';
/**
 * Validation better, worse, flat (within noise or below min-effect), or undetermined (its noise cannot be known).
 */
export type ValidationChange = 'better' | 'worse' | 'flat' | 'undetermined';
/**
 * A two-sided interval [low, high].
 *
 * @minItems 2
 * @maxItems 2
 */
export type Interval = [number, number];
/**
 * The significance test behind a change (DESIGN.md §4); `newcombe-score` is Newcombe's (1998) hybrid score interval for a difference of two proportions, its p inverting the interval; `none` when the noise is unknown.
 */
export type TestName =
  'welch-t' | 'z-binomial' | 'mcnemar-exact' | 'paired-t' | 'newcombe-score' | 'none';
/**
 * A change called on its estimate: `up`/`down` only when significant at alpha and at least min-effect in size; `flat` when its noise is known and it is not; `undetermined` when its noise cannot be known (one repeat or a zero spread of a continuous metric without per-example values).
 */
export type Call = 'up' | 'down' | 'flat' | 'undetermined';
/**
 * A split, named as in the run artifact.
 */
export type SplitName = 'train' | 'train_dev' | 'validation' | 'test';
/**
 * An error component (DESIGN.md §3).
 */
export type ComponentName = 'bias' | 'variance' | 'mismatch' | 'overfit';
/**
 * Why a component has no value: no reference level, no train_dev split, or no test split.
 */
export type UnavailableCode = 'no-reference' | 'no-train-dev' | 'no-test';
/**
 * The largest present error component of a run (DESIGN.md §6).
 */
export type Diagnosis =
  'good-fit' | 'high-bias' | 'high-variance' | 'data-mismatch' | 'high-bias-and-variance';
/**
 * What a hyperparameter controls (README 'Hyperparameter vocabulary').
 */
export type KnobRole =
  | 'regularization'
  | 'capacity'
  | 'features'
  | 'polynomial-degree'
  | 'data-size'
  | 'epochs'
  | 'early-stopping-patience'
  | 'learning-rate'
  | 'inert';
/**
 * What a hyperparameter change does to the model, given its role and direction.
 */
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
 * A lever: what to try next.
 */
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
  | 'supply-reference'
  | 'repeat-with-seeds';
/**
 * One fact behind a lever.
 */
export type LeverEvidenceItem =
  | DiagnosisEvidence
  | PrChangeEvidence
  | ComponentChangeEvidence
  | AlreadyPulledEvidence
  | SweepMinimumEvidence
  | LearningProjectionEvidence
  | GapTrendEvidence
  | EpochMinimumEvidence
  | StillImprovingEvidence
  | EpochCurveSilentEvidence
  | ReferenceMissingEvidence
  | NoiseUnknownEvidence
  | ChangeUndeterminedEvidence
  | CheaperThanEvidence;
/**
 * Something the reviewer should know about the inputs or the method.
 */
export type Note =
  | TrainDevInOneRunNote
  | UnpairedSlicesNote
  | HiddenRegressionsNote
  | NoiseUnknownNote
  | BiasUnknownNote
  | PredictionsShareNoIdNote
  | PredictionsInOneRunNote
  | PredictionsSplitMismatchNote
  | PredictionsUnmatchedNote
  | EpochLogNotUsedNote
  | EpochLogMissingNote
  | ReferenceFromOneRunNote
  | ReferencesDifferNote
  | NoiseFromEvaluationSetNote
  | PredictionsPartialOverlapNote
  | RepeatsDecidedNote
  | UnmappedHyperparametersNote;
/**
 * What kept a guardrail from a full review.
 */
export type GuardrailProblem =
  | 'missing-in-baseline'
  | 'missing-in-candidate'
  | 'metric-differs'
  | 'noise-unknown'
  | 'no-margin'
  | 'candidate-margin-ignored';

/**
 * A fitgap review, format fitgap-review/1: codes, numbers and artifact strings (no sentences; the report writes those).
 */
export interface Review {
  format: 'fitgap-review/1';
  metric: {
    name: string;
    goal: 'minimize' | 'maximize';
    kind: 'proportion' | 'continuous';
    best?: number;
    unit?: string;
  };
  settings: ReviewSettings;
  movement: Movement;
  validation: {
    change: ValidationChange;
    delta: MetricDelta;
    /**
     * Present when the validation change is flat or undetermined; null when the noise is unknown.
     */
    mde?: MinimumDetectableEffect | null;
    repeatsNeeded?: RepeatsNeeded;
  };
  /**
   * Change in avoidable bias; null when neither run's training error can be measured.
   */
  bias: {
    delta: ShortfallDelta | null;
  };
  variance: {
    delta: ShortfallDelta;
  };
  mismatch: {
    delta: ShortfallDelta | null;
  };
  overfit: {
    delta: ShortfallDelta | null;
  };
  splits: SplitChange[];
  baseline: RunSummary;
  candidate: RunSummary;
  slices: SliceChange[];
  hyperparameters: HyperparameterChange[];
  levers: Lever[];
  /**
   * `smaller-training-set`: shrinking the training set does not cure high bias.
   */
  nonLevers: 'smaller-training-set'[];
  gate: Gate;
  notes: Note[];
  paired: PairedSummary | null;
  /**
   * Guardrail metrics of either run, candidate's order first. Absent in reports of runs without guardrails.
   */
  guardrails?: GuardrailReview[];
  /**
   * Cost figures that both runs give, by field. Absent when neither run gives cost.
   */
  cost?: {
    trainSeconds?: CostChange;
    inferenceMs?: CostChange;
    parameters?: CostChange;
    memoryMb?: CostChange;
  };
}
/**
 * The settings the review was made with.
 */
export interface ReviewSettings {
  alpha: number;
  minEffect: number;
  gapTolerance: number;
  failOn: FailOn[];
}
/**
 * A change candidate − baseline in the metric's own units (for a maximized metric, up is better).
 */
export interface MetricDelta {
  /**
   * The unit of estimate and ci.
   */
  unit: 'metric';
  /**
   * Candidate − baseline.
   */
  estimate: number;
  /**
   * 1 − alpha interval of the estimate; null when its noise is unknown.
   */
  ci: Interval | null;
  /**
   * Two-sided p-value; null when its noise is unknown.
   */
  p: number | null;
  test: TestName;
  call: Call;
}
/**
 * The smallest |candidate − baseline| of the validation value (metric units) this design detects with 80% power at the two-sided alpha; `atLeast` when a noise component could not be estimated (the true value is larger). `method`: `welch-noncentral-t` (noncentral t at the Welch–Satterthwaite df; Cohen 1988), `normal` (df ∞: binomial noise alone), `fleiss-two-proportions` (Fleiss, Levin & Paik 2003), `mcnemar-connor` (Connor 1987), `paired-t`.
 */
export interface MinimumDetectableEffect {
  value: number;
  method:
    'welch-noncentral-t' | 'normal' | 'fleiss-two-proportions' | 'mcnemar-connor' | 'paired-t';
  atLeast: boolean;
}
/**
 * Present when the validation change is flat or undetermined.
 */
export interface RepeatsNeeded {
  repeats: number | null;
  lowerBound: boolean;
  reason: 'no-change' | 'noise-unknown' | 'fixed-noise' | 'beyond-limit' | null;
}
/**
 * A change candidate − baseline in shortfall units: the metric's units signed so that up is always worse.
 */
export interface ShortfallDelta {
  /**
   * The unit of estimate and ci.
   */
  unit: 'shortfall';
  /**
   * Candidate − baseline.
   */
  estimate: number;
  /**
   * 1 − alpha interval of the estimate; null when its noise is unknown.
   */
  ci: Interval | null;
  /**
   * Two-sided p-value; null when its noise is unknown.
   */
  p: number | null;
  test: TestName;
  call: Call;
}
export interface SplitChange {
  split: SplitName;
  baseline: number;
  candidate: number;
  delta: MetricDelta;
}
/**
 * One run: its splits, error components, diagnosis and curve evidence.
 */
export interface RunSummary {
  name: string;
  commit: string | null;
  createdAt: string | null;
  /**
   * Reference level used; null when unknown.
   */
  reference: number | null;
  /**
   * Where the reference came from: this run's artifact, the other run's artifact (the reference is a property of the task: one level for both runs), the config, the default, or unknown.
   */
  referenceSource: 'artifact' | 'other-run' | 'config' | 'default' | 'unknown';
  splits: SplitSummary[];
  /**
   * Validation error level e (DESIGN.md §6).
   */
  errorLevel: number;
  components: {
    bias: Component;
    variance: Component;
    mismatch: Component;
    overfit: Component;
  };
  diagnosis: Diagnosis;
  /**
   * No reference level: the diagnosis rests on variance and mismatch only.
   */
  biasUnknown: boolean;
  /**
   * `validation-overfit`: test error well above validation error. `below-reference`: training error significantly below the reference level (negative avoidable bias): memorising noise, or a wrong reference.
   */
  warnings: ('validation-overfit' | 'below-reference')[];
  curves: CurvesReport;
}
/**
 * One split of one run, in metric units.
 */
export interface SplitSummary {
  split: SplitName;
  /**
   * Mean over repeats.
   */
  mean: number;
  /**
   * Sample standard deviation over repeats (null with one repeat).
   */
  sd: number | null;
  repeats: number;
  examples: number | null;
  /**
   * Interval of the mean: t over repeats, or Wilson for one proportion with examples.
   */
  ci: Interval | null;
}
/**
 * One error component of one run, in shortfall units.
 */
export interface Component {
  name: ComponentName;
  /**
   * Mean over repeats; null when it cannot be computed (see unavailable).
   */
  value: number | null;
  unavailable?: UnavailableCode;
  /**
   * 1 − alpha interval of the value where its noise is known.
   */
  ci: Interval | null;
  /**
   * One-sided p-value of value > 0, where its noise is known.
   */
  p: number | null;
  /**
   * At least gap-tolerance × error level, at least min-effect, and significant where testable.
   */
  present: boolean;
}
/**
 * Curve evidence of one run; each member only where the artifact has that curve.
 */
export interface CurvesReport {
  epochs?: EpochsEvidence | CurveSkipped;
  training_examples?: LearningCurveEvidence | CurveSkipped;
  regularization?: RegularizationEvidence | CurveSkipped;
}
/**
 * Early-stopping evidence from the epoch curve (Prechelt 1998).
 */
export interface EpochsEvidence {
  /**
   * x of the lowest validation error.
   */
  bestX: number;
  bestValidation: number;
  finalX: number;
  finalValidation: number;
  /**
   * Generalization loss at the last point, in percent; null when the best validation error is exactly 0.
   */
  gl: number | null;
  /**
   * Progress quotient GL/P_5 at the last strip end; null without train values.
   */
  pq: number | null;
  /**
   * The run ends past the validation minimum with GL > 5.
   */
  stoppedLate: boolean;
  /**
   * Train and validation both still falling at the end (needs train values).
   */
  stoppedEarly: boolean;
  /**
   * x at which each of Prechelt's criteria would have stopped the run; null when it never fired.
   */
  stopsAt?: {
    [k: string]: number | null;
  };
  /**
   * Chart-ready downsampled points (LTTB).
   */
  chart: ChartPoint[];
}
/**
 * A curve point kept for charts (metric units).
 */
export interface ChartPoint {
  x: number;
  train?: number;
  validation: number;
}
/**
 * A curve that was not analysed: too few points, or the power-law fit failed.
 */
export interface CurveSkipped {
  skipped: 'too-few-points' | 'fit-failed';
  /**
   * Points the curve has.
   */
  points: number;
  /**
   * Points the analysis needs.
   */
  needs: number;
}
/**
 * Power-law fit error(m) = a·m^(−b) + c of validation error against training examples; a, b, c and residual in error units, projections in metric units.
 */
export interface LearningCurveEvidence {
  a: number;
  b: number;
  c: number;
  r2: number;
  residual: number;
  projections: LearningCurveProjection[];
  /**
   * Train/validation gap at the right end.
   */
  gapTrend: 'closing' | 'flat' | 'unknown';
  gapChangePerDoubling?: number | null;
  /**
   * c in metric units: the level more data approaches.
   */
  asymptote?: number;
  /**
   * Chart-ready downsampled points (LTTB).
   */
  chart: ChartPoint[];
}
export interface LearningCurveProjection {
  x: number;
  validation: number;
  ci: Interval;
}
/**
 * Where the regularization sweep has its validation minimum, and where the run's own strength sits.
 */
export interface RegularizationEvidence {
  bestX: number;
  bestValidation: number;
  side: 'below' | 'above' | 'at' | 'unknown';
  suggestedX: number;
  atEdge: 'low' | 'high' | null;
  refined?: boolean;
  /**
   * Chart-ready downsampled points (LTTB).
   */
  chart: ChartPoint[];
}
/**
 * Validation change of one slice, metric units.
 */
export interface SliceChange {
  name: string;
  examples: number | null;
  baseline: number;
  candidate: number;
  delta: MetricDelta;
  /**
   * Holm–Bonferroni adjusted p over all slices; null when untestable.
   */
  pAdjusted: number | null;
  change: ValidationChange;
  /**
   * Regressed significantly while the aggregate validation improved.
   */
  hiddenRegression: boolean;
}
export interface HyperparameterChange {
  key: string;
  /**
   * Any JSON value (null when added).
   */
  baseline: unknown;
  /**
   * Any JSON value (null when removed).
   */
  candidate: unknown;
  kind: 'raised' | 'lowered' | 'changed' | 'added' | 'removed';
  /**
   * The knob's role; null when fitgap does not know it (origin unknown or ambiguous).
   */
  role?: KnobRole | null;
  /**
   * Raising the value lowers the role (scikit-learn's C).
   */
  inverse?: boolean;
  /**
   * Where the role came from.
   */
  origin?: 'built-in' | 'config' | 'ambiguous' | 'unknown';
  /**
   * The change's effect on the model; null when not a known raise or cut.
   */
  effect?: ChangeEffect | null;
  /**
   * candidate / baseline of the compared values, when both are finite and positive.
   */
  ratio?: number;
  /**
   * Layer sizes compared by their total units.
   */
  totalUnits?: boolean;
  /**
   * Which side means 'no limit' (max_depth None).
   */
  unlimited?: 'baseline' | 'candidate';
}
/**
 * What to try next, ranked by score.
 */
export interface Lever {
  id: LeverId;
  /**
   * Rank key, higher first (see src/analysis/levers/scores.ts).
   */
  score: number;
  suggestion?: Suggestion;
  evidence: LeverEvidenceItem[];
}
/**
 * A value to try.
 */
export interface Suggestion {
  hyperparameter: string;
  value: number;
  /**
   * Where the value comes from: between the baseline and candidate values, the baseline value itself (nothing worth typing lies between), a finite limit for a knob the PR set to 'no limit', the sweep's minimum, or one grid step beyond the sweep's end.
   */
  basis:
    | 'between-old-and-new'
    | 'back-to-baseline'
    | 'finite-limit'
    | 'sweep-minimum'
    | 'beyond-sweep-edge';
  /**
   * The value is the total hidden units of a layer-size list.
   */
  totalUnits?: boolean;
}
/**
 * A present error component of the candidate, with its size and the validation error level (both shortfall units).
 */
export interface DiagnosisEvidence {
  kind: 'diagnosis';
  component: ComponentName;
  value: number;
  errorLevel: number;
}
/**
 * The PR changed a hyperparameter the way the model moved: this lever undoes or counters it.
 */
export interface PrChangeEvidence {
  kind: 'pr-change';
  hyperparameter: string;
  /**
   * Baseline value (total units for layer sizes); null = no limit.
   */
  from: number | null;
  /**
   * Candidate value; null = no limit.
   */
  to: number | null;
  direction: 'raised' | 'lowered';
  role: KnobRole;
  effect: ChangeEffect;
  /**
   * Values are total units of layer sizes.
   */
  totalUnits?: boolean;
}
/**
 * How a component changed between the runs.
 */
export interface ComponentChangeEvidence {
  kind: 'component-change';
  component: 'bias' | 'variance';
  delta: ShortfallDelta;
}
/**
 * The PR itself already pulled this lever: judge its effect before pulling further.
 */
export interface AlreadyPulledEvidence {
  kind: 'already-pulled';
  hyperparameter: string;
  from: number;
  to: number;
  direction: 'raised' | 'lowered';
}
/**
 * The candidate's regularization sweep: its validation minimum and the strength the candidate uses.
 */
export interface SweepMinimumEvidence {
  kind: 'sweep-minimum';
  /**
   * The candidate's regularization hyperparameter, when it has one.
   */
  hyperparameter: string | null;
  bestX: number;
  /**
   * Lowest validation value of the sweep, metric units.
   */
  bestValidation: number;
  /**
   * The candidate's own strength.
   */
  current: number | null;
  suggestedX: number;
  /**
   * Where the candidate's own strength sits relative to the minimum.
   */
  side: 'below' | 'above' | 'at' | 'unknown';
  /**
   * true: the minimum lies on this lever's side; false: it does not (other side, or the candidate is at it); null: not known.
   */
  supports: boolean | null;
  atEdge: 'low' | 'high' | null;
}
/**
 * The power-law projection of validation at more training examples (metric units).
 */
export interface LearningProjectionEvidence {
  kind: 'learning-curve';
  /**
   * Largest training-set size on the curve.
   */
  fromX: number;
  atX: number;
  /**
   * Candidate's validation mean.
   */
  current: number;
  projected: number;
  ci: Interval;
  r2: number;
  /**
   * The projection's interval includes today's validation value: more data is unlikely to help measurably.
   */
  includesToday: boolean;
}
/**
 * The train/validation gap at the right end of the learning curve.
 */
export interface GapTrendEvidence {
  kind: 'gap-trend';
  trend: 'closing' | 'flat';
}
/**
 * The epoch curve passed its validation minimum.
 */
export interface EpochMinimumEvidence {
  kind: 'epoch-minimum';
  epoch: number;
  of: number;
  /**
   * Validation error saved by stopping at the minimum, shortfall units.
   */
  saves: number;
  /**
   * Generalization loss at the end, percent.
   */
  gl: number | null;
}
/**
 * Train and validation were both still improving at the last epoch.
 */
export interface StillImprovingEvidence {
  kind: 'still-improving';
  epoch: number;
}
/**
 * The epoch curve does not confirm this lever (or there is none).
 */
export interface EpochCurveSilentEvidence {
  kind: 'epoch-curve-silent';
  /**
   * Whether the candidate has an epoch curve.
   */
  curve: boolean;
}
/**
 * No reference level, so avoidable bias is unknown.
 */
export interface ReferenceMissingEvidence {
  kind: 'reference-missing';
}
/**
 * Run-to-run noise is unknown (one repeat of a continuous metric, no paired predictions).
 */
export interface NoiseUnknownEvidence {
  kind: 'noise-unknown';
}
/**
 * The validation change could not be called either way at this noise: repeat both runs with more seeds before acting on any other lever.
 */
export interface ChangeUndeterminedEvidence {
  kind: 'change-undetermined';
  /**
   * Repeats per run needed to detect the minimum effect; null when not known.
   */
  repeatsNeeded: number | null;
}
/**
 * The evidence ranks this lever and `over` alike; this one comes first because it costs less training (`training`: `less` or `same` time and size, against `more` for `over`).
 */
export interface CheaperThanEvidence {
  kind: 'cheaper-than';
  over: LeverId;
  training: 'less' | 'same';
}
export interface Gate {
  pass: boolean;
  reasons: GateReason[];
  failOn: FailOn[];
}
/**
 * A fail-on outcome that fired.
 */
export interface GateReason {
  outcome: FailOn;
  /**
   * Slices that regressed (slice-regression).
   */
  slices?: number;
  /**
   * Guardrails that fired (guardrail-regression, guardrail-undetermined).
   */
  guardrails?: string[];
  /**
   * The cost ratio that exceeded its limit (FIELD-ratio>X).
   */
  ratio?: number;
}
/**
 * Only one run has a train_dev split: the variance change is measured as validation − train in both.
 */
export interface TrainDevInOneRunNote {
  code: 'train-dev-in-one-run';
}
/**
 * Slices found in one run only, not compared.
 */
export interface UnpairedSlicesNote {
  code: 'unpaired-slices';
  count: number;
  /**
   * The first few names (at most 5).
   */
  names: string[];
}
/**
 * Validation improved, yet slices regressed significantly (Holm-adjusted).
 */
export interface HiddenRegressionsNote {
  code: 'hidden-regressions';
  count: number;
  /**
   * The first few names (at most 5).
   */
  names: string[];
}
/**
 * Run-to-run noise is unknown: changes are called on size alone (min-effect), or not at all when min-effect is 0.
 */
export interface NoiseUnknownNote {
  code: 'noise-unknown';
}
/**
 * No reference level: avoidable bias is unknown; its change is measured from the training error.
 */
export interface BiasUnknownNote {
  code: 'bias-unknown';
}
/**
 * The two predictions files share no id: no paired test.
 */
export interface PredictionsShareNoIdNote {
  code: 'predictions-share-no-id';
}
/**
 * Only one run ships per-example predictions: no paired test.
 */
export interface PredictionsInOneRunNote {
  code: 'predictions-in-one-run';
}
/**
 * The predictions are for different splits: no paired test.
 */
export interface PredictionsSplitMismatchNote {
  code: 'predictions-split-mismatch';
  baseline: SplitName;
  candidate: SplitName;
}
/**
 * Prediction rows without a partner, left out of the paired test.
 */
export interface PredictionsUnmatchedNote {
  code: 'predictions-unmatched';
  rows: number;
  baseline: number;
  candidate: number;
}
/**
 * The artifact has its own epoch curve; the configured epoch log was not used.
 */
export interface EpochLogNotUsedNote {
  code: 'epoch-log-not-used';
  file: string;
  log: string;
}
/**
 * No epoch log next to the artifact; the config's epoch-log mapping was not applied.
 */
export interface EpochLogMissingNote {
  code: 'epoch-log-missing';
  file: string;
  log: string;
}
/**
 * Only one artifact states a reference: it is used for both runs (the reference is a property of the task).
 */
export interface ReferenceFromOneRunNote {
  code: 'reference-from-one-run';
  from: 'baseline' | 'candidate';
  value: number;
}
/**
 * The two artifacts state different references: the candidate's is used for both runs, so Δbias equals the change of training shortfall.
 */
export interface ReferencesDifferNote {
  code: 'references-differ';
  baseline: number;
  candidate: number;
}
/**
 * At least one run's validation noise includes the evaluation set's sampling noise (binomial or per-example), which the seed spread does not hold on fixed rows.
 */
export interface NoiseFromEvaluationSetNote {
  code: 'noise-from-evaluation-set';
  source: 'binomial' | 'per-example';
}
/**
 * The predictions files' ids only partly match: no paired test; the unpaired test decided.
 */
export interface PredictionsPartialOverlapNote {
  code: 'predictions-partial-overlap';
  shared: number;
  baseline: number;
  candidate: number;
}
/**
 * Both runs have at least 2 repeats: Welch's test over repeats decided, since it holds the seed noise that a paired test over one repeat's rows leaves out; the predictions were not used for the test.
 */
export interface RepeatsDecidedNote {
  code: 'repeats-decided';
}
/**
 * Hyperparameters the PR changed whose role fitgap does not know (or that mean different things in different libraries): map them in the config's `hyperparameters`.
 */
export interface UnmappedHyperparametersNote {
  code: 'unmapped-hyperparameters';
  count: number;
  /**
   * The first few (at most 5) of them.
   */
  changes: {
    key: string;
    ambiguous: boolean;
    /**
     * Any JSON value (null when added).
     */
    baseline: unknown;
    /**
     * Any JSON value (null when removed).
     */
    candidate: unknown;
  }[];
}
/**
 * Paired-prediction evidence on the validation change. `test` names the paired test only when it decided the change; null otherwise (with `reason`).
 */
export interface PairedSummary {
  rows: number;
  test: 'mcnemar-exact' | 'paired-t' | null;
  discordant?: {
    baselineOnly: number;
    candidateOnly: number;
  };
  /**
   * Why the paired test did not decide: `repeats` (both runs have ≥ 2 repeats; Welch decided), `partial-overlap` (ids only partly match), `no-shared-id`.
   */
  reason?: 'repeats' | 'partial-overlap' | 'no-shared-id' | null;
}
/**
 * One guardrail metric: its change and its non-inferiority call against the margin (confidence-interval approach, ICH E9 §3.3.2; Holm across guardrails).
 */
export interface GuardrailReview {
  name: string;
  goal: 'minimize' | 'maximize';
  kind: 'proportion' | 'continuous';
  unit: string | null;
  baseline: number | null;
  candidate: number | null;
  change: GuardrailChange | null;
  margin: number | null;
  marginSource: ('config' | 'baseline' | 'candidate') | null;
  worseningBounds: Interval | null;
  pNonInferior: number | null;
  nonInferiority: ('non-inferior' | 'inferior' | 'undetermined') | null;
  problems: GuardrailProblem[];
}
/**
 * Change of a guardrail, candidate − baseline, in the metric's own units; the call is in the metric's direction.
 */
export interface GuardrailChange {
  estimate: number;
  ci: Interval | null;
  p: number | null;
  test: TestName;
  call: 'better' | 'worse' | 'flat' | 'undetermined';
}
/**
 * A cost figure of both runs: candidate / baseline with its interval (Welch on logarithms) where per-repeat values allow.
 */
export interface CostChange {
  baseline: number;
  candidate: number;
  ratio: number;
  ci: Interval | null;
  p: number | null;
  call: 'up' | 'down' | 'flat' | 'undetermined';
}
