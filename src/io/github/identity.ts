/**
 * Who the token writes as, so our own comment can be recognised. A personal access token belongs
 * to a person: `GET /user` names them, and only their comments carrying our marker are ours. An
 * installation token (the workflow's GITHUB_TOKEN, a GitHub App; prefix `ghs_`) writes as a bot and
 * `GET /user` answers 403: then any bot's comment with our marker is ours, as before.
 */
import type { GitHubClient } from './client.js';

export type Identity = { kind: 'user'; login: string } | { kind: 'bot' };

/** Installation tokens; `GET /user` is refused for them (common practice: GitHub's token prefixes). */
const INSTALLATION_TOKEN = /^ghs_/;

export async function resolveIdentity(octokit: GitHubClient, token: string): Promise<Identity> {
  if (INSTALLATION_TOKEN.test(token)) return { kind: 'bot' };
  try {
    const { data } = await octokit.rest.users.getAuthenticated();
    return data.type === 'Bot' ? { kind: 'bot' } : { kind: 'user', login: data.login };
  } catch (error) {
    const status = (error as { status?: unknown } | null)?.status;
    // 403/404: a token that may not ask who it is (an app, an older server); 401 is a bad token
    // and fails the next call with a clear message anyway.
    if (status === 403 || status === 404) return { kind: 'bot' };
    throw error;
  }
}
