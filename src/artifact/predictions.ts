/**
 * Streams two predictions CSVs (`id,correct` or `id,loss`) and pairs their rows by id without
 * keeping a row per example: rows in the same order pair on the fly; only rows that arrive out of
 * order wait in a map until their partner shows up. Duplicate ids are found from a typed array of
 * id hashes (one object, not one per row) and confirmed by a second pass that names the lines.
 */
import { createReadStream } from 'node:fs';
import { createInterface } from 'node:readline';
import type { MetricKind } from '../model/run.js';
import { InputError, quote, type Issue } from '../model/errors.js';
import { RunningStats } from '../stats/index.js';
import type { PairedPredictions } from '../model/review.js';

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
  const value = raw.trim() === '' ? Number.NaN : Number(raw);
  if (kind === 'proportion' ? value !== 0 && value !== 1 : !Number.isFinite(value)) {
    throw new InputError([
      {
        file,
        pointer: `line ${line}`,
        expected:
          kind === 'proportion'
            ? `column "${column}" must be 1 or 0`
            : `column "${column}" must be a finite number`,
        got: quote(raw),
      },
    ]);
  }
  return value;
}

async function* readRows(
  path: string,
  file: string,
  kind: MetricKind,
  hashes?: HashLog,
): AsyncGenerator<Row> {
  const stream = createReadStream(path, { encoding: 'utf8' });
  const lines = createInterface({ input: stream, crlfDelay: Infinity });
  let line = 0;
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
}

async function duplicateIssues(
  path: string,
  file: string,
  kind: MetricKind,
  suspects: Set<number>,
): Promise<Issue[]> {
  const firstLine = new Map<string, number>();
  const issues: Issue[] = [];
  for await (const row of readRows(path, file, kind)) {
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
  /** Path to open. */
  path: string;
  /** Name shown in messages. */
  file: string;
}

/** Pairs baseline and candidate predictions by id, streaming both files. */
export async function pairPredictions(
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
  const base = readRows(baseline.path, baseline.file, kind, baseHashes);
  const cand = readRows(candidate.path, candidate.file, kind, candHashes);
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
  if (baseRepeated.size > 0)
    issues.push(...(await duplicateIssues(baseline.path, baseline.file, kind, baseRepeated)));
  const candRepeated = candHashes.repeated();
  if (candRepeated.size > 0)
    issues.push(...(await duplicateIssues(candidate.path, candidate.file, kind, candRepeated)));
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
