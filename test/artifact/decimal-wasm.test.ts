/**
 * The WebAssembly loss reader (decimal.wat through decimal-wasm.ts) against decimal.ts
 * `readDecimal` (which predictions-decimal.test.ts checks against Number()) and against Number()
 * itself: the same lines accepted and refused, at the same positions, with the same doubles.
 * Source: ECMA-262 §7.1.4.1.1 StringToNumber (Number() rounds the decimal's mathematical value to
 * the nearest double, ties to even); V8's Number() is the reference.
 */
import fc from 'fast-check';
import { describe, expect, it, vi } from 'vitest';
import { io, readDecimal } from '../../src/artifact/decimal.js';
import { wasmDecimals, type WasmDecimals } from '../../src/artifact/decimal-wasm.js';
import { halfway, nearHalfway } from './halfway.js';

const SIZE = 4096;
const reader = wasmDecimals(SIZE) as WasmDecimals;
const js = Buffer.alloc(SIZE);
const jsView = new DataView(js.buffer, js.byteOffset, js.byteLength);

/** Both readers on `text` at `from` (bytes before `end`): [next, value] of each, value NaN on a refusal. */
function both(text: string, from = 0, end = Buffer.byteLength(text, 'latin1')) {
  reader.buf.fill(0x41);
  js.fill(0x41);
  reader.buf.write(text, 0, 'latin1');
  js.write(text, 0, 'latin1');
  const w = reader.next(from, end);
  const j = readDecimal(js, jsView, from, end);
  return {
    wasm: [w, w >= 0 ? reader.value : Number.NaN] as const,
    js: [j, j >= 0 ? (io[2] as number) : Number.NaN] as const,
  };
}

/** `digits` · 10^−places as a plain decimal. */
function plainDecimal(digits: string, places: number): string {
  const padded = digits.padStart(places + 1, '0');
  return `${padded.slice(0, -places)}.${padded.slice(-places)}`;
}

/** Writes `line` at the start of the reader's buffer; its length. */
function writeLine(line: string): number {
  return reader.buf.write(line, 0, 'latin1');
}

/** Same position (or both refused with −1) and the same double, −0 apart from 0. */
function agree(text: string, from?: number, end?: number): boolean {
  const { wasm, js: ref } = both(text, from, end);
  return wasm[0] === ref[0] && Object.is(wasm[1], ref[1]);
}

describe('the WebAssembly loss reader', () => {
  it('is available here (Node with WebAssembly)', () => {
    // The reader falls back to readDecimal without WebAssembly; this suite must not pass vacuously.
    expect(reader).not.toBeNull();
  });

  it('reads what readDecimal reads, and refuses what it refuses, on decimal-like text (property)', () => {
    const digits = (min: number, max: number) =>
      fc.stringMatching(new RegExp(`^[0-9]{${min},${max}}$`));
    const some = <T>(often: fc.Arbitrary<T>, rarely: fc.Arbitrary<T>) =>
      fc.oneof({ weight: 5, arbitrary: often }, { weight: 1, arbitrary: rarely });
    const line = fc
      .tuple(
        some(fc.constantFrom('', '-'), fc.constantFrom('+', ' ', '--')),
        some(digits(1, 24), fc.constant('')),
        some(fc.constantFrom('.'), fc.constantFrom('', '..', ',')),
        digits(0, 24),
        some(
          fc.constant(''),
          fc
            .tuple(
              fc.constantFrom('e', 'E', 'x'),
              fc.constantFrom('', '-', '+', '-+'),
              digits(0, 7),
            )
            .map((parts) => parts.join('')),
        ),
        some(fc.constant('\n'), fc.constantFrom('\r\n', ',', ' \n', '', '\n\n')),
      )
      .map((parts) => parts.join(''));
    const cut = some(fc.constant(0), fc.nat(12));
    let read = 0;
    let byNumber = 0;
    fc.assert(
      fc.property(line, cut, (text, shorter) => {
        const end = Math.max(0, Buffer.byteLength(text, 'latin1') - shorter);
        if (!agree(text, 0, end)) return false;
        if (reader.next(0, end) >= 0) read++;
        if (reader.read(0, end) === -2) byNumber++;
        return true;
      }),
      { numRuns: 30000 },
    );
    // Not only refusals: about a third of the lines are read (10,600–10,800 of 30,000 measured),
    // some of them by Number() (more than 19 digits, far scales).
    expect(read).toBeGreaterThan(10000);
    expect(byNumber).toBeGreaterThan(500);
  });

  it('agrees with readDecimal on arbitrary bytes (property)', () => {
    const bytes = fc.array(fc.constantFrom(...'0123456789.-+eE\n\r x,9'.split('')), {
      maxLength: 40,
    });
    fc.assert(
      fc.property(bytes, (chars) => agree(chars.join(''))),
      { numRuns: 20000 },
    );
  });

  it('reads shortest round-trip prints (Python repr, String()) back to the same double (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e15, max: 1e15, noNaN: true }),
        fc.integer({ min: 0, max: 7 }),
        (x, at) => {
          // String(−0) is "0": that one reads back as 0.
          const text = `${' '.repeat(at)}${String(x)}\n`;
          const { wasm } = both(text, at);
          return wasm[0] === text.length && Object.is(wasm[1], Object.is(x, -0) ? 0 : x);
        },
      ),
      { numRuns: 20000 },
    );
  });

  it('matches Number() next to halfway points, where rounding is hardest (property)', () => {
    // The decimal expansion of the midpoint between x and the next double, cut to 16–19 digits and
    // nudged by one unit: values on either side of a tie, the cases the near-tie test must catch.
    let decided = 0;
    let total = 0;
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e14, noNaN: true }),
        fc.integer({ min: 16, max: 19 }),
        fc.integer({ min: -1, max: 1 }),
        fc.boolean(),
        (x, n, nudge, plain) => {
          const near = nearHalfway(x, n, nudge);
          if (near === null || near.scale < -40) return true;
          const { text, scale } = near;
          // As a plain decimal (0.000…ddd or ddd.ddd) or with an exponent (ddde-k).
          const line =
            plain && scale < 0 ? `${plainDecimal(text, -scale)}\n` : `${text}e${scale}\n`;
          total++;
          if (reader.read(0, writeLine(line)) !== -2) decided++;
          const { wasm } = both(line);
          return wasm[0] === line.length && Object.is(wasm[1], Number(line.trim()));
        },
      ),
      { numRuns: 20000 },
    );
    expect(total).toBeGreaterThan(15000);
    expect(decided / total).toBeGreaterThan(0.5);
  });

  it('rounds exact ties within ±1e15 to even, as Number() does (property)', () => {
    // Between 2^49 and 1e15 the doubles are 1/8 apart, so each midpoint has 19 digits
    // (562949953421312.0625): a decimal exactly halfway, which must go to the even neighbour.
    fc.assert(
      fc.property(fc.integer({ min: 0, max: (1e15 - 2 ** 49) * 8 - 2 }), fc.boolean(), (k, neg) => {
        const x = 2 ** 49 + k / 8;
        const { digits, exp10 } = halfway(x);
        const line = `${neg ? '-' : ''}${plainDecimal(digits, -exp10)}\n`;
        const { wasm } = both(line);
        return wasm[0] === line.length && Object.is(wasm[1], Number(line.trim()));
      }),
      { numRuns: 5000 },
    );
  });

  it('decides the edges as Number() does', () => {
    const cases = [
      '0\n',
      '-0\n',
      '-0.0\n',
      '1000000000000000\n', // 1e15: the largest magnitude taken
      '-1000000000000000.0\n',
      '1000000000000000.1\n', // above 1e15: refused
      '1e15\n',
      '1.0000000000000002e15\n',
      '9007199254740993\n', // 2^53 + 1: a tie, to even
      '9007199254740995\n',
      '0.1\n',
      '0.30000000000000004\n',
      '0.9999999999999999\n',
      '0.99999999999999999\n', // rounds to 1
      '123456789012345678\n', // 18 digits
      '1234567890.123456789\n', // 19 digits
      '0.12345678901234567891\n', // 20 digits: Number() decides
      '99999999999999999999e-5\n',
      '1e-22\n',
      '1e22\n',
      '4.9e-324\n', // subnormal, scale beyond 22
      '2.6e-07\n',
      '1E+2\n',
      '00000000000000000000000001.5\n',
      '0.000000000000000000000000000001\n',
    ];
    for (const text of cases) {
      const { wasm, js: ref } = both(text);
      const expected = Number(text.trim());
      expect(wasm, text).toEqual(ref);
      if (Math.abs(expected) <= 1e15) {
        expect(wasm[0], text).toBe(text.length);
        expect(Object.is(wasm[1], expected), text).toBe(true);
      } else expect(wasm[0], text).toBe(-1);
    }
  });

  it('is null, so that readDecimal reads, when a memory cannot be had', () => {
    // Each memory reserves address space; under `ulimit -v` V8 may refuse it with a RangeError.
    const spy = vi.spyOn(WebAssembly, 'Memory').mockImplementation(function () {
      throw new RangeError('WebAssembly.Memory(): could not allocate memory');
    });
    try {
      expect(wasmDecimals(SIZE)).toBeNull();
      expect(spy).toHaveBeenCalled();
    } finally {
      spy.mockRestore();
    }
    expect(wasmDecimals(SIZE)).not.toBeNull();
  });

  it('reads values next to a buffer end without reading past it', () => {
    // The eight-digit step stops eight bytes before `end`: a digit at `end` is not the value's.
    const { wasm } = both('0.123456789\n', 0, 11);
    expect(wasm[0]).toBe(-1);
    expect(both('0.1234567\n', 0, 10).wasm[0]).toBe(10);
    expect(both('0.12345678\n', 0, 11).wasm[0]).toBe(11);
  });
});
