/**
 * The predictions reader where WebAssembly cannot run (`node --jitless`): losses are then read by
 * decimal.ts `readDecimal` and the lockstep loop leaves them to the row-by-row path. The whole
 * differential suite (predictions-differential.test.ts) runs again in that mode, against the same
 * string reader.
 */
import { describe, expect, it, vi } from 'vitest';
import { PredictionLines } from '../../src/artifact/prediction-lines.js';

vi.mock('../../src/artifact/decimal-wasm.js', () => ({ wasmDecimals: () => null }));

describe('without WebAssembly', () => {
  it('reads losses with readDecimal', () => {
    const source = { read: async () => 0, close: async () => {}, size: 0 };
    expect(new PredictionLines(source, 'x.csv', 'continuous').decimals).toBeNull();
  });
});

await import('./predictions-differential.test.js');
