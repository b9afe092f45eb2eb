/**
 * The `fitgap-review/1` report's JSON Schema, compiled once, as a type guard; and `reviewIssues`,
 * which names every problem of a report that fails it. For reports fitgap did not just build
 * itself (an uploaded report in publish mode, an audit): validate before anything is rendered.
 */
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import schema from '../../schema/fitgap-review-1.schema.json' with { type: 'json' };
import type { Issue } from '../model/errors.js';
import type { Review } from '../model/review.js';
import { ajvIssues } from './ajv-issues.js';

let compiled: ValidateFunction<Review> | undefined;

/** The compiled validator of `fitgap-review/1` (compiled on first use, then reused). */
export function reviewValidator(): ValidateFunction<Review> {
  if (compiled === undefined) {
    const ajv = new Ajv2020({ allErrors: true, strict: true, strictNumbers: true });
    // `tsType` only guides the type generator (scripts/review-types.mjs).
    ajv.addKeyword({ keyword: 'tsType', schemaType: 'string' });
    compiled = ajv.compile<Review>(schema);
  }
  return compiled;
}

/** True when `doc` is a valid `fitgap-review/1` report. */
export function isReview(doc: unknown): doc is Review {
  return reviewValidator()(doc);
}

/** Every way `doc` fails the schema, as issues naming `file` and a JSON pointer; [] when valid. */
export function reviewIssues(doc: unknown, file: string): Issue[] {
  const validate = reviewValidator();
  return validate(doc) ? [] : ajvIssues(validate.errors ?? [], file, doc);
}
