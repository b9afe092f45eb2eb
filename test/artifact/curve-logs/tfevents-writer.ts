/**
 * Writes TensorBoard event files for tests, independently of the reader: its own protobuf encoder
 * and its own CRC-32C (bitwise, no table). Layout (TensorFlow's event.proto, summary.proto,
 * tensor.proto): Event { wall_time = 1 double; step = 2 int64; file_version = 3 string;
 * summary = 5 } · Summary { value = 1 } · Value { tag = 1; simple_value = 2 float; tensor = 8;
 * metadata = 9 { plugin_data = 1 { plugin_name = 1 } } } · TensorProto { dtype = 1;
 * tensor_shape = 2 { dim = 2 { size = 1 } }; tensor_content = 4; float_val = 5 (packed);
 * double_val = 6; int64_val = 10; half_val = 13 }.
 * TFRecord framing: uint64 length, masked CRC-32C of the length, data, masked CRC-32C of the data.
 * Source: TensorFlow's "TFRecords format details" (tensorflow/docs, api_guides/python/python_io.md).
 */

/** Bitwise CRC-32C (reflected polynomial 0x82F63B78). Source: RFC 3720 §B.4. */
export function crc32cBitwise(bytes: Uint8Array): number {
  let crc = 0xffffffff;
  for (const b of bytes) {
    crc ^= b;
    for (let k = 0; k < 8; k++) crc = crc & 1 ? (crc >>> 1) ^ 0x82f63b78 : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}

export function mask(crc: number): number {
  const rotated = ((crc >>> 15) | (crc << 17)) >>> 0;
  return (rotated + 0xa282ead8) % 2 ** 32;
}

function varint(value: bigint): number[] {
  let v = BigInt.asUintN(64, value);
  const out: number[] = [];
  do {
    let byte = Number(v & 0x7fn);
    v >>= 7n;
    if (v > 0n) byte |= 0x80;
    out.push(byte);
  } while (v > 0n);
  return out;
}

const key = (field: number, wire: number) => varint(BigInt(field * 8 + wire));
const bytesField = (field: number, data: Uint8Array | number[]) => [
  ...key(field, 2),
  ...varint(BigInt(data.length)),
  ...data,
];
const text = (s: string) => [...new TextEncoder().encode(s)];
function float32(v: number): number[] {
  const b = new Uint8Array(4);
  new DataView(b.buffer).setFloat32(0, v, true);
  return [...b];
}
function float64(v: number): number[] {
  const b = new Uint8Array(8);
  new DataView(b.buffer).setFloat64(0, v, true);
  return [...b];
}

export type TensorSpec =
  | { dtype: 'float'; value: number; packed?: boolean; content?: boolean }
  | { dtype: 'double'; value: number; content?: boolean }
  | { dtype: 'int64'; value: number }
  | { dtype: 'half'; bits: number }
  | { dtype: 'float'; values: number[] };

export interface ValueSpec {
  tag: string;
  simple?: number;
  tensor?: TensorSpec;
  plugin?: string;
}

function tensor(spec: TensorSpec): number[] {
  const out: number[] = [];
  const dtype = { float: 1, double: 2, int64: 9, half: 19 }[spec.dtype];
  out.push(...key(1, 0), ...varint(BigInt(dtype)));
  if ('values' in spec) {
    out.push(
      ...bytesField(2, bytesField(2, [...key(1, 0), ...varint(BigInt(spec.values.length))])),
    );
    out.push(...bytesField(5, spec.values.flatMap(float32)));
    return out;
  }
  if (spec.dtype === 'float') {
    if (spec.content === true) out.push(...bytesField(4, float32(spec.value)));
    else if (spec.packed === false) out.push(...key(5, 5), ...float32(spec.value));
    else out.push(...bytesField(5, float32(spec.value)));
  } else if (spec.dtype === 'double') {
    if (spec.content === true) out.push(...bytesField(4, float64(spec.value)));
    else out.push(...bytesField(6, float64(spec.value)));
  } else if (spec.dtype === 'int64') {
    out.push(...bytesField(10, varint(BigInt(spec.value))));
  } else {
    out.push(...bytesField(13, varint(BigInt(spec.bits))));
  }
  return out;
}

function value(spec: ValueSpec): number[] {
  const out = bytesField(1, text(spec.tag));
  if (spec.simple !== undefined) out.push(...key(2, 5), ...float32(spec.simple));
  if (spec.tensor !== undefined) out.push(...bytesField(8, tensor(spec.tensor)));
  if (spec.plugin !== undefined)
    out.push(...bytesField(9, bytesField(1, bytesField(1, text(spec.plugin)))));
  return out;
}

export interface EventSpec {
  step?: number;
  wallTime?: number;
  fileVersion?: string;
  values?: ValueSpec[];
}

export function encodeEvent(spec: EventSpec): Uint8Array {
  const out: number[] = [...key(1, 1), ...float64(spec.wallTime ?? 1_700_000_000)];
  if (spec.step !== undefined && spec.step !== 0)
    out.push(...key(2, 0), ...varint(BigInt(spec.step)));
  if (spec.fileVersion !== undefined) out.push(...bytesField(3, text(spec.fileVersion)));
  if (spec.values !== undefined)
    out.push(
      ...bytesField(
        5,
        spec.values.flatMap((v) => bytesField(1, value(v))),
      ),
    );
  return Uint8Array.from(out);
}

export function frame(data: Uint8Array): Uint8Array {
  const header = new Uint8Array(8);
  new DataView(header.buffer).setBigUint64(0, BigInt(data.length), true);
  const out = new Uint8Array(8 + 4 + data.length + 4);
  const view = new DataView(out.buffer);
  out.set(header, 0);
  view.setUint32(8, mask(crc32cBitwise(header)), true);
  out.set(data, 12);
  view.setUint32(12 + data.length, mask(crc32cBitwise(data)), true);
  return out;
}

/** An event file: a version record, then one record per event. */
export function eventFile(events: EventSpec[]): Uint8Array {
  const parts = [
    frame(encodeEvent({ fileVersion: 'brain.Event:2' })),
    ...events.map((e) => frame(encodeEvent(e))),
  ];
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
