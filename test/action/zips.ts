/** Zip archives for the tests, built with fflate (the library the action inflates with). */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
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

/** Every file under `dir`, as upload-artifact would pack the folder (paths relative to it). */
export function filesOf(dir: string, prefix = ''): Record<string, Uint8Array> {
  const out: Record<string, Uint8Array> = {};
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const name = prefix === '' ? entry.name : `${prefix}/${entry.name}`;
    if (entry.isDirectory()) Object.assign(out, filesOf(join(dir, entry.name), name));
    else out[name] = readFileSync(join(dir, entry.name));
  }
  return out;
}
