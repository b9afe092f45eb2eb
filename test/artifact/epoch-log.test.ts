/**
 * The config's epoch-log mapping, read through the CSV-log reader with an exact mapping. Logs are
 * written by the tests; quoting follows RFC 4180 §2 (a quoted cell may hold commas, `""` is a
 * quote). A curve's rules (x strictly increasing, numbers within ±1e15, at most 10,000 points)
 * are the artifact's own, see src/model/limits.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseEpochLog } from '../../src/artifact/epoch-log.js';
import type { EpochLogMapping } from '../../src/model/config.js';
import { InputError } from '../../src/model/errors.js';
import { MAX_EPOCH_POINTS, MAX_MAGNITUDE } from '../../src/model/limits.js';

const MAPPING: EpochLogMapping = {
  file: 'epochs.csv',
  x: 'epoch',
  train: 'train_loss',
  validation: 'val_loss',
};
const read = (text: string, mapping: EpochLogMapping = MAPPING) =>
  parseEpochLog(text, 'runs/epochs.csv', mapping);

describe('parseEpochLog', () => {
  it('maps the named columns onto curve points, ignoring the others', () => {
    const text = 'epoch,train_loss,val_loss,lr,note\n1,0.5,0.6,0.001,warmup\n2,0.4,0.55,0.001,\n';
    expect(read(text)).toEqual([
      { x: 1, train: 0.5, validation: 0.6 },
      { x: 2, train: 0.4, validation: 0.55 },
    ]);
  });

  it('takes only what is mapped: no partner looked up, no units converted', () => {
    // "loss"/"val_loss" would be paired by name, and accuracy converted for an error metric,
    // by `curves import`; a mapping names its columns and keeps their values as logged.
    const text = 'epoch,loss,val_loss,val_accuracy\n0,0.9,0.8,0.61\n1,0.7,0.6,0.72\n';
    expect(read(text, { file: 'e.csv', x: 'epoch', validation: 'val_loss' })).toEqual([
      { x: 0, validation: 0.8 },
      { x: 1, validation: 0.6 },
    ]);
    expect(read(text, { file: 'e.csv', x: 'epoch', validation: 'val_accuracy' })).toEqual([
      { x: 0, validation: 0.61 },
      { x: 1, validation: 0.72 },
    ]);
  });

  it('reads quoted cells, a byte-order mark, CRLF, blank lines and an unnamed index column', () => {
    // pandas' DataFrame.to_csv writes its index as a first column with an empty name (common practice).
    const text =
      '\uFEFF,"epoch","train_loss","val_loss"\r\n0,1,"0.5",0.6\r\n\r\n1,2,0.4,"0.55"\r\n';
    expect(read(text)).toEqual([
      { x: 1, train: 0.5, validation: 0.6 },
      { x: 2, train: 0.4, validation: 0.55 },
    ]);
  });

  it('refuses a repeated column name, saying which columns', () => {
    expect(() => read('epoch,val_loss,train_loss,val_loss\n1,0.5,0.4,0.5\n')).toThrow(
      'runs/epochs.csv: line 1 must name each column once (column 4 repeats column 2) (got "val_loss")',
    );
  });

  it.each([
    ['x', { ...MAPPING, x: 'iteration' }, 'iteration'],
    ['train', { ...MAPPING, train: 'loss' }, 'loss'],
    ['validation', { ...MAPPING, validation: 'val_acc' }, 'val_acc'],
  ])('names a missing %s column with the header and the config key', (role, mapping, name) => {
    expect(() => read('epoch,train_loss,val_loss\n1,0.5,0.6\n', mapping)).toThrow(
      `runs/epochs.csv: line 1 must have the column "${name}" (epoch-log ${role} in the config) ` +
        `(got "epoch,train_loss,val_loss"). Change epoch-log ${role} in the config to name one of the header columns.`,
    );
  });

  it('refuses the x column mapped as values', () => {
    expect(() => read('epoch,val_loss\n1,0.5\n', { ...MAPPING, train: 'epoch' })).toThrow(
      'runs/epochs.csv: line 1 must not use the x column "epoch" for epoch-log train in the config as well',
    );
  });

  it.each([
    ['a word', '2,0.4,oops', 'column "val_loss"', '"oops"'],
    ['an empty cell', '2,,0.5', 'column "train_loss"', '""'],
    ['a missing cell', '2,0.4', 'column "val_loss"', '""'],
    ['NaN', '2,nan,0.5', 'column "train_loss"', '"nan"'],
    ['a number beyond 1e15', '2,0.4,2e15', 'column "val_loss"', '"2e15"'],
    ['an x beyond 1e15', '-1e16,0.4,0.5', 'column "epoch"', '"-1e16"'],
    ['a hexadecimal x', '0x2,0.4,0.5', 'column "epoch"', '"0x2"'],
  ])('refuses %s with its line', (_name, row, column, got) => {
    expect(() => read(`epoch,train_loss,val_loss\n1,0.5,0.6\n${row}\n`)).toThrow(
      `runs/epochs.csv: line 3 ${column} must be a decimal number within ±1e15 (got ${got})`,
    );
  });

  it('reports bad cells of both mapped columns together', () => {
    const error = (() => {
      try {
        read('epoch,train_loss,val_loss\n1,x,0.6\n2,0.4,y\n');
      } catch (e) {
        return e;
      }
      return undefined;
    })();
    expect(error).toBeInstanceOf(InputError);
    const issues = (error as InputError).issues.map((i) => `${i.pointer} ${i.expected}`);
    expect(issues).toEqual([
      'line 3 column "val_loss" must be a decimal number within ±1e15',
      'line 2 column "train_loss" must be a decimal number within ±1e15',
    ]);
  });

  it('refuses x that goes back or repeats, naming both lines', () => {
    expect(() => read('epoch,train_loss,val_loss\n1,0.5,0.6\n3,0.4,0.5\n2,0.3,0.4\n')).toThrow(
      'runs/epochs.csv: line 4 column "epoch" must strictly increase (previous 3 at line 3) (got 2). Sort the rows',
    );
    // A resumed run logs an epoch twice; a mapping refuses it rather than averaging.
    expect(() => read('epoch,train_loss,val_loss\n1,0.5,0.6\n1,0.4,0.5\n')).toThrow(
      'runs/epochs.csv: line 3 column "epoch" must strictly increase (previous 1 at line 2) (got 1). Keep one value per x',
    );
  });

  it(`refuses more than ${MAX_EPOCH_POINTS} data rows at the first row over`, () => {
    const rows = (n: number) =>
      `epoch,val_loss\n${Array.from({ length: n }, (_, i) => `${i + 1},0.5\n`).join('')}`;
    const mapping = { file: 'e.csv', x: 'epoch', validation: 'val_loss' };
    expect(read(rows(MAX_EPOCH_POINTS), mapping)).toHaveLength(MAX_EPOCH_POINTS);
    expect(() => read(rows(MAX_EPOCH_POINTS + 1), mapping)).toThrow(
      `runs/epochs.csv: line ${MAX_EPOCH_POINTS + 2} must have at most ${MAX_EPOCH_POINTS} data rows`,
    );
  });

  it('refuses a header without data rows, and a file without a header', () => {
    expect(() => read('epoch,train_loss,val_loss\n\n')).toThrow(
      'runs/epochs.csv must have at least one value of "val_loss"',
    );
    expect(() => read('')).toThrow('runs/epochs.csv: line 1 must be a header row');
  });

  it('round-trips generated logs (property)', () => {
    const value = fc.double({ min: -MAX_MAGNITUDE, max: MAX_MAGNITUDE, noNaN: true });
    // Python writes -0.0 as "-0.0"; String(-0) would lose the sign.
    const num = (v: number) => (Object.is(v, -0) ? '-0.0' : String(v));
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: -5, max: 100_000 }), { minLength: 1, maxLength: 40 }),
        fc.infiniteStream(fc.tuple(value, value)),
        fc.boolean(),
        (xs, values, withTrain) => {
          const rows = [...xs]
            .sort((a, b) => a - b)
            .map((x) => {
              const [t, v] = values.next().value as [number, number];
              return withTrain ? { x, train: t, validation: v } : { x, validation: v };
            });
          const text = [
            'step,epoch,train_loss,val_loss',
            ...rows.map((r, i) => `${i},${r.x},${num(r.train ?? 1)},${num(r.validation)}`),
          ].join('\n');
          const mapping = withTrain
            ? MAPPING
            : { file: 'e.csv', x: 'epoch', validation: 'val_loss' };
          expect(read(text, mapping)).toEqual(rows);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('gives a curve that meets the artifact rules, or an InputError (property)', () => {
    // Mostly well-formed logs with damage here and there: bad cells, repeated x, short rows,
    // a repeated or missing column.
    const garbage = fc.constantFrom('', 'nan', '"', '1e400', '2e15', ',', '0x1', 'abc', ' 1 ');
    const cell = fc.oneof(
      { weight: 12, arbitrary: fc.double({ min: -1e3, max: 1e3, noNaN: true }).map(String) },
      { weight: 1, arbitrary: garbage },
    );
    const header = fc.oneof(
      {
        weight: 6,
        arbitrary: fc.shuffledSubarray(['epoch', 'train_loss', 'val_loss', 'lr', ''], {
          minLength: 5,
        }),
      },
      {
        weight: 1,
        arbitrary: fc.shuffledSubarray(['epoch', 'train_loss', 'val_loss', 'val_loss', 'lr'], {
          minLength: 1,
        }),
      },
    );
    const row = fc.record({
      step: fc.oneof(
        { weight: 8, arbitrary: fc.integer({ min: 1, max: 3 }) },
        fc.constant(0),
        fc.constant(-1),
      ),
      cells: fc.array(cell, { minLength: 5, maxLength: 5 }),
      cut: fc.oneof({ weight: 8, arbitrary: fc.constant(5) }, fc.integer({ min: 0, max: 6 })),
    });
    let curves = 0;
    fc.assert(
      fc.property(header, fc.array(row, { maxLength: 8 }), (h, rows) => {
        let x = 0;
        const lines = rows.map(({ step, cells, cut }) => {
          x += step;
          const line = h.map((name, i) => (name === 'epoch' ? String(x) : (cells[i] ?? '')));
          return [...line, ...(cut > 5 ? ['extra'] : [])].slice(0, Math.max(cut, 1)).join(',');
        });
        let points;
        try {
          points = read([h.join(','), ...lines].join('\n'));
        } catch (error) {
          expect(error).toBeInstanceOf(InputError);
          return;
        }
        curves++;
        expect(points.length).toBeGreaterThan(0);
        points.forEach((p, i) => {
          for (const v of [p.x, p.train, p.validation]) {
            expect(Number.isFinite(v)).toBe(true);
            expect(Math.abs(v as number)).toBeLessThanOrEqual(MAX_MAGNITUDE);
          }
          if (i > 0) expect(p.x).toBeGreaterThan((points[i - 1] as { x: number }).x);
        });
      }),
      { numRuns: 500 },
    );
    // Some logs must get through, or the checks on the points above never ran.
    expect(curves).toBeGreaterThan(30);
  });
});
