/**
 * The REST client: `@octokit/rest` with the official retry and throttling plugins, bounded.
 * Built by an entry from its settings, so the action and the CLI's audits share it.
 */
import { Octokit } from '@octokit/rest';
import { retry } from '@octokit/plugin-retry';
import { throttling } from '@octokit/plugin-throttling';

export type GitHubClient = InstanceType<typeof Octokit>;

export interface ClientOptions {
  baseUrl: string;
  token: string;
  /** Retries of a 5xx answer (each waits retry² units). */
  retries: number;
  /** Milliseconds per delay unit (1000 in production). */
  delayUnitMs: number;
  /** Rate-limit retries allowed per request. @default 2 */
  rateLimitRetries?: number;
  /** Longest `retry-after` (seconds) worth waiting for; longer limits fail the request. @default 120 */
  maxRateLimitWaitS?: number;
  /** Space writes as GitHub asks (1 s, 3 s for posts that notify). Unit tests turn it off. @default true */
  throttle?: boolean;
  /** Transport, e.g. a proxy-aware fetch. */
  fetch?: typeof fetch;
  /**
   * Milliseconds a request may take before it is abandoned (and retried like a 5xx).
   * @default 30000
   */
  timeoutMs?: number;
  /** Receives one line per retry or rate-limit wait. */
  log?: (message: string) => void;
}

const Client = Octokit.plugin(retry, throttling);

/**
 * A fetch that gives up after `ms`. The timeout is raised as a network failure (a `TypeError`
 * with a cause), which octokit turns into a request error with status 500 and the retry plugin
 * retries; its message says what happened.
 */
export function fetchWithTimeout(base: typeof fetch, ms: number): typeof fetch {
  return async (input, init) => {
    const timeout = AbortSignal.timeout(ms);
    const signal = init?.signal ? AbortSignal.any([init.signal, timeout]) : timeout;
    try {
      return await base(input, { ...init, signal });
    } catch (error) {
      if (timeout.aborted)
        throw new TypeError('fetch failed', {
          cause: new Error(`no answer within ${Math.round(ms / 100) / 10} s (timed out)`),
        });
      throw error;
    }
  };
}

export function createClient(options: ClientOptions): GitHubClient {
  const limitRetries = options.rateLimitRetries ?? 2;
  const maxWait = options.maxRateLimitWaitS ?? 120;
  const log = options.log ?? (() => undefined);
  const onLimit =
    (kind: string) =>
    (retryAfter: number, request: { method: string; url: string }, _o: unknown, count: number) => {
      const again = count < limitRetries && retryAfter <= maxWait;
      log(
        `${kind} rate limit on ${request.method} ${request.url}: ` +
          (again ? `retrying after ${retryAfter} s` : 'giving up'),
      );
      return again;
    };
  return new Client({
    baseUrl: options.baseUrl,
    auth: options.token,
    userAgent: 'fitgap-action',
    request: {
      fetch: fetchWithTimeout(options.fetch ?? globalThis.fetch, options.timeoutMs ?? 30_000),
    },
    // 429 is left to the throttling plugin, which honours retry-after.
    retry: {
      retries: options.retries,
      retryAfterBaseValue: options.delayUnitMs,
      doNotRetry: [400, 401, 403, 404, 410, 422, 429, 451],
    },
    throttle: {
      enabled: options.throttle ?? true,
      retryAfterBaseValue: options.delayUnitMs,
      fallbackSecondaryRateRetryAfter: 60,
      onRateLimit: onLimit('primary'),
      onSecondaryRateLimit: onLimit('secondary'),
    },
    log: { debug: () => undefined, info: () => undefined, warn: log, error: log },
  });
}
