/** Shared helpers of the text readers: bytes to text, decimal numbers, and the bounds. */
import { InputError, quote, type Issue } from '../../model/errors.js';
import { formatLimit } from '../../model/limits.js';
import { MAX_POINTS, MAX_TEXT_BYTES } from './limits.js';
import { pointerOf, type Where } from './types.js';

const decoder = new TextDecoder('utf-8', { fatal: true });

/** UTF-8 text of a log, without a byte-order mark; bad bytes or an oversized file are an InputError. */
export function decodeText(input: Uint8Array | string, file: string, what: string): string {
  if (typeof input !== 'string' && input.length > MAX_TEXT_BYTES) {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: `must be at most ${MAX_TEXT_BYTES / 1024 / 1024} MiB for ${what}`,
        got: `${input.length} bytes`,
        hint: 'Import a shorter log, or thin it out before importing.',
      },
    ]);
  }
  let text: string;
  try {
    text = typeof input === 'string' ? input : decoder.decode(input);
  } catch {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: `must be UTF-8 text (${what})`,
        hint: 'Check that the file is the log itself and not a binary or compressed file.',
      },
    ]);
  }
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A decimal number as loggers write it; `NaN`, `inf` and overflow give a non-finite number. */
export function parseDecimal(text: string): number | undefined {
  const t = text.trim();
  if (DECIMAL.test(t)) return Number(t);
  if (/^[+-]?(?:nan|inf|infinity)$/i.test(t)) return /nan/i.test(t) ? Number.NaN : Infinity;
  return undefined;
}

/**
 * The issue for a value that is not a finite number, or (with `bound`) a decimal number beyond
 * ±bound.
 */
export function notFinite(
  file: string,
  pointer: string,
  what: string,
  got: string,
  bound?: number,
): Issue {
  const value = parseDecimal(got);
  const nonFinite = value !== undefined && !Number.isFinite(value);
  return {
    file,
    pointer,
    expected:
      bound === undefined
        ? `${what} must be a finite number`
        : `${what} must be a decimal number within ±${formatLimit(bound)}`,
    got: quote(got),
    ...(nonFinite
      ? {
          hint: 'The run logged NaN or infinity here (it may have diverged); cut the log before this point or pick another series.',
        }
      : value !== undefined
        ? {
            hint: 'Rescale the values (thousands instead of units); larger ones overflow in the statistics.',
          }
        : {}),
  };
}

/** Counts points as a reader adds them and stops at `MAX_POINTS`. */
export class PointBudget {
  private used = 0;
  constructor(private readonly limit = MAX_POINTS) {}
  /**
   * One more point, at `at` of `where` in `file`; its pointer is written only when the budget is
   * exceeded (a log may hold a million points).
   */
  take(file: string, where: Where, at: number): void {
    this.used++;
    if (this.used > this.limit) {
      throw new InputError([
        {
          file,
          pointer: pointerOf(where, at),
          expected: `holds more than ${this.limit.toLocaleString('en-US')} points, the most one import reads`,
          hint: 'Import fewer files, or log less often (per epoch rather than per step).',
        },
      ]);
    }
  }
}
