/**
 * The action's settings: the ONE place that calls `core.getInput` and reads `process.env`.
 * Everything downstream receives the typed `Settings` object.
 */
import * as core from '@actions/core';
import { tmpdir } from 'node:os';
import { InputError, quote } from '../../model/errors.js';
import type { Issue } from '../../model/errors.js';
import { isValidCommentKey } from '../../report/marker.js';
import { parseFailOn, parseNumberSetting, type NumberSettingName } from '../../model/settings.js';
import type { SettingsOverrides } from '../../io/review-from-files.js';
import { LIMIT_NAMES, parseLimitMb, type FileLimits } from '../../io/open-untrusted.js';

export type ActionMode = 'review' | 'publish' | 'audit';
export type CommentMode = 'update' | 'new' | 'off';
/** How the gate is published besides the step's own result. `auto`: a check run in publish mode. */
export type StatusCheckMode = 'auto' | 'check-run' | 'commit-status' | 'off';

export interface ApiSettings {
  /** REST base URL, from `GITHUB_API_URL` (GitHub Enterprise Server works). */
  baseUrl: string;
  token: string;
  /** Retries of a failed request (5xx), bounded. */
  retries: number;
  /**
   * Milliseconds per unit of retry delay (retry n waits n² units; `retry-after: s` waits s units).
   * 1000 in production; tests shrink it through `FITGAP_TEST_DELAY_UNIT_MS` (test-only).
   */
  delayUnitMs: number;
  /** Milliseconds a request may take (30 s; tests shrink it through `FITGAP_TEST_TIMEOUT_MS`). */
  timeoutMs: number;
}

export interface Settings {
  mode: ActionMode;
  /** Candidate run artifact path (review mode). */
  candidate: string | null;
  /** Baseline run artifact path; exclusive with `baselineArtifact`. */
  baseline: string | null;
  /** Name of a workflow artifact holding the baseline run, fetched from an earlier run. */
  baselineArtifact: string | null;
  /** Branch or full commit sha whose newest successful run supplies the baseline artifact. */
  baselineRef: string | null;
  /** Workflow file (`train.yml`) whose runs hold the baseline artifact; null: the running workflow. */
  baselineWorkflow: string | null;
  config: string | null;
  comment: CommentMode;
  commentKey: string;
  /** Settings given as inputs (`alpha`, `min-effect`, `gap-tolerance`, `reference`, `fail-on`); they win over the config file. */
  overrides: SettingsOverrides;
  /** Byte limits given as inputs (`max-artifact-mb`…); they win over the config file's `limits`. */
  limits: Partial<FileLimits>;
  statusCheck: StatusCheckMode;
  /** Name of the artifact that carries the review into the publish workflow. */
  reportArtifact: string;
  /** Limit for a downloaded archive and for the bytes inflated from it. */
  archiveLimitBytes: number;
  api: ApiSettings;
  /** Folder for the report and extracted files (`RUNNER_TEMP`). */
  tempDir: string;
  /** Folder relative paths are resolved against (`GITHUB_WORKSPACE`). */
  workspace: string;
  /** `owner/repo/.github/workflows/file.yml@ref` of the running workflow, when known. */
  workflowRef: string | null;
}

type Env = Record<string, string | undefined>;

function optional(name: string): string | null {
  const value = core.getInput(name);
  return value === '' ? null : value;
}

/** A required input; `action.yml`'s `required: true` is not enforced by the runner. */
function required(name: string, issues: Issue[]): string {
  try {
    return core.getInput(name, { required: true });
  } catch {
    issues.push({ file: `input "${name}"`, pointer: '', expected: 'is required', got: '""' });
    return '';
  }
}

function oneOf<T extends string>(name: string, allowed: readonly T[], issues: Issue[]): T {
  const value = required(name, issues);
  if (value === '') return allowed[0] as T;
  if ((allowed as readonly string[]).includes(value)) return value as T;
  issues.push({
    file: `input "${name}"`,
    pointer: '',
    expected: `must be one of ${allowed.join(', ')}`,
    got: quote(value),
  });
  return allowed[0] as T;
}

const FIELD: Record<NumberSettingName, 'alpha' | 'minEffect' | 'gapTolerance' | 'reference'> = {
  alpha: 'alpha',
  'min-effect': 'minEffect',
  'gap-tolerance': 'gapTolerance',
  reference: 'reference',
};

/** The review settings given as inputs, parsed by the one settings source (model/settings.ts). */
function overrideInputs(issues: Issue[]): SettingsOverrides {
  const out: SettingsOverrides = {};
  for (const name of Object.keys(FIELD) as NumberSettingName[]) {
    const text = optional(name);
    if (text === null) continue;
    const parsed = parseNumberSetting(name, text, { file: `input "${name}"`, pointer: '' });
    if ('issues' in parsed) issues.push(...parsed.issues);
    else out[FIELD[name]] = parsed.value;
  }
  // An empty input is an unset input on GitHub: the config file's fail-on, else the default.
  const failOn = optional('fail-on');
  if (failOn !== null) {
    const parsed = parseFailOn(failOn, { file: 'input "fail-on"', pointer: '' });
    if ('issues' in parsed) issues.push(...parsed.issues);
    else out.failOn = parsed.value;
  }
  return out;
}

function limitInputs(issues: Issue[]): Partial<FileLimits> {
  const out: Partial<FileLimits> = {};
  for (const key of Object.keys(LIMIT_NAMES) as (keyof FileLimits)[]) {
    const name = LIMIT_NAMES[key].option;
    const text = optional(name);
    if (text === null) continue;
    const parsed = parseLimitMb(key, text, `input "${name}"`);
    if ('issues' in parsed) issues.push(...parsed.issues);
    else out[key] = parsed.bytes;
  }
  return out;
}

function archiveLimit(issues: Issue[]): number {
  const text = optional('archive-limit-mb');
  if (text === null) return 50 * 1024 * 1024;
  const value = /^\s*(?:\d+(?:\.\d*)?|\.\d+)\s*$/.test(text) ? Number(text) : Number.NaN;
  if (!(value >= 0.001 && value <= 2048)) {
    issues.push({
      file: 'input "archive-limit-mb"',
      pointer: '',
      expected: 'must be a number of MB from 0.001 to 2048',
      got: quote(text),
    });
    return 50 * 1024 * 1024;
  }
  return Math.round(value * 1024 * 1024);
}

/** Reads every input and the runner environment. Throws `InputError` listing all bad inputs. */
export function readSettings(env: Env = process.env): Settings {
  const issues: Issue[] = [];
  const mode = oneOf<ActionMode>('mode', ['review', 'publish', 'audit'], issues);
  const candidate = mode === 'review' ? required('candidate', issues) : optional('candidate');
  const baseline = optional('baseline');
  const baselineArtifact = optional('baseline-artifact');
  if (mode === 'review' && (baseline === null) === (baselineArtifact === null)) {
    issues.push({
      file: 'inputs "baseline" and "baseline-artifact"',
      pointer: '',
      expected: 'need exactly one of them',
      got: baseline === null ? 'neither' : 'both',
      hint: 'Give a file path as "baseline", or the name of an uploaded artifact as "baseline-artifact".',
    });
  }
  const commentKey = core.getInput('comment-key') || 'default';
  if (!isValidCommentKey(commentKey)) {
    issues.push({
      file: 'input "comment-key"',
      pointer: '',
      expected: "must be 1-64 letters, digits, '.', '_' or '-'",
      got: quote(commentKey),
    });
  }
  const baselineWorkflow = optional('baseline-workflow');
  if (mode === 'publish' && baselineArtifact !== null && baselineWorkflow === null) {
    issues.push({
      file: 'input "baseline-workflow"',
      pointer: '',
      expected: 'is needed with "baseline-artifact" in publish mode',
      hint: 'Name the workflow file (e.g. train.yml) whose runs on the base branch upload the baseline.',
    });
  }
  const overrides = overrideInputs(issues);
  const limits = limitInputs(issues);
  const archiveLimitBytes = archiveLimit(issues);
  const settings: Settings = {
    mode,
    candidate,
    baseline,
    baselineArtifact,
    baselineRef: optional('baseline-ref'),
    baselineWorkflow,
    config: optional('config'),
    comment: oneOf<CommentMode>('comment', ['update', 'new', 'off'], issues),
    commentKey,
    overrides,
    limits,
    statusCheck: oneOf<StatusCheckMode>(
      'status-check',
      ['auto', 'check-run', 'commit-status', 'off'],
      issues,
    ),
    reportArtifact: core.getInput('report-artifact') || 'fitgap-report',
    archiveLimitBytes,
    api: {
      baseUrl: (env['GITHUB_API_URL'] ?? 'https://api.github.com').replace(/\/+$/, ''),
      token: required('github-token', issues),
      retries: 2,
      delayUnitMs: testNumber(env, 'FITGAP_TEST_DELAY_UNIT_MS', 1000),
      timeoutMs: testNumber(env, 'FITGAP_TEST_TIMEOUT_MS', 30_000),
    },
    tempDir: env['RUNNER_TEMP'] ?? tmpdir(),
    workspace: env['GITHUB_WORKSPACE'] ?? process.cwd(),
    workflowRef: env['GITHUB_WORKFLOW_REF'] ?? null,
  };
  if (issues.length > 0) throw new InputError(issues);
  return settings;
}

/**
 * Test-only knobs: `FITGAP_TEST_DELAY_UNIT_MS` shrinks retry and rate-limit waits,
 * `FITGAP_TEST_TIMEOUT_MS` the request timeout, so tests stay fast.
 */
function testNumber(env: Env, name: string, otherwise: number): number {
  const text = env[name];
  const value = text === undefined ? NaN : Number(text);
  return Number.isFinite(value) && value > 0 ? value : otherwise;
}
