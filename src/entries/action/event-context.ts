/**
 * The workflow's event context, read from the runner's environment and event file exactly as
 * `@actions/github`'s `Context` reads it (the fields `buildRunContext` uses).
 *
 * Why not import that context: with the bundle split per mode, any import of `@actions/github`'s
 * main module puts its event context in one chunk with the package's REST client and HTTP stack
 * (undici, about 540 kB), which every run would then load and compile. Only a step that talks to
 * GitHub needs those (see the entry's `client`).
 */
import { existsSync, readFileSync } from 'node:fs';
import { EOL } from 'node:os';
import type { ActionsContextLike, Repo } from '../../io/github/context.js';

export function readEventContext(env: NodeJS.ProcessEnv): ActionsContextLike {
  let payload: Record<string, unknown> = {};
  const eventPath = env['GITHUB_EVENT_PATH'];
  if (eventPath) {
    if (existsSync(eventPath))
      payload = JSON.parse(readFileSync(eventPath, { encoding: 'utf8' })) as Record<
        string,
        unknown
      >;
    else process.stdout.write(`GITHUB_EVENT_PATH ${eventPath} does not exist${EOL}`);
  }
  return {
    payload,
    eventName: env['GITHUB_EVENT_NAME'] as string,
    sha: env['GITHUB_SHA'] as string,
    runId: parseInt(env['GITHUB_RUN_ID'] as string, 10),
    serverUrl: env['GITHUB_SERVER_URL'] ?? 'https://github.com',
    get repo(): Repo {
      const full = env['GITHUB_REPOSITORY'];
      if (full) {
        const [owner, repo] = full.split('/');
        return { owner, repo } as Repo;
      }
      const repository = payload['repository'] as
        { owner: { login: string }; name: string } | undefined;
      if (repository) return { owner: repository.owner.login, repo: repository.name };
      throw new Error(
        "context.repo requires a GITHUB_REPOSITORY environment variable like 'owner/repo'",
      );
    },
  };
}
