import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  between,
  isIntegerKnob,
  midpoint,
  roundSuggestion,
  significantDigits,
  toSignificant,
} from '../../../src/analysis/levers/rounding.js';

describe('roundSuggestion: examples', () => {
  // The values on the left are suggestions fitgap printed before; on the right what a person types
  // (two significant digits, integers for counts: common practice).
  it.each([
    [333.333333, true, 330],
    [3.162, true, 3],
    [26.83, true, 27],
    [17.32, false, 17],
    [0.8286, false, 0.83],
    [0.5477, false, 0.55],
    [0.0316227766, false, 0.032],
    [31.6227766, false, 32],
    [2.5, true, 3],
    [0.000123456, false, 0.00012],
    [123456, true, 120000],
  ])('%s (integer: %s) → %s', (x, integer, typed) => {
    expect(roundSuggestion(x, { integer })).toBe(typed);
  });

  it('snaps to the sweep’s grid value when the suggestion rounds like it', () => {
    expect(roundSuggestion(0.0166, { grid: [0.0055, 0.0165, 0.05] })).toBe(0.0165);
    expect(roundSuggestion(0.197, { grid: [0.01, 0.03, 0.1, 0.3, 1] })).toBe(0.2);
    expect(roundSuggestion(0.0998, { grid: [0.01, 0.1, 1] })).toBe(0.1);
    // A grid value outside the range is never chosen.
    expect(roundSuggestion(0.0166, { grid: [0.0165], range: [0.0166, 1] })).toBe(0.017);
  });

  it('stays inside the range the evidence supports', () => {
    expect(roundSuggestion(50, { range: [1, 10] })).toBe(10);
    expect(roundSuggestion(0.1015, { range: [0.101, 0.149] })).toBe(0.11);
    expect(roundSuggestion(0.1015, { range: [0.1011, 0.1019] })).toBe(0.1015);
    expect(roundSuggestion(7.4, { integer: true, range: [7.2, 7.8] })).toBe(7);
  });

  it('rejects a non-finite value', () => {
    expect(() => roundSuggestion(NaN)).toThrow(RangeError);
    expect(() => roundSuggestion(Infinity)).toThrow(RangeError);
    expect(() => roundSuggestion(1, { range: [0, NaN] })).toThrow(RangeError);
  });
});

describe('midpoint and between', () => {
  it('is geometric on a log scale and arithmetic on a linear one', () => {
    expect(midpoint(0.001, 1, 'log')).toBeCloseTo(Math.sqrt(0.001), 15);
    expect(midpoint(10, 30, 'linear')).toBe(20);
    // A zero end has no geometric midpoint: fall back to arithmetic.
    expect(midpoint(0, 0.01, 'log')).toBe(0.005);
  });

  it('names a typed value between the PR’s two values, or none', () => {
    expect(between(1, 0.001, { scale: 'log', integer: false })).toBe(0.032);
    expect(between(1, 1000, { scale: 'log', integer: false })).toBe(32);
    expect(between(30, 10, { scale: 'linear', integer: true })).toBe(20);
    expect(between(4, 20, { scale: 'linear', integer: true })).toBe(12);
    expect(between(3, 4, { scale: 'linear', integer: true })).toBeNull();
    expect(between(0, 0.01, { scale: 'log', integer: false })).toBe(0.005);
    expect(between(1, 1.05, { scale: 'log', integer: false })).toBe(1.02);
  });
});

describe('isIntegerKnob', () => {
  it('rounds counts and layer sizes to integers, fractions and strengths not', () => {
    expect(isIntegerKnob({ domain: 'count' }, [3.5])).toBe(true);
    expect(isIntegerKnob({ domain: 'units' }, [])).toBe(true);
    expect(isIntegerKnob({ domain: 'count-or-fraction' }, [1, 20])).toBe(true);
    expect(isIntegerKnob({ domain: 'count-or-fraction' }, [0.05, 0.1])).toBe(false);
    expect(isIntegerKnob({ domain: 'positive' }, [1, 10])).toBe(false);
  });
});

describe('roundSuggestion properties', () => {
  const finite = fc.double({ min: -1e9, max: 1e9, noNaN: true, noDefaultInfinity: true });
  const positive = fc.double({ min: 1e-9, max: 1e9, noNaN: true, noDefaultInfinity: true });
  const options = fc.record(
    {
      integer: fc.boolean(),
      range: fc.tuple(finite, finite),
      grid: fc.array(fc.oneof(finite, fc.integer({ min: -1000, max: 1000 })), { maxLength: 6 }),
    },
    { requiredKeys: [] },
  );
  const hasInteger = (r: readonly [number, number] | undefined): boolean =>
    r === undefined || Math.ceil(Math.min(...r)) <= Math.floor(Math.max(...r));

  it('is idempotent', () => {
    fc.assert(
      fc.property(finite, options, (x, o) => {
        const once = roundSuggestion(x, o);
        expect(roundSuggestion(once, o)).toBe(once);
      }),
      { numRuns: 2000 },
    );
  });

  it('stays inside the range (for integers: when the range holds one)', () => {
    fc.assert(
      fc.property(finite, options, (x, o) => {
        fc.pre(!o.integer || hasInteger(o.range));
        const v = roundSuggestion(x, o);
        if (o.range !== undefined) {
          expect(v).toBeGreaterThanOrEqual(Math.min(...o.range));
          expect(v).toBeLessThanOrEqual(Math.max(...o.range));
        }
      }),
      { numRuns: 2000 },
    );
  });

  it('gives integers for integer knobs', () => {
    fc.assert(
      fc.property(finite, options, (x, o) => {
        expect(Number.isInteger(roundSuggestion(x, { ...o, integer: true }))).toBe(true);
      }),
    );
  });

  it('writes at most two significant digits, unless on the grid or the range is narrower than a two-digit step', () => {
    fc.assert(
      fc.property(finite, options, (x, o) => {
        fc.pre(!o.integer || hasInteger(o.range));
        const v = roundSuggestion(x, o);
        if (significantDigits(v) <= 2 || (o.grid ?? []).includes(v)) return;
        // Independent check: a range at least one two-digit step wide holds a two-digit value.
        expect(o.range).toBeDefined();
        const [a, b] = o.range as [number, number];
        const top = Math.max(Math.abs(a), Math.abs(b));
        const step = 10 ** (Math.floor(Math.log10(top)) - 1);
        expect(Math.abs(b - a)).toBeLessThan(step * (1 + 1e-9));
      }),
      { numRuns: 2000 },
    );
  });

  it('moves a free value by at most half a unit in its second significant digit', () => {
    fc.assert(
      fc.property(positive, (x) => {
        const v = roundSuggestion(x);
        expect(Math.abs(v - x)).toBeLessThanOrEqual(0.05 * x * (1 + 1e-12) + 1e-300);
        expect(v).toBe(toSignificant(x, 2));
      }),
    );
  });

  it('between() lies strictly between its ends, when it answers', () => {
    fc.assert(
      fc.property(
        positive,
        positive,
        fc.boolean(),
        fc.constantFrom('log', 'linear'),
        (a, b, integer, scale) => {
          const v = between(a, b, { scale, integer });
          if (v === null) return;
          expect(v).toBeGreaterThan(Math.min(a, b));
          expect(v).toBeLessThan(Math.max(a, b));
          if (integer) expect(Number.isInteger(v)).toBe(true);
        },
      ),
    );
  });
});
