/**
 * Guardrail review: each guardrail's change under the primary metric's noise rule (seed spread plus
 * the evaluation set's sampling noise, stats/split-noise.ts; undetermined when neither is known), and a non-inferiority call against its margin, Holm-adjusted across
 * the guardrails (src/stats/non-inferiority.ts). The primary verdict is never adjusted by them.
 * Pure.
 */
import type { GuardrailChange, GuardrailReview, MarginSource } from '../model/guardrails.js';
import type { Guardrail, RunArtifact, Split } from '../model/run.js';
import {
  binomialVariance,
  compareSplitMeans,
  mean,
  nonInferiorityCalls,
  nonInferiorityTest,
  splitNoise,
  type NonInferiorityTest,
  type SplitNoise,
  type WorseningEstimate,
} from '../stats/index.js';

export interface GuardrailSettings {
  alpha: number;
  /** Margins from the trusted config, by guardrail name (own properties only). */
  margins: ReadonlyMap<string, number>;
}

interface Tested {
  change: GuardrailChange;
  worsening: WorseningEstimate | null;
}

/** Sign that turns the metric into "worse is positive". */
const worseSign = (g: Guardrail): 1 | -1 => (g.metric.goal === 'minimize' ? 1 : -1);

/** A guardrail split's noise under the primary metric's rule (seed spread plus sampling noise). */
function noiseOf(g: Guardrail, split: Split, sign: 1 | -1): SplitNoise {
  const m = mean(split.values);
  const sampling =
    g.metric.kind === 'proportion' && split.examples !== undefined && m >= 0 && m <= 1
      ? { variance: binomialVariance(m, split.examples), df: Infinity, source: 'binomial' as const }
      : null;
  return splitNoise({
    values: split.values.map((v) => sign * v),
    sampling,
    evaluationRows: split.evaluationRows ?? 'fixed',
  });
}

function test(b: Guardrail, c: Guardrail, alpha: number): Tested {
  const sign = worseSign(c);
  const nb = noiseOf(b, b.splits.validation, sign);
  const nc = noiseOf(c, c.splits.validation, sign);
  const estimate = mean(c.splits.validation.values) - mean(b.splits.validation.values);
  const r = compareSplitMeans(nb, nc, alpha);
  if (r.ci === null || r.p === null || r.test === 'none') {
    return {
      change: { estimate, ci: null, p: null, test: 'none', call: 'undetermined' },
      worsening: null,
    };
  }
  // r is in "worse is positive" units; the change is reported in metric units.
  const ci: [number, number] = sign === 1 ? r.ci : [-r.ci[1], -r.ci[0]];
  const testName = r.test === 'z-binomial' ? 'z-binomial' : 'welch-t';
  return {
    change: changeOf(estimate, ci, r.p, testName, sign, alpha),
    worsening: {
      estimate: r.estimate,
      se: Math.sqrt(nb.variance + nc.variance),
      df: r.df === undefined ? null : r.df,
    },
  };
}

function changeOf(
  estimate: number,
  ci: [number, number] | null,
  p: number | null,
  testName: 'welch-t' | 'z-binomial',
  sign: 1 | -1,
  alpha: number,
): GuardrailChange {
  const significant = p !== null && p < alpha && estimate !== 0;
  const worse = sign * estimate > 0;
  return {
    estimate,
    ci,
    p,
    test: testName,
    call: significant ? (worse ? 'worse' : 'better') : 'flat',
  };
}

function marginOf(
  name: string,
  b: Guardrail | undefined,
  c: Guardrail | undefined,
  settings: GuardrailSettings,
): { margin: number | null; source: MarginSource | null; candidateIgnored: boolean } {
  const fromConfig = settings.margins.get(name);
  const candidateIgnored = (chosen: number | undefined): boolean =>
    c?.margin !== undefined && chosen !== undefined && c.margin !== chosen;
  if (fromConfig !== undefined)
    return {
      margin: fromConfig,
      source: 'config',
      candidateIgnored: candidateIgnored(fromConfig),
    };
  if (b?.margin !== undefined)
    return { margin: b.margin, source: 'baseline', candidateIgnored: candidateIgnored(b.margin) };
  if (c?.margin !== undefined)
    return { margin: c.margin, source: 'candidate', candidateIgnored: false };
  return { margin: null, source: null, candidateIgnored: false };
}

/** One entry per guardrail name found in either run, in the candidate's order then the baseline's. */
export function reviewGuardrails(
  baseline: RunArtifact,
  candidate: RunArtifact,
  settings: GuardrailSettings,
): GuardrailReview[] {
  const byName = (run: RunArtifact): Map<string, Guardrail> =>
    new Map((run.guardrails ?? []).map((g) => [g.metric.name, g]));
  const bs = byName(baseline);
  const cs = byName(candidate);
  const names = [...new Set([...cs.keys(), ...bs.keys()])];

  const drafts = names.map((name) => {
    const b = bs.get(name);
    const c = cs.get(name);
    const metric = (c ?? b)?.metric;
    if (metric === undefined) throw new Error(`guardrail ${name} vanished`);
    const { margin, source, candidateIgnored } = marginOf(name, b, c, settings);
    const review: GuardrailReview = {
      name,
      goal: metric.goal,
      kind: metric.kind,
      unit: metric.unit ?? null,
      baseline: b === undefined ? null : mean(b.splits.validation.values),
      candidate: c === undefined ? null : mean(c.splits.validation.values),
      change: null,
      margin,
      marginSource: source,
      worseningBounds: null,
      pNonInferior: null,
      nonInferiority: null,
      problems: [],
    };
    if (candidateIgnored) review.problems.push('candidate-margin-ignored');
    if (margin === null) review.problems.push('no-margin');
    if (b === undefined) review.problems.push('missing-in-baseline');
    if (c === undefined) review.problems.push('missing-in-candidate');
    if (b === undefined || c === undefined) return { review, ni: null };
    if (b.metric.goal !== c.metric.goal || b.metric.kind !== c.metric.kind) {
      review.problems.push('metric-differs');
      return { review, ni: null };
    }
    const tested = test(b, c, settings.alpha);
    review.change = tested.change;
    if (tested.worsening === null) review.problems.push('noise-unknown');
    if (margin === null) return { review, ni: null };
    if (tested.worsening === null) {
      review.nonInferiority = 'undetermined';
      return { review, ni: null };
    }
    const ni: NonInferiorityTest = nonInferiorityTest(tested.worsening, margin, settings.alpha);
    review.worseningBounds = ni.bounds;
    return { review, ni };
  });

  const calls = nonInferiorityCalls(
    drafts.map((d) => d.ni),
    settings.alpha,
  );
  return drafts.map((d, i) => {
    const call = calls[i];
    if (d.ni !== null && call !== undefined && call.call !== null) {
      d.review.nonInferiority = call.call;
      d.review.pNonInferior = call.pNonInferior;
    }
    return d.review;
  });
}
