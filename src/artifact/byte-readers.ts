/** The bytes of a predictions file, as the byte-level reader (prediction-lines.ts) takes them. */
import type { FileHandle } from 'node:fs/promises';

/** Bytes of one file, from the start; `read` returns 0 at the end. */
export interface ByteReader {
  read(into: Uint8Array, offset: number, length: number): Promise<number>;
  close(): Promise<void>;
}

/**
 * Where the bytes of a predictions file come from. The caller opens the file (and so decides what
 * may be opened: path, file type, size); the reader only reads it. A file handle is read with
 * explicit positions; a function returns a fresh stream of the whole file on every call. Both can
 * be read more than once: a file whose ids may repeat is read again to find and name the lines
 * (predictions.ts). The file's size (`stat`) of a handle sizes the id table.
 */
export type PredictionsSource = FileHandle | (() => AsyncIterable<Uint8Array>);

export function handleReader(handle: FileHandle): ByteReader {
  let position = 0;
  return {
    async read(into, offset, length) {
      const { bytesRead } = await handle.read(into, offset, length, position);
      position += bytesRead;
      return bytesRead;
    },
    async close() {},
  };
}

export function iterableReader(make: () => AsyncIterable<Uint8Array>): ByteReader {
  const iterator = make()[Symbol.asyncIterator]();
  let chunk: Uint8Array | null = null;
  let at = 0;
  return {
    async read(into, offset, length) {
      while (chunk === null || at >= chunk.length) {
        const next = await iterator.next();
        if (next.done === true) return 0;
        chunk = next.value;
        at = 0;
      }
      const n = Math.min(length, chunk.length - at);
      into.set(chunk.subarray(at, at + n), offset);
      at += n;
      return n;
    },
    async close() {
      await iterator.return?.();
    },
  };
}
