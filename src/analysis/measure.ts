/**
 * A measure is a linear combination of split values in shortfall units (DESIGN.md §3):
 * a split mean, or an error component such as variance = s(validation) − s(train).
 * From a run it yields per-repeat values and, for one repeat of a proportion metric, a binomial
 * variance. Pure.
 */
import type { RunArtifact, SplitName } from '../model/run.js';
import { binomialVariance, mean } from '../stats/index.js';

export interface Term {
  split: SplitName;
  weight: number;
}

export interface Measure {
  terms: Term[];
  /** Added to every repeat (e.g. −s(reference)). */
  constant: number;
}

/** Shortfall sign: s(v) = v for minimize, −v for maximize. */
export function shortfallSign(run: RunArtifact): 1 | -1 {
  return run.metric.goal === 'minimize' ? 1 : -1;
}

export function splitMeasure(split: SplitName): Measure {
  return { terms: [{ split, weight: 1 }], constant: 0 };
}

/** The measure's value for each repeat, or null when a split it needs is missing. */
export function perRepeat(run: RunArtifact, measure: Measure): number[] | null {
  const sign = shortfallSign(run);
  const columns: { values: number[]; weight: number }[] = [];
  for (const term of measure.terms) {
    const split = run.splits[term.split];
    if (split === undefined) return null;
    columns.push({ values: split.values, weight: term.weight });
  }
  const repeats = run.splits.train.values.length;
  const out: number[] = [];
  for (let i = 0; i < repeats; i++) {
    let total = measure.constant;
    for (const column of columns) total += column.weight * sign * (column.values[i] ?? Number.NaN);
    out.push(total);
  }
  return out;
}

/**
 * Binomial variance of the measure's mean for a proportion metric whose every split involved
 * gives `examples`; null otherwise. Splits are independent samples (common practice).
 */
export function binomialMeasureVariance(run: RunArtifact, measure: Measure): number | null {
  if (run.metric.kind !== 'proportion') return null;
  let total = 0;
  for (const term of measure.terms) {
    const split = run.splits[term.split];
    if (split?.examples === undefined) return null;
    const repeats = split.values.length;
    // The mean over repeats of one split pools repeats × examples trials.
    total +=
      term.weight * term.weight * binomialVariance(mean(split.values), split.examples * repeats);
  }
  return total;
}
