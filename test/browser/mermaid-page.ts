/**
 * Renders markdown the way a reader sees it: micromark + GFM to HTML, then the Mermaid blocks with
 * the `mermaid` package's own browser bundle in headless Chromium (Debian's `chromium`, driven by
 * playwright-core). No network: the page is set from a string, the bundle is read from
 * node_modules, and every request the page makes is refused and counted.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { chromium } from 'playwright-core';
import { expect } from 'vitest';
import { toHtml } from '../report/gfm.js';

export const CHROMIUM = process.env['FITGAP_CHROMIUM'] ?? '/usr/bin/chromium';
const hasBrowser = existsSync(CHROMIUM);
/** In CI the browser is required (.ci/run installs it): its absence fails, never skips. */
const required = process.env['CI'] === 'true';
const mermaidBundle = join(
  dirname(createRequire(import.meta.url).resolve('mermaid/package.json')),
  'dist/mermaid.min.js',
);

/** Locally a missing browser skips the test, saying how to get one; in CI it fails the test. */
export function needBrowser(test: { skip: (note?: string) => void }): void {
  if (hasBrowser) return;
  const why = `no browser at ${CHROMIUM} (install it with: apt-get install -y chromium)`;
  if (required) expect.fail(`${why}; CI requires it`);
  test.skip(why);
}

const STYLE = `
  body { font: 14px/1.5 system-ui, sans-serif; max-width: 980px; margin: 16px auto; color: #1f2328; }
  table { border-collapse: collapse; margin: 8px 0; }
  th, td { border: 1px solid #d0d7de; padding: 4px 10px; }
  pre.mermaid { background: #fff; }
  hr { margin: 32px 0; }
`;

export interface RenderedChart {
  svg: boolean;
  /** Mermaid's `aria-roledescription`: `xychart`, `quadrantChart`… */
  type: string;
  error: boolean;
  paths: number;
  circles: number;
  width: number;
}

export interface RenderedPage {
  charts: RenderedChart[];
  /** Errors thrown in the page. */
  errors: string[];
  /** Requests the page tried to make (all refused). */
  refused: string[];
}

interface MermaidApi {
  initialize(config: Record<string, unknown>): void;
  run(options: { querySelector: string }): Promise<void>;
}

/** Renders the documents (one page, separated by rules) and saves a full-page screenshot. */
export async function renderInBrowser(
  documents: readonly string[],
  screenshot: string,
): Promise<RenderedPage> {
  // GitHub turns ```mermaid fences into diagrams; here the fence's code element becomes the
  // element Mermaid renders into (its text is the decoded diagram source).
  const body = documents
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
    const charts = await page.evaluate(async () => {
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
    mkdirSync(dirname(screenshot), { recursive: true });
    await page.screenshot({ path: screenshot, fullPage: true });
    return { charts, errors, refused };
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}
