import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseJson, scanStructure } from '../../src/artifact/read-json.js';
import { escapePointerToken } from '../../src/validate/ajv-issues.js';

/**
 * Naive reference: the straightforward scan (a frame object and a Set of decoded keys for every
 * container), as fitgap did it before the scan stopped allocating per container. The fast scan must
 * find the same depth violation and the same duplicates, pointers included.
 */
function naiveScan(text: string, maxDepth: number): ReturnType<typeof scanStructure> {
  interface Frame {
    object: boolean;
    keys: Set<string>;
    at: string;
    index: number;
    expectKey: boolean;
  }
  const decode = (raw: string): string | null => {
    try {
      return JSON.parse(`"${raw}"`) as string;
    } catch {
      return null;
    }
  };
  const stack: Frame[] = [];
  const duplicates: { pointer: string; key: string }[] = [];
  const pointer = () =>
    stack
      .slice(0, -1)
      .map((f) => `/${f.object ? escapePointerToken(f.at) : String(f.index)}`)
      .join('');
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (c === '"') {
      const start = ++i;
      while (i < text.length && text[i] !== '"') {
        if (text[i] === '\\') i++;
        i++;
      }
      const top = stack[stack.length - 1];
      if (top?.object === true && top.expectKey) {
        const key = decode(text.slice(start, i));
        top.expectKey = false;
        if (key !== null) {
          top.at = key;
          if (top.keys.has(key) && duplicates.length < 10)
            duplicates.push({ pointer: `${pointer()}/${escapePointerToken(key)}`, key });
          top.keys.add(key);
        }
      }
    } else if (c === '{' || c === '[') {
      if (stack.length >= maxDepth) return { tooDeep: i, duplicates };
      stack.push({ object: c === '{', keys: new Set(), at: '', index: 0, expectKey: c === '{' });
    } else if (c === '}' || c === ']') stack.pop();
    else if (c === ',') {
      const top = stack[stack.length - 1];
      if (top !== undefined) {
        if (top.object) top.expectKey = true;
        else top.index++;
      }
    }
  }
  return { tooDeep: -1, duplicates };
}

/** Keys drawn from a small alphabet (so they repeat), sometimes escaped, sometimes with `/` or `~`. */
const keyText = fc
  .tuple(fc.constantFrom('a', 'b', 'x', 'a/b', 'm~n', 'é', '"q"', 'train'), fc.boolean())
  .map(([key, escape]) =>
    escape
      ? [...key].map((ch) => `\\u${ch.charCodeAt(0).toString(16).padStart(4, '0')}`).join('')
      : JSON.stringify(key).slice(1, -1),
  );

/** JSON text (valid) whose objects may repeat keys; a few objects have more than 16 keys. */
const jsonText: fc.Arbitrary<string> = fc.letrec<{ value: string }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    fc.constantFrom('1', '-2.5e3', 'true', 'null', '"s\\"t"', '"\\\\"'),
    fc.array(tie('value'), { maxLength: 5 }).map((xs) => `[${xs.join(',')}]`),
    fc
      .array(fc.tuple(keyText, tie('value')), { maxLength: 6 })
      .map((kv) => `{${kv.map(([k, v]) => `"${k}":${v}`).join(',')}}`),
    fc
      .tuple(fc.integer({ min: 14, max: 24 }), fc.integer({ min: 0, max: 30 }), tie('value'))
      .map(([count, again, v]) => {
        const names = Array.from({ length: count }, (_, i) => `k${i}`);
        if (again < count) names.push(`k${again}`);
        return `{${names.map((k) => `"${k}":${v}`).join(', ')}}`;
      }),
  ),
})).value;

describe('scanStructure', () => {
  it('finds the same duplicates and depth violation as the naive scan', () => {
    // Source: the naive scan above (common practice: a Set of keys per object).
    fc.assert(
      fc.property(jsonText, fc.integer({ min: 1, max: 8 }), (text, depth) => {
        expect(scanStructure(text, depth)).toEqual(naiveScan(text, depth));
        expect(scanStructure(text)).toEqual(naiveScan(text, 64));
      }),
      { numRuns: 1000, seed: 20261130 },
    );
  });

  it('agrees with the naive scan on broken text (unclosed strings, stray brackets)', () => {
    const broken = fc
      .array(
        fc.constantFrom('{', '}', '[', ']', ',', ':', '"', '\\', 'a', '"k"', '"\\u0061"', '1'),
        {
          maxLength: 40,
        },
      )
      .map((parts) => parts.join(''));
    fc.assert(
      fc.property(broken, (text) => {
        expect(scanStructure(text, 4)).toEqual(naiveScan(text, 4));
      }),
      { numRuns: 2000, seed: 20261130 },
    );
  });

  it('names a repeated key deep in a large array by its pointer', () => {
    const points = Array.from({ length: 50_000 }, (_, i) => `{"x":${i},"validation":0.5}`);
    points[41_234] = '{"x":41234,"validation":0.5,"x":1}';
    const text = `{"curves":{"epochs":[${points.join(',')}]}}`;
    expect(scanStructure(text).duplicates).toEqual([
      { pointer: '/curves/epochs/41234/x', key: 'x' },
    ]);
    expect(() => parseJson(text, 'run.json')).toThrow(
      'run.json: /curves/epochs/41234/x must appear once in its object',
    );
  });
});
