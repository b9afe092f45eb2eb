/**
 * Benchmark workloads. Each variant runs in its own child process (so peak memory is its own) and
 * prints one JSON line: {variant, ms, maxRssMb}. scripts/bench.mjs compares variants side by side.
 */
import { createReadStream, mkdirSync, writeFileSync, existsSync } from 'node:fs';
import { createInterface } from 'node:readline';
import { join } from 'node:path';
import { pairPredictions } from '../src/artifact/predictions.js';
import { predictionsSource } from '../src/io/load-run.js';
import { DEFAULT_FILE_LIMITS } from '../src/io/open-untrusted.js';
import { analyzeCurves } from '../src/analysis/curves/index.js';
import type { CurvePoint } from '../src/model/run.js';

const ROWS = 1_000_000;
const dir = join('node_modules', '.cache', 'fitgap-bench');

function ensureFiles(): void {
  mkdirSync(dir, { recursive: true });
  if (existsSync(join(dir, 'shuffled.csv'))) return;
  const ids = Array.from({ length: ROWS }, (_, i) => `example-${i}`);
  const write = (file: string, order: number[], value: (i: number) => number): void => {
    const lines = ['id,correct'];
    for (const i of order) lines.push(`${ids[i]},${value(i)}`);
    writeFileSync(join(dir, file), `${lines.join('\n')}\n`);
  };
  const inOrder = ids.map((_, i) => i);
  write('baseline.csv', inOrder, (i) => (i % 10 === 0 ? 0 : 1));
  write('candidate.csv', inOrder, (i) => (i % 12 === 0 ? 0 : 1));
  // A local shuffle (blocks of 1,000 reversed): the realistic case of a re-sharded evaluation.
  const shuffled = inOrder
    .map((_, i) => Math.floor(i / 1000) * 1000 + (999 - (i % 1000)))
    .filter((i) => i < ROWS);
  write('shuffled.csv', shuffled, (i) => (i % 12 === 0 ? 0 : 1));
}

/** The obvious approach: read both files into maps, then join. */
async function naivePair(a: string, b: string): Promise<number> {
  const read = async (path: string): Promise<Map<string, number>> => {
    const map = new Map<string, number>();
    let first = true;
    for await (const line of createInterface({
      input: createReadStream(path),
      crlfDelay: Infinity,
    })) {
      if (first) {
        first = false;
        continue;
      }
      const [id, v] = line.split(',');
      if (id !== undefined) map.set(id, Number(v));
    }
    return map;
  };
  const [ma, mb] = [await read(a), await read(b)];
  let discordant = 0;
  for (const [id, v] of ma) if (mb.get(id) !== v) discordant++;
  return discordant;
}

function epochCurve(n: number): CurvePoint[] {
  return Array.from({ length: n }, (_, i) => {
    const e = i + 1;
    return {
      x: e,
      train: 0.05 + 0.5 * Math.exp(-e / (n / 10)),
      validation: 0.09 + 0.5 * Math.exp(-e / (n / 10)) + (e > n / 2 ? (0.02 * (e - n / 2)) / n : 0),
    };
  });
}

/** The predictions reader's input as the review opens it (checked, streamed). */
const csvSource = (path: string, file: string) =>
  predictionsSource({
    path,
    file,
    what: 'a predictions CSV',
    limit: 'csvBytes',
    limits: DEFAULT_FILE_LIMITS,
  });

const variants: Record<string, () => Promise<unknown>> = {
  'pair-streaming-in-order': () =>
    pairPredictions(
      csvSource(join(dir, 'baseline.csv'), 'b'),
      csvSource(join(dir, 'candidate.csv'), 'c'),
      'proportion',
    ),
  'pair-streaming-shuffled': () =>
    pairPredictions(
      csvSource(join(dir, 'baseline.csv'), 'b'),
      csvSource(join(dir, 'shuffled.csv'), 'c'),
      'proportion',
    ),
  'pair-naive-maps': () => naivePair(join(dir, 'baseline.csv'), join(dir, 'candidate.csv')),
  'curves-epochs-1k': async () =>
    analyzeCurves({ epochs: epochCurve(1_000) }, { kind: 'proportion', goal: 'minimize' }),
  'curves-epochs-100k': async () =>
    analyzeCurves({ epochs: epochCurve(100_000) }, { kind: 'proportion', goal: 'minimize' }),
};

const name = process.argv[2] ?? '';
if (name === 'prepare') {
  ensureFiles();
} else {
  const variant = variants[name];
  if (variant === undefined)
    throw new Error(`unknown variant ${name}; one of ${Object.keys(variants).join(', ')}`);
  const start = performance.now();
  await variant();
  const ms = performance.now() - start;
  process.stdout.write(
    `${JSON.stringify({ variant: name, ms, maxRssMb: process.resourceUsage().maxRSS / 1024 })}\n`,
  );
}
