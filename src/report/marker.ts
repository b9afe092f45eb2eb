/**
 * The hidden marker that identifies fitgap's own PR comment: keyed by a comment key (several fitgap
 * reports can live on one PR) and carrying the head commit the report was made for.
 *
 *   <!-- fitgap:review key=default head=9f1c2ab... -->
 */

const KEY_PATTERN = /^[A-Za-z0-9._-]{1,64}$/;
const MARKER_PATTERN = /<!-- fitgap:review key=([A-Za-z0-9._-]{1,64}) head=([0-9a-f]{0,64}) -->/;

export interface Marker {
  key: string;
  /** Head commit sha, or '' when unknown. */
  head: string;
}

/** True when a key is usable in a marker (letters, digits, `.`, `_`, `-`; 1–64 characters). */
export function isValidCommentKey(key: string): boolean {
  return KEY_PATTERN.test(key);
}

export function buildMarker(marker: Marker): string {
  if (!isValidCommentKey(marker.key)) {
    throw new RangeError(
      `comment key ${JSON.stringify(marker.key)} must be 1-64 letters, digits, '.', '_' or '-'`,
    );
  }
  const head = /^[0-9a-f]{0,64}$/.test(marker.head) ? marker.head : '';
  return `<!-- fitgap:review key=${marker.key} head=${head} -->`;
}

/** The first fitgap marker in a comment body, or null. */
export function parseMarker(body: string): Marker | null {
  const match = MARKER_PATTERN.exec(body);
  if (match === null) return null;
  return { key: match[1] ?? '', head: match[2] ?? '' };
}
