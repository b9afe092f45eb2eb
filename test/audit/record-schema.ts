/**
 * The compiled audit record schema, shared by every audit test that checks a record. The record's
 * `review` is `{"type": "object"}` until `schema/fitgap-review-1.schema.json` is published; then
 * the record schema `$ref`s it and it is registered here (`ajv.addSchema(reviewSchema)`).
 */
import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import addFormats from 'ajv-formats';

const ajv = new Ajv2020({ allErrors: true, strict: true });
addFormats.default(ajv);

export const validateRecord = ajv.compile(
  JSON.parse(readFileSync('schema/fitgap-audit-record-1.schema.json', 'utf8')) as object,
);
