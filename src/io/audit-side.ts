/**
 * One side of an audited review, read from somewhere other than the working tree (a commit, the
 * contents API, a workflow artifact): the run artifact's bytes and the files it names beside it
 * (predictions CSV, epoch log) are written under a private temp folder with the same relative
 * layout, then loaded and validated exactly as `fitgap review` loads files.
 */
import { createHash } from 'node:crypto';
import { mkdir, writeFile } from 'node:fs/promises';
import { dirname, join, posix } from 'node:path';
import type { EpochLogMapping } from '../model/config.js';
import type { SourceFile } from '../model/audit.js';
import { loadRun } from './load-run.js';
import type { LoadedRun } from './load-run.js';

export interface SideFile {
  /** Relative posix path (repository- or archive-relative). */
  path: string;
  bytes: Uint8Array;
}

/** Largest file an audit reads from history or the API. */
export const DEFAULT_MAX_FILE_BYTES = 64 * 1024 * 1024;

/**
 * The relative path of a file an artifact at `artifactPath` names as `name` (resolved against its
 * folder), or null when it would leave that folder, as `loadRun` requires.
 */
export function besideArtifact(artifactPath: string, name: string): string | null {
  const folder = posix.dirname(artifactPath);
  if (name.includes('\\') || posix.isAbsolute(name)) return null;
  const joined = posix.normalize(posix.join(folder, name));
  const inside = folder === '.' ? joined : joined.slice(folder.length + 1);
  if (folder !== '.' && !joined.startsWith(`${folder}/`)) return null;
  if (inside === '' || inside === '.' || inside.startsWith('../') || inside === '..') return null;
  return joined;
}

/** The predictions path an artifact names, read loosely (validation comes later), or null. */
export function namedPredictions(bytes: Uint8Array): string | null {
  try {
    const doc: unknown = JSON.parse(new TextDecoder().decode(bytes));
    const path = (doc as { predictions?: { path?: unknown } } | null)?.predictions?.path;
    return typeof path === 'string' ? path : null;
  } catch {
    return null;
  }
}

/** The relative paths of the files to fetch beside an artifact. */
export function filesBeside(
  artifactPath: string,
  artifactBytes: Uint8Array,
  epochLog: EpochLogMapping | undefined,
): string[] {
  const names = [namedPredictions(artifactBytes), epochLog?.file ?? null];
  return [
    ...new Set(
      names.flatMap((name) => {
        const path = name === null ? null : besideArtifact(artifactPath, name);
        return path === null ? [] : [path];
      }),
    ),
  ];
}

export function sha256(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

export interface LoadSideOptions {
  /** Private folder for this side's files; created here. */
  dir: string;
  artifact: SideFile;
  beside: SideFile[];
  /** Name in messages and in the review's notes (stable across runs: no temp path). */
  displayName: string;
  epochLog?: EpochLogMapping;
}

/** Writes the side's files under `dir` and loads the run. Throws `InputError` when invalid. */
export async function loadSide(options: LoadSideOptions): Promise<LoadedRun> {
  for (const file of [options.artifact, ...options.beside]) {
    const target = join(options.dir, ...file.path.split('/'));
    await mkdir(dirname(target), { recursive: true });
    await writeFile(target, file.bytes);
  }
  return loadRun(join(options.dir, ...options.artifact.path.split('/')), {
    displayName: options.displayName,
    ...(options.epochLog === undefined ? {} : { epochLog: options.epochLog }),
  });
}

/** Source entries of a side's files, in a fixed order (artifact first, then by path). */
export function sideSources(
  commit: string | null,
  artifact: SideFile,
  beside: SideFile[],
  from?: { name: string; runId: number },
): SourceFile[] {
  const entry = (file: SideFile): SourceFile => ({
    commit,
    path: file.path,
    sha256: sha256(file.bytes),
    ...(from === undefined ? {} : { artifact: from }),
  });
  return [entry(artifact), ...[...beside].sort((a, b) => (a.path < b.path ? -1 : 1)).map(entry)];
}
