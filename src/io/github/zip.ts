/**
 * A careful reader for zip archives downloaded from other workflow runs (untrusted). It reads the
 * central directory itself so it can refuse the whole archive when any entry is a link, an absolute
 * path or climbs out with `..`, and it inflates (with fflate) only the entries asked for, counting
 * bytes against a limit while inflating so a zip bomb stops early.
 * Format: PKWARE APPNOTE.TXT 6.3.x §4.3 (common practice; ZIP64 is refused).
 */
import { Inflate } from 'fflate';
import { InputError } from '../../model/errors.js';

export interface ZipEntry {
  name: string;
  method: number;
  compressedSize: number;
  /** Size the central directory declares; checked against the inflated bytes. */
  size: number;
  localOffset: number;
  directory: boolean;
}

const EOCD = 0x06054b50;
const CENTRAL = 0x02014b50;
const LOCAL = 0x04034b50;
const S_IFMT = 0o170000;
const S_IFLNK = 0o120000;
const UNIX = 3;

function refuse(label: string, expected: string, got?: string, hint?: string): never {
  throw new InputError([
    {
      file: label,
      pointer: '',
      expected,
      ...(got === undefined ? {} : { got }),
      ...(hint === undefined ? {} : { hint }),
    },
  ]);
}

/** Why an entry name is unsafe to extract, or null when it is fine. */
export function unsafeName(name: string): string | null {
  if (name === '' || name.includes('\0')) return 'an empty or NUL-containing name';
  const parts = name.split(/[\\/]/);
  if (name.startsWith('/') || name.startsWith('\\') || /^[A-Za-z]:/.test(name))
    return 'an absolute path';
  if (parts.includes('..')) return "a '..' path segment";
  return null;
}

/** Every entry of the archive; refuses the archive when any entry is unsafe. */
export function listEntries(zip: Uint8Array, label: string): ZipEntry[] {
  const view = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
  let eocd = -1;
  for (let i = zip.length - 22; i >= Math.max(0, zip.length - 22 - 0xffff); i--) {
    if (view.getUint32(i, true) === EOCD) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) refuse(label, 'must be a zip archive', 'no end-of-central-directory record');
  const count = view.getUint16(eocd + 10, true);
  let offset = view.getUint32(eocd + 16, true);
  if (count === 0xffff || offset === 0xffffffff) refuse(label, 'must not be a ZIP64 archive');
  const decoder = new TextDecoder();
  const entries: ZipEntry[] = [];
  for (let i = 0; i < count; i++) {
    if (offset + 46 > zip.length || view.getUint32(offset, true) !== CENTRAL) {
      refuse(label, 'must have a readable central directory', `a bad record at byte ${offset}`);
    }
    const madeBy = view.getUint8(offset + 5);
    const method = view.getUint16(offset + 10, true);
    const compressedSize = view.getUint32(offset + 20, true);
    const size = view.getUint32(offset + 24, true);
    const nameLength = view.getUint16(offset + 28, true);
    const extraLength = view.getUint16(offset + 30, true);
    const commentLength = view.getUint16(offset + 32, true);
    const external = view.getUint32(offset + 38, true);
    const localOffset = view.getUint32(offset + 42, true);
    const name = decoder.decode(zip.subarray(offset + 46, offset + 46 + nameLength));
    const problem = unsafeName(name);
    if (problem !== null) {
      refuse(
        label,
        `must not contain an entry with ${problem}`,
        JSON.stringify(name),
        'The archive was refused as a whole.',
      );
    }
    if (madeBy === UNIX && ((external >>> 16) & S_IFMT) === S_IFLNK) {
      refuse(
        label,
        'must not contain symbolic links',
        JSON.stringify(name),
        'The archive was refused as a whole.',
      );
    }
    entries.push({
      name,
      method,
      compressedSize,
      size,
      localOffset,
      directory: name.endsWith('/'),
    });
    offset += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}

/** Bytes still allowed to be inflated from one archive. */
export interface InflateBudget {
  remaining: number;
  limit: number;
}

/** Inflates one entry, stopping as soon as the budget is spent. */
export function readEntry(
  zip: Uint8Array,
  entry: ZipEntry,
  budget: InflateBudget,
  label: string,
): Uint8Array {
  const view = new DataView(zip.buffer, zip.byteOffset, zip.byteLength);
  const at = entry.localOffset;
  if (at + 30 > zip.length || view.getUint32(at, true) !== LOCAL) {
    refuse(label, 'must have a readable local header', JSON.stringify(entry.name));
  }
  const start = at + 30 + view.getUint16(at + 26, true) + view.getUint16(at + 28, true);
  const data = zip.subarray(start, start + entry.compressedSize);
  const over = () =>
    refuse(
      label,
      `must inflate to at most ${budget.limit} bytes`,
      `more while inflating ${JSON.stringify(entry.name)}`,
      'Raise "archive-limit-mb" if the archive is genuine.',
    );
  const corrupt = (detail: string): never =>
    refuse(
      label,
      `must hold readable data in ${JSON.stringify(entry.name)}`,
      detail,
      'The archive is damaged; upload it again.',
    );
  if (entry.method === 0) {
    if (data.length > budget.remaining) over();
    if (data.length !== entry.size || data.length !== entry.compressedSize)
      corrupt(`${data.length} stored bytes where its directory says ${entry.size}`);
    budget.remaining -= data.length;
    return data.slice();
  }
  if (entry.method !== 8)
    refuse(label, 'must use stored or deflate entries', `method ${entry.method}`);
  const chunks: Uint8Array[] = [];
  let total = 0;
  const inflater = new Inflate((chunk) => {
    total += chunk.length;
    if (total > budget.remaining) over();
    chunks.push(chunk);
  });
  const step = 64 * 1024;
  try {
    for (let i = 0; i < data.length; i += step) {
      inflater.push(data.subarray(i, i + step), i + step >= data.length);
    }
    if (data.length === 0) inflater.push(new Uint8Array(0), true);
  } catch (error) {
    if (error instanceof InputError) throw error; // the budget ran out
    corrupt(`invalid deflate data (${error instanceof Error ? error.message : String(error)})`);
  }
  if (total !== entry.size) {
    refuse(
      label,
      `must hold ${entry.size} bytes in ${JSON.stringify(entry.name)} as its directory says`,
      String(total),
    );
  }
  budget.remaining -= total;
  const out = new Uint8Array(total);
  let pos = 0;
  for (const chunk of chunks) {
    out.set(chunk, pos);
    pos += chunk.length;
  }
  return out;
}
