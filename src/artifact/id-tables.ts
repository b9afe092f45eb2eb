/**
 * Flat tables keyed on the bytes of prediction ids, for pairing millions of rows without a string
 * or an object per row: a 64-bit hash of an id, a check that ids keep increasing (then no id can
 * repeat and nothing needs remembering), a set of id hashes for files whose ids do not, and an
 * open-addressing table of the rows still waiting for their partner.
 */

/** The two 32-bit words of the last `hashId` (a and b; a picks the slot). */
export const hashed = { a: 0, b: 0 };

/** murmur3's 32-bit finaliser (Appleby, MurmurHash3, public domain; common practice). */
function mix(h: number): number {
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}

/** Two 32-bit FNV-1a-style hashes of `key[start, start + len)` (different primes), mixed. */
export function hashId(key: Uint8Array, start: number, len: number): void {
  let a = 0x811c9dc5;
  let b = 0x9747b28c ^ len;
  for (let i = start, stop = start + len; i < stop; i++) {
    const c = key[i] as number;
    a = Math.imul(a ^ c, 0x01000193);
    b = Math.imul(b ^ c, 0x5bd1e995);
  }
  hashed.a = mix(a);
  hashed.b = mix(b ^ (b >>> 15));
}

export function sameBytes(
  x: Uint8Array,
  xs: number,
  xl: number,
  y: Uint8Array,
  ys: number,
  yl: number,
): boolean {
  if (xl !== yl) return false;
  for (let i = 0; i < xl; i++) if (x[xs + i] !== y[ys + i]) return false;
  return true;
}

/**
 * Whether the ids of one file keep strictly increasing, by bytes or by length then bytes
 * (`order-9` < `order-10`). While either holds, the file has no repeated id.
 */
export class IdOrder {
  private lex = true;
  private shortlex = true;

  /**
   * Takes the next id, given with the one before it (prevLen −1 for the first); false from the
   * first id that breaks both orders.
   */
  next(
    key: Uint8Array,
    start: number,
    len: number,
    prev: Uint8Array,
    prevStart: number,
    prevLen: number,
  ): boolean {
    if (prevLen < 0) return true;
    let cmp = 0;
    const n = len < prevLen ? len : prevLen;
    for (let i = 0; i < n; i++) {
      cmp = (key[start + i] as number) - (prev[prevStart + i] as number);
      if (cmp !== 0) break;
    }
    if (cmp === 0) cmp = len - prevLen;
    if (cmp <= 0) this.lex = false;
    if (len !== prevLen ? len < prevLen : cmp <= 0) this.shortlex = false;
    return this.lex || this.shortlex;
  }
}

const EMPTY_KEY_B = 1;

/** A set of 64-bit id hashes (open addressing, linear probing); `add` says whether it was new. */
export class HashSet64 {
  private words: Uint32Array;
  private mask: number;
  private size = 0;

  /** `slots`: initial capacity, a power of two. */
  constructor(slots = 1 << 16) {
    this.words = new Uint32Array(2 * slots);
    this.mask = slots - 1;
  }

  add(a: number, b: number): boolean {
    if (a === 0 && b === 0) b = EMPTY_KEY_B;
    if (this.size * 10 >= (this.mask + 1) * 7) this.grow();
    const words = this.words;
    const mask = this.mask;
    let i = a & mask;
    for (;;) {
      const wa = words[2 * i] as number;
      const wb = words[2 * i + 1] as number;
      if (wa === 0 && wb === 0) {
        words[2 * i] = a;
        words[2 * i + 1] = b;
        this.size++;
        return true;
      }
      if (wa === a && wb === b) return false;
      i = (i + 1) & mask;
    }
  }

  private grow(): void {
    const old = this.words;
    this.mask = this.mask * 2 + 1;
    this.words = new Uint32Array(2 * (this.mask + 1));
    this.size = 0;
    for (let i = 0; i < old.length; i += 2) {
      const a = old[i] as number;
      const b = old[i + 1] as number;
      if (a !== 0 || b !== 0) this.add(a, b);
    }
  }
}

export const BASE = 0;
export const CAND = 1;

/** Ids up to this many bytes are stored inline in the waiting table; longer ones in a Map. */
export const INLINE_ID_BYTES = 64;

/**
 * Rows waiting for their partner, keyed on the id bytes (stored inline, fixed width per table,
 * widened up to INLINE_ID_BYTES when a longer id arrives), with the side they came from and their
 * value. Linear probing with backward-shift deletion (no tombstones), so a table that fills and
 * drains stays fast. Proportion values (0/1) live in the tag byte; losses in a Float64Array. Longer
 * ids (rare) wait in a Map keyed on their bytes as a latin1 string.
 */
export class WaitingTable {
  /** Rows waiting, per side. */
  waitingBase = 0;
  waitingCand = 0;
  /** The partner's value after `meet` returned true. */
  partner = 0;
  private cap: number;
  private mask: number;
  private width = 16;
  private count = 0;
  private hashes: Uint32Array;
  /** Id length; 0 marks an empty slot (ids are never empty). */
  private lens: Int32Array;
  private tags: Uint8Array;
  private keys: Uint8Array;
  private values: Float64Array | null;
  private readonly long = new Map<string, { side: number; value: number }>();

  /** `losses`: values are numbers, not 0/1. `slots`: initial capacity, a power of two. */
  constructor(losses: boolean, slots = 1 << 12) {
    this.cap = slots;
    this.mask = slots - 1;
    this.hashes = new Uint32Array(slots);
    this.lens = new Int32Array(slots);
    this.tags = new Uint8Array(slots);
    this.keys = new Uint8Array(slots * this.width);
    this.values = losses ? new Float64Array(slots) : null;
  }

  /**
   * A row of `side` arrives. When its id waits from the other side, that row leaves the table and
   * its value is in `partner` (true). Otherwise the row waits, replacing a row of the same side
   * and id (false). `hash` is `hashed.a` of the id.
   */
  meet(
    side: number,
    key: Buffer,
    start: number,
    len: number,
    hash: number,
    value: number,
  ): boolean {
    if (len > INLINE_ID_BYTES)
      return this.meetLong(side, key.toString('latin1', start, start + len), value);
    if (len > this.width || (this.count + 1) * 10 > this.cap * 7) {
      let width = this.width;
      while (width < len) width *= 2;
      this.rebuild((this.count + 1) * 10 > this.cap * 7 ? this.cap * 2 : this.cap, width);
    }
    const { lens, hashes, keys, tags, width, mask } = this;
    let i = hash & mask;
    for (;;) {
      const l = lens[i] as number;
      if (l === 0) break;
      if (l === len && hashes[i] === hash) {
        let at = i * width;
        let k = start;
        const stop = start + len;
        while (k < stop && keys[at] === key[k]) {
          at++;
          k++;
        }
        if (k === stop) {
          const tag = tags[i] as number;
          if ((tag & 1) !== side) {
            this.partner = this.values === null ? tag >> 1 : (this.values[i] as number);
            this.remove(i, tag & 1);
            return true;
          }
          this.store(i, side, value);
          return false;
        }
      }
      i = (i + 1) & mask;
    }
    this.count++;
    if (side === BASE) this.waitingBase++;
    else this.waitingCand++;
    hashes[i] = hash;
    lens[i] = len;
    for (let k = 0, at = i * width; k < len; k++) keys[at + k] = key[start + k] as number;
    this.store(i, side, value);
    return false;
  }

  private meetLong(side: number, id: string, value: number): boolean {
    const waiting = this.long.get(id);
    if (waiting !== undefined && waiting.side !== side) {
      this.partner = waiting.value;
      this.long.delete(id);
      if (waiting.side === BASE) this.waitingBase--;
      else this.waitingCand--;
      return true;
    }
    if (waiting === undefined) {
      if (side === BASE) this.waitingBase++;
      else this.waitingCand++;
    }
    this.long.set(id, { side, value });
    return false;
  }

  private store(i: number, side: number, value: number): void {
    if (this.values === null) this.tags[i] = side | (value << 1);
    else {
      this.tags[i] = side;
      this.values[i] = value;
    }
  }

  private remove(slot: number, side: number): void {
    const { lens, hashes, tags, keys, values, width, mask } = this;
    if (side === BASE) this.waitingBase--;
    else this.waitingCand--;
    this.count--;
    let i = slot;
    let j = slot;
    for (;;) {
      j = (j + 1) & mask;
      const l = lens[j] as number;
      if (l === 0) break;
      const home = (hashes[j] as number) & mask;
      // Leave j where it is when its home slot lies cyclically in (i, j].
      if (i <= j ? i < home && home <= j : i < home || home <= j) continue;
      hashes[i] = hashes[j] as number;
      lens[i] = l;
      tags[i] = tags[j] as number;
      if (values !== null) values[i] = values[j] as number;
      for (let k = 0; k < l; k++) keys[i * width + k] = keys[j * width + k] as number;
      i = j;
    }
    lens[i] = 0;
  }

  private rebuild(cap: number, width: number): void {
    const { lens, hashes, tags, keys, values } = this;
    const oldWidth = this.width;
    const oldCap = this.cap;
    this.cap = cap;
    this.mask = cap - 1;
    this.width = width;
    this.hashes = new Uint32Array(cap);
    this.lens = new Int32Array(cap);
    this.tags = new Uint8Array(cap);
    this.keys = new Uint8Array(cap * width);
    this.values = values === null ? null : new Float64Array(cap);
    for (let s = 0; s < oldCap; s++) {
      const l = lens[s] as number;
      if (l === 0) continue;
      const h = hashes[s] as number;
      let i = h & this.mask;
      while (this.lens[i] !== 0) i = (i + 1) & this.mask;
      this.hashes[i] = h;
      this.lens[i] = l;
      this.tags[i] = tags[s] as number;
      if (this.values !== null && values !== null) this.values[i] = values[s] as number;
      for (let k = 0; k < l; k++) this.keys[i * width + k] = keys[s * oldWidth + k] as number;
    }
  }
}
