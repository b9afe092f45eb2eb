// @vitest-environment jsdom
// (jsdom: mermaid.parse needs a DOM window for DOMPurify; see mermaid.test.ts.)
/**
 * Snapshots of the PR comment for each bundled demo candidate, built from the files on disk
 * through the same adapter the CLI uses, plus the safety checks every comment must pass.
 */
import mermaid from 'mermaid';
import { describe, expect, it } from 'vitest';
import { renderMarkdown, renderText } from '../../src/report/index.js';
import { reviewFiles } from '../../src/io/review-from-files.js';
import { mermaidBlocks, rawHtml, tableShapes, toDocument } from './gfm.js';

describe.each(['1-interactions', '2-lambda-3', '3-more-data'])('demo %s comment', (name) => {
  it('matches its snapshot, parses as safe GFM and valid Mermaid', async () => {
    const { review, files } = await reviewFiles({
      baseline: 'demo/baseline.json',
      candidate: `demo/${name}.json`,
      config: 'demo/fitgap.yml',
    });
    const md = renderMarkdown(review, {
      commentKey: 'demo',
      headSha: 'a91f3d2b6c',
      provenance: {
        files: [
          { label: 'baseline', ...files.baseline },
          { label: 'candidate', ...files.candidate },
        ],
      },
    });
    await expect(md).toMatchFileSnapshot(`__snapshots__/demo-${name}.md`);
    for (const chunk of rawHtml(md)) {
      expect(chunk).toMatch(
        /^(<!-- fitgap:review [^>]*-->|<details>\n<summary>[^<>&\n]*<\/summary>|<\/details>)$/,
      );
    }
    const doc = toDocument(md);
    for (const shape of tableShapes(doc)) expect(new Set(shape.columns).size).toBe(1);
    const blocks = mermaidBlocks(md);
    expect(blocks.length).toBeGreaterThanOrEqual(2);
    for (const block of blocks) await expect(mermaid.parse(block)).resolves.toBeTruthy();
    expect(md.length).toBeLessThan(60_000);
  });
});

describe('demo comments are short', () => {
  it.each([
    ['1-interactions', '**Regularization curve**'],
    ['2-lambda-3', '**Regularization curve**'],
    ['3-more-data', '**Bias/variance plane**'],
  ])('%s: three levers in the table, one chart open (%s)', async (name, caption) => {
    const { review } = await reviewFiles({
      baseline: 'demo/baseline.json',
      candidate: `demo/${name}.json`,
      config: 'demo/fitgap.yml',
    });
    const md = renderMarkdown(review);
    // Mermaid blocks outside folded sections: only the first lever's chart.
    const open = md.replace(/<details>[\s\S]*?<\/details>/g, '');
    expect(mermaidBlocks(open)).toHaveLength(1);
    expect(open.split('### Chart\n')[1]?.trimStart().startsWith(caption)).toBe(true);
    const levers = (open.split('### Next levers')[1] ?? '').split('###')[0] ?? '';
    expect(levers.match(/^\| \d+ \|/gm)?.length ?? 0).toBeLessThanOrEqual(3);
    // The headline (title and its bullet list) stays short enough for one laptop screen.
    const headline = md.split('\n### ')[0] ?? '';
    expect(headline.split('\n').length).toBeLessThanOrEqual(12);
    expect(headline.length).toBeLessThan(1600);
  });
});

describe('demo guardrails in the terminal', () => {
  it('3-more-data: the guardrail verdict and its margin fit 80 columns uncut', async () => {
    const { review } = await reviewFiles({
      baseline: 'demo/baseline.json',
      candidate: 'demo/3-more-data.json',
      config: 'demo/fitgap.yml',
    });
    const text = renderText(review, { color: false });
    const row = text.split('\n').find((l) => l.trimStart().startsWith('calibration_error'));
    expect(row).toMatch(/\+0\.01280 +beyond margin 0\.00500$/);
    for (const line of text.split('\n')) expect(line.length).toBeLessThanOrEqual(80);
  });
});
