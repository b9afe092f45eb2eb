/**
 * Fuzz suite: valid run artifacts, configs, predictions CSVs and uploaded bundles, mutated at
 * random. Every case must end in a review (exit 0 or 1) or a named refusal (exit 2): never an
 * internal error (exit 3, a thrown error), a stack trace, a hang, or memory above 512 MB.
 * Most cases run in-process through the CLI's own `runCli` (and the publish path's bundle reader)
 * with files in a temp folder; a sample runs through the built CLI in a child process.
 *
 * Seed: fixed under CI=true (so a failure reproduces), random locally; printed either way.
 * Reproduce with FITGAP_FUZZ_SEED=<seed>. Cases: FITGAP_FUZZ_RUNS (default 520 in all).
 */
import { execFile } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import fc from 'fast-check';
import { zipSync } from 'fflate';
import { beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../../src/entries/cli/main.js';
import { extractBundle } from '../../src/io/bundle.js';
import { DEFAULT_FILE_LIMITS } from '../../src/io/open-untrusted.js';
import { reviewFiles } from '../../src/io/review-from-files.js';
import { InputError } from '../../src/model/errors.js';
import { fakeIo } from '../cli/fake-io.js';
import {
  applyEdit,
  applyText,
  configText,
  jsonEdit,
  numericEdit,
  predictionsText,
  scaleEdit,
  splitEdit,
  textEdit,
  type Json,
} from './mutate.js';

const CI = process.env['CI'] === 'true';
const SEED = Number(process.env['FITGAP_FUZZ_SEED'] ?? (CI ? 20261130 : Date.now() % 2 ** 31));
const TOTAL = Number(process.env['FITGAP_FUZZ_RUNS'] ?? 520);
const share = (part: number) => Math.max(1, Math.round((TOTAL * part) / 520));
const RUNS = {
  structure: share(100),
  numbers: share(160),
  configs: share(80),
  csvs: share(100),
  bundles: share(80),
};
const CASE_MS = 10_000;
const MEMORY_LIMIT = 512 * 1024 * 1024;

const load = (path: string) => JSON.parse(readFileSync(resolve(path), 'utf8')) as Json;
/** A continuous metric in its own units (a delivery-time RMSE in minutes), one repeat and three. */
function continuous(repeats: number): Json {
  const doc = structuredClone(load('test/fixtures/bad/good.json')) as Record<string, Json>;
  doc['metric'] = { name: 'eta_rmse_minutes', goal: 'minimize', kind: 'continuous' };
  delete doc['reference'];
  const splits = doc['splits'] as Record<string, { values: number[] }>;
  for (const split of Object.values(splits))
    split.values = split.values.slice(0, repeats).map((v) => Math.round(v * 4000) / 10);
  doc['slices'] = [{ name: 'rainy days', examples: 800, train: 150, validation: 310 }];
  doc['curves'] = {
    training_examples: [1000, 2000, 4000, 8000].map((x, i) => ({
      x,
      train: 100 + i * 10,
      validation: 400 - i * 40,
    })),
  };
  return doc;
}

const SEEDS: Json[] = [
  load('test/fixtures/bad/good.json'),
  continuous(3),
  continuous(1),
  continuous(2),
  load('demo/baseline.json'),
  load('demo/1-interactions.json'),
  load('test/fixtures/design/example.json'),
  load('test/fixtures/action/candidate-worse.json'),
];

const root = mkdtempSync(join(tmpdir(), 'fitgap-fuzz-'));
let counter = 0;
const freshDir = () => {
  const dir = join(root, String(counter++));
  mkdirSync(dir);
  return dir;
};

let cases = 0;
let refusals = 0;
let reviews = 0;

beforeAll(() => {
  console.info(
    `fuzz seed ${SEED} (${CI ? 'fixed under CI' : 'random'}; rerun with FITGAP_FUZZ_SEED=${SEED}); ` +
      `cases: ${Object.entries(RUNS)
        .map(([k, v]) => `${k} ${v}`)
        .join(', ')}`,
  );
});

/** Runs one case with a time limit; a throw here is an internal error (exit 3). */
async function bounded<T>(work: () => Promise<T>, what: string): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const hang = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`hang: ${what} ran over ${CASE_MS} ms`)), CASE_MS);
  });
  try {
    return await Promise.race([work(), hang]);
  } finally {
    clearTimeout(timer);
  }
}

function checkOutcome(code: number, stderr: string, stdout: string) {
  cases++;
  expect([0, 1, 2], `exit ${code}: ${stderr.slice(0, 400)}`).toContain(code);
  expect(stderr).not.toMatch(/\n\s+at .+:\d+:\d+/);
  if (code === 2) {
    refusals++;
    expect(stderr.trim().length).toBeGreaterThan(0);
    expect(stdout).toBe('');
  } else reviews++;
  expect(process.memoryUsage().rss).toBeLessThan(MEMORY_LIMIT);
}

async function review(dir: string, args: string[]) {
  const { io, stdout, stderr } = fakeIo(dir);
  const code = await bounded(() => runCli(args, io), args.join(' '));
  checkOutcome(code, stderr(), stdout());
  rmSync(dir, { recursive: true, force: true });
}

/** An edit of a document the fuzzer itself made hostile (too deep to clone): left as it is. */
function safeEdit(doc: Json, edit: Parameters<typeof applyEdit>[1]): Json {
  try {
    return applyEdit(doc, edit);
  } catch {
    return doc;
  }
}

const PARAMS = (runs: number, offset: number) => ({
  numRuns: runs,
  seed: SEED + offset,
  endOnFailure: true,
});

describe(`fuzz (seed ${SEED})`, { timeout: 600_000 }, () => {
  /** One case: a baseline and a candidate written as given, then `fitgap review`. */
  async function artifactCase(baseline: Uint8Array | string, candidate: Uint8Array | string) {
    const dir = freshDir();
    writeFileSync(join(dir, 'baseline.json'), baseline);
    writeFileSync(join(dir, 'candidate.json'), candidate);
    await review(dir, [
      'review',
      '--baseline',
      'baseline.json',
      '--candidate',
      'candidate.json',
      '--format',
      'markdown',
    ]);
  }

  it('run artifacts with hostile structure and bytes: a review or exit 2', async () => {
    await fc.assert(
      fc.asyncProperty(
        // Mostly the candidate's own seed as the baseline: runs of one metric get reviewed.
        fc.oneof({ weight: 3, arbitrary: fc.constant(-1) }, fc.nat({ max: SEEDS.length - 1 })),
        fc.nat({ max: SEEDS.length - 1 }),
        fc.array(jsonEdit, { minLength: 1, maxLength: 4 }),
        textEdit,
        fc.boolean(),
        async (b, c, edits, text, mutateBaseline) => {
          const candidate = edits.reduce<Json>(
            (doc, edit) => applyEdit(doc, edit),
            SEEDS[c] ?? null,
          );
          const baseline = JSON.stringify(SEEDS[b < 0 ? c : b] ?? null);
          await artifactCase(
            mutateBaseline ? applyText(JSON.stringify(candidate), text) : baseline,
            applyText(JSON.stringify(candidate, null, 1), text),
          );
        },
      ),
      PARAMS(RUNS.structure, 0),
    );
  });

  it('run artifacts with numbers at the edges (valid documents): a review or exit 2', async () => {
    const edit = fc.oneof(numericEdit, scaleEdit, splitEdit);
    await fc.assert(
      fc.asyncProperty(
        fc.nat({ max: SEEDS.length - 1 }),
        fc.array(edit, { minLength: 1, maxLength: 12 }),
        fc.array(edit, { minLength: 0, maxLength: 3 }),
        async (c, candidateEdits, baselineEdits) => {
          const seed = SEEDS[c] ?? null;
          const apply = (edits: typeof candidateEdits) =>
            edits.reduce<Json>((doc, e) => applyEdit(doc, e), seed);
          await artifactCase(
            JSON.stringify(apply(baselineEdits)),
            JSON.stringify(apply(candidateEdits)),
          );
        },
      ),
      PARAMS(RUNS.numbers, 5),
    );
  });

  it('hostile configs: a review or exit 2', async () => {
    await fc.assert(
      fc.asyncProperty(
        configText,
        textEdit,
        fc.constantFrom('review', 'validate'),
        async (config, text, command) => {
          const dir = freshDir();
          writeFileSync(join(dir, 'run.json'), JSON.stringify(SEEDS[0]));
          writeFileSync(join(dir, 'epochs.csv'), 'epoch,val\n1,0.5\n2,0.4\n');
          writeFileSync(join(dir, 'fitgap.yml'), applyText(config, text));
          await review(
            dir,
            command === 'review'
              ? [
                  'review',
                  '--baseline',
                  'run.json',
                  '--candidate',
                  'run.json',
                  '--config',
                  'fitgap.yml',
                ]
              : ['validate', '--config', 'fitgap.yml', 'run.json', 'fitgap.yml'],
          );
        },
      ),
      PARAMS(RUNS.configs, 1),
    );
  });

  it('hostile predictions CSVs: a review or exit 2', async () => {
    const kindAndFiles = fc
      .constantFrom('proportion' as const, 'continuous' as const)
      .chain((kind) => fc.tuple(fc.constant(kind), predictionsText(kind), predictionsText(kind)));
    await fc.assert(
      fc.asyncProperty(
        kindAndFiles,
        fc.boolean(),
        fc.integer({ min: 1, max: 3 }),
        async ([kind, baseCsv, candCsv], both, repeats) => {
          const run = (withPredictions: boolean): Json => {
            const doc = structuredClone(SEEDS[0]) as Record<string, Json>;
            (doc['metric'] as Record<string, Json>)['kind'] = kind;
            if (kind === 'continuous') delete doc['reference'];
            const splits = doc['splits'] as Record<string, { values: number[] }>;
            for (const split of Object.values(splits))
              split.values = split.values.slice(0, repeats);
            if (withPredictions) doc['predictions'] = { split: 'validation', path: 'p.csv' };
            return doc;
          };
          const dir = freshDir();
          mkdirSync(join(dir, 'b'));
          mkdirSync(join(dir, 'c'));
          writeFileSync(join(dir, 'b', 'run.json'), JSON.stringify(run(both)));
          writeFileSync(join(dir, 'c', 'run.json'), JSON.stringify(run(true)));
          writeFileSync(join(dir, 'b', 'p.csv'), baseCsv);
          writeFileSync(join(dir, 'c', 'p.csv'), candCsv);
          await review(dir, [
            'review',
            '--baseline',
            'b/run.json',
            '--candidate',
            'c/run.json',
            '--format',
            'json',
          ]);
        },
      ),
      PARAMS(RUNS.csvs, 2),
    );
  });

  it('mutated upload bundles (publish side): a review or a refusal', async () => {
    const good = {
      'pull-request.json': JSON.stringify({
        format: 'fitgap-pull-request/1',
        repository: 'o/r',
        number: 7,
        headSha: 'a'.repeat(40),
      }),
      'baseline/run.json': JSON.stringify(SEEDS[3]),
      'candidate/run.json': JSON.stringify(SEEDS[3]),
    };
    const entryName = fc.oneof(
      {
        weight: 6,
        arbitrary: fc.constantFrom(
          ...Object.keys(good),
          'baseline/predictions.csv',
          'candidate/predictions.csv',
          'review.json',
        ),
      },
      fc.constantFrom(
        '../../escape.json',
        '/etc/passwd',
        'candidate\\run.json',
        'candidate/../pull-request.json',
        'a\u0000b',
        '',
      ),
    );
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.tuple(entryName, jsonEdit, textEdit), { minLength: 0, maxLength: 3 }),
        fc.option(fc.tuple(fc.nat(), fc.integer({ min: 0, max: 255 })), { nil: null }),
        async (edits, corrupt) => {
          const files: Record<string, Uint8Array> = Object.fromEntries(
            Object.entries(good).map(([k, v]) => [k, Buffer.from(v)]),
          );
          for (const [name, edit, text] of edits) {
            const current = files[name];
            const doc: Json =
              current === undefined
                ? {}
                : (() => {
                    try {
                      return JSON.parse(Buffer.from(current).toString('utf8')) as Json;
                    } catch {
                      return null;
                    }
                  })();
            try {
              files[name] = applyText(JSON.stringify(safeEdit(doc, edit)), text);
            } catch {
              // A document the fuzzer nested too deep for JSON.stringify: keep its bytes.
            }
          }
          let zip: Uint8Array;
          try {
            zip = zipSync(files);
          } catch {
            return; // names fflate itself will not write
          }
          if (corrupt !== null && zip.length > 0) zip[corrupt[0] % zip.length] = corrupt[1];
          const dir = freshDir();
          await bounded(async () => {
            try {
              const bundle = await extractBundle({
                zip,
                label: 'artifact "fuzz"',
                tempDir: dir,
                limitBytes: 8 * 1024 * 1024,
                limits: DEFAULT_FILE_LIMITS,
              });
              const result = await reviewFiles({
                baseline: bundle.runs.baseline,
                candidate: bundle.runs.candidate,
                cwd: dir,
                epochLogs: false,
              });
              expect(typeof result.review.gate.pass).toBe('boolean');
              cases++;
              reviews++;
            } catch (error) {
              if (!(error instanceof InputError)) throw error;
              cases++;
              refusals++;
              expect(error.message.length).toBeGreaterThan(0);
            }
          }, 'bundle');
          expect(process.memoryUsage().rss).toBeLessThan(MEMORY_LIMIT);
          rmSync(dir, { recursive: true, force: true });
        },
      ),
      PARAMS(RUNS.bundles, 3),
    );
  });

  it('a sample through the built CLI, with a 512 MB heap', async () => {
    const cli = resolve('dist/cli.js');
    const run = promisify(execFile);
    const samples = fc.sample(
      fc.tuple(
        fc.nat({ max: SEEDS.length - 1 }),
        fc.array(jsonEdit, { minLength: 1, maxLength: 3 }),
        textEdit,
      ),
      { numRuns: 6, seed: SEED + 4 },
    );
    for (const [c, edits, text] of samples) {
      const dir = freshDir();
      writeFileSync(join(dir, 'baseline.json'), JSON.stringify(SEEDS[c]));
      writeFileSync(
        join(dir, 'candidate.json'),
        applyText(
          JSON.stringify(edits.reduce<Json>((d, e) => applyEdit(d, e), SEEDS[c] ?? null)),
          text,
        ),
      );
      let code = 0;
      let stderr = '';
      let stdout = '';
      try {
        ({ stdout, stderr } = await run(
          process.execPath,
          [
            '--max-old-space-size=512',
            cli,
            'review',
            '--baseline',
            'baseline.json',
            '--candidate',
            'candidate.json',
          ],
          { cwd: dir, timeout: 30_000 },
        ));
      } catch (error) {
        const e = error as {
          code: number | null;
          signal: string | null;
          stdout: string;
          stderr: string;
        };
        expect(e.signal, 'killed: a hang or memory above the limit').toBeNull();
        ({ code, stdout, stderr } = { code: e.code ?? -1, stdout: e.stdout, stderr: e.stderr });
      }
      checkOutcome(code, stderr, stdout);
    }
    console.info(`fuzz: ${cases} cases, ${reviews} reviews, ${refusals} refusals (exit 2)`);
    expect(cases).toBeGreaterThanOrEqual(Math.min(500, TOTAL));
  });
});
