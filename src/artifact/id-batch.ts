/**
 * A batch of id-table operations (rows out of step with the other file), stored flat and
 * applied in order of the table region their id falls in, the records moved into that order. A
 * million random probes into a table of tens of megabytes miss the cache and the TLB on almost
 * every probe; probes that sweep the table from one end to the other, and records read one after
 * another, mostly hit. Without a repeated id the result of the operations does not depend
 * on their order (each id pairs with its one partner); where the order of pairs matters (losses),
 * every operation carries the step its row was read at.
 */

import { FNV_BASIS, FNV_PRIME, slotHash } from './id-tables.js';

/** Operation kinds. */
export const MEET_BASE = 1;
export const MEET_CAND = 2;

/** Words per record before the id bytes: hash, step, len << 3 | kind (with a 0/1 value in bit 2). */
const HEAD = 3;

export class IdBatch {
  size = 0;
  /** Longest id in the batch. */
  longest = 0;
  private width: number;
  private stride: number;
  private words: Uint32Array;
  private bytes: Uint8Array;
  /** Values of the records (written by the caller after `add`: a double argument is boxed). */
  values: Float64Array;
  /** Where `sort` writes the records in their new order (then the two swap). */
  private spare: Uint32Array = new Uint32Array(0);
  private spareBytes: Uint8Array = new Uint8Array(0);
  private spareValues: Float64Array;
  private group = new Int32Array(0);
  private counts = new Int32Array(0);

  /** `width`: bytes kept for each id at first (a multiple of 4; the batch widens for longer ids). */
  constructor(
    readonly capacity: number,
    width = 8,
  ) {
    this.width = width;
    this.stride = HEAD + width / 4;
    this.words = new Uint32Array(capacity * this.stride);
    this.bytes = new Uint8Array(this.words.buffer);
    this.values = new Float64Array(capacity);
    this.spareValues = new Float64Array(0);
  }

  /** Bytes kept for each id (a new batch may start with the width its predecessor reached). */
  get idWidth(): number {
    return this.width;
  }

  get full(): boolean {
    return this.size === this.capacity;
  }

  /**
   * Adds a record; its hash is the id table's (`slotHash`), computed while the bytes are copied.
   * The bytes after the id in its last word are zero (the id table compares whole words).
   */
  add(kind: number, key: Uint8Array, start: number, len: number, step: number): void {
    if (len > this.width) this.widen(len);
    const r = this.size++;
    const at = r * this.stride;
    const words = this.words;
    const bytes = this.bytes;
    if (len > 0) words[at + HEAD + ((len - 1) >>> 2)] = 0;
    let fnv = FNV_BASIS;
    for (let k = 0, b = (at + HEAD) * 4; k < len; k++) {
      const c = key[start + k] as number;
      bytes[b + k] = c;
      fnv = Math.imul(fnv ^ c, FNV_PRIME);
    }
    words[at] = slotHash(fnv);
    words[at + 1] = step;
    words[at + 2] = (len << 3) | kind;
    if (len > this.longest) this.longest = len;
  }

  /**
   * Puts the records in order of their home slot in `table` >>> shift (a stable counting sort that
   * moves them, so that they are then read one after another, not at random).
   */
  sort(
    table: { slots: number; home(hash: number): number },
    shift: number,
    withValues: boolean,
  ): void {
    const groups = ((table.slots - 1) >>> shift) + 1;
    if (this.counts.length < groups + 1) this.counts = new Int32Array(groups + 1);
    else this.counts.fill(0, 0, groups + 1);
    const counts = this.counts;
    const { words, stride, size, values } = this;
    if (this.group.length < size) this.group = new Int32Array(this.capacity);
    if (this.spare.length !== words.length) this.spare = new Uint32Array(words.length);
    if (withValues && this.spareValues.length !== values.length)
      this.spareValues = new Float64Array(values.length);
    const { group, spare, spareValues } = this;
    for (let r = 0; r < size; r++) {
      const g = table.home(words[r * stride] as number) >>> shift;
      group[r] = g;
      counts[g + 1] = (counts[g + 1] as number) + 1;
    }
    for (let g = 1; g <= groups; g++) counts[g] = (counts[g] as number) + (counts[g - 1] as number);
    for (let r = 0; r < size; r++) {
      const g = group[r] as number;
      const to = counts[g] as number;
      counts[g] = to + 1;
      for (let k = 0, from = r * stride, at = to * stride; k < stride; k++)
        spare[at + k] = words[from + k] as number;
      if (withValues) spareValues[to] = values[r] as number;
    }
    this.spare = words;
    this.words = spare;
    const bytes = this.bytes;
    this.bytes =
      this.spareBytes.buffer === spare.buffer ? this.spareBytes : new Uint8Array(spare.buffer);
    this.spareBytes = bytes;
    if (withValues) {
      this.spareValues = values;
      this.values = spareValues;
    }
  }

  hash(r: number): number {
    return this.words[r * this.stride] as number;
  }
  step(r: number): number {
    return this.words[r * this.stride + 1] as number;
  }
  kind(r: number): number {
    return (this.words[r * this.stride + 2] as number) & 3;
  }
  /** The 0/1 value given in bit 2 of the kind. */
  bit(r: number): number {
    return ((this.words[r * this.stride + 2] as number) >>> 2) & 1;
  }
  len(r: number): number {
    return (this.words[r * this.stride + 2] as number) >>> 3;
  }
  /** Index of record r's id in `keyWords` (its first word). */
  keyWord(r: number): number {
    return r * this.stride + HEAD;
  }
  /** The records' words: ids as IdTable.meet takes them. */
  get keyWords(): Uint32Array {
    return this.words;
  }
  value(r: number): number {
    return this.values[r] as number;
  }

  clear(): void {
    this.size = 0;
    this.longest = 0;
  }

  private widen(len: number): void {
    const width = Math.ceil(len / 4) * 4;
    const stride = HEAD + width / 4;
    const words = new Uint32Array(this.capacity * stride);
    for (let r = 0; r < this.size; r++)
      words.set(this.words.subarray(r * this.stride, (r + 1) * this.stride), r * stride);
    this.words = words;
    this.bytes = new Uint8Array(words.buffer);
    this.width = width;
    this.stride = stride;
  }
}
