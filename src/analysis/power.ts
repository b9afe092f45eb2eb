/**
 * What the design could detect (DESIGN.md §4): for a flat or undetermined validation change, the
 * smallest change detectable with 80% power at the two-sided alpha and the repeats per run that
 * would detect the observed change (stats/power.ts names each method's source). Also the per-split
 * sampling noise that per-example values give. Pure.
 */
import type { RunArtifact } from '../model/run.js';
import type { PairedPredictions, Review } from '../model/review.js';
import {
  binomialSamplingVariance,
  mdeMeans,
  mdeTwoProportions,
  mean,
  repeatsNeeded,
  type SamplingVariance,
} from '../stats/index.js';
import type { TestResult } from '../stats/types.js';
import { lossScale } from './changes.js';
import { measureNoise, type RunsExampleNoise } from './noise.js';
import { shortfallSign, splitMeasure, type ExampleNoise } from './measure.js';

type Runs = { baseline: RunArtifact; candidate: RunArtifact };
type Validation = Review['validation'];

/** σ² of one repeat of the predictions split from one file's per-example values. */
function sideNoise(
  paired: PairedPredictions,
  run: RunArtifact,
  side: 'baseline' | 'candidate',
): ExampleNoise {
  const stats = paired.sides?.[side];
  const split = paired.split ?? 'validation';
  const values = run.splits[split]?.values;
  if (stats === undefined || values === undefined || stats.n < 2) return {};
  let sampling: SamplingVariance | null = null;
  if (paired.kind === 'proportion') {
    const rate = Math.min(1, Math.max(0, mean(values)));
    sampling = binomialSamplingVariance(rate, stats.n);
  } else {
    const scale = lossScale({ ...paired, sides: { baseline: stats, candidate: stats } }, run);
    if (scale === null || !(stats.variance > 0)) return {};
    // σ² of the mean loss is s²/N (common practice), carried to the metric by the scale.
    sampling = {
      variance: (stats.variance / stats.n) * scale * scale,
      df: stats.n - 1,
      source: 'per-example',
    };
  }
  return { [split]: sampling };
}

/** Per-run sampling noise from the predictions files' own rows. */
export function exampleNoise(runs: Runs, paired: PairedPredictions | undefined): RunsExampleNoise {
  if (paired?.sides === undefined) return {};
  return {
    baseline: sideNoise(paired, runs.baseline, 'baseline'),
    candidate: sideNoise(paired, runs.candidate, 'candidate'),
  };
}

/** `mde` and `repeatsNeeded` of the validation change (shortfall units in, magnitudes out). */
export function validationPower(
  runs: Runs,
  shortfall: TestResult,
  alpha: number,
  examples: RunsExampleNoise,
): Pick<Validation, 'mde' | 'repeatsNeeded'> {
  const measure = splitMeasure('validation');
  const b = measureNoise(runs.baseline, measure, examples.baseline);
  const c = measureNoise(runs.candidate, measure, examples.candidate);
  if (b === null || c === null) throw new Error('validation split is required by the schema');
  const atLeast = b.basis.missing.length > 0 || c.basis.missing.length > 0;
  let mde: Validation['mde'] = null;
  if (shortfall.test === 'newcombe-score') {
    // One repeat of a proportion each: Fleiss, Levin & Paik (2003) on the error rates.
    const nb = runs.baseline.splits.validation.examples ?? 0;
    const nc = runs.candidate.splits.validation.examples ?? 0;
    const value = runs.baseline.splits.validation.values[0] ?? 0;
    const rate = shortfallSign(runs.baseline) === 1 ? value : 1 - value;
    const both = mdeTwoProportions(Math.min(1, Math.max(0, rate)), nb, nc, alpha);
    const found = [both.increase, both.decrease].filter((x): x is number => x !== null);
    if (found.length > 0)
      mde = { value: Math.min(...found), method: 'fleiss-two-proportions', atLeast };
  } else {
    const value = mdeMeans(b, c, alpha);
    if (value !== null) {
      mde = {
        value,
        method: b.df === Infinity && c.df === Infinity ? 'normal' : 'welch-noncentral-t',
        atLeast,
      };
    }
  }
  const r = repeatsNeeded(shortfall.estimate, b, c, alpha);
  const needed: Validation['repeatsNeeded'] =
    r.repeats === null
      ? { repeats: null, lowerBound: false, reason: r.reason }
      : { repeats: r.repeats, lowerBound: r.lowerBound, reason: null };
  return { mde, repeatsNeeded: needed };
}
