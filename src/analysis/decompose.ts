/**
 * Error decomposition of one run (DESIGN.md §3) and its diagnosis (§6). Pure.
 */
import type { RunArtifact } from '../model/run.js';
import { mean } from '../stats/index.js';
import { shortfallSign, type Measure } from './measure.js';
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

/** The reference level: config override, the artifact's own, 0 for a minimized proportion, else unknown. */
export function chooseReference(run: RunArtifact, override: number | undefined): ReferenceChoice {
  if (override !== undefined) return { value: override, source: 'config' };
  if (run.reference !== undefined) return { value: run.reference, source: 'artifact' };
  if (run.metric.kind === 'proportion' && run.metric.goal === 'minimize')
    return { value: 0, source: 'default' };
  return { value: null, source: 'unknown' };
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

/** Validation error level e: mean validation for minimize, 1 − mean for maximize (DESIGN.md §6). */
export function errorLevel(run: RunArtifact): number {
  const m = mean(run.splits.validation.values);
  return Math.abs(run.metric.goal === 'minimize' ? m : 1 - m);
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
): Record<ComponentName, Component> {
  const measures = componentMeasures(run, reference);
  const threshold = Math.max(settings.gapTolerance * errorLevel(run), settings.minEffect);
  const out = {} as Record<ComponentName, Component>;
  for (const name of ['bias', 'variance', 'mismatch', 'overfit'] as const) {
    const measure = measures[name];
    const level = measure === null ? null : measureLevel(run, measure, settings.alpha);
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
