/**
 * Per-slice validation changes with Holm–Bonferroni correction over the slices tested, and the
 * slices that regressed while the aggregate improved. Pure.
 */
import type { RunArtifact, Slice } from '../model/run.js';
import { binomialVariance, holmAdjust, normalTest } from '../stats/index.js';
import type { TestResult } from '../stats/types.js';
import { callOf, toMetricDelta, type CallSettings } from './noise.js';
import type { SliceChange, ValidationChange } from '../model/review.js';

function sliceTest(b: Slice, c: Slice, proportion: boolean, alpha: number): TestResult {
  const estimate = c.validation - b.validation;
  if (proportion && b.examples !== undefined && c.examples !== undefined) {
    const variance =
      binomialVariance(b.validation, b.examples) + binomialVariance(c.validation, c.examples);
    return normalTest(estimate, variance, alpha, 'z-binomial');
  }
  return { estimate, ci: null, p: null, test: 'none' };
}

export interface SliceResult {
  slices: SliceChange[];
  /** Slice names found in one run only. */
  unpaired: string[];
}

export function compareSlices(
  baseline: RunArtifact,
  candidate: RunArtifact,
  aggregate: ValidationChange,
  settings: CallSettings,
): SliceResult {
  const base = new Map((baseline.slices ?? []).map((s) => [s.name, s]));
  const proportion = baseline.metric.kind === 'proportion';
  const sign = baseline.metric.goal === 'minimize' ? 1 : -1;
  const pairs: { b: Slice; c: Slice; test: TestResult }[] = [];
  const unpaired: string[] = [];
  for (const c of candidate.slices ?? []) {
    const b = base.get(c.name);
    if (b === undefined) unpaired.push(c.name);
    else pairs.push({ b, c, test: sliceTest(b, c, proportion, settings.alpha) });
    base.delete(c.name);
  }
  unpaired.push(...base.keys());
  const adjusted = holmAdjust(pairs.map((p) => p.test.p));
  const slices = pairs.map(({ b, c, test }, i): SliceChange => {
    const pAdjusted = adjusted[i] ?? null;
    const call = callOf({ ...test, p: pAdjusted }, settings);
    // call is on the metric value; for a minimized metric 'up' is worse.
    const change: ValidationChange =
      call === 'flat' ? 'flat' : (call === 'up') === (sign === 1) ? 'worse' : 'better';
    return {
      name: c.name,
      examples: c.examples ?? null,
      baseline: b.validation,
      candidate: c.validation,
      delta: toMetricDelta(test, settings),
      pAdjusted,
      change,
      hiddenRegression: change === 'worse' && aggregate === 'better',
    };
  });
  return { slices, unpaired };
}
