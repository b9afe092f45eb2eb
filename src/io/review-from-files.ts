/**
 * Adapter: reads two run artifacts (and their predictions CSVs) and a config file from disk,
 * validates them, and returns the review. All file I/O of a review lives here; the analysis it calls
 * is pure. Throws `InputError` for anything the user must fix.
 */
import { createHash } from 'node:crypto';
import { dirname, join, resolve } from 'node:path';
import { buildReview, type ReviewInput } from '../analysis/review.js';
import type { Note, PairedPredictions } from '../model/review.js';
import type { Review } from '../model/review.js';
import { loadRun, type LoadedRun } from './load-run.js';
import { pairPredictions } from '../artifact/predictions.js';
import { loadConfig } from './load-config.js';
import { DEFAULT_SETTINGS } from '../model/settings.js';
import type { ConfigFile } from '../model/config.js';
import { InputError, type Issue } from '../model/errors.js';

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
}

export interface InputFile {
  path: string;
  sha256: string;
}

export interface ReviewFilesResult {
  review: Review;
  files: { baseline: InputFile; candidate: InputFile; config: InputFile | null };
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

async function pairIfBoth(
  baseline: LoadedRun,
  candidate: LoadedRun,
): Promise<{ paired?: PairedPredictions; notes: Note[] }> {
  const bp = baseline.artifact.predictions;
  const cp = candidate.artifact.predictions;
  if (
    bp === undefined ||
    cp === undefined ||
    baseline.predictionsPath === null ||
    candidate.predictionsPath === null
  ) {
    return {
      notes:
        bp !== cp && (bp === undefined || cp === undefined)
          ? [{ code: 'predictions-in-one-run' }]
          : [],
    };
  }
  if (bp.split !== cp.split) {
    return {
      notes: [{ code: 'predictions-split-mismatch', baseline: bp.split, candidate: cp.split }],
    };
  }
  const result = await pairPredictions(
    { path: baseline.predictionsPath, file: join(dirname(baseline.file), bp.path) },
    { path: candidate.predictionsPath, file: join(dirname(candidate.file), cp.path) },
    candidate.artifact.metric.kind,
  );
  const notes: Note[] = [];
  const { unmatched, ...paired } = result;
  if (unmatched.baseline + unmatched.candidate > 0) {
    notes.push({
      code: 'predictions-unmatched',
      rows: result.rows,
      baseline: unmatched.baseline,
      candidate: unmatched.candidate,
    });
  }
  return { paired: { ...paired, split: bp.split }, notes };
}

export async function reviewFiles(options: ReviewFilesOptions): Promise<ReviewFilesResult> {
  const cwd = options.cwd ?? '.';
  const configPath = resolve(cwd, options.config ?? DEFAULT_CONFIG_PATH);
  const loaded = await loadConfig(
    configPath,
    options.config ?? DEFAULT_CONFIG_PATH,
    options.config !== undefined,
  );
  const config = loaded?.config ?? {};
  const epochLog = config['epoch-log'];
  const load = (path: string): Promise<LoadedRun> =>
    loadRun(resolve(cwd, path), {
      displayName: path,
      ...(epochLog === undefined ? {} : { epochLog }),
    });

  // Load both, so the user sees the problems of both files at once.
  const [b, c] = await Promise.allSettled([load(options.baseline), load(options.candidate)]);
  const issues = [b, c].flatMap((r) =>
    r.status === 'rejected' ? (r.reason instanceof InputError ? r.reason.issues : []) : [],
  );
  for (const r of [b, c])
    if (r.status === 'rejected' && !(r.reason instanceof InputError)) throw r.reason;
  if (issues.length > 0 || b.status === 'rejected' || c.status === 'rejected')
    throw new InputError(issues);
  const baseline = b.value;
  const candidate = c.value;
  const mismatch = sameMetric(baseline, candidate);
  if (mismatch.length > 0) throw new InputError(mismatch);

  const { paired, notes } = await pairIfBoth(baseline, candidate);
  const review = buildReview({
    baseline: baseline.artifact,
    candidate: candidate.artifact,
    settings: resolveSettings(config, options.overrides),
    ...(paired === undefined ? {} : { paired }),
    notes: [...baseline.notes, ...candidate.notes, ...notes],
  });
  return {
    review,
    files: {
      baseline: { path: options.baseline, sha256: baseline.sha256 },
      candidate: { path: options.candidate, sha256: candidate.sha256 },
      config:
        loaded === null
          ? null
          : {
              path: options.config ?? DEFAULT_CONFIG_PATH,
              sha256: createHash('sha256').update(loaded.text).digest('hex'),
            },
    },
  };
}
