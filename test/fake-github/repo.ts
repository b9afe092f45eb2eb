/**
 * An in-memory repository behind the fake server, with GitHub's semantics for the operations
 * fitgap uses: paginated issue comments with Link headers, pulls, check runs, commit statuses,
 * workflow runs, artifacts and their 302 download. Objects start from the examples in GitHub's
 * OpenAPI description, so they carry every required field.
 */
import { example } from './openapi.js';
import { apiError } from './server.js';
import type { FakeGitHub, FakeRequest, FakeResponse } from './server.js';

type Json = Record<string, unknown>;

export interface User {
  login: string;
  type: 'Bot' | 'User';
}

export const BOT: User = { login: 'github-actions[bot]', type: 'Bot' };
export const PERSON: User = { login: 'octo-reviewer', type: 'User' };
export const TOKEN = 'ghs_faketoken0123456789';
/** A personal access token; it writes as MAINTAINER, a person. */
export const PAT = 'ghp_fakepersonaltoken0123';
export const MAINTAINER: User = { login: 'octo-maintainer', type: 'User' };

/** Who a token writes as, or null for a token GitHub does not know. */
export function userOf(authorization: string | undefined): User | null {
  if (authorization === `token ${TOKEN}`) return BOT;
  if (authorization === `token ${PAT}`) return MAINTAINER;
  return null;
}

export interface Comment {
  id: number;
  body: string;
  user: User;
  created_at: string;
}

export interface WorkflowRun {
  id: number;
  workflowFile: string;
  headSha: string;
  headBranch: string;
  event: string;
  conclusion: 'success' | 'failure';
  headRepo: string;
}

export interface Artifact {
  id: number;
  runId: number;
  name: string;
  zip: Uint8Array;
  /** Size the API reports; defaults to the zip's length. */
  sizeInBytes?: number;
  expired?: boolean;
}

export class FakeRepo {
  readonly owner = 'o';
  readonly repo = 'r';
  comments: Comment[] = [];
  pulls = new Map<
    number,
    { headSha: string; headRepo: string; baseRef: string; baseSha?: string }
  >();
  checkRuns: Json[] = [];
  statuses: Json[] = [];
  runs: WorkflowRun[] = [];
  artifacts: Artifact[] = [];
  /** Committed files: commit sha → path → bytes (contents API). */
  files = new Map<string, Map<string, Uint8Array>>();
  private nextId = 1000;
  private clock = Date.parse('2026-11-30T10:00:00Z');

  constructor(private readonly server: FakeGitHub) {}

  get fullName(): string {
    return `${this.owner}/${this.repo}`;
  }

  id(): number {
    return this.nextId++;
  }

  /** Strictly increasing timestamps, one second apart. */
  now(): string {
    this.clock += 1000;
    return new Date(this.clock).toISOString().replace('.000Z', 'Z');
  }

  addComment(body: string, user: User): Comment {
    const comment = { id: this.id(), body, user, created_at: this.now() };
    this.comments.push(comment);
    return comment;
  }

  commentJson(c: Comment): Json {
    const base = example('issue-comment');
    const user = {
      ...(base['user'] as Json),
      login: c.user.login,
      type: c.user.type,
      id: c.user.type === 'Bot' ? 41898282 : 7,
    };
    return {
      ...base,
      id: c.id,
      node_id: `IC_${c.id}`,
      url: `${this.server.url}/repos/o/r/issues/comments/${c.id}`,
      html_url: `https://github.invalid/o/r/pull/7#issuecomment-${c.id}`,
      issue_url: `${this.server.url}/repos/o/r/issues/7`,
      body: c.body,
      user,
      created_at: c.created_at,
      updated_at: c.created_at,
      performed_via_github_app: null,
    };
  }

  pullJson(number: number): Json | null {
    const pull = this.pulls.get(number);
    if (pull === undefined) return null;
    const base = example('pull-request');
    const head = base['head'] as Json;
    const headRepo = {
      ...(head['repo'] as Json),
      full_name: pull.headRepo,
      name: pull.headRepo.split('/')[1],
    };
    return {
      ...base,
      number,
      requested_teams: [],
      head: { ...head, sha: pull.headSha, repo: headRepo, ref: 'feature' },
      base: {
        ...(base['base'] as Json),
        ref: pull.baseRef,
        ...(pull.baseSha === undefined ? {} : { sha: pull.baseSha }),
      },
    };
  }

  runJson(run: WorkflowRun): Json {
    const base = example('workflow-run');
    return {
      ...base,
      id: run.id,
      head_sha: run.headSha,
      head_branch: run.headBranch,
      event: run.event,
      status: 'completed',
      conclusion: run.conclusion,
      path: `.github/workflows/${run.workflowFile}`,
      head_repository: { ...(base['head_repository'] as Json), full_name: run.headRepo },
      pull_requests: [],
    };
  }

  artifactJson(a: Artifact): Json {
    const base = (example<Json>('artifact-paginated')['artifacts'] as Json[])[0] ?? {};
    return {
      ...base,
      id: a.id,
      name: a.name,
      size_in_bytes: a.sizeInBytes ?? a.zip.length,
      expired: a.expired ?? false,
      url: `${this.server.url}/repos/o/r/actions/artifacts/${a.id}`,
      archive_download_url: `${this.server.url}/repos/o/r/actions/artifacts/${a.id}/zip`,
      workflow_run: { ...(base['workflow_run'] as Json), id: a.runId },
    };
  }

  /** Registers GitHub's behaviour for every operation fitgap uses. */
  install(): this {
    const s = this.server;
    const authed =
      (handler: (r: FakeRequest, user: User) => FakeResponse) =>
      (r: FakeRequest): FakeResponse => {
        const user = userOf(r.headers.authorization);
        return user === null ? apiError(401, 'Bad credentials') : handler(r, user);
      };
    s.on(
      'GET /user',
      authed((_r, user) => {
        // An installation token may not ask who it is.
        if (user.type === 'Bot') return apiError(403, 'Resource not accessible by integration');
        const base = example('private-user');
        return { status: 200, body: { ...base, login: user.login, type: user.type } };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/issues/{issue_number}/comments',
      authed((r) => {
        const perPage = Math.min(Number(r.url.searchParams.get('per_page') ?? 30), 100);
        const page = Number(r.url.searchParams.get('page') ?? 1);
        const items = this.comments
          .slice((page - 1) * perPage, page * perPage)
          .map((c) => this.commentJson(c));
        const last = Math.max(1, Math.ceil(this.comments.length / perPage));
        const link = (p: number) => `<${s.url}${r.url.pathname}?per_page=${perPage}&page=${p}>`;
        const links =
          page < last ? [`${link(page + 1)}; rel="next"`, `${link(last)}; rel="last"`] : [];
        return {
          status: 200,
          body: items,
          headers: links.length > 0 ? { link: links.join(', ') } : {},
        };
      }),
    );
    s.on(
      'POST /repos/{owner}/{repo}/issues/{issue_number}/comments',
      authed((r, user) => {
        const body = String((r.body as Json)['body']);
        if (body.length > 65_536) return apiError(422, 'Validation Failed');
        const comment = this.addComment(body, user);
        return { status: 201, body: this.commentJson(comment) };
      }),
    );
    s.on(
      'PATCH /repos/{owner}/{repo}/issues/comments/{comment_id}',
      authed((r, user) => {
        const comment = this.comments.find((c) => c.id === Number(r.params['comment_id']));
        if (comment === undefined) return apiError(404, 'Not Found');
        if (comment.user.login !== user.login)
          return apiError(403, 'Resource not accessible by integration');
        const body = String((r.body as Json)['body']);
        if (body.length > 65_536) return apiError(422, 'Validation Failed');
        comment.body = body;
        return { status: 200, body: this.commentJson(comment) };
      }),
    );
    s.on(
      'DELETE /repos/{owner}/{repo}/issues/comments/{comment_id}',
      authed((r) => {
        const index = this.comments.findIndex((c) => c.id === Number(r.params['comment_id']));
        if (index < 0) return apiError(404, 'Not Found');
        this.comments.splice(index, 1);
        return { status: 204 };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/pulls/{pull_number}',
      authed((r) => {
        const pull = this.pullJson(Number(r.params['pull_number']));
        return pull === null ? apiError(404, 'Not Found') : { status: 200, body: pull };
      }),
    );
    s.on(
      'POST /repos/{owner}/{repo}/check-runs',
      authed((r) => {
        const input = r.body as Json;
        const run = {
          ...example('check-run-example-of-completed-conclusion'),
          id: this.id(),
          name: input['name'],
          head_sha: input['head_sha'],
          status: input['status'],
          conclusion: input['conclusion'],
          details_url: input['details_url'] ?? null,
          html_url: `https://github.invalid/o/r/runs/${this.nextId}`,
          output: {
            ...(input['output'] as Json),
            text: null,
            annotations_count: 0,
            annotations_url: `${s.url}/x`,
          },
        };
        this.checkRuns.push(run);
        return { status: 201, body: run };
      }),
    );
    s.on(
      'POST /repos/{owner}/{repo}/statuses/{sha}',
      authed((r) => {
        const input = r.body as Json;
        const status = {
          ...example('status'),
          id: this.id(),
          state: input['state'],
          context: input['context'],
          description: input['description'] ?? null,
          target_url: input['target_url'] ?? null,
          sha: r.params['sha'],
        };
        this.statuses.push(status);
        return { status: 201, body: status };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/actions/workflows/{workflow_id}/runs',
      authed((r) => {
        const q = r.url.searchParams;
        const runs = this.runs
          .filter((run) => run.workflowFile === r.params['workflow_id'])
          .filter((run) => q.get('status') !== 'success' || run.conclusion === 'success')
          .filter((run) => !q.has('branch') || run.headBranch === q.get('branch'))
          .filter((run) => !q.has('head_sha') || run.headSha === q.get('head_sha'))
          .sort((a, b) => b.id - a.id)
          .slice(0, Number(q.get('per_page') ?? 30));
        return {
          status: 200,
          body: { total_count: runs.length, workflow_runs: runs.map((run) => this.runJson(run)) },
        };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/actions/runs/{run_id}/artifacts',
      authed((r) => {
        const name = r.url.searchParams.get('name');
        const list = this.artifacts
          .filter((a) => a.runId === Number(r.params['run_id']))
          .filter((a) => name === null || a.name === name);
        return {
          status: 200,
          body: { total_count: list.length, artifacts: list.map((a) => this.artifactJson(a)) },
        };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/actions/artifacts/{artifact_id}/{archive_format}',
      authed((r) => {
        const artifact = this.artifacts.find((a) => a.id === Number(r.params['artifact_id']));
        if (artifact === undefined) return apiError(404, 'Not Found');
        // GitHub answers 302 to a storage URL that expires after a minute.
        return {
          status: 302,
          headers: { location: `${s.url}/storage/artifacts/${artifact.id}.zip?sig=abc` },
        };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/actions/runs/{run_id}',
      authed((r) => {
        const run = this.runs.find((x) => x.id === Number(r.params['run_id']));
        return run === undefined
          ? apiError(404, 'Not Found')
          : { status: 200, body: this.runJson(run) };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/commits/{ref}',
      authed((r) => {
        const ref = r.params['ref'] ?? '';
        const found = [...this.files.keys()].filter(
          (sha) => sha.startsWith(ref) && ref.length >= 4,
        );
        if (found.length !== 1)
          return apiError(found.length === 0 ? 404 : 422, 'No commit found for SHA: ' + ref);
        const sha = found[0] ?? '';
        return {
          status: 200,
          body: { ...example<Json>('commit'), sha, node_id: `C_${sha}`, files: [] },
        };
      }),
    );
    s.on(
      'GET /repos/{owner}/{repo}/contents/{path}',
      authed((r) => {
        const path = r.params['path'] ?? '';
        const ref = r.url.searchParams.get('ref') ?? '';
        const bytes = this.files.get(ref)?.get(path);
        if (bytes === undefined) return apiError(404, 'Not Found');
        const base = example<Json>('content-file-response-if-content-is-a-file');
        return {
          status: 200,
          body: {
            ...base,
            type: 'file',
            encoding: 'base64',
            size: bytes.length,
            name: path.split('/').pop(),
            path,
            content: Buffer.from(bytes).toString('base64'),
          },
        };
      }),
    );
    s.onRaw('GET /storage/artifacts/{file}', (r) => {
      const artifact = this.artifacts.find((a) => `${a.id}.zip` === r.params['file']);
      return artifact === undefined
        ? { status: 404, raw: new Uint8Array() }
        : { status: 200, raw: artifact.zip };
    });
    return this;
  }
}
