/**
 * Flat tables keyed on the bytes of prediction ids, for pairing millions of rows without a string
 * or an object per row: a hash of an id, an open-addressing table of ids, and a set of 64-bit
 * hashes. (Id comparisons, and the check that ids keep increasing, are in id-compare.ts.)
 */

/**
 * The two 31-bit words of the last `hashId` (a and b; a picks the slot). 31 bits, not 32: a small
 * integer travels through calls as is, a larger one is a heap number allocated per call.
 */
export const hashed = { a: 0, b: 0 };

/** murmur3's 32-bit finaliser (Appleby, MurmurHash3, public domain; common practice). */
function mix(h: number): number {
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}

/** Two FNV-1a-style hashes of `key[start, start + len)` (different primes), mixed, 31 bits each. */
export function hashId(key: Uint8Array, start: number, len: number): void {
  let a = FNV_BASIS;
  let b = 0x9747b28c ^ len;
  for (let i = start, stop = start + len; i < stop; i++) {
    const c = key[i] as number;
    a = Math.imul(a ^ c, FNV_PRIME);
    b = Math.imul(b ^ c, 0x5bd1e995);
  }
  hashed.a = mix(a) & 0x7fffffff;
  hashed.b = mix(b ^ (b >>> 15)) & 0x7fffffff;
}

/** FNV-1a's offset basis and prime (32-bit; Fowler, Noll, Vo; common practice). */
export const FNV_BASIS = 0x811c9dc5;
export const FNV_PRIME = 0x01000193;

/**
 * `hashId`'s first word (the id table's hash) from the FNV-1a state after the id's bytes: callers
 * that copy the bytes anyway hash them in the same pass.
 */
export function slotHash(fnv: number): number {
  return mix(fnv) & 0x7fffffff;
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
/** Entry word after the hash: len << 3 | ONE? | CAND? | BASE? (0: empty slot). */
const LEN_SHIFT = 3;
/** Ids up to this many bytes are stored inline; longer ones (rare) in a Map. */
export const INLINE_ID_BYTES = 64;
/** Entries per slot at most. */
const LOAD = 0.75;

/**
 * The rows waiting for their partner, keyed on their id bytes: open addressing with linear probing,
 * each slot two words (hash; length, file, 0/1 value) and the id bytes inline at a fixed width
 * (widened in steps of 4 up to INLINE_ID_BYTES): 20 bytes for ids up to 12 bytes. Slots are as many as needed,
 * not a power of two (an id's home slot is its hash scaled to the table), as every page of a large
 * table is memory the process must be given; a pair deletes its entry (backward-shift deletion, no
 * tombstones); `expected` lets it grow straight to the size it will need. The rows are
 * those of the original reader's two Maps: a row whose id
 * waits from the other file pairs with it; otherwise it waits, replacing a waiting row of its own
 * file with the same id (and `repeated` gets that file's bit).
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
  /** How many rows will wait at most, when that is clear (else 0); read when the table grows. */
  expected = 0;
  private cap: number;
  /** slots / 2^31 (exact: a power-of-two division). */
  private scale: number;
  private width = 8;
  private stride = 2 + 8 / 4;
  private count = 0;
  private words: Uint32Array;
  private values: Float64Array | null;
  /** Steps of waiting loss rows (their order decides the order of the differences). */
  private steps: Uint32Array | null;
  private readonly long = new Map<string, { bits: number; value: number; step: number }>();

  /** `losses`: values are numbers, not 0/1. `slots`: initial capacity. */
  constructor(
    private readonly losses: boolean,
    slots = 4096,
  ) {
    this.cap = slots;
    this.scale = slots / 2 ** 31;
    this.words = new Uint32Array(slots * this.stride);
    this.values = losses ? new Float64Array(slots) : null;
    this.steps = losses ? new Uint32Array(slots) : null;
  }

  /** Rows waiting. */
  get size(): number {
    return this.count;
  }

  /** Number of slots; an id's home slot is `home(hash)`. */
  get slots(): number {
    return this.cap;
  }

  /**
   * The home slot of a 31-bit hash: hash · slots / 2^31 rounded down, in [0, slots) (the product
   * is rounded to a double first, which may move a slot by one: the same for every call).
   */
  home(hash: number): number {
    return Math.floor(hash * this.scale);
  }

  /** Room for `n` rows without growing. */
  reserve(n: number): void {
    if (n > this.cap * LOAD)
      this.rebuild(Math.max(Math.ceil(n / LOAD), Math.ceil(this.expected / LOAD)), 0);
  }

  /** Room for ids of up to `longest` bytes (so that no rebuild comes in the middle of a batch). */
  widen(longest: number): void {
    if (longest > this.width && longest <= INLINE_ID_BYTES) this.rebuild(this.cap, longest);
  }

  /**
   * A row of `side` out of step with the other file: pairs with a waiting row of the other file
   * (true; its value and step in `partner`, `partnerStep`) or waits (false). `incoming` and
   * `incomingStep` hold the row's value and step. The id (at most INLINE_ID_BYTES) is
   * `key[from, from + ceil(len / 4))` as words, the bytes after its last one zero (as IdBatch
   * keeps them): ids are compared and copied a word at a time.
   */
  meet(side: number, key: Uint32Array, from: number, len: number, hash: number): boolean {
    const slot = this.find(key, from, len, hash);
    if (slot < 0) {
      this.insert(~slot, key, from, len, hash, side);
      return false;
    }
    const at = slot * this.stride + 1;
    const word = this.words[at] as number;
    const bits = word & BOTH;
    if ((bits & side) !== 0) {
      this.repeated |= side;
      if (bits === side) this.store(slot, word, side); // the old Map.set: replace the value
      return false;
    }
    if (this.values === null) this.partner = (word & ONE) >>> 2;
    else {
      this.partner = this.values[slot] as number;
      this.partnerStep = (this.steps as Uint32Array)[slot] as number;
    }
    this.count1(bits, -1);
    this.remove(slot);
    return true;
  }

  /** `meet` for an id longer than INLINE_ID_BYTES (kept apart, in a Map), as bytes. */
  meetLong(side: number, key: Uint8Array, start: number, len: number): boolean {
    const id = latin1(key, start, len);
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
    this.long.delete(id);
    return true;
  }

  /** Slot of the id, or ~slot where it would go. */
  private find(key: Uint32Array, from: number, len: number, hash: number): number {
    if (len > this.width || this.count + 1 > this.cap * LOAD) this.grow(len);
    const { words, stride, cap } = this;
    const n = (len + 3) >>> 2;
    let i = this.home(hash);
    for (;;) {
      const at = i * stride;
      const word = words[at + 1] as number;
      if (word === 0) return ~i;
      if (word >>> LEN_SHIFT === len && words[at] === hash) {
        let k = 0;
        while (k < n && words[at + 2 + k] === key[from + k]) k++;
        if (k === n) return i;
      }
      i = i + 1 === cap ? 0 : i + 1;
    }
  }

  private insert(
    slot: number,
    key: Uint32Array,
    from: number,
    len: number,
    hash: number,
    bits: number,
  ): void {
    const at = slot * this.stride;
    const words = this.words;
    for (let k = 0, n = (len + 3) >>> 2; k < n; k++) words[at + 2 + k] = key[from + k] as number;
    this.count++;
    this.words[at] = hash;
    this.store(slot, len << LEN_SHIFT, bits);
  }

  /** Makes the entry at `slot` a waiting row of `side` with the incoming value and step. */
  private store(slot: number, word: number, side: number): void {
    const base = (word & ~(ONE | BOTH)) | side;
    const at = slot * this.stride + 1;
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
    const { words, values, steps, stride, cap } = this;
    this.count--;
    let i = slot;
    let j = slot;
    for (;;) {
      j = j + 1 === cap ? 0 : j + 1;
      if (words[j * stride + 1] === 0) break;
      const home = this.home(words[j * stride] as number);
      // Leave j where it is when its home slot lies cyclically in (i, j].
      if (i <= j ? i < home && home <= j : i < home || home <= j) continue;
      // A slot is a few words: a loop, not a copyWithin call per slot moved.
      for (let k = 0, to = i * stride, from = j * stride; k < stride; k++)
        words[to + k] = words[from + k] as number;
      if (values !== null && steps !== null) {
        values[i] = values[j] as number;
        steps[i] = steps[j] as number;
      }
      i = j;
    }
    words[i * stride + 1] = 0;
  }

  private grow(len: number): void {
    let cap = this.cap;
    if (this.count + 1 > cap * LOAD) cap = Math.max(2 * cap, Math.ceil(this.expected / LOAD));
    this.rebuild(cap, len);
  }

  private rebuild(cap: number, width: number): void {
    const { words, values, steps, stride, cap: oldCap } = this;
    // Widths in steps of 4 bytes (ids of a file mostly have similar lengths).
    const w = Math.max(this.width, Math.ceil(width / 4) * 4);
    this.cap = cap;
    this.scale = cap / 2 ** 31;
    this.width = w;
    this.stride = 2 + w / 4;
    this.words = new Uint32Array(cap * this.stride);
    this.values = values === null ? null : new Float64Array(cap);
    this.steps = steps === null ? null : new Uint32Array(cap);
    const keyWords = stride - 2;
    for (let s = 0; s < oldCap; s++) {
      const word = words[s * stride + 1] as number;
      if (word === 0) continue;
      const hash = words[s * stride] as number;
      let i = this.home(hash);
      while (this.words[i * this.stride + 1] !== 0) i = i + 1 === cap ? 0 : i + 1;
      const at = i * this.stride;
      this.words[at] = hash;
      this.words[at + 1] = word;
      for (let k = 0; k < keyWords; k++)
        this.words[at + 2 + k] = words[s * stride + 2 + k] as number;
      if (this.values !== null && values !== null && this.steps !== null && steps !== null) {
        this.values[i] = values[s] as number;
        this.steps[i] = steps[s] as number;
      }
    }
  }
}

function latin1(key: Uint8Array, start: number, len: number): string {
  return Buffer.from(key.buffer, key.byteOffset, key.byteLength).toString(
    'latin1',
    start,
    start + len,
  );
}
