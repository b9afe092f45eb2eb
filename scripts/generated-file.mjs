// Writes a generated file that is committed, or with `--check` on the command line only tells
// whether the committed one differs from what would be written (CI runs the generators so).
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';

/**
 * Writes `text` to `path` unless it is already there; with `--check`, writes nothing and reports a
 * difference (naming `command`, which writes it). False when `--check` found the file stale.
 */
export function writeGenerated(path, text, command) {
  let old = null;
  try {
    old = readFileSync(path, 'utf8');
  } catch {
    old = null;
  }
  if (old === text) return true;
  if (process.argv.includes('--check')) {
    console.error(`${path} is stale: run '${command}' and commit it.`);
    return false;
  }
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, text);
  return true;
}
