/**
 * The PR comment body (GFM) for a review, also used as the job summary. Pure function of the review
 * model. Layout: hidden marker, headline, split and decomposition tables, levers, Mermaid charts,
 * then collapsible details. When the body would be longer than the limit, detail is dropped in a
 * fixed order (slices beyond the worst few, charts, method notes, then the remaining details) and
 * the comment says what was dropped.
 */
import { markdownTable } from 'markdown-table';
import type { LeverEvidence, Review } from '../model/review.js';
import { escapeInline } from './escape.js';
import { count } from './format.js';
import { guardrailsTable } from './guardrails.js';
import { buildHeadline } from './headline.js';
import { buildMarker } from './marker.js';
import type { Chart } from './mermaid.js';
import { buildCharts } from './mermaid.js';
import type { ProvenanceFile } from './method.js';
import { curveEvidence, methodNotes, provenanceTables } from './method.js';
import { unavailableNotes } from './notes.js';
import type { Table } from './tables.js';
import {
  LEVERS_SHOWN,
  MAX_HYPERPARAMETER_ROWS,
  decompositionTable,
  hyperparameterTable,
  leversTable,
  sliceCounts,
  slicesTable,
  splitsTable,
} from './tables.js';
import { CAUTION, levelPercent } from './words.js';

export interface MarkdownOptions {
  /** Key of the hidden marker, so several fitgap reports can live on one PR. @default 'default' */
  commentKey?: string;
  /** Head commit the review was made for; carried in the marker. @default '' */
  headSha?: string;
  /**
   * Hard limit on the body length in UTF-16 code units (GitHub counts characters; a code unit count
   * is never smaller). Without it the body is kept under 60,000, a margin below GitHub's 65,536.
   * @default 65_536
   */
  maxLength?: number;
  /** Input files with their sha256, listed under provenance. */
  provenance?: { files: ProvenanceFile[] };
}

/** GitHub's limit on a comment body. */
export const GITHUB_COMMENT_LIMIT = 65_536;
/** The target without an explicit `maxLength`. */
export const DEFAULT_TARGET_LENGTH = 60_000;
/** Slices shown in full detail, and after the first reduction. */
export const SLICES_SHOWN = 20;
export const SLICES_WHEN_SHORT = 5;

interface Detail {
  slices: number;
  charts: boolean;
  methodNotes: boolean;
  /** Curve evidence, hyperparameter changes and provenance. */
  rest: boolean;
}

/** Ever less detail, in the fixed order of dropping. */
const STAGES: Detail[] = [
  { slices: SLICES_SHOWN, charts: true, methodNotes: true, rest: true },
  { slices: SLICES_WHEN_SHORT, charts: true, methodNotes: true, rest: true },
  { slices: SLICES_WHEN_SHORT, charts: false, methodNotes: true, rest: true },
  { slices: SLICES_WHEN_SHORT, charts: false, methodNotes: false, rest: true },
  { slices: 0, charts: false, methodNotes: false, rest: false },
];

/** What a stage leaves out of this review, in words ('' entries are filtered). */
function droppedBy(review: Review, d: Detail, hasCharts: boolean): string[] {
  const n = review.slices.length;
  return [
    d.slices === 0 && n > 0 ? 'all slices' : '',
    d.slices > 0 && d.slices < SLICES_SHOWN && n > d.slices
      ? `slices beyond the worst ${d.slices}`
      : '',
    !d.charts && hasCharts ? 'charts' : '',
    d.methodNotes ? '' : 'method notes',
    d.rest ? '' : 'curve evidence, hyperparameter changes and provenance',
  ].filter((x) => x !== '');
}

export function renderMarkdown(review: Review, options: MarkdownOptions = {}): string {
  const limit = options.maxLength ?? GITHUB_COMMENT_LIMIT;
  const target = options.maxLength === undefined ? DEFAULT_TARGET_LENGTH : limit;
  const marker = buildMarker({ key: options.commentKey ?? 'default', head: options.headSha ?? '' });
  const files = options.provenance?.files ?? [];
  const charts = buildCharts(review);
  for (const detail of STAGES) {
    const body = compose(review, { marker, files, charts }, detail);
    if (body.length <= target) return body;
  }
  const minimal = [
    marker,
    ...headlineBlock(review),
    `_Shortened to fit the size limit: left out the tables, levers, charts and details. The JSON report has every number._`,
    '',
    `_${CAUTION}_`,
    '',
  ].join('\n');
  if (minimal.length <= target) return minimal;
  const stub = `${marker}\n## fitgap review\n\nToo large for this space: see the JSON report.\n`;
  return stub.length <= target ? stub : stub.slice(0, Math.max(0, target));
}

/** The chart a kind of lever evidence is drawn in. */
const EVIDENCE_CHART: Partial<Record<LeverEvidence['kind'], Chart['kind']>> = {
  'sweep-minimum': 'regularization',
  'learning-curve': 'training_examples',
  'gap-trend': 'training_examples',
  'epoch-minimum': 'epochs',
  'still-improving': 'epochs',
  diagnosis: 'plane',
  'component-change': 'plane',
  'pr-change': 'plane',
};

/**
 * The one chart left open: the one that carries the first lever's evidence, a measured curve
 * before the bias/variance plane; the plane when the first lever has no drawn evidence.
 */
export function openChart(review: Review, charts: readonly Chart[]): Chart | undefined {
  const kinds = (review.levers[0]?.evidence ?? []).flatMap((e) => EVIDENCE_CHART[e.kind] ?? []);
  const ordered = [...kinds.filter((k) => k !== 'plane'), 'plane'];
  for (const kind of ordered) {
    const chart = charts.find((c) => c.kind === kind);
    if (chart !== undefined) return chart;
  }
  return undefined;
}

function table(t: Table): string {
  const body = markdownTable([t.header, ...t.rows], { align: t.align, alignDelimiters: false });
  return t.units === undefined || t.units === null ? body : `${t.units}\n\n${body}`;
}

function details(summary: string, body: string[]): string[] {
  return ['<details>', `<summary>${summary}</summary>`, '', ...body, '', '</details>', ''];
}

function headlineBlock(review: Review): string[] {
  const h = buildHeadline(review, escapeInline);
  return [
    `## fitgap review: ${h.title}`,
    '',
    ...h.lines.map((l) => `- **${l.label}**: ${l.text}`),
    '',
  ];
}

interface Parts {
  marker: string;
  files: ProvenanceFile[];
  charts: Chart[];
}

function compose(review: Review, { marker, files, charts }: Parts, d: Detail): string {
  const out: string[] = [marker, ...headlineBlock(review)];
  const guards = guardrailsTable(review, escapeInline, levelPercent(review));
  if (guards !== null) out.push('### Guardrails and cost', '', table(guards), '');
  out.push('### Splits', '', table(splitsTable(review, escapeInline)), '');
  out.push('### Error decomposition', '', table(decompositionTable(review, escapeInline)), '');
  const missing = unavailableNotes(review, escapeInline);
  if (missing.length > 0) out.push(...missing.map((m) => `- ${m}`), '');
  if (review.levers.length > 0) {
    out.push(
      '### Next levers',
      '',
      table(leversTable(review, escapeInline, { to: LEVERS_SHOWN })),
      '',
    );
    const more = review.levers.length - LEVERS_SHOWN;
    if (more > 0)
      out.push(
        ...details(`${count(more)} more ${more === 1 ? 'lever' : 'levers'}`, [
          table(leversTable(review, escapeInline, { from: LEVERS_SHOWN })),
        ]),
      );
  }
  if (d.charts && charts.length > 0) {
    const open = openChart(review, charts);
    const fence = (chart: Chart): string[] => [
      chart.caption,
      '',
      '```mermaid',
      chart.code,
      '```',
      '',
    ];
    if (open !== undefined) out.push('### Chart', '', ...fence(open));
    const folded = charts.filter((c) => c !== open);
    if (folded.length > 0)
      out.push(...details(open === undefined ? 'Charts' : 'More charts', folded.flatMap(fence)));
  }
  if (review.slices.length > 0 && d.slices > 0) {
    const c = sliceCounts(review.slices);
    const shown = Math.min(d.slices, review.slices.length);
    const rest = review.slices.length - shown;
    const body = [table(slicesTable(review, escapeInline, d.slices))];
    if (rest > 0) {
      body.push(
        '',
        `${count(rest)} more ${rest === 1 ? 'slice is' : 'slices are'} not shown; the JSON report has all ${count(review.slices.length)}.`,
      );
    }
    out.push(
      ...details(
        `Slices: ${count(c.worse)} worse, ${count(c.better)} better, ${count(c.flat)} unchanged (worst first)`,
        body,
      ),
    );
  }
  if (d.rest) {
    const evidence = curveEvidence(review);
    if (evidence.length > 0)
      out.push(
        ...details(
          'Curve evidence',
          evidence.map((e) => `- ${e}`),
        ),
      );
    if (review.hyperparameters.length > 0) {
      const body = [table(hyperparameterTable(review, escapeInline))];
      const rest = review.hyperparameters.length - MAX_HYPERPARAMETER_ROWS;
      if (rest > 0) body.push('', `${count(rest)} more changes are not shown.`);
      out.push(
        ...details(`Hyperparameter changes (${count(review.hyperparameters.length)})`, body),
      );
    }
  }
  if (d.methodNotes) {
    out.push(
      ...details(
        'Method notes',
        methodNotes(review, escapeInline).map((n) => `- ${n}`),
      ),
    );
  }
  if (d.rest) {
    const tables = provenanceTables(review, escapeInline, files);
    out.push(
      ...details(
        'Provenance',
        tables.flatMap((t) => [table(t), '']),
      ),
    );
  }
  const dropped = droppedBy(review, d, charts.length > 0);
  if (dropped.length > 0) {
    out.push(
      `_Shortened to fit the size limit: left out ${dropped.join('; ')}. The JSON report has every number._`,
      '',
    );
  }
  out.push(`_${CAUTION}_`, '');
  return out.join('\n');
}
