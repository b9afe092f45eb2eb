import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  logRatio,
  nonInferiorityCalls,
  nonInferiorityTest,
  welchWorsening,
} from '../../src/stats/index.js';
import { expectNear, expectRelative } from './close.js';

interface NiCase {
  baseline: number[];
  candidate: number[];
  margin: number;
  alpha: number;
  pNonInferior: number;
  pInferior: number;
  bounds: [number, number];
}
interface RatioCase {
  baseline: number[];
  candidate: number[];
  ratio: number;
  ci: [number, number];
  p: number;
}
const fixture = JSON.parse(
  readFileSync(new URL('../fixtures/stats/non-inferiority-scipy.json', import.meta.url), 'utf8'),
) as { source: string; nonInferiority: NiCase[]; ratios: RatioCase[] };

describe('non-inferiority, one-sided Welch tests against a margin', () => {
  // Source: computed (SciPy 1.17.1): scipy.stats.ttest_ind(c − margin, b, equal_var=False,
  // alternative='less' | 'greater') and the (1 − 2α) interval of ttest_ind(c, b, equal_var=False);
  // test/fixtures/stats/make-non-inferiority.py.
  it.each(fixture.nonInferiority.map((c, i) => [i, c] as const))('case %i', (_i, c) => {
    const result = nonInferiorityTest(welchWorsening(c.baseline, c.candidate), c.margin, c.alpha);
    expectRelative(result.pNonInferior, c.pNonInferior, 1e-6);
    expectRelative(result.pInferior, c.pInferior, 1e-6);
    expectNear(result.bounds[0], c.bounds[0], 1e-9);
    expectNear(result.bounds[1], c.bounds[1], 1e-9);
  });

  it('the call agrees with the one-sided bounds (ICH E9 §3.3.2 confidence-interval approach)', () => {
    // Source: ICH E9 §3.3.2 / Wellek (2010) ch. 2: non-inferior ⇔ upper bound < margin; the
    // one-sided test at alpha and the one-sided (1 − alpha) bound decide alike.
    for (const c of fixture.nonInferiority) {
      const test = nonInferiorityTest(welchWorsening(c.baseline, c.candidate), c.margin, c.alpha);
      const [call] = nonInferiorityCalls([test], c.alpha);
      const expected =
        test.bounds[1] < c.margin
          ? 'non-inferior'
          : test.bounds[0] > c.margin
            ? 'inferior'
            : 'undetermined';
      expect(call?.call).toBe(expected);
    }
  });

  it('zero spread: the bounds collapse and the side of the margin decides', () => {
    const w = { estimate: 0.01, se: 0, df: 4 };
    expect(nonInferiorityTest(w, 0.02, 0.05)).toEqual({
      bounds: [0.01, 0.01],
      pNonInferior: 0,
      pInferior: 1,
    });
    expect(nonInferiorityTest(w, 0.005, 0.05).pInferior).toBe(0);
    expect(nonInferiorityTest(w, 0.01, 0.05)).toMatchObject({ pNonInferior: 1, pInferior: 1 });
  });

  it('normal reference: z bounds', () => {
    // Source: z(0.95) = 1.644854 (NIST e-Handbook §1.3.6.7.1 table, ∞ row of the t table 1.645).
    const t = nonInferiorityTest({ estimate: 0, se: 1, df: null }, 1.644854, 0.05);
    expectNear(t.bounds[1], 1.644854, 1e-5);
    expectNear(t.pNonInferior, 0.05, 1e-6);
  });

  it('Holm across guardrails makes each call harder, never easier (Holm 1979)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            estimate: fc.double({ min: -1, max: 1, noNaN: true }),
            se: fc.double({ min: 0.001, max: 1, noNaN: true }),
            margin: fc.double({ min: 0, max: 1, noNaN: true }),
          }),
          { minLength: 1, maxLength: 6 },
        ),
        (rows) => {
          const tests = rows.map((r) => nonInferiorityTest({ ...r, df: null }, r.margin, 0.05));
          const joint = nonInferiorityCalls(tests, 0.05);
          tests.forEach((t, i) => {
            const alone = nonInferiorityCalls([t], 0.05)[0]?.call;
            const together = joint[i]?.call;
            if (together === 'non-inferior' || together === 'inferior')
              expect(alone).toBe(together);
            expect(joint[i]?.pNonInferior).toBeGreaterThanOrEqual(t.pNonInferior);
          });
        },
      ),
      { seed: 15, numRuns: 300 },
    );
  });

  it('a guardrail without a test takes no part', () => {
    const t = nonInferiorityTest({ estimate: 0, se: 0.01, df: 10 }, 0.05, 0.05);
    const calls = nonInferiorityCalls([null, t], 0.05);
    expect(calls[0]).toEqual({ call: null, pNonInferior: null, pInferior: null });
    expect(calls[1]?.call).toBe('non-inferior');
  });
});

describe('cost ratios: Welch on logarithms', () => {
  // Source: computed (SciPy 1.17.1): exp of ttest_ind(log c, log b, equal_var=False) and its 95%
  // interval; test/fixtures/stats/make-non-inferiority.py.
  it.each(fixture.ratios.map((c, i) => [i, c] as const))('case %i', (_i, c) => {
    const r = logRatio(c.baseline, c.candidate, 0.05);
    expectRelative(r.ratio, c.ratio, 1e-9);
    expectRelative(r.ci?.[0], c.ci[0], 1e-7);
    expectRelative(r.ci?.[1], c.ci[1], 1e-7);
    expectRelative(r.p ?? undefined, c.p, 1e-6);
  });

  it('one repeat: a ratio without an interval', () => {
    expect(logRatio([100], [240], 0.05)).toEqual({ ratio: 2.4, ci: null, p: null });
  });

  it('swapping the runs inverts the ratio and its interval', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.1, max: 1e4, noNaN: true }), { minLength: 2, maxLength: 6 }),
        fc.array(fc.double({ min: 0.1, max: 1e4, noNaN: true }), { minLength: 2, maxLength: 6 }),
        (b, c) => {
          const ab = logRatio(b, c, 0.05);
          const ba = logRatio(c, b, 0.05);
          expect(ab.ratio * ba.ratio).toBeCloseTo(1, 9);
          if (ab.ci && ba.ci) {
            expect(ab.ci[0] * ba.ci[1]).toBeCloseTo(1, 6);
          }
        },
      ),
      { seed: 15, numRuns: 200 },
    );
  });

  it('refuses values that are not positive', () => {
    expect(() => logRatio([0, 1], [1, 2], 0.05)).toThrow(/baseline\[0\] must be a positive/);
  });
});
