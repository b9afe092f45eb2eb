/** The JSON report, and on a pull request the bundle for the publish workflow, on disk. */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { Review } from '../../model/review.js';
import { renderJson } from '../../report/json.js';
import { REVIEW_FILE } from '../../io/bundle-files.js';

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

export async function writeReportFiles(dir: string, review: Review): Promise<ReportFiles> {
  await mkdir(dir, { recursive: true });
  const path = join(dir, REVIEW_FILE);
  await writeFile(path, reviewJson(review));
  return { dir, path };
}
