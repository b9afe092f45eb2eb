/**
 * A measure is a linear combination of split values in shortfall units (DESIGN.md §3):
 * a split mean, or an error component such as variance = s(validation) − s(train).
 * From a run it yields per-repeat values and, for one repeat of a proportion metric, a binomial
 * variance. Pure.
 */
import type { RunArtifact, SplitName } from '../model/run.js';
import {
  binomialSamplingVariance,
  mean,
  satterthwaite,
  type EvaluationRows,
  type SamplingVariance,
} from '../stats/index.js';

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

/** The measure's splits with their weights, or null when a split it needs is missing. */
function columnsOf(
  run: RunArtifact,
  measure: Measure,
): { values: number[]; weight: number }[] | null {
  const columns: { values: number[]; weight: number }[] = [];
  for (const term of measure.terms) {
    const split = run.splits[term.split];
    if (split === undefined) return null;
    columns.push({ values: split.values, weight: term.weight });
  }
  return columns;
}

/** The measure's value for each repeat, or null when a split it needs is missing. */
export function perRepeat(run: RunArtifact, measure: Measure): number[] | null {
  const sign = shortfallSign(run);
  const columns = columnsOf(run, measure);
  if (columns === null) return null;
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
 * The largest |constant| + Σ |weight · value| over the repeats: the size of the numbers a
 * per-repeat value is computed from, which sets its floating-point round-off (an error component
 * such as validation − train can be far smaller than its operands). Null as `perRepeat`.
 */
export function perRepeatMagnitude(run: RunArtifact, measure: Measure): number | null {
  const columns = columnsOf(run, measure);
  if (columns === null) return null;
  let largest = 0;
  const repeats = run.splits.train.values.length;
  for (let i = 0; i < repeats; i++) {
    let total = Math.abs(measure.constant);
    for (const column of columns) total += Math.abs(column.weight * (column.values[i] ?? 0));
    if (total > largest) largest = total;
  }
  return largest;
}

/** σ² of one repeat's value of a split from its per-example values (predictions), by split. */
export type ExampleNoise = Partial<Record<SplitName, SamplingVariance>>;

/**
 * σ² of one repeat of a split, from the evaluation set: binomial p(1 − p)/N for a proportion with
 * `examples` (Agresti–Coull adjusted at 0 or 1), else from per-example values when given; null when
 * it cannot be known.
 */
export function splitSampling(
  run: RunArtifact,
  split: SplitName,
  examples: ExampleNoise = {},
): SamplingVariance | null {
  const s = run.splits[split];
  if (s === undefined) return null;
  if (run.metric.kind === 'proportion' && s.examples !== undefined) {
    // A rate over N examples is a count over N: round to it (so 1e-300 is 0, not noiseless).
    const rate = Math.round(Math.min(1, Math.max(0, mean(s.values))) * s.examples) / s.examples;
    return binomialSamplingVariance(rate, s.examples);
  }
  return examples[split] ?? null;
}

/**
 * σ² of one repeat of the measure: Σ w² σ²(split) over its terms (splits are independent samples;
 * common practice), df by Welch–Satterthwaite; null when any term's σ² is unknown. The rows are
 * `per-repeat` only when every term's are.
 */
export function measureSampling(
  run: RunArtifact,
  measure: Measure,
  examples: ExampleNoise = {},
): { sampling: SamplingVariance | null; rows: EvaluationRows } {
  const parts: { variance: number; df: number }[] = [];
  let perRepeatRows = true;
  let known = true;
  let source: SamplingVariance['source'] = 'binomial';
  for (const term of measure.terms) {
    const split = run.splits[term.split];
    if ((split?.evaluationRows ?? 'fixed') !== 'per-repeat') perRepeatRows = false;
    const s = splitSampling(run, term.split, examples);
    if (s === null || !(s.variance > 0)) {
      known = false;
      continue;
    }
    if (s.source === 'per-example') source = 'per-example';
    parts.push({ variance: term.weight * term.weight * s.variance, df: s.df });
  }
  const rows: EvaluationRows = perRepeatRows ? 'per-repeat' : 'fixed';
  if (!known || parts.length === 0) return { sampling: null, rows };
  const variance = parts.reduce((a, p) => a + p.variance, 0);
  return { sampling: { variance, df: satterthwaite(parts), source }, rows };
}
