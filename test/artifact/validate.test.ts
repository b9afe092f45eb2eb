import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validateRun } from '../../src/validate/run.js';
import { InputError } from '../../src/model/errors.js';

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
