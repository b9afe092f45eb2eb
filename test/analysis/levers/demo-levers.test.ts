/**
 * The levers of the three demo scenarios, on the model: ids in order, suggestions rounded and on
 * the evidence's side, no opposite pair, nothing its own evidence rules out (common practice).
 */
import { describe, expect, it } from 'vitest';
import { OPPOSITES, ruledOut } from '../../../src/analysis/levers/resolve.js';
import { reviewFiles } from '../../../src/io/review-from-files.js';
import { significantDigits } from '../../../src/analysis/levers/rounding.js';

async function demo(name: string) {
  const { review } = await reviewFiles({
    baseline: 'demo/baseline.json',
    candidate: `demo/${name}.json`,
    config: 'demo/fitgap.yml',
  });
  return review;
}

describe('demo levers', () => {
  it('1-interactions: regularize harder to the sweep minimum, then step the features back', async () => {
    const review = await demo('1-interactions');
    expect(review.levers.map((l) => l.id)).toEqual([
      'stronger-regularization',
      'fewer-features',
      'more-data',
      'early-stopping',
    ]);
    expect(review.levers[0]?.suggestion).toEqual({
      hyperparameter: 'lambda',
      value: 0.83,
      basis: 'sweep-minimum',
    });
    expect(review.levers[1]?.suggestion).toEqual({
      hyperparameter: 'features',
      value: 29,
      basis: 'between-old-and-new',
    });
    // Both changes that added features are named on the one lever.
    expect(
      review.levers[1]?.evidence.flatMap((e) => (e.kind === 'pr-change' ? [e.hyperparameter] : [])),
    ).toEqual(['features', 'polynomial_degree']);
  });

  it('2-lambda-3: weaken regularization to the sweep minimum, not between old and new', async () => {
    const review = await demo('2-lambda-3');
    expect(review.levers[0]).toMatchObject({
      id: 'weaker-regularization',
      suggestion: { hyperparameter: 'lambda', value: 0.017, basis: 'sweep-minimum' },
    });
    const ids = review.levers.map((l) => l.id);
    // The epoch curve does not show training stopped early; the run has no capacity knob.
    expect(ids).not.toContain('train-longer');
    expect(ids).not.toContain('bigger-model');
  });

  it('3-more-data: bias levers only; the features the PR already added come last', async () => {
    const review = await demo('3-more-data');
    expect(review.levers.map((l) => l.id)).toEqual([
      'richer-features',
      'weaker-regularization',
      'more-features',
    ]);
    expect(review.levers[2]?.evidence.map((e) => e.kind)).toContain('already-pulled');
  });

  it.each(['1-interactions', '2-lambda-3', '3-more-data'])(
    '%s: no contradictions',
    async (name) => {
      const review = await demo(name);
      const ids = review.levers.map((l) => l.id);
      for (const [a, b] of OPPOSITES) expect(ids.includes(a) && ids.includes(b)).toBe(false);
      for (const lever of review.levers) {
        expect(ruledOut(lever, new Set())).toBe(false);
        const v = lever.suggestion?.value;
        if (v !== undefined) expect(Number.isInteger(v) || significantDigits(v) <= 2).toBe(true);
      }
    },
  );
});
