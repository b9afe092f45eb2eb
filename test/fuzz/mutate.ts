/**
 * Mutations of valid inputs for the fuzz suite: structural edits of JSON documents (replace,
 * delete, insert at a random place, with values chosen to hurt: extremes, deep nesting, markup,
 * prototype keys), text edits (truncation, byte flips, invalid UTF-8, duplicated keys), and
 * generators for hostile configs, predictions CSVs and uploaded bundles.
 */
import fc from 'fast-check';

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Values that have broken parsers and statistics before. */
const nasty: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(
    1.7e308,
    -1.7e308,
    5e-324,
    -0,
    1e15,
    -1e15,
    1e16,
    2 ** 53 + 1,
    0.5,
    1.5,
    -1,
    0,
    1,
    2,
    '',
    '0x1',
    '1e999',
    '<img src=x onerror=alert(1)>',
    '@octocat [x](javascript:alert(1)) | pipe',
    '__proto__',
    'constructor',
    '\u202eevil\u0000',
    'a'.repeat(5000),
    [],
    {},
    [[[[[[[[[[]]]]]]]]]],
    null,
    true,
  ),
  fc.double({ noNaN: true }),
  fc.integer(),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 20 }),
  fc.array(fc.double({ noNaN: true, min: -2, max: 2 }), { maxLength: 8 }),
  fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json>,
);

export type JsonEdit =
  | { op: 'number'; path: number[]; value: number }
  | { op: 'scale'; path: number[]; factor: number }
  | { op: 'split-values'; split: number; factor: number; shift: number }
  | { op: 'replace'; path: number[]; value: Json }
  | { op: 'delete'; path: number[] }
  | { op: 'insert'; path: number[]; key: string; value: Json }
  | { op: 'grow'; path: number[]; times: number };

const path = fc.array(fc.nat(), { minLength: 0, maxLength: 6 });

/** Numbers that stay valid for a proportion or a count but stress the statistics. */
const edgeNumber: fc.Arbitrary<number> = fc.oneof(
  fc.constantFrom(
    0,
    1,
    1e-300,
    5e-324,
    1e-9,
    0.5,
    0.999999,
    1e15,
    -1e15,
    1e12,
    2,
    3,
    1e6,
    1.7e308,
    -1.7e308,
  ),
  fc.double({ min: 0, max: 1, noNaN: true }),
  fc.integer({ min: 0, max: 100 }),
);

/** Numeric edits only, within [0, 1] or small counts: documents mostly stay valid. */
export const numericEdit: fc.Arbitrary<JsonEdit> = fc.record({
  op: fc.constant('number' as const),
  path,
  value: fc.oneof(
    fc.constantFrom(0, 1, 1e-300, 1e-9, 0.5, 0.999999, 2, 3),
    fc.double({ min: 0, max: 1, noNaN: true }),
  ),
});

/** Every number below a random place times a factor: whole splits or curves at the edge of range. */
export const scaleEdit: fc.Arbitrary<JsonEdit> = fc.record({
  op: fc.constant('scale' as const),
  path,
  factor: fc.constantFrom(1e300, -1e300, 1e15, -1e14, 1e-300, -1, 0, 1e6),
});

/** One split's values scaled and shifted: the measured numbers themselves at the edge of range. */
export const splitEdit: fc.Arbitrary<JsonEdit> = fc.record({
  op: fc.constant('split-values' as const),
  split: fc.nat(),
  factor: fc.constantFrom(1e300, -1e300, 1e15, 1e8, 1, 0, -1, 1e-300),
  shift: fc.constantFrom(0, 0, 1, -1, 1e15, -1e15, 0.5),
});

export const jsonEdit: fc.Arbitrary<JsonEdit> = fc.oneof(
  scaleEdit,
  // Mostly numeric edits that keep a document valid, so the analysis itself is exercised.
  {
    weight: 4,
    arbitrary: fc.record({ op: fc.constant('number' as const), path, value: edgeNumber }),
  },
  fc.record({ op: fc.constant('replace' as const), path, value: nasty }),
  fc.record({ op: fc.constant('delete' as const), path }),
  fc.record({
    op: fc.constant('insert' as const),
    path,
    key: fc.oneof(
      fc.constantFrom('__proto__', 'constructor', 'x', 'predictions', 'reference', 'slices'),
      fc.string({ maxLength: 10 }),
    ),
    value: nasty,
  }),
  fc.record({ op: fc.constant('grow' as const), path, times: fc.integer({ min: 2, max: 2000 }) }),
);

/** Walks `path` (each step picks a child modulo the count) and returns the parent and key. */
function locate(
  doc: Json,
  steps: number[],
): { parent: Json[] | Record<string, Json>; key: string | number } | null {
  let node = doc;
  let parent: Json[] | Record<string, Json> | null = null;
  let key: string | number = '';
  for (const step of steps) {
    if (Array.isArray(node) && node.length > 0) {
      parent = node;
      key = step % node.length;
      node = node[key] ?? null;
    } else if (
      node !== null &&
      typeof node === 'object' &&
      !Array.isArray(node) &&
      Object.keys(node).length > 0
    ) {
      const object: Record<string, Json> = node;
      const keys = Object.keys(object);
      const name = keys[step % keys.length] ?? '';
      parent = object;
      key = name;
      node = object[name] ?? null;
    } else break;
  }
  return parent === null ? null : { parent, key };
}

function scaled(node: Json, factor: number): Json {
  if (typeof node === 'number') return node * factor;
  if (Array.isArray(node)) return node.map((item) => scaled(item, factor));
  if (node !== null && typeof node === 'object')
    return Object.fromEntries(Object.entries(node).map(([k, v]) => [k, scaled(v, factor)]));
  return node;
}

export function applyEdit(doc: Json, edit: JsonEdit): Json {
  const copy = structuredClone(doc);
  if (edit.op === 'split-values') {
    const splits = (copy as Record<string, Json> | null)?.['splits'];
    if (splits === null || typeof splits !== 'object' || Array.isArray(splits)) return copy;
    const names = Object.keys(splits);
    const split = splits[names[edit.split % names.length] ?? ''] as
      Record<string, Json> | undefined;
    const values = split?.['values'];
    if (split !== undefined && Array.isArray(values))
      split['values'] = values.map((v) =>
        typeof v === 'number' ? v * edit.factor + edit.shift : v,
      );
    return copy;
  }
  const at = locate(copy, edit.path);
  if (at === null) return copy;
  const { parent, key } = at;
  const set = (value: Json) => {
    if (Array.isArray(parent)) parent[key as number] = value;
    else
      Object.defineProperty(parent, key, {
        value,
        enumerable: true,
        writable: true,
        configurable: true,
      });
  };
  const get = (): Json =>
    Array.isArray(parent) ? (parent[key as number] ?? null) : (parent[key as string] ?? null);
  switch (edit.op) {
    case 'number':
      if (typeof get() === 'number') set(edit.value);
      break;
    case 'scale':
      set(scaled(get(), edit.factor));
      break;
    case 'replace':
      set(edit.value);
      break;
    case 'delete':
      if (Array.isArray(parent)) parent.splice(key as number, 1);
      else delete parent[key as string];
      break;
    case 'insert': {
      const target = get();
      if (target !== null && typeof target === 'object' && !Array.isArray(target))
        Object.defineProperty(target, edit.key, {
          value: edit.value,
          enumerable: true,
          writable: true,
          configurable: true,
        });
      else if (Array.isArray(target)) target.push(edit.value);
      else set(edit.value);
      break;
    }
    case 'grow': {
      const target = get();
      if (Array.isArray(target) && target.length > 0) {
        const grown: Json[] = [];
        for (let i = 0; i < edit.times; i++)
          grown.push(structuredClone(target[i % target.length] ?? null));
        set(grown);
      }
      break;
    }
  }
  return copy;
}

export type TextEdit =
  | { op: 'none' }
  | { op: 'truncate'; at: number }
  | { op: 'flip'; at: number; byte: number }
  | { op: 'invalid-utf8'; at: number }
  | { op: 'duplicate-key'; which: number }
  | { op: 'nest'; depth: number }
  | { op: 'bom' };

export const textEdit: fc.Arbitrary<TextEdit> = fc.oneof(
  { weight: 6, arbitrary: fc.constant({ op: 'none' as const }) },
  fc.record({ op: fc.constant('truncate' as const), at: fc.nat() }),
  fc.record({
    op: fc.constant('flip' as const),
    at: fc.nat(),
    byte: fc.integer({ min: 0, max: 255 }),
  }),
  fc.record({ op: fc.constant('invalid-utf8' as const), at: fc.nat() }),
  fc.record({ op: fc.constant('duplicate-key' as const), which: fc.nat() }),
  fc.record({ op: fc.constant('nest' as const), depth: fc.integer({ min: 60, max: 200_000 }) }),
  fc.constant({ op: 'bom' as const }),
);

export function applyText(text: string, edit: TextEdit): Uint8Array {
  const bytes = Buffer.from(text, 'utf8');
  switch (edit.op) {
    case 'none':
      return bytes;
    case 'truncate':
      return bytes.subarray(0, edit.at % (bytes.length + 1));
    case 'flip': {
      const copy = Buffer.from(bytes);
      if (copy.length > 0) copy[edit.at % copy.length] = edit.byte;
      return copy;
    }
    case 'invalid-utf8': {
      const at = edit.at % (bytes.length + 1);
      return Buffer.concat([bytes.subarray(0, at), Buffer.from([0xc3, 0x28]), bytes.subarray(at)]);
    }
    case 'duplicate-key': {
      const keys = [...text.matchAll(/"([A-Za-z_]+)":/g)];
      const match = keys[edit.which % Math.max(1, keys.length)];
      if (match?.index === undefined) return bytes;
      const end = match.index + match[0].length;
      return Buffer.from(
        `${text.slice(0, match.index)}"${match[1]}": 0, ${text.slice(match.index, end)}${text.slice(end)}`,
        'utf8',
      );
    }
    case 'nest': {
      const at = text.indexOf('"hyperparameters"');
      const open = '['.repeat(edit.depth);
      const close = ']'.repeat(edit.depth);
      if (at < 0) return Buffer.from(`${open}${close}`);
      return Buffer.from(`${text.slice(0, at)}"deep": ${open}${close}, ${text.slice(at)}`, 'utf8');
    }
    case 'bom':
      return Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), bytes]);
  }
}

/** A config: a few keys from the real ones with nasty values, or YAML made to hurt. */
export const configText: fc.Arbitrary<string> = fc.oneof(
  fc
    .dictionary(
      fc.constantFrom(
        'alpha',
        'min-effect',
        'gap-tolerance',
        'reference',
        'fail-on',
        'epoch-log',
        'limits',
        'unknown',
      ),
      fc.oneof(
        fc.constantFrom(
          '0.05',
          '0.5',
          '0',
          '-1',
          '1e-17',
          '.nan',
          '.inf',
          '"0.05"',
          '[]',
          '[worse-validation, none]',
          '"worse-validation, slice-regression"',
          '[worse-validation, slice-regression]',
          '{ file: epochs.csv, x: epoch, validation: val }',
          '{ file: ../../etc/passwd, x: a, validation: b }',
          '{ artifact-mb: 0.001 }',
          '{ csv-mb: 70000 }',
          '&a [1, *a]',
          '!!binary aGVsbG8=',
          'null',
        ),
        fc.double().map(String),
        fc.string({ maxLength: 12 }).map((s) => JSON.stringify(s)),
      ),
      { maxKeys: 4 },
    )
    .map(
      (entries) =>
        `${Object.entries(entries)
          .map(([k, v]) => `${k}: ${v}`)
          .join('\n')}\n`,
    ),
  fc.constantFrom(
    'a: &a ["x","x","x","x","x","x","x","x","x"]\nb: &b [*a,*a,*a,*a,*a,*a,*a,*a,*a]\nc: &c [*b,*b,*b,*b,*b,*b,*b,*b,*b]\nd: [*c,*c,*c,*c,*c,*c,*c,*c,*c]\n',
    `alpha: ${'['.repeat(5000)}`,
    `alpha:\n${' '.repeat(200)}- 1\n`,
    'alpha: 0.05\nalpha: 0.1\n',
    '- just\n- a list\n',
    '\u0000\u0001',
    '',
  ),
  fc.string({ maxLength: 200 }),
);

/** A predictions CSV for a metric kind, with hostile rows now and then. */
export function predictionsText(kind: 'proportion' | 'continuous'): fc.Arbitrary<string> {
  const header = fc.oneof(
    { weight: 8, arbitrary: fc.constant(kind === 'proportion' ? 'id,correct' : 'id,loss') },
    fc.constantFrom(
      'id,correct',
      'id,loss',
      '\uFEFFid,correct',
      'id,correct,extra',
      '',
      'id;correct',
    ),
  );
  const value =
    kind === 'proportion'
      ? fc.oneof(
          { weight: 10, arbitrary: fc.constantFrom('0', '1') },
          fc.constantFrom('0x1', '+1', '1e0', '2', '', ' 1', '1.0', '-0'),
        )
      : fc.oneof(
          { weight: 10, arbitrary: fc.double({ min: 0, max: 5, noNaN: true }).map(String) },
          fc.constantFrom('1.7e308', '-1.7e308', '1e999', 'NaN', '0x10', '', 'abc', '1e15', '1e16'),
        );
  const id = fc.oneof(
    { weight: 10, arbitrary: fc.integer({ min: 0, max: 30 }).map((i) => `r${i}`) },
    fc.constantFrom('', '"q,uoted"', 'x\u0000', 'é'),
  );
  const row = fc.oneof(
    { weight: 20, arbitrary: fc.tuple(id, value).map(([i, v]) => `${i},${v}`) },
    fc.constantFrom('', 'a,b,c', 'noComma', ',1'),
  );
  return fc
    .tuple(header, fc.array(row, { minLength: 0, maxLength: 40 }), fc.constantFrom('\n', '\r\n'))
    .map(([h, rows, eol]) => [h, ...rows].join(eol) + eol);
}
