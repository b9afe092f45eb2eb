/**
 * The few review fields the audit renderers read, gathered in one place so that a change of the
 * review model touches this file only. Pure.
 *
 * Read: metric.{name,goal,kind}, settings.alpha, movement, validation.{change,delta}, bias.delta.call,
 * variance.delta.call, gate.pass, and of baseline/candidate: splits[validation].{mean,ci},
 * errorLevel, components.{bias,variance}.value, diagnosis.
 */
import type { Call, Delta, Diagnosis, Movement, Review, RunSummary } from '../model/review.js';
import type { ValidationChange } from '../model/review.js';
import type { Interval } from '../stats/types.js';
import { numberFormatFor } from './format.js';

export interface RunFields {
  /** Mean validation value, metric units. */
  validation: number | null;
  validationCi: Interval | null;
  /** Validation error level (mean for a minimized metric, 1 − mean for a maximized one). */
  errorLevel: number;
  /** Avoidable bias and variance, shortfall units; null when unknown. */
  bias: number | null;
  variance: number | null;
  diagnosis: Diagnosis;
}

export interface ChangeFields {
  movement: Movement;
  validationChange: ValidationChange;
  validationDelta: Pick<Delta, 'estimate' | 'ci' | 'p' | 'call'>;
  biasCall: Call | null;
  varianceCall: Call;
  gatePass: boolean;
}

export interface ReviewFields {
  metric: { name: string; goal: 'minimize' | 'maximize'; kind: 'proportion' | 'continuous' };
  alpha: number;
  /** Decimals the review's own renderers would use for metric values. */
  decimals: number;
  baseline: RunFields;
  candidate: RunFields;
  change: ChangeFields;
}

function runFields(run: RunSummary): RunFields {
  const validation = run.splits.find((s) => s.split === 'validation');
  return {
    validation: validation?.mean ?? null,
    validationCi: validation?.ci ?? null,
    errorLevel: run.errorLevel,
    bias: run.components.bias.value,
    variance: run.components.variance.value,
    diagnosis: run.diagnosis,
  };
}

export function reviewFields(review: Review): ReviewFields {
  const delta = review.validation.delta;
  return {
    metric: { name: review.metric.name, goal: review.metric.goal, kind: review.metric.kind },
    alpha: review.settings.alpha,
    decimals: numberFormatFor(review).decimals,
    baseline: runFields(review.baseline),
    candidate: runFields(review.candidate),
    change: {
      movement: review.movement,
      validationChange: review.validation.change,
      validationDelta: { estimate: delta.estimate, ci: delta.ci, p: delta.p, call: delta.call },
      biasCall: review.bias.delta?.call ?? null,
      varianceCall: review.variance.delta.call,
      gatePass: review.gate.pass,
    },
  };
}
