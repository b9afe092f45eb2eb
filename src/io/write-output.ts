/**
 * Writes the review to the file `--out` names. Refuses to overwrite one of the files the review
 * read (by real path or by device and inode, so a hard link or a second name counts too), and
 * turns every write failure (no such folder, a folder, no space left, permission) into an
 * `InputError` that names the file.
 */
import { realpath, stat, writeFile } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';
import { InputError } from '../model/errors.js';
import { describeCode } from './open-untrusted.js';
import type { ReadFile } from './load-run.js';

function refuse(file: string, expected: string, got: string, hint: string): never {
  throw new InputError([{ file, pointer: '', expected, got, hint }]);
}

/** Where `path` would be written, links resolved; null when its folder does not exist. */
async function realTarget(path: string): Promise<string | null> {
  const real = await realpath(path).catch(() => null);
  if (real !== null) return real;
  const folder = await realpath(dirname(path)).catch(() => null);
  return folder === null ? null : join(folder, basename(path));
}

/** The real path and device:inode of a file named as an input, or null when it does not exist. */
export async function identify(path: string): Promise<ReadFile | null> {
  const real = await realpath(path).catch(() => null);
  const info = real === null ? null : await stat(real).catch(() => null);
  return real === null || info === null ? null : { realPath: real, id: `${info.dev}:${info.ino}` };
}

export async function writeOutput(
  path: string,
  text: string,
  file: string,
  inputs: readonly ReadFile[],
): Promise<void> {
  const target = resolve(path);
  const real = await realTarget(target);
  const info = await stat(target).catch(() => null);
  const id = info === null ? null : `${info.dev}:${info.ino}`;
  if (inputs.some((input) => input.realPath === real || (id !== null && input.id === id))) {
    refuse(
      file,
      "must not name one of the review's input files (--out)",
      'an input file',
      'Write the review to a new file.',
    );
  }
  if (info?.isDirectory() === true)
    refuse(file, 'could not be written (--out)', 'a folder', 'Name a file, not a folder.');
  try {
    await writeFile(target, text, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const got =
      code === 'ENOENT'
        ? 'no such folder'
        : code === 'ENOSPC'
          ? 'no space left on the device'
          : code === 'EROFS'
            ? 'a read-only file system'
            : describeCode(code);
    refuse(
      file,
      'could not be written (--out)',
      got,
      'Check that the folder exists and can be written to.',
    );
  }
}
