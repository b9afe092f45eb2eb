/**
 * Seeded property suite for the noise and input-consistency rules: evaluation-set noise, unknown
 * noise, one reference per comparison, loss direction, metric scale, complement symmetry,
 * negative avoidable bias, and the power lines. fast-check with a fixed seed.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildReview } from '../../src/analysis/review.js';
import type { RunArtifact } from '../../src/model/run.js';
import type { PairedPredictions } from '../../src/model/review.js';
import { normalQuantile } from '../../src/stats/index.js';
import { makeRun, SETTINGS } from './make-run.js';

const SEED = 20261202;
const opts = { seed: SEED, numRuns: 150 };

const rate = fc.oneof(fc.constantFrom(0, 1, 0.5), fc.double({ min: 0, max: 1, noNaN: true }));
const repeats = fc.integer({ min: 1, max: 10 });
const examples = fc.integer({ min: 20, max: 5000 });

function proportionRun(
  train: number[],
  validation: number[],
  n: number,
  goal: 'minimize' | 'maximize' = 'minimize',
  reference?: number,
): RunArtifact {
  return makeRun({
    kind: 'proportion',
    goal,
    examples: n,
    train,
    validation,
    ...(reference === undefined ? {} : { reference }),
  });
}

/** σ² of one evaluation: binomial, Agresti–Coull adjusted at 0 or 1. */
function sigma2(raw: number, n: number): number {
  const p = Math.round(raw * n) / n;
  if (p > 0 && p < 1) return (p * (1 - p)) / n;
  const a = (n * p + 2) / (n + 4);
  return (a * (1 - a)) / (n + 4);
}

describe('zero spread is not zero noise', () => {
  it('identical repeats on a fixed evaluation set carry the binomial noise of that set', () => {
    fc.assert(
      fc.property(rate, rate, repeats, examples, (pb, pc, k, n) => {
        const b = proportionRun(Array(k).fill(pb), Array(k).fill(pb), n);
        const c = proportionRun(Array(k).fill(pc), Array(k).fill(pc), n);
        const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
        const d = review.validation.delta;
        expect(d.ci).not.toBeNull();
        expect(d.p).not.toBeNull();
        if (k >= 2) {
          // Source: law of total variance, fixed rows: Var(mean) = s²/k + σ² with s² = 0, and σ²
          // binomial p(1 − p)/N (Agresti & Coull 1998 at 0 or 1); normal interval (df ∞).
          const se = Math.sqrt(sigma2(pb, n) + sigma2(pc, n));
          const half = normalQuantile(0.975) * se;
          expect((d.ci![1] - d.ci![0]) / 2).toBeCloseTo(half, 9);
          expect(d.test).toBe('z-binomial');
        } else {
          // Source: Newcombe (1998) method 10: never collapses to a point.
          expect(d.test).toBe('newcombe-score');
          expect(d.ci![1] - d.ci![0]).toBeGreaterThan(0);
        }
      }),
      opts,
    );
  });

  it('0.200 → 0.201 on 1,000 examples with three identical repeats is not a change', () => {
    const b = proportionRun([0.1, 0.1, 0.1], [0.2, 0.2, 0.2], 1000);
    const c = proportionRun([0.1, 0.1, 0.1], [0.201, 0.201, 0.201], 1000);
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.validation.change).toBe('flat');
    expect(review.validation.delta.p).toBeGreaterThan(0.9);
    expect(review.validation.mde?.value).toBeGreaterThan(0.001);
  });

  it('floating-point dust moves nothing', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 5, noNaN: true }), repeats, (v, k) => {
        const dusty = (x: number): number[] =>
          Array.from({ length: k }, (_, i) => x + (i % 2) * 2.8e-17 * x);
        const b = makeRun({ train: dusty(v), validation: dusty(v + 0.3) });
        const c = makeRun({ train: dusty(v), validation: dusty(v + 0.3) });
        const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
        for (const call of [review.variance.delta.call, review.bias.delta?.call])
          expect(call === 'up' || call === 'down').toBe(false);
        expect(review.movement).toBe('undetermined');
      }),
      opts,
    );
  });
});

describe('unknown noise says cannot tell', () => {
  it('a continuous metric with one repeat or zero spread and no predictions is undetermined', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        fc.double({ min: 0.1, max: 5, noNaN: true }),
        repeats,
        (vb, vc, k) => {
          const b = makeRun({ train: Array(k).fill(vb), validation: Array(k).fill(vb + 1) });
          const c = makeRun({ train: Array(k).fill(vc), validation: Array(k).fill(vc + 0.5) });
          const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
          expect(review.validation.change).toBe('undetermined');
          expect(review.movement).toBe('undetermined');
          expect(review.validation.mde).toBeNull();
          expect(review.validation.repeatsNeeded?.reason).toBe('noise-unknown');
          expect(review.notes).toContainEqual({ code: 'noise-unknown' });
        },
      ),
      opts,
    );
  });

  it('train RMSE 1.48 → 0.42 on one repeat is not "no change"', () => {
    const b = makeRun({ train: [1.48], validation: [2.1] });
    const c = makeRun({ train: [0.42], validation: [2.0] });
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.movement).toBe('undetermined');
    expect(review.movement).not.toBe('no-significant-change');
  });
});

describe('how many repeats would decide it', () => {
  it('binomial noise alone: the MDE is (z₁₋α/₂ + z₀.₈)·SE', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.integer({ min: 2, max: 10 }),
        examples,
        (p, k, n) => {
          const b = proportionRun(Array(k).fill(p), Array(k).fill(p), n);
          const review = buildReview({ baseline: b, candidate: b, settings: SETTINGS });
          const se = Math.sqrt(2 * sigma2(p, n));
          // Source: normal approximation to the two-sided power, Chow, Shao & Wang (2008) §3.2
          // (from memory): δ = (z₁₋α/₂ + z_power)·SE; the far tail adds < 1e-6.
          const expected = (normalQuantile(0.975) + normalQuantile(0.8)) * se;
          expect(review.validation.mde?.method).toBe('normal');
          expect(review.validation.mde?.value).toBeCloseTo(expected, 5);
          // The fixed set's noise does not shrink with seeds.
          expect(review.validation.repeatsNeeded?.repeats).toBeNull();
        },
      ),
      opts,
    );
  });
});

describe('one reference per comparison', () => {
  it('a reference stated in one artifact is used for both: identical runs change nothing', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.5, max: 3, noNaN: true }), { minLength: 2, maxLength: 6 }),
        fc.double({ min: 0, max: 0.4, noNaN: true }),
        fc.boolean(),
        (train, ref, inBaseline) => {
          const validation = train.map((t, i) => t + 0.5 + 0.01 * i);
          const plain = makeRun({ train, validation });
          const withRef = makeRun({ train, validation, reference: ref });
          const [b, c] = inBaseline ? [withRef, plain] : [plain, withRef];
          const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
          expect(review.bias.delta?.estimate).toBeCloseTo(0, 12);
          expect(['up', 'down']).not.toContain(review.bias.delta?.call);
          expect(review.baseline.reference).toBe(review.candidate.reference);
          expect(review.notes).toContainEqual({
            code: 'reference-from-one-run',
            from: inBaseline ? 'baseline' : 'candidate',
            value: ref,
          });
        },
      ),
      opts,
    );
  });

  it('Δbias always equals the change of train shortfall, also when references differ', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.5, max: 3, noNaN: true }), { minLength: 2, maxLength: 6 }),
        fc.double({ min: -1, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 0.4, noNaN: true }),
        fc.double({ min: 0, max: 0.4, noNaN: true }),
        (train, shift, rb, rc) => {
          const b = makeRun({ train, validation: train.map((t) => t + 1), reference: rb });
          const ct = train.map((t, i) => t + shift + 0.01 * i);
          const c = makeRun({ train: ct, validation: ct.map((t) => t + 1), reference: rc });
          const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
          const dTrain =
            ct.reduce((a, x) => a + x, 0) / ct.length -
            train.reduce((a, x) => a + x, 0) / train.length;
          expect(review.bias.delta?.estimate).toBeCloseTo(dTrain, 9);
          if (rb !== rc)
            expect(review.notes).toContainEqual({
              code: 'references-differ',
              baseline: rb,
              candidate: rc,
            });
        },
      ),
      opts,
    );
  });
});

describe('direction of per-example values', () => {
  it('R² 0.80 → 0.85 with 20% smaller losses is better', () => {
    const b = makeRun({ goal: 'maximize', train: [0.9], validation: [0.8] });
    const c = makeRun({ goal: 'maximize', train: [0.92], validation: [0.85] });
    const paired: PairedPredictions = {
      kind: 'continuous',
      rows: 1000,
      meanDiff: -0.05,
      varDiff: 0.01,
      split: 'validation',
      sides: {
        baseline: { n: 1000, mean: 0.25, variance: 0.04 },
        candidate: { n: 1000, mean: 0.2, variance: 0.03 },
      },
    };
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS, paired });
    expect(review.validation.delta.test).toBe('paired-t');
    expect(review.validation.delta.estimate).toBeGreaterThan(0);
    expect(review.validation.change).toBe('better');
    // Shortfall ∝ mean loss: 0.20 × (−0.05 / 0.25) = −0.04 shortfall, +0.04 R² (common practice).
    expect(review.validation.delta.estimate).toBeCloseTo(0.04, 12);
    expect(review.paired).toMatchObject({ test: 'paired-t', reason: null });
  });

  it('with ≥ 2 repeats in both runs the paired block names no test and says why', () => {
    const b = makeRun({ train: [0.9, 0.91], validation: [1.0, 1.02] });
    const c = makeRun({ train: [0.8, 0.82], validation: [0.95, 0.96] });
    const paired: PairedPredictions = {
      kind: 'continuous',
      rows: 100,
      meanDiff: -0.05,
      varDiff: 0.01,
      split: 'validation',
      sides: {
        baseline: { n: 100, mean: 1.0, variance: 0.04 },
        candidate: { n: 100, mean: 0.95, variance: 0.03 },
      },
    };
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS, paired });
    expect(review.validation.delta.test).toBe('welch-t');
    expect(review.paired).toMatchObject({ test: null, reason: 'repeats' });
    expect(review.notes).toContainEqual({ code: 'repeats-decided' });
  });
});

describe('symmetry', () => {
  it('a maximized proportion and its complement as a minimized one give the same verdict', () => {
    fc.assert(
      fc.property(
        repeats,
        examples,
        fc.array(rate, { minLength: 4, maxLength: 4 }),
        fc.array(fc.double({ min: -0.02, max: 0.02, noNaN: true }), {
          minLength: 10,
          maxLength: 10,
        }),
        (k, n, [tb, vb, tc, vc], jitter) => {
          const rows = (x: number, j: number): number[] =>
            Array.from({ length: k }, (_, i) =>
              Math.min(1, Math.max(0, x + (jitter[(i + j) % 10] ?? 0))),
            );
          const runs = { tb: rows(tb!, 0), vb: rows(vb!, 3), tc: rows(tc!, 5), vc: rows(vc!, 7) };
          const flip = (v: number[]): number[] => v.map((x) => 1 - x);
          const min = buildReview({
            baseline: proportionRun(runs.tb, runs.vb, n),
            candidate: proportionRun(runs.tc, runs.vc, n),
            settings: SETTINGS,
          });
          const max = buildReview({
            baseline: proportionRun(flip(runs.tb), flip(runs.vb), n, 'maximize'),
            candidate: proportionRun(flip(runs.tc), flip(runs.vc), n, 'maximize'),
            settings: SETTINGS,
          });
          expect(max.movement).toBe(min.movement);
          expect(max.validation.change).toBe(min.validation.change);
          expect(max.candidate.diagnosis).toBe(min.candidate.diagnosis);
          expect(max.baseline.diagnosis).toBe(min.baseline.diagnosis);
          expect(max.validation.delta.estimate).toBeCloseTo(-min.validation.delta.estimate, 9);
        },
      ),
      opts,
    );
  });
});

describe('metric scale and negative avoidable bias', () => {
  it('the error level of a maximized metric is best − value', () => {
    const run = makeRun({ goal: 'maximize', train: [99.9, 99.8], validation: [99.76, 99.7] });
    run.metric.best = 100;
    const review = buildReview({ baseline: run, candidate: run, settings: SETTINGS });
    expect(review.candidate.errorLevel).toBeCloseTo(0.27, 9);
  });

  it('train error significantly below the reference is flagged', () => {
    const run = makeRun({
      reference: 0.5,
      train: [0.1, 0.11, 0.12],
      validation: [0.6, 0.62, 0.61],
    });
    const review = buildReview({ baseline: run, candidate: run, settings: SETTINGS });
    expect(review.candidate.warnings).toContain('below-reference');
  });
});
