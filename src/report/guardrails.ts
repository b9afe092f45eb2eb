/**
 * Guardrails and cost in words: one compact table (after the headline), the headline's trade-off
 * phrase and its guardrail line. Pure functions of the review model.
 */
import type { CostChange, GuardrailReview, Review } from '../model/review.js';
import type { Escape } from './escape.js';
import {
  amount,
  change,
  changeInterval,
  fixed,
  formatForValues,
  numberFormatFor,
  short,
  value,
  type NumberFormat,
} from './format.js';
import type { Table } from './tables.js';

type CostField = keyof NonNullable<Review['cost']>;

/** Cost fields in the order shown, with their names in prose and their unit. */
const COST_WORDS = new Map<CostField, { noun: string; unit: string }>([
  ['trainSeconds', { noun: 'training time', unit: ' s' }],
  ['inferenceMs', { noun: 'inference latency', unit: ' ms' }],
  ['parameters', { noun: 'parameters', unit: '' }],
  ['memoryMb', { noun: 'memory', unit: ' MB' }],
]);

const NON_INFERIORITY_WORD = new Map<string, string>([
  ['non-inferior', 'within margin'],
  ['inferior', 'beyond margin'],
  ['undetermined', 'cannot tell, margin'],
]);

const CHANGE_WORD = new Map<string, string>([
  ['better', 'better'],
  ['worse', 'worse'],
  ['flat', 'no change beyond noise'],
  ['undetermined', 'noise unknown'],
]);

const COST_CALL_WORD = new Map<string, string>([
  ['up', 'up'],
  ['down', 'down'],
  ['flat', 'no change beyond noise'],
  ['undetermined', 'noise unknown'],
]);

const word = (table: Map<string, string>, code: string, esc: Escape): string =>
  table.get(code) ?? esc(code, 40);

function formatOf(g: GuardrailReview): NumberFormat {
  const values = [g.baseline, g.candidate].filter((v): v is number => v !== null);
  return formatForValues(g.kind, values);
}

function withUnit(text: string, g: GuardrailReview, esc: Escape): string {
  return g.unit === null || g.kind === 'proportion' ? text : `${text} ${esc(g.unit, 20)}`;
}

function guardrailVerdict(g: GuardrailReview, esc: Escape, margin: string): string {
  if (g.problems.includes('missing-in-baseline')) return 'not in the baseline';
  if (g.problems.includes('missing-in-candidate')) return 'not in the candidate';
  if (g.problems.includes('metric-differs')) return 'metric differs between the runs';
  const changeWord = g.change === null ? '' : word(CHANGE_WORD, g.change.call, esc);
  if (g.nonInferiority === null) return `${changeWord}; no margin, not gated`;
  return `${word(NON_INFERIORITY_WORD, g.nonInferiority, esc)} ${margin}`;
}

function ratio(v: number): string {
  return `×${fixed(v, v >= 10 ? 1 : 2)}`;
}

function costCell(v: number, field: CostField): string {
  return `${short(v)}${COST_WORDS.get(field)?.unit ?? ''}`;
}

/** The guardrails-and-cost table, or null when the review has neither. */
export function guardrailsTable(
  review: Review,
  esc: Escape,
  level: string,
  compact = false,
): Table | null {
  const rows: string[][] = [];
  for (const g of review.guardrails ?? []) {
    const f = formatOf(g);
    const margin = g.margin === null ? '—' : withUnit(amount(g.margin, f), g, esc);
    rows.push([
      esc(g.name, 60),
      g.baseline === null ? '—' : withUnit(value(g.baseline, f), g, esc),
      g.candidate === null ? '—' : withUnit(value(g.candidate, f), g, esc),
      g.change === null
        ? '—'
        : compact
          ? change(g.change.estimate, f)
          : `${change(g.change.estimate, f)} ${changeInterval(g.change.ci, f)}`,
      guardrailVerdict(g, esc, margin),
    ]);
  }
  for (const [field, words] of COST_WORDS) {
    const c: CostChange | undefined = review.cost?.[field];
    if (c === undefined) continue;
    // The compact (80-column) table leaves the interval out; its verdict says whether it moved.
    const interval =
      c.ci === null || compact ? '' : ` [${fixed(c.ci[0], 2)}, ${fixed(c.ci[1], 2)}]`;
    rows.push([
      words.noun,
      costCell(c.baseline, field),
      costCell(c.candidate, field),
      `${ratio(c.ratio)}${interval}`,
      word(COST_CALL_WORD, c.call, esc),
    ]);
  }
  if (rows.length === 0) return null;
  return {
    header: [
      compact ? 'Guardrail' : 'Guardrail or cost',
      'Baseline',
      'Candidate',
      compact ? 'Δ' : `Δ [${level}% interval]`,
      'Verdict',
    ],
    align: ['l', 'r', 'r', 'r', 'l'],
    rows,
    units: null,
  };
}

/**
 * The trade-off in one phrase when a cost moved beyond noise and the validation metric changed:
 * `−0.80 pts late_delivery_error for ×2.40 training time`; null otherwise.
 */
export function tradeOffPhrase(review: Review, esc: Escape): string | null {
  const moved = [...COST_WORDS].filter(([field]) => {
    const call = review.cost?.[field]?.call;
    return call === 'up' || call === 'down';
  });
  if (moved.length === 0) return null;
  const f = numberFormatFor(review);
  const costs = moved
    .map(([field, words]) => `${ratio(review.cost?.[field]?.ratio ?? 1)} ${words.noun}`)
    .join(' and ');
  const metric = esc(review.metric.name, 60);
  // The gain is stated only when it is beyond noise; otherwise the cost is bought for nothing known.
  const gain =
    review.validation.change === 'better' || review.validation.change === 'worse'
      ? `${change(review.validation.delta.estimate, f)} ${metric}`
      : review.validation.change === 'flat'
        ? `${metric} unchanged within noise`
        : `a ${metric} change that cannot be told from noise yet`;
  return `${gain} for ${costs}`;
}

/** Names of the guardrails with a given call. */
export function guardrailNames(review: Review, call: GuardrailReview['nonInferiority']): string[] {
  return (review.guardrails ?? []).filter((g) => g.nonInferiority === call).map((g) => g.name);
}
