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

const enumOf = (values: string[]) => ({ type: 'string', enum: values });
const delta = {
  type: 'object',
  required: ['estimate', 'test', 'call'],
  properties: { estimate: { type: 'number' }, call: enumOf(['up', 'down', 'flat']) },
};
/**
 * The parts of a review the publish step reads directly. The renderer reads the rest; a review
 * that breaks it is refused as a whole (see `publish.ts`).
 */
const reviewSchema = {
  type: 'object',
  required: [
    'format',
    'movement',
    'validation',
    'slices',
    'settings',
    'candidate',
    'baseline',
    'gate',
    'metric',
  ],
  properties: {
    format: { const: 'fitgap-review/1' },
    movement: enumOf([
      'better-on-both',
      'away-from-underfitting',
      'toward-overfitting',
      'away-from-overfitting',
      'no-significant-change',
      'toward-underfitting',
      'worse-on-both',
    ]),
    validation: {
      type: 'object',
      required: ['change', 'delta'],
      properties: { change: enumOf(['better', 'worse', 'flat']), delta },
    },
    slices: {
      type: 'array',
      items: {
        type: 'object',
        required: ['change'],
        properties: { change: enumOf(['better', 'worse', 'flat']) },
      },
    },
    settings: { type: 'object' },
    candidate: {
      type: 'object',
      required: ['diagnosis', 'components'],
      properties: {
        components: {
          type: 'object',
          required: ['overfit'],
          properties: {
            overfit: {
              type: 'object',
              required: ['present'],
              properties: { present: { type: 'boolean' } },
            },
          },
        },
        diagnosis: enumOf([
          'good-fit',
          'high-bias',
          'high-variance',
          'data-mismatch',
          'high-bias-and-variance',
        ]),
      },
    },
    baseline: { type: 'object' },
    metric: { type: 'object', required: ['name', 'goal', 'kind'] },
    gate: {
      type: 'object',
      required: ['pass', 'reasons'],
      properties: {
        pass: { type: 'boolean' },
        reasons: { type: 'array', maxItems: 50, items: { type: 'string', maxLength: 1000 } },
      },
    },
  },
} as const;

const validatePullRequest = ajv.compile(pullRequestSchema);
const validateReview = ajv.compile(reviewSchema);

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
