import { expect } from 'vitest';

/** |actual − expected| <= tolerance. */
export function expectNear(actual: number | undefined, expected: number, tolerance: number): void {
  expect(actual).toBeTypeOf('number');
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(tolerance);
}

/** Agreement to a relative tolerance, for very small or very large numbers. */
export function expectRelative(
  actual: number | undefined,
  expected: number,
  relative: number,
): void {
  expect(actual).toBeTypeOf('number');
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(
    relative * Math.abs(expected),
  );
}

/** Agreement to the digits a source printed: within half a unit in the last printed place. */
export function expectPrinted(actual: number | undefined, printed: string): void {
  const decimals = printed.includes('.') ? (printed.split('.')[1] as string).length : 0;
  expectNear(actual, Number(printed), 0.5 * 10 ** -decimals + 1e-12);
}
