/** Sentences about an imported curve: which series were taken and what to watch out for. */
import type { CurveLogWarning, ImportedCurve } from '../artifact/curve-logs/index.js';

const CONVERSION_WORDS = {
  'one-minus': '1 − value',
  sqrt: 'the square root',
  square: 'the square',
} as const;

export function curveLogWarningText(w: CurveLogWarning): string {
  switch (w.code) {
    case 'loss-not-metric':
      return w.metric === undefined
        ? `"${w.series}" is a loss, not necessarily the run's metric; the artifact's curves must be in the metric's units. Pass --metric NAME, or name metric series with --train and --validation.`
        : `"${w.series}" is a loss, not the metric "${w.metric}"; the artifact's curves must be in the metric's units. Name the metric's series with --train and --validation if the log has them.`;
    case 'units-unchecked':
      return w.metric === undefined
        ? `Check that "${w.series}" is in the units of the run's metric (pass --metric NAME to have it checked).`
        : `Could not tell whether "${w.series}" is in the units of "${w.metric}"; check it.`;
    case 'converted':
      return `Converted "${w.series}" to the units of "${w.metric}" (${CONVERSION_WORDS[w.conversion]}).`;
    case 'duplicates-averaged':
      return `"${w.series}" had several values at ${w.xs} x value(s); each was replaced by their mean.`;
    case 'no-train-series':
      return `No training series pairs with "${w.validation}"; the curve has validation values only (name one with --train).`;
    case 'train-missing':
      return `"${w.series}" has no value at ${w.points} point(s) of the curve; those points have no train value.`;
    case 'train-only-dropped':
      return `${w.points} value(s) of "${w.series}" at an x with no validation value were left out.`;
    case 'truncated-record':
      return `${w.file} ends inside a record at byte ${w.offset} (still being written?); the records before it were read.`;
    case 'non-scalar-skipped':
      return `${w.file}: skipped ${w.count} summary value(s) that are not numeric scalars (histograms, images, text).`;
    case 'eval-sets-guessed':
      return `Took eval set "${w.train}" as training data and "${w.validation}" as validation data (eval_set order); name them with --train and --validation if that is wrong.`;
  }
}

/** One line saying what was imported, then one per warning. */
export function curveImportNotes(curve: ImportedCurve, out: string): string[] {
  const series =
    curve.train === undefined
      ? `validation "${curve.validation}"`
      : `train "${curve.train}" and validation "${curve.validation}"`;
  const how = curve.by === 'flags' ? 'Took' : 'Picked';
  const others =
    curve.alternatives.length === 0
      ? ''
      : ` Others: ${curve.alternatives
          .slice(0, 6)
          .map((a) => `"${a}"`)
          .join(', ')}${curve.alternatives.length > 6 ? ', …' : ''}.`;
  return [
    `${how} ${series} from ${curve.files.join(', ')} (x: ${curve.x}); wrote ${curve.points.length} point(s) to ${out}.${others}`,
    ...curve.warnings.map(curveLogWarningText),
  ];
}
