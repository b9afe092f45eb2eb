import { describe, expect, it } from 'vitest';
import {
  binomialVariance,
  mcnemarExact,
  normalTest,
  twoProportionZ,
  wilsonInterval,
} from '../../src/stats/index.js';
import { expectNear, expectPrinted, expectRelative } from './close.js';

describe('wilsonInterval (Newcombe 1998, Table I, method 3)', () => {
  it('81/263 → 0.2553–0.3662', () => {
    const [low, high] = wilsonInterval(81, 263, 0.05);
    expectPrinted(low, '0.2553'); // Source: Newcombe (1998) Table I, read in R package propint tests (VALUES.md §3)
    expectPrinted(high, '0.3662'); // Source: Newcombe (1998) Table I, read in R package propint tests (VALUES.md §3)
    expectNear(low, 0.255289, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
    expectNear(high, 0.36621, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
  });

  it('15/148 → 0.0624–0.1605', () => {
    const [low, high] = wilsonInterval(15, 148, 0.05);
    expectPrinted(low, '0.0624'); // Source: Newcombe (1998) Table I, read in R package propint tests (VALUES.md §3)
    expectPrinted(high, '0.1605'); // Source: Newcombe (1998) Table I, read in R package propint tests (VALUES.md §3)
    expectNear(low, 0.062386, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
    expectNear(high, 0.160487, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
  });

  it('0/20 → 0–0.1611', () => {
    const [low, high] = wilsonInterval(0, 20, 0.05);
    expect(low).toBe(0); // Newcombe (1998) Table I, from memory; exact 0 by construction
    expectPrinted(high, '0.1611'); // Newcombe (1998) Table I, from memory (VALUES.md §3)
    expectNear(high, 0.161125, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
  });

  it('1/29 → 0.0061–0.1718', () => {
    const [low, high] = wilsonInterval(1, 29, 0.05);
    expectPrinted(low, '0.0061'); // Newcombe (1998) Table I, from memory (VALUES.md §3)
    expectPrinted(high, '0.1718'); // Newcombe (1998) Table I, from memory (VALUES.md §3)
    expectNear(low, 0.006113, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
    expectNear(high, 0.171755, 1e-6); // computed (SciPy/NumPy), VALUES.md §3
  });

  it('defines the edges: x = n ends at exactly 1, n = 0 is [0, 1]', () => {
    expect(wilsonInterval(20, 20, 0.05)[1]).toBe(1);
    expectNear(wilsonInterval(20, 20, 0.05)[0], 1 - 0.161125, 1e-6); // mirror of 0/20 (computed, VALUES.md §3)
    expect(wilsonInterval(0, 0, 0.05)).toEqual([0, 1]);
  });

  it('rejects bad counts and alpha', () => {
    expect(() => wilsonInterval(5, 4, 0.05)).toThrow(/must not exceed/);
    expect(() => wilsonInterval(-1, 4, 0.05)).toThrow(/non-negative integer/);
    expect(() => wilsonInterval(1.5, 4, 0.05)).toThrow(RangeError);
    expect(() => wilsonInterval(1, 4, 0)).toThrow(/alpha/);
  });
});

describe('mcnemarExact', () => {
  it('Agresti (1990) presidential approval, b = 150, c = 86, n = 1600', () => {
    const r = mcnemarExact(150, 86, 1600, 0.05);
    expect(r.test).toBe('mcnemar-exact');
    expectRelative(r.p ?? NaN, 3.7159e-5, 1e-4); // computed (SciPy): exact binomial p, VALUES.md §4
    expectRelative(r.p ?? NaN, 3.7159361395713866e-5, 1e-6); // computed: SciPy 1.17.1 2*stats.binom.cdf(86, 236, 0.5)
    expectNear(r.estimate, -0.04, 1e-15); // (86 − 150)/1600; Agresti's 0.59 − 0.55 approval change (from memory)
    // Wald interval for paired proportions, computed with NumPy/SciPy: se 0.0095492146,
    // CI (−0.0587161168, −0.0212838832); Agresti reports (0.02, 0.06) for the reverse sign (from memory).
    expectNear(r.ci?.[0], -0.0587161168, 1e-9);
    expectNear(r.ci?.[1], -0.0212838832, 1e-9);
  });

  it('Fagerland, Lydersen & Laake (2013) Table 1: 1 vs 7 discordant → p = 18/256', () => {
    const r = mcnemarExact(1, 7, 21, 0.05);
    expect(r.p).toBeCloseTo(0.0703125, 12); // computed: exact 18/256 (VALUES.md §4); paper reports 0.070 (from memory)
    expect(mcnemarExact(7, 1, 21, 0.05).p).toBeCloseTo(0.0703125, 12); // same, b and c swapped
  });

  it('defines b + c = 0, all-discordant rows, and caps p at 1', () => {
    expect(mcnemarExact(0, 0, 50, 0.05)).toEqual({
      estimate: 0,
      ci: [0, 0],
      p: 1,
      test: 'mcnemar-exact',
    });
    expect(mcnemarExact(5, 5, 50, 0.05).p).toBe(1);
    const all = mcnemarExact(0, 10, 10, 0.05);
    expect(all.estimate).toBe(1);
    expect(all.ci).toEqual([1, 1]);
    expectNear(all.p ?? NaN, 2 / 1024, 1e-15); // common practice: 2·(1/2)¹⁰
  });

  it('keeps tiny p-values instead of rounding them to 0', () => {
    expectRelative(mcnemarExact(0, 60, 100, 0.05).p ?? NaN, 2 ** -59, 1e-9); // common practice: 2·(1/2)⁶⁰
  });

  it('rejects bad counts', () => {
    expect(() => mcnemarExact(3, 4, 5, 0.05)).toThrow(/must not exceed n/);
    expect(() => mcnemarExact(0, 0, 0, 0.05)).toThrow(/at least one paired row/);
    expect(() => mcnemarExact(-1, 4, 5, 0.05)).toThrow(/non-negative integer/);
  });
});

describe('twoProportionZ (Agresti, Physicians’ Health Study aspirin example)', () => {
  // baseline = aspirin 104/11037, candidate = placebo 189/11034, so estimate = p̂placebo − p̂aspirin
  // as Agresti reports it.
  const r = twoProportionZ(104, 11037, 189, 11034, 0.05);

  it('pooled z = 5.001388, X² = 25.014', () => {
    expectNear(r.pooledZ, 5.001388, 1e-6); // computed (SciPy), VALUES.md §5
    expect(r.statistic).toBe(r.pooledZ);
    expectPrinted(r.pooledZ * r.pooledZ, '25.014'); // Source: prop.test(c(189,104), c(11034,11037), correct=FALSE), X-squared = 25.014 (read, VALUES.md §5)
    expectRelative(r.p ?? NaN, 5.6919e-7, 1e-4); // computed (SciPy), VALUES.md §5
    expect(r.test).toBe('z-binomial');
  });

  it('Wald interval (0.004688, 0.010724) and estimate 0.0077', () => {
    expectNear(r.estimate, 0.0171289 - 0.0094229, 1e-7); // computed (SciPy), p̂1 and p̂2, VALUES.md §5
    expectPrinted(r.estimate, '0.0077'); // Agresti reports 0.0077 (from memory)
    expectPrinted(r.ci?.[0], '0.004688'); // computed (SciPy), VALUES.md §5
    expectPrinted(r.ci?.[1], '0.010724'); // computed (SciPy), VALUES.md §5
    expectPrinted(r.ci?.[0], '0.005'); // Agresti reports (0.005, 0.011) (from memory)
    expectPrinted(r.ci?.[1], '0.011'); // Agresti reports (0.005, 0.011) (from memory)
  });

  it('defines both rates 0 or both 1, and rejects bad counts', () => {
    expect(twoProportionZ(0, 10, 0, 20, 0.05)).toEqual({
      estimate: 0,
      ci: [0, 0],
      p: 1,
      test: 'z-binomial',
      statistic: 0,
      pooledZ: 0,
    });
    expect(twoProportionZ(10, 10, 20, 20, 0.05).p).toBe(1);
    expect(() => twoProportionZ(11, 10, 1, 20, 0.05)).toThrow(/x1 \(11\) must not exceed n1/);
    expect(() => twoProportionZ(1, 0, 1, 20, 0.05)).toThrow(/n1 must be at least 1/);
  });
});

describe('normalTest and binomialVariance', () => {
  it('reproduces the aspirin z from the two binomial variances', () => {
    // Unpooled z for the aspirin example: the Wald interval half-width / 1.959964 is the unpooled SE
    // (computed, VALUES.md §5: CI (0.004688, 0.010724)).
    const p1 = 104 / 11037;
    const p2 = 189 / 11034;
    const v = binomialVariance(p1, 11037) + binomialVariance(p2, 11034);
    const r = normalTest(p2 - p1, v, 0.05);
    expect(r.test).toBe('z-binomial');
    expectPrinted(r.ci?.[0], '0.004688'); // computed (SciPy), VALUES.md §5
    expectPrinted(r.ci?.[1], '0.010724'); // computed (SciPy), VALUES.md §5
  });

  it('z = 1.959964 gives p = 0.05 and a CI touching 0', () => {
    const r = normalTest(1.959963984540054, 1, 0.05, 'paired-t');
    expectNear(r.p ?? NaN, 0.05, 1e-9); // computed (SciPy): z(0.975) = 1.959964, VALUES.md §2
    expectNear(r.ci?.[0], 0, 1e-9);
    expect(r.test).toBe('paired-t');
  });

  it('defines variance 0 and rejects bad input', () => {
    expect(normalTest(0, 0, 0.05)).toEqual({ estimate: 0, ci: [0, 0], p: 1, test: 'z-binomial' });
    expect(normalTest(-2, 0, 0.05).p).toBe(0);
    expect(() => normalTest(1, -1, 0.05)).toThrow(RangeError);
    expect(() => normalTest(NaN, 1, 0.05)).toThrow(RangeError);
    expect(binomialVariance(0.5, 100)).toBe(0.0025); // common practice: p(1 − p)/n
    expect(() => binomialVariance(0.5, 0)).toThrow(RangeError);
    expect(() => binomialVariance(1.2, 10)).toThrow(RangeError);
  });
});
