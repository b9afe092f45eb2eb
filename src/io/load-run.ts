/**
 * Reads one run artifact from disk: JSON, schema and semantic validation, the sha256 of its bytes,
 * the predictions file beside it (checked, and opened again for each pass of the CSV reader), and
 * an epoch log mapped by the config. Every file goes through `open-untrusted.ts`. Adapter; throws
 * InputError.
 */
import { createHash } from 'node:crypto';
import { lstat } from 'node:fs/promises';
import { dirname, relative, resolve, sep } from 'node:path';
import { InputError, type Issue } from '../model/errors.js';
import type { EpochLogMapping } from '../model/config.js';
import type { PredictionsFile } from '../artifact/predictions.js';
import { parseJson } from '../artifact/read-json.js';
import type { Note } from '../model/review.js';
import type { RunArtifact } from '../model/run.js';
import { semanticIssues, validateRun } from '../validate/run.js';
import {
  DEFAULT_FILE_LIMITS,
  MissingFileError,
  decodeUtf8,
  openChecked,
  readChecked,
  streamChecked,
  bytesChecked,
  type FileLimits,
  type UntrustedFile,
} from './open-untrusted.js';

/** A file that was read for a review: its real path and device:inode. */
export interface ReadFile {
  realPath: string;
  id: string;
}

export interface LoadedRun {
  artifact: RunArtifact;
  /** Path as the user gave it (for messages). */
  file: string;
  sha256: string;
  /** Resolved predictions CSV path, when the artifact names one. */
  predictionsPath: string | null;
  /** The predictions CSV, opened afresh (and checked again) for every pass. */
  predictions: PredictionsFile | null;
  /** What the loader did that the review should mention. */
  notes: Note[];
  /** Every file read (the artifact, its predictions, its epoch log). */
  read: ReadFile[];
}

export interface LoadRunOptions {
  epochLog?: EpochLogMapping;
  displayName?: string;
  limits?: FileLimits;
  /** Receives every stream or byte source opened for the predictions, so the caller can close them all. */
  track?: (opened: Closable) => void;
}

/** Something opened for the predictions: a stream, or a byte source (closed through `destroy`). */
export interface Closable {
  destroy(): void;
}

/** A path named inside an artifact, resolved against its folder; must not leave the folder. */
function besideArtifact(artifactPath: string, name: string): string | null {
  const folder = resolve(dirname(artifactPath));
  const target = resolve(folder, name);
  const rel = relative(folder, target);
  if (
    rel === '' ||
    rel.startsWith('..') ||
    rel.includes(`..${sep}`) ||
    resolve(folder, rel) !== target
  )
    return null;
  return target;
}

/** `runs/epochs.csv` for an epoch log next to `runs/run.json`, as the user would name it. */
function besideName(file: string, name: string): string {
  return `${dirname(file) === '.' ? '' : `${dirname(file)}/`}${name}`;
}

/** A predictions CSV as the CSV reader takes it: opened (and checked) afresh for every pass. */
export function predictionsSource(
  target: UntrustedFile,
  track?: (opened: Closable) => void,
): PredictionsFile {
  return {
    file: target.file,
    open: async () => {
      const { stream } = await streamChecked(target);
      track?.(stream);
      return stream;
    },
    openBytes: async () => {
      const bytes = await bytesChecked(target);
      track?.({ destroy: () => void bytes.close() });
      return bytes;
    },
  };
}

/**
 * The artifact's text and the sha256 of its bytes. The bytes are not kept: a large artifact (a
 * curve of a million points is about 50 MB) would otherwise be held twice while it is parsed.
 */
async function readArtifactText(
  path: string,
  file: string,
  limits: FileLimits,
): Promise<{ text: string; sha256: string; checked: { realPath: string; id: string } }> {
  const { bytes, file: checked } = await readChecked({
    path,
    file,
    what: 'a run artifact (JSON)',
    limit: 'artifactBytes',
    limits,
  });
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  return { text: decodeUtf8(bytes, file, 'a run artifact'), sha256, checked };
}

export async function loadRun(path: string, options: LoadRunOptions = {}): Promise<LoadedRun> {
  const file = options.displayName ?? path;
  const limits = options.limits ?? DEFAULT_FILE_LIMITS;
  const folder = dirname(resolve(path));
  const { text, sha256, checked } = await readArtifactText(path, file, limits);
  const read: ReadFile[] = [{ realPath: checked.realPath, id: checked.id }];
  const artifact = validateRun(parseJson(text, file), file);
  const notes: Note[] = [];

  let predictionsPath: string | null = null;
  let predictions: PredictionsFile | null = null;
  if (artifact.predictions !== undefined) {
    predictionsPath = besideArtifact(path, artifact.predictions.path);
    const issue: Issue = {
      file,
      pointer: '/predictions/path',
      expected: "must name a CSV file inside the artifact's folder",
      got: JSON.stringify(artifact.predictions.path),
      hint: 'Put the predictions CSV next to the artifact, or remove "predictions".',
    };
    if (predictionsPath === null) throw new InputError([issue]);
    const target: UntrustedFile = {
      path: predictionsPath,
      file: besideName(file, artifact.predictions.path),
      what: 'a predictions CSV',
      folder,
      limit: 'csvBytes',
      limits,
    };
    // Checked now, so a missing or refused file is reported with the artifact's other problems.
    const first = await openChecked(target).catch((error: unknown) => {
      if (error instanceof MissingFileError)
        throw new InputError([
          { ...issue, expected: 'must name an existing file next to the artifact' },
        ]);
      throw error;
    });
    await first.handle.close();
    read.push({ realPath: first.realPath, id: first.id });
    predictions = predictionsSource(target, options.track);
  }

  if (options.epochLog !== undefined) {
    const logPath = besideArtifact(path, options.epochLog.file);
    const logName = besideName(file, options.epochLog.file);
    const present = logPath !== null && (await lstat(logPath).catch(() => null)) !== null;
    if (logPath !== null && present) {
      if (artifact.curves?.epochs !== undefined) {
        notes.push({ code: 'epoch-log-not-used', file, log: logName });
      } else {
        const log = await readChecked({
          path: logPath,
          file: logName,
          what: 'an epoch log (CSV)',
          folder,
          limit: 'artifactBytes',
          limits,
        });
        read.push({ realPath: log.file.realPath, id: log.file.id });
        const logText = decodeUtf8(log.bytes, logName, 'an epoch log');
        // Loaded only when a log is mapped: the log readers are not needed otherwise.
        const { parseEpochLog } = await import('../artifact/epoch-log.js');
        artifact.curves = {
          ...artifact.curves,
          epochs: parseEpochLog(logText, logName, options.epochLog),
        };
        // The mapped curve meets the same rules as an artifact's own (range, increasing x).
        const issues = semanticIssues(artifact, `${file} (with ${logName})`);
        if (issues.length > 0) throw new InputError(issues);
      }
    } else {
      notes.push({ code: 'epoch-log-missing', file, log: logName });
    }
  }
  return { artifact, file, sha256, predictionsPath, predictions, notes, read };
}
