/**
 * Builds the review model from two validated runs (DESIGN.md §3–§8). Pure: no I/O, no
 * environment, no clock.
 */
import type { RunArtifact, SplitName } from '../model/run.js';
import { SPLIT_NAMES } from '../model/run.js';
import {
  mcnemarExact,
  mean,
  pairedT,
  sampleVariance,
  tQuantile,
  wilsonInterval,
} from '../stats/index.js';
import type { Interval, TestResult } from '../stats/types.js';
import { analyzeCurves } from './curves/index.js';
import {
  chooseReference,
  componentMeasures,
  decompose,
  diagnose,
  errorLevel,
} from './decompose.js';
import { formatValue } from './format.js';
import { applyGate } from './gate.js';
import { diffHyperparameters, knobOf, pulledLevers } from './hyperparameters.js';
import { chooseLevers } from './levers/choose.js';
import { shortfallSign, splitMeasure, type Measure } from './measure.js';
import { movementOf, validationChangeOf } from './movement.js';
import { measureChange, toDelta, toMetricUnits, type CallSettings } from './noise.js';
import { compareSlices } from './slices.js';
import type {
  Delta,
  Review,
  ReviewSettings,
  RunSummary,
  SplitChange,
  SplitSummary,
  PairedPredictions,
} from '../model/review.js';

export interface ReviewInput {
  baseline: RunArtifact;
  candidate: RunArtifact;
  settings: ReviewSettings & { reference?: number };
  paired?: PairedPredictions;
  /** Notes from loading (files not used, rows without a partner…). */
  notes?: string[];
}

function splitSummary(run: RunArtifact, split: SplitName, alpha: number): SplitSummary | null {
  const s = run.splits[split];
  if (s === undefined) return null;
  const m = mean(s.values);
  const n = s.values.length;
  const sd = n >= 2 ? Math.sqrt(sampleVariance(s.values)) : null;
  let ci: Interval | null = null;
  if (sd !== null) {
    const half = tQuantile(1 - alpha / 2, n - 1) * (sd / Math.sqrt(n));
    ci = [m - half, m + half];
  } else if (run.metric.kind === 'proportion' && s.examples !== undefined) {
    ci = wilsonInterval(Math.round(m * s.examples), s.examples, alpha);
  }
  return { split, mean: m, sd, repeats: n, examples: s.examples ?? null, ci };
}

function lambdaOf(run: RunArtifact): number | undefined {
  for (const [key, value] of Object.entries(run.hyperparameters ?? {})) {
    if (typeof value === 'number' && knobOf(key) === 'regularization' && !/dropout/i.test(key))
      return value;
  }
  return undefined;
}

function summarize(run: RunArtifact, settings: ReviewInput['settings']): RunSummary {
  const reference = chooseReference(run, settings.reference);
  const components = decompose(run, reference.value, settings);
  const diagnosis = diagnose(components);
  const warnings: string[] = [];
  if (components.overfit.present) {
    warnings.push(
      'Test error is well above validation error: model choices may be tuned to the validation set.',
    );
  }
  const lambda = lambdaOf(run);
  return {
    name: run.run.name,
    commit: run.run.commit ?? null,
    createdAt: run.run.createdAt ?? null,
    reference: reference.value,
    referenceSource: reference.source,
    splits: SPLIT_NAMES.flatMap((s) => splitSummary(run, s, settings.alpha) ?? []),
    errorLevel: errorLevel(run),
    components,
    diagnosis,
    biasUnknown: reference.value === null,
    warnings,
    curves: analyzeCurves(run.curves, {
      ...(lambda === undefined ? {} : { lambda }),
      kind: run.metric.kind,
      goal: run.metric.goal,
    }),
  };
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

function both(measure: Measure): { baseline: Measure; candidate: Measure } {
  return { baseline: measure, candidate: measure };
}

export function buildReview(input: ReviewInput): Review {
  const { baseline, candidate, settings } = input;
  const calls: CallSettings = { alpha: settings.alpha, minEffect: settings.minEffect };
  const sign = shortfallSign(candidate);
  const notes = [...(input.notes ?? [])];

  const base = summarize(baseline, settings);
  const cand = summarize(candidate, settings);

  // Split changes, in shortfall space first; the predictions split may use the paired test.
  const pairedSplit = input.paired?.split ?? 'validation';
  const shortfallChanges = new Map<SplitName, TestResult>();
  for (const split of SPLIT_NAMES) {
    let result = measureChange(baseline, candidate, both(splitMeasure(split)), settings.alpha);
    if (result === null) continue;
    if (
      input.paired !== undefined &&
      split === pairedSplit &&
      (result.test === 'none' || result.test === 'z-binomial')
    ) {
      const paired = pairedTest(input.paired, candidate, settings.alpha);
      if (paired !== null) result = toMetricUnits(paired, sign);
    }
    shortfallChanges.set(split, result);
  }
  const validationShortfall = shortfallChanges.get('validation');
  if (validationShortfall === undefined)
    throw new Error('validation split is required by the schema');
  const validationDelta = toDelta(validationShortfall, calls);

  const splits: SplitChange[] = [];
  for (const [split, result] of shortfallChanges) {
    const b = base.splits.find((s) => s.split === split);
    const c = cand.splits.find((s) => s.split === split);
    if (b === undefined || c === undefined) continue;
    splits.push({
      split,
      baseline: b.mean,
      candidate: c.mean,
      delta: toDelta(toMetricUnits(result, sign), calls),
    });
  }

  // Component changes. Bias change needs no reference when both runs share it (or lack it).
  const refB = base.reference;
  const refC = cand.reference;
  // With both references known the bias change includes any change of reference; otherwise
  // both runs are measured against 0, which leaves Δs(train).
  const [biasRefB, biasRefC] = refB !== null && refC !== null ? [refB, refC] : [0, 0];
  const biasResult = measureChange(
    baseline,
    candidate,
    {
      baseline: componentMeasures(baseline, biasRefB).bias ?? splitMeasure('train'),
      candidate: componentMeasures(candidate, biasRefC).bias ?? splitMeasure('train'),
    },
    settings.alpha,
  );
  const componentChange = (name: 'variance' | 'mismatch' | 'overfit'): Delta | null => {
    const mb = componentMeasures(baseline, refB)[name];
    const mc = componentMeasures(candidate, refC)[name];
    if (mb === null || mc === null) return null;
    // Variance must mean the same thing in both runs (train_dev in both, or in neither).
    if (
      name === 'variance' &&
      (baseline.splits.train_dev === undefined) !== (candidate.splits.train_dev === undefined)
    ) {
      const fallback: Measure = {
        terms: [
          { split: 'validation', weight: 1 },
          { split: 'train', weight: -1 },
        ],
        constant: 0,
      };
      notes.push(
        'Only one run has a train_dev split: the variance change is measured as validation − train in both.',
      );
      const r = measureChange(baseline, candidate, both(fallback), settings.alpha);
      return r === null ? null : toDelta(r, calls);
    }
    const r = measureChange(baseline, candidate, { baseline: mb, candidate: mc }, settings.alpha);
    return r === null ? null : toDelta(r, calls);
  };
  const biasDelta = biasResult === null ? null : toDelta(biasResult, calls);
  const varianceDelta = componentChange('variance');
  if (varianceDelta === null)
    throw new Error('variance needs train and validation, which the schema requires');
  const movement = movementOf(biasDelta?.call ?? 'flat', varianceDelta.call);
  const validationChange = validationChangeOf(validationDelta.call);

  const sliceResult = compareSlices(baseline, candidate, validationChange, calls);
  if (sliceResult.unpaired.length > 0) {
    notes.push(
      `${sliceResult.unpaired.length} slice(s) appear in one run only and were not compared: ${sliceResult.unpaired.slice(0, 5).join(', ')}${sliceResult.unpaired.length > 5 ? ', …' : ''}.`,
    );
  }
  const hidden = sliceResult.slices.filter((s) => s.hiddenRegression);
  if (hidden.length > 0) {
    notes.push(
      `Validation improved overall, yet ${hidden.length} slice(s) regressed significantly (Holm-adjusted): ${hidden
        .slice(0, 5)
        .map((s) => s.name)
        .join(', ')}.`,
    );
  }

  const noiseUnknown = validationDelta.test === 'none' || varianceDelta.test === 'none';
  if (noiseUnknown) {
    notes.push(
      settings.minEffect > 0
        ? `Run-to-run noise is unknown (one repeat of a continuous metric, no per-example predictions): changes are called on size alone (min-effect ${formatValue(settings.minEffect, candidate.metric.kind)}).`
        : 'Run-to-run noise is unknown (one repeat of a continuous metric, no per-example predictions) and min-effect is 0: no change can be called. Add repeats (seeds), per-example predictions, or set min-effect.',
    );
  }
  if (cand.biasUnknown) {
    notes.push(
      'Avoidable bias is unknown: there is no reference level for this metric. Its change is still measured from the training error; the diagnosis rests on variance and data mismatch.',
    );
  }
  if (input.paired !== undefined && input.paired.rows === 0) {
    notes.push('The two predictions files share no id: the paired test was not used.');
  }

  const changes = diffHyperparameters(baseline.hyperparameters, candidate.hyperparameters);
  const lambda = lambdaOf(candidate);
  const { levers, nonLevers } = chooseLevers({
    kind: candidate.metric.kind,
    metricName: candidate.metric.name,
    candidate: cand,
    baseline: base,
    movement,
    bias: biasDelta ?? { estimate: 0, ci: null, p: null, test: 'none', call: 'flat' },
    variance: varianceDelta,
    pulled: pulledLevers(changes),
    changes,
    lambda,
    noiseUnknown,
  });

  const partial = {
    movement,
    validation: {
      change: validationChange,
      delta: toDelta(toMetricUnits(validationShortfall, sign), calls),
    },
    slices: sliceResult.slices,
    candidate: cand,
    settings: {
      alpha: settings.alpha,
      minEffect: settings.minEffect,
      gapTolerance: settings.gapTolerance,
      failOn: [...settings.failOn],
    },
  };
  const gate = applyGate(partial);
  const paired =
    input.paired === undefined
      ? null
      : {
          rows: input.paired.rows,
          test:
            input.paired.kind === 'proportion' ? ('mcnemar-exact' as const) : ('paired-t' as const),
          ...(input.paired.kind === 'proportion'
            ? {
                discordant: {
                  baselineOnly: input.paired.baselineOnly ?? 0,
                  candidateOnly: input.paired.candidateOnly ?? 0,
                },
              }
            : {}),
        };

  return {
    format: 'fitgap-review/1',
    metric: { ...candidate.metric },
    ...partial,
    bias: { delta: biasDelta },
    variance: { delta: varianceDelta },
    mismatch: { delta: componentChange('mismatch') },
    overfit: { delta: componentChange('overfit') },
    splits,
    baseline: base,
    hyperparameters: changes,
    levers,
    nonLevers,
    gate,
    notes,
    paired,
  };
}
