import { describe, test } from 'vitest';
import { MAX_CHECK_OUTPUT_CHARS, publishGate } from '../../src/io/github/check.js';
import { fakeGitHub } from './fixture.js';

const SHA = '2'.repeat(40);
const repo = { owner: 'o', repo: 'r' };
const base = {
  repo,
  sha: SHA,
  name: 'fitgap',
  title: 'toward-overfitting; validation worse',
  summary: '## fitgap',
};

describe.concurrent('publishGate', () => {
  test('check run: completed, conclusion from the gate, reasons first, output within the limit', async (context) => {
    const { expect } = context;
    const { fake, repo: gh, octokit } = await fakeGitHub(context);
    await publishGate({
      ...base,
      octokit,
      kind: 'check-run',
      pass: false,
      reasons: ['worse-validation: validation got significantly worse'],
      summary: `## fitgap\n${'row\n'.repeat(20_000)}`,
      detailsUrl: 'https://github.invalid/run',
    });
    expect(fake.violations).toEqual([]);
    expect(fake.log).toEqual(['POST /repos/o/r/check-runs']);
    const run = gh.checkRuns[0] as {
      output: { summary: string };
      conclusion: string;
      head_sha: string;
    };
    expect(run).toMatchObject({
      name: 'fitgap',
      head_sha: SHA,
      status: 'completed',
      conclusion: 'failure',
    });
    expect(
      run.output.summary.startsWith(
        '**Gate failed**\n\n- worse-validation: validation got significantly worse',
      ),
    ).toBe(true);
    expect(run.output.summary.length).toBeLessThanOrEqual(MAX_CHECK_OUTPUT_CHARS);
    expect(run.output.summary).toMatch(/…cut to fit; the full review is in the job summary\.$/);
  });

  test('commit status: state and a description of at most 140 characters', async (context) => {
    const { expect } = context;
    const { fake, repo: gh, octokit } = await fakeGitHub(context);
    await publishGate({
      ...base,
      octokit,
      kind: 'commit-status',
      pass: false,
      reasons: ['x'.repeat(300)],
    });
    expect(fake.log).toEqual([`POST /repos/o/r/statuses/${SHA}`]);
    const status = gh.statuses[0] as { state: string; context: string; description: string };
    expect(status).toMatchObject({ state: 'failure', context: 'fitgap' });
    expect(status.description.length).toBeLessThanOrEqual(140);
    await publishGate({ ...base, octokit, kind: 'commit-status', pass: true, reasons: [] });
    expect(gh.statuses[1]).toMatchObject({
      state: 'success',
      description: 'passed: toward-overfitting; validation worse',
    });
  });
});
