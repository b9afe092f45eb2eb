/**
 * The levers chosen for the scikit-learn-named fixture set (test/fixtures/levers/sklearn-named.json):
 * the first lever a senior engineer would name, written from the trade's common practice (marked
 * so in the fixture), and its suggested value: the right knob, moved the right way, inside the
 * range the evidence supports, rounded as a person would type it. Asserted on the model.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { chooseLevers } from '../../../src/analysis/levers/choose.js';
import { significantDigits } from '../../../src/analysis/levers/rounding.js';
import type { HyperparameterRolesConfig } from '../../../src/model/hyperparameter-roles.js';
import type { Diagnosis, LeverId, Movement } from '../../../src/model/review.js';
import { contextFor } from './lever-context.js';

interface FixtureCase {
  name: string;
  baseline: { hyperparameters: Record<string, unknown> };
  candidate: { hyperparameters: Record<string, unknown> };
  candidateDiagnosis: Diagnosis;
  movement: Movement;
  config?: { hyperparameters: HyperparameterRolesConfig };
  expected: {
    firstLever: LeverId;
    suggestion: {
      hyperparameter: string;
      direction: 'raise' | 'lower';
      within?: [number, number];
    } | null;
    source: string;
  };
}

const fixture = JSON.parse(
  readFileSync(new URL('../../fixtures/levers/sklearn-named.json', import.meta.url), 'utf8'),
) as { cases: FixtureCase[] };

describe('first lever for scikit-learn-named changes (common practice)', () => {
  it.each(fixture.cases.map((c) => [c.name, c] as const))('%s', (_name, c) => {
    expect(c.expected.source).toBe('common practice');
    const { levers } = chooseLevers(contextFor(c));
    const first = levers[0];
    expect(first?.id).toBe(c.expected.firstLever);
    const want = c.expected.suggestion;
    if (want === null) {
      expect(first?.suggestion).toBeUndefined();
      return;
    }
    const s = first?.suggestion;
    expect(s?.hyperparameter).toBe(want.hyperparameter);
    const value = s?.value ?? NaN;
    expect(Number.isFinite(value)).toBe(true);
    // Rounded as a person types it: two significant digits, or an integer.
    expect(Number.isInteger(value) || significantDigits(value) <= 2).toBe(true);
    const current = levers[0]?.evidence.find((e) => e.kind === 'pr-change');
    expect(current?.kind).toBe('pr-change');
    if (current?.kind !== 'pr-change') return;
    // Moves the knob the wanted way from the candidate's value (a "no limit" candidate: any finite value does).
    if (current.to !== null) {
      if (want.direction === 'raise') expect(value).toBeGreaterThan(current.to);
      else expect(value).toBeLessThan(current.to);
    }
    if (want.within !== undefined) {
      expect(value).toBeGreaterThanOrEqual(Math.min(...want.within));
      expect(value).toBeLessThanOrEqual(Math.max(...want.within));
    }
    if (current.to === null && current.from !== null)
      expect(value).toBeGreaterThanOrEqual(current.from);
  });
});

describe('lever rules on the model', () => {
  const byName = new Map(fixture.cases.map((c) => [c.name, c]));
  const get = (name: string): FixtureCase => {
    const c = byName.get(name);
    if (c === undefined) throw new Error(`fixture case ${name} missing`);
    return c;
  };

  it('never offers both directions of a knob, nor the same lever twice', () => {
    for (const c of fixture.cases) {
      const ids = chooseLevers(contextFor(c)).levers.map((l) => l.id);
      expect(new Set(ids).size).toBe(ids.length);
      for (const [a, b] of [
        ['stronger-regularization', 'weaker-regularization'],
        ['bigger-model', 'smaller-model'],
        ['train-longer', 'early-stopping'],
        ['more-features', 'fewer-features'],
      ] as const)
        expect(ids.includes(a) && ids.includes(b)).toBe(false);
    }
  });

  it('gives no value for a learning-rate change and names only the change that pulled the way the model moved', () => {
    const { levers } = chooseLevers(contextFor(get('gradient-boosting-deeper-and-slower')));
    const changed = levers.flatMap((l) =>
      l.evidence.flatMap((e) => (e.kind === 'pr-change' ? [e.hyperparameter] : [])),
    );
    expect(changed).toEqual(['max_depth']);
  });

  it('does not offer epoch levers for a closed-form ridge, nor capacity levers without a capacity knob', () => {
    const c = get('ridge-alpha-raise');
    const ids = chooseLevers(contextFor(c)).levers.map((l) => l.id);
    expect(ids).not.toContain('train-longer');
    expect(ids).not.toContain('bigger-model');
  });

  it('does not offer polynomial terms for an MLP (no feature knob)', () => {
    const ids = chooseLevers(contextFor(get('mlp-narrower'))).levers.map((l) => l.id);
    expect(ids).not.toContain('richer-features');
    expect(ids[0]).toBe('bigger-model');
  });

  it('a finite limit, at least the baseline, for a depth the PR made unlimited', () => {
    const s = chooseLevers(contextFor(get('tree-depth-unlimited'))).levers[0]?.suggestion;
    expect(s?.basis).toBe('finite-limit');
    expect(s?.value).toBeGreaterThanOrEqual(8);
    expect(Number.isInteger(s?.value)).toBe(true);
  });

  it('suggests total hidden units for a layer-size list', () => {
    const s = chooseLevers(contextFor(get('mlp-wider'))).levers[0]?.suggestion;
    expect(s?.totalUnits).toBe(true);
    expect(s?.value).toBeGreaterThan(100);
    expect(s?.value).toBeLessThan(1024);
  });

  it('puts repeating with more seeds first when the validation change is undetermined', () => {
    const ctx = { ...contextFor(get('logistic-c-cut')), undetermined: { repeatsNeeded: 7 } };
    const { levers } = chooseLevers(ctx);
    expect(levers[0]).toMatchObject({
      id: 'repeat-with-seeds',
      evidence: [{ kind: 'change-undetermined', repeatsNeeded: 7 }],
    });
    expect(levers[1]?.id).toBe('weaker-regularization');
  });
});
