// @vitest-environment jsdom
// Mermaid's parser needs a DOM window (DOMPurify); jsdom provides one.
/**
 * The audit renderers on hand-made audits (no git): GFM table shape, Mermaid chart syntax with
 * Mermaid's own parser, escaping of hostile commit subjects, thinning of long audits, and the
 * JSON Lines record's sorted keys.
 */
import mermaid from 'mermaid';
import { describe, expect, it } from 'vitest';
import type { AuditEntry, RangeAudit } from '../../src/model/audit.js';
import type { Review } from '../../src/model/review.js';
import { MAX_TREND_POINTS, trendChart } from '../../src/report/audit-chart.js';
import { renderAuditMarkdown } from '../../src/report/audit-markdown.js';
import { canonicalJson, rangeRecords, renderJsonLines } from '../../src/report/audit-record.js';
import { renderAuditText } from '../../src/report/audit-text.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { minimalReview } from '../fixtures/report/minimal.js';
import { mermaidBlocks, rawHtml, tableShapes, toDocument } from '../report/gfm.js';

const sha = (i: number): string => i.toString(16).padStart(2, '0').repeat(20);
const commit = (i: number, subject = `change ${i}`) => ({
  sha: sha(i),
  date: `2026-04-${String((i % 28) + 1).padStart(2, '0')}T10:00:00+02:00`,
  subject,
});

function audit(reviews: Review[], extra: AuditEntry[] = []): RangeAudit {
  const entries: AuditEntry[] = [
    { status: 'base', commit: commit(0), sources: [], note: null },
    ...reviews.map((review, i): AuditEntry => ({
      status: 'reviewed',
      commit: commit(
        i + 1,
        i === 0 ? '<img src=x onerror=alert(1)> | @team #12 `x`' : `change ${i + 1}`,
      ),
      baseline: sha(i),
      review,
      sources: [
        { commit: sha(i), path: 'runs/a.json', sha256: 'a'.repeat(64) },
        { commit: sha(i + 1), path: 'runs/a.json', sha256: 'b'.repeat(64) },
      ],
    })),
    ...extra,
  ];
  return {
    repository: 'crumb-co/forecast',
    artifactPath: 'runs/a.json',
    from: commit(0),
    to: entries[entries.length - 1]?.commit ?? commit(0),
    against: 'previous',
    entries,
  };
}

describe('markdown', () => {
  const md = renderAuditMarkdown(
    audit(
      [bakeryReview(), bakeryReview()],
      [
        {
          status: 'skipped',
          commit: commit(9, 'drop *all* [data]'),
          kind: 'invalid',
          reason: 'runs/a.json: / must be JSON <b>',
        },
      ],
    ),
  );

  it('one trend table: header and a row per base or reviewed commit, 9 columns', () => {
    const doc = toDocument(md);
    expect(tableShapes(doc)).toEqual([{ rows: 4, columns: [9, 9, 9, 9] }]);
    const cells = [...doc.querySelectorAll('tbody tr:nth-child(2) td')].map((td) => td.textContent);
    expect(cells.slice(0, 4)).toEqual([
      '0101010',
      '2026-04-02',
      '<img src=x onerror=alert(1)> | @\u200Dteam #\u200D12 `x`',
      'toward overfitting',
    ]);
  });

  it('artifact and commit text cannot open HTML, mention anyone or break the table', () => {
    expect(rawHtml(md)).toEqual([]);
    expect(md).not.toMatch(/@team|#12/);
    expect(md).toContain(
      '- `0909090` drop \\*all\\* \\[data\\]: invalid artifact, runs/a.json: / must be JSON &lt;b&gt;',
    );
  });

  it('the chart parses with Mermaid and names its lines in the caption', async () => {
    const blocks = mermaidBlocks(md);
    expect(blocks).toHaveLength(1);
    const parsed = await mermaid.parse(blocks[0] ?? '');
    expect(parsed && parsed.diagramType).toBe('xychart');
    expect(md).toContain(
      'Lines: dark grey = validation error level, blue = avoidable bias, orange = variance.',
    );
    expect(blocks[0]).toContain('x-axis "commit" ["0000000", "0101010", "0202020"]');
  });
});

describe('chart', () => {
  it('a long audit is thinned to the first and last and evenly between', () => {
    const chart = trendChart(audit(Array.from({ length: 250 }, () => bakeryReview())));
    const labels = /x-axis "commit" \[(.*)\]/.exec(chart?.code ?? '')?.[1]?.split(', ') ?? [];
    expect(labels).toHaveLength(MAX_TREND_POINTS);
    expect(labels[0]).toBe('"0000000"');
    expect(labels[labels.length - 1]).toBe(`"${sha(250).slice(0, 7)}"`);
    expect(chart?.caption).toContain('251 commits thinned evenly to 100 points');
  });

  it('no bias line when the reference is unknown; no chart for one point', () => {
    const chart = trendChart(audit([minimalReview()]));
    expect(chart?.code.match(/^ {2}line /gm)).toHaveLength(2);
    expect(chart?.caption).toContain('Not drawn (unknown at some commits): avoidable bias.');
    expect(trendChart({ ...audit([]), entries: [audit([]).entries[0] as AuditEntry] })).toBeNull();
  });
});

describe('text and records', () => {
  it('text has no control characters from commit subjects', () => {
    const text = renderAuditText(
      audit(
        [bakeryReview()],
        [
          {
            status: 'skipped',
            commit: commit(5, 'evil \x1b[31mred\x1b[0m'),
            kind: 'missing',
            reason: 'gone',
          },
        ],
      ),
    );
    expect(text).not.toContain('\x1b');
    expect(text).toContain('0505050 evil [31mred[0m: no artifact, gone');
  });

  it('records: sorted keys at every depth, one line each, the clock only in recordedAt', () => {
    const a = audit([bakeryReview(), minimalReview()]);
    const records = rangeRecords(a, {
      recordedAt: '2026-12-01T00:00:00.000Z',
      fitgapVersion: '1.2.3',
    });
    const lines = renderJsonLines(records).split('\n');
    expect(lines).toHaveLength(3);
    expect(lines[2]).toBe('');
    const sorted = (value: unknown): boolean =>
      Array.isArray(value)
        ? value.every(sorted)
        : value !== null && typeof value === 'object'
          ? Object.keys(value).join() === Object.keys(value).sort().join() &&
            Object.values(value).every(sorted)
          : true;
    expect(sorted(JSON.parse(lines[0] ?? ''))).toBe(true);
    expect(canonicalJson({ b: 1, a: [{ d: 1, c: undefined }] })).toBe('{"a":[{"d":1}],"b":1}');
  });
});
