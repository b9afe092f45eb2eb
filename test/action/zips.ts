/** Zip archives for the tests, built with fflate (the library the action inflates with). */
import { readFileSync } from 'node:fs';
import { strToU8, zipSync } from 'fflate';
import type { Zippable } from 'fflate';

export function zipFiles(files: Record<string, string | Uint8Array>): Uint8Array {
  const entries: Zippable = {};
  for (const [name, content] of Object.entries(files)) {
    entries[name] = typeof content === 'string' ? strToU8(content) : content;
  }
  return zipSync(entries);
}

export function fixtureText(path: string): string {
  return readFileSync(path, 'utf8');
}
