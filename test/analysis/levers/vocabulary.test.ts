import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  BUILT_IN_VOCABULARY,
  configRoleConflicts,
  lastSegment,
  mergeRoles,
  normaliseName,
  resolveKnob,
  specFromConfig,
} from '../../../src/analysis/levers/resolve-knob.js';
import { AMBIGUOUS, VOCABULARY } from '../../../src/analysis/levers/vocabulary.js';
import type { KnobSpec, ValueDomain } from '../../../src/model/hyperparameter-roles.js';

interface Constraint {
  kind: string;
  left?: number | null;
  right?: number | null;
  closed?: string;
  text?: string;
}
interface SklearnParameter {
  constraints: Constraint[];
  doc: string;
}
// Source: scikit-learn 1.2.1 (Debian python3-sklearn), Estimator._parameter_constraints and class
// docstrings, frozen by test/fixtures/levers/sklearn-parameters.py.
const sklearn = JSON.parse(
  readFileSync(new URL('../../fixtures/levers/sklearn-parameters.json', import.meta.url), 'utf8'),
) as { source: string; estimators: Record<string, Record<string, SklearnParameter>> };

function param(estimator: string, name: string): SklearnParameter {
  const p = sklearn.estimators[estimator]?.[name];
  if (p === undefined) throw new Error(`fixture lacks ${estimator}.${name}`);
  return p;
}

function knob(name: string): KnobSpec {
  const r = resolveKnob(name);
  if (r.status !== 'built-in') throw new Error(`${name} is not a built-in knob (${r.status})`);
  return r.spec;
}

/** Does our value domain agree with scikit-learn's own constraint on the parameter? */
function domainAgrees(domain: ValueDomain, constraints: Constraint[]): boolean {
  const ints = constraints.filter((c) => c.kind === 'integer');
  const reals = constraints.filter((c) => c.kind === 'real');
  const arrays = constraints.some((c) => c.text === 'array-like');
  const fractionReal = reals.some((c) => c.left === 0 && c.right === 1);
  switch (domain) {
    case 'count':
      return ints.length > 0 && reals.length === 0 && ints.every((c) => (c.left ?? 0) >= 0);
    case 'count-or-fraction':
      return ints.length > 0 && fractionReal;
    case 'fraction':
      return ints.length === 0 && fractionReal;
    case 'non-negative':
      return (
        ints.length === 0 &&
        reals.some((c) => c.left === 0 && c.closed !== 'right' && c.closed !== 'neither')
      );
    case 'positive':
      return (
        ints.length === 0 &&
        reals.some((c) => c.left === 0 && (c.closed === 'right' || c.closed === 'neither'))
      );
    case 'units':
      return arrays && ints.length > 0;
  }
}

describe('vocabulary table', () => {
  it('lists every name once, built-in or ambiguous', () => {
    const names = [...VOCABULARY, ...AMBIGUOUS].flatMap((g) => g.names.map(normaliseName));
    expect(new Set(names).size).toBe(names.length);
    expect(BUILT_IN_VOCABULARY.size).toBe(names.length);
  });

  it('writes every name as it matches, up to case (the README shows `C`, which matches `c`)', () => {
    for (const g of [...VOCABULARY, ...AMBIGUOUS])
      for (const n of g.names) expect(normaliseName(n)).toBe(n.toLowerCase());
  });

  it('gives every group a source', () => {
    for (const g of [...VOCABULARY, ...AMBIGUOUS]) expect(g.source.length).toBeGreaterThan(0);
  });
});

describe('normaliseName and lastSegment', () => {
  it.each([
    ['C', 'c'],
    ['learningRate', 'learning_rate'],
    ['MAX-DEPTH', 'max_depth'],
    ['weight-decay', 'weight_decay'],
    ['nEstimators', 'n_estimators'],
    ['hiddenLayerSizes', 'hidden_layer_sizes'],
    ['l2Penalty', 'l2_penalty'],
    ['clf__C', 'clf__c'],
    ['model.C', 'model.c'],
  ])('%s → %s', (raw, normalised) => {
    expect(normaliseName(raw)).toBe(normalised);
  });

  it.each([
    ['model.c', 'c'],
    ['clf__c', 'c'],
    ['optimizer/lr', 'lr'],
    ['a.b__c', 'c'],
    ['lambda_l1', null],
    ['c', null],
  ])('lastSegment(%s) = %s', (name, last) => {
    expect(lastSegment(name)).toBe(last);
  });
});

describe('resolveKnob', () => {
  it('resolves whole names, camelCase and paths by their last segment', () => {
    expect(resolveKnob('C')).toMatchObject({ status: 'built-in', matched: 'c' });
    expect(resolveKnob('model.C')).toMatchObject({ status: 'built-in', matched: 'c' });
    expect(resolveKnob('clf__C')).toMatchObject({ status: 'built-in', matched: 'c' });
    expect(resolveKnob('optimizer.lr')).toMatchObject({
      status: 'built-in',
      matched: 'lr',
      spec: { role: 'learning-rate' },
    });
    expect(resolveKnob('weightDecay')).toMatchObject({
      spec: { role: 'regularization', inverse: false },
    });
  });

  it('reports ambiguous and unknown names instead of guessing', () => {
    expect(resolveKnob('gamma')).toMatchObject({ status: 'ambiguous', matched: 'gamma' });
    expect(resolveKnob('max_features').status).toBe('ambiguous');
    expect(resolveKnob('my_penalty')).toEqual({ status: 'unknown' });
    expect(resolveKnob('ema_decay')).toEqual({ status: 'unknown' });
  });

  // Source for the directions in this block: the frozen scikit-learn docstrings quoted below.
  it('reads C as an inverse regularization strength (scikit-learn LogisticRegression, SVC, LinearSVC)', () => {
    // Source: scikit-learn LogisticRegression docstring, parameter C:
    // "Inverse of regularization strength; must be a positive float. Like in support vector
    // machines, smaller values specify stronger regularization."
    // https://scikit-learn.org/stable/modules/generated/sklearn.linear_model.LogisticRegression.html
    expect(param('LogisticRegression', 'C').doc).toContain('Inverse of regularization strength');
    expect(param('LogisticRegression', 'C').doc).toContain(
      'smaller values specify stronger regularization',
    );
    expect(param('SVC', 'C').doc).toContain('inversely proportional to C');
    expect(param('LinearSVC', 'C').doc).toContain('inversely proportional to C');
    expect(knob('C')).toMatchObject({ role: 'regularization', inverse: true, scale: 'log' });
  });

  it('reads alpha as a regularization strength (scikit-learn Ridge, Lasso, SGD, MLP)', () => {
    expect(param('Ridge', 'alpha').doc).toContain('controlling regularization strength');
    expect(param('Lasso', 'alpha').doc).toContain('controlling regularization strength');
    expect(param('SGDClassifier', 'alpha').doc).toContain(
      'The higher the value, the stronger the regularization',
    );
    expect(param('MLPClassifier', 'alpha').doc).toContain('Strength of the L2 regularization term');
    expect(knob('alpha')).toMatchObject({ role: 'regularization', inverse: false, scale: 'log' });
  });

  it('reads the tree and boosting knobs the way scikit-learn documents them', () => {
    expect(param('GradientBoostingClassifier', 'subsample').doc).toContain(
      'leads to a reduction of variance',
    );
    expect(knob('subsample')).toMatchObject({ role: 'regularization', inverse: true });
    expect(param('HistGradientBoostingClassifier', 'l2_regularization').doc).toContain(
      'Use 0 for no regularization',
    );
    expect(knob('l2_regularization')).toMatchObject({ role: 'regularization', inverse: false });
    expect(param('DecisionTreeClassifier', 'min_samples_leaf').doc).toContain(
      'smoothing the model',
    );
    expect(knob('min_samples_leaf')).toMatchObject({ role: 'regularization', inverse: false });
    expect(param('DecisionTreeClassifier', 'ccp_alpha').doc).toContain('Cost-Complexity Pruning');
    expect(knob('ccp_alpha')).toMatchObject({ role: 'regularization', inverse: false });
    expect(param('GradientBoostingClassifier', 'n_estimators').doc).toContain(
      'number of boosting stages',
    );
    expect(knob('n_estimators')).toMatchObject({ role: 'capacity', inverse: false });
    expect(param('GradientBoostingClassifier', 'learning_rate').doc).toContain(
      'shrinks the contribution of each tree',
    );
    expect(knob('learning_rate').role).toBe('learning-rate');
  });

  it('reads "no limit" values where scikit-learn documents None as unlimited', () => {
    expect(param('DecisionTreeClassifier', 'max_depth').doc).toContain(
      'If None, then nodes are expanded until',
    );
    expect(param('DecisionTreeClassifier', 'max_leaf_nodes').doc).toContain(
      'If None then unlimited',
    );
    expect(param('HistGradientBoostingClassifier', 'max_leaf_nodes').doc).toContain(
      'If None, there is no maximum limit',
    );
    expect(knob('max_depth')).toMatchObject({
      role: 'capacity',
      unlimited: 'null-or-non-positive',
    });
    expect(knob('max_leaf_nodes')).toMatchObject({ role: 'capacity', unlimited: 'null' });
    // n_neighbors=None means "the default", not unlimited.
    expect(knob('n_neighbors').unlimited).toBeUndefined();
  });

  it('reads training length and patience as scikit-learn documents them', () => {
    expect(param('MLPClassifier', 'max_iter').doc).toContain(
      'this determines the number of epochs',
    );
    expect(param('SGDClassifier', 'max_iter').doc).toContain('(aka epochs)');
    expect(knob('max_iter').role).toBe('epochs');
    // HistGradientBoosting's max_iter counts trees: the caveat says so.
    expect(param('HistGradientBoostingClassifier', 'max_iter').doc).toContain(
      'maximum number of trees',
    );
    expect(VOCABULARY.find((g) => g.names.includes('max_iter'))?.caveat).toContain(
      'HistGradientBoosting',
    );
    expect(param('SGDClassifier', 'n_iter_no_change').doc).toContain(
      'no improvement to wait before stopping',
    );
    expect(knob('n_iter_no_change').role).toBe('early-stopping-patience');
    expect(param('MLPClassifier', 'hidden_layer_sizes').doc).toContain(
      'number of neurons in the ith hidden layer',
    );
    expect(knob('hidden_layer_sizes')).toMatchObject({ role: 'capacity', domain: 'units' });
    expect(param('PolynomialFeatures', 'degree').doc).toContain('maximal degree');
    expect(knob('degree').role).toBe('polynomial-degree');
  });

  it('keeps scikit-learn names that are per-split or per-tree sampling out of features and data size', () => {
    expect(param('RandomForestClassifier', 'max_features').doc).toContain(
      'features to consider when looking for the best split',
    );
    expect(param('RandomForestClassifier', 'max_samples').doc).toContain(
      'to train each base estimator',
    );
    expect(param('SVC', 'gamma').doc).toContain('Kernel coefficient');
    for (const name of ['max_features', 'max_samples', 'gamma'])
      expect(resolveKnob(name).status).toBe('ambiguous');
  });

  it.each([
    ['LogisticRegression', 'C', 'c'],
    ['SVC', 'C', 'c'],
    ['Ridge', 'alpha', 'alpha'],
    ['MLPClassifier', 'alpha', 'alpha'],
    ['MLPClassifier', 'hidden_layer_sizes', 'hidden_layer_sizes'],
    ['MLPClassifier', 'learning_rate_init', 'learning_rate_init'],
    ['MLPClassifier', 'max_iter', 'max_iter'],
    ['HistGradientBoostingClassifier', 'learning_rate', 'learning_rate'],
    ['HistGradientBoostingClassifier', 'l2_regularization', 'l2_regularization'],
    ['DecisionTreeClassifier', 'max_depth', 'max_depth'],
    ['DecisionTreeClassifier', 'min_samples_leaf', 'min_samples_leaf'],
    ['DecisionTreeClassifier', 'min_samples_split', 'min_samples_split'],
    ['DecisionTreeClassifier', 'max_leaf_nodes', 'max_leaf_nodes'],
    ['DecisionTreeClassifier', 'ccp_alpha', 'ccp_alpha'],
    ['DecisionTreeClassifier', 'min_impurity_decrease', 'min_impurity_decrease'],
    ['GradientBoostingClassifier', 'n_estimators', 'n_estimators'],
    ['GradientBoostingClassifier', 'subsample', 'subsample'],
    ['GradientBoostingClassifier', 'n_iter_no_change', 'n_iter_no_change'],
    ['KNeighborsClassifier', 'n_neighbors', 'n_neighbors'],
    ['PolynomialFeatures', 'degree', 'degree'],
    ['RFE', 'n_features_to_select', 'n_features_to_select'],
    ['LogisticRegression', 'tol', 'tol'],
  ])('%s.%s: value domain agrees with scikit-learn’s own constraint', (estimator, name, ours) => {
    const spec = knob(ours);
    expect(domainAgrees(spec.domain, param(estimator, name).constraints)).toBe(true);
  });

  it('the domain check can fail: C is not a count, max_depth is not a fraction', () => {
    expect(domainAgrees('count', param('LogisticRegression', 'C').constraints)).toBe(false);
    expect(domainAgrees('fraction', param('DecisionTreeClassifier', 'max_depth').constraints)).toBe(
      false,
    );
    expect(domainAgrees('positive', param('Ridge', 'alpha').constraints)).toBe(false);
  });
});

describe('config roles', () => {
  it('maps an unknown name and overrides a built-in or ambiguous one', () => {
    const vocab = mergeRoles(BUILT_IN_VOCABULARY, {
      my_penalty: { role: 'regularization', inverse: false },
      gamma: { role: 'capacity', integer: false },
      'Model.C': { role: 'regularization', inverse: true },
      n_estimators: { role: 'inert' },
    });
    expect(resolveKnob('my_penalty', vocab)).toEqual({
      status: 'config',
      matched: 'my_penalty',
      spec: { role: 'regularization', inverse: false, domain: 'non-negative', scale: 'log' },
    });
    expect(resolveKnob('gamma', vocab)).toMatchObject({
      status: 'config',
      spec: { role: 'capacity', domain: 'non-negative', scale: 'log' },
    });
    expect(resolveKnob('model.c', vocab)).toMatchObject({ status: 'config', matched: 'model.c' });
    expect(resolveKnob('svc.C', vocab)).toMatchObject({ status: 'built-in', matched: 'c' });
    expect(resolveKnob('n_estimators', vocab)).toMatchObject({
      status: 'config',
      spec: { role: 'inert' },
    });
    // The built-in table itself is untouched.
    expect(resolveKnob('gamma').status).toBe('ambiguous');
  });

  it('fills defaults by role: counts are integers on a linear scale, strengths reals on a log scale', () => {
    expect(specFromConfig({ role: 'capacity' })).toEqual({
      role: 'capacity',
      inverse: false,
      domain: 'count',
      scale: 'linear',
    });
    expect(specFromConfig({ role: 'learning-rate' })).toEqual({
      role: 'learning-rate',
      inverse: false,
      domain: 'non-negative',
      scale: 'log',
    });
    expect(specFromConfig({ role: 'data-size', integer: false, scale: 'log' })).toEqual({
      role: 'data-size',
      inverse: false,
      domain: 'non-negative',
      scale: 'log',
    });
  });

  it('finds config keys that collide once normalised', () => {
    expect(
      configRoleConflicts({
        C: { role: 'regularization', inverse: true },
        c: { role: 'capacity' },
        lr: { role: 'learning-rate' },
      }),
    ).toEqual([['C', 'c']]);
    expect(
      configRoleConflicts({
        'my-knob': { role: 'capacity' },
        my_knob: { role: 'capacity' },
        myKnob: { role: 'capacity' },
      }),
    ).toEqual([['my-knob', 'my_knob', 'myKnob']]);
  });

  it('leaves the vocabulary as it was without a config', () => {
    expect(mergeRoles(BUILT_IN_VOCABULARY, undefined)).toBe(BUILT_IN_VOCABULARY);
  });
});
