/**
 * Where the baseline run comes from: a file in the workspace, or an artifact of the newest
 * successful run of this workflow on the base branch (or for a commit), extracted under the
 * runner's temp folder.
 */
import { mkdir, mkdtemp, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { InputError } from '../../model/errors.js';
import type { RunFilter } from '../../io/github/artifacts.js';
import type { GitHubClient } from '../../io/github/client.js';
import type { RunContext } from '../../io/github/context.js';
import type { ActionIO } from './io.js';
import type { Settings } from './settings.js';

export interface BaselineDeps {
  settings: Settings;
  context: RunContext;
  /** The REST client, built on first use. */
  client: () => Promise<GitHubClient>;
  io: ActionIO;
}

/**
 * Absolute path of the baseline run artifact. `baseBranch` (publish mode: the PR's base branch)
 * replaces the branch the event names.
 */
export async function resolveBaseline(deps: BaselineDeps, baseBranch?: string): Promise<string> {
  const { settings, context, io } = deps;
  if (settings.baseline !== null) return resolve(settings.workspace, settings.baseline);
  const octokit = await deps.client();
  // Loaded only for a baseline from an artifact: the zip reader is not needed otherwise.
  const { downloadArtifact, findArtifact, pickRunFiles } =
    await import('../../io/github/artifacts.js');
  const name = settings.baselineArtifact ?? '';
  const filter =
    baseBranch !== undefined && settings.baselineRef === null
      ? { branch: baseBranch }
      : runFilter(settings, context);
  const workflow = await currentWorkflow(deps);
  const artifact = await findArtifact({
    octokit,
    repo: context.repo,
    workflow,
    filter,
    name,
    excludeRunId: context.runId,
  });
  io.info(`Baseline: artifact "${name}" (${artifact.sizeInBytes} bytes) of run ${artifact.runId}.`);
  const zip = await downloadArtifact({
    octokit,
    repo: context.repo,
    artifact,
    limitBytes: settings.archiveLimitBytes,
  });
  const picked = pickRunFiles(zip, {
    preferredName: settings.candidate === null ? null : basename(settings.candidate),
    limitBytes: settings.archiveLimitBytes,
    label: `artifact "${name}" (run ${artifact.runId})`,
  });
  const parent = join(settings.tempDir, `fitgap-${settings.commentKey}`);
  await mkdir(parent, { recursive: true });
  // A fresh folder: the archive's files never land on (or through) anything already there.
  const root = await mkdtemp(join(parent, 'baseline-'));
  for (const [entry, bytes] of picked.files) {
    const target = join(root, ...entry.split(/[\\/]/));
    await mkdir(dirname(target), { recursive: true });
    await writeFile(target, bytes, { flag: 'wx' });
  }
  return join(root, ...picked.run.split(/[\\/]/));
}

function runFilter(settings: Settings, context: RunContext): RunFilter {
  const ref = settings.baselineRef;
  if (ref !== null) return /^[0-9a-f]{40}$/.test(ref) ? { sha: ref } : { branch: ref };
  const branch = context.pullRequest?.baseRef || context.defaultBranch;
  if (branch === null || branch === '') {
    throw new InputError([
      {
        file: 'input "baseline-ref"',
        pointer: '',
        expected: 'is needed outside pull requests when the event names no default branch',
        hint: 'Set "baseline-ref" to a branch name or a full commit sha.',
      },
    ]);
  }
  return { branch };
}

/** The workflow to search: the input, else the running one (from GITHUB_WORKFLOW_REF or the run). */
async function currentWorkflow(deps: BaselineDeps): Promise<string | number> {
  if (deps.settings.baselineWorkflow !== null) return deps.settings.baselineWorkflow;
  const { workflowFileFromRef } = await import('../../io/github/artifacts.js');
  const fromRef =
    deps.settings.workflowRef === null ? null : workflowFileFromRef(deps.settings.workflowRef);
  if (fromRef !== null) return fromRef;
  const octokit = await deps.client();
  const { data } = await octokit.rest.actions.getWorkflowRun({
    ...deps.context.repo,
    run_id: deps.context.runId,
  });
  return data.workflow_id;
}
