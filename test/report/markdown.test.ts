import fc from 'fast-check';
import { markdownTable } from 'markdown-table';
import { describe, expect, it } from 'vitest';
import type { Review } from '../../src/model/review.js';
import { escapeInline, plainText } from '../../src/report/escape.js';
import { renderMarkdown } from '../../src/report/markdown.js';
import { parseMarker } from '../../src/report/marker.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { HOSTILE, LONG_NAME, hostileReview } from '../fixtures/report/hostile.js';
import { minimalReview } from '../fixtures/report/minimal.js';
import { mermaidBlocks, rawHtml, tableShapes, toDocument } from './gfm.js';

const ZWJ = /\u200D/g;
const OUR_HTML =
  /^(<!-- fitgap:review key=[A-Za-z0-9._-]+ head=[0-9a-f]* -->|<details>\n<summary>[^<>&\n]*<\/summary>|<\/details>)$/;
const ALLOWED_ELEMENTS = new Set(
  'html head body h2 h3 p ul li strong em table thead tbody tr th td pre code details summary'.split(
    ' ',
  ),
);

/** Asserts everything a safe comment must be, and returns its DOM. */
function assertSafe(markdown: string): Document {
  for (const chunk of rawHtml(markdown)) expect(chunk).toMatch(OUR_HTML);
  const doc = toDocument(markdown);
  for (const el of doc.body.querySelectorAll('*')) {
    expect(ALLOWED_ELEMENTS, `unexpected <${el.localName}>`).toContain(el.localName);
  }
  const prose = doc.body.cloneNode(true) as HTMLElement;
  for (const pre of prose.querySelectorAll('pre')) pre.remove(); // GitHub links nothing in code
  const text = prose.textContent ?? '';
  expect(text).not.toMatch(/(^|[^\w`])@[A-Za-z0-9]/); // no mention
  expect(text).not.toMatch(/#\d/); // no issue reference
  expect(text).not.toMatch(/:\/\/|www\./i); // no autolink
  expect(text).not.toMatch(/[\u202A-\u202E\u2066-\u2069\u200E\u200F\u061C]/); // no bidi control
  expect(parseMarker(markdown)).not.toBeNull();
  return doc;
}

const cases: [string, () => Review][] = [
  ['bakery', bakeryReview],
  ['delivery', deliveryReview],
  ['minimal', minimalReview],
  ['hostile', () => hostileReview()],
];

describe('renderMarkdown', () => {
  it.each(cases)('%s: only our own HTML, no links, mentions or bidi controls', (_, make) => {
    assertSafe(renderMarkdown(make(), { commentKey: 'demo', headSha: 'b71c9e3' }));
  });

  it('puts the marker first, with key and head', () => {
    const md = renderMarkdown(bakeryReview(), { commentKey: 'nightly', headSha: 'abc123' });
    expect(
      md.startsWith('<!-- fitgap:review key=nightly head=abc123 -->\n## fitgap review: '),
    ).toBe(true);
    expect(renderMarkdown(bakeryReview()).split('\n')[0]).toBe(
      '<!-- fitgap:review key=default head= -->',
    );
  });

  it('bakery: tables have the expected rows × columns', () => {
    const doc = assertSafe(renderMarkdown(bakeryReview()));
    const shapes = tableShapes(doc).map((t) => [t.rows, ...new Set(t.columns)]);
    expect(shapes).toEqual([
      [5, 7], // splits: header + train, train-dev, validation, test
      [6, 7], // decomposition: header + 4 components + diagnosis
      [4, 3], // levers: header + the first 3
      [2, 3], // the 4th lever, folded
      [15, 7], // slices: header + 14
      [7, 4], // hyperparameters
      [3, 4], // provenance: runs
    ]);
    const headers = [...doc.querySelectorAll('table')].map((t) =>
      [...t.querySelectorAll('th')].map((th) => th.textContent),
    );
    expect(headers[0]).toEqual([
      'Split',
      'Baseline',
      'Candidate',
      'Δ',
      '95% interval',
      'p',
      'Reading',
    ]);
    expect(headers[2]).toEqual(['#', 'Lever', 'Why']);
  });

  it('bakery: the headline says movement, validation with interval and p, gate and first lever', () => {
    const doc = toDocument(renderMarkdown(bakeryReview()));
    expect(doc.querySelector('h2')?.textContent).toBe(
      'fitgap review: toward overfitting · validation worse · gate failed',
    );
    const items = [...doc.querySelectorAll('h2 + ul > li')].map((li) => li.textContent);
    // This fixture records changes without roles (an older report): directions and values only.
    expect(items[0]).toMatch(
      /^This PR: raised hidden_units 64 → 256; lowered weight_decay 0.001 → 0.0001; /,
    );
    expect(items[1]).toMatch(/^The change moved the model toward overfitting: avoidable bias fell/);
    expect(items[2]).toBe(
      "Validation mae_loaves worse: 6.050 → 6.380 (Δ +0.330, 95% interval [+0.120, +0.540], p = 0.006, Welch's t-test).",
    );
    expect(items[3]).toBe('Gate failed: worse-validation: validation got significantly worse.');
    // The first lever in one sentence: its first measured reason (it has no value to try).
    expect(items[4]).toBe(
      'Next lever: Stop training earlier: The candidate has high variance: 1.290 against a ' +
        'validation error of 6.380.',
    );
  });

  it('provenance lists the files with sha256 when given', () => {
    const sha = 'a'.repeat(64);
    const md = renderMarkdown(bakeryReview(), {
      provenance: { files: [{ label: 'baseline', path: 'runs/base|line.json', sha256: sha }] },
    });
    const doc = assertSafe(md);
    const last = [...doc.querySelectorAll('table')].at(-1);
    expect([...(last?.querySelectorAll('td') ?? [])].map((td) => td.textContent)).toEqual([
      'baseline',
      'runs/base|line.json',
      sha,
    ]);
  });

  it('minimal: no charts, no slice or hyperparameter sections, n/a where unknown', () => {
    const md = renderMarkdown(minimalReview());
    const doc = assertSafe(md);
    expect(mermaidBlocks(md)).toEqual([]);
    expect(md).not.toContain('### Charts');
    expect(md).not.toContain('Slices');
    expect(md).not.toContain('Hyperparameter changes');
    expect(tableShapes(doc).map((t) => t.rows)).toEqual([3, 6, 3, 3]);
    expect(md).toContain('avoidable bias unknown');
  });

  it('delivery: a hidden slice regression is in the headline and first among the slices', () => {
    const md = renderMarkdown(deliveryReview());
    const doc = assertSafe(md);
    expect(md).toContain(
      '**1 slice got worse while validation improved**: worst: Depot 7 (island routes)',
    );
    const sliceTable = [...doc.querySelectorAll('details table')][0];
    expect(sliceTable?.querySelector('tbody tr td')?.textContent).toBe('Depot 7 (island routes)');
  });

  it('hostile: every slice and hyperparameter cell holds exactly its plain text', () => {
    const review = hostileReview(40);
    const doc = assertSafe(renderMarkdown(review));
    const shapes = tableShapes(doc);
    for (const shape of shapes) expect(new Set(shape.columns).size).toBe(1);
    const slices = [...doc.querySelectorAll('details table')].find(
      (t) => t.querySelector('th')?.textContent === 'Slice',
    );
    const names = [...(slices?.querySelectorAll('tbody tr') ?? [])].map((tr) =>
      (tr.querySelector('td')?.textContent ?? '').replace(ZWJ, ''),
    );
    expect(names).toHaveLength(20);
    const expected = new Set(review.slices.map((s) => plainText(s.name)));
    for (const name of names) expect(expected).toContain(name);
    const keys = [...doc.querySelectorAll('td')].map((td) =>
      (td.textContent ?? '').replace(ZWJ, ''),
    );
    for (const text of HOSTILE) expect(keys).toContain(plainText(text));
    expect(keys).toContain(plainText(LONG_NAME));
  });

  it('hostile text never reaches a Mermaid block', () => {
    const md = renderMarkdown(hostileReview(10));
    const blocks = mermaidBlocks(md);
    expect(blocks.length).toBeGreaterThan(0);
    for (const block of blocks) {
      // The first line may be our own init directive (colours); the rest must be clean.
      const body = block
        .split('\n')
        .filter((line) => !line.startsWith('%%{init: {"themeVariables"'));
      for (const line of body) {
        expect(line.replace(' --> ', ' ')).not.toMatch(/[<>@#`|;]|%%|click|script/);
      }
    }
  });
});

describe('size limit', () => {
  it('5,000 hostile slices and 10,000-character names stay under 60,000 by default', () => {
    const md = renderMarkdown(hostileReview(5000));
    expect(md.length).toBeLessThanOrEqual(60_000);
    assertSafe(md);
    expect(md).toContain('4,980 more slices are not shown; the JSON report has all 5,000.');
  });

  it.each([40_000, 12_000, 8_000, 5_000, 3_000, 2_000, 1_000, 300, 50])(
    'never exceeds maxLength %i',
    (maxLength) => {
      const md = renderMarkdown(hostileReview(5000), { maxLength });
      expect(md.length).toBeLessThanOrEqual(maxLength);
    },
  );

  it('drops detail in a fixed order and says what was dropped', () => {
    const review = bakeryReview();
    const full = renderMarkdown(review, { maxLength: 1_000_000 });
    expect(full).not.toContain('Shortened');
    const seen: string[] = [];
    for (let max = full.length; max > 1_200; max -= 97) {
      const md = renderMarkdown(review, { maxLength: max });
      expect(md.length).toBeLessThanOrEqual(max);
      const state = [
        (md.match(/<summary>Slices/) ? (md.match(/^\| [^|]+ \| [\d,]+ \|/gm) ?? []).length : 0) >=
        14
          ? 'slices:all'
          : md.includes('<summary>Slices')
            ? 'slices:5'
            : 'slices:none',
        md.includes('```mermaid') ? 'charts' : 'no-charts',
        md.includes('<summary>Method notes') ? 'notes' : 'no-notes',
      ].join(' ');
      if (seen.at(-1) !== state) seen.push(state);
      if (md !== full) {
        expect(md).toMatch(
          /_Shortened to fit the size limit: left out [^_]+\. The JSON report has every number\._/,
        );
      }
    }
    expect(seen).toEqual([
      'slices:all charts notes',
      'slices:5 charts notes',
      'slices:5 no-charts notes',
      'slices:5 no-charts no-notes',
      'slices:none no-charts no-notes',
    ]);
    // Below the headline's own size only a stub with the marker is left.
    expect(renderMarkdown(review, { maxLength: 400 })).toBe(
      '<!-- fitgap:review key=default head= -->\n## fitgap review\n\nToo large for this space: see the JSON report.\n',
    );
  });
});

describe('escapeInline inside a GFM table (property)', () => {
  it('any string stays in one cell and reads back as its plain text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 60 }), (s) => {
        const doc = toDocument(markdownTable([['h'], [escapeInline(s)]]));
        const cells = doc.querySelectorAll('td');
        expect(cells).toHaveLength(1);
        expect(doc.querySelectorAll('a, img, script, code, em, strong, del')).toHaveLength(0);
        expect((cells[0]?.textContent ?? '').replace(ZWJ, '')).toBe(plainText(s));
      }),
      { numRuns: 300 },
    );
  });
});

describe('snapshot', () => {
  it('bakery comment', async () => {
    const md = renderMarkdown(bakeryReview(), { commentKey: 'demo', headSha: 'b71c9e3' });
    await expect(md).toMatchFileSnapshot('./__snapshots__/bakery-comment.md');
  });
  it('delivery comment', async () => {
    const md = renderMarkdown(deliveryReview(), { commentKey: 'demo', headSha: '7d2f4a9' });
    await expect(md).toMatchFileSnapshot('./__snapshots__/delivery-comment.md');
  });
});
