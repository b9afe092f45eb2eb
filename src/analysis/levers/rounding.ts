/**
 * Values a person would type for a suggested hyperparameter: two significant digits (`0.032`, not
 * `0.0316228`), integers for counts and depths, a sweep's own grid value when the suggestion lands
 * on it, and never outside the range the evidence supports. Midpoints are geometric on log-scale
 * knobs (regularization strengths, learning rates) and arithmetic on counts. Pure.
 *
 * The rule (`roundSuggestion`): clamp into the range; return the value with the fewest significant
 * digits d ≥ 2 that lies in the range and is nearest to it (d = 2 whenever the range holds such a
 * value); then, if a grid value in the range rounds to the same two digits, return that grid value
 * itself. Integer knobs choose among integers only. Rounding twice changes nothing.
 */
import type { KnobScale, KnobSpec } from '../../model/hyperparameter-roles.js';

/** Significant digits of a suggestion (common practice: what a person types into a config). */
export const SUGGESTION_DIGITS = 2;
const MAX_DIGITS = 17;

export interface RoundingOptions {
  /** Choose among integers only (counts, depths, integer-valued knobs). @default false */
  integer?: boolean;
  /** Inclusive range the evidence supports, in either order. */
  range?: readonly [number, number];
  /** The sweep's x values: a suggestion that rounds like one of them becomes that value. */
  grid?: readonly number[];
}

/** `x` to `digits` significant digits, as the nearest double to that decimal. */
export function toSignificant(x: number, digits: number): number {
  if (x === 0 || !Number.isFinite(x)) return x;
  return Number(x.toPrecision(digits));
}

/** Fewest significant digits that write `x` exactly (as a double): 0.032 → 2, 3.162 → 4. */
export function significantDigits(x: number): number {
  if (x === 0 || !Number.isFinite(x)) return 1;
  for (let d = 1; d < MAX_DIGITS; d++) if (toSignificant(x, d) === x) return d;
  return MAX_DIGITS;
}

/** Decimal exponent of |v| > 0: 10^E ≤ |v| < 10^(E+1), robust to log10's last-bit error. */
function decade(v: number): number {
  const a = Math.abs(v);
  let e = Math.floor(Math.log10(a));
  if (scaled(1, e) > a) e -= 1;
  else if (scaled(1, e + 1) <= a) e += 1;
  return e;
}

/**
 * k·10^e as the double nearest to that decimal (no 0.30000000000000004): parsing the decimal is
 * correctly rounded at every exponent, where k / 10^−e is only for |e| ≤ 22.
 */
function scaled(k: number, e: number): number {
  return Number(`${k}e${e}`);
}

/**
 * Smallest number ≥ v (`up`) or largest ≤ v (`!up`) with at most `digits` significant digits
 * (and integer when asked).
 */
function outward(v: number, digits: number, integer: boolean, up: boolean): number {
  if (v === 0) return 0;
  if (v < 0) return -outward(-v, digits, integer, !up);
  const e = integer ? Math.max(decade(v) - digits + 1, 0) : decade(v) - digits + 1;
  let q = v / scaled(1, e);
  const near = Math.round(q);
  if (Math.abs(q - near) <= 1e-9 * Math.max(1, q)) q = near;
  let k = up ? Math.ceil(q) : Math.floor(q);
  let r = scaled(k, e);
  // The decimal k·10^e can still fall a last bit on the wrong side of v: take the next one.
  if (up ? r < v : r > v) {
    k += up ? 1 : -1;
    r = scaled(k, e);
  }
  return r;
}

/** The number with at most `digits` significant digits nearest to x (integer when asked). */
function nearest(x: number, digits: number, integer: boolean): number {
  if (!integer) return toSignificant(x, digits);
  return Math.abs(x) < 10 ** digits ? Math.round(x) : toSignificant(x, digits);
}

function inside(v: number, lo: number, hi: number): boolean {
  return v >= lo && v <= hi;
}

/** Nearest value to x in [lo, hi] with the fewest digits ≥ 2; null when there is none (integers). */
function fewestDigits(x: number, lo: number, hi: number, integer: boolean): number | null {
  for (let d = SUGGESTION_DIGITS; d <= MAX_DIGITS; d++) {
    const r = nearest(x, d, integer);
    if (inside(r, lo, hi)) return r;
    const edge = r < lo ? outward(lo, d, integer, true) : outward(hi, d, integer, false);
    if (inside(edge, lo, hi)) return edge;
  }
  return null;
}

/**
 * The strength a regularization sweep suggests, as a person would type it: `x` (the sweep's
 * minimum) rounded within the swept grid, or, for a minimum at an end of the sweep (`grid` null),
 * the step beyond it rounded freely.
 */
export function sweepSuggestion(x: number, grid: readonly number[] | null): number {
  const finite = grid?.filter((v) => Number.isFinite(v)) ?? [];
  if (finite.length === 0) return roundSuggestion(x);
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of finite) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return roundSuggestion(x, { grid: finite, range: [lo, hi] });
}

/**
 * A value a person would type near `x`: see the module comment. When an integer knob's range holds
 * no integer, the nearest integer to the clamped value (outside the range) is returned.
 * @example roundSuggestion(333.333333, { integer: true }) // 330
 * @example roundSuggestion(3.162, { integer: true }) // 3
 * @example roundSuggestion(0.197, { grid: [0.01, 0.03, 0.1, 0.3, 1] }) // 0.2
 * @example roundSuggestion(0.0166, { grid: [0.0055, 0.0165, 0.05] }) // 0.0165
 */
export function roundSuggestion(x: number, options: RoundingOptions = {}): number {
  if (!Number.isFinite(x)) throw new RangeError(`cannot round ${String(x)}: not a finite number`);
  const integer = options.integer ?? false;
  const [a, b] = options.range ?? [-Infinity, Infinity];
  if (Number.isNaN(a) || Number.isNaN(b))
    throw new RangeError('cannot round into a range with NaN');
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const x0 = Math.min(hi, Math.max(lo, x));
  const grid = (options.grid ?? []).filter(
    (g) => Number.isFinite(g) && inside(g, lo, hi) && (!integer || Number.isInteger(g)),
  );
  if (grid.includes(x0)) return x0;
  const v = fewestDigits(x0, lo, hi, integer) ?? Math.round(x0);
  const key = toSignificant(v, SUGGESTION_DIGITS);
  let snapped: number | null = null;
  for (const g of grid)
    if (
      toSignificant(g, SUGGESTION_DIGITS) === key &&
      (snapped === null || Math.abs(g - x0) < Math.abs(snapped - x0))
    )
      snapped = g;
  return snapped ?? v;
}

/** Geometric midpoint on a log scale when both ends are positive, arithmetic otherwise. */
export function midpoint(a: number, b: number, scale: KnobScale): number {
  if (scale === 'log' && a > 0 && b > 0) return Math.sqrt(a) * Math.sqrt(b);
  return a / 2 + b / 2;
}

/**
 * A rounded value strictly between `a` and `b`, near their midpoint on the knob's scale; null when
 * none is worth typing (the integers 3 and 4 have nothing between them).
 */
export function between(
  a: number,
  b: number,
  options: { scale: KnobScale; integer: boolean; grid?: readonly number[] },
): number | null {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  // The open interval (lo, hi), so 1 → 1.05 gives 1.02 rather than 1.0 (an end).
  const inset = (hi - lo) * 1e-9;
  if (!(inset > 0)) return null;
  const v = roundSuggestion(midpoint(lo, hi, options.scale), {
    integer: options.integer,
    range: [lo + inset, hi - inset],
    ...(options.grid === undefined ? {} : { grid: options.grid }),
  });
  return v > lo && v < hi ? v : null;
}

/**
 * Whether suggestions for this knob are integers, given the values the evidence holds: counts and
 * layer sizes always; a count-or-fraction knob (scikit-learn's `min_samples_leaf`) when every
 * value is at least 1; real-valued knobs never.
 */
export function isIntegerKnob(spec: Pick<KnobSpec, 'domain'>, values: readonly number[]): boolean {
  switch (spec.domain) {
    case 'count':
    case 'units':
      return true;
    case 'count-or-fraction':
      return values.every((v) => v >= 1);
    default:
      return false;
  }
}
