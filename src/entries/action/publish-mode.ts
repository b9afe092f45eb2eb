/**
 * Publish mode, for a `workflow_run` workflow (the fork-safe pattern): download the report
 * artifact of the triggering run, treat it as untrusted (validate its shape; check the PR number
 * against the API, the head sha against the event), then comment and publish the gate as a check
 * run on that head sha. The job's own status does not attach to the PR, so the gate lives in the
 * check; the step fails only when publishing fails.
 */
import { applyGate } from '../../analysis/gate.js';
import { InputError } from '../../model/errors.js';
import type { Issue } from '../../model/errors.js';
import { downloadArtifact } from '../../io/github/artifacts.js';
import type { WorkflowRunRef } from '../../io/github/context.js';
import { listEntries, readEntry } from '../../io/github/zip.js';
import { plainText } from '../../report/escape.js';
import { gateReasonLines } from '../../report/gate.js';
import { renderMarkdown } from '../../report/markdown.js';
import { isFailOn } from '../../model/settings.js';
import { PULL_REQUEST_FILE, REVIEW_FILE, readPullRequestNote, readReview } from './bundle.js';
import type { PublishDeps } from './publish-steps.js';
import { commentStep, gateCheckStep, setReviewOutputs } from './publish-steps.js';
import { writeReportFiles } from './report-files.js';
import { join } from 'node:path';

function refuse(issue: Omit<Issue, 'pointer'> & { pointer?: string }): never {
  throw new InputError([{ pointer: '', ...issue }]);
}

export async function runPublish(deps: PublishDeps): Promise<void> {
  const { settings, context, octokit, io } = deps;
  const run = context.workflowRun;
  if (run === null || context.eventName !== 'workflow_run') {
    refuse({
      file: 'input "mode"',
      expected: 'may be "publish" only in a workflow triggered by workflow_run',
      got: JSON.stringify(context.eventName),
    });
  }
  const files = await downloadBundle(deps, run);
  const label = `artifact "${settings.reportArtifact}" (run ${run.id})`;
  const note = readPullRequestNote(files.note, label);
  const untrusted = readReview(files.review, label);
  // The gate policy is the publish workflow's (trusted), applied to the reported outcome.
  const failOn = settings.failOn?.filter(isFailOn) ?? untrusted.settings.failOn;
  const review = { ...untrusted, settings: { ...untrusted.settings, failOn } };
  review.gate = applyGate(review, failOn);
  const fullName = `${context.repo.owner}/${context.repo.repo}`;
  if (note.repository !== fullName || note.headSha !== run.headSha) {
    refuse({
      file: `${label} ${PULL_REQUEST_FILE}`,
      expected: `must name this repository (${fullName}) and the run's head commit (${run.headSha})`,
      got: `${note.repository} at ${note.headSha}`,
    });
  }
  const { data: pull } = await octokit.rest.pulls.get({
    ...context.repo,
    pull_number: note.number,
  });
  const pullHeadRepo = pull.head.repo?.full_name ?? null;
  if (pullHeadRepo !== run.headRepo) {
    refuse({
      file: `${label} ${PULL_REQUEST_FILE}`,
      expected: `must name a PR whose head is in ${run.headRepo ?? 'the run head repository'}`,
      got: `PR #${note.number} from ${pullHeadRepo ?? 'a deleted repository'}`,
    });
  }

  let body: string;
  try {
    body = renderMarkdown(review, { commentKey: settings.commentKey, headSha: run.headSha });
  } catch (error) {
    refuse({
      file: `${label} ${REVIEW_FILE}`,
      expected: 'must be a complete fitgap-review/1 report',
      got: String(error),
    });
  }
  await io.appendSummary(body);
  const written = await writeReportFiles(
    join(settings.tempDir, `fitgap-${settings.commentKey}`, 'report'),
    review,
    note,
  );
  setReviewOutputs(io, review, written.path, written.dir);

  const problems: string[] = [];
  const comment = await commentStep(
    deps,
    { pullNumber: note.number, headSha: run.headSha, currentHead: pull.head.sha },
    body,
  );
  if (comment !== null) problems.push(comment);
  const kind = settings.statusCheck === 'auto' ? 'check-run' : settings.statusCheck;
  if (kind !== 'off') {
    const problem = await gateCheckStep(deps, kind, run.headSha, review, body);
    if (problem !== null) problems.push(problem);
  }
  if (!review.gate.pass)
    io.info(
      `Gate failed (published on ${run.headSha}): ${gateReasonLines(review, plainText).join('; ')}`,
    );
  if (problems.length > 0) io.setFailed(problems.join('\n'));
}

async function downloadBundle(deps: PublishDeps, run: WorkflowRunRef) {
  const { settings, context, octokit } = deps;
  const name = settings.reportArtifact;
  const { data } = await octokit.rest.actions.listWorkflowRunArtifacts({
    ...context.repo,
    run_id: run.id,
    name,
    per_page: 100,
  });
  const artifact = data.artifacts.find((a) => a.name === name && !a.expired);
  if (artifact === undefined) {
    refuse({
      file: 'input "report-artifact"',
      expected: `must name an artifact of the triggering run ${run.id} (conclusion ${run.conclusion ?? 'unknown'})`,
      got: JSON.stringify(name),
      hint: 'Upload the "report-dir" output of the review step under this name, also when the gate fails (if: always()).',
    });
  }
  const zip = await downloadArtifact({
    octokit,
    repo: context.repo,
    artifact: { id: artifact.id, name, sizeInBytes: artifact.size_in_bytes, runId: run.id },
    limitBytes: settings.archiveLimitBytes,
  });
  const label = `artifact "${name}" (run ${run.id})`;
  const entries = listEntries(zip, label);
  const budget = { remaining: settings.archiveLimitBytes, limit: settings.archiveLimitBytes };
  const read = (file: string) => {
    const entry = entries.find((e) => e.name === file);
    if (entry === undefined) refuse({ file: label, expected: `must hold ${file} at its root` });
    return readEntry(zip, entry, budget, label);
  };
  return { note: read(PULL_REQUEST_FILE), review: read(REVIEW_FILE) };
}
