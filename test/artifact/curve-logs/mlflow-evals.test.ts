/**
 * MLflow metric files written by the test in the file store's layout (`mlruns/<experiment>/<run>/
 * metrics/<key>`, lines `timestamp value step`; from memory of mlflow/store/tracking/file_store.py),
 * and evals_result JSON: two files written by XGBoost itself (test/fixtures/curve-logs/README.md)
 * and LightGBM's layout (`training`, `valid_0`; from memory of its docs).
 */
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/model/errors.js';
import {
  buildCurve,
  readEvalsResult,
  readMlflowMetric,
  stepsToEpochs,
  type ReadResult,
} from '../../../src/artifact/curve-logs/index.js';

const catalogue = { file: 'x', pointer: '', noun: 'series' };

describe('readMlflowMetric', () => {
  it('reads timestamp value step lines; an old two-field line is step 0', () => {
    const text = '1700000000000 0.5 0\n1700000001000 0.25 1\n\n1700000002000 1e-1 2\n';
    const { series } = readMlflowMetric(text, 'metrics/val_loss', 'val_loss');
    expect(series[0]?.points).toEqual([
      { x: 0, value: 0.5, at: 1 },
      { x: 1, value: 0.25, at: 2 },
      { x: 2, value: 0.1, at: 4 },
    ]);
    expect(readMlflowMetric('1700000000000 0.5\n', 'f', 'k').series[0]?.points).toEqual([
      { x: 0, value: 0.5, at: 1 },
    ]);
  });

  it('maps steps to epochs through a logged epoch series', () => {
    const read: ReadResult = {
      series: [
        readMlflowMetric('1 0 10\n2 0 20\n3 1 30\n4 1 40\n', 'm/epoch', 'epoch').series[0]!,
        readMlflowMetric('1 0.9 10\n2 0.7 20\n3 0.5 30\n4 0.3 40\n', 'm/train_loss', 'train_loss')
          .series[0]!,
        readMlflowMetric('5 0.8 20\n6 0.6 40\n', 'm/val_loss', 'val_loss').series[0]!,
      ],
      warnings: [],
    };
    const curve = buildCurve(stepsToEpochs(read, 'm'), catalogue);
    expect(curve.x).toBe('epoch');
    expect(curve.points).toEqual([
      { x: 0, train: 0.8, validation: 0.8 },
      { x: 1, train: expect.closeTo(0.4, 12), validation: 0.6 },
    ]);
    expect(() => stepsToEpochs({ series: read.series.slice(1), warnings: [] }, 'm')).toThrow(
      'm must log an "epoch" series to use epochs as x',
    );
  });

  it('rejects malformed lines and keeps NaN as a problem', () => {
    expect(() => readMlflowMetric('1 2 3 4\n', 'f', 'k')).toThrow(
      'f: line 1 must be "timestamp value step"',
    );
    expect(() => readMlflowMetric('x 0.5 1\n', 'f', 'k')).toThrow(InputError);
    const { series } = readMlflowMetric('1 nan 0\n2 0.5 1\n', 'f', 'k');
    expect(series[0]?.problems[0]).toMatchObject({ pointer: 'line 1', got: '"nan"' });
  });

  it('round-trips and throws nothing but InputError (properties)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.nat(),
            fc.double({ noNaN: true, noDefaultInfinity: true }),
            fc.integer({ min: -10, max: 1e9 }),
          ),
          { maxLength: 30 },
        ),
        (rows) => {
          const text = rows
            .map(([t, v, s]) => `${t} ${Object.is(v, -0) ? '-0.0' : v} ${s}`)
            .join('\n');
          const points = readMlflowMetric(text, 'f', 'k').series[0]?.points.map((p) => [
            p.x,
            p.value,
          ]);
          expect(points).toEqual(rows.map(([, v, s]) => [s, v]));
        },
      ),
      { numRuns: 200 },
    );
    fc.assert(
      fc.property(fc.string({ maxLength: 80 }), (text) => {
        try {
          readMlflowMetric(text, 'f', 'k');
        } catch (error) {
          expect(error).toBeInstanceOf(InputError);
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe('readEvalsResult', () => {
  it('reads XGBoost’s own evals_result; with no metric named, takes the last one (early stopping’s)', () => {
    const text = readFileSync('test/fixtures/curve-logs/xgboost-train-evals-result.json', 'utf8');
    const doc = JSON.parse(text) as Record<string, Record<string, number[]>>;
    const read = readEvalsResult(text, 'evals.json');
    expect(read.series.map((s) => s.name)).toEqual([
      'train/logloss',
      'train/error',
      'eval/logloss',
      'eval/error',
    ]);
    const curve = buildCurve(read, catalogue);
    expect(curve).toMatchObject({ train: 'train/error', validation: 'eval/error', x: 'round' });
    expect(curve.points).toHaveLength(25);
    expect(curve.points[0]).toEqual({
      x: 1,
      train: doc['train']!['error']![0],
      validation: doc['eval']!['error']![0],
    });
    expect(curve.warnings).toEqual([{ code: 'units-unchecked', series: 'eval/error' }]);
    const logloss = buildCurve(read, catalogue, { metric: 'log loss' });
    expect(logloss.validation).toBe('eval/logloss');
    expect(logloss.points.at(-1)?.validation).toBe(doc['eval']!['logloss']![24]);
    const accuracy = buildCurve(read, catalogue, { metric: 'accuracy' });
    expect(accuracy.points[0]?.validation).toBeCloseTo(1 - doc['eval']!['error']![0]!, 15);
  });

  it('takes validation_0 as training data for XGBoost’s scikit-learn eval_set, and says so', () => {
    const text = readFileSync('test/fixtures/curve-logs/xgboost-sklearn-evals-result.json', 'utf8');
    const curve = buildCurve(readEvalsResult(text, 'e.json'), catalogue, { metric: 'error' });
    expect(curve).toMatchObject({ train: 'validation_0/error', validation: 'validation_1/error' });
    expect(curve.points).toHaveLength(15);
    expect(curve.warnings).toEqual([
      { code: 'eval-sets-guessed', train: 'validation_0/error', validation: 'validation_1/error' },
    ]);
  });

  it('reads LightGBM’s layout and converts l2 (MSE) to RMSE when the metric is RMSE', () => {
    const text = JSON.stringify({
      training: { l2: [0.25, 0.16], l1: [0.4, 0.3] },
      valid_0: { l2: [0.36, 0.25], l1: [0.5, 0.45] },
    });
    const curve = buildCurve(readEvalsResult(text, 'lgb.json'), catalogue, { metric: 'rmse' });
    expect(curve.points).toEqual([
      { x: 1, train: 0.5, validation: 0.6 },
      { x: 2, train: 0.4, validation: 0.5 },
    ]);
    expect(curve.warnings).toEqual([
      { code: 'converted', series: 'valid_0/l2', metric: 'rmse', conversion: 'sqrt' },
    ]);
  });

  it('explains Python’s NaN and wrong shapes with a JSON pointer', () => {
    expect(() => readEvalsResult('{"train": {"auc": [0.5, NaN]}}', 'e.json')).toThrow(
      'e.json: line 1, column 25 must be JSON without NaN or Infinity (got "NaN")',
    );
    expect(() => readEvalsResult('[1]', 'e.json')).toThrow('e.json must be an object of eval sets');
    expect(() => readEvalsResult('{"a/b": {"x~y": 3}}', 'e.json')).toThrow(
      'e.json: /a~1b/x~0y must be an array with one value per boosting round (got 3)',
    );
    expect(() => readEvalsResult('{"a/b": {"c": [1]}, "a": {"b/c": [2]}}', 'e.json')).toThrow(
      'e.json: /a/b~1c must give a series name of its own, but "a/b/c" is taken (got "b/c")',
    );
    const read = readEvalsResult(
      '{"train": {"auc": [0.5, "0.6"]}, "eval": {"auc": [1, 2]}}',
      'e.json',
    );
    expect(() => buildCurve(read, catalogue)).toThrow(
      'e.json: /train/auc/1 must be a finite number (got "0.6")',
    );
  });

  it('round-trips and throws nothing but InputError (properties)', () => {
    const finite = fc.double({ noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(
        fc.dictionary(
          fc.string({ maxLength: 8 }),
          fc.dictionary(fc.string({ maxLength: 8 }), fc.array(finite)),
          {
            minKeys: 1,
          },
        ),
        (doc) => {
          // Names like {"a/b": {"c": …}} and {"a": {"b/c": …}} collide; that case is tested apart.
          const names = Object.entries(doc).flatMap(([set, m]) =>
            Object.keys(m).map((k) => `${set}/${k}`),
          );
          fc.pre(new Set(names).size === names.length);
          const read = readEvalsResult(JSON.stringify(doc), 'e.json');
          for (const [set, metrics] of Object.entries(doc))
            for (const [metric, values] of Object.entries(metrics)) {
              const s = read.series.find((x) => x.name === `${set}/${metric}`);
              // JSON has no -0.
              expect(s?.points.map((p) => p.value)).toEqual(
                values.map((v) => (Object.is(v, -0) ? 0 : v)),
              );
              expect(s?.points.map((p) => p.x)).toEqual(values.map((_, i) => i + 1));
            }
        },
      ),
      { numRuns: 200 },
    );
    fc.assert(
      fc.property(fc.oneof(fc.json(), fc.string({ maxLength: 40 })), (text) => {
        try {
          buildCurve(readEvalsResult(text, 'e.json'), catalogue);
        } catch (error) {
          expect(error).toBeInstanceOf(InputError);
        }
      }),
      { numRuns: 500 },
    );
  });
});
