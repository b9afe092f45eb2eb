/**
 * Runs the bundled action (`dist/index.js`) as a child process with the environment a runner sets:
 * INPUT_* (hyphens kept, defaults taken from action.yml as the runner does), GITHUB_EVENT_NAME,
 * GITHUB_EVENT_PATH, GITHUB_REPOSITORY, GITHUB_API_URL (the fake server), GITHUB_OUTPUT,
 * GITHUB_STEP_SUMMARY and RUNNER_TEMP, all in a fresh temp folder. Nothing from the test process's
 * environment leaks in but PATH.
 */
import { execFileSync, spawn } from 'node:child_process';
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  statSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parse } from 'yaml';
import { TOKEN } from '../fake-github/repo.js';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
export const FIXTURES = join(ROOT, 'test/fixtures/action');
export const HEAD = 'a'.repeat(40);
export const OLD_HEAD = 'b'.repeat(40);
export const BASE_SHA = 'c'.repeat(40);

function newestSource(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const path = join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestSource(path) : statSync(path).mtimeMs);
  }
  return newest;
}

/**
 * Builds `dist/` with the project's build script when the bundle is missing or older than any
 * source file. CI builds before testing, so there the bundle is fresh and the test files that
 * run built entries never rewrite it under each other.
 */
export function buildBundle(): void {
  const bundle = join(ROOT, 'dist/index.js');
  if (existsSync(bundle) && statSync(bundle).mtimeMs >= newestSource(join(ROOT, 'src'))) return;
  execFileSync('npm', ['run', '-s', 'build'], { cwd: ROOT, stdio: 'pipe' });
}

interface ActionYml {
  inputs: Record<string, { default?: string }>;
  outputs: Record<string, unknown>;
}

export function actionYml(): ActionYml {
  return parse(readFileSync(join(ROOT, 'action.yml'), 'utf8')) as ActionYml;
}

export interface RunOptions {
  apiUrl: string;
  inputs: Record<string, string>;
  eventName: string;
  payload: Record<string, unknown>;
  /** Files copied into the workspace: workspace path → fixture path. */
  files?: Record<string, string>;
  env?: Record<string, string>;
}

export interface ActionRun {
  code: number | null;
  stdout: string;
  stderr: string;
  outputs: Record<string, string>;
  summary: string;
  workspace: string;
  temp: string;
}

export function pullRequestEvent(number = 7, headSha = HEAD): Record<string, unknown> {
  return {
    action: 'synchronize',
    number,
    pull_request: {
      number,
      head: { sha: headSha, ref: 'feature', repo: { full_name: 'o/r' } },
      base: { sha: BASE_SHA, ref: 'main', repo: { full_name: 'o/r' } },
    },
    repository: { full_name: 'o/r', default_branch: 'main' },
  };
}

/** `name<<delimiter\nvalue\ndelimiter` records of a GITHUB_OUTPUT file. */
export function parseOutputs(text: string): Record<string, string> {
  const outputs: Record<string, string> = {};
  const pattern = /^([^\n<]+)<<(\S+)\n([\s\S]*?)\n\2$/gm;
  for (const match of text.matchAll(pattern)) outputs[match[1] ?? ''] = match[3] ?? '';
  return outputs;
}

/**
 * At most this many action processes at a time across a test file: each starts a Node process that
 * loads the bundle, and on a 2-core machine under load more of them only slow each other down.
 */
const MAX_PROCESSES = 2;
let running = 0;
const waiting: (() => void)[] = [];

async function slot<T>(work: () => Promise<T>): Promise<T> {
  if (running >= MAX_PROCESSES) await new Promise<void>((go) => waiting.push(go));
  running++;
  try {
    return await work();
  } finally {
    running--;
    waiting.shift()?.();
  }
}

/** Runs the action in a child process (at most two at a time). */
export function runAction(options: RunOptions): Promise<ActionRun> {
  return slot(() => runActionNow(options));
}

async function runActionNow(options: RunOptions): Promise<ActionRun> {
  const root = mkdtempSync(join(tmpdir(), 'fitgap-action-'));
  const workspace = join(root, 'workspace');
  const temp = join(root, 'runner-temp');
  mkdirSync(workspace);
  mkdirSync(temp);
  for (const [target, source] of Object.entries(options.files ?? {})) {
    mkdirSync(dirname(join(workspace, target)), { recursive: true });
    copyFileSync(source, join(workspace, target));
  }
  const eventPath = join(root, 'event.json');
  writeFileSync(eventPath, JSON.stringify(options.payload));
  const outputPath = join(root, 'output.txt');
  const summaryPath = join(root, 'summary.md');
  writeFileSync(outputPath, '');
  writeFileSync(summaryPath, '');
  const env: Record<string, string> = {
    PATH: process.env['PATH'] ?? '',
    GITHUB_ACTIONS: 'true',
    GITHUB_EVENT_NAME: options.eventName,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_REPOSITORY: 'o/r',
    GITHUB_API_URL: options.apiUrl,
    GITHUB_SERVER_URL: 'https://github.invalid',
    GITHUB_SHA: BASE_SHA,
    GITHUB_RUN_ID: '9001',
    GITHUB_WORKFLOW_REF: 'o/r/.github/workflows/train.yml@refs/pull/7/merge',
    GITHUB_WORKSPACE: workspace,
    GITHUB_OUTPUT: outputPath,
    GITHUB_STEP_SUMMARY: summaryPath,
    RUNNER_TEMP: temp,
    FITGAP_TEST_DELAY_UNIT_MS: '5',
    ...options.env,
  };
  for (const [name, spec] of Object.entries(actionYml().inputs)) {
    const value = spec.default === '${{ github.token }}' ? TOKEN : spec.default;
    if (value !== undefined) env[`INPUT_${name.toUpperCase()}`] = value;
  }
  for (const [name, value] of Object.entries(options.inputs))
    env[`INPUT_${name.toUpperCase()}`] = value;

  const child = spawn(process.execPath, [join(ROOT, 'dist/index.js')], { cwd: workspace, env });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  const code = await new Promise<number | null>((done) => child.on('close', done));
  return {
    code,
    stdout,
    stderr,
    outputs: parseOutputs(readFileSync(outputPath, 'utf8')),
    summary: readFileSync(summaryPath, 'utf8'),
    workspace,
    temp,
  };
}
