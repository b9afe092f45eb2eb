/**
 * Reads one run artifact from disk: JSON, schema and semantic validation, the sha256 of its bytes,
 * the predictions file beside it, and an epoch log mapped by the config. Adapter; throws InputError.
 */
import { createHash } from 'node:crypto';
import { readFile, stat } from 'node:fs/promises';
import { dirname, relative, resolve, sep } from 'node:path';
import { InputError, type Issue } from '../model/errors.js';
import type { EpochLogMapping } from '../model/config.js';
import { parseEpochLog } from '../artifact/epoch-log.js';
import { parseJson } from '../artifact/read-json.js';
import type { Note } from '../model/review.js';
import type { RunArtifact } from '../model/run.js';
import { semanticIssues, validateRun } from '../validate/run.js';

export interface LoadedRun {
  artifact: RunArtifact;
  /** Path as the user gave it (for messages). */
  file: string;
  sha256: string;
  /** Resolved predictions CSV path, when the artifact names one. */
  predictionsPath: string | null;
  /** What the loader did that the review should mention. */
  notes: Note[];
}

async function readText(path: string, file: string, what: string): Promise<Buffer> {
  try {
    return await readFile(path);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new InputError([
      {
        file,
        pointer: '',
        expected: `could not be read as ${what}`,
        got:
          code === 'ENOENT'
            ? 'no such file'
            : code === 'EISDIR'
              ? 'a directory'
              : (code ?? String(error)),
        hint: 'Check the path.',
      },
    ]);
  }
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

export async function loadRun(
  path: string,
  options: { epochLog?: EpochLogMapping; displayName?: string } = {},
): Promise<LoadedRun> {
  const file = options.displayName ?? path;
  const bytes = await readText(path, file, 'a run artifact (JSON)');
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const artifact = validateRun(parseJson(bytes.toString('utf8'), file), file);
  const notes: Note[] = [];

  let predictionsPath: string | null = null;
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
    const info = await stat(predictionsPath).catch(() => null);
    if (info === null || !info.isFile())
      throw new InputError([
        { ...issue, expected: 'must name an existing file next to the artifact' },
      ]);
  }

  if (options.epochLog !== undefined) {
    const logPath = besideArtifact(path, options.epochLog.file);
    const logName = `${dirname(file) === '.' ? '' : `${dirname(file)}/`}${options.epochLog.file}`;
    const info = logPath === null ? null : await stat(logPath).catch(() => null);
    if (logPath !== null && info?.isFile() === true) {
      if (artifact.curves?.epochs !== undefined) {
        notes.push({ code: 'epoch-log-not-used', file, log: logName });
      } else {
        const text = (await readText(logPath, logName, 'an epoch log (CSV)')).toString('utf8');
        artifact.curves = {
          ...artifact.curves,
          epochs: parseEpochLog(text, logName, options.epochLog),
        };
        // The mapped curve meets the same rules as an artifact's own (range, increasing x).
        const issues = semanticIssues(artifact, `${file} (with ${logName})`);
        if (issues.length > 0) throw new InputError(issues);
      }
    } else {
      notes.push({ code: 'epoch-log-missing', file, log: logName });
    }
  }
  return { artifact, file, sha256, predictionsPath, notes };
}
