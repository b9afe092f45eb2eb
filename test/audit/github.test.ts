/**
 * `fitgap audit --repo OWNER/NAME`: a past pull request's review re-run from the artifacts of its
 * workflow runs (or from committed files through the contents API), against the fake GitHub REST
 * server on 127.0.0.1. The request log is asserted; every answer is checked against GitHub's
 * OpenAPI description.
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, test } from 'vitest';
import type { TestContext } from 'vitest';
import { runCli } from '../../src/entries/cli/main.js';
import { FakeRepo, TOKEN } from '../fake-github/repo.js';
import { FakeGitHub } from '../fake-github/server.js';
import { FIXTURES } from '../action/harness.js';
import { fixtureText, zipFiles } from '../action/zips.js';
import { validateRecord } from './record-schema.js';
import { fakeIo } from '../cli/fake-io.js';
import { predictions } from './history.js';

const BASE = 'c'.repeat(40);
const HEAD = 'a'.repeat(40);
const LATER = 'd'.repeat(40);
const baselineRun = fixtureText(`${FIXTURES}/baseline.json`);
const worseRun = fixtureText(`${FIXTURES}/candidate-worse.json`);
const temp = mkdtempSync(join(tmpdir(), 'fitgap-audit-gh-'));

async function setup(context: TestContext) {
  const fake = await new FakeGitHub().start();
  context.onTestFinished(() => fake.close());
  const repo = new FakeRepo(fake).install();
  repo.pulls.set(7, { headSha: HEAD, headRepo: 'fork/r', baseRef: 'main', baseSha: BASE });
  return { fake, repo };
}

function addRun(
  repo: FakeRepo,
  run: { id: number; headSha: string; headBranch: string; event: string; headRepo: string },
  files: Record<string, string>,
) {
  repo.runs.push({ ...run, workflowFile: 'train.yml', conclusion: 'success' });
  repo.artifacts.push({
    id: run.id + 1000,
    runId: run.id,
    name: 'fitgap-run',
    zip: zipFiles(files),
  });
}

async function audit(fake: FakeGitHub, args: string[], env: Record<string, string> = {}) {
  const io = fakeIo(temp, {
    env: { GITHUB_TOKEN: TOKEN, GITHUB_API_URL: fake.url, ...env },
    now: () => new Date('2026-12-02T12:00:00.000Z'),
    tempDir: temp,
  });
  const code = await runCli(['audit', '--repo', 'o/r', ...args], io.io);
  return { code, stdout: io.stdout(), stderr: io.stderr() };
}

const RUNS = ['--run-artifact', 'fitgap-run', '--workflow', 'train.yml'];

describe.concurrent('pull request from run artifacts', () => {
  test('base run of the base commit, head run of the fork head: one review, request log', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    addRun(
      repo,
      { id: 501, headSha: BASE, headBranch: 'main', event: 'push', headRepo: 'o/r' },
      { 'run.json': baselineRun },
    );
    addRun(
      repo,
      { id: 502, headSha: HEAD, headBranch: 'feature', event: 'pull_request', headRepo: 'fork/r' },
      { 'run.json': worseRun },
    );
    const run = await audit(fake, ['--pull-request', '7', ...RUNS]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(fake.violations).toEqual([]);
    expect(fake.log).toEqual([
      'GET /repos/o/r/pulls/7',
      `GET /repos/o/r/actions/workflows/train.yml/runs?status=success&per_page=20&head_sha=${BASE}`,
      'GET /repos/o/r/actions/runs/501/artifacts?name=fitgap-run&per_page=100',
      'GET /repos/o/r/actions/artifacts/1501/zip',
      'GET /storage/artifacts/1501.zip?sig=abc',
      `GET /repos/o/r/actions/workflows/train.yml/runs?status=success&per_page=20&head_sha=${HEAD}`,
      'GET /repos/o/r/actions/runs/502/artifacts?name=fitgap-run&per_page=100',
      'GET /repos/o/r/actions/artifacts/1502/zip',
      'GET /storage/artifacts/1502.zip?sig=abc',
    ]);
    expect(run.stdout).toContain(
      "Audit re-run of o/r PR #7 (base ccccccc → head aaaaaaa), recomputed by fitgap 0.0.0-test from the runs' artifacts",
    );
    expect(run.stdout).toContain('fitgap review: ');
    expect(run.stdout).toContain('validation worse');
  });

  test('--fail-on: exit 1 when the re-run review meets it', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    addRun(
      repo,
      { id: 501, headSha: BASE, headBranch: 'main', event: 'push', headRepo: 'o/r' },
      { 'run.json': baselineRun },
    );
    addRun(
      repo,
      { id: 502, headSha: HEAD, headBranch: 'feature', event: 'pull_request', headRepo: 'fork/r' },
      { 'run.json': worseRun },
    );
    const run = await audit(fake, [
      '--pull-request',
      '7',
      ...RUNS,
      '--fail-on',
      'worse-validation',
      '--format',
      'markdown',
    ]);
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(
      /^<!-- fitgap:review key=default\.audit head=a{40} -->\n> \*\*Audit re-run\.\*\* /,
    );
  });

  test('no run kept the base commit: the base branch newest run, said plainly; JSON record valid', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    addRun(
      repo,
      { id: 601, headSha: LATER, headBranch: 'main', event: 'push', headRepo: 'o/r' },
      { 'run.json': baselineRun },
    );
    addRun(
      repo,
      { id: 602, headSha: HEAD, headBranch: 'feature', event: 'pull_request', headRepo: 'fork/r' },
      { 'run.json': worseRun },
    );
    const run = await audit(fake, ['--pull-request', '7', ...RUNS, '--format', 'json']);
    expect(run.code).toBe(0);
    expect(fake.violations).toEqual([]);
    expect(fake.log).toContain(
      'GET /repos/o/r/actions/workflows/train.yml/runs?status=success&per_page=20&branch=main',
    );
    expect(fake.log).toContain('GET /repos/o/r/actions/runs/601');
    const record = JSON.parse(run.stdout) as Record<string, unknown>;
    expect(validateRecord(record), JSON.stringify(validateRecord.errors)).toBe(true);
    expect(record).toMatchObject({
      base: LATER,
      head: HEAD,
      repository: 'o/r',
      recordedAt: '2026-12-02T12:00:00.000Z',
      sources: [
        { commit: LATER, path: 'run.json', artifact: { name: 'fitgap-run', runId: 601 } },
        { commit: HEAD, path: 'run.json', artifact: { name: 'fitgap-run', runId: 602 } },
      ],
    });
    const text = await audit(fake, ['--pull-request', '7', ...RUNS]);
    expect(text.stdout).toContain(
      'No successful run of the base commit ccccccc kept the artifact; the base side is the newest successful run on branch main (commit ddddddd), which may be later than the pull request.',
    );
  });

  test('no artifact for the head: exit 2 naming what was searched', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    addRun(
      repo,
      { id: 501, headSha: BASE, headBranch: 'main', event: 'push', headRepo: 'o/r' },
      { 'run.json': baselineRun },
    );
    const run = await audit(fake, ['--pull-request', '7', ...RUNS]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('head side found no artifact named "fitgap-run"');
    expect(run.stderr).toContain(`for commit ${HEAD}`);
  });
});

describe.concurrent('commits from the contents API', () => {
  test('--base/--head (short shas) with committed files and their predictions', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    // Error rates 0.061 and 0.075 over 2,000 rows (122 and 150 wrong), as the artifacts state:
    // predictions must reproduce their split value.
    const withPredictions = (text: string) => {
      const doc = JSON.parse(text) as Record<string, unknown>;
      doc['predictions'] = { split: 'validation', path: 'validation-predictions.csv' };
      return JSON.stringify(doc);
    };
    const enc = (t: string) => new TextEncoder().encode(t);
    repo.files.set(
      BASE,
      new Map([
        ['runs/model.json', enc(withPredictions(baselineRun))],
        ['runs/validation-predictions.csv', enc(predictions((i) => (i * 61) % 1000 < 61))],
      ]),
    );
    repo.files.set(
      HEAD,
      new Map([
        ['runs/model.json', enc(withPredictions(worseRun))],
        ['runs/validation-predictions.csv', enc(predictions((i) => (i * 3) % 40 < 3))],
      ]),
    );
    const run = await audit(fake, [
      '--base',
      'cccccccc',
      '--head',
      'aaaaaaaa',
      '--artifact',
      'runs/model.json',
      '--format',
      'json',
    ]);
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0);
    expect(fake.violations).toEqual([]);
    expect(fake.log).toEqual([
      'GET /repos/o/r/commits/cccccccc',
      'GET /repos/o/r/commits/aaaaaaaa',
      `GET /repos/o/r/contents/runs%2Fmodel.json?ref=${BASE}`,
      `GET /repos/o/r/contents/runs%2Fvalidation-predictions.csv?ref=${BASE}`,
      `GET /repos/o/r/contents/runs%2Fmodel.json?ref=${HEAD}`,
      `GET /repos/o/r/contents/runs%2Fvalidation-predictions.csv?ref=${HEAD}`,
    ]);
    const record = JSON.parse(run.stdout) as {
      review: { paired: { rows: number } };
      sources: unknown[];
    };
    expect(validateRecord(record), JSON.stringify(validateRecord.errors)).toBe(true);
    expect(record.sources).toHaveLength(4);
    expect(record.review.paired.rows).toBe(2000);
  });

  test('a file missing at the head commit: exit 2', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    repo.files.set(BASE, new Map([['runs/model.json', new TextEncoder().encode(baselineRun)]]));
    repo.files.set(HEAD, new Map());
    const run = await audit(fake, [
      '--base',
      BASE,
      '--head',
      HEAD,
      '--artifact',
      'runs/model.json',
    ]);
    expect(run.code).toBe(2);
    expect(run.stderr).toContain(
      `runs/model.json at aaaaaaa must exist in the repository at that commit`,
    );
  });
});

describe.concurrent('usage and API errors exit 2 with one line', () => {
  test.for([
    [['--pull-request', '7'], {}, 'name the run artifact'],
    [['--pull-request', 'x', ...RUNS], {}, '--pull-request must be a pull request number'],
    [
      ['--pull-request', '7', '--run-artifact', 'fitgap-run'],
      {},
      '--run-artifact needs --workflow',
    ],
    [
      ['--base', BASE, ...RUNS],
      {},
      '--repo needs --pull-request N, or both --base COMMIT and --head COMMIT',
    ],
    [['--pull-request', '7', ...RUNS], { GITHUB_TOKEN: '' }, 'set GITHUB_TOKEN'],
    [['--pull-request', '99', ...RUNS], {}, 'pull request #99 must exist in o/r'],
    [
      ['--pull-request', '7', ...RUNS],
      { GITHUB_TOKEN: 'wrong' },
      'GitHub API GET /repos/o/r/pulls/7 answered 401: Bad credentials',
    ],
  ] as [string[], Record<string, string>, string][])(
    '%j %j',
    async ([args, env, message], context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const run = await audit(fake, args, env);
      expect(run.code).toBe(2);
      expect(run.stderr).toContain(message);
      expect(run.stderr).not.toMatch(/\n\s+at /);
    },
  );
});
