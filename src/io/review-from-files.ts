/**
 * Adapter: reads two run artifacts (and their predictions CSVs) and a config file from disk,
 * validates them, and returns the review. All file I/O of a review lives here; the analysis it calls
 * is pure. Throws `InputError` for anything the user must fix.
 */
import { createHash } from 'node:crypto';
import { resolve } from 'node:path';
import { buildReview, type ReviewInput } from '../analysis/review.js';
import type { Note, PairedPredictions } from '../model/review.js';
import type { Review } from '../model/review.js';
import { loadRun, type Closable, type LoadedRun, type ReadFile } from './load-run.js';
import { checkPredictions, pairPredictions } from '../artifact/predictions.js';
import { loadConfig } from './load-config.js';
import { DEFAULT_SETTINGS } from '../model/settings.js';
import type { ConfigFile } from '../model/config.js';
import { InputError, quote, type Issue } from '../model/errors.js';
import { DEFAULT_FILE_LIMITS, type FileLimits } from './open-untrusted.js';

/** Settings that a CLI flag or an action input can override over the config file. */
export interface SettingsOverrides {
  alpha?: number;
  minEffect?: number;
  gapTolerance?: number;
  failOn?: string[];
  reference?: number;
}

export interface ReviewFilesOptions {
  baseline: string;
  candidate: string;
  /** Config file path; when absent `.github/fitgap.yml` under `cwd` is used if it exists. */
  config?: string;
  cwd?: string;
  overrides?: SettingsOverrides;
  /** How an override is named in messages: a flag (`--reference`) or an action input. */
  overrideLabel?: (name: string) => string;
  /** Byte limits set by flag or input; they win over the config's `limits`. */
  limits?: Partial<FileLimits>;
  /** Apply the config's epoch-log mapping (off for artifacts that were already merged). */
  epochLogs?: boolean;
  /** Names for messages and provenance, when the paths are not what a reader knows them by. */
  names?: { baseline?: string; candidate?: string; config?: string };
}

export interface InputFile {
  path: string;
  sha256: string;
}

export interface ReviewFilesResult {
  review: Review;
  files: { baseline: InputFile; candidate: InputFile; config: InputFile | null };
  /** The loaded runs (artifacts as reviewed, predictions sources). */
  runs: { baseline: LoadedRun; candidate: LoadedRun };
  /** Every file read, so an output file can be kept from overwriting one of them. */
  read: ReadFile[];
}

const MB = 1024 * 1024;

/** Flag or input limits over the config's, over the defaults. */
export function resolveLimits(config: ConfigFile, given: Partial<FileLimits> = {}): FileLimits {
  const fromConfig: Partial<FileLimits> = {};
  const artifactMb = config.limits?.['artifact-mb'];
  const csvMb = config.limits?.['csv-mb'];
  if (artifactMb !== undefined) fromConfig.artifactBytes = Math.round(artifactMb * MB);
  if (csvMb !== undefined) fromConfig.csvBytes = Math.round(csvMb * MB);
  return { ...DEFAULT_FILE_LIMITS, ...fromConfig, ...given };
}

/** A reference for a proportion metric must itself be a proportion. */
function referenceIssues(
  config: ConfigFile,
  options: ReviewFilesOptions,
  configFile: string,
  kind: string,
): Issue[] {
  if (kind !== 'proportion') return [];
  const fromFlag = options.overrides?.reference;
  const value = fromFlag ?? config.reference;
  if (value === undefined || (value >= 0 && value <= 1)) return [];
  return [
    {
      file:
        fromFlag !== undefined
          ? (options.overrideLabel?.('reference') ?? '--reference')
          : configFile,
      pointer: fromFlag !== undefined ? '' : '/reference',
      expected: 'must be within [0, 1] for a proportion metric',
      got: quote(value),
      hint: 'Write the reference as a fraction (0.02, not 2).',
    },
  ];
}

export const DEFAULT_CONFIG_PATH = '.github/fitgap.yml';

/** Config file values, then overrides, over the defaults. */
export function resolveSettings(
  config: ConfigFile,
  overrides: SettingsOverrides = {},
): ReviewInput['settings'] {
  const reference = overrides.reference ?? config.reference;
  return {
    alpha: overrides.alpha ?? config.alpha ?? DEFAULT_SETTINGS.alpha,
    minEffect: overrides.minEffect ?? config['min-effect'] ?? DEFAULT_SETTINGS.minEffect,
    gapTolerance:
      overrides.gapTolerance ?? config['gap-tolerance'] ?? DEFAULT_SETTINGS.gapTolerance,
    failOn: overrides.failOn ?? config['fail-on'] ?? [...DEFAULT_SETTINGS.failOn],
    ...(reference === undefined ? {} : { reference }),
    ...(config.guardrails === undefined
      ? {}
      : {
          guardrailMargins: new Map(
            Object.entries(config.guardrails).map(([name, g]) => [name, g.margin]),
          ),
        }),
    ...(config.hyperparameters === undefined ? {} : { hyperparameters: config.hyperparameters }),
  };
}

function sameMetric(baseline: LoadedRun, candidate: LoadedRun): Issue[] {
  const b = baseline.artifact.metric;
  const c = candidate.artifact.metric;
  return (['name', 'goal', 'kind'] as const)
    .filter((key) => b[key] !== c[key])
    .map((key) => ({
      file: candidate.file,
      pointer: `/metric/${key}`,
      expected: `must match the baseline's metric ${key} ${JSON.stringify(b[key])} (${baseline.file})`,
      got: JSON.stringify(c[key]),
      hint: 'Compare runs of the same metric; a review of different metrics would be meaningless.',
    }));
}

/** Fewest paired rows a paired test can use: a paired t-test needs two differences. */
const MIN_PAIRED_ROWS = 2;

async function pairIfBoth(
  baseline: LoadedRun,
  candidate: LoadedRun,
): Promise<{ paired?: PairedPredictions; notes: Note[] }> {
  const bp = baseline.artifact.predictions;
  const cp = candidate.artifact.predictions;
  const kind = candidate.artifact.metric.kind;
  const unpaired = async (notes: Note[]) => {
    // Not paired, but still checked: a broken file is an error whether or not it is used.
    for (const run of [baseline, candidate])
      if (run.predictions !== null) await checkPredictions(run.predictions, kind);
    return { notes };
  };
  if (
    baseline.predictions === null ||
    candidate.predictions === null ||
    bp === undefined ||
    cp === undefined
  ) {
    return unpaired(
      bp !== cp && (bp === undefined || cp === undefined)
        ? [{ code: 'predictions-in-one-run' }]
        : [],
    );
  }
  if (bp.split !== cp.split) {
    return unpaired([
      { code: 'predictions-split-mismatch', baseline: bp.split, candidate: cp.split },
    ]);
  }
  const result = await pairPredictions(baseline.predictions, candidate.predictions, kind);
  const notes: Note[] = [];
  const { unmatched, ...paired } = result;
  const issues = [
    ...reproduceIssues(baseline, paired.sides.baseline),
    ...reproduceIssues(candidate, paired.sides.candidate),
  ];
  if (issues.length > 0) throw new InputError(issues);
  const aggregate = cp.aggregate ?? 'mean';
  const repeat = cp.repeat ?? 0;
  // Pair only when the id sets match; otherwise the unpaired test decides (a note says so).
  const partial = unmatched.baseline + unmatched.candidate > 0 && result.rows > 0;
  if (result.rows < MIN_PAIRED_ROWS && !partial) {
    throw new InputError([
      {
        file: `${baseline.predictions.file} and ${candidate.predictions.file}`,
        pointer: '',
        expected: `must share at least ${MIN_PAIRED_ROWS} ids to be paired`,
        got: `${result.rows} shared (${unmatched.baseline} and ${unmatched.candidate} unmatched rows)`,
        hint: 'Write predictions of the same examples, with the same ids, for both runs.',
      },
    ]);
  }
  if (unmatched.baseline + unmatched.candidate > 0 && !partial) {
    notes.push({
      code: 'predictions-unmatched',
      rows: result.rows,
      baseline: unmatched.baseline,
      candidate: unmatched.candidate,
    });
  }
  return {
    paired: { ...paired, split: bp.split, aggregate, repeat, ...(partial ? { partial } : {}) },
    notes,
  };
}

/** Agreement the per-example values must show with the artifact's split value (see README). */
export function reproduceTolerance(
  value: number,
  rows: number,
  kind: 'proportion' | 'continuous',
): number {
  const rounding = Math.max(5e-4, 5e-4 * Math.abs(value));
  return kind === 'proportion' ? Math.max(rounding, 1 / Math.max(1, rows)) : rounding;
}

/**
 * The per-example values must reproduce the artifact's value of their split for their repeat:
 * the rate of `correct` = 1 (accuracy) or = 0 (error rate) for a proportion; the declared aggregate
 * of `loss` for a minimized continuous metric. (A maximized continuous metric such as R² is not a
 * plain aggregate of the loss and is not checked.)
 */
function reproduceIssues(run: LoadedRun, side: { n: number; mean: number }): Issue[] {
  const ref = run.artifact.predictions;
  if (ref === undefined || side.n === 0) return [];
  const metric = run.artifact.metric;
  const repeat = ref.repeat ?? 0;
  const values = run.artifact.splits[ref.split]?.values;
  const pointer = `/splits/${ref.split}/values/${repeat}`;
  const stated = values?.[repeat];
  if (stated === undefined) {
    return [
      {
        file: run.file,
        pointer: '/predictions/repeat',
        expected: `must name a repeat of split "${ref.split}" (0 to ${(values?.length ?? 1) - 1})`,
        got: String(repeat),
      },
    ];
  }
  let computed: number;
  if (metric.kind === 'proportion') {
    computed = metric.goal === 'maximize' ? side.mean : 1 - side.mean;
  } else {
    if (metric.goal === 'maximize') return [];
    const aggregate = ref.aggregate ?? 'mean';
    computed =
      aggregate === 'mean'
        ? side.mean
        : aggregate === 'sum'
          ? side.n * side.mean
          : Math.sqrt(side.mean);
  }
  if (Math.abs(computed - stated) <= reproduceTolerance(stated, side.n, metric.kind)) return [];
  const what =
    metric.kind === 'proportion'
      ? `the rate of correct = ${metric.goal === 'maximize' ? 1 : 0} over ${side.n} rows`
      : `the ${ref.aggregate ?? 'mean'} of loss over ${side.n} rows`;
  return [
    {
      file: run.file,
      pointer,
      expected: `must agree with its predictions (${ref.path}): ${what} is ${Number(computed.toPrecision(6))}, the artifact states ${stated}`,
      got: String(stated),
      hint: 'The predictions must be for this run and this repeat (set predictions.repeat), and for a continuous metric predictions.aggregate must say how loss aggregates to the value.',
    },
  ];
}

/** A maximized metric with values above 1 needs metric.best (its error level is best − value). */
function bestIssues(run: LoadedRun): Issue[] {
  const a = run.artifact;
  if (a.metric.goal !== 'maximize' || a.metric.best !== undefined) return [];
  const splits = Object.entries(a.splits) as [string, { values: number[] } | undefined][];
  for (const [name, split] of splits) {
    const index = split?.values.findIndex((v) => v > 1) ?? -1;
    if (index >= 0) {
      return [
        {
          file: run.file,
          pointer: `/splits/${name}/values/${index}`,
          expected: 'a maximized metric without metric.best must stay at or below 1',
          got: String(split?.values[index]),
          hint: 'Add metric.best, the best possible value (100 for a 0–100 score), so the error level is best − value.',
        },
      ];
    }
  }
  return [];
}

/** The config file (explicit, or `.github/fitgap.yml` under `cwd` when it exists) and its sha256. */
export async function loadReviewConfig(
  cwd: string,
  config?: string,
  limits?: Partial<FileLimits>,
): Promise<{ config: ConfigFile; file: InputFile | null; read: ReadFile[] }> {
  const configPath = resolve(cwd, config ?? DEFAULT_CONFIG_PATH);
  const loaded = await loadConfig(
    configPath,
    config ?? DEFAULT_CONFIG_PATH,
    config !== undefined,
    resolveLimits({}, limits),
  );
  if (loaded === null) return { config: {}, file: null, read: [] };
  return {
    config: loaded.config,
    read: [loaded.checked],
    file: {
      path: config ?? DEFAULT_CONFIG_PATH,
      sha256: createHash('sha256').update(loaded.text).digest('hex'),
    },
  };
}

/**
 * The review of two loaded runs: same metric checked, predictions paired when both ship them.
 * Throws `InputError` when the runs cannot be compared.
 */
export async function reviewLoadedRuns(
  baseline: LoadedRun,
  candidate: LoadedRun,
  config: ConfigFile,
  overrides?: SettingsOverrides,
): Promise<Review> {
  const mismatch = [
    ...sameMetric(baseline, candidate),
    ...bestIssues(baseline),
    ...bestIssues(candidate),
  ];
  if (mismatch.length > 0) throw new InputError(mismatch);
  const { paired, notes } = await pairIfBoth(baseline, candidate);
  return buildReview({
    baseline: baseline.artifact,
    candidate: candidate.artifact,
    settings: resolveSettings(config, overrides),
    ...(paired === undefined ? {} : { paired }),
    notes: [...baseline.notes, ...candidate.notes, ...notes],
  });
}

export async function reviewFiles(options: ReviewFilesOptions): Promise<ReviewFilesResult> {
  const cwd = options.cwd ?? '.';
  const configPath = resolve(cwd, options.config ?? DEFAULT_CONFIG_PATH);
  const configFile = options.names?.config ?? options.config ?? DEFAULT_CONFIG_PATH;
  const loaded = await loadConfig(
    configPath,
    configFile,
    options.config !== undefined,
    resolveLimits({}, options.limits),
  );
  const config = loaded?.config ?? {};
  const limits = resolveLimits(config, options.limits);
  const epochLog = options.epochLogs === false ? undefined : config['epoch-log'];
  const streams: Closable[] = [];
  const load = (path: string, name: string | undefined): Promise<LoadedRun> =>
    loadRun(resolve(cwd, path), {
      displayName: name ?? path,
      limits,
      track: (stream) => streams.push(stream),
      ...(epochLog === undefined ? {} : { epochLog }),
    });

  try {
    // Load both, so the user sees the problems of both files at once.
    const [b, c] = await Promise.allSettled([
      load(options.baseline, options.names?.baseline),
      load(options.candidate, options.names?.candidate),
    ]);
    const issues = [b, c].flatMap((r) =>
      r.status === 'rejected' ? (r.reason instanceof InputError ? r.reason.issues : []) : [],
    );
    for (const r of [b, c])
      if (r.status === 'rejected' && !(r.reason instanceof InputError)) throw r.reason;
    if (issues.length > 0 || b.status === 'rejected' || c.status === 'rejected')
      throw new InputError(issues);
    const baseline = b.value;
    const candidate = c.value;
    const reference = referenceIssues(config, options, configFile, candidate.artifact.metric.kind);
    if (reference.length > 0) throw new InputError(reference);
    const review = await reviewLoadedRuns(baseline, candidate, config, options.overrides);
    return {
      review,
      files: {
        baseline: { path: baseline.file, sha256: baseline.sha256 },
        candidate: { path: candidate.file, sha256: candidate.sha256 },
        config:
          loaded === null
            ? null
            : {
                path: configFile,
                sha256: createHash('sha256').update(loaded.text).digest('hex'),
              },
      },
      runs: { baseline, candidate },
      read: [...(loaded === null ? [] : [loaded.checked]), ...baseline.read, ...candidate.read],
    };
  } finally {
    // A reader that stopped at an error leaves its partner's file open: close every one.
    for (const stream of streams) stream.destroy();
  }
}
