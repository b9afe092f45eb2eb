/** The JSON report (and, on a PR, the note of which PR and commit it was made for) on disk. */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { Review } from '../../model/review.js';
import { renderJson } from '../../report/json.js';
import { PULL_REQUEST_FILE, REVIEW_FILE } from './bundle.js';
import type { PullRequestNote } from './bundle.js';

export interface ReportFiles {
  /** Folder to upload as the report artifact for the publish workflow. */
  dir: string;
  /** The `fitgap-review/1` JSON report. */
  path: string;
}

/** The `fitgap-review/1` JSON text. */
export function reviewJson(review: Review): string {
  return renderJson(review);
}

export async function writeReportFiles(
  dir: string,
  review: Review,
  note: PullRequestNote | null,
): Promise<ReportFiles> {
  await mkdir(dir, { recursive: true });
  const path = join(dir, REVIEW_FILE);
  await writeFile(path, reviewJson(review));
  if (note !== null)
    await writeFile(join(dir, PULL_REQUEST_FILE), `${JSON.stringify(note, null, 2)}\n`);
  return { dir, path };
}
