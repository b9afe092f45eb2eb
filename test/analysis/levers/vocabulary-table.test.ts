import { execFile } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AMBIGUOUS, VOCABULARY } from '../../../src/analysis/levers/vocabulary.js';

const run = promisify(execFile);
const script = fileURLToPath(new URL('../../../scripts/vocabulary-table.mjs', import.meta.url));

async function table(...args: string[]): Promise<{ stdout: string; stderr: string; code: number }> {
  try {
    const { stdout, stderr } = await run(process.execPath, [script, ...args]);
    return { stdout, stderr, code: 0 };
  } catch (error) {
    const e = error as { stdout: string; stderr: string; code: number };
    return { stdout: e.stdout, stderr: e.stderr, code: e.code };
  }
}

describe('scripts/vocabulary-table.mjs', () => {
  let dir = '';
  let printed = '';
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'fitgap-vocabulary-'));
    printed = (await table()).stdout;
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('prints one row per vocabulary group and per ambiguous group, between the markers', () => {
    const lines = printed.trimEnd().split('\n');
    expect(lines[0]).toBe('<!-- hyperparameter-vocabulary:start -->');
    expect(lines.at(-1)).toBe('<!-- hyperparameter-vocabulary:end -->');
    const rows = lines.filter((l) => l.startsWith('| `'));
    expect(rows).toHaveLength(VOCABULARY.length + AMBIGUOUS.length);
    expect(printed).toContain(
      '| `C` | regularization | higher = weaker regularization (inverse) | real > 0, log scale |',
    );
    expect(printed).toContain('| `alpha` | regularization | higher = stronger regularization |');
    expect(printed).toContain('| `gamma` | scikit-learn SVC: RBF kernel coefficient');
  });

  it('fills a README block, then finds it fresh; a stale block fails the check', async () => {
    const readme = join(dir, 'README.md');
    await writeFile(
      readme,
      '# x\n\n<!-- hyperparameter-vocabulary:start -->\nold\n<!-- hyperparameter-vocabulary:end -->\n\nafter\n',
    );
    expect((await table('--check', readme)).code).toBe(1);
    expect((await table('--write', readme)).code).toBe(0);
    const text = await readFile(readme, 'utf8');
    expect(text).not.toContain('\nold\n');
    expect(text).toContain(printed.trimEnd());
    expect(text.endsWith('\n\nafter\n')).toBe(true);
    expect((await table('--check', readme)).code).toBe(0);
  });

  it('says so when the file has no block', async () => {
    const readme = join(dir, 'EMPTY.md');
    await writeFile(readme, '# nothing here\n');
    const result = await table('--check', readme);
    expect(result.code).toBe(2);
    expect(result.stderr).toContain('no <!-- hyperparameter-vocabulary:start -->');
  });
});
