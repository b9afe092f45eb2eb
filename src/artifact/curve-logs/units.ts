/**
 * Metric families and the conversions between them, so a curve lands in the run's metric units.
 * Names are the ones Keras, scikit-learn, XGBoost, LightGBM and CatBoost log (common practice).
 * Conversions: accuracy = 1 − error rate (and back); RMSE = √MSE (LightGBM's `l2` is the MSE).
 * A loss is not converted: it says how training went, not how the metric moved.
 */
import type { Conversion, CurveLogWarning } from './types.js';

export type Family =
  'accuracy' | 'error' | 'loss' | 'logloss' | 'rmse' | 'mse' | 'mae' | 'auc' | 'r2';

const FAMILY = new Map<string, Family>();
const add = (family: Family, names: string[]) => names.forEach((n) => FAMILY.set(n, family));
add('accuracy', [
  'accuracy',
  'acc',
  'binary_accuracy',
  'categorical_accuracy',
  'sparse_categorical_accuracy',
  'top1_accuracy',
]);
add('error', [
  'error',
  'err',
  'error_rate',
  'binary_error',
  'multi_error',
  'merror',
  'misclassification_rate',
  'zero_one_loss',
]);
add('loss', ['loss', 'total_loss', 'objective']);
add('logloss', [
  'logloss',
  'log_loss',
  'binary_logloss',
  'multi_logloss',
  'mlogloss',
  'cross_entropy',
  'crossentropy',
  'binary_crossentropy',
  'categorical_crossentropy',
  'sparse_categorical_crossentropy',
  'nll',
  'multiclass',
]);
add('rmse', ['rmse', 'root_mean_squared_error']);
add('mse', ['mse', 'l2', 'mean_squared_error']);
add('mae', ['mae', 'l1', 'mean_absolute_error']);
add('auc', ['auc', 'roc_auc', 'auroc']);
add('r2', ['r2', 'r2_score', 'r_squared']);

/** `val accuracy` → `val_accuracy`: lower-case words joined by `_`. */
export function normalizeMetricName(name: string): string {
  return name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '');
}

export function familyOf(name: string): Family | undefined {
  const leaf = name.slice(name.lastIndexOf('/') + 1);
  return FAMILY.get(normalizeMetricName(leaf));
}

export function isLoss(family: Family | undefined): boolean {
  return family === 'loss' || family === 'logloss';
}

const CONVERSIONS = new Map<string, Conversion>([
  ['accuracy>error', 'one-minus'],
  ['error>accuracy', 'one-minus'],
  ['mse>rmse', 'sqrt'],
  ['rmse>mse', 'square'],
]);

export function convert(conversion: Conversion, value: number): number {
  if (conversion === 'one-minus') return 1 - value;
  if (conversion === 'sqrt') return Math.sqrt(value);
  return value * value;
}

/** How well a measured quantity (`base`) matches the metric: 0 same, 1 family, 2 convertible. */
export function matchScore(base: string, metric: string): number | undefined {
  const b = normalizeMetricName(base.slice(base.lastIndexOf('/') + 1));
  const m = normalizeMetricName(metric);
  if (b === m) return 0;
  const bf = familyOf(b);
  const mf = familyOf(m);
  if (bf === undefined || mf === undefined) return undefined;
  if (bf === mf) return 1;
  return CONVERSIONS.has(`${bf}>${mf}`) ? 2 : undefined;
}

/** The conversion into the metric's units and the warning to give for a picked series. */
export function unitsFor(
  base: string,
  series: string,
  metric: string | undefined,
): { conversion?: Conversion; warning?: CurveLogWarning } {
  const bf = familyOf(base);
  if (metric === undefined) {
    return {
      warning: isLoss(bf)
        ? { code: 'loss-not-metric', series }
        : { code: 'units-unchecked', series },
    };
  }
  const score = matchScore(base, metric);
  if (score === 0 || score === 1) return {};
  const mf = familyOf(metric);
  const conversion =
    bf !== undefined && mf !== undefined ? CONVERSIONS.get(`${bf}>${mf}`) : undefined;
  if (conversion !== undefined)
    return { conversion, warning: { code: 'converted', series, metric, conversion } };
  if (isLoss(bf)) return { warning: { code: 'loss-not-metric', series, metric } };
  return { warning: { code: 'units-unchecked', series, metric } };
}
