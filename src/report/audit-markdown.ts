/**
 * The range audit as GFM (for a job summary, a file or an issue): a summary line, the trend table,
 * the trend chart (Mermaid) and the skipped commits. Pure.
 */
import { markdownTable } from 'markdown-table';
import type { RangeAudit } from '../model/audit.js';
import { trendChart } from './audit-chart.js';
import {
  MAX_UNCHANGED_NAMED,
  auditCounts,
  short,
  skippedLines,
  trendTable,
} from './audit-table.js';
import { escapeInline, type Escape } from './escape.js';
import { gateReasonLines } from './gate.js';
import { CAUTION } from './words.js';

const code = (text: string): string => `\`${text.replace(/`/g, '')}\``;

/** How each commit was compared, in one sentence. */
export function againstSentence(audit: RangeAudit): string {
  return audit.against === 'first'
    ? 'Each commit is reviewed against the first valid artifact of the range.'
    : 'Each commit is reviewed against the previous commit that had a valid artifact.';
}

/** Commits whose gate failed, one line each (short sha and reasons), for either renderer. */
export function gateFailures(audit: RangeAudit, esc: Escape): { sha: string; reasons: string[] }[] {
  return audit.entries.flatMap((e) => {
    if (e.status !== 'reviewed' || e.review.gate.pass) return [];
    return [{ sha: short(e.commit.sha), reasons: gateReasonLines(e.review, esc) }];
  });
}

export function renderAuditMarkdown(audit: RangeAudit): string {
  const counts = auditCounts(audit);
  const where = audit.repository === null ? '' : ` in ${escapeInline(audit.repository, 100)}`;
  const out: string[] = [
    `## fitgap audit: ${code(audit.artifactPath)}, ${code(`${short(audit.from.sha)}..${short(audit.to.sha)}`)}`,
    '',
    `${counts.commits} ${counts.commits === 1 ? 'commit' : 'commits'} after ${code(short(audit.from.sha))}${where}: ` +
      `${counts.reviewed} reviewed, ${counts.skipped} skipped. ${againstSentence(audit)}`,
    '',
  ];
  const table = trendTable(audit, escapeInline);
  out.push('### Trend', '');
  if (table.units !== null) out.push(table.units, '');
  out.push(
    markdownTable([table.header, ...table.rows], { align: table.align, alignDelimiters: false }),
    '',
    'Avoidable bias and variance are the candidate’s, in shortfall units; the word after each says how the review called its change (up is worse).',
    '',
  );
  const chart = trendChart(audit);
  if (chart !== null) out.push(chart.caption, '', '```mermaid', chart.code, '```', '');
  const failures = gateFailures(audit, escapeInline);
  if (failures.length > 0) {
    out.push('### Gate failures', '');
    for (const f of failures) out.push(`- ${code(f.sha)}: ${f.reasons.join('; ')}`);
    out.push('');
  }
  const skipped = skippedLines(audit, escapeInline, code);
  if (skipped.lines.length + skipped.unchanged.length > 0) {
    out.push('### Skipped commits', '');
    out.push(...skipped.lines.map((l) => `- ${l}`));
    if (skipped.unchanged.length > 0) {
      const named = skipped.unchanged.slice(0, MAX_UNCHANGED_NAMED).map(code).join(', ');
      const rest = skipped.unchanged.length - MAX_UNCHANGED_NAMED;
      out.push(
        `- ${skipped.unchanged.length} ${skipped.unchanged.length === 1 ? 'commit' : 'commits'} left the artifact unchanged: ${named}${rest > 0 ? ` and ${rest} more` : ''}.`,
      );
    }
    out.push('');
  }
  out.push(`_${CAUTION}_`, '');
  return out.join('\n');
}
