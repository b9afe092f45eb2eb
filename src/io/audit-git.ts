/**
 * What the range audit asks of git: is this a repository, which commits does `A..B` hold (oldest
 * first), what is at a path in a commit, and the bytes of a blob, bounded. Only resolved shas and
 * repository-relative paths reach git's argument list; user text goes through `--end-of-options`
 * and `--literal-pathspecs`.
 */
import { posix } from 'node:path';
import type { CommitInfo } from '../model/audit.js';
import { UsageError } from '../model/errors.js';
import { GitError } from './git.js';
import type { RunGit } from './git.js';

const SHA = /^[0-9a-f]{40}$/;
/** Field and record separators of our `git log` format (unit separator; `-z` ends records). */
const FIELD = '\x1f';
const LOG_FORMAT = `--format=%H${FIELD}%cI${FIELD}%s`;

/** The repository's top folder and the current folder's path inside it (`sub/dir/` or ''). */
export async function openRepository(git: RunGit, cwd: string): Promise<{ prefix: string }> {
  try {
    const out = (await git(['rev-parse', '--is-inside-work-tree', '--show-prefix']))
      .toString('utf8')
      .split('\n');
    return { prefix: out[1] ?? '' };
  } catch (error) {
    if (!(error instanceof GitError)) throw error;
    if (error.code === 'ENOENT')
      throw new UsageError('fitgap audit: git is not installed (or not on PATH).');
    throw new UsageError(
      `fitgap audit: ${cwd} is not inside a git work tree (${firstLine(error.stderr)}). Run it from a clone of the repository.`,
    );
  }
}

/** `A..B` into its two ends, each resolved to a commit. */
export async function resolveRange(
  git: RunGit,
  range: string,
): Promise<{ from: string; to: string }> {
  const match = /^([^.\s][^\s]*?)\.\.([^.\s][^\s]*)$/.exec(range);
  if (match === null || match[1]?.endsWith('.') === true || match[2]?.includes('..') === true) {
    throw new UsageError(
      `fitgap audit: --range must be two commits joined by '..', like v1.2..main or a1b2c3d..HEAD (got ${JSON.stringify(range)}).`,
    );
  }
  return {
    from: await resolveCommit(git, match[1] ?? ''),
    to: await resolveCommit(git, match[2] ?? ''),
  };
}

export async function resolveCommit(git: RunGit, rev: string): Promise<string> {
  let out = '';
  try {
    out = (
      await git(['rev-parse', '--verify', '--quiet', '--end-of-options', `${rev}^{commit}`])
    ).toString('utf8');
  } catch (error) {
    if (!(error instanceof GitError)) throw error;
  }
  const sha = out.trim();
  if (!SHA.test(sha)) {
    throw new UsageError(
      `fitgap audit: ${JSON.stringify(rev)} is not a commit of this repository. Check the range (git log ${rev} -1), and fetch the history (a shallow clone may lack it).`,
    );
  }
  return sha;
}

function parseLog(out: Buffer): CommitInfo[] {
  return out
    .toString('utf8')
    .split('\0')
    .filter((record) => record.trim() !== '')
    .map((record) => {
      const text = record.replace(/^\n/, '');
      const first = text.indexOf(FIELD);
      const second = text.indexOf(FIELD, first + 1);
      return {
        sha: text.slice(0, first),
        date: text.slice(first + 1, second),
        subject: text.slice(second + 1),
      };
    });
}

/** Commits of `from..to`, oldest first, as `git log --reverse` lists them. */
export async function listCommits(git: RunGit, from: string, to: string): Promise<CommitInfo[]> {
  return parseLog(await git(['log', '--reverse', '-z', LOG_FORMAT, `${from}..${to}`, '--']));
}

export async function commitInfo(git: RunGit, sha: string): Promise<CommitInfo> {
  const [info] = parseLog(await git(['log', '-1', '-z', LOG_FORMAT, sha, '--']));
  if (info === undefined) throw new Error(`git log printed nothing for ${sha}`);
  return info;
}

export type TreeEntry =
  | { kind: 'blob'; oid: string; size: number }
  | { kind: 'missing' }
  | { kind: 'other'; what: string };

/** What `path` (repository-relative) is at `commit`. */
export async function treeEntry(git: RunGit, commit: string, path: string): Promise<TreeEntry> {
  const out = (
    await git(['--literal-pathspecs', 'ls-tree', '-l', '--full-tree', '-z', commit, '--', path])
  ).toString('utf8');
  // `<mode> SP <type> SP <object> SP+ <size> TAB <path>`, records ended by NUL.
  for (const record of out.split('\0')) {
    const tab = record.indexOf('\t');
    if (tab < 0 || record.slice(tab + 1) !== path) continue;
    const [mode = '', type = '', oid = '', size = ''] = record.slice(0, tab).split(/ +/);
    if (type === 'tree') return { kind: 'other', what: 'a folder' };
    if (type === 'commit') return { kind: 'other', what: 'a submodule' };
    if (mode === '120000') return { kind: 'other', what: 'a symbolic link' };
    if (type === 'blob') return { kind: 'blob', oid, size: Number(size) };
  }
  return { kind: 'missing' };
}

/** A blob's bytes; the caller has checked its size against the cap. */
export async function readBlob(git: RunGit, oid: string, size: number): Promise<Buffer> {
  return git(['cat-file', 'blob', oid], { maxBytes: size + 1 });
}

/**
 * The repository's name for the record: `owner/name` for a GitHub remote, otherwise the remote's
 * URL without user name, password or query; null without an `origin` remote.
 */
export async function originRepository(git: RunGit): Promise<string | null> {
  let url = '';
  try {
    url = (await git(['config', '--get', 'remote.origin.url'])).toString('utf8').trim();
  } catch (error) {
    if (!(error instanceof GitError)) throw error;
    return null;
  }
  return repositoryName(url);
}

export function repositoryName(url: string): string | null {
  if (url === '') return null;
  const github = /github\.com[:/]([A-Za-z0-9_.-]+)\/([A-Za-z0-9_.-]+?)(?:\.git)?\/?$/.exec(url);
  if (github !== null) return `${github[1]}/${github[2]}`;
  try {
    const parsed = new URL(url);
    parsed.username = '';
    parsed.password = '';
    parsed.search = '';
    parsed.hash = '';
    return parsed.toString();
  } catch {
    // scp-like `user@host:path`: drop the user.
    return url.replace(/^[^@/]+@/, '');
  }
}

/**
 * The repository-relative form of a path the user typed in `prefix` (the current folder inside
 * the repository); null when it leaves the repository.
 */
export function repositoryPath(prefix: string, typed: string): string | null {
  const slashed = typed.replace(/\\/g, '/');
  const joined = posix.normalize(posix.join(prefix, slashed));
  if (
    posix.isAbsolute(slashed) ||
    posix.isAbsolute(joined) ||
    joined.startsWith('../') ||
    joined === '..' ||
    joined === '.'
  )
    return null;
  return joined.replace(/\/+$/, '');
}

function firstLine(text: string): string {
  return text.trim().split('\n')[0] ?? '';
}
