/** The hyperparameter diff between two runs and the levers a change already pulled. Pure. */
import type { Hyperparameters } from '../model/run.js';
import type { HyperparameterChange, LeverId } from '../model/review.js';

export function diffHyperparameters(
  baseline: Hyperparameters = {},
  candidate: Hyperparameters = {},
): HyperparameterChange[] {
  const keys = [...new Set([...Object.keys(baseline), ...Object.keys(candidate)])].sort();
  const out: HyperparameterChange[] = [];
  for (const key of keys) {
    const inB = Object.hasOwn(baseline, key);
    const inC = Object.hasOwn(candidate, key);
    const b = baseline[key];
    const c = candidate[key];
    if (!inB) out.push({ key, baseline: null, candidate: c, kind: 'added' });
    else if (!inC) out.push({ key, baseline: b, candidate: null, kind: 'removed' });
    else if (typeof b === 'number' && typeof c === 'number') {
      if (c > b) out.push({ key, baseline: b, candidate: c, kind: 'raised' });
      else if (c < b) out.push({ key, baseline: b, candidate: c, kind: 'lowered' });
    } else if (JSON.stringify(b) !== JSON.stringify(c))
      out.push({ key, baseline: b, candidate: c, kind: 'changed' });
  }
  return out;
}

/** What a hyperparameter controls, recognised from common names (common practice). */
export type Knob =
  'regularization' | 'features' | 'feature-richness' | 'data' | 'epochs' | 'model-size';

const KNOBS: [RegExp, Knob][] = [
  [
    /^(lambda|l2|l2_penalty|weight_decay|reg(ularization)?(_strength)?|ridge_alpha|dropout)$/i,
    'regularization',
  ],
  [/^(features|num_features|n_features|feature_count)$/i, 'features'],
  [/^(polynomial_degree|poly_degree|degree|interaction_terms)$/i, 'feature-richness'],
  [/^(train_examples|training_examples|n_train|train_size|num_train)$/i, 'data'],
  [/^(epochs|max_epochs|num_epochs|iterations|max_iter|steps)$/i, 'epochs'],
  [
    /^(hidden_units|hidden_size|layers|num_layers|depth|max_depth|width|params|parameters|model_size|n_estimators)$/i,
    'model-size',
  ],
];

export function knobOf(key: string): Knob | null {
  for (const [pattern, knob] of KNOBS) if (pattern.test(key)) return knob;
  return null;
}

const PULLED: Record<Knob, { raised: LeverId; lowered: LeverId }> = {
  regularization: { raised: 'stronger-regularization', lowered: 'weaker-regularization' },
  features: { raised: 'more-features', lowered: 'fewer-features' },
  'feature-richness': { raised: 'richer-features', lowered: 'fewer-features' },
  data: { raised: 'more-data', lowered: 'more-data' },
  epochs: { raised: 'train-longer', lowered: 'early-stopping' },
  'model-size': { raised: 'bigger-model', lowered: 'smaller-model' },
};

export interface PulledLever {
  lever: LeverId;
  change: HyperparameterChange;
  knob: Knob;
}

/** Levers the PR itself pulled, from its numeric hyperparameter changes. Less data pulls none. */
export function pulledLevers(changes: readonly HyperparameterChange[]): PulledLever[] {
  const out: PulledLever[] = [];
  for (const change of changes) {
    if (change.kind !== 'raised' && change.kind !== 'lowered') continue;
    const knob = knobOf(change.key);
    if (knob === null) continue;
    if (knob === 'data' && change.kind === 'lowered') continue;
    out.push({ lever: PULLED[knob][change.kind], change, knob });
  }
  return out;
}
