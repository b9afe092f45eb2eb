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
  PairedSummary,
  Review,
  ReviewSettings,
  ShortfallDelta,
  SliceChange,
} from '../model/review.js';
import {
  componentChanges,
  repeatsDecide,
  splitChanges,
  splitShortfalls,
  type ComponentChanges,
} from './changes.js';
import { reviewCost } from './cost.js';
import { taskReference, type TaskReference } from './decompose.js';
import { exampleNoise, validationPower } from './power.js';
import type { RunsExampleNoise } from './noise.js';
import { applyGate } from './gate.js';
import { reviewGuardrails } from './guardrails.js';
import type { HyperparameterRolesConfig } from '../model/hyperparameter-roles.js';
import type { HyperparameterChange } from '../model/review.js';
import { chooseLevers } from './levers/choose.js';
import { knobValues, regularizationKnob, runRoles, runVocabulary } from './levers/knobs.js';
import { prChanges, type PrChange } from './levers/pr-changes.js';
import { BUILT_IN_VOCABULARY, mergeRoles } from './levers/resolve-knob.js';
import { shortfallSign } from './measure.js';
import { movementOf, validationChangeOf } from './movement.js';
import { toMetricDelta, toMetricUnits, toShortfallDelta, type CallSettings } from './noise.js';
import { summarize } from './run-summary.js';
import { compareSlices } from './slices.js';

export interface ReviewInput {
  baseline: RunArtifact;
  candidate: RunArtifact;
  /** `failOn` holds validated outcomes; an unknown one is a bug in the caller. */
  settings: Omit<ReviewSettings, 'failOn'> & {
    failOn: readonly string[];
    reference?: number;
    /** Guardrail margins from the trusted config, by guardrail name. */
    guardrailMargins?: ReadonlyMap<string, number>;
    /** The config's hyperparameter roles, laid over the built-in vocabulary. */
    hyperparameters?: HyperparameterRolesConfig;
  };
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
  const vocabulary = runVocabulary(
    mergeRoles(BUILT_IN_VOCABULARY, input.settings.hyperparameters),
    baseline.hyperparameters,
    candidate.hyperparameters,
  );
  const summarySettings = {
    ...settings,
    vocabulary,
    ...(reference === undefined ? {} : { reference }),
  };
  const runs = { baseline, candidate };
  const task = taskReference(baseline, candidate, reference);
  const examples = exampleNoise(runs, input.paired);
  const base = summarize(
    baseline,
    { ...summarySettings, referenceChoice: task.baseline },
    examples.baseline,
  );
  const cand = summarize(
    candidate,
    { ...summarySettings, referenceChoice: task.candidate },
    examples.candidate,
  );
  const paired = input.paired?.partial === true ? undefined : input.paired;

  const shortfalls = splitShortfalls(runs, settings.alpha, paired, examples);
  const validationShortfall = shortfalls.get('validation');
  if (validationShortfall === undefined)
    throw new Error('validation split is required by the schema');
  const components = componentChanges(
    runs,
    { baseline: base.reference, candidate: cand.reference },
    calls,
    examples,
  );
  const movement = movementOf(components.bias?.call ?? 'flat', components.variance.call);
  const change = validationChangeOf(toShortfallDelta(validationShortfall, calls).call);
  const validation = {
    change,
    delta: toMetricDelta(toMetricUnits(validationShortfall, shortfallSign(candidate)), calls),
    ...(change === 'flat' || change === 'undetermined'
      ? validationPower(runs, validationShortfall, settings.alpha, examples)
      : {}),
  };
  const pairedDecided =
    paired !== undefined &&
    paired.rows > 0 &&
    (validationShortfall.test === 'mcnemar-exact' || validationShortfall.test === 'paired-t');
  const sliceResult = compareSlices(baseline, candidate, validation.change, calls);
  const noiseUnknown = validation.delta.test === 'none' || components.variance.test === 'none';

  const changes = prChanges(
    knobValues(baseline.hyperparameters),
    knobValues(candidate.hyperparameters),
    vocabulary,
  );
  const { levers, nonLevers } = chooseLevers({
    goal: candidate.metric.goal,
    candidate: cand,
    baseline: base,
    movement,
    bias: components.bias ?? NO_BIAS_CHANGE,
    variance: components.variance,
    changes,
    vocabulary,
    roles: runRoles(candidate.hyperparameters, vocabulary),
    regularization: regularizationKnob(candidate.hyperparameters, vocabulary),
    noiseUnknown,
    ...undeterminedOf(validation),
  });
  const hasGuardrails = baseline.guardrails !== undefined || candidate.guardrails !== undefined;
  const guardrails = hasGuardrails
    ? reviewGuardrails(baseline, candidate, {
        alpha: settings.alpha,
        margins: input.settings.guardrailMargins ?? new Map(),
      })
    : undefined;
  const cost =
    baseline.cost !== undefined || candidate.cost !== undefined
      ? reviewCost(baseline, candidate, settings.alpha)
      : undefined;
  const gate = applyGate(
    {
      movement,
      validation,
      slices: sliceResult.slices,
      candidate: cand,
      ...(guardrails === undefined ? {} : { guardrails }),
      ...(cost === undefined ? {} : { cost }),
    },
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
    hyperparameters: changes.map(hyperparameterChange),
    levers,
    nonLevers,
    gate,
    ...(guardrails === undefined ? {} : { guardrails }),
    ...(cost === undefined ? {} : { cost }),
    notes: [
      ...(input.notes ?? []),
      ...reviewNotes({
        components,
        unpaired: sliceResult.unpaired,
        slices: sliceResult.slices,
        noiseUnknown,
        biasUnknown: cand.biasUnknown,
        paired: input.paired,
        task,
        repeatsDecided:
          paired !== undefined &&
          paired.rows > 0 &&
          repeatsDecide(runs, paired.split ?? 'validation'),
        examples,
        changes,
      }),
    ],
    paired: pairedSummary(input.paired, pairedDecided, runs),
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
  task: TaskReference;
  repeatsDecided: boolean;
  examples: RunsExampleNoise;
  changes: PrChange[];
}): Note[] {
  const notes: Note[] = [];
  if (facts.task.fromOneRun !== null)
    notes.push({ code: 'reference-from-one-run', ...facts.task.fromOneRun });
  if (facts.task.differ !== null) notes.push({ code: 'references-differ', ...facts.task.differ });
  if (facts.paired?.partial === true) {
    const sides = facts.paired.sides;
    notes.push({
      code: 'predictions-partial-overlap',
      shared: facts.paired.rows,
      baseline: sides?.baseline.n ?? 0,
      candidate: sides?.candidate.n ?? 0,
    });
  }
  if (facts.repeatsDecided) notes.push({ code: 'repeats-decided' });
  const unmapped = facts.changes.filter((c) => c.origin === 'unknown' || c.origin === 'ambiguous');
  if (unmapped.length > 0) {
    notes.push({
      code: 'unmapped-hyperparameters',
      count: unmapped.length,
      changes: unmapped.slice(0, NOTE_NAMES).map((c) => ({
        key: c.hyperparameter,
        ambiguous: c.origin === 'ambiguous',
        baseline: c.from ?? null,
        candidate: c.to ?? null,
      })),
    });
  }
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
  if (facts.paired !== undefined && facts.paired.rows === 0 && facts.paired.partial !== true)
    notes.push({ code: 'predictions-share-no-id' });
  return notes;
}

/** Whether the validation change is undetermined, and the repeats per run that would decide it. */
function undeterminedOf(
  validation: Pick<Review['validation'], 'change' | 'repeatsNeeded'>,
): { undetermined: { repeatsNeeded: number | null } } | Record<string, never> {
  if (validation.change !== 'undetermined') return {};
  return { undetermined: { repeatsNeeded: validation.repeatsNeeded?.repeats ?? null } };
}

/** A PR change as the review records it: the artifact's values, the kind, the role and effect. */
function hyperparameterChange(c: PrChange): HyperparameterChange {
  return {
    key: c.hyperparameter,
    baseline: c.from ?? null,
    candidate: c.to ?? null,
    kind: c.direction,
    role: c.role,
    inverse: c.inverse,
    origin: c.origin,
    effect: c.effect,
    ...(c.ratio === undefined ? {} : { ratio: c.ratio }),
    ...(c.totalUnits === undefined ? {} : { totalUnits: true }),
    ...(c.unlimited === undefined
      ? {}
      : { unlimited: c.unlimited === 'from' ? ('baseline' as const) : ('candidate' as const) }),
  };
}

/** The paired block: it names a test only when that test decided the validation change. */
function pairedSummary(
  paired: PairedPredictions | undefined,
  decided: boolean,
  runs: { baseline: RunArtifact; candidate: RunArtifact },
): Review['paired'] {
  if (paired === undefined) return null;
  const reason: PairedSummary['reason'] = decided
    ? null
    : paired.partial === true
      ? 'partial-overlap'
      : paired.rows === 0
        ? 'no-shared-id'
        : repeatsDecide(runs, paired.split ?? 'validation')
          ? 'repeats'
          : null;
  if (paired.kind === 'continuous')
    return { rows: paired.rows, test: decided ? 'paired-t' : null, reason };
  return {
    rows: paired.rows,
    test: decided ? 'mcnemar-exact' : null,
    reason,
    discordant: {
      baselineOnly: paired.baselineOnly ?? 0,
      candidateOnly: paired.candidateOnly ?? 0,
    },
  };
}
