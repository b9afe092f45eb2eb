/**
 * The bad-input corpus: every file under test/fixtures/bad/ that a user could get wrong, each
 * run through the CLI in-process. Each must exit 2 with a message naming the file, the place
 * (JSON pointer or line) and the problem, and never print a stack trace.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../../src/entries/cli/main.js';
import { fakeIo } from './fake-io.js';

interface Case {
  id: string;
  args: string[];
  expect: string[];
}

const dir = resolve('test/fixtures/bad');
const cases = JSON.parse(readFileSync(resolve(dir, 'cases.json'), 'utf8')) as Case[];

describe('bad input corpus', () => {
  it('has at least 25 cases', () => {
    expect(cases.length).toBeGreaterThanOrEqual(25);
  });

  it.each(cases.map((c) => [c.id, c] as const))(
    '%s exits 2 with a clear message',
    async (_id, c) => {
      const { io, stdout, stderr } = fakeIo(dir);
      const code = await runCli(c.args, io);
      expect(code).toBe(2);
      const message = stderr();
      for (const fragment of c.expect) expect(message).toContain(fragment);
      // Files are named as the user typed them, not as absolute paths.
      expect(message).not.toContain(dir);
      expect(message).not.toMatch(/\n\s+at /); // no stack trace
      // Nothing half-done reaches standard output for a review.
      if (c.args[0] === 'review') expect(stdout()).toBe('');
    },
  );

  it('reports up to 10 problems at once', async () => {
    const { io, stderr } = fakeIo(dir);
    const doc = JSON.parse(readFileSync(resolve(dir, 'good.json'), 'utf8')) as {
      splits: { train: { values: unknown[] } };
    };
    doc.splits.train.values = Array.from({ length: 14 }, () => 'x');
    const { writeFileSync, mkdtempSync } = await import('node:fs');
    const { tmpdir } = await import('node:os');
    const tmp = mkdtempSync(resolve(tmpdir(), 'fitgap-'));
    writeFileSync(resolve(tmp, 'many.json'), JSON.stringify(doc));
    writeFileSync(resolve(tmp, 'good.json'), readFileSync(resolve(dir, 'good.json')));
    const code = await runCli(['review', '--baseline', 'good.json', '--candidate', 'many.json'], {
      ...io,
      cwd: tmp,
    });
    expect(code).toBe(2);
    const lines = stderr().trim().split('\n');
    expect(lines).toHaveLength(11);
    expect(lines[10]).toBe('…and 4 more problems.');
  });
});
