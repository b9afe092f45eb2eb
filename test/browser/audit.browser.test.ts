/**
 * A real browser renders the audit's markdown (headless Chromium, Mermaid's own bundle, no
 * network): the trend chart becomes an SVG with one line per series; a screenshot goes to
 * test-output/audit.png.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { chromium } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { auditRange } from '../../src/io/audit.js';
import { gitRunner } from '../../src/io/git.js';
import type { RangeAudit } from '../../src/model/audit.js';
import { renderAuditMarkdown } from '../../src/report/audit-markdown.js';
import { ARTIFACT, buildHistory } from '../audit/history.js';
import { mermaidBlocks, toHtml } from '../report/gfm.js';

const CHROMIUM = '/usr/bin/chromium';
const hasBrowser = existsSync(CHROMIUM);
/** In CI the browser is required (.ci/run installs it): its absence fails, never skips. */
const required = process.env['CI'] === 'true';
const mermaidBundle = join(
  dirname(createRequire(import.meta.url).resolve('mermaid/package.json')),
  'dist/mermaid.min.js',
);

/** The ferry history of the audit tests (a real git repository built here), audited. */
async function audit(): Promise<RangeAudit> {
  const history = buildHistory();
  const temp = mkdtempSync(join(tmpdir(), 'fitgap-audit-browser-'));
  try {
    return await auditRange({
      git: gitRunner(history.dir),
      cwd: history.dir,
      range: `${history.shas[0]}..main`,
      artifact: ARTIFACT,
      against: 'previous',
      config: {},
      configFile: null,
      tempDir: temp,
    });
  } finally {
    history.cleanup();
    rmSync(temp, { recursive: true, force: true });
  }
}

const STYLE = `
  body { font: 14px/1.5 system-ui, sans-serif; max-width: 980px; margin: 16px auto; color: #1f2328; }
  table { border-collapse: collapse; margin: 8px 0; }
  th, td { border: 1px solid #d0d7de; padding: 4px 10px; }
  pre.mermaid { background: #fff; }
  hr { margin: 32px 0; }
`;

describe('audit in a real browser', () => {
  it('renders the trend chart to an SVG and saves test-output/audit.png', async (test) => {
    if (!hasBrowser) {
      // Locally a missing browser skips, saying how to get one; CI must have one.
      const why = `no browser at ${CHROMIUM} (install it with: apt-get install -y chromium)`;
      if (required) expect.fail(`${why}; CI requires it`);
      test.skip(why);
    }
    const md = renderAuditMarkdown(await audit());
    expect(mermaidBlocks(md)).toHaveLength(1);
    const expectedCharts = 1;
    const body = toHtml(md).replace(
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
      expect(result[0]?.type).toBe('xychart');
      expect(result[0]?.paths).toBeGreaterThanOrEqual(3); // validation error, bias, variance
      mkdirSync('test-output', { recursive: true });
      await page.screenshot({ path: 'test-output/audit.png', fullPage: true });
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
