/**
 * The regularization sweep decides regularization levers (a measured curve beats the PR's change
 * and the diagnosis; common practice): its direction rules the other lever out, its minimum sets
 * the value, rounded to the sweep's grid. For an inverse knob (C) the sweep's x is C itself, so a
 * C below the minimum's is stronger regularization than the minimum's.
 */
import { describe, expect, it } from 'vitest';
import { buildReview } from '../../../src/analysis/review.js';
import { chooseLevers } from '../../../src/analysis/levers/choose.js';
import { sweepSuggestion } from '../../../src/analysis/levers/rounding.js';
import type { RegularizationEvidence } from '../../../src/model/review.js';
import { makeRun, SETTINGS } from '../make-run.js';
import { contextFor } from './lever-context.js';

/** A C sweep with its validation minimum at C = 0.3 (invented for the test). */
const C_SWEEP = [0.001, 0.003, 0.01, 0.03, 0.1, 0.3, 1, 3, 10, 30].map((x) => ({
  x,
  train: 0.2 - 0.02 * Math.log10(x),
  validation: 0.1 + 0.01 * Math.log10(x / 0.3) ** 2,
}));

describe('regularization sweep and levers', () => {
  it('reads a C sweep the right way round (curve_knobs, inverse_knobs from the Python writer)', () => {
    const b = makeRun({
      reference: 0.02,
      // Examples give the evaluation-set noise: the per-repeat gaps alone have zero spread.
      kind: 'proportion',
      examples: 10000,
      train: [0.05, 0.051, 0.049],
      validation: [0.09, 0.091, 0.089],
      hyperparameters: { C: 1, curve_knobs: { regularization: 'C' }, inverse_knobs: ['C'] },
    });
    const c = {
      ...makeRun({
        reference: 0.02,
        kind: 'proportion',
        examples: 10000,
        train: [0.09, 0.091, 0.089],
        validation: [0.1, 0.101, 0.099],
        hyperparameters: { C: 0.001, curve_knobs: { regularization: 'C' }, inverse_knobs: ['C'] },
      }),
      curves: { regularization: C_SWEEP },
    };
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.movement).toBe('toward-underfitting');
    // The writer's keys are facts about knobs, not changed knobs.
    expect(review.hyperparameters.map((h) => h.key)).toEqual(['C']);
    expect(review.notes.map((n) => n.code)).not.toContain('unmapped-hyperparameters');
    const first = review.levers[0];
    expect(first?.id).toBe('weaker-regularization');
    expect(first?.suggestion).toEqual({ hyperparameter: 'C', value: 0.3, basis: 'sweep-minimum' });
    expect(first?.evidence.map((e) => e.kind)).toEqual([
      'pr-change',
      'component-change',
      'sweep-minimum',
    ]);
    expect(review.levers.map((l) => l.id)).not.toContain('stronger-regularization');
  });

  const GRID = [0.01, 0.03, 0.1, 0.3, 1, 3];
  // As the curve analysis writes it: the suggestion is the minimum rounded to the sweep's grid.
  const sweep = (side: RegularizationEvidence['side'], bestX: number): RegularizationEvidence => ({
    bestX,
    bestValidation: 0.08,
    side,
    suggestedX: sweepSuggestion(bestX, GRID),
    atEdge: null,
    refined: true,
    chart: GRID.map((x) => ({ x, train: 0.05, validation: 0.09 })),
  });

  it('offers neither regularization lever when the candidate sits at the sweep minimum', () => {
    const { levers } = chooseLevers(
      contextFor({
        baseline: { hyperparameters: { lambda: 1 } },
        candidate: { hyperparameters: { lambda: 0.2 } },
        candidateDiagnosis: 'high-bias',
        movement: 'better-on-both',
        curves: { regularization: sweep('at', 0.197) },
      }),
    );
    const ids = levers.map((l) => l.id);
    expect(ids).not.toContain('weaker-regularization');
    expect(ids).not.toContain('stronger-regularization');
  });

  it('drops the PR-change lever the sweep contradicts and takes the sweep side, rounded to its grid', () => {
    // The PR raised lambda and bias rose, but the sweep says the candidate is still too weak.
    const { levers } = chooseLevers(
      contextFor({
        baseline: { hyperparameters: { lambda: 0.01 } },
        candidate: { hyperparameters: { lambda: 0.03 } },
        candidateDiagnosis: 'high-variance',
        movement: 'toward-underfitting',
        curves: { regularization: sweep('below', 0.2966) },
      }),
    );
    const ids = levers.map((l) => l.id);
    expect(ids).not.toContain('weaker-regularization');
    const stronger = levers.find((l) => l.id === 'stronger-regularization');
    expect(stronger?.suggestion).toEqual({
      hyperparameter: 'lambda',
      value: 0.3,
      basis: 'sweep-minimum',
    });
  });
});
