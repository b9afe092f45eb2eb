/**
 * The JSON Schemas of the report bundle (bundle.ts). Not compiled at run time: the validators are
 * generated from this module at build time by scripts/gen-validators.mjs.
 */
import type { JSONSchemaType } from 'ajv';
import type { PullRequestNote } from './bundle.js';

export const pullRequestSchema: JSONSchemaType<PullRequestNote> = {
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
export const reviewSchema = {
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
