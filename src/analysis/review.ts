/**
 * Builds the review model from two validated runs (DESIGN.md §3–§8). Pure: no I/O, no
 * environment, no clock.
 */
import type { RunArtifact } from '../model/run.js';
import { isFailOn } from '../model/settings.js';
import type {
  FailOn,
  Note,
  PairedPredictions,
  Review,
  ReviewSettings,
  ShortfallDelta,
  SliceChange,
} from '../model/review.js';
import {
  componentChanges,
  splitChanges,
  splitShortfalls,
  type ComponentChanges,
} from './changes.js';
import { applyGate } from './gate.js';
import { diffHyperparameters, pulledLevers } from './hyperparameters.js';
import { chooseLevers } from './levers/choose.js';
import { shortfallSign } from './measure.js';
import { movementOf, validationChangeOf } from './movement.js';
import { toMetricDelta, toMetricUnits, toShortfallDelta, type CallSettings } from './noise.js';
import { regularizationOf, summarize } from './run-summary.js';
import { compareSlices } from './slices.js';

export interface ReviewInput {
  baseline: RunArtifact;
  candidate: RunArtifact;
  /** `failOn` holds validated outcomes; an unknown one is a bug in the caller. */
  settings: Omit<ReviewSettings, 'failOn'> & { failOn: readonly string[]; reference?: number };
  paired?: PairedPredictions;
  /** Notes from loading (files not used, rows without a partner…). */
  notes?: Note[];
}

/** Names listed in a note, at most. */
export const NOTE_NAMES = 5;

function failOnOf(values: readonly string[]): FailOn[] {
  return values.map((value) => {
    if (!isFailOn(value)) throw new RangeError(`unknown fail-on outcome ${JSON.stringify(value)}`);
    return value;
  });
}

/** The settings as the review records them, with `failOn` checked. */
function reviewSettings(input: ReviewInput['settings']): ReviewSettings {
  return {
    alpha: input.alpha,
    minEffect: input.minEffect,
    gapTolerance: input.gapTolerance,
    failOn: failOnOf(input.failOn),
  };
}

/** No bias change could be measured: a flat change with unknown noise stands in for the levers. */
const NO_BIAS_CHANGE: ShortfallDelta = {
  unit: 'shortfall',
  estimate: 0,
  ci: null,
  p: null,
  test: 'none',
  call: 'flat',
};

export function buildReview(input: ReviewInput): Review {
  const { baseline, candidate } = input;
  const settings = reviewSettings(input.settings);
  const calls: CallSettings = { alpha: settings.alpha, minEffect: settings.minEffect };
  const reference = input.settings.reference;
  const summarySettings = { ...settings, ...(reference === undefined ? {} : { reference }) };
  const base = summarize(baseline, summarySettings);
  const cand = summarize(candidate, summarySettings);
  const runs = { baseline, candidate };

  const shortfalls = splitShortfalls(runs, settings.alpha, input.paired);
  const validationShortfall = shortfalls.get('validation');
  if (validationShortfall === undefined)
    throw new Error('validation split is required by the schema');
  const components = componentChanges(
    runs,
    { baseline: base.reference, candidate: cand.reference },
    calls,
  );
  const movement = movementOf(components.bias?.call ?? 'flat', components.variance.call);
  const validation = {
    change: validationChangeOf(toShortfallDelta(validationShortfall, calls).call),
    delta: toMetricDelta(toMetricUnits(validationShortfall, shortfallSign(candidate)), calls),
  };
  const sliceResult = compareSlices(baseline, candidate, validation.change, calls);
  const noiseUnknown = validation.delta.test === 'none' || components.variance.test === 'none';

  const changes = diffHyperparameters(baseline.hyperparameters, candidate.hyperparameters);
  const { levers, nonLevers } = chooseLevers({
    goal: candidate.metric.goal,
    candidate: cand,
    baseline: base,
    movement,
    bias: components.bias ?? NO_BIAS_CHANGE,
    variance: components.variance,
    pulled: pulledLevers(changes),
    changes,
    regularization: regularizationOf(candidate),
    noiseUnknown,
  });
  const gate = applyGate(
    { movement, validation, slices: sliceResult.slices, candidate: cand },
    settings.failOn,
  );

  return {
    format: 'fitgap-review/1',
    metric: { ...candidate.metric },
    settings,
    movement,
    validation,
    bias: { delta: components.bias },
    variance: { delta: components.variance },
    mismatch: { delta: components.mismatch },
    overfit: { delta: components.overfit },
    splits: splitChanges(shortfalls, runs, { baseline: base, candidate: cand }, calls),
    baseline: base,
    candidate: cand,
    slices: sliceResult.slices,
    hyperparameters: changes,
    levers,
    nonLevers,
    gate,
    notes: [
      ...(input.notes ?? []),
      ...reviewNotes({
        components,
        unpaired: sliceResult.unpaired,
        slices: sliceResult.slices,
        noiseUnknown,
        biasUnknown: cand.biasUnknown,
        paired: input.paired,
      }),
    ],
    paired: pairedSummary(input.paired),
  };
}

/** What the reviewer should know about how the numbers were obtained. */
function reviewNotes(facts: {
  components: ComponentChanges;
  unpaired: string[];
  slices: SliceChange[];
  noiseUnknown: boolean;
  biasUnknown: boolean;
  paired: PairedPredictions | undefined;
}): Note[] {
  const notes: Note[] = [];
  if (facts.components.varianceFallback) notes.push({ code: 'train-dev-in-one-run' });
  if (facts.unpaired.length > 0) {
    notes.push({
      code: 'unpaired-slices',
      count: facts.unpaired.length,
      names: facts.unpaired.slice(0, NOTE_NAMES),
    });
  }
  const hidden = facts.slices.filter((s) => s.hiddenRegression);
  if (hidden.length > 0) {
    notes.push({
      code: 'hidden-regressions',
      count: hidden.length,
      names: hidden.slice(0, NOTE_NAMES).map((s) => s.name),
    });
  }
  if (facts.noiseUnknown) notes.push({ code: 'noise-unknown' });
  if (facts.biasUnknown) notes.push({ code: 'bias-unknown' });
  if (facts.paired !== undefined && facts.paired.rows === 0)
    notes.push({ code: 'predictions-share-no-id' });
  return notes;
}

function pairedSummary(paired: PairedPredictions | undefined): Review['paired'] {
  if (paired === undefined) return null;
  if (paired.kind === 'continuous') return { rows: paired.rows, test: 'paired-t', reason: null };
  return {
    rows: paired.rows,
    test: 'mcnemar-exact',
    reason: null,
    discordant: {
      baselineOnly: paired.baselineOnly ?? 0,
      candidateOnly: paired.candidateOnly ?? 0,
    },
  };
}
