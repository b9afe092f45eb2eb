/**
 * End-to-end runs of the built CLI (dist/cli.js) as a child process, as a user would run it.
 */
import { execFile, spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { beforeAll, describe, expect, it } from 'vitest';
import { expectValidReport } from '../report/valid-review.js';

const run = promisify(execFile);
const cli = resolve('dist/cli.js');

async function fitgap(args: string[], env: Record<string, string> = {}) {
  try {
    const { stdout, stderr } = await run(process.execPath, [cli, ...args], {
      env: { PATH: process.env['PATH'] ?? '', ...env },
      cwd: resolve('.'),
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

const MAIN_HELP = `fitgap - bias/variance review of a model-training change

Usage:
  fitgap review --baseline FILE --candidate FILE [options]
  fitgap validate FILE...
  fitgap audit --range A..B --artifact PATH [options]
  fitgap audit --repo OWNER/NAME --pull-request N [options]
  fitgap demo [NAME]
  fitgap curves import --from FORMAT PATH... --out FILE
  fitgap --version

Commands:
  review     compare two run artifacts and print the review
  validate   check run artifacts (.json) or config files (.yml) and exit
  audit      re-run reviews over a git range, or a past pull request's review
  demo       review the bundled demo scenario
  curves     import a training log (CSV, TensorBoard, MLflow, evals_result) as a curve

Run 'fitgap COMMAND --help' for the options of a command.

Exit codes: 0 review done and gate passed; 1 gate failed; 2 bad input or usage.
A verdict is advice for a human reviewer, not a proof.
`;

const REVIEW_HELP = `Usage: fitgap review --baseline FILE --candidate FILE [options]

Compare a candidate training run with its baseline: error decomposition, significance of
each change, movement in the bias/variance plane, and the next levers to try.

Options:
  --baseline FILE       baseline run artifact (fitgap-run/1 JSON)
  --candidate FILE      candidate run artifact (fitgap-run/1 JSON)
  --config FILE         config file (default: .github/fitgap.yml when it exists)
  --format FORMAT       text (default), markdown or json
  --out FILE            write the review to FILE instead of standard output
  --alpha N             significance level, 0.000001 to 0.5 (default 0.05)
  --min-effect N        smallest change that counts, in metric units (default 0)
  --gap-tolerance N     component present at N x validation error, 0 to 1 (default 0.10)
  --reference N         reference level (human-level or Bayes error) for both runs
  --fail-on LIST        outcomes that fail the gate, separated by commas or new lines
                        (default worse-validation; 'none' never fails; never empty)
  --comment-key KEY     key of the hidden marker in markdown output (default 'default')
  --max-artifact-mb N   largest run artifact or epoch log read (default 16)
  --max-config-mb N     largest config file read (default 1)
  --max-csv-mb N        largest predictions CSV read (default 512)
  -h, --help            show this help

Outcomes for --fail-on: worse-validation, toward-overfitting, toward-underfitting,
worse-on-both, any-movement, slice-regression, high-bias, high-variance, data-mismatch,
validation-overfit, guardrail-regression, guardrail-undetermined, none, and FIELD-ratio>X
for a cost (train-seconds, inference-ms, parameters, memory-mb), e.g. train-seconds-ratio>2.

Flags override the config file. Exit codes: 0 gate passed; 1 gate failed; 2 bad input.
`;

beforeAll(async () => {
  if (!existsSync(cli)) await run('npm', ['run', '-s', 'build']);
});

describe('fitgap CLI (built)', () => {
  it('prints help and version', async () => {
    // Literal text, so a change to the help is a visible change to this test.
    expect((await fitgap(['--help'])).stdout).toBe(MAIN_HELP);
    expect((await fitgap(['review', '--help'])).stdout).toBe(REVIEW_HELP);
    const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };
    expect((await fitgap(['--version'])).stdout).toBe(`${pkg.version}\n`);
  });

  it('reviews the DESIGN.md example against a modified copy as JSON with the stable keys', async () => {
    const result = await fitgap([
      'review',
      '--baseline',
      'test/fixtures/design/example.json',
      '--candidate',
      'test/fixtures/design/candidate/example.json',
      '--format',
      'json',
      '--fail-on',
      'none',
    ]);
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    expectValidReport(result.stdout);
    const report = JSON.parse(result.stdout) as Record<string, unknown> & {
      validation: { change: string; delta: { test: string } };
      bias: { delta: Record<string, unknown> };
      variance: { delta: Record<string, unknown> };
      levers: { id: string; score: number; evidence: { kind: string }[] }[];
      gate: { pass: boolean; reasons: unknown[] };
    };
    expect(report['format']).toBe('fitgap-review/1');
    expect(report['movement']).toBe('toward-overfitting');
    expect(['better', 'worse', 'flat']).toContain(report.validation.change);
    for (const delta of [report.bias.delta, report.variance.delta]) {
      expect(Object.keys(delta).sort()).toEqual(['call', 'ci', 'estimate', 'p', 'test', 'unit']);
      expect(delta['unit']).toBe('shortfall');
    }
    expect(report).toHaveProperty('baseline.diagnosis');
    expect(report).toHaveProperty('candidate.diagnosis');
    expect(report.levers[0]).toMatchObject({
      id: expect.any(String),
      score: expect.any(Number),
      evidence: expect.any(Array),
    });
    expect(report.gate).toEqual({ pass: true, reasons: [], failOn: ['none'] });
  });

  it('exits 1 when the gate fails and writes --out', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fitgap-cli-'));
    const out = join(dir, 'review.md');
    const result = await fitgap([
      'review',
      '--baseline',
      'demo/baseline.json',
      '--candidate',
      'demo/2-lambda-3.json',
      '--format',
      'markdown',
      '--out',
      out,
    ]);
    expect(result.code).toBe(1);
    expect(result.stderr).toContain('gate failed');
    expect(readFileSync(out, 'utf8')).toMatch(/^<!-- fitgap:review key=default head= -->/);
  });

  it('runs the demo with three different movements', async () => {
    const movements: string[] = [];
    for (const name of ['1-interactions', '2-lambda-3', '3-more-data']) {
      const result = await fitgap(['demo', name, '--format', 'json']);
      expect(result.code).toBe(0);
      movements.push((JSON.parse(result.stdout) as { movement: string }).movement);
    }
    // 3-more-data: on a fixed evaluation set of known size, its sampling noise leaves the variance
    // change flat, so only the bias change is called.
    expect(movements).toEqual([
      'toward-overfitting',
      'toward-underfitting',
      'away-from-underfitting',
    ]);
  });

  it('prints plain text without colour under NO_COLOR and within 80 columns', async () => {
    const result = await fitgap(['demo'], { NO_COLOR: '1' });
    expect(result.code).toBe(0);
    expect(result.stdout).not.toContain('\u001b[');
    for (const line of result.stdout.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
    expect(result.stdout).toContain('npm run -s demo -- 2-lambda-3');
    // Split names are never cut to fit the width.
    expect(result.stdout).toMatch(/^ {2}train-dev {2,}/m);
    expect(result.stdout).toMatch(/^ {2}validation {2,}/m);
  });

  it('validates files and reports bad ones with exit 2', async () => {
    const ok = await fitgap(['validate', 'test/fixtures/design/example.json', 'demo/fitgap.yml']);
    expect(ok.code).toBe(0);
    expect(ok.stdout).toContain(
      'test/fixtures/design/example.json: valid run artifact "poly-degree-3" (3 repeat(s))',
    );
    const bad = await fitgap(['validate', 'test/fixtures/bad/bad-goal.json']);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toBe(
      'test/fixtures/bad/bad-goal.json: /metric/goal must be one of "minimize", "maximize" (got "lower").\n',
    );
  });

  it("a reader that goes away (| head) ends the CLI quietly, with the review's own exit code", async () => {
    for (const [failOn, expected] of [
      ['none', 0],
      ['any-movement', 1],
    ] as const) {
      const child = spawn(process.execPath, [
        cli,
        'review',
        '--baseline',
        'test/fixtures/design/example.json',
        '--candidate',
        'test/fixtures/design/candidate/example.json',
        '--format',
        'markdown',
        '--fail-on',
        failOn,
      ]);
      child.stdout.destroy(); // the reader is gone before the first byte: EPIPE
      let stderr = '';
      child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
      const code = await new Promise<number | null>((done) => child.on('close', done));
      expect(stderr).toBe('');
      expect(code).toBe(expected);
    }
  });
});
