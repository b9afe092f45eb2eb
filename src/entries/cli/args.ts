/** Parses command-line flags into typed options; bad usage is a `UsageError`. */
import { parseArgs } from 'node:util';
import { UsageError } from '../../model/errors.js';
import type { SettingsOverrides } from '../../io/review-from-files.js';

export type Format = 'text' | 'markdown' | 'json';
const FORMATS: readonly Format[] = ['text', 'markdown', 'json'];

export function parseFlags(
  argv: string[],
  options: Record<string, { type: 'string' | 'boolean'; short?: string }>,
  command: string,
): { values: Record<string, string | boolean | undefined>; positionals: string[] } {
  try {
    const parsed = parseArgs({ args: argv, options, allowPositionals: true, strict: true });
    return {
      values: parsed.values as Record<string, string | boolean | undefined>,
      positionals: parsed.positionals,
    };
  } catch (error) {
    const message = error instanceof Error ? (error.message.split('\n')[0] ?? '') : String(error);
    throw new UsageError(`fitgap ${command}: ${message}. Run 'fitgap ${command} --help'.`);
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

function number(
  values: Record<string, string | boolean | undefined>,
  flag: string,
  range: [number, number],
  command: string,
): number | undefined {
  const raw = values[flag];
  if (raw === undefined || typeof raw !== 'string') return undefined;
  const value = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(value) || value < range[0] || value > range[1]) {
    throw new UsageError(
      `fitgap ${command}: --${flag} must be a number from ${range[0]} to ${range[1]} (got ${JSON.stringify(raw)}).`,
    );
  }
  return value;
}

export function parseOverrides(
  values: Record<string, string | boolean | undefined>,
  command: string,
): SettingsOverrides {
  const out: SettingsOverrides = {};
  const alpha = number(values, 'alpha', [1e-9, 0.5], command);
  if (alpha !== undefined) out.alpha = alpha;
  const minEffect = number(values, 'min-effect', [0, Number.MAX_VALUE], command);
  if (minEffect !== undefined) out.minEffect = minEffect;
  const gap = number(values, 'gap-tolerance', [0, 1], command);
  if (gap !== undefined) out.gapTolerance = gap;
  const reference = number(values, 'reference', [-Number.MAX_VALUE, Number.MAX_VALUE], command);
  if (reference !== undefined) out.reference = reference;
  const failOn = values['fail-on'];
  if (typeof failOn === 'string')
    out.failOn = failOn
      .split(',')
      .map((s) => s.trim())
      .filter((s) => s !== '');
  return out;
}
