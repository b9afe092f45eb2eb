/**
 * The one number formatter of the reports. A review has one `NumberFormat`: a proportion metric is
 * written in percent and its changes in percentage points (`8.9%`, `−0.8 pts`); a continuous metric
 * in its own units. Both use the same number of decimals everywhere in the review, chosen so that
 * the largest split mean shows four significant digits. Negative numbers take U+2212 (−) in prose
 * and tables; chart data (Mermaid source) keeps ASCII.
 */
import type { MetricKind } from '../model/run.js';
import type { Review } from '../model/review.js';
import type { Interval } from '../stats/types.js';

export const MINUS = '\u2212';

export interface NumberFormat {
  kind: MetricKind;
  /** Decimals of a metric value in metric units (a proportion shows two fewer, in percent). */
  decimals: number;
}

/** Significant digits of the largest split mean. */
const SIGNIFICANT = 4;
const MAX_DECIMALS = 6;

export function numberFormatFor(review: Pick<Review, 'splits' | 'metric'>): NumberFormat {
  return formatForValues(
    review.metric.kind,
    review.splits.flatMap((s) => [s.baseline, s.candidate]),
  );
}

/** The format of another metric (a guardrail): four significant digits of its largest value. */
export function formatForValues(kind: MetricKind, values: readonly number[]): NumberFormat {
  let largest = 0;
  for (const v of values) largest = Math.max(largest, Math.abs(v));
  const decimals =
    largest === 0 || !Number.isFinite(largest)
      ? SIGNIFICANT
      : Math.min(MAX_DECIMALS, Math.max(0, SIGNIFICANT - 1 - Math.floor(Math.log10(largest))));
  return { kind, decimals };
}

/** Digits of a number in the format's display unit, `-0` shown as `0`, minus as U+2212. */
function digits(v: number, f: NumberFormat): string {
  const proportion = f.kind === 'proportion';
  const text = (proportion ? v * 100 : v).toFixed(
    proportion ? Math.max(0, f.decimals - 2) : f.decimals,
  );
  if (/^-0(\.0+)?$/.test(text)) return text.slice(1);
  return text.replace('-', MINUS);
}

function isZero(text: string): boolean {
  return /^0(\.0+)?$/.test(text);
}

/** A metric value: `9.67%` or `6.050`. */
export function value(v: number, f: NumberFormat): string {
  return f.kind === 'proportion' ? `${digits(v, f)}%` : digits(v, f);
}

/** The unit suffix of a change: ` pts` for a proportion, nothing otherwise. */
function unit(f: NumberFormat): string {
  return f.kind === 'proportion' ? ' pts' : '';
}

/** A signed change without unit: `+1.17`, `−0.330`, `0.00`. */
function signedDigits(v: number, f: NumberFormat): string {
  const text = digits(Math.abs(v), f);
  if (isZero(text)) return text;
  return v > 0 ? `+${text}` : `${MINUS}${text}`;
}

/** A signed change: `+1.17 pts`, `−0.330`. */
export function change(v: number, f: NumberFormat): string {
  return `${signedDigits(v, f)}${unit(f)}`;
}

/** The size of a difference, unsigned: `1.17 pts`, `0.330`. */
export function amount(v: number, f: NumberFormat): string {
  return `${digits(Math.abs(v), f)}${unit(f)}`;
}

/** A difference that is usually positive (a component, a gap): `4.00 pts`, `−0.12 pts`. */
export function difference(v: number, f: NumberFormat): string {
  return `${digits(v, f)}${unit(f)}`;
}

/** The interval of a change: `[+0.82, +1.51] pts`, or `n/a`. */
export function changeInterval(ci: Interval | null, f: NumberFormat): string {
  if (ci === null) return 'n/a';
  return `[${signedDigits(ci[0], f)}, ${signedDigits(ci[1], f)}]${unit(f)}`;
}

/** The interval of a value: `9.90% to 10.20%`. */
export function valueRange(ci: Interval, f: NumberFormat): string {
  return `${value(ci[0], f)} to ${value(ci[1], f)}`;
}

/*
 * Table cells carry no unit; a line above the table says it once (`unitLine`), so that tables
 * stay narrow.
 */

/** The units of a table of values and changes, or null for a continuous metric. */
export function unitLine(f: NumberFormat, values: 'values' | 'differences'): string | null {
  if (f.kind !== 'proportion') return null;
  return values === 'values'
    ? 'Values in percent; Δ and intervals in percentage points.'
    : 'Components, Δ and intervals in percentage points.';
}

/** A metric value in a table cell: `9.67` (percent) or `6.050`. */
export function valueCell(v: number, f: NumberFormat): string {
  return digits(v, f);
}

/** A change in a table cell: `+1.17`. */
export function changeCell(v: number, f: NumberFormat): string {
  return signedDigits(v, f);
}

/** The interval of a change in a table cell: `[+0.82, +1.51]`, or `n/a`. */
export function intervalCell(ci: Interval | null, f: NumberFormat): string {
  if (ci === null) return 'n/a';
  return `[${signedDigits(ci[0], f)}, ${signedDigits(ci[1], f)}]`;
}

/** Below this a p-value is written as a bound. */
const SMALLEST_P = 0.001;

/** A p-value for a table cell: `< 0.001`, `0.031`, `n/a`. */
export function pCell(p: number | null): string {
  if (p === null) return 'n/a';
  return p < SMALLEST_P ? `< ${SMALLEST_P}` : p.toFixed(3);
}

/** A p-value for a sentence: `p < 0.001`, `p = 0.031`, `p n/a`. */
export function pText(p: number | null): string {
  if (p === null) return 'p n/a';
  return p < SMALLEST_P ? `p < ${SMALLEST_P}` : `p = ${p.toFixed(3)}`;
}

/** A count with thousands separators: `12,400`. */
export function count(n: number): string {
  return Math.round(n)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** A plain number (settings, hyperparameters, x values): up to 4 significant digits. */
export function short(v: number): string {
  if (v === 0) return '0';
  const abs = Math.abs(v);
  const text = abs >= 1e6 || abs < 1e-4 ? v.toExponential(2) : String(Number(v.toPrecision(4)));
  return text.replace(/-/g, MINUS);
}

/** A number with fixed decimals (R², percentages that are not metric values): `0.987`. */
export function fixed(v: number, decimals: number): string {
  const text = v.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text.replace('-', MINUS);
}

/** A fixed-decimal number for Mermaid data (ASCII minus, no exponent, no `-0`). */
export function chartNumber(v: number, decimals: number): string {
  const text = v.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text) ? text.slice(1) : text;
}
