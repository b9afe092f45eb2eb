import { describe, expect, it } from 'vitest';
import { renderJson } from '../../src/report/json.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { hostileReview } from '../fixtures/report/hostile.js';

describe('renderJson', () => {
  it('is the review as pretty JSON with a final newline, and round-trips', () => {
    const review = bakeryReview();
    const json = renderJson(review);
    expect(json.endsWith('}\n')).toBe(true);
    expect(json.startsWith('{\n  "format": "fitgap-review/1",\n')).toBe(true);
    expect(JSON.parse(json)).toEqual(JSON.parse(JSON.stringify(review)));
  });

  it('keeps the stable keys of fitgap-review/1 (DESIGN.md §8)', () => {
    const doc = JSON.parse(renderJson(bakeryReview())) as Record<string, Record<string, unknown>>;
    expect(doc.movement).toBe('toward-overfitting');
    expect(doc.validation?.change).toBe('worse');
    for (const key of ['bias', 'variance'] as const) {
      expect(Object.keys(doc[key]?.delta as object)).toEqual([
        'unit',
        'estimate',
        'ci',
        'p',
        'test',
        'call',
      ]);
    }
    expect(doc.baseline?.diagnosis).toBe('high-bias');
    expect(doc.candidate?.diagnosis).toBe('high-variance');
    expect((doc.bias?.delta as { unit: string }).unit).toBe('shortfall');
    expect((doc.validation?.delta as { unit: string }).unit).toBe('metric');
    expect(Object.keys(doc.gate ?? {})).toEqual(['pass', 'reasons', 'failOn']);
    expect(doc.gate?.reasons).toEqual([{ outcome: 'worse-validation' }]);
  });

  it('keeps hostile text as data (JSON escaping is enough there)', () => {
    const review = hostileReview(3);
    expect(JSON.parse(renderJson(review)).metric.name).toBe(review.metric.name);
  });

  it('throws on a non-finite number, naming its JSON pointer', () => {
    const review = bakeryReview();
    review.variance.delta.estimate = Number.NaN;
    expect(() => renderJson(review)).toThrow(
      /^fitgap-review\/1 \/variance\/delta\/estimate is NaN/,
    );
    const other = bakeryReview();
    const split = other.splits[2];
    if (split === undefined) throw new Error('fixture');
    split.delta.ci = [0, Number.POSITIVE_INFINITY];
    expect(() => renderJson(other)).toThrow(/\/splits\/2\/delta\/ci\/1 is Infinity/);
  });
});
