/**
 * The loss reader of decimal.wat: per predictions file of losses, a WebAssembly memory that holds
 * the file's buffer and an instance whose `read` reads a plain decimal from it, by the rules of
 * decimal.ts `readDecimal` and with the same values (issue 14: a review of 2 × 1M losses spent
 * about 30 ms reading numbers in JavaScript that V8 had not compiled yet; this module is compiled
 * before it runs). Where WebAssembly is missing (`node --jitless`), `wasmDecimals` returns null
 * and the reader uses `readDecimal`.
 */
import { MAX_MAGNITUDE } from '../model/limits.js';
import { DECIMAL_WASM } from './generated/decimal-wasm.js';

/** Where the file's bytes start in the memory (decimal.wat). */
const BASE = 1024;
const PAGE = 65536;

interface DecimalExports {
  read(p: number, end: number): number;
}

let compiled: WebAssembly.Module | null | undefined;

/** The module, compiled once per process; null where WebAssembly cannot run. */
function decimalModule(): WebAssembly.Module | null {
  if (compiled === undefined) {
    try {
      compiled =
        typeof WebAssembly === 'object'
          ? new WebAssembly.Module(Buffer.from(DECIMAL_WASM, 'base64'))
          : null;
    } catch {
      compiled = null;
    }
  }
  return compiled;
}

export class WasmDecimals {
  /** The file's buffer (`size` bytes of the memory). */
  readonly buf: Buffer;
  /**
   * `read(p, end)`: a plain decimal within ±1e15 and `\n` from `buf[p]` (before `end`): the index
   * after the newline with the value in `out[0]`; −1 for anything else (as `readDecimal`); −2 when
   * `Number()` must read it (`next` does).
   */
  readonly read: (p: number, end: number) => number;
  /** out[0]: the value of the last `read` that returned an index. */
  readonly out: Float64Array;
  /** stop[2]: where the text of a −2 ends (its newline). */
  private readonly stop: Int32Array;
  /** The value of the last `next` that returned an index. */
  value = 0;

  constructor(module: WebAssembly.Module, size: number) {
    const memory = new WebAssembly.Memory({ initial: Math.ceil((BASE + size) / PAGE) });
    const instance = new WebAssembly.Instance(module, { env: { mem: memory } });
    this.read = (instance.exports as unknown as DecimalExports).read;
    this.buf = Buffer.from(memory.buffer, BASE, size);
    this.out = new Float64Array(memory.buffer, 0, 1);
    this.stop = new Int32Array(memory.buffer, 0, 4);
  }

  /**
   * `read` with its −2 decided: the value by `Number()` (within ±1e15, else −1), as `readDecimal`
   * does. Sets `value` when it returns an index.
   */
  next(from: number, end: number): number {
    const next = this.read(from, end);
    if (next >= 0) {
      this.value = this.out[0] as number;
      return next;
    }
    if (next === -1) return -1;
    const stop = this.stop[2] as number;
    const value = Number(this.buf.toString('latin1', from, stop));
    if (!(Math.abs(value) <= MAX_MAGNITUDE)) return -1;
    this.value = value;
    return stop + 1;
  }
}

/**
 * A buffer of `size` bytes with its decimal reader, or null where WebAssembly cannot run or its
 * memory cannot be had (each memory reserves address space: `ulimit -v` may refuse it).
 */
export function wasmDecimals(size: number): WasmDecimals | null {
  const module = decimalModule();
  if (module === null) return null;
  try {
    return new WasmDecimals(module, size);
  } catch {
    return null;
  }
}
