/**
 * Re-indexes step-based series (TensorBoard, MLflow) by epoch, using the `epoch` series that
 * Lightning and others log next to their metrics: a point at step s takes the epoch logged at s,
 * or at the last step before s. Pure.
 */
import { InputError } from '../../model/errors.js';
import type { ReadResult, Series } from './types.js';

function isEpochSeries(s: Series): boolean {
  const leaf = s.name.slice(s.name.lastIndexOf('/') + 1).toLowerCase();
  return leaf === 'epoch';
}

export function stepsToEpochs(read: ReadResult, file: string): ReadResult {
  const epochSeries = read.series.filter(isEpochSeries);
  if (epochSeries.length === 0) {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: 'must log an "epoch" series to use epochs as x',
        hint: 'Leave out --x epoch to use the logged steps as x.',
      },
    ]);
  }
  const byFolder = new Map<string, { step: number; epoch: number }[]>();
  for (const s of epochSeries) {
    const folder = s.name.slice(0, s.name.lastIndexOf('/') + 1);
    const list = byFolder.get(folder) ?? [];
    for (const p of s.points) list.push({ step: p.x, epoch: p.value });
    byFolder.set(folder, list);
  }
  for (const list of byFolder.values()) list.sort((a, b) => a.step - b.step);
  const fallback =
    byFolder.get('') ?? (byFolder.size === 1 ? [...byFolder.values()][0] : undefined);

  const epochAt = (list: { step: number; epoch: number }[], step: number): number | undefined => {
    let lo = 0;
    let hi = list.length - 1;
    let found: number | undefined;
    while (lo <= hi) {
      const mid = (lo + hi) >> 1;
      const entry = list[mid] as { step: number; epoch: number };
      if (entry.step <= step) {
        found = entry.epoch;
        lo = mid + 1;
      } else hi = mid - 1;
    }
    return found;
  };

  const series: Series[] = [];
  for (const s of read.series) {
    if (isEpochSeries(s)) continue;
    const folder = s.name.slice(0, s.name.lastIndexOf('/') + 1);
    const list = byFolder.get(folder) ?? fallback;
    if (list === undefined) continue;
    const points = [];
    for (const p of s.points) {
      const epoch = epochAt(list, p.x);
      if (epoch !== undefined) points.push({ ...p, x: epoch });
    }
    series.push({ ...s, x: 'epoch', points });
  }
  return { series, warnings: read.warnings };
}
