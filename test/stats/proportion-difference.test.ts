import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { newcombeDifference, newcombeInterval, twoProportionZ } from '../../src/stats/index.js';
import { expectNear, expectPrinted } from './close.js';

interface FrozenCase {
  x1: number;
  n1: number;
  x2: number;
  n2: number;
  p: number;
  ci: Record<string, [number, number]>;
}
// Source: computed (statsmodels 0.13.5, SciPy 1.10.1), frozen by test/fixtures/stats/newcombe-statsmodels.py
const frozen = JSON.parse(
  readFileSync(new URL('../fixtures/stats/newcombe-statsmodels.json', import.meta.url), 'utf8'),
) as { cases: FrozenCase[] };

describe('newcombeInterval (Newcombe 1998, method 10)', () => {
  // Table II of Newcombe (1998) prints x1/n1 − x2/n2; here the first is the candidate.
  const table: [string, number, number, number, number, string, string][] = [
    ['56/70 − 48/80', 48, 80, 56, 70, '0.0524', '0.3339'],
    ['9/10 − 3/10', 3, 10, 9, 10, '0.1705', '0.8090'],
    ['6/7 − 2/7', 2, 7, 6, 7, '0.0582', '0.8062'],
    ['5/56 − 0/29', 0, 29, 5, 56, '-0.0381', '0.1926'],
    ['0/10 − 0/20', 0, 20, 0, 10, '-0.1611', '0.2775'],
    ['10/10 − 0/20', 0, 20, 10, 10, '0.6791', '1.0000'],
  ];
  for (const [label, x1, n1, x2, n2, low, high] of table) {
    it(`${label} → ${low}, ${high}`, () => {
      const [l, h] = newcombeInterval(x1, n1, x2, n2, 0.05);
      // Source: Newcombe (1998) Table II, method 10 (from memory; VALUES.md §11), confirmed by
      // statsmodels 0.13.5 confint_proportions_2indep(method='newcomb') in newcombe-statsmodels.json
      expectPrinted(l, low);
      expectPrinted(h, high);
    });
  }

  it('7/34 − 1/34 → 0.019, 0.340', () => {
    // Source: Fagerland, Lydersen & Laake (2015), Stat Methods Med Res 24:224–254, Newcombe hybrid
    // score row, read in statsmodels' test_proportion.py (test_confint_2indep).
    const [l, h] = newcombeInterval(1, 34, 7, 34, 0.05);
    expectPrinted(l, '0.019');
    expectPrinted(h, '0.340');
  });

  it('does not collapse when both rates sit at 1 (540/540 vs 375/375) or at 0', () => {
    // Source: computed (statsmodels 0.13.5), VALUES.md §11 and newcombe-statsmodels.json
    const [l, h] = newcombeInterval(540, 540, 375, 375, 0.05);
    expectNear(l, -0.010140017, 1e-8);
    expectNear(h, 0.007063564, 1e-8);
    const zero = newcombeInterval(0, 1000, 0, 200, 0.05);
    expect(zero[0]).toBeLessThan(0);
    expect(zero[1]).toBeGreaterThan(0);
    // The Wald interval of the z test collapses on the same counts (the defect this replaces).
    expect(twoProportionZ(540, 540, 375, 375, 0.05).ci).toEqual([0, 0]);
  });

  it('rejects bad counts and alpha', () => {
    expect(() => newcombeInterval(5, 4, 1, 4, 0.05)).toThrow(/must not exceed/);
    expect(() => newcombeInterval(0, 0, 1, 4, 0.05)).toThrow(/at least 1/);
    expect(() => newcombeInterval(1, 4, 1.5, 4, 0.05)).toThrow(RangeError);
    expect(() => newcombeInterval(1, 4, 1, 4, 1)).toThrow(/alpha/);
  });
});

/**
 * Counts whose rates are often close (so p lands anywhere in (0, 1), not only near 0), with 0/n
 * and n/n on either side a fair share of the time.
 */
const counts = fc
  .record({
    n1: fc.integer({ min: 1, max: 2000 }),
    n2: fc.integer({ min: 1, max: 2000 }),
    // Rates on a grid of 1e-4 (fast-check's doubles crowd towards 0, which would make most
    // rates 0 and most p exactly 1).
    f1: fc.oneof(
      fc.constant(0),
      fc.constant(1),
      fc.integer({ min: 0, max: 10000 }).map((i) => i / 1e4),
    ),
    shift: fc.oneof(
      fc.constant(0),
      fc.integer({ min: -1000, max: 1000 }).map((i) => i / 1e4),
      fc.integer({ min: -10000, max: 10000 }).map((i) => i / 1e4),
    ),
  })
  .map(({ n1, n2, f1, shift }) => {
    const f2 = Math.min(1, Math.max(0, f1 + shift));
    return { n1, n2, x1: Math.round(f1 * n1), x2: Math.round(f2 * n2) };
  });

describe('newcombeDifference', () => {
  it(`matches statsmodels on ${frozen.cases.length} frozen cases (interval at three levels, inverted p)`, () => {
    // Source: computed (statsmodels 0.13.5, SciPy 1.10.1 brentq), newcombe-statsmodels.json
    for (const c of frozen.cases) {
      for (const [alpha, [low, high]] of Object.entries(c.ci)) {
        const r = newcombeDifference(c.x1, c.n1, c.x2, c.n2, Number(alpha));
        expectNear(r.ci[0], low, 1e-9);
        expectNear(r.ci[1], high, 1e-9);
        expect(r.estimate).toBe(c.x2 / c.n2 - c.x1 / c.n1);
        if (c.p < 1e-250) expect(r.p).toBeLessThan(1e-250);
        else expect(Math.abs(r.p - c.p)).toBeLessThanOrEqual(1e-7 * c.p + 1e-15);
      }
    }
  });

  it('gives p = 1 for equal rates, including both at 1', () => {
    const r = newcombeDifference(540, 540, 375, 375, 0.05);
    expect(r).toMatchObject({ estimate: 0, p: 1, statistic: 0, test: 'newcombe-score' });
  });

  it('agrees with its interval at every alpha: p < alpha ⇔ 0 ∉ CI, including 0/n and n/n', () => {
    // Test–interval duality (Casella & Berger §9.2, from memory): the property that defines p here.
    let nearBoundary = 0;
    let pInRange = 0;
    fc.assert(
      fc.property(
        counts,
        fc.integer({ min: 1, max: 999_999 }).map((i) => i / 1e6),
        ({ x1, n1, x2, n2 }, alpha) => {
          const r = newcombeDifference(x1, n1, x2, n2, alpha);
          const excludes = r.ci[0] > 0 || r.ci[1] < 0;
          if (r.p > 1e-6 && r.p < 0.999) pInRange++;
          if (Math.abs(r.p - alpha) <= 1e-9 * alpha) {
            nearBoundary++; // within the bisection's precision: either answer is right
            return true;
          }
          return r.p < alpha === excludes;
        },
      ),
      { numRuns: 3000, seed: 9001 },
    );
    expect(nearBoundary).toBeLessThanOrEqual(3);
    expect(pInRange).toBeGreaterThan(500); // the property met p values on both sides of alpha
  });

  it('at alpha = p the bound nearer 0 touches 0', () => {
    let checked = 0;
    fc.assert(
      fc.property(counts, ({ x1, n1, x2, n2 }) => {
        const r = newcombeDifference(x1, n1, x2, n2, 0.05);
        // Below p ≈ 1e-6, 1 − p/2 in the level → z conversion loses digits (not the root finder).
        if (r.estimate === 0 || !(r.p > 1e-6 && r.p < 1)) return true;
        const [low, high] = newcombeInterval(x1, n1, x2, n2, r.p);
        checked++;
        return Math.abs(r.estimate > 0 ? low : high) < 1e-9;
      }),
      { numRuns: 1000, seed: 9002 },
    );
    expect(checked).toBeGreaterThan(200);
  });

  it('mirrors when baseline and candidate swap', () => {
    fc.assert(
      fc.property(counts, ({ x1, n1, x2, n2 }) => {
        const a = newcombeDifference(x1, n1, x2, n2, 0.05);
        const b = newcombeDifference(x2, n2, x1, n1, 0.05);
        const near = (u: number, v: number): boolean => Math.abs(u - v) <= 1e-12;
        return (
          near(a.estimate, -b.estimate) &&
          near(a.ci[0], -b.ci[1]) &&
          near(a.ci[1], -b.ci[0]) &&
          Math.abs(a.p - b.p) <= 1e-9 * a.p + 1e-300
        );
      }),
      { numRuns: 300, seed: 9003 },
    );
  });
});
