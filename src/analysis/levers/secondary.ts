/**
 * Levers that do not come from the bias/variance diagnosis: what the epoch curve shows on its
 * own, data mismatch, validation overfit, and the missing evidence (reference level, repeats). Pure.
 */
import { epochMinimum, type CurveEvidence, type Drafts, type LeverContext } from './context.js';
import * as SCORE from './scores.js';

export function secondaryLevers(ctx: LeverContext, curves: CurveEvidence, drafts: Drafts): void {
  const epochs = curves.epochs;
  const { candidate } = ctx;
  if (epochs !== null && epochs.stoppedLate && !drafts.has('early-stopping')) {
    drafts.add('early-stopping', SCORE.EPOCH_CURVE_ALONE, [epochMinimum(epochs, ctx.goal)]);
  }
  if (epochs !== null && epochs.stoppedEarly && !drafts.has('train-longer')) {
    drafts.add('train-longer', SCORE.EPOCH_CURVE_ALONE, [
      { kind: 'still-improving', epoch: epochs.finalX },
    ]);
  }
  const mismatch = candidate.components.mismatch;
  if (candidate.diagnosis === 'data-mismatch' || mismatch.present) {
    drafts.add(
      'align-training-data',
      candidate.diagnosis === 'data-mismatch' ? SCORE.MISMATCH_DIAGNOSED : SCORE.MISMATCH_PRESENT,
      [
        {
          kind: 'diagnosis',
          component: 'mismatch',
          value: mismatch.value ?? 0,
          errorLevel: candidate.errorLevel,
        },
      ],
    );
  }
  const overfit = candidate.components.overfit;
  if (overfit.present) {
    drafts.add('bigger-validation-set', SCORE.VALIDATION_OVERFIT, [
      {
        kind: 'diagnosis',
        component: 'overfit',
        value: overfit.value ?? 0,
        errorLevel: candidate.errorLevel,
      },
    ]);
  }
  if (candidate.biasUnknown) {
    drafts.add('supply-reference', SCORE.SUPPLY_REFERENCE, [{ kind: 'reference-missing' }]);
  }
  if (ctx.undetermined !== undefined) {
    drafts.add('repeat-with-seeds', SCORE.REPEAT_FIRST, [
      { kind: 'change-undetermined', repeatsNeeded: ctx.undetermined.repeatsNeeded },
    ]);
  }
  if (ctx.noiseUnknown) {
    drafts.add('add-repeats', SCORE.ADD_REPEATS, [{ kind: 'noise-unknown' }]);
  }
}
