/** What the lever rules read, and the collection of drafted levers they write to. Pure. */
import type { Goal } from '../../model/run.js';
import type {
  CurveSkipped,
  CurvesReport,
  EpochsEvidence,
  LearningCurveEvidence,
  RegularizationEvidence,
} from '../../model/curves.js';
import type {
  Lever,
  LeverEvidence,
  LeverId,
  Movement,
  RunSummary,
  ShortfallDelta,
  Suggestion,
} from '../../model/review.js';
import type { HyperparameterRole } from '../../model/hyperparameter-roles.js';
import type { RegularizationKnob } from './knobs.js';
import type { PrChange } from './pr-changes.js';
import type { Vocabulary } from './resolve-knob.js';

export interface LeverContext {
  goal: Goal;
  candidate: RunSummary;
  baseline: RunSummary;
  movement: Movement;
  bias: ShortfallDelta;
  variance: ShortfallDelta;
  /** What the PR did to the hyperparameters, with roles (./pr-changes.ts). */
  changes: PrChange[];
  /** The review's vocabulary: built-in names, the config's map and the writer's inverse knobs. */
  vocabulary: Vocabulary;
  /** The roles the candidate's known knobs cover; empty when it names none. */
  roles: ReadonlySet<HyperparameterRole>;
  /** The knob the candidate's regularization sweep varies (its x), if it has one. */
  regularization: RegularizationKnob | undefined;
  noiseUnknown: boolean;
  /**
   * Set when the validation change could not be called either way at this noise, with the repeats
   * per run needed to detect the minimum effect (null when unknown).
   */
  undetermined?: { repeatsNeeded: number | null };
}

/** The candidate's analysed curves, or null where a curve is missing or was skipped. */
export interface CurveEvidence {
  learning: LearningCurveEvidence | null;
  sweep: RegularizationEvidence | null;
  epochs: EpochsEvidence | null;
}

export function curveEvidence(curves: CurvesReport): CurveEvidence {
  const analysed = <T extends object>(c: T | CurveSkipped | undefined): T | null =>
    c === undefined || 'skipped' in c ? null : (c as T);
  return {
    learning: analysed(curves.training_examples),
    sweep: analysed(curves.regularization),
    epochs: analysed(curves.epochs),
  };
}

/** Levers drafted by the rules; a lever drafted twice keeps its higher-scoring draft. */
export class Drafts {
  readonly #byId = new Map<LeverId, Lever>();

  add(id: LeverId, score: number, evidence: LeverEvidence[], suggestion?: Suggestion): void {
    const existing = this.#byId.get(id);
    if (existing !== undefined && existing.score >= score) return;
    this.#byId.set(id, {
      id,
      score,
      ...(suggestion === undefined ? {} : { suggestion }),
      evidence,
    });
  }

  has(id: LeverId): boolean {
    return this.#byId.has(id);
  }

  get(id: LeverId): Lever | undefined {
    return this.#byId.get(id);
  }

  delete(id: LeverId): void {
    this.#byId.delete(id);
  }

  /** Highest score first; drafts with equal scores keep the order they were first drafted in. */
  ranked(): Lever[] {
    return [...this.#byId.values()].sort((a, b) => b.score - a.score);
  }
}

/**
 * Which regularization lever the sweep calls for, in strength terms: `stronger` when the candidate
 * is weaker than the sweep's minimum, `weaker` when stronger, `at` when it sits at the minimum,
 * null when unknown. The sweep's x is the knob's own value, so an inverse knob (C) reads the other
 * way: a C below the minimum's C is stronger regularization than the minimum's.
 */
export function sweepWants(
  sweep: RegularizationEvidence,
  knob: RegularizationKnob | undefined,
): 'stronger' | 'weaker' | 'at' | null {
  if (sweep.side === 'unknown') return null;
  if (sweep.side === 'at') return 'at';
  const below = sweep.side === 'below';
  return below !== (knob?.inverse ?? false) ? 'stronger' : 'weaker';
}

/**
 * The sweep's suggestion, rounded to two significant digits or to the sweep's own grid: its
 * minimum (inside the swept range), or one grid step beyond the end it lies at. Undefined when the
 * rounded value would not move the knob the wanted way.
 */
export function sweepSuggestion(
  sweep: RegularizationEvidence,
  knob: RegularizationKnob,
  wants: 'stronger' | 'weaker',
): Suggestion | undefined {
  // Rounded where the curve was analysed (curves/index.ts `sweepSuggestion`).
  const value = sweep.suggestedX;
  const up = (wants === 'stronger') !== knob.inverse;
  if (up ? !(value > knob.value) : !(value < knob.value)) return undefined;
  return {
    hyperparameter: knob.key,
    value,
    basis: sweep.atEdge === null ? 'sweep-minimum' : 'beyond-sweep-edge',
  };
}

/** The sweep as evidence for a regularization lever that wants `lever`. */
export function sweepEvidence(
  sweep: RegularizationEvidence,
  knob: RegularizationKnob | undefined,
  lever: 'stronger' | 'weaker',
): LeverEvidence {
  const wants = sweepWants(sweep, knob);
  return {
    kind: 'sweep-minimum',
    hyperparameter: knob?.key ?? null,
    bestX: sweep.bestX,
    bestValidation: sweep.bestValidation,
    current: knob?.value ?? null,
    suggestedX: sweep.suggestedX,
    side: sweep.side,
    supports: wants === null ? null : wants === lever,
    atEdge: sweep.atEdge,
  };
}

/** Validation error saved by stopping at the epoch minimum, in shortfall units (≥ 0). */
export function savedByStopping(e: EpochsEvidence, goal: Goal): number {
  const sign = goal === 'minimize' ? 1 : -1;
  return Math.max(0, sign * (e.finalValidation - e.bestValidation));
}

export function epochMinimum(e: EpochsEvidence, goal: Goal): LeverEvidence {
  return {
    kind: 'epoch-minimum',
    epoch: e.bestX,
    of: e.finalX,
    saves: savedByStopping(e, goal),
    gl: e.gl,
  };
}
