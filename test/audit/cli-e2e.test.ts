/**
 * The built CLI (`dist/cli.js`, the esbuild bundle) auditing a git history built in the test: the
 * progress bar (cli-progress, bundled) is drawn on a real pseudo-terminal (util-linux `script`),
 * and not with --quiet or when standard error is not a terminal.
 */
import { execFile } from 'node:child_process';
import { resolve } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildBundle } from '../action/harness.js';
import { ARTIFACT, buildHistory } from './history.js';
import type { History } from './history.js';

const run = promisify(execFile);
const cli = resolve('dist/cli.js');
let h: History;

beforeAll(() => {
  buildBundle();
  h = buildHistory();
}, 120_000);
afterAll(() => h.cleanup());

const quote = (s: string): string => `'${s.replace(/'/g, `'\\''`)}'`;

/** Runs the CLI with a pseudo-terminal as its standard streams; returns what the terminal got. */
async function onTerminal(args: string[], stdoutAway = false): Promise<string> {
  const command =
    [process.execPath, cli, 'audit', ...args].map(quote).join(' ') +
    (stdoutAway ? ' > /dev/null' : '');
  const { stdout } = await run('script', ['-qec', command, '/dev/null'], {
    cwd: h.dir,
    env: { PATH: process.env['PATH'] ?? '', TERM: 'xterm', COLUMNS: '120' },
  });
  return stdout;
}

describe('fitgap audit (built)', () => {
  const args = () => ['--range', `${h.shas[0]}..main`, '--artifact', ARTIFACT, '--format', 'json'];

  it('draws progress on a terminal, to standard error', async () => {
    const screen = await onTerminal(args(), true);
    expect(screen).toMatch(/fitgap audit \[[\u2588\u2591]+\] \d\/7 commits/);
    expect(screen).not.toContain('"head":"'); // standard output went elsewhere
  });

  it('no progress with --quiet', async () => {
    const screen = await onTerminal([...args(), '--quiet']);
    expect(screen).not.toContain('fitgap audit [');
    expect(screen).toContain('"head":"');
  });

  it('no progress when standard error is not a terminal; exit codes as documented', async () => {
    const { stdout, stderr } = await run(process.execPath, [cli, 'audit', ...args()], {
      cwd: h.dir,
      env: { PATH: process.env['PATH'] ?? '' },
    });
    expect(stdout.trimEnd().split('\n')).toHaveLength(3);
    expect(stderr).not.toContain('fitgap audit [');
    expect(stderr.trimEnd().split('\n')).toHaveLength(3); // the three skipped commits
    const bad = await run(
      process.execPath,
      [cli, 'audit', '--range', 'nope..main', '--artifact', ARTIFACT],
      {
        cwd: h.dir,
      },
    ).catch((e: { code: number; stderr: string }) => e);
    expect(bad).toMatchObject({ code: 2 });
    expect((bad as { stderr: string }).stderr).toMatch(/^fitgap audit: "nope" is not a commit/);
  });
});
