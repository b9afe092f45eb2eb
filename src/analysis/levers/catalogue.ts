/** The lever catalogue: what each lever addresses (common practice), and the diagnosis levers in order. */
import type { LeverId } from '../../model/review.js';

export type Target = 'variance' | 'bias' | 'mismatch' | 'validation-overfit' | 'evidence';

export const LEVER_CATALOGUE: Readonly<Record<LeverId, { addresses: Target }>> = {
  'more-data': { addresses: 'variance' },
  'fewer-features': { addresses: 'variance' },
  'stronger-regularization': { addresses: 'variance' },
  'smaller-model': { addresses: 'variance' },
  'early-stopping': { addresses: 'variance' },
  'more-features': { addresses: 'bias' },
  'richer-features': { addresses: 'bias' },
  'weaker-regularization': { addresses: 'bias' },
  'bigger-model': { addresses: 'bias' },
  'train-longer': { addresses: 'bias' },
  'align-training-data': { addresses: 'mismatch' },
  'bigger-validation-set': { addresses: 'validation-overfit' },
  'add-repeats': { addresses: 'evidence' },
  'supply-reference': { addresses: 'evidence' },
  'repeat-with-seeds': { addresses: 'evidence' },
};

/**
 * The levers offered for a high-variance or high-bias diagnosis, most broadly useful first (common
 * practice): data and regularization before feature and capacity changes, epochs last because
 * they need an epoch curve to be judged.
 */
export const BY_TARGET: Readonly<Record<'variance' | 'bias', readonly LeverId[]>> = {
  variance: [
    'more-data',
    'stronger-regularization',
    'fewer-features',
    'early-stopping',
    'smaller-model',
  ],
  bias: [
    'richer-features',
    'more-features',
    'weaker-regularization',
    'bigger-model',
    'train-longer',
  ],
};
