/**
 * The review settings, defined once: the defaults, ranges and parsing of `alpha`, `min-effect`,
 * `gap-tolerance`, `reference` and `fail-on`. The CLI flags, the action inputs and the config file
 * all go through these functions; schema/fitgap-config.schema.json states the same ranges and a
 * test holds the two together. Pure.
 */
import { quote, type Issue } from './errors.js';
import { MAX_MAGNITUDE, formatLimit } from './limits.js';
import type { ReviewSettings } from './review.js';

/** Outcomes that `fail-on` can name. */
export const FAIL_ON_VALUES = [
  'worse-validation',
  'toward-overfitting',
  'toward-underfitting',
  'worse-on-both',
  'any-movement',
  'slice-regression',
  'high-bias',
  'high-variance',
  'data-mismatch',
  'validation-overfit',
  'guardrail-regression',
  'guardrail-undetermined',
  'none',
] as const;

/** Cost fields as `fail-on` names them (`train-seconds-ratio>2`), mapped to the run format's keys. */
export const COST_OUTCOME_FIELDS = new Map([
  ['train-seconds', 'trainSeconds'],
  ['inference-ms', 'inferenceMs'],
  ['parameters', 'parameters'],
  ['memory-mb', 'memoryMb'],
] as const);

/** `FIELD-ratio>X`: fails when candidate / baseline of that cost exceeds X. */
export const COST_RATIO_OUTCOME =
  /^(train-seconds|inference-ms|parameters|memory-mb)-ratio>((?:0|[1-9][0-9]*)(?:\.[0-9]+)?)$/;

export type FailOn = (typeof FAIL_ON_VALUES)[number] | `${string}-ratio>${string}`;

export function isFailOn(value: string): value is FailOn {
  return (FAIL_ON_VALUES as readonly string[]).includes(value) || COST_RATIO_OUTCOME.test(value);
}

export const DEFAULT_SETTINGS: ReviewSettings = {
  alpha: 0.05,
  minEffect: 0,
  gapTolerance: 0.1,
  failOn: ['worse-validation'],
};

export type NumberSettingName = 'alpha' | 'min-effect' | 'gap-tolerance' | 'reference';

export interface NumberSetting {
  /** Inclusive range. */
  min: number;
  max: number;
  /** What the setting is, for help texts. */
  about: string;
}

/**
 * Ranges of the numeric settings (inclusive at both ends).
 * - `alpha` from 1e-6: an interval at 1 − α/2 must stay a quantile the normal and t distributions
 *   can give in double precision; far below 1e-6 it rounds to 1 and the interval is infinite.
 *   Up to 0.5: a "significance level" above one half calls every difference significant.
 * - `min-effect` and `reference`: any number an artifact may hold (±1e15, see MAX_MAGNITUDE);
 *   a reference for a proportion metric must also lie in [0, 1] (checked with the artifacts).
 * - `gap-tolerance`: a fraction of the validation error level.
 */
export const NUMBER_SETTINGS: Record<NumberSettingName, NumberSetting> = {
  alpha: { min: 1e-6, max: 0.5, about: 'significance level' },
  'min-effect': { min: 0, max: MAX_MAGNITUDE, about: 'smallest change that counts' },
  'gap-tolerance': { min: 0, max: 1, about: 'component present at this fraction of the error' },
  reference: { min: -MAX_MAGNITUDE, max: MAX_MAGNITUDE, about: 'reference level' },
};

/** Where a setting came from, for messages: `--alpha`, `input "alpha"`, a config file and pointer. */
export interface SettingSource {
  file: string;
  pointer: string;
}

/** A plain decimal number: `0.05`, `-1`, `2e-3`. Not `0x1`, `Infinity`, `1_000` or an empty text. */
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** The number a text spells in plain decimal notation, or null. */
export function parseDecimal(text: string): number | null {
  const trimmed = text.trim();
  if (!DECIMAL.test(trimmed)) return null;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : null;
}

function rangeText(name: NumberSettingName): string {
  const { min, max } = NUMBER_SETTINGS[name];
  return `must be a number from ${formatLimit(min)} to ${formatLimit(max)}`;
}

/** Problems of a numeric setting's value (empty when it is in range). */
export function numberSettingIssues(
  name: NumberSettingName,
  value: number,
  source: SettingSource,
): Issue[] {
  const { min, max } = NUMBER_SETTINGS[name];
  if (Number.isFinite(value) && value >= min && value <= max) return [];
  return [{ ...source, expected: rangeText(name), got: quote(value) }];
}

/** A numeric setting written as text (a flag or an action input). */
export function parseNumberSetting(
  name: NumberSettingName,
  text: string,
  source: SettingSource,
): { value: number } | { issues: Issue[] } {
  const value = parseDecimal(text);
  if (value === null)
    return { issues: [{ ...source, expected: rangeText(name), got: quote(text) }] };
  const issues = numberSettingIssues(name, value, source);
  return issues.length > 0 ? { issues } : { value };
}

/** `fail-on` items are separated by commas or new lines, in flags, inputs and config alike. */
export const FAIL_ON_SEPARATORS = /[,\n]/;

/**
 * Problems of a `fail-on` list: unknown outcomes, an empty list (it would silently disable the
 * gate: write `none` to mean that), and `none` beside other outcomes (a contradiction).
 */
export function failOnIssues(values: readonly string[], source: SettingSource): Issue[] {
  const at = (i: number) => (source.pointer === '' ? '' : `${source.pointer}/${i}`);
  if (values.length === 0) {
    return [
      {
        ...source,
        expected: 'must name at least one outcome',
        got: 'an empty list',
        hint: "Write 'none' for a gate that never fails, or leave the setting out for the default (worse-validation).",
      },
    ];
  }
  const issues: Issue[] = values.flatMap((value, i) =>
    isFailOn(value)
      ? []
      : [
          {
            ...source,
            pointer: at(i),
            expected: `must be one of ${FAIL_ON_VALUES.join(', ')}, or FIELD-ratio>X (FIELD one of ${[...COST_OUTCOME_FIELDS.keys()].join(', ')})`,
            got: quote(value),
            hint: 'Separate outcomes with commas or new lines.',
          },
        ],
  );
  if (issues.length === 0 && values.length > 1 && values.includes('none')) {
    issues.push({
      ...source,
      pointer: at(values.indexOf('none')),
      expected: "must not combine 'none' with other outcomes",
      got: quote(values.join(',')),
    });
  }
  return issues;
}

/** A `fail-on` list written as text: outcomes separated by commas or new lines. */
export function parseFailOn(
  text: string,
  source: SettingSource,
): { value: FailOn[] } | { issues: Issue[] } {
  const values = text
    .split(FAIL_ON_SEPARATORS)
    .map((s) => s.trim())
    .filter((s) => s !== '');
  const issues = failOnIssues(values, source);
  return issues.length > 0 ? { issues } : { value: values as FailOn[] };
}
