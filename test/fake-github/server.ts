/**
 * A fake GitHub REST API: a real node:http server on 127.0.0.1 (ephemeral port) with scripted
 * per-operation handlers and a request log that tests assert on
 * (`["GET /repos/o/r/issues/7/comments?per_page=100", …]`). Every JSON answer of an API operation
 * is checked against GitHub's OpenAPI description; mismatches land in `violations`.
 */
import { createServer } from 'node:http';
import type { IncomingHttpHeaders, Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { checkResponse } from './openapi.js';

export interface FakeRequest {
  method: string;
  /** Path and query, as logged. */
  path: string;
  url: URL;
  params: Record<string, string>;
  headers: IncomingHttpHeaders;
  body: unknown;
}

export interface FakeResponse {
  status: number;
  /** JSON body (validated for API operations). */
  body?: unknown;
  /** Raw bytes (downloads outside the API); not validated. */
  raw?: Uint8Array;
  headers?: Record<string, string>;
}

export type Handler = (request: FakeRequest) => FakeResponse | Promise<FakeResponse>;

interface Route {
  operation: string;
  method: string;
  pattern: RegExp;
  names: string[];
  handler: Handler;
  /** One-shot answers served before the handler. */
  queue: Handler[];
  api: boolean;
}

function compile(path: string): { pattern: RegExp; names: string[] } {
  const names: string[] = [];
  const source = path
    .replace(/[.*+?^$()|[\]\\]/g, '\\$&')
    .replace(/\\?\{([a-z_]+)\\?\}/g, (_m, name: string) => {
      names.push(name);
      return '([^/]+)';
    });
  return { pattern: new RegExp(`^${source}$`), names };
}

export class FakeGitHub {
  readonly log: string[] = [];
  readonly violations: string[] = [];
  private readonly routes: Route[] = [];
  private server: Server | null = null;
  private base = '';

  /** Base URL, e.g. `http://127.0.0.1:40123`. */
  get url(): string {
    return this.base;
  }

  /** Handles an API operation named as in GitHub's OpenAPI description: `GET /repos/{owner}/{repo}/pulls/{pull_number}`. */
  on(operation: string, handler: Handler): this {
    return this.add(operation, handler, true);
  }

  /** Handles a non-API URL (an artifact's storage location); answers are not validated. */
  onRaw(operation: string, handler: Handler): this {
    return this.add(operation, handler, false);
  }

  /** Answers the next calls of an operation with these, in order, then falls back to its handler. */
  queue(operation: string, ...answers: Handler[]): this {
    const route = this.routes.find((r) => r.operation === operation);
    if (route === undefined) throw new Error(`no handler for ${operation}`);
    route.queue.push(...answers);
    return this;
  }

  private add(operation: string, handler: Handler, api: boolean): this {
    const [method = '', path = ''] = operation.split(' ');
    const existing = this.routes.find((r) => r.operation === operation);
    if (existing !== undefined) {
      existing.handler = handler;
      return this;
    }
    this.routes.push({ operation, method, ...compile(path), handler, queue: [], api });
    return this;
  }

  async start(): Promise<this> {
    this.server = createServer((req, res) => {
      const chunks: Buffer[] = [];
      req.on('data', (c: Buffer) => chunks.push(c));
      req.on('end', () => {
        void this.dispatch(
          req.method ?? 'GET',
          req.url ?? '/',
          req.headers,
          Buffer.concat(chunks),
        ).then((answer) => {
          res.writeHead(answer.status, answer.headers);
          res.end(answer.payload);
        });
      });
    });
    await new Promise<void>((resolve) => this.server?.listen(0, '127.0.0.1', resolve));
    const { port } = this.server.address() as AddressInfo;
    this.base = `http://127.0.0.1:${port}`;
    return this;
  }

  async close(): Promise<void> {
    const server = this.server;
    if (server === null) return;
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private async dispatch(
    method: string,
    rawUrl: string,
    headers: IncomingHttpHeaders,
    raw: Buffer,
  ) {
    const url = new URL(rawUrl, this.base);
    const path = `${url.pathname}${url.search}`;
    this.log.push(`${method} ${path}`);
    let body: unknown = undefined;
    if (raw.length > 0) {
      try {
        body = JSON.parse(raw.toString('utf8'));
      } catch {
        body = raw.toString('utf8');
      }
    }
    for (const route of this.routes) {
      if (route.method !== method) continue;
      const match = route.pattern.exec(url.pathname);
      if (match === null) continue;
      const params = Object.fromEntries(
        route.names.map((n, i) => [n, decodeURIComponent(match[i + 1] ?? '')]),
      );
      const handler = route.queue.shift() ?? route.handler;
      let answer: FakeResponse;
      try {
        answer = await handler({ method, path, url, params, headers, body });
      } catch (error) {
        this.violations.push(`${method} ${path}: handler threw ${String(error)}`);
        answer = {
          status: 500,
          body: { message: 'fake handler failed', documentation_url: 'https://docs.invalid' },
        };
      }
      if (route.api && answer.raw === undefined) {
        this.violations.push(...checkResponse(route.operation, answer.status, answer.body));
      }
      return encode(answer);
    }
    this.violations.push(`${method} ${path}: no route`);
    return encode({
      status: 404,
      body: { message: 'Not Found', documentation_url: 'https://docs.invalid' },
    });
  }
}

function encode(answer: FakeResponse) {
  const headers: Record<string, string> = { ...answer.headers };
  let payload: Uint8Array | string = '';
  if (answer.raw !== undefined) {
    payload = answer.raw;
    headers['content-type'] ??= 'application/zip';
  } else if (answer.body !== undefined && answer.status !== 204) {
    payload = JSON.stringify(answer.body);
    headers['content-type'] ??= 'application/json; charset=utf-8';
  }
  return { status: answer.status, headers, payload };
}

/** GitHub's error body. */
export function apiError(
  status: number,
  message: string,
  headers: Record<string, string> = {},
): FakeResponse {
  return { status, headers, body: { message, documentation_url: 'https://docs.github.com/rest' } };
}
