/**
 * Flat tables keyed on the bytes of prediction ids, for pairing millions of rows without a string
 * or an object per row: a hash of an id, a check that ids keep increasing (then no id can repeat
 * and nothing needs remembering), an open-addressing table of ids, and a set of 64-bit hashes.
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

/** Which file an id came from (bits of an entry). */
export const BASE = 1;
export const CAND = 2;
const BOTH = 3;
/** Entry bit: the value (0/1) of a waiting proportion row. */
const ONE = 4;
const BITS = 3; // entry word: len << BITS | ONE? | CAND? | BASE?
/** Ids up to this many bytes are stored inline; longer ones (rare) in a Map. */
export const INLINE_ID_BYTES = 64;

/**
 * The ids of both files, keyed on their bytes: open addressing with linear probing, each slot one
 * run of 32-bit words (hash, length and bits, then the id bytes inline at a fixed width that widens
 * up to INLINE_ID_BYTES), so that a probe reads one cache line. An entry's bits say which files
 * have the id: one bit, a row waiting for its partner (with its value); both, a pair.
 *
 * While both files' ids keep increasing, only waiting rows are kept and a pair deletes its entry
 * (backward-shift deletion, no tombstones). From the first id out of order (`recordAll`) every id
 * is kept, so that an id a file has already had is seen again: `repeated` gets that file's bit.
 * The rows are those of the original reader's two Maps: a row whose id waits from the other file
 * pairs with it; otherwise it waits, replacing a waiting row of its own file with the same id.
 */
export class IdTable {
  /** Rows waiting, per file. */
  waitingBase = 0;
  waitingCand = 0;
  /** Files (BASE | CAND) with an id seen twice. */
  repeated = 0;
  /** The value and step of the row `meet` paired with. */
  partner = 0;
  partnerStep = 0;
  /** The value and step of the arriving row, for `meet` (fields: a double argument is boxed). */
  incoming = 0;
  incomingStep = 0;
  private recording = false;
  private cap: number;
  private mask_: number;
  private width = 16;
  private stride = 2 + 16 / 4;
  private count = 0;
  private words: Uint32Array;
  private bytes: Uint8Array;
  private values: Float64Array | null;
  /** Steps of waiting loss rows (their order decides the order of the differences). */
  private steps: Uint32Array | null;
  private readonly long = new Map<string, { bits: number; value: number; step: number }>();

  /** `losses`: values are numbers, not 0/1. `slots`: initial capacity, a power of two. */
  constructor(
    private readonly losses: boolean,
    slots = 1 << 12,
  ) {
    this.cap = slots;
    this.mask_ = slots - 1;
    this.words = new Uint32Array(slots * this.stride);
    this.bytes = new Uint8Array(this.words.buffer);
    this.values = losses ? new Float64Array(slots) : null;
    this.steps = losses ? new Uint32Array(slots) : null;
  }

  /** Slot mask: an id's home slot is `hash & mask`. */
  get mask(): number {
    return this.mask_;
  }

  /** Room for `extra` more ids of up to `longest` bytes, so that no rebuild comes in between. */
  prepare(extra: number, longest: number): void {
    if (longest > this.width && longest <= INLINE_ID_BYTES) this.grow(longest);
    this.reserve(this.count + extra);
  }

  /** Keep every id from now on; `expected`: about how many distinct ids will come. */
  recordAll(expected: number): void {
    this.recording = true;
    this.reserve(expected);
  }

  /**
   * A row of `side` out of step with the other file: pairs with a waiting row of the other file
   * (true; its value in `partner`) or waits (false). `incoming` holds the row's value.
   */
  meet(side: number, key: Uint8Array, start: number, len: number, hash: number): boolean {
    if (len > INLINE_ID_BYTES) return this.longMeet(side, key, start, len);
    const slot = this.find(key, start, len, hash);
    if (slot < 0) {
      this.insert(~slot, key, start, len, hash, side);
      return false;
    }
    const at = slot * this.stride + 1;
    const word = this.words[at] as number;
    const bits = word & BOTH;
    if ((bits & side) !== 0) {
      this.repeated |= side;
      if (bits === side) this.store(slot, at, word, side); // the old Map.set: replace the value
      return false;
    }
    if (this.values === null) this.partner = (word & ONE) >>> 2;
    else {
      this.partner = this.values[slot] as number;
      this.partnerStep = (this.steps as Uint32Array)[slot] as number;
    }
    this.count1(bits, -1);
    if (this.recording) this.words[at] = (word & ~(ONE | BOTH)) | BOTH;
    else this.remove(slot);
    return true;
  }

  /** Rows of both files with this id, in step (only while recording). */
  together(key: Uint8Array, start: number, len: number, hash: number): void {
    if (len > INLINE_ID_BYTES) {
      const id = Buffer.from(key.buffer, key.byteOffset, key.byteLength).toString(
        'latin1',
        start,
        start + len,
      );
      const entry = this.long.get(id);
      if (entry === undefined) this.long.set(id, { bits: BOTH, value: 0, step: 0 });
      else {
        this.repeated |= entry.bits;
        entry.bits = BOTH;
      }
      return;
    }
    const slot = this.find(key, start, len, hash);
    if (slot < 0) this.insert(~slot, key, start, len, hash, BOTH);
    else {
      const at = slot * this.stride + 1;
      this.repeated |= (this.words[at] as number) & BOTH;
    }
  }

  /**
   * An id of `side` read before `recordAll` (re-read from the file's start): it paired then unless
   * it still waits. Waiting from the other file, though, means that file has it twice.
   */
  mark(side: number, key: Uint8Array, start: number, len: number, hash: number): void {
    if (len > INLINE_ID_BYTES) {
      const id = Buffer.from(key.buffer, key.byteOffset, key.byteLength).toString(
        'latin1',
        start,
        start + len,
      );
      const entry = this.long.get(id);
      if (entry === undefined) this.long.set(id, { bits: BOTH, value: 0, step: 0 });
      else if ((entry.bits & side) === 0) this.repeated |= entry.bits;
      return;
    }
    const slot = this.find(key, start, len, hash);
    if (slot < 0) this.insert(~slot, key, start, len, hash, BOTH);
    else {
      const bits = (this.words[slot * this.stride + 1] as number) & BOTH;
      if ((bits & side) === 0) this.repeated |= bits;
    }
  }

  private longMeet(side: number, key: Uint8Array, start: number, len: number): boolean {
    const id = Buffer.from(key.buffer, key.byteOffset, key.byteLength).toString(
      'latin1',
      start,
      start + len,
    );
    const entry = this.long.get(id);
    if (entry === undefined) {
      this.long.set(id, { bits: side, value: this.incoming, step: this.incomingStep });
      this.count1(side, 1);
      return false;
    }
    if ((entry.bits & side) !== 0) {
      this.repeated |= side;
      if (entry.bits === side) {
        entry.value = this.incoming;
        entry.step = this.incomingStep;
      }
      return false;
    }
    this.partner = entry.value;
    this.partnerStep = entry.step;
    this.count1(entry.bits, -1);
    if (this.recording) entry.bits = BOTH;
    else this.long.delete(id);
    return true;
  }

  /** Slot of the id, or ~slot where it would go. */
  private find(key: Uint8Array, start: number, len: number, hash: number): number {
    if (len > this.width || (this.count + 1) * 10 > this.cap * 7) this.grow(len);
    const { words, bytes, stride } = this;
    const mask = this.mask_;
    let i = hash & mask;
    for (;;) {
      const at = i * stride;
      const word = words[at + 1] as number;
      if (word === 0) return ~i;
      if (word >>> BITS === len && words[at] === hash) {
        let b = (at + 2) * 4;
        let k = start;
        const stop = start + len;
        while (k < stop && bytes[b] === key[k]) {
          b++;
          k++;
        }
        if (k === stop) return i;
      }
      i = (i + 1) & mask;
    }
  }

  private insert(
    slot: number,
    key: Uint8Array,
    start: number,
    len: number,
    hash: number,
    bits: number,
  ): void {
    const at = slot * this.stride;
    this.words[at] = hash;
    const bytes = this.bytes;
    for (let k = 0, b = (at + 2) * 4; k < len; k++) bytes[b + k] = key[start + k] as number;
    this.count++;
    if (bits === BOTH) this.words[at + 1] = (len << BITS) | BOTH;
    else this.store(slot, at + 1, len << BITS, bits);
  }

  /** Makes the entry at `slot` a waiting row of `side` with the incoming value. */
  private store(slot: number, at: number, word: number, side: number): void {
    const base = (word & ~(ONE | BOTH)) | side;
    if (this.values === null) this.words[at] = this.incoming === 1 ? base | ONE : base;
    else {
      this.words[at] = base;
      this.values[slot] = this.incoming;
      (this.steps as Uint32Array)[slot] = this.incomingStep;
    }
    if ((word & BOTH) !== side) this.count1(side, 1);
  }

  private count1(bits: number, by: number): void {
    if (bits === BASE) this.waitingBase += by;
    else if (bits === CAND) this.waitingCand += by;
  }

  private remove(slot: number): void {
    const { words, values, steps, stride } = this;
    const mask = this.mask_;
    this.count--;
    let i = slot;
    let j = slot;
    for (;;) {
      j = (j + 1) & mask;
      const word = words[j * stride + 1] as number;
      if (word === 0) break;
      const home = (words[j * stride] as number) & mask;
      // Leave j where it is when its home slot lies cyclically in (i, j].
      if (i <= j ? i < home && home <= j : i < home || home <= j) continue;
      words.copyWithin(i * stride, j * stride, j * stride + stride);
      if (values !== null && steps !== null) {
        values[i] = values[j] as number;
        steps[i] = steps[j] as number;
      }
      i = j;
    }
    words[i * stride + 1] = 0;
  }

  /** Room for `n` entries at a load of at most 0.7. */
  private reserve(n: number): void {
    let cap = this.cap;
    while (n * 10 > cap * 7) cap *= 2;
    if (cap > this.cap) this.rebuild(cap, this.width);
  }

  private grow(len: number): void {
    let width = this.width;
    while (width < len) width *= 2;
    const cap = (this.count + 1) * 10 > this.cap * 7 ? this.cap * 2 : this.cap;
    this.rebuild(cap, width);
  }

  private rebuild(cap: number, width: number): void {
    const { words, values, steps, stride, cap: oldCap } = this;
    this.cap = cap;
    this.mask_ = cap - 1;
    this.width = width;
    this.stride = 2 + width / 4;
    this.words = new Uint32Array(cap * this.stride);
    this.bytes = new Uint8Array(this.words.buffer);
    this.values = values === null ? null : new Float64Array(cap);
    this.steps = steps === null ? null : new Uint32Array(cap);
    const keyWords = stride - 2;
    for (let s = 0; s < oldCap; s++) {
      const word = words[s * stride + 1] as number;
      if (word === 0) continue;
      const hash = words[s * stride] as number;
      let i = hash & this.mask_;
      while (this.words[i * this.stride + 1] !== 0) i = (i + 1) & this.mask_;
      const at = i * this.stride;
      this.words[at] = hash;
      this.words[at + 1] = word;
      for (let w = 0; w < keyWords; w++)
        this.words[at + 2 + w] = words[s * stride + 2 + w] as number;
      if (this.values !== null && values !== null && this.steps !== null && steps !== null) {
        this.values[i] = values[s] as number;
        this.steps[i] = steps[s] as number;
      }
    }
  }
}
