/**
 * The words the reports use for the review model's codes. Our own wording. Tables are Maps, so a
 * code read from an untrusted report can only find an entry the table really has; a code with no
 * entry is shown escaped, as the text it is.
 */
import type {
  ChangeEffect,
  Call,
  ComponentName,
  Diagnosis,
  LeverId,
  Movement,
  ReferenceSource,
  Review,
  ValidationChange,
} from '../model/review.js';
import type { SplitName } from '../model/run.js';
import type { TestName } from '../stats/types.js';
import type { Escape } from './escape.js';

/** A table of words for codes. */
export type Words<K extends string> = ReadonlyMap<K, string>;

function words<K extends string>(entries: Record<K, string>): Words<K> {
  return new Map(Object.entries(entries) as [K, string][]);
}

/** The word for `code`, or the code itself, escaped, when the table has none. */
export function say<K extends string>(table: Words<K>, code: K, esc: Escape): string {
  return table.get(code) ?? esc(String(code), 60);
}

export const MOVEMENT_TITLE = words<Movement>({
  'better-on-both': 'less bias and less variance',
  'away-from-underfitting': 'away from underfitting',
  'toward-overfitting': 'toward overfitting',
  'away-from-overfitting': 'away from overfitting',
  'no-significant-change': 'no change beyond noise',
  'toward-underfitting': 'toward underfitting',
  'worse-on-both': 'more bias and more variance',
  undetermined: 'cannot tell: no noise estimate',
});

export const MOVEMENT_SENTENCE = words<Movement>({
  'better-on-both': 'The change lowered both avoidable bias and variance',
  'away-from-underfitting': 'The change moved the model away from underfitting',
  'toward-overfitting': 'The change moved the model toward overfitting',
  'away-from-overfitting': 'The change moved the model away from overfitting',
  'no-significant-change':
    'The change did not move avoidable bias or variance beyond run-to-run noise',
  'toward-underfitting': 'The change moved the model toward underfitting',
  'worse-on-both': 'The change raised both avoidable bias and variance',
  undetermined:
    'Whether the change moved avoidable bias or variance cannot be told: their noise is unknown',
});

export const VALIDATION_WORD = words<ValidationChange>({
  better: 'better',
  worse: 'worse',
  flat: 'unchanged within noise',
  undetermined: 'undetermined (noise unknown)',
});

export const DIAGNOSIS_WORD = words<Diagnosis>({
  'good-fit': 'good fit',
  'high-bias': 'high bias (underfitting)',
  'high-variance': 'high variance (overfitting)',
  'data-mismatch': 'data mismatch',
  'high-bias-and-variance': 'high bias and high variance',
});

/** Component names at the start of a table row or sentence. */
export const COMPONENT_TITLE = words<ComponentName>({
  bias: 'Avoidable bias',
  variance: 'Variance',
  mismatch: 'Data mismatch',
  overfit: 'Validation overfit',
});

/** Component names inside a sentence. */
export const COMPONENT_WORD = words<ComponentName>({
  bias: 'avoidable bias',
  variance: 'variance',
  mismatch: 'data mismatch',
  overfit: 'validation overfit',
});

export const COMPONENT_ORDER: readonly ComponentName[] = [
  'bias',
  'variance',
  'mismatch',
  'overfit',
];

/** Split names in prose and tables (`train_dev` is only the artifact key). */
export const SPLIT_WORD = words<SplitName>({
  train: 'train',
  train_dev: 'train-dev',
  validation: 'validation',
  test: 'test',
});

export const LEVER_TITLE = words<LeverId>({
  'more-data': 'Add training data',
  'fewer-features': 'Use fewer features',
  'stronger-regularization': 'Strengthen regularization',
  'smaller-model': 'Use a smaller model',
  'early-stopping': 'Stop training earlier',
  'more-features': 'Add features',
  'richer-features': 'Add polynomial or interaction terms',
  'weaker-regularization': 'Weaken regularization',
  'bigger-model': 'Use a bigger model',
  'train-longer': 'Train longer',
  'align-training-data': 'Make training data look like validation data',
  'bigger-validation-set': 'Use a bigger validation set',
  'add-repeats': 'Repeat each run with several seeds',
  'supply-reference': 'Supply a reference error level',
  'repeat-with-seeds': 'Repeat both runs with more seeds first',
});

export const TEST_WORD = words<TestName>({
  'welch-t': "Welch's t-test",
  'z-binomial': 'binomial z-test',
  'mcnemar-exact': "McNemar's exact test",
  'paired-t': 'paired t-test',
  'newcombe-score': "Newcombe's score interval",
  none: 'no test',
});

export const TEST_WHY = words<TestName>({
  'welch-t':
    "Welch's t-test on per-repeat values: each run has two or more repeats (seeds), and their spreads may differ.",
  'z-binomial':
    'normal approximation with binomial variances: one repeat of a proportion metric measured on a known number of examples.',
  'mcnemar-exact':
    "McNemar's exact test: both runs scored the same examples, so only the examples on which they disagree carry information.",
  'paired-t':
    'paired t-test on per-example loss differences: both runs scored the same examples with a continuous loss.',
  'newcombe-score':
    "Newcombe's hybrid score interval for a difference of two proportions (Newcombe 1998, method 10), its p-value inverting the interval: one repeat of a proportion metric on a known number of examples.",
  none: 'no test: with one repeat of a continuous metric and no paired predictions, run-to-run noise is unknown, so only min-effect decides.',
});

export const REFERENCE_SOURCE = words<ReferenceSource>({
  artifact: 'from the artifact',
  'other-run': "from the other run's artifact (one reference for both runs)",
  config: 'from the config',
  default: 'the default for a minimized proportion',
  unknown: 'source unknown',
});

/** Whether a metric-unit change is an improvement, given the goal. */
export function reading(call: Call, review: Review): 'better' | 'worse' | 'flat' {
  if (call === 'flat') return 'flat';
  const up = call === 'up';
  return up === (review.metric.goal === 'maximize') ? 'better' : 'worse';
}

/** A component change in shortfall units (up is worse), long or one word. */
export function componentReading(call: Call, compact: boolean): string {
  if (call === 'up') return compact ? 'worse' : 'up (worse)';
  if (call === 'down') return compact ? 'better' : 'down (better)';
  return 'flat';
}

/** The interval level in percent for the review's alpha: `95`. */
export function levelPercent(review: Review): string {
  return String(Number(((1 - review.settings.alpha) * 100).toPrecision(4)));
}

/** The caution every report carries. */
export const CAUTION =
  'This verdict is advice for a human reviewer, not a proof: it rests on the numbers the two runs recorded and on the tests named in the method notes.';

export const EFFECT_WORD = words<ChangeEffect>({
  'more-regularization': 'stronger regularization',
  'less-regularization': 'weaker regularization',
  'more-capacity': 'a bigger model',
  'less-capacity': 'a smaller model',
  'more-features': 'more features',
  'fewer-features': 'fewer features',
  'higher-degree': 'higher-degree terms',
  'lower-degree': 'lower-degree terms',
  'more-data': 'more training data',
  'less-data': 'less training data',
  'longer-training': 'longer training',
  'shorter-training': 'shorter training',
  'later-stopping': 'later early stopping',
  'earlier-stopping': 'earlier early stopping',
  'larger-steps': 'larger optimiser steps',
  'smaller-steps': 'smaller optimiser steps',
});
