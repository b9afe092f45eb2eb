/**
 * The machine-readable report `fitgap-review/1`: the review model as pretty JSON. Every number in
 * the model is finite by construction; a non-finite one is a bug in the analysis and throws here
 * (naming its JSON pointer) rather than turning silently into `null`.
 */
import type { Review } from '../model/review.js';

export function renderJson(review: Review): string {
  assertFinite(review, '');
  return `${JSON.stringify(review, null, 2)}\n`;
}

/** Throws a RangeError naming the JSON pointer of the first NaN or ±Infinity in `value`. */
export function assertFinite(value: unknown, pointer: string): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) {
      throw new RangeError(
        `fitgap-review/1 ${pointer || '/'} is ${String(value)}; the review model must hold finite numbers only (this is a bug)`,
      );
    }
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((item, i) => assertFinite(item, `${pointer}/${i}`));
    return;
  }
  if (value !== null && typeof value === 'object') {
    for (const [key, item] of Object.entries(value)) {
      assertFinite(item, `${pointer}/${key.replace(/~/g, '~0').replace(/\//g, '~1')}`);
    }
  }
}
