/**
 * fitgap's one living PR comment: found by its hidden marker AND its author (the token's own user
 * when that can be known, as with a personal access token; else a bot) over every page, edited
 * only when the body changed, never written by a run for an older head commit, and de-duplicated
 * after a create (the oldest comment of ours is kept). A body GitHub refuses as too long (422) is
 * replaced once by a short pointer to the job summary.
 */
import { buildMarker, parseMarker } from '../../report/marker.js';
import type { GitHubClient } from './client.js';
import type { Repo } from './context.js';
import type { Identity } from './identity.js';

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
  /** Who the token writes as (see `identity.ts`); default: some bot. */
  identity?: Identity;
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

  const create = () =>
    shrinkOn422(options, body, async (text) => {
      const { data } = await octokit.rest.issues.createComment({
        ...repo,
        issue_number: pullNumber,
        body: text,
      });
      return data;
    });

  if (options.mode === 'new') {
    const data = await create();
    return { action: 'created', id: data.id, url: data.html_url };
  }

  const identity = options.identity ?? { kind: 'bot' };
  const ours = await listOurComments(options, identity);
  const [target, ...duplicates] = ours;
  if (target === undefined) return dedupeAfterCreate(options, body, await create());
  await deleteComments(options, duplicates);
  if (target.body === body) return { action: 'unchanged', id: target.id, url: target.html_url };
  const data = await update(options, target.id, body);
  return { action: 'updated', id: data.id, url: data.html_url };
}

function update(options: PublishCommentOptions, id: number, body: string) {
  return shrinkOn422(options, body, async (text) => {
    const { data } = await options.octokit.rest.issues.updateComment({
      ...options.repo,
      comment_id: id,
      body: text,
    });
    return data;
  });
}

/**
 * Sends the body; when GitHub answers 422 (a body it counts as too long, or any validation it
 * refuses), sends the short pointer instead, once. The pointer's own refusal is the caller's.
 */
async function shrinkOn422<T>(
  options: PublishCommentOptions,
  body: string,
  send: (text: string) => Promise<T>,
): Promise<T> {
  try {
    return await send(body);
  } catch (error) {
    const status = (error as { status?: unknown } | null)?.status;
    const pointer = pointerBody(options, body.length);
    if (status !== 422 || body === pointer) throw error;
    return send(pointer);
  }
}

/** Concurrent runs may both create: keep the oldest comment of ours, delete the later ones. */
async function dedupeAfterCreate(
  options: PublishCommentOptions,
  body: string,
  created: CommentLike,
): Promise<CommentOutcome> {
  // Once our comment exists its author is known: only that author's comments count now.
  const ours = await listOurComments(
    options,
    created.user === null
      ? (options.identity ?? { kind: 'bot' })
      : { kind: 'user', login: created.user.login },
  );
  const [oldest, ...later] = ours;
  if (oldest === undefined || oldest.id === created.id) {
    await deleteComments(options, later);
    return { action: 'created', id: created.id, url: created.html_url };
  }
  await deleteComments(options, later);
  if (oldest.body === body) return { action: 'unchanged', id: oldest.id, url: oldest.html_url };
  const data = await update(options, oldest.id, body);
  return { action: 'updated', id: data.id, url: data.html_url };
}

/** Our comments for this key, oldest first. */
async function listOurComments(
  options: PublishCommentOptions,
  identity: Identity,
): Promise<CommentLike[]> {
  const ours: CommentLike[] = [];
  const pages = options.octokit.paginate.iterator(options.octokit.rest.issues.listComments, {
    ...options.repo,
    issue_number: options.pullNumber,
    per_page: 100,
  });
  for await (const page of pages) {
    for (const comment of page.data) {
      if (isOurs(comment, options.key, identity)) ours.push(comment);
    }
  }
  return ours.sort((a, b) => a.created_at.localeCompare(b.created_at) || a.id - b.id);
}

/**
 * Marker with our key, written by us: by the token's user when it is known (a personal access
 * token), else by a bot. A person quoting the marker is never ours.
 */
export function isOurs(
  comment: CommentLike,
  key: string,
  identity: Identity = { kind: 'bot' },
): boolean {
  const user = comment.user;
  if (user === null) return false;
  if (identity.kind === 'user' ? user.login !== identity.login : user.type !== 'Bot') return false;
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
  return body.length <= MAX_COMMENT_CHARS ? body : pointerBody(options, body.length);
}

function pointerBody(options: PublishCommentOptions, length: number): string {
  const where =
    options.runUrl === undefined ? 'the job summary' : `the [job summary](${options.runUrl})`;
  return (
    `${buildMarker({ key: options.key, head: options.headSha })}\n` +
    `fitgap's review is ${length} characters long, more than a comment can hold ` +
    `(${MAX_COMMENT_CHARS}). Read it in ${where}.\n`
  );
}
