/**
 * Turns a CSV epoch log (e.g. `epoch,train_loss,val_loss`) into `curves.epochs` using the column
 * mapping from the config, through the same reader as `fitgap curves import --from csv-log`. A
 * mapping is exact: only the named columns are read, every data row must give each of them a
 * decimal number within the artifact's bounds, x must strictly increase row by row (no repeats),
 * and values keep the units they were logged in. Adapter helper: parses text it is given; the
 * caller opens the file.
 */
import type { EpochLogMapping } from '../model/config.js';
import type { CurvePoint } from '../model/run.js';
import { MAX_EPOCH_POINTS, MAX_MAGNITUDE } from '../model/limits.js';
import { PointBudget, buildCurve, readCsvLog } from './curve-logs/index.js';

const namedBy = (role: string) => `epoch-log ${role} in the config`;

export function parseEpochLog(text: string, file: string, mapping: EpochLogMapping): CurvePoint[] {
  const columns = [
    ...(mapping.train === undefined ? [] : [{ role: 'train', name: mapping.train }]),
    { role: 'validation', name: mapping.validation },
  ];
  const read = readCsvLog(text, file, {
    x: mapping.x,
    columns,
    // Only the mapped columns are read, and maxRows bounds the rows: a value per column and row.
    budget: new PointBudget(MAX_EPOCH_POINTS * columns.length),
    namedBy,
    blank: 'refuse',
    maxMagnitude: MAX_MAGNITUDE,
    maxRows: MAX_EPOCH_POINTS,
  });
  const curve = buildCurve(
    read,
    { file, pointer: 'line 1', noun: 'column' },
    {
      validation: mapping.validation,
      ...(mapping.train === undefined ? {} : { train: mapping.train }),
      exact: true,
      duplicates: 'reject',
    },
  );
  return curve.points;
}
