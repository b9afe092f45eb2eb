/** A lever context built from hyperparameters, a diagnosis and a movement, for lever tests. */
import type { LeverContext } from '../../../src/analysis/levers/choose.js';
import {
  knobValues,
  regularizationKnob,
  runRoles,
  runVocabulary,
} from '../../../src/analysis/levers/knobs.js';
import { prChanges } from '../../../src/analysis/levers/pr-changes.js';
import { BUILT_IN_VOCABULARY, mergeRoles } from '../../../src/analysis/levers/resolve-knob.js';
import type { CurvesReport } from '../../../src/model/curves.js';
import type { HyperparameterRolesConfig } from '../../../src/model/hyperparameter-roles.js';
import type {
  Component,
  Diagnosis,
  Movement,
  RunSummary,
  ShortfallDelta,
} from '../../../src/model/review.js';

function component(name: Component['name'], value: number): Component {
  return { name, value, ci: null, p: null, present: value > 0.02 };
}

/** A candidate with the fixture's diagnosis: components sized so the diagnosis is the larger one. */
export function summaryWith(diagnosis: Diagnosis): RunSummary {
  const bias = diagnosis === 'high-bias' || diagnosis === 'high-bias-and-variance' ? 0.1 : 0.01;
  const variance =
    diagnosis === 'high-variance' || diagnosis === 'high-bias-and-variance' ? 0.08 : 0.01;
  return {
    name: 'candidate',
    commit: null,
    createdAt: null,
    reference: 0.02,
    referenceSource: 'artifact',
    splits: [],
    errorLevel: 0.2,
    components: {
      bias: component('bias', bias),
      variance: component('variance', variance),
      mismatch: component('mismatch', 0),
      overfit: component('overfit', 0),
    },
    diagnosis,
    biasUnknown: false,
    warnings: [],
    curves: {},
  };
}

const UP: ShortfallDelta = {
  unit: 'shortfall',
  estimate: 0.03,
  ci: [0.01, 0.05],
  p: 0.001,
  test: 'welch-t',
  call: 'up',
};
const FLAT: ShortfallDelta = { ...UP, estimate: 0, ci: [-0.01, 0.01], p: 0.9, call: 'flat' };

export interface ContextCase {
  baseline: { hyperparameters: Record<string, unknown> };
  candidate: { hyperparameters: Record<string, unknown> };
  candidateDiagnosis: Diagnosis;
  movement: Movement;
  config?: { hyperparameters: HyperparameterRolesConfig };
  curves?: CurvesReport;
}

export function contextFor(c: ContextCase): LeverContext {
  const b = c.baseline.hyperparameters;
  const h = c.candidate.hyperparameters;
  const vocabulary = runVocabulary(
    mergeRoles(BUILT_IN_VOCABULARY, c.config?.hyperparameters),
    b,
    h,
  );
  const summary = { ...summaryWith(c.candidateDiagnosis), curves: c.curves ?? {} };
  return {
    goal: 'minimize',
    candidate: summary,
    baseline: summaryWith('good-fit'),
    movement: c.movement,
    bias: c.movement === 'toward-underfitting' ? UP : FLAT,
    variance: c.movement === 'toward-overfitting' ? UP : FLAT,
    changes: prChanges(knobValues(b), knobValues(h), vocabulary),
    vocabulary,
    roles: runRoles(h, vocabulary),
    regularization: regularizationKnob(h, vocabulary),
    noiseUnknown: false,
  };
}
