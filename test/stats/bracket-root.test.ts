import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { illinois } from '../../src/stats/bracket-root.js';
import { mdeTwoProportions, powerTwoProportions } from '../../src/stats/index.js';

describe('illinois', () => {
  it('brackets the root of x³ − c to the tolerance in few evaluations', () => {
    // Reference: Math.cbrt (ECMAScript's correctly rounded-ish cube root; common practice).
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (c) => {
        let calls = 0;
        const f = (x: number): number => {
          calls++;
          return x * x * x - c;
        };
        const root = Math.cbrt(c);
        const lo = 0;
        const hi = Math.max(1, root * 2);
        const b = illinois(f, lo, f(lo), hi, f(hi), 1e-13, 200);
        expect(b.lo).toBeLessThanOrEqual(b.hi);
        expect(b.hi - b.lo).toBeLessThanOrEqual(1e-13 * b.hi);
        if (b.lo < b.hi) {
          expect(f(b.lo)).toBeLessThan(0);
          expect(f(b.hi)).toBeGreaterThanOrEqual(0);
        }
        expect(Math.abs(b.hi - root)).toBeLessThanOrEqual(1e-12 * root);
        // Never slower than bisection, which halves the bracket per evaluation (common practice).
        const bisectionSteps = Math.ceil(Math.log2((hi - lo) / (1e-13 * root)));
        expect(calls - 2).toBeLessThanOrEqual(bisectionSteps);
      }),
    );
  });

  it('needs far fewer evaluations than bisection on an S-shaped curve such as a power curve', () => {
    // A logistic curve crossing q inside a cell of width 1/256, as the MDE search meets it.
    // Bisection needs about 35 evaluations to narrow such a cell to 1e-13 (common practice).
    const counts: number[] = [];
    for (let q = 0.05; q < 0.95; q += 0.0137) {
      let calls = 0;
      const f = (x: number): number => {
        calls++;
        return 1 / (1 + Math.exp(-40 * (x - 0.5))) - q;
      };
      const x0 = 0.5 + Math.log(q / (1 - q)) / 40;
      const lo = Math.floor(x0 * 256) / 256;
      const hi = lo + 1 / 256;
      const b = illinois(f, lo, f(lo), hi, f(hi), 1e-13, 200);
      expect(Math.abs(b.hi - x0)).toBeLessThanOrEqual(1e-12);
      counts.push(calls - 2);
    }
    expect(Math.max(...counts)).toBeLessThanOrEqual(35);
    expect(counts.reduce((a, b) => a + b, 0) / counts.length).toBeLessThanOrEqual(10);
  });

  it('returns an exact zero as a bracket of width 0, and steps inside a degenerate secant', () => {
    const b = illinois((x) => x - 0.5, 0, -0.5, 1, 0.5, 1e-13, 50);
    expect(b).toEqual({ lo: 0.5, hi: 0.5 });
    // A flat negative end (f(lo) = -Infinity) puts the secant point on lo: bisection steps instead.
    const g = (x: number): number => (x < 0.3 ? -Infinity : x - 0.3);
    const s = illinois(g, 0, -Infinity, 1, 0.7, 1e-13, 200);
    expect(s.hi).toBeGreaterThanOrEqual(0.3);
    expect(s.hi - 0.3).toBeLessThan(1e-12);
  });
});

/** The search this replaced: the same grid, then 60 bisection steps in the cell (naive reference). */
function mdeByBisection(p1: number, n1: number, n2: number, end: 0 | 1): number | null {
  const at = (t: number): number => powerTwoProportions(p1, p1 + t * (end - p1), n1, n2, 0.05);
  if (end === p1 || at(1) < 0.8) return null;
  let prev = 0;
  for (let i = 1; i <= 256; i++) {
    const t = i / 256;
    if (at(t) >= 0.8) {
      let lo = prev;
      let hi = t;
      for (let j = 0; j < 60; j++) {
        const mid = (lo + hi) / 2;
        if (at(mid) >= 0.8) hi = mid;
        else lo = mid;
      }
      return hi * Math.abs(end - p1);
    }
    prev = t;
  }
  return null;
}

describe('mdeTwoProportions', () => {
  it('agrees with the grid-and-bisection search to 1e-12 relative (1e-15 absolute), and reaches the power', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 2, max: 2_000_000 }),
        fc.integer({ min: 2, max: 2_000_000 }),
        (p1, n1, n2) => {
          const got = mdeTwoProportions(p1, n1, n2, 0.05);
          for (const [end, value] of [
            [1, got.increase],
            [0, got.decrease],
          ] as const) {
            const want = mdeByBisection(p1, n1, n2, end);
            if (want === null) {
              expect(value).toBeNull();
              continue;
            }
            expect(value).not.toBeNull();
            // Rates are resolved to about 1e-16 near 1 (double spacing): below that the power is a
            // step function and either search may stop on a different step.
            const gap = Math.abs((value as number) - want);
            if (gap > 1e-12 * want + 1e-15) {
              // Near a rate of 0 or 1, round-off in p(1 − p) makes the power wobble across 0.8 more
              // than once within a few spacings (seed -1160582485: p1 = 0.99999966, n = 513218 and
              // 30021, crossings 1.6e-15 apart). Then each search may stop on a different crossing,
              // and both are right: the power must dip below 0.8 between them, and they stay close.
              const lo = Math.min(value as number, want);
              const span = Math.abs(end - p1);
              const atValue = (v: number): number =>
                powerTwoProportions(p1, p1 + (v / span) * (end - p1), n1, n2, 0.05);
              let dips = false;
              for (let k = 1; k < 64 && !dips; k++) dips = atValue(lo + (gap * k) / 64) < 0.8;
              expect(dips, `no second crossing between ${lo} and ${lo + gap}`).toBe(true);
              expect(gap).toBeLessThanOrEqual(1e-9 * want + 1e-13);
            }
            const p2 = end === 1 ? p1 + (value as number) : p1 - (value as number);
            expect(powerTwoProportions(p1, p2, n1, n2, 0.05)).toBeGreaterThanOrEqual(0.8);
          }
        },
      ),
      { numRuns: 200, examples: [[0.9999996625929836, 513218, 30021]] },
    );
  });
});
