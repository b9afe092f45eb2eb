/**
 * The GitHub Action entry: read the settings and the event context, run the chosen mode with a
 * REST client built on first use. Environment reads happen here and in `action/settings.ts` only
 * (`action/event-context.ts` reads the environment this entry passes it).
 */
import * as core from '@actions/core';
import { readAuditSettings } from './action/audit-settings.js';
import { handleFailure } from './action/failure.js';
import { coreIO } from './action/io.js';
import { readEventContext } from './action/event-context.js';
import { readSettings } from './action/settings.js';
import { runReview } from './action/review-mode.js';
import type { ApiSettings } from './action/settings.js';
import type { GitHubClient } from '../io/github/client.js';
import { buildRunContext } from '../io/github/context.js';

async function main(): Promise<void> {
  const settings = readSettings();
  core.setSecret(settings.api.token);
  let client: Promise<GitHubClient> | undefined;
  const deps = {
    settings,
    context: buildRunContext(readEventContext(process.env)),
    // Built when a step first talks to GitHub: the REST client and its HTTP stack (undici) are
    // large, and a review with comment and status check off sends nothing.
    client: () => (client ??= githubClient(settings.api)),
    io: coreIO(),
  };
  // Audit and publish are loaded when they run. Review, the common mode, is imported statically:
  // loaded on its own it split the shared code into more chunks (a tiny review loaded 14 modules,
  // now 10, and runs about 30M fewer instructions, some 6 ms; issue 14).
  if (settings.mode === 'audit') {
    const { runAudit } = await import('./action/audit-mode.js');
    await runAudit({ ...deps, audit: readAuditSettings(settings), now: () => new Date() });
  } else if (settings.mode === 'publish') {
    await (await import('./action/publish-mode.js')).runPublish(deps);
  } else await runReview(deps);
}

async function githubClient(api: ApiSettings): Promise<GitHubClient> {
  const [{ defaults }, { createClient }] = await Promise.all([
    import('@actions/github/lib/utils'),
    import('../io/github/client.js'),
  ]);
  return createClient({
    ...api,
    // The proxy-aware transport @actions/github builds for GITHUB_API_URL.
    ...(defaults.request?.fetch === undefined ? {} : { fetch: defaults.request.fetch }),
    log: (message) => core.info(message),
  });
}

main().catch(handleFailure);
