/**
 * Curves are analysed as *errors* (lower is better); values arrive in metric units. The
 * convention, for every curve of one run:
 * - goal `minimize`: error = value.
 * - goal `maximize`, and the metric's best value is 1 (every `proportion`, and a `continuous` metric
 *   whose values are all ≤ 1, such as R² or AUC; DESIGN.md §6): error = 1 − value.
 * - goal `maximize` otherwise (a continuous value above 1 was seen): error = −value.
 * Bounds of the error, used for the power-law asymptote c and to clip intervals:
 * - proportion: [0, 1];
 * - continuous with error = 1 − value: [0, ∞) (the value cannot exceed its best, 1);
 * - continuous minimized: [0, ∞) when every value is ≥ 0 (a non-negative loss, the usual case),
 *   unbounded otherwise; continuous negated: unbounded.
 */
import type { Goal, MetricKind } from '../../model/run.js';

export interface ErrorScale {
  convention: 'identity' | 'one-minus' | 'negate';
  toError(value: number): number;
  fromError(error: number): number;
  /** Lowest and highest possible error. */
  lower: number;
  upper: number;
}

/** `range`: the smallest and largest value seen on the run's curves (train and validation). */
export function errorScale(
  context: { kind: MetricKind; goal: Goal },
  range: { min: number; max: number },
): ErrorScale {
  const proportion = context.kind === 'proportion';
  if (context.goal === 'minimize') {
    const nonNegative = range.min >= 0;
    return {
      convention: 'identity',
      toError: (v) => v,
      fromError: (e) => e,
      lower: proportion || nonNegative ? 0 : -Infinity,
      upper: proportion ? 1 : Infinity,
    };
  }
  if (proportion || range.max <= 1) {
    return {
      convention: 'one-minus',
      toError: (v) => 1 - v,
      fromError: (e) => 1 - e,
      lower: 0,
      upper: proportion ? 1 : Infinity,
    };
  }
  return {
    convention: 'negate',
    toError: (v) => -v,
    fromError: (e) => -e,
    lower: -Infinity,
    upper: Infinity,
  };
}
