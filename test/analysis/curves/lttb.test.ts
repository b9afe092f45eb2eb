import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { downsampleKeeping, lttbIndices } from '../../../src/analysis/curves/lttb.js';
import { fixturePath } from './nist-fixtures.js';

function rows(file: string): string[][] {
  return readFileSync(fixturePath(file), 'utf8')
    .split('\n')
    .filter((l) => l.trim() !== '' && !l.startsWith('#'))
    .slice(1)
    .map((l) => l.split(','));
}

describe('lttbIndices', () => {
  // Source: TimescaleDB Toolkit docs/lttb.md (timescale/timescaledb-toolkit @153d8c1), executable
  // doc tests: 101 points 10 + 5·cos(foo), thresholds 4, 8, 17, 34; expected 0-based indices in
  // lttb-timescale-cosine101-expected.csv (VALUES.md §9).
  const input = rows('lttb-timescale-cosine101-input.csv');
  const xs = input.map((r) => Number(r[1]));
  const ys = input.map((r) => Number(r[3]));
  const expected = rows('lttb-timescale-cosine101-expected.csv');
  for (const threshold of [4, 8, 17, 34]) {
    it(`reproduces TimescaleDB's published selection for threshold ${threshold}`, () => {
      const want = expected.filter((r) => Number(r[0]) === threshold).map((r) => Number(r[2]));
      expect(want).toHaveLength(threshold);
      expect(lttbIndices(xs, ys, threshold)).toEqual(want);
    });
  }

  it('reproduces TimescaleDB threshold 4 literally', () => {
    // Source: TimescaleDB Toolkit docs/lttb.md, threshold 4 → dates 2020-01-11, 2020-02-01,
    // 2020-03-03, 2020-04-20 = indices 0, 21, 52, 100; values printed in full there.
    const picked = lttbIndices(xs, ys, 4);
    expect(picked).toEqual([0, 21, 52, 100]);
    expect(picked.map((i) => ys[i])).toEqual([
      12.7015115293407, 5.004324248633603, 14.982710485116087, 10.022128489940254,
    ]);
  });

  it("reproduces ClickHouse's largestTriangleThreeBuckets(4) documentation example", () => {
    // Source: ClickHouse docs, aggregate function largestTriangleThreeBuckets: result
    // [(1,10),(3,15),(9,55),(10,70)] for n = 4 (lttb-clickhouse-10pt.csv, VALUES.md §9).
    const ch = rows('lttb-clickhouse-10pt.csv');
    const picked = lttbIndices(
      ch.map((r) => Number(r[0])),
      ch.map((r) => Number(r[1])),
      4,
    );
    expect(picked).toEqual([0, 2, 8, 9]);
    expect(picked).toEqual(ch.flatMap((r, i) => (r[2] === '1' ? [i] : [])));
  });

  it('property: sorted, a subset of the input, exactly min(n, T) points, first and last kept', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 400 }),
        fc.integer({ min: 2, max: 500 }),
        (ys, threshold) => {
          const xs = ys.map((_, i) => i * 0.5 + 1);
          const picked = lttbIndices(xs, ys, threshold);
          expect(picked).toHaveLength(Math.min(ys.length, threshold));
          expect(picked[0]).toBe(0);
          expect(picked[picked.length - 1]).toBe(ys.length - 1);
          for (let i = 1; i < picked.length; i++)
            expect(picked[i]!).toBeGreaterThan(picked[i - 1]!);
          picked.forEach((i) => expect(Number.isInteger(i) && i >= 0 && i < ys.length).toBe(true));
        },
      ),
    );
  });
});

describe('downsampleKeeping', () => {
  it('keeps a required index LTTB dropped, staying at the point budget', () => {
    // TimescaleDB threshold 4 keeps [0, 21, 52, 100]; require index 60.
    const input = rows('lttb-timescale-cosine101-input.csv');
    const xs = input.map((r) => Number(r[1]));
    const ys = input.map((r) => Number(r[3]));
    expect(downsampleKeeping(xs, ys, 4, [60])).toEqual([0, 21, 60, 100]);
  });

  it('property: ≤ budget, sorted, first, last and the minimum always kept', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), {
          minLength: 3,
          maxLength: 2000,
        }),
        fc.integer({ min: 3, max: 80 }),
        (ys, budget) => {
          const xs = ys.map((_, i) => i);
          const min = ys.indexOf(Math.min(...ys));
          const picked = downsampleKeeping(xs, ys, budget, [min]);
          expect(picked).toHaveLength(Math.min(ys.length, budget));
          expect(picked).toContain(0);
          expect(picked).toContain(ys.length - 1);
          expect(picked).toContain(min);
          for (let i = 1; i < picked.length; i++)
            expect(picked[i]!).toBeGreaterThan(picked[i - 1]!);
        },
      ),
    );
  });
});
