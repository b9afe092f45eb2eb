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
 * Most points in an epoch curve (`curves.epochs`, an epoch log, `fitgap curves import`). A loss
 * logged once per training step gives curves of a million points; their analysis is linear (the
 * early-stopping criteria in one pass, the chart by LTTB to about a hundred points) and costs about
 * half of reading and parsing the file. The limit bounds the work and the memory of one artifact
 * (a million points are about 50 MB of JSON and 60 MB of parsed objects; such a file also needs
 * a raised artifact byte limit, `--max-artifact-mb`). Log at most once per step, or thin longer
 * curves before writing the artifact.
 */
export const MAX_EPOCH_POINTS = 1_000_000;

/**
 * Most points in a learning curve (`curves.training_examples`) or a regularization sweep
 * (`curves.regularization`). The learning curve's analysis is far heavier per point than the epoch
 * curve's: a power law fitted by Levenberg–Marquardt from several starting values, with intervals
 * for its projections, over every point (about a second at 10,000 points, some hundred times the
 * cost per point of an epoch curve). Both curves take one training run per point, so real ones have
 * tens of points; 10,000 is generous and keeps a review within seconds.
 */
export const MAX_CURVE_POINTS = 10_000;

/** The point limit of a curve by its name. */
export function maxCurvePoints(name: 'epochs' | 'training_examples' | 'regularization'): number {
  return name === 'epochs' ? MAX_EPOCH_POINTS : MAX_CURVE_POINTS;
}

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
