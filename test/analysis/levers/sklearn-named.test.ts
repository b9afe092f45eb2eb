/**
 * The scikit-learn-named fixture set (test/fixtures/levers/sklearn-named.json). Each case holds the
 * PR's hyperparameters, the candidate's diagnosis and movement, the changes fitgap must read from
 * it, and the first lever a senior engineer would name (common practice). Here only what the
 * vocabulary and prChanges decide is checked, plus the fixture's own consistency; the lever choice
 * is checked where levers are chosen.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { prChanges, type ChangeEffect } from '../../../src/analysis/levers/pr-changes.js';
import type { HyperparameterRolesConfig } from '../../../src/model/hyperparameter-roles.js';
import { BUILT_IN_VOCABULARY, mergeRoles } from '../../../src/analysis/levers/resolve-knob.js';
import type { Diagnosis, LeverId, Movement } from '../../../src/model/review.js';

interface FixtureCase {
  name: string;
  estimator: string;
  baseline: { hyperparameters: Record<string, unknown> };
  candidate: { hyperparameters: Record<string, unknown> };
  candidateDiagnosis: Diagnosis;
  movement: Movement;
  config?: { hyperparameters: HyperparameterRolesConfig };
  changes: {
    hyperparameter: string;
    role: string | null;
    inverse: boolean;
    direction: string;
    effect: ChangeEffect | null;
  }[];
  expected: {
    firstLever: LeverId;
    suggestion: {
      hyperparameter: string;
      direction: 'raise' | 'lower';
      within?: [number, number];
    } | null;
    source: string;
    why: string;
  };
}

const fixture = JSON.parse(
  readFileSync(new URL('../../fixtures/levers/sklearn-named.json', import.meta.url), 'utf8'),
) as { source: string; cases: FixtureCase[] };

const LEVER_IDS = [
  'more-data',
  'fewer-features',
  'stronger-regularization',
  'smaller-model',
  'early-stopping',
  'more-features',
  'richer-features',
  'weaker-regularization',
  'bigger-model',
  'train-longer',
  'align-training-data',
  'bigger-validation-set',
  'add-repeats',
  'supply-reference',
] as const satisfies readonly LeverId[];
const MOVEMENTS = [
  'better-on-both',
  'away-from-underfitting',
  'toward-overfitting',
  'away-from-overfitting',
  'no-significant-change',
  'toward-underfitting',
  'worse-on-both',
] as const satisfies readonly Movement[];
const DIAGNOSES = [
  'good-fit',
  'high-bias',
  'high-variance',
  'data-mismatch',
  'high-bias-and-variance',
] as const satisfies readonly Diagnosis[];

function changesOf(c: FixtureCase) {
  const vocabulary = mergeRoles(BUILT_IN_VOCABULARY, c.config?.hyperparameters);
  return prChanges(c.baseline.hyperparameters, c.candidate.hyperparameters, vocabulary);
}

describe('scikit-learn-named fixture set', () => {
  it('covers the names the issue lists', () => {
    const names = new Set(fixture.cases.flatMap((c) => c.changes.map((ch) => ch.hyperparameter)));
    for (const n of [
      'alpha',
      'C',
      'max_depth',
      'hidden_layer_sizes',
      'n_estimators',
      'weight_decay',
      'dropout',
      'num_leaves',
      'min_samples_leaf',
      'learning_rate',
    ])
      expect(names, n).toContain(n);
    expect(fixture.source).toContain('common practice');
  });

  it.each(fixture.cases.map((c) => [c.name, c] as const))(
    '%s: fitgap reads the PR’s changes as expected',
    (_name, c) => {
      const got = changesOf(c).map(({ hyperparameter, role, inverse, direction, effect }) => ({
        hyperparameter,
        role,
        inverse,
        direction,
        effect,
      }));
      expect(got).toEqual(c.changes);
    },
  );

  it.each(fixture.cases.map((c) => [c.name, c] as const))(
    '%s: the expectation is well formed and marked common practice',
    (_name, c) => {
      expect(LEVER_IDS).toContain(c.expected.firstLever);
      expect(MOVEMENTS).toContain(c.movement);
      expect(DIAGNOSES).toContain(c.candidateDiagnosis);
      expect(c.expected.source).toBe('common practice');
      const s = c.expected.suggestion;
      if (s === null) return;
      const moved = changesOf(c).find((ch) => ch.hyperparameter === s.hyperparameter);
      expect(moved, `${s.hyperparameter} is one of the PR's changes`).toBeDefined();
      if (moved === undefined) return;
      // Stepping back toward the baseline undoes the PR's move on the knob it names.
      expect(s.direction).toBe(moved.direction === 'raised' ? 'lower' : 'raise');
      // The PR's change pulled the model the way it moved (the harm being undone): less data
      // raises variance, which shows as a move toward overfitting.
      const explains =
        moved.pull === c.movement ||
        (moved.pull === 'more-variance' && c.movement === 'toward-overfitting');
      expect(explains, `${String(moved.pull)} explains ${c.movement}`).toBe(true);
      if (s.within !== undefined) {
        const [lo, hi] = s.within;
        expect([lo, hi].sort((a, b) => a - b)).toEqual(
          [moved.from, moved.to].sort((a, b) => Number(a) - Number(b)),
        );
      }
    },
  );
});
