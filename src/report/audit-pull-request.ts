/**
 * A re-run of a past pull request's review (or of any two commits): the full review, preceded by a
 * banner that marks it as an audit re-run and says where each side's artifact came from. Markdown
 * for job summaries and the (opt-in) comment; text for the terminal. Pure.
 */
import type { PullRequestAudit, SourceFile } from '../model/audit.js';
import type { ProvenanceFile } from './method.js';
import { escapeInline, terminalText } from './escape.js';
import { renderMarkdown } from './markdown.js';
import { renderText } from './text.js';
import { short } from './audit-table.js';

/** The comment key of audit re-runs, so they never replace the PR's own review comment. */
export function auditCommentKey(key: string): string {
  return `${key.slice(0, 58)}.audit`;
}

function subject(audit: PullRequestAudit): string {
  return audit.pullNumber === null
    ? `commits ${short(audit.base.commit)} → ${short(audit.head.commit)}`
    : `PR #${audit.pullNumber} (base ${short(audit.base.commit)} → head ${short(audit.head.commit)})`;
}

function describe(file: SourceFile): string {
  const from =
    file.artifact === undefined
      ? `at ${file.commit === null ? 'the working tree' : short(file.commit)}`
      : `from artifact "${file.artifact.name}" of run ${file.artifact.runId}`;
  return `${file.path} ${from}`;
}

/** Banner lines as plain facts; the renderers escape them. */
function bannerFacts(audit: PullRequestAudit, version: string): string[] {
  return [
    `Audit re-run of ${audit.repository} ${subject(audit)}, recomputed by fitgap ${version} from the runs' artifacts; not the review the pull request showed at the time.`,
    ...[audit.base.note, audit.head.note].filter((n): n is string => n !== null),
  ];
}

export interface PullRequestAuditOptions {
  version: string;
  /** Key of the PR's own review comment; the audit uses `auditCommentKey(key)`. @default 'default' */
  commentKey?: string;
}

export function renderPullRequestAuditMarkdown(
  audit: PullRequestAudit,
  options: PullRequestAuditOptions,
): string {
  const files: ProvenanceFile[] = audit.sources.map((s) => ({
    label: s.commit === null ? 'config' : s.commit === audit.base.commit ? 'baseline' : 'candidate',
    path: describe(s),
    sha256: s.sha256,
  }));
  const body = renderMarkdown(audit.review, {
    commentKey: auditCommentKey(options.commentKey ?? 'default'),
    headSha: audit.head.commit,
    provenance: { files },
    // Room for the banner below GitHub's comment limit.
    maxLength: 60_000,
  });
  const newline = body.indexOf('\n');
  const banner = bannerFacts(audit, options.version)
    .map((fact, i) => `> ${i === 0 ? '**Audit re-run.** ' : ''}${escapeInline(fact, 400)}`)
    .join('\n>\n');
  return `${body.slice(0, newline + 1)}${banner}\n\n${body.slice(newline + 1)}`;
}

export function renderPullRequestAuditText(
  audit: PullRequestAudit,
  options: PullRequestAuditOptions & { color: boolean },
): string {
  const facts = bannerFacts(audit, options.version).map((f) => terminalText(f, 400));
  const sources = audit.sources.map(
    (s) => `  ${terminalText(describe(s), 200)}  sha256 ${s.sha256}`,
  );
  return [
    ...facts,
    'Sources:',
    ...sources,
    '',
    renderText(audit.review, { color: options.color }),
  ].join('\n');
}
