/**
 * The review's tables as data (header + rows of strings), shared by the markdown and text
 * renderers. Artifact text goes through the `esc` function the renderer passes in (markdown or
 * terminal escaping); codes are looked up in word tables.
 */
import type { ComponentName, Review, SliceChange } from '../model/review.js';
import { displayValue, type Escape } from './escape.js';
import {
  changeCell,
  count,
  intervalCell,
  numberFormatFor,
  pCell,
  unitLine,
  valueCell,
} from './format.js';
import { leverText } from './levers.js';
import {
  COMPONENT_ORDER,
  COMPONENT_TITLE,
  DIAGNOSIS_WORD,
  SPLIT_WORD,
  componentReading,
  levelPercent,
  reading,
  say,
} from './words.js';

export type Align = 'l' | 'r' | 'c';

export interface Table {
  header: string[];
  align: Align[];
  rows: string[][];
  /** The units of the cells, said once above the table (null: the metric's own units). */
  units?: string | null;
}

export function splitsTable(review: Review, esc: Escape): Table {
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
    units: unitLine(f, 'values'),
    rows: review.splits.map((s) => [
      say(SPLIT_WORD, s.split, esc),
      valueCell(s.baseline, f),
      valueCell(s.candidate, f),
      changeCell(s.delta.estimate, f),
      intervalCell(s.delta.ci, f),
      pCell(s.delta.p),
      reading(s.delta.call, review),
    ]),
  };
}

/**
 * Components of both runs with the change (shortfall units: up is worse). `compact` (for 80
 * columns): present components are marked `*`, the p column is left out, the call is one word and
 * the diagnosis is left to a sentence (`diagnosisLine`).
 */
export function decompositionTable(review: Review, esc: Escape, compact = false): Table {
  const f = numberFormatFor(review);
  const cell = (run: 'baseline' | 'candidate', name: ComponentName): string => {
    const c = review[run].components[name];
    if (c.value === null) return 'n/a';
    return `${valueCell(c.value, f)}${c.present ? (compact ? '*' : ' (present)') : ''}`;
  };
  const deltas = {
    bias: review.bias.delta,
    variance: review.variance.delta,
    mismatch: review.mismatch.delta,
    overfit: review.overfit.delta,
  };
  const rows = COMPONENT_ORDER.map((name) => {
    const d = deltas[name];
    const row = [say(COMPONENT_TITLE, name, esc), cell('baseline', name), cell('candidate', name)];
    if (d === null) return [...row, 'n/a', 'n/a', ...(compact ? [] : ['n/a']), 'n/a'];
    return [
      ...row,
      changeCell(d.estimate, f),
      intervalCell(d.ci, f),
      ...(compact ? [] : [pCell(d.p)]),
      componentReading(d.call, compact),
    ];
  });
  // Components are differences of error levels: in points for a proportion, like changes.
  const units = unitLine(f, 'differences');
  const header = ['Component', 'Baseline', 'Candidate', 'Δ', `${levelPercent(review)}% interval`];
  if (compact) {
    return { header: [...header, 'Call'], align: ['l', 'r', 'r', 'r', 'r', 'l'], rows, units };
  }
  rows.push([
    'Diagnosis',
    say(DIAGNOSIS_WORD, review.baseline.diagnosis, esc),
    say(DIAGNOSIS_WORD, review.candidate.diagnosis, esc),
    '',
    '',
    '',
    '',
  ]);
  return {
    header: [...header, 'p', 'Call'],
    align: ['l', 'r', 'r', 'r', 'r', 'r', 'l'],
    rows,
    units,
  };
}

/** The diagnosis of both runs in one sentence. */
export function diagnosisLine(review: Review, esc: Escape): string {
  return `Diagnosis: baseline ${say(DIAGNOSIS_WORD, review.baseline.diagnosis, esc)}; candidate ${say(DIAGNOSIS_WORD, review.candidate.diagnosis, esc)}.`;
}

/** Levers shown in the comment's table; the rest are folded. */
export const LEVERS_SHOWN = 3;

/**
 * The levers from `from` (0-based) up to `to`, numbered in the review's order. A sentence an
 * earlier lever already gave (the same diagnosis, the same PR change) is not repeated.
 */
export function leversTable(
  review: Review,
  esc: Escape,
  range: { from?: number; to?: number } = {},
): Table {
  const f = numberFormatFor(review);
  const said = new Set<string>();
  const rows: string[][] = [];
  review.levers.forEach((lever, i) => {
    const text = leverText(lever, review, f, esc);
    const fresh = text.sentences.filter((s) => !said.has(s));
    for (const s of text.sentences) said.add(s);
    if (i < (range.from ?? 0) || i >= (range.to ?? Infinity)) return;
    const why =
      fresh.length > 0
        ? fresh.join(' ')
        : text.sentences.length > 0
          ? 'For the reason above.'
          : '—';
    rows.push([String(i + 1), text.title, why]);
  });
  return { header: ['#', 'Lever', 'Why'], align: ['r', 'l', 'l'], rows };
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

const SLICE_CHANGE = new Map([
  ['worse', 'worse'],
  ['better', 'better'],
  ['flat', 'flat'],
]);

export function slicesTable(review: Review, esc: Escape, limit: number): Table {
  const f = numberFormatFor(review);
  const rows = sortSlices(review)
    .slice(0, limit)
    .map((s) => [
      esc(s.name),
      s.examples === null ? 'n/a' : count(s.examples),
      valueCell(s.baseline, f),
      valueCell(s.candidate, f),
      changeCell(s.delta.estimate, f),
      pCell(s.pAdjusted),
      s.hiddenRegression ? 'worse (hidden)' : (SLICE_CHANGE.get(s.change) ?? esc(s.change, 20)),
    ]);
  return {
    header: ['Slice', 'Examples', 'Baseline', 'Candidate', 'Δ', 'p (Holm)', 'Change'],
    align: ['l', 'r', 'r', 'r', 'r', 'r', 'l'],
    rows,
    units: unitLine(f, 'values'),
  };
}

/** Counts of slices by change, for the "and N more" line and the summary. */
export function sliceCounts(slices: SliceChange[]): {
  worse: number;
  better: number;
  flat: number;
} {
  const out = { worse: 0, better: 0, flat: 0 };
  for (const s of slices) {
    if (s.change === 'worse') out.worse += 1;
    else if (s.change === 'better') out.better += 1;
    else out.flat += 1;
  }
  return out;
}

export const MAX_HYPERPARAMETER_ROWS = 50;

const HYPERPARAMETER_CHANGE = new Map([
  ['raised', 'raised'],
  ['lowered', 'lowered'],
  ['changed', 'changed'],
  ['added', 'added'],
  ['removed', 'removed'],
]);

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
        HYPERPARAMETER_CHANGE.get(h.kind) ?? esc(h.kind, 20),
      ]),
  };
}
