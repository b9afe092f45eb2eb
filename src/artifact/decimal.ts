/**
 * Correctly rounded decimal → double for the loss column of a predictions file, without a string:
 * the value `(hi · 10^loDigits + lo) · 10^scale` from its digits, equal to what `Number()` gives
 * for the same text, or NaN when this cannot tell (then the caller asks `Number()`).
 *
 * - A digit string whose integer is below 2^53 (up to 15 digits, most of 16) and |scale| ≤ 22: one
 *   division or multiplication of two exact doubles, correctly rounded by IEEE 754 (Clinger 1990,
 *   "How to read floating point numbers accurately", PLDI; the "fast path").
 * - Larger ones, up to 20 digits (shortest round-trip printing gives up to 17): the first rounded
 *   quotient q0, then its residual, computed exactly with Dekker's (1971) product ("A
 *   floating-point technique for extending the available precision", Numer. Math. 18) and
 *   Veltkamp's split, decides between q0 and its neighbour. A residual within 2^-20 of a halfway
 *   point (a near-tie) is left to `Number()`.
 */

/** 10^0 … 10^22, each exact in a double. */
export const POW10: readonly number[] = Array.from({ length: 23 }, (_, i) => Number(`1e${i}`));
const TWO53 = 2 ** 53;
const SPLIT = 134217729; // 2^27 + 1 (Veltkamp)
/** Veltkamp halves of the powers of ten: 10^i = POW10_HI[i] + POW10_LO[i], 26 bits each. */
const POW10_HI = POW10.map((x) => SPLIT * x - (SPLIT * x - x));
const POW10_LO = POW10.map((x, i) => x - (POW10_HI[i] as number));
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
/** Index of the high word of a double in `u32` (little- or big-endian hosts). */
const HI = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;
const LO = 1 - HI;

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
  let unit: number;
  if (scale >= 0) {
    // m·d − q0 = (mh·d − q0) + ml·d; the first term exactly, the second to 2^-53.
    q0 = mh * d;
    x = SPLIT * mh;
    xh = x - (x - mh);
    xl = mh - xh;
    r = xh * dh - q0 + xh * dl + xl * dh + xl * dl + ml * d;
    unit = 1;
  } else {
    // m − q0·d = (mh − pp) − (q0·d − pp) + ml, in units of d; mh − pp is exact (Sterbenz).
    q0 = mh / d;
    const pp = q0 * d;
    x = SPLIT * q0;
    xh = x - (x - q0);
    xl = q0 - xh;
    r = mh - pp - (xh * dh - pp + xh * dl + xl * dh + xl * dl) + ml;
    unit = d;
  }
  // The exact value is q0 + r/unit: q0 or its neighbour c (towards r), unless within 2^-20 of the
  // halfway point between them.
  if (r === 0) {
    io[2] = q0;
    return true;
  }
  f64[0] = q0;
  let lo = (u32[LO] as number) + (r > 0 ? 1 : -1);
  let hiWord = u32[HI] as number;
  if (lo > 0xffffffff) {
    lo = 0;
    hiWord++;
  } else if (lo < 0) {
    lo = 0xffffffff;
    hiWord--;
  }
  u32[LO] = lo;
  u32[HI] = hiWord;
  const c = f64[0] as number;
  const half = (Math.abs(c - q0) * unit) / 2;
  const a = Math.abs(r);
  const margin = half * 2 ** -20;
  if (a < half - margin) io[2] = q0;
  else if (a > half + margin && a < 2 * half * 1.2) io[2] = c;
  else return false;
  return true;
}
