/**
 * End-to-end: the bundled action (`dist/index.js`) in a child process, against the fake GitHub
 * REST server on 127.0.0.1. Each test has its own server, repository and temp folders, so they run
 * concurrently. Every answer of the fake is checked against GitHub's OpenAPI description.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, test } from 'vitest';
import { expectValidReport } from '../report/valid-review.js';
import type { ExpectStatic, TestContext } from 'vitest';
import { BOT, FakeRepo, MAINTAINER, PAT, PERSON, TOKEN } from '../fake-github/repo.js';
import { FakeGitHub, apiError } from '../fake-github/server.js';
import type { ActionRun } from './harness.js';
import { FIXTURES, HEAD, OLD_HEAD, buildBundle, pullRequestEvent, runAction } from './harness.js';
import { filesOf, fixtureText, zipFiles } from './zips.js';

beforeAll(() => buildBundle(), 120_000);

/** A fresh fake server and repository, closed when the (concurrent) test finishes. */
async function setup(context: TestContext): Promise<{ fake: FakeGitHub; repo: FakeRepo }> {
  const fake = await new FakeGitHub().start();
  context.onTestFinished(() => fake.close());
  const repo = new FakeRepo(fake).install();
  repo.pulls.set(7, { headSha: HEAD, headRepo: 'o/r', baseRef: 'main' });
  return { fake, repo };
}

const WORSE = `${FIXTURES}/candidate-worse.json`;
const BETTER = `${FIXTURES}/candidate-better.json`;
const BASELINE = `${FIXTURES}/baseline.json`;

function review(
  fake: FakeGitHub,
  candidate: string,
  extra: Partial<Parameters<typeof runAction>[0]> = {},
) {
  return runAction({
    apiUrl: fake.url,
    eventName: 'pull_request',
    payload: pullRequestEvent(),
    inputs: { candidate: 'runs/candidate.json', baseline: 'runs/baseline.json' },
    files: { 'runs/candidate.json': candidate, 'runs/baseline.json': BASELINE },
    ...extra,
  });
}

/** The fresh folder the baseline archive was extracted into. */
function baselineDir(temp: string): string {
  const parent = join(temp, 'fitgap-default');
  const [name] = readdirSync(parent).filter((n) => n.startsWith('baseline-'));
  return join(parent, name ?? 'missing');
}

const COMMENTS = 'GET /repos/o/r/issues/7/comments?per_page=100';
const PULL = 'GET /repos/o/r/pulls/7';
const POST = 'POST /repos/o/r/issues/7/comments';

/** What every run must honour: a conforming fake, no stack trace, the token only in its mask command. */
function sane(expect: ExpectStatic, fake: FakeGitHub, run: ActionRun) {
  expect(fake.violations).toEqual([]);
  const printed = `${run.stdout}\n${run.stderr}`.replace(`::add-mask::${TOKEN}`, '');
  expect(printed).not.toContain(TOKEN);
  expect(printed).not.toMatch(/\n\s+at .+:\d+:\d+/);
}

describe.concurrent('review mode on a pull request', { timeout: 90_000 }, () => {
  test('first run: summary, report, outputs, one comment, then the gate', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const run = await review(fake, WORSE);
    sane(expect, fake, run);
    expect(fake.log).toEqual([PULL, COMMENTS, POST, COMMENTS]);
    expect(repo.comments).toHaveLength(1);
    const [comment] = repo.comments;
    expect(comment?.body).toContain(`<!-- fitgap:review key=default head=${HEAD} -->`);
    // The gate (fail-on: worse-validation, the default when neither input nor config sets it) fails the step after commenting.
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(/::error::fitgap gate failed:%0A- worse-validation/);
    const text = readFileSync(run.outputs['report-path'] ?? '', 'utf8');
    expectValidReport(text);
    const report = JSON.parse(text) as Record<string, unknown>;
    expect(report['format']).toBe('fitgap-review/1');
    expect(run.outputs).toMatchObject({
      movement: report['movement'],
      'validation-change': 'worse',
      'candidate-diagnosis': (report['candidate'] as { diagnosis: string }).diagnosis,
      gate: 'fail',
      'comment-url': `https://github.invalid/o/r/pull/7#issuecomment-${comment?.id}`,
    });
    expect(run.outputs['report-path']?.startsWith(run.temp)).toBe(true);
    expect(run.summary).toContain(comment?.body.split('\n')[1] ?? 'missing');
    const note = JSON.parse(
      readFileSync(join(run.outputs['report-dir'] ?? '', 'pull-request.json'), 'utf8'),
    );
    expect(note).toEqual({
      format: 'fitgap-pull-request/1',
      repository: 'o/r',
      number: 7,
      headSha: HEAD,
    });
  });

  test('second run updates the same comment; an unchanged body is not edited', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const first = await review(fake, BETTER);
    expect(first.code).toBe(0);
    const id = repo.comments[0]?.id;
    fake.log.length = 0;
    const second = await review(fake, WORSE);
    sane(expect, fake, second);
    expect(fake.log).toEqual([PULL, COMMENTS, `PATCH /repos/o/r/issues/comments/${id}`]);
    expect(repo.comments.map((c) => c.id)).toEqual([id]);
    expect(repo.comments[0]?.body).toContain('worse');
    fake.log.length = 0;
    const third = await review(fake, WORSE);
    sane(expect, fake, third);
    expect(fake.log).toEqual([PULL, COMMENTS]);
    expect(third.outputs['comment-url']).toBe(second.outputs['comment-url']);
  });

  test('120 earlier comments over two pages, people quoting the marker: only ours is edited', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const quote = `> <!-- fitgap:review key=default head=${HEAD} -->\n> copied from the bot`;
    let ours = 0;
    let otherKey = 0;
    for (let i = 0; i < 120; i++) {
      if (i === 104)
        ours = repo.addComment('<!-- fitgap:review key=default head=0123abc -->\nold', BOT).id;
      else if (i === 3)
        otherKey = repo.addComment(
          '<!-- fitgap:review key=ranker head=0123abc -->\nother model',
          BOT,
        ).id;
      else repo.addComment(i % 10 === 0 ? quote : `comment ${i}`, PERSON);
    }
    const before = repo.comments.map((c) => ({ ...c }));
    const run = await review(fake, BETTER);
    sane(expect, fake, run);
    expect(fake.log).toEqual([
      PULL,
      COMMENTS,
      `${COMMENTS}&page=2`,
      `PATCH /repos/o/r/issues/comments/${ours}`,
    ]);
    expect(run.code).toBe(0);
    for (const [i, c] of repo.comments.entries()) {
      if (c.id !== ours) expect(c).toEqual(before[i]);
    }
    expect(repo.comments.find((c) => c.id === otherKey)?.body).toContain('other model');
    expect(repo.comments.find((c) => c.id === ours)?.body).toContain(`head=${HEAD}`);
  });

  test('403 on commenting: a warning and the summary, the gate still applied', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    fake.on(`POST /repos/{owner}/{repo}/issues/{issue_number}/comments`, () =>
      apiError(403, 'Resource not accessible by integration'),
    );
    const [failing, passing] = await Promise.all([review(fake, WORSE), review(fake, BETTER)]);
    for (const run of [failing, passing]) {
      sane(expect, fake, run);
      expect(run.stdout).toMatch(
        /::warning::fitgap could not comment on PR #7 .*403: Resource not accessible/,
      );
      expect(run.summary).toContain('## fitgap');
      expect(run.summary).toContain('could not comment on PR #7');
      expect(run.outputs['movement']).toBeDefined();
      expect(run.outputs['comment-url']).toBeUndefined();
    }
    expect(repo.comments).toEqual([]);
    expect(failing.code).toBe(1);
    expect(failing.stdout).toContain('::error::fitgap gate failed');
    expect(passing.code).toBe(0);
  });

  test('502 then success: the request is retried', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    fake.queue('GET /repos/{owner}/{repo}/issues/{issue_number}/comments', () =>
      apiError(502, 'Server Error'),
    );
    const run = await review(fake, BETTER);
    sane(expect, fake, run);
    expect(fake.log).toEqual([PULL, COMMENTS, COMMENTS, POST, COMMENTS]);
    expect(repo.comments).toHaveLength(1);
    expect(run.code).toBe(0);
  });

  test('secondary rate limit with retry-after: waited for and retried', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    fake.queue('POST /repos/{owner}/{repo}/issues/{issue_number}/comments', () =>
      apiError(
        403,
        'You have exceeded a secondary rate limit. Please wait a few minutes before you try again.',
        {
          'retry-after': '2',
        },
      ),
    );
    const run = await review(fake, BETTER);
    sane(expect, fake, run);
    expect(fake.log).toEqual([PULL, COMMENTS, POST, POST, COMMENTS]);
    expect(run.stdout).toContain(
      'secondary rate limit on POST /repos/{owner}/{repo}/issues/{issue_number}/comments: retrying after 2 s',
    );
    expect(repo.comments).toHaveLength(1);
    expect(run.code).toBe(0);
  });

  test('a stale run for an older head never overwrites the newer report', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const newer = repo.addComment(
      `<!-- fitgap:review key=default head=${HEAD} -->\nnewer report`,
      BOT,
    );
    const run = await review(fake, WORSE, { payload: pullRequestEvent(7, OLD_HEAD) });
    sane(expect, fake, run);
    expect(fake.log).toEqual([PULL]);
    expect(repo.comments).toEqual([newer]);
    expect(run.stdout).toContain(`Not commenting: this review is for ${OLD_HEAD}`);
    expect(run.code).toBe(1); // the gate still applies to the commit this run reviewed
  });

  test('comment: new posts another comment; comment: off posts none', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    await review(fake, BETTER);
    await review(fake, BETTER, {
      inputs: { candidate: 'runs/candidate.json', baseline: 'runs/baseline.json', comment: 'new' },
    });
    expect(repo.comments).toHaveLength(2);
    fake.log.length = 0;
    const off = await review(fake, BETTER, {
      inputs: { candidate: 'runs/candidate.json', baseline: 'runs/baseline.json', comment: 'off' },
    });
    sane(expect, fake, off);
    expect(fake.log).toEqual([]);
    expect(off.code).toBe(0);
  });
});

describe.concurrent('without a pull request, and user errors', { timeout: 90_000 }, () => {
  test('push event: summary, outputs and gate, no API call', async (context) => {
    const { expect } = context;
    const { fake } = await setup(context);
    const run = await review(fake, WORSE, {
      eventName: 'push',
      payload: { ref: 'refs/heads/main', repository: { full_name: 'o/r', default_branch: 'main' } },
    });
    sane(expect, fake, run);
    expect(fake.log).toEqual([]);
    expect(run.summary).toContain('## fitgap');
    expect(run.outputs['validation-change']).toBe('worse');
    expect(run.code).toBe(1);
  });

  test('bad input: one clear message per problem, no stack, no API call', async (context) => {
    const { expect } = context;
    const { fake } = await setup(context);
    const run = await review(fake, WORSE, {
      inputs: {
        candidate: 'runs/candidate.json',
        comment: 'sometimes',
        alpha: 'five',
        'fail-on': 'worse',
      },
    });
    sane(expect, fake, run);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain(
      'input \\"comment\\" must be one of update, new, off (got \\"sometimes\\")'.replace(
        /\\"/g,
        '"',
      ),
    );
    expect(run.stdout).toContain(
      'inputs "baseline" and "baseline-artifact" need exactly one of them (got neither)',
    );
    expect(run.stdout).toContain('input "alpha" must be a number');
    expect(run.stdout).toContain('input "fail-on" must be one of worse-validation');
    expect(fake.log).toEqual([]);
  });

  test('a missing candidate file: the core names the file', async (context) => {
    const { expect } = context;
    const { fake } = await setup(context);
    const run = await review(fake, WORSE, {
      inputs: { candidate: 'runs/nope.json', baseline: 'runs/baseline.json' },
    });
    sane(expect, fake, run);
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(/::error::.*nope\.json/);
    expect(fake.log).toEqual([]);
  });
});

describe.concurrent('baseline from an artifact of the base branch', { timeout: 90_000 }, () => {
  function artifactSetup(repo: FakeRepo, zip: Uint8Array, sizeInBytes?: number) {
    repo.runs.push(
      {
        id: 501,
        workflowFile: 'train.yml',
        headSha: 'd'.repeat(40),
        headBranch: 'main',
        event: 'push',
        conclusion: 'success',
        headRepo: 'o/r',
      },
      // A fork's branch named "main": never a baseline.
      {
        id: 502,
        workflowFile: 'train.yml',
        headSha: 'e'.repeat(40),
        headBranch: 'main',
        event: 'pull_request',
        conclusion: 'success',
        headRepo: 'fork/r',
      },
      {
        id: 503,
        workflowFile: 'train.yml',
        headSha: 'f'.repeat(40),
        headBranch: 'main',
        event: 'push',
        conclusion: 'failure',
        headRepo: 'o/r',
      },
    );
    repo.artifacts.push(
      {
        id: 77,
        runId: 501,
        name: 'baseline-run',
        zip,
        ...(sizeInBytes === undefined ? {} : { sizeInBytes }),
      },
      {
        id: 78,
        runId: 502,
        name: 'baseline-run',
        zip: zipFiles({ 'run.json': fixtureText(WORSE) }),
      },
    );
  }
  const inputs = (extra: Record<string, string> = {}) => ({
    candidate: 'out/run.json',
    'baseline-artifact': 'baseline-run',
    comment: 'off',
    ...extra,
  });
  const files = { 'out/run.json': BETTER };
  const SEARCH = [
    'GET /repos/o/r/actions/workflows/train.yml/runs?status=success&per_page=20&branch=main',
    'GET /repos/o/r/actions/runs/501/artifacts?name=baseline-run&per_page=100',
  ];

  test('newest successful push run, zip fetched through the 302, only the run file extracted', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    artifactSetup(
      repo,
      zipFiles({
        'run.json': fixtureText(BASELINE),
        'model.bin': new Uint8Array(1000),
        'notes/other.json': '{}',
      }),
    );
    const run = await review(fake, BETTER, { inputs: inputs(), files });
    sane(expect, fake, run);
    expect(fake.log).toEqual([
      ...SEARCH,
      'GET /repos/o/r/actions/artifacts/77/zip',
      'GET /storage/artifacts/77.zip?sig=abc',
    ]);
    expect(run.code).toBe(0);
    expect(run.outputs['validation-change']).toBe('better');
    const dir = baselineDir(run.temp);
    expect(readFileSync(join(dir, 'run.json'), 'utf8')).toBe(fixtureText(BASELINE));
    expect(existsSync(join(dir, 'model.bin'))).toBe(false);
    expect(existsSync(join(dir, 'notes'))).toBe(false);
  });

  test("a zip with a '../' entry is refused as a whole", async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    artifactSetup(repo, zipFiles({ 'run.json': fixtureText(BASELINE), '../../escape.json': '{}' }));
    const run = await review(fake, BETTER, { inputs: inputs(), files });
    sane(expect, fake, run);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain(
      `::error::artifact "baseline-run" (run 501) must not contain an entry with a '..' path segment (got "../../escape.json")`,
    );
    // Refused before anything was written.
    expect(existsSync(join(run.temp, 'fitgap-default'))).toBe(false);
    expect(existsSync(join(run.temp, '..', 'escape.json'))).toBe(false);
  });

  test('an archive listed over the limit is refused before download', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    artifactSetup(repo, zipFiles({ 'run.json': fixtureText(BASELINE) }), 3 * 1024 * 1024);
    const run = await review(fake, BETTER, { inputs: inputs({ 'archive-limit-mb': '1' }), files });
    sane(expect, fake, run);
    expect(fake.log).toEqual(SEARCH);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('must be at most 1048576 bytes (got 3145728 bytes)');
  });

  test('an archive that inflates over the limit is stopped while inflating', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    // 2 MiB of spaces deflate to a few kilobytes: a small zip bomb.
    const padded = fixtureText(BASELINE).replace('{', `{${' '.repeat(2 * 1024 * 1024)}`);
    const zip = zipFiles({ 'run.json': padded });
    expect(zip.length).toBeLessThan(20_000);
    artifactSetup(repo, zip);
    const run = await review(fake, BETTER, { inputs: inputs({ 'archive-limit-mb': '1' }), files });
    sane(expect, fake, run);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain(
      'must inflate to at most 1048576 bytes (got more while inflating "run.json")',
    );
  });

  test('audit: the baseline is the run of another workflow for a given commit', async (context) => {
    const { expect } = context;
    const { fake, repo } = await setup(context);
    const sha = '9'.repeat(40);
    repo.runs.push({
      id: 601,
      workflowFile: 'pr-review.yml',
      headSha: sha,
      headBranch: 'main',
      event: 'push',
      conclusion: 'success',
      headRepo: 'o/r',
    });
    repo.artifacts.push({
      id: 81,
      runId: 601,
      name: 'baseline-run',
      zip: zipFiles({ 'run.json': fixtureText(BASELINE) }),
    });
    const run = await review(fake, BETTER, {
      eventName: 'workflow_dispatch',
      payload: { inputs: {}, repository: { full_name: 'o/r', default_branch: 'main' } },
      inputs: inputs({ 'baseline-ref': sha, 'baseline-workflow': 'pr-review.yml' }),
      files,
    });
    sane(expect, fake, run);
    expect(fake.log.slice(0, 2)).toEqual([
      `GET /repos/o/r/actions/workflows/pr-review.yml/runs?status=success&per_page=20&head_sha=${sha}`,
      'GET /repos/o/r/actions/runs/601/artifacts?name=baseline-run&per_page=100',
    ]);
    expect(run.code).toBe(0);
    expect(run.outputs['validation-change']).toBe('better');
  });

  test('nothing found: the message names the branch, the workflow and the artifact', async (context) => {
    const { expect } = context;
    const { fake } = await setup(context);
    const run = await review(fake, BETTER, { inputs: inputs(), files });
    sane(expect, fake, run);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain(
      'found no artifact named "baseline-run" in the 0 newest successful runs of workflow "train.yml" on branch "main"',
    );
  });
});

describe.concurrent(
  'fork-safe pattern: review uploads runs, workflow_run recomputes',
  { timeout: 90_000 },
  () => {
    /** Runs review mode as a fork PR would (comment off); returns the uploaded folder's files. */
    async function uploaded(fake: FakeGitHub, candidate: string) {
      const run = await review(fake, candidate, {
        inputs: {
          candidate: 'runs/candidate.json',
          baseline: 'runs/baseline.json',
          comment: 'off',
        },
      });
      const dir = run.outputs['report-dir'] ?? '';
      expectValidReport(readFileSync(join(dir, 'review.json'), 'utf8'));
      return filesOf(dir);
    }
    const event = {
      action: 'completed',
      workflow_run: {
        id: 777,
        head_sha: HEAD,
        event: 'pull_request',
        conclusion: 'failure',
        head_repository: { full_name: 'fork/r' },
        pull_requests: [],
      },
      repository: { full_name: 'o/r', default_branch: 'main' },
    };
    const publish = (fake: FakeGitHub, extra: Partial<Parameters<typeof runAction>[0]> = {}) =>
      runAction({
        apiUrl: fake.url,
        eventName: 'workflow_run',
        payload: event,
        inputs: { mode: 'publish' },
        ...extra,
      });
    async function forkSetup(context: TestContext, files: Record<string, string | Uint8Array>) {
      const { fake, repo } = await setup(context);
      repo.pulls.set(7, { headSha: HEAD, headRepo: 'fork/r', baseRef: 'main' });
      repo.artifacts.push({ id: 90, runId: 777, name: 'fitgap-report', zip: zipFiles(files) });
      fake.log.length = 0;
      return { fake, repo };
    }

    test('uploads the runs and the PR note; publish recomputes, comments and creates the check run', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const files = await uploaded(fake, WORSE);
      expect(Object.keys(files).sort()).toEqual([
        'baseline/run.json',
        'candidate/run.json',
        'pull-request.json',
        'review.json',
      ]);
      const { fake: trusted, repo } = await forkSetup(context, files);
      const run = await publish(trusted);
      sane(expect, trusted, run);
      expect(trusted.log).toEqual([
        'GET /repos/o/r/actions/runs/777/artifacts?name=fitgap-report&per_page=100',
        'GET /repos/o/r/actions/artifacts/90/zip',
        'GET /storage/artifacts/90.zip?sig=abc',
        PULL,
        COMMENTS,
        POST,
        COMMENTS,
        'POST /repos/o/r/check-runs',
      ]);
      expect(repo.comments).toHaveLength(1);
      expect(repo.comments[0]?.body).toContain(`head=${HEAD}`);
      expect(repo.comments[0]?.body).toContain('candidate/run.json');
      expect(repo.checkRuns).toHaveLength(1);
      expect(repo.checkRuns[0]).toMatchObject({
        name: 'fitgap',
        head_sha: HEAD,
        status: 'completed',
        conclusion: 'failure',
        details_url: 'https://github.invalid/o/r/actions/runs/9001',
      });
      expect(JSON.stringify(repo.checkRuns[0])).toContain('worse-validation');
      // The gate lives in the check run; the publish step itself succeeded.
      expect(run.code).toBe(0);
      expect(run.outputs['gate']).toBe('fail');
      expect(run.summary).toContain('## fitgap');
    });

    test('a forged review.json cannot turn the gate green: the review is recomputed', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const files = await uploaded(fake, WORSE);
      type Forged = { validation: { change: string }; gate: unknown; levers: unknown };
      const forged = JSON.parse(new TextDecoder().decode(files['review.json'])) as Forged;
      forged.validation.change = 'better';
      forged.gate = { pass: true, reasons: [], failOn: [] };
      forged.levers = [{ id: '__proto__', reason: '<img src=x onerror=alert(1)> @octocat' }];
      files['review.json'] = new TextEncoder().encode(JSON.stringify(forged));
      // The runs themselves carry hostile names; the renderer escapes every artifact string.
      const hostile = '<img src=x onerror=alert(1)> @octocat [x](https://evil.invalid) | </table>';
      for (const side of ['baseline', 'candidate']) {
        const text = new TextDecoder().decode(files[`${side}/run.json`]);
        const doc = JSON.parse(text) as Record<string, unknown>;
        doc['slices'] = [{ name: hostile, examples: 500, train: 0.05, validation: 0.1 }];
        doc['hyperparameters'] = { ...(doc['hyperparameters'] as object), [hostile]: side };
        doc['run'] = { ...(doc['run'] as object), name: hostile };
        files[`${side}/run.json`] = new TextEncoder().encode(JSON.stringify(doc));
      }
      const { fake: trusted, repo } = await forkSetup(context, files);
      const run = await publish(trusted);
      sane(expect, trusted, run);
      expect(repo.checkRuns[0]).toMatchObject({ conclusion: 'failure' });
      expect(run.outputs['validation-change']).toBe('worse');
      const body = repo.comments[0]?.body ?? '';
      expect(body).toContain('onerror'); // the name is shown, as text
      for (const live of ['<img', '</table>', '@octocat', '](https://evil', '__proto__'])
        expect(body).not.toContain(live);
    });

    test("the gate policy is the publish side's: its config and inputs, never the upload's", async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const files = await uploaded(fake, WORSE);
      const { fake: trusted, repo } = await forkSetup(context, files);
      const run = await publish(trusted, {
        inputs: { mode: 'publish', config: '.github/fitgap.yml' },
        files: { '.github/fitgap.yml': `${FIXTURES}/fail-on-none.yml` },
      });
      sane(expect, trusted, run);
      expect(repo.checkRuns[0]).toMatchObject({ conclusion: 'success' });
      expect(run.outputs['gate']).toBe('pass');
    });

    test('with "baseline-artifact" the baseline is fetched from the base branch, not the upload', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const files = await uploaded(fake, WORSE);
      // The fork uploads its worse candidate as the baseline too: a review against it shows no change.
      files['baseline/run.json'] = files['candidate/run.json'] ?? new Uint8Array();
      const { fake: trusted, repo } = await forkSetup(context, files);
      repo.runs.push({
        id: 501,
        workflowFile: 'train.yml',
        headSha: 'd'.repeat(40),
        headBranch: 'main',
        event: 'push',
        conclusion: 'success',
        headRepo: 'o/r',
      });
      repo.artifacts.push({
        id: 77,
        runId: 501,
        name: 'fitgap-run',
        zip: zipFiles({ 'run.json': fixtureText(BASELINE) }),
      });
      const run = await publish(trusted, {
        inputs: {
          mode: 'publish',
          'baseline-artifact': 'fitgap-run',
          'baseline-workflow': 'train.yml',
        },
      });
      sane(expect, trusted, run);
      expect(trusted.log).toContain(
        'GET /repos/o/r/actions/workflows/train.yml/runs?status=success&per_page=20&branch=main',
      );
      expect(run.outputs['validation-change']).toBe('worse');
      expect(repo.checkRuns[0]).toMatchObject({ conclusion: 'failure' });
    });

    test('every uploaded file is untrusted input: a hostile run is refused, named, before any write', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const files = await uploaded(fake, BETTER);
      const run0 = JSON.parse(new TextDecoder().decode(files['candidate/run.json'])) as Record<
        string,
        unknown
      >;
      const hostile = JSON.stringify(run0).replace('"format"', '"format":"x","format"');
      files['candidate/run.json'] = new TextEncoder().encode(hostile);
      const { fake: trusted, repo } = await forkSetup(context, files);
      const run = await publish(trusted);
      sane(expect, trusted, run);
      expect(run.code).toBe(1);
      expect(run.stdout).toContain(
        'artifact "fitgap-report" (run 777) candidate/run.json: /format must appear once in its object',
      );
      expect(trusted.log.filter((l) => !l.startsWith('GET'))).toEqual([]);
      expect(repo.comments).toEqual([]);
      expect(repo.checkRuns).toEqual([]);
    });

    test('an upload without a candidate run is refused with what it must hold', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const files = await uploaded(fake, BETTER);
      delete files['candidate/run.json'];
      const { fake: trusted, repo } = await forkSetup(context, files);
      const run = await publish(trusted);
      sane(expect, trusted, run);
      expect(run.code).toBe(1);
      expect(run.stdout).toContain(
        'artifact "fitgap-report" (run 777) must hold candidate/run.json exactly once (got none)',
      );
      expect(repo.comments).toEqual([]);
    });

    test('a note naming another commit is refused: no comment, no check', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const { fake: trusted, repo } = await forkSetup(context, await uploaded(fake, BETTER));
      const forged = { ...event, workflow_run: { ...event.workflow_run, head_sha: OLD_HEAD } };
      const run = await publish(trusted, { payload: forged });
      sane(expect, trusted, run);
      expect(run.code).toBe(1);
      expect(run.stdout).toContain(
        `must name this repository (o/r) and the run's head commit (${OLD_HEAD})`,
      );
      expect(trusted.log.filter((l) => !l.startsWith('GET'))).toEqual([]);
      expect(repo.comments).toEqual([]);
      expect(repo.checkRuns).toEqual([]);
    });

    test('a PR whose head is in another repository than the run is refused', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const { fake: trusted, repo } = await forkSetup(context, await uploaded(fake, BETTER));
      repo.pulls.set(7, { headSha: HEAD, headRepo: 'someone-else/r', baseRef: 'main' });
      const run = await publish(trusted);
      sane(expect, trusted, run);
      expect(run.code).toBe(1);
      expect(run.stdout).toContain('must name a PR whose head is in fork/r');
      expect(repo.comments).toEqual([]);
      expect(repo.checkRuns).toEqual([]);
    });
  },
);

describe.concurrent(
  'GitHub API faults: the summary is written and the gate applied',
  { timeout: 90_000 },
  () => {
    test('503 on every try of the comment: three tries, the call named, the gate still applied', async (context) => {
      const { expect } = context;
      const { fake, repo } = await setup(context);
      const fail = () => apiError(503, 'Service Unavailable');
      fake.queue(`POST /repos/{owner}/{repo}/issues/{issue_number}/comments`, fail, fail, fail);
      const run = await review(fake, WORSE, {
        inputs: {
          candidate: 'runs/candidate.json',
          baseline: 'runs/baseline.json',
          'status-check': 'check-run',
        },
      });
      sane(expect, fake, run);
      expect(fake.log.filter((l) => l === POST)).toHaveLength(3);
      expect(run.summary).toContain('## fitgap');
      expect(run.code).toBe(1);
      expect(run.stdout).toContain('fitgap gate failed');
      expect(run.stdout).toContain(
        'Could not publish the comment: GitHub API POST /repos/o/r/issues/7/comments answered 503: Service Unavailable',
      );
      expect(repo.checkRuns[0]).toMatchObject({ conclusion: 'failure' });
    });

    test('500 then 502 then success: retried within the bound', async (context) => {
      const { expect } = context;
      const { fake, repo } = await setup(context);
      fake.queue(
        'GET /repos/{owner}/{repo}/pulls/{pull_number}',
        () => apiError(500, 'Server Error'),
        () => apiError(502, 'Bad Gateway'),
      );
      const run = await review(fake, BETTER);
      sane(expect, fake, run);
      expect(fake.log.slice(0, 3)).toEqual([PULL, PULL, PULL]);
      expect(repo.comments).toHaveLength(1);
      expect(run.code).toBe(0);
    });

    test('401 (a bad token): the call is named, the summary written, the gate applied', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      const run = await review(fake, WORSE, {
        inputs: {
          candidate: 'runs/candidate.json',
          baseline: 'runs/baseline.json',
          'github-token': 'ghs_wrong',
        },
      });
      sane(expect, fake, run);
      expect(fake.log).toEqual([PULL]);
      expect(run.summary).toContain('## fitgap');
      expect(run.stdout).toContain('fitgap gate failed');
      expect(run.stdout).toContain(
        'Could not publish the comment: GitHub API GET /repos/o/r/pulls/7 answered 401: Bad credentials',
      );
      expect(run.stdout).toContain('(check the token given as "github-token")');
      expect(run.code).toBe(1);
    });

    test('404 (no such pull request): the call is named, the gate applied', async (context) => {
      const { expect } = context;
      const { fake, repo } = await setup(context);
      repo.pulls.delete(7);
      const run = await review(fake, BETTER);
      sane(expect, fake, run);
      expect(run.stdout).toContain('GitHub API GET /repos/o/r/pulls/7 answered 404: Not Found');
      expect(run.summary).toContain('## fitgap');
      expect(run.outputs['gate']).toBe('pass');
      expect(run.code).toBe(1);
    });

    test('422 on the comment body: shrunk to a pointer and sent once more', async (context) => {
      const { expect } = context;
      const { fake, repo } = await setup(context);
      fake.queue(`POST /repos/{owner}/{repo}/issues/{issue_number}/comments`, () =>
        apiError(422, 'Validation Failed'),
      );
      const run = await review(fake, BETTER);
      sane(expect, fake, run);
      expect(fake.log.filter((l) => l === POST)).toHaveLength(2);
      expect(repo.comments).toHaveLength(1);
      expect(repo.comments[0]?.body).toContain('more than a comment can hold');
      expect(repo.comments[0]?.body).toContain(`head=${HEAD}`);
      expect(run.code).toBe(0);
    });

    test('a server that never answers: timed out, retried, named; the gate applied', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      fake.on('GET /repos/{owner}/{repo}/pulls/{pull_number}', async () => {
        await new Promise((done) => setTimeout(done, 5_000));
        return apiError(500, 'late');
      });
      const run = await review(fake, WORSE, { env: { FITGAP_TEST_TIMEOUT_MS: '200' } });
      expect(fake.log.filter((l) => l === PULL)).toHaveLength(3);
      expect(run.stdout).toContain(
        'GitHub API GET /repos/o/r/pulls/7 could not be reached: no answer within 0.2 s (timed out)',
      );
      expect(run.stdout).toContain('fitgap gate failed');
      expect(run.summary).toContain('## fitgap');
      expect(run.code).toBe(1);
    });

    test('a refused connection: named, the summary written, the gate applied', async (context) => {
      const { expect } = context;
      const { fake } = await setup(context);
      await fake.close(); // nothing listens on its port any more
      const run = await review(fake, WORSE);
      expect(run.stdout).toMatch(
        /GitHub API GET \/repos\/o\/r\/pulls\/7 could not be reached: connect ECONNREFUSED 127\.0\.0\.1:\d+/,
      );
      expect(run.stdout).toContain('fitgap gate failed');
      expect(run.summary).toContain('## fitgap');
      expect(run.code).toBe(1);
    });

    test('a personal access token: its own earlier comment is updated, not duplicated', async (context) => {
      const { expect } = context;
      const { fake, repo } = await setup(context);
      const mine = repo.addComment(
        `<!-- fitgap:review key=default head=${OLD_HEAD} -->\nold`,
        MAINTAINER,
      );
      const quoting = repo.addComment(`> <!-- fitgap:review key=default head=${HEAD} -->`, PERSON);
      const inputs = {
        candidate: 'runs/candidate.json',
        baseline: 'runs/baseline.json',
        'github-token': PAT,
      };
      const first = await review(fake, BETTER, { inputs });
      sane(expect, fake, first);
      expect(fake.log).toEqual([
        'GET /user',
        PULL,
        COMMENTS,
        `PATCH /repos/o/r/issues/comments/${mine.id}`,
      ]);
      const second = await review(fake, WORSE, { inputs });
      sane(expect, fake, second);
      expect(repo.comments.map((c) => c.id)).toEqual([mine.id, quoting.id]);
      expect(repo.comments[0]?.body).toContain('worse');
      expect(repo.comments[1]?.body).toBe(`> <!-- fitgap:review key=default head=${HEAD} -->`);
    });
  },
);
