/**
 * Audit mode (for `workflow_dispatch`): re-run the review of a past pull request, or of two
 * commits, from each side's run artifact (a successful run's artifact, or the committed file),
 * then publish in this order: job summary, JSON report and JSON Lines record (files and outputs),
 * the comment (only when asked, marked as an audit re-run, under its own key), the gate (only when
 * `fail-on` is given: an audit reports by default).
 */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { gateReasonLines } from '../../report/gate.js';
import { plainText } from '../../report/escape.js';
import { auditCommitPair, auditPullRequest } from '../../io/audit-github.js';
import type { GitHubAuditOptions } from '../../io/audit-github.js';
import { publishComment } from '../../io/github/comment.js';
import { loadReviewConfig } from '../../io/review-from-files.js';
import type { PullRequestAudit } from '../../model/audit.js';
import { pullRequestRecord, recordLine } from '../../report/audit-record.js';
import {
  auditCommentKey,
  renderPullRequestAuditMarkdown,
} from '../../report/audit-pull-request.js';
import type { AuditSettings } from './audit-settings.js';
import { describeRequestError, isRequestError } from './failure.js';
import type { PublishDeps } from './publish-steps.js';
import { runUrl, setReviewOutputs } from './publish-steps.js';
import { writeReportFiles } from './report-files.js';
import pkg from '../../../package.json' with { type: 'json' };

export const AUDIT_FILE = 'audit.jsonl';

export interface AuditDeps extends PublishDeps {
  audit: AuditSettings;
  /** The clock, for the record's `recordedAt`. */
  now: () => Date;
}

export async function runAudit(deps: AuditDeps): Promise<void> {
  const { settings, context, io, audit } = deps;
  const octokit = await deps.client();
  const overrides = settings.overrides;
  const { config, file: configFile } = await loadReviewConfig(
    settings.workspace,
    settings.config ?? undefined,
    settings.limits,
  );
  const dir = join(settings.tempDir, `fitgap-${settings.commentKey}`, 'audit');
  await mkdir(dir, { recursive: true });
  const options: GitHubAuditOptions = {
    octokit,
    repo: context.repo,
    source: audit.source,
    config,
    configFile,
    overrides,
    tempDir: dir,
    limitBytes: settings.archiveLimitBytes,
  };
  const target = audit.target;
  const result: PullRequestAudit =
    'pullNumber' in target
      ? await auditPullRequest({ ...options, pullNumber: target.pullNumber })
      : await auditCommitPair({
          ...options,
          base: target.base,
          head: target.head,
          labels: ['input "base-sha"', 'input "head-sha"'],
        });
  const version = pkg.version;
  const body = renderPullRequestAuditMarkdown(result, {
    version,
    commentKey: settings.commentKey,
  });
  await io.appendSummary(body);

  const report = await writeReportFiles(join(dir, 'report'), result.review);
  const line = recordLine(
    pullRequestRecord(result, { recordedAt: deps.now().toISOString(), fitgapVersion: version }),
  );
  const recordPath = join(report.dir, AUDIT_FILE);
  await writeFile(recordPath, line);
  setReviewOutputs(io, result.review, report.path, report.dir);
  io.setOutput('audit-record', line.trimEnd());
  io.setOutput('audit-record-path', recordPath);
  io.info(
    `Audit re-run: base ${result.base.commit}, head ${result.head.commit}; record in ${recordPath}.`,
  );

  const problems: string[] = [];
  if (audit.comment) {
    if (result.pullNumber === null) {
      io.warning('"audit-comment" needs "pull-request": no pull request to comment on.');
    } else {
      const problem = await comment(deps, result.pullNumber, result.head.commit, body);
      if (problem !== null) problems.push(problem);
    }
  }
  if (overrides.failOn !== undefined && !result.review.gate.pass)
    problems.unshift(
      `fitgap gate failed:\n${gateReasonLines(result.review, plainText)
        .map((r) => `- ${r}`)
        .join('\n')}`,
    );
  if (problems.length > 0) io.setFailed(problems.join('\n'));
}

async function comment(
  deps: AuditDeps,
  pullNumber: number,
  headSha: string,
  body: string,
): Promise<string | null> {
  const { settings, context, io } = deps;
  const octokit = await deps.client();
  try {
    const outcome = await publishComment({
      octokit,
      repo: context.repo,
      pullNumber,
      headSha,
      key: auditCommentKey(settings.commentKey),
      body,
      mode: 'update',
      runUrl: runUrl(context),
      currentHead: headSha,
    });
    if (outcome.action !== 'stale') {
      io.info(`Audit comment ${outcome.action}: ${outcome.url}`);
      io.setOutput('comment-url', outcome.url);
    }
    return null;
  } catch (error) {
    if (isRequestError(error))
      return `Could not post the audit comment on PR #${pullNumber}: ${describeRequestError(error)}`;
    throw error;
  }
}
