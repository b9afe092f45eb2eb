/**
 * The review's tables as data (header + rows of strings), shared by the markdown and text renderers.
 * Artifact text goes through the `esc` function the renderer passes in (markdown or terminal
 * escaping); our own words and numbers need none.
 */
import type { Review, SliceChange } from '../model/review.js';
import { displayValue } from './escape.js';
import { count, interval, num, numberFormatFor, pValue, signed } from './format.js';
import {
  COMPONENT_ORDER,
  COMPONENT_WORD,
  DIAGNOSIS_WORD,
  LEVER_TITLE,
  SPLIT_WORD,
  componentReading,
  levelPercent,
  reading,
} from './words.js';

export type Escape = (text: string, maxChars?: number) => string;
export type Align = 'l' | 'r' | 'c';

export interface Table {
  header: string[];
  align: Align[];
  rows: string[][];
}

export function splitsTable(review: Review): Table {
  const f = numberFormatFor(review);
  return {
    header: [
      'Split',
      'Baseline',
      'Candidate',
      'Δ',
      `${levelPercent(review)}% interval`,
      'p',
      'Reading',
    ],
    align: ['l', 'r', 'r', 'r', 'r', 'r', 'l'],
    rows: review.splits.map((s) => [
      SPLIT_WORD[s.split],
      num(s.baseline, f),
      num(s.candidate, f),
      signed(s.delta.estimate, f),
      interval(s.delta.ci, f),
      pValue(s.delta.p).replace(/^p /, '').replace(/^= /, ''),
      reading(s.delta.call, review),
    ]),
  };
}

/**
 * Components of both runs with the change. `compact` (for 80 columns): present components are marked
 * `*`, the p column is left out and the call is one word.
 */
export function decompositionTable(review: Review, compact = false): Table {
  const f = numberFormatFor(review);
  const cell = (run: 'baseline' | 'candidate', name: (typeof COMPONENT_ORDER)[number]): string => {
    const c = review[run].components[name];
    if (c.value === null) return 'n/a';
    return `${num(c.value, f)}${c.present ? (compact ? '*' : ' (present)') : ''}`;
  };
  const deltas = {
    bias: review.bias.delta,
    variance: review.variance.delta,
    mismatch: review.mismatch.delta,
    overfit: review.overfit.delta,
  };
  const rows = COMPONENT_ORDER.map((name) => {
    const d = deltas[name];
    return [
      COMPONENT_WORD[name],
      cell('baseline', name),
      cell('candidate', name),
      d === null ? 'n/a' : signed(d.estimate, f),
      d === null ? 'n/a' : interval(d.ci, f),
      d === null ? 'n/a' : pValue(d.p).replace(/^p /, '').replace(/^= /, ''),
      d === null ? 'n/a' : componentReading(d.call),
    ];
  });
  rows.push([
    'Diagnosis',
    DIAGNOSIS_WORD[review.baseline.diagnosis],
    DIAGNOSIS_WORD[review.candidate.diagnosis],
    '',
    '',
    '',
    '',
  ]);
  const table: Table = {
    header: [
      'Component',
      'Baseline',
      'Candidate',
      'Δ',
      `${levelPercent(review)}% interval`,
      'p',
      'Call',
    ],
    align: ['l', 'r', 'r', 'r', 'r', 'r', 'l'],
    rows,
  };
  if (!compact) return table;
  const shorter = (row: string[]): string[] => [
    ...row.slice(0, 5),
    (row[6] ?? '').replace(/^(up|down) \((\w+)\)$/, '$2'),
  ];
  return {
    header: shorter(table.header),
    align: ['l', 'r', 'r', 'r', 'r', 'l'],
    rows: table.rows.map(shorter),
  };
}

/** Reasons why components could not be computed, one line each, deduplicated. */
export function unavailableNotes(review: Review, esc: Escape): string[] {
  const seen = new Set<string>();
  for (const run of ['baseline', 'candidate'] as const) {
    for (const name of COMPONENT_ORDER) {
      const c = review[run].components[name];
      if (c.value === null && c.unavailable !== undefined) {
        seen.add(`${COMPONENT_WORD[name]}: ${esc(c.unavailable, 300)}`);
      }
    }
  }
  return [...seen];
}

export function leversTable(review: Review, esc: Escape): Table {
  return {
    header: ['#', 'Lever', 'Why', 'Evidence'],
    align: ['r', 'l', 'l', 'l'],
    rows: review.levers.map((lever, i) => [
      String(i + 1),
      LEVER_TITLE[lever.id],
      esc(lever.reason, 300),
      lever.evidence.map((e) => esc(e, 200)).join(' · ') || '—',
    ]),
  };
}

/** Shortfall change of a slice (up = worse), used to put the worst regressions first. */
function sliceHarm(slice: SliceChange, review: Review): number {
  return review.metric.goal === 'minimize' ? slice.delta.estimate : -slice.delta.estimate;
}

/** Slices, worst first: hidden regressions, then significant regressions, then by harm. */
export function sortSlices(review: Review): SliceChange[] {
  const rank = (s: SliceChange): number =>
    s.hiddenRegression ? 0 : s.change === 'worse' ? 1 : s.change === 'flat' ? 2 : 3;
  return [...review.slices].sort(
    (a, b) =>
      rank(a) - rank(b) ||
      sliceHarm(b, review) - sliceHarm(a, review) ||
      (a.name < b.name ? -1 : a.name > b.name ? 1 : 0),
  );
}

export function slicesTable(review: Review, esc: Escape, limit: number): Table {
  const f = numberFormatFor(review);
  const rows = sortSlices(review)
    .slice(0, limit)
    .map((s) => [
      esc(s.name),
      s.examples === null ? 'n/a' : count(s.examples),
      num(s.baseline, f),
      num(s.candidate, f),
      signed(s.delta.estimate, f),
      s.pAdjusted === null ? 'n/a' : pValue(s.pAdjusted).replace(/^p /, '').replace(/^= /, ''),
      s.hiddenRegression ? 'worse (hidden)' : s.change,
    ]);
  return {
    header: ['Slice', 'Examples', 'Baseline', 'Candidate', 'Δ', 'p (Holm)', 'Change'],
    align: ['l', 'r', 'r', 'r', 'r', 'r', 'l'],
    rows,
  };
}

/** Counts of slices by change, for the "and N more" line and the summary. */
export function sliceCounts(slices: SliceChange[]): {
  worse: number;
  better: number;
  flat: number;
} {
  const out = { worse: 0, better: 0, flat: 0 };
  for (const s of slices) out[s.change] += 1;
  return out;
}

export const MAX_HYPERPARAMETER_ROWS = 50;

export function hyperparameterTable(review: Review, esc: Escape): Table {
  return {
    header: ['Hyperparameter', 'Baseline', 'Candidate', 'Change'],
    align: ['l', 'l', 'l', 'l'],
    rows: review.hyperparameters
      .slice(0, MAX_HYPERPARAMETER_ROWS)
      .map((h) => [
        esc(h.key),
        h.kind === 'added' ? '(absent)' : esc(displayValue(h.baseline), 60),
        h.kind === 'removed' ? '(absent)' : esc(displayValue(h.candidate), 60),
        h.kind,
      ]),
  };
}
