/**
 * Re-runs a past review through the GitHub API: the two commits of a pull request (or two commits
 * named directly), each side's run artifact read either as a committed file (contents API) or out
 * of the artifact of a successful workflow run for that commit (the lookup and the careful unzip
 * the action uses). Base side of a PR: its base commit's run, else the newest successful run on the
 * base branch, said plainly in the result.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { join } from 'node:path';
import type { PullRequestAudit, SourceFile } from '../model/audit.js';
import type { ConfigFile } from '../model/config.js';
import { InputError } from '../model/errors.js';
import { downloadArtifact, findArtifact, pickRunFiles } from './github/artifacts.js';
import type { RunFilter } from './github/artifacts.js';
import type { GitHubClient } from './github/client.js';
import type { Repo } from './github/context.js';
import { filesBeside, loadSide, sideSources } from './audit-side.js';
import type { SideFile } from './audit-side.js';
import { reviewLoadedRuns } from './review-from-files.js';
import type { InputFile, SettingsOverrides } from './review-from-files.js';

/** Where each side's run artifact lives. */
export type AuditArtifactSource =
  /** A file committed at that commit, read through the contents API. */
  | { kind: 'contents'; path: string }
  /** The artifact `name` of a successful run of `workflow` for that commit. */
  | { kind: 'run-artifact'; workflow: string | number; name: string; preferredName: string | null };

export interface GitHubAuditOptions {
  octokit: GitHubClient;
  repo: Repo;
  source: AuditArtifactSource;
  config: ConfigFile;
  configFile: InputFile | null;
  overrides?: SettingsOverrides;
  tempDir: string;
  /** Most bytes of one file, one archive, and the bytes inflated from it. */
  limitBytes: number;
}

const short = (sha: string): string => sha.slice(0, 7);

interface Fetched {
  commit: string;
  artifact: SideFile;
  beside: SideFile[];
  from?: { name: string; runId: number };
  note: string | null;
}

function isStatus(error: unknown, status: number): boolean {
  return (error as { status?: unknown } | null)?.status === status;
}

/** A committed file's bytes at `ref`, or null when it does not exist there. */
async function readContents(
  options: GitHubAuditOptions,
  path: string,
  ref: string,
): Promise<Uint8Array | null> {
  const { octokit, repo } = options;
  let data: unknown;
  try {
    ({ data } = await octokit.rest.repos.getContent({ ...repo, path, ref }));
  } catch (error) {
    if (isStatus(error, 404)) return null;
    throw error;
  }
  const file = data as { type?: string; size?: number; encoding?: string; content?: string };
  const label = `${path} at ${short(ref)}`;
  if (Array.isArray(data) || file.type !== 'file') {
    throw new InputError([
      {
        file: label,
        pointer: '',
        expected: 'must be a file',
        got: Array.isArray(data) ? 'a folder' : String(file.type),
      },
    ]);
  }
  if ((file.size ?? 0) > options.limitBytes) {
    throw new InputError([
      {
        file: label,
        pointer: '',
        expected: `must be at most ${options.limitBytes} bytes`,
        got: `${file.size} bytes`,
      },
    ]);
  }
  if (file.encoding === 'base64' && typeof file.content === 'string')
    return Buffer.from(file.content, 'base64');
  // Files over 1 MB come without content: ask for the raw bytes.
  const raw = await octokit.request('GET /repos/{owner}/{repo}/contents/{path}', {
    ...repo,
    path,
    ref,
    mediaType: { format: 'raw' },
  });
  const body: unknown = raw.data;
  const bytes =
    typeof body === 'string' ? Buffer.from(body, 'utf8') : new Uint8Array(body as ArrayBuffer);
  if (bytes.length > options.limitBytes) {
    throw new InputError([
      {
        file: label,
        pointer: '',
        expected: `must be at most ${options.limitBytes} bytes`,
        got: `${bytes.length} bytes`,
      },
    ]);
  }
  return bytes;
}

async function fromContents(
  options: GitHubAuditOptions,
  path: string,
  commit: string,
): Promise<Fetched> {
  const bytes = await readContents(options, path, commit);
  if (bytes === null) {
    throw new InputError([
      {
        file: `${path} at ${short(commit)}`,
        pointer: '',
        expected: 'must exist in the repository at that commit',
        got: 'no such file',
        hint: 'Check the path, or read the run artifact of a workflow run instead.',
      },
    ]);
  }
  const beside: SideFile[] = [];
  for (const other of filesBeside(path, bytes, options.config['epoch-log'])) {
    const found = await readContents(options, other, commit);
    if (found !== null) beside.push({ path: other, bytes: found });
  }
  return { commit, artifact: { path, bytes }, beside, note: null };
}

async function fromRun(
  options: GitHubAuditOptions,
  source: Extract<AuditArtifactSource, { kind: 'run-artifact' }>,
  filter: RunFilter,
  side: string,
  headRepository?: string,
): Promise<Fetched> {
  const { octokit, repo } = options;
  const artifact = await findArtifact({
    octokit,
    repo,
    workflow: source.workflow,
    filter,
    name: source.name,
    label: `${side} side`,
    ...(headRepository === undefined ? {} : { headRepository }),
  });
  const zip = await downloadArtifact({ octokit, repo, artifact, limitBytes: options.limitBytes });
  const label = `artifact "${source.name}" (run ${artifact.runId})`;
  const picked = pickRunFiles(zip, {
    preferredName: source.preferredName,
    limitBytes: options.limitBytes,
    label,
  });
  let commit = 'sha' in filter ? filter.sha : '';
  if (commit === '') {
    const { data } = await octokit.rest.actions.getWorkflowRun({ ...repo, run_id: artifact.runId });
    commit = data.head_sha;
  }
  const files = [...picked.files].map(([path, bytes]) => ({ path, bytes }));
  return {
    commit,
    artifact: files.find((f) => f.path === picked.run) ?? {
      path: picked.run,
      bytes: new Uint8Array(),
    },
    beside: files.filter((f) => f.path !== picked.run),
    from: { name: source.name, runId: artifact.runId },
    note: null,
  };
}

async function fetchSide(
  options: GitHubAuditOptions,
  side: 'base' | 'head',
  sha: string,
  fallback: { branch: string } | null,
  headRepository?: string,
): Promise<Fetched> {
  const source = options.source;
  if (source.kind === 'contents') return fromContents(options, source.path, sha);
  try {
    return await fromRun(options, source, { sha }, side, headRepository);
  } catch (error) {
    if (!(error instanceof InputError) || fallback === null) throw error;
    const found = await fromRun(options, source, fallback, side);
    return {
      ...found,
      note: `No successful run of the base commit ${short(sha)} kept the artifact; the base side is the newest successful run on branch ${fallback.branch} (commit ${short(found.commit)}), which may be later than the pull request.`,
    };
  }
}

async function review(
  options: GitHubAuditOptions,
  base: Fetched,
  head: Fetched,
): Promise<Pick<PullRequestAudit, 'review' | 'sources'>> {
  const root = await mkdtemp(join(options.tempDir, 'fitgap-audit-'));
  try {
    const epochLog = options.config['epoch-log'];
    const load = (f: Fetched, dir: string) =>
      loadSide({
        dir: join(root, dir),
        artifact: f.artifact,
        beside: f.beside,
        displayName:
          f.from === undefined
            ? `${short(f.commit)}:${f.artifact.path}`
            : `${f.from.name}@${f.from.runId}:${f.artifact.path}`,
        ...(epochLog === undefined ? {} : { epochLog }),
      });
    const baseline = await load(base, 'base');
    const candidate = await load(head, 'head');
    const result = await reviewLoadedRuns(baseline, candidate, options.config, options.overrides);
    const config: SourceFile[] =
      options.configFile === null ? [] : [{ commit: null, ...options.configFile }];
    return {
      review: result,
      sources: [
        ...sideSources(base.commit, base.artifact, base.beside, base.from),
        ...sideSources(head.commit, head.artifact, head.beside, head.from),
        ...config,
      ],
    };
  } finally {
    await rm(root, { recursive: true, force: true });
  }
}

export async function auditPullRequest(
  options: GitHubAuditOptions & { pullNumber: number },
): Promise<PullRequestAudit> {
  const { octokit, repo } = options;
  let pull;
  try {
    ({ data: pull } = await octokit.rest.pulls.get({ ...repo, pull_number: options.pullNumber }));
  } catch (error) {
    if (!isStatus(error, 404)) throw error;
    throw new InputError([
      {
        file: `pull request #${options.pullNumber}`,
        pointer: '',
        expected: `must exist in ${repo.owner}/${repo.repo}`,
        got: 'not found',
      },
    ]);
  }
  const headRepository = pull.head.repo?.full_name;
  const base = await fetchSide(options, 'base', pull.base.sha, { branch: pull.base.ref });
  const head = await fetchSide(options, 'head', pull.head.sha, null, headRepository);
  return {
    repository: `${repo.owner}/${repo.repo}`,
    pullNumber: options.pullNumber,
    base: { commit: base.commit, note: base.note },
    head: { commit: head.commit, note: head.note },
    ...(await review(options, base, head)),
  };
}

/** A commit named by sha (full or short) or ref, resolved through the API. */
async function resolveCommit(options: GitHubAuditOptions, ref: string, what: string) {
  try {
    const { data } = await options.octokit.rest.repos.getCommit({ ...options.repo, ref });
    return data.sha;
  } catch (error) {
    if (!isStatus(error, 404) && !isStatus(error, 422)) throw error;
    throw new InputError([
      {
        file: what,
        pointer: '',
        expected: `must name a commit of ${options.repo.owner}/${options.repo.repo}`,
        got: JSON.stringify(ref),
      },
    ]);
  }
}

export async function auditCommitPair(
  options: GitHubAuditOptions & { base: string; head: string; labels?: [string, string] },
): Promise<PullRequestAudit> {
  const [baseLabel, headLabel] = options.labels ?? ['base commit', 'head commit'];
  const baseSha = await resolveCommit(options, options.base, baseLabel);
  const headSha = await resolveCommit(options, options.head, headLabel);
  const base = await fetchSide(options, 'base', baseSha, null);
  const head = await fetchSide(options, 'head', headSha, null);
  return {
    repository: `${options.repo.owner}/${options.repo.repo}`,
    pullNumber: null,
    base: { commit: base.commit, note: base.note },
    head: { commit: head.commit, note: head.note },
    ...(await review(options, base, head)),
  };
}
