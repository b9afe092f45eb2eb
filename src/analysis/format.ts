/** Number formatting shared by lever reasons and notes (renderers have their own). Pure. */
import type { MetricKind } from '../model/run.js';

/** A value in metric units: percent with one decimal for proportions, 4 significant digits otherwise. */
export function formatValue(value: number, kind: MetricKind): string {
  if (kind === 'proportion') return `${(value * 100).toFixed(Math.abs(value) < 0.001 ? 2 : 1)}%`;
  return formatNumber(value);
}

/** A change in metric units: points for proportions. */
export function formatChange(value: number, kind: MetricKind): string {
  const sign = value > 0 ? '+' : value < 0 ? '−' : '±';
  const magnitude = Math.abs(value);
  if (kind === 'proportion')
    return `${sign}${(magnitude * 100).toFixed(magnitude < 0.001 ? 2 : 1)} pts`;
  return `${sign}${formatNumber(magnitude)}`;
}

export function formatNumber(value: number): string {
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs >= 1e5 || abs < 1e-3) return value.toExponential(2);
  return Number(value.toPrecision(4)).toString();
}

/** A p-value for a sentence: `< 0.001`, three decimals, or `n/a` when noise is unknown. */
export function formatP(p: number | null): string {
  if (p === null) return 'n/a';
  return p < 0.001 ? '< 0.001' : p.toFixed(3);
}
