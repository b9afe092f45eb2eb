import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CurvePoint } from '../../../src/model/run.js';
import * as curves from '../../../src/analysis/curves/index.js';
import { analyzeCurves, CHART_POINTS } from '../../../src/analysis/curves/index.js';
import type {
  EpochsEvidence,
  LearningCurveEvidence,
  RegularizationEvidence,
} from '../../../src/model/curves.js';
import { fixturePath } from './nist-fixtures.js';

const minimizeProportion = { kind: 'proportion', goal: 'minimize' } as const;

function asEpochs(v: unknown): EpochsEvidence {
  if (typeof v !== 'object' || v === null || 'skipped' in v) throw new Error(JSON.stringify(v));
  return v as EpochsEvidence;
}
function asLearning(v: unknown): LearningCurveEvidence {
  if (typeof v !== 'object' || v === null || 'skipped' in v) throw new Error(JSON.stringify(v));
  return v as LearningCurveEvidence;
}
function asRegularization(v: unknown): RegularizationEvidence {
  if (typeof v !== 'object' || v === null || 'skipped' in v) throw new Error(JSON.stringify(v));
  return v as RegularizationEvidence;
}

describe('analyzeCurves', () => {
  it('pins the public exports', () => {
    expect(Object.keys(curves).sort()).toEqual([
      'CHART_POINTS',
      'analyzeCurves',
      'downsampleKeeping',
      'fitLeastSquares',
      'generalizationLoss',
      'lttbIndices',
      'progressQuotient',
      'trainingProgress',
    ]);
  });

  it('returns an empty report without curves, and only the curves present', () => {
    expect(analyzeCurves(undefined, minimizeProportion)).toEqual({});
    const r = analyzeCurves(
      {
        epochs: [
          { x: 1, validation: 0.3 },
          { x: 2, validation: 0.2 },
        ],
      },
      minimizeProportion,
    );
    expect(Object.keys(r)).toEqual(['epochs']);
  });

  it('carries the curve keys of the JSON report', () => {
    const ref = JSON.parse(
      readFileSync(fixturePath('scipy-power-law-crosscheck.json'), 'utf8'),
    ) as {
      curves: Record<string, { m: number[]; e: number[] }>;
    };
    const lc = ref.curves['six-points']!;
    const r = analyzeCurves(
      {
        epochs: [0.5, 0.4, 0.35, 0.33, 0.34, 0.36].map((v, i) => ({
          x: i + 1,
          train: v - 0.1,
          validation: v,
        })),
        training_examples: lc.m.map((x, i) => ({ x, train: lc.e[i]! / 2, validation: lc.e[i]! })),
        regularization: [0.001, 0.01, 0.1, 1].map((x, i) => ({
          x,
          validation: [0.3, 0.2, 0.25, 0.4][i]!,
        })),
      },
      { ...minimizeProportion, lambda: 1 },
    );
    expect(Object.keys(asEpochs(r.epochs))).toEqual(
      expect.arrayContaining(['bestX', 'finalX', 'gl', 'stoppedLate', 'stoppedEarly']),
    );
    const learning = asLearning(r.training_examples);
    expect(Object.keys(learning)).toEqual(
      expect.arrayContaining(['a', 'b', 'c', 'r2', 'projections']),
    );
    expect(learning.projections.map((p) => Object.keys(p))).toEqual([
      ['x', 'validation', 'ci'],
      ['x', 'validation', 'ci'],
    ]);
    expect(learning.projections.map((p) => p.x)).toEqual([32000, 64000]);
    const reg = asRegularization(r.regularization);
    expect(Object.keys(reg)).toEqual(expect.arrayContaining(['bestX', 'side', 'suggestedX']));
    expect(reg.side).toBe('above');
    expect(JSON.parse(JSON.stringify(r))).toEqual(r); // JSON-safe: no Infinity/NaN/undefined here
  });

  it('reports a maximized metric back in metric units (accuracy = 1 − error)', () => {
    // Same SciPy-checked curve as power-law.test.ts, given as accuracy = 1 − error.
    const ref = JSON.parse(
      readFileSync(fixturePath('scipy-power-law-crosscheck.json'), 'utf8'),
    ) as {
      curves: Record<
        string,
        { m: number[]; e: number[]; c: number; projections: { value: number; ci: number[] }[] }
      >;
    };
    const lc = ref.curves['nine-points']!;
    const r = asLearning(
      analyzeCurves(
        { training_examples: lc.m.map((x, i) => ({ x, validation: 1 - lc.e[i]! })) },
        { kind: 'proportion', goal: 'maximize' },
      ).training_examples,
    );
    // Source: SciPy 1.17.1 curve_fit, frozen fixture (error units), mapped through 1 − e.
    expect(r.c).toBeCloseTo(lc.c, 6);
    expect(r.asymptote).toBeCloseTo(1 - lc.c, 6);
    r.projections.forEach((p, i) => {
      const want = lc.projections[i]!;
      expect(p.validation).toBeCloseTo(1 - want.value, 7);
      expect(p.ci[0]).toBeCloseTo(1 - want.ci[1]!, 6);
      expect(p.ci[1]).toBeCloseTo(1 - want.ci[0]!, 6);
    });
  });

  it('finds the accuracy peak of a maximized epoch curve as its validation minimum of error', () => {
    const acc = [0.6, 0.7, 0.8, 0.78, 0.75];
    const e = asEpochs(
      analyzeCurves(
        { epochs: acc.map((v, i) => ({ x: i + 1, validation: v })) },
        { kind: 'proportion', goal: 'maximize' },
      ).epochs,
    );
    expect(e.bestX).toBe(3);
    expect(e.bestValidation).toBe(0.8);
    // GL on error 1 − accuracy: 100·(0.25/0.2 − 1) = 25 % (Prechelt's definition, by hand).
    expect(e.gl).toBeCloseTo(25, 10);
    expect(e.stoppedLate).toBe(true);
  });

  it('property: a strictly decreasing validation loss is best at the last epoch and never stopped late', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 1e-4, max: 0.5, noNaN: true }), { minLength: 1, maxLength: 200 }),
        (drops) => {
          let v = 200;
          const points: CurvePoint[] = [{ x: 1, validation: v }];
          drops.forEach((d, i) => {
            v -= d;
            points.push({ x: i + 2, train: v / 2, validation: v });
          });
          const e = asEpochs(
            analyzeCurves({ epochs: points }, { kind: 'continuous', goal: 'minimize' }).epochs,
          );
          expect(e.bestX).toBe(points.length);
          expect(e.bestX).toBe(e.finalX);
          expect(e.stoppedLate).toBe(false);
        },
      ),
    );
  });

  it('analyses a 100,000-point epoch curve, charting ≤ 60 points with first, last and minimum', () => {
    const n = 100_000;
    const points: CurvePoint[] = Array.from({ length: n }, (_, i) => {
      const t = i + 1;
      const train = 2 / Math.sqrt(t) + 0.1;
      // U-shaped validation loss with a ripple; minimum near epoch 31,000.
      const validation = train + 0.3 + 1e-11 * (t - 31_000) ** 2 + 0.002 * Math.sin(t / 50);
      return { x: t, train, validation };
    });
    let min = 0;
    points.forEach((p, i) => {
      if (p.validation < points[min]!.validation) min = i;
    });
    const e = asEpochs(
      analyzeCurves({ epochs: points }, { kind: 'continuous', goal: 'minimize' }).epochs,
    );
    expect(e.bestX).toBe(points[min]!.x);
    expect(e.finalX).toBe(n);
    expect(e.chart.length).toBe(CHART_POINTS);
    expect(e.chart[0]).toEqual(points[0]);
    expect(e.chart[e.chart.length - 1]).toEqual(points[n - 1]);
    expect(e.chart).toContainEqual(points[min]);
    expect(e.stoppedLate).toBe(true);
  });

  it('keeps short or degenerate curves with the reason they were not used', () => {
    const r = analyzeCurves(
      {
        epochs: [{ x: 1, validation: 0.2 }],
        training_examples: [1000, 2000, 4000].map((x) => ({ x, validation: 0.2 })),
        regularization: [{ x: 0.1, validation: 0.2 }],
      },
      minimizeProportion,
    );
    expect(r).toEqual({
      epochs: { skipped: 'too-few-points', points: 1, needs: 2 },
      training_examples: { skipped: 'too-few-points', points: 3, needs: 4 },
      regularization: { skipped: 'too-few-points', points: 1, needs: 3 },
    });
  });
});
