/**
 * Input checks shared by the statistics functions. Invalid input to a statistic is a bug in the
 * caller (the artifact layer validates user data first), so these throw `RangeError` with a message
 * that names the parameter, the expected form and the value.
 */

export function assertAlpha(alpha: number): void {
  if (!(alpha > 0 && alpha < 1)) {
    throw new RangeError(`alpha must be in (0, 1), e.g. 0.05 for a 95% interval; got ${alpha}`);
  }
}

export function assertProbability(name: string, p: number): void {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`${name} must be in [0, 1]; got ${p}`);
}

export function assertCount(name: string, value: number): void {
  if (!Number.isSafeInteger(value) || value < 0) {
    throw new RangeError(`${name} must be a non-negative integer count; got ${value}`);
  }
}

export function assertFinite(name: string, value: number): void {
  if (!Number.isFinite(value))
    throw new RangeError(`${name} must be a finite number; got ${value}`);
}

export function assertFiniteValues(name: string, values: readonly number[]): void {
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    if (!Number.isFinite(v)) {
      throw new RangeError(`${name}[${i}] must be a finite number; got ${v}`);
    }
  }
}

export function assertMinLength(name: string, values: readonly number[], min: number): void {
  if (values.length < min) {
    throw new RangeError(`${name} needs at least ${min} values; got ${values.length}`);
  }
}
