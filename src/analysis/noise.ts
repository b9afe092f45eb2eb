/**
 * Significance of a measure's change between two runs, and of a component being above 0 within
 * one run, choosing the test DESIGN.md §4 prescribes for the noise information available. Pure.
 */
import type { RunArtifact } from '../model/run.js';
import { mean, normalCdf, normalTest, oneSampleT, welchT } from '../stats/index.js';
import type { Interval, TestResult } from '../stats/types.js';
import { binomialMeasureVariance, perRepeat, type Measure } from './measure.js';
import type { Call, MetricDelta, ShortfallDelta } from '../model/review.js';

export interface CallSettings {
  alpha: number;
  minEffect: number;
}

/** `up`/`down` only when significant at alpha and at least min-effect; unknown noise uses min-effect alone (when set). */
export function callOf(result: TestResult, settings: CallSettings): Call {
  const big = Math.abs(result.estimate) >= settings.minEffect && result.estimate !== 0;
  const significant = result.p === null ? settings.minEffect > 0 : result.p < settings.alpha;
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

/** Candidate − baseline of a measure (shortfall units), or null when either run lacks a split. */
export function measureChange(
  baseline: RunArtifact,
  candidate: RunArtifact,
  measure: { baseline: Measure; candidate: Measure },
  alpha: number,
): TestResult | null {
  const b = perRepeat(baseline, measure.baseline);
  const c = perRepeat(candidate, measure.candidate);
  if (b === null || c === null) return null;
  const estimate = mean(c) - mean(b);
  if (b.length >= 2 && c.length >= 2) return welchT(b, c, alpha);
  const vb = binomialMeasureVariance(baseline, measure.baseline);
  const vc = binomialMeasureVariance(candidate, measure.candidate);
  if (vb !== null && vc !== null) return normalTest(estimate, vb + vc, alpha, 'z-binomial');
  return { estimate, ci: null, p: null, test: 'none' };
}

export interface LevelTest {
  value: number;
  ci: Interval | null;
  /** One-sided p of value > 0. */
  p: number | null;
}

/** A component's mean within one run and whether it is significantly above 0. */
export function measureLevel(run: RunArtifact, measure: Measure, alpha: number): LevelTest | null {
  const values = perRepeat(run, measure);
  if (values === null) return null;
  const value = mean(values);
  if (values.length >= 2) {
    const t = oneSampleT(values, alpha);
    return { value, ci: t.ci, p: t.pGreater };
  }
  const variance = binomialMeasureVariance(run, measure);
  if (variance !== null) {
    const z = normalTest(value, variance, alpha, 'z-binomial');
    const p = variance > 0 ? 1 - normalCdf(value / Math.sqrt(variance)) : value > 0 ? 0 : 1;
    return { value, ci: z.ci, p };
  }
  return { value, ci: null, p: null };
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
