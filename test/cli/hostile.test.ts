/**
 * Hostile inputs, one test each: files that lead elsewhere, hang, grow without end or lie about
 * their size; values that overflow; documents that nest without end or repeat keys; output paths
 * that cannot be written. Every one must end in exit 2 with a message that names the file and the
 * problem, within seconds, without a stack trace, and without quoting the content of a refused file.
 */
import { execFileSync } from 'node:child_process';
import {
  linkSync,
  mkdirSync,
  mkdtempSync,
  readFileSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../src/entries/cli/main.js';
import { writeOutput } from '../../src/io/write-output.js';
import { fakeIo } from './fake-io.js';

const good = JSON.parse(readFileSync(resolve('test/fixtures/bad/good.json'), 'utf8')) as Record<
  string,
  unknown
>;
type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

function artifact(change: (doc: Doc) => void = () => undefined, compact = false): string {
  const doc = structuredClone(good) as Doc;
  change(doc);
  return compact ? JSON.stringify(doc) : JSON.stringify(doc, null, 2);
}

/** A fresh folder with these files (text, or a function that makes the entry). */
function folder(files: Record<string, string | ((path: string) => void)>): string {
  const dir = mkdtempSync(join(tmpdir(), 'fitgap-hostile-'));
  for (const [name, content] of Object.entries(files)) {
    const path = join(dir, name);
    mkdirSync(join(path, '..'), { recursive: true });
    if (typeof content === 'string') writeFileSync(path, content);
    else content(path);
  }
  return dir;
}

async function cli(dir: string, args: string[], real = false) {
  const fake = fakeIo(
    dir,
    real ? { writeFile: (p, t, o) => writeOutput(p, t, o.file, o.inputs) } : {},
  );
  const started = Date.now();
  const code = await runCli(args, fake.io);
  return { code, stdout: fake.stdout(), stderr: fake.stderr(), ms: Date.now() - started };
}

const review = (baseline: string, candidate: string, ...rest: string[]) => [
  'review',
  '--baseline',
  baseline,
  '--candidate',
  candidate,
  ...rest,
];

/** Exit 2, the fragments in the message, no stack, nothing half-done on stdout, in seconds. */
function refused(run: Awaited<ReturnType<typeof cli>>, ...fragments: string[]) {
  expect(run.code, run.stderr).toBe(2);
  for (const fragment of fragments) expect(run.stderr).toContain(fragment);
  expect(run.stderr).not.toMatch(/\n\s+at /);
  expect(run.stdout).toBe('');
  expect(run.ms).toBeLessThan(5000);
}

const environ = (() => {
  try {
    return readFileSync('/proc/self/environ', 'utf8')
      .split('\0')
      .filter((v) => v.length > 8);
  } catch {
    return [];
  }
})();

function leaksNothing(text: string) {
  for (const variable of environ.slice(0, 20)) expect(text).not.toContain(variable.slice(0, 16));
}

const withPredictions = (path: string, kind: 'proportion' | 'continuous' = 'proportion') =>
  artifact((d) => {
    d['predictions'] = { split: 'validation', path };
    if (kind === 'continuous') {
      d['metric'].kind = 'continuous';
      delete d['reference'];
    }
  });
const PREDICTIONS = 'id,correct\na,1\nb,0\nc,1\n';

describe('files that lead elsewhere, hang or never end', () => {
  it('a predictions CSV linked to /proc/self/environ is refused without quoting it', async () => {
    const dir = folder({
      'run.json': withPredictions('p.csv'),
      'p.csv': (p) => symlinkSync('/proc/self/environ', p),
    });
    const run = await cli(dir, review('run.json', 'run.json'));
    refused(
      run,
      "p.csv must be a file inside the artifact's folder",
      'a link that leads outside it',
    );
    leaksNothing(run.stderr);
  });

  it('an epoch log linked to /proc/self/environ is refused without quoting it', async () => {
    const dir = folder({
      'run.json': artifact((d) => delete d['curves'].epochs),
      'epochs.csv': (p) => symlinkSync('/proc/self/environ', p),
      'fitgap.yml': 'epoch-log: { file: epochs.csv, x: epoch, validation: val }\n',
    });
    const run = await cli(dir, review('run.json', 'run.json', '--config', 'fitgap.yml'));
    refused(run, "epochs.csv must be a file inside the artifact's folder");
    leaksNothing(run.stderr);
  });

  it('a link to a regular file outside the folder is refused as well', async () => {
    const outside = folder({ 'p.csv': PREDICTIONS });
    const dir = folder({
      'run.json': withPredictions('p.csv'),
      'p.csv': (p) => symlinkSync(join(outside, 'p.csv'), p),
    });
    refused(await cli(dir, review('run.json', 'run.json')), 'a link that leads outside it');
  });

  it('a link inside the folder is fine', async () => {
    const dir = folder({
      'run.json': withPredictions('p.csv'),
      'data/p.csv': PREDICTIONS,
      'p.csv': (p) => symlinkSync('data/p.csv', p),
    });
    const run = await cli(dir, review('run.json', 'run.json'));
    expect(run.code, run.stderr).toBe(0);
  });

  it('/proc/self/environ named as the artifact: size 0 but content, refused unread', async () => {
    const dir = folder({ 'run.json': artifact() });
    const run = await cli(dir, review('run.json', '/proc/self/environ'));
    refused(run, '/proc/self/environ must be a regular file of fixed size');
    leaksNothing(run.stderr);
  });

  it.each([
    [
      'a FIFO as the artifact',
      'fifo.json',
      (dir: string) => review('good.json', join(dir, 'fifo.json')),
    ],
    [
      'a FIFO as the config',
      'fifo.yml',
      () => review('good.json', 'good.json', '--config', 'fifo.yml'),
    ],
  ])('%s ends in exit 2 at once', async (_name, fifo, args) => {
    const dir = folder({ 'good.json': artifact(), [fifo]: (p) => execFileSync('mkfifo', [p]) });
    refused(await cli(dir, args(dir)), 'must be a regular file', 'a named pipe (FIFO)');
  });

  it('a link to /dev/zero as the artifact ends in exit 2 at once', async () => {
    const dir = folder({
      'good.json': artifact(),
      'zero.json': (p) => symlinkSync('/dev/zero', p),
    });
    refused(await cli(dir, review('good.json', 'zero.json')), 'a link that leads outside it');
  });

  it('/dev/zero named directly: a device, refused', async () => {
    const dir = folder({ 'good.json': artifact() });
    refused(
      await cli(dir, review('good.json', '/dev/zero')),
      '/dev/zero must be a regular file',
      'a device',
    );
  });

  it('an artifact over the byte limit is refused with the way to raise it', async () => {
    const dir = folder({ 'good.json': artifact() });
    refused(
      await cli(dir, review('good.json', 'good.json', '--max-artifact-mb', '0.001')),
      'good.json must be at most 0.001 MB (1049 bytes)',
      '--max-artifact-mb',
    );
  });

  it('a predictions CSV over its limit (set in the config) is refused', async () => {
    const dir = folder({
      'run.json': withPredictions('p.csv'),
      'p.csv': PREDICTIONS + 'x,1\n'.repeat(1000),
      'fitgap.yml': 'limits: { csv-mb: 0.001 }\n',
    });
    refused(
      await cli(dir, review('run.json', 'run.json', '--config', 'fitgap.yml')),
      'p.csv must be at most',
      '--max-csv-mb',
    );
  });

  it('a folder named as the artifact', async () => {
    const dir = folder({ 'good.json': artifact(), 'sub/x': 'x' });
    refused(await cli(dir, review('good.json', 'sub')), 'sub must be a regular file', 'a folder');
  });
});

describe('bad input that used to crash (exit 3)', () => {
  it('a YAML alias bomb in the config', async () => {
    const lines = ['a: &a ["x","x","x","x","x","x","x","x","x"]'];
    for (const [name, prev] of [
      ['b', 'a'],
      ['c', 'b'],
      ['d', 'c'],
      ['e', 'd'],
      ['f', 'e'],
    ])
      lines.push(`${name}: &${name} [${Array(9).fill(`*${prev}`).join(',')}]`);
    const dir = folder({ 'good.json': artifact(), 'bomb.yml': `${lines.join('\n')}\n` });
    refused(
      await cli(dir, review('good.json', 'good.json', '--config', 'bomb.yml')),
      'bomb.yml must not expand aliases more than 100 times',
    );
  });

  it('a config nested ten thousand levels deep', async () => {
    const dir = folder({ 'good.json': artifact(), 'deep.yml': `alpha: ${'['.repeat(10000)}` });
    refused(
      await cli(dir, review('good.json', 'good.json', '--config', 'deep.yml')),
      'deep.yml: line 1 must not nest deeper than a config needs',
    );
  });

  it.each([
    ['into a missing folder', 'nowhere/review.md', 'no such folder'],
    ['onto a folder', '.', 'a folder'],
    ['onto /dev/full', '/dev/full', 'no space left on the device'],
  ])('--out %s', async (_name, out, got) => {
    const dir = folder({ 'good.json': artifact() });
    const run = await cli(dir, review('good.json', 'good.json', '--out', out), true);
    refused(run, `${out} could not be written (--out) (got ${got})`);
  });

  it('values of ±1.7e308 whose differences overflow', async () => {
    const dir = folder({
      'base.json': artifact((d) => {
        d['metric'].kind = 'continuous';
        delete d['reference'];
      }),
      'huge.json': artifact((d) => {
        d['metric'].kind = 'continuous';
        delete d['reference'];
        d['splits'].validation.values = [1.7e308, -1.7e308, 1.7e308];
      }),
    });
    refused(
      await cli(dir, review('base.json', 'huge.json')),
      'huge.json: /splits/validation/values/0 must be within ±1e15 (got 1.7e+308)',
      'Rescale',
    );
  });

  it('one repeat with fewer than two paired rows', async () => {
    const one = artifact((d) => {
      for (const split of Object.values(d['splits'] as Record<string, { values: number[] }>))
        split.values = split.values.slice(0, 1);
      d['metric'].kind = 'continuous';
      delete d['reference'];
      d['predictions'] = { split: 'validation', path: 'one.csv' };
    });
    // The one row's loss is the split value, so the file reproduces its artifact.
    const dir = folder({ 'one.json': one, 'one.csv': 'id,loss\no1,0.061\n' });
    refused(
      await cli(dir, review('one.json', 'one.json')),
      'one.csv and one.csv must share at least 2 ids to be paired (got 1 shared',
    );
  });

  it('a learning curve of 200,000 points: refused at once', async () => {
    const dir = folder({
      'good.json': artifact(),
      'long.json': artifact((d) => {
        d['curves'].training_examples = Array.from({ length: 200_000 }, (_, i) => ({
          x: i + 1,
          train: 0.01,
          validation: 0.1 + 0.5 / (i + 1),
        }));
      }, true),
    });
    refused(
      await cli(dir, review('good.json', 'long.json')),
      'long.json: /curves/training_examples must have at most 10000 points (got 200000 points)',
    );
  });

  it('an alpha so small that its quantile would be 1', async () => {
    const dir = folder({ 'good.json': artifact() });
    refused(
      await cli(dir, review('good.json', 'good.json', '--alpha', '1e-17')),
      '--alpha must be a number from 0.000001 to 0.5 (got 1e-17)',
    );
    const smallest = await cli(
      dir,
      review('good.json', 'good.json', '--alpha', '0.000001', '--format', 'json'),
    );
    expect(smallest.code, smallest.stderr).toBe(0);
  });

  it('JSON nested a hundred thousand levels deep', async () => {
    const deep = artifact().replace(
      '"epochs": 30',
      `"epochs": ${'['.repeat(100_000)}${']'.repeat(100_000)}`,
    );
    const dir = folder({ 'good.json': artifact(), 'deep.json': deep });
    refused(
      await cli(dir, review('good.json', 'deep.json')),
      'deep.json: line',
      'must not nest arrays and objects more than 64 levels deep',
    );
  });
});

describe('bad input that used to pass silently', () => {
  it('a duplicate JSON key', async () => {
    const twice = artifact().replace(
      '"reference": 0.02,',
      '"reference": 0.02,\n  "reference": 0.9,',
    );
    const dir = folder({ 'good.json': artifact(), 'twice.json': twice });
    refused(
      await cli(dir, review('good.json', 'twice.json')),
      'twice.json: /reference must appear once in its object (got the key "reference" again)',
    );
  });

  it('a duplicate key written with an escape, deep inside', async () => {
    const twice = artifact().replace('"lambda": 0.1,', '"lambda": 0.1, "l\\u0061mbda": 3,');
    const dir = folder({ 'good.json': artifact(), 'twice.json': twice });
    refused(
      await cli(dir, review('good.json', 'twice.json')),
      'twice.json: /hyperparameters/lambda must appear once',
    );
  });

  it('invalid UTF-8 in a name', async () => {
    const bytes = Buffer.from(artifact().replace('poly-degree-3', 'poly-\u00e9'), 'utf8');
    const at = bytes.indexOf(Buffer.from('\u00e9', 'utf8'));
    bytes[at + 1] = 0x28; // a lead byte without its continuation
    const dir = folder({ 'good.json': artifact(), 'bad.json': (p) => writeFileSync(p, bytes) });
    refused(
      await cli(dir, review('good.json', 'bad.json')),
      'bad.json: line 4 must be UTF-8 text (a run artifact) (got an invalid UTF-8 sequence)',
    );
  });

  it('a UTF-16 file is named as such', async () => {
    const dir = folder({
      'good.json': artifact(),
      'wide.json': (p) =>
        writeFileSync(
          p,
          Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(artifact(), 'utf16le')]),
        ),
    });
    refused(
      await cli(dir, review('good.json', 'wide.json')),
      'wide.json: line 1 must be UTF-8 text',
      'UTF-16',
    );
  });

  it('a predictions CSV with a header and no rows', async () => {
    const dir = folder({ 'run.json': withPredictions('p.csv'), 'p.csv': 'id,correct\n' });
    refused(
      await cli(dir, review('run.json', 'run.json')),
      'p.csv must have one row per example under its header (got no rows)',
    );
  });

  it.each(['0x1', '+1', '1e0', '1.0', ' 01'])('%j in a 0/1 column', async (value) => {
    const dir = folder({
      'run.json': withPredictions('p.csv'),
      'p.csv': `id,correct\na,1\nb,${value}\n`,
    });
    refused(
      await cli(dir, review('run.json', 'run.json')),
      'p.csv: line 3 column "correct" must be 1 or 0',
    );
  });

  it('a hexadecimal loss', async () => {
    const dir = folder({
      'run.json': withPredictions('p.csv', 'continuous'),
      'p.csv': 'id,loss\na,0.5\nb,0x10\n',
    });
    refused(
      await cli(dir, review('run.json', 'run.json')),
      'p.csv: line 3 column "loss" must be a decimal number',
    );
  });

  it('duplicate column names in an epoch log', async () => {
    const dir = folder({
      'run.json': artifact((d) => delete d['curves'].epochs),
      'epochs.csv': 'epoch,val,val\n1,0.5,0.4\n2,0.4,0.3\n',
      'fitgap.yml': 'epoch-log: { file: epochs.csv, x: epoch, validation: val }\n',
    });
    refused(
      await cli(dir, review('run.json', 'run.json', '--config', 'fitgap.yml')),
      'epochs.csv: line 1 must name each column once (column 3 repeats column 2) (got "val")',
    );
  });

  it.each([
    [
      '--reference',
      ['--reference', '1.5'],
      '--reference must be within [0, 1] for a proportion metric (got 1.5)',
    ],
    [
      'a config reference',
      ['--config', 'ref.yml'],
      'ref.yml: /reference must be within [0, 1] for a proportion metric (got -0.2)',
    ],
  ])('a reference outside [0, 1] for a proportion, from %s', async (_name, flags, message) => {
    const dir = folder({ 'good.json': artifact(), 'ref.yml': 'reference: -0.2\n' });
    refused(await cli(dir, review('good.json', 'good.json', ...flags)), message);
  });

  it.each([
    ['""', '', 'must name at least one outcome (got an empty list)'],
    ['","', ',', 'must name at least one outcome'],
    ['a typo', 'worse-validaton', 'must be one of worse-validation'],
    [
      'spaces as separators',
      'worse-validation slice-regression',
      'must be one of worse-validation, toward-overfitting',
    ],
    ['none with others', 'none,worse-validation', "must not combine 'none' with other outcomes"],
  ])('--fail-on %s is refused', async (_name, value, message) => {
    const dir = folder({ 'good.json': artifact() });
    refused(
      await cli(dir, review('good.json', 'good.json', '--fail-on', value)),
      `--fail-on ${message}`,
    );
  });

  it('--fail-on takes commas and new lines alike', async () => {
    const dir = folder({ 'good.json': artifact() });
    const run = await cli(
      dir,
      review(
        'good.json',
        'good.json',
        '--fail-on',
        'worse-validation,\nslice-regression',
        '--format',
        'json',
      ),
    );
    expect(run.code, run.stderr).toBe(0);
    expect(JSON.parse(run.stdout).settings.failOn).toEqual([
      'worse-validation',
      'slice-regression',
    ]);
  });

  it.each([
    ['the candidate', 'good.json'],
    ['the config', 'fitgap.yml'],
    ['the predictions CSV', 'p.csv'],
    ['a hard link to an input', 'hard.json'],
  ])('--out naming %s is refused and the file is left as it was', async (_name, out) => {
    const dir = folder({
      'good.json': withPredictions('p.csv'),
      'p.csv': PREDICTIONS,
      'fitgap.yml': 'alpha: 0.05\n',
      'hard.json': (p) => linkSync(join(p, '..', 'good.json'), p),
    });
    const before = readFileSync(join(dir, out), 'utf8');
    const run = await cli(
      dir,
      review('good.json', 'good.json', '--config', 'fitgap.yml', '--out', out),
      true,
    );
    refused(run, `${out} must not name one of the review's input files (--out)`);
    expect(readFileSync(join(dir, out), 'utf8')).toBe(before);
  });
});

describe('validate checks everything review would', () => {
  it('a broken predictions CSV fails validate', async () => {
    const dir = folder({ 'run.json': withPredictions('p.csv'), 'p.csv': 'id,correct\na,1\na,0\n' });
    const run = await cli(dir, ['validate', 'run.json']);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('p.csv: line 3 must have a unique id (also on line 2)');
  });

  it('review checks a predictions CSV even when the other run has none', async () => {
    const dir = folder({
      'good.json': artifact(),
      'run.json': withPredictions('p.csv'),
      'p.csv': 'id,correct\na,2\n',
    });
    refused(
      await cli(dir, review('good.json', 'run.json')),
      'p.csv: line 2 column "correct" must be 1 or 0',
    );
  });

  it("validate applies the config's epoch-log mapping", async () => {
    const dir = folder({
      'run.json': artifact((d) => delete d['curves'].epochs),
      'epochs.csv': 'epoch,val\n1,0.5\n1,0.4\n',
      '.github/fitgap.yml': 'epoch-log: { file: epochs.csv, x: epoch, validation: val }\n',
    });
    const run = await cli(dir, ['validate', 'run.json']);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('epochs.csv: line 3 column "epoch" must strictly increase');
  });

  it('validate reports a valid run with its predictions checked', async () => {
    const dir = folder({ 'run.json': withPredictions('p.csv'), 'p.csv': PREDICTIONS });
    const run = await cli(dir, ['validate', 'run.json']);
    expect(run.code, run.stderr).toBe(0);
    expect(run.stdout).toBe('run.json: valid run artifact "poly-degree-3" (3 repeat(s))\n');
  });
});

describe('negative numbers as option values', () => {
  it('--reference -0.5 is a value (for a continuous metric)', async () => {
    const dir = folder({
      'c.json': artifact((d) => {
        d['metric'].kind = 'continuous';
        d['metric'].goal = 'maximize';
        delete d['reference'];
      }),
    });
    const run = await cli(
      dir,
      review('c.json', 'c.json', '--reference', '-0.5', '--format', 'json'),
    );
    expect(run.code, run.stderr).toBe(0);
    expect(JSON.parse(run.stdout).candidate.reference).toBe(-0.5);
  });

  it('--min-effect -1 is read as a value and refused by its range', async () => {
    const dir = folder({ 'good.json': artifact() });
    refused(
      await cli(dir, review('good.json', 'good.json', '--min-effect', '-1')),
      '--min-effect must be a number from 0 to 1e15 (got -1)',
    );
  });
});
