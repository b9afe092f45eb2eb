import { describe, expect, it } from 'vitest';
import { reviewCost } from '../../src/analysis/cost.js';
import { reviewGuardrails } from '../../src/analysis/guardrails.js';
import type { Guardrail, RunArtifact } from '../../src/model/run.js';
import { makeRun } from './make-run.js';

const base = makeRun({ train: [0.1, 0.1], validation: [0.2, 0.2] });

function withGuardrails(run: RunArtifact, guardrails: Guardrail[], cost?: RunArtifact['cost']) {
  return { ...run, guardrails, ...(cost === undefined ? {} : { cost }) };
}

const ece = (values: number[], margin?: number): Guardrail => ({
  metric: { name: 'calibration_error', goal: 'minimize', kind: 'continuous' },
  splits: { validation: { values } },
  ...(margin === undefined ? {} : { margin }),
});

const settings = { alpha: 0.05, margins: new Map<string, number>() };

describe('guardrails', () => {
  it('a clear regression beyond the margin is inferior; a small one is non-inferior', () => {
    // Welch: baseline mean 0.030, candidate 0.060 → worsening 0.030 with a tight spread.
    const b = withGuardrails(base, [ece([0.03, 0.031, 0.029], 0.01)]);
    const worse = withGuardrails(base, [ece([0.06, 0.061, 0.059])]);
    const same = withGuardrails(base, [ece([0.0301, 0.0305, 0.0298])]);
    const [inferior] = reviewGuardrails(b, worse, settings);
    expect(inferior).toMatchObject({
      nonInferiority: 'inferior',
      marginSource: 'baseline',
      change: { test: 'welch-t', call: 'worse' },
    });
    const [fine] = reviewGuardrails(b, same, settings);
    expect(fine?.nonInferiority).toBe('non-inferior');
    expect(fine?.worseningBounds?.[1]).toBeLessThan(0.01);
  });

  it('a maximized guardrail worsens when it falls', () => {
    const auc = (values: number[]): Guardrail => ({
      metric: { name: 'auc_weekend', goal: 'maximize', kind: 'continuous', best: 1 },
      splits: { validation: { values } },
      margin: 0.005,
    });
    const [g] = reviewGuardrails(
      withGuardrails(base, [auc([0.91, 0.912, 0.909])]),
      withGuardrails(base, [auc([0.88, 0.881, 0.879])]),
      settings,
    );
    expect(g?.change?.call).toBe('worse');
    expect(g?.change?.estimate).toBeLessThan(0);
    expect(g?.nonInferiority).toBe('inferior');
  });

  it('the trusted config margin wins over the artifacts; a candidate margin never loosens it', () => {
    const b = withGuardrails(base, [ece([0.03, 0.031, 0.029], 0.01)]);
    const c = withGuardrails(base, [ece([0.045, 0.046, 0.044], 0.5)]);
    const [fromBaseline] = reviewGuardrails(b, c, settings);
    expect(fromBaseline).toMatchObject({ margin: 0.01, marginSource: 'baseline' });
    expect(fromBaseline?.problems).toContain('candidate-margin-ignored');
    expect(fromBaseline?.nonInferiority).toBe('inferior');
    const [fromConfig] = reviewGuardrails(b, c, {
      alpha: 0.05,
      margins: new Map([['calibration_error', 0.05]]),
    });
    expect(fromConfig).toMatchObject({ margin: 0.05, marginSource: 'config' });
    expect(fromConfig?.nonInferiority).toBe('non-inferior');
  });

  it('no margin: reported, never called', () => {
    const [g] = reviewGuardrails(
      withGuardrails(base, [ece([0.03, 0.031])]),
      withGuardrails(base, [ece([0.06, 0.061])]),
      settings,
    );
    expect(g?.nonInferiority).toBeNull();
    expect(g?.problems).toEqual(['no-margin']);
    expect(g?.change?.call).toBe('worse');
  });

  it('one repeat of a continuous guardrail: undetermined, not a pass', () => {
    const [g] = reviewGuardrails(
      withGuardrails(base, [ece([0.03], 0.01)]),
      withGuardrails(base, [ece([0.031])]),
      settings,
    );
    expect(g?.nonInferiority).toBe('undetermined');
    expect(g?.change).toMatchObject({ test: 'none', call: 'undetermined' });
  });

  it('one repeat of a proportion with examples: binomial normal approximation', () => {
    // Source: two-proportion Wald standard error sqrt(p1q1/n1 + p2q2/n2) (Agresti, An Introduction
    // to Categorical Data Analysis, §2.2.3; VALUES.md §5).
    const rate = (value: number): Guardrail => ({
      metric: { name: 'late_rate_rural', goal: 'minimize', kind: 'proportion' },
      splits: { validation: { values: [value], examples: 4000 } },
      margin: 0.01,
    });
    const [g] = reviewGuardrails(
      withGuardrails(base, [rate(0.05)]),
      withGuardrails(base, [rate(0.051)]),
      settings,
    );
    const se = Math.sqrt((0.05 * 0.95) / 4000 + (0.051 * 0.949) / 4000);
    expect(g?.change?.test).toBe('z-binomial');
    // One-sided 95% upper bound: 0.001 + 1.644854·se (z(0.95), VALUES.md §2).
    expect(g?.worseningBounds?.[1]).toBeCloseTo(0.001 + 1.644854 * se, 6);
    expect(g?.nonInferiority).toBe('non-inferior');
  });

  it('missing on one side, or a different metric: no call, with the reason', () => {
    const [missing] = reviewGuardrails(
      base,
      withGuardrails(base, [ece([0.03, 0.04], 0.01)]),
      settings,
    );
    expect(missing?.problems).toContain('missing-in-baseline');
    expect(missing?.nonInferiority).toBeNull();
  });
});

describe('cost', () => {
  it('per-repeat seconds give a ratio with an interval; a parameter count is exact', () => {
    const b = { ...base, cost: { trainSeconds: [100, 104, 98], parameters: 1000 } };
    const c = { ...base, cost: { trainSeconds: [240, 250, 236], parameters: 1000 } };
    const { trainSeconds: seconds, parameters } = reviewCost(b, c, 0.05);
    expect(seconds).toMatchObject({ call: 'up' });
    expect(seconds?.ratio).toBeCloseTo(2.4, 1);
    expect(seconds?.ci?.[0]).toBeGreaterThan(2);
    expect(parameters).toMatchObject({ ratio: 1, ci: null, call: 'flat' });
  });

  it('a timing measured once per run is undetermined', () => {
    const b = { ...base, cost: { trainSeconds: [100] } };
    const c = { ...base, cost: { trainSeconds: [130] } };
    expect(reviewCost(b, c, 0.05).trainSeconds?.call).toBe('undetermined');
  });

  it('fields on one side only are left out', () => {
    expect(reviewCost({ ...base, cost: { memoryMb: 10 } }, base, 0.05)).toEqual({});
  });
});

describe('fail-on outcomes', () => {
  it('the review schema and the settings list name the same outcomes', async () => {
    const { FAIL_ON_VALUES } = await import('../../src/model/settings.js');
    const schema = (await import('../../schema/fitgap-review-1.schema.json', {
      with: { type: 'json' },
    })) as unknown as { default: { $defs: { failOn: { anyOf: [{ enum: string[] }] } } } };
    expect([...schema.default.$defs.failOn.anyOf[0].enum].sort()).toEqual(
      [...FAIL_ON_VALUES].sort(),
    );
  });

  it('guardrail and cost outcomes fire on the review', async () => {
    const { applyGate } = await import('../../src/analysis/gate.js');
    const { buildReview } = await import('../../src/analysis/review.js');
    const { SETTINGS } = await import('./make-run.js');
    const b = withGuardrails(base, [ece([0.03, 0.031, 0.029], 0.01)], {
      trainSeconds: [100, 102, 98],
    });
    const c = withGuardrails(base, [ece([0.06, 0.061, 0.059])], { trainSeconds: [240, 245, 238] });
    const review = buildReview({
      baseline: b,
      candidate: c,
      settings: {
        ...SETTINGS,
        failOn: ['guardrail-regression', 'train-seconds-ratio>2', 'inference-ms-ratio>1'],
      },
    });
    expect(review.gate.pass).toBe(false);
    expect(review.gate.reasons).toEqual([
      { outcome: 'guardrail-regression', guardrails: ['calibration_error'] },
      { outcome: 'train-seconds-ratio>2', ratio: review.cost?.trainSeconds?.ratio },
    ]);
    expect(applyGate(review, ['train-seconds-ratio>3']).pass).toBe(true);
  });
});
