/**
 * A reader for the protocol-buffer wire format, enough to walk TensorBoard's `Event`, `Summary`
 * and `TensorProto` messages: varints, 32- and 64-bit fixed fields, length-delimited fields, and
 * skipping whatever else a message holds. Source: protobuf.dev, "Encoding" (wire types 0, 1, 2, 5).
 *
 * Hand-written rather than a library: three messages are read, nothing is written, and a generic
 * decoder would need the .proto files bundled and bring code paths we do not use. Malformed input
 * throws `MalformedProto`, which the caller turns into an InputError naming the record.
 */

export class MalformedProto extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MalformedProto';
  }
}

export const WIRE = { varint: 0, fixed64: 1, bytes: 2, fixed32: 5 } as const;

const SCRATCH = new Uint8Array(8);
const SCRATCH_VIEW = new DataView(SCRATCH.buffer);

export class ProtoReader {
  private pos: number;
  private readonly end: number;
  constructor(
    private readonly buf: Uint8Array,
    start = 0,
    end = buf.length,
  ) {
    this.pos = start;
    this.end = end;
  }

  done(): boolean {
    return this.pos >= this.end;
  }

  /** Field number and wire type of the next field. */
  tag(): { field: number; wire: number } {
    const key = this.varint();
    const field = Math.floor(key / 8);
    if (field < 1) throw new MalformedProto(`field number 0 at byte ${this.pos}`);
    return { field, wire: key % 8 };
  }

  /** An unsigned varint as a number (exact up to 2^53). */
  varint(): number {
    let result = 0;
    let scale = 1;
    for (let i = 0; i < 10; i++) {
      if (this.pos >= this.end) throw new MalformedProto('varint runs past the end');
      const b = this.buf[this.pos++] as number;
      result += (b & 0x7f) * scale;
      if ((b & 0x80) === 0) return result;
      scale *= 128;
    }
    throw new MalformedProto('varint longer than 10 bytes');
  }

  /** A varint read as a two's-complement int64 (negative steps take 10 bytes). */
  int64(): number {
    const start = this.pos;
    const unsigned = this.varint();
    if (unsigned < 2 ** 53) return unsigned;
    // Re-read exactly with BigInt for values past 2^53 (negative numbers among them).
    let value = 0n;
    let shift = 0n;
    for (let p = start; p < this.pos; p++) {
      value |= BigInt((this.buf[p] as number) & 0x7f) << shift;
      shift += 7n;
    }
    return Number(BigInt.asIntN(64, value));
  }

  /** Copies a fixed-width field into the scratch buffer (little-endian, as the wire is). */
  private fixed(size: number): void {
    if (this.end - this.pos < size) throw new MalformedProto('fixed field runs past the end');
    for (let i = 0; i < size; i++) SCRATCH[i] = this.buf[this.pos + i] as number;
    this.pos += size;
  }

  float(): number {
    this.fixed(4);
    return SCRATCH_VIEW.getFloat32(0, true);
  }

  double(): number {
    this.fixed(8);
    return SCRATCH_VIEW.getFloat64(0, true);
  }

  /** A length-delimited field's bytes (a view, not a copy). */
  bytes(): Uint8Array {
    const length = this.varint();
    if (length > this.end - this.pos) throw new MalformedProto('length runs past the end');
    const out = this.buf.subarray(this.pos, this.pos + length);
    this.pos += length;
    return out;
  }

  skip(wire: number): void {
    if (wire === WIRE.varint) this.varint();
    else if (wire === WIRE.fixed64) this.fixed(8);
    else if (wire === WIRE.bytes) this.bytes();
    else if (wire === WIRE.fixed32) this.fixed(4);
    else throw new MalformedProto(`unsupported wire type ${wire}`);
  }
}

/** Reads a repeated numeric field that may be packed (one length-delimited run) or not. */
export function readRepeated(
  reader: ProtoReader,
  wire: number,
  scalarWire: number,
  one: (r: ProtoReader) => number,
  out: number[],
): void {
  if (wire === scalarWire) {
    out.push(one(reader));
    return;
  }
  if (wire !== WIRE.bytes) throw new MalformedProto(`unexpected wire type ${wire}`);
  const run = reader.bytes();
  const inner = new ProtoReader(run);
  while (!inner.done()) out.push(one(inner));
}

const decoder = new TextDecoder('utf-8', { fatal: true });

export function utf8(bytes: Uint8Array): string {
  try {
    return decoder.decode(bytes);
  } catch {
    throw new MalformedProto('string field is not UTF-8');
  }
}
