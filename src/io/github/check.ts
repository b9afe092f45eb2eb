/**
 * The gate as a check run or a commit status on a commit: how a `workflow_run` workflow, whose own
 * job status does not attach to the PR, makes fitgap a requireable check.
 */
import type { GitHubClient } from './client.js';
import type { Repo } from './context.js';

/** `output.summary` and `output.text` of a check run hold at most this many characters. */
export const MAX_CHECK_OUTPUT_CHARS = 65_535;
/** A commit status description holds at most this many characters. */
const MAX_STATUS_DESCRIPTION = 140;

export interface PublishGateOptions {
  octokit: GitHubClient;
  repo: Repo;
  sha: string;
  kind: 'check-run' | 'commit-status';
  /** Stable, unique name (the check a branch protection rule requires). */
  name: string;
  pass: boolean;
  /** One line headline, e.g. the movement and validation change. */
  title: string;
  /** Markdown shown on the check's page; the gate reasons are put first. */
  summary: string;
  reasons: string[];
  detailsUrl?: string;
}

export interface GateOutcome {
  kind: 'check-run' | 'commit-status';
  url: string;
}

export async function publishGate(options: PublishGateOptions): Promise<GateOutcome> {
  const { octokit, repo, sha, name, pass } = options;
  if (options.kind === 'commit-status') {
    const description = pass ? `passed: ${options.title}` : `failed: ${options.reasons.join('; ')}`;
    const { data } = await octokit.rest.repos.createCommitStatus({
      ...repo,
      sha,
      state: pass ? 'success' : 'failure',
      context: name,
      description: clip(description, MAX_STATUS_DESCRIPTION),
      ...(options.detailsUrl === undefined ? {} : { target_url: options.detailsUrl }),
    });
    return { kind: 'commit-status', url: data.url };
  }
  const reasons = pass
    ? ''
    : `**Gate failed**\n\n${options.reasons.map((r) => `- ${r}`).join('\n')}\n\n`;
  const { data } = await octokit.rest.checks.create({
    ...repo,
    name,
    head_sha: sha,
    status: 'completed',
    conclusion: pass ? 'success' : 'failure',
    ...(options.detailsUrl === undefined ? {} : { details_url: options.detailsUrl }),
    output: {
      title: clip(options.title, 200),
      summary: clip(reasons + options.summary, MAX_CHECK_OUTPUT_CHARS),
    },
  });
  return { kind: 'check-run', url: data.html_url ?? data.url };
}

/** Cut at a line end where possible, with a closing note; never over `max` characters. */
function clip(text: string, max: number): string {
  if (text.length <= max) return text;
  const note = max > 200 ? '\n\n…cut to fit; the full review is in the job summary.' : '…';
  const room = max - note.length;
  const cut = text.lastIndexOf('\n', room);
  return text.slice(0, cut > room / 2 ? cut : room) + note;
}
