/** One run's summary: split means with intervals, error components, diagnosis, curves. Pure. */
import type { RunArtifact, SplitName } from '../model/run.js';
import { SPLIT_NAMES } from '../model/run.js';
import { mean, sampleVariance, tQuantile, wilsonInterval } from '../stats/index.js';
import type { Interval } from '../stats/types.js';
import { analyzeCurves } from './curves/index.js';
import { chooseReference, decompose, diagnose, errorLevel } from './decompose.js';
import { regularizationKnob } from './levers/knobs.js';
import { BUILT_IN_VOCABULARY, type Vocabulary } from './levers/resolve-knob.js';
import type { RunSummary, SplitSummary } from '../model/review.js';

export interface SummarySettings {
  alpha: number;
  minEffect: number;
  gapTolerance: number;
  reference?: number;
  /** Hyperparameter names → roles, for the knob the regularization sweep varies. */
  vocabulary?: Vocabulary;
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

export function summarize(run: RunArtifact, settings: SummarySettings): RunSummary {
  const reference = chooseReference(run, settings.reference);
  const components = decompose(run, reference.value, settings);
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
    splits: SPLIT_NAMES.flatMap((s) => splitSummary(run, s, settings.alpha) ?? []),
    errorLevel: errorLevel(run),
    components,
    diagnosis: diagnose(components),
    biasUnknown: reference.value === null,
    warnings: components.overfit.present ? ['validation-overfit'] : [],
    curves: analyzeCurves(run.curves, {
      ...(lambda === undefined ? {} : { lambda }),
      kind: run.metric.kind,
      goal: run.metric.goal,
    }),
  };
}
