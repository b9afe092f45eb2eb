import { createReadStream, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pairPredictions, type PredictionsFile } from '../../src/artifact/predictions.js';
import { InputError } from '../../src/model/errors.js';

const dir = mkdtempSync(join(tmpdir(), 'fitgap-pred-'));
let counter = 0;
function csv(text: string): PredictionsFile {
  const file = `p${counter++}.csv`;
  writeFileSync(join(dir, file), text);
  return { file, open: async () => createReadStream(join(dir, file)) };
}

describe('pairPredictions', () => {
  it('pairs rows by id, not by position', async () => {
    const b = csv('id,correct\na,1\nb,1\nc,0\nd,0\n');
    const c = csv('id,correct\nd,1\nc,0\nb,0\na,1\n');
    const result = await pairPredictions(b, c, 'proportion');
    expect(result.rows).toBe(4);
    expect(result.baselineOnly).toBe(1); // b: right → wrong
    expect(result.candidateOnly).toBe(1); // d: wrong → right
    expect(result.unmatched).toEqual({ baseline: 0, candidate: 0 });
  });

  it('counts rows without a partner', async () => {
    const b = csv('id,loss\nx,1\ny,2\nz,3\n');
    const c = csv('id,loss\ny,2.5\nw,9\n');
    const result = await pairPredictions(b, c, 'continuous');
    expect(result.rows).toBe(1);
    expect(result.meanDiff).toBeCloseTo(0.5, 12);
    expect(result.unmatched).toEqual({ baseline: 2, candidate: 1 });
  });

  it('names the line of a duplicate id', async () => {
    const b = csv('id,correct\na,1\nb,0\na,1\n');
    const c = csv('id,correct\na,1\nb,1\n');
    await expect(pairPredictions(b, c, 'proportion')).rejects.toThrow(
      /line 4 must have a unique id \(also on line 2\)/,
    );
  });

  it('rejects an empty file', async () => {
    const b = csv('');
    const c = csv('id,correct\na,1\n');
    await expect(pairPredictions(b, c, 'proportion')).rejects.toBeInstanceOf(InputError);
  });

  it('matches a direct computation for any shuffle of the same ids (property)', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.uniqueArray(fc.stringMatching(/^[a-z0-9]{1,6}$/), { minLength: 1, maxLength: 60 }),
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 60, maxLength: 60 }),
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 60, maxLength: 60 }),
        fc.integer(),
        async (ids, lb, lc, seed) => {
          const shuffled = [...ids].sort(
            (x, y) => ((x.charCodeAt(0) * (seed | 1)) % 7) - ((y.charCodeAt(0) * (seed | 1)) % 7),
          );
          const baseLoss = new Map(ids.map((id, i) => [id, lb[i] ?? 0]));
          const candLoss = new Map(ids.map((id, i) => [id, lc[i] ?? 0]));
          const b = csv(`id,loss\n${ids.map((id) => `${id},${baseLoss.get(id)}`).join('\n')}\n`);
          const c = csv(
            `id,loss\n${shuffled.map((id) => `${id},${candLoss.get(id)}`).join('\n')}\n`,
          );
          const result = await pairPredictions(b, c, 'continuous');
          const diffs = ids.map((id) => (candLoss.get(id) ?? 0) - (baseLoss.get(id) ?? 0));
          const mean = diffs.reduce((s, d) => s + d, 0) / diffs.length;
          expect(result.rows).toBe(ids.length);
          expect(result.meanDiff).toBeCloseTo(mean, 9);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('streams 1,000,000 rows in the same order without a row object per example', async () => {
    const n = 1_000_000;
    const lines = ['id,correct'];
    for (let i = 0; i < n; i++) lines.push(`ex${i},${i % 10 === 0 ? 0 : 1}`);
    const b = csv(`${lines.join('\n')}\n`);
    // The candidate gets every example right: it fixes the baseline's n/10 errors.
    for (let i = 1; i <= n; i++) lines[i] = `ex${i - 1},1`;
    const c = csv(`${lines.join('\n')}\n`);
    lines.length = 0;
    const before = process.memoryUsage().heapUsed;
    const result = await pairPredictions(b, c, 'proportion');
    const grown = process.memoryUsage().heapUsed - before;
    expect(result.rows).toBe(n);
    expect(result.baselineOnly).toBe(0);
    expect(result.candidateOnly).toBe(n / 10);
    // One Float64Array of hashes per file (8 MB each at most after growth), no per-row retention.
    expect(grown).toBeLessThan(120 * 1024 * 1024);
  }, 60_000);
});
