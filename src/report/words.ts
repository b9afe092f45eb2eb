/** The plain words the reports use for the review model's codes. Our own wording. */
import type {
  Call,
  ComponentName,
  Diagnosis,
  LeverId,
  Movement,
  Review,
  ValidationChange,
} from '../model/review.js';
import type { SplitName } from '../model/run.js';
import type { TestName } from '../stats/types.js';

export const MOVEMENT_TITLE: Record<Movement, string> = {
  'better-on-both': 'less bias and less variance',
  'away-from-underfitting': 'away from underfitting',
  'toward-overfitting': 'toward overfitting',
  'away-from-overfitting': 'away from overfitting',
  'no-significant-change': 'no change beyond noise',
  'toward-underfitting': 'toward underfitting',
  'worse-on-both': 'more bias and more variance',
};

export const MOVEMENT_SENTENCE: Record<Movement, string> = {
  'better-on-both': 'The change lowered both avoidable bias and variance',
  'away-from-underfitting': 'The change moved the model away from underfitting',
  'toward-overfitting': 'The change moved the model toward overfitting',
  'away-from-overfitting': 'The change moved the model away from overfitting',
  'no-significant-change':
    'The change did not move avoidable bias or variance beyond run-to-run noise',
  'toward-underfitting': 'The change moved the model toward underfitting',
  'worse-on-both': 'The change raised both avoidable bias and variance',
};

export const VALIDATION_WORD: Record<ValidationChange, string> = {
  better: 'better',
  worse: 'worse',
  flat: 'unchanged within noise',
};

export const DIAGNOSIS_WORD: Record<Diagnosis, string> = {
  'good-fit': 'good fit',
  'high-bias': 'high bias (underfitting)',
  'high-variance': 'high variance (overfitting)',
  'data-mismatch': 'data mismatch',
  'high-bias-and-variance': 'high bias and high variance',
};

export const COMPONENT_WORD: Record<ComponentName, string> = {
  bias: 'Avoidable bias',
  variance: 'Variance',
  mismatch: 'Data mismatch',
  overfit: 'Validation overfit',
};

export const COMPONENT_ORDER: readonly ComponentName[] = [
  'bias',
  'variance',
  'mismatch',
  'overfit',
];

export const SPLIT_WORD: Record<SplitName, string> = {
  train: 'train',
  train_dev: 'train-dev',
  validation: 'validation',
  test: 'test',
};

export const LEVER_TITLE: Record<LeverId, string> = {
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
};

export const TEST_WORD: Record<TestName, string> = {
  'welch-t': "Welch's t-test",
  'z-binomial': 'binomial z-test',
  'mcnemar-exact': "McNemar's exact test",
  'paired-t': 'paired t-test',
  none: 'no test',
};

export const TEST_WHY: Record<TestName, string> = {
  'welch-t':
    "Welch's t-test on per-repeat values: each run has two or more repeats (seeds), and their spreads may differ.",
  'z-binomial':
    'normal approximation with binomial variances: one repeat of a proportion metric measured on a known number of examples.',
  'mcnemar-exact':
    "McNemar's exact test: both runs scored the same examples, so only the examples on which they disagree carry information.",
  'paired-t':
    'paired t-test on per-example loss differences: both runs scored the same examples with a continuous loss.',
  none: 'no test: with one repeat of a continuous metric and no paired predictions, run-to-run noise is unknown, so only min-effect decides.',
};

/** Whether a metric-unit change is an improvement, given the goal. */
export function reading(call: Call, review: Review): 'better' | 'worse' | 'flat' {
  if (call === 'flat') return 'flat';
  const up = call === 'up';
  return up === (review.metric.goal === 'maximize') ? 'better' : 'worse';
}

/** A component change in shortfall units: up is worse. */
export function componentReading(call: Call): string {
  if (call === 'up') return 'up (worse)';
  if (call === 'down') return 'down (better)';
  return 'flat';
}

/** The interval level in percent for the review's alpha: `95`. */
export function levelPercent(review: Review): string {
  return String(Number(((1 - review.settings.alpha) * 100).toPrecision(4)));
}

/** The caution every report carries. */
export const CAUTION =
  'This verdict is advice for a human reviewer, not a proof: it rests on the numbers the two runs recorded and on the tests named in the method notes.';
