/**
 * One metric file of MLflow's file store, `mlruns/<experiment>/<run>/metrics/<key>`: one line per
 * logged value, `timestamp value step` (timestamp in milliseconds; files from before MLflow logged
 * steps have `timestamp value`, read as step 0 as MLflow's own file store does — from memory of
 * mlflow/store/tracking/file_store.py). x is the step. Pure: text in, one series out; the metric
 * key (the path under `metrics/`, which may hold slashes) comes from the caller.
 */
import { InputError, quote } from '../../model/errors.js';
import { PointBudget, decodeText, notFinite, parseDecimal } from './text.js';
import type { ReadResult, Series } from './types.js';

export interface MlflowOptions {
  budget?: PointBudget;
}

const INTEGER = /^[+-]?\d+$/;

export function readMlflowMetric(
  input: Uint8Array | string,
  file: string,
  key: string,
  options: MlflowOptions = {},
): ReadResult {
  const text = decodeText(input, file, 'an MLflow metric file');
  const budget = options.budget ?? new PointBudget();
  const series: Series = {
    name: key,
    file,
    x: 'step',
    where: { kind: 'line' },
    points: [],
    problems: [],
  };
  const lines = text.split(/\r?\n/);
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i] ?? '';
    if (raw.trim() === '') continue;
    const line = i + 1;
    const fields = raw.trim().split(/\s+/);
    const [timestamp, valueText, stepText = '0'] = fields;
    if (
      fields.length < 2 ||
      fields.length > 3 ||
      !INTEGER.test(timestamp ?? '') ||
      !INTEGER.test(stepText)
    ) {
      throw new InputError([
        {
          file,
          pointer: `line ${line}`,
          expected: 'must be "timestamp value step" (whole-number timestamp and step)',
          got: quote(raw),
          hint: 'Name a metric file under mlruns/<experiment>/<run>/metrics/.',
        },
      ]);
    }
    const value = parseDecimal(valueText ?? '');
    if (value === undefined || !Number.isFinite(value)) {
      if (series.problems.length < 10)
        series.problems.push(notFinite(file, `line ${line}`, `metric "${key}"`, valueText ?? ''));
      continue;
    }
    budget.take(file, series.where, line);
    series.points.push({ x: Number(stepText), value, at: line });
  }
  return { series: [series], warnings: [] };
}
