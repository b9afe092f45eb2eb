/**
 * decimalToDouble (the loss column's number reader) against Number() of the same text.
 * Source: ECMA-262 §7.1.4.1.1 StringToNumber — the mathematical value rounded to nearest, ties to
 * even (IEEE 754 roundTiesToEven); V8's Number() implements it, so it is the reference.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DECIMAL_PRIMER,
  decimalToDouble,
  decoded,
  io,
  primeDecimalReader,
  readDecimal,
} from '../../src/artifact/decimal.js';
import { nearHalfway } from './halfway.js';

/** hi / lo / loDigits of a digit string without leading zeros (as the reader splits them). */
function split(digits: string): [number, number, number] {
  const hi = digits.slice(0, 15);
  const lo = digits.slice(15);
  return [Number(hi), lo === '' ? 0 : Number(lo), lo.length];
}

/** decimalToDouble of `${digits}e${scale}`; NaN means "ask Number()". */
function read(digits: string, scale: number): number {
  const [hi, lo, loDigits] = split(digits);
  return decimalToDouble(hi, lo, loDigits, scale) ? (decoded[0] as number) : Number.NaN;
}

/**
 * hi / lo / loDigits as the byte reader splits a digit string (prediction-lines.ts `number`): digits
 * go to hi while hi < 9·10^14 (so hi stays an exact integer below 2^53, 16 digits unless the first
 * is 9), the rest to lo.
 */
function readerSplit(digits: string): [number, number, number] {
  let hi = 0;
  let lo = 0;
  let loDigits = 0;
  for (const ch of digits) {
    if (hi < 9e14) hi = hi * 10 + Number(ch);
    else {
      lo = lo * 10 + Number(ch);
      loDigits++;
    }
  }
  return [hi, lo, loDigits];
}

function agrees(digits: string, scale: number): boolean {
  const ours = read(digits, scale);
  return Number.isNaN(ours) || Object.is(ours, Number(`${digits}e${scale}`));
}

describe('decimalToDouble', () => {
  it('matches Number() on 16 to 19 significant digits at any scale within ±22 (property)', () => {
    fc.assert(
      fc.property(
        fc.stringMatching(/^[1-9][0-9]{15,18}$/),
        fc.integer({ min: -22, max: 22 }),
        (digits, scale) => agrees(digits, scale),
      ),
      { numRuns: 20000 },
    );
  });

  it('matches Number() on 15 to 20 digits split as the reader splits them (property)', () => {
    // 16 and 17 digits are what shortest round-trip printing (Python's repr) gives for most doubles.
    let decided = 0;
    fc.assert(
      fc.property(
        fc.stringMatching(/^[1-9][0-9]{14,19}$/),
        fc.integer({ min: -22, max: 22 }),
        (digits, scale) => {
          const [hi, lo, loDigits] = readerSplit(digits);
          if (loDigits > 4) return true;
          const ours = decimalToDouble(hi, lo, loDigits, scale)
            ? (decoded[0] as number)
            : Number.NaN;
          if (!Number.isNaN(ours)) decided++;
          return Number.isNaN(ours) || Object.is(ours, Number(`${digits}e${scale}`));
        },
      ),
      { numRuns: 20000 },
    );
    expect(decided).toBeGreaterThan(10000);
  });

  it('matches Number() on up to 15 digits (Clinger fast path) (property)', () => {
    fc.assert(
      fc.property(
        fc.stringMatching(/^[1-9][0-9]{0,14}$/),
        fc.integer({ min: -22, max: 22 }),
        (digits, scale) => Object.is(read(digits, scale), Number(`${digits}e${scale}`)),
      ),
      { numRuns: 5000 },
    );
  });

  it('matches Number() next to halfway points, where rounding is hardest (property)', () => {
    let decided = 0;
    let total = 0;
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        fc.integer({ min: 16, max: 19 }),
        fc.integer({ min: -1, max: 1 }),
        (x, n, nudge) => {
          const near = nearHalfway(x, n, nudge);
          if (near === null || near.scale < -22 || near.scale > 22) return true;
          const { text, scale } = near;
          total++;
          const ours = read(text, scale);
          if (!Number.isNaN(ours)) decided++;
          return Number.isNaN(ours) || Object.is(ours, Number(`${text}e${scale}`));
        },
      ),
      { numRuns: 20000 },
    );
    // Most of these are still decided without Number(); only near-ties are handed over.
    expect(total).toBeGreaterThan(1000);
    expect(decided / total).toBeGreaterThan(0.5);
  });

  it('decides the shortest round-trip print of nearly every double itself (property)', () => {
    // A shortest print (String(x), Python's repr) lies within half a unit in the last place of x,
    // so it is near a tie only by chance (about 2^-19 of them): Number() is rarely needed. The first
    // quotient may be more than one unit from x (17 digits above 2^53), which must not matter.
    let undecided = 0;
    let runs = 0;
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e15, noNaN: true }), (x) => {
        const text = String(x);
        if (text.includes('e')) return true;
        runs++;
        const [whole, fraction = ''] = text.split('.');
        const digits = `${whole}${fraction}`.replace(/^0+/, '');
        const [hi, lo, loDigits] = readerSplit(digits);
        if (!decimalToDouble(hi, lo, loDigits, -fraction.length)) {
          undecided++;
          return true;
        }
        return Object.is(decoded[0], x);
      }),
      { numRuns: 20000 },
    );
    expect(runs).toBeGreaterThan(19000);
    expect(undecided).toBeLessThanOrEqual(5);
  });

  it('rounds an exact tie to even through Number() (2^53 + 1 is halfway)', () => {
    // 9007199254740993 = 2^53 + 1 lies halfway between 2^53 and 2^53 + 2.
    const ours = read('9007199254740993', 0);
    expect(Number.isNaN(ours) || ours === 9007199254740992).toBe(true);
    expect(read('9007199254740995', 0)).toSatisfy(
      (v: number) => Number.isNaN(v) || v === 9007199254740996,
    );
  });
});

describe('the reader primer', () => {
  it('reads every rare shape it primes, each as Number() does', () => {
    // Each line must take the byte path (not -1): a line it refused would stop the priming early.
    const bytes = Buffer.from(DECIMAL_PRIMER, 'latin1');
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    const lines = DECIMAL_PRIMER.split('\n').slice(0, -1);
    expect(lines.length).toBeGreaterThanOrEqual(6);
    let p = 0;
    for (const line of lines) {
      const next = readDecimal(bytes, view, p, bytes.length);
      expect(next, line).toBe(p + line.length + 1);
      expect(Object.is(io[2], Number(line)), line).toBe(true);
      p = next;
    }
    expect(() => primeDecimalReader()).not.toThrow();
  });
});
