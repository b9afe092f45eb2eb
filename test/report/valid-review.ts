/** Asserts that a review's JSON report is a valid `fitgap-review/1` (the published schema). */
import { expect } from 'vitest';
import type { Review } from '../../src/model/review.js';
import { renderJson } from '../../src/report/json.js';
import { reviewIssues } from '../../src/validate/review.js';

export function expectValidReport(review: Review | string): void {
  const json = typeof review === 'string' ? review : renderJson(review);
  expect(reviewIssues(JSON.parse(json), 'review.json')).toEqual([]);
}
