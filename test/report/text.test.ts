import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Review } from '../../src/model/review.js';
import { renderText, textTable, wrap } from '../../src/report/text.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { hostileReview } from '../fixtures/report/hostile.js';
import { minimalReview } from '../fixtures/report/minimal.js';

const cases: [string, () => Review][] = [
  ['bakery', bakeryReview],
  ['delivery', deliveryReview],
  ['minimal', minimalReview],
  ['hostile', () => hostileReview(5000)],
];
const width = (line: string): number => Array.from(line).length;
// Controls other than newline (ESC among them), and bidi controls.
// eslint-disable-next-line no-control-regex
const CONTROLS = /[\u0000-\u0009\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069\u200E\u200F]/;

describe('renderText', () => {
  it.each(cases)('%s: fits 80 columns, no escape or bidi characters without colour', (_, make) => {
    const text = renderText(make(), { color: false });
    for (const line of text.split('\n')) expect(width(line), line).toBeLessThanOrEqual(80);
    expect(text).not.toMatch(CONTROLS);
  });

  it.each([40, 60, 120])('fits width %i', (w) => {
    const text = renderText(hostileReview(30), { color: false, width: w });
    for (const line of text.split('\n')) expect(width(line)).toBeLessThanOrEqual(w);
  });

  it('colour adds ANSI sequences only around our own text, and the same text remains', () => {
    const plain = renderText(bakeryReview(), { color: false });
    const colored = renderText(bakeryReview(), { color: true });
    expect(colored).toContain('\x1b[1m\x1b[31mfitgap review: toward overfitting');
    // eslint-disable-next-line no-control-regex
    expect(colored.replace(/\x1b\[[0-9;]*m/g, '')).toBe(plain);
  });

  it('bakery: headline, tables and the caution', () => {
    const text = renderText(bakeryReview(), { color: false });
    const lines = text.split('\n');
    expect(lines[0]).toBe('fitgap review: toward overfitting · validation worse · gate failed');
    expect(lines).toContain(
      '  Split       Baseline  Candidate       Δ      95% interval        p  Reading',
    );
    expect(lines).toContain(
      '  validation     6.050      6.380  +0.330  [+0.120, +0.540]    0.006  worse',
    );
    expect(text).toContain('Slices (10 worse, 2 better, 2 unchanged; worst first)');
    expect(text).toContain('  4 more not shown; the JSON report has all.');
    expect(lines.slice(-3)).toEqual([
      'This verdict is advice for a human reviewer, not a proof: it rests on the',
      'numbers the two runs recorded and on the tests named in the method notes.',
      '',
    ]);
    expect(lines).toContain(
      '  Avoidable bias        1.100*      0.420  −0.680  [−0.790, −0.570]  better',
    );
    expect(lines).toContain(
      '  Diagnosis: baseline high bias (underfitting); candidate high variance',
    );
  });

  it('delivery: a proportion in percent, its changes in points, everywhere', () => {
    const text = renderText(deliveryReview(), { color: false });
    expect(text).toContain(
      '* Validation late_call_error_rate better: 17.10% → 13.10% (Δ −4.00 pts, 95%',
    );
    expect(text).toContain('  Values in percent; Δ and intervals in percentage points.');
    expect(text).toContain(
      '  validation     17.10      13.10  −4.00  [−4.90, −3.10]  < 0.001  better',
    );
    expect(text).toContain('  Components, Δ and intervals in percentage points.');
    expect(text).toContain(
      '  Avoidable bias         9.20*      4.80*  −4.40  [−4.70, −4.10]  better',
    );
    expect(text.replace(/\n\s*/g, ' ')).toContain(
      'Validation error exceeds train-dev error by 2.20 pts',
    );
    // One minus sign: U+2212 in every number, never a hyphen-minus before a digit.
    expect(text).not.toMatch(/(^|[\s([])-\d/m);
  });
});

describe('wrap and textTable', () => {
  it('wraps on spaces with a hanging indent and splits over-long words', () => {
    expect(wrap('aaa bbb ccc', 8, '  ', '* ')).toEqual(['* aaa', '  bbb', '  ccc']);
    expect(wrap('x'.repeat(12), 6, '', '')).toEqual(['xxxxxx', 'xxxxxx']);
  });

  it('wraps exactly as counting code points with Array.from does, surrogates included (property)', () => {
    // Reference: the plain wrap that measures every candidate line with Array.from (ECMA-262
    // §22.1.5.1: a string iterates by code points; a lone surrogate is one), naive and quadratic.
    const naive = (text: string, width: number, indent: string, first = indent): string[] => {
      const len = (x: string): number => Array.from(x).length;
      const lines: string[] = [];
      let line = first;
      let empty = true;
      for (const word of text.split(' ').filter((w) => w !== '')) {
        const candidate = empty ? `${line}${word}` : `${line} ${word}`;
        if (len(candidate) <= width) {
          line = candidate;
          empty = false;
          continue;
        }
        if (!empty) lines.push(line);
        let rest = word;
        line = lines.length === 0 && empty ? first : indent;
        while (len(line + rest) > width) {
          const room = Math.max(1, width - len(line));
          const points = Array.from(rest);
          lines.push(line + points.slice(0, room).join(''));
          rest = points.slice(room).join('');
          line = indent;
        }
        line = `${line}${rest}`;
        empty = false;
      }
      if (!empty || lines.length === 0) lines.push(line.trimEnd());
      return lines;
    };
    const piece = fc.oneof(
      fc.constantFrom(' ', '  ', 'a', 'word', '😀', '\uD83D', '\uDE00', 'é', '表'),
      fc.string({ unit: 'binary', maxLength: 6 }),
    );
    fc.assert(
      fc.property(
        fc.array(piece, { maxLength: 40 }).map((p) => p.join('')),
        fc.integer({ min: 4, max: 30 }),
        fc.constantFrom('', '  ', '\uDE00'),
        fc.constantFrom('', '* ', '\uD83D'),
        (text, width, indent, first) => {
          expect(wrap(text, width, indent, first)).toEqual(naive(text, width, indent, first));
        },
      ),
      { numRuns: 500 },
    );
  });

  it('narrows text columns with an ellipsis to fit', () => {
    const lines = textTable(
      { header: ['Name', 'n'], align: ['l', 'r'], rows: [['a'.repeat(50), '1']] },
      20,
    );
    expect(lines).toEqual(['  Name             n', `  ${'a'.repeat(14)}…  1`]);
  });
});
