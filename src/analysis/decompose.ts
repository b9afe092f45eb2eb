/**
 * Error decomposition of one run (DESIGN.md §3) and its diagnosis (§6). Pure.
 */
import type { RunArtifact } from '../model/run.js';
import { mean } from '../stats/index.js';
import { shortfallSign, type ExampleNoise, type Measure } from './measure.js';
import { measureLevel } from './noise.js';
import type {
  Component,
  ComponentName,
  Diagnosis,
  ReferenceSource,
  UnavailableCode,
} from '../model/review.js';

export interface ReferenceChoice {
  value: number | null;
  source: ReferenceSource;
}

/**
 * The metric's best possible value: `metric.best`, else 1 for a maximized metric (accuracy, R²,
 * AUC) and 0 for a minimized one (an error). Values of a maximized metric above 1 need `best`
 * (checked when the artifacts are loaded).
 */
export function bestOf(run: RunArtifact): number {
  return run.metric.best ?? (run.metric.goal === 'maximize' ? 1 : 0);
}

/**
 * The default reference: a proportion's perfect score (error 0: the best value, whichever the
 * goal, so a metric and its complement get the same reference); unknown for a continuous metric.
 */
function defaultReference(run: RunArtifact): number | null {
  return run.metric.kind === 'proportion' ? bestOf(run) : null;
}

/** One run's reference alone: config override, the artifact's own, the default, else unknown. */
export function chooseReference(run: RunArtifact, override: number | undefined): ReferenceChoice {
  if (override !== undefined) return { value: override, source: 'config' };
  if (run.reference !== undefined) return { value: run.reference, source: 'artifact' };
  const value = defaultReference(run);
  return value === null ? { value, source: 'unknown' } : { value, source: 'default' };
}

export interface TaskReference {
  baseline: ReferenceChoice;
  candidate: ReferenceChoice;
  /** Only one artifact stated a reference: which, and its value. */
  fromOneRun: { from: 'baseline' | 'candidate'; value: number } | null;
  /** Both artifacts stated references and they differ. */
  differ: { baseline: number; candidate: number } | null;
}

/**
 * The reference is a property of the task, so both runs are measured against one level: the
 * config's; else the one both artifacts state; else the one artifact that states it (for both);
 * when the two differ, the candidate's (a warning); else the default. Δbias then always equals the
 * change of training shortfall.
 */
export function taskReference(
  baseline: RunArtifact,
  candidate: RunArtifact,
  override: number | undefined,
): TaskReference {
  const none = { fromOneRun: null, differ: null };
  if (override !== undefined) {
    const c = { value: override, source: 'config' } as const;
    return { baseline: c, candidate: c, ...none };
  }
  const rb = baseline.reference;
  const rc = candidate.reference;
  if (rb !== undefined && rc !== undefined) {
    const differ = rb === rc ? null : { baseline: rb, candidate: rc };
    return {
      baseline: { value: rc, source: rb === rc ? 'artifact' : 'other-run' },
      candidate: { value: rc, source: 'artifact' },
      fromOneRun: null,
      differ,
    };
  }
  if (rb !== undefined)
    return {
      baseline: { value: rb, source: 'artifact' },
      candidate: { value: rb, source: 'other-run' },
      fromOneRun: { from: 'baseline', value: rb },
      differ: null,
    };
  if (rc !== undefined)
    return {
      baseline: { value: rc, source: 'other-run' },
      candidate: { value: rc, source: 'artifact' },
      fromOneRun: { from: 'candidate', value: rc },
      differ: null,
    };
  return {
    baseline: chooseReference(baseline, undefined),
    candidate: chooseReference(candidate, undefined),
    ...none,
  };
}

/** The measures of each component for a run (null when a needed split or the reference is missing). */
export function componentMeasures(
  run: RunArtifact,
  reference: number | null,
): Record<ComponentName, Measure | null> {
  const sign = shortfallSign(run);
  const hasDev = run.splits.train_dev !== undefined;
  return {
    bias:
      reference === null
        ? null
        : { terms: [{ split: 'train', weight: 1 }], constant: -sign * reference },
    variance: {
      terms: [
        { split: hasDev ? 'train_dev' : 'validation', weight: 1 },
        { split: 'train', weight: -1 },
      ],
      constant: 0,
    },
    mismatch: hasDev
      ? {
          terms: [
            { split: 'validation', weight: 1 },
            { split: 'train_dev', weight: -1 },
          ],
          constant: 0,
        }
      : null,
    overfit:
      run.splits.test !== undefined
        ? {
            terms: [
              { split: 'test', weight: 1 },
              { split: 'validation', weight: -1 },
            ],
            constant: 0,
          }
        : null,
  };
}

/** Validation error level e: the distance of mean validation from the best value (DESIGN.md §6). */
export function errorLevel(run: RunArtifact): number {
  const m = mean(run.splits.validation.values);
  return Math.abs(m - bestOf(run));
}

/** Why a component has no value. Variance needs train and validation, which every run has. */
const UNAVAILABLE = new Map<ComponentName, UnavailableCode>([
  ['bias', 'no-reference'],
  ['mismatch', 'no-train-dev'],
  ['overfit', 'no-test'],
]);

export interface DecomposeSettings {
  alpha: number;
  minEffect: number;
  gapTolerance: number;
}

export function decompose(
  run: RunArtifact,
  reference: number | null,
  settings: DecomposeSettings,
  examples: ExampleNoise = {},
): Record<ComponentName, Component> {
  const measures = componentMeasures(run, reference);
  const threshold = Math.max(settings.gapTolerance * errorLevel(run), settings.minEffect);
  const out = {} as Record<ComponentName, Component>;
  for (const name of ['bias', 'variance', 'mismatch', 'overfit'] as const) {
    const measure = measures[name];
    const level = measure === null ? null : measureLevel(run, measure, settings.alpha, examples);
    if (level === null) {
      const unavailable = UNAVAILABLE.get(name);
      if (unavailable === undefined) throw new Error(`${name} needs splits every run has`);
      out[name] = { name, value: null, unavailable, ci: null, p: null, present: false };
      continue;
    }
    const significant = level.p === null || level.p < settings.alpha;
    const present = level.value > 0 && level.value >= threshold && significant;
    out[name] = { name, value: level.value, ci: level.ci, p: level.p, present };
  }
  return out;
}

/** DESIGN.md §6: the largest present component names the diagnosis. */
export function diagnose(components: Record<ComponentName, Component>): Diagnosis {
  const candidates = (['bias', 'variance', 'mismatch'] as const)
    .map((name) => components[name])
    .filter((c) => c.present && c.value !== null)
    .sort((a, b) => (b.value ?? 0) - (a.value ?? 0));
  const top = candidates[0];
  if (top === undefined) return 'good-fit';
  const bias = components.bias;
  const variance = components.variance;
  if (bias.present && variance.present && bias.value !== null && variance.value !== null) {
    const ratio = Math.max(bias.value, variance.value) / Math.min(bias.value, variance.value);
    if (ratio <= 2 && (top.name === 'bias' || top.name === 'variance'))
      return 'high-bias-and-variance';
  }
  if (top.name === 'bias') return 'high-bias';
  if (top.name === 'variance') return 'high-variance';
  return 'data-mismatch';
}
