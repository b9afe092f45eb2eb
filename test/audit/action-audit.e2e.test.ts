/**
 * Audit mode of the bundled action (`dist/index.js`, child process) on a `workflow_dispatch`
 * event, against the fake GitHub server: run artifacts of a past PR, committed files through the
 * contents API, the opt-in audit comment, the JSON Lines record as a file and an output.
 */
import { readFileSync } from 'node:fs';
import { beforeAll, describe, test } from 'vitest';
import type { TestContext } from 'vitest';
import { BOT, FakeRepo, TOKEN } from '../fake-github/repo.js';
import { FakeGitHub } from '../fake-github/server.js';
import { FIXTURES, buildBundle, runAction } from '../action/harness.js';
import { fixtureText, zipFiles } from '../action/zips.js';
import { validateRecord } from './record-schema.js';

beforeAll(() => buildBundle(), 120_000);

const BASE = 'c'.repeat(40);
const HEAD = 'a'.repeat(40);
const baselineRun = fixtureText(`${FIXTURES}/baseline.json`);
const worseRun = fixtureText(`${FIXTURES}/candidate-worse.json`);
const DISPATCH = {
  inputs: {},
  ref: 'refs/heads/main',
  repository: { full_name: 'o/r', default_branch: 'main' },
};

async function setup(context: TestContext) {
  const fake = await new FakeGitHub().start();
  context.onTestFinished(() => fake.close());
  const repo = new FakeRepo(fake).install();
  repo.pulls.set(7, { headSha: HEAD, headRepo: 'o/r', baseRef: 'main', baseSha: BASE });
  for (const [id, sha, event, run] of [
    [501, BASE, 'push', baselineRun],
    [502, HEAD, 'pull_request', worseRun],
  ] as const) {
    repo.runs.push({
      id,
      workflowFile: 'train.yml',
      headSha: sha,
      headBranch: event === 'push' ? 'main' : 'feature',
      event,
      conclusion: 'success',
      headRepo: 'o/r',
    });
    repo.artifacts.push({
      id: id + 1000,
      runId: id,
      name: 'fitgap-run',
      zip: zipFiles({ 'run.json': run }),
    });
  }
  return { fake, repo };
}

function audit(fake: FakeGitHub, inputs: Record<string, string>) {
  return runAction({
    apiUrl: fake.url,
    eventName: 'workflow_dispatch',
    payload: DISPATCH,
    inputs: { mode: 'audit', ...inputs },
  });
}

const RUN_ARTIFACTS = { 'baseline-artifact': 'fitgap-run', 'baseline-workflow': 'train.yml' };

describe.concurrent('audit mode (workflow_dispatch)', () => {
  test('a past PR from run artifacts: summary, record file and output, no comment', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const run = await audit(fake, { 'pull-request': '7', ...RUN_ARTIFACTS });
    expect(run.stderr).toBe('');
    expect(run.code).toBe(0); // worse validation, but no fail-on given: an audit reports
    expect(fake.violations).toEqual([]);
    expect(fake.log.filter((l) => !l.startsWith('GET '))).toEqual([]);
    expect(repo.comments).toEqual([]);
    expect(run.summary).toContain(
      '> **Audit re-run.** Audit re-run of o/r PR \\#\u200D7 (base ccccccc → head aaaaaaa)',
    );
    const line = run.outputs['audit-record'] ?? '';
    expect(readFileSync(run.outputs['audit-record-path'] ?? '', 'utf8')).toBe(`${line}\n`);
    const record = JSON.parse(line) as Record<string, unknown>;
    expect(validateRecord(record), JSON.stringify(validateRecord.errors)).toBe(true);
    expect(record).toMatchObject({ base: BASE, head: HEAD, repository: 'o/r' });
    expect(run.outputs).toMatchObject({ 'validation-change': 'worse', gate: 'fail' });
    expect(JSON.parse(readFileSync(run.outputs['report-path'] ?? '', 'utf8'))).toEqual(
      record['review'],
    );
  });

  test('audit-comment: one comment marked as an audit re-run; the PR review comment is left alone', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const own = repo.addComment(
      `<!-- fitgap:review key=default head=${HEAD} -->\nthe original review`,
      BOT,
    );
    const first = await audit(fake, {
      'pull-request': '7',
      ...RUN_ARTIFACTS,
      'audit-comment': 'true',
    });
    expect(first.code).toBe(0);
    expect(repo.comments).toHaveLength(2);
    expect(repo.comments[0]).toEqual(own);
    expect(repo.comments[1]?.body).toMatch(
      /^<!-- fitgap:review key=default\.audit head=a{40} -->\n> \*\*Audit re-run\.\*\*/,
    );
    // A second audit edits its own comment only when the body changed (it did not).
    const second = await audit(fake, {
      'pull-request': '7',
      ...RUN_ARTIFACTS,
      'audit-comment': 'true',
    });
    expect(second.code).toBe(0);
    expect(repo.comments).toHaveLength(2);
    expect(fake.log.filter((l) => l.startsWith('POST') || l.startsWith('PATCH'))).toEqual([
      'POST /repos/o/r/issues/7/comments',
    ]);
    expect(fake.violations).toEqual([]);
  });

  test('two commits from the contents API; fail-on given: the gate fails the step', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const enc = (t: string) => new TextEncoder().encode(t);
    repo.files.set(BASE, new Map([['runs/model.json', enc(baselineRun)]]));
    repo.files.set(HEAD, new Map([['runs/model.json', enc(worseRun)]]));
    const run = await audit(fake, {
      'base-sha': BASE.slice(0, 10),
      'head-sha': HEAD,
      candidate: 'runs/model.json',
      'fail-on': 'worse-validation',
    });
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(
      /::error::fitgap gate failed:%0A- worse-validation: validation got significantly worse/,
    );
    expect(fake.violations).toEqual([]);
    expect(fake.log).toContain(`GET /repos/o/r/contents/runs%2Fmodel.json?ref=${HEAD}`);
    expect(JSON.parse(run.outputs['audit-record'] ?? '{}')).toMatchObject({
      base: BASE,
      head: HEAD,
    });
    expect(run.stdout.replace(`::add-mask::${TOKEN}`, '')).not.toContain(TOKEN);
  });

  test('neither a PR nor two commits: one clear error, nothing fetched', async (context) => {
    const { expect } = context;
    const { fake } = await setup(context);
    const run = await audit(fake, { 'base-sha': BASE, ...RUN_ARTIFACTS });
    expect(run.code).toBe(1);
    expect(run.stdout).toContain(
      'need \\"pull-request\\", or both \\"base-sha\\" and \\"head-sha\\"'.replace(/\\/g, ''),
    );
    expect(fake.log).toEqual([]);
  });
});
