/**
 * The opening policy on its own: errors the file system can answer with (EACCES cannot be made
 * with chmod when the tests run as root, so `open` is made to answer it here), the UTF-8 check
 * against Node's own decoder, and reading exactly the promised bytes.
 */
import { isUtf8 } from 'node:buffer';
import { appendFileSync, mkdtempSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import type * as FsPromises from 'node:fs/promises';
import { describe, expect, it, vi } from 'vitest';

vi.mock('node:fs/promises', async (importOriginal) => {
  const original = await importOriginal<typeof FsPromises>();
  return {
    ...original,
    open: (
      path: string,
      ...rest: Parameters<typeof original.open> extends [unknown, ...infer R] ? R : never
    ) => {
      if (String(path).includes('denied'))
        return Promise.reject(
          Object.assign(new Error('EACCES: permission denied'), { code: 'EACCES' }),
        );
      return original.open(path, ...rest);
    },
  };
});

const { DEFAULT_FILE_LIMITS, bytesChecked, firstInvalidUtf8, readChecked, streamChecked } =
  await import('../../src/io/open-untrusted.js');
const { runCli } = await import('../../src/entries/cli/main.js');
const { fakeIo } = await import('../cli/fake-io.js');

const dir = mkdtempSync(join(tmpdir(), 'fitgap-open-'));
const target = (name: string) => ({
  path: join(dir, name),
  file: name,
  what: 'a test file',
  limit: 'csvBytes' as const,
  limits: DEFAULT_FILE_LIMITS,
});

describe('openChecked and friends', () => {
  it('EACCES on a predictions file: exit 2 naming the file and "permission denied"', async () => {
    const good = JSON.parse(
      (await import('node:fs')).readFileSync('test/fixtures/bad/good.json', 'utf8'),
    ) as Record<string, unknown>;
    good['predictions'] = { split: 'validation', path: 'denied.csv' };
    writeFileSync(join(dir, 'run.json'), JSON.stringify(good));
    writeFileSync(join(dir, 'denied.csv'), 'id,correct\na,1\n');
    const { io, stderr } = fakeIo(dir);
    const code = await runCli(['review', '--baseline', 'run.json', '--candidate', 'run.json'], io);
    expect(code).toBe(2);
    expect(stderr()).toContain(
      'denied.csv could not be read as a predictions CSV (got permission denied)',
    );
  });

  it('reads exactly the bytes of a file, whole or streamed', async () => {
    const bytes = Buffer.from('x'.repeat(200_000));
    writeFileSync(join(dir, 'big.txt'), bytes);
    const whole = await readChecked(target('big.txt'));
    expect(whole.bytes.equals(bytes)).toBe(true);
    const { stream } = await streamChecked(target('big.txt'));
    const chunks: Buffer[] = [];
    for await (const chunk of stream) chunks.push(chunk as Buffer);
    expect(Buffer.concat(chunks).equals(bytes)).toBe(true);
  });

  it("reads exactly the bytes of a file into the caller's buffer, in reads of any size", async () => {
    const bytes = Buffer.from(Array.from({ length: 150_000 }, (_, i) => (i * 31) % 251));
    writeFileSync(join(dir, 'bytes.bin'), bytes);
    for (const size of [1, 4096, 65_536, 1 << 20]) {
      const source = await bytesChecked(target('bytes.bin'));
      const into = Buffer.alloc(size + 3);
      const parts: Buffer[] = [];
      for (let n = await source.read(into, 3, size); n > 0; n = await source.read(into, 3, size))
        parts.push(Buffer.from(into.subarray(3, 3 + n)));
      await source.close();
      expect(Buffer.concat(parts).equals(bytes)).toBe(true);
    }
  });

  it('refuses a file that grows while read in place, and reads what is left of one that shrinks', async () => {
    writeFileSync(join(dir, 'grows.csv'), 'id,correct\na,1\n');
    const growing = await bytesChecked(target('grows.csv'));
    const into = Buffer.alloc(64);
    expect(await growing.read(into, 0, 64)).toBe(15);
    appendFileSync(join(dir, 'grows.csv'), 'b,0\n');
    await expect(growing.read(into, 0, 64)).rejects.toThrow(
      'grows.csv must be a regular file of fixed size (got more bytes than its size promised)',
    );
    await growing.close();

    writeFileSync(join(dir, 'shrinks.csv'), 'id,correct\na,1\nb,0\n');
    const shrinking = await bytesChecked(target('shrinks.csv'));
    expect(await shrinking.read(into, 0, 11)).toBe(11);
    truncateSync(join(dir, 'shrinks.csv'), 15);
    expect(await shrinking.read(into, 0, 64)).toBe(4);
    expect(await shrinking.read(into, 0, 64)).toBe(0);
    await shrinking.close();
  });

  it('an empty file reads as empty', async () => {
    writeFileSync(join(dir, 'empty.txt'), '');
    expect((await readChecked(target('empty.txt'))).bytes.length).toBe(0);
  });
});

describe('firstInvalidUtf8', () => {
  // Source: Node's TextDecoder (WHATWG Encoding Standard, UTF-8 decoder), the reference here.
  const fatal = new TextDecoder('utf-8', { fatal: true });
  const valid = (bytes: Uint8Array) => {
    try {
      fatal.decode(bytes);
      return true;
    } catch {
      return false;
    }
  };

  it('agrees with the WHATWG decoder on random bytes', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 64 }), (bytes) => {
        expect(firstInvalidUtf8(bytes) < 0).toBe(valid(bytes));
      }),
      { numRuns: 2000 },
    );
  });

  /** UTF-8 text with one byte (at a random place) set to a random value: mostly near-valid. */
  const nearValidUtf8 = fc
    .tuple(fc.string({ unit: 'binary', maxLength: 40 }), fc.nat(), fc.integer({ min: 0, max: 255 }))
    .map(([text, at, byte]) => {
      const bytes = Buffer.from(text, 'utf8');
      if (bytes.length > 0) bytes[at % bytes.length] = byte;
      return bytes;
    });

  it('agrees on text with one byte changed, and points at or before the change', () => {
    fc.assert(
      fc.property(nearValidUtf8, (bytes) => {
        if (bytes.length === 0) return;
        const bad = firstInvalidUtf8(bytes);
        expect(bad < 0).toBe(valid(bytes));
        if (bad >= 0) expect(valid(bytes.subarray(0, bad))).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });

  it("agrees with node:buffer's isUtf8, which decodeUtf8 asks first", () => {
    // Source: Node's isUtf8 (simdutf, RFC 3629) against the byte loop, on near-valid text.
    fc.assert(
      fc.property(nearValidUtf8, (bytes) => {
        expect(firstInvalidUtf8(bytes) < 0).toBe(isUtf8(bytes));
      }),
      { numRuns: 2000 },
    );
  });

  it.each([
    ['overlong "/"', [0xc0, 0xaf]],
    ['a surrogate', [0xed, 0xa0, 0x80]],
    ['past U+10FFFF', [0xf4, 0x90, 0x80, 0x80]],
    ['a lone continuation', [0x80]],
    ['a cut sequence', [0xe2, 0x82]],
  ])('refuses %s', (_name, bytes) => {
    expect(firstInvalidUtf8(Uint8Array.from(bytes))).toBe(0);
  });
});
