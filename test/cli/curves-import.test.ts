/** `fitgap curves import`, run in-process on logs the test writes into a temp folder. */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { validateRun } from '../../src/validate/run.js';
import { CURVES_HELP, CURVES_IMPORT_HELP } from '../../src/entries/cli/curves-import.js';
import { runCli } from '../../src/entries/cli/main.js';
import { fakeIo } from './fake-io.js';

const KERAS = 'epoch,accuracy,loss,val_accuracy,val_loss\n0,0.7,0.6,0.65,0.7\n1,0.8,0.4,0.75,0.5\n';

function folder(files: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'fitgap-curves-'));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
  return dir;
}

describe('fitgap curves import', () => {
  it('pins its help text', async () => {
    expect(CURVES_IMPORT_HELP)
      .toBe(`Usage: fitgap curves import --from FORMAT PATH... --out FILE [options]

Read a training log and write its epoch curve as {"epochs": [{x, train, validation}]},
the shape of a run artifact's "curves". PATH is a log file or a folder to search.

Formats (--from):
  csv-log         per-epoch CSV (Keras CSVLogger; Lightning CSVLogger's metrics.csv)
  tensorboard     TensorBoard event files (events.out.tfevents.*)
  mlflow          an MLflow run folder (mlruns/EXPERIMENT/RUN) or its metric files
  evals-result    XGBoost or LightGBM evals_result JSON (x: boosting round from 1)

Options:
  --from FORMAT         log format (required)
  --out FILE            file to write the curve JSON to (required)
  --train SERIES        training series (default: picked by name, such as loss)
  --validation SERIES   validation series (default: picked by name, such as val_loss)
  --metric NAME         the run's metric (accuracy, error, rmse, ...): pick its series
                        and convert accuracy/error and MSE/RMSE into its units
  --x epoch|step        x for csv-log (the column), tensorboard and mlflow (epoch: via
                        the logged "epoch" series); default epoch for csv-log, else step
  -h, --help            show this help

Values of one series at the same x are averaged; points are sorted by x.
Exit codes: 0 curve written; 2 bad input or usage.
`);
    expect(CURVES_HELP).toBe(`Usage: fitgap curves import --from FORMAT PATH... --out FILE [options]

Commands:
  import     turn a training log into a run artifact's epoch curve

Run 'fitgap curves import --help' for its options.
`);
    const { io, stdout } = fakeIo('.');
    expect(await runCli(['curves', 'import', '--help'], io)).toBe(0);
    expect(stdout()).toBe(CURVES_IMPORT_HELP);
    const bare = fakeIo('.');
    expect(await runCli(['curves'], bare.io)).toBe(2);
    expect(bare.stdout()).toBe(CURVES_HELP);
  });

  it('writes {"epochs": [...]} that a run artifact accepts, and says what it took', async () => {
    const dir = folder({ 'training.log': KERAS });
    const { io, stderr, files } = fakeIo(dir);
    const code = await runCli(
      [
        'curves',
        'import',
        '--from',
        'csv-log',
        'training.log',
        '--metric',
        'accuracy',
        '--out',
        'curves.json',
      ],
      io,
    );
    expect(stderr()).toBe(
      'fitgap: Picked train "accuracy" and validation "val_accuracy" from training.log (x: epoch); wrote 2 point(s) to curves.json. Others: "val_loss".\n',
    );
    expect(code).toBe(0);
    const written = files.get(resolve(dir, 'curves.json')) ?? '';
    expect(written).toBe(`{
  "epochs": [
    {
      "x": 0,
      "train": 0.7,
      "validation": 0.65
    },
    {
      "x": 1,
      "train": 0.8,
      "validation": 0.75
    }
  ]
}
`);
    const artifact = JSON.parse(readFileSync('test/fixtures/bad/good.json', 'utf8')) as Record<
      string,
      unknown
    >;
    artifact['metric'] = { name: 'accuracy', goal: 'maximize', kind: 'proportion' };
    artifact['curves'] = JSON.parse(written) as unknown;
    expect(() => validateRun(artifact, 'run.json')).not.toThrow();
  });

  it('warns when it takes a loss, and honours --train/--validation', async () => {
    const dir = folder({ 'training.log': KERAS, 'history.csv': KERAS });
    const picked = fakeIo(dir);
    // A folder is searched for its one *.csv.
    await runCli(['curves', 'import', '--from', 'csv-log', dir, '--out', 'c.json'], picked.io);
    expect(picked.stderr()).toContain(`from ${dir}/history.csv (x: epoch)`);
    expect(picked.stderr()).toContain(
      `fitgap: "val_loss" is a loss, not necessarily the run's metric; the artifact's curves must be in the metric's units.`,
    );
    const named = fakeIo(dir);
    await runCli(
      [
        'curves',
        'import',
        '--from',
        'csv-log',
        'training.log',
        '--validation',
        'val_accuracy',
        '--out',
        'c.json',
      ],
      named.io,
    );
    expect(named.stderr()).toContain(
      'fitgap: Took train "accuracy" and validation "val_accuracy" from training.log',
    );
  });

  it.each([
    [
      ['curves', 'import', 'a.csv', '--out', 'c.json'],
      'fitgap curves import: --from must be one of csv-log, tensorboard, mlflow, evals-result.',
    ],
    [
      ['curves', 'import', '--from', 'wandb', 'a', '--out', 'c.json'],
      '--from must be one of csv-log, tensorboard, mlflow, evals-result (got "wandb")',
    ],
    [
      ['curves', 'import', '--from', 'csv-log', 'a.csv'],
      'fitgap curves import: --out FILE is required.',
    ],
    [
      ['curves', 'import', '--from', 'csv-log', '--out', 'c.json'],
      'name at least one log file or folder',
    ],
    [
      ['curves', 'import', '--from', 'csv-log', 'a', '--out', 'c', '--x', 'time'],
      '--x must be epoch or step (got "time")',
    ],
    [
      ['curves', 'import', '--from', 'evals-result', 'a', '--out', 'c', '--x', 'step'],
      '--x does not apply to evals-result',
    ],
    [
      ['curves', 'import', '--from', 'csv-log', 'a', '--out', 'c', '--bogus'],
      "Unknown option '--bogus'",
    ],
    [['curves', 'export'], 'fitgap curves: unknown command "export"'],
    [
      ['curves', 'import', '--from', 'csv-log', 'missing.csv', '--out', 'c.json'],
      'missing.csv does not exist.',
    ],
  ])('%j exits 2: %s', async (args, message) => {
    const { io, stderr, files } = fakeIo(folder({}));
    expect(await runCli(args, io)).toBe(2);
    expect(stderr()).toContain(message);
    expect(stderr()).not.toMatch(/\n\s+at /);
    expect(files.size).toBe(0);
  });

  it('writes nothing when the log is bad', async () => {
    const dir = folder({ 'log.csv': 'epoch,loss,val_loss\n0,0.5,0.6\n1,0.4,nan\n' });
    const { io, stderr, files } = fakeIo(dir);
    expect(
      await runCli(['curves', 'import', '--from', 'csv-log', 'log.csv', '--out', 'c.json'], io),
    ).toBe(2);
    expect(stderr()).toBe(
      'log.csv: line 3 column "val_loss" must be a decimal number within ±1e15 (got "nan"). The run logged NaN or infinity here (it may have diverged); cut the log before this point or pick another series.\n',
    );
    expect(files.size).toBe(0);
  });

  // The bound of a run artifact's numbers (MAX_MAGNITUDE), applied while importing rather than
  // when `fitgap validate` reads the written curve.
  it('refuses a CSV value beyond ±1e15 at its line, and writes nothing', async () => {
    const dir = folder({ 'log.csv': 'epoch,loss,val_loss\n0,0.5,0.6\n1,0.4,2e15\n2,0.3,0.5\n' });
    const { io, stderr, files } = fakeIo(dir);
    expect(
      await runCli(['curves', 'import', '--from', 'csv-log', 'log.csv', '--out', 'c.json'], io),
    ).toBe(2);
    expect(stderr()).toBe(
      'log.csv: line 3 column "val_loss" must be a decimal number within ±1e15 (got "2e15"). Rescale the values (thousands instead of units); larger ones overflow in the statistics.\n',
    );
    expect(files.size).toBe(0);
  });

  it('refuses an evals_result value beyond ±1e15 at its JSON pointer, and writes nothing', async () => {
    const evals = JSON.stringify({
      train: { rmse: [3, 2, 1.5] },
      eval: { rmse: [3.5, -3e15, 2.5] },
    });
    const dir = folder({ 'evals.json': evals });
    const { io, stderr, files } = fakeIo(dir);
    expect(
      await runCli(
        ['curves', 'import', '--from', 'evals-result', 'evals.json', '--out', 'c.json'],
        io,
      ),
    ).toBe(2);
    expect(stderr()).toBe(
      'evals.json: /eval/rmse/1 "eval/rmse" must be a decimal number within ±1e15 (got "-3000000000000000"). Rescale the values (thousands instead of units); larger ones overflow in the statistics.\n',
    );
    expect(files.size).toBe(0);
  });
});
