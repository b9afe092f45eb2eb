/**
 * Mermaid charts of a review: the bias/variance plane (`quadrantChart`) and the epoch, learning and
 * regularization curves (`xychart-beta` line charts, baseline against candidate). Pure functions of
 * the review. Artifact text reaches a chart only through `mermaidLabel`; numbers are fixed-decimal.
 */
import type { Review, RunSummary } from '../model/review.js';
import type { CurveSkipped, CurvesReport } from '../model/curves.js';
import type { CurveName } from '../model/run.js';
import { escapeInline, mermaidLabel } from './escape.js';
import { chartNumber, difference, numberFormatFor, short } from './format.js';

export interface Chart {
  kind: 'plane' | CurveName;
  /** One markdown paragraph above the chart: what it shows and which line is which. */
  caption: string;
  /** The Mermaid source (without the fence). */
  code: string;
}

/** Most points per series; curves are already downsampled by the analysis, this is a backstop. */
export const MAX_POINTS = 100;

/** Line colours, in series order: baseline validation, baseline train, candidate ditto. */
const PALETTE = {
  baselineValidation: ['#1f5fa8', 'dark blue'],
  baselineTrain: ['#8fbce6', 'light blue'],
  candidateValidation: ['#c2410c', 'dark orange'],
  candidateTrain: ['#f6b07a', 'light orange'],
} as const;

type Point = { x: number; train?: number; validation: number };
type RunKey = 'baseline' | 'candidate';
interface Series {
  run: RunKey;
  part: 'validation' | 'train';
  points: [number, number][];
}

export function buildCharts(review: Review): Chart[] {
  const charts: Chart[] = [];
  const plane = planeChart(review);
  if (plane !== null) charts.push(plane);
  for (const curve of ['epochs', 'training_examples', 'regularization'] as const) {
    charts.push(...curveCharts(review, curve));
  }
  return charts;
}

/** Where the plane's middle lines sit: the presence threshold, in shortfall units. */
function planeThreshold(review: Review): number {
  const level = (review.baseline.errorLevel + review.candidate.errorLevel) / 2;
  return Math.max(review.settings.gapTolerance * Math.abs(level), review.settings.minEffect);
}

/**
 * Bias/variance plane. Each axis maps a component v to v / (v + t), t the presence threshold, so the
 * middle line is exactly the threshold and no point falls off the chart; negative values sit at 0.
 */
export function planeChart(review: Review): Chart | null {
  const points: [RunKey, number, number][] = [];
  for (const run of ['baseline', 'candidate'] as const) {
    const { bias, variance } = review[run].components;
    if (bias.value === null || variance.value === null) return null;
    points.push([run, bias.value, variance.value]);
  }
  const t = planeThreshold(review);
  if (!(t > 0) || !Number.isFinite(t)) return null;
  const axis = (v: number): string => chartNumber(v <= 0 ? 0 : v / (v + t), 3);
  const format = numberFormatFor(review);
  const lines = [
    'quadrantChart',
    '  title Avoidable bias and variance of both runs',
    '  x-axis "Low avoidable bias" --> "High avoidable bias"',
    '  y-axis "Low variance" --> "High variance"',
    '  quadrant-1 "Both present"',
    '  quadrant-2 "Variance present"',
    '  quadrant-3 "Neither present"',
    '  quadrant-4 "Bias present"',
    ...points.map(([run, b, v]) => `  "${run}": [${axis(b)}, ${axis(v)}]`),
  ];
  const metric = escapeInline(review.metric.name, 40);
  const values = points
    .map(([run, b, v]) => `${run} bias ${difference(b, format)}, variance ${difference(v, format)}`)
    .join('; ');
  const caption =
    `**Bias/variance plane** (${metric}, shortfall units). Each axis is scaled so that its middle ` +
    `line is the presence threshold, ${difference(t, format)} (gap tolerance ${short(review.settings.gapTolerance)} × ` +
    `the mean validation error level); right of it avoidable bias is large enough to count, above it ` +
    `variance. Values: ${values}.`;
  return { kind: 'plane', caption, code: lines.join('\n') };
}

const CURVE_TEXT: Record<CurveName, { title: string; x: string; caption: string }> = {
  epochs: { title: 'Epoch curve', x: 'epoch', caption: 'Epoch curve' },
  training_examples: {
    title: 'Learning curve',
    x: 'training examples',
    caption: 'Learning curve',
  },
  regularization: {
    title: 'Regularization curve',
    x: 'regularization strength',
    caption: 'Regularization curve',
  },
};

function usable(evidence: CurvesReport[CurveName]): Point[] | null {
  if (evidence === undefined || isSkipped(evidence)) return null;
  const chart = evidence.chart.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.validation));
  return chart.length >= 2 ? chart : null;
}

function isSkipped(evidence: object): evidence is CurveSkipped {
  return 'skipped' in evidence;
}

function seriesOf(run: RunKey, summary: RunSummary, curve: CurveName): Series[] {
  const points = usable(summary.curves[curve]);
  if (points === null) return [];
  const sorted = [...points].sort((a, b) => a.x - b.x);
  const out: Series[] = [
    { run, part: 'validation', points: sorted.map((p) => [p.x, p.validation]) },
  ];
  const train = sorted.filter((p) => p.train !== undefined && Number.isFinite(p.train));
  if (train.length >= 2) {
    out.push({ run, part: 'train', points: train.map((p) => [p.x, p.train ?? 0]) });
  }
  return out;
}

/**
 * Line charts of one curve. Both runs on one chart when their x ranges mostly overlap (drawn over
 * the shared range); otherwise one chart per run with the same y range, so they compare by eye.
 */
export function curveCharts(review: Review, curve: CurveName): Chart[] {
  const all = [
    ...seriesOf('baseline', review.baseline, curve),
    ...seriesOf('candidate', review.candidate, curve),
  ];
  if (all.length === 0) return [];
  const runs = [...new Set(all.map((s) => s.run))];
  const ranges = runs.map((run) => {
    const xs = all.filter((s) => s.run === run).flatMap((s) => s.points.map((p) => p[0]));
    return [Math.min(...xs), Math.max(...xs)] as const;
  });
  const lo = Math.max(...ranges.map((r) => r[0]));
  const hi = Math.min(...ranges.map((r) => r[1]));
  const unionLo = Math.min(...ranges.map((r) => r[0]));
  const unionHi = Math.max(...ranges.map((r) => r[1]));
  const yAll = all.flatMap((s) => s.points.map((p) => p[1]));
  const yRange: [number, number] = [Math.min(...yAll), Math.max(...yAll)];
  if (runs.length === 1) {
    const run = runs[0] ?? 'candidate';
    if (!(hi > lo)) return [];
    const chart = lineChart(review, curve, all, [lo, hi], yRange, run);
    const other = run === 'baseline' ? 'candidate' : 'baseline';
    return [
      { ...chart, caption: `${chart.caption} The ${other} has no chartable curve of this kind.` },
    ];
  }
  if (hi > lo && hi - lo >= 0.8 * (unionHi - unionLo)) {
    return [lineChart(review, curve, all, [lo, hi], yRange, null)];
  }
  return runs.flatMap((run) => {
    const series = all.filter((s) => s.run === run);
    const range = ranges[runs.indexOf(run)] ?? [lo, hi];
    if (!(range[1] > range[0])) return [];
    return [lineChart(review, curve, series, [range[0], range[1]], yRange, run)];
  });
}

function lineChart(
  review: Review,
  curve: CurveName,
  series: Series[],
  [lo, hi]: [number, number],
  yRange: [number, number],
  only: RunKey | null,
): Chart {
  const text = CURVE_TEXT[curve];
  const ordered = orderSeries(series);
  const xs = [
    ...new Set(ordered.flatMap((s) => s.points.map((p) => p[0])).filter((x) => x >= lo && x <= hi)),
  ].sort((a, b) => a - b);
  const geometric = curve !== 'epochs' && lo > 0 && hi / lo >= 10;
  const grid = geometric ? thin(xs, MAX_POINTS) : evenGrid(lo, hi, Math.min(MAX_POINTS, xs.length));
  // A proportion is drawn in percent, as the tables write it.
  const percent = review.metric.kind === 'proportion';
  const yScale = percent ? 100 : 1;
  const [yMin, yMax] = [yRange[0] * yScale, yRange[1] * yScale];
  const yPad = (yMax - yMin) * 0.05 || Math.abs(yMax) * 0.05 || 1;
  const y0 = yMin - yPad;
  const y1 = yMax + yPad;
  const yDecimals = Math.min(6, Math.max(0, 2 - Math.floor(Math.log10(y1 - y0))));
  const xDecimals =
    Number.isInteger(lo) && Number.isInteger(hi)
      ? 0
      : Math.min(6, Math.max(0, 2 - Math.floor(Math.log10(Math.max(hi - lo, 1e-9)))));
  const metric = mermaidLabel(review.metric.name, 40) || 'metric';
  const unit = percent ? '%' : 'metric units';
  const title = only === null ? text.title : `${text.title}, ${only}`;
  const palette = ordered.map((s) => PALETTE[paletteKey(s)][0]).join(', ');
  const lines = [
    `%%{init: {"themeVariables": {"xyChart": {"plotColorPalette": "${palette}"}}}}%%`,
    'xychart-beta',
    `  title "${title}"`,
    geometric
      ? `  x-axis "${text.x}" [${grid.map((x) => `"${short(x)}"`).join(', ')}]`
      : `  x-axis "${text.x}" ${chartNumber(lo, xDecimals)} --> ${chartNumber(hi, xDecimals)}`,
    `  y-axis "${metric} (${unit})" ${chartNumber(y0, yDecimals)} --> ${chartNumber(y1, yDecimals)}`,
    ...ordered.map(
      (s) =>
        `  line [${grid.map((x) => chartNumber(yScale * interpolate(s.points, x, geometric), yDecimals + 1)).join(', ')}]`,
    ),
  ];
  const legend = ordered.map((s) => `${PALETTE[paletteKey(s)][1]} = ${s.run} ${s.part}`).join(', ');
  const scale = geometric
    ? ' The x positions are evenly spaced categories (roughly a log scale).'
    : '';
  const clipped =
    only === null && series.some((s) => s.points.some((p) => p[0] < lo || p[0] > hi))
      ? ` Drawn over the x range both runs cover (${short(lo)} to ${short(hi)}).`
      : '';
  const caption = `**${text.caption}${only === null ? '' : ` (${only})`}**, ${escapeInline(
    review.metric.name,
    40,
  )} by ${text.x}. Lines: ${legend}.${scale}${clipped}`;
  return { kind: curve, caption, code: lines.join('\n') };
}

function paletteKey(s: Series): keyof typeof PALETTE {
  return s.part === 'validation' ? `${s.run}Validation` : `${s.run}Train`;
}

function orderSeries(series: Series[]): Series[] {
  const rank = (s: Series): number => (s.run === 'baseline' ? 0 : 2) + (s.part === 'train' ? 1 : 0);
  return [...series].sort((a, b) => rank(a) - rank(b));
}

function evenGrid(lo: number, hi: number, n: number): number[] {
  const count = Math.max(2, n);
  return Array.from({ length: count }, (_, i) => lo + ((hi - lo) * i) / (count - 1));
}

/** At most `max` values, evenly by index, first and last kept. */
function thin(values: number[], max: number): number[] {
  if (values.length <= max) return values;
  return Array.from(
    { length: max },
    (_, i) => values[Math.round((i * (values.length - 1)) / (max - 1))] ?? 0,
  );
}

/** Linear interpolation (in log x on a geometric axis); flat beyond the ends. */
export function interpolate(points: [number, number][], x: number, logX: boolean): number {
  const first = points[0];
  const last = points[points.length - 1];
  if (first === undefined || last === undefined) return Number.NaN;
  if (x <= first[0]) return first[1];
  if (x >= last[0]) return last[1];
  const f = (v: number): number => (logX ? Math.log(v) : v);
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    if (a === undefined || b === undefined) continue;
    if (x <= b[0]) {
      const span = f(b[0]) - f(a[0]);
      const w = span === 0 ? 0 : (f(x) - f(a[0])) / span;
      return a[1] + w * (b[1] - a[1]);
    }
  }
  return last[1];
}
