/**
 * The audit's trend chart: a Mermaid `xychart-beta` line chart of the validation error level,
 * avoidable bias and variance at each commit that holds a baseline or a reviewed candidate, commits
 * on a categorical x axis (short shas). GitHub's xychart draws no legend, so the caption names each
 * line by its colour. Pure; numbers are fixed-decimal, labels pass `mermaidLabel`.
 */
import type { RangeAudit } from '../model/audit.js';
import { baseFields, fieldsByEntry, short } from './audit-table.js';
import { reviewFields } from './audit-fields.js';
import type { RunFields } from './audit-fields.js';
import { escapeInline, mermaidLabel } from './escape.js';
import { chartNumber } from './format.js';

/** Most commits on the chart; longer audits are thinned evenly (first and last kept). */
export const MAX_TREND_POINTS = 100;

const SERIES = [
  { key: 'errorLevel', colour: '#374151', word: 'dark grey', name: 'validation error level' },
  { key: 'bias', colour: '#1f5fa8', word: 'blue', name: 'avoidable bias' },
  { key: 'variance', colour: '#c2410c', word: 'orange', name: 'variance' },
] as const;

export interface TrendChart {
  caption: string;
  code: string;
}

interface Point {
  sha: string;
  run: RunFields;
}

function points(audit: RangeAudit): Point[] {
  const fields = fieldsByEntry(audit);
  const out: Point[] = [];
  audit.entries.forEach((entry, i) => {
    if (entry.status === 'base') {
      const run = baseFields(audit, fields, i);
      if (run !== null) out.push({ sha: entry.commit.sha, run });
    } else if (entry.status === 'reviewed') {
      const run = fields.get(i)?.candidate;
      if (run !== undefined) out.push({ sha: entry.commit.sha, run });
    }
  });
  return out;
}

function thin<T>(values: T[], max: number): T[] {
  if (values.length <= max) return values;
  return Array.from(
    { length: max },
    (_, i) => values[Math.round((i * (values.length - 1)) / (max - 1))] as T,
  );
}

function metricName(audit: RangeAudit): string {
  for (const entry of audit.entries)
    if (entry.status === 'reviewed') return reviewFields(entry.review).metric.name;
  return '';
}

/** The chart, or null with fewer than two commits to draw. */
export function trendChart(audit: RangeAudit): TrendChart | null {
  const all = points(audit);
  if (all.length < 2) return null;
  const shown = thin(all, MAX_TREND_POINTS);
  const series = SERIES.filter((s) => shown.every((p) => p.run[s.key] !== null));
  const values = series.flatMap((s) => shown.map((p) => p.run[s.key] ?? 0));
  const lo = Math.min(0, ...values);
  const hi = Math.max(...values);
  const pad = (hi - lo) * 0.05 || Math.abs(hi) * 0.05 || 1;
  const y0 = lo < 0 ? lo - pad : 0;
  const y1 = hi + pad;
  const decimals = Math.min(6, Math.max(0, 2 - Math.floor(Math.log10(y1 - y0))));
  const first = all[0]?.sha ?? '';
  const metric = mermaidLabel(metricName(audit), 40) || 'metric';
  const code = [
    `%%{init: {"themeVariables": {"xyChart": {"plotColorPalette": "${series.map((s) => s.colour).join(', ')}"}}}}%%`,
    'xychart-beta',
    `  title "${metric} by commit"`,
    `  x-axis "commit" [${shown.map((p) => `"${short(p.sha)}"`).join(', ')}]`,
    `  y-axis "shortfall units" ${chartNumber(y0, decimals)} --> ${chartNumber(y1, decimals)}`,
    ...series.map(
      (s) =>
        `  line [${shown.map((p) => chartNumber(p.run[s.key] ?? 0, decimals + 1)).join(', ')}]`,
    ),
  ].join('\n');
  const lines = series.map((s) => `${s.word} = ${s.name}`).join(', ');
  const missing = SERIES.filter((s) => !series.includes(s)).map((s) => s.name);
  const caption = [
    `**Trend** of ${escapeInline(audit.artifactPath, 80)} from \`${short(first)}\` to \`${short(all[all.length - 1]?.sha ?? '')}\`, one point per commit with a valid artifact.`,
    `Lines: ${lines}.`,
    'The validation error level is the mean validation value of a minimized metric and 1 minus it for a maximized one, so all lines are in the same shortfall units; the decomposition is in the reviews.',
    missing.length > 0 ? `Not drawn (unknown at some commits): ${missing.join(', ')}.` : '',
    shown.length < all.length
      ? `${all.length} commits thinned evenly to ${shown.length} points (first and last kept).`
      : '',
  ]
    .filter((t) => t !== '')
    .join(' ');
  return { caption, code };
}
