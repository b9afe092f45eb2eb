/**
 * The JSON Schema of the bundle's pull-request note (bundle.ts). Not compiled at run time: its
 * validator is generated from this module at build time by scripts/gen-validators.mjs.
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
    number: { type: 'integer', minimum: 1, maximum: 2147483647 },
    headSha: { type: 'string', pattern: '^[0-9a-f]{40}$' },
  },
};
