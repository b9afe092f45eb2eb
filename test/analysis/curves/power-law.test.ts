import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitPowerLaw, type PowerLawFit } from '../../../src/analysis/curves/power-law.js';
import { gapTrend } from '../../../src/analysis/curves/gap-trend.js';
import { fixturePath } from './nist-fixtures.js';
import { gaussian } from '../../stats/random.js';

interface Frozen {
  m: number[];
  e: number[];
  a: number;
  b: number;
  c: number;
  covariance: number[][];
  rss: number;
  r2: number;
  projections: { x: number; value: number; ci: [number, number] }[];
}
const frozen = JSON.parse(readFileSync(fixturePath('scipy-power-law-crosscheck.json'), 'utf8')) as {
  curves: Record<string, Frozen>;
};

const boundRef = JSON.parse(
  readFileSync(new URL('../../fixtures/stats/scipy-power-law-bound.json', import.meta.url), 'utf8'),
) as {
  curves: Record<
    string,
    {
      m: number[];
      e: number[];
      a: number;
      b: number;
      c: number;
      rss: number;
      projections: { x: number; value: number; ci: [number, number] }[];
    }
  >;
};

function fitted(m: number[], e: number[]): PowerLawFit {
  const fit = fitPowerLaw(m, e, { lower: 0, upper: 1 });
  if ('skipped' in fit) throw new Error(fit.skipped);
  return fit;
}

describe('fitPowerLaw', () => {
  for (const [name, ref] of Object.entries(frozen.curves)) {
    it(`matches SciPy curve_fit on the ${name} curve (parameters, R², delta-method intervals)`, () => {
      // Source: SciPy 1.17.1 curve_fit + scipy.stats.t, frozen in
      // test/fixtures/curves/scipy-power-law-crosscheck.json by the .py beside it.
      const fit = fitted(ref.m, ref.e);
      expect(fit.a).toBeCloseTo(ref.a, 5);
      expect(fit.b / ref.b).toBeCloseTo(1, 6);
      expect(fit.c / ref.c).toBeCloseTo(1, 6);
      expect(fit.rss / ref.rss).toBeCloseTo(1, 8);
      expect(fit.r2).toBeCloseTo(ref.r2, 10);
      expect(fit.residual).toBeCloseTo(Math.sqrt(ref.rss / (ref.m.length - 3)), 10);
      expect(fit.projections.map((p) => p.x)).toEqual(ref.projections.map((p) => p.x));
      fit.projections.forEach((p, i) => {
        const r = ref.projections[i]!;
        expect(p.error).toBeCloseTo(r.value, 7);
        expect(p.ci[0]).toBeCloseTo(r.ci[0], 6);
        expect(p.ci[1]).toBeCloseTo(r.ci[1], 6);
      });
    });
  }

  it('says why it does not fit fewer than 4 points', () => {
    expect(fitPowerLaw([1000, 2000, 4000], [0.3, 0.2, 0.15], { lower: 0, upper: 1 })).toEqual({
      skipped: 'needs at least 4 points, has 3',
    });
  });

  it('never projects beyond 4× the largest m', () => {
    expect(() =>
      fitPowerLaw([1, 2, 3, 4], [4, 3, 2, 1], { lower: 0, upper: 1, multiples: [8] }),
    ).toThrow(RangeError);
  });

  it('recovers an exact power law', () => {
    const m = [1000, 2000, 4000, 8000, 16000, 32000];
    const e = m.map((x) => 3 * x ** -0.4 + 0.05);
    const fit = fitted(m, e);
    expect(fit.a).toBeCloseTo(3, 6);
    expect(fit.b).toBeCloseTo(0.4, 8);
    expect(fit.c).toBeCloseTo(0.05, 8);
    expect(fit.projections[0]!.error).toBeCloseTo(3 * 64000 ** -0.4 + 0.05, 10);
  });

  it('keeps c inside the metric range (proportion: c ≥ 0)', () => {
    // A curve heading below zero: the unconstrained asymptote would be negative.
    const m = [100, 200, 400, 800, 1600];
    const e = [0.5, 0.36, 0.255, 0.18, 0.125];
    const fit = fitted(m, e);
    expect(fit.c).toBeGreaterThanOrEqual(0);
    fit.projections.forEach((p) => expect(p.ci[0]).toBeGreaterThanOrEqual(0));
  });

  it('recovers a noisy synthetic power law: the true projection lies inside the 95% interval for most seeds', () => {
    // Property: with Gaussian noise of SD 0.002 on 8 points, the delta-method interval for the
    // fitted curve at 2× should cover the true value in about 95% of samples; we ask for ≥ 85%
    // over 200 samples (the delta method is approximate for a nonlinear model). Noise comes from a
    // seeded generator, so each fast-check sample is one seed; parameters are drawn without
    // fast-check's bias toward the ends of their ranges.
    let covered = 0;
    let fitted = 0;
    fc.assert(
      fc.property(
        fc.noBias(fc.double({ min: 0.1, max: 0.4, noNaN: true })),
        fc.noBias(fc.double({ min: 0.2, max: 0.8, noNaN: true })),
        fc.noBias(fc.double({ min: 0.01, max: 0.2, noNaN: true })),
        fc.noBias(fc.integer({ min: 1, max: 2 ** 31 - 1 })),
        (span, b, c, seed) => {
          const m = [250, 500, 1000, 2000, 4000, 8000, 16000, 32000];
          const a = span * 250 ** b; // the curve starts `span` above its asymptote
          const truth = (x: number) => a * x ** -b + c;
          const normal = gaussian(seed);
          const e = m.map((x) => truth(x) + 0.002 * normal());
          const fit = fitPowerLaw(m, e, { lower: 0, upper: 1 });
          if ('skipped' in fit) return true; // counted as not covered
          fitted++;
          const p = fit.projections[0]!;
          if (p.ci[0] <= truth(p.x) && truth(p.x) <= p.ci[1]) covered++;
          return p.ci[0] <= p.error && p.error <= p.ci[1];
        },
      ),
      { numRuns: 200, seed: 20261130 },
    );
    expect(fitted).toBeGreaterThanOrEqual(190);
    expect(covered / 200).toBeGreaterThanOrEqual(0.85);
  });
});

describe('fitPowerLaw intervals when the asymptote sits at its bound', () => {
  it('covers the true projection at least 90% of the time at nominal 95% (true asymptote at or near 0)', () => {
    // Property (simulation): curves a·m^(−b) + c with c = 0 or just above it, 5–10 points doubling
    // from m0, Gaussian noise; a fit that puts c on its bound 0 used to get an interval that
    // treated c as known (3–4× too narrow, 61–86% coverage in this generator). Source for the
    // target: the definition of a 95% confidence interval (common practice); the full-Jacobian
    // covariance is the module note's rule. Measured when written: 96% over all fits, 99% at bound.
    const grid = (lo: number, hi: number) =>
      fc.integer({ min: 0, max: 10_000 }).map((i) => lo + ((hi - lo) * i) / 10_000);
    let runs = 0;
    let atBound = 0;
    const covered = { all: 0, bound: 0 };
    fc.assert(
      fc.property(
        fc.record({
          span: grid(0.05, 0.4),
          b: grid(0.2, 1),
          c: fc.oneof(
            fc.constant(0),
            grid(0, 0.1).map((x) => x * x),
          ), // 0 … 0.01, crowded near 0
          points: fc.integer({ min: 5, max: 10 }),
          m0: fc.integer({ min: 100, max: 1000 }),
          sd: grid(0.0005, 0.0065),
          seed: fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        }),
        ({ span, b, c, points, m0, sd, seed }) => {
          const m = Array.from({ length: points }, (_, i) => m0 * 2 ** i);
          const a = span * m0 ** b;
          const truth = (x: number) => a * x ** -b + c;
          const normal = gaussian(seed);
          const e = m.map((x) => Math.max(0, truth(x) + sd * normal()));
          const fit = fitPowerLaw(m, e, { lower: 0, upper: 1 });
          if ('skipped' in fit) return true; // counted as not covered
          runs++;
          const p = fit.projections[0]!;
          const inside = p.ci[0] <= truth(p.x) && truth(p.x) <= p.ci[1];
          if (inside) covered.all++;
          if (fit.atBound.c) {
            atBound++;
            if (inside) covered.bound++;
            expect(fit.intervalCovariance).toBe('full');
          }
          return p.ci[0] <= p.error && p.error <= p.ci[1];
        },
      ),
      { numRuns: 400, seed: 20260915 },
    );
    expect(runs).toBeGreaterThanOrEqual(390);
    expect(atBound).toBeGreaterThanOrEqual(80); // the property really exercises the bound
    expect(covered.all / 400).toBeGreaterThanOrEqual(0.9);
    expect(covered.bound / atBound).toBeGreaterThanOrEqual(0.9);
  });

  for (const [name, r] of Object.entries(boundRef.curves)) {
    it(`matches SciPy curve_fit with bounds on the ${name} curve (c at 0, full covariance)`, () => {
      // Source: SciPy 1.10.1 curve_fit(bounds=…, method='trf'), whose pcov covers all three
      // parameters at a bound; frozen by test/fixtures/stats/scipy-power-law-bound.py.
      const fit = fitted(r.m, r.e);
      expect(fit.atBound.c).toBe(true);
      expect(fit.c).toBe(0);
      expect(fit.intervalCovariance).toBe('full');
      expect(fit.a / r.a).toBeCloseTo(1, 6);
      expect(fit.b / r.b).toBeCloseTo(1, 6);
      expect(fit.rss / r.rss).toBeCloseTo(1, 8);
      fit.projections.forEach((p, k) => {
        const q = r.projections[k]!;
        expect(p.x).toBe(q.x);
        expect(p.error).toBeCloseTo(q.value, 7);
        expect(p.ci[0]).toBeCloseTo(q.ci[0], 6);
        expect(p.ci[1]).toBeCloseTo(q.ci[1], 6);
      });
    });
  }
});

describe('gapTrend', () => {
  it('calls a gap that halves per doubling closing, a constant gap flat', () => {
    // Hand-checkable: gap 0.08, 0.04, 0.02 at m = 1000, 2000, 4000 (slope in log2 m = −0.03,
    // mean gap 0.04667 → −64% per doubling).
    const closing = gapTrend([
      { x: 1000, trainError: 0.1, validationError: 0.18 },
      { x: 2000, trainError: 0.11, validationError: 0.15 },
      { x: 4000, trainError: 0.12, validationError: 0.14 },
    ]);
    expect(closing.trend).toBe('closing');
    expect(closing.changePerDoubling).toBeCloseTo(-0.03 / (0.14 / 3), 10);
    const flat = gapTrend([
      { x: 1000, trainError: 0.2, validationError: 0.25 },
      { x: 2000, trainError: 0.2, validationError: 0.25 },
      { x: 4000, trainError: 0.2, validationError: 0.25 },
      { x: 8000, trainError: 0.2, validationError: 0.25 },
    ]);
    expect(flat).toEqual({ trend: 'flat', changePerDoubling: 0 });
  });

  it('is unknown without train values at three points', () => {
    expect(
      gapTrend([
        { x: 1, validationError: 0.2 },
        { x: 2, validationError: 0.1 },
      ]).trend,
    ).toBe('unknown');
  });
});
