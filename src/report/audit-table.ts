/**
 * The audit's trend as data: one row per commit that holds a baseline or a reviewed candidate
 * (commit, date, subject, movement, validation with its interval, the validation change with its
 * interval, avoidable bias, variance, candidate diagnosis), and the list of skipped commits.
 * Shared by the markdown and text renderers; artifact and commit text goes through `esc`.
 */
import type { AuditEntry, RangeAudit, SkipKind } from '../model/audit.js';
import type { Call } from '../model/review.js';
import { reviewFields } from './audit-fields.js';
import type { ReviewFields, RunFields } from './audit-fields.js';
import { changeCell, intervalCell, unitLine, valueCell } from './format.js';
import type { NumberFormat } from './format.js';
import type { Escape } from './escape.js';
import type { Table } from './tables.js';
import { DIAGNOSIS_WORD, MOVEMENT_TITLE, VALIDATION_WORD, say } from './words.js';

export const short = (sha: string): string => sha.slice(0, 7);

/** The review fields of each reviewed entry, by index into `audit.entries`. */
export function fieldsByEntry(audit: RangeAudit): Map<number, ReviewFields> {
  const out = new Map<number, ReviewFields>();
  audit.entries.forEach((entry, i) => {
    if (entry.status === 'reviewed') out.set(i, reviewFields(entry.review));
  });
  return out;
}

/** The run summary of a base entry, taken from the first review that used it as baseline. */
export function baseFields(
  audit: RangeAudit,
  fields: Map<number, ReviewFields>,
  index: number,
): RunFields | null {
  const sha = audit.entries[index]?.commit.sha;
  for (let i = index + 1; i < audit.entries.length; i += 1) {
    const entry = audit.entries[i];
    if (entry?.status === 'reviewed' && entry.baseline === sha)
      return fields.get(i)?.baseline ?? null;
  }
  return null;
}

/** One number format for the whole table: the fewest decimals any review would use. */
export function auditFormat(fields: Iterable<ReviewFields>): NumberFormat {
  let decimals: number | null = null;
  let kind: NumberFormat['kind'] = 'continuous';
  for (const f of fields) {
    decimals = decimals === null ? f.decimals : Math.min(decimals, f.decimals);
    kind = f.metric.kind;
  }
  return { kind, decimals: decimals ?? 4 };
}

/** The interval level, in percent, of the audit's reviews (one alpha per audit). */
export function levelOf(fields: Iterable<ReviewFields>): string {
  for (const f of fields) return String(Number(((1 - f.alpha) * 100).toPrecision(4)));
  return '95';
}

const CALL_WORD = new Map<Call, string>([
  ['up', 'up'],
  ['down', 'down'],
  ['flat', 'flat'],
]);

function valueWithCall(v: number | null, call: Call | null, f: NumberFormat): string {
  if (v === null) return 'unknown';
  if (call === null) return valueCell(v, f);
  return `${valueCell(v, f)} (${CALL_WORD.get(call) ?? 'unknown'})`;
}

function validationCell(run: RunFields, f: NumberFormat): string {
  if (run.validation === null) return 'n/a';
  return run.validationCi === null
    ? valueCell(run.validation, f)
    : `${valueCell(run.validation, f)} [${valueCell(run.validationCi[0], f)}, ${valueCell(run.validationCi[1], f)}]`;
}

/** The trend table, with the line that states its units once (null for a continuous metric). */
export function trendTable(audit: RangeAudit, esc: Escape): Table & { units: string | null } {
  const fields = fieldsByEntry(audit);
  const f = auditFormat(fields.values());
  const level = levelOf(fields.values());
  const rows: string[][] = [];
  audit.entries.forEach((entry, i) => {
    const head = [
      short(entry.commit.sha),
      entry.commit.date.slice(0, 10),
      esc(entry.commit.subject, 60),
    ];
    if (entry.status === 'base') {
      const run = baseFields(audit, fields, i);
      rows.push([
        ...head,
        entry.note === null ? 'baseline' : 'baseline (new chain)',
        run === null ? 'n/a' : validationCell(run, f),
        '',
        run === null ? '' : valueWithCall(run.bias, null, f),
        run === null ? '' : valueWithCall(run.variance, null, f),
        run === null ? '' : say(DIAGNOSIS_WORD, run.diagnosis, esc),
      ]);
    } else if (entry.status === 'reviewed') {
      const r = fields.get(i);
      if (r === undefined) return;
      const d = r.change.validationDelta;
      rows.push([
        ...head,
        say(MOVEMENT_TITLE, r.change.movement, esc),
        validationCell(r.candidate, f),
        `${changeCell(d.estimate, f)} ${intervalCell(d.ci, f)} ${say(VALIDATION_WORD, r.change.validationChange, esc)}`,
        valueWithCall(r.candidate.bias, r.change.biasCall, f),
        valueWithCall(r.candidate.variance, r.change.varianceCall, f),
        say(DIAGNOSIS_WORD, r.candidate.diagnosis, esc),
      ]);
    }
  });
  return {
    header: [
      'commit',
      'date',
      'subject',
      'movement',
      `validation (${level}% interval)`,
      `Δ validation (${level}% interval)`,
      'avoidable bias',
      'variance',
      'candidate diagnosis',
    ],
    align: ['l', 'l', 'l', 'l', 'r', 'r', 'r', 'r', 'l'],
    rows,
    units: unitLine(f, 'values'),
  };
}

export const SKIP_WORD: Record<SkipKind, string> = {
  missing: 'no artifact',
  'not-a-file': 'not a file',
  'too-large': 'too large',
  invalid: 'invalid artifact',
  unchanged: 'unchanged',
  incomparable: 'not comparable',
};

export interface SkippedLines {
  /** One line per skipped commit (short sha, subject, reason), unchanged ones excepted. */
  lines: string[];
  /** Short shas of commits whose artifact was unchanged (listed together). */
  unchanged: string[];
}

/** Most unchanged commits named one by one; the rest are counted. */
export const MAX_UNCHANGED_NAMED = 20;

export function skippedLines(audit: RangeAudit, esc: Escape, code: Escape): SkippedLines {
  const skipped = audit.entries.filter(
    (e): e is Extract<AuditEntry, { status: 'skipped' }> => e.status === 'skipped',
  );
  return {
    lines: skipped
      .filter((e) => e.kind !== 'unchanged')
      .map(
        (e) =>
          `${code(short(e.commit.sha))} ${esc(e.commit.subject, 50)}: ${SKIP_WORD[e.kind]}, ${esc(e.reason, 300)}`,
      ),
    unchanged: skipped.filter((e) => e.kind === 'unchanged').map((e) => short(e.commit.sha)),
  };
}

/** Counts for the summary line. */
export function auditCounts(audit: RangeAudit): {
  commits: number;
  reviewed: number;
  skipped: number;
  failed: number;
} {
  const reviewed = audit.entries.filter((e) => e.status === 'reviewed');
  // An ancestor that supplied the first baseline comes before the range's start: not counted.
  const start = audit.entries.findIndex((e) => e.commit.sha === audit.from.sha);
  return {
    commits: audit.entries.length - 1 - Math.max(0, start),
    reviewed: reviewed.length,
    skipped: audit.entries.filter((e) => e.status === 'skipped').length,
    failed: reviewed.filter(
      (e) => e.status === 'reviewed' && !reviewFields(e.review).change.gatePass,
    ).length,
  };
}
