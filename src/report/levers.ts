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
import { COMPONENT_TITLE, COMPONENT_WORD, LEVER_TITLE, say } from './words.js';

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

/** A change `from → to` of a hyperparameter, escaped. */
function fromTo(e: { from: number; to: number }): string {
  return `${short(e.from)} → ${short(e.to)}`;
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
    case 'pr-change':
      return `This PR ${e.direction === 'raised' ? 'raised' : 'lowered'} ${esc(e.hyperparameter, 60)} ${fromTo(e)}.`;
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

function suggestionSentence(s: Suggestion, ctx: Context): string {
  const basis =
    s.basis === 'between-old-and-new'
      ? ', between the old and new values'
      : s.basis === 'sweep-minimum'
        ? ", the sweep's minimum"
        : ', one grid step beyond the end of the sweep';
  return `Try ${ctx.esc(s.hyperparameter, 60)} ≈ ${short(s.value)}${basis}.`;
}
