/**
 * Significance of a measure's change between two runs, and of a component being above 0 within
 * one run, choosing the test DESIGN.md §4 prescribes for the noise information available. Pure.
 */
import type { RunArtifact } from '../model/run.js';
import {
  compareSplitMeans,
  newcombeDifference,
  splitNoise,
  tCdf,
  tQuantile,
  type SplitNoise,
} from '../stats/index.js';
import type { Interval, TestResult } from '../stats/types.js';
import {
  measureSampling,
  perRepeat,
  perRepeatMagnitude,
  shortfallSign,
  type ExampleNoise,
  type Measure,
} from './measure.js';
import type { Call, MetricDelta, ShortfallDelta } from '../model/review.js';

export interface CallSettings {
  alpha: number;
  minEffect: number;
}

/**
 * `up`/`down` only when significant at alpha and at least min-effect; `undetermined` when the noise
 * is unknown (no p): size alone never decides, since an unknown noise may exceed any change.
 */
export function callOf(result: TestResult, settings: CallSettings): Call {
  if (result.p === null) return 'undetermined';
  const big = Math.abs(result.estimate) >= settings.minEffect && result.estimate !== 0;
  const significant = result.p < settings.alpha;
  if (!big || !significant) return 'flat';
  return result.estimate > 0 ? 'up' : 'down';
}

/** A test result as a change in shortfall units (up = worse), called at the settings. */
export function toShortfallDelta(result: TestResult, settings: CallSettings): ShortfallDelta {
  return { unit: 'shortfall', ...deltaFields(result, settings) };
}

/** A test result as a change in metric units, called at the settings. */
export function toMetricDelta(result: TestResult, settings: CallSettings): MetricDelta {
  return { unit: 'metric', ...deltaFields(result, settings) };
}

function deltaFields(result: TestResult, settings: CallSettings): Omit<MetricDelta, 'unit'> {
  return {
    estimate: result.estimate,
    ci: result.ci,
    p: result.p,
    test: result.test,
    call: callOf(result, settings),
  };
}

/** The noise of a measure's mean in one run (stats/split-noise.ts), or null when a split is missing. */
export function measureNoise(
  run: RunArtifact,
  measure: Measure,
  examples: ExampleNoise = {},
): SplitNoise | null {
  const values = perRepeat(run, measure);
  if (values === null) return null;
  const { sampling, rows } = measureSampling(run, measure, examples);
  const magnitude = perRepeatMagnitude(run, measure) ?? 0;
  return splitNoise({ values, sampling, evaluationRows: rows, magnitude });
}

/** Per-run σ² from per-example values, by split. */
export interface RunsExampleNoise {
  baseline?: ExampleNoise;
  candidate?: ExampleNoise;
}

/**
 * Candidate − baseline of a measure (shortfall units), or null when either run lacks a split.
 * Each run's noise combines the seed spread and the evaluation set's sampling noise
 * (stats/split-noise.ts); Welch's test with Welch–Satterthwaite df, the normal when df is ∞;
 * `none` (p null) when a run's noise cannot be known. One repeat of a proportion split in each
 * run, with examples known: Newcombe's hybrid score interval (Newcombe 1998, method 10), which
 * does not collapse at 0 or 1.
 */
export function measureChange(
  baseline: RunArtifact,
  candidate: RunArtifact,
  measure: { baseline: Measure; candidate: Measure },
  alpha: number,
  examples: RunsExampleNoise = {},
): TestResult | null {
  const b = measureNoise(baseline, measure.baseline, examples.baseline);
  const c = measureNoise(candidate, measure.candidate, examples.candidate);
  if (b === null || c === null) return null;
  const newcombe = newcombeChange(baseline, candidate, measure, alpha);
  if (newcombe !== null) return newcombe;
  return compareSplitMeans(b, c, alpha);
}

/** Newcombe's interval when the measure is one proportion split with one repeat and examples in both runs. */
function newcombeChange(
  baseline: RunArtifact,
  candidate: RunArtifact,
  measure: { baseline: Measure; candidate: Measure },
  alpha: number,
): TestResult | null {
  const counts = (run: RunArtifact, m: Measure): { x: number; n: number } | null => {
    const term = m.terms[0];
    if (run.metric.kind !== 'proportion' || m.terms.length !== 1 || m.constant !== 0) return null;
    if (term === undefined || term.weight !== 1) return null;
    const split = run.splits[term.split];
    if (split?.examples === undefined || split.values.length !== 1) return null;
    const value = split.values[0] ?? Number.NaN;
    if (!(value >= 0 && value <= 1)) return null;
    // Shortfall rate: the error rate (value for minimize, 1 − value for maximize).
    const rate = shortfallSign(run) === 1 ? value : 1 - value;
    return { x: Math.round(rate * split.examples), n: split.examples };
  };
  const b = counts(baseline, measure.baseline);
  const c = counts(candidate, measure.candidate);
  if (b === null || c === null) return null;
  const r = newcombeDifference(b.x, b.n, c.x, c.n, alpha);
  // Estimate from the stated values (the counts only round them).
  const sign = shortfallSign(candidate);
  const estimate =
    sign *
    ((candidate.splits[measure.candidate.terms[0]!.split]?.values[0] ?? 0) -
      (baseline.splits[measure.baseline.terms[0]!.split]?.values[0] ?? 0));
  const shift = estimate - r.estimate;
  return {
    estimate,
    ci: [r.ci[0] + shift, r.ci[1] + shift],
    p: r.p,
    test: 'newcombe-score',
    statistic: r.statistic,
  };
}

export interface LevelTest {
  value: number;
  ci: Interval | null;
  /** One-sided p of value > 0. */
  p: number | null;
}

/** A component's mean within one run and whether it is significantly above 0 (same noise rule). */
export function measureLevel(
  run: RunArtifact,
  measure: Measure,
  alpha: number,
  examples: ExampleNoise = {},
): LevelTest | null {
  const noise = measureNoise(run, measure, examples);
  if (noise === null) return null;
  const value = noise.mean;
  if (!noise.known) return { value, ci: null, p: null };
  const se = Math.sqrt(noise.variance);
  const half = tQuantile(1 - alpha / 2, noise.df) * se;
  return { value, ci: [value - half, value + half], p: 1 - tCdf(value / se, noise.df) };
}

/** Flip a shortfall-space result into metric units (for a maximized metric). */
export function toMetricUnits(result: TestResult, sign: 1 | -1): TestResult {
  if (sign === 1) return result;
  return {
    ...result,
    estimate: -result.estimate,
    ci: result.ci === null ? null : [-result.ci[1], -result.ci[0]],
    ...(result.statistic === undefined ? {} : { statistic: -result.statistic }),
  };
}
