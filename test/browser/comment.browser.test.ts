/**
 * A real browser renders the comment: markdown → HTML with micromark + GFM, then the Mermaid blocks
 * with the `mermaid` package's own browser bundle in headless Chromium (Debian's `chromium`, driven by
 * playwright-core). Every chart must produce an SVG with its marks; a screenshot goes to
 * test-output/comment.png. No network: the page is set from a string, the Mermaid bundle is read
 * from node_modules, and every request the page makes is refused and counted.
 */
import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/report/markdown.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { mermaidBlocks } from '../report/gfm.js';
import { needBrowser, renderInBrowser } from './mermaid-page.js';

describe('comment in a real browser', () => {
  it('renders every Mermaid chart to an SVG and saves test-output/comment.png', async (test) => {
    needBrowser(test);
    const comments = [
      renderMarkdown(bakeryReview(), { commentKey: 'demo', headSha: 'b71c9e3' }),
      renderMarkdown(deliveryReview(), { commentKey: 'demo', headSha: '7d2f4a9' }),
    ];
    const expectedCharts = comments.reduce((n, md) => n + mermaidBlocks(md).length, 0);
    expect(expectedCharts).toBe(8);
    const page = await renderInBrowser(comments, 'test-output/comment.png');
    expect(page.errors).toEqual([]);
    expect(page.charts).toHaveLength(expectedCharts);
    for (const chart of page.charts) {
      expect(chart.svg).toBe(true);
      expect(chart.error).toBe(false);
      expect(chart.width).toBeGreaterThan(100);
    }
    const planes = page.charts.filter((c) => c.type === 'quadrantChart');
    expect(planes).toHaveLength(2);
    for (const plane of planes) expect(plane.circles).toBeGreaterThanOrEqual(2); // the two runs
    const lines = page.charts.filter((c) => c.type === 'xychart');
    expect(lines).toHaveLength(6);
    for (const chart of lines) expect(chart.paths).toBeGreaterThanOrEqual(2); // a line per series
    expect(page.refused).toEqual([]);
  }, 60_000);
});
