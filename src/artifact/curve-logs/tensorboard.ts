/**
 * TensorBoard event files (`events.out.tfevents.*`): TFRecord framing around protocol-buffer
 * `Event` messages. Scalars come as `Summary.Value.simple_value` (PyTorch, TensorFlow 1) or as a
 * one-element `Summary.Value.tensor` (TensorFlow 2 and Keras). Fields read (tensorflow/core/util/
 * event.proto, framework/summary.proto, framework/tensor.proto, framework/tensor_shape.proto):
 *   Event         { wall_time = 1 double; step = 2 int64; summary = 5 Summary }
 *   Summary       { value = 1 repeated Value }
 *   Value         { tag = 1 string; simple_value = 2 float; tensor = 8 TensorProto;
 *                   metadata = 9 SummaryMetadata { plugin_data = 1 { plugin_name = 1 string } } }
 *   TensorProto   { dtype = 1; tensor_shape = 2 { dim = 2 repeated { size = 1 } };
 *                   tensor_content = 4 bytes; float_val = 5; double_val = 6; int_val = 7;
 *                   int64_val = 10; half_val = 13 }
 * DataType numbers: DT_FLOAT 1, DT_DOUBLE 2, DT_INT32 3, DT_INT64 9, DT_HALF 19 (types.proto).
 * x is the event's step; float32 values are written as the shortest decimal that reads back as the
 * same float32. Pure: bytes in, series out.
 */
import { InputError } from '../../model/errors.js';
import { MAX_EVENT_FILE_BYTES, MAX_SERIES } from './limits.js';
import { MalformedProto, ProtoReader, WIRE, readRepeated, utf8 } from './protobuf.js';
import { readTfRecords } from './tfrecord.js';
import { PointBudget } from './text.js';
import type { CurveLogWarning, ReadResult, Series } from './types.js';

export interface TensorBoardOptions {
  budget?: PointBudget;
}

const DT = { float: 1, double: 2, int32: 3, int64: 9, half: 19 } as const;

interface ScalarValue {
  tag: string;
  /** undefined: not a numeric scalar (image, histogram, text, a longer tensor). */
  value: number | undefined;
  plugin?: string;
}

/**
 * The shortest decimal that reads back as the same float32: a logged 0.95f is 0.949999988079071
 * as a double, and writing that into a curve would claim digits the log never had.
 */
export function shortestFloat32(value: number): number {
  if (!Number.isFinite(value) || value === 0) return value;
  for (let digits = 1; digits <= 9; digits++) {
    const candidate = Number(value.toPrecision(digits));
    if (Math.fround(candidate) === value) return candidate;
  }
  return value;
}

function halfToNumber(bits: number): number {
  const sign = bits & 0x8000 ? -1 : 1;
  const exponent = (bits >> 10) & 0x1f;
  const fraction = bits & 0x3ff;
  if (exponent === 0) return sign * 2 ** -14 * (fraction / 1024);
  if (exponent === 31) return fraction === 0 ? sign * Infinity : Number.NaN;
  return sign * 2 ** (exponent - 15) * (1 + fraction / 1024);
}

function shapeSize(bytes: Uint8Array): number {
  const reader = new ProtoReader(bytes);
  let size = 1;
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 2 && wire === WIRE.bytes) {
      const dim = new ProtoReader(reader.bytes());
      let n = 0;
      while (!dim.done()) {
        const t = dim.tag();
        if (t.field === 1 && t.wire === WIRE.varint) n = dim.int64();
        else dim.skip(t.wire);
      }
      size *= n;
    } else reader.skip(wire);
  }
  return size;
}

function fromContent(content: Uint8Array, dtype: number): number | undefined {
  const width = { [DT.float]: 4, [DT.double]: 8, [DT.int32]: 4, [DT.int64]: 8, [DT.half]: 2 }[
    dtype
  ];
  if (width === undefined || content.length !== width) return undefined;
  const view = new DataView(content.buffer, content.byteOffset, width);
  if (dtype === DT.float) return shortestFloat32(view.getFloat32(0, true));
  if (dtype === DT.double) return view.getFloat64(0, true);
  if (dtype === DT.int32) return view.getInt32(0, true);
  if (dtype === DT.int64) return Number(view.getBigInt64(0, true));
  return halfToNumber(view.getUint16(0, true));
}

/** The value of a one-element numeric tensor; undefined for anything else. */
function scalarOfTensor(bytes: Uint8Array): number | undefined {
  const reader = new ProtoReader(bytes);
  let dtype = 0;
  let size = 1;
  let content: Uint8Array | undefined;
  const values: number[] = [];
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 1 && wire === WIRE.varint) dtype = reader.varint();
    else if (field === 2 && wire === WIRE.bytes) size = shapeSize(reader.bytes());
    else if (field === 4 && wire === WIRE.bytes) content = reader.bytes();
    else if (field === 5)
      readRepeated(reader, wire, WIRE.fixed32, (r) => shortestFloat32(r.float()), values);
    else if (field === 6) readRepeated(reader, wire, WIRE.fixed64, (r) => r.double(), values);
    else if (field === 7 || field === 10)
      readRepeated(reader, wire, WIRE.varint, (r) => r.int64(), values);
    else if (field === 13)
      readRepeated(reader, wire, WIRE.varint, (r) => halfToNumber(r.varint() & 0xffff), values);
    else reader.skip(wire);
  }
  if (size !== 1 || !(Object.values(DT) as number[]).includes(dtype)) return undefined;
  if (content !== undefined && content.length > 0) return fromContent(content, dtype);
  return values.length === 1 ? values[0] : undefined;
}

function pluginName(bytes: Uint8Array): string | undefined {
  const reader = new ProtoReader(bytes);
  let name: string | undefined;
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 1 && wire === WIRE.bytes) {
      const data = new ProtoReader(reader.bytes());
      while (!data.done()) {
        const t = data.tag();
        if (t.field === 1 && t.wire === WIRE.bytes) name = utf8(data.bytes());
        else data.skip(t.wire);
      }
    } else reader.skip(wire);
  }
  return name;
}

function readValue(bytes: Uint8Array): ScalarValue {
  const reader = new ProtoReader(bytes);
  const out: ScalarValue = { tag: '', value: undefined };
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 1 && wire === WIRE.bytes) out.tag = utf8(reader.bytes());
    else if (field === 2 && wire === WIRE.fixed32) out.value = shortestFloat32(reader.float());
    else if (field === 8 && wire === WIRE.bytes) out.value = scalarOfTensor(reader.bytes());
    else if (field === 9 && wire === WIRE.bytes) {
      const plugin = pluginName(reader.bytes());
      if (plugin !== undefined) out.plugin = plugin;
    } else reader.skip(wire);
  }
  return out;
}

function readEvent(bytes: Uint8Array): { step: number; values: ScalarValue[] } {
  const reader = new ProtoReader(bytes);
  let step = 0;
  const summaries: Uint8Array[] = [];
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 2 && wire === WIRE.varint) step = reader.int64();
    else if (field === 5 && wire === WIRE.bytes) summaries.push(reader.bytes());
    else reader.skip(wire);
  }
  const values: ScalarValue[] = [];
  for (const summary of summaries) {
    const s = new ProtoReader(summary);
    while (!s.done()) {
      const { field, wire } = s.tag();
      if (field === 1 && wire === WIRE.bytes) values.push(readValue(s.bytes()));
      else s.skip(wire);
    }
  }
  return { step, values };
}

export function readTensorBoard(
  bytes: Uint8Array,
  file: string,
  options: TensorBoardOptions = {},
): ReadResult {
  if (bytes.length > MAX_EVENT_FILE_BYTES) {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: `must be at most ${MAX_EVENT_FILE_BYTES / 1024 / 1024} MiB`,
        got: `${bytes.length} bytes`,
        hint: 'Import the event file of the scalars only, or split the run.',
      },
    ]);
  }
  const budget = options.budget ?? new PointBudget();
  const { records, truncatedAt } = readTfRecords(bytes, file);
  const byTag = new Map<string, Series>();
  /** Tags whose metadata names a plugin other than scalars (TensorFlow sends it once per tag). */
  const otherPlugin = new Set<string>();
  let skipped = 0;
  const where = { kind: 'record' } as const;
  for (const record of records) {
    let event: ReturnType<typeof readEvent>;
    try {
      event = readEvent(record.data);
    } catch (error) {
      if (!(error instanceof MalformedProto)) throw error;
      throw new InputError([
        {
          file,
          pointer: `record ${record.number} (byte ${record.offset})`,
          expected: 'must hold a TensorBoard Event message',
          got: error.message,
          hint: 'Name an events.out.tfevents.* file written by TensorBoard, PyTorch or Keras.',
        },
      ]);
    }
    for (const v of event.values) {
      if (v.plugin !== undefined && v.plugin !== 'scalars') otherPlugin.add(v.tag);
      if (v.tag === '' || otherPlugin.has(v.tag)) continue;
      if (v.value === undefined) {
        skipped++;
        continue;
      }
      let series = byTag.get(v.tag);
      if (series === undefined) {
        if (byTag.size >= MAX_SERIES)
          throw new InputError([
            {
              file,
              pointer: `record ${record.number}`,
              expected: `must hold at most ${MAX_SERIES} scalar tags`,
            },
          ]);
        series = { name: v.tag, file, x: 'step', where, points: [], problems: [] };
        byTag.set(v.tag, series);
      }
      if (!Number.isFinite(v.value)) {
        if (series.problems.length < 10)
          series.problems.push({
            file,
            pointer: `record ${record.number}`,
            expected: `tag "${v.tag}" must be a finite number`,
            got: String(v.value),
            hint: 'The run logged NaN or infinity here (it may have diverged); pick another series or cut the run.',
          });
        continue;
      }
      budget.take(file, where, record.number);
      series.points.push({ x: event.step, value: v.value, at: record.number });
    }
  }
  const warnings: CurveLogWarning[] = [];
  if (skipped > 0) warnings.push({ code: 'non-scalar-skipped', file, count: skipped });
  if (truncatedAt !== undefined)
    warnings.push({ code: 'truncated-record', file, offset: truncatedAt });
  return { series: [...byTag.values()], warnings };
}
