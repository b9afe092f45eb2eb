/**
 * Finding logs in folders laid out as the loggers lay them out (common practice):
 * Keras's TensorBoard callback (`<log_dir>/train/`, `<log_dir>/validation/`), Lightning
 * (`lightning_logs/version_N/`), MLflow's file store (`mlruns/<experiment>/<run>/metrics/<key>`,
 * keys with `/` as sub-folders).
 */
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildCurve } from '../../src/artifact/curve-logs/index.js';
import { nodeCurveLogFs, readCurveLogs, type CurveLogFs } from '../../src/io/curve-logs.js';
import { eventFile } from '../artifact/curve-logs/tfevents-writer.js';

function tree(files: Record<string, string | Uint8Array>): string {
  const root = mkdtempSync(join(tmpdir(), 'fitgap-logs-'));
  for (const [rel, content] of Object.entries(files)) {
    mkdirSync(dirname(join(root, rel)), { recursive: true });
    writeFileSync(join(root, rel), content);
  }
  return root;
}

const at = (root: string, rel: string) => ({ path: join(root, rel), display: rel });

const kerasEvents = (prefix: string, base: number) =>
  eventFile(
    [0, 1, 2].map((epoch) => ({
      step: epoch,
      values: [
        { tag: 'epoch_loss', tensor: { dtype: 'float' as const, value: base - 0.125 * epoch } },
        { tag: 'epoch_accuracy', tensor: { dtype: 'float' as const, value: 0.5 + 0.125 * epoch } },
      ],
      wallTime: prefix.length,
    })),
  );

describe('readCurveLogs', () => {
  it('reads a Keras TensorBoard log folder with train/ and validation/ runs', async () => {
    const root = tree({
      'logs/fit/train/events.out.tfevents.1.host': kerasEvents('train', 1),
      'logs/fit/validation/events.out.tfevents.2.host': kerasEvents('validation', 1.5),
      'logs/fit/notes.txt': 'not a log',
    });
    const { read, catalogue } = await readCurveLogs(
      'tensorboard',
      [at(root, 'logs/fit')],
      nodeCurveLogFs,
    );
    expect(read.series.map((s) => s.name).sort()).toEqual([
      'train/epoch_accuracy',
      'train/epoch_loss',
      'validation/epoch_accuracy',
      'validation/epoch_loss',
    ]);
    const curve = buildCurve(read, catalogue, { metric: 'accuracy' });
    expect(curve).toMatchObject({
      train: 'train/epoch_accuracy',
      validation: 'validation/epoch_accuracy',
    });
    expect(curve.points).toEqual([
      { x: 0, train: 0.5, validation: 0.5 },
      { x: 1, train: 0.625, validation: 0.625 },
      { x: 2, train: 0.75, validation: 0.75 },
    ]);
    expect(curve.files).toEqual([
      'logs/fit/validation/events.out.tfevents.2.host',
      'logs/fit/train/events.out.tfevents.1.host',
    ]);
    // The same two files named one by one give the same series names.
    const named = await readCurveLogs(
      'tensorboard',
      [
        at(root, 'logs/fit/train/events.out.tfevents.1.host'),
        at(root, 'logs/fit/validation/events.out.tfevents.2.host'),
      ],
      nodeCurveLogFs,
    );
    expect(named.read.series.map((s) => s.name).sort()).toEqual(
      read.series.map((s) => s.name).sort(),
    );
  });

  it('asks which Lightning version to read, and maps steps to epochs', async () => {
    const version = (loss: number) =>
      eventFile([
        {
          step: 9,
          values: [
            { tag: 'epoch', simple: 0 },
            { tag: 'train_loss', simple: loss },
          ],
        },
        { step: 9, values: [{ tag: 'val_loss', simple: loss + 0.25 }] },
        {
          step: 19,
          values: [
            { tag: 'epoch', simple: 1 },
            { tag: 'train_loss', simple: loss / 2 },
          ],
        },
        { step: 19, values: [{ tag: 'val_loss', simple: loss / 2 + 0.25 }] },
      ]);
    const root = tree({
      'lightning_logs/version_0/events.out.tfevents.1.a': version(1),
      'lightning_logs/version_1/events.out.tfevents.1.b': version(0.5),
    });
    await expect(
      readCurveLogs('tensorboard', [at(root, 'lightning_logs')], nodeCurveLogFs).then((r) =>
        buildCurve(r.read, r.catalogue),
      ),
    ).rejects.toThrow(
      'lightning_logs must hold one run, but several log "loss" (got "version_0", "version_1")',
    );
    const { read, catalogue } = await readCurveLogs(
      'tensorboard',
      [at(root, 'lightning_logs/version_1')],
      nodeCurveLogFs,
      {
        x: 'epoch',
      },
    );
    expect(buildCurve(read, catalogue).points).toEqual([
      { x: 0, train: 0.5, validation: 0.75 },
      { x: 1, train: 0.25, validation: 0.5 },
    ]);
  });

  it('reads one MLflow run, with keys holding slashes, and refuses an experiment of several runs', async () => {
    const root = tree({
      'mlruns/0/meta.yaml': 'name: Default\n',
      'mlruns/0/a1/meta.yaml': 'run_id: a1\n',
      'mlruns/0/a1/metrics/train/loss': '1 0.5 0\n2 0.25 1\n',
      'mlruns/0/a1/metrics/val/loss': '1 0.75 0\n2 0.5 1\n',
      'mlruns/0/a1/params/lr': '0.1',
      'mlruns/0/b2/metrics/val_loss': '1 0.8 0\n',
      'mlruns/.trash/c3/metrics/val_loss': '1 0.8 0\n',
    });
    await expect(readCurveLogs('mlflow', [at(root, 'mlruns')], nodeCurveLogFs)).rejects.toThrow(
      'mlruns must hold one MLflow run, but holds 2: mlruns/0/a1, mlruns/0/b2. Name the run folder',
    );
    const { read, catalogue } = await readCurveLogs(
      'mlflow',
      [at(root, 'mlruns/0/a1')],
      nodeCurveLogFs,
    );
    expect(catalogue).toEqual({ file: 'mlruns/0/a1/metrics', pointer: '', noun: 'metric' });
    const curve = buildCurve(read, catalogue);
    expect(curve).toMatchObject({ train: 'train/loss', validation: 'val/loss', x: 'step' });
    expect(curve.points).toEqual([
      { x: 0, train: 0.5, validation: 0.75 },
      { x: 1, train: 0.25, validation: 0.5 },
    ]);
    // Run from inside the metrics folder: keys are still the paths under it.
    const inside = await readCurveLogs(
      'mlflow',
      [{ path: join(root, 'mlruns/0/a1/metrics'), display: '.' }],
      nodeCurveLogFs,
    );
    expect(inside.read.series.map((s) => s.name).sort()).toEqual(['train/loss', 'val/loss']);
    const files = await readCurveLogs(
      'mlflow',
      [at(root, 'mlruns/0/a1/metrics/train/loss'), at(root, 'mlruns/0/b2/metrics/val_loss')],
      nodeCurveLogFs,
    );
    expect(files.read.series.map((s) => s.name)).toEqual(['train/loss', 'val_loss']);
  });

  it('asks which CSV or JSON file a folder means, and says what is missing', async () => {
    const root = tree({
      'lightning_logs/version_0/metrics.csv': 'epoch,step,val_loss\n0,9,0.5\n',
      'lightning_logs/version_0/hparams.yaml': '',
      'lightning_logs/version_1/metrics.csv': 'epoch,step,val_loss\n0,9,0.4\n',
      'boost/evals.json': '{"train": {"rmse": [2, 1]}, "eval": {"rmse": [3, 2]}}',
      'empty/readme.md': '',
    });
    await expect(
      readCurveLogs('csv-log', [at(root, 'lightning_logs')], nodeCurveLogFs),
    ).rejects.toThrow(
      'lightning_logs must hold one CSV log (*.csv), but holds 2: lightning_logs/version_0/metrics.csv, lightning_logs/version_1/metrics.csv. Name the one to import.',
    );
    const one = await readCurveLogs(
      'csv-log',
      [at(root, 'lightning_logs/version_1')],
      nodeCurveLogFs,
    );
    expect(one.catalogue.file).toBe('lightning_logs/version_1/metrics.csv');
    const boost = await readCurveLogs('evals-result', [at(root, 'boost')], nodeCurveLogFs);
    expect(buildCurve(boost.read, boost.catalogue).points).toEqual([
      { x: 1, train: 2, validation: 3 },
      { x: 2, train: 1, validation: 2 },
    ]);
    await expect(readCurveLogs('tensorboard', [at(root, 'empty')], nodeCurveLogFs)).rejects.toThrow(
      'empty must hold a TensorBoard event file (events.out.tfevents.*)',
    );
    await expect(
      readCurveLogs('csv-log', [at(root, 'nowhere.csv')], nodeCurveLogFs),
    ).rejects.toThrow('nowhere.csv does not exist');
  });

  it('opens files through the one reader it is given, after checking their size', async () => {
    const opened: string[] = [];
    const fake: CurveLogFs = {
      readFile: async (path) => {
        opened.push(path);
        return new TextEncoder().encode('epoch,loss,val_loss\n1,0.5,0.6\n');
      },
      readdir: async () => [
        { name: 'a.csv', kind: 'file' },
        { name: 'link.csv', kind: 'other' },
      ],
      stat: async (path) =>
        path.endsWith('big.csv')
          ? { kind: 'file', size: 2 ** 40 }
          : { kind: path.endsWith('.csv') ? 'file' : 'dir', size: 30 },
    };
    const { read } = await readCurveLogs('csv-log', [{ path: '/logs', display: 'logs' }], fake);
    expect(read.series.map((s) => s.name)).toEqual(['loss', 'val_loss']);
    expect(opened).toEqual(['/logs/a.csv']);
    await expect(
      readCurveLogs('csv-log', [{ path: '/big.csv', display: 'big.csv' }], fake),
    ).rejects.toThrow('big.csv must be at most 64 MiB (it has 1099511627776 bytes)');
    expect(opened).toEqual(['/logs/a.csv']);
  });
});
