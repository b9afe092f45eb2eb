/**
 * Turns the series of a training log into a run artifact's curve: picks the training and
 * validation series, converts them into the metric's units, and merges them by x.
 *
 * Repeated x (Lightning logs several steps per epoch; a resumed run logs an epoch twice): with
 * `duplicates: 'average'` (the default) the values of one series at one x are replaced by their
 * mean, points are sorted by x, and a warning says how many x were merged; with `'reject'`, x must
 * strictly increase in the order of the file, as a hand-written curve must. A curve point needs a
 * validation value, so training values at an x without one are left out (counted in a warning).
 * With `exact` (a config mapping), only the named series are taken and their values are kept in
 * the units they were logged in: nothing is looked up, converted or warned about units.
 * The result meets the artifact's rules: finite numbers, x strictly increasing, at least one point.
 */
import { InputError, type Issue } from '../../model/errors.js';
import { formatLimit } from '../../model/limits.js';
import type { CurvePoint } from '../../model/run.js';
import { pickSeries, type Catalogue, type PickOptions } from './picker.js';
import {
  pointerOf,
  type CurveLogWarning,
  type ReadResult,
  type Series,
  type SeriesPoint,
} from './types.js';
import { notFinite } from './text.js';
import { convert, unitsFor } from './units.js';

export interface CurveOptions extends PickOptions {
  duplicates?: 'average' | 'reject';
  /** x and values beyond ± this are refused, with their place in the file. Default: no bound. */
  maxMagnitude?: number;
  /** Points the curve may have (one per x with a validation value). Default: no limit. */
  maxPoints?: number;
}

/**
 * Points of a picked series whose x or value lies beyond ±bound (at most 10), as problems of their
 * place in the file: the readers of binary and JSON logs take any finite number, and the artifact
 * that the curve goes into refuses such numbers (MAX_MAGNITUDE).
 */
function beyond(series: Series, bound: number): Issue[] {
  const issues: Issue[] = [];
  for (const p of series.points) {
    if (issues.length >= 10) break;
    const x = Math.abs(p.x) > bound;
    if (!x && !(Math.abs(p.value) > bound)) continue;
    const what = x ? `x ("${series.x}") of "${series.name}"` : `"${series.name}"`;
    issues.push(
      notFinite(series.file, pointerOf(series.where, p.at), what, String(x ? p.x : p.value), bound),
    );
  }
  return issues;
}

export interface ImportedCurve {
  points: CurvePoint[];
  validation: string;
  train?: string;
  /** `flags`: the caller named the series; `names`: they were picked by name. */
  by: 'flags' | 'names';
  /** What x counts (`epoch`, `step`, `round`, or the CSV column). */
  x: string;
  /** Files the two series came from. */
  files: string[];
  /** Other validation series that could have been picked. */
  alternatives: string[];
  warnings: CurveLogWarning[];
}

/** A series with one value per x, in ascending x. */
interface Collapsed {
  xs: number[];
  values: number[];
}

function collapse(
  series: Series,
  mode: 'average' | 'reject',
  warnings: CurveLogWarning[],
): Collapsed {
  // The usual log: x strictly increasing. Then there is nothing to merge or sort, and a log of a
  // million steps costs no map.
  const points = series.points;
  let increasing = true;
  for (let i = 1; i < points.length && increasing; i++)
    increasing = (points[i] as SeriesPoint).x > (points[i - 1] as SeriesPoint).x;
  if (increasing) {
    const xs = new Array<number>(points.length);
    const values = new Array<number>(points.length);
    for (let i = 0; i < points.length; i++) {
      const x = (points[i] as SeriesPoint).x;
      xs[i] = x === 0 ? 0 : x; // −0 is 0, as a map key would make it
      values[i] = (points[i] as SeriesPoint).value;
    }
    return { xs, values };
  }
  // Running means: no overflow for values near the largest double.
  const means = new Map<number, { mean: number; n: number }>();
  let previous: SeriesPoint | undefined;
  for (const p of points) {
    if (mode === 'reject' && previous !== undefined && !(p.x > previous.x)) {
      const x = series.where.kind === 'line' ? `column "${series.x}"` : `"${series.x}"`;
      throw new InputError([
        {
          file: series.file,
          pointer: pointerOf(series.where, p.at),
          expected: `${x} must strictly increase (previous ${previous.x} at ${pointerOf(series.where, previous.at)})`,
          got: String(p.x),
          hint:
            p.x === previous.x
              ? 'Keep one value per x: drop the repeated ones (a resumed run logs some twice).'
              : 'Sort the rows by x, or cut the log where x starts again.',
        },
      ]);
    }
    previous = p;
    const entry = means.get(p.x);
    if (entry === undefined) means.set(p.x, { mean: p.value, n: 1 });
    else {
      entry.n++;
      entry.mean += p.value / entry.n - entry.mean / entry.n;
    }
  }
  let merged = 0;
  for (const { n } of means.values()) if (n > 1) merged++;
  if (merged > 0) warnings.push({ code: 'duplicates-averaged', series: series.name, xs: merged });
  const xs = [...means.keys()].sort((a, b) => a - b);
  return { xs, values: xs.map((x) => (means.get(x) as { mean: number }).mean) };
}

export function buildCurve(
  read: ReadResult,
  catalogue: Catalogue,
  options: CurveOptions = {},
): ImportedCurve {
  const picked = pickSeries(read.series, options, catalogue);
  const warnings: CurveLogWarning[] = [...read.warnings, ...picked.warnings];
  const mode = options.duplicates ?? 'average';
  const { validation, train } = picked;
  const units: ReturnType<typeof unitsFor> =
    options.exact === true ? {} : unitsFor(picked.base, validation.name, options.metric);
  if (units.warning !== undefined) warnings.push(units.warning);
  const conversion = units.conversion;
  const toMetric = (v: number): number => {
    if (conversion === undefined) return v;
    const converted = convert(conversion, v);
    if (!Number.isFinite(converted))
      throw new InputError([
        {
          file: validation.file,
          pointer: '',
          expected: `must have values that stay finite in the metric's units (${conversion})`,
          got: String(v),
        },
      ]);
    return converted;
  };

  // Bad cells of either series, reported together (at most 10 each were kept).
  const problems = [
    ...validation.problems,
    ...(train === undefined || train === validation ? [] : train.problems),
  ];
  if (options.maxMagnitude !== undefined) {
    problems.push(...beyond(validation, options.maxMagnitude));
    if (train !== undefined && train !== validation)
      problems.push(...beyond(train, options.maxMagnitude));
  }
  if (problems.length > 0) throw new InputError(problems);
  const validationByX = collapse(validation, mode, warnings);
  const size = validationByX.xs.length;
  if (options.maxPoints !== undefined && size > options.maxPoints) {
    throw new InputError([
      {
        file: validation.file,
        pointer: '',
        expected: `must give a curve of at most ${options.maxPoints} points (one per x with a value of "${validation.name}")`,
        got: `${size} points`,
        hint: 'Log less often, or keep every n-th row or step before importing.',
      },
    ]);
  }
  const trainByX = train === undefined ? undefined : collapse(train, mode, warnings);
  if (size === 0) {
    throw new InputError([
      {
        file: validation.file,
        pointer: '',
        expected: `must have at least one value of "${validation.name}"`,
        hint: 'Check that the run got as far as a validation pass, or name another series.',
      },
    ]);
  }
  // Both series are in ascending x: merge them in one walk. A train value at an x without a
  // validation value is dropped (counted); a validation x without a train value has none.
  let missing = 0;
  let dropped = 0;
  let t = 0;
  const points = new Array<CurvePoint>(size);
  for (let i = 0; i < size; i++) {
    const x = validationByX.xs[i] as number;
    const point: CurvePoint = { x, validation: toMetric(validationByX.values[i] as number) };
    if (trainByX !== undefined) {
      while (t < trainByX.xs.length && (trainByX.xs[t] as number) < x) {
        t++;
        dropped++;
      }
      if (t < trainByX.xs.length && trainByX.xs[t] === x)
        point.train = toMetric(trainByX.values[t++] as number);
      else missing++;
    }
    points[i] = point;
  }
  if (trainByX !== undefined) dropped += trainByX.xs.length - t;
  const bound = options.maxMagnitude;
  const over =
    bound === undefined || conversion === undefined
      ? undefined
      : points.find((p) => Math.abs(p.validation) > bound || Math.abs(p.train ?? 0) > bound);
  if (over !== undefined && bound !== undefined) {
    throw new InputError([
      {
        file: validation.file,
        pointer: '',
        expected: `must stay within ±${formatLimit(bound)} in the metric's units (${conversion ?? ''})`,
        got: `a value beyond it at x = ${over.x}`,
        hint: 'Rescale the values, or import the series without --metric.',
      },
    ]);
  }
  if (train !== undefined && trainByX !== undefined) {
    if (missing > 0) warnings.push({ code: 'train-missing', series: train.name, points: missing });
    if (dropped > 0)
      warnings.push({ code: 'train-only-dropped', series: train.name, points: dropped });
  }
  const files = [...new Set([validation.file, ...(train === undefined ? [] : [train.file])])];
  return {
    points,
    validation: validation.name,
    ...(train === undefined ? {} : { train: train.name }),
    by: picked.by,
    x: validation.x,
    files,
    alternatives: picked.alternatives,
    warnings,
  };
}
