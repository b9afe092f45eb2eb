import type { RunArtifact, Split } from '../../src/model/run.js';
import type { ReviewInput } from '../../src/analysis/review.js';

/** A small run artifact for tests; values are per repeat. */
export function makeRun(options: {
  name?: string;
  goal?: 'minimize' | 'maximize';
  kind?: 'proportion' | 'continuous';
  reference?: number;
  train: number[];
  validation: number[];
  train_dev?: number[];
  test?: number[];
  examples?: number;
  hyperparameters?: Record<string, unknown>;
}): RunArtifact {
  const split = (values: number[]): Split =>
    options.examples === undefined ? { values } : { values, examples: options.examples };
  return {
    format: 'fitgap-run/1',
    run: { name: options.name ?? 'run' },
    metric: { name: 'error', goal: options.goal ?? 'minimize', kind: options.kind ?? 'continuous' },
    ...(options.reference === undefined ? {} : { reference: options.reference }),
    splits: {
      train: split(options.train),
      validation: split(options.validation),
      ...(options.train_dev === undefined ? {} : { train_dev: split(options.train_dev) }),
      ...(options.test === undefined ? {} : { test: split(options.test) }),
    },
    ...(options.hyperparameters === undefined ? {} : { hyperparameters: options.hyperparameters }),
  };
}

export const SETTINGS: ReviewInput['settings'] = {
  alpha: 0.05,
  minEffect: 0,
  gapTolerance: 0.1,
  failOn: ['worse-validation'],
};
