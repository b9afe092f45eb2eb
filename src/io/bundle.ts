/**
 * The bundle that carries a pull request's runs from the untrusted `pull_request` workflow to the
 * trusted `workflow_run` publish step. It holds inputs, never conclusions:
 *
 *   pull-request.json          which PR and head commit the runs are for
 *   baseline/run.json          the baseline run artifact, as reviewed
 *   baseline/predictions.csv   its predictions, when it has them
 *   candidate/run.json         the candidate run artifact, as reviewed
 *   candidate/predictions.csv  its predictions, when it has them
 *   review.json                the PR side's own review, for people; the publish step ignores it
 *
 * The publish step extracts only these names (nothing else is inflated), each within the archive's
 * byte budget, into a fresh folder, and then reads them through the same checks as any input:
 * `open-untrusted.ts` (real path, regular file, size), the strict JSON reader, the run schema.
 * It recomputes the review itself with the trusted config.
 */
import { mkdir, mkdtemp, writeFile } from 'node:fs/promises';
import { createWriteStream } from 'node:fs';
import { pipeline } from 'node:stream/promises';
import { join } from 'node:path';
import type { ErrorObject } from 'ajv';
import { InputError } from '../model/errors.js';
import type { Issue } from '../model/errors.js';
import { parseJson } from '../artifact/read-json.js';
import { listEntries, readEntry } from './github/zip.js';
import type { LoadedRun } from './load-run.js';
import { decodeUtf8, readChecked, type FileLimits } from './open-untrusted.js';
import validatePullRequestSchema from '../validate/generated/pull-request-note.js';

import { PREDICTIONS_FILE, PULL_REQUEST_FILE, REVIEW_FILE, RUN_FILE } from './bundle-files.js';

export { PREDICTIONS_FILE, PULL_REQUEST_FILE, REVIEW_FILE, RUN_FILE };
export const SIDES = ['baseline', 'candidate'] as const;
export type Side = (typeof SIDES)[number];

export interface PullRequestNote {
  format: 'fitgap-pull-request/1';
  /** `owner/repo` of the base repository. */
  repository: string;
  number: number;
  headSha: string;
}

// Generated at build time from bundle-schemas.ts (scripts/gen-validators.mjs): no schema is
// compiled when the action starts.
const validatePullRequest = validatePullRequestSchema as {
  (data: unknown): data is PullRequestNote;
  errors?: ErrorObject[] | null;
};

/** The note, from text already read under the checks; refused unless it matches the schema exactly. */
export function parsePullRequestNote(text: string, file: string): PullRequestNote {
  const doc = parseJson(text, file);
  if (!validatePullRequest(doc)) {
    throw new InputError(
      (validatePullRequest.errors ?? []).map((e): Issue => ({
        file,
        pointer: e.instancePath || '/',
        expected: e.message ?? 'is invalid',
        hint: 'The note is written by fitgap in review mode; upload its "report-dir" unchanged.',
      })),
    );
  }
  return doc;
}

/** The runs as reviewed (an epoch log already merged), with the predictions at a fixed name. */
export async function writeBundle(
  dir: string,
  runs: Record<Side, LoadedRun>,
  note: PullRequestNote,
): Promise<void> {
  await mkdir(dir, { recursive: true });
  await writeFile(join(dir, PULL_REQUEST_FILE), `${JSON.stringify(note, null, 2)}\n`);
  for (const side of SIDES) {
    const run = runs[side];
    const folder = join(dir, side);
    await mkdir(folder, { recursive: true });
    const artifact =
      run.artifact.predictions === undefined
        ? run.artifact
        : { ...run.artifact, predictions: { ...run.artifact.predictions, path: PREDICTIONS_FILE } };
    await writeFile(join(folder, RUN_FILE), `${JSON.stringify(artifact, null, 2)}\n`);
    if (run.predictions !== null)
      await pipeline(
        await run.predictions.open(),
        createWriteStream(join(folder, PREDICTIONS_FILE)),
      );
  }
}

export interface ExtractedBundle {
  note: PullRequestNote;
  /** Paths of the extracted run artifacts. */
  runs: Record<Side, string>;
  folder: string;
}

/**
 * Extracts the bundle's known files from an uploaded archive into a fresh folder under `tempDir`
 * and reads the note. Refuses an archive without a note or a candidate run; an unknown entry is
 * left in the archive.
 */
export async function extractBundle(options: {
  zip: Uint8Array;
  label: string;
  tempDir: string;
  limitBytes: number;
  limits: FileLimits;
}): Promise<ExtractedBundle> {
  const { zip, label } = options;
  const entries = listEntries(zip, label).filter((e) => !e.directory);
  const wanted = [
    PULL_REQUEST_FILE,
    ...SIDES.flatMap((side) => [`${side}/${RUN_FILE}`, `${side}/${PREDICTIONS_FILE}`]),
  ];
  for (const name of [PULL_REQUEST_FILE, ...SIDES.map((side) => `${side}/${RUN_FILE}`)]) {
    if (entries.filter((e) => e.name === name).length !== 1) {
      throw new InputError([
        {
          file: label,
          pointer: '',
          expected: `must hold ${name} exactly once`,
          got: entries.some((e) => e.name === name) ? 'more than one' : 'none',
          hint: 'Upload the "report-dir" output of the review step (fitgap 0.2 or later) unchanged.',
        },
      ]);
    }
  }
  await mkdir(options.tempDir, { recursive: true });
  const folder = await mkdtemp(join(options.tempDir, 'bundle-'));
  const budget = { remaining: options.limitBytes, limit: options.limitBytes };
  for (const entry of entries) {
    if (!wanted.includes(entry.name)) continue;
    const bytes = readEntry(zip, entry, budget, label);
    const [side, base] = entry.name.includes('/') ? entry.name.split('/') : [null, entry.name];
    if (side !== null) await mkdir(join(folder, side), { recursive: true });
    // `wx`: a fresh folder, never through something already there.
    await writeFile(join(folder, ...(side === null ? [] : [side]), base ?? ''), bytes, {
      flag: 'wx',
    });
  }
  const noteFile = `${label} ${PULL_REQUEST_FILE}`;
  const { bytes } = await readChecked({
    path: join(folder, PULL_REQUEST_FILE),
    file: noteFile,
    what: 'a pull-request note (JSON)',
    limit: 'artifactBytes',
    limits: options.limits,
  });
  const note = parsePullRequestNote(decodeUtf8(bytes, noteFile, 'a pull-request note'), noteFile);
  return {
    note,
    runs: {
      baseline: join(folder, 'baseline', RUN_FILE),
      candidate: join(folder, 'candidate', RUN_FILE),
    },
    folder,
  };
}
