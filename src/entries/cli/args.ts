/** Parses command-line flags into typed options; bad usage is a `UsageError`, bad values an `InputError`. */
import { parseArgs } from 'node:util';
import { InputError, UsageError, type Issue } from '../../model/errors.js';
import { parseFailOn, parseNumberSetting, type NumberSettingName } from '../../model/settings.js';
import type { SettingsOverrides } from '../../io/review-from-files.js';
import { LIMIT_NAMES, parseLimitMb, type FileLimits } from '../../io/open-untrusted.js';

export type Format = 'text' | 'markdown' | 'json';
const FORMATS: readonly Format[] = ['text', 'markdown', 'json'];

type Options = Record<string, { type: 'string' | 'boolean'; short?: string }>;

/** `-0.5`, `-1`, `-.5e3`: a value, not a flag. */
const NEGATIVE_NUMBER = /^-(?:\d|\.\d)/;

/**
 * `--reference -0.5` → `--reference=-0.5`, so a negative number after an option that takes a value
 * is read as its value (node's parser would call it an ambiguous flag).
 */
export function joinNegativeValues(argv: readonly string[], options: Options): string[] {
  const out: string[] = [];
  for (let i = 0; i < argv.length; i++) {
    const token = argv[i] ?? '';
    if (token === '--') {
      out.push(...argv.slice(i));
      break;
    }
    const name = token.startsWith('--') && !token.includes('=') ? token.slice(2) : null;
    const next = argv[i + 1];
    if (
      name !== null &&
      options[name]?.type === 'string' &&
      next !== undefined &&
      NEGATIVE_NUMBER.test(next)
    ) {
      out.push(`${token}=${next}`);
      i++;
    } else out.push(token);
  }
  return out;
}

export function parseFlags(
  argv: string[],
  options: Options,
  command: string,
): { values: Record<string, string | boolean | undefined>; positionals: string[] } {
  try {
    const parsed = parseArgs({
      args: joinNegativeValues(argv, options),
      options,
      allowPositionals: true,
      strict: true,
    });
    return {
      values: parsed.values as Record<string, string | boolean | undefined>,
      positionals: parsed.positionals,
    };
  } catch (error) {
    const message = error instanceof Error ? (error.message.split('\n')[0] ?? '') : String(error);
    throw new UsageError(
      `fitgap ${command}: ${message.replace(/\.+$/, '')}. Run 'fitgap ${command} --help'.`,
    );
  }
}

export function parseFormat(value: string | boolean | undefined, command: string): Format {
  if (value === undefined) return 'text';
  if (typeof value === 'string' && (FORMATS as readonly string[]).includes(value))
    return value as Format;
  throw new UsageError(
    `fitgap ${command}: --format must be one of ${FORMATS.join(', ')} (got ${JSON.stringify(value)}).`,
  );
}

/** The flags of the review settings and the file limits, shared by `review` and `validate`. */
export const SETTING_FLAGS = {
  alpha: { type: 'string' },
  'min-effect': { type: 'string' },
  'gap-tolerance': { type: 'string' },
  reference: { type: 'string' },
  'fail-on': { type: 'string' },
} as const;

export const LIMIT_FLAGS = {
  'max-artifact-mb': { type: 'string' },
  'max-config-mb': { type: 'string' },
  'max-csv-mb': { type: 'string' },
} as const;

const FIELD: Record<NumberSettingName, 'alpha' | 'minEffect' | 'gapTolerance' | 'reference'> = {
  alpha: 'alpha',
  'min-effect': 'minEffect',
  'gap-tolerance': 'gapTolerance',
  reference: 'reference',
};

/** The settings flags, parsed by the one settings source; every bad value is reported at once. */
export function parseOverrides(
  values: Record<string, string | boolean | undefined>,
): SettingsOverrides {
  const out: SettingsOverrides = {};
  const issues: Issue[] = [];
  for (const name of Object.keys(FIELD) as NumberSettingName[]) {
    const raw = values[name];
    if (typeof raw !== 'string') continue;
    const parsed = parseNumberSetting(name, raw, { file: `--${name}`, pointer: '' });
    if ('issues' in parsed) issues.push(...parsed.issues);
    else out[FIELD[name]] = parsed.value;
  }
  const failOn = values['fail-on'];
  if (typeof failOn === 'string') {
    const parsed = parseFailOn(failOn, { file: '--fail-on', pointer: '' });
    if ('issues' in parsed) issues.push(...parsed.issues);
    else out.failOn = parsed.value;
  }
  if (issues.length > 0) throw new InputError(issues);
  return out;
}

/** `--max-artifact-mb` and friends, as byte limits. */
export function parseLimits(
  values: Record<string, string | boolean | undefined>,
): Partial<FileLimits> {
  const out: Partial<FileLimits> = {};
  const issues: Issue[] = [];
  for (const key of Object.keys(LIMIT_NAMES) as (keyof FileLimits)[]) {
    const option = LIMIT_NAMES[key].option;
    const raw = values[option];
    if (typeof raw !== 'string') continue;
    const parsed = parseLimitMb(key, raw, `--${option}`);
    if ('issues' in parsed) issues.push(...parsed.issues);
    else out[key] = parsed.bytes;
  }
  if (issues.length > 0) throw new InputError(issues);
  return out;
}
