/**
 * The parts of the byte-level predictions reader, each against a plain model: the waiting table
 * against two Maps (the original reader's), the hash set against a Set, the increasing-ids check
 * against a sort, and the number fast path against `Number()`.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  BASE,
  CAND,
  HashSet64,
  INLINE_ID_BYTES,
  IdTable,
  hashId,
  hashed,
} from '../../src/artifact/id-tables.js';
import { IdOrder, sameIds } from '../../src/artifact/id-compare.js';
import { Readable } from 'node:stream';
import { IdBatch, MEET_BASE } from '../../src/artifact/id-batch.js';
import { DONE, NEED_A, Pairing, TUNING } from '../../src/artifact/pairing.js';
import { NEED, PredictionLines, ROW, streamReader } from '../../src/artifact/prediction-lines.js';
import { InputError } from '../../src/model/errors.js';
import { MAX_MAGNITUDE } from '../../src/model/limits.js';

const ids = fc.oneof(
  fc.integer({ min: 0, max: 40 }).map((i) => `id-${i}`),
  fc.integer({ min: 0, max: 5 }).map((i) => `${'long-'.repeat(15)}${i}`), // > INLINE_ID_BYTES
  fc.integer({ min: 0, max: 5 }).map((i) => `${'w'.repeat(20)}${i}`), // widens the table
);

describe('IdBatch', () => {
  it('stores the id table hash of each id, the first word of hashId (property)', () => {
    // The table meets rows by this hash (common practice: FNV-1a, murmur3's finaliser); the
    // batch computes it while it copies the bytes, so it must be the same function.
    fc.assert(
      fc.property(
        fc.array(fc.uint8Array({ minLength: 1, maxLength: INLINE_ID_BYTES }), {
          minLength: 1,
          maxLength: 20,
        }),
        (keys) => {
          const batch = new IdBatch(keys.length);
          keys.forEach((key, step) => batch.add(MEET_BASE, key, 0, key.length, step));
          keys.forEach((key, r) => {
            hashId(key, 0, key.length);
            expect(batch.hash(r)).toBe(hashed.a);
          });
        },
      ),
    );
  });
});

describe('IdTable', () => {
  it('pairs like the original two Maps, in a table that starts tiny (property)', () => {
    expect(`${'long-'.repeat(15)}0`.length).toBeGreaterThan(INLINE_ID_BYTES);
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom(BASE, CAND), ids, fc.integer({ min: 0, max: 1 })), {
          maxLength: 300,
          size: 'max',
        }),
        fc.boolean(),
        (steps, losses) => {
          const table = new IdTable(losses, 8);
          const waiting = new Map<number, Map<string, number>>([
            [BASE, new Map()],
            [CAND, new Map()],
          ]);
          let repeated = 0;
          steps.forEach(([side, id, v], step) => {
            const value = losses ? v + 0.25 : v;
            const mine = waiting.get(side) as Map<string, number>;
            const other = waiting.get(side === BASE ? CAND : BASE) as Map<string, number>;
            const key = Buffer.from(`..${id}`);
            hashId(key, 2, key.length - 2);
            table.incoming = value;
            table.incomingStep = step;
            const len = key.length - 2;
            // Inline ids as IdBatch holds them: whole words from word 1, zero after the last byte.
            const words = new Uint32Array(2 + Math.ceil(len / 4)).fill(0xdeadbeef);
            words.fill(0, 1 + Math.floor((len - 1) / 4));
            key.copy(Buffer.from(words.buffer), 4, 2);
            const met =
              len > INLINE_ID_BYTES
                ? table.meetLong(side, key, 2, len)
                : table.meet(side, words, 1, len, hashed.a);
            const partner = other.get(id);
            if (partner !== undefined) {
              other.delete(id);
              expect(met).toBe(true);
              expect(table.partner).toBe(partner);
            } else {
              if (mine.has(id)) repeated |= side;
              mine.set(id, value);
              expect(met).toBe(false);
            }
          });
          expect([table.waitingBase, table.waitingCand]).toEqual([
            waiting.get(BASE)?.size,
            waiting.get(CAND)?.size,
          ]);
          expect(table.repeated).toBe(repeated);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe('HashSet64', () => {
  it('behaves like a Set of (a, b) pairs, including (0, 0) (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 3 }))),
        (pairs) => {
          const set = new HashSet64(4);
          const model = new Set<string>();
          for (const [a, b] of pairs) {
            // Map (0, 1) away so that the model need not know the set's empty marker.
            if (a === 0 && b === 1) continue;
            expect(set.add(a, b)).toBe(!model.has(`${a},${b}`));
            model.add(`${a},${b}`);
          }
        },
      ),
    );
  });
});

describe('IdOrder', () => {
  it('holds exactly while ids increase by bytes or by length then bytes (property)', () => {
    const byBytes = (x: Buffer, y: Buffer): number => Buffer.compare(x, y);
    const byLength = (x: Buffer, y: Buffer): number =>
      x.length !== y.length ? x.length - y.length : Buffer.compare(x, y);
    fc.assert(
      // Up to 11 bytes of a small alphabet: long common prefixes, and ids that differ in a whole
      // four-byte word, in its last byte or only in the tail after the words.
      fc.property(
        fc.array(fc.stringMatching(/^[ab0-9\xff]{1,11}$/), { maxLength: 12 }),
        fc.nat(7),
        (list, pad) => {
          const keys = list.map((s) => Buffer.from(s, 'latin1'));
          const order = new IdOrder();
          let ok = true;
          keys.forEach((key, i) => {
            const prev = keys[i - 1] ?? Buffer.alloc(0);
            const result = order.next(
              ...placed(key, pad),
              key.length,
              ...placed(prev, pad + 3),
              i === 0 ? -1 : prev.length,
            );
            if (!ok) return;
            const prefix = keys.slice(0, i + 1);
            const increasing = (cmp: (x: Buffer, y: Buffer) => number): boolean =>
              prefix.every((k, j) => j === 0 || cmp(prefix[j - 1] as Buffer, k) < 0);
            expect(result).toBe(increasing(byBytes) || increasing(byLength));
            ok = result;
          });
        },
      ),
    );
  });
});

describe('sameIds', () => {
  it('is Buffer.equals on the two ids wherever they sit in their views (property)', () => {
    fc.assert(
      fc.property(
        fc.uint8Array({ maxLength: 13 }),
        fc.uint8Array({ maxLength: 13 }),
        // The second id: the first one, another one, or the first with one byte changed.
        fc.constantFrom('same', 'other', 'one byte'),
        fc.nat(),
        fc.nat(7),
        fc.nat(7),
        (x, y, how, at, px, py) => {
          const a = Buffer.from(x);
          const b = Buffer.from(how === 'other' ? y : x);
          if (how === 'one byte' && b.length > 0)
            b.writeUInt8(b.readUInt8(at % b.length) ^ (1 + (at % 255)), at % b.length);
          expect(sameIds(...placed(a, px), a.length, ...placed(b, py), b.length)).toBe(a.equals(b));
        },
      ),
    );
  });
});

/** `bytes` copied into a larger buffer at offset `pad`, as a view of that buffer and the offset. */
function placed(bytes: Buffer, pad: number): [DataView, number] {
  const host = Buffer.alloc(pad + bytes.length + 5, 0x61);
  bytes.copy(host, pad);
  return [new DataView(host.buffer, host.byteOffset, host.length), pad];
}

/** Python's repr of a float (shortest round-trip digits; exponent form below 1e-4 and from 1e16). */
function pythonRepr(x: number): string {
  if (x === 0) return Object.is(x, -0) ? '-0.0' : '0.0';
  const [mantissa, exp] = x.toExponential().split('e') as [string, string];
  const e = Number(exp);
  const negative = mantissa.startsWith('-');
  const digits = mantissa.replace('-', '').replace('.', '');
  const sign = negative ? '-' : '';
  if (e < -4 || e >= 16) {
    const m = digits.length === 1 ? digits : `${digits[0]}.${digits.slice(1)}`;
    return `${sign}${m}e${e < 0 ? '-' : '+'}${String(Math.abs(e)).padStart(2, '0')}`;
  }
  if (e < 0) return `${sign}0.${'0'.repeat(-e - 1)}${digits}`;
  const int = digits.slice(0, e + 1).padEnd(e + 1, '0');
  const frac = digits.slice(e + 1);
  return `${sign}${int}.${frac === '' ? '0' : frac}`;
}

async function losses(text: string, chunk: number): Promise<number[]> {
  const data = Buffer.from(text);
  const lines = new PredictionLines(
    streamReader(async () =>
      Readable.from(
        (function* () {
          for (let at = 0; at < data.length; at += chunk) yield data.subarray(at, at + chunk);
        })(),
        { objectMode: false },
      ),
    ),
    'l.csv',
    'continuous',
  );
  const values: number[] = [];
  for (;;) {
    let r = lines.advance();
    while (r === NEED) {
      await lines.fill();
      r = lines.advance();
    }
    if (r !== ROW) return values;
    values.push(lines.value);
  }
}

describe('PredictionLines number fast path', () => {
  it('reads every plain decimal within ±1e15 to the same double as Number() (property)', async () => {
    // Source: ECMA-262 §7.1.4.1.1 StringToNumber (the string rules use Number(); V8 rounds
    // correctly), so Number() of the same text is the reference.
    const decimal = fc
      .tuple(
        fc.boolean(),
        fc.stringMatching(/^[0-9]{1,20}$/),
        fc.option(fc.stringMatching(/^[0-9]{1,20}$/)),
        fc.option(
          fc.tuple(fc.constantFrom('e', 'E', 'e+', 'e-', 'E-'), fc.integer({ min: 0, max: 30 })),
        ),
      )
      .map(
        ([neg, int, frac, exp]) =>
          `${neg ? '-' : ''}${int}${frac === null ? '' : `.${frac}`}${exp === null ? '' : `${exp[0]}${exp[1]}`}`,
      )
      .filter((t) => Math.abs(Number(t)) <= MAX_MAGNITUDE);
    await fc.assert(
      fc.asyncProperty(
        fc.array(
          fc.oneof(
            decimal,
            fc.double({ min: -MAX_MAGNITUDE, max: MAX_MAGNITUDE, noNaN: true }).map(String),
          ),
          {
            minLength: 1,
            maxLength: 200,
          },
        ),
        fc.integer({ min: 1, max: 64 }),
        async (texts, chunk) => {
          const values = await losses(
            `id,loss\n${texts.map((t, i) => `r${i},${t}\n`).join('')}`,
            chunk,
          );
          expect(values.length).toBe(texts.length);
          texts.forEach((t, i) => expect(Object.is(values[i], Number(t))).toBe(true));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('reads losses as Python writes them (repr) to the same doubles as Number() (property)', async () => {
    // Python's repr prints the shortest digits that round-trip (as JavaScript's String does), in
    // fixed notation for exponents −4 to 15 and as d.ddde±XX otherwise (Python docs, "Floating
    // Point Arithmetic: Issues and Limitations"; float_repr_style 'short'). Whole files in one
    // chunk, so that a value's digits are read eight at a time. Source of the values: ECMA-262
    // §7.1.4.1.1 StringToNumber (Number() of the same text).
    const values = fc.oneof(
      fc.double({ min: 0, max: 1, noNaN: true }),
      fc.double({ min: -100, max: 100, noNaN: true }),
      fc.double({ min: -MAX_MAGNITUDE, max: MAX_MAGNITUDE, noNaN: true }),
      fc.double({ min: 1e-12, max: 1e-4, noNaN: true }),
    );
    await fc.assert(
      fc.asyncProperty(fc.array(values, { minLength: 1, maxLength: 300 }), async (xs) => {
        const texts = xs.map(pythonRepr);
        const read = await losses(
          `id,loss\n${texts.map((t, i) => `r${i},${t}\n`).join('')}`,
          1 << 20,
        );
        expect(read.length).toBe(texts.length);
        texts.forEach((t, i) => expect(Object.is(read[i], Number(t))).toBe(true));
        // The text is the value's own shortest form: reading it back gives the value itself.
        xs.forEach((x, i) => expect(Object.is(read[i], x)).toBe(true));
      }),
      { numRuns: 300 },
    );
  });

  it('refuses a value beyond ±1e15 on the byte path as on the string path', async () => {
    // Source: the magnitude limit of model/limits.ts (MAX_MAGNITUDE), the string rule's own.
    for (const text of ['1000000000000000.5', '-2e15', '1e16', '12345678901234567']) {
      for (const chunk of [1, 7, 64]) {
        const error = await losses(`id,loss\na,1\nb,${text}\n`, chunk).catch((e: unknown) => e);
        expect(error).toBeInstanceOf(InputError);
        expect((error as InputError).message).toContain(
          `line 3 column "loss" must be a decimal number within ±1e15 (got "${text}")`,
        );
      }
    }
    expect(await losses('id,loss\na,1e15\nb,-1000000000000000\n', 5)).toEqual([1e15, -1e15]);
  });
});

describe('PredictionLines reads', () => {
  it('asks for small reads first, then whole buffers, and reads every row either way', async () => {
    // The first reads are small so that the paths of a row cut by the end of a buffer run before
    // V8 compiles the row loop (prediction-lines.ts, WARM_READS); the rows must not change.
    const rows = 20_000;
    const data = Buffer.from(
      `id,correct\n${Array.from({ length: rows }, (_, i) => `row-${i},${i % 3 === 0 ? 1 : 0}\n`).join('')}`,
    );
    const asked: number[] = [];
    let at = 0;
    const lines = new PredictionLines(
      {
        async read(into, offset, length) {
          asked.push(length);
          const n = Math.min(length, data.length - at);
          into.set(data.subarray(at, at + n), offset);
          at += n;
          return n;
        },
        async close() {},
      },
      'p.csv',
      'proportion',
    );
    let ones = 0;
    let count = 0;
    for (;;) {
      let r = lines.advance();
      while (r === NEED) {
        await lines.fill();
        r = lines.advance();
      }
      if (r !== ROW) break;
      expect(lines.id()).toBe(`row-${count}`);
      ones += lines.value;
      count++;
    }
    expect(count).toBe(rows);
    expect(ones).toBe(Math.ceil(rows / 3));
    // Common practice (a 1 KiB read ends inside a row of about 10 bytes most of the time).
    expect(asked.slice(0, 48).every((n) => n <= 1024)).toBe(true);
    expect(Math.max(...asked.slice(48))).toBeGreaterThan(1024 * 1024 - 1024);
  });
});

describe('Pairing lockstep loop', () => {
  for (const kind of ['proportion', 'continuous'] as const) {
    it(`leaves each file's id, previous id, line and value as reading row by row would (${kind})`, async () => {
      // Reference: the file's own rows (row k is r-k with a value from k). The candidate has a
      // blank line after its header, so its rows sit at other offsets in its buffer; reads of
      // 3000 bytes cut rows at many places.
      const rows = 5000;
      const value = (k: number, salt: number): number =>
        kind === 'proportion' ? (k + salt) % 2 : ((k * 37 + salt) % 101) / 8;
      const body = (salt: number): string =>
        Array.from({ length: rows }, (_, i) => `r-${i},${value(i, salt)}\n`).join('');
      const reader = (text: string): PredictionLines => {
        const data = Buffer.from(text);
        let at = 0;
        return new PredictionLines(
          {
            async read(into, offset, length) {
              const n = Math.min(length, data.length - at, 3000);
              into.set(data.subarray(at, at + n), offset);
              at += n;
              return n;
            },
            async close() {},
          },
          'f.csv',
          kind,
        );
      };
      const header = kind === 'proportion' ? 'id,correct' : 'id,loss';
      const a = reader(`${header}\n${body(0)}`);
      const b = reader(`${header}\n\n${body(1)}`);
      const pairing = new Pairing(a, b, new IdTable(kind === 'continuous'), kind, TUNING);
      const prevId = (l: PredictionLines): string =>
        l.prevKey.toString('utf8', l.prevStart, l.prevStart + l.prevLen);
      let checks = 0;
      for (let r = pairing.run(); r !== DONE; r = pairing.run()) {
        for (const [l, salt] of [
          [a, 0],
          [b, 1],
        ] as const) {
          if (l.rows >= 2) {
            expect(l.id()).toBe(`r-${l.rows - 1}`);
            expect(prevId(l)).toBe(`r-${l.rows - 2}`);
            expect(l.value).toBe(value(l.rows - 1, salt));
            expect(l.line).toBe(l.rows + 1 + salt);
            checks++;
          }
        }
        if (r === NEED_A) await a.fill();
        else await b.fill();
      }
      expect(checks).toBeGreaterThan(10);
      pairing.flush();
      expect(pairing.rows).toBe(rows);
      if (kind === 'proportion') {
        // The baseline is right (1) and the candidate wrong (0) on odd rows, the reverse on even.
        expect(pairing.baselineOnly).toBe(rows / 2);
        expect(pairing.candidateOnly).toBe(rows / 2);
      } else {
        // Source: the mean of the differences, summed directly (common practice).
        let sum = 0;
        for (let k = 0; k < rows; k++) sum += value(k, 1) - value(k, 0);
        expect(Math.abs(pairing.diffs.mean - sum / rows)).toBeLessThan(1e-12);
      }
    });
  }
});
