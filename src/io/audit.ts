/**
 * The range audit: walks the commits of `A..B` oldest first, reads the run artifact (and the files
 * it names beside it) at each commit from git, and reviews each commit against the previous commit
 * that had a valid artifact (or each against the first). A commit whose artifact is missing,
 * invalid or unchanged is listed with the reason and skipped; it never aborts the audit.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { join } from 'node:path';
import type {
  AuditAgainst,
  AuditEntry,
  CommitInfo,
  RangeAudit,
  SourceFile,
} from '../model/audit.js';
import type { ConfigFile } from '../model/config.js';
import { InputError, UsageError, formatIssue } from '../model/errors.js';
import type { Issue } from '../model/errors.js';
import {
  commitInfo,
  listCommits,
  openRepository,
  originRepository,
  readBlob,
  repositoryPath,
  resolveRange,
  treeEntry,
} from './audit-git.js';
import {
  DEFAULT_MAX_FILE_BYTES,
  filesBeside,
  loadSide,
  sideSources,
  type SideFile,
} from './audit-side.js';
import type { RunGit } from './git.js';
import type { LoadedRun } from './load-run.js';
import { reviewLoadedRuns } from './review-from-files.js';
import type { InputFile, SettingsOverrides } from './review-from-files.js';

export interface RangeAuditOptions {
  git: RunGit;
  /** Folder the command runs in (inside the repository); paths the user typed are relative to it. */
  cwd: string;
  /** `A..B`. */
  range: string;
  /** Path of the run artifact, relative to `cwd`. */
  artifact: string;
  against: AuditAgainst;
  config: ConfigFile;
  /** The config file the settings came from, listed among each record's sources. */
  configFile: InputFile | null;
  overrides?: SettingsOverrides;
  /** Where a private temp folder is made (and removed at the end). */
  tempDir: string;
  maxFileBytes?: number;
  /** Called before each commit is read: `done` commits of `total` are finished. */
  onProgress?: (done: number, total: number, commit: CommitInfo) => void;
}

const short = (sha: string): string => sha.slice(0, 7);

/** First-parent ancestors searched for a starting baseline when the range's start has none. */
export const LOOKBACK = 50;

type GitSide =
  | { ok: true; artifact: SideFile; beside: SideFile[]; key: string }
  | { ok: false; kind: 'missing' | 'not-a-file' | 'too-large'; reason: string };

async function readGitSide(
  options: RangeAuditOptions,
  commit: string,
  path: string,
  cap: number,
): Promise<GitSide> {
  const { git } = options;
  const entry = await treeEntry(git, commit, path);
  if (entry.kind === 'missing')
    return { ok: false, kind: 'missing', reason: `${path} does not exist at this commit` };
  if (entry.kind === 'other')
    return { ok: false, kind: 'not-a-file', reason: `${path} is ${entry.what}, not a file` };
  if (entry.size > cap)
    return {
      ok: false,
      kind: 'too-large',
      reason: `${path} is ${entry.size} bytes, over the ${cap}-byte cap (--max-file-mb)`,
    };
  const artifact = { path, bytes: await readBlob(git, entry.oid, entry.size) };
  const beside: SideFile[] = [];
  const oids = [entry.oid];
  for (const other of filesBeside(path, artifact.bytes, options.config['epoch-log'])) {
    const found = await treeEntry(git, commit, other);
    // Absent or unusable files are left out; loading then says what is missing.
    if (found.kind !== 'blob' || found.size > cap) continue;
    beside.push({ path: other, bytes: await readBlob(git, found.oid, found.size) });
    oids.push(`${other}:${found.oid}`);
  }
  return { ok: true, artifact, beside, key: oids.join(' ') };
}

function oneLine(issues: Issue[]): string {
  const [first] = issues;
  if (first === undefined) return 'not a valid run artifact';
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more problems)` : '';
  return `${formatIssue(first)}${more}`;
}

interface Side {
  info: CommitInfo;
  run: LoadedRun;
  sources: SourceFile[];
  dir: string;
}

export async function auditRange(options: RangeAuditOptions): Promise<RangeAudit> {
  const { git } = options;
  const cap = options.maxFileBytes ?? DEFAULT_MAX_FILE_BYTES;
  const { prefix } = await openRepository(git, options.cwd);
  const path = repositoryPath(prefix, options.artifact);
  if (path === null) {
    throw new UsageError(
      `fitgap audit: --artifact ${JSON.stringify(options.artifact)} is outside the repository. Give a path relative to the current folder, inside the repository.`,
    );
  }
  const { from, to } = await resolveRange(git, options.range);
  const commits = await listCommits(git, from, to);
  if (commits.length === 0) {
    throw new UsageError(
      `fitgap audit: the range ${options.range} holds no commits (is ${JSON.stringify(options.range.split('..')[1])} an ancestor of ${JSON.stringify(options.range.split('..')[0])}?). Name the older commit first.`,
    );
  }
  const fromInfo = await commitInfo(git, from);
  const toInfo = await commitInfo(git, to);
  const repository = await originRepository(git);
  const configSource: SourceFile[] =
    options.configFile === null ? [] : [{ commit: null, ...options.configFile }];

  const root = await mkdtemp(join(options.tempDir, 'fitgap-audit-'));
  const entries: AuditEntry[] = [];
  const all = [fromInfo, ...commits];
  let seenAny = false;
  let lastSeen: string | null = null;
  let lastKey: string | null = null;
  let lastValid: string | null = null;
  let chain: Side | null = null;
  let first: Side | null = null;
  const release = async (side: Side | null) => {
    if (side !== null && side !== first) await rm(side.dir, { recursive: true, force: true });
  };
  const epochLog = options.config['epoch-log'];
  /** Loads a commit's side; the issues when it is invalid (its folder is then removed). */
  const load = async (
    info: CommitInfo,
    read: Extract<GitSide, { ok: true }>,
  ): Promise<Side | Issue[]> => {
    const dir = join(root, info.sha);
    try {
      const run = await loadSide({
        dir,
        artifact: read.artifact,
        beside: read.beside,
        displayName: `${short(info.sha)}:${path}`,
        ...(epochLog === undefined ? {} : { epochLog }),
      });
      return { info, run, dir, sources: sideSources(info.sha, read.artifact, read.beside) };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      await rm(dir, { recursive: true, force: true });
      return error.issues;
    }
  };
  try {
    // Without a valid artifact at the range's start, its nearest first-parent ancestor with one
    // is the first baseline, so a range cut into slices chains as one long audit does.
    const start = await readGitSide(options, from, path, cap);
    const startValid = start.ok && !Array.isArray(await load(fromInfo, start));
    if (!startValid) {
      const ancestors = (
        await git(['rev-list', '--first-parent', `--max-count=${LOOKBACK + 1}`, from, '--'])
      )
        .toString('utf8')
        .split('\n')
        .filter((sha) => /^[0-9a-f]{40}$/.test(sha))
        .slice(1);
      for (const sha of ancestors) {
        const read = await readGitSide(options, sha, path, cap);
        if (!read.ok) continue;
        const side = await load(await commitInfo(git, sha), read);
        if (Array.isArray(side)) continue;
        entries.push({
          status: 'base',
          commit: side.info,
          sources: side.sources,
          note: `the range's start ${short(from)} has no valid artifact; its nearest ancestor with one starts the chain`,
        });
        chain = side;
        first = side;
        lastKey = read.key;
        lastValid = sha;
        lastSeen = sha;
        seenAny = true;
        break;
      }
    }
    for (const [index, info] of all.entries()) {
      options.onProgress?.(index, all.length, info);
      const read = await readGitSide(options, info.sha, path, cap);
      if (!read.ok) {
        const deleted =
          read.kind === 'missing' && lastSeen !== null
            ? `${path} was deleted (it existed at ${short(lastSeen)})`
            : read.reason;
        entries.push({ status: 'skipped', commit: info, kind: read.kind, reason: deleted });
        continue;
      }
      seenAny = true;
      lastSeen = info.sha;
      if (read.key === lastKey && lastValid !== null) {
        entries.push({
          status: 'skipped',
          commit: info,
          kind: 'unchanged',
          reason: `same artifact bytes as ${short(lastValid)}`,
        });
        continue;
      }
      const loaded = await load(info, read);
      if (Array.isArray(loaded)) {
        entries.push({ status: 'skipped', commit: info, kind: 'invalid', reason: oneLine(loaded) });
        continue;
      }
      lastKey = read.key;
      lastValid = info.sha;
      const side = loaded;
      const { dir, run } = side;
      const reference = options.against === 'first' ? first : chain;
      if (reference === null) {
        entries.push({
          status: 'base',
          commit: info,
          sources: side.sources,
          note:
            index === 0
              ? null
              : `first valid artifact of the range; the range's start ${short(from)} had none`,
        });
        chain = side;
        first = side;
        continue;
      }
      try {
        const review = await reviewLoadedRuns(
          reference.run,
          run,
          options.config,
          options.overrides,
        );
        entries.push({
          status: 'reviewed',
          commit: info,
          baseline: reference.info.sha,
          review,
          sources: [...reference.sources, ...side.sources, ...configSource],
        });
      } catch (error) {
        if (!(error instanceof InputError)) throw error;
        const incomparable = error.issues.every((i) => i.pointer.startsWith('/metric/'));
        if (incomparable && options.against === 'previous') {
          entries.push({
            status: 'base',
            commit: info,
            sources: side.sources,
            note: `not comparable with ${short(reference.info.sha)} (${oneLine(error.issues)}); starts a new chain`,
          });
          await release(chain);
          chain = side;
          continue;
        }
        await rm(dir, { recursive: true, force: true });
        entries.push({
          status: 'skipped',
          commit: info,
          kind: incomparable ? 'incomparable' : 'invalid',
          reason: oneLine(error.issues),
        });
        continue;
      }
      if (options.against === 'previous') {
        await release(chain);
        chain = side;
      } else {
        await rm(dir, { recursive: true, force: true });
      }
    }
  } finally {
    await rm(root, { recursive: true, force: true });
  }
  if (!seenAny) {
    throw new UsageError(
      `fitgap audit: ${path} exists at no commit of ${short(from)}..${short(to)}. Check --artifact (a path relative to the current folder).`,
    );
  }
  return {
    repository,
    artifactPath: path,
    from: fromInfo,
    to: toInfo,
    against: options.against,
    entries,
  };
}
