/**
 * Comparisons of prediction ids as bytes, read through DataViews four bytes at a time: whether two
 * ids are the same, and whether the ids of one file keep increasing (then no id can repeat).
 */

/**
 * Whether two ids are the same bytes. Ids are read through DataViews four bytes at a time (one
 * comparison where a byte loop makes four; ids are mostly 8 to 40 bytes).
 */
export function sameIds(
  x: DataView,
  xs: number,
  xl: number,
  y: DataView,
  ys: number,
  yl: number,
): boolean {
  if (xl !== yl) return false;
  let i = 0;
  for (; i + 4 <= xl; i += 4) if (x.getUint32(xs + i) !== y.getUint32(ys + i)) return false;
  for (; i < xl; i++) if (x.getUint8(xs + i) !== y.getUint8(ys + i)) return false;
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
    key: DataView,
    start: number,
    len: number,
    prev: DataView,
    prevStart: number,
    prevLen: number,
  ): boolean {
    return this.take(idSteps(key, start, len, prev, prevStart, prevLen));
  }

  /** Takes the next id by its `idSteps` code (the same code serves two files with the same ids). */
  take(code: number): boolean {
    if ((code & LEX_UP) === 0) this.lex = false;
    if ((code & SHORTLEX_UP) === 0) this.shortlex = false;
    return this.lex || this.shortlex;
  }
}

/** `idSteps` bits: the id comes after the one before it by bytes, and by length then bytes. */
const LEX_UP = 1;
const SHORTLEX_UP = 2;

/**
 * How an id follows the one before it (prevLen −1: no id before it, both bits). Big-endian words
 * compare as their bytes do, so the first unequal word decides the byte order.
 */
export function idSteps(
  key: DataView,
  start: number,
  len: number,
  prev: DataView,
  prevStart: number,
  prevLen: number,
): number {
  if (prevLen < 0) return LEX_UP | SHORTLEX_UP;
  let cmp = 0;
  const n = len < prevLen ? len : prevLen;
  let i = 0;
  for (; i + 4 <= n; i += 4) {
    const x = key.getUint32(start + i);
    const y = prev.getUint32(prevStart + i);
    if (x !== y) {
      cmp = x > y ? 1 : -1;
      break;
    }
  }
  if (cmp === 0) {
    for (; i < n; i++) {
      cmp = key.getUint8(start + i) - prev.getUint8(prevStart + i);
      if (cmp !== 0) break;
    }
  }
  if (cmp === 0) cmp = len - prevLen;
  return (cmp > 0 ? LEX_UP : 0) | ((len !== prevLen ? len > prevLen : cmp > 0) ? SHORTLEX_UP : 0);
}
