import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  effectOf,
  prChanges,
  pullOf,
  type PrChange,
} from '../../../src/analysis/levers/pr-changes.js';
import { BUILT_IN_VOCABULARY, mergeRoles } from '../../../src/analysis/levers/resolve-knob.js';

function only(changes: PrChange[]): PrChange {
  expect(changes).toHaveLength(1);
  return changes[0] as PrChange;
}

describe('prChanges: known knobs', () => {
  it('reads a cut of C as more regularization (C is an inverse strength)', () => {
    // Source: scikit-learn LogisticRegression docstring: "smaller values specify stronger regularization".
    expect(only(prChanges({ C: 1, solver: 'lbfgs' }, { C: 0.001, solver: 'lbfgs' }))).toEqual({
      hyperparameter: 'C',
      role: 'regularization',
      inverse: true,
      origin: 'built-in',
      from: 1,
      to: 0.001,
      direction: 'lowered',
      ratio: 0.001,
      effect: 'more-regularization',
      pull: 'toward-underfitting',
    });
  });

  it.each([
    ['alpha', 1, 100, 'raised', 'more-regularization', 'toward-underfitting'],
    ['weight_decay', 0.01, 0, 'lowered', 'less-regularization', 'toward-overfitting'],
    ['dropout', 0.1, 0.5, 'raised', 'more-regularization', 'toward-underfitting'],
    ['min_samples_leaf', 20, 1, 'lowered', 'less-regularization', 'toward-overfitting'],
    ['subsample', 1, 0.5, 'lowered', 'more-regularization', 'toward-underfitting'],
    ['max_depth', 4, 20, 'raised', 'more-capacity', 'toward-overfitting'],
    ['num_leaves', 31, 255, 'raised', 'more-capacity', 'toward-overfitting'],
    ['n_estimators', 100, 2000, 'raised', 'more-capacity', 'toward-overfitting'],
    ['n_neighbors', 15, 1, 'lowered', 'more-capacity', 'toward-overfitting'],
    ['n_features', 30, 10, 'lowered', 'fewer-features', 'toward-underfitting'],
    ['polynomial_degree', 3, 6, 'raised', 'higher-degree', 'toward-overfitting'],
    ['train_examples', 40000, 10000, 'lowered', 'less-data', 'more-variance'],
    ['train_size', 0.5, 0.8, 'raised', 'more-data', 'less-variance'],
    ['epochs', 30, 10, 'lowered', 'shorter-training', 'toward-underfitting'],
    ['tol', 0.001, 0.00001, 'lowered', 'longer-training', 'toward-overfitting'],
    ['early_stopping_rounds', 50, 1, 'lowered', 'earlier-stopping', 'toward-underfitting'],
    ['learning_rate', 0.1, 0.05, 'lowered', 'smaller-steps', null],
  ] as const)('%s %s → %s: %s, %s', (name, from, to, direction, effect, pull) => {
    expect(only(prChanges({ [name]: from }, { [name]: to }))).toMatchObject({
      hyperparameter: name,
      direction,
      effect,
      pull,
    });
  });

  it('names the training-set and feature cuts the issue saw go unnamed', () => {
    const changes = prChanges(
      { alpha: 1, train_examples: 40000, features: 30 },
      { alpha: 1, train_examples: 10000, features: 10 },
    );
    expect(changes.map((c) => [c.hyperparameter, c.effect, c.ratio])).toEqual([
      ['features', 'fewer-features', 10 / 30],
      ['train_examples', 'less-data', 0.25],
    ]);
  });
});

describe('prChanges: layer sizes, no-limit values, text', () => {
  it('compares hidden_layer_sizes by total units', () => {
    expect(
      only(prChanges({ hidden_layer_sizes: [100] }, { hidden_layer_sizes: [512, 512] })),
    ).toMatchObject({
      direction: 'raised',
      totalUnits: { from: 100, to: 1024 },
      ratio: 10.24,
      effect: 'more-capacity',
    });
    expect(
      only(prChanges({ hidden_layer_sizes: [64, 64] }, { hidden_layer_sizes: 8 })),
    ).toMatchObject({
      direction: 'lowered',
      totalUnits: { from: 128, to: 8 },
      effect: 'less-capacity',
    });
  });

  it('calls a reshape with the same total units changed, with no effect', () => {
    expect(
      only(prChanges({ hidden_layer_sizes: [100] }, { hidden_layer_sizes: [50, 50] })),
    ).toMatchObject({
      direction: 'changed',
      effect: null,
      pull: null,
    });
  });

  it('reads max_depth None (scikit-learn) and -1 (LightGBM) as no limit', () => {
    const none = only(prChanges({ max_depth: 8 }, { max_depth: null }));
    expect(none).toMatchObject({
      direction: 'raised',
      unlimited: 'to',
      effect: 'more-capacity',
      to: null,
    });
    expect(none.ratio).toBeUndefined();
    expect(only(prChanges({ max_depth: -1 }, { max_depth: 6 }))).toMatchObject({
      direction: 'lowered',
      unlimited: 'from',
    });
    expect(prChanges({ max_depth: -1 }, { max_depth: null })).toEqual([]);
    // max_leaf_nodes: only None means no limit.
    expect(only(prChanges({ max_leaf_nodes: 31 }, { max_leaf_nodes: null }))).toMatchObject({
      direction: 'raised',
      unlimited: 'to',
    });
  });

  it('does not compare a count with a fraction of a total', () => {
    expect(only(prChanges({ min_samples_leaf: 5 }, { min_samples_leaf: 0.05 }))).toMatchObject({
      direction: 'changed',
      effect: null,
    });
    expect(only(prChanges({ train_size: 0.5 }, { train_size: 0.8 }))).toMatchObject({
      direction: 'raised',
    });
  });

  it('compares decimal strings as numbers and keeps the artifact’s own values', () => {
    expect(only(prChanges({ lr: '1e-3' }, { lr: '1e-4' }))).toMatchObject({
      from: '1e-3',
      to: '1e-4',
      direction: 'lowered',
      effect: 'smaller-steps',
    });
    expect(prChanges({ lr: '1e-3' }, { lr: 0.001 })).toEqual([]);
  });

  it('lists text and boolean changes as changed, with the role when known', () => {
    expect(
      prChanges(
        { solver: 'lbfgs', learning_rate: 'constant', early_stopping: false },
        { solver: 'adam', learning_rate: 'adaptive', early_stopping: true },
      ),
    ).toEqual([
      {
        hyperparameter: 'early_stopping',
        role: null,
        inverse: false,
        origin: 'unknown',
        from: false,
        to: true,
        direction: 'changed',
        effect: null,
        pull: null,
      },
      {
        hyperparameter: 'learning_rate',
        role: 'learning-rate',
        inverse: false,
        origin: 'built-in',
        from: 'constant',
        to: 'adaptive',
        direction: 'changed',
        effect: null,
        pull: null,
      },
      {
        hyperparameter: 'solver',
        role: null,
        inverse: false,
        origin: 'unknown',
        from: 'lbfgs',
        to: 'adam',
        direction: 'changed',
        effect: null,
        pull: null,
      },
    ]);
  });
});

describe('prChanges: unknown, ambiguous, added, nested, config', () => {
  it('returns an unknown changed key with role null, never drops it', () => {
    expect(
      only(prChanges({ max_bin: 255, ema_decay: 0.99 }, { max_bin: 255, ema_decay: 0.999 })),
    ).toMatchObject({
      hyperparameter: 'ema_decay',
      role: null,
      origin: 'unknown',
      direction: 'raised',
      effect: null,
      pull: null,
    });
  });

  it('returns an ambiguous name with role null and says so', () => {
    expect(only(prChanges({ gamma: 0.01 }, { gamma: 10 }))).toMatchObject({
      role: null,
      origin: 'ambiguous',
      direction: 'raised',
      ratio: 1000,
      effect: null,
    });
  });

  it('lists added and removed keys without an effect', () => {
    const changes = prChanges({ dropout: 0.2 }, { weight_decay: 0.01 });
    expect(changes).toEqual([
      {
        hyperparameter: 'dropout',
        role: 'regularization',
        inverse: false,
        origin: 'built-in',
        from: 0.2,
        direction: 'removed',
        effect: null,
        pull: null,
      },
      {
        hyperparameter: 'weight_decay',
        role: 'regularization',
        inverse: false,
        origin: 'built-in',
        to: 0.01,
        direction: 'added',
        effect: null,
        pull: null,
      },
    ]);
  });

  it('flattens nested objects and resolves paths by their last segment', () => {
    expect(
      only(
        prChanges(
          { optimizer: { lr: 0.1, momentum: 0.9 } },
          { optimizer: { lr: 0.01, momentum: 0.9 } },
        ),
      ),
    ).toMatchObject({
      hyperparameter: 'optimizer.lr',
      role: 'learning-rate',
      direction: 'lowered',
    });
    expect(only(prChanges({ clf__C: 10 }, { clf__C: 0.01 }))).toMatchObject({
      hyperparameter: 'clf__C',
      effect: 'more-regularization',
    });
    expect(only(prChanges({ model: { C: 1 } }, { model: { C: 10 } }))).toMatchObject({
      hyperparameter: 'model.C',
      effect: 'less-regularization',
    });
  });

  it('lets a literal key win over a nested path spelled the same', () => {
    expect(
      only(prChanges({ 'model.C': 1, model: { C: 5 } }, { 'model.C': 2, model: { C: 5 } })),
    ).toMatchObject({ from: 1, to: 2 });
  });

  it('uses the config’s roles', () => {
    const vocab = mergeRoles(BUILT_IN_VOCABULARY, {
      my_penalty: { role: 'regularization', inverse: false },
      gamma: { role: 'capacity', integer: false },
    });
    expect(
      prChanges({ my_penalty: 1, gamma: 0.01 }, { my_penalty: 3, gamma: 1 }, vocab),
    ).toMatchObject([
      { hyperparameter: 'gamma', origin: 'config', effect: 'more-capacity' },
      { hyperparameter: 'my_penalty', origin: 'config', effect: 'more-regularization', ratio: 3 },
    ]);
  });

  it('is safe with __proto__ and constructor keys from JSON', () => {
    const b = JSON.parse('{"__proto__": {"C": 1}, "constructor": 3}') as Record<string, unknown>;
    const c = JSON.parse('{"__proto__": {"C": 2}, "constructor": 4}') as Record<string, unknown>;
    const changes = prChanges(b, c);
    expect(changes.map((x) => [x.hyperparameter, x.direction])).toEqual([
      ['__proto__.C', 'raised'],
      ['constructor', 'raised'],
    ]);
    expect(({} as Record<string, unknown>).C).toBeUndefined();
  });

  it('returns nothing for missing or identical hyperparameters', () => {
    expect(prChanges(undefined, undefined)).toEqual([]);
    expect(
      prChanges(
        { alpha: 1, hidden_layer_sizes: [10, 10], opt: { lr: 0.1 } },
        { opt: { lr: 0.1 }, hidden_layer_sizes: [10, 10], alpha: 1 },
      ),
    ).toEqual([]);
  });
});

describe('effects', () => {
  it('maps every effect to a pull, and a learning rate to none', () => {
    expect(effectOf('regularization', true, 'raised')).toBe('less-regularization');
    expect(effectOf('capacity', true, 'raised')).toBe('less-capacity');
    expect(effectOf('inert', false, 'raised')).toBeNull();
    expect(effectOf('capacity', false, 'changed')).toBeNull();
    expect(pullOf('larger-steps')).toBeNull();
    expect(pullOf(null)).toBeNull();
  });
});

describe('prChanges properties', () => {
  const names = fc.constantFrom(
    'C',
    'alpha',
    'max_depth',
    'hidden_layer_sizes',
    'n_estimators',
    'dropout',
    'train_size',
    'ema_decay',
    'gamma',
    'lr',
    'tol',
  );
  const value = fc.oneof(
    fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
    fc.integer({ min: 0, max: 1000 }),
    fc.array(fc.integer({ min: 1, max: 512 }), { minLength: 1, maxLength: 4 }),
    fc.constant(null),
    fc.constantFrom('lbfgs', 'adam'),
  );
  const params = fc.dictionary(names, value, { maxKeys: 6 });

  it('swapping baseline and candidate reverses every change', () => {
    const opposite: Record<string, string> = {
      raised: 'lowered',
      lowered: 'raised',
      added: 'removed',
      removed: 'added',
      changed: 'changed',
    };
    fc.assert(
      fc.property(params, params, (b, c) => {
        const forward = prChanges(b, c);
        const backward = prChanges(c, b);
        expect(backward.map((x) => x.hyperparameter)).toEqual(forward.map((x) => x.hyperparameter));
        forward.forEach((f, i) => {
          const r = backward[i] as PrChange;
          expect(r.direction).toBe(opposite[f.direction]);
          expect(r.role).toBe(f.role);
          if (f.effect !== null) expect(r.effect).not.toBe(f.effect);
          else expect(r.effect).toBeNull();
          if (f.ratio !== undefined) expect((r.ratio ?? NaN) * f.ratio).toBeCloseTo(1, 9);
        });
      }),
    );
  });

  it('finds no change between a run and itself', () => {
    fc.assert(
      fc.property(params, (p) => {
        expect(prChanges(p, structuredClone(p))).toEqual([]);
      }),
    );
  });
});
