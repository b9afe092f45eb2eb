/**
 * The review as terminal text: the same content as the comment without charts, fitted to a width
 * (default 80 columns), with ANSI colour only when asked. Artifact text is made plain by
 * `terminalText`, which removes ESC and every other control character, so an artifact cannot send
 * terminal escape sequences. Widths count code points (wide East Asian characters count as one).
 */
import type { Review } from '../model/review.js';
import { terminalText, truncate } from './escape.js';
import { count } from './format.js';
import { guardrailsTable } from './guardrails.js';
import { buildHeadline } from './headline.js';
import type { Tone } from './headline.js';
import { numberFormatFor } from './format.js';
import { leverText } from './levers.js';
import { curveEvidence, methodNotes } from './method.js';
import { unavailableNotes } from './notes.js';
import type { Table } from './tables.js';
import {
  decompositionTable,
  diagnosisLine,
  hyperparameterTable,
  sliceCounts,
  slicesTable,
  splitsTable,
} from './tables.js';
import { CAUTION, levelPercent } from './words.js';

export interface TextOptions {
  /** ANSI colour (bold headings, green/red for good/bad). */
  color: boolean;
  /** Columns to fit. @default 80 */
  width?: number;
  /** Slices listed, worst first. @default 10 */
  slices?: number;
}

const ANSI = {
  bold: '\x1b[1m',
  red: '\x1b[31m',
  green: '\x1b[32m',
  dim: '\x1b[2m',
  reset: '\x1b[0m',
};

export function renderText(review: Review, options: TextOptions): string {
  const width = Math.max(40, Math.floor(options.width ?? 80));
  const paint = (text: string, ...codes: string[]): string =>
    options.color && codes.length > 0 ? `${codes.join('')}${text}${ANSI.reset}` : text;
  const tone = (t: Tone): string[] => (t === 'good' ? [ANSI.green] : t === 'bad' ? [ANSI.red] : []);
  const heading = (text: string): string => paint(text, ANSI.bold);
  const esc = (text: string, max?: number): string => terminalText(text, max);

  const h = buildHeadline(review, esc);
  const out: string[] = [];
  for (const line of wrap(`fitgap review: ${h.title}`, width, '')) {
    out.push(paint(line, ANSI.bold, ...tone(h.tone)));
  }
  out.push('');
  for (const l of h.lines) {
    const lines = wrap(`${l.label}: ${l.text}`, width, '  ', '* ');
    const [first, ...rest] = lines;
    const cut = l.label.length + 3;
    if (first !== undefined) {
      const labelPart = first.slice(0, Math.min(cut, first.length));
      out.push(paint(labelPart, ANSI.bold, ...tone(l.tone)) + first.slice(labelPart.length));
    }
    out.push(...rest);
  }
  const guards = guardrailsTable(review, esc, levelPercent(review), true);
  if (guards !== null) out.push('', heading('Guardrails and cost'), ...textTable(guards, width));
  // When the splits table is too wide, drop its Reading column (the sign of Δ and the headline
  // carry it) rather than cut the split names.
  const splits = splitsTable(review, esc);
  const fitted = naturalWidth(splits) > width ? withoutColumn(splits, 'Reading') : splits;
  out.push('', heading('Splits'), ...textTable(fitted, width), '');
  out.push(
    heading('Error decomposition'),
    ...textTable(decompositionTable(review, esc, true), width),
  );
  for (const n of ['* present: large enough to count.', diagnosisLine(review, esc)])
    out.push(...wrap(n, width, '    ', '  '));
  for (const m of unavailableNotes(review, esc)) out.push(...wrap(m, width, '    ', '  - '));
  out.push('');
  if (review.levers.length > 0) {
    out.push(heading('Next levers'));
    const f = numberFormatFor(review);
    review.levers.forEach((lever, i) => {
      const n = `${i + 1}. `;
      const pad = ' '.repeat(n.length + 2);
      const text = leverText(lever, review, f, esc);
      out.push(...wrap(`${text.title}: ${text.sentences.join(' ')}`, width, pad, `  ${n}`));
    });
    out.push('');
  }
  if (review.slices.length > 0) {
    const limit = Math.max(0, Math.floor(options.slices ?? 10));
    const c = sliceCounts(review.slices);
    const title = `Slices (${count(c.worse)} worse, ${count(c.better)} better, ${count(c.flat)} unchanged; worst first)`;
    out.push(
      ...wrap(title, width, '').map(heading),
      ...textTable(slicesTable(review, esc, limit), width),
    );
    const rest = review.slices.length - Math.min(limit, review.slices.length);
    if (rest > 0)
      out.push(...wrap(`${count(rest)} more not shown; the JSON report has all.`, width, '  '));
    out.push('');
  }
  if (review.hyperparameters.length > 0) {
    out.push(
      heading('Hyperparameter changes'),
      ...textTable(hyperparameterTable(review, esc), width),
    );
    out.push('');
  }
  const evidence = curveEvidence(review);
  if (evidence.length > 0) {
    out.push(heading('Curve evidence'));
    for (const e of evidence) out.push(...wrap(e, width, '    ', '  - '));
    out.push('');
  }
  out.push(heading('Method notes'));
  for (const n of methodNotes(review, esc)) out.push(...wrap(n, width, '    ', '  - '));
  out.push('', heading('Provenance'));
  for (const run of ['baseline', 'candidate'] as const) {
    const r = review[run];
    const commit = r.commit === null ? '' : ` @ ${esc(r.commit, 40)}`;
    out.push(...wrap(`${run}: ${esc(r.name)}${commit}`, width, '    ', '  '));
  }
  out.push('');
  for (const line of wrap(CAUTION, width, '')) out.push(paint(line, ANSI.dim));
  return `${out.join('\n')}\n`;
}

/** Columns a table needs without cutting any cell. */
function naturalWidth(t: Table): number {
  const rows = [t.header, ...t.rows];
  const widths = t.header.map((_, c) => Math.max(...rows.map((r) => codePoints(r[c] ?? ''))));
  return 2 + widths.reduce((a, b) => a + b, 0) + 2 * (widths.length - 1);
}

/** A table without one of its columns (by header). */
function withoutColumn(t: Table, header: string): Table {
  const c = t.header.indexOf(header);
  if (c < 0) return t;
  const drop = <T>(row: readonly T[]): T[] => row.filter((_, i) => i !== c);
  return { ...t, header: drop(t.header), align: drop(t.align), rows: t.rows.map(drop) };
}

const SURROGATE = /[\uD800-\uDFFF]/;

/**
 * Code points in s, as `Array.from(s).length` counts them (a surrogate pair is one), without
 * building the array when s has no surrogates (then every code unit is one code point).
 */
function codePoints(s: string): number {
  return SURROGATE.test(s) ? Array.from(s).length : s.length;
}

/** Word-wraps to `width` columns; the first line starts with `first`, the others with `indent`. */
export function wrap(text: string, width: number, indent: string, first = indent): string[] {
  const lines: string[] = [];
  let line = first;
  let empty = true;
  for (const word of text.split(' ').filter((w) => w !== '')) {
    const candidate = empty ? `${line}${word}` : `${line} ${word}`;
    if (codePoints(candidate) <= width) {
      line = candidate;
      empty = false;
      continue;
    }
    if (!empty) lines.push(line);
    let rest = word;
    line = lines.length === 0 && empty ? first : indent;
    while (codePoints(line + rest) > width) {
      const room = Math.max(1, width - codePoints(line));
      const points = Array.from(rest);
      lines.push(line + points.slice(0, room).join(''));
      rest = points.slice(room).join('');
      line = indent;
    }
    line = `${line}${rest}`;
    empty = false;
  }
  if (!empty || lines.length === 0) lines.push(line.trimEnd());
  return lines;
}

/**
 * A table in columns, two spaces apart, indented by two. When too wide, the left-aligned text
 * columns (names, reasons) are narrowed, widest first, and cut with an ellipsis; if that is not
 * enough (very narrow terminals), every column is.
 */
export function textTable(t: Table, width: number): string[] {
  const len = codePoints;
  const rows = [t.header, ...t.rows];
  const widths = t.header.map((_, c) => Math.max(...rows.map((r) => len(r[c] ?? ''))));
  const total = (): number => 2 + widths.reduce((a, b) => a + b, 0) + 2 * (widths.length - 1);
  const shrinkable = t.align.map((a, c) => (a === 'l' ? c : -1)).filter((c) => c >= 0);
  const narrow = (columns: number[], least: number): void => {
    while (total() > width && columns.length > 0) {
      const c = columns.reduce((best, i) => ((widths[i] ?? 0) > (widths[best] ?? 0) ? i : best));
      const w = widths[c] ?? 0;
      if (w <= least) break;
      widths[c] = w - 1;
    }
  };
  narrow(shrinkable, 6);
  narrow(
    widths.map((_, c) => c),
    2,
  );
  const units = t.units === undefined || t.units === null ? [] : wrap(t.units, width, '  ');
  const lines = rows.map((r) => {
    const cells = widths.map((w, c) => {
      const cell = truncate(r[c] ?? '', w);
      const pad = ' '.repeat(Math.max(0, w - len(cell)));
      return t.align[c] === 'r' ? pad + cell : cell + pad;
    });
    return `  ${cells.join('  ')}`.trimEnd();
  });
  return [...units, ...lines];
}
