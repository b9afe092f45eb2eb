import { describe, expect, it } from 'vitest';
import { fitLeastSquares, type Model } from '../../../src/analysis/curves/levenberg-marquardt.js';
import { loadNist, lre } from './nist-fixtures.js';

// Models as printed in the NIST StRD nonlinear regression data files (first comment line of each
// fixture): https://www.itl.nist.gov/div898/strd/nls/nls_main.shtml
const E = Math.exp;
const models: Record<string, Model> = {
  misra1a: (b, x) => b[0]! * (1 - E(-b[1]! * x)),
  misra1b: (b, x) => b[0]! * (1 - (1 + (b[1]! * x) / 2) ** -2),
  misra1c: (b, x) => b[0]! * (1 - (1 + 2 * b[1]! * x) ** -0.5),
  misra1d: (b, x) => (b[0]! * b[1]! * x) / (1 + b[1]! * x),
  danwood: (b, x) => b[0]! * x ** b[1]!,
  boxbod: (b, x) => b[0]! * (1 - E(-b[1]! * x)),
  chwirut2: (b, x) => E(-b[0]! * x) / (b[1]! + b[2]! * x),
  kirby2: (b, x) => (b[0]! + b[1]! * x + b[2]! * x * x) / (1 + b[3]! * x + b[4]! * x * x),
  thurber: (b, x) =>
    (b[0]! + b[1]! * x + b[2]! * x ** 2 + b[3]! * x ** 3) /
    (1 + b[4]! * x + b[5]! * x ** 2 + b[6]! * x ** 3),
  rat42: (b, x) => b[0]! / (1 + E(b[1]! - b[2]! * x)),
  rat43: (b, x) => b[0]! / (1 + E(b[1]! - b[2]! * x)) ** (1 / b[3]!),
  eckerle4: (b, x) => (b[0]! / b[1]!) * E(-0.5 * ((x - b[2]!) / b[1]!) ** 2),
  mgh09: (b, x) => (b[0]! * (x * x + x * b[1]!)) / (x * x + x * b[2]! + b[3]!),
};

describe('fitLeastSquares on NIST StRD nonlinear regression', () => {
  it('parses the certified values of the fixtures', () => {
    // Source: NIST StRD Misra1a.dat and DanWood.dat, certified values (VALUES.md §6), written out.
    const misra = loadNist('misra1a');
    expect(misra.certified).toEqual([2.3894212918e2, 5.5015643181e-4]);
    expect(misra.start1).toEqual([500, 1e-4]);
    expect(misra.start2).toEqual([250, 5e-4]);
    expect(misra.certifiedRss).toBe(1.2455138894e-1);
    expect(misra.x).toHaveLength(14);
    const dan = loadNist('danwood');
    expect(dan.certified).toEqual([7.6886226176e-1, 3.8604055871]);
    expect(dan.x).toHaveLength(6);
  });

  // Source: NIST StRD certified parameters, certified SDs and certified RSS (11 significant
  // digits) for each dataset, read from the fixture's comment line. The issue asks for ≥ 4
  // significant digits from both published starts; we require 6 on parameters (log relative
  // error, McCullough 1998, common practice), 9 on the RSS and 6 on the certified standard
  // deviations (which check the covariance s²(JᵀJ)⁻¹).
  // Kirby2: VALUES.md §6 warns SciPy reaches only ~5 digits there; we reach 8.
  const cases = Object.keys(models).filter((name) => name !== 'boxbod');
  for (const name of cases) {
    for (const which of ['start1', 'start2'] as const) {
      it(`${name} from ${which} reproduces the certified values`, () => {
        const d = loadNist(name);
        const fit = fitLeastSquares({ model: models[name]!, x: d.x, y: d.y, start: d[which] });
        expect(fit.converged, fit.reason).toBe(true);
        fit.params.forEach((p, j) =>
          expect(lre(p, d.certified[j]!), `b${j + 1} = ${p}`).toBeGreaterThanOrEqual(6),
        );
        expect(lre(fit.rss, d.certifiedRss)).toBeGreaterThanOrEqual(9);
        expect(fit.covariance).not.toBeNull();
        fit.covariance!.forEach((row, j) =>
          expect(lre(Math.sqrt(row[j]!), d.certifiedSd[j]!)).toBeGreaterThanOrEqual(6),
        );
        // Source: NIST StRD residual degrees of freedom (n − p) printed with each dataset.
        expect(fit.dof).toBe(d.x.length - d.certified.length);
      });
    }
  }

  it('BoxBOD from start 1 reports non-convergence instead of a wrong fit', () => {
    // Source: VALUES.md §6 — from NIST start 1 (b1 = 1, b2 = 1) LM stalls near b = (172.5, ~111),
    // RSS ≈ 9771.5 (SciPy least_squares 'lm'), a flat region where exp(−b2·x) ≈ 0. Certified RSS is
    // 1168.0088766 (NIST StRD BoxBOD.dat).
    const d = loadNist('boxbod');
    const fit = fitLeastSquares({ model: models.boxbod!, x: d.x, y: d.y, start: d.start1 });
    expect(fit.converged).toBe(false);
    expect(fit.reason).toMatch(/plateau/);
    expect(fit.flat).toEqual([false, true]);
    expect(fit.params[0]).toBeCloseTo(172.5, 6);
    expect(fit.params[1]).toBeGreaterThan(50);
    expect(fit.rss).toBeCloseTo(9771.5, 6);
    // Independently of the plateau probe, the stationarity test fails too: the residual still has
    // a component in the tangent plane of the model thousands of times the 1e-5 tolerance.
    expect(fit.relativeOffset).toBeGreaterThan(1e-2);
  });

  it('BoxBOD started at the stall point reported by SciPy is not taken for a fit', () => {
    // Source: VALUES.md §6, stall point b = (172.5, 110.95) of SciPy least_squares(method='lm').
    const d = loadNist('boxbod');
    const fit = fitLeastSquares({ model: models.boxbod!, x: d.x, y: d.y, start: [172.5, 110.95] });
    expect(fit.converged).toBe(false);
    expect(fit.flat[1]).toBe(true);
  });

  it('BoxBOD from start 2 converges to the certified values', () => {
    // Source: NIST StRD BoxBOD.dat certified values.
    const d = loadNist('boxbod');
    const fit = fitLeastSquares({ model: models.boxbod!, x: d.x, y: d.y, start: d.start2 });
    expect(fit.converged, fit.reason).toBe(true);
    fit.params.forEach((p, j) => expect(lre(p, d.certified[j]!)).toBeGreaterThanOrEqual(6));
    expect(lre(fit.rss, d.certifiedRss)).toBeGreaterThanOrEqual(9);
  });

  it('an analytic Jacobian gives the same certified DanWood fit', () => {
    // Source: NIST StRD DanWood.dat certified values (the certified power-law analogue).
    const d = loadNist('danwood');
    const fit = fitLeastSquares({
      model: models.danwood!,
      jacobian: (b, x) => [x ** b[1]!, b[0]! * x ** b[1]! * Math.log(x)],
      x: d.x,
      y: d.y,
      start: d.start1,
    });
    expect(fit.converged).toBe(true);
    fit.params.forEach((p, j) => expect(lre(p, d.certified[j]!)).toBeGreaterThanOrEqual(7));
  });

  it('stops at the iteration limit without claiming convergence', () => {
    const d = loadNist('misra1a');
    const fit = fitLeastSquares({
      model: models.misra1a!,
      x: d.x,
      y: d.y,
      start: d.start1,
      maxIterations: 2,
    });
    expect(fit.stop).toBe('max-iterations');
    expect(fit.converged).toBe(false);
  });

  it('holds a parameter at its bound and leaves it out of the covariance', () => {
    // DanWood with b2 capped below its certified 3.8604 (NIST StRD): the fit must stop at the cap.
    const d = loadNist('danwood');
    const fit = fitLeastSquares({
      model: models.danwood!,
      x: d.x,
      y: d.y,
      start: [1, 3],
      bounds: { upper: [Infinity, 3.5] },
    });
    expect(fit.params[1]).toBe(3.5);
    expect(fit.atBound).toEqual([false, true]);
    expect(fit.converged, fit.reason).toBe(true);
    expect(fit.covariance![1]).toEqual([0, 0]);
    expect(fit.dof).toBe(5);
    // With b2 fixed the model is linear in b1: b1 = Σ y·x^3.5 / Σ x^7 (ordinary least squares
    // through the origin, common practice).
    const sxy = d.x.reduce((s, x, i) => s + d.y[i]! * x ** 3.5, 0);
    const sxx = d.x.reduce((s, x) => s + x ** 7, 0);
    expect(fit.params[0]).toBeCloseTo(sxy / sxx, 10);
  });
});
