/**
 * The series picker on the names the common loggers write (common practice: Keras, its
 * TensorBoard callback, Lightning, PyTorch users' tags, XGBoost, LightGBM, CatBoost).
 */
import { describe, expect, it } from 'vitest';
import { InputError } from '../../../src/model/errors.js';
import { pickSeries, type Series } from '../../../src/artifact/curve-logs/index.js';
import { parseName } from '../../../src/artifact/curve-logs/names.js';

const catalogue = { file: 'log', pointer: 'line 1', noun: 'column' };
const series = (names: string[]): Series[] =>
  names.map((name) => ({
    name,
    file: 'log',
    x: 'epoch',
    where: { kind: 'line' },
    points: [{ x: 1, value: 0.5, at: 2 }],
    problems: [],
  }));
const pick = (names: string[], metric?: string) => {
  const p = pickSeries(series(names), metric === undefined ? {} : { metric }, catalogue);
  return [p.train?.name, p.validation.name];
};

describe('pickSeries by name', () => {
  it.each([
    [['epoch', 'accuracy', 'loss', 'val_accuracy', 'val_loss'], 'loss', 'val_loss'],
    [['train_loss', 'val_loss'], 'train_loss', 'val_loss'],
    [['train/loss', 'val/loss', 'train/acc', 'val/acc'], 'train/loss', 'val/loss'],
    [['Loss/train', 'Loss/val'], 'Loss/train', 'Loss/val'],
    [
      ['train/epoch_loss', 'validation/epoch_loss', 'validation/evaluation_loss_vs_iterations'],
      'train/epoch_loss',
      'validation/epoch_loss',
    ],
    [['epoch', 'train_loss_step', 'train_loss_epoch', 'val_loss'], 'train_loss_epoch', 'val_loss'],
    [
      ['training/binary_logloss', 'valid_0/binary_logloss'],
      'training/binary_logloss',
      'valid_0/binary_logloss',
    ],
    [['learn/Logloss', 'validation/Logloss'], 'learn/Logloss', 'validation/Logloss'],
    [['train/error', 'test/error'], 'train/error', 'test/error'],
    [['train/auc', 'valid_1/auc', 'valid_0/auc'], 'train/auc', 'valid_0/auc'],
    [['lr', 'epoch', 'val_loss'], undefined, 'val_loss'],
  ])('%j → %s / %s', (names, train, validation) => {
    expect(pick(names)).toEqual([train, validation]);
  });

  it('prefers the metric’s series when the metric is named, by name, family or conversion', () => {
    const names = ['loss', 'val_loss', 'acc', 'val_acc', 'lr'];
    expect(pick(names, 'accuracy')).toEqual(['acc', 'val_acc']);
    expect(pick(names, 'error rate')).toEqual(['acc', 'val_acc']);
    expect(pick(names, 'AUC')).toEqual(['loss', 'val_loss']); // not logged: falls back to loss
    expect(pick(['train/rmse', 'eval/rmse', 'train/l2', 'eval/l2'], 'l2')).toEqual([
      'train/l2',
      'eval/l2',
    ]);
    expect(pick(['train/l2', 'eval/l2', 'train/l1', 'eval/l1'], 'RMSE')).toEqual([
      'train/l2',
      'eval/l2',
    ]);
  });

  it('reads names as the loggers mean them', () => {
    expect(parseName('val_loss')).toMatchObject({
      role: 'validation',
      base: 'loss',
      qualifier: '',
    });
    expect(parseName('loss')).toMatchObject({ role: 'train', base: 'loss' });
    expect(parseName('version_0/train/epoch_accuracy')).toMatchObject({
      role: 'train',
      base: 'accuracy',
      qualifier: 'version_0',
    });
    expect(parseName('val_binary_accuracy')).toMatchObject({
      role: 'validation',
      base: 'binary_accuracy',
    });
    expect(parseName('epoch')).toBeUndefined();
    expect(parseName('lr-Adam')).toBeUndefined();
  });

  it('refuses to choose between runs, and says which', () => {
    const names = ['version_0/train_loss', 'version_0/val_loss', 'version_1/val_loss'];
    expect(() => pick(names)).toThrow(InputError);
    expect(() => pick(names)).toThrow(
      'log must hold one run, but several log "loss" (got "version_0", "version_1")',
    );
  });

  it('needs a validation series', () => {
    expect(() => pick(['loss', 'lr'])).toThrow(
      'log: line 1 must have a validation column (such as "val_loss", "val/loss" or an eval set) (got "loss", "lr")',
    );
  });
});

describe('pickSeries by flags', () => {
  it('takes named series and finds a missing partner by name', () => {
    const all = series(['loss', 'val_loss', 'acc', 'val_acc']);
    const both = pickSeries(all, { train: 'acc', validation: 'val_loss' }, catalogue);
    expect([both.train?.name, both.validation.name, both.by]).toEqual(['acc', 'val_loss', 'flags']);
    const v = pickSeries(all, { validation: 'val_acc' }, catalogue);
    expect(v.train?.name).toBe('acc');
    const t = pickSeries(all, { train: 'loss' }, catalogue);
    expect(t.validation.name).toBe('val_loss');
    // A config mapping is exact: no partner is added.
    const exact = pickSeries(all, { validation: 'val_acc', exact: true }, catalogue);
    expect(exact.train).toBeUndefined();
    const alone = pickSeries(series(['val_x']), { validation: 'val_x' }, catalogue);
    expect(alone.warnings).toEqual([{ code: 'no-train-series', validation: 'val_x' }]);
  });

  it('names what is there when a series is missing', () => {
    expect(() =>
      pickSeries(series(['loss', 'val_loss']), { validation: 'VAL_LOSS' }, catalogue),
    ).toThrow(
      'log: line 1 must have the column "VAL_LOSS" (validation) (got "loss", "val_loss"). Names are case-sensitive: did you mean "val_loss"?',
    );
    expect(() => pickSeries(series(['loss', 'x']), { train: 'loss' }, catalogue)).toThrow(
      'log: line 1 must have a validation column to go with "loss". Name it with --validation.',
    );
  });
});

describe('names that are also Object properties', () => {
  it('are plain names', () => {
    expect(parseName('constructor_loss')).toMatchObject({
      role: 'train',
      base: 'constructor_loss',
    });
    expect(parseName('toString/loss')).toMatchObject({
      role: 'train',
      base: 'loss',
      qualifier: 'tostring',
    });
    expect(pick(['constructor', 'val_constructor'], 'constructor')).toEqual([
      'constructor',
      'val_constructor',
    ]);
  });
});
