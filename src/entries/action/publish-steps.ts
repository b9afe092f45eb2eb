/**
 * The publishing steps both modes share: outputs, job summary, the comment (403 → warning) and
 * the gate as a check run or commit status.
 */
import type { Review } from '../../model/review.js';
import { publishGate } from '../../io/github/check.js';
import { escapeInline, plainText } from '../../report/escape.js';
import { gateReasonLines } from '../../report/gate.js';
import type { GitHubClient } from '../../io/github/client.js';
import { publishComment } from '../../io/github/comment.js';
import { resolveIdentity } from '../../io/github/identity.js';
import type { RunContext } from '../../io/github/context.js';
import { describeRequestError, isRequestError } from './failure.js';
import type { ActionIO } from './io.js';
import type { Settings } from './settings.js';

export interface PublishDeps {
  settings: Settings;
  context: RunContext;
  /** The REST client, built on first use (start-up loads no HTTP stack when nothing is sent). */
  client: () => Promise<GitHubClient>;
  io: ActionIO;
}

export function setReviewOutputs(
  io: ActionIO,
  review: Review,
  reportPath: string,
  reportDir: string,
) {
  io.setOutput('movement', review.movement);
  io.setOutput('validation-change', review.validation.change);
  io.setOutput('candidate-diagnosis', review.candidate.diagnosis);
  io.setOutput('gate', review.gate.pass ? 'pass' : 'fail');
  io.setOutput('report-path', reportPath);
  io.setOutput('report-dir', reportDir);
}

/** The step's failure message when the gate failed (one plain line per reason). */
export function gateFailure(review: Review): string {
  return `fitgap gate failed:\n${gateReasonLines(review, plainText)
    .map((r) => `- ${r}`)
    .join('\n')}`;
}

export function runUrl(context: RunContext): string {
  return `${context.serverUrl}/${context.repo.owner}/${context.repo.repo}/actions/runs/${context.runId}`;
}

/** Posts or updates the comment. Returns a problem to fail the step with, or null. */
export async function commentStep(
  deps: PublishDeps,
  target: { pullNumber: number; headSha: string; currentHead?: string },
  body: string,
): Promise<string | null> {
  const { settings, context, io } = deps;
  if (settings.comment === 'off') return null;
  const octokit = await deps.client();
  try {
    const identity =
      settings.comment === 'update'
        ? await resolveIdentity(octokit, settings.api.token)
        : undefined;
    const outcome = await publishComment({
      octokit,
      repo: context.repo,
      ...(identity === undefined ? {} : { identity }),
      pullNumber: target.pullNumber,
      headSha: target.headSha,
      key: settings.commentKey,
      body,
      mode: settings.comment,
      runUrl: runUrl(context),
      ...(target.currentHead === undefined ? {} : { currentHead: target.currentHead }),
    });
    if (outcome.action === 'stale') {
      io.info(
        `Not commenting: this review is for ${target.headSha}, but PR #${target.pullNumber} ` +
          `has moved on to ${outcome.currentHead}; the run for that commit reports it.`,
      );
      return null;
    }
    io.info(`Comment ${outcome.action}: ${outcome.url}`);
    io.setOutput('comment-url', outcome.url);
    return null;
  } catch (error) {
    if (isRequestError(error) && error.status === 403) {
      const text =
        `fitgap could not comment on PR #${target.pullNumber} (${describeRequestError(error)}). ` +
        'Fork PRs get a read-only token: use the two-workflow pattern (examples/fork-safe-*.yml), ' +
        'or grant "pull-requests: write". The review is in this job summary.';
      io.warning(text);
      await io.appendSummary(`\n> [!WARNING]\n> ${text}\n`);
      return null;
    }
    if (isRequestError(error))
      return `Could not publish the comment: ${describeRequestError(error)}`;
    throw error;
  }
}

/** Publishes the gate on a commit. Returns a problem to fail the step with, or null. */
export async function gateCheckStep(
  deps: PublishDeps,
  kind: 'check-run' | 'commit-status',
  sha: string,
  review: Review,
  body: string,
): Promise<string | null> {
  const { settings, context, io } = deps;
  const octokit = await deps.client();
  const name = settings.commentKey === 'default' ? 'fitgap' : `fitgap (${settings.commentKey})`;
  try {
    const outcome = await publishGate({
      octokit,
      repo: context.repo,
      sha,
      kind,
      name,
      pass: review.gate.pass,
      title: `${review.movement}; validation ${review.validation.change}`,
      summary: body,
      reasons: gateReasonLines(review, escapeInline),
      detailsUrl: runUrl(context),
    });
    io.info(
      `Gate published as a ${outcome.kind} on ${sha}: ${review.gate.pass ? 'pass' : 'fail'}.`,
    );
    return null;
  } catch (error) {
    if (isRequestError(error))
      return `Could not publish the gate ${kind}: ${describeRequestError(error)}`;
    throw error;
  }
}
