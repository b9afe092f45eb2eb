/**
 * Reads what a series name says about itself: whether it is measured on the training or the
 * validation data, and what it measures. The conventions are the loggers' own (common practice):
 *   Keras           `loss`, `val_loss`, `accuracy`, `val_accuracy` (no prefix: training)
 *   Keras TensorBoard  `train/epoch_loss`, `validation/epoch_loss` (run folder, `epoch_` tag)
 *   Lightning       `train_loss`, `train_loss_epoch`, `train_loss_step`, `val_loss`
 *   PyTorch users   `train/loss`, `val/loss`, `Loss/train`, `Loss/val`
 *   Boosting        `train/logloss`, `eval/logloss`, `validation_0/error`, `training/l2`,
 *                   `valid_0/l2`, `learn/Logloss`, `test/error`
 */

export type Role = 'train' | 'validation';

export interface NameParts {
  name: string;
  role: Role;
  /** What is measured, lower-cased, `epoch_` and Lightning's `_epoch`/`_step` removed: `loss`. */
  base: string;
  /** Leading path segments that name a run (`version_0`), '' when none; pairs share it. */
  qualifier: string;
  /** Preference among names of one role and base: lower is better. */
  rank: number;
  /** The eval-set word when the name has one (`validation_0`), lower-cased. */
  set?: string;
}

const TRAIN_WORDS = new Set(['train', 'training', 'learn', 'trn']);
const VALIDATION_RANK = new Map<string, number>([
  ['val', 0],
  ['valid', 0],
  ['validation', 0],
  ['eval', 0],
  ['evaluation', 0],
  ['dev', 0],
  ['test', 3],
]);
const NUMBERED = /^(?:val|valid|validation|eval)_(\d+)$/;

/** Quantities that are not a model's quality: never picked by name. */
const NOT_A_METRIC =
  /^(?:epochs?|steps?|global_step|iter(?:ation)?s?|batch(?:es)?|lr|learning_rate|lr[-_].*|time.*|duration|hp_metric|momentum|weight_decay|grad_norm)$/;

function roleOfWord(word: string): { role: Role; rank: number } | undefined {
  const w = word.toLowerCase();
  if (TRAIN_WORDS.has(w)) return { role: 'train', rank: 0 };
  const rank = VALIDATION_RANK.get(w);
  if (rank !== undefined) return { role: 'validation', rank };
  const numbered = NUMBERED.exec(w);
  if (numbered?.[1] !== undefined)
    return { role: 'validation', rank: 1 + Number(numbered[1]) / 1e6 };
  return undefined;
}

/** Lower-case, `epoch_` prefix and `_epoch`/`_step` suffix removed; stage rank for the suffix. */
function normalizeBase(text: string): { base: string; stage: number } {
  let base = text.toLowerCase();
  let stage = 0;
  const last = base.lastIndexOf('/') + 1;
  let leaf = base.slice(last);
  if (leaf.startsWith('epoch_') && leaf.length > 6) leaf = leaf.slice(6);
  const suffix = /^(.+)_(epoch|step)$/.exec(leaf);
  if (suffix?.[1] !== undefined) {
    leaf = suffix[1];
    stage = suffix[2] === 'epoch' ? 0.1 : 0.2;
  }
  base = base.slice(0, last) + leaf;
  return { base, stage };
}

export function parseName(name: string): NameParts | undefined {
  const segments = name.split('/');
  for (let i = segments.length - 1; i >= 0; i--) {
    const found = roleOfWord(segments[i] ?? '');
    if (found === undefined) continue;
    const after = segments.slice(i + 1).join('/');
    const before = segments.slice(0, i).join('/');
    const { base, stage } = normalizeBase(after !== '' ? after : before);
    if (base === '' || NOT_A_METRIC.test(base.slice(base.lastIndexOf('/') + 1))) return undefined;
    return {
      name,
      role: found.role,
      base,
      qualifier: after !== '' ? before.toLowerCase() : '',
      rank: found.rank + stage,
      set: (segments[i] ?? '').toLowerCase(),
    };
  }
  const leaf = segments[segments.length - 1] ?? '';
  const qualifier = segments.slice(0, -1).join('/').toLowerCase();
  let role: Role = 'train';
  let rank = 0.5; // an unprefixed name (Keras `loss`) is training data, after explicit prefixes
  let rest = leaf;
  const prefix = /^([A-Za-z]+(?:_\d+)?)_(.+)$/.exec(leaf);
  const suffix = /^(.+)_([A-Za-z]+)$/.exec(leaf);
  const byPrefix = prefix?.[1] === undefined ? undefined : roleOfWord(prefix[1]);
  const bySuffix = suffix?.[2] === undefined ? undefined : roleOfWord(suffix[2]);
  if (byPrefix !== undefined && prefix?.[2] !== undefined) {
    ({ role, rank } = byPrefix);
    rest = prefix[2];
  } else if (bySuffix !== undefined && suffix?.[1] !== undefined) {
    ({ role, rank } = bySuffix);
    rest = suffix[1];
  }
  const { base, stage } = normalizeBase(rest);
  if (base === '' || NOT_A_METRIC.test(base)) return undefined;
  return { name, role, base, qualifier, rank: rank + stage };
}
