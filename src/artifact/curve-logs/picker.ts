/**
 * Chooses the training and validation series of a curve. Named series (`--train`, `--validation`,
 * or the config) are taken as given; a missing partner is looked up by name. Otherwise series are
 * paired by what they measure (see names.ts) and one pair is chosen:
 *   1. with a metric name: the pair measuring it (same name, same family, then convertible);
 *   2. else the `loss` pair (every framework logs one; the caller then warns loss ≠ metric);
 *   3. else the pair that appears last (XGBoost stops early on its last eval metric).
 * Two runs measuring the chosen quantity (`version_0/val_loss`, `version_1/val_loss`) are an error:
 * the user names the run. Pure; no I/O.
 */
import { InputError, quote } from '../../model/errors.js';
import { parseName, type NameParts } from './names.js';
import type { CurveLogWarning, Series } from './types.js';
import { matchScore } from './units.js';

export interface PickOptions {
  train?: string;
  validation?: string;
  metric?: string;
  /** Take only the series named; do not look up a missing partner (a config mapping is exact). */
  exact?: boolean;
}

/** Where series are listed, for "not found" messages: `{file: 'training.log', pointer: 'line 1', noun: 'column'}`. */
export interface Catalogue {
  file: string;
  pointer: string;
  noun: string;
}

export interface Picked {
  validation: Series;
  train?: Series;
  /** `flags`: named by the caller; `names`: chosen here. */
  by: 'flags' | 'names';
  /** What the pair measures, as parsed from its names (e.g. `loss`); the validation name when unparsed. */
  base: string;
  /** Validation series of the other pairs that could have been chosen. */
  alternatives: string[];
  warnings: CurveLogWarning[];
}

interface Group {
  base: string;
  qualifier: string;
  train: NameParts[];
  validation: NameParts[];
  /** Position of the group's last series in the input. */
  last: number;
}

const byRank = (a: NameParts, b: NameParts) => a.rank - b.rank;

function groups(series: Series[]): Group[] {
  const map = new Map<string, Group>();
  series.forEach((s, index) => {
    const parts = parseName(s.name);
    if (parts === undefined) return;
    const key = `${parts.qualifier}\u0000${parts.base}`;
    let group = map.get(key);
    if (group === undefined) {
      group = {
        base: parts.base,
        qualifier: parts.qualifier,
        train: [],
        validation: [],
        last: index,
      };
      map.set(key, group);
    }
    group[parts.role].push(parts);
    group.last = index;
  });
  for (const g of map.values()) {
    g.train.sort(byRank);
    g.validation.sort(byRank);
  }
  return [...map.values()];
}

/** XGBoost's scikit-learn API names eval sets by position; `eval_set=[train, valid]` is the usual call. */
function guessPositional(g: Group): { train: NameParts; validation: NameParts } | undefined {
  const positional = g.validation.filter((p) => /^validation_\d+$/.test(p.set ?? ''));
  if (g.train.length > 0 || positional.length < 2 || positional.length !== g.validation.length)
    return undefined;
  const [train, validation] = positional;
  return train === undefined || validation === undefined ? undefined : { train, validation };
}

function notFound(catalogue: Catalogue, name: string, series: Series[], flag: string): InputError {
  const names = series.map((s) => s.name);
  const close = names.find((n) => n.toLowerCase() === name.toLowerCase());
  const listed = names
    .slice(0, 12)
    .map((n) => JSON.stringify(n))
    .join(', ');
  return new InputError([
    {
      file: catalogue.file,
      pointer: catalogue.pointer,
      expected: `must have the ${catalogue.noun} "${name}" (${flag})`,
      got: names.length === 0 ? 'none' : `${listed}${names.length > 12 ? ', …' : ''}`,
      hint:
        close !== undefined
          ? `Names are case-sensitive: did you mean "${close}"?`
          : `Name one of the ${catalogue.noun}s listed.`,
    },
  ]);
}

function partner(all: Group[], name: string, role: 'train' | 'validation'): string | undefined {
  const parts = parseName(name);
  if (parts === undefined) return undefined;
  const group = all.find((g) => g.base === parts.base && g.qualifier === parts.qualifier);
  return group?.[role][0]?.name;
}

function pickByFlags(series: Series[], options: PickOptions, catalogue: Catalogue): Picked {
  const find = (name: string, flag: string) => {
    const s = series.find((x) => x.name === name);
    if (s === undefined) throw notFound(catalogue, name, series, flag);
    return s;
  };
  const all = groups(series);
  const lookUp = options.exact !== true;
  const validationName =
    options.validation ??
    (options.train === undefined || !lookUp
      ? undefined
      : partner(all, options.train, 'validation'));
  if (validationName === undefined) {
    throw new InputError([
      {
        file: catalogue.file,
        pointer: catalogue.pointer,
        expected: `must have a validation ${catalogue.noun} to go with "${options.train}"`,
        hint: 'Name it with --validation.',
      },
    ]);
  }
  const validation = find(validationName, 'validation');
  const trainName =
    options.train ??
    (options.validation === undefined || !lookUp
      ? undefined
      : partner(all, validationName, 'train'));
  const train = trainName === undefined ? undefined : find(trainName, 'train');
  const warnings: CurveLogWarning[] = [];
  if (train === undefined) warnings.push({ code: 'no-train-series', validation: validation.name });
  return {
    validation,
    ...(train === undefined ? {} : { train }),
    by: 'flags',
    base: parseName(validationName)?.base ?? validationName,
    alternatives: [],
    warnings,
  };
}

export function pickSeries(series: Series[], options: PickOptions, catalogue: Catalogue): Picked {
  if (options.train !== undefined || options.validation !== undefined)
    return pickByFlags(series, options, catalogue);

  const all = groups(series).filter((g) => g.validation.length > 0);
  if (all.length === 0) {
    throw new InputError([
      {
        file: catalogue.file,
        pointer: catalogue.pointer,
        expected: `must have a validation ${catalogue.noun} (such as "val_loss", "val/loss" or an eval set)`,
        got:
          series.length === 0
            ? 'none'
            : series
                .slice(0, 12)
                .map((s) => JSON.stringify(s.name))
                .join(', '),
        hint: 'Name the series to use with --validation (and --train).',
      },
    ]);
  }
  const metric = options.metric;
  const score = (g: Group): number => {
    const m = metric === undefined ? undefined : matchScore(g.base, metric);
    if (m !== undefined) return m;
    return g.base === 'loss' ? 10 : 20 - g.last / (series.length + 1);
  };
  const ranked = [...all].sort((a, b) => score(a) - score(b));
  const best = ranked[0] as Group;
  const rivals = ranked.filter((g) => g.base === best.base && g.qualifier !== best.qualifier);
  if (rivals.length > 0) {
    const runs = [best, ...rivals].map((g) =>
      quote(g.qualifier === '' ? '(top level)' : g.qualifier),
    );
    throw new InputError([
      {
        file: catalogue.file,
        pointer: '',
        expected: `must hold one run, but several log "${best.base}"`,
        got: runs.join(', '),
        hint: 'Name one run folder as PATH, or name the series with --train and --validation.',
      },
    ]);
  }
  const warnings: CurveLogWarning[] = [];
  const guessed = guessPositional(best);
  const validationParts = guessed?.validation ?? (best.validation[0] as NameParts);
  const trainParts = guessed?.train ?? best.train[0];
  if (guessed !== undefined)
    warnings.push({
      code: 'eval-sets-guessed',
      train: guessed.train.name,
      validation: guessed.validation.name,
    });
  const validation = series.find((s) => s.name === validationParts.name) as Series;
  const train =
    trainParts === undefined ? undefined : series.find((s) => s.name === trainParts.name);
  if (train === undefined) warnings.push({ code: 'no-train-series', validation: validation.name });
  return {
    validation,
    ...(train === undefined ? {} : { train }),
    by: 'names',
    base: best.base,
    alternatives: ranked.slice(1).map((g) => (g.validation[0] as NameParts).name),
    warnings,
  };
}
