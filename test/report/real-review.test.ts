// @vitest-environment jsdom
// (jsdom: mermaid.parse needs a DOM window for DOMPurify; see mermaid.test.ts.)
/**
 * The renderers on a review built by the real analysis (buildReview) from the bakery demo
 * artifacts, so the report and the analysis agree on the model: curve charts from LTTB output,
 * lever text with artifact names, gate reasons.
 */
import mermaid from 'mermaid';
import { describe, expect, it } from 'vitest';
import { buildReview } from '../../src/analysis/review.js';
import type { Review } from '../../src/model/review.js';
import { renderJson } from '../../src/report/json.js';
import { renderMarkdown } from '../../src/report/markdown.js';
import { renderText } from '../../src/report/text.js';
import { bakeryArtifacts } from '../fixtures/report/artifacts.js';
import { HOSTILE } from '../fixtures/report/hostile.js';
import { mermaidBlocks, rawHtml, tableShapes, toDocument } from './gfm.js';
import { expectValidReport } from './valid-review.js';

function review(hostile = false): Review {
  const { baseline, candidate } = bakeryArtifacts();
  if (hostile) {
    for (const run of [baseline, candidate]) {
      run.metric.name = HOSTILE[11] ?? '';
      run.slices = HOSTILE.map((name, i) => ({ name, examples: 100 + i, validation: 6 + i / 10 }));
      run.hyperparameters = Object.fromEntries(
        HOSTILE.map((k, i) => [k, run === baseline ? i : `${k}!`]),
      );
    }
  }
  return buildReview({
    baseline,
    candidate,
    settings: { alpha: 0.05, minEffect: 0.1, gapTolerance: 0.1, failOn: ['worse-validation'] },
  });
}

describe('report of a review built by the analysis', () => {
  it.each([false, true])(
    'hostile=%s: safe GFM, Mermaid that parses, 80-column text, JSON',
    async (hostile) => {
      const r = review(hostile);
      const md = renderMarkdown(r, { commentKey: 'demo', headSha: 'b71c9e3' });
      for (const chunk of rawHtml(md)) {
        expect(chunk).toMatch(
          /^(<!-- fitgap:review [^>]*-->|<details>\n<summary>[^<>&\n]*<\/summary>|<\/details>)$/,
        );
      }
      const doc = toDocument(md);
      expect(doc.querySelectorAll('a, img, script, b')).toHaveLength(0);
      for (const shape of tableShapes(doc)) expect(new Set(shape.columns).size).toBe(1);
      const blocks = mermaidBlocks(md);
      expect(blocks.length).toBe(5); // plane, two epoch charts, learning curves, regularization
      for (const block of blocks) await expect(mermaid.parse(block)).resolves.toBeTruthy();
      for (const line of renderText(r, { color: false }).split('\n')) {
        expect(Array.from(line).length).toBeLessThanOrEqual(80);
      }
      expect(JSON.parse(renderJson(r)).format).toBe('fitgap-review/1');
      expectValidReport(r);
    },
  );

  it('says the gate failed and why', () => {
    const md = renderMarkdown(review());
    expect(md).toContain('· gate failed');
    expect(md).toMatch(/- \*\*Gate failed\*\*: .+\./);
  });
});
