import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  holmAdjust,
  mcnemarExact,
  mean,
  normalTest,
  oneSampleT,
  RunningStats,
  sampleVariance,
  twoProportionZ,
  welchT,
  wilsonInterval,
} from '../../src/stats/index.js';
import type { Interval, TestResult } from '../../src/stats/index.js';

// Property tests (fast-check). Each property is common practice for the test in question:
// relabelling baseline/candidate flips the sign of a difference, and t and z are scale-free.

const alpha = fc.double({ min: 0.001, max: 0.5, noNaN: true });
/** Values on a grid of 1/8 in [−1000, 1000]: realistic metrics, no catastrophic cancellation. */
const value = fc.integer({ min: -8000, max: 8000 }).map((i) => i / 8);
const sample = fc.array(value, { minLength: 2, maxLength: 40 });

function close(a: number, b: number, relative = 1e-9, absolute = 1e-12): boolean {
  return Math.abs(a - b) <= absolute + relative * Math.max(Math.abs(a), Math.abs(b));
}

function expectNegated(a: TestResult, b: TestResult): void {
  expect(close(b.estimate, -a.estimate)).toBe(true);
  const [lo, hi] = a.ci as Interval;
  const [lo2, hi2] = b.ci as Interval;
  expect(close(lo2, -hi)).toBe(true);
  expect(close(hi2, -lo)).toBe(true);
  expect(close(b.p as number, a.p as number)).toBe(true);
}

describe('swapping baseline and candidate negates estimate and CI and keeps p', () => {
  it('welchT', () => {
    fc.assert(
      fc.property(sample, sample, alpha, (b, c, a) =>
        expectNegated(welchT(b, c, a), welchT(c, b, a)),
      ),
    );
  });

  it('normalTest', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        alpha,
        (est, v, a) => expectNegated(normalTest(est, v, a), normalTest(-est, v, a)),
      ),
    );
  });

  it('mcnemarExact (swap b and c)', () => {
    const counts = fc
      .tuple(fc.nat(500), fc.nat(500), fc.nat(1000))
      .map(([b, c, extra]) => ({ b, c, n: b + c + extra + 1 }));
    fc.assert(
      fc.property(counts, alpha, ({ b, c, n }, a) =>
        expectNegated(mcnemarExact(b, c, n, a), mcnemarExact(c, b, n, a)),
      ),
    );
  });

  it('twoProportionZ', () => {
    const rate = fc
      .tuple(fc.integer({ min: 1, max: 5000 }), fc.double({ min: 0, max: 1, noNaN: true }))
      .map(([n, f]) => ({ x: Math.round(f * n), n }));
    fc.assert(
      fc.property(rate, rate, alpha, (r1, r2, a) => {
        const ab = twoProportionZ(r1.x, r1.n, r2.x, r2.n, a);
        const ba = twoProportionZ(r2.x, r2.n, r1.x, r1.n, a);
        expectNegated(ab, ba);
        expect(close(ba.pooledZ, -ab.pooledZ)).toBe(true);
      }),
    );
  });
});

describe('scaling all values by c > 0 scales estimate and CI and keeps p', () => {
  const scale = fc.double({ min: 1e-3, max: 1e3, noNaN: true });

  it('welchT', () => {
    fc.assert(
      fc.property(sample, sample, scale, alpha, (b, c, k, a) => {
        const r = welchT(b, c, a);
        const s = welchT(
          b.map((x) => x * k),
          c.map((x) => x * k),
          a,
        );
        const width = (r.ci as Interval)[1] - (r.ci as Interval)[0];
        expect(close(s.estimate, k * r.estimate, 1e-9, 1e-9 * k * width)).toBe(true);
        expect(
          close((s.ci as Interval)[0], k * (r.ci as Interval)[0], 1e-8, 1e-9 * k * width),
        ).toBe(true);
        expect(
          close((s.ci as Interval)[1], k * (r.ci as Interval)[1], 1e-8, 1e-9 * k * width),
        ).toBe(true);
        expect(close(s.p as number, r.p as number, 1e-5, 1e-9)).toBe(true);
      }),
    );
  });

  it('oneSampleT', () => {
    fc.assert(
      fc.property(sample, scale, alpha, (v, k, a) => {
        const r = oneSampleT(v, a);
        const s = oneSampleT(
          v.map((x) => x * k),
          a,
        );
        const width = r.ci[1] - r.ci[0];
        expect(close(s.estimate, k * r.estimate, 1e-9, 1e-9 * k * width)).toBe(true);
        expect(close(s.ci[0], k * r.ci[0], 1e-8, 1e-9 * k * width)).toBe(true);
        expect(close(s.ci[1], k * r.ci[1], 1e-8, 1e-9 * k * width)).toBe(true);
        expect(close(s.pTwoSided, r.pTwoSided, 1e-5, 1e-9)).toBe(true);
        expect(close(s.pGreater, r.pGreater, 1e-5, 1e-9)).toBe(true);
        expect(s.df).toBe(r.df);
      }),
    );
  });
});

describe('wilsonInterval', () => {
  it('contains p̂ and stays within [0, 1]', () => {
    const counts = fc
      .tuple(fc.integer({ min: 1, max: 1_000_000 }), fc.double({ min: 0, max: 1, noNaN: true }))
      .map(([n, f]) => ({ x: Math.round(f * n), n }));
    fc.assert(
      fc.property(counts, alpha, ({ x, n }, a) => {
        const [low, high] = wilsonInterval(x, n, a);
        expect(low).toBeGreaterThanOrEqual(0);
        expect(high).toBeLessThanOrEqual(1);
        expect(low).toBeLessThanOrEqual(x / n);
        expect(high).toBeGreaterThanOrEqual(x / n);
      }),
    );
  });
});

describe('holmAdjust', () => {
  it('is monotone in the order of the sorted raw p, >= raw p, <= 1, and keeps nulls', () => {
    const entry = fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { nil: null, freq: 4 });
    fc.assert(
      fc.property(fc.array(entry, { maxLength: 30 }), (ps) => {
        const out = holmAdjust(ps);
        expect(out).toHaveLength(ps.length);
        const order: number[] = [];
        ps.forEach((p, i) => {
          if (p === null) expect(out[i]).toBeNull();
          else {
            const adj = out[i] as number;
            expect(adj).toBeGreaterThanOrEqual(p);
            expect(adj).toBeLessThanOrEqual(1);
            order.push(i);
          }
        });
        order.sort((i, j) => (ps[i] as number) - (ps[j] as number));
        for (let k = 1; k < order.length; k++) {
          expect(out[order[k] as number] as number).toBeGreaterThanOrEqual(
            out[order[k - 1] as number] as number,
          );
        }
      }),
    );
  });
});

describe('RunningStats', () => {
  it('agrees with two-pass mean and variance on random arrays (relative tolerance)', () => {
    const values = fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), {
      minLength: 2,
      maxLength: 200,
    });
    fc.assert(
      fc.property(values, (xs) => {
        const running = new RunningStats();
        for (const x of xs) running.push(x);
        const m = mean(xs);
        const v = sampleVariance(xs);
        // Both are backward-stable; their difference is bounded relative to the data's magnitude.
        // Among subnormals no bound is relative: [3e-323, -6.4e-323, 0] gives means one spacing
        // apart (5e-324; fast-check seed -1283756438), hence the same floor as the variance's.
        const size = Math.max(...xs.map(Math.abs));
        expect(running.n).toBe(xs.length);
        expect(Math.abs(running.mean - m)).toBeLessThanOrEqual(1e-12 * size + 1e-300);
        expect(Math.abs(running.variance - v)).toBeLessThanOrEqual(1e-10 * size * size + 1e-300);
      }),
    );
  });
});
