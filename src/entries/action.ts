/**
 * The GitHub Action entry: read the settings, build the event context and the REST client, run
 * the chosen mode. Environment reads happen here and in `action/settings.ts` only.
 */
import * as core from '@actions/core';
import { readAuditSettings } from './action/audit-settings.js';
import { handleFailure } from './action/failure.js';
import { coreIO } from './action/io.js';
import { readSettings } from './action/settings.js';
import { createClient } from '../io/github/client.js';
import { buildRunContext } from '../io/github/context.js';

async function main(): Promise<void> {
  const settings = readSettings();
  core.setSecret(settings.api.token);
  // Imported here, not at the top: @actions/github reads the environment when it is loaded.
  const { context } = await import('@actions/github');
  const { defaults } = await import('@actions/github/lib/utils');
  const octokit = createClient({
    ...settings.api,
    // The proxy-aware transport @actions/github builds for GITHUB_API_URL.
    ...(defaults.request?.fetch === undefined ? {} : { fetch: defaults.request.fetch }),
    log: (message) => core.info(message),
  });
  const deps = { settings, context: buildRunContext(context), octokit, io: coreIO() };
  // Each mode is loaded when it runs (the bundle is split per mode).
  if (settings.mode === 'audit') {
    const { runAudit } = await import('./action/audit-mode.js');
    await runAudit({ ...deps, audit: readAuditSettings(settings), now: () => new Date() });
  } else if (settings.mode === 'publish') {
    await (await import('./action/publish-mode.js')).runPublish(deps);
  } else await (await import('./action/review-mode.js')).runReview(deps);
}

main().catch(handleFailure);
