import { describe, expect, it } from 'vitest';
import { holmAdjust } from '../../src/stats/index.js';

// Hand-worked examples derived from the definition (Holm 1979, Scand. J. Statist. 6:65–70):
// sort the m p-values ascending, multiply the j-th smallest by (m − j + 1), cap at 1, and carry the
// running maximum so the adjusted values never decrease.
describe('holmAdjust', () => {
  it('four p-values (derived from the definition)', () => {
    // sorted 0.005, 0.01, 0.03, 0.04 × 4, 3, 2, 1 = 0.02, 0.03, 0.06, 0.04 → running max
    // 0.02, 0.03, 0.06, 0.06; back in input order:
    const out = holmAdjust([0.01, 0.04, 0.03, 0.005]);
    expect(out[0]).toBeCloseTo(0.03, 15);
    expect(out[1]).toBeCloseTo(0.06, 15);
    expect(out[2]).toBeCloseTo(0.06, 15);
    expect(out[3]).toBeCloseTo(0.02, 15);
  });

  it('nulls pass through and do not count in m (derived from the definition)', () => {
    const out = holmAdjust([null, 0.01, null, 0.04, 0.03, 0.005]);
    expect(out[0]).toBeNull();
    expect(out[2]).toBeNull();
    expect(out[1]).toBeCloseTo(0.03, 15);
    expect(out[3]).toBeCloseTo(0.06, 15);
    expect(out[4]).toBeCloseTo(0.06, 15);
    expect(out[5]).toBeCloseTo(0.02, 15);
  });

  it('caps at 1 and carries the maximum (derived from the definition)', () => {
    // m = 2: 0.6·2 = 1.2 → 1; then max(1, 0.7·1) = 1
    expect(holmAdjust([0.6, 0.7])).toEqual([1, 1]);
    // m = 2: 0.3·2 = 0.6; then max(0.6, 0.5·1) = 0.6
    expect(holmAdjust([0.5, 0.3])).toEqual([0.6, 0.6]);
    // ties get equal values: 0.02·3 = 0.06, max(0.06, 0.02·2) = 0.06, max(0.06, 0.5) = 0.5
    const tied = holmAdjust([0.02, 0.5, 0.02]);
    expect(tied[0]).toBeCloseTo(0.06, 15);
    expect(tied[2]).toBe(tied[0]);
    expect(tied[1]).toBe(0.5);
  });

  it('handles empty, all-null and single input, and rejects values outside [0, 1]', () => {
    expect(holmAdjust([])).toEqual([]);
    expect(holmAdjust([null, null])).toEqual([null, null]);
    expect(holmAdjust([0.2])).toEqual([0.2]);
    expect(() => holmAdjust([0.2, 1.5])).toThrow(/p\[1\]/);
    expect(() => holmAdjust([NaN])).toThrow(RangeError);
  });
});
