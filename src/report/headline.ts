/**
 * The headline of a review as data: a title and a few labelled sentences (movement, validation,
 * gate, next lever, hidden slice regressions), shared by the markdown and text renderers.
 */
import type { Review, ShortfallDelta } from '../model/review.js';
import type { Escape } from './escape.js';
import {
  change,
  changeInterval,
  numberFormatFor,
  pText,
  value,
  type NumberFormat,
} from './format.js';
import { gateSentence } from './gate.js';
import { guardrailNames, tradeOffPhrase } from './guardrails.js';
import { leverHeadline } from './levers.js';
import { prSummary } from './pr-summary.js';
import { sortSlices } from './tables.js';
import {
  DIAGNOSIS_WORD,
  MOVEMENT_SENTENCE,
  MOVEMENT_TITLE,
  TEST_WORD,
  VALIDATION_WORD,
  levelPercent,
  say,
} from './words.js';

export type Tone = 'good' | 'bad' | 'neutral';

export interface HeadlineLine {
  label: string;
  text: string;
  tone: Tone;
}

export interface Headline {
  title: string;
  tone: Tone;
  lines: HeadlineLine[];
}

function changePhrase(
  name: string,
  delta: ShortfallDelta | null,
  review: Review,
  f: NumberFormat,
): string {
  if (delta === null) return `${name} unknown`;
  const stats =
    delta.ci === null
      ? `${change(delta.estimate, f)}, noise unknown`
      : `${change(delta.estimate, f)}, ${levelPercent(review)}% interval ${changeInterval(delta.ci, f)}, ${pText(delta.p)}`;
  const word = delta.call === 'up' ? 'rose' : delta.call === 'down' ? 'fell' : 'held steady';
  return `${name} ${word} (${stats})`;
}

const GOOD_MOVEMENTS = new Set([
  'better-on-both',
  'away-from-overfitting',
  'away-from-underfitting',
]);

/** Trade-off of a moved cost, and guardrails that regressed or cannot be told apart. */
function guardrailLines(review: Review, esc: Escape): HeadlineLine[] {
  const lines: HeadlineLine[] = [];
  const tradeOff = tradeOffPhrase(review, esc);
  if (tradeOff !== null) lines.push({ label: 'Trade-off', text: `${tradeOff}.`, tone: 'neutral' });
  const inferior = guardrailNames(review, 'inferior');
  if (inferior.length > 0) {
    lines.push({
      label: `${inferior.length === 1 ? 'Guardrail' : 'Guardrails'} regressed beyond the margin`,
      text: `${inferior.map((n) => esc(n, 60)).join(', ')}.`,
      tone: 'bad',
    });
  }
  return lines;
}

export function buildHeadline(review: Review, esc: Escape): Headline {
  const f = numberFormatFor(review);
  const metric = esc(review.metric.name, 60);
  const v = review.validation;
  const vSplit = review.splits.find((s) => s.split === 'validation');
  const movementTone: Tone = GOOD_MOVEMENTS.has(review.movement)
    ? 'good'
    : review.movement === 'no-significant-change' || review.movement === 'undetermined'
      ? 'neutral'
      : 'bad';
  const vTone: Tone = v.change === 'better' ? 'good' : v.change === 'worse' ? 'bad' : 'neutral';
  const vStats =
    v.delta.ci === null
      ? `${change(v.delta.estimate, f)}; run-to-run noise unknown`
      : `${change(v.delta.estimate, f)}, ${levelPercent(review)}% interval ${changeInterval(v.delta.ci, f)}, ${pText(v.delta.p)}, ${say(TEST_WORD, v.delta.test, esc)}`;
  const from =
    vSplit === undefined ? '' : `${value(vSplit.baseline, f)} → ${value(vSplit.candidate, f)} `;
  const did = prSummary(review, esc);
  const errorTerms =
    review.metric.goal === 'maximize'
      ? ` Bias and variance are in error terms (1 − ${metric}).`
      : '';
  const lines: HeadlineLine[] = [
    ...(did === null ? [] : [{ label: 'This PR', text: did, tone: 'neutral' as const }]),
    {
      label: say(MOVEMENT_SENTENCE, review.movement, esc),
      text: `${changePhrase('avoidable bias', review.bias.delta, review, f)}; ${changePhrase(
        'variance',
        review.variance.delta,
        review,
        f,
      )}. Diagnosis: baseline ${say(DIAGNOSIS_WORD, review.baseline.diagnosis, esc)}, candidate ${say(
        DIAGNOSIS_WORD,
        review.candidate.diagnosis,
        esc,
      )}.${errorTerms}`,
      tone: movementTone,
    },
    {
      label: `Validation ${metric} ${say(VALIDATION_WORD, v.change, esc)}`,
      text: `${from}(Δ ${vStats}).`,
      tone: vTone,
    },
    ...guardrailLines(review, esc),
    {
      label: review.gate.pass ? 'Gate passed' : 'Gate failed',
      text: gateSentence(review, esc),
      tone: review.gate.pass ? 'good' : 'bad',
    },
  ];
  const first = review.levers[0];
  if (first === undefined)
    lines.push({ label: 'Next lever', text: 'none suggested.', tone: 'neutral' });
  else {
    const text = leverHeadline(first, review, f, esc);
    lines.push({
      label: `Next lever: ${text.title}`,
      text: text.sentences.join(' ') || '—',
      tone: 'neutral',
    });
  }
  const hidden = sortSlices(review).filter((s) => s.hiddenRegression);
  const worst = hidden[0];
  if (worst !== undefined) {
    lines.push({
      label: `${hidden.length} ${hidden.length === 1 ? 'slice' : 'slices'} got worse while validation improved`,
      text: `worst: ${esc(worst.name, 60)} (${value(worst.baseline, f)} → ${value(worst.candidate, f)}, ${change(worst.delta.estimate, f)}).`,
      tone: 'bad',
    });
  }
  const title = `${say(MOVEMENT_TITLE, review.movement, esc)} · validation ${say(
    VALIDATION_WORD,
    v.change,
    esc,
  )} · gate ${review.gate.pass ? 'passed' : 'failed'}`;
  return { title, tone: review.gate.pass ? movementTone : 'bad', lines };
}
