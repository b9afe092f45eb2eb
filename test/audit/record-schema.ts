/**
 * The compiled audit record schema, shared by every audit test that checks a record. The record's
 * `review` `$ref`s the published review schema, registered here.
 */
import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import addFormats from 'ajv-formats';

const ajv = new Ajv2020({ allErrors: true, strict: true, strictNumbers: true });
addFormats.default(ajv);
// `tsType` only guides the review type generator (scripts/review-types.mjs).
ajv.addKeyword({ keyword: 'tsType', schemaType: 'string' });
ajv.addSchema(JSON.parse(readFileSync('schema/fitgap-review-1.schema.json', 'utf8')) as object);

export const validateRecord = ajv.compile(
  JSON.parse(readFileSync('schema/fitgap-audit-record-1.schema.json', 'utf8')) as object,
);
