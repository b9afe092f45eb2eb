import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  epochVerdict,
  generalizationLoss,
  glStop,
  pqStop,
  progressQuotient,
  trainingProgress,
  upStop,
} from '../../../src/analysis/curves/early-stopping.js';

// Hand-checkable sequence of VALUES.md §8, derived from Prechelt's (1998) definitions
// ("Early Stopping — But When?", LNCS 1524, pp. 55–69): GL(t) = 100·(E_va(t)/E_opt(t) − 1),
// P_k(t) = 1000·(Σ strip E_tr / (k·min strip E_tr) − 1), PQ = GL/P_k, k = 5.
const validation = [1.0, 0.8, 0.7, 0.72, 0.75];
const train = [1.0, 0.9, 0.85, 0.82, 0.8];

describe("Prechelt's criteria on the hand-checked sequence", () => {
  it('GL(5) = 7.142857 %', () => {
    // Source: derived from Prechelt's (1998) definitions, VALUES.md §8: 100·(0.75/0.70 − 1).
    const gl = generalizationLoss(validation);
    expect(gl[4]).toBeCloseTo(7.142857, 6);
    // E_opt runs 1.0, 0.8, 0.7, 0.7, 0.7: GL is 0 while E_va keeps falling, then 2.857 at t = 4.
    expect(gl.slice(0, 3)).toEqual([0, 0, 0]);
    expect(gl[3]).toBeCloseTo((100 * 0.02) / 0.7, 10);
  });

  it('P_5(5) = 92.5 per mille and PQ = 0.0772201', () => {
    // Source: derived from Prechelt's (1998) definitions, VALUES.md §8: 1000·(0.874/0.80 − 1).
    const progress = trainingProgress(train);
    expect(progress.slice(0, 4)).toEqual([null, null, null, null]);
    expect(progress[4]).toBeCloseTo(92.5, 10);
    const pq = progressQuotient(validation, train);
    expect(pq.slice(0, 4)).toEqual([null, null, null, null]);
    expect(pq[4]).toBeCloseTo(0.0772201, 7);
  });

  it('GL_5 fires at the fifth epoch, PQ_0.5 does not', () => {
    // Source: derived from Prechelt's (1998) definitions, VALUES.md §8.
    expect(glStop(validation, 5)).toBe(4);
    expect(glStop(validation, 2)).toBe(3); // GL(4) = 2.857 > 2
    expect(pqStop(validation, train, 0.5)).toBeNull();
  });

  it('the verdict on it: minimum at the third epoch, stopped late', () => {
    const v = epochVerdict(validation, train);
    expect(v.bestIndex).toBe(2);
    expect(v.gl).toBeCloseTo(7.142857, 6);
    expect(v.pq).toBeCloseTo(0.0772201, 7);
    expect(v.stoppedLate).toBe(true);
    expect(v.stoppedEarly).toBe(false);
    expect(v.stopsAt).toMatchObject({ GL_1: 3, GL_2: 3, GL_3: 4, GL_5: 4, 'PQ_0.5': null });
  });
});

describe('UP_s', () => {
  it('fires after s successive strips of rising validation error', () => {
    // Derived from Prechelt's (1998) definition of UP_s (VALUES.md §8): checked at strip ends
    // t = 5, 10, 15, 20 (1-based); values there 0.50, 0.52, 0.55, 0.60 rise three times.
    const v = Array.from({ length: 20 }, (_, i) => 0.9 - i * 0.01);
    v[4] = 0.5;
    v[9] = 0.52;
    v[14] = 0.55;
    v[19] = 0.6;
    expect(upStop(v, 2)).toBe(14);
    expect(upStop(v, 3)).toBe(19);
    expect(upStop(v, 4)).toBeNull();
  });
});

describe('epochVerdict', () => {
  it('property: a strictly decreasing validation curve has its minimum at the last point and never stopped late', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 1e-6, max: 1, noNaN: true }), { minLength: 1, maxLength: 300 }),
        fc.double({ min: 0.01, max: 10, noNaN: true }),
        fc.boolean(),
        (drops, start, withTrain) => {
          const values: number[] = [start];
          for (const d of drops) values.push(values[values.length - 1]! - d);
          const t = withTrain ? values.map((v) => v - 0.1) : null;
          const verdict = epochVerdict(values, t);
          expect(verdict.bestIndex).toBe(values.length - 1);
          expect(verdict.gl).toBe(0);
          expect(verdict.stoppedLate).toBe(false);
        },
      ),
    );
  });

  it('calls a run still improving on both curves stopped early', () => {
    const v = [0.9, 0.8, 0.72, 0.66, 0.61, 0.57, 0.54, 0.52];
    const t = [0.85, 0.74, 0.65, 0.58, 0.52, 0.47, 0.43, 0.4];
    const verdict = epochVerdict(v, t);
    expect(verdict.stoppedEarly).toBe(true);
    expect(verdict.stoppedLate).toBe(false);
  });

  it('does not call a converged run stopped early (P_5 < 0.1 per mille)', () => {
    // Training error falling by 1e-7 per epoch: P_5 ≈ 0.0006 per mille, under Prechelt's 0.1.
    const v = [0.5, 0.4, 0.35, 0.32, 0.3, 0.29999, 0.29998, 0.29997, 0.29996];
    const t = v.map((_, i) => 0.2 - i * 1e-7);
    expect(epochVerdict(v, t).stoppedEarly).toBe(false);
  });

  it('cannot say stopped early without train values', () => {
    expect(epochVerdict([0.9, 0.8, 0.7, 0.6, 0.5, 0.4], null).stoppedEarly).toBe(false);
  });
});

describe('epochVerdict in one pass equals the criteria computed array by array', () => {
  /**
   * Naive reference: each criterion as its own array (generalizationLoss, trainingProgress,
   * progressQuotient, which transcribe Prechelt's definitions) and the verdict read off them.
   */
  function naiveVerdict(v: number[], t: number[] | null) {
    const last = v.length - 1;
    const best = v.indexOf(Math.min(...v));
    const gls = generalizationLoss(v);
    const gl = gls[last] as number;
    const first = (xs: (number | null)[], alpha: number) => {
      const i = xs.findIndex((x) => x !== null && x > alpha);
      return i < 0 ? null : i;
    };
    const stopsAt: Record<string, number | null> = {};
    for (const a of [1, 2, 3, 5]) stopsAt[`GL_${a}`] = first(gls, a);
    let pq: number | null = null;
    let stoppedEarly = false;
    if (t !== null) {
      const pqs = progressQuotient(v, t);
      for (const a of [0.5, 0.75, 1, 2, 3]) stopsAt[`PQ_${a}`] = first(pqs, a);
      pq = [...pqs].reverse().find((q) => q !== null) ?? null;
      const slope = (ys: number[]) => {
        const n = ys.length;
        const mx = (n - 1) / 2;
        const my = ys.reduce((s, y) => s + y, 0) / n;
        let sxy = 0;
        let sxx = 0;
        ys.forEach((y, i) => {
          sxy += (i - mx) * (y - my);
          sxx += (i - mx) ** 2;
        });
        return sxx > 0 ? sxy / sxx : 0;
      };
      const progress = trainingProgress(t)[last];
      stoppedEarly =
        v.length >= 5 &&
        gl <= 1 &&
        slope(v.slice(-5)) < 0 &&
        slope(t.slice(-5)) < 0 &&
        progress !== null &&
        progress !== undefined &&
        progress >= 0.1;
    }
    for (const s of [2, 3, 4, 6, 8]) stopsAt[`UP_${s}`] = upStop(v, s);
    return {
      bestIndex: best,
      gl: Number.isFinite(gl) ? gl : null,
      pq: pq !== null && Number.isFinite(pq) ? pq : null,
      stoppedLate: best < last && gl > 5,
      stoppedEarly,
      stopsAt,
    };
  }

  // Values from a small grid (ties, zeros, negatives for a negated metric) or any double.
  const value = fc.oneof(
    fc.constantFrom(0, 0.1, 0.2, 0.25, 0.3, 1, -0.5),
    fc.double({ min: -2, max: 2, noNaN: true }),
  );

  it('property: same best index, GL, PQ, verdicts and stopping points, to the bit', () => {
    // Source: the naive reference above, built from the per-criterion definitions.
    fc.assert(
      fc.property(
        fc.array(fc.tuple(value, value), { minLength: 1, maxLength: 60 }),
        fc.boolean(),
        (pairs, withTrain) => {
          const v = pairs.map(([x]) => x);
          const t = withTrain ? pairs.map(([, y]) => y) : null;
          expect(epochVerdict(Float64Array.from(v), t && Float64Array.from(t))).toEqual(
            naiveVerdict(v, t),
          );
          expect(epochVerdict(v, t)).toEqual(naiveVerdict(v, t));
        },
      ),
      { numRuns: 3000, seed: 20261130 },
    );
  });

  it('property: the same on long, noisy, falling-then-rising curves', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 50, max: 3000 }),
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        (n, seed) => {
          let s = seed;
          const noise = () => {
            s = (Math.imul(s, 48271) % 2147483647) >>> 0;
            return s / 2147483647 - 0.5;
          };
          const v: number[] = [];
          const t: number[] = [];
          for (let i = 0; i < n; i++) {
            const u = i / n;
            t.push(0.2 + 0.5 * Math.exp(-5 * u) + 0.01 * noise());
            v.push(
              0.25 + 0.5 * Math.exp(-5 * u) + 0.2 * Math.max(0, u - 0.6) ** 2 + 0.01 * noise(),
            );
          }
          expect(epochVerdict(Float64Array.from(v), Float64Array.from(t))).toEqual(
            naiveVerdict(v, t),
          );
        },
      ),
      { numRuns: 200, seed: 20261130 },
    );
  });
});
