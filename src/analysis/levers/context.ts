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
  HyperparameterChange,
  Lever,
  LeverEvidence,
  LeverId,
  Movement,
  RunSummary,
  ShortfallDelta,
  Suggestion,
} from '../../model/review.js';
import type { PulledLever } from '../hyperparameters.js';

export interface LeverContext {
  goal: Goal;
  candidate: RunSummary;
  baseline: RunSummary;
  movement: Movement;
  bias: ShortfallDelta;
  variance: ShortfallDelta;
  pulled: PulledLever[];
  changes: HyperparameterChange[];
  /** Candidate's regularization hyperparameter (name and strength), if it has one. */
  regularization: { key: string; value: number } | undefined;
  noiseUnknown: boolean;
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

  /** Highest score first; drafts with equal scores keep the order they were first drafted in. */
  ranked(): Lever[] {
    return [...this.#byId.values()].sort((a, b) => b.score - a.score);
  }
}

/** A value between the old and new setting: geometric mean when both are positive. */
export function between(from: number, to: number): number {
  return from > 0 && to > 0 ? Math.sqrt(from * to) : (from + to) / 2;
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
