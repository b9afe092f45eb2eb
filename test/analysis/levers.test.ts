/**
 * The lever catalogue against the trade's rules of thumb (common practice): more training data,
 * fewer features and stronger regularization address variance; additional features, polynomial
 * features and weaker regularization address bias; a smaller training set is never a cure for
 * high bias.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LEVER_CATALOGUE } from '../../src/analysis/levers/catalogue.js';
import { buildReview } from '../../src/analysis/review.js';
import type { LeverId } from '../../src/model/review.js';
import { makeRun, SETTINGS } from './make-run.js';

describe('lever catalogue (common practice)', () => {
  it.each<[LeverId, string]>([
    ['more-data', 'variance'],
    ['fewer-features', 'variance'],
    ['stronger-regularization', 'variance'],
    ['smaller-model', 'variance'],
    ['early-stopping', 'variance'],
    ['more-features', 'bias'],
    ['richer-features', 'bias'],
    ['weaker-regularization', 'bias'],
    ['bigger-model', 'bias'],
    ['train-longer', 'bias'],
    ['align-training-data', 'mismatch'],
    ['bigger-validation-set', 'validation-overfit'],
  ])('%s addresses %s', (id, target) => {
    expect(LEVER_CATALOGUE[id].addresses).toBe(target);
  });

  it('offers variance levers for high variance and bias levers for high bias', () => {
    const highVariance = makeRun({
      reference: 0.01,
      train: [0.02, 0.021, 0.019],
      validation: [0.2, 0.21, 0.19],
    });
    const r1 = buildReview({ baseline: highVariance, candidate: highVariance, settings: SETTINGS });
    expect(r1.candidate.diagnosis).toBe('high-variance');
    const ids1 = r1.levers.map((l) => l.id);
    expect(ids1.slice(0, 3)).toEqual(
      expect.arrayContaining(['more-data', 'stronger-regularization', 'fewer-features']),
    );
    expect(ids1).not.toContain('more-features');
    expect(ids1).not.toContain('weaker-regularization');

    const highBias = makeRun({
      reference: 0.01,
      train: [0.2, 0.21, 0.19],
      validation: [0.21, 0.22, 0.2],
    });
    const r2 = buildReview({ baseline: highBias, candidate: highBias, settings: SETTINGS });
    expect(r2.candidate.diagnosis).toBe('high-bias');
    const ids2 = r2.levers.map((l) => l.id);
    expect(ids2.slice(0, 3)).toEqual(expect.arrayContaining(['richer-features', 'more-features']));
    expect(ids2).not.toContain('more-data');
    expect(ids2).not.toContain('stronger-regularization');
    expect(r2.nonLevers).toEqual(['smaller-training-set']);
  });

  it('never offers a smaller training set, whatever the runs', () => {
    const values = fc.array(fc.double({ min: 0.01, max: 0.5, noNaN: true }), {
      minLength: 2,
      maxLength: 2,
    });
    fc.assert(
      fc.property(
        values,
        values,
        values,
        values,
        fc.integer({ min: 100, max: 100000 }),
        (t1, v1, t2, v2, n) => {
          const b = makeRun({
            kind: 'proportion',
            train: t1,
            validation: v1,
            hyperparameters: { train_examples: n },
          });
          const c = makeRun({
            kind: 'proportion',
            train: t2,
            validation: v2,
            hyperparameters: { train_examples: Math.floor(n / 2) },
          });
          const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
          // No lever shrinks the data: none is outside the catalogue, a suggested train_examples
          // is never below the candidate's (restoring data is fine), and the PR's own shrinking
          // pulls no lever.
          for (const lever of review.levers) {
            expect(Object.hasOwn(LEVER_CATALOGUE, lever.id)).toBe(true);
            if (lever.suggestion?.hyperparameter === 'train_examples')
              expect(lever.suggestion.value).toBeGreaterThan(Math.floor(n / 2));
            expect(lever.evidence.map((e) => e.kind)).not.toContain('already-pulled');
          }
          // The PR halved the training set, so the non-lever is always said.
          expect(review.nonLevers).toEqual(['smaller-training-set']);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('does not blindly repeat a lever the PR already pulled', () => {
    const b = makeRun({
      reference: 0.01,
      train: [0.02, 0.021, 0.019],
      validation: [0.2, 0.21, 0.19],
      hyperparameters: { lambda: 0.1 },
    });
    const c = makeRun({
      reference: 0.01,
      train: [0.02, 0.021, 0.019],
      validation: [0.19, 0.2, 0.18],
      hyperparameters: { lambda: 0.3 },
    });
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.candidate.diagnosis).toBe('high-variance');
    const strong = review.levers.find((l) => l.id === 'stronger-regularization');
    expect(strong?.evidence).toContainEqual({
      kind: 'already-pulled',
      hyperparameter: 'lambda',
      from: 0.1,
      to: 0.3,
      direction: 'raised',
    });
    expect(review.levers[0]?.id).not.toBe('stronger-regularization');
  });
});

describe('lever scores keep their bands (src/analysis/levers/scores.ts)', () => {
  it('puts a reversal of the PR’s own change above every diagnosis lever, and evidence levers last', async () => {
    const S = await import('../../src/analysis/levers/scores.js');
    const bestDiagnosis =
      S.DIAGNOSIS_BASE +
      Math.max(S.GAP_CLOSING_BONUS, S.SWEEP_AGREES_BONUS, S.EPOCH_CONFIRMED_BONUS);
    expect(S.REVERSE_OWN_CHANGE).toBeGreaterThan(S.COUNTER_WITH_SWEEP);
    expect(S.COUNTER_WITH_SWEEP).toBeGreaterThan(S.STEP_BACK_CAPACITY);
    expect(S.STEP_BACK_CAPACITY).toBeGreaterThan(S.COUNTER_WITHOUT_SWEEP);
    expect(S.COUNTER_WITHOUT_SWEEP).toBeGreaterThan(bestDiagnosis);
    expect(S.MISMATCH_DIAGNOSED).toBeGreaterThan(S.DIAGNOSIS_BASE);
    // Within a target, the whole catalogue order is worth at most the smallest curve bonus.
    expect(4 * S.CATALOGUE_STEP).toBeLessThanOrEqual(S.GAP_CLOSING_BONUS);
    expect(S.SUPPLY_REFERENCE).toBeGreaterThan(S.ADD_REPEATS);
    expect(S.ADD_REPEATS).toBeLessThan(S.EPOCH_CURVE_ALONE);
  });
});
