import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { reviewFiles } from '../../src/io/review-from-files.js';
import { InputError } from '../../src/model/errors.js';

function runDir(value: number, csv: string, extra: Record<string, unknown> = {}): string {
  const dir = mkdtempSync(join(tmpdir(), 'fitgap-agree-'));
  writeFileSync(join(dir, 'p.csv'), csv);
  writeFileSync(
    join(dir, 'run.json'),
    JSON.stringify({
      format: 'fitgap-run/1',
      run: { name: 'r' },
      metric: { name: 'error', goal: 'minimize', kind: 'proportion' },
      splits: { train: { values: [0.01] }, validation: { values: [value] } },
      predictions: { split: 'validation', path: 'p.csv', ...extra },
    }),
  );
  return join(dir, 'run.json');
}

const rows = (wrong: number, total: number, prefix = ''): string =>
  'id,correct\n' +
  Array.from({ length: total }, (_, i) => `${prefix}${i},${i < wrong ? 0 : 1}`).join('\n') +
  '\n';

describe('predictions must agree with the artifact', () => {
  it('stops with both numbers when the error rate of the CSV is not the stated value', async () => {
    // Stated 0.40, the file's rate of correct = 0 is 0.06.
    const b = runDir(0.061, rows(6, 100));
    const c = runDir(0.4, rows(6, 100));
    const error = await reviewFiles({ baseline: b, candidate: c }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect(String((error as InputError).message)).toMatch(/0\.06.*0\.4/s);
  });

  it('pairs only when the id sets match; partial overlap falls back to the unpaired test', async () => {
    const b = runDir(0.06, rows(6, 100));
    const c = runDir(0.06, rows(6, 50) + rows(0, 50, 'x').replace('id,correct\n', ''));
    const { review } = await reviewFiles({ baseline: b, candidate: c });
    expect(review.paired).toMatchObject({ test: null, reason: 'partial-overlap' });
    expect(review.notes).toContainEqual({
      code: 'predictions-partial-overlap',
      shared: 50,
      baseline: 100,
      candidate: 100,
    });
    expect(review.validation.delta.test).not.toBe('mcnemar-exact');
  });

  it('checks the repeat the predictions belong to', async () => {
    const b = runDir(0.06, rows(6, 100), { repeat: 3 });
    const c = runDir(0.06, rows(6, 100));
    await expect(reviewFiles({ baseline: b, candidate: c })).rejects.toBeInstanceOf(InputError);
  });
});

describe('the metric scale', () => {
  it('refuses a maximized metric above 1 without metric.best, with a hint', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fitgap-best-'));
    const path = join(dir, 'run.json');
    writeFileSync(
      path,
      JSON.stringify({
        format: 'fitgap-run/1',
        run: { name: 'bleu' },
        metric: { name: 'bleu', goal: 'maximize', kind: 'continuous' },
        splits: { train: { values: [99.9] }, validation: { values: [99.76] } },
      }),
    );
    const error = await reviewFiles({ baseline: path, candidate: path }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    expect(String((error as InputError).message)).toMatch(/metric\.best/);
  });
});
