/** The bytes of a predictions file, as the byte-level reader (prediction-lines.ts) takes them. */
import type { Readable } from 'node:stream';

/** Bytes of one file, from the start; `read` returns 0 at the end. */
export interface ByteReader {
  read(into: Uint8Array, offset: number, length: number): Promise<number>;
  close(): Promise<void>;
  /** The file's size in bytes once opened, when known (it only sizes the id table). */
  readonly size?: number | null;
}

/**
 * One pass over a file through `open`, which returns a fresh stream of the whole file on every
 * call: the io layer opens the file and decides what may be read (real path, file type, size); this
 * reader never opens anything itself. The stream is opened on the first read and destroyed on
 * `close`. Read errors (an `InputError` for a file that changed while read) arrive from `read`.
 */
export function streamReader(open: () => Promise<Readable>): ByteReader {
  let stream: Readable | null = null;
  let iterator: AsyncIterator<unknown> | null = null;
  let chunk: Uint8Array | null = null;
  let at = 0;
  return {
    async read(into, offset, length) {
      if (iterator === null) {
        stream = await open();
        iterator = stream[Symbol.asyncIterator]();
      }
      while (chunk === null || at >= chunk.length) {
        const next = await iterator.next();
        if (next.done === true) return 0;
        const value: unknown = next.value;
        // A stream in text mode would change the bytes (decoding); the reader needs them as they are.
        if (!(value instanceof Uint8Array))
          throw new TypeError('a predictions stream must yield bytes, not text');
        chunk = value;
        at = 0;
      }
      const n = Math.min(length, chunk.length - at);
      into.set(chunk.subarray(at, at + n), offset);
      at += n;
      return n;
    },
    async close() {
      stream?.destroy();
    },
  };
}

/**
 * One pass over a file through `open`, which returns a fresh byte source of the whole file on every
 * call (the io layer opens and checks the file; this reader never opens anything itself). The
 * source is opened on the first read and closed on `close`.
 */
export function lazyReader(open: () => Promise<ByteReader>): ByteReader {
  let source: ByteReader | null = null;
  let closed = false;
  return {
    async read(into, offset, length) {
      if (closed) return 0;
      source ??= await open();
      return source.read(into, offset, length);
    },
    async close() {
      closed = true;
      await source?.close();
    },
    get size() {
      return source?.size ?? null;
    },
  };
}
