/**
 * `fitgap audit`: re-run reviews over a git range (`--range A..B --artifact PATH`), or re-run a
 * past pull request's review (`--repo OWNER/NAME --pull-request N`, or `--base`/`--head`) through
 * the GitHub API. Exit 0 when the audit ran; 1 when `--fail-on` was given and a reviewed commit
 * failed it; 2 for bad usage or input.
 */
import { tmpdir } from 'node:os';
import { resolve } from 'node:path';
import { auditCommitPair, auditPullRequest } from '../../io/audit-github.js';
import type { AuditArtifactSource, GitHubAuditOptions } from '../../io/audit-github.js';
import { auditRange } from '../../io/audit.js';
import { gitRunner } from '../../io/git.js';
import { createClient } from '../../io/github/client.js';
import { loadReviewConfig } from '../../io/review-from-files.js';
import type { AuditAgainst, PullRequestAudit, RangeAudit } from '../../model/audit.js';
import { EXIT, UsageError } from '../../model/errors.js';
import { renderAuditMarkdown } from '../../report/audit-markdown.js';
import {
  renderPullRequestAuditMarkdown,
  renderPullRequestAuditText,
} from '../../report/audit-pull-request.js';
import { pullRequestRecord, rangeRecords, renderJsonLines } from '../../report/audit-record.js';
import { reviewFields } from '../../report/audit-fields.js';
import { renderAuditText } from '../../report/audit-text.js';
import { parseFlags, parseFormat, parseOverrides } from './args.js';
import type { Format } from './args.js';
import { AUDIT_HELP } from './help.js';
import type { CliIo } from './io.js';
import { auditProgress } from './progress.js';

const AUDIT_FLAGS = {
  range: { type: 'string' },
  artifact: { type: 'string' },
  against: { type: 'string' },
  repo: { type: 'string' },
  'pull-request': { type: 'string' },
  base: { type: 'string' },
  head: { type: 'string' },
  workflow: { type: 'string' },
  'run-artifact': { type: 'string' },
  config: { type: 'string' },
  format: { type: 'string' },
  out: { type: 'string' },
  alpha: { type: 'string' },
  'min-effect': { type: 'string' },
  'gap-tolerance': { type: 'string' },
  reference: { type: 'string' },
  'fail-on': { type: 'string' },
  'max-file-mb': { type: 'string' },
  quiet: { type: 'boolean', short: 'q' },
  help: { type: 'boolean', short: 'h' },
} as const;

type Values = Record<string, string | boolean | undefined>;

const usage = (message: string): UsageError =>
  new UsageError(`fitgap audit: ${message} Run 'fitgap audit --help'.`);

function text(values: Values, flag: string): string | undefined {
  const value = values[flag];
  return typeof value === 'string' ? value : undefined;
}

function maxFileBytes(values: Values): number {
  const raw = text(values, 'max-file-mb');
  if (raw === undefined) return 64 * 1024 * 1024;
  const mb = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(mb) || mb <= 0 || mb > 2048)
    throw usage(
      `--max-file-mb must be a number above 0 and at most 2048 (got ${JSON.stringify(raw)}).`,
    );
  return Math.round(mb * 1024 * 1024);
}

/** A GitHub API failure as one line (method, path, status, message), for the user. */
function requestProblem(error: unknown): string | null {
  const e = error as {
    status?: unknown;
    message?: unknown;
    request?: { method?: unknown; url?: unknown };
  };
  if (typeof e?.status !== 'number' || typeof e.request?.url !== 'string') return null;
  const path = new URL(e.request.url, 'http://api.invalid').pathname;
  return `fitgap audit: GitHub API ${String(e.request.method)} ${path} answered ${e.status}: ${String(e.message)}`;
}

export async function auditCommand(argv: string[], io: CliIo): Promise<number> {
  const { values, positionals } = parseFlags(argv, AUDIT_FLAGS, 'audit');
  if (values['help'] === true) {
    io.stdout(AUDIT_HELP);
    return EXIT.ok;
  }
  if (positionals.length > 0) throw usage(`unexpected argument ${JSON.stringify(positionals[0])}.`);
  const format = parseFormat(values['format'], 'audit');
  const overrides = parseOverrides(values);
  const range = text(values, 'range');
  const repo = text(values, 'repo');
  if ((range === undefined) === (repo === undefined))
    throw usage(
      range === undefined
        ? 'name what to audit: --range A..B with --artifact PATH, or --repo OWNER/NAME with --pull-request N.'
        : '--range and --repo audit different things; give one of them.',
    );
  const configOption = text(values, 'config');
  const { config, file: configFile, read } = await loadReviewConfig(io.cwd, configOption);
  const now = (io.now ?? (() => new Date()))();
  const context = { recordedAt: now.toISOString(), fitgapVersion: io.version };
  const tempDir = io.tempDir ?? tmpdir();
  const quiet = values['quiet'] === true;

  let output: string;
  let failed: boolean;
  if (range !== undefined) {
    const audit = await runRange(values, io, {
      range,
      config,
      configFile,
      overrides,
      tempDir,
      quiet,
    });
    output = renderRange(audit, format, context);
    if (format === 'json') {
      for (const e of audit.entries)
        if (e.status === 'skipped')
          io.stderr(`fitgap audit: skipped ${e.commit.sha.slice(0, 7)} (${e.kind}): ${e.reason}\n`);
    }
    failed = audit.entries.some(
      (e) => e.status === 'reviewed' && !reviewFields(e.review).change.gatePass,
    );
  } else {
    const audit = await runGitHub(values, io, {
      repo: repo ?? '',
      config,
      configFile,
      overrides,
      tempDir,
    });
    output =
      format === 'json'
        ? renderJsonLines([pullRequestRecord(audit, context)])
        : format === 'markdown'
          ? renderPullRequestAuditMarkdown(audit, { version: io.version })
          : renderPullRequestAuditText(audit, { version: io.version, color: io.color });
    failed = !reviewFields(audit.review).change.gatePass;
  }
  const out = text(values, 'out');
  if (out === undefined) io.stdout(output);
  else {
    await io.writeFile(resolve(io.cwd, out), output, { file: out, inputs: read });
    if (!quiet) io.stderr(`fitgap: audit written to ${out}.\n`);
  }
  // Only an explicit --fail-on turns outcomes into exit code 1: an audit reports by default.
  return failed && overrides.failOn !== undefined ? EXIT.gateFailed : EXIT.ok;
}

function renderRange(
  audit: RangeAudit,
  format: Format,
  context: { recordedAt: string; fitgapVersion: string },
): string {
  if (format === 'json') return renderJsonLines(rangeRecords(audit, context));
  if (format === 'markdown') return renderAuditMarkdown(audit);
  return renderAuditText(audit);
}

interface Common {
  config: GitHubAuditOptions['config'];
  configFile: GitHubAuditOptions['configFile'];
  overrides: NonNullable<GitHubAuditOptions['overrides']>;
  tempDir: string;
}

async function runRange(
  values: Values,
  io: CliIo,
  options: Common & { range: string; quiet: boolean },
): Promise<RangeAudit> {
  const artifact = text(values, 'artifact');
  if (artifact === undefined)
    throw usage('--range needs --artifact PATH (the run artifact in the repository).');
  for (const flag of ['pull-request', 'base', 'head', 'workflow', 'run-artifact'])
    if (values[flag] !== undefined)
      throw usage(`--${flag} belongs to --repo audits, not to --range.`);
  const againstText = text(values, 'against') ?? 'previous';
  if (againstText !== 'previous' && againstText !== 'first')
    throw usage(`--against must be previous or first (got ${JSON.stringify(againstText)}).`);
  const progress = auditProgress(io.stderrStream, options.quiet);
  try {
    return await auditRange({
      git: gitRunner(io.cwd),
      cwd: io.cwd,
      range: options.range,
      artifact,
      against: againstText as AuditAgainst,
      config: options.config,
      configFile: options.configFile,
      overrides: options.overrides,
      tempDir: options.tempDir,
      maxFileBytes: maxFileBytes(values),
      onProgress: (done, total, commit) =>
        progress.update(done, total, `${commit.sha.slice(0, 7)} ${commit.subject.slice(0, 40)}`),
    });
  } finally {
    progress.stop();
  }
}

async function runGitHub(
  values: Values,
  io: CliIo,
  options: Common & { repo: string },
): Promise<PullRequestAudit> {
  const match = /^([A-Za-z0-9_.-]{1,100})\/([A-Za-z0-9_.-]{1,100})$/.exec(options.repo);
  if (match === null)
    throw usage(
      `--repo must be OWNER/NAME, like octo-org/demand-model (got ${JSON.stringify(options.repo)}).`,
    );
  if (values['against'] !== undefined) throw usage('--against belongs to --range audits.');
  const pr = text(values, 'pull-request');
  const base = text(values, 'base');
  const head = text(values, 'head');
  const byPull = pr !== undefined && base === undefined && head === undefined;
  const byCommits = pr === undefined && base !== undefined && head !== undefined;
  if (!byPull && !byCommits)
    throw usage('--repo needs --pull-request N, or both --base COMMIT and --head COMMIT.');
  const number = pr === undefined ? null : Number(pr);
  if (number !== null && (!Number.isInteger(number) || number < 1))
    throw usage(`--pull-request must be a pull request number (got ${JSON.stringify(pr)}).`);
  const source = artifactSource(values);
  const token = io.env?.['GITHUB_TOKEN'] ?? '';
  if (token === '')
    throw usage(
      '--repo audits read the GitHub API: set GITHUB_TOKEN to a token that can read the repository (and its actions, for run artifacts).',
    );
  const octokit = createClient({
    baseUrl: (io.env?.['GITHUB_API_URL'] || 'https://api.github.com').replace(/\/+$/, ''),
    token,
    retries: 2,
    delayUnitMs: 1000,
    log: (message) => io.stderr(`fitgap audit: ${message}\n`),
  });
  const github: GitHubAuditOptions = {
    octokit,
    repo: { owner: match[1] ?? '', repo: match[2] ?? '' },
    source,
    config: options.config,
    configFile: options.configFile,
    overrides: options.overrides,
    tempDir: options.tempDir,
    limitBytes: maxFileBytes(values),
  };
  try {
    return number !== null
      ? await auditPullRequest({ ...github, pullNumber: number })
      : await auditCommitPair({
          ...github,
          base: base ?? '',
          head: head ?? '',
          labels: ['--base', '--head'],
        });
  } catch (error) {
    const problem = requestProblem(error);
    if (problem !== null) throw new UsageError(problem);
    throw error;
  }
}

function artifactSource(values: Values): AuditArtifactSource {
  const artifact = text(values, 'artifact');
  const runArtifact = text(values, 'run-artifact');
  const workflow = text(values, 'workflow');
  if (runArtifact !== undefined) {
    if (workflow === undefined)
      throw usage(
        '--run-artifact needs --workflow FILE (the workflow, e.g. train.yml, whose runs upload it).',
      );
    return {
      kind: 'run-artifact',
      name: runArtifact,
      workflow: /^\d+$/.test(workflow) ? Number(workflow) : workflow,
      preferredName: artifact === undefined ? null : (artifact.split('/').pop() ?? null),
    };
  }
  if (workflow !== undefined) throw usage('--workflow goes with --run-artifact NAME.');
  if (artifact === undefined)
    throw usage(
      'name the run artifact: --artifact PATH (a committed file), or --run-artifact NAME --workflow FILE.',
    );
  return { kind: 'contents', path: artifact.replace(/^\.\//, '') };
}
