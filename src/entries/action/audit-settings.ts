/**
 * The inputs of audit mode (`pull-request`, `base-sha`, `head-sha`, `audit-comment`), read beside
 * `settings.ts` so that file stays as it is; like it, this is an edge that calls `core.getInput`.
 */
import * as core from '@actions/core';
import { basename } from 'node:path';
import { InputError, quote } from '../../model/errors.js';
import type { Issue } from '../../model/errors.js';
import type { AuditArtifactSource } from '../../io/audit-github.js';
import type { Settings } from './settings.js';

export type AuditTarget = { pullNumber: number } | { base: string; head: string };

export interface AuditSettings {
  target: AuditTarget;
  source: AuditArtifactSource;
  /** Post the re-run review on the pull request, marked as an audit re-run. */
  comment: boolean;
}

function optional(name: string): string | null {
  const value = core.getInput(name).trim();
  return value === '' ? null : value;
}

const REF = /^[A-Za-z0-9._/-]{1,250}$/;

export function readAuditSettings(settings: Settings): AuditSettings {
  const issues: Issue[] = [];
  const pull = optional('pull-request');
  const base = optional('base-sha');
  const head = optional('head-sha');
  let target: AuditTarget = { pullNumber: 0 };
  if (pull !== null && base === null && head === null) {
    const number = Number(pull.replace(/^#/, ''));
    if (Number.isInteger(number) && number >= 1) target = { pullNumber: number };
    else
      issues.push({
        file: 'input "pull-request"',
        pointer: '',
        expected: 'must be a pull request number',
        got: quote(pull),
      });
  } else if (pull === null && base !== null && head !== null) {
    for (const [name, value] of [
      ['base-sha', base],
      ['head-sha', head],
    ] as const)
      if (!REF.test(value) || value.startsWith('-'))
        issues.push({
          file: `input "${name}"`,
          pointer: '',
          expected: 'must be a commit sha or a ref name',
          got: quote(value),
        });
    target = { base, head };
  } else {
    issues.push({
      file: 'inputs "pull-request", "base-sha" and "head-sha"',
      pointer: '',
      expected: 'need "pull-request", or both "base-sha" and "head-sha"',
      hint: 'Pass the workflow_dispatch inputs through, e.g. pull-request: ${{ inputs.pull-request }}.',
    });
  }
  const commentText = (core.getInput('audit-comment') || 'false').trim().toLowerCase();
  if (commentText !== 'true' && commentText !== 'false')
    issues.push({
      file: 'input "audit-comment"',
      pointer: '',
      expected: 'must be true or false',
      got: quote(commentText),
    });
  let source: AuditArtifactSource = { kind: 'contents', path: '' };
  if (settings.baselineArtifact !== null) {
    if (settings.baselineWorkflow === null)
      issues.push({
        file: 'input "baseline-workflow"',
        pointer: '',
        expected: 'is needed in audit mode with "baseline-artifact"',
        hint: 'Name the workflow file (e.g. train.yml) whose runs upload the artifact.',
      });
    source = {
      kind: 'run-artifact',
      name: settings.baselineArtifact,
      workflow: /^\d+$/.test(settings.baselineWorkflow ?? '')
        ? Number(settings.baselineWorkflow)
        : (settings.baselineWorkflow ?? ''),
      preferredName: settings.candidate === null ? null : basename(settings.candidate),
    };
  } else if (settings.candidate !== null) {
    source = { kind: 'contents', path: settings.candidate.replace(/^\.\//, '') };
  } else {
    issues.push({
      file: 'inputs "baseline-artifact" and "candidate"',
      pointer: '',
      expected: 'need one of them in audit mode',
      hint: 'Name the workflow artifact holding the run ("baseline-artifact" with "baseline-workflow"), or the committed run file ("candidate").',
    });
  }
  if (issues.length > 0) throw new InputError(issues);
  return { target, source, comment: commentText === 'true' };
}
