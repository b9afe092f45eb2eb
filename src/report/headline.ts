/**
 * The headline of a review as data: a title and a few labelled sentences (movement, validation,
 * gate, next lever), shared by the markdown and text renderers.
 */
import type { Delta, Review } from '../model/review.js';
import type { Escape } from './tables.js';
import { interval, num, numberFormatFor, pValue, signed } from './format.js';
import { sortSlices } from './tables.js';
import {
  DIAGNOSIS_WORD,
  LEVER_TITLE,
  MOVEMENT_SENTENCE,
  MOVEMENT_TITLE,
  TEST_WORD,
  VALIDATION_WORD,
  levelPercent,
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

function changePhrase(name: string, delta: Delta | null, review: Review): string {
  const f = numberFormatFor(review);
  if (delta === null) return `${name} unknown`;
  const level = levelPercent(review);
  const stats =
    delta.ci === null
      ? `${signed(delta.estimate, f)}, noise unknown`
      : `${signed(delta.estimate, f)}, ${level}% interval ${interval(delta.ci, f)}, ${pValue(delta.p)}`;
  const word = delta.call === 'up' ? 'rose' : delta.call === 'down' ? 'fell' : 'held steady';
  return `${name} ${word} (${stats})`;
}

export function buildHeadline(review: Review, esc: Escape): Headline {
  const f = numberFormatFor(review);
  const metric = esc(review.metric.name, 60);
  const v = review.validation;
  const vBase = review.splits.find((s) => s.split === 'validation');
  const movementTone: Tone =
    review.movement === 'better-on-both' ||
    review.movement === 'away-from-overfitting' ||
    review.movement === 'away-from-underfitting'
      ? 'good'
      : review.movement === 'no-significant-change'
        ? 'neutral'
        : 'bad';
  const vTone: Tone = v.change === 'better' ? 'good' : v.change === 'worse' ? 'bad' : 'neutral';
  const level = levelPercent(review);
  const vStats =
    v.delta.ci === null
      ? `Δ ${signed(v.delta.estimate, f)}; run-to-run noise unknown`
      : `Δ ${signed(v.delta.estimate, f)}, ${level}% interval ${interval(v.delta.ci, f)}, ${pValue(v.delta.p)}, ${TEST_WORD[v.delta.test]}`;
  const from = vBase === undefined ? '' : `${num(vBase.baseline, f)} → ${num(vBase.candidate, f)} `;
  const lines: HeadlineLine[] = [
    {
      label: MOVEMENT_SENTENCE[review.movement],
      text: `${changePhrase(
        'avoidable bias',
        review.bias.delta,
        review,
      )}; ${changePhrase('variance', review.variance.delta, review)}. Diagnosis: baseline ${
        DIAGNOSIS_WORD[review.baseline.diagnosis]
      }, candidate ${DIAGNOSIS_WORD[review.candidate.diagnosis]}.`,
      tone: movementTone,
    },
    {
      label: `Validation ${metric} ${VALIDATION_WORD[v.change]}`,
      text: `${from}(${vStats}).`,
      tone: vTone,
    },
  ];
  const gate = review.gate;
  lines.push({
    label: gate.pass ? 'Gate passed' : 'Gate failed',
    text: gate.pass
      ? gate.failOn.length === 0
        ? 'no fail-on policy is set.'
        : `none of fail-on (${gate.failOn.map((p) => esc(p, 60)).join(', ')}) applies.`
      : `${gate.reasons.map((r) => esc(r, 200)).join('; ')}.`,
    tone: gate.pass ? 'good' : 'bad',
  });
  const first = review.levers[0];
  lines.push(
    first === undefined
      ? { label: 'Next lever', text: 'none suggested.', tone: 'neutral' }
      : {
          label: `Next lever: ${LEVER_TITLE[first.id]}`,
          text: esc(first.reason, 300),
          tone: 'neutral',
        },
  );
  const hidden = sortSlices(review).filter((s) => s.hiddenRegression);
  const worst = hidden[0];
  if (worst !== undefined) {
    lines.push({
      label: `${hidden.length} ${hidden.length === 1 ? 'slice' : 'slices'} got worse while validation improved`,
      text: `worst: ${esc(worst.name, 60)} (${signed(worst.delta.estimate, f)}).`,
      tone: 'bad',
    });
  }
  const title = `${MOVEMENT_TITLE[review.movement]} · validation ${VALIDATION_WORD[v.change]} · gate ${
    gate.pass ? 'passed' : 'failed'
  }`;
  return { title, tone: gate.pass ? movementTone : 'bad', lines };
}
