/**
 * TFRecord framing, as TensorFlow writes event files: each record is
 *   uint64 length (little-endian) · uint32 masked CRC-32C of those 8 bytes ·
 *   length bytes of data · uint32 masked CRC-32C of the data.
 * Source: TensorFlow's "TFRecords format details" (tensorflow/docs, api_guides/python/python_io.md).
 * Both checksums are verified. A file that ends inside its last record (a writer still running) is
 * not an error: the complete records are returned with the offset of the partial one.
 */
import { InputError } from '../../model/errors.js';
import { crc32c, maskCrc } from './crc32c.js';

export interface TfRecords {
  /** Each record's data, with its 1-based number and byte offset. */
  records: { data: Uint8Array; number: number; offset: number }[];
  /** Byte offset of a partial record at the end of the file, if any. */
  truncatedAt?: number;
}

function readUint32(bytes: Uint8Array, at: number): number {
  return (
    ((bytes[at] as number) |
      ((bytes[at + 1] as number) << 8) |
      ((bytes[at + 2] as number) << 16) |
      ((bytes[at + 3] as number) << 24)) >>>
    0
  );
}

export function readTfRecords(bytes: Uint8Array, file: string): TfRecords {
  const records: TfRecords['records'] = [];
  let offset = 0;
  let number = 0;
  while (offset < bytes.length) {
    number++;
    const where = `record ${number} (byte ${offset})`;
    if (bytes.length - offset < 12) return { records, truncatedAt: offset };
    if (maskCrc(crc32c(bytes, offset, offset + 8)) !== readUint32(bytes, offset + 8)) {
      throw new InputError([
        {
          file,
          pointer: where,
          expected: 'must start with a record length whose checksum matches',
          hint: 'The file is damaged or is not a TensorBoard event file (events.out.tfevents.*).',
        },
      ]);
    }
    const high = readUint32(bytes, offset + 4);
    const length = readUint32(bytes, offset);
    const start = offset + 12;
    // The length's checksum matched, so a record longer than the rest of the file was cut short.
    if (high === 0 && length > bytes.length - start - 4) return { records, truncatedAt: offset };
    if (high !== 0) {
      throw new InputError([
        {
          file,
          pointer: where,
          expected: 'must have a record length under 4 GiB',
          got: `${high * 2 ** 32 + length} bytes`,
        },
      ]);
    }
    const end = start + length;
    if (maskCrc(crc32c(bytes, start, end)) !== readUint32(bytes, end)) {
      throw new InputError([
        {
          file,
          pointer: where,
          expected: 'must hold data whose checksum matches',
          hint: 'The file is damaged; TensorBoard would stop reading it here too.',
        },
      ]);
    }
    records.push({ data: bytes.subarray(start, end), number, offset });
    offset = end + 4;
  }
  return { records };
}
