/**
 * Guardrail metrics and cost in the review model (codes and numbers only). A guardrail is a metric
 * that must not get worse by more than a margin; cost compares what the two runs took.
 */
import type { Interval, TestName } from '../stats/types.js';
import type { CostField, Goal, MetricKind } from './run.js';

export type NonInferiority = 'non-inferior' | 'inferior' | 'undetermined';

/** Where a guardrail's margin came from: the trusted config wins, then the baseline artifact. */
export type MarginSource = 'config' | 'baseline' | 'candidate';

/** Change of a guardrail, candidate − baseline, in the metric's own units and direction. */
export interface GuardrailChange {
  estimate: number;
  /** Two-sided 1 − alpha interval; null when noise is unknown. */
  ci: Interval | null;
  p: number | null;
  test: TestName;
  /** In the metric's direction: `better`/`worse` only when significant at alpha. */
  call: 'better' | 'worse' | 'flat' | 'undetermined';
}

export interface GuardrailReview {
  name: string;
  goal: Goal;
  kind: MetricKind;
  unit: string | null;
  /** Validation means over repeats; null for the side that lacks the guardrail. */
  baseline: number | null;
  candidate: number | null;
  change: GuardrailChange | null;
  margin: number | null;
  marginSource: MarginSource | null;
  /** One-sided (1 − alpha) bounds of the worsening (positive = worse), when tested. */
  worseningBounds: Interval | null;
  /** Holm-adjusted one-sided p of H0: worsening ≥ margin. */
  pNonInferior: number | null;
  /** null when there is no margin, or a run lacks the guardrail. */
  nonInferiority: NonInferiority | null;
  /** Codes for what kept the guardrail from a full review. */
  problems: GuardrailProblem[];
}

export type GuardrailProblem =
  | 'missing-in-baseline'
  | 'missing-in-candidate'
  | 'metric-differs'
  | 'noise-unknown'
  | 'no-margin'
  | 'candidate-margin-ignored';

export interface CostChange {
  field: CostField;
  /** Mean (geometric for per-repeat lists) of each run. */
  baseline: number;
  candidate: number;
  /** candidate / baseline. */
  ratio: number;
  /** 1 − alpha interval of the ratio; null with one repeat or a single figure. */
  ci: Interval | null;
  p: number | null;
  /**
   * `up`/`down` when the ratio differs from 1 beyond noise (any change for a single figure such as
   * parameters); `undetermined` for a per-repeat measurement taken once per run.
   */
  call: 'up' | 'down' | 'flat' | 'undetermined';
}
