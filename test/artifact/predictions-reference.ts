/**
 * Test-only: the string reader of predictions CSVs (readline, a row object per line) as it stood
 * before the byte-level reader replaced it, kept as the reference that the byte-level reader must
 * match exactly (predictions-differential.test.ts): same results bit for bit, same errors.
 */
import { createInterface } from 'node:readline';
import type { Readable } from 'node:stream';
import type { MetricKind } from '../../src/model/run.js';
import { InputError, quote, type Issue } from '../../src/model/errors.js';
import { RunningStats } from '../../src/stats/index.js';
import type { PairedPredictions } from '../../src/model/review.js';
import { MAX_MAGNITUDE } from '../../src/model/limits.js';
import { parseDecimal } from '../../src/model/settings.js';

interface Row {
  id: string;
  value: number;
  line: number;
}

const HEADER: Record<MetricKind, string> = { proportion: 'id,correct', continuous: 'id,loss' };

/** 53-bit FNV-1a style hash of a string, as a double (exact integer). */
function hashId(id: string): number {
  let h1 = 0x811c9dc5;
  let h2 = 0x01000193;
  for (let i = 0; i < id.length; i++) {
    const c = id.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 0x01000193) >>> 0;
    h2 = Math.imul(h2 ^ c, 0x5bd1e995) >>> 0;
  }
  return (h2 & 0x1fffff) * 0x100000000 + h1;
}

class HashLog {
  private data = new Float64Array(1024);
  private size = 0;
  push(h: number): void {
    if (this.size === this.data.length) {
      const next = new Float64Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.size++] = h;
  }
  /** Hashes that occur more than once. */
  repeated(): Set<number> {
    const sorted = this.data.slice(0, this.size).sort();
    const out = new Set<number>();
    for (let i = 1; i < sorted.length; i++)
      if (sorted[i] === sorted[i - 1]) out.add(sorted[i] ?? 0);
    return out;
  }
}

function parseValue(raw: string, kind: MetricKind, file: string, line: number): number {
  const column = kind === 'proportion' ? 'correct' : 'loss';
  // Only the digits 0 and 1 in a 0/1 column (not `0x1`, `+1`, `1e0`); plain decimals for a loss.
  const text = raw.trim();
  const value =
    kind === 'proportion'
      ? text === '0' || text === '1'
        ? Number(text)
        : Number.NaN
      : (parseDecimal(text) ?? Number.NaN);
  if (!Number.isFinite(value) || Math.abs(value) > MAX_MAGNITUDE) {
    throw new InputError([
      {
        file,
        pointer: `line ${line}`,
        expected:
          kind === 'proportion'
            ? `column "${column}" must be 1 or 0`
            : `column "${column}" must be a decimal number within ±1e15`,
        got: quote(raw),
      },
    ]);
  }
  return value;
}

async function* readRows(
  source: PredictionsFile,
  kind: MetricKind,
  hashes?: HashLog,
): AsyncGenerator<Row> {
  const file = source.file;
  const stream = await source.open();
  stream.setEncoding('utf8');
  const lines = createInterface({ input: stream, crlfDelay: Infinity });
  let line = 0;
  let rows = 0;
  try {
    for await (const text of lines) {
      line++;
      if (line === 1) {
        const header = text.replace(/^\uFEFF/, '').trim();
        if (header !== HEADER[kind]) {
          throw new InputError([
            {
              file,
              pointer: 'line 1',
              expected: `must be the header "${HEADER[kind]}" for a ${kind} metric`,
              got: quote(header),
            },
          ]);
        }
        continue;
      }
      if (text.trim() === '') continue;
      const comma = text.indexOf(',');
      if (comma < 0 || text.indexOf(',', comma + 1) >= 0) {
        throw new InputError([
          {
            file,
            pointer: `line ${line}`,
            expected: 'must have exactly two fields, id and value',
            got: quote(text),
          },
        ]);
      }
      const id = text.slice(0, comma).trim();
      if (id === '')
        throw new InputError([
          { file, pointer: `line ${line}`, expected: 'must have a non-empty id' },
        ]);
      hashes?.push(hashId(id));
      rows++;
      yield { id, value: parseValue(text.slice(comma + 1), kind, file, line), line };
    }
  } finally {
    lines.close();
    stream.destroy();
  }
  if (line === 0) {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: `is empty; it needs the header "${HEADER[kind]}" and one row per example`,
      },
    ]);
  }
  if (rows === 0) {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: 'must have one row per example under its header',
        got: 'no rows',
      },
    ]);
  }
}

async function duplicateIssues(
  source: PredictionsFile,
  kind: MetricKind,
  suspects: Set<number>,
): Promise<Issue[]> {
  const file = source.file;
  const firstLine = new Map<string, number>();
  const issues: Issue[] = [];
  for await (const row of readRows(source, kind)) {
    if (!suspects.has(hashId(row.id))) continue;
    const first = firstLine.get(row.id);
    if (first === undefined) firstLine.set(row.id, row.line);
    else
      issues.push({
        file,
        pointer: `line ${row.line}`,
        expected: `must have a unique id (also on line ${first})`,
        got: quote(row.id),
      });
  }
  return issues;
}

export interface PredictionsFile {
  /** Name shown in messages. */
  file: string;
  /**
   * Opens the file afresh for one pass (the io layer applies its checks; a second pass looks for
   * duplicate ids). Read errors arrive through the stream as `InputError`s.
   */
  open: () => Promise<Readable>;
}

/** Reads one predictions file through to check it (header, values, unique ids, at least one row). */
export async function referenceCheckPredictions(
  source: PredictionsFile,
  kind: MetricKind,
): Promise<void> {
  const hashes = new HashLog();
  for await (const row of readRows(source, kind, hashes)) void row;
  const repeated = hashes.repeated();
  if (repeated.size > 0) {
    const issues = await duplicateIssues(source, kind, repeated);
    if (issues.length > 0) throw new InputError(issues);
  }
}

/** Pairs baseline and candidate predictions by id, streaming both files. */
export async function referencePairPredictions(
  baseline: PredictionsFile,
  candidate: PredictionsFile,
  kind: MetricKind,
): Promise<
  PairedPredictions & {
    unmatched: { baseline: number; candidate: number };
    sides: NonNullable<PairedPredictions['sides']>;
  }
> {
  const baseHashes = new HashLog();
  const candHashes = new HashLog();
  const base = readRows(baseline, kind, baseHashes);
  const cand = readRows(candidate, kind, candHashes);
  const waitingBase = new Map<string, number>();
  const waitingCand = new Map<string, number>();
  let rows = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  const diffs = new RunningStats();
  // Each file's own rows, paired or not: they must reproduce the artifact's split value.
  const baseAll = new RunningStats();
  const candAll = new RunningStats();

  const pair = (b: number, c: number): void => {
    rows++;
    if (kind === 'proportion') {
      if (b === 1 && c === 0) baselineOnly++;
      else if (b === 0 && c === 1) candidateOnly++;
    } else diffs.push(c - b);
  };

  let a = await base.next();
  let b = await cand.next();
  while (!a.done || !b.done) {
    if (!a.done && !b.done && a.value.id === b.value.id) {
      pair(a.value.value, b.value.value);
    } else {
      if (!a.done) {
        const partner = waitingCand.get(a.value.id);
        if (partner !== undefined) {
          waitingCand.delete(a.value.id);
          pair(a.value.value, partner);
        } else waitingBase.set(a.value.id, a.value.value);
      }
      if (!b.done) {
        const partner = waitingBase.get(b.value.id);
        if (partner !== undefined) {
          waitingBase.delete(b.value.id);
          pair(partner, b.value.value);
        } else waitingCand.set(b.value.id, b.value.value);
      }
    }
    if (!a.done) baseAll.push(a.value.value);
    if (!b.done) candAll.push(b.value.value);
    if (!a.done) a = await base.next();
    if (!b.done) b = await cand.next();
  }

  const issues: Issue[] = [];
  const baseRepeated = baseHashes.repeated();
  if (baseRepeated.size > 0) issues.push(...(await duplicateIssues(baseline, kind, baseRepeated)));
  const candRepeated = candHashes.repeated();
  if (candRepeated.size > 0) issues.push(...(await duplicateIssues(candidate, kind, candRepeated)));
  if (issues.length > 0) throw new InputError(issues);

  const unmatched = { baseline: waitingBase.size, candidate: waitingCand.size };
  const stats = (s: RunningStats): { n: number; mean: number; variance: number } => ({
    n: s.n,
    mean: s.n > 0 ? s.mean : 0,
    variance: s.n > 1 ? s.variance : 0,
  });
  const sides = { baseline: stats(baseAll), candidate: stats(candAll) };
  if (kind === 'proportion') return { kind, rows, baselineOnly, candidateOnly, unmatched, sides };
  return {
    sides,
    kind,
    rows,
    meanDiff: diffs.n > 0 ? diffs.mean : 0,
    varDiff: diffs.n > 1 ? diffs.variance : 0,
    unmatched,
  };
}
