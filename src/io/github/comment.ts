/**
 * fitgap's one living PR comment: found by its hidden marker AND a bot author over every page,
 * edited only when the body changed, never written by a run for an older head commit, and
 * de-duplicated after a create (the oldest comment of ours is kept).
 */
import { buildMarker, parseMarker } from '../../report/marker.js';
import type { GitHubClient } from './client.js';
import type { Repo } from './context.js';

/** GitHub rejects comment bodies longer than this (422 "Body is too long"). */
export const MAX_COMMENT_CHARS = 65_536;

export interface PublishCommentOptions {
  octokit: GitHubClient;
  repo: Repo;
  pullNumber: number;
  /** Head commit the report was made for. */
  headSha: string;
  key: string;
  /** The comment body; must carry the marker for `key` (it is added when missing). */
  body: string;
  /** `update`: keep one comment up to date; `new`: post a new comment every run. */
  mode: 'update' | 'new';
  /** Link to the run, used when the body is too long for a comment. */
  runUrl?: string;
  /** The PR's current head when the caller already fetched the PR; fetched otherwise. */
  currentHead?: string;
}

export type CommentOutcome =
  | { action: 'created' | 'updated' | 'unchanged'; id: number; url: string }
  /** The PR's head moved on: this run's report is for an older commit and was not posted. */
  | { action: 'stale'; currentHead: string };

interface CommentLike {
  id: number;
  body?: string | undefined;
  html_url: string;
  created_at: string;
  user: { login: string; type: string } | null;
}

export async function publishComment(options: PublishCommentOptions): Promise<CommentOutcome> {
  const { octokit, repo, pullNumber, key } = options;
  const body = fitBody(withMarker(options.body, key, options.headSha), options);
  const currentHead =
    options.currentHead ??
    (await octokit.rest.pulls.get({ ...repo, pull_number: pullNumber })).data.head.sha;
  if (currentHead !== options.headSha) return { action: 'stale', currentHead };

  if (options.mode === 'new') {
    const { data } = await octokit.rest.issues.createComment({
      ...repo,
      issue_number: pullNumber,
      body,
    });
    return { action: 'created', id: data.id, url: data.html_url };
  }

  const ours = await listOurComments(options, null);
  const [target, ...duplicates] = ours;
  if (target === undefined) {
    const { data: created } = await octokit.rest.issues.createComment({
      ...repo,
      issue_number: pullNumber,
      body,
    });
    return dedupeAfterCreate(options, body, created);
  }
  await deleteComments(options, duplicates);
  if (target.body === body) return { action: 'unchanged', id: target.id, url: target.html_url };
  const { data } = await octokit.rest.issues.updateComment({
    ...repo,
    comment_id: target.id,
    body,
  });
  return { action: 'updated', id: data.id, url: data.html_url };
}

/** Concurrent runs may both create: keep the oldest comment of ours, delete the later ones. */
async function dedupeAfterCreate(
  options: PublishCommentOptions,
  body: string,
  created: CommentLike,
): Promise<CommentOutcome> {
  const ours = await listOurComments(options, created.user?.login ?? null);
  const [oldest, ...later] = ours;
  if (oldest === undefined || oldest.id === created.id) {
    await deleteComments(options, later);
    return { action: 'created', id: created.id, url: created.html_url };
  }
  await deleteComments(options, later);
  if (oldest.body === body) return { action: 'unchanged', id: oldest.id, url: oldest.html_url };
  const { data } = await options.octokit.rest.issues.updateComment({
    ...options.repo,
    comment_id: oldest.id,
    body,
  });
  return { action: 'updated', id: data.id, url: data.html_url };
}

/** Our comments for this key, oldest first. `login` narrows to one author once it is known. */
async function listOurComments(
  options: PublishCommentOptions,
  login: string | null,
): Promise<CommentLike[]> {
  const ours: CommentLike[] = [];
  const pages = options.octokit.paginate.iterator(options.octokit.rest.issues.listComments, {
    ...options.repo,
    issue_number: options.pullNumber,
    per_page: 100,
  });
  for await (const page of pages) {
    for (const comment of page.data) {
      if (isOurs(comment, options.key, login)) ours.push(comment);
    }
  }
  return ours.sort((a, b) => a.created_at.localeCompare(b.created_at) || a.id - b.id);
}

/** Marker with our key, written by a bot: a person quoting the marker is never ours. */
export function isOurs(comment: CommentLike, key: string, login: string | null = null): boolean {
  if (comment.user?.type !== 'Bot') return false;
  if (login !== null && comment.user.login !== login) return false;
  return parseMarker(comment.body ?? '')?.key === key;
}

async function deleteComments(options: PublishCommentOptions, comments: CommentLike[]) {
  for (const comment of comments) {
    await options.octokit.rest.issues.deleteComment({ ...options.repo, comment_id: comment.id });
  }
}

function withMarker(body: string, key: string, headSha: string): string {
  return parseMarker(body)?.key === key ? body : `${buildMarker({ key, head: headSha })}\n${body}`;
}

/** A body over GitHub's limit is replaced by a short pointer, never cut mid-report. */
function fitBody(body: string, options: PublishCommentOptions): string {
  if (body.length <= MAX_COMMENT_CHARS) return body;
  const where =
    options.runUrl === undefined ? 'the job summary' : `the [job summary](${options.runUrl})`;
  return (
    `${buildMarker({ key: options.key, head: options.headSha })}\n` +
    `fitgap's review is ${body.length} characters long, more than a comment can hold ` +
    `(${MAX_COMMENT_CHARS}). Read it in ${where}.\n`
  );
}
