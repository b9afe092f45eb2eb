import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { escapePointerToken, outOfRangeNumbers } from '../../src/validate/ajv-issues.js';

/**
 * Naive reference: a recursive walk in document order that writes the pointer of every number and
 * keeps the bad ones (common practice: RFC 6901 pointers, tokens escaped with ~0 and ~1).
 */
function naive(doc: unknown, bound: number, max = 10): { pointer: string; value: number }[] {
  const found: { pointer: string; value: number }[] = [];
  const walk = (node: unknown, pointer: string): void => {
    if (found.length >= max) return;
    if (typeof node === 'number') {
      if (!Number.isFinite(node) || Math.abs(node) > bound) found.push({ pointer, value: node });
    } else if (Array.isArray(node)) node.forEach((v, i) => walk(v, `${pointer}/${i}`));
    else if (node !== null && typeof node === 'object')
      for (const key of Object.keys(node))
        walk((node as Record<string, unknown>)[key], `${pointer}/${escapePointerToken(key)}`);
  };
  walk(doc, '');
  return found;
}

const number = fc.oneof(
  fc.double({ min: -10, max: 10, noNaN: true }),
  fc.constantFrom(1e15, -1e15, 1.0000001e15, -2e20, Infinity, -Infinity, 0),
);
const key = fc.constantFrom('x', 'train', 'validation', 'a/b', 'm~n', '__proto__', '0');
const value: fc.Arbitrary<unknown> = fc.letrec<{ v: unknown }>((tie) => ({
  v: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    number,
    fc.constantFrom('s', true, null),
    fc.array(tie('v'), { maxLength: 5 }),
    // Objects as JSON.parse builds them (a "__proto__" key is an own property).
    fc
      .array(fc.tuple(key, tie('v')), { maxLength: 4 })
      .map(
        (entries) =>
          JSON.parse(
            `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${JSON.stringify(v) ?? 'null'}`).join(',')}}`,
          ) as unknown,
      ),
    // Curve-like points: an array of flat objects, which the walk checks in place.
    fc.array(fc.record({ x: number, train: number, validation: number }), { maxLength: 8 }),
  ),
})).v;

describe('outOfRangeNumbers', () => {
  it('finds the same numbers, in the same order and at the same pointers, as a naive walk', () => {
    // Source: the naive recursive walk above.
    fc.assert(
      fc.property(value, (doc) => {
        expect(outOfRangeNumbers(doc, 1e15)).toEqual(naive(doc, 1e15));
        expect(outOfRangeNumbers(doc, 1e15, 2)).toEqual(naive(doc, 1e15, 2));
      }),
      { numRuns: 2000, seed: 20261130 },
    );
  });

  it('names a bad number deep in a long curve', () => {
    const epochs = Array.from({ length: 100_000 }, (_, i) => ({ x: i + 1, validation: 0.5 }));
    (epochs[76_543] as { validation: number }).validation = 3e15;
    expect(outOfRangeNumbers({ curves: { epochs } }, 1e15)).toEqual([
      { pointer: '/curves/epochs/76543/validation', value: 3e15 },
    ]);
  });
});
