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
} from './noise.js';
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

/** Paired test of the predictions split, in metric units (candidate − baseline). */
function pairedTest(paired: PairedPredictions, run: RunArtifact, alpha: number): TestResult | null {
  if (paired.rows === 0) return null;
  if (paired.kind === 'proportion') {
    // mcnemarExact's estimate is the change in the proportion correct.
    const result = mcnemarExact(
      paired.baselineOnly ?? 0,
      paired.candidateOnly ?? 0,
      paired.rows,
      alpha,
    );
    // A minimized proportion metric counts errors: its change is the negative.
    return run.metric.goal === 'minimize' ? toMetricUnits(result, -1) : result;
  }
  return pairedT(
    { n: paired.rows, mean: paired.meanDiff ?? 0, variance: paired.varDiff ?? 0 },
    alpha,
  );
}

/**
 * Each split's change in shortfall units; the predictions split uses the paired test where the
 * per-split test knows less (one repeat).
 */
export function splitShortfalls(
  runs: Runs,
  alpha: number,
  paired: PairedPredictions | undefined,
): Map<SplitName, TestResult> {
  const pairedSplit = paired?.split ?? 'validation';
  const sign = shortfallSign(runs.candidate);
  const out = new Map<SplitName, TestResult>();
  for (const split of SPLIT_NAMES) {
    let result = measureChange(runs.baseline, runs.candidate, both(splitMeasure(split)), alpha);
    if (result === null) continue;
    if (
      paired !== undefined &&
      split === pairedSplit &&
      (result.test === 'none' || result.test === 'z-binomial')
    ) {
      const test = pairedTest(paired, runs.candidate, alpha);
      if (test !== null) result = toMetricUnits(test, sign);
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
  );
  const change = (name: 'variance' | 'mismatch' | 'overfit'): ShortfallDelta | null => {
    const mb = componentMeasures(baseline, refB)[name];
    const mc = componentMeasures(candidate, refC)[name];
    if (mb === null || mc === null) return null;
    const r = measureChange(baseline, candidate, { baseline: mb, candidate: mc }, alpha);
    return r === null ? null : toShortfallDelta(r, calls);
  };
  // Variance must mean the same thing in both runs (train_dev in both, or in neither).
  const varianceFallback =
    (baseline.splits.train_dev === undefined) !== (candidate.splits.train_dev === undefined);
  const variance = varianceFallback ? validationMinusTrain(runs, calls) : change('variance');
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

function validationMinusTrain(runs: Runs, calls: CallSettings): ShortfallDelta | null {
  const measure: Measure = {
    terms: [
      { split: 'validation', weight: 1 },
      { split: 'train', weight: -1 },
    ],
    constant: 0,
  };
  const r = measureChange(runs.baseline, runs.candidate, both(measure), calls.alpha);
  return r === null ? null : toShortfallDelta(r, calls);
}
