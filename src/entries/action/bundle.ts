/**
 * The report bundle that carries a review from an untrusted `pull_request` workflow to the
 * `workflow_run` publish step: `review.json` (the `fitgap-review/1` report) and `pull-request.json`
 * (which PR and head commit it was made for). Both are validated before anything is trusted.
 */
import { Ajv } from 'ajv';
import type { JSONSchemaType } from 'ajv';
import { InputError } from '../../model/errors.js';
import type { Issue } from '../../model/errors.js';
import type { Review } from '../../model/review.js';
import { isReview, reviewIssues } from '../../validate/review.js';

export const REVIEW_FILE = 'review.json';
export const PULL_REQUEST_FILE = 'pull-request.json';

export interface PullRequestNote {
  format: 'fitgap-pull-request/1';
  /** `owner/repo` of the base repository. */
  repository: string;
  number: number;
  headSha: string;
}

const ajv = new Ajv({ allErrors: true });

const pullRequestSchema: JSONSchemaType<PullRequestNote> = {
  type: 'object',
  additionalProperties: false,
  required: ['format', 'repository', 'number', 'headSha'],
  properties: {
    format: { type: 'string', const: 'fitgap-pull-request/1' },
    repository: { type: 'string', pattern: '^[A-Za-z0-9_.-]{1,100}/[A-Za-z0-9_.-]{1,100}$' },
    number: { type: 'integer', minimum: 1 },
    headSha: { type: 'string', pattern: '^[0-9a-f]{40}$' },
  },
};

const validatePullRequest = ajv.compile(pullRequestSchema);

function parse(bytes: Uint8Array, file: string): unknown {
  try {
    return JSON.parse(new TextDecoder().decode(bytes));
  } catch (error) {
    throw new InputError([
      { file, pointer: '', expected: 'must be JSON', got: (error as Error).message },
    ]);
  }
}

function issues(file: string, errors: typeof validatePullRequest.errors): Issue[] {
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
  // The whole report must be a valid fitgap-review/1 before anything of it is rendered.
  const problems = reviewIssues(doc, file);
  if (problems.length > 0 || !isReview(doc)) throw new InputError(problems);
  return doc;
}
