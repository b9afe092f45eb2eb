/**
 * Turns a CSV epoch log (e.g. `epoch,train_loss,val_loss`) into `curves.epochs` using the column
 * mapping from the config. Adapter helper: parses text it is given; the caller reads the file.
 */
import { InputError, quote, type Issue } from '../model/errors.js';
import type { EpochLogMapping } from '../model/config.js';
import type { CurvePoint } from '../model/run.js';
import { MAX_CURVE_POINTS, MAX_MAGNITUDE, formatLimit } from '../model/limits.js';
import { parseDecimal } from '../model/settings.js';

function splitCsvLine(line: string): string[] {
  return line.split(',').map((cell) => cell.trim().replace(/^"(.*)"$/, '$1'));
}

export function parseEpochLog(text: string, file: string, mapping: EpochLogMapping): CurvePoint[] {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const header = splitCsvLine(lines[0] ?? '');
  const seen = new Map<string, number>();
  header.forEach((name, i) => {
    const first = seen.get(name);
    if (first !== undefined) {
      throw new InputError([
        {
          file,
          pointer: 'line 1',
          expected: `must name each column once (column ${i + 1} repeats column ${first + 1})`,
          got: quote(name),
          hint: 'Rename one of the columns; a repeated name makes the mapping ambiguous.',
        },
      ]);
    }
    seen.set(name, i);
  });
  const column = (name: string | undefined, role: string): number | undefined => {
    if (name === undefined) return undefined;
    const index = header.indexOf(name);
    if (index < 0) {
      throw new InputError([
        {
          file,
          pointer: 'line 1',
          expected: `must have the column "${name}" (epoch-log ${role} in the config)`,
          got: quote(header.join(',')),
          hint: 'Change epoch-log in the config to name one of the header columns.',
        },
      ]);
    }
    return index;
  };
  const xi = column(mapping.x, 'x') ?? 0;
  const ti = column(mapping.train, 'train');
  const vi = column(mapping.validation, 'validation') ?? 0;

  const points: CurvePoint[] = [];
  const issues: Issue[] = [];
  for (let i = 1; i < lines.length; i++) {
    const raw = lines[i] ?? '';
    if (raw.trim() === '') continue;
    const cells = splitCsvLine(raw);
    const read = (index: number, name: string): number => {
      const cell = cells[index] ?? '';
      const value = parseDecimal(cell) ?? Number.NaN;
      if (!Number.isFinite(value) || Math.abs(value) > MAX_MAGNITUDE) {
        issues.push({
          file,
          pointer: `line ${i + 1}`,
          expected: `column "${name}" must be a decimal number within ±${formatLimit(MAX_MAGNITUDE)}`,
          got: quote(cell),
        });
        return Number.NaN;
      }
      return value;
    };
    const point: CurvePoint = { x: read(xi, mapping.x), validation: read(vi, mapping.validation) };
    if (ti !== undefined && mapping.train !== undefined) point.train = read(ti, mapping.train);
    const previous = points[points.length - 1];
    if (previous !== undefined && Number.isFinite(point.x) && !(point.x > previous.x)) {
      issues.push({
        file,
        pointer: `line ${i + 1}`,
        expected: `column "${mapping.x}" must strictly increase (previous ${previous.x})`,
        got: quote(point.x),
      });
    }
    points.push(point);
    if (issues.length >= 10) break;
    if (points.length > MAX_CURVE_POINTS) {
      issues.push({
        file,
        pointer: `line ${i + 1}`,
        expected: `must have at most ${MAX_CURVE_POINTS} data rows (a curve's limit)`,
        hint: 'Log less often, or keep every n-th row.',
      });
      break;
    }
  }
  if (issues.length > 0) throw new InputError(issues);
  if (points.length === 0)
    throw new InputError([{ file, pointer: '', expected: 'has no data rows under its header' }]);
  return points;
}
