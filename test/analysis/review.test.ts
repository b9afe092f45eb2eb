import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildReview } from '../../src/analysis/review.js';
import { movementOf } from '../../src/analysis/movement.js';
import { newcombeInterval } from '../../src/stats/index.js';
import { validateRun } from '../../src/validate/run.js';
import { makeRun, SETTINGS } from './make-run.js';

describe('movement table (DESIGN.md §5)', () => {
  it('maps every pair of calls', () => {
    expect(movementOf('down', 'down')).toBe('better-on-both');
    expect(movementOf('down', 'flat')).toBe('away-from-underfitting');
    expect(movementOf('down', 'up')).toBe('toward-overfitting');
    expect(movementOf('flat', 'down')).toBe('away-from-overfitting');
    expect(movementOf('flat', 'flat')).toBe('no-significant-change');
    expect(movementOf('flat', 'up')).toBe('toward-overfitting');
    expect(movementOf('up', 'down')).toBe('toward-underfitting');
    expect(movementOf('up', 'flat')).toBe('toward-underfitting');
    expect(movementOf('up', 'up')).toBe('worse-on-both');
  });
});

describe('buildReview', () => {
  const baseline = makeRun({
    reference: 0.02,
    train: [0.08, 0.081, 0.079],
    validation: [0.1, 0.102, 0.099],
  });

  it('decomposes per DESIGN.md §3 with hand-computed values', () => {
    const run = makeRun({
      reference: 0.02,
      train: [0.03, 0.03],
      train_dev: [0.04, 0.04],
      validation: [0.07, 0.07],
      test: [0.08, 0.08],
    });
    const review = buildReview({ baseline: run, candidate: run, settings: SETTINGS });
    const c = review.candidate.components;
    // B = s(train) − s(ref) = 0.03 − 0.02; V = train_dev − train; D = validation − train_dev; O = test − validation
    expect(c.bias.value).toBeCloseTo(0.01, 12);
    expect(c.variance.value).toBeCloseTo(0.01, 12);
    expect(c.mismatch.value).toBeCloseTo(0.03, 12);
    expect(c.overfit.value).toBeCloseTo(0.01, 12);
    expect(review.candidate.diagnosis).toBe('data-mismatch');
    // Identical repeats of a continuous metric without per-example values: zero spread is not
    // zero noise, so nothing can be called.
    expect(review.movement).toBe('undetermined');
  });

  it('calls toward-overfitting when train error falls and the gap widens', () => {
    const candidate = makeRun({
      reference: 0.02,
      train: [0.05, 0.051, 0.049],
      validation: [0.11, 0.112, 0.109],
    });
    const review = buildReview({ baseline, candidate, settings: SETTINGS });
    expect(review.bias.delta?.call).toBe('down');
    expect(review.variance.delta.call).toBe('up');
    expect(review.movement).toBe('toward-overfitting');
    expect(review.validation.change).toBe('worse');
    expect(review.bias.delta?.test).toBe('welch-t');
    expect(review.gate.pass).toBe(false);
    expect(review.gate.reasons).toEqual([{ outcome: 'worse-validation' }]);
  });

  it('calls toward-underfitting and points lambda between old and new', () => {
    const b = makeRun({
      reference: 0.02,
      train: [0.05, 0.051, 0.049],
      validation: [0.09, 0.092, 0.089],
      hyperparameters: { lambda: 0.1 },
    });
    const c = makeRun({
      reference: 0.02,
      train: [0.09, 0.091, 0.089],
      validation: [0.1, 0.103, 0.098],
      hyperparameters: { lambda: 10 },
    });
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.movement).toBe('toward-underfitting');
    const first = review.levers[0];
    expect(first?.id).toBe('weaker-regularization');
    // Geometric mean of 0.1 and 10, the PR's own change and the bias it added as evidence.
    expect(first?.suggestion).toEqual({
      hyperparameter: 'lambda',
      value: 1,
      basis: 'between-old-and-new',
    });
    expect(first?.evidence.map((e) => e.kind)).toEqual(['pr-change', 'component-change']);
    expect(first?.evidence[0]).toEqual({
      kind: 'pr-change',
      hyperparameter: 'lambda',
      from: 0.1,
      to: 10,
      direction: 'raised',
      role: 'regularization',
      effect: 'more-regularization',
    });
    expect(first?.evidence[1]).toMatchObject({
      kind: 'component-change',
      component: 'bias',
      delta: { unit: 'shortfall', call: 'up' },
    });
    expect(review.levers.map((l) => l.id)).not.toContain('stronger-regularization');
  });

  it('uses binomial noise for one repeat of a proportion with examples', () => {
    const b = makeRun({ kind: 'proportion', examples: 5000, train: [0.03], validation: [0.07] });
    const c = makeRun({ kind: 'proportion', examples: 5000, train: [0.03], validation: [0.06] });
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.validation.delta.test).toBe('newcombe-score');
    // Source: Newcombe (1998), method 10, on 350/5000 vs 300/5000 errors (stats/proportion-difference.ts).
    const ci = newcombeInterval(350, 5000, 300, 5000, SETTINGS.alpha);
    expect(review.validation.delta.ci?.[0]).toBeCloseTo(ci[0], 9);
    expect(review.validation.delta.ci?.[1]).toBeCloseTo(ci[1], 9);
    expect(review.validation.change).toBe('better');
    // The reference defaults to 0 for a minimized proportion (DESIGN.md §2).
    expect(review.candidate.referenceSource).toBe('default');
    expect(review.candidate.components.bias.value).toBeCloseTo(0.03, 12);
  });

  it('says plainly when noise is unknown and calls nothing without min-effect', () => {
    const b = makeRun({ train: [1.2], validation: [2.0] });
    const c = makeRun({ train: [1.0], validation: [2.5] });
    const review = buildReview({ baseline: b, candidate: c, settings: SETTINGS });
    expect(review.validation.delta.test).toBe('none');
    expect(review.validation.delta.p).toBeNull();
    expect(review.movement).toBe('undetermined');
    expect(review.validation.change).toBe('undetermined');
    expect(review.validation.repeatsNeeded).toEqual({
      repeats: null,
      lowerBound: false,
      reason: 'noise-unknown',
    });
    expect(review.notes).toContainEqual({ code: 'noise-unknown' });
    expect(review.levers.map((l) => l.id)).toContain('add-repeats');
    // Size alone never decides: an unknown noise may exceed any change.
    const sized = buildReview({
      baseline: b,
      candidate: c,
      settings: { ...SETTINGS, minEffect: 0.1 },
    });
    expect(sized.movement).toBe('undetermined');
  });

  it('reports bias as unknown without a reference for a continuous metric', () => {
    const b = makeRun({ train: [1.0, 1.1], validation: [2.0, 2.1] });
    const review = buildReview({ baseline: b, candidate: b, settings: SETTINGS });
    expect(review.candidate.biasUnknown).toBe(true);
    expect(review.candidate.components.bias.value).toBeNull();
    expect(review.candidate.components.bias.unavailable).toBe('no-reference');
    expect(review.levers.map((l) => l.id)).toContain('supply-reference');
    expect(review.candidate.diagnosis).toBe('high-variance');
  });

  it('uses McNemar on paired predictions for one repeat', () => {
    const b = makeRun({ kind: 'proportion', train: [0.03], validation: [0.07] });
    const c = makeRun({ kind: 'proportion', train: [0.03], validation: [0.06] });
    const review = buildReview({
      baseline: b,
      candidate: c,
      settings: SETTINGS,
      paired: {
        kind: 'proportion',
        rows: 1600,
        baselineOnly: 86,
        candidateOnly: 150,
        split: 'validation',
      },
    });
    expect(review.validation.delta.test).toBe('mcnemar-exact');
    // Source: Agresti (1990) p. 350 via R mcnemar.test docs; exact p computed with SciPy (VALUES.md §4)
    expect(review.validation.delta.p).toBeCloseTo(3.7159e-5, 8);
    // error rate fell: candidate fixed 150 examples and broke 86
    expect(review.validation.delta.estimate).toBeCloseTo(-64 / 1600, 12);
    expect(review.validation.change).toBe('better');
  });

  it('flags a slice that regressed while the aggregate improved (Holm-adjusted)', () => {
    const b = {
      ...makeRun({ kind: 'proportion', examples: 20000, train: [0.05], validation: [0.08] }),
      slices: [
        { name: 'north', examples: 900, validation: 0.12 },
        { name: 'south', examples: 900, validation: 0.1 },
      ],
    };
    const c = {
      ...makeRun({ kind: 'proportion', examples: 20000, train: [0.05], validation: [0.07] }),
      slices: [
        { name: 'north', examples: 900, validation: 0.18 },
        { name: 'south', examples: 900, validation: 0.1 },
      ],
    };
    const review = buildReview({
      baseline: b,
      candidate: c,
      settings: { ...SETTINGS, failOn: ['slice-regression'] },
    });
    const north = review.slices.find((s) => s.name === 'north');
    expect(north?.change).toBe('worse');
    expect(north?.hiddenRegression).toBe(true);
    // Holm with two tests: the smaller p doubles (Holm 1979, from the definition)
    expect(north?.pAdjusted).toBeCloseTo(Math.min(1, 2 * (north?.delta.p ?? 1)), 12);
    expect(review.gate.pass).toBe(false);
  });
});

describe('the DESIGN.md example', () => {
  it('reviews against a modified copy and returns the stable report keys', () => {
    const doc = JSON.parse(readFileSync('test/fixtures/design/example.json', 'utf8')) as Record<
      string,
      unknown
    >;
    delete doc['predictions'];
    const baseline = validateRun(doc, 'example.json');
    const candidate = structuredClone(baseline);
    candidate.splits.train.values = [0.021, 0.02, 0.022];
    candidate.splits.validation.values = [0.071, 0.074, 0.07];
    const review = buildReview({ baseline, candidate, settings: SETTINGS });
    const json = JSON.parse(JSON.stringify(review)) as Record<string, unknown>;
    for (const key of [
      'movement',
      'validation',
      'bias',
      'variance',
      'baseline',
      'candidate',
      'levers',
      'gate',
    ])
      expect(json).toHaveProperty(key);
    expect(json).toHaveProperty('validation.change');
    expect(json).toHaveProperty('bias.delta.estimate');
    expect(json).toHaveProperty('variance.delta.ci');
    expect(json).toHaveProperty('variance.delta.p');
    expect(json).toHaveProperty('variance.delta.test');
    expect(json).toHaveProperty('variance.delta.call');
    expect(json).toHaveProperty('baseline.diagnosis');
    expect(json).toHaveProperty('candidate.diagnosis');
    expect(json).toHaveProperty('gate.pass');
    expect(json).toHaveProperty('gate.reasons');
    expect(review.movement).toBe('toward-overfitting');
  });
});

describe('curves with a perfect validation point', () => {
  it('reports generalization loss as unknown instead of Infinity, and the JSON report renders', async () => {
    const { renderJson } = await import('../../src/report/index.js');
    const run = makeRun({ kind: 'proportion', train: [0.01, 0.01], validation: [0.02, 0.02] });
    run.curves = {
      epochs: Array.from({ length: 12 }, (_, i) => ({
        x: i + 1,
        train: 0.1 / (i + 1),
        validation: i === 5 ? 0 : 0.05,
      })),
    };
    const review = buildReview({ baseline: run, candidate: run, settings: SETTINGS });
    const epochs = review.candidate.curves.epochs;
    expect(epochs !== undefined && !('skipped' in epochs) ? epochs.gl : 'missing').toBeNull();
    expect(() => renderJson(review)).not.toThrow();
  });
});
