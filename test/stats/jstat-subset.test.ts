/**
 * The copy of jStat's functions that fitgap loads (src/stats/vendor/jstat-subset.js) against the
 * jstat package it was copied from: bit for bit the same results on random inputs over the domains
 * fitgap uses and beyond. Source: jStat 1.9.6 (npm "jstat"), the reference library itself.
 */
import fc from 'fast-check';
import jStatPackage from 'jstat';
import { describe, expect, it } from 'vitest';
import jStat from '../../src/stats/vendor/jstat-subset.js';

const same = (a: unknown, b: unknown) => Object.is(a, b);
const positive = (max: number) => fc.double({ min: 1e-9, max, noNaN: true });
const unit = fc.double({ min: 0, max: 1, noNaN: true });

describe('the copied jStat functions', () => {
  it('are those of jstat 1.9.6, the version copied', async () => {
    const { default: pkg } = await import('jstat/package.json', { with: { type: 'json' } });
    expect(pkg.version).toBe('1.9.6');
    expect(Object.keys(jStat).sort()).toEqual([
      'betacf',
      'binomial',
      'erf',
      'erfc',
      'erfcinv',
      'gammaln',
      'ibeta',
      'ibetainv',
      'normal',
      'studentt',
    ]);
  });

  it('gammaln and ibeta return exactly what jStat returns (property)', () => {
    fc.assert(
      fc.property(positive(1e7), (x) => same(jStat.gammaln(x), jStatPackage.gammaln(x))),
      { numRuns: 5000 },
    );
    fc.assert(
      fc.property(
        fc.double({ min: -0.5, max: 1.5, noNaN: true }),
        positive(1e5),
        positive(1e5),
        (x, a, b) => same(jStat.ibeta(x, a, b), jStatPackage.ibeta(x, a, b)),
      ),
      { numRuns: 5000 },
    );
  });

  it('the normal CDF and quantile return exactly what jStat returns (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 40, noNaN: true }), unit, (x, p) => {
        return (
          same(jStat.normal.cdf(x, 0, 1), jStatPackage.normal.cdf(x, 0, 1)) &&
          same(jStat.normal.inv(p, 0, 1), jStatPackage.normal.inv(p, 0, 1))
        );
      }),
      { numRuns: 5000 },
    );
  });

  it("Student's t quantile returns exactly what jStat returns (property)", () => {
    fc.assert(
      fc.property(unit, positive(1e9), (p, df) =>
        same(jStat.studentt.inv(p, df), jStatPackage.studentt.inv(p, df)),
      ),
      { numRuns: 5000 },
    );
  });

  it('the binomial CDF returns exactly what jStat returns (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 1_000_000 }),
        fc.double({ min: -0.1, max: 1.1, noNaN: true }),
        unit,
        (n, at, p) => {
          const k = Math.floor(at * n);
          return same(jStat.binomial.cdf(k, n, p), jStatPackage.binomial.cdf(k, n, p));
        },
      ),
      { numRuns: 3000 },
    );
  });
});
