/**
 * The PR comment body (GFM) for a review. Pure function of the review model.
 * (Stub: the full comment is built in the report issue.)
 */
import type { Review } from '../analysis/types.js';

export interface MarkdownOptions {
  /** Key of the hidden marker, so several fitgap reports can live on one PR. */
  commentKey?: string;
  /** Head commit the review was made for; carried in the marker. */
  headSha?: string;
}

export function renderMarkdown(review: Review, _options: MarkdownOptions = {}): string {
  return `## fitgap: ${review.movement}\n`;
}
