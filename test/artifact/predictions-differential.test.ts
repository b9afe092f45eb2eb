/**
 * The byte-level predictions reader against the string reader it replaced (predictions-reference.ts):
 * on generated CSVs — empty files, header only, BOM, CRLF and lone CR, blank and padded lines,
 * quotes, UTF-8 and broken UTF-8, duplicates, shuffled and partly overlapping ids, bad and unusual
 * values — both give the same result, bit for bit, or the same error with the same issues; for a
 * pair of files (pairPredictions) and for one file (checkPredictions).
 */
import { createReadStream, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { TUNING } from '../../src/artifact/pairing.js';
import {
  checkPredictions,
  pairPredictions,
  type PredictionsFile,
} from '../../src/artifact/predictions.js';
import { predictionsSource } from '../../src/io/load-run.js';
import { DEFAULT_FILE_LIMITS } from '../../src/io/open-untrusted.js';
import type { MetricKind } from '../../src/model/run.js';
import { referenceCheckPredictions, referencePairPredictions } from './predictions-reference.js';

const dir = mkdtempSync(join(tmpdir(), 'fitgap-pred-diff-'));
let counter = 0;
/** A file on disk, read as the reference reads it (a plain file stream). */
function write(bytes: Uint8Array): PredictionsFile & { path: string } {
  const file = `d${counter++}.csv`;
  const path = join(dir, file);
  writeFileSync(path, bytes);
  return { path, file, open: async () => createReadStream(path) };
}

/**
 * The same file as a review opens it: through the io layer's checks (open-untrusted.ts), read in
 * place (`openBytes`) or, without it, as a stream.
 */
function checked(f: { path: string; file: string }, bytes: boolean): PredictionsFile {
  const source = predictionsSource({
    path: f.path,
    file: f.file,
    what: 'a predictions CSV',
    limit: 'csvBytes',
    limits: DEFAULT_FILE_LIMITS,
  });
  return bytes ? source : { file: source.file, open: source.open };
}

/** Numbers as their exact shortest text, -0 kept apart from 0. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_, v: unknown) =>
    typeof v === 'number' ? (Object.is(v, -0) ? '-0' : String(v)) : v,
  );
}

async function outcome(run: () => Promise<unknown>): Promise<string> {
  try {
    return `ok ${canonical(await run())}`;
  } catch (error) {
    const e = error as Error & { issues?: unknown };
    return `${e.name}: ${e.message} ${canonical(e.issues)}`;
  }
}

const utf8 = (text: string): Uint8Array => Buffer.from(text, 'utf8');
const bytes = (...values: number[]): Uint8Array => Uint8Array.from(values);

const id = fc.oneof(
  { weight: 8, arbitrary: fc.integer({ min: 0, max: 30 }).map((i) => utf8(`ex-${i}`)) },
  { weight: 2, arbitrary: fc.stringMatching(/^[a-z0-9]{1,3}$/).map(utf8) },
  {
    weight: 2,
    arbitrary: fc
      .constantFrom(
        ' ex-1',
        'ex-1 ',
        '"ex-1"',
        'café',
        'cafe\u0301',
        '\uFEFFex-2',
        '\tex-3',
        '',
        ' ',
        'a"b',
        'ex-1\u00a0',
        '\u2028ex-4',
        'x\u0000y',
      )
      .map(utf8),
  },
  {
    weight: 1,
    arbitrary: fc.constantFrom(bytes(0xff), bytes(0xfe), bytes(0xc3), bytes(0xe2, 0x82)),
  },
);

const correctValue = fc.oneof(
  { weight: 10, arbitrary: fc.constantFrom('0', '1') },
  {
    weight: 2,
    arbitrary: fc.constantFrom(
      '1.0',
      ' 1',
      '0 ',
      '-0',
      '0x1',
      '1e0',
      '+1',
      '2',
      '',
      'x',
      '1,0',
      'true',
    ),
  },
);
const lossValue = fc.oneof(
  { weight: 6, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }).map(String) },
  { weight: 3, arbitrary: fc.double({ min: -10, max: 10, noNaN: true }).map((x) => x.toFixed(6)) },
  {
    weight: 3,
    arbitrary: fc
      .tuple(
        fc.boolean(),
        fc.stringMatching(/^[0-9]{1,20}$/),
        fc.option(fc.stringMatching(/^[0-9]{1,20}$/)),
        fc.option(
          fc.tuple(fc.constantFrom('e', 'E', 'e+', 'e-', 'E-'), fc.integer({ min: 0, max: 400 })),
        ),
      )
      .map(
        ([neg, int, frac, exp]) =>
          `${neg ? '-' : ''}${int}${frac === null ? '' : `.${frac}`}${exp === null ? '' : `${exp[0]}${exp[1]}`}`,
      ),
  },
  {
    weight: 2,
    arbitrary: fc.constantFrom(
      '1e999',
      '-1e999',
      'NaN',
      'Infinity',
      '',
      ' 2.5',
      '.5',
      '5.',
      '0x10',
      '1_0',
      '0.1e',
      '-',
      '1e-400',
      '9007199254740993',
      '12345678901234567',
      '0.30000000000000004',
      '1e22',
      '1e23',
      '123456789012345678e-10',
      '-0.0',
    ),
  },
);

const eol = fc.oneof(
  { weight: 12, arbitrary: fc.constant('\n') },
  { weight: 1, arbitrary: fc.constantFrom('\r\n', '\r', '\n\n', '\n \n', '\r\r\n') },
);

function csv(kind: MetricKind) {
  const header = fc.oneof(
    { weight: 12, arbitrary: fc.constant(kind === 'proportion' ? 'id,correct' : 'id,loss') },
    {
      weight: 1,
      arbitrary: fc.constantFrom(
        '\uFEFFid,correct',
        '\uFEFFid,loss',
        ' id,correct ',
        'id,loss',
        'id,correct',
        'id;correct',
        '',
      ),
    },
  );
  const line = fc.tuple(id, kind === 'proportion' ? correctValue : lossValue, eol);
  return fc
    .tuple(
      fc.oneof(
        { weight: 20, arbitrary: header.map((h) => ({ empty: false, h })) },
        { weight: 1, arbitrary: fc.constant({ empty: true, h: '' }) },
      ),
      eol,
      fc.array(line, { maxLength: 25 }),
      fc.boolean(),
      fc.boolean(),
    )
    .map(([head, headEol, lines, sorted, trailing]) => {
      if (head.empty) return new Uint8Array(0);
      const rows = sorted ? [...lines].sort((x, y) => Buffer.compare(x[0], y[0])) : lines;
      const parts: Uint8Array[] = [utf8(head.h), utf8(headEol)];
      rows.forEach(([i, v, e], k) => {
        parts.push(i, utf8(`,${v}`));
        if (trailing || k < rows.length - 1) parts.push(utf8(e));
      });
      return Buffer.concat(parts);
    });
}

/** The file's bytes in chunks of the given sizes (cycled), a fresh stream per `open()`. */
function chunked(file: string, data: Uint8Array, sizes: number[]): PredictionsFile {
  async function* chunks(): AsyncGenerator<Buffer> {
    let at = 0;
    let k = 0;
    while (at < data.length) {
      const n = Math.max(1, sizes[k++ % sizes.length] ?? 1);
      yield Buffer.from(data.subarray(at, at + n));
      at += n;
    }
  }
  return { file, open: async () => Readable.from(chunks(), { objectMode: false }) };
}

describe('byte-level predictions reader = string reader', () => {
  for (const kind of ['proportion', 'continuous'] as const) {
    it(`gives the same result or error for generated ${kind} files (property)`, async () => {
      await fc.assert(
        fc.asyncProperty(
          csv(kind),
          csv(kind),
          fc.constantFrom('stream', 'checked', 'checked-stream', 'chunks'),
          fc.array(fc.integer({ min: 1, max: 40 }), { minLength: 1, maxLength: 5 }),
          async (baseBytes, candBytes, how, sizes) => {
            const b = write(baseBytes);
            const c = write(candBytes);
            const expected = await outcome(() => referencePairPredictions(b, c, kind));
            const as = (
              f: PredictionsFile & { path: string },
              data: Uint8Array,
            ): PredictionsFile =>
              how === 'stream'
                ? f
                : how === 'chunks'
                  ? chunked(f.file, data, sizes)
                  : checked(f, how === 'checked');
            const actual = await outcome(() =>
              pairPredictions(as(b, baseBytes), as(c, candBytes), kind),
            );
            expect(actual).toBe(expected);
            // One file on its own: the check a review makes of a side without a partner.
            expect(await outcome(() => checkPredictions(as(b, baseBytes), kind))).toBe(
              await outcome(() => referenceCheckPredictions(b, kind)),
            );
          },
        ),
        { numRuns: 400 },
      );
    }, 120_000);
  }

  it('agrees on shuffled, partly overlapping and repeated ids with many rows (property)', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.integer({ min: 0, max: 400 }), { maxLength: 300, size: 'max' }),
        fc.array(fc.integer({ min: 0, max: 400 }), { maxLength: 300, size: 'max' }),
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), {
          minLength: 401,
          maxLength: 401,
        }),
        fc.boolean(),
        fc.boolean(),
        fc.constantFrom('proportion', 'continuous') as fc.Arbitrary<MetricKind>,
        // Small batches and table regions reorder the table's work the most.
        // The window may double while the table has more than 16 slots per step of it.
        fc
          .record({
            window: fc.integer({ min: 1, max: 64 }),
            regionBits: fc.integer({ min: 0, max: 3 }),
            growth: fc.integer({ min: 0, max: 3 }),
          })
          .map(({ window, regionBits, growth }) => ({
            window,
            regionBits,
            maxWindow: window * 2 ** growth,
            growFrom: 0,
          })),
        async (xs, ys, losses, unique, sortBase, kind, tuning) => {
          const prep = (list: number[]): number[] => {
            const l = unique ? [...new Set(list)] : list;
            return sortBase ? [...l].sort((p, q) => p - q) : l;
          };
          const v = (i: number, salt: number): string =>
            kind === 'proportion'
              ? String((i * 7 + salt) % 3 === 0 ? 0 : 1)
              : String((losses[i] ?? 0) * salt);
          const text = (list: number[], salt: number): Uint8Array =>
            utf8(
              `${kind === 'proportion' ? 'id,correct' : 'id,loss'}\n${list.map((i) => `id-${i},${v(i, salt)}\n`).join('')}`,
            );
          const b = write(text(prep(xs), 1));
          const c = write(text(unique ? [...new Set(ys)] : ys, 3));
          const expected = await outcome(() => referencePairPredictions(b, c, kind));
          expect(await outcome(() => pairPredictions(b, c, kind, tuning))).toBe(expected);
        },
      ),
      { numRuns: 400 },
    );
  }, 120_000);

  it('agrees where the files are in step, with rows out of step, odd lines and repeats mixed in (property)', async () => {
    // Both files list the same increasing ids (the common case, read by the lockstep loop of
    // pairing.ts); a few edits put rows out of step, send a row to the string rules, break the
    // order or repeat an id. Up to 40,000 rows, so that the loop crosses its blocks of 2048
    // steps, buffer ends and (small) windows.
    const edit = fc.record({
      at: fc.nat(),
      what: fc.constantFrom(
        'drop-base',
        'drop-cand',
        'crlf-base',
        'blank-cand',
        'space-cand',
        'swap-cand',
        'repeat-both',
        'long-both',
        'value-cand',
        'back-cand',
        'apart-both',
        'prefix-cand',
        'semicolon-cand',
      ),
    });
    await fc.assert(
      fc.asyncProperty(
        fc.oneof(fc.integer({ min: 1, max: 3000 }), fc.integer({ min: 20_000, max: 40_000 })),
        fc.array(edit, { maxLength: 6 }),
        fc.constantFrom('proportion', 'continuous') as fc.Arbitrary<MetricKind>,
        fc.constantFrom('stream', 'checked', 'chunks'),
        fc.array(fc.integer({ min: 1, max: 9000 }), { minLength: 1, maxLength: 4 }),
        fc.option(fc.integer({ min: 1, max: 5000 })),
        fc.boolean(),
        async (n, edits, kind, how, sizes, window, pad) => {
          const value = (i: number, salt: number): string =>
            kind === 'proportion'
              ? String((i * 2654435761 + salt) % 7 < 3 ? 0 : 1)
              : String(((i * 2654435761 + salt) % 1000) / 997);
          // Padded ids increase by bytes too (r-000010 after r-000009).
          const id = (i: number): string => `r-${pad ? String(i).padStart(6, '0') : i}`;
          const base = Array.from({ length: n }, (_, i) => `${id(i)},${value(i, 1)}\n`);
          const cand = Array.from({ length: n }, (_, i) => `${id(i)},${value(i, 5)}\n`);
          for (const { at, what } of edits) {
            const i = at % n;
            if (what === 'drop-base') base[i] = '';
            else if (what === 'drop-cand') cand[i] = '';
            else if (what === 'crlf-base') base[i] = (base[i] ?? '').replace('\n', '\r\n');
            else if (what === 'blank-cand') cand[i] = `\n${cand[i] ?? ''}`;
            else if (what === 'space-cand') cand[i] = ` ${cand[i] ?? ''}`;
            else if (what === 'swap-cand' && i + 1 < n)
              [cand[i], cand[i + 1]] = [cand[i + 1] ?? '', cand[i] ?? ''];
            else if (what === 'repeat-both') {
              base[i] = `${base[i] ?? ''}${base[i] ?? ''}`;
              cand[i] = `${cand[i] ?? ''}${cand[i] ?? ''}`;
            } else if (what === 'long-both') {
              base[i] = `${id(i)}${'z'.repeat(70)},${value(i, 1)}\n`;
              cand[i] = `${id(i)}${'z'.repeat(70)},${value(i, 5)}\n`;
            } else if (what === 'apart-both') {
              // One row each that the other file lacks, then in step again (the rows in between
              // wait in the id table, and the losses' pairs keep their order through the ring).
              base[i] = `${base[i] ?? ''}${id(i)}a,${value(i, 2)}\n`;
              cand[i] = `${cand[i] ?? ''}${id(i)}b,${value(i, 3)}\n`;
            } else if (what === 'prefix-cand') {
              // The candidate's id is the baseline's and one more byte (r-5 beside r-50).
              cand[i] = `${id(i)}0,${value(i, 5)}\n`;
            } else if (what === 'semicolon-cand') {
              // One field, not two: `r-5;1` must be refused, not read as the id r-5.
              cand[i] = `${id(i)};${value(i, 5)}\n`;
            } else if (what === 'back-cand' && !pad && n > 10 && String(n - 1)[0] !== '9') {
              // The candidate ends with an id from further back again (r-5 after r-17): it follows
              // the last one by bytes, not by length then bytes; but the ids stopped increasing
              // by bytes at r-9 → r-10, so it is a repeat to find (only the order checks can).
              const m = Number(String(n - 1)[0]) + 1;
              cand[n - 1] = `${cand[n - 1] ?? ''}r-${m},${value(m, 5)}\n`;
            } else if (what === 'value-cand')
              cand[i] = `${id(i)},${kind === 'proportion' ? 2 : 'x'}\n`;
          }
          const header = kind === 'proportion' ? 'id,correct\n' : 'id,loss\n';
          const baseBytes = utf8(header + base.join(''));
          const candBytes = utf8(header + cand.join(''));
          const b = write(baseBytes);
          const c = write(candBytes);
          const expected = await outcome(() => referencePairPredictions(b, c, kind));
          const as = (f: PredictionsFile & { path: string }, data: Uint8Array): PredictionsFile =>
            how === 'stream'
              ? f
              : how === 'chunks'
                ? chunked(f.file, data, sizes)
                : checked(f, true);
          const tuning = window === null ? undefined : { ...TUNING, window, maxWindow: window };
          const actual = await outcome(() =>
            pairPredictions(as(b, baseBytes), as(c, candBytes), kind, tuning),
          );
          expect(actual).toBe(expected);
        },
      ),
      { numRuns: 80 },
    );
  }, 180_000);

  it('sees an id repeated while it waits, though its partner comes later', async () => {
    // The candidate's two "c" rows both wait before the baseline's "c" pairs with one: nothing is
    // left over at the end, only the repeat itself tells.
    const b = write(utf8('id,correct\na,1\nb,1\nc,1\n'));
    const c = write(utf8('id,correct\nc,1\nc,0\na,1\nb,1\n'));
    const expected = await outcome(() => referencePairPredictions(b, c, 'proportion'));
    expect(expected).toMatch(/line 3 must have a unique id \(also on line 2\)/);
    expect(await outcome(() => pairPredictions(b, c, 'proportion'))).toBe(expected);
  });

  it('checks the candidate ids own order when a pair follows rows out of step', async () => {
    // Step 2 pairs "d" with "d", but the step before was out of step ("c" beside "d"): the
    // baseline's "c" → "d" increases, the candidate's "d" → "d" repeats. Only in lockstep may the
    // baseline's order stand for the candidate's.
    const b = write(utf8('id,correct\nc,1\nd,1\n'));
    const c = write(utf8('id,correct\nd,1\nd,0\n'));
    const expected = await outcome(() => referencePairPredictions(b, c, 'proportion'));
    expect(expected).toMatch(/line 3 must have a unique id \(also on line 2\)/);
    expect(await outcome(() => pairPredictions(b, c, 'proportion'))).toBe(expected);
  });

  it('still sees a repeated id when the read before it overwrote the previous id', async () => {
    // The second read lands a newline where the first row's id was: only a saved copy of that id
    // shows that "b" repeats (the ids look increasing otherwise).
    const data = utf8('id,correct\nb,1\nb,1\nc,1\nd,1\nx,1\n');
    const b = write(data);
    const c = write(utf8('id,correct\nb,1\n'));
    const expected = await outcome(() => referencePairPredictions(b, c, 'proportion'));
    expect(expected).toMatch(/line 3 must have a unique id \(also on line 2\)/);
    const actual = await outcome(() =>
      pairPredictions(chunked(b.file, data, [15, 16]), c, 'proportion'),
    );
    expect(actual).toBe(expected);
  });

  it('agrees on a line longer than the read buffer', async () => {
    const long = 'x'.repeat(3 << 20);
    const b = write(utf8(`id,correct\n${long},1\nb,0\n`));
    const c = write(utf8(`id,correct\nb,1\n${long},1\n`));
    const expected = await outcome(() => referencePairPredictions(b, c, 'proportion'));
    expect(expected).toMatch(/^ok /);
    expect(await outcome(() => pairPredictions(b, c, 'proportion'))).toBe(expected);
  });
});
