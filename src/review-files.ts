/**
 * Adapter: reads two run artifacts (and their predictions CSVs) and a config file from disk,
 * validates them, and returns the review. All file I/O of a review lives here; the analysis it calls
 * is pure. Throws `InputError` for anything the user must fix.
 * (Stub: being implemented in the core issue.)
 */
import type { Review } from './analysis/types.js';

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

export async function reviewFiles(_options: ReviewFilesOptions): Promise<ReviewFilesResult> {
  throw new Error('reviewFiles: not implemented yet');
}
