/**
 * Per-epoch CSV logs, as the common Keras and Lightning CSV loggers write them: a header row
 * (`epoch,accuracy,loss,val_accuracy,val_loss`, or Lightning's `epoch,step,train_loss,val_loss`)
 * and one row per logged moment. Lightning writes training and validation metrics in different
 * rows with the other cells empty; an empty cell is "not logged here", so each column becomes a
 * series of the rows where it has a value, and rows merge later by x. Pure: text in, series out.
 */
import { InputError, quote, type Issue } from '../../model/errors.js';
import { MAX_SERIES } from './limits.js';
import { PointBudget, decodeText, notFinite, parseDecimal } from './text.js';
import type { ReadResult, Series } from './types.js';

export interface CsvLogOptions {
  /** Column holding x. Default: `epoch` when the header has it, else `step`. */
  x?: string;
  /** Shared across the files of one import; a fresh one per call by default. */
  budget?: PointBudget;
  /**
   * Columns the caller named (a config mapping): each must be in the header and differ from x,
   * and only these are read. Default: every named column.
   */
  columns?: readonly { role: string; name: string }[];
  /** Who named x and the columns, for messages: `(role) => \`epoch-log ${role} in the config\``. */
  namedBy?: (role: string) => string;
  /** An empty cell: `skip` (nothing logged on that row, the default) or `refuse` (a problem of its column). */
  blank?: 'skip' | 'refuse';
  /** Numbers beyond ± this are problems, as non-numbers are. Default: any finite number. */
  maxMagnitude?: number;
  /** Data rows allowed; the first row over is refused with its line. Default: no limit. */
  maxRows?: number;
}

/** Cells of one CSV line (RFC 4180 quoting, without line breaks inside quotes); null when a quote is left open. */
export function splitCsvLine(line: string): string[] | null {
  if (!line.includes('"')) return line.split(',').map((cell) => cell.trim());
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted) {
      if (c === '"') {
        if (line[i + 1] === '"') {
          cell += '"';
          i++;
        } else quoted = false;
      } else cell += c;
    } else if (c === '"' && cell.trim() === '') {
      cell = '';
      quoted = true;
    } else if (c === ',') {
      cells.push(cell.trim());
      cell = '';
    } else cell += c;
  }
  if (quoted) return null;
  cells.push(cell.trim());
  return cells;
}

function structural(file: string, line: number, expected: string, got?: string, hint?: string) {
  const issue: Issue = { file, pointer: `line ${line}`, expected };
  if (got !== undefined) issue.got = got;
  if (hint !== undefined) issue.hint = hint;
  return new InputError([issue]);
}

export function readCsvLog(
  input: Uint8Array | string,
  file: string,
  options: CsvLogOptions = {},
): ReadResult {
  const text = decodeText(input, file, 'a CSV log');
  const budget = options.budget ?? new PointBudget();
  const bound = options.maxMagnitude;
  const lines = text.split(/\r?\n/);
  const header = splitCsvLine(lines[0] ?? '');
  if (header === null || header.every((h) => h === '')) {
    throw structural(
      file,
      1,
      'must be a header row naming the columns, such as "epoch,loss,val_loss"',
      quote(lines[0] ?? ''),
    );
  }
  if (header.length > MAX_SERIES + 1)
    throw structural(file, 1, `must have at most ${MAX_SERIES} columns`, `${header.length}`);
  // An unnamed column (pandas writes its index so) can be named by nobody and is never read.
  const seen = new Map<string, number>();
  header.forEach((name, i) => {
    if (name === '') return;
    const first = seen.get(name);
    if (first !== undefined)
      throw structural(
        file,
        1,
        `must name each column once (column ${i + 1} repeats column ${first + 1})`,
        quote(name),
        'Rename one of the columns; a repeated name makes the choice of series ambiguous.',
      );
    seen.set(name, i);
  });
  const shownHeader = quote(header.join(','));
  const missing = (name: string, role: string) => {
    const by = options.namedBy?.(role);
    return structural(
      file,
      1,
      `must have the column "${name}"${by === undefined ? '' : ` (${by})`}`,
      shownHeader,
      by === undefined
        ? 'Name one of the header columns.'
        : `Change ${by} to name one of the header columns.`,
    );
  };
  const xName = options.x ?? (seen.has('epoch') ? 'epoch' : seen.has('step') ? 'step' : undefined);
  if (xName === undefined) {
    throw structural(
      file,
      1,
      'must have an "epoch" or "step" column for x',
      shownHeader,
      'Name the x column (--x, or x in the config).',
    );
  }
  const xi = seen.get(xName);
  if (xi === undefined) throw missing(xName, 'x');
  for (const { name, role } of options.columns ?? []) {
    if (!seen.has(name)) throw missing(name, role);
    if (name === xName)
      throw structural(
        file,
        1,
        `must not use the x column "${xName}" for ${options.namedBy?.(role) ?? role} as well`,
        shownHeader,
        'Name a column of values, not the one that counts epochs or steps.',
      );
  }
  const wanted =
    options.columns === undefined ? undefined : new Set(options.columns.map((c) => c.name));

  const where = { kind: 'line' } as const;
  const series: (Series | undefined)[] = header.map((name, c) =>
    c === xi || name === '' || wanted?.has(name) === false
      ? undefined
      : { name, file, x: xName, where, points: [], problems: [] },
  );
  const usable = (v: number | undefined): v is number =>
    v !== undefined && Number.isFinite(v) && (bound === undefined || Math.abs(v) <= bound);
  const xIssues: Issue[] = [];
  let rows = 0;
  for (let i = 1; i < lines.length && xIssues.length < 10; i++) {
    const raw = lines[i] ?? '';
    if (raw.trim() === '') continue;
    const line = i + 1;
    rows++;
    if (options.maxRows !== undefined && rows > options.maxRows)
      throw structural(
        file,
        line,
        `must have at most ${options.maxRows} data rows`,
        undefined,
        'Log less often, or keep every n-th row.',
      );
    const cells = splitCsvLine(raw);
    if (cells === null) throw structural(file, line, 'must close every quoted cell', quote(raw));
    if (cells.length > header.length)
      throw structural(
        file,
        line,
        `must have at most ${header.length} cells, one per header column`,
        `${cells.length}`,
        'Quote cells that contain commas, or fix the header.',
      );
    const xCell = cells[xi] ?? '';
    const x = xCell === '' ? Number.NaN : parseDecimal(xCell);
    if (!usable(x)) {
      xIssues.push(notFinite(file, `line ${line}`, `column "${xName}"`, xCell, bound));
      continue;
    }
    for (let c = 0; c < header.length; c++) {
      const s = series[c];
      if (s === undefined) continue;
      const cell = cells[c] ?? '';
      if (cell === '' && options.blank !== 'refuse') continue;
      const value = parseDecimal(cell);
      if (!usable(value)) {
        if (s.problems.length < 10)
          s.problems.push(notFinite(file, `line ${line}`, `column "${s.name}"`, cell, bound));
        continue;
      }
      budget.take(file, where, line);
      s.points.push({ x, value, at: line });
    }
  }
  if (xIssues.length > 0) throw new InputError(xIssues);
  return { series: series.filter((s): s is Series => s !== undefined), warnings: [] };
}
