/**
 * Correctly rounded decimal → double for the loss column of a predictions file, without a string.
 * The predictions reader uses decimal.wat (the same rules and results in WebAssembly, tested
 * against `readDecimal`); `readDecimal` reads where WebAssembly cannot run and after a line
 * outgrew the reader's buffer.
 *
 * `decodeDecimal` gives the value `(hi · 10^loDigits + lo) · 10^scale` from its digits, equal to
 * what `Number()` gives for the same text, or NaN when this cannot tell (then the caller asks
 * `Number()`):
 *
 * - A digit string whose integer is below 2^53 (up to 15 digits, most of 16) and |scale| ≤ 22: one
 *   division or multiplication of two exact doubles, correctly rounded by IEEE 754 (Clinger 1990,
 *   "How to read floating point numbers accurately", PLDI; the "fast path").
 * - Larger ones, up to 20 digits (shortest round-trip printing gives up to 17): a first quotient
 *   q0 (within a few units of the value), then its residual, computed exactly with Dekker's (1971)
 *   product ("A floating-point technique for extending the available precision", Numer. Math. 18)
 *   and Veltkamp's split; q0 plus the residual, rounded once, is the nearest double. A value whose
 *   rounding changes when the residual moves by 2^-20 of itself (a near-tie) is left to `Number()`.
 */

import { MAX_MAGNITUDE } from '../model/limits.js';

/** 10^0 … 10^22, each exact in a double. */
export const POW10: readonly number[] = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));
const TWO53 = 2 ** 53;
/** 1/10^i, rounded. */
const INV10: readonly number[] = POW10.map((x) => 1 / x);
const SPLIT = 134217729; // 2^27 + 1 (Veltkamp)
/** Veltkamp halves of the powers of ten: 10^i = POW10_HI[i] + POW10_LO[i], 26 bits each. */
const POW10_HI = POW10.map((x) => SPLIT * x - (SPLIT * x - x));
const POW10_LO = POW10.map((x, i) => x - (POW10_HI[i] as number));

/**
 * In and out of `decodeDecimal`: io[0] = hi, io[1] = lo in; io[2] = the value out. (Doubles kept in
 * a typed array rather than passed or returned: a double argument or result is a heap allocation
 * per call when V8 does not inline the call.)
 */
export const io = new Float64Array(3);

/** The value of the last `decimalToDouble` call that returned true. */
export const decoded = io.subarray(2, 3);

/**
 * Sets `decoded[0]` to `(hi · 10^loDigits + lo) · 10^scale`, for integers hi < 2^53 and
 * lo < 10^loDigits, loDigits ≤ 4 and |scale| ≤ 22, and returns true; false when a `Number()` call must decide.
 */
export function decimalToDouble(hi: number, lo: number, loDigits: number, scale: number): boolean {
  io[0] = hi;
  io[1] = lo;
  return decodeDecimal(loDigits, scale);
}

/** `decimalToDouble` with hi and lo in io[0] and io[1]; the value in io[2]. */
export function decodeDecimal(loDigits: number, scale: number): boolean {
  if (scale < -22 || scale > 22 || loDigits > 4) return false;
  const hi = io[0] as number;
  const k = scale < 0 ? -scale : scale;
  const d = POW10[k] as number;
  if (loDigits === 0) {
    // Clinger's fast path: hi and d are exact, one rounding.
    io[2] = scale < 0 ? hi / d : hi * d;
    return true;
  }
  if (hi === 0) return false;
  // Clinger's fast path still holds when hi · 10^loDigits + lo is below 2^53: then it is exact (a
  // rounded product or sum at or above 2^53 stays at or above it, so the test cannot pass wrongly).
  const t = POW10[loDigits] as number;
  const whole = hi * t + (io[1] as number);
  if (whole < TWO53) {
    io[2] = scale < 0 ? whole / d : whole * d;
    return true;
  }
  // m = hi · 10^loDigits + lo = mh + ml exactly (mh = fl(m)); Dekker's product for hi · 10^loDigits.
  const th = POW10_HI[loDigits] as number;
  const tl = POW10_LO[loDigits] as number;
  let x = SPLIT * hi;
  let xh = x - (x - hi);
  let xl = hi - xh;
  const p = hi * t;
  const e = xh * th - p + xh * tl + xl * th + xl * tl + (io[1] as number); // small integers: exact
  const mh = p + e;
  const ml = e - (mh - p);
  const dh = POW10_HI[k] as number;
  const dl = POW10_LO[k] as number;
  let q0: number;
  let r: number;
  let delta: number;
  if (scale >= 0) {
    // m·d − q0 = (mh·d − q0) + ml·d; the first term exactly, the second to 2^-53.
    q0 = mh * d;
    x = SPLIT * mh;
    xh = x - (x - mh);
    xl = mh - xh;
    r = xh * dh - q0 + xh * dl + xl * dh + xl * dl + ml * d;
    delta = r;
  } else {
    // m − q0·d = (mh − pp) − (q0·d − pp) + ml, in units of d; mh − pp is exact (Sterbenz). Any q0
    // within a few units of m/d will do, the residual being exact for it: so products with the
    // rounded 1/d instead of two divisions (shorter dependency chain).
    const inv = INV10[k] as number;
    q0 = mh * inv;
    const pp = q0 * d;
    x = SPLIT * q0;
    xh = x - (x - q0);
    xl = q0 - xh;
    r = mh - pp - (xh * dh - pp + xh * dl + xl * dh + xl * dl) + ml;
    delta = r * inv;
  }
  // The exact value is q0 + delta, up to about 2^-50 units of q0 (delta: the residual in units of
  // the value). Added to q0 and rounded once, it gives the double nearest the value, however far
  // q0 is from it; the same sum with delta moved by 2^-20 of itself either way must round the same,
  // else the value is near a tie: left to Number().
  const value = q0 + delta * (1 + 2 ** -20);
  if (value !== q0 + delta * (1 - 2 ** -20)) return false;
  io[2] = value;
  return true;
}

/** Whether the four bytes of w (little-endian) are all ASCII digits (common practice, "SWAR"). */
function allDigits(w: number): boolean {
  return (w & 0xf0f0f0f0) === 0x30303030 && ((w + 0x06060606) & 0xf0f0f0f0) === 0x30303030;
}

/** The number the four ASCII digits of w spell, the lowest byte being the first digit. */
function fourDigits(w: number): number {
  const d = w - 0x30303030;
  const pairs = (Math.imul(d, 10) + (d >>> 8)) & 0x00ff00ff; // d0·10 + d1, d2·10 + d3
  return (pairs & 0xff) * 100 + (pairs >>> 16);
}

/**
 * Reads a plain decimal (`-?D+(.D+)?([eE][+-]?D+)?`) within ±1e15 followed by `\n` from `buf[from]`
 * (before `end`; `view` reads the same bytes): sets io[2] to its value and returns the index after
 * the newline, or −1 for anything else (then the value is not set). The value is what `Number()`
 * gives for the same text: `decodeDecimal`, or `Number()` itself. Used by the predictions
 * reader's byte path (prediction-lines.ts) and the lockstep loop (lockstep.ts).
 */
export function readDecimal(buf: Buffer, view: DataView, from: number, end: number): number {
  let p = from;
  let c = p < end ? (buf[p] as number) : -1;
  const negative = c === 45;
  if (negative) c = ++p < end ? (buf[p] as number) : -1;
  // The leading significant digits in hi while it stays below 9·10^15 (an exact integer under
  // 2^53: 16 digits unless they start with 9), the next ones (up to 4 are used) in lo.
  let hi = 0;
  let lo = 0;
  let loDigits = 0;
  const intStart = p;
  while (p < end && (c = buf[p] as number) >= 48 && c <= 57) {
    if (hi < 9e14) hi = hi * 10 + (c - 48);
    else {
      lo = lo * 10 + (c - 48);
      loDigits++;
    }
    p++;
  }
  if (p === intStart) return -1;
  let scale = 0;
  if (p < end && c === 46) {
    const fracStart = ++p;
    // Eight digits at a time while they fit in hi (a fraction is most of a loss's digits):
    // hi < 9·10^7 before a block keeps it below 9·10^15, as the digit loop would.
    while (hi < 9e7 && p + 8 <= end) {
      const w0 = view.getUint32(p, true);
      const w1 = view.getUint32(p + 4, true);
      if (!allDigits(w0) || !allDigits(w1)) break;
      hi = hi * 1e8 + fourDigits(w0) * 10000 + fourDigits(w1);
      p += 8;
    }
    while (p < end && (c = buf[p] as number) >= 48 && c <= 57) {
      if (hi < 9e14) hi = hi * 10 + (c - 48);
      else {
        lo = lo * 10 + (c - 48);
        loDigits++;
      }
      p++;
    }
    if (p === fracStart) return -1;
    scale = fracStart - p;
  }
  if (p >= end) return -1;
  if (c === 101 || c === 69) {
    c = ++p < end ? (buf[p] as number) : -1;
    let sign = 1;
    if (c === 43 || c === 45) {
      if (c === 45) sign = -1;
      c = ++p < end ? (buf[p] as number) : -1;
    }
    let e = 0;
    const expStart = p;
    while (p < end && (c = buf[p] as number) >= 48 && c <= 57) {
      if (e < 100000) e = e * 10 + (c - 48);
      p++;
    }
    if (p === expStart || p >= end) return -1;
    scale += sign * e;
  }
  if (c !== 10) return -1;
  let value: number;
  if (loDigits === 0 && scale >= -22 && scale <= 22) {
    // Clinger's fast path (decimal.ts) inline: most losses have at most 16 digits.
    value = scale < 0 ? hi / (POW10[-scale] as number) : hi * (POW10[scale] as number);
    if (negative) value = -value;
  } else {
    io[0] = hi;
    io[1] = lo;
    if (decodeDecimal(loDigits, scale)) {
      value = io[2] as number;
      if (negative) value = -value;
    } else value = Number(buf.toString('latin1', from, p));
  }
  if (!(Math.abs(value) <= MAX_MAGNITUDE)) return -1;
  io[2] = value;
  return p + 1;
}

/**
 * Shapes of a loss that are rare in a file yet turn up in most large ones: an exponent (Python
 * prints a loss below 1e-4 as `2.6e-07`), a sign, no fraction, 16 digits just under 2^53, 17 and
 * more. V8 compiles `readDecimal` with the paths it has run so far, so the first such value threw
 * the compiled reader away and it ran slow until recompiled (issue 14: about 12 ms of 2 × 1M
 * losses, at the first exponent 3.6 MiB into a file). `primeDecimalReader` reads them a few dozen
 * times (V8 keeps no feedback for a function's first few calls), so they are among the paths it
 * compiles. Not the `Number()` fallback: a near-tie is rarer still, and that path would make the
 * compiled reader larger.
 */
export const DECIMAL_PRIMER =
  '2.6e-07\n1E+2\n-3.5e4\n-0.25\n7\n0.12345678901234567891\n0.9001234567890123\n12.5\n';
let primed = false;

/** Runs the rare shapes through `readDecimal` once per process (before a file of losses). */
export function primeDecimalReader(): void {
  if (primed) return;
  primed = true;
  const bytes = Buffer.from(DECIMAL_PRIMER, 'latin1');
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let round = 0; round < 24; round++) {
    for (let p = 0; p >= 0 && p < bytes.length;) p = readDecimal(bytes, view, p, bytes.length);
  }
}
