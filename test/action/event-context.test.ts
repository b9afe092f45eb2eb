/**
 * The action reads the event context itself (so that start-up does not load @actions/github's
 * HTTP stack); it must read what @actions/github's own `context` reads from the same environment.
 * Source: the reference is @actions/github 9.1.1, lib/context.js (the `Context` class).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { readEventContext } from '../../src/entries/action/event-context.js';

const dir = mkdtempSync(join(tmpdir(), 'fitgap-event-'));
const pullRequestEvent = join(dir, 'pull_request.json');
writeFileSync(
  pullRequestEvent,
  JSON.stringify({
    pull_request: { number: 7, head: { sha: 'c'.repeat(40) }, base: { ref: 'main' } },
    repository: { owner: { login: 'crumb' }, name: 'eta', default_branch: 'main' },
  }),
);

/**
 * @actions/github's `Context` (the class behind its `context`, which reads the environment when it
 * is constructed), built for the current process.env. Imported by path: the package does not
 * export the file.
 */
async function referenceContext() {
  const file = join(process.cwd(), 'node_modules/@actions/github/lib/context.js');
  const { Context } = (await import(pathToFileURL(file).href)) as {
    Context: new () => ReturnType<typeof readEventContext>;
  };
  return new Context();
}

function fields(ctx: {
  payload: unknown;
  eventName: string;
  sha: string;
  runId: number;
  serverUrl: string;
  repo: unknown;
}) {
  return {
    payload: ctx.payload,
    eventName: ctx.eventName,
    sha: ctx.sha,
    runId: ctx.runId,
    serverUrl: ctx.serverUrl,
    repo: ctx.repo,
  };
}

const cases: Record<string, Record<string, string | undefined>> = {
  'a pull_request event': {
    GITHUB_EVENT_PATH: pullRequestEvent,
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_SHA: 'a'.repeat(40),
    GITHUB_RUN_ID: '9001',
    GITHUB_SERVER_URL: 'https://github.invalid',
    GITHUB_REPOSITORY: 'crumb/eta',
  },
  'no GITHUB_REPOSITORY: the repository comes from the payload': {
    GITHUB_EVENT_PATH: pullRequestEvent,
    GITHUB_EVENT_NAME: 'pull_request',
    GITHUB_SHA: 'a'.repeat(40),
    GITHUB_RUN_ID: undefined,
    GITHUB_SERVER_URL: undefined,
    GITHUB_REPOSITORY: undefined,
  },
  'no event file named': {
    GITHUB_EVENT_PATH: undefined,
    GITHUB_EVENT_NAME: 'push',
    GITHUB_SHA: 'b'.repeat(40),
    GITHUB_RUN_ID: '12',
    GITHUB_SERVER_URL: undefined,
    GITHUB_REPOSITORY: 'crumb/eta',
  },
};

describe('readEventContext', () => {
  afterEach(() => {
    vi.unstubAllEnvs();
  });

  for (const [name, env] of Object.entries(cases)) {
    it(`reads what @actions/github reads: ${name}`, async () => {
      for (const [key, value] of Object.entries(env)) vi.stubEnv(key, value);
      expect(fields(readEventContext(process.env))).toEqual(fields(await referenceContext()));
    });
  }

  it('no repository anywhere: the same error as @actions/github', async () => {
    vi.stubEnv('GITHUB_EVENT_PATH', undefined);
    vi.stubEnv('GITHUB_REPOSITORY', undefined);
    const reference = await referenceContext();
    expect(() => reference.repo).toThrow(/GITHUB_REPOSITORY/);
    const ours = readEventContext(process.env);
    expect(() => ours.repo).toThrow(
      "context.repo requires a GITHUB_REPOSITORY environment variable like 'owner/repo'",
    );
  });

  it('an event file that is not there: the same notice on stdout', async () => {
    const missing = join(dir, 'missing.json');
    vi.stubEnv('GITHUB_EVENT_PATH', missing);
    const write = vi.spyOn(process.stdout, 'write').mockImplementation(() => true);
    try {
      await referenceContext();
      const fromReference = write.mock.calls.map((c) => String(c[0]));
      write.mockClear();
      expect(readEventContext(process.env).payload).toEqual({});
      expect(write.mock.calls.map((c) => String(c[0]))).toEqual(fromReference.slice(0, 1));
      expect(fromReference[0]).toContain(`GITHUB_EVENT_PATH ${missing} does not exist`);
    } finally {
      write.mockRestore();
    }
  });
});
