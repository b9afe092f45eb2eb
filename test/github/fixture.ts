/** A fake server, its repository and a real client pointed at it, for in-process module tests. */
import type { TestContext } from 'vitest';
import { createClient } from '../../src/io/github/client.js';
import type { GitHubClient } from '../../src/io/github/client.js';
import { FakeRepo, TOKEN } from '../fake-github/repo.js';
import { FakeGitHub } from '../fake-github/server.js';

export async function fakeGitHub(
  context: TestContext,
): Promise<{ fake: FakeGitHub; repo: FakeRepo; octokit: GitHubClient }> {
  const fake = await new FakeGitHub().start();
  context.onTestFinished(() => fake.close());
  const repo = new FakeRepo(fake).install();
  // Write spacing is a process-wide schedule in the throttling plugin: off in module tests.
  const octokit = createClient({
    baseUrl: fake.url,
    token: TOKEN,
    retries: 2,
    delayUnitMs: 1,
    throttle: false,
  });
  return { fake, repo, octokit };
}
