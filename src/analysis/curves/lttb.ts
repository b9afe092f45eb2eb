/**
 * Largest-Triangle-Three-Buckets downsampling (Steinarsson 2013), exactly as the reference
 * implementation sveinn-steinarsson/flot-downsample `jquery.flot.downsample.js` (master) does it —
 * floor-based bucket bounds, the first bucket starting at index 1, strict `>` so the first of equal
 * areas wins (VALUES.md §9). O(n), no allocation per point.
 */

/**
 * Indices (ascending) of the `threshold` points LTTB keeps from points sorted by x.
 * threshold ≥ n returns every index; threshold 2 returns first and last; threshold 1 the first.
 * (The reference returns the input for threshold 0; here threshold must be ≥ 1.)
 */
export function lttbIndices(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  threshold: number,
): number[] {
  const n = xs.length;
  if (ys.length !== n) throw new RangeError(`lttb: ${n} x values but ${ys.length} y values`);
  if (!Number.isInteger(threshold) || threshold < 1)
    throw new RangeError(`lttb: threshold must be an integer ≥ 1; got ${threshold}`);
  if (threshold >= n) return Array.from({ length: n }, (_, i) => i);
  if (threshold === 1) return [0];
  const every = (n - 2) / (threshold - 2);
  const sampled: number[] = [0];
  let a = 0;
  for (let i = 0; i < threshold - 2; i++) {
    const avgStart = Math.floor((i + 1) * every) + 1;
    const avgEnd = Math.min(Math.floor((i + 2) * every) + 1, n);
    let avgX = 0;
    let avgY = 0;
    for (let j = avgStart; j < avgEnd; j++) {
      avgX += xs[j] as number;
      avgY += ys[j] as number;
    }
    avgX /= avgEnd - avgStart;
    avgY /= avgEnd - avgStart;
    const rangeStart = Math.floor(i * every) + 1;
    const rangeEnd = Math.floor((i + 1) * every) + 1;
    const ax = xs[a] as number;
    const ay = ys[a] as number;
    let maxArea = -1;
    let next = rangeStart;
    for (let j = rangeStart; j < rangeEnd; j++) {
      const area =
        Math.abs((ax - avgX) * ((ys[j] as number) - ay) - (ax - (xs[j] as number)) * (avgY - ay)) *
        0.5;
      if (area > maxArea) {
        maxArea = area;
        next = j;
      }
    }
    sampled.push(next);
    a = next;
  }
  sampled.push(n - 1);
  return sampled;
}

/**
 * LTTB to at most `maxPoints` (≥ 2 + keep.length) that also keeps every index in `keep` (for
 * charts: the validation minimum). First and last are always kept by LTTB; each kept index that LTTB
 * dropped replaces the nearest selected interior index that is not itself required, so the count
 * stays at min(n, maxPoints) and the order stays ascending.
 */
export function downsampleKeeping(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  maxPoints: number,
  keep: readonly number[] = [],
): number[] {
  const selected = lttbIndices(xs, ys, maxPoints);
  if (selected.length === xs.length) return selected;
  const last = xs.length - 1;
  const required = new Set<number>([0, last, ...keep]);
  if (required.size > maxPoints)
    throw new RangeError(`cannot keep ${required.size} points in ${maxPoints}`);
  for (const k of keep) {
    if (selected.includes(k)) continue;
    let best = -1;
    for (let s = 0; s < selected.length; s++) {
      const idx = selected[s] as number;
      if (required.has(idx)) continue;
      if (best < 0 || Math.abs(idx - k) < Math.abs((selected[best] as number) - k)) best = s;
    }
    if (best < 0) throw new RangeError(`cannot keep ${required.size} points in ${maxPoints}`);
    selected[best] = k;
    selected.sort((p, q) => p - q);
  }
  return selected;
}
