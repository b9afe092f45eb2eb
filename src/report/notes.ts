/**
 * The sentences of the notes: the review's notes, its non-levers, the runs' warnings, and why a
 * component could not be computed. Artifact strings (slice and file names) go through `esc`.
 */
import type { Note, NonLever, Review, RunWarning, UnavailableCode } from '../model/review.js';
import type { Escape } from './escape.js';
import { amount, count, short, value, type NumberFormat } from './format.js';
import { COMPONENT_ORDER, COMPONENT_TITLE, SPLIT_WORD, say, type Words } from './words.js';

/** Names listed in a note, and "…" when there were more. */
function names(list: readonly string[], total: number, esc: Escape): string {
  return `${list.map((n) => esc(n, 60)).join(', ')}${total > list.length ? ', …' : ''}`;
}

/** A hyperparameter value from an artifact: a number in short form, anything else as JSON, escaped. */
function jsonText(v: unknown, esc: Escape): string {
  if (typeof v === 'number') return short(v);
  if (v === null) return 'none';
  return esc(JSON.stringify(v) ?? String(v), 40);
}

function slices(n: number): string {
  return `${count(n)} ${n === 1 ? 'slice' : 'slices'}`;
}

export function noteSentence(note: Note, review: Review, f: NumberFormat, esc: Escape): string {
  switch (note.code) {
    case 'train-dev-in-one-run':
      return 'Only one run has a train-dev split: the variance change is measured as validation − train in both.';
    case 'unpaired-slices':
      return `${slices(note.count)} appear in one run only and were not compared: ${names(note.names, note.count, esc)}.`;
    case 'hidden-regressions':
      return `Validation improved overall, yet ${slices(note.count)} regressed significantly (Holm-adjusted): ${names(note.names, note.count, esc)}.`;
    case 'noise-unknown':
      return 'Cannot tell: run-to-run noise is unknown (one repeat, or identical repeats, of a continuous metric without per-example predictions), so changes it touches are undetermined, whatever their size. Repeat each run with at least 2 seeds, or add per-example predictions.';
    case 'reference-from-one-run':
      return `Only the ${note.from} states a reference (${value(note.value, f)}): it is used for both runs, since the reference is a property of the task.`;
    case 'references-differ':
      return `Warning: the runs state different references (baseline ${value(note.baseline, f)}, candidate ${value(note.candidate, f)}); the candidate's is used for both, so the bias change is the change of training error.`;
    case 'noise-from-evaluation-set':
      return `The noise includes the evaluation set's sampling noise (${note.source === 'binomial' ? 'binomial' : 'from per-example values'}), which repeats on fixed rows do not show.`;
    case 'predictions-partial-overlap':
      return `The predictions files share ${count(note.shared)} ids of ${count(note.baseline)} (baseline) and ${count(note.candidate)} (candidate): not paired; the unpaired test decided.`;
    case 'repeats-decided':
      return "Both runs have two or more repeats: Welch's test over the repeats decided, since it holds the seed noise that a paired test over one repeat's rows leaves out.";
    case 'bias-unknown':
      return 'Avoidable bias is unknown: there is no reference level for this metric. Its change is still measured from the training error; the diagnosis rests on variance and data mismatch.';
    case 'predictions-share-no-id':
      return 'The two predictions files share no id: the paired test was not used.';
    case 'predictions-in-one-run':
      return 'Only one run ships per-example predictions: no paired test.';
    case 'predictions-split-mismatch':
      return `The predictions are for different splits (${say(SPLIT_WORD, note.baseline, esc)} in the baseline, ${say(SPLIT_WORD, note.candidate, esc)} in the candidate): no paired test.`;
    case 'predictions-unmatched':
      return `Predictions paired by id: ${count(note.rows)} rows in both; ${count(note.baseline)} baseline and ${count(note.candidate)} candidate rows had no partner and were left out of the paired test.`;
    case 'epoch-log-not-used':
      return `${esc(note.file, 120)}: the artifact has its own epoch curve; the epoch log ${esc(note.log, 120)} was not used.`;
    case 'epoch-log-missing':
      return `No epoch log ${esc(note.log, 120)} next to ${esc(note.file, 120)}; the config's epoch-log mapping was not applied to it.`;
    case 'unmapped-hyperparameters': {
      const list = note.changes
        .map(
          (c) =>
            `${esc(c.key, 60)} ${jsonText(c.baseline, esc)} → ${jsonText(c.candidate, esc)}${c.ambiguous ? ' (means different things in different libraries)' : ''}`,
        )
        .join('; ');
      const more =
        note.count > note.changes.length
          ? `; and ${count(note.count - note.changes.length)} more`
          : '';
      return `The PR changed ${note.count === 1 ? 'a hyperparameter' : 'hyperparameters'} whose role fitgap does not know, so no lever rests on ${note.count === 1 ? 'it' : 'them'}: ${list}${more}. Map ${note.count === 1 ? 'it' : 'them'} in the config's \`hyperparameters\` (role and inverse).`;
    }
    default:
      return esc(String((note as { code: unknown }).code), 60);
  }
}

const NON_LEVER: Words<NonLever> = new Map([
  [
    'smaller-training-set',
    'A smaller training set is not a cure for high bias: it only lowers the training error, while validation error stays high or rises.',
  ],
]);

const WARNING: Words<RunWarning> = new Map([
  [
    'validation-overfit',
    'test error is well above validation error: model choices may be tuned to the validation set.',
  ],
  [
    'below-reference',
    'training error is below the reference level (negative avoidable bias): the model may be memorising noise, or the reference is wrong. This is not "better".',
  ],
]);

const MDE_METHOD: Words<NonNullable<Review['validation']['mde']>['method']> = new Map([
  ['welch-noncentral-t', "Welch's t, noncentral t power"],
  ['normal', 'normal approximation'],
  ['fleiss-two-proportions', 'two proportions, Fleiss–Levin–Paik'],
  ['mcnemar-connor', "McNemar, Connor's formula"],
  ['paired-t', 'paired t'],
]);

/** One line: the smallest detectable validation change and the repeats that would detect it. */
export function powerLine(review: Review, f: NumberFormat, esc: Escape): string | null {
  const { mde, repeatsNeeded } = review.validation;
  if (mde === undefined && repeatsNeeded === undefined) return null;
  const alpha = review.settings.alpha;
  const smallest =
    mde === null || mde === undefined
      ? 'The smallest detectable change is unknown (no noise estimate)'
      : `This design detects a validation change of ${mde.atLeast ? 'at least ' : ''}${amount(mde.value, f)} with 80% power at two-sided alpha ${alpha} (${say(MDE_METHOD, mde.method, esc)})`;
  let repeats = '';
  if (repeatsNeeded !== undefined) {
    if (repeatsNeeded.repeats !== null)
      repeats = `; ${repeatsNeeded.lowerBound ? 'at least ' : ''}${count(repeatsNeeded.repeats)} repeats per run would detect the observed change`;
    else if (repeatsNeeded.reason === 'noise-unknown')
      repeats = '; repeat each run with at least 2 seeds to measure the noise';
    else if (repeatsNeeded.reason === 'fixed-noise')
      repeats =
        "; the fixed evaluation set's sampling noise alone hides the observed change: more seeds cannot help, a larger evaluation set can";
    else if (repeatsNeeded.reason === 'beyond-limit')
      repeats = '; more than 1,000 repeats per run would be needed to detect the observed change';
  }
  return `${smallest}${repeats}.`;
}

/** The review's notes, the runs' warnings and the non-levers, one sentence each. */
export function reviewNotes(review: Review, f: NumberFormat, esc: Escape): string[] {
  return [
    ...(['baseline', 'candidate'] as const).flatMap((run) =>
      review[run].warnings.map((w) => `${run}: ${say(WARNING, w, esc)}`),
    ),
    ...[powerLine(review, f, esc)].filter((l): l is string => l !== null),
    ...review.notes.map((n) => noteSentence(n, review, f, esc)),
    ...review.nonLevers.map((n) => say(NON_LEVER, n, esc)),
  ];
}

const UNAVAILABLE: Words<UnavailableCode> = new Map([
  [
    'no-reference',
    'no reference level: give `reference` in the artifact or the config (human-level error, a prior system, or an estimated Bayes error).',
  ],
  ['no-train-dev', 'needs a train-dev split (held-out data from the training distribution).'],
  ['no-test', 'needs a test split.'],
]);

/** Why components could not be computed, one line each, deduplicated. */
export function unavailableNotes(review: Review, esc: Escape): string[] {
  const seen = new Set<string>();
  for (const run of ['baseline', 'candidate'] as const) {
    for (const name of COMPONENT_ORDER) {
      const c = review[run].components[name];
      if (c.value === null && c.unavailable !== undefined) {
        seen.add(`${say(COMPONENT_TITLE, name, esc)}: ${say(UNAVAILABLE, c.unavailable, esc)}`);
      }
    }
  }
  return [...seen];
}
