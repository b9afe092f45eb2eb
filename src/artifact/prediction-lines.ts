/**
 * Byte-level reader of one predictions CSV (`id,correct` or `id,loss`), one row at a time, with no
 * string, object or `await` per row: 1 MiB reads into one buffer, ids left in place as bytes.
 *
 * Why hand-written: the file has two columns and millions
 * of rows; a general CSV or line reader builds a string and an object per row, which measured as
 * most of a paired review's time. The rules are still the string rules of a line reader: lines as
 * Node's readline splits them (`\n`, `\r\n`, or a lone `\r`), the header after an optional BOM,
 * blank lines skipped, fields trimmed, only `0`/`1` in a 0/1 column and plain decimals within
 * ±1e15 for a loss; and only lines that need nothing of them take the byte path: `ID,VALUE\n` with
 * ID printable ASCII without a comma and VALUE the byte `0` or `1` (correct) or a plain decimal
 * within ±1e15 (loss). Any other line (CR, BOM, quotes, spaces, UTF-8, odd or large numbers,
 * errors) is decoded and read by the string rules, with the same messages.
 *
 * A row's id is exposed as `key[keyStart, keyStart + keyLen)`: the UTF-8 bytes of the id string the
 * string rules would give, so that equal bytes mean equal ids on both paths. The previous row's id
 * stays readable as `prevKey[prevStart, prevStart + prevLen)` (for the increasing-ids check).
 */
import type { MetricKind } from '../model/run.js';
import { InputError, quote } from '../model/errors.js';
import { MAX_MAGNITUDE } from '../model/limits.js';
import { parseDecimal } from '../model/settings.js';
import { io, primeDecimalReader, readDecimal } from './decimal.js';
import { wasmDecimals, type WasmDecimals } from './decimal-wasm.js';
import type { ByteReader } from './byte-readers.js';

export { lazyReader, streamReader, type ByteReader } from './byte-readers.js';

export const CHUNK = 1 << 20;
/**
 * The first WARM_READS reads take at most WARM_BYTES each. A read that ends inside a row sends the
 * row loop down the paths of a cut row (back to the caller for more bytes); V8 compiles the loop
 * with what it has seen so far, so when those paths had never run, the first 1 MiB boundary threw
 * the compiled loop away (a deoptimization), and the loop ran slow again until it was recompiled
 * (issue 14: 7–20 ms of compiler time each on a busy 2-core machine). Small first reads run those
 * paths a few dozen times while the loop is still interpreted; the rows and their order do not
 * change. (The lockstep loop, lockstep.ts, stops at a cut row and leaves it to these paths too.)
 */
const WARM_READS = 48;
const WARM_BYTES = 1024;
/** `advance()` results. */
export const ROW = 1;
export const END = 0;
export const NEED = -1;
/** Internal: a segment went to the string path; look again. */
const AGAIN = 2;

const HEADER: Record<MetricKind, string> = { proportion: 'id,correct', continuous: 'id,loss' };

/**
 * The value rule of the string path: only the digits 0 and 1 in a 0/1 column (not `0x1`, `+1`,
 * `1e0`); a plain decimal number within ±1e15 for a loss (model/settings.ts `parseDecimal`).
 */
function parseValue(raw: string, kind: MetricKind, file: string, line: number): number {
  const column = kind === 'proportion' ? 'correct' : 'loss';
  const text = raw.trim();
  const value =
    kind === 'proportion'
      ? text === '0' || text === '1'
        ? Number(text)
        : Number.NaN
      : (parseDecimal(text) ?? Number.NaN);
  if (!Number.isFinite(value) || Math.abs(value) > MAX_MAGNITUDE) {
    throw new InputError([
      {
        file,
        pointer: `line ${line}`,
        expected:
          kind === 'proportion'
            ? `column "${column}" must be 1 or 0`
            : `column "${column}" must be a decimal number within ±1e15`,
        got: quote(raw),
      },
    ]);
  }
  return value;
}

/** A DataView of exactly the bytes of `buf`. */
function viewOf(buf: Buffer): DataView {
  return new DataView(buf.buffer, buf.byteOffset, buf.length);
}

export class PredictionLines {
  /** 1-based number of the last line read (readline's count: header and blank lines included). */
  line = 0;
  /** Data rows read. */
  rows = 0;
  /** The current row (after `advance()` returned ROW); `keyView` reads the same bytes as `key`. */
  key: Buffer;
  keyView: DataView;
  keyStart = 0;
  keyLen = 0;
  value = 0;
  /** The previous row's id (prevLen −1 before the second row). */
  prevKey: Buffer;
  prevView: DataView;
  prevStart = 0;
  prevLen = -1;

  /**
   * The bytes read and not yet dropped: rows from `pos` to `end`. `buf`, `view`, `pos`, `end` and
   * `pending` are read by the lockstep loop of pairing.ts, which takes rows through `took`.
   */
  buf: Buffer;
  /** `buf` read four bytes at a time (ids, in id-compare.ts). */
  view: DataView;
  /**
   * Losses: the WebAssembly reader whose memory holds `buf` (decimal-wasm.ts); null for 0/1, where
   * WebAssembly cannot run, and after `buf` outgrew it (then `readDecimal` reads the losses).
   */
  decimals: WasmDecimals | null = null;
  pos = 0;
  /** Bytes before `buf[0]`. */
  private dropped = 0;
  end = 0;
  private eof = false;
  /** Lines decoded by the string rules, not yet read (null: none). */
  pending: string[] | null = null;
  private pendingAt = 0;
  private reads = 0;
  private scratch: Buffer = Buffer.allocUnsafe(256);
  private scratchView = viewOf(this.scratch);
  /** A copy of the last row's id when its bytes are about to be overwritten. */
  private saved: Buffer = Buffer.allocUnsafe(256);
  private savedView = viewOf(this.saved);
  private readonly proportion: boolean;

  constructor(
    private readonly reader: ByteReader,
    readonly file: string,
    readonly kind: MetricKind,
  ) {
    this.proportion = kind === 'proportion';
    if (!this.proportion) this.decimals = wasmDecimals(CHUNK);
    this.buf = this.decimals === null ? Buffer.allocUnsafe(CHUNK) : this.decimals.buf;
    this.view = viewOf(this.buf);
    if (!this.proportion && this.decimals === null) primeDecimalReader();
    this.key = this.buf;
    this.keyView = this.view;
    this.prevKey = this.buf;
    this.prevView = this.view;
  }

  /** Reads more bytes after `advance()` returned NEED (keeps the unread part of the buffer). */
  async fill(): Promise<void> {
    if (this.key === this.buf) this.save();
    this.dropped += this.pos;
    const rest = this.end - this.pos;
    if (rest === this.buf.length) {
      // A line longer than the buffer: grow it (out of the WebAssembly memory: readDecimal reads on).
      const bigger = Buffer.allocUnsafe(this.buf.length * 2);
      this.buf.copy(bigger, 0, this.pos, this.end);
      this.buf = bigger;
      this.view = viewOf(bigger);
      if (this.decimals !== null) {
        this.decimals = null;
        primeDecimalReader();
      }
    } else if (this.pos > 0) this.buf.copyWithin(0, this.pos, this.end);
    this.pos = 0;
    this.end = rest;
    const room = this.buf.length - rest;
    const want = this.reads++ < WARM_READS ? Math.min(room, WARM_BYTES) : room;
    const n = await this.reader.read(this.buf, rest, want);
    if (n === 0) this.eof = true;
    else this.end += n;
  }

  /** Next data row: ROW (fields set), END, or NEED (call `fill()` and try again). */
  advance(): number {
    for (;;) {
      if (this.pending !== null && this.fromPending()) return ROW;
      const result = this.scan();
      if (result !== AGAIN) return result;
    }
  }

  private scan(): number {
    const buf = this.buf;
    const end = this.end;
    let p = this.pos;
    for (;;) {
      if (p >= end) {
        this.pos = p;
        if (!this.eof) return NEED;
        if (this.line === 0) {
          throw new InputError([
            {
              file: this.file,
              pointer: '',
              expected: `is empty; it needs the header "${HEADER[this.kind]}" and one row per example`,
            },
          ]);
        }
        if (this.rows === 0) {
          throw new InputError([
            {
              file: this.file,
              pointer: '',
              expected: 'must have one row per example under its header',
              got: 'no rows',
            },
          ]);
        }
        return END;
      }
      const start = p;
      let c = buf[p] as number;
      if (this.line === 0) return this.slow(start);
      if (c === 10) {
        this.line++;
        p++;
        continue;
      }
      // The id: printable ASCII up to the comma.
      while (c > 32 && c < 127 && c !== 44) {
        if (++p >= end) return this.slow(start);
        c = buf[p] as number;
      }
      if (c !== 44 || p === start) return this.slow(start);
      const idEnd = p;
      p++;
      if (this.proportion) {
        if (p + 1 >= end) return this.slow(start);
        const v = buf[p] as number;
        if ((v !== 48 && v !== 49) || buf[p + 1] !== 10) return this.slow(start);
        this.value = v - 48;
        p += 2;
      } else {
        const after = this.number(p);
        if (after < 0) return this.slow(start);
        p = after;
      }
      this.prevKey = this.key;
      this.prevView = this.keyView;
      this.prevStart = this.keyStart;
      this.prevLen = this.rows === 0 ? -1 : this.keyLen;
      this.key = buf;
      this.keyView = this.view;
      this.keyStart = start;
      this.keyLen = idEnd - start;
      this.line++;
      this.rows++;
      this.pos = p;
      return ROW;
    }
  }

  /**
   * Takes `count` ≥ 1 rows that the lockstep loop read from `buf` by the byte path's rules (the
   * fields are then as after as many ROWs from `advance()`): the last at `[start, start + len)`
   * with `value`, the one before it at `[prevStart, prevStart + prevLen)` (when count ≥ 2), and the
   * next row at `next`.
   */
  took(
    count: number,
    start: number,
    len: number,
    value: number,
    prevStart: number,
    prevLen: number,
    next: number,
  ): void {
    if (count === 1) {
      this.prevKey = this.key;
      this.prevView = this.keyView;
      this.prevStart = this.keyStart;
      this.prevLen = this.rows === 0 ? -1 : this.keyLen;
    } else {
      this.prevKey = this.buf;
      this.prevView = this.view;
      this.prevStart = prevStart;
      this.prevLen = prevLen;
    }
    this.key = this.buf;
    this.keyView = this.view;
    this.keyStart = start;
    this.keyLen = len;
    this.value = value;
    this.line += count;
    this.rows += count;
    this.pos = next;
  }

  /**
   * Reads a plain decimal within ±1e15 followed by `\n` from `from` (decimal-wasm.ts, else
   * decimal.ts `readDecimal`): sets `value` and returns the index after the newline, or −1 for
   * anything else (the line takes the string path, which refuses a larger number).
   */
  private number(from: number): number {
    const decimals = this.decimals;
    if (decimals !== null) {
      const next = decimals.next(from, this.end);
      if (next >= 0) this.value = decimals.value;
      return next;
    }
    const next = readDecimal(this.buf, this.view, from, this.end);
    if (next >= 0) this.value = io[2] as number;
    return next;
  }

  /** The string path for the line(s) of the segment from `start` to the next `\n`. */
  private slow(start: number): number {
    const end = this.end;
    let nl = start < end ? this.buf.indexOf(10, start) : -1;
    if (nl >= end) nl = -1;
    if (nl < 0 && !this.eof) {
      this.pos = start;
      return NEED;
    }
    const stop = nl < 0 ? end : nl;
    this.pos = nl < 0 ? end : nl + 1;
    // readline: `\r\n` ends one line; a lone `\r` ends a line too.
    const text = this.buf.toString('utf8', start, stop);
    const lines = text.split('\r');
    if (text.endsWith('\r')) lines.pop();
    this.pending = lines;
    this.pendingAt = 0;
    return AGAIN;
  }

  /** Reads pending string lines until one is a data row (true) or none are left (false). */
  private fromPending(): boolean {
    const lines = this.pending as string[];
    while (this.pendingAt < lines.length) {
      const text = lines[this.pendingAt++] as string;
      this.line++;
      if (this.line === 1) {
        const header = text.replace(/^\uFEFF/, '').trim();
        if (header !== HEADER[this.kind]) {
          throw new InputError([
            {
              file: this.file,
              pointer: 'line 1',
              expected: `must be the header "${HEADER[this.kind]}" for a ${this.kind} metric`,
              got: quote(header),
            },
          ]);
        }
        continue;
      }
      if (text.trim() === '') continue;
      const comma = text.indexOf(',');
      if (comma < 0 || text.indexOf(',', comma + 1) >= 0) {
        throw new InputError([
          {
            file: this.file,
            pointer: `line ${this.line}`,
            expected: 'must have exactly two fields, id and value',
            got: quote(text),
          },
        ]);
      }
      const id = text.slice(0, comma).trim();
      if (id === '')
        throw new InputError([
          { file: this.file, pointer: `line ${this.line}`, expected: 'must have a non-empty id' },
        ]);
      this.value = parseValue(text.slice(comma + 1), this.kind, this.file, this.line);
      if (this.key === this.scratch) this.save();
      this.prevKey = this.key;
      this.prevView = this.keyView;
      this.prevStart = this.keyStart;
      this.prevLen = this.rows === 0 ? -1 : this.keyLen;
      const length = Buffer.byteLength(id, 'utf8');
      if (length > this.scratch.length) {
        this.scratch = Buffer.allocUnsafe(length * 2);
        this.scratchView = viewOf(this.scratch);
      }
      this.scratch.write(id, 0, 'utf8');
      this.key = this.scratch;
      this.keyView = this.scratchView;
      this.keyStart = 0;
      this.keyLen = length;
      this.rows++;
      return true;
    }
    this.pending = null;
    return false;
  }

  /** The file's size in bytes, when its source knows it (after the first read). */
  get size(): number | null {
    return this.reader.size ?? null;
  }

  /** Bytes read up to the current row. */
  get consumed(): number {
    return this.dropped + this.pos;
  }

  /** Moves the last row's id to `saved` before the buffer holding it is reused. */
  private save(): void {
    if (this.keyLen > this.saved.length) {
      this.saved = Buffer.allocUnsafe(this.keyLen * 2);
      this.savedView = viewOf(this.saved);
    }
    this.key.copy(this.saved, 0, this.keyStart, this.keyStart + this.keyLen);
    this.key = this.saved;
    this.keyView = this.savedView;
    this.keyStart = 0;
  }

  /** The current row's id as a string (for messages). */
  id(): string {
    return this.key.toString('utf8', this.keyStart, this.keyStart + this.keyLen);
  }

  async close(): Promise<void> {
    await this.reader.close();
  }
}
