/**
 * Gradient-boosting `evals_result` JSON, as XGBoost (`evals_result()`, the `evals_result=` dict of
 * `xgboost.train`) and LightGBM (`evals_result_`, `record_evaluation`) hold it and `json.dump`
 * writes it: `{"<eval set>": {"<metric>": [value per boosting round]}}`, eval sets such as
 * `train`, `eval`, `validation_0`, `training`, `valid_0`. One series per eval set and metric,
 * named `<eval set>/<metric>`; x is the boosting round, counted from 1. Pure: text in, series out.
 */
import { InputError, quote } from '../../model/errors.js';
import { parseJson } from '../read-json.js';
import { MAX_SERIES } from './limits.js';
import { PointBudget, decodeText } from './text.js';
import type { ReadResult, Series } from './types.js';

export interface EvalsResultOptions {
  budget?: PointBudget;
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function escapePointer(segment: string): string {
  return segment.replace(/~/g, '~0').replace(/\//g, '~1');
}

export function readEvalsResult(
  input: Uint8Array | string,
  file: string,
  options: EvalsResultOptions = {},
): ReadResult {
  const text = decodeText(input, file, 'an evals_result JSON file');
  const budget = options.budget ?? new PointBudget();
  let doc: unknown;
  try {
    doc = parseJson(text, file);
  } catch (error) {
    // Python's json.dump writes NaN and Infinity, which JSON does not allow.
    const nan = /[:[,]\s*-?(?:NaN|Infinity)\b/.exec(text);
    if (!(error instanceof InputError) || nan === null) throw error;
    const issue = error.issues[0];
    throw new InputError([
      {
        file,
        pointer: issue?.pointer ?? '',
        expected: 'must be JSON without NaN or Infinity',
        got: quote(nan[0].replace(/^[:[,]\s*/, '')),
        hint: 'A round logged a non-finite value; cut the rounds after it, or dump with allow_nan=False to find it.',
      },
    ]);
  }
  const shape = (pointer: string, expected: string, got: unknown) =>
    new InputError([
      {
        file,
        pointer,
        expected,
        got: quote(got),
        hint: 'Write the booster\'s evals_result as JSON: {"train": {"logloss": [...]}, "eval": {...}}.',
      },
    ]);
  if (!isObject(doc) || Object.keys(doc).length === 0)
    throw shape('', 'must be an object of eval sets, each an object of metric arrays', doc);
  const series: Series[] = [];
  const names = new Set<string>();
  for (const [set, metrics] of Object.entries(doc)) {
    const setPointer = `/${escapePointer(set)}`;
    if (!isObject(metrics))
      throw shape(
        setPointer,
        'must be an object of metric arrays, such as {"logloss": [...]}',
        metrics,
      );
    for (const [metric, values] of Object.entries(metrics)) {
      const path = `${setPointer}/${escapePointer(metric)}`;
      if (!Array.isArray(values))
        throw shape(path, 'must be an array with one value per boosting round', values);
      if (series.length >= MAX_SERIES)
        throw shape(path, `must hold at most ${MAX_SERIES} eval-set metrics`, metric);
      const name = `${set}/${metric}`;
      if (names.has(name))
        throw shape(path, `must give a series name of its own, but "${name}" is taken`, metric);
      names.add(name);
      const s: Series = {
        name,
        file,
        x: 'round',
        where: { kind: 'json', path },
        points: [],
        problems: [],
      };
      values.forEach((value: unknown, i) => {
        if (typeof value !== 'number' || !Number.isFinite(value)) {
          if (s.problems.length < 10)
            s.problems.push({
              file,
              pointer: `${path}/${i}`,
              expected: 'must be a finite number',
              got: quote(value),
            });
          return;
        }
        budget.take(file, s.where, i);
        s.points.push({ x: i + 1, value, at: i });
      });
      series.push(s);
    }
  }
  return { series, warnings: [] };
}
