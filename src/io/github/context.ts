/**
 * The event context fitgap needs, built once in the entry from `@actions/github`'s context and
 * passed down as plain data. Nothing here reads the environment.
 */

export interface Repo {
  owner: string;
  repo: string;
}

export interface PullRequestRef {
  number: number;
  headSha: string;
  baseRef: string;
  /** `owner/repo` the head branch lives in (differs from the base repo for forks). */
  headRepo: string | null;
}

export interface WorkflowRunRef {
  id: number;
  headSha: string;
  /** `owner/repo` of the run's head (a fork for fork PRs). */
  headRepo: string | null;
  /** The event that triggered the reviewed run (`pull_request`, `push`…). */
  event: string;
  conclusion: string | null;
}

export interface RunContext {
  repo: Repo;
  eventName: string;
  /** Commit of the running workflow (`GITHUB_SHA`). */
  sha: string;
  runId: number;
  /** Set on pull_request events. */
  pullRequest: PullRequestRef | null;
  /** Set on workflow_run events. */
  workflowRun: WorkflowRunRef | null;
  defaultBranch: string | null;
  serverUrl: string;
}

/** The parts of `@actions/github`'s `Context` read here. */
export interface ActionsContextLike {
  payload: Record<string, unknown>;
  eventName: string;
  sha: string;
  runId: number;
  serverUrl: string;
  repo: Repo;
}

function record(value: unknown): Record<string, unknown> | null {
  return typeof value === 'object' && value !== null && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : null;
}

function text(value: unknown): string | null {
  return typeof value === 'string' && value !== '' ? value : null;
}

function fullName(repo: unknown): string | null {
  return text(record(repo)?.['full_name']);
}

export function buildRunContext(ctx: ActionsContextLike): RunContext {
  const payload = ctx.payload;
  const pr = record(payload['pull_request']);
  const head = record(pr?.['head']);
  const base = record(pr?.['base']);
  const number = pr?.['number'];
  const run = record(payload['workflow_run']);
  return {
    repo: ctx.repo,
    eventName: ctx.eventName,
    sha: ctx.sha,
    runId: ctx.runId,
    pullRequest:
      pr !== null && typeof number === 'number'
        ? {
            number,
            headSha: text(head?.['sha']) ?? ctx.sha,
            baseRef: text(base?.['ref']) ?? '',
            headRepo: fullName(head?.['repo']),
          }
        : null,
    workflowRun:
      run !== null && typeof run['id'] === 'number'
        ? {
            id: run['id'],
            headSha: text(run['head_sha']) ?? '',
            headRepo: fullName(run['head_repository']),
            event: text(run['event']) ?? '',
            conclusion: text(run['conclusion']),
          }
        : null,
    defaultBranch: text(record(payload['repository'])?.['default_branch']),
    serverUrl: ctx.serverUrl,
  };
}
