/** Readers for training logs (pure: bytes or text in, series out) and the curve built from them. */
export { readCsvLog, splitCsvLine, type CsvLogOptions } from './csv-log.js';
export { readTensorBoard } from './tensorboard.js';
export { readMlflowMetric } from './mlflow.js';
export { readEvalsResult } from './evals-result.js';
export { stepsToEpochs } from './x-axis.js';
export { buildCurve, type CurveOptions, type ImportedCurve } from './curve.js';
export { pickSeries, type Catalogue, type Picked, type PickOptions } from './picker.js';
export { PointBudget } from './text.js';
export * from './limits.js';
export {
  CURVE_LOG_FORMATS,
  pointerOf,
  type Conversion,
  type CurveLogFormat,
  type CurveLogWarning,
  type ReadResult,
  type Series,
  type SeriesPoint,
} from './types.js';
