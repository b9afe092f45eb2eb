import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  binomialSamplingVariance,
  mdeMcNemar,
  noncentralityFor,
  tTestPower,
  mdeMeans,
  mdePaired,
  mdeTwoProportions,
  pairsNeeded,
  powerTwoProportions,
  repeatsNeeded,
  rowsNeededMcNemar,
  rowsNeededTwoProportions,
  splitNoise,
} from '../../src/stats/index.js';
import type { SplitNoise } from '../../src/stats/index.js';

import { expectNear, expectRelative } from './close.js';

// Source: computed (statsmodels 0.13.5, SciPy 1.10.1), frozen by test/fixtures/stats/power-statsmodels.py
const ref = JSON.parse(
  readFileSync(new URL('../fixtures/stats/power-statsmodels.json', import.meta.url), 'utf8'),
) as {
  nct_power: { ncp: number; df: number; alpha: number; power: number }[];
  ttest_ind_mde: { k: number; alpha: number; power: number; d: number }[];
  normal_ind_mde: { n: number; alpha: number; power: number; d: number }[];
  ttest_ind_n: { d: number; n: number }[];
  ttest_paired_mde: { n: number; d: number }[];
  ttest_paired_n: { d: number; n: number }[];
  two_proportions_power: {
    p1: number;
    p2: number;
    n1: number;
    n2: number;
    alpha: number;
    power: number;
  }[];
  two_proportions_n: { p1: number; p2: number; ratio: number; n: number }[];
  mcnemar: { p10: number; p01: number; n: number; exactPowerAtCeil: number }[];
};

/** An arm of k repeats with per-repeat SD 1 and no sampling part (a spread-only design). */
function seedArm(k: number, sd = 1): SplitNoise {
  // Values with sample SD exactly `sd`: ±sd·sqrt((k − 1)/k) around 0 for even k is not general, so
  // build the noise directly from the rule's inputs instead.
  const base = splitNoise({
    values: Array.from({ length: k }, (_, i) => i),
    evaluationRows: 'per-repeat',
  });
  const s2 = sd * sd;
  return { ...base, mean: 0, variance: s2 / k, df: k - 1, perRepeat: { variance: s2, df: k - 1 } };
}

describe('tTestPower (noncentral t by quadrature)', () => {
  it(`matches SciPy's nct on ${ref.nct_power.length} grid points, df 1 to 2e5, noncentrality to 80`, () => {
    for (const r of ref.nct_power) {
      // Source: computed (SciPy 1.10.1 scipy.stats.nct), power-statsmodels.json
      expectNear(tTestPower(r.ncp, r.df, r.alpha), r.power, 1e-6);
    }
  });

  it('noncentralityFor inverts it', () => {
    for (const df of [1, 2.5, 30, Infinity]) {
      expectNear(tTestPower(noncentralityFor(0.8, df, 0.05), df, 0.05), 0.8, 1e-9);
    }
  });
});

describe('mdeMeans against statsmodels TTestIndPower (noncentral t)', () => {
  it('matches for k = 2 … 50 repeats per run at two (alpha, power) settings', () => {
    for (const r of ref.ttest_ind_mde) {
      const mde = mdeMeans(seedArm(r.k), seedArm(r.k), r.alpha, r.power) as number;
      // Source: computed (statsmodels 0.13.5 TTestIndPower.solve_power), power-statsmodels.json
      expectRelative(mde, r.d, 1e-7);
    }
  });

  it('is the normal formula when the noise is binomial alone (df ∞)', () => {
    for (const r of ref.normal_ind_mde) {
      // v = σ²/n per arm with σ = 1 → MDE = d·σ
      const arm = { ...seedArm(2), variance: 1 / r.n, df: Infinity };
      // Source: computed (statsmodels 0.13.5 NormalIndPower.solve_power), power-statsmodels.json
      expectRelative(mdeMeans(arm, arm, r.alpha, r.power) as number, r.d, 1e-6);
    }
  });

  it('is null when the noise is unknown', () => {
    expect(mdeMeans(splitNoise({ values: [1.48] }), seedArm(3), 0.05)).toBeNull();
  });
});

describe('repeatsNeeded', () => {
  it('Cohen’s table: d = 0.2, 0.5, 0.8 need 394, 64, 26 repeats per run', () => {
    // Source: Cohen (1988) Table 2.4.1, 393, 64, 26 (from memory; VALUES.md §12); statsmodels
    // TTestIndPower 393.41, 63.77, 25.52 (computed), rounded up.
    expect(repeatsNeeded(0.2, seedArm(3), seedArm(3), 0.05)).toEqual({
      repeats: 394,
      lowerBound: false,
    });
    expect(repeatsNeeded(0.5, seedArm(3), seedArm(3), 0.05)).toEqual({
      repeats: 64,
      lowerBound: false,
    });
    expect(repeatsNeeded(-0.8, seedArm(3), seedArm(3), 0.05)).toEqual({
      repeats: 26,
      lowerBound: false,
    });
  });

  it('is statsmodels TTestIndPower n rounded up', () => {
    for (const r of ref.ttest_ind_n) {
      // Source: computed (statsmodels 0.13.5 TTestIndPower.solve_power), power-statsmodels.json
      expect(repeatsNeeded(r.d, seedArm(5), seedArm(5), 0.05)).toEqual({
        repeats: Math.max(2, Math.ceil(r.n)),
        lowerBound: false,
      });
    }
  });

  it('says why there is no number: no change, unknown noise, fixed-set noise, too many', () => {
    expect(repeatsNeeded(0, seedArm(3), seedArm(3), 0.05)).toEqual({
      repeats: null,
      reason: 'no-change',
    });
    expect(repeatsNeeded(0.1, splitNoise({ values: [1.48] }), seedArm(3), 0.05)).toEqual({
      repeats: null,
      reason: 'noise-unknown',
    });
    // One repeat of a proportion: σ² is known but the seed part is not. Fixed rows: the sampling
    // noise alone decides whether repeats can help; when they can, the count is a lower bound.
    const one = splitNoise({ values: [0.2], sampling: binomialSamplingVariance(0.2, 1000) });
    expect(repeatsNeeded(0.03, one, one, 0.05)).toEqual({ repeats: null, reason: 'fixed-noise' });
    expect(repeatsNeeded(0.1, one, one, 0.05)).toEqual({ repeats: 2, lowerBound: true });
    const onePerRepeat = splitNoise({
      values: [0.2],
      sampling: binomialSamplingVariance(0.2, 1000),
      evaluationRows: 'per-repeat',
    });
    const perRepeatNeed = repeatsNeeded(0.01, onePerRepeat, onePerRepeat, 0.05);
    // Per-repeat rows: σ²/k shrinks, so k follows from σ² = 1.6e-4 (normal formula: 2·2.80²·σ²/δ² ≈ 25.1).
    expect(perRepeatNeed).toEqual({ repeats: 26, lowerBound: true });
    // Fixed rows, 1,000 examples: MDE from the sampling noise alone is 2.8·sqrt(2·0.16/1000) ≈ 0.050.
    const fixed = splitNoise({
      values: [0.2, 0.21, 0.19],
      sampling: binomialSamplingVariance(0.2, 1000),
    });
    expect(repeatsNeeded(0.03, fixed, fixed, 0.05)).toEqual({
      repeats: null,
      reason: 'fixed-noise',
    });
    expect(repeatsNeeded(0.06, fixed, fixed, 0.05).repeats).toBeGreaterThanOrEqual(2);
    expect(repeatsNeeded(1e-4, seedArm(3), seedArm(3), 0.05)).toEqual({
      repeats: null,
      reason: 'beyond-limit',
    });
  });

  it('fixed rows: more repeats shrink only the seed part (the answer meets the MDE it promises)', () => {
    const fixed = splitNoise({
      values: [0.2, 0.23, 0.17],
      sampling: binomialSamplingVariance(0.2, 5000),
    });
    const got = repeatsNeeded(0.03, fixed, fixed, 0.05);
    expect(got.repeats).not.toBeNull();
    const k = got.repeats as number;
    const at = (n: number): SplitNoise => {
      const variance = fixed.perRepeat.variance / n + fixed.fixed.variance;
      const df = variance ** 2 / ((fixed.perRepeat.variance / n) ** 2 / (n - 1)); // the fixed part has df ∞
      return { ...fixed, variance, df };
    };
    expect(mdeMeans(at(k), at(k), 0.05) as number).toBeLessThanOrEqual(0.03);
    expect(mdeMeans(at(k - 1), at(k - 1), 0.05) as number).toBeGreaterThan(0.03);
  });
});

describe('two proportions (Fleiss, Levin & Paik 2003 §4.2)', () => {
  it('power matches statsmodels power_proportions_2indep', () => {
    for (const r of ref.two_proportions_power) {
      // Source: computed (statsmodels 0.13.5), power-statsmodels.json
      expectNear(powerTwoProportions(r.p1, r.p2, r.n1, r.n2, r.alpha), r.power, 1e-9);
    }
  });

  it('rows needed match statsmodels samplesize_proportions_2indep_onetail, rounded up', () => {
    for (const r of ref.two_proportions_n) {
      // Source: computed (statsmodels 0.13.5), power-statsmodels.json
      expect(rowsNeededTwoProportions(r.p1, r.p2, 0.05, 0.8, r.ratio)).toBe(Math.ceil(r.n));
    }
    expect(rowsNeededTwoProportions(0.2, 0.2, 0.05)).toBeNull();
  });

  it('the MDE is where the power reaches 80%, in both directions', () => {
    const { increase, decrease } = mdeTwoProportions(0.2, 1000, 1000, 0.05);
    expectNear(powerTwoProportions(0.2, 0.2 + (increase as number), 1000, 1000, 0.05), 0.8, 1e-9);
    expectNear(powerTwoProportions(0.2, 0.2 - (decrease as number), 1000, 1000, 0.05), 0.8, 1e-9);
    // Consistent with the sample-size formula: n for p1 → p1 + MDE is about the n we have.
    expect(
      Math.abs((rowsNeededTwoProportions(0.2, 0.2 + (increase as number), 0.05) as number) - 1000),
    ).toBeLessThanOrEqual(1);
    // A rate at 0: no decrease exists; the increase is still finite.
    const zero = mdeTwoProportions(0, 2000, 2000, 0.05);
    expect(zero.decrease).toBeNull();
    expect(zero.increase).toBeGreaterThan(0);
    // Too few rows for any change of the rate to reach 80% power in that direction.
    expect(mdeTwoProportions(0.9, 3, 3, 0.05).increase).toBeNull();
  });
});

describe('paired designs', () => {
  it('McNemar rows follow Connor (1987); the exact test reaches about 0.77 power there', () => {
    for (const r of ref.mcnemar) {
      // Source: Connor (1987) formula (from memory), computed in power-statsmodels.py
      expect(rowsNeededMcNemar(r.p10, r.p01, 0.05)).toBe(Math.ceil(r.n));
      // Computed exact power of McNemar's exact conditional test at that n: the formula is for the
      // asymptotic test, so the exact test falls a little short of 0.8.
      expect(r.exactPowerAtCeil).toBeGreaterThan(0.75);
      expect(r.exactPowerAtCeil).toBeLessThan(0.8);
    }
    expect(rowsNeededMcNemar(0.1, 0.1, 0.05)).toBeNull();
  });

  it('McNemar MDE inverts the rows formula', () => {
    const psi = 0.3;
    const mde = mdeMcNemar(psi, 233, 0.05) as number;
    const p01 = (psi + mde) / 2;
    const p10 = (psi - mde) / 2;
    expect(rowsNeededMcNemar(p10, p01, 0.05)).toBe(233); // Connor (1987), from memory
    expectNear(mde, 0.1, 2e-3); // 0.1 vs 0.2 needed 233.09 rows (power-statsmodels.json)
    expect(mdeMcNemar(0, 1000, 0.05)).toBeNull();
    expect(mdeMcNemar(0.01, 10, 0.05)).toBeNull();
  });

  it('paired t MDE and pairs needed match statsmodels TTestPower', () => {
    for (const r of ref.ttest_paired_mde) {
      // Source: computed (statsmodels 0.13.5 TTestPower.solve_power), power-statsmodels.json
      expectRelative(mdePaired(1, r.n, 0.05) as number, r.d, 1e-7);
    }
    for (const r of ref.ttest_paired_n) {
      // Source: computed (statsmodels 0.13.5 TTestPower.solve_power), power-statsmodels.json
      expect(pairsNeeded(r.d, 1, 0.05)).toBe(Math.ceil(r.n));
    }
    expect(mdePaired(0, 100, 0.05)).toBeNull();
    expect(pairsNeeded(0, 1, 0.05)).toBeNull();
  });
});

describe('input checks', () => {
  it('rejects power and alpha outside their ranges', () => {
    expect(() => mdePaired(1, 10, 0.05, 1)).toThrow(/power/);
    expect(() => mdePaired(1, 10, 0)).toThrow(/alpha/);
    expect(() => rowsNeededMcNemar(0.6, 0.6, 0.05)).toThrow(/exceed 1/);
  });
});
