/**
 * The action's settings: the ONE place that calls `core.getInput` and reads `process.env`.
 * Everything downstream receives the typed `Settings` object.
 */
import * as core from '@actions/core';
import { tmpdir } from 'node:os';
import { InputError, quote } from '../../model/errors.js';
import type { Issue } from '../../model/errors.js';
import { failOnIssues } from '../../io/load-config.js';
import { isValidCommentKey } from '../../report/marker.js';

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
  /** Policy list; null leaves it to the config file or the core's default. */
  failOn: string[] | null;
  alpha: number | null;
  minEffect: number | null;
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

function number(name: string, issues: Issue[], min: number, max: number): number | null {
  const text = optional(name);
  if (text === null) return null;
  const value = Number(text);
  if (!Number.isFinite(value) || value < min || value > max) {
    issues.push({
      file: `input "${name}"`,
      pointer: '',
      expected: `must be a number from ${min} to ${max}`,
      got: quote(text),
    });
    return null;
  }
  return value;
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
  const failOnText = optional('fail-on');
  const failOn =
    failOnText === null
      ? null
      : failOnText
          .split(/[\s,]+/)
          .map((s) => s.trim())
          .filter((s) => s !== '');
  issues.push(...failOnIssues(failOn ?? [], 'input "fail-on"', ''));
  const limitMb = number('archive-limit-mb', issues, 0.001, 2048) ?? 50;
  const settings: Settings = {
    mode,
    candidate,
    baseline,
    baselineArtifact,
    baselineRef: optional('baseline-ref'),
    baselineWorkflow: optional('baseline-workflow'),
    config: optional('config'),
    comment: oneOf<CommentMode>('comment', ['update', 'new', 'off'], issues),
    commentKey,
    failOn,
    alpha: number('alpha', issues, Number.MIN_VALUE, 0.5),
    minEffect: number('min-effect', issues, 0, Number.MAX_VALUE),
    statusCheck: oneOf<StatusCheckMode>(
      'status-check',
      ['auto', 'check-run', 'commit-status', 'off'],
      issues,
    ),
    reportArtifact: core.getInput('report-artifact') || 'fitgap-report',
    archiveLimitBytes: Math.round(limitMb * 1024 * 1024),
    api: {
      baseUrl: (env['GITHUB_API_URL'] ?? 'https://api.github.com').replace(/\/+$/, ''),
      token: required('github-token', issues),
      retries: 2,
      delayUnitMs: testDelayUnit(env),
    },
    tempDir: env['RUNNER_TEMP'] ?? tmpdir(),
    workspace: env['GITHUB_WORKSPACE'] ?? process.cwd(),
    workflowRef: env['GITHUB_WORKFLOW_REF'] ?? null,
  };
  if (issues.length > 0) throw new InputError(issues);
  return settings;
}

/** Test-only: `FITGAP_TEST_DELAY_UNIT_MS` shrinks retry and rate-limit waits so tests stay fast. */
function testDelayUnit(env: Env): number {
  const text = env['FITGAP_TEST_DELAY_UNIT_MS'];
  const value = text === undefined ? NaN : Number(text);
  return Number.isFinite(value) && value >= 0 ? value : 1000;
}
