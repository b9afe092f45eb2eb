/**
 * A real browser renders the audit's markdown (headless Chromium, Mermaid's own bundle, no
 * network): the trend chart becomes an SVG with one line per series; a screenshot goes to
 * test-output/audit.png.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { auditRange } from '../../src/io/audit.js';
import { gitRunner } from '../../src/io/git.js';
import type { RangeAudit } from '../../src/model/audit.js';
import { renderAuditMarkdown } from '../../src/report/audit-markdown.js';
import { ARTIFACT, buildHistory } from '../audit/history.js';
import { mermaidBlocks } from '../report/gfm.js';
import { needBrowser, renderInBrowser } from './mermaid-page.js';

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

describe('audit in a real browser', () => {
  it('renders the trend chart to an SVG and saves test-output/audit.png', async (test) => {
    needBrowser(test);
    const md = renderAuditMarkdown(await audit());
    expect(mermaidBlocks(md)).toHaveLength(1);
    const page = await renderInBrowser([md], 'test-output/audit.png');
    expect(page.errors).toEqual([]);
    expect(page.charts).toHaveLength(1);
    const chart = page.charts[0];
    expect(chart?.svg).toBe(true);
    expect(chart?.error).toBe(false);
    expect(chart?.width).toBeGreaterThan(100);
    expect(chart?.type).toBe('xychart');
    expect(chart?.paths).toBeGreaterThanOrEqual(3); // validation error, bias, variance
    expect(page.refused).toEqual([]);
  }, 60_000);
});
