/**
 * The config's `hyperparameters` map: accepted and passed into the review's vocabulary; two
 * entries naming the same knob (names match up to case, '-' and '_') are an input error at the
 * entry's JSON pointer.
 */
import { describe, expect, it } from 'vitest';
import { parseConfig } from '../../src/io/load-config.js';
import { resolveSettings } from '../../src/io/review-from-files.js';
import { buildReview } from '../../src/analysis/review.js';
import { InputError } from '../../src/model/errors.js';
import { makeRun } from '../analysis/make-run.js';

describe('config hyperparameters', () => {
  it('maps a name the vocabulary does not know, and the review uses it', async () => {
    const config = await parseConfig(
      'hyperparameters:\n  ema_decay: {role: regularization, inverse: true}\n',
      'fitgap.yml',
    );
    const settings = resolveSettings(config);
    expect(settings.hyperparameters).toEqual({
      ema_decay: { role: 'regularization', inverse: true },
    });
    const run = makeRun({
      reference: 0.01,
      train: [0.02, 0.021, 0.019],
      validation: [0.2, 0.21, 0.19],
    });
    const review = buildReview({
      baseline: { ...run, hyperparameters: { ema_decay: 0.9 } },
      candidate: { ...run, hyperparameters: { ema_decay: 0.99 } },
      settings,
    });
    expect(review.hyperparameters[0]).toMatchObject({
      key: 'ema_decay',
      role: 'regularization',
      origin: 'config',
      effect: 'less-regularization',
    });
    expect(review.notes.map((n) => n.code)).not.toContain('unmapped-hyperparameters');
  });

  it('rejects two entries that name the same knob, at the entry', async () => {
    const error = await parseConfig(
      'hyperparameters:\n  C: {role: regularization, inverse: true}\n  c: {role: capacity}\n',
      'fitgap.yml',
    ).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InputError);
    const issues = (error as InputError).issues;
    expect(issues).toHaveLength(1);
    expect(issues[0]?.pointer).toBe('/hyperparameters/c');
    expect(issues[0]?.file).toBe('fitgap.yml');
  });

  it('names an unknown changed key in a note instead of dropping it', () => {
    const run = makeRun({ reference: 0.01, train: [0.02, 0.021], validation: [0.2, 0.21] });
    const review = buildReview({
      baseline: { ...run, hyperparameters: { ema_decay: 0.99, gamma: 0.01 } },
      candidate: { ...run, hyperparameters: { ema_decay: 0.9999, gamma: 10 } },
      settings: resolveSettings({}),
    });
    const note = review.notes.find((n) => n.code === 'unmapped-hyperparameters');
    expect(note).toEqual({
      code: 'unmapped-hyperparameters',
      count: 2,
      changes: [
        { key: 'ema_decay', ambiguous: false, baseline: 0.99, candidate: 0.9999 },
        { key: 'gamma', ambiguous: true, baseline: 0.01, candidate: 10 },
      ],
    });
  });
});
