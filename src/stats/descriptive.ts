/**
 * Descriptive statistics. These report "not enough data" as NaN (mean of nothing, variance of fewer
 * than two values), as documented on each; the tests built on them throw instead.
 */
import { assertFinite, assertFiniteValues } from './validate.js';

/**
 * Arithmetic mean. Computed around the first value (x₀ + Σ(x − x₀)/n), so a constant input returns
 * that constant exactly. NaN for an empty array; RangeError for a non-finite value.
 */
export function mean(values: readonly number[]): number {
  assertFiniteValues('values', values);
  const n = values.length;
  if (n === 0) return NaN;
  const shift = values[0] as number;
  let sum = 0;
  for (const v of values) sum += v - shift;
  return shift + sum / n;
}

/**
 * Sample variance with the n − 1 denominator (corrected two-pass algorithm: Σd² − (Σd)²/n over
 * d = x − mean). Exactly 0 for a constant input; NaN for fewer than two values.
 */
export function sampleVariance(values: readonly number[]): number {
  const n = values.length;
  if (n < 2) {
    assertFiniteValues('values', values);
    return NaN;
  }
  const m = mean(values);
  let sum = 0;
  let sumSquares = 0;
  for (const v of values) {
    const d = v - m;
    sum += d;
    sumSquares += d * d;
  }
  return Math.max(0, (sumSquares - (sum * sum) / n) / (n - 1));
}

/**
 * Welford running mean/variance for streaming (a million rows must not need a million objects).
 * `mean` is NaN before the first value and `variance` (sample, n − 1) is NaN before the second.
 * A constant stream keeps mean equal to the constant and variance exactly 0. Structurally it is the
 * `{ n, mean, variance }` summary that `pairedT` takes.
 */
export class RunningStats {
  #n = 0;
  #mean = 0;
  #m2 = 0;

  /** Add one value; RangeError for NaN or ±Infinity (one would poison every later result). */
  push(x: number): void {
    assertFinite('RunningStats value', x);
    this.#n += 1;
    const delta = x - this.#mean;
    this.#mean += delta / this.#n;
    this.#m2 += delta * (x - this.#mean);
  }

  /**
   * `push` of `values[0]` … `values[count − 1]` in order, the same arithmetic in one loop (a
   * million values from a predictions file: no call per value).
   */
  pushAll(values: Float64Array, count: number): void {
    let n = this.#n;
    let mean = this.#mean;
    let m2 = this.#m2;
    try {
      for (let i = 0; i < count; i++) {
        const x = values[i] as number;
        if (x - x !== 0) assertFinite('RunningStats value', x);
        n += 1;
        const delta = x - mean;
        mean += delta / n;
        m2 += delta * (x - mean);
      }
    } finally {
      this.#n = n;
      this.#mean = mean;
      this.#m2 = m2;
    }
  }

  get n(): number {
    return this.#n;
  }

  get mean(): number {
    return this.#n === 0 ? NaN : this.#mean;
  }

  get variance(): number {
    return this.#n < 2 ? NaN : Math.max(0, this.#m2 / (this.#n - 1));
  }
}
