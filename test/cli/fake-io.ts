import { resolve } from 'node:path';
import type { CliIo } from '../../src/entries/cli/io.js';

/** In-memory CliIo: collects output; writes files into a map. */
export function fakeIo(cwd: string, overrides: Partial<CliIo> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const files = new Map<string, string>();
  const io: CliIo = {
    stdout: (t) => out.push(t),
    stderr: (t) => err.push(t),
    color: false,
    cwd,
    writeFile: async (path, text) => {
      files.set(path, text);
    },
    demoDir: resolve('demo'),
    version: '0.0.0-test',
    ...overrides,
  };
  return { io, stdout: () => out.join(''), stderr: () => err.join(''), files };
}
