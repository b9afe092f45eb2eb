/**
 * Publish mode, for a `workflow_run` workflow (the fork-safe pattern). The triggering run is
 * untrusted: it uploaded run artifacts, not conclusions. This step downloads them, refuses
 * anything but the known files, reads each one as untrusted input (size, schema, paths), checks
 * the PR note against the event and the API, recomputes the review itself with the trusted config
 * and inputs, and then comments and publishes the gate as a check run on the PR's head commit.
 * Nothing from the upload is rendered but artifact strings, which the renderer escapes. The job's
 * own status does not attach to the PR, so the gate lives in the check; the step fails only when
 * publishing fails.
 */
import { join } from 'node:path';
import { InputError } from '../../model/errors.js';
import type { Issue } from '../../model/errors.js';
import { downloadArtifact } from '../../io/github/artifacts.js';
import type { WorkflowRunRef } from '../../io/github/context.js';
import { PULL_REQUEST_FILE, RUN_FILE, extractBundle } from '../../io/bundle.js';
import { resolveLimits, reviewFiles } from '../../io/review-from-files.js';
import { plainText } from '../../report/escape.js';
import { gateReasonLines } from '../../report/gate.js';
import { renderMarkdown } from '../../report/markdown.js';
import { resolveBaseline } from './baseline.js';
import type { PublishDeps } from './publish-steps.js';
import { commentStep, gateCheckStep, setReviewOutputs } from './publish-steps.js';
import { writeReportFiles } from './report-files.js';

function refuse(issue: Omit<Issue, 'pointer'> & { pointer?: string }): never {
  throw new InputError([{ pointer: '', ...issue }]);
}

export async function runPublish(deps: PublishDeps): Promise<void> {
  const { settings, context, io } = deps;
  const run = context.workflowRun;
  if (run === null || context.eventName !== 'workflow_run') {
    refuse({
      file: 'input "mode"',
      expected: 'may be "publish" only in a workflow triggered by workflow_run',
      got: JSON.stringify(context.eventName),
    });
  }
  const label = `artifact "${settings.reportArtifact}" (run ${run.id})`;
  const zip = await downloadUpload(deps, run);
  const work = join(settings.tempDir, `fitgap-${settings.commentKey}`);
  const bundle = await extractBundle({
    zip,
    label,
    tempDir: join(work, 'upload'),
    limitBytes: settings.archiveLimitBytes,
    limits: resolveLimits({}, settings.limits),
  });
  const note = bundle.note;
  const fullName = `${context.repo.owner}/${context.repo.repo}`;
  if (note.repository !== fullName || note.headSha !== run.headSha) {
    refuse({
      file: `${label} ${PULL_REQUEST_FILE}`,
      expected: `must name this repository (${fullName}) and the run's head commit (${run.headSha})`,
      got: `${note.repository} at ${note.headSha}`,
    });
  }
  const octokit = await deps.client();
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

  // The baseline: the uploaded one, or (given "baseline" or "baseline-artifact") a trusted one.
  const trustedBaseline = settings.baseline !== null || settings.baselineArtifact !== null;
  const baseline = trustedBaseline
    ? await resolveBaseline(deps, pull.base.ref)
    : bundle.runs.baseline;
  const uploaded = (side: string) => `${label} ${side}/${RUN_FILE}`;
  const result = await reviewFiles({
    baseline,
    candidate: bundle.runs.candidate,
    ...(settings.config === null ? {} : { config: settings.config }),
    cwd: settings.workspace,
    overrides: settings.overrides,
    overrideLabel: (name) => `input "${name}"`,
    limits: settings.limits,
    // The upload holds the runs as the PR side reviewed them, an epoch log already merged.
    epochLogs: false,
    names: {
      candidate: uploaded('candidate'),
      ...(trustedBaseline
        ? settings.baseline !== null
          ? { baseline: settings.baseline }
          : { baseline: `artifact ${settings.baselineArtifact ?? ''}: ${RUN_FILE}` }
        : { baseline: uploaded('baseline') }),
    },
  });
  const { review, files } = result;
  const provenance = {
    files: [
      { label: 'baseline', ...files.baseline },
      { label: 'candidate', ...files.candidate },
      ...(files.config === null ? [] : [{ label: 'config', ...files.config }]),
    ],
  };
  const body = renderMarkdown(review, {
    commentKey: settings.commentKey,
    headSha: run.headSha,
    provenance,
  });
  await io.appendSummary(body);
  const written = await writeReportFiles(join(work, 'report'), review);
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

/** The triggering run's upload, refused before download when listed over the archive limit. */
async function downloadUpload(deps: PublishDeps, run: WorkflowRunRef): Promise<Uint8Array> {
  const { settings, context } = deps;
  const octokit = await deps.client();
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
  return downloadArtifact({
    octokit,
    repo: context.repo,
    artifact: { id: artifact.id, name, sizeInBytes: artifact.size_in_bytes, runId: run.id },
    limitBytes: settings.archiveLimitBytes,
  });
}
