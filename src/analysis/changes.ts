/**
 * The changes candidate − baseline: every split (metric units; the predictions split may use the
 * paired test) and every error component (shortfall units). Pure.
 */
import type { RunArtifact, SplitName } from '../model/run.js';
import { SPLIT_NAMES } from '../model/run.js';
import { mcnemarExact, pairedT } from '../stats/index.js';
import type { TestResult } from '../stats/types.js';
import { componentMeasures } from './decompose.js';
import { shortfallSign, splitMeasure, type Measure } from './measure.js';
import {
  measureChange,
  toMetricDelta,
  toMetricUnits,
  toShortfallDelta,
  type CallSettings,
  type RunsExampleNoise,
} from './noise.js';
import { bestOf } from './decompose.js';
import type {
  PairedPredictions,
  RunSummary,
  ShortfallDelta,
  SplitChange,
} from '../model/review.js';

export interface Runs {
  baseline: RunArtifact;
  candidate: RunArtifact;
}

function both(measure: Measure): { baseline: Measure; candidate: Measure } {
  return { baseline: measure, candidate: measure };
}

/**
 * Metric shortfall per unit of mean per-example loss, at the baseline (continuous metrics):
 * d(aggregate)/d(mean) — 1 for `mean`, N for `sum`, 1/(2√m) for `rmse` (delta method, common
 * practice) — and, for a maximized metric, × (best − value)/aggregate: its shortfall is taken as
 * proportional to the aggregated loss (1 − R² = MSE/Var y). Null when it cannot be formed.
 */
export function lossScale(paired: PairedPredictions, run: RunArtifact): number | null {
  const side = paired.sides?.baseline;
  if (side === undefined || !(side.mean > 0) || side.n < 1) return null;
  const aggregate = paired.aggregate ?? 'mean';
  const m = side.mean;
  const agg = aggregate === 'mean' ? m : aggregate === 'sum' ? side.n * m : Math.sqrt(m);
  const slope = aggregate === 'mean' ? 1 : aggregate === 'sum' ? side.n : 1 / (2 * Math.sqrt(m));
  if (run.metric.goal === 'minimize') return slope;
  const split = run.splits[paired.split ?? 'validation'];
  const value = split?.values[paired.repeat ?? 0];
  if (value === undefined) return null;
  const shortfall = bestOf(run) - value;
  return shortfall > 0 ? (slope * shortfall) / agg : null;
}

/**
 * Paired test of the predictions split, in SHORTFALL units (candidate − baseline, up = worse).
 * `correct` counts: the change in the proportion correct, negated (worse = fewer correct, for
 * either goal). `loss` is lower-is-better per example: its change is a shortfall change, scaled to
 * the metric (`lossScale`), so a maximized metric's direction comes out right.
 */
export function pairedShortfall(
  paired: PairedPredictions,
  baselineRun: RunArtifact,
  alpha: number,
): TestResult | null {
  if (paired.rows === 0 || paired.partial === true) return null;
  if (paired.kind === 'proportion') {
    const result = mcnemarExact(
      paired.baselineOnly ?? 0,
      paired.candidateOnly ?? 0,
      paired.rows,
      alpha,
    );
    return toMetricUnits(result, -1);
  }
  const scale = lossScale(paired, baselineRun);
  if (scale === null) return null;
  const r = pairedT(
    { n: paired.rows, mean: paired.meanDiff ?? 0, variance: paired.varDiff ?? 0 },
    alpha,
  );
  return {
    ...r,
    estimate: r.estimate * scale,
    ci: r.ci === null ? null : [r.ci[0] * scale, r.ci[1] * scale],
  };
}

/** Whether both runs have ≥ 2 repeats of the split: Welch over repeats decides, not the paired test. */
export function repeatsDecide(runs: Runs, split: SplitName): boolean {
  return (
    (runs.baseline.splits[split]?.values.length ?? 0) >= 2 &&
    (runs.candidate.splits[split]?.values.length ?? 0) >= 2
  );
}

/**
 * Each split's change in shortfall units; the predictions split uses the paired test where a run
 * has one repeat (with ≥ 2 in both, the spread over seeds holds noise a paired test over one
 * repeat's rows leaves out).
 */
export function splitShortfalls(
  runs: Runs,
  alpha: number,
  paired: PairedPredictions | undefined,
  examples: RunsExampleNoise = {},
): Map<SplitName, TestResult> {
  const pairedSplit = paired?.split ?? 'validation';
  const out = new Map<SplitName, TestResult>();
  for (const split of SPLIT_NAMES) {
    let result = measureChange(
      runs.baseline,
      runs.candidate,
      both(splitMeasure(split)),
      alpha,
      examples,
    );
    if (result === null) continue;
    if (paired !== undefined && split === pairedSplit && !repeatsDecide(runs, split)) {
      const test = pairedShortfall(paired, runs.baseline, alpha);
      if (test !== null) result = test;
    }
    out.set(split, result);
  }
  return out;
}

/** Split changes in metric units, for the splits both runs have. */
export function splitChanges(
  shortfalls: Map<SplitName, TestResult>,
  runs: Runs,
  summaries: { baseline: RunSummary; candidate: RunSummary },
  calls: CallSettings,
): SplitChange[] {
  const sign = shortfallSign(runs.candidate);
  const out: SplitChange[] = [];
  for (const [split, result] of shortfalls) {
    const b = summaries.baseline.splits.find((s) => s.split === split);
    const c = summaries.candidate.splits.find((s) => s.split === split);
    if (b === undefined || c === undefined) continue;
    out.push({
      split,
      baseline: b.mean,
      candidate: c.mean,
      delta: toMetricDelta(toMetricUnits(result, sign), calls),
    });
  }
  return out;
}

export interface ComponentChanges {
  bias: ShortfallDelta | null;
  variance: ShortfallDelta;
  mismatch: ShortfallDelta | null;
  overfit: ShortfallDelta | null;
  /** Only one run has train_dev: variance was measured as validation − train in both. */
  varianceFallback: boolean;
}

/** Component changes in shortfall units. */
export function componentChanges(
  runs: Runs,
  references: { baseline: number | null; candidate: number | null },
  calls: CallSettings,
  examples: RunsExampleNoise = {},
): ComponentChanges {
  const { baseline, candidate } = runs;
  const alpha = calls.alpha;
  const refB = references.baseline;
  const refC = references.candidate;
  // With both references known the bias change includes any change of reference; otherwise
  // both runs are measured against 0, which leaves Δs(train).
  const [biasRefB, biasRefC] = refB !== null && refC !== null ? [refB, refC] : [0, 0];
  const bias = measureChange(
    baseline,
    candidate,
    {
      baseline: componentMeasures(baseline, biasRefB).bias ?? splitMeasure('train'),
      candidate: componentMeasures(candidate, biasRefC).bias ?? splitMeasure('train'),
    },
    alpha,
    examples,
  );
  const change = (name: 'variance' | 'mismatch' | 'overfit'): ShortfallDelta | null => {
    const mb = componentMeasures(baseline, refB)[name];
    const mc = componentMeasures(candidate, refC)[name];
    if (mb === null || mc === null) return null;
    const r = measureChange(baseline, candidate, { baseline: mb, candidate: mc }, alpha, examples);
    return r === null ? null : toShortfallDelta(r, calls);
  };
  // Variance must mean the same thing in both runs (train_dev in both, or in neither).
  const varianceFallback =
    (baseline.splits.train_dev === undefined) !== (candidate.splits.train_dev === undefined);
  const variance = varianceFallback
    ? validationMinusTrain(runs, calls, examples)
    : change('variance');
  if (variance === null)
    throw new Error('variance needs train and validation, which the schema requires');
  return {
    bias: bias === null ? null : toShortfallDelta(bias, calls),
    variance,
    mismatch: change('mismatch'),
    overfit: change('overfit'),
    varianceFallback,
  };
}

function validationMinusTrain(
  runs: Runs,
  calls: CallSettings,
  examples: RunsExampleNoise,
): ShortfallDelta | null {
  const measure: Measure = {
    terms: [
      { split: 'validation', weight: 1 },
      { split: 'train', weight: -1 },
    ],
    constant: 0,
  };
  const r = measureChange(runs.baseline, runs.candidate, both(measure), calls.alpha, examples);
  return r === null ? null : toShortfallDelta(r, calls);
}
