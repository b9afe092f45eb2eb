import { describe, expect, it } from 'vitest';
import { reviewFiles, resolveSettings } from '../../src/io/review-from-files.js';
import { parseConfig } from '../../src/io/load-config.js';
import { expectValidReport } from '../report/valid-review.js';

describe('config', () => {
  it('maps a CSV epoch log next to each artifact onto curves.epochs', async () => {
    const { review } = await reviewFiles({
      baseline: 'test/fixtures/epoch-log/base/run.json',
      candidate: 'test/fixtures/epoch-log/cand/run.json',
      config: 'test/fixtures/epoch-log/fitgap.yml',
    });
    const cand = review.candidate.curves.epochs;
    const base = review.baseline.curves.epochs;
    if (cand === undefined || 'skipped' in cand || base === undefined || 'skipped' in base) {
      throw new Error('epoch evidence missing');
    }
    expect(cand.finalX).toBe(30);
    // The candidate's log rises after epoch 12 by construction; the baseline's keeps falling.
    expect(cand.bestX).toBeGreaterThanOrEqual(12);
    expect(cand.bestX).toBeLessThan(20);
    expect(cand.stoppedLate).toBe(true);
    expect(base.stoppedLate).toBe(false);
    expect(review.levers.map((l) => l.id)).toContain('early-stopping');
    expectValidReport(review);
  });

  it('lets flags override the file, and the file override the defaults', async () => {
    const config = await parseConfig(
      'alpha: 0.01\nmin-effect: 0.5\nfail-on: [toward-overfitting]\n',
      'c.yml',
    );
    expect(resolveSettings(config)).toEqual({
      alpha: 0.01,
      minEffect: 0.5,
      gapTolerance: 0.1,
      failOn: ['toward-overfitting'],
    });
    expect(resolveSettings(config, { alpha: 0.1, failOn: ['none'], reference: 0.3 })).toEqual({
      alpha: 0.1,
      minEffect: 0.5,
      gapTolerance: 0.1,
      failOn: ['none'],
      reference: 0.3,
    });
    expect(resolveSettings({})).toEqual({
      alpha: 0.05,
      minEffect: 0,
      gapTolerance: 0.1,
      failOn: ['worse-validation'],
    });
  });
});
