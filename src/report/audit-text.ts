/**
 * The range audit as terminal text: a summary line, the trend table in aligned columns (as wide as
 * it needs; audits are read in wide terminals or files), gate failures and skipped commits.
 * Artifact and commit text is made plain by `terminalText` (no escape sequence reaches the
 * terminal). Pure.
 */
import type { RangeAudit } from '../model/audit.js';
import { againstSentence, gateFailures } from './audit-markdown.js';
import {
  MAX_UNCHANGED_NAMED,
  auditCounts,
  short,
  skippedLines,
  trendTable,
} from './audit-table.js';
import { terminalText } from './escape.js';
import type { Table } from './tables.js';
import { CAUTION } from './words.js';

const width = (text: string): number => Array.from(text).length;

export function alignedTable(table: Table): string[] {
  const all = [table.header, ...table.rows];
  const widths = table.header.map((_, c) => Math.max(...all.map((row) => width(row[c] ?? ''))));
  const line = (row: string[]): string =>
    row
      .map((cell, c) => {
        const pad = ' '.repeat((widths[c] ?? 0) - width(cell));
        return table.align[c] === 'r' ? pad + cell : cell + pad;
      })
      .join('  ')
      .trimEnd();
  return [line(table.header), ...table.rows.map(line)];
}

export function renderAuditText(audit: RangeAudit): string {
  const esc = (text: string, max?: number): string => terminalText(text, max);
  const counts = auditCounts(audit);
  const table = trendTable(audit, (t: string, max?: number) => esc(t, Math.min(max ?? 40, 40)));
  const out: string[] = [
    `fitgap audit: ${esc(audit.artifactPath, 200)} over ${short(audit.from.sha)}..${short(audit.to.sha)}` +
      (audit.repository === null ? '' : ` (${esc(audit.repository, 100)})`),
    `${counts.commits} commits after ${short(audit.from.sha)}: ${counts.reviewed} reviewed, ${counts.skipped} skipped. ${againstSentence(audit)}`,
    '',
    ...(table.units === null ? [] : [table.units, '']),
    ...alignedTable(table),
    '',
    'Bias and variance: the candidate’s, in shortfall units, with the call of their change (up is worse).',
  ];
  const failures = gateFailures(audit, esc);
  if (failures.length > 0) {
    out.push('', 'Gate failures:');
    for (const f of failures) out.push(`  ${f.sha}  ${f.reasons.join('; ')}`);
  }
  const skipped = skippedLines(audit, esc, (t) => t);
  if (skipped.lines.length + skipped.unchanged.length > 0) {
    out.push('', 'Skipped:');
    out.push(...skipped.lines.map((l) => `  ${l}`));
    if (skipped.unchanged.length > 0) {
      const rest = skipped.unchanged.length - MAX_UNCHANGED_NAMED;
      out.push(
        `  unchanged artifact: ${skipped.unchanged.slice(0, MAX_UNCHANGED_NAMED).join(', ')}${rest > 0 ? ` and ${rest} more` : ''}`,
      );
    }
  }
  out.push('', CAUTION, '');
  return out.join('\n');
}
