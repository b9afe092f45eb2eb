/** `fitgap curves import`: a training log in, a run artifact's `curves.epochs` out. */
import { identify } from '../../io/write-output.js';
import type { ReadFile } from '../../io/load-run.js';
import { resolve } from 'node:path';
import {
  CURVE_LOG_FORMATS,
  buildCurve,
  type CurveLogFormat,
} from '../../artifact/curve-logs/index.js';
import { EXIT, UsageError } from '../../model/errors.js';
import { MAX_EPOCH_POINTS, MAX_MAGNITUDE } from '../../model/limits.js';
import { nodeCurveLogFs, readCurveLogs, type CurveLogFs } from '../../io/curve-logs.js';
import { curveImportNotes } from '../../report/curve-log-notes.js';
import { parseFlags } from './args.js';
import type { CliIo } from './io.js';

export const CURVES_HELP = `Usage: fitgap curves import --from FORMAT PATH... --out FILE [options]

Commands:
  import     turn a training log into a run artifact's epoch curve

Run 'fitgap curves import --help' for its options.
`;

export const CURVES_IMPORT_HELP = `Usage: fitgap curves import --from FORMAT PATH... --out FILE [options]

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
`;

const FLAGS = {
  from: { type: 'string' },
  out: { type: 'string' },
  train: { type: 'string' },
  validation: { type: 'string' },
  metric: { type: 'string' },
  x: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
} as const;

const COMMAND = 'curves import';

function text(values: Record<string, string | boolean | undefined>, flag: string) {
  const value = values[flag];
  if (value === '') throw new UsageError(`fitgap ${COMMAND}: --${flag} must not be empty.`);
  return typeof value === 'string' ? value : undefined;
}

export async function curvesImportCommand(
  argv: string[],
  io: CliIo,
  fs: CurveLogFs = nodeCurveLogFs,
): Promise<number> {
  const { values, positionals } = parseFlags(argv, FLAGS, COMMAND);
  if (values['help'] === true) {
    io.stdout(CURVES_IMPORT_HELP);
    return EXIT.ok;
  }
  const from = text(values, 'from');
  if (from === undefined || !(CURVE_LOG_FORMATS as readonly string[]).includes(from)) {
    throw new UsageError(
      `fitgap ${COMMAND}: --from must be one of ${CURVE_LOG_FORMATS.join(', ')}${
        from === undefined ? '' : ` (got ${JSON.stringify(from)})`
      }. Run 'fitgap ${COMMAND} --help'.`,
    );
  }
  const format = from as CurveLogFormat;
  const out = text(values, 'out');
  if (out === undefined)
    throw new UsageError(
      `fitgap ${COMMAND}: --out FILE is required. Run 'fitgap ${COMMAND} --help'.`,
    );
  if (positionals.length === 0)
    throw new UsageError(`fitgap ${COMMAND}: name at least one log file or folder.`);
  const x = text(values, 'x');
  if (x !== undefined && x !== 'epoch' && x !== 'step')
    throw new UsageError(
      `fitgap ${COMMAND}: --x must be epoch or step (got ${JSON.stringify(x)}).`,
    );
  if (x !== undefined && format === 'evals-result')
    throw new UsageError(
      `fitgap ${COMMAND}: --x does not apply to evals-result; x is the boosting round.`,
    );
  const train = text(values, 'train');
  const validation = text(values, 'validation');
  const metric = text(values, 'metric');

  const paths = positionals.map((p) => ({ path: resolve(io.cwd, p), display: p }));
  const { read, catalogue } = await readCurveLogs(format, paths, fs, x === undefined ? {} : { x });
  // The curve meets the artifact's rules for an epoch curve here, before anything is written.
  const curve = buildCurve(read, catalogue, {
    maxMagnitude: MAX_MAGNITUDE,
    maxPoints: MAX_EPOCH_POINTS,
    ...(train === undefined ? {} : { train }),
    ...(validation === undefined ? {} : { validation }),
    ...(metric === undefined ? {} : { metric }),
  });
  const epochs = curve.points.map((p) =>
    p.train === undefined
      ? { x: p.x, validation: p.validation }
      : { x: p.x, train: p.train, validation: p.validation },
  );
  // --out must not overwrite a log it read.
  const inputs = (await Promise.all(paths.map((p) => identify(p.path)))).filter(
    (f): f is ReadFile => f !== null,
  );
  await io.writeFile(resolve(io.cwd, out), `${JSON.stringify({ epochs }, null, 2)}\n`, {
    file: out,
    inputs,
  });
  for (const line of curveImportNotes(curve, out)) io.stderr(`fitgap: ${line}\n`);
  return EXIT.ok;
}

/** `fitgap curves SUBCOMMAND`. */
export async function curvesCommand(
  argv: string[],
  io: CliIo,
  fs: CurveLogFs = nodeCurveLogFs,
): Promise<number> {
  const [sub, ...rest] = argv;
  if (sub === 'import') return curvesImportCommand(rest, io, fs);
  if (sub === undefined || sub === '--help' || sub === '-h' || sub === 'help') {
    io.stdout(CURVES_HELP);
    return sub === undefined ? EXIT.badInput : EXIT.ok;
  }
  throw new UsageError(
    `fitgap curves: unknown command ${JSON.stringify(sub)}. Run 'fitgap curves --help'.`,
  );
}
