/**
 * What the training-log readers produce: named series of (x, value) points, plus the problems and
 * warnings they met, all as data. Sentences about them are written in `report/`.
 */
import type { Issue } from '../../model/errors.js';

export type CurveLogFormat = 'csv-log' | 'tensorboard' | 'mlflow' | 'evals-result';
export const CURVE_LOG_FORMATS: readonly CurveLogFormat[] = [
  'csv-log',
  'tensorboard',
  'mlflow',
  'evals-result',
];

export interface SeriesPoint {
  x: number;
  value: number;
  /** Where the value sits in its file: line, record or array index, as `Series.where` says. */
  at: number;
}

/** How to name a point's place in its file: `line N`, `record N` or a JSON pointer ending in N. */
export type Where = { kind: 'line' } | { kind: 'record' } | { kind: 'json'; path: string };

/** One logged quantity (a CSV column, a TensorBoard tag, an MLflow metric key, an eval set's metric). */
export interface Series {
  /** As the log names it; for TensorBoard and MLflow prefixed with the run folder when there are several. */
  name: string;
  /** File it was read from, as the user would name it. */
  file: string;
  /** What x counts, as the log names it: a CSV column such as `epoch`, or `step`, or `round`. */
  x: string;
  where: Where;
  /** Finite points in the order the log holds them; x may repeat or go back (merged later). */
  points: SeriesPoint[];
  /**
   * Cells or records of this series that are not finite numbers (at most 10 kept). They matter only
   * when the series is used, so garbage in a column nobody picked does not stop an import.
   */
  problems: Issue[];
}

/** Something the user should know about an import; not an error. Codes are stable. */
export type CurveLogWarning =
  /** The picked series holds a loss, not the run's metric (`metric` absent: the metric was not given). */
  | { code: 'loss-not-metric'; series: string; metric?: string }
  /** The metric was not given (or its family is unknown), so the units could not be checked. */
  | { code: 'units-unchecked'; series: string; metric?: string }
  /** Values were converted into the metric's units. */
  | { code: 'converted'; series: string; metric: string; conversion: Conversion }
  /** Several values of one series shared an x and were replaced by their mean. */
  | { code: 'duplicates-averaged'; series: string; xs: number }
  /** No training series partners the validation series; points carry validation only. */
  | { code: 'no-train-series'; validation: string }
  /** The training series has no value at some x of the validation series. */
  | { code: 'train-missing'; series: string; points: number }
  /** Training values at an x with no validation value were left out (a curve point needs one). */
  | { code: 'train-only-dropped'; series: string; points: number }
  /** An event file ends inside a record (it was still being written); the partial record is ignored. */
  | { code: 'truncated-record'; file: string; offset: number }
  /** Tensor summaries that are not numeric scalars (histograms, text, images) were skipped. */
  | { code: 'non-scalar-skipped'; file: string; count: number }
  /** Eval sets named only by position (`validation_0`, `validation_1`): the first is taken as train. */
  | { code: 'eval-sets-guessed'; train: string; validation: string };

export type Conversion = 'one-minus' | 'sqrt' | 'square';

/** What a reader returns for one file. */
export interface ReadResult {
  series: Series[];
  warnings: CurveLogWarning[];
}

/** `line 7`, `record 3`, `/valid_0/auc/4`: a point's place, for messages. */
export function pointerOf(where: Where, at: number): string {
  if (where.kind === 'json') return `${where.path}/${at}`;
  return `${where.kind} ${at}`;
}
