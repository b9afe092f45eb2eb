/**
 * CRC-32C (Castagnoli, reflected polynomial 0x82F63B78) and the mask TFRecord files store it with.
 * Source: RFC 3720 §B.4 (iSCSI) for CRC-32C; TensorFlow's "TFRecords format details"
 * (tensorflow/docs, api_guides/python/python_io.md) for the mask
 * `((crc >> 15) | (crc << 17)) + 0xa282ead8`.
 */

const TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? (c >>> 1) ^ 0x82f63b78 : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

export function crc32c(bytes: Uint8Array, start = 0, end = bytes.length): number {
  let crc = 0xffffffff;
  for (let i = start; i < end; i++) {
    crc = (TABLE[(crc ^ (bytes[i] as number)) & 0xff] as number) ^ (crc >>> 8);
  }
  return (crc ^ 0xffffffff) >>> 0;
}

/** Rotate right by 15 bits and add a constant, modulo 2^32. */
export function maskCrc(crc: number): number {
  return (((crc >>> 15) | (crc << 17)) + 0xa282ead8) >>> 0;
}
