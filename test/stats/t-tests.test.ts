import { describe, expect, it } from 'vitest';
import { oneSampleT, pairedT, RunningStats, welchT } from '../../src/stats/index.js';
import { pooledT } from './pooled-t.js';
import { expectNear, expectPrinted, expectRelative } from './close.js';
import { auto83b, sleep } from './fixtures.js';

// NIST AUTO83B: sample 1 = US, sample 2 = Japan, and NIST reports Ȳ1 − Ȳ2. Our estimate is
// candidate − baseline, so baseline = Japan, candidate = US reproduces NIST's sign.
const { us, japan } = auto83b();
// R: t.test(extra ~ group, data = sleep) reports mean(group 1) − mean(group 2):
// baseline = group 2, candidate = group 1.
const { group1, group2 } = sleep();

describe('welchT on NIST AUTO83B', () => {
  const r = welchT(japan, us, 0.05);

  it('reproduces the NIST summary statistics from the fixture', () => {
    expect(us).toHaveLength(249); // Source: NIST e-Handbook §1.3.5.3, N1 = 249 (read)
    expect(japan).toHaveLength(79); // Source: NIST e-Handbook §1.3.5.3, N2 = 79 (read)
  });

  it("matches Boost.Math's Welch example (df 136.87, T −12.946)", () => {
    expect(r.test).toBe('welch-t');
    expectPrinted(r.df, '136.87'); // Source: Boost.Math example/students_t_two_samples.cpp output (read, VALUES.md §1a)
    expectPrinted(r.statistic, '-12.946'); // Source: Boost.Math example/students_t_two_samples.cpp output (read, VALUES.md §1a)
  });

  it('matches the computed Welch values', () => {
    expectNear(r.statistic, -12.946273, 1e-6); // computed (SciPy), VALUES.md §1a
    expectNear(r.df, 136.874977, 1e-6); // computed (SciPy), VALUES.md §1a
    expectRelative(r.p ?? NaN, 1.5709e-25, 1e-4); // computed (SciPy), VALUES.md §1a
    expectNear(r.ci?.[0], -11.915248, 1e-6); // computed (SciPy), VALUES.md §1a
    expectNear(r.ci?.[1], -8.757621, 1e-6); // computed (SciPy), VALUES.md §1a
    expectNear(r.estimate, 20.14458 - 30.48101, 1e-5); // Source: NIST e-Handbook §1.3.5.3 means (read)
  });
});

describe('pooledT on NIST AUTO83B', () => {
  const r = pooledT(japan, us, 0.05);

  it('matches the NIST e-Handbook pooled test (T −12.62059, df 326, s_p 6.34260)', () => {
    expectPrinted(r.statistic, '-12.62059'); // Source: NIST/SEMATECH e-Handbook §1.3.5.3 (read)
    expect(r.df).toBe(326); // Source: NIST/SEMATECH e-Handbook §1.3.5.3 (read)
    expectPrinted(r.pooledSd, '6.34260'); // Source: NIST/SEMATECH e-Handbook §1.3.5.3 (read)
  });

  it("matches NIST's R companion interval and the computed p", () => {
    expectPrinted(r.ci?.[0], '-11.947653'); // Source: NIST e-Handbook §1.3.5.3 R output, t.test(var.equal=TRUE) (read)
    expectPrinted(r.ci?.[1], '-8.725216'); // Source: NIST e-Handbook §1.3.5.3 R output, t.test(var.equal=TRUE) (read)
    expectRelative(r.p ?? NaN, 5.273e-30, 1e-3); // computed (SciPy), VALUES.md §1a
    // Source: Boost.Math example prints one-sided probability 2.637e-030 for the pooled test (read)
    expectRelative((r.p ?? NaN) / 2, 2.637e-30, 1e-3);
  });
});

describe('welchT on R sleep', () => {
  const r = welchT(group2, group1, 0.05);

  it("matches R's printed t.test output", () => {
    expectPrinted(r.statistic, '-1.8608'); // Source: R stats::t.test documentation example output (read, VALUES.md §1b)
    expectPrinted(r.df, '17.776'); // Source: R stats::t.test documentation example output (read, VALUES.md §1b)
    expectPrinted(r.p ?? NaN, '0.07939'); // Source: R stats::t.test documentation example output (read, VALUES.md §1b)
    expectPrinted(r.ci?.[0], '-3.3654832'); // Source: R stats::t.test documentation example output (read, VALUES.md §1b)
    expectPrinted(r.ci?.[1], '0.2054832'); // Source: R stats::t.test documentation example output (read, VALUES.md §1b)
    expectPrinted(r.estimate, '-1.58'); // Source: R output, group means 0.75 and 2.33 (read)
  });

  it('matches the computed values to 1e-7', () => {
    expectNear(r.statistic, -1.860813467, 1e-8); // computed (SciPy), VALUES.md §1b
    expectNear(r.df, 17.776473516, 1e-8); // computed (SciPy), VALUES.md §1b
    expectNear(r.p ?? NaN, 0.07939414, 1e-7); // computed (SciPy), VALUES.md §1b
    expectNear(r.ci?.[0], -3.365483231, 1e-7); // computed (SciPy), VALUES.md §1b
    expectNear(r.ci?.[1], 0.205483231, 1e-7); // computed (SciPy), VALUES.md §1b
  });
});

describe('pairedT', () => {
  const diffs = group1.map((x, i) => x - (group2[i] as number));
  const running = new RunningStats();
  for (const d of diffs) running.push(d);
  const r = pairedT(running, 0.05);

  it("matches R's paired sleep example", () => {
    // R: t.test(extra ~ group, data = sleep, paired = TRUE) prints t = -4.0621, df = 9,
    // p-value = 0.002833, CI -2.4598858 -0.7001142 (from memory), confirmed by SciPy 1.17.1
    // stats.ttest_rel (computed: t -4.062127683, p 0.002832890, CI -2.459885763..-0.700114237).
    expect(r.test).toBe('paired-t');
    expect(r.df).toBe(9);
    expectNear(r.statistic, -4.062127683, 1e-8);
    expectNear(r.p ?? NaN, 0.00283289, 1e-8);
    expectNear(r.ci?.[0], -2.459885763, 1e-7);
    expectNear(r.ci?.[1], -0.700114237, 1e-7);
  });

  it('via RunningStats equals oneSampleT on the difference values', () => {
    const o = oneSampleT(diffs, 0.05);
    expectNear(r.estimate, o.estimate, 1e-14); // computed: same statistic two ways
    expectNear(r.ci?.[0], o.ci[0], 1e-12);
    expectNear(r.ci?.[1], o.ci[1], 1e-12);
    expectNear(r.p ?? NaN, o.pTwoSided, 1e-12);
    expect(r.df).toBe(o.df);
  });

  it('has the estimate of welchT on the two columns (mean of differences = difference of means)', () => {
    expectNear(r.estimate, welchT(group2, group1, 0.05).estimate, 1e-14); // common practice
  });

  it('rejects n < 2 and a bad variance', () => {
    expect(() => pairedT({ n: 1, mean: 0, variance: NaN }, 0.05)).toThrow(/at least 2/);
    expect(() => pairedT({ n: 5, mean: 0, variance: -1 }, 0.05)).toThrow(RangeError);
    expect(() => pairedT({ n: 5, mean: 0, variance: 1 }, 1)).toThrow(/alpha/);
  });
});

describe('oneSampleT', () => {
  it('gives the one-sided p for mean > 0', () => {
    const o = oneSampleT(
      group1.map((x, i) => (group2[i] as number) - x),
      0.05,
    );
    // computed: SciPy 1.17.1 stats.ttest_1samp(group2 − group1, 0, alternative='greater') p = 0.00141644
    expectNear(o.pGreater, 0.0014164451, 1e-8);
    expectNear(o.pTwoSided, 0.00283289, 1e-8);
    expect(o.df).toBe(9);
  });

  it('defines zero variance', () => {
    expect(oneSampleT([2, 2, 2], 0.05)).toEqual({
      estimate: 2,
      ci: [2, 2],
      pTwoSided: 0,
      pGreater: 0,
      df: 2,
    });
    expect(oneSampleT([0, 0], 0.05)).toMatchObject({ pTwoSided: 1, pGreater: 0.5 });
    expect(oneSampleT([-0.1, -0.1, -0.1], 0.05)).toMatchObject({ pTwoSided: 0, pGreater: 1 });
  });
});

describe('degenerate and invalid t-test input', () => {
  it('Welch with both variances 0', () => {
    expect(welchT([1, 1], [3, 3, 3], 0.05)).toEqual({
      estimate: 2,
      ci: [2, 2],
      p: 0,
      test: 'welch-t',
    });
    expect(welchT([0.1, 0.1, 0.1], [0.1, 0.1], 0.05)).toEqual({
      estimate: 0,
      ci: [0, 0],
      p: 1,
      test: 'welch-t',
    });
  });

  it('Welch with one variance 0 uses the other group’s n − 1 as df', () => {
    const r = welchT([5, 5, 5, 5], [1, 2, 3], 0.05);
    expectNear(r.df, 2, 1e-12); // Welch–Satterthwaite with s1 = 0 reduces to n2 − 1 (derived from the formula)
  });

  it('throws RangeError for too few values, non-finite values and bad alpha', () => {
    expect(() => welchT([1], [1, 2], 0.05)).toThrow(/baseline needs at least 2/);
    expect(() => welchT([1, 2], [], 0.05)).toThrow(/candidate needs at least 2/);
    expect(() => welchT([1, NaN], [1, 2], 0.05)).toThrow(/baseline\[1\]/);
    expect(() => welchT([1, 2], [1, 2], 0)).toThrow(/alpha/);
    expect(() => oneSampleT([1], 0.05)).toThrow(RangeError);
    expect(() => welchT([1e308, -1e308], [1, 2], 0.05)).toThrow(RangeError);
  });
});
