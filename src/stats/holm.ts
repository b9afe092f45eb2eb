/**
 * Holm–Bonferroni step-down adjusted p-values (Holm 1979, Scand. J. Statist. 6:65–70). With the m
 * non-null p-values sorted ascending, p(1) <= … <= p(m), the adjusted value of p(i) is
 * max over j <= i of min(1, (m − j + 1)·p(j)). Results come back in input order; nulls pass through
 * untouched and do not count in m. The adjusted values are monotone in the order of the raw ones,
 * at least the raw value, and at most 1; tied raw values get equal adjusted values.
 * RangeError for a value outside [0, 1] or NaN.
 */
export function holmAdjust(p: readonly (number | null)[]): (number | null)[] {
  const present: { index: number; value: number }[] = [];
  p.forEach((value, index) => {
    if (value === null) return;
    if (!(value >= 0 && value <= 1)) {
      throw new RangeError(`holmAdjust: p[${index}] must be in [0, 1] or null; got ${value}`);
    }
    present.push({ index, value });
  });
  // Array.prototype.sort is stable, so ties keep their input order.
  present.sort((a, b) => a.value - b.value);
  const m = present.length;
  const out: (number | null)[] = p.map(() => null);
  let running = 0;
  present.forEach(({ index, value }, rank) => {
    running = Math.max(running, Math.min(1, (m - rank) * value));
    out[index] = running;
  });
  return out;
}
