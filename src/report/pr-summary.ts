/**
 * "What the PR did", one line: each changed hyperparameter with its direction, factor and what it
 * does to the model ("lowered C 1 → 0.001 (÷1000): stronger regularization"), the known changes
 * first; names fitgap does not know are listed as such. Artifact strings go through `esc`.
 */
import type { HyperparameterChange, Review } from '../model/review.js';
import type { Escape } from './escape.js';
import { count, short } from './format.js';
import { EFFECT_WORD, say } from './words.js';

/** Changes named in the line; the rest are counted. */
export const PR_SUMMARY_CHANGES = 4;

function valueText(v: unknown, esc: Escape): string {
  if (typeof v === 'number') return short(v);
  if (v === null) return 'no limit';
  return esc(JSON.stringify(v) ?? String(v), 30);
}

function factor(ratio: number | undefined): string {
  if (ratio === undefined || !Number.isFinite(ratio) || ratio <= 0) return '';
  const two = (x: number): string => short(Number(x.toPrecision(2)));
  return ratio >= 1 ? ` (×${two(ratio)})` : ` (÷${two(1 / ratio)})`;
}

function phrase(c: HyperparameterChange, esc: Escape): string {
  const name = esc(c.key, 60);
  const values = `${valueText(c.unlimited === 'baseline' ? null : c.baseline, esc)} → ${valueText(c.unlimited === 'candidate' ? null : c.candidate, esc)}`;
  if (c.kind === 'added') return `added ${name} = ${valueText(c.candidate, esc)}`;
  if (c.kind === 'removed') return `removed ${name}`;
  if (c.kind === 'changed') return `changed ${name} ${values}`;
  const effect =
    c.effect === null || c.effect === undefined ? '' : `: ${say(EFFECT_WORD, c.effect, esc)}`;
  const unknown = c.role === null ? ' (role unknown)' : '';
  return `${c.kind} ${name} ${values}${factor(c.ratio)}${effect}${unknown}`;
}

/** The line, or null when the PR changed no hyperparameter. */
export function prSummary(review: Review, esc: Escape): string | null {
  const all = review.hyperparameters;
  if (all.length === 0) return null;
  const known = all.filter((c) => c.effect !== null && c.effect !== undefined);
  const rest = all.filter((c) => c.effect === null || c.effect === undefined);
  const inert = (c: HyperparameterChange): boolean => c.role === 'inert';
  const ordered = [...known, ...rest.filter((c) => !inert(c)), ...rest.filter(inert)];
  const shown = ordered.slice(0, PR_SUMMARY_CHANGES).map((c) => phrase(c, esc));
  const more = ordered.length - shown.length;
  return `${shown.join('; ')}${more > 0 ? `; and ${count(more)} more` : ''}.`;
}
