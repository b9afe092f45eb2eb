import { describe, test } from 'vitest';
import { MAX_COMMENT_CHARS, isOurs, publishComment } from '../../src/io/github/comment.js';
import { BOT, PERSON } from '../fake-github/repo.js';
import { fakeGitHub } from './fixture.js';

const HEAD = '1'.repeat(40);
const repo = { owner: 'o', repo: 'r' };
const marker = (key = 'default', head = HEAD) => `<!-- fitgap:review key=${key} head=${head} -->`;

describe.concurrent('publishComment', () => {
  test('concurrent creates: the later comment of ours is deleted, the oldest kept and updated', async (context) => {
    const { expect } = context;
    const { fake, repo: gh, octokit } = await fakeGitHub(context);
    gh.pulls.set(7, { headSha: HEAD, headRepo: 'o/r', baseRef: 'main' });
    // Another run creates its comment between our lookup and our create.
    fake.queue('POST /repos/{owner}/{repo}/issues/{issue_number}/comments', (request) => {
      const theirs = gh.addComment(`${marker()}\nthe other run`, BOT);
      const ours = gh.addComment(String((request.body as { body: string }).body), BOT);
      expect(theirs.id).toBeLessThan(ours.id);
      return { status: 201, body: gh.commentJson(ours) };
    });
    const outcome = await publishComment({
      octokit,
      repo,
      pullNumber: 7,
      headSha: HEAD,
      key: 'default',
      body: `${marker()}\nours`,
      mode: 'update',
    });
    expect(fake.violations).toEqual([]);
    expect(gh.comments).toHaveLength(1);
    expect(gh.comments[0]?.body).toBe(`${marker()}\nours`);
    expect(outcome).toMatchObject({ action: 'updated', id: gh.comments[0]?.id });
    expect(fake.log.filter((l) => !l.startsWith('GET'))).toEqual([
      'POST /repos/o/r/issues/7/comments',
      `DELETE /repos/o/r/issues/comments/${(gh.comments[0]?.id ?? 0) + 1}`,
      `PATCH /repos/o/r/issues/comments/${gh.comments[0]?.id}`,
    ]);
  });

  test('duplicates left by an earlier race are cleaned up on the next update', async (context) => {
    const { expect } = context;
    const { fake, repo: gh, octokit } = await fakeGitHub(context);
    gh.pulls.set(7, { headSha: HEAD, headRepo: 'o/r', baseRef: 'main' });
    const first = gh.addComment(`${marker()}\nold`, BOT);
    const second = gh.addComment(`${marker()}\nold`, BOT);
    const outcome = await publishComment({
      octokit,
      repo,
      pullNumber: 7,
      headSha: HEAD,
      key: 'default',
      body: `${marker()}\nnew`,
      mode: 'update',
    });
    expect(outcome).toMatchObject({ action: 'updated', id: first.id });
    expect(gh.comments.map((c) => c.id)).toEqual([first.id]);
    expect(fake.log).toContain(`DELETE /repos/o/r/issues/comments/${second.id}`);
  });

  test('a body over the limit becomes a short pointer to the job summary, never a cut report', async (context) => {
    const { expect } = context;
    const { repo: gh, octokit } = await fakeGitHub(context);
    gh.pulls.set(7, { headSha: HEAD, headRepo: 'o/r', baseRef: 'main' });
    await publishComment({
      octokit,
      repo,
      pullNumber: 7,
      headSha: HEAD,
      key: 'default',
      mode: 'update',
      body: `${marker()}\n${'x'.repeat(MAX_COMMENT_CHARS)}`,
      runUrl: 'https://github.invalid/o/r/actions/runs/1',
    });
    const body = gh.comments[0]?.body ?? '';
    expect(body.length).toBeLessThan(500);
    expect(body).toContain(marker());
    expect(body).toContain('[job summary](https://github.invalid/o/r/actions/runs/1)');
  });

  test('a body without the marker gets it, keyed and with the head', async (context) => {
    const { expect } = context;
    const { repo: gh, octokit } = await fakeGitHub(context);
    gh.pulls.set(7, { headSha: HEAD, headRepo: 'o/r', baseRef: 'main' });
    await publishComment({
      octokit,
      repo,
      pullNumber: 7,
      headSha: HEAD,
      key: 'ranker',
      body: 'plain',
      mode: 'new',
    });
    expect(gh.comments[0]?.body).toBe(`${marker('ranker')}\nplain`);
  });
});

test('isOurs: marker with our key and a bot author; a person quoting it never', ({ expect }) => {
  const c = (body: string, user = BOT) => ({ id: 1, body, html_url: '', created_at: '', user });
  expect(isOurs(c(marker()), 'default')).toBe(true);
  expect(isOurs(c(`> ${marker()}`, PERSON), 'default')).toBe(false);
  expect(isOurs(c(marker('other')), 'default')).toBe(false);
  expect(isOurs(c('no marker'), 'default')).toBe(false);
  expect(isOurs(c(marker()), 'default', { kind: 'user', login: 'some-app[bot]' })).toBe(false);
  expect(isOurs({ ...c(marker()), user: null }, 'default')).toBe(false);
});
