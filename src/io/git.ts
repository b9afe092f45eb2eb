/**
 * Git, read-only, through `child_process.execFile` with argument arrays (never a shell), bounded
 * output, and no pager. The audit takes a `RunGit` as a parameter so tests can hand in another.
 */
import { execFile } from 'node:child_process';

/** Runs `git ARGS` and resolves to its standard output; rejects with a `GitError`. */
export type RunGit = (args: readonly string[], options?: { maxBytes?: number }) => Promise<Buffer>;

/** Default cap on what one git command may print. */
export const DEFAULT_GIT_OUTPUT_BYTES = 64 * 1024 * 1024;

export class GitError extends Error {
  readonly args: readonly string[];
  /** Exit code, or the error code (`ENOENT` when git is not installed, `ERR_CHILD_PROCESS_STDIO_MAXBUFFER`). */
  readonly code: number | string | null;
  readonly stderr: string;
  constructor(args: readonly string[], code: number | string | null, stderr: string) {
    super(`git ${args.join(' ')} failed (${String(code)}): ${stderr.trim().split('\n')[0] ?? ''}`);
    this.name = 'GitError';
    this.args = args;
    this.code = code;
    this.stderr = stderr;
  }
}

/** A `RunGit` working in `cwd` with the `git` on PATH. */
export function gitRunner(cwd: string): RunGit {
  return (args, options = {}) =>
    new Promise((resolve, reject) => {
      execFile(
        'git',
        ['--no-pager', ...args],
        {
          cwd,
          encoding: 'buffer',
          maxBuffer: options.maxBytes ?? DEFAULT_GIT_OUTPUT_BYTES,
          windowsHide: true,
        },
        (error, stdout, stderr) => {
          if (error === null) {
            resolve(stdout);
            return;
          }
          const code = (error as NodeJS.ErrnoException & { code?: number | string }).code ?? null;
          reject(new GitError(args, code, stderr.toString('utf8') || error.message));
        },
      );
    });
}
