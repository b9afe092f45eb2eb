import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { regularizationMinimum } from '../../../src/analysis/curves/regularization.js';

function ok(result: ReturnType<typeof regularizationMinimum>) {
  if ('skipped' in result) throw new Error(result.skipped);
  return result;
}

describe('regularizationMinimum', () => {
  it('finds the vertex of a parabola in log x exactly', () => {
    // Validation error = 0.1 + 0.02·(ln x − ln 0.3)² sampled on a log grid: three points of a
    // parabola determine it, so the refined minimum is 0.3 to rounding (common practice).
    const x = [0.001, 0.01, 0.1, 1, 10];
    const e = x.map((v) => 0.1 + 0.02 * (Math.log(v) - Math.log(0.3)) ** 2);
    const r = ok(regularizationMinimum(x, e, 0.01));
    expect(r.bestIndex).toBe(2); // the grid point 0.1 is nearest in ln x
    expect(r.refined).toBe(true);
    expect(r.bestX).toBeCloseTo(0.3, 12);
    expect(r.suggestedX).toBeCloseTo(0.3, 12);
    expect(r.atEdge).toBeNull();
    expect(r.side).toBe('below');
    expect(ok(regularizationMinimum(x, e, 3)).side).toBe('above');
    expect(ok(regularizationMinimum(x, e, 0.31)).side).toBe('at');
    expect(ok(regularizationMinimum(x, e, undefined)).side).toBe('unknown');
  });

  it('handles unequal spacing (vertex of the parabola through three points)', () => {
    // Hand-checked: at t = ln x = 0, 1, 3 the errors 2, 1, 5 lie on y = t² − 2t + 2
    // (y(1) = 1, y(3) = 9 − 6 + 2 = 5), whose vertex is t = 1.
    const r = ok(regularizationMinimum([1, Math.E, Math.E ** 3], [2, 1, 5], undefined));
    expect(Math.log(r.bestX)).toBeCloseTo(1, 12);
  });

  it('says "extend the sweep" at either end instead of inventing a minimum', () => {
    const low = ok(regularizationMinimum([0.01, 0.1, 1, 10], [0.1, 0.12, 0.15, 0.3], 1));
    expect(low.atEdge).toBe('low');
    expect(low.refined).toBe(false);
    expect(low.bestX).toBe(0.01);
    expect(low.suggestedX).toBeCloseTo(0.001, 12); // one grid step (×10) beyond
    expect(low.side).toBe('above');
    const high = ok(regularizationMinimum([0.01, 0.1, 1, 3], [0.3, 0.2, 0.15, 0.1], 3));
    expect(high.atEdge).toBe('high');
    expect(high.suggestedX).toBeCloseTo(9, 12);
    expect(high.side).toBe('at');
  });

  it('needs three points', () => {
    expect(regularizationMinimum([0.1, 1], [0.2, 0.1], 1)).toEqual({
      skipped: 'too-few-points',
      points: 2,
      needs: 3,
    });
  });

  it('property: an interior refined minimum lies between the neighbours of the lowest point', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 3, maxLength: 30 }),
        (e) => {
          const x = e.map((_, i) => 10 ** (i - 5));
          const r = ok(regularizationMinimum(x, e, undefined));
          expect(e[r.bestIndex]).toBe(Math.min(...e));
          if (r.atEdge === null) {
            expect(r.bestX).toBeGreaterThan(x[r.bestIndex - 1]!);
            expect(r.bestX).toBeLessThan(x[r.bestIndex + 1]!);
          }
        },
      ),
    );
  });
});
