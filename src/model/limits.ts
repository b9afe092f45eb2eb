/**
 * Limits on the content of an input, so that no file can make fitgap overflow, recurse without end
 * or work for minutes. Byte limits of the files themselves live with the file opening
 * (`io/open-untrusted.ts`). Each limit says why it has its value; SECURITY.md lists them all.
 */

/**
 * Largest magnitude of any number in a run artifact, a CSV or a setting. Values up to 1e15 keep
 * integer precision (2^53 ≈ 9.0e15) and their squares, sums of squares over millions of rows and
 * products of two variances stay far from the double range (1.8e308); ±1.7e308 would overflow the
 * first difference. Rescale a metric whose values are larger (report thousands, not units).
 */
export const MAX_MAGNITUDE = 1e15;

/**
 * Most points in one curve. The curve analysis (power-law fit, early stopping) takes about three
 * seconds at 10,000 points on one core, and a chart shows at most about a hundred: log a curve at
 * most once per 1/10,000 of its range, or thin it before writing the artifact.
 */
export const MAX_CURVE_POINTS = 10_000;

/**
 * Deepest nesting of arrays and objects in a JSON document. A run artifact nests five levels; free
 * hyperparameter values may nest a few more. Deeper documents are refused before any recursive
 * walk could exhaust the stack.
 */
export const MAX_JSON_DEPTH = 64;

/** `1e15`, `0.000001`: a limit as a person would write it. */
export function formatLimit(value: number): string {
  if (value !== 0 && (Math.abs(value) >= 1e6 || Math.abs(value) < 1e-6))
    return value.toExponential().replace('e+', 'e');
  return String(value);
}
