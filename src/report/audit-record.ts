/**
 * The audit log: one JSON Lines record per reviewed commit,
 * `{base, fitgapVersion, head, recordedAt, repository, review, sources}` (schema
 * `schema/fitgap-audit-record-1.schema.json`). Keys are sorted at every depth, so the same review
 * always prints the same bytes; the only clock is `recordedAt`, passed in. Pure.
 */
import type { PullRequestAudit, RangeAudit, SourceFile } from '../model/audit.js';
import type { Review } from '../model/review.js';
import { assertFinite } from './json.js';

export interface AuditRecord {
  /** Full sha of the baseline's commit. */
  base: string;
  fitgapVersion: string;
  /** Full sha of the reviewed (candidate) commit. */
  head: string;
  /** ISO 8601 time the record was made (the envelope's only clock). */
  recordedAt: string;
  repository: string | null;
  review: Review;
  sources: SourceFile[];
}

export interface RecordContext {
  recordedAt: string;
  fitgapVersion: string;
}

/** JSON with object keys sorted (code-unit order) at every depth; arrays keep their order. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sortKeys(value));
}

function sortKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortKeys);
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const key of Object.keys(value).sort()) {
      const item = (value as Record<string, unknown>)[key];
      // defineProperty: a key named "__proto__" stays an own property, as in the input.
      if (item !== undefined)
        Object.defineProperty(out, key, {
          value: sortKeys(item),
          enumerable: true,
          writable: true,
          configurable: true,
        });
    }
    return out;
  }
  return value;
}

export function rangeRecords(audit: RangeAudit, context: RecordContext): AuditRecord[] {
  return audit.entries.flatMap((entry) =>
    entry.status === 'reviewed'
      ? [
          {
            base: entry.baseline,
            fitgapVersion: context.fitgapVersion,
            head: entry.commit.sha,
            recordedAt: context.recordedAt,
            repository: audit.repository,
            review: entry.review,
            sources: entry.sources,
          },
        ]
      : [],
  );
}

export function pullRequestRecord(audit: PullRequestAudit, context: RecordContext): AuditRecord {
  return {
    base: audit.base.commit,
    fitgapVersion: context.fitgapVersion,
    head: audit.head.commit,
    recordedAt: context.recordedAt,
    repository: audit.repository,
    review: audit.review,
    sources: audit.sources,
  };
}

/** One record as one line (with its newline). Throws on a non-finite number (a bug). */
export function recordLine(record: AuditRecord): string {
  assertFinite(record.review, '');
  return `${canonicalJson(record)}\n`;
}

export function renderJsonLines(records: AuditRecord[]): string {
  return records.map(recordLine).join('');
}
