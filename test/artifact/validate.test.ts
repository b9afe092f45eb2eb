import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validateRun } from '../../src/validate/run.js';
import { InputError } from '../../src/model/errors.js';
import { MAX_CURVE_POINTS, MAX_EPOCH_POINTS } from '../../src/model/limits.js';

const example = JSON.parse(readFileSync('test/fixtures/design/example.json', 'utf8')) as unknown;

function issuesOf(doc: unknown): string {
  try {
    validateRun(doc, 'c.json');
  } catch (error) {
    if (error instanceof InputError) return error.message;
    throw error;
  }
  return 'valid';
}

describe('validateRun', () => {
  it('accepts the DESIGN.md example unchanged', () => {
    const run = validateRun(example, 'example.json');
    expect(run.run.name).toBe('poly-degree-3');
    expect(run.splits.validation.values).toEqual([0.061, 0.066, 0.059]);
  });

  it('reports several schema problems at once with pointers', () => {
    const doc = structuredClone(example) as Record<string, unknown>;
    doc['bogus'] = 1;
    (doc['splits'] as { validation: { values: unknown[] } }).validation.values[0] = '0.07';
    const message = issuesOf(doc);
    expect(message).toContain('c.json: /bogus is not a known key');
    expect(message).toContain(
      'c.json: /splits/validation/values/0 must be of type number (got string "0.07"). Write numbers without quotes.',
    );
  });
});

describe('curve point limits', () => {
  /** The example with one curve of n points (x from 1, a falling validation error). */
  const withCurve = (name: string, n: number): unknown => {
    const doc = structuredClone(example) as Record<string, unknown>;
    const points = new Array<{ x: number; train: number; validation: number }>(n);
    for (let i = 0; i < n; i++)
      points[i] = { x: i + 1, train: 0.05, validation: 0.1 + 1 / (i + 2) };
    doc['curves'] = { [name]: points };
    return doc;
  };

  it(`accepts an epoch curve of exactly ${MAX_EPOCH_POINTS} points and refuses one more`, () => {
    expect(MAX_EPOCH_POINTS).toBe(1_000_000);
    expect(issuesOf(withCurve('epochs', MAX_EPOCH_POINTS))).toBe('valid');
    expect(issuesOf(withCurve('epochs', MAX_EPOCH_POINTS + 1))).toBe(
      'c.json: /curves/epochs must have at most 1000000 points (got 1000001 points). Log the curve less often, or keep every n-th point before writing the artifact.',
    );
  });

  it.each(['training_examples', 'regularization'])(
    `keeps the smaller limit of ${MAX_CURVE_POINTS} points for %s`,
    (name) => {
      expect(MAX_CURVE_POINTS).toBe(10_000);
      expect(issuesOf(withCurve(name, MAX_CURVE_POINTS))).toBe('valid');
      expect(issuesOf(withCurve(name, MAX_CURVE_POINTS + 1))).toBe(
        `c.json: /curves/${name} must have at most 10000 points (got 10001 points). Log the curve less often, or keep every n-th point before writing the artifact.`,
      );
    },
  );

  it('names the first bad point of a long curve by its pointer', () => {
    const doc = withCurve('epochs', 300_000) as { curves: { epochs: { x: number }[] } };
    (doc.curves.epochs[254_321] as { x: number }).x = 3;
    expect(issuesOf(doc)).toContain(
      "c.json: /curves/epochs/254321/x must be greater than the previous point's x (254321)",
    );
  });
});
