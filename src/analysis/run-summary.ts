/** One run's summary: split means with intervals, error components, diagnosis, curves. Pure. */
import type { RunArtifact, SplitName } from '../model/run.js';
import { SPLIT_NAMES } from '../model/run.js';
import { mean, sampleVariance, tQuantile, wilsonInterval } from '../stats/index.js';
import type { Interval } from '../stats/types.js';
import { analyzeCurves } from './curves/index.js';
import {
  chooseReference,
  decompose,
  diagnose,
  errorLevel,
  type ReferenceChoice,
} from './decompose.js';
import { splitMeasure, type ExampleNoise } from './measure.js';
import { measureNoise } from './noise.js';
import { regularizationKnob } from './levers/knobs.js';
import { BUILT_IN_VOCABULARY, type Vocabulary } from './levers/resolve-knob.js';
import type { RunSummary, SplitSummary } from '../model/review.js';

export interface SummarySettings {
  alpha: number;
  minEffect: number;
  gapTolerance: number;
  reference?: number;
  /** The reference chosen for both runs (taskReference); overrides `reference`. */
  referenceChoice?: ReferenceChoice;
  /** Hyperparameter names → roles, for the knob the regularization sweep varies. */
  vocabulary?: Vocabulary;
}

/**
 * A split's mean with its interval under the same noise rule as the changes (noise.ts): the seed
 * spread plus the evaluation set's sampling noise; one repeat of a proportion: Wilson's interval.
 */
function splitSummary(
  run: RunArtifact,
  split: SplitName,
  alpha: number,
  examples: ExampleNoise,
): SplitSummary | null {
  const s = run.splits[split];
  if (s === undefined) return null;
  const m = mean(s.values);
  const n = s.values.length;
  const sd = n >= 2 ? Math.sqrt(sampleVariance(s.values)) : null;
  let ci: Interval | null = null;
  const noise = measureNoise(run, splitMeasure(split), examples);
  if (n === 1 && run.metric.kind === 'proportion' && s.examples !== undefined) {
    ci = wilsonInterval(Math.round(m * s.examples), s.examples, alpha);
  } else if (noise !== null && noise.known) {
    const half = tQuantile(1 - alpha / 2, noise.df) * Math.sqrt(noise.variance);
    ci = [m - half, m + half];
  }
  return { split, mean: m, sd, repeats: n, examples: s.examples ?? null, ci };
}

/**
 * Training error significantly below the reference (negative avoidable bias): memorising noise,
 * or a wrong reference. Flagged also when its noise is unknown.
 */
function belowReference(bias: RunSummary['components']['bias'], alpha: number): boolean {
  if (bias.value === null || !(bias.value < 0)) return false;
  return bias.p === null || 1 - bias.p < alpha;
}

export function summarize(
  run: RunArtifact,
  settings: SummarySettings,
  examples: ExampleNoise = {},
): RunSummary {
  const reference = settings.referenceChoice ?? chooseReference(run, settings.reference);
  const components = decompose(run, reference.value, settings, examples);
  const lambda = regularizationKnob(
    run.hyperparameters,
    settings.vocabulary ?? BUILT_IN_VOCABULARY,
  )?.value;
  return {
    name: run.run.name,
    commit: run.run.commit ?? null,
    createdAt: run.run.createdAt ?? null,
    reference: reference.value,
    referenceSource: reference.source,
    splits: SPLIT_NAMES.flatMap((s) => splitSummary(run, s, settings.alpha, examples) ?? []),
    errorLevel: errorLevel(run),
    components,
    diagnosis: diagnose(components),
    biasUnknown: reference.value === null,
    warnings: [
      ...(components.overfit.present ? (['validation-overfit'] as const) : []),
      ...(belowReference(components.bias, settings.alpha) ? (['below-reference'] as const) : []),
    ],
    curves: analyzeCurves(run.curves, {
      ...(lambda === undefined ? {} : { lambda }),
      kind: run.metric.kind,
      goal: run.metric.goal,
    }),
  };
}
