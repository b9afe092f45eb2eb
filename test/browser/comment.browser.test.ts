/**
 * A real browser renders the comment: markdown → HTML with micromark + GFM, then the Mermaid blocks
 * with the `mermaid` package's own browser bundle in headless Chromium (Debian's `chromium`, driven by
 * playwright-core). Every chart must produce an SVG with its marks; a screenshot goes to
 * test-output/comment.png. No network: the page is set from a string, the Mermaid bundle is read
 * from node_modules, and every request the page makes is refused and counted.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { chromium } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { renderMarkdown } from '../../src/report/markdown.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { mermaidBlocks, toHtml } from '../report/gfm.js';

const CHROMIUM = process.env['FITGAP_CHROMIUM'] ?? '/usr/bin/chromium';
const hasBrowser = existsSync(CHROMIUM);
/** In CI the browser is required (.ci/run installs it): its absence fails, never skips. */
const required = process.env['CI'] === 'true';
const mermaidBundle = join(
  dirname(createRequire(import.meta.url).resolve('mermaid/package.json')),
  'dist/mermaid.min.js',
);

const STYLE = `
  body { font: 14px/1.5 system-ui, sans-serif; max-width: 980px; margin: 16px auto; color: #1f2328; }
  table { border-collapse: collapse; margin: 8px 0; }
  th, td { border: 1px solid #d0d7de; padding: 4px 10px; }
  pre.mermaid { background: #fff; }
  hr { margin: 32px 0; }
`;

describe('comment in a real browser', () => {
  it('renders every Mermaid chart to an SVG and saves test-output/comment.png', async (test) => {
    if (!hasBrowser) {
      // Locally a missing browser skips, saying how to get one; CI must have one.
      const why = `no browser at ${CHROMIUM} (install it with: apt-get install -y chromium)`;
      if (required) expect.fail(`${why}; CI requires it`);
      test.skip(why);
    }
    const comments = [
      renderMarkdown(bakeryReview(), { commentKey: 'demo', headSha: 'b71c9e3' }),
      renderMarkdown(deliveryReview(), { commentKey: 'demo', headSha: '7d2f4a9' }),
    ];
    const expectedCharts = comments.reduce((n, md) => n + mermaidBlocks(md).length, 0);
    expect(expectedCharts).toBe(8);
    // GitHub turns ```mermaid fences into diagrams; here the fence's code element becomes the
    // element Mermaid renders into (its text is the decoded diagram source).
    const body = comments
      .map((md) => toHtml(md))
      .join('<hr>')
      .replace(
        /<pre><code class="language-mermaid">([\s\S]*?)<\/code><\/pre>/g,
        '<pre class="mermaid">$1</pre>',
      );
    const profile = mkdtempSync(join(tmpdir(), 'fitgap-chromium-'));
    const context = await chromium.launchPersistentContext(profile, {
      executablePath: CHROMIUM,
      headless: true,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
      viewport: { width: 1024, height: 800 },
    });
    const refused: string[] = [];
    try {
      await context.route('**/*', (route) => {
        refused.push(route.request().url());
        return route.abort();
      });
      const page = context.pages()[0] ?? (await context.newPage());
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.setContent(
        `<!doctype html><html><head><meta charset="utf-8"><style>${STYLE}</style></head><body>${body}</body></html>`,
      );
      await page.addScriptTag({ path: mermaidBundle });
      const result = await page.evaluate(async () => {
        const m = (window as unknown as { mermaid: MermaidApi }).mermaid;
        m.initialize({ startOnLoad: false, theme: 'default', securityLevel: 'strict' });
        await m.run({ querySelector: 'pre.mermaid' });
        return [...document.querySelectorAll('pre.mermaid')].map((pre) => {
          const svg = pre.querySelector('svg');
          return {
            svg: svg !== null,
            type: svg?.getAttribute('aria-roledescription') ?? '',
            error: /syntax error/i.test(pre.textContent ?? ''),
            paths: svg?.querySelectorAll('path').length ?? 0,
            circles: svg?.querySelectorAll('circle').length ?? 0,
            width: svg?.getBoundingClientRect().width ?? 0,
          };
        });
      });
      expect(errors).toEqual([]);
      expect(result).toHaveLength(expectedCharts);
      for (const chart of result) {
        expect(chart.svg).toBe(true);
        expect(chart.error).toBe(false);
        expect(chart.width).toBeGreaterThan(100);
      }
      const planes = result.filter((c) => c.type === 'quadrantChart');
      expect(planes).toHaveLength(2);
      for (const plane of planes) expect(plane.circles).toBeGreaterThanOrEqual(2); // the two runs
      const lines = result.filter((c) => c.type === 'xychart');
      expect(lines).toHaveLength(6);
      for (const chart of lines) expect(chart.paths).toBeGreaterThanOrEqual(2); // a line per series
      mkdirSync('test-output', { recursive: true });
      await page.screenshot({ path: 'test-output/comment.png', fullPage: true });
      expect(refused).toEqual([]);
    } finally {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    }
  }, 60_000);
});

interface MermaidApi {
  initialize(config: Record<string, unknown>): void;
  run(options: { querySelector: string }): Promise<void>;
}
