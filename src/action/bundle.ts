/**
 * The report bundle that carries a review from an untrusted `pull_request` workflow to the
 * `workflow_run` publish step: `review.json` (the `fitgap-review/1` report) and `pull-request.json`
 * (which PR and head commit it was made for). Both are validated before anything is trusted.
 */
import type { ErrorObject } from 'ajv';
import validatePullRequestSchema from '../artifact/generated/pull-request-note.js';
import validateReviewSchema from '../artifact/generated/review-bundle.js';
import { InputError } from '../errors.js';
import type { Issue } from '../errors.js';
import type { Review } from '../analysis/types.js';

export const REVIEW_FILE = 'review.json';
export const PULL_REQUEST_FILE = 'pull-request.json';

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
const validateReview = validateReviewSchema;

function parse(bytes: Uint8Array, file: string): unknown {
  try {
    return JSON.parse(new TextDecoder().decode(bytes));
  } catch (error) {
    throw new InputError([
      { file, pointer: '', expected: 'must be JSON', got: (error as Error).message },
    ]);
  }
}

function issues(file: string, errors: typeof validateReview.errors): Issue[] {
  return (errors ?? []).map((e) => ({
    file,
    pointer: e.instancePath || '/',
    expected: e.message ?? 'is invalid',
  }));
}

export function readPullRequestNote(bytes: Uint8Array, label: string): PullRequestNote {
  const file = `${label} ${PULL_REQUEST_FILE}`;
  const doc = parse(bytes, file);
  if (!validatePullRequest(doc)) throw new InputError(issues(file, validatePullRequest.errors));
  return doc;
}

export function readReview(bytes: Uint8Array, label: string): Review {
  const file = `${label} ${REVIEW_FILE}`;
  const doc = parse(bytes, file);
  if (!validateReview(doc)) throw new InputError(issues(file, validateReview.errors));
  return doc as unknown as Review;
}
