/**
 * The action's top-level error handler. User-fixable problems (bad input, refused archives, API
 * answers such as a missing permission) print one clear message; bugs print their stack too.
 * Anything thrown, Error or not, fails the step.
 */
import * as core from '@actions/core';
import { InputError, UsageError } from '../../model/errors.js';

interface RequestErrorLike {
  status: number;
  message: string;
  request: { method: string; url: string };
  /** Absent when no answer came (refused connection, timeout, DNS). */
  response?: unknown;
}

function isRequestError(error: unknown): error is RequestErrorLike {
  const e = error as Partial<RequestErrorLike> | null;
  return (
    typeof e === 'object' &&
    e !== null &&
    typeof e.status === 'number' &&
    typeof e.request?.method === 'string' &&
    typeof e.request.url === 'string'
  );
}

/**
 * One line for a failed GitHub API call: method, path (no host, no query), and either the status
 * and message of the answer or why no answer came.
 */
export function describeRequestError(error: RequestErrorLike): string {
  const path = new URL(error.request.url, 'http://api.invalid').pathname;
  const call = `GitHub API ${error.request.method} ${path}`;
  if (error.response === undefined) return `${call} could not be reached: ${error.message}`;
  const hint =
    error.status === 401
      ? ' (check the token given as "github-token")'
      : error.status === 404
        ? ' (check the repository, the number, and that the token may see them)'
        : '';
  return `${call} answered ${error.status}: ${error.message}${hint}`;
}

export function failureMessage(error: unknown): { message: string; stack: string | null } {
  if (error instanceof InputError || error instanceof UsageError) {
    return { message: error.message, stack: null };
  }
  if (isRequestError(error)) return { message: describeRequestError(error), stack: null };
  if (error instanceof Error) return { message: error.message, stack: error.stack ?? null };
  return { message: `fitgap failed: ${String(error)}`, stack: null };
}

export function handleFailure(error: unknown): void {
  const { message, stack } = failureMessage(error);
  if (stack !== null) core.info(stack);
  core.setFailed(message);
}

export { isRequestError };
