/**
 * Every input file is opened here, as untrusted: run artifacts, config files, predictions CSVs,
 * epoch logs, and the files of an uploaded bundle. A file is read only when
 * 1. its real path (links resolved) lies inside the folder it was named in: the artifact's folder
 *    for a predictions CSV or an epoch log, the folder of the path as given for the rest;
 * 2. it opens without following a link and without blocking (a FIFO never hangs), and the opened
 *    handle is checked again: the real path of the open descriptor, a regular file (no FIFO,
 *    device, socket or folder), at most the byte limit;
 * 3. it yields exactly the bytes its size promised (files under /proc report 0 and then yield
 *    content: refused).
 * A file that fails a check is refused with a message naming the file and the check; its content is
 * never quoted. The limits have documented defaults and can be raised (flags, inputs, config).
 */
import { isUtf8 } from 'node:buffer';
import { constants, readSync } from 'node:fs';
import { open, realpath } from 'node:fs/promises';
import type { FileHandle } from 'node:fs/promises';
import { Readable } from 'node:stream';
import { dirname, isAbsolute, relative, resolve } from 'node:path';
import { InputError, type Issue } from '../model/errors.js';

const MIB = 1024 * 1024;

/** Byte limits per kind of input file. */
export interface FileLimits {
  /** A run artifact (JSON), an epoch log (it becomes part of the artifact), a bundle's note. */
  artifactBytes: number;
  /** A config file (YAML). */
  configBytes: number;
  /** A predictions CSV (streamed, never held whole). */
  csvBytes: number;
}

/**
 * Defaults: 16 MiB for an artifact (a hundred thousand slices take about 8 MB; parsing holds a few
 * times the text), 1 MiB for a config (a real one is a dozen lines), 512 MiB for a predictions CSV
 * (about twenty million rows; it is streamed, so the limit bounds time, not memory).
 */
export const DEFAULT_FILE_LIMITS: FileLimits = {
  artifactBytes: 16 * MIB,
  configBytes: 1 * MIB,
  csvBytes: 512 * MIB,
};

/** The names under which each limit is set, in MB: flag and action input, and the config key. */
export const LIMIT_NAMES: Record<keyof FileLimits, { option: string; config: string | null }> = {
  artifactBytes: { option: 'max-artifact-mb', config: 'artifact-mb' },
  configBytes: { option: 'max-config-mb', config: null },
  csvBytes: { option: 'max-csv-mb', config: 'csv-mb' },
};

/**
 * Ranges a limit may be set to, in MB (schema/fitgap-config.schema.json states the same). An
 * artifact is held whole while parsed, hence its lower ceiling; a CSV is streamed.
 */
export const LIMIT_RANGES_MB: Record<keyof FileLimits, { min: number; max: number }> = {
  artifactBytes: { min: 0.001, max: 1024 },
  configBytes: { min: 0.001, max: 64 },
  csvBytes: { min: 0.001, max: 65536 },
};

/** A limit written in MB (a flag or an input), as bytes; problems name `label`. */
export function parseLimitMb(
  key: keyof FileLimits,
  text: string,
  label: string,
): { bytes: number } | { issues: Issue[] } {
  const { min, max } = LIMIT_RANGES_MB[key];
  const value = /^\s*(?:\d+(?:\.\d*)?|\.\d+)\s*$/.test(text) ? Number(text) : Number.NaN;
  if (!(value >= min && value <= max)) {
    return {
      issues: [
        {
          file: label,
          pointer: '',
          expected: `must be a number of MB from ${min} to ${max}`,
          got: JSON.stringify(text),
        },
      ],
    };
  }
  return { bytes: Math.round(value * MIB) };
}

/** How each limit is raised, named in the message that refuses a file. */
export const LIMIT_HINTS: Record<keyof FileLimits, string> = {
  artifactBytes:
    'Raise the limit with --max-artifact-mb (action input "max-artifact-mb", config limits.artifact-mb) if the file is genuine.',
  configBytes:
    'Raise the limit with --max-config-mb (action input "max-config-mb") if the file is genuine.',
  csvBytes:
    'Raise the limit with --max-csv-mb (action input "max-csv-mb", config limits.csv-mb) if the file is genuine.',
};

export interface UntrustedFile {
  /** Path to open (absolute or relative to the process's folder). */
  path: string;
  /** Name shown in messages (as the user wrote it). */
  file: string;
  /** What the file should be, for messages: `a run artifact (JSON)`. */
  what: string;
  /** The folder the real path must stay in; default: the folder of `path` itself. */
  folder?: string;
  /** Which limit applies. */
  limit: keyof FileLimits;
  limits: FileLimits;
}

/** An opened, checked file: its size and real path; read it once, then close it. */
export interface CheckedFile {
  handle: FileHandle;
  size: number;
  realPath: string;
  /** Device and inode, to recognise the same file under another name. */
  id: string;
}

const READ_CHUNK = 64 * 1024;

/** The file does not exist (an optional file, such as the default config, may be missing). */
export class MissingFileError extends InputError {}

function refuse(target: UntrustedFile, expected: string, got?: string, hint?: string): never {
  const issue: Issue = { file: target.file, pointer: '', expected };
  if (got !== undefined) issue.got = got;
  if (hint !== undefined) issue.hint = hint;
  throw new InputError([issue]);
}

/** Plain words for the errors opening and reading can meet. */
export function describeCode(code: string | undefined): string {
  switch (code) {
    case 'ENOENT':
      return 'no such file';
    case 'EACCES':
    case 'EPERM':
      return 'permission denied';
    case 'ELOOP':
      return 'a symbolic link where none may be (or a loop of links)';
    case 'EISDIR':
      return 'a folder';
    case 'ENOTDIR':
      return 'a path through something that is not a folder';
    case 'ENXIO':
      return 'a socket or a device without a reader';
    case 'ENAMETOOLONG':
      return 'a name too long for the file system';
    case 'EIO':
      return 'an input/output error';
    case 'EMFILE':
    case 'ENFILE':
      return 'too many open files';
    default:
      return code ?? 'an unknown error';
  }
}

function errorCode(error: unknown): string | undefined {
  return (error as NodeJS.ErrnoException | null)?.code;
}

/** True when `path` is `folder` itself or lies below it (both real paths). */
export function isInside(folder: string, path: string): boolean {
  const rel = relative(folder, path);
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel);
}

function kindOf(stats: {
  isDirectory(): boolean;
  isFIFO(): boolean;
  isSocket(): boolean;
  isCharacterDevice(): boolean;
  isBlockDevice(): boolean;
  isSymbolicLink(): boolean;
}): string {
  if (stats.isDirectory()) return 'a folder';
  if (stats.isFIFO()) return 'a named pipe (FIFO)';
  if (stats.isSocket()) return 'a socket';
  if (stats.isCharacterDevice() || stats.isBlockDevice()) return 'a device';
  if (stats.isSymbolicLink()) return 'a symbolic link';
  return 'not a regular file';
}

const MB = (bytes: number) => `${Math.round((bytes / MIB) * 1000) / 1000} MB`;

/** Opens a file under the checks above. The caller reads it and must close `handle`. */
export async function openChecked(target: UntrustedFile): Promise<CheckedFile> {
  const path = resolve(target.path);
  const where = `could not be read as ${target.what}`;
  let folder: string;
  let real: string;
  try {
    folder = await realpath(resolve(target.folder ?? dirname(path)));
    real = await realpath(path);
  } catch (error) {
    const code = errorCode(error);
    if (code === 'ENOENT')
      throw new MissingFileError([
        {
          file: target.file,
          pointer: '',
          expected: where,
          got: 'no such file',
          hint: 'Check the path.',
        },
      ]);
    refuse(target, where, describeCode(code), 'Check the path.');
  }
  if (!isInside(folder, real)) {
    refuse(
      target,
      `must be a file inside ${target.folder === undefined ? 'the folder it is named in' : "the artifact's folder"}`,
      'a link that leads outside it',
      'Copy the file there instead of linking to it.',
    );
  }
  let handle: FileHandle;
  try {
    // O_NONBLOCK: opening a FIFO without a writer returns at once (and is refused below).
    handle = await open(
      real,
      constants.O_RDONLY | constants.O_NOFOLLOW | constants.O_NONBLOCK | constants.O_NOCTTY,
    );
  } catch (error) {
    refuse(target, where, describeCode(errorCode(error)), 'Check the path and its permissions.');
  }
  try {
    const stats = await handle.stat();
    if (!stats.isFile()) refuse(target, 'must be a regular file', kindOf(stats));
    // Check after open: the descriptor's own path, in case a folder on the way was swapped for a
    // link between the real-path check and the open (Linux; elsewhere the first check stands).
    const opened = await realpath(`/proc/self/fd/${handle.fd}`).catch(() => null);
    if (opened !== null && opened !== real && !isInside(folder, opened)) {
      refuse(target, 'must not change while it is opened', 'a path that moved outside its folder');
    }
    const max = target.limits[target.limit];
    if (stats.size > max) {
      refuse(
        target,
        `must be at most ${MB(max)} (${max} bytes)`,
        `${stats.size} bytes`,
        LIMIT_HINTS[target.limit],
      );
    }
    return { handle, size: stats.size, realPath: real, id: `${stats.dev}:${stats.ino}` };
  } catch (error) {
    await handle.close().catch(() => undefined);
    throw error;
  }
}

function grew(target: UntrustedFile): never {
  refuse(
    target,
    'must be a regular file of fixed size',
    'more bytes than its size promised',
    'Files that change while read (logs being written, files under /proc) are refused; copy it first.',
  );
}

async function readAt(
  target: UntrustedFile,
  handle: FileHandle,
  buffer: Uint8Array,
  at: number,
): Promise<number> {
  try {
    const { bytesRead } = await handle.read(buffer, 0, buffer.length, at);
    return bytesRead;
  } catch (error) {
    refuse(target, `could not be read as ${target.what}`, describeCode(errorCode(error)));
  }
}

/**
 * `readAt` on the calling thread: for the predictions reader's 1 MiB reads of a local file the
 * round trip through libuv's thread pool cost about as much as the copy (2 × 1M rows: 10 ms less
 * of 0.33 s read this way, 9 alternating runs). Nothing else runs while a review reads its files.
 */
function readAtNow(
  target: UntrustedFile,
  handle: FileHandle,
  buffer: Uint8Array,
  at: number,
): number {
  try {
    return readSync(handle.fd, buffer, 0, buffer.length, at);
  } catch (error) {
    refuse(target, `could not be read as ${target.what}`, describeCode(errorCode(error)));
  }
}

/** The whole file, checked; for JSON and YAML. */
export async function readChecked(
  target: UntrustedFile,
): Promise<{ bytes: Buffer; file: CheckedFile }> {
  const file = await openChecked(target);
  try {
    const bytes = Buffer.alloc(file.size);
    let at = 0;
    while (at < file.size) {
      const n = await readAt(target, file.handle, bytes.subarray(at), at);
      if (n === 0) break; // shrank while read: what was there is what we have
      at += n;
    }
    if ((await readAt(target, file.handle, Buffer.alloc(1), at)) > 0) grew(target);
    return { bytes: at === file.size ? bytes : bytes.subarray(0, at), file };
  } finally {
    await file.handle.close().catch(() => undefined);
  }
}

/**
 * A checked file as a stream of Buffers, for the CSV readers. Opening errors are thrown here;
 * read errors arrive as an `InputError` from the stream. The file closes when the stream ends or
 * is destroyed.
 */
export async function streamChecked(
  target: UntrustedFile,
): Promise<{ stream: Readable; file: CheckedFile }> {
  const file = await openChecked(target);
  async function* chunks(): AsyncGenerator<Buffer> {
    try {
      let at = 0;
      while (at < file.size) {
        const buffer = Buffer.alloc(Math.min(READ_CHUNK, file.size - at));
        const n = await readAt(target, file.handle, buffer, at);
        if (n === 0) return;
        at += n;
        yield n === buffer.length ? buffer : buffer.subarray(0, n);
      }
      if ((await readAt(target, file.handle, Buffer.alloc(1), at)) > 0) grew(target);
    } finally {
      await file.handle.close().catch(() => undefined);
    }
  }
  return { stream: Readable.from(chunks(), { objectMode: false }), file };
}

/** One pass over a checked file, read into the caller's buffers (see `bytesChecked`). */
export interface CheckedBytes {
  /** Reads up to `length` bytes into `into` at `offset`; 0 at the end of the file. */
  read(into: Uint8Array, offset: number, length: number): Promise<number>;
  /** Closes the file (again: nothing). */
  close(): Promise<void>;
  /** The size the file had when it was opened and checked. */
  readonly size: number;
}

/**
 * A checked file read straight into the caller's buffers, for the byte-level predictions reader:
 * the same checks and errors as `streamChecked`, without a new buffer per read (fresh memory for
 * every chunk cost more than the reading itself on a file of millions of rows). Opening errors are
 * thrown here, read errors from `read`. The caller must `close` it.
 */
export async function bytesChecked(target: UntrustedFile): Promise<CheckedBytes> {
  const file = await openChecked(target);
  let at = 0;
  let ended = false;
  let closed = false;
  const close = async (): Promise<void> => {
    if (closed) return;
    closed = true;
    await file.handle.close().catch(() => undefined);
  };
  return {
    async read(into, offset, length) {
      if (ended || closed || length <= 0) return 0;
      if (at < file.size) {
        const want = Math.min(length, file.size - at);
        const n = readAtNow(target, file.handle, into.subarray(offset, offset + want), at);
        if (n > 0) {
          at += n;
          return n;
        }
        ended = true; // shrank while read: what was there is what we have
        return 0;
      }
      ended = true;
      if (readAtNow(target, file.handle, Buffer.alloc(1), at) > 0) grew(target);
      return 0;
    },
    close,
    size: file.size,
  };
}

/** Offset of the first byte that breaks UTF-8 (RFC 3629: no overlongs, surrogates or > U+10FFFF). */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i] ?? 0;
    if (b < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let low = 0x80;
    let high = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) need = 1;
    else if (b >= 0xe0 && b <= 0xef) {
      need = 2;
      if (b === 0xe0) low = 0xa0;
      if (b === 0xed) high = 0x9f;
    } else if (b >= 0xf0 && b <= 0xf4) {
      need = 3;
      if (b === 0xf0) low = 0x90;
      if (b === 0xf4) high = 0x8f;
    } else return i;
    for (let k = 1; k <= need; k++) {
      const c = bytes[i + k];
      if (c === undefined || c < (k === 1 ? low : 0x80) || c > (k === 1 ? high : 0xbf)) return i;
    }
    i += need + 1;
  }
  return -1;
}

/** Text that must be UTF-8; invalid bytes are refused (they would turn into U+FFFD silently). */
export function decodeUtf8(bytes: Uint8Array, file: string, what: string): string {
  // Node's own check (the same RFC 3629 rules, natively) for the usual valid file; the byte loop
  // below only finds where a file that failed it breaks, for the message.
  const bad = isUtf8(bytes) ? -1 : firstInvalidUtf8(bytes);
  if (bad < 0)
    return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString('utf8');
  let line = 1;
  for (let i = 0; i < bad; i++) if (bytes[i] === 10) line++;
  throw new InputError([
    {
      file,
      pointer: `line ${line}`,
      expected: `must be UTF-8 text (${what})`,
      got: 'an invalid UTF-8 sequence',
      hint:
        (bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff)
          ? 'The file looks like UTF-16; save it as UTF-8.'
          : 'Save the file as UTF-8.',
    },
  ]);
}
