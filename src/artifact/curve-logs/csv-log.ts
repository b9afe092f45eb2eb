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
  const seen = new Set<string>();
  for (const name of header) {
    if (name === '' || seen.has(name))
      throw structural(
        file,
        1,
        'must name every column once',
        quote(name),
        'Give each column a distinct, non-empty name.',
      );
    seen.add(name);
  }
  const xName = options.x ?? (seen.has('epoch') ? 'epoch' : seen.has('step') ? 'step' : undefined);
  const xi = xName === undefined ? -1 : header.indexOf(xName);
  if (xName === undefined || xi < 0) {
    throw structural(
      file,
      1,
      xName === undefined
        ? 'must have an "epoch" or "step" column for x'
        : `must have the column "${xName}"`,
      quote(header.join(',')),
      xName === undefined
        ? 'Name the x column (--x, or x in the config).'
        : 'Name one of the header columns.',
    );
  }

  const where = { kind: 'line' } as const;
  const series: Series[] = header.map((name) => ({
    name,
    file,
    x: xName,
    where,
    points: [],
    problems: [],
  }));
  const xIssues: Issue[] = [];
  for (let i = 1; i < lines.length && xIssues.length < 10; i++) {
    const raw = lines[i] ?? '';
    if (raw.trim() === '') continue;
    const line = i + 1;
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
    if (x === undefined || !Number.isFinite(x)) {
      xIssues.push(notFinite(file, `line ${line}`, `column "${xName}"`, xCell));
      continue;
    }
    for (let c = 0; c < header.length; c++) {
      const cell = cells[c] ?? '';
      const s = series[c];
      if (c === xi || cell === '' || s === undefined) continue;
      const value = parseDecimal(cell);
      if (value === undefined || !Number.isFinite(value)) {
        if (s.problems.length < 10)
          s.problems.push(notFinite(file, `line ${line}`, `column "${s.name}"`, cell));
        continue;
      }
      budget.take(file, `line ${line}`);
      s.points.push({ x, value, at: line });
    }
  }
  if (xIssues.length > 0) throw new InputError(xIssues);
  return { series: series.filter((_, c) => c !== xi), warnings: [] };
}
