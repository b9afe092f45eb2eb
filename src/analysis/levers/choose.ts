/**
 * What to try next (DESIGN.md §7): levers ranked by the candidate's diagnosis, sharpened by the
 * PR's own hyperparameter change and by curve evidence, each with a one-line reason citing numbers.
 * Pure.
 */
import type { MetricKind } from '../../model/run.js';
import type {
  CurvesReport,
  LearningCurveEvidence,
  RegularizationEvidence,
  EpochsEvidence,
} from '../../model/curves.js';
import { formatChange, formatNumber, formatP, formatValue } from '../format.js';
import { knobOf, type PulledLever } from '../hyperparameters.js';
import type {
  Delta,
  Diagnosis,
  HyperparameterChange,
  Lever,
  LeverId,
  Movement,
  RunSummary,
} from '../../model/review.js';

export type Target = 'variance' | 'bias' | 'mismatch' | 'validation-overfit' | 'evidence';

/** The lever catalogue: what each lever addresses (common practice) and its one-line meaning. */
export const LEVER_CATALOGUE: Record<LeverId, { addresses: Target; meaning: string }> = {
  'more-data': { addresses: 'variance', meaning: 'train on more examples' },
  'fewer-features': { addresses: 'variance', meaning: 'drop weak or redundant features' },
  'stronger-regularization': {
    addresses: 'variance',
    meaning: 'raise the regularization strength',
  },
  'smaller-model': { addresses: 'variance', meaning: 'reduce model capacity' },
  'early-stopping': { addresses: 'variance', meaning: 'stop at the validation minimum' },
  'more-features': { addresses: 'bias', meaning: 'add informative features' },
  'richer-features': { addresses: 'bias', meaning: 'add polynomial or interaction terms' },
  'weaker-regularization': { addresses: 'bias', meaning: 'lower the regularization strength' },
  'bigger-model': { addresses: 'bias', meaning: 'increase model capacity' },
  'train-longer': { addresses: 'bias', meaning: 'train for more epochs' },
  'align-training-data': {
    addresses: 'mismatch',
    meaning: 'make training data look like validation data',
  },
  'bigger-validation-set': {
    addresses: 'validation-overfit',
    meaning: 'enlarge or refresh the validation set',
  },
  'add-repeats': { addresses: 'evidence', meaning: 'repeat training with other seeds' },
  'supply-reference': { addresses: 'evidence', meaning: 'give a reference level' },
};

const BY_TARGET: Record<'variance' | 'bias', LeverId[]> = {
  variance: [
    'more-data',
    'stronger-regularization',
    'fewer-features',
    'early-stopping',
    'smaller-model',
  ],
  bias: [
    'richer-features',
    'more-features',
    'weaker-regularization',
    'bigger-model',
    'train-longer',
  ],
};

/** Shrinking the training set lowers training error but does not cure high bias (common practice). */
export const SMALLER_TRAINING_SET_NOTE =
  'A smaller training set is not a cure for high bias: it only lowers the training error, while validation error stays high or rises.';

export interface LeverContext {
  kind: MetricKind;
  metricName: string;
  candidate: RunSummary;
  baseline: RunSummary;
  movement: Movement;
  bias: Delta;
  variance: Delta;
  pulled: PulledLever[];
  changes: HyperparameterChange[];
  /** Candidate's regularization strength from its hyperparameters, if it has one. */
  lambda: number | undefined;
  noiseUnknown: boolean;
}

function learning(curves: CurvesReport): LearningCurveEvidence | null {
  const c = curves.training_examples;
  return c !== undefined && !('skipped' in c) ? c : null;
}
function regularization(curves: CurvesReport): RegularizationEvidence | null {
  const c = curves.regularization;
  return c !== undefined && !('skipped' in c) ? c : null;
}
function epochs(curves: CurvesReport): EpochsEvidence | null {
  const c = curves.epochs;
  return c !== undefined && !('skipped' in c) ? c : null;
}

function targets(diagnosis: Diagnosis, run: RunSummary): ('variance' | 'bias')[] {
  const b = run.components.bias.value ?? 0;
  const v = run.components.variance.value ?? 0;
  switch (diagnosis) {
    case 'high-variance':
      return ['variance'];
    case 'high-bias':
      return ['bias'];
    case 'high-bias-and-variance':
      return b >= v ? ['bias', 'variance'] : ['variance', 'bias'];
    default:
      return [];
  }
}

interface Draft extends Lever {
  score: number;
}

export function chooseLevers(ctx: LeverContext): { levers: Lever[]; nonLevers: string[] } {
  const { kind } = ctx;
  const v = (x: number): string => formatValue(x, kind);
  const curves = ctx.candidate.curves;
  const drafts = new Map<LeverId, Draft>();
  const add = (id: LeverId, score: number, reason: string, evidence: string[] = []): void => {
    const existing = drafts.get(id);
    if (existing === undefined || existing.score < score)
      drafts.set(id, { id, reason, evidence, score });
  };
  const pulled = new Map(ctx.pulled.map((p) => [p.lever, p]));
  const pulledNote = (id: LeverId): string | null => {
    const p = pulled.get(id);
    if (p === undefined) return null;
    return `this PR already ${p.change.kind} ${p.change.key} (${String(p.change.baseline)} → ${String(p.change.candidate)})`;
  };

  const lc = learning(curves);
  const reg = regularization(curves);
  const ep = epochs(curves);
  const stopEarlierReason = (e: EpochsEvidence): string =>
    `Validation minimum at epoch ${formatNumber(e.bestX)} of ${formatNumber(e.finalX)}; stopping there saves ${formatChange(e.finalValidation - e.bestValidation, kind).replace(/^\+/, '')}${e.gl === null ? '' : ` (generalization loss ${e.gl.toFixed(1)}%)`}.`;
  const trainLongerReason = (e: EpochsEvidence): string =>
    `Train and validation ${ctx.metricName} were both still falling at epoch ${formatNumber(e.finalX)}: train longer.`;

  // 1. The PR's own change overshot: point between old and new.
  for (const p of ctx.pulled) {
    const { baseline: from, candidate: to } = p.change;
    if (typeof from !== 'number' || typeof to !== 'number') continue;
    const between = from > 0 && to > 0 ? Math.sqrt(from * to) : (from + to) / 2;
    const overshotTowardBias =
      ctx.movement === 'toward-underfitting' || ctx.movement === 'worse-on-both';
    const overshotTowardVariance =
      ctx.movement === 'toward-overfitting' || ctx.movement === 'worse-on-both';
    if (p.lever === 'stronger-regularization' && overshotTowardBias) {
      add(
        'weaker-regularization',
        100,
        `${p.change.key} rose ${from} → ${to} and moved the model toward underfitting (Δbias ${formatChange(ctx.bias.estimate, kind)}); try ${p.change.key} ≈ ${formatNumber(between)}, between the two.`,
        [`Δbias ${formatChange(ctx.bias.estimate, kind)}, p ${formatP(ctx.bias.p)}`],
      );
    }
    if (p.lever === 'weaker-regularization' && overshotTowardVariance) {
      add(
        'stronger-regularization',
        100,
        `${p.change.key} fell ${from} → ${to} and moved the model toward overfitting (Δvariance ${formatChange(ctx.variance.estimate, kind)}); try ${p.change.key} ≈ ${formatNumber(between)}, between the two.`,
        [`Δvariance ${formatChange(ctx.variance.estimate, kind)}, p ${formatP(ctx.variance.p)}`],
      );
    }
    if (
      (p.lever === 'richer-features' ||
        p.lever === 'more-features' ||
        p.lever === 'bigger-model') &&
      overshotTowardVariance
    ) {
      const back: LeverId = p.lever === 'bigger-model' ? 'smaller-model' : 'fewer-features';
      add(
        back,
        90,
        `${p.change.key} rose ${from} → ${to} and moved the model toward overfitting (Δvariance ${formatChange(ctx.variance.estimate, kind)}); step back toward ${formatNumber(between)} or keep it and regularize harder.`,
        [`Δvariance ${formatChange(ctx.variance.estimate, kind)}`],
      );
      if (reg !== null && reg.side === 'below') {
        add(
          'stronger-regularization',
          95,
          `Keep the new ${p.change.key} and regularize harder: the candidate's sweep has its validation minimum at λ ≈ ${formatNumber(reg.bestX)}${ctx.lambda === undefined ? '' : ` (it uses ${formatNumber(ctx.lambda)})`}; try ${formatNumber(reg.suggestedX)}.`,
          [`lowest validation ${v(reg.bestValidation)} at λ ≈ ${formatNumber(reg.bestX)}`],
        );
      } else {
        add(
          'stronger-regularization',
          85,
          `Keep the new ${p.change.key} but counter its extra variance with stronger regularization.`,
          [],
        );
      }
    }
  }

  // 2. Levers for the candidate's diagnosis, in order, sharpened by curves.
  const order = targets(ctx.candidate.diagnosis, ctx.candidate);
  order.forEach((target, t) => {
    const component = ctx.candidate.components[target];
    const label = target === 'bias' ? 'avoidable bias' : 'variance';
    const size =
      component.value === null
        ? ''
        : `: ${label} ${v(component.value)} against a validation error of ${v(ctx.candidate.errorLevel)}`;
    BY_TARGET[target].forEach((id, i) => {
      let score = 60 - t * 20 - i * 2;
      let reason = `The candidate has high ${target}${size}.`;
      const evidence: string[] = [];
      if (id === 'more-data' && lc !== null) {
        const twice = lc.projections[0];
        if (twice !== undefined) {
          reason = `2× data projects validation ${ctx.metricName} ${v(ctx.candidate.splits.find((s) => s.split === 'validation')?.mean ?? 0)} → ${v(twice.validation)} (power-law fit R² ${lc.r2.toFixed(2)}).`;
          evidence.push(
            `fit e(m) = ${formatNumber(lc.a)}·m^−${formatNumber(lc.b)} + ${formatNumber(lc.c)}; at ${formatNumber(twice.x)} examples: ${v(twice.ci[0])} to ${v(twice.ci[1])}`,
          );
        }
        if (lc.gapTrend === 'flat') {
          score -= 25;
          reason = `More data will help little: the train/validation gap is flat at the right end of the learning curve.`;
        } else if (lc.gapTrend === 'closing') score += 8;
      }
      if ((id === 'stronger-regularization' || id === 'weaker-regularization') && reg !== null) {
        const wants = id === 'stronger-regularization' ? 'below' : 'above';
        if (reg.atEdge !== null) {
          evidence.push(
            `the sweep's minimum is at its ${reg.atEdge} end (${formatNumber(reg.bestX)}): extend the sweep`,
          );
        }
        if (reg.side === wants) {
          score += 10;
          reason = `The regularization sweep has its validation minimum at λ ≈ ${formatNumber(reg.bestX)}${ctx.lambda === undefined ? '' : `, the candidate uses ${formatNumber(ctx.lambda)}`}; try ${formatNumber(reg.suggestedX)}.`;
        } else if (reg.side !== 'unknown') {
          score -= 20;
          const meaning = LEVER_CATALOGUE[id].meaning;
          reason = `${meaning.charAt(0).toUpperCase()}${meaning.slice(1)}, but the sweep's validation minimum (λ ≈ ${formatNumber(reg.bestX)}) is on the other side.`;
        }
      }
      if (id === 'early-stopping') {
        if (ep !== null && ep.stoppedLate) {
          score += 12;
          reason = stopEarlierReason(ep);
        } else {
          score -= 15;
          reason = `${reason} ${ep === null ? 'No epoch curve to confirm it.' : 'The epoch curve does not show training past the validation minimum.'}`;
        }
      }
      if (id === 'train-longer') {
        if (ep !== null && ep.stoppedEarly) {
          score += 12;
          reason = trainLongerReason(ep);
        } else {
          score -= 15;
          reason = `${reason} ${ep === null ? 'No epoch curve to confirm it.' : 'The epoch curve does not show both errors still falling at the end.'}`;
        }
      }
      if (id === 'weaker-regularization' && ctx.lambda === undefined && reg === null) score -= 10;
      const note = pulledNote(id);
      if (note !== null) {
        score -= 30;
        reason = `${reason} Note: ${note}; judge its effect before pulling further.`;
      }
      add(id, score, reason, evidence);
    });
  });

  // The epoch curve speaks for itself whatever the diagnosis.
  if (ep !== null && ep.stoppedLate && !drafts.has('early-stopping')) {
    add('early-stopping', 35, stopEarlierReason(ep));
  }
  if (ep !== null && ep.stoppedEarly && !drafts.has('train-longer')) {
    add('train-longer', 35, trainLongerReason(ep));
  }
  if (ctx.candidate.diagnosis === 'data-mismatch' || ctx.candidate.components.mismatch.present) {
    const d = ctx.candidate.components.mismatch.value ?? 0;
    add(
      'align-training-data',
      ctx.candidate.diagnosis === 'data-mismatch' ? 70 : 30,
      `Validation error exceeds train_dev error by ${v(d)}: the training data does not look like the validation data; collect or synthesise training data that resembles it.`,
    );
  }
  if (ctx.candidate.components.overfit.present) {
    add(
      'bigger-validation-set',
      40,
      `Test error exceeds validation error by ${v(ctx.candidate.components.overfit.value ?? 0)}: choices may be tuned to the validation set; enlarge or refresh it.`,
    );
  }
  if (ctx.candidate.biasUnknown) {
    add(
      'supply-reference',
      20,
      'Bias is unknown without a reference level: add "reference" (human-level error, a prior system, or an estimated Bayes error) to the artifacts or the config.',
    );
  }
  if (ctx.noiseUnknown) {
    add(
      'add-repeats',
      15,
      'Run-to-run noise is unknown: train with 2 or more seeds (or ship per-example predictions) so changes can be tested.',
    );
  }

  const levers = [...drafts.values()]
    .sort((a, b) => b.score - a.score)
    .map(({ id, reason, evidence }) => ({ id, reason, evidence }));
  const nonLevers: string[] = [];
  const biasy =
    ctx.candidate.diagnosis === 'high-bias' || ctx.candidate.diagnosis === 'high-bias-and-variance';
  const shrank = ctx.changes.some((c) => c.kind === 'lowered' && knobOf(c.key) === 'data');
  if (biasy || shrank) nonLevers.push(SMALLER_TRAINING_SET_NOTE);
  return { levers, nonLevers };
}
