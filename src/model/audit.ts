/**
 * The result of an audit as data: the commits of a range (or the two sides of a past pull request),
 * what was reviewed against what, and what was skipped and why. Pure data; `report/audit-*.ts`
 * renders it, `io/audit*.ts` builds it.
 */
import type { Review } from './review.js';

export interface CommitInfo {
  /** Full 40-hex commit sha. */
  sha: string;
  /** Committer date, ISO 8601 with offset, as git prints it (`%cI`); '' when unknown. */
  date: string;
  /** First line of the commit message (artifact text: escape before rendering). */
  subject: string;
}

/** One input file of a review: where it came from and the sha256 of its bytes. */
export interface SourceFile {
  /** Commit the file was read at; null for a file of the working tree (the config). */
  commit: string | null;
  /** Repository-relative path (or the entry's path inside a workflow artifact). */
  path: string;
  sha256: string;
  /** Set when the file came out of a workflow run's artifact. */
  artifact?: { name: string; runId: number };
}

export type AuditAgainst = 'previous' | 'first';

/** Why a commit was not reviewed. */
export type SkipKind =
  /** The artifact path does not exist at that commit (never added, or deleted). */
  | 'missing'
  /** The path is a folder, a symbolic link or a submodule. */
  | 'not-a-file'
  /** Larger than the size cap. */
  | 'too-large'
  /** Not a valid run artifact (JSON, schema, semantic rules, predictions). */
  | 'invalid'
  /** The same bytes as the last valid artifact: a review would say nothing new. */
  | 'unchanged'
  /** Valid, but not comparable with the baseline (another metric). */
  | 'incomparable';

export type AuditEntry =
  | {
      status: 'base';
      commit: CommitInfo;
      sources: SourceFile[];
      /** Why this commit starts a chain of reviews, when it is not the range's start. */
      note: string | null;
    }
  | {
      status: 'reviewed';
      commit: CommitInfo;
      /** Sha of the commit whose artifact was the baseline. */
      baseline: string;
      review: Review;
      /** Baseline files, then candidate files, then the config (commit null). */
      sources: SourceFile[];
    }
  | { status: 'skipped'; commit: CommitInfo; kind: SkipKind; reason: string };

export interface RangeAudit {
  /** `owner/name` from the `origin` remote, its URL without credentials, or null. */
  repository: string | null;
  /** Repository-relative path of the run artifact. */
  artifactPath: string;
  /** The range's start (A of A..B): its artifact is the first baseline. */
  from: CommitInfo;
  /** The range's end (B). */
  to: CommitInfo;
  against: AuditAgainst;
  /**
   * The range's start, then every commit of the range, oldest first; preceded by the nearest
   * first-parent ancestor with a valid artifact when the start has none (a `base` entry).
   */
  entries: AuditEntry[];
}

/** How a side of a past pull request was found. */
export interface AuditSide {
  /** Commit whose artifact was used. */
  commit: string;
  /** Plain statement of where it came from when that is not the obvious place, else null. */
  note: string | null;
}

export interface PullRequestAudit {
  repository: string;
  /** The PR number, or null when two commits were audited directly. */
  pullNumber: number | null;
  base: AuditSide;
  head: AuditSide;
  review: Review;
  sources: SourceFile[];
}
