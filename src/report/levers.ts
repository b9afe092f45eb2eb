/**
 * The sentences of the levers section: each lever's evidence and suggestion in words. Artifact
 * strings (hyperparameter and metric names) go through the renderer's `esc`.
 */
import type { Lever, LeverEvidence, LeverId, Review, Suggestion } from '../model/review.js';
import type { Escape } from './escape.js';
import {
  amount,
  change,
  count,
  fixed,
  pText,
  short,
  value,
  valueRange,
  type NumberFormat,
} from './format.js';
import { COMPONENT_TITLE, COMPONENT_WORD, EFFECT_WORD, LEVER_TITLE, say } from './words.js';

export interface LeverText {
  title: string;
  /** The lever's evidence and suggestion, one sentence each. */
  sentences: string[];
}

interface Context {
  review: Review;
  f: NumberFormat;
  esc: Escape;
}

export function leverText(lever: Lever, review: Review, f: NumberFormat, esc: Escape): LeverText {
  const ctx = { review, f, esc };
  const sentences = lever.evidence.flatMap((e) => evidenceSentence(e, lever.id, ctx) ?? []);
  if (lever.suggestion !== undefined) sentences.push(suggestionSentence(lever.suggestion, ctx));
  return { title: say(LEVER_TITLE, lever.id, esc), sentences };
}

/**
 * The lever in one short sentence for the headline: its suggestion when it has one, else its first
 * measured or PR-change reason.
 */
export function leverHeadline(
  lever: Lever,
  review: Review,
  f: NumberFormat,
  esc: Escape,
): LeverText {
  const ctx = { review, f, esc };
  const title = say(LEVER_TITLE, lever.id, esc);
  if (lever.suggestion !== undefined)
    return { title, sentences: [suggestionSentence(lever.suggestion, ctx)] };
  const first = lever.evidence.flatMap((e) => evidenceSentence(e, lever.id, ctx) ?? [])[0];
  return { title, sentences: first === undefined ? [] : [first] };
}

/** A change `from → to` of a hyperparameter; null is "no limit". */
function fromTo(e: { from: number | null; to: number | null }): string {
  const v = (x: number | null): string => (x === null ? 'no limit' : short(x));
  return `${v(e.from)} → ${v(e.to)}`;
}

function evidenceSentence(e: LeverEvidence, id: LeverId, ctx: Context): string | null {
  const { f, esc, review } = ctx;
  const metric = esc(review.metric.name, 60);
  switch (e.kind) {
    case 'diagnosis':
      if (e.component === 'mismatch')
        return `Validation error exceeds train-dev error by ${amount(e.value, f)}: the training data does not look like the validation data; collect or synthesise training data that resembles it.`;
      if (e.component === 'overfit')
        return `Test error exceeds validation error by ${amount(e.value, f)}: model choices may be tuned to the validation set; enlarge or refresh it.`;
      return `The candidate has high ${say(COMPONENT_WORD, e.component, esc)}: ${amount(e.value, f)} against a validation error of ${value(e.errorLevel, f)}.`;
    case 'pr-change': {
      const units = e.totalUnits === true ? ' hidden units in total' : '';
      return `This PR ${e.direction === 'raised' ? 'raised' : 'lowered'} ${esc(e.hyperparameter, 60)} ${fromTo(e)}${units}: ${say(EFFECT_WORD, e.effect, esc)}.`;
    }
    case 'component-change': {
      const word =
        e.delta.call === 'up' ? 'rose' : e.delta.call === 'down' ? 'fell' : 'held steady';
      const toward =
        e.delta.call !== 'up'
          ? ''
          : e.component === 'bias'
            ? ': the model moved toward underfitting'
            : ': the model moved toward overfitting';
      return `${say(COMPONENT_TITLE, e.component, esc)} ${word} (${change(e.delta.estimate, f)}, ${pText(e.delta.p)})${toward}.`;
    }
    case 'already-pulled':
      return `This PR already ${e.direction === 'raised' ? 'raised' : 'lowered'} ${esc(e.hyperparameter, 60)} (${fromTo(e)}): judge its effect before pulling further.`;
    case 'sweep-minimum':
      return sweepSentence(e, ctx);
    case 'learning-curve': {
      if (e.includesToday)
        return `More data is unlikely to help measurably: at ${count(e.atX)} training examples the power-law fit projects validation ${metric} ${value(e.projected, f)}, with an interval (${valueRange(e.ci, f)}) that includes today's ${value(e.current, f)}.`;
      const times = e.fromX > 0 ? ` (${short(e.atX / e.fromX)}× the largest on the curve)` : '';
      return `At ${count(e.atX)} training examples${times} the power-law fit (R² ${fixed(e.r2, 2)}) projects validation ${metric} ${value(e.current, f)} → ${value(e.projected, f)} (${valueRange(e.ci, f)}).`;
    }
    case 'gap-trend':
      return e.trend === 'flat'
        ? 'The train/validation gap is flat at the right end of the learning curve: more data will help little.'
        : 'The train/validation gap is still closing at the right end of the learning curve.';
    case 'epoch-minimum':
      return `Validation was best at epoch ${short(e.epoch)} of ${short(e.of)}; stopping there saves ${amount(e.saves, f)}${e.gl === null ? '' : ` (generalization loss ${fixed(e.gl, 1)}%)`}.`;
    case 'still-improving':
      return `Train and validation ${metric} were both still improving at epoch ${short(e.epoch)}.`;
    case 'epoch-curve-silent':
      if (!e.curve) return 'No epoch curve to confirm it.';
      return id === 'train-longer'
        ? 'The epoch curve does not show both errors still falling at the end.'
        : 'The epoch curve does not show training past the validation minimum.';
    case 'reference-missing':
      return 'Bias is unknown without a reference level: add `reference` (human-level error, a prior system, or an estimated Bayes error) to the artifacts or the config.';
    case 'noise-unknown':
      return 'Run-to-run noise is unknown: train with 2 or more seeds (or ship per-example predictions) so changes can be tested.';
    case 'cheaper-than':
      return `Ranked alike with ${say(LEVER_TITLE, e.over, esc).toLowerCase()}; first because it ${e.training === 'less' ? 'trains for less' : 'adds no training cost'}.`;
    case 'change-undetermined':
      return e.repeatsNeeded === null
        ? 'The validation change is undetermined at this noise: no other lever can be judged yet.'
        : `The validation change is undetermined at this noise: about ${count(e.repeatsNeeded)} repeats (seeds) per run would detect the minimum effect.`;
    default:
      return null;
  }
}

function sweepSentence(e: Extract<LeverEvidence, { kind: 'sweep-minimum' }>, ctx: Context): string {
  const { f, esc } = ctx;
  const name = e.hyperparameter === null ? 'λ' : esc(e.hyperparameter, 60);
  const at = `${name} ≈ ${short(e.bestX)}`;
  const uses = e.current === null ? '' : `; the candidate uses ${short(e.current)}`;
  const edge =
    e.atEdge === null
      ? ''
      : ` The minimum is at the ${e.atEdge === 'low' ? 'low' : 'high'} end of the sweep: extend it.`;
  if (e.supports === true)
    return `The regularization sweep has its lowest validation (${value(e.bestValidation, f)}) at ${at}${uses}.${edge}`;
  if (e.supports === false && e.side === 'at')
    return `The candidate's strength is already at the sweep's validation minimum (${at}).${edge}`;
  if (e.supports === false)
    return `The sweep's validation minimum (${at}) lies on the other side of the candidate's strength.${edge}`;
  return `The regularization sweep has its lowest validation (${value(e.bestValidation, f)}) at ${at}.${edge}`;
}

const BASIS: Readonly<Record<Suggestion['basis'], string>> = {
  'between-old-and-new': ', between the old and new values',
  'back-to-baseline': ', the baseline value',
  'finite-limit': ', a finite limit instead of none',
  'sweep-minimum': ", the sweep's minimum",
  'beyond-sweep-edge': ', one grid step beyond the end of the sweep',
};

function suggestionSentence(s: Suggestion, ctx: Context): string {
  const basis = BASIS[s.basis] ?? '';
  const units = s.totalUnits === true ? ' hidden units in total' : '';
  return `Try ${ctx.esc(s.hyperparameter, 60)} ≈ ${short(s.value)}${units}${basis}.`;
}
