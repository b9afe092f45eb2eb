/**
 * Review mode: review the candidate against the baseline, then publish in this order: job summary,
 * JSON report (and, on a pull request, the bundle of runs for a publish workflow), outputs,
 * comment, gate. The gate is applied even when commenting fails.
 */
import { basename, isAbsolute, join, relative, resolve } from 'node:path';
import { renderMarkdown } from '../../report/markdown.js';
import { reviewFiles } from '../../io/review-from-files.js';
import { resolveBaseline } from './baseline.js';
import type { PublishDeps } from './publish-steps.js';
import { commentStep, gateCheckStep, gateFailure, setReviewOutputs } from './publish-steps.js';
import { writeReportFiles } from './report-files.js';

export async function runReview(deps: PublishDeps): Promise<void> {
  const { settings, context, io } = deps;
  const baseline = await resolveBaseline(deps);
  const result = await reviewFiles({
    baseline,
    candidate: settings.candidate ?? '',
    ...(settings.config === null ? {} : { config: settings.config }),
    cwd: settings.workspace,
    overrides: settings.overrides,
    overrideLabel: (name) => `input "${name}"`,
    limits: settings.limits,
  });
  const { review, files: inputs } = result;
  const pr = context.pullRequest;
  const headSha = pr?.headSha ?? context.sha;
  // Paths as a reader knows them (workspace-relative, or the artifact's name), so that the same
  // inputs give the same comment body on every run and an unchanged comment is not edited.
  const shown = (path: string): string => {
    const inside = relative(settings.workspace, resolve(settings.workspace, path));
    if (inside !== '' && !inside.startsWith('..') && !isAbsolute(inside)) return inside;
    const artifact = settings.baselineArtifact;
    return artifact === null ? basename(path) : `artifact ${artifact}: ${basename(path)}`;
  };
  const provenance = {
    files: [
      { label: 'baseline', ...inputs.baseline, path: shown(inputs.baseline.path) },
      { label: 'candidate', ...inputs.candidate, path: shown(inputs.candidate.path) },
      ...(inputs.config === null
        ? []
        : [{ label: 'config', ...inputs.config, path: shown(inputs.config.path) }]),
    ],
  };
  const body = renderMarkdown(review, { commentKey: settings.commentKey, headSha, provenance });

  await io.appendSummary(body);
  const files = await writeReportFiles(
    join(settings.tempDir, `fitgap-${settings.commentKey}`, 'report'),
    review,
  );
  if (pr !== null) {
    // Inputs for a publish workflow, which recomputes the review on the trusted side.
    const { writeBundle } = await import('../../io/bundle.js');
    await writeBundle(files.dir, result.runs, {
      format: 'fitgap-pull-request/1',
      repository: `${context.repo.owner}/${context.repo.repo}`,
      number: pr.number,
      headSha: pr.headSha,
    });
  }
  setReviewOutputs(io, review, files.path, files.dir);

  const problems: string[] = [];
  if (pr !== null) {
    const problem = await commentStep(deps, { pullNumber: pr.number, headSha }, body);
    if (problem !== null) problems.push(problem);
  }
  if (settings.statusCheck === 'check-run' || settings.statusCheck === 'commit-status') {
    const problem = await gateCheckStep(deps, settings.statusCheck, headSha, review, body);
    if (problem !== null) problems.push(problem);
  }
  if (!review.gate.pass) problems.unshift(gateFailure(review));
  if (problems.length > 0) io.setFailed(problems.join('\n'));
}
