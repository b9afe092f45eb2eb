/**
 * Number formatting shared by the markdown and text renderers: one fixed number of decimals per
 * review (chosen from the size of the metric), signed deltas, intervals and p-values.
 */
import type { Review } from '../model/review.js';
import type { Interval } from '../stats/types.js';

export interface NumberFormat {
  /** Decimals used for every metric-unit value of the review. */
  decimals: number;
}

/**
 * Decimals that show four significant digits of the review's largest split mean (so that deltas
 * a hundred times smaller still show), between 0 and 6.
 */
export function numberFormatFor(review: Review): NumberFormat {
  let largest = 0;
  for (const change of review.splits) {
    largest = Math.max(largest, Math.abs(change.baseline), Math.abs(change.candidate));
  }
  if (largest === 0 || !Number.isFinite(largest)) return { decimals: 4 };
  const decimals = 3 - Math.floor(Math.log10(largest));
  return { decimals: Math.min(6, Math.max(0, decimals)) };
}

/** A metric value with the review's decimals; `-0.000` prints as `0.000`. */
export function num(value: number, format: NumberFormat): string {
  const text = value.toFixed(format.decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}

/** A signed metric change: `+0.012`, `−0.004` (U+2212 minus), `0.000`. */
export function signed(value: number, format: NumberFormat): string {
  const text = num(Math.abs(value), format);
  if (/^0(\.0+)?$/.test(text)) return text;
  return value > 0 ? `+${text}` : `\u2212${text}`;
}

/** `[−0.004, +0.012]`, or `n/a` when the interval is unknown. */
export function interval(ci: Interval | null, format: NumberFormat): string {
  if (ci === null) return 'n/a';
  return `[${signed(ci[0], format)}, ${signed(ci[1], format)}]`;
}

/** `p = 0.031`, `p < 0.001`, or `p n/a`. */
export function pValue(p: number | null): string {
  if (p === null) return 'p n/a';
  if (p < 0.001) return 'p < 0.001';
  return `p = ${p.toFixed(3)}`;
}

/** A count with thousands separators: `12,400`. */
export function count(n: number): string {
  return Math.round(n)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** A plain number for axis labels and notes: up to 4 significant digits, no exponent below 1e6. */
export function short(value: number): string {
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-4) return value.toExponential(2);
  return String(Number(value.toPrecision(4)));
}

/** A fixed-decimal number for Mermaid data (no exponent, no `-0`). */
export function chartNumber(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}
