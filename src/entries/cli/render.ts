/** Renders a review in the chosen format (text, markdown, json). */
import type { Review } from '../../model/review.js';
import { renderJson, renderMarkdown, renderText } from '../../report/index.js';
import type { ReviewFilesResult } from '../../io/review-from-files.js';
import type { Format } from './args.js';

export function renderReview(
  result: ReviewFilesResult,
  format: Format,
  options: { color: boolean; commentKey?: string },
): string {
  const review: Review = result.review;
  if (format === 'json') return renderJson(review);
  if (format === 'markdown') {
    const files = [
      { label: 'baseline', ...result.files.baseline },
      { label: 'candidate', ...result.files.candidate },
      ...(result.files.config === null ? [] : [{ label: 'config', ...result.files.config }]),
    ];
    return renderMarkdown(review, {
      ...(options.commentKey === undefined ? {} : { commentKey: options.commentKey }),
      provenance: { files },
    });
  }
  return renderText(review, { color: options.color });
}
