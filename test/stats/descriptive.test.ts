import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { mean, RunningStats, sampleVariance } from '../../src/stats/index.js';
import { expectNear } from './close.js';
import { auto83b, sleep } from './fixtures.js';

describe('mean and sampleVariance', () => {
  it('reproduce the NIST AUTO83B summary statistics', () => {
    const { us, japan } = auto83b();
    expect(mean(us)).toBeCloseTo(20.14458, 5); // Source: NIST e-Handbook §1.3.5.3, mean 20.14458 (read)
    expect(mean(japan)).toBeCloseTo(30.48101, 5); // Source: NIST e-Handbook §1.3.5.3, mean 30.48101 (read)
    expect(Math.sqrt(sampleVariance(us))).toBeCloseTo(6.4147, 5); // Source: NIST e-Handbook §1.3.5.3, SD 6.41470 (read)
    expect(Math.sqrt(sampleVariance(japan))).toBeCloseTo(6.10771, 5); // Source: NIST e-Handbook §1.3.5.3, SD 6.10771 (read)
  });

  it('reproduce the R sleep summary statistics', () => {
    const { group1, group2 } = sleep();
    expect(mean(group1)).toBeCloseTo(0.75, 12); // Source: R t.test output, mean in group 1 0.75 (read, VALUES.md §1b)
    expect(mean(group2)).toBeCloseTo(2.33, 12); // Source: R t.test output, mean in group 2 2.33 (read, VALUES.md §1b)
    expect(Math.sqrt(sampleVariance(group1))).toBeCloseTo(1.78901, 5); // Source: sx = 1.789010 (read, VALUES.md §1b)
    expect(Math.sqrt(sampleVariance(group2))).toBeCloseTo(2.002249, 6); // Source: sy = 2.002249 (read, VALUES.md §1b)
  });

  it('return a constant exactly with variance 0, and NaN when there is not enough data', () => {
    expect(mean([0.1, 0.1, 0.1])).toBe(0.1);
    expect(sampleVariance([0.1, 0.1, 0.1])).toBe(0);
    expect(mean([])).toBeNaN();
    expect(sampleVariance([3])).toBeNaN();
    expect(() => mean([1, Infinity])).toThrow(/values\[1\]/);
  });
});

describe('RunningStats', () => {
  it('equals two-pass mean and variance on the NIST data', () => {
    const { us } = auto83b();
    const running = new RunningStats();
    for (const x of us) running.push(x);
    expect(running.n).toBe(249);
    expectNear(running.mean, mean(us), 1e-12);
    expectNear(running.variance, sampleVariance(us), 1e-10);
  });

  it('is NaN before enough data, exact on constants, and rejects non-finite values', () => {
    const running = new RunningStats();
    expect(running.n).toBe(0);
    expect(running.mean).toBeNaN();
    running.push(0.1);
    expect(running.mean).toBe(0.1);
    expect(running.variance).toBeNaN();
    running.push(0.1);
    running.push(0.1);
    expect(running.mean).toBe(0.1);
    expect(running.variance).toBe(0);
    expect(() => running.push(NaN)).toThrow(RangeError);
    expect(running.n).toBe(3);
  });

  it('streams a million values without keeping them', () => {
    // Values i mod 10 for i < 1e6: mean 4.5 and sample variance 8.25·n/(n − 1) (common practice:
    // the population variance of 0..9 is 8.25).
    const running = new RunningStats();
    const n = 1_000_000;
    for (let i = 0; i < n; i++) running.push(i % 10);
    expectNear(running.mean, 4.5, 1e-9);
    expectNear(running.variance, (8.25 * n) / (n - 1), 1e-8);
  });
});

describe('RunningStats.pushAll', () => {
  it('is push of each value in order, to the last bit, and stops at a non-finite value (property)', () => {
    // Common practice: a batch form of an online update must be the same update, in the same order.
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { maxLength: 60 }),
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { maxLength: 60 }),
        fc.constantFrom(Number.NaN, Infinity, -Infinity, null),
        (first, rest, bad) => {
          const one = new RunningStats();
          const all = new RunningStats();
          const values = bad === null ? [...first, ...rest] : [...first, bad, ...rest];
          let threw = false;
          try {
            for (const x of values) one.push(x);
          } catch {
            threw = true;
          }
          const run = (): void => all.pushAll(Float64Array.from(values), values.length);
          if (threw) expect(run).toThrow(RangeError);
          else expect(run).not.toThrow();
          expect([all.n, all.mean, all.variance]).toEqual([one.n, one.mean, one.variance]);
        },
      ),
    );
  });
});
