/**
 * Finds and reads training logs for `fitgap curves import`. A PATH may be a log file or a folder
 * to search for the format's layout:
 *   csv-log       the one `*.csv` under the folder (Lightning: lightning_logs/version_N/metrics.csv)
 *   tensorboard   every `events.out.tfevents.*` under the folder; tags are prefixed with the file's
 *                 folder relative to the folders of all event files (`train/epoch_loss`)
 *   mlflow        the one run's `metrics/` folder (mlruns/<experiment>/<run>/metrics/<key>)
 *   evals-result  the one `*.json` under the folder
 * Series of the same name from several files are pooled. File access goes through `CurveLogFs`,
 * passed in so tests can fake it; files are opened in `readLogFile` only.
 */
import { readdir, stat } from 'node:fs/promises';
import { basename, dirname, join, relative, sep } from 'node:path';
import { InputError, type Issue } from '../model/errors.js';
import {
  MAX_EVENT_FILE_BYTES,
  MAX_SERIES,
  MAX_TEXT_BYTES,
  PointBudget,
  readCsvLog,
  readEvalsResult,
  readMlflowMetric,
  readTensorBoard,
  stepsToEpochs,
  type Catalogue,
  type CurveLogFormat,
  type ReadResult,
  type Series,
} from '../artifact/curve-logs/index.js';
import { DEFAULT_FILE_LIMITS, readChecked } from './open-untrusted.js';
import { MAX_MAGNITUDE } from '../model/limits.js';

export type PathKind = 'file' | 'dir' | 'other' | 'missing';

export interface CurveLogFs {
  /** Whole contents of a file; `display` names it in messages. */
  readFile(path: string, display?: string): Promise<Uint8Array>;
  /** Entries of a folder; symbolic links are `other` (not followed while searching). */
  readdir(path: string): Promise<{ name: string; kind: PathKind }[]>;
  /** What a path is (following a link the user named) and its size in bytes. */
  stat(path: string): Promise<{ kind: PathKind; size: number }>;
}

export const nodeCurveLogFs: CurveLogFs = {
  // Opened as untrusted input (real path in its folder, regular file, fixed size); the size limit
  // per format is checked by `readLogFile` first, so this one only bounds the read.
  readFile: async (path, display) =>
    (
      await readChecked({
        path,
        file: display ?? path,
        what: 'a training log',
        limit: 'artifactBytes',
        limits: {
          ...DEFAULT_FILE_LIMITS,
          artifactBytes: Math.max(MAX_EVENT_FILE_BYTES, MAX_TEXT_BYTES),
        },
      })
    ).bytes,
  readdir: async (path) =>
    (await readdir(path, { withFileTypes: true })).map((d) => ({
      name: d.name,
      kind: d.isFile() ? 'file' : d.isDirectory() ? 'dir' : 'other',
    })),
  stat: async (path) => {
    try {
      const s = await stat(path);
      return { kind: s.isFile() ? 'file' : s.isDirectory() ? 'dir' : 'other', size: s.size };
    } catch {
      return { kind: 'missing', size: 0 };
    }
  },
};

/** A path as opened (absolute) and as the user would name it in a message. */
export interface LogPath {
  path: string;
  display: string;
}

export interface ReadCurveLogsOptions {
  /** `epoch` or `step`; for csv-log the x column, for tensorboard and mlflow `epoch` maps steps via the logged `epoch`. */
  x?: 'epoch' | 'step';
}

export interface CurveLogs {
  read: ReadResult;
  catalogue: Catalogue;
}

const MAX_DEPTH = 8;
const MAX_ENTRIES = 50_000;

function problem(display: string, expected: string, hint?: string): InputError {
  const issue: Issue = { file: display, pointer: '', expected };
  if (hint !== undefined) issue.hint = hint;
  return new InputError([issue]);
}

function joinDisplay(display: string, rel: string): string {
  const d = display.replace(/[\\/]+$/, '');
  return d === '' || d === '.' ? rel : `${d}/${rel}`;
}

/** Files (or, with `dirs`, folders) under `root` whose name matches, breadth first, bounded. */
async function search(
  fs: CurveLogFs,
  root: LogPath,
  match: (name: string) => boolean,
  want: 'file' | 'dir',
): Promise<(LogPath & { rel: string })[]> {
  const found: (LogPath & { rel: string })[] = [];
  let queue: { path: string; rel: string }[] = [{ path: root.path, rel: '' }];
  let seen = 0;
  for (let depth = 0; depth <= MAX_DEPTH && queue.length > 0; depth++) {
    const next: typeof queue = [];
    for (const dir of queue) {
      const entries = await fs.readdir(dir.path);
      seen += entries.length;
      if (seen > MAX_ENTRIES)
        throw problem(
          root.display,
          `holds more than ${MAX_ENTRIES} entries to search`,
          'Name a folder closer to the log.',
        );
      for (const e of entries.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0))) {
        const rel = dir.rel === '' ? e.name : `${dir.rel}/${e.name}`;
        const path = join(dir.path, e.name);
        if (e.kind === want && match(e.name))
          found.push({ path, display: joinDisplay(root.display, rel), rel });
        if (e.kind === 'dir' && e.name !== '.trash' && e.name !== 'node_modules')
          next.push({ path, rel });
      }
    }
    queue = next;
  }
  return found;
}

/** The one place a log file is opened. */
async function readLogFile(fs: CurveLogFs, file: LogPath, maxBytes: number): Promise<Uint8Array> {
  const { kind, size } = await fs.stat(file.path);
  if (kind !== 'file') throw problem(file.display, 'must be a readable file');
  if (size > maxBytes)
    throw problem(
      file.display,
      `must be at most ${maxBytes / 1024 / 1024} MiB (it has ${size} bytes)`,
      'Import a shorter log, or thin it out first.',
    );
  return fs.readFile(file.path, file.display);
}

async function kindOf(fs: CurveLogFs, p: LogPath): Promise<PathKind> {
  const { kind } = await fs.stat(p.path);
  if (kind === 'missing' || kind === 'other')
    throw problem(p.display, kind === 'missing' ? 'does not exist' : 'must be a file or a folder');
  return kind;
}

/** The single file a folder holds for this format; several or none is an error naming them. */
async function oneFile(
  fs: CurveLogFs,
  root: LogPath,
  match: (name: string) => boolean,
  what: string,
): Promise<LogPath> {
  if ((await kindOf(fs, root)) === 'file') return root;
  const found = await search(fs, root, match, 'file');
  const [first] = found;
  if (first === undefined)
    throw problem(root.display, `must hold ${what}`, 'Name the log file itself.');
  if (found.length > 1)
    throw problem(
      root.display,
      `must hold one ${what}, but holds ${found.length}: ${found
        .slice(0, 5)
        .map((f) => f.display)
        .join(', ')}${found.length > 5 ? ', …' : ''}`,
      'Name the one to import.',
    );
  return first;
}

function pool(results: ReadResult[]): ReadResult {
  const byName = new Map<string, Series>();
  const warnings = results.flatMap((r) => r.warnings);
  for (const r of results) {
    for (const s of r.series) {
      const seen = byName.get(s.name);
      if (seen === undefined)
        byName.set(s.name, { ...s, points: [...s.points], problems: [...s.problems] });
      else {
        for (const p of s.points) seen.points.push(p);
        seen.problems.push(...s.problems.slice(0, Math.max(0, 10 - seen.problems.length)));
      }
    }
  }
  return { series: [...byName.values()], warnings };
}

function commonDir(paths: string[]): string {
  const split = paths.map((p) => dirname(p).split(sep));
  const first = split[0] ?? [];
  let n = first.length;
  for (const parts of split) {
    let i = 0;
    while (i < n && parts[i] === first[i]) i++;
    n = i;
  }
  return first.slice(0, n).join(sep);
}

async function readTensorBoardLogs(fs: CurveLogFs, paths: LogPath[], budget: PointBudget) {
  const files: LogPath[] = [];
  for (const p of paths) {
    if ((await kindOf(fs, p)) === 'file') files.push(p);
    else {
      const found = await search(fs, p, (n) => n.startsWith('events.out.tfevents.'), 'file');
      if (found.length === 0)
        throw problem(
          p.display,
          'must hold a TensorBoard event file (events.out.tfevents.*)',
          'Name the log folder of one run.',
        );
      files.push(...found);
    }
  }
  const common = commonDir(files.map((f) => f.path));
  const results: ReadResult[] = [];
  for (const f of files) {
    const label = relative(common, dirname(f.path)).split(sep).join('/');
    const read = readTensorBoard(await readLogFile(fs, f, MAX_EVENT_FILE_BYTES), f.display, {
      budget,
    });
    if (label !== '') for (const s of read.series) s.name = `${label}/${s.name}`;
    results.push(read);
  }
  return pool(results);
}

async function readMlflowLogs(fs: CurveLogFs, paths: LogPath[], budget: PointBudget) {
  const results: ReadResult[] = [];
  let catalogueFile = '';
  for (const p of paths) {
    if ((await kindOf(fs, p)) === 'file') {
      const segments = p.display.split(/[\\/]/);
      const at = segments.lastIndexOf('metrics');
      const key =
        at >= 0 && at < segments.length - 1 ? segments.slice(at + 1).join('/') : basename(p.path);
      results.push(
        readMlflowMetric(await readLogFile(fs, p, MAX_TEXT_BYTES), p.display, key, { budget }),
      );
      catalogueFile ||= p.display;
      continue;
    }
    const metricsDirs =
      basename(p.path) === 'metrics' ? [p] : await search(fs, p, (n) => n === 'metrics', 'dir');
    const [metrics] = metricsDirs;
    if (metrics === undefined)
      throw problem(
        p.display,
        'must hold an MLflow run (a metrics/ folder)',
        'Name mlruns/<experiment>/<run>.',
      );
    if (metricsDirs.length > 1)
      throw problem(
        p.display,
        `must hold one MLflow run, but holds ${metricsDirs.length}: ${metricsDirs
          .slice(0, 5)
          .map((m) => m.display.replace(/\/metrics$/, ''))
          .join(', ')}${metricsDirs.length > 5 ? ', …' : ''}`,
        'Name the run folder, mlruns/<experiment>/<run>.',
      );
    catalogueFile ||= metrics.display;
    for (const f of await search(fs, metrics, () => true, 'file')) {
      const key = f.rel;
      results.push(
        readMlflowMetric(await readLogFile(fs, f, MAX_TEXT_BYTES), f.display, key, { budget }),
      );
    }
  }
  return { read: pool(results), file: catalogueFile };
}

export async function readCurveLogs(
  format: CurveLogFormat,
  paths: LogPath[],
  fs: CurveLogFs,
  options: ReadCurveLogsOptions = {},
): Promise<CurveLogs> {
  const budget = new PointBudget();
  const shown = paths.map((p) => p.display).join(', ');
  let read: ReadResult;
  let catalogue: Catalogue;
  if (format === 'csv-log') {
    const results: ReadResult[] = [];
    const files: string[] = [];
    for (const p of paths) {
      const file = await oneFile(fs, p, (n) => /\.csv$/i.test(n), 'CSV log (*.csv)');
      files.push(file.display);
      const bytes = await readLogFile(fs, file, MAX_TEXT_BYTES);
      results.push(
        readCsvLog(bytes, file.display, {
          budget,
          // A cell beyond the artifact's bound is a problem of its column, named by its line.
          maxMagnitude: MAX_MAGNITUDE,
          ...(options.x === undefined ? {} : { x: options.x }),
        }),
      );
    }
    read = pool(results);
    catalogue = { file: files.join(', '), pointer: 'line 1', noun: 'column' };
  } else if (format === 'tensorboard') {
    read = await readTensorBoardLogs(fs, paths, budget);
    catalogue = { file: shown, pointer: '', noun: 'tag' };
  } else if (format === 'mlflow') {
    const found = await readMlflowLogs(fs, paths, budget);
    read = found.read;
    catalogue = { file: found.file, pointer: '', noun: 'metric' };
  } else {
    const results: ReadResult[] = [];
    for (const p of paths) {
      const file = await oneFile(
        fs,
        p,
        (n) => /\.json$/i.test(n),
        'evals_result JSON file (*.json)',
      );
      results.push(
        readEvalsResult(await readLogFile(fs, file, MAX_TEXT_BYTES), file.display, { budget }),
      );
    }
    read = pool(results);
    catalogue = { file: shown, pointer: '', noun: 'eval-set metric' };
  }
  if (read.series.length > MAX_SERIES)
    throw problem(shown, `must hold at most ${MAX_SERIES} series`, 'Name fewer or smaller logs.');
  if (options.x === 'epoch' && (format === 'tensorboard' || format === 'mlflow'))
    read = stepsToEpochs(read, catalogue.file);
  return { read, catalogue };
}
