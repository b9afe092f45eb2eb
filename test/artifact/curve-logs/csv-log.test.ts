/**
 * CSV logs written by the tests themselves, in the layouts of the two common CSV loggers
 * (common practice, from memory of their docs):
 * - Keras `CSVLogger`: header `epoch,<sorted metric names>`, one row per epoch (0-based), values
 *   as Python writes floats, `nan` for a NaN loss.
 * - Lightning `CSVLogger` (`lightning_logs/version_N/metrics.csv`): columns `epoch,step,<metrics>`;
 *   a row per log call, so training and validation values sit in different rows with the other
 *   cells empty, and step-level training values repeat an epoch.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/model/errors.js';
import { buildCurve, readCsvLog, splitCsvLine } from '../../../src/artifact/curve-logs/index.js';

const catalogue = { file: 'log.csv', pointer: 'line 1', noun: 'column' };

const KERAS = `epoch,accuracy,loss,val_accuracy,val_loss
0,0.71,0.62,0.69,0.65
1,0.80,0.45,0.76,0.52
2,0.86,0.33,0.79,0.49
`;

const LIGHTNING = [
  'epoch,step,train_loss_step,train_loss_epoch,val_acc,val_loss',
  '0,49,0.90,,,',
  '0,99,0.70,,,',
  '0,99,,,0.61,0.75',
  '0,99,,0.80,,',
  '1,149,0.50,,,',
  '1,199,0.40,,,',
  '1,199,,,0.72,0.55',
  '1,199,,0.45,,',
].join('\r\n');

describe('readCsvLog', () => {
  it('reads a Keras CSVLogger file and picks loss/val_loss by name', () => {
    const curve = buildCurve(readCsvLog(KERAS, 'log.csv'), catalogue);
    expect(curve).toMatchObject({ train: 'loss', validation: 'val_loss', by: 'names', x: 'epoch' });
    expect(curve.points).toEqual([
      { x: 0, train: 0.62, validation: 0.65 },
      { x: 1, train: 0.45, validation: 0.52 },
      { x: 2, train: 0.33, validation: 0.49 },
    ]);
    expect(curve.alternatives).toEqual(['val_accuracy']);
    expect(curve.warnings).toEqual([{ code: 'loss-not-metric', series: 'val_loss' }]);
  });

  it('with the metric named, picks accuracy and converts it for an error-rate metric', () => {
    const read = readCsvLog(KERAS, 'log.csv');
    const accuracy = buildCurve(read, catalogue, { metric: 'accuracy' });
    expect(accuracy).toMatchObject({ train: 'accuracy', validation: 'val_accuracy', warnings: [] });
    const error = buildCurve(read, catalogue, { metric: 'error rate' });
    expect(error.validation).toBe('val_accuracy');
    expect(error.points[0]?.train).toBeCloseTo(1 - 0.71, 12);
    expect(error.points[0]?.validation).toBeCloseTo(1 - 0.69, 12);
    expect(error.warnings).toEqual([
      { code: 'converted', series: 'val_accuracy', metric: 'error rate', conversion: 'one-minus' },
    ]);
  });

  it('merges a Lightning metrics.csv by epoch, averaging step rows', () => {
    const curve = buildCurve(readCsvLog(LIGHTNING, 'metrics.csv'), catalogue);
    expect(curve).toMatchObject({ train: 'train_loss_epoch', validation: 'val_loss', x: 'epoch' });
    expect(curve.points).toEqual([
      { x: 0, train: 0.8, validation: 0.75 },
      { x: 1, train: 0.45, validation: 0.55 },
    ]);
    const steps = buildCurve(readCsvLog(LIGHTNING, 'metrics.csv'), catalogue, {
      train: 'train_loss_step',
      validation: 'val_loss',
    });
    expect(steps.points).toEqual([
      { x: 0, train: 0.8, validation: 0.75 },
      { x: 1, train: 0.45, validation: 0.55 },
    ]);
    expect(steps.warnings).toContainEqual({
      code: 'duplicates-averaged',
      series: 'train_loss_step',
      xs: 2,
    });
  });

  it('uses step as x when asked, keeping only steps with a validation value', () => {
    const curve = buildCurve(readCsvLog(LIGHTNING, 'metrics.csv', { x: 'step' }), catalogue, {
      train: 'train_loss_step',
      validation: 'val_loss',
    });
    expect(curve.x).toBe('step');
    expect(curve.points).toEqual([
      { x: 99, train: 0.7, validation: 0.75 },
      { x: 199, train: 0.4, validation: 0.55 },
    ]);
    expect(curve.warnings).toContainEqual({
      code: 'train-only-dropped',
      series: 'train_loss_step',
      points: 2,
    });
  });

  it('handles quoting, a byte-order mark and blank lines', () => {
    expect(splitCsvLine('a,"b,c","d ""e"""')).toEqual(['a', 'b,c', 'd "e"']);
    expect(splitCsvLine('"open')).toBeNull();
    const read = readCsvLog('\uFEFF"epoch","loss","val_loss"\n\n1,"0.5",0.6\n', 'q.csv');
    expect(read.series.map((s) => [s.name, s.points])).toEqual([
      ['loss', [{ x: 1, value: 0.5, at: 3 }]],
      ['val_loss', [{ x: 1, value: 0.6, at: 3 }]],
    ]);
  });

  it('ignores an unnamed column, as pandas writes its index', () => {
    // DataFrame.to_csv() without index=False: the first header cell is empty (common practice).
    const read = readCsvLog(',epoch,loss,val_loss\n0,1,0.5,0.6\n1,2,0.4,0.5\n', 'pd.csv');
    expect(read.series.map((s) => s.name)).toEqual(['loss', 'val_loss']);
    expect(buildCurve(read, catalogue).points).toEqual([
      { x: 1, train: 0.5, validation: 0.6 },
      { x: 2, train: 0.4, validation: 0.5 },
    ]);
  });

  it('keeps a bad cell as a problem of its column: fatal only when that column is used', () => {
    const text = 'epoch,loss,val_loss,note\n1,0.5,0.6,ok\n2,0.4,0.5,fine\n3,nan,0.55,x\n';
    const read = readCsvLog(text, 'k.csv');
    // "note" is garbage but never picked; "loss" has a NaN at line 4.
    expect(() => buildCurve(read, catalogue)).toThrow(
      'k.csv: line 4 column "loss" must be a finite number (got "nan"). The run logged NaN',
    );
    const validationOnly = buildCurve(read, catalogue, {
      train: 'val_loss',
      validation: 'val_loss',
    });
    expect(validationOnly.points).toHaveLength(3);
  });

  it('names the line and the column in its messages', () => {
    const text = 'epoch,train_loss,val_loss\n1,0.5,0.6\n2,0.4,oops\n';
    expect(() => readCsvLog(text, 'epochs.csv', { x: 'iteration' })).toThrow(
      'epochs.csv: line 1 must have the column "iteration"',
    );
    expect(() =>
      buildCurve(readCsvLog(text, 'epochs.csv', { x: 'epoch' }), catalogue, {
        train: 'train_loss',
        validation: 'val_loss',
      }),
    ).toThrow('epochs.csv: line 3 column "val_loss" must be a finite number (got "oops")');
    expect(() =>
      buildCurve(
        readCsvLog(text, 'epochs.csv'),
        { file: 'epochs.csv', pointer: 'line 1', noun: 'column' },
        {
          validation: 'val_acc',
        },
      ),
    ).toThrow('epochs.csv: line 1 must have the column "val_acc"');
    const decreasing = 'epoch,val_loss\n1,0.5\n3,0.4\n2,0.3\n';
    expect(() =>
      buildCurve(readCsvLog(decreasing, 'e.csv'), catalogue, {
        validation: 'val_loss',
        duplicates: 'reject',
      }),
    ).toThrow('e.csv: line 4 column "epoch" must strictly increase (previous 3 at line 3) (got 2)');
    expect(
      buildCurve(readCsvLog(decreasing, 'e.csv'), catalogue, { validation: 'val_loss' }).points.map(
        (p) => p.x,
      ),
    ).toEqual([1, 2, 3]);
  });

  it('rejects broken structure with the line', () => {
    expect(() => readCsvLog('', 'e.csv')).toThrow('e.csv: line 1 must be a header row');
    expect(() => readCsvLog('epoch,a,a\n', 'e.csv')).toThrow(
      'e.csv: line 1 must name each column once (column 3 repeats column 2) (got "a")',
    );
    expect(() => readCsvLog('loss,val_loss\n1,2\n', 'e.csv')).toThrow(
      'e.csv: line 1 must have an "epoch" or "step" column for x',
    );
    expect(() => readCsvLog('epoch,loss\n1,2,3\n', 'e.csv')).toThrow(
      'e.csv: line 2 must have at most 2 cells',
    );
    expect(() => readCsvLog('epoch,loss\n"1,2\n', 'e.csv')).toThrow(
      'e.csv: line 2 must close every quoted cell',
    );
    expect(() => readCsvLog('epoch,loss\n,2\nx,3\n', 'e.csv')).toThrow(
      /line 2 column "epoch" must be a finite number \(got ""\)\.\ne\.csv: line 3 column "epoch"/,
    );
    expect(() => readCsvLog(Uint8Array.from([0x65, 0xff, 0xfe]), 'e.csv')).toThrow(
      'e.csv must be UTF-8 text',
    );
    expect(() => buildCurve(readCsvLog('epoch,loss,val_loss\n', 'e.csv'), catalogue)).toThrow(
      'e.csv must have at least one value of "val_loss"',
    );
  });

  it('round-trips generated per-epoch logs (property)', () => {
    const finite = fc.double({ noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: -5, max: 10_000 }), { minLength: 1, maxLength: 40 }),
        fc.infiniteStream(fc.tuple(finite, fc.option(finite, { nil: undefined }))),
        (epochs, values) => {
          const rows = epochs.map((x) => {
            const [v, t] = values.next().value as [number, number | undefined];
            return { x, validation: v, train: t };
          });
          // Python writes -0.0 as "-0.0"; String(-0) would lose the sign.
          const num = (v: number) => (Object.is(v, -0) ? '-0.0' : String(v));
          const text = [
            'epoch,loss,val_loss',
            ...rows.map(
              (r) => `${r.x},${r.train === undefined ? '' : num(r.train)},${num(r.validation)}`,
            ),
          ].join('\n');
          const curve = buildCurve(readCsvLog(text, 'p.csv'), catalogue, {
            train: 'loss',
            validation: 'val_loss',
          });
          const expected = [...rows]
            .sort((a, b) => a.x - b.x)
            .map((r) => (r.train === undefined ? { x: r.x, validation: r.validation } : r));
          expect(curve.points).toEqual(expected);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('throws nothing but InputError on garbage (property)', () => {
    const cell = fc.oneof(
      fc.string({ maxLength: 6 }),
      fc.constantFrom('', 'nan', '"', '1e400', '-0', ',', '0x1'),
    );
    fc.assert(
      fc.property(
        fc.array(fc.array(cell, { maxLength: 5 }), { maxLength: 8 }),
        fc.constantFrom(undefined, 'epoch', 'step'),
        (rows, x) => {
          const text = rows.map((r) => r.join(',')).join('\n');
          try {
            const read = readCsvLog(text, 'g.csv', x === undefined ? {} : { x });
            buildCurve(read, catalogue);
          } catch (error) {
            expect(error).toBeInstanceOf(InputError);
          }
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('buildCurve bounds', () => {
  const log = 'epoch,loss,val_loss\n1,0.5,0.6\n2,0.4,0.5\n3,0.3,0.45\n3,0.3,0.44\n4,0.2,0.4\n';

  it('keeps at most maxPoints points (one per x with a validation value), else names the file', () => {
    const read = readCsvLog(log, 'log.csv');
    // Five rows, x = 3 twice: four points.
    expect(buildCurve(read, catalogue, { maxPoints: 4 }).points).toHaveLength(4);
    expect(() => buildCurve(read, catalogue, { maxPoints: 3 })).toThrow(
      'log.csv must give a curve of at most 3 points (one per x with a value of "val_loss") (got 4 points). Log less often',
    );
  });

  it('refuses x or a value beyond maxMagnitude, by its place in the file', () => {
    const read = readCsvLog('step,loss,val_loss\n1,0.5,0.6\n2e16,0.4,0.5\n', 'log.csv', {
      x: 'step',
    });
    expect(() => buildCurve(read, catalogue, { maxMagnitude: 1e15 })).toThrow(
      'log.csv: line 3 x ("step") of "val_loss" must be a decimal number within ±1e15 (got "20000000000000000")',
    );
    expect(buildCurve(read, catalogue).points).toHaveLength(2);
    const value = readCsvLog('epoch,loss,val_loss\n1,5e15,0.6\n', 'log.csv');
    expect(() => buildCurve(value, catalogue, { maxMagnitude: 1e15 })).toThrow(
      'log.csv: line 2 "loss" must be a decimal number within ±1e15 (got "5000000000000000")',
    );
  });
});

describe('buildCurve merges series as a map by x would', () => {
  /**
   * Naive reference: every series collapsed through a Map of running means by x, the validation
   * x sorted, train values looked up by x (the straightforward merge; common practice).
   */
  function naive(read: ReturnType<typeof readCsvLog>) {
    const byX = (name: string) => {
      const means = new Map<number, { mean: number; n: number }>();
      for (const p of read.series.find((s) => s.name === name)?.points ?? []) {
        const e = means.get(p.x);
        if (e === undefined) means.set(p.x, { mean: p.value, n: 1 });
        else {
          e.n++;
          e.mean += p.value / e.n - e.mean / e.n;
        }
      }
      return means;
    };
    const v = byX('val_loss');
    const t = byX('loss');
    const points = [...v.keys()]
      .sort((a, b) => a - b)
      .map((x) => {
        const train = t.get(x)?.mean;
        const validation = (v.get(x) as { mean: number }).mean;
        return train === undefined ? { x, validation } : { x, train, validation };
      });
    const merged = (m: Map<number, { n: number }>) => [...m.values()].filter((e) => e.n > 1).length;
    return {
      points,
      averaged: [merged(v), merged(t)],
      missing: [...v.keys()].filter((x) => !t.has(x)).length,
      dropped: [...t.keys()].filter((x) => !v.has(x)).length,
    };
  }

  it('property: same points and the same counts in the warnings, sorted or not, with repeats', () => {
    // Source: the naive map-based merge above.
    const row = fc.tuple(
      fc.integer({ min: -3, max: 12 }),
      fc.option(fc.double({ min: -5, max: 5, noNaN: true }), { nil: undefined }),
      fc.option(fc.double({ min: -5, max: 5, noNaN: true }), { nil: undefined }),
    );
    fc.assert(
      fc.property(fc.array(row, { minLength: 1, maxLength: 30 }), fc.boolean(), (rows, sorted) => {
        const ordered = sorted ? [...rows].sort((a, b) => a[0] - b[0]) : rows;
        const text = `epoch,loss,val_loss\n${ordered
          .map(([x, t, v]) => `${x},${t ?? ''},${v ?? ''}`)
          .join('\n')}\n`;
        const read = readCsvLog(text, 'log.csv');
        const expected = naive(read);
        if (expected.points.length === 0) return;
        const curve = buildCurve(read, catalogue, { train: 'loss', validation: 'val_loss' });
        expect(curve.points).toEqual(expected.points);
        const count = (code: string, series: string) => {
          const w = curve.warnings.find(
            (w) => w.code === code && 'series' in w && w.series === series,
          ) as { xs?: number; points?: number } | undefined;
          return w === undefined ? 0 : (w.xs ?? w.points ?? 0);
        };
        expect([
          count('duplicates-averaged', 'val_loss'),
          count('duplicates-averaged', 'loss'),
        ]).toEqual(expected.averaged);
        expect(count('train-missing', 'loss')).toBe(expected.missing);
        expect(count('train-only-dropped', 'loss')).toBe(expected.dropped);
      }),
      { numRuns: 1500, seed: 20261130 },
    );
  });
});
