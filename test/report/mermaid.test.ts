// @vitest-environment jsdom
// Mermaid's parser sanitizes labels with DOMPurify, which needs a DOM `window`: in plain Node,
// `mermaid.parse` fails with "DOMPurify.addHook is not a function". The jsdom environment provides
// one, so the package's own parser runs unchanged.
import mermaid from 'mermaid';
import { describe, expect, it } from 'vitest';
import type { Review } from '../../src/model/review.js';
import { renderMarkdown } from '../../src/report/markdown.js';
import { buildCharts, curveCharts, interpolate, planeChart } from '../../src/report/mermaid.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { hostileReview } from '../fixtures/report/hostile.js';
import { minimalReview } from '../fixtures/report/minimal.js';
import { mermaidBlocks } from './gfm.js';

const cases: [string, () => Review, number][] = [
  ['bakery', bakeryReview, 5], // plane, 2 epoch charts (ranges 1–40 and 1–80), learning, regularization
  ['delivery', deliveryReview, 3], // plane, candidate epochs, candidate learning curve
  ['minimal', minimalReview, 0], // no reference (no plane), no curves
  ['hostile', () => hostileReview(50), 5], // baseline learning curve skipped: candidate's alone
];

describe('Mermaid blocks parse with mermaid.parse', () => {
  it('rejects a broken block (the parser is really checking)', async () => {
    await expect(mermaid.parse('xychart-beta\n  line [1, 2')).rejects.toThrow();
    await expect(mermaid.parse('quadrantChart\n  "a"]: [0.1, 0.2]')).rejects.toThrow();
  });

  it.each(cases)('%s', async (_, make, expected) => {
    const blocks = mermaidBlocks(renderMarkdown(make()));
    expect(blocks).toHaveLength(expected);
    for (const block of blocks) {
      const result = await mermaid.parse(block);
      expect(result && ['xychart', 'quadrantChart']).toContain(result && result.diagramType);
    }
  });
});

describe('chart contents', () => {
  it('plane: the middle line is the presence threshold (v / (v + t) = 0.5 at v = t)', () => {
    const review = bakeryReview();
    const chart = planeChart(review);
    // t = 0.1 × (6.05 + 6.38) / 2 = 0.6215; baseline bias 1.10 → 1.10 / 1.7215 = 0.639.
    expect(chart?.code).toContain('"baseline": [0.639, 0.456]');
    expect(chart?.code).toContain('"candidate": [0.403, 0.675]');
  });

  it('no plane without a bias value', () => {
    expect(planeChart(minimalReview())).toBeNull();
  });

  it('one chart for both runs when their x ranges overlap, ≤ 100 points, fixed decimals', () => {
    const [chart] = curveCharts(bakeryReview(), 'training_examples');
    const lines = chart?.code.split('\n') ?? [];
    expect(lines.filter((l) => l.startsWith('  line ['))).toHaveLength(4);
    expect(chart?.code).toContain(
      '  x-axis "training examples" ["1500", "3000", "6000", "12000", "24000", "48000"]',
    );
    expect(chart?.caption).toContain(
      'Lines: dark blue = baseline validation, light blue = baseline train, dark orange = candidate validation, light orange = candidate train.',
    );
    for (const chart of buildCharts(hostileReview(5))) {
      for (const line of chart.code.split('\n').filter((l) => l.startsWith('  line ['))) {
        const values = line.slice(8, -1).split(', ');
        expect(values.length).toBeLessThanOrEqual(100);
        const decimals = new Set(values.map((v) => v.split('.')[1]?.length ?? 0));
        expect(decimals.size).toBe(1);
      }
    }
  });

  it('epoch curves with different lengths become one chart per run on the same y axis', () => {
    const charts = curveCharts(bakeryReview(), 'epochs');
    expect(charts.map((c) => c.code.split('\n')[2])).toEqual([
      '  title "Epoch curve, baseline"',
      '  title "Epoch curve, candidate"',
    ]);
    const yAxes = charts.map((c) => c.code.split('\n')[4]);
    expect(yAxes[0]).toBe(yAxes[1]);
    expect(charts[1]?.code).toContain('  x-axis "epoch" 1 --> 80');
  });

  it('more than 100 points are resampled to 100', () => {
    const review = bakeryReview();
    const e = review.candidate.curves.epochs;
    if (e === undefined || 'skipped' in e) throw new Error('fixture');
    e.chart = Array.from({ length: 400 }, (_, i) => ({ x: i + 1, validation: 1 / (i + 1) }));
    const chart = curveCharts(review, 'epochs').at(-1);
    const line = chart?.code.split('\n').find((l) => l.startsWith('  line ['));
    expect(line?.split(', ')).toHaveLength(100);
  });

  it('interpolates linearly, in log x on a geometric axis', () => {
    expect(
      interpolate(
        [
          [0, 0],
          [10, 1],
        ],
        5,
        false,
      ),
    ).toBe(0.5);
    expect(
      interpolate(
        [
          [1, 0],
          [100, 1],
        ],
        10,
        true,
      ),
    ).toBeCloseTo(0.5, 12);
    expect(
      interpolate(
        [
          [1, 2],
          [3, 4],
        ],
        9,
        false,
      ),
    ).toBe(4);
  });
});
