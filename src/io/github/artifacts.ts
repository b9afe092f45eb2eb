/**
 * Workflow artifacts of other runs: find the newest successful run of a workflow on a branch (or
 * for a commit) that still holds an artifact, download its zip (the API answers 302 to a short-lived
 * URL, which the client follows) and pick the needed files out of it with the limits of `zip.ts`.
 */
import { posix } from 'node:path';
import { InputError } from '../../model/errors.js';
import type { GitHubClient } from './client.js';
import type { Repo } from './context.js';
import { listEntries, readEntry } from './zip.js';
import type { InflateBudget, ZipEntry } from './zip.js';

export interface ArtifactRef {
  id: number;
  name: string;
  sizeInBytes: number;
  runId: number;
}

/** `branch` or full commit `sha` whose runs are searched. */
export type RunFilter = { branch: string } | { sha: string };

export interface FindArtifactOptions {
  octokit: GitHubClient;
  repo: Repo;
  /** Workflow file name (`train.yml`) or numeric id. */
  workflow: string | number;
  filter: RunFilter;
  name: string;
  /** The running workflow run, never its own baseline. */
  excludeRunId?: number;
  /** Runs inspected at most, newest first. @default 5 */
  maxRuns?: number;
  /** `owner/repo` whose runs count (a fork PR's runs carry the fork). @default this repository */
  headRepository?: string;
  /** What the not-found message blames. @default 'input "baseline-artifact"' */
  label?: string;
}

/** The workflow file name from `owner/repo/.github/workflows/train.yml@refs/heads/main`. */
export function workflowFileFromRef(ref: string): string | null {
  const match = /\/\.github\/workflows\/([^@/]+)@/.exec(ref);
  return match?.[1] ?? null;
}

/** The newest successful run's artifact of that name. Throws `InputError` naming what was searched. */
export async function findArtifact(options: FindArtifactOptions): Promise<ArtifactRef> {
  const { octokit, repo, filter, name } = options;
  const fullName = options.headRepository ?? `${repo.owner}/${repo.repo}`;
  const { data } = await octokit.rest.actions.listWorkflowRuns({
    ...repo,
    workflow_id: options.workflow,
    status: 'success',
    per_page: 20,
    ...('branch' in filter ? { branch: filter.branch } : { head_sha: filter.sha }),
  });
  const runs = data.workflow_runs
    .filter((run) => run.id !== options.excludeRunId)
    // A fork's branch can share the base branch's name: only runs of this repository count,
    // and on a branch only runs of pushes and other non-PR events (a PR run tests a merge).
    .filter((run) => (run.head_repository?.full_name ?? fullName) === fullName)
    .filter((run) => !('branch' in filter) || !run.event.startsWith('pull_request'))
    .slice(0, options.maxRuns ?? 5);
  for (const run of runs) {
    const { data: listed } = await octokit.rest.actions.listWorkflowRunArtifacts({
      ...repo,
      run_id: run.id,
      name,
      per_page: 100,
    });
    const artifact = listed.artifacts.find((a) => a.name === name && !a.expired);
    if (artifact !== undefined) {
      return { id: artifact.id, name, sizeInBytes: artifact.size_in_bytes, runId: run.id };
    }
  }
  const where = 'branch' in filter ? `on branch "${filter.branch}"` : `for commit ${filter.sha}`;
  throw new InputError([
    {
      file: options.label ?? 'input "baseline-artifact"',
      pointer: '',
      expected:
        `found no artifact named "${name}" in the ${runs.length} newest successful runs of ` +
        `workflow "${options.workflow}" ${where}`,
      hint:
        'Check that this workflow uploads an artifact with that name, that it succeeded there ' +
        'within the retention period, and that the job has "actions: read" permission.',
    },
  ]);
}

export interface DownloadOptions {
  octokit: GitHubClient;
  repo: Repo;
  artifact: ArtifactRef;
  limitBytes: number;
}

/** The artifact's zip, refused before download when its listed size is over the limit. */
export async function downloadArtifact(options: DownloadOptions): Promise<Uint8Array> {
  const { artifact, limitBytes } = options;
  const label = `artifact "${artifact.name}" (run ${artifact.runId})`;
  const tooBig = (size: number) =>
    new InputError([
      {
        file: label,
        pointer: '',
        expected: `must be at most ${limitBytes} bytes`,
        got: `${size} bytes`,
        hint: 'Raise "archive-limit-mb" if the archive is genuine.',
      },
    ]);
  if (artifact.sizeInBytes > limitBytes) throw tooBig(artifact.sizeInBytes);
  const response = await options.octokit.rest.actions.downloadArtifact({
    ...options.repo,
    artifact_id: artifact.id,
    archive_format: 'zip',
  });
  const zip = new Uint8Array(response.data as ArrayBuffer);
  if (zip.length > limitBytes) throw tooBig(zip.length);
  return zip;
}

export interface PickOptions {
  /** Prefer the run file with this base name (the candidate's), else the only `.json` entry. */
  preferredName: string | null;
  limitBytes: number;
  label: string;
}

export interface PickedFiles {
  /** Archive path of the run artifact. */
  run: string;
  /** Archive path → bytes: the run artifact and, when it names one inside the archive, its predictions. */
  files: Map<string, Uint8Array>;
}

/** Picks the run artifact (and its predictions CSV) out of an archive; nothing else is inflated. */
export function pickRunFiles(zip: Uint8Array, options: PickOptions): PickedFiles {
  const { label } = options;
  const entries = listEntries(zip, label).filter((e) => !e.directory);
  const json = entries.filter((e) => e.name.toLowerCase().endsWith('.json'));
  const byName = json.filter((e) => posix.basename(e.name) === options.preferredName);
  const run = byName.length === 1 ? byName[0] : json.length === 1 ? json[0] : undefined;
  if (run === undefined) {
    throw new InputError([
      {
        file: label,
        pointer: '',
        expected:
          options.preferredName === null
            ? 'must hold exactly one .json run artifact'
            : `must hold one run artifact named "${options.preferredName}" or exactly one .json file`,
        got: json.length === 0 ? 'none' : json.map((e) => JSON.stringify(e.name)).join(', '),
      },
    ]);
  }
  const budget: InflateBudget = { remaining: options.limitBytes, limit: options.limitBytes };
  const runBytes = readEntry(zip, run, budget, label);
  const files = new Map<string, Uint8Array>([[run.name, runBytes]]);
  const predictions = predictionsEntry(runBytes, run.name, entries);
  if (predictions !== undefined)
    files.set(predictions.name, readEntry(zip, predictions, budget, label));
  return { run: run.name, files };
}

function predictionsEntry(
  runBytes: Uint8Array,
  runName: string,
  entries: ZipEntry[],
): ZipEntry | undefined {
  let path: unknown;
  try {
    const doc: unknown = JSON.parse(new TextDecoder().decode(runBytes));
    const predictions = (doc as { predictions?: { path?: unknown } } | null)?.predictions;
    path = predictions?.path;
  } catch {
    return undefined; // the core reports the broken JSON with its file name
  }
  if (typeof path !== 'string') return undefined;
  const wanted = posix.normalize(posix.join(posix.dirname(runName), path));
  return entries.find((e) => e.name === wanted);
}
