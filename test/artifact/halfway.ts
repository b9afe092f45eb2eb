/** Test helper: the decimal expansion of the midpoint between a double and the next one. */

/** Exact decimal digits and exponent of the point halfway between x > 0 and the next double. */
export function halfway(x: number): { digits: string; exp10: number } {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const biased = Number((bits >> 52n) & 0x7ffn);
  const mant = (bits & ((1n << 52n) - 1n)) | (1n << 52n);
  const exp = biased - 1075; // x = mant · 2^exp
  const odd = 2n * mant + 1n; // halfway = odd · 2^(exp − 1)
  const e = exp - 1;
  if (e >= 0) return { digits: (odd << BigInt(e)).toString(), exp10: 0 };
  const k = -e;
  return { digits: (odd * 5n ** BigInt(k)).toString(), exp10: -k };
}

/**
 * The midpoint after x cut to its first n digits and moved by `nudge` units in the last one: the
 * n digits (no leading zero) and the power of ten they are scaled by; null when the cut has fewer
 * than n digits. Such values lie on either side of a tie, near it.
 */
export function nearHalfway(
  x: number,
  n: number,
  nudge: number,
): { text: string; scale: number } | null {
  const { digits, exp10 } = halfway(x);
  let cut = BigInt(digits.slice(0, n)) + BigInt(nudge);
  if (cut <= 0n) cut = 1n;
  const text = cut.toString();
  return text.length === n ? { text, scale: exp10 + digits.length - n } : null;
}
