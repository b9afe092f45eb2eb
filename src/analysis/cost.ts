/**
 * Cost of the candidate relative to the baseline: ratio per field, with a Welch-on-logs interval
 * where both runs give per-repeat values (src/stats/ratio.ts). Pure.
 */
import type { CostChange, CostReview } from '../model/guardrails.js';
import { COST_FIELDS, type Cost, type RunArtifact } from '../model/run.js';
import { logRatio } from '../stats/index.js';

const asList = (value: Cost[keyof Cost]): number[] | null =>
  value === undefined ? null : Array.isArray(value) ? value : [value];

export function reviewCost(
  baseline: RunArtifact,
  candidate: RunArtifact,
  alpha: number,
): CostReview {
  const out: CostReview = {};
  for (const field of COST_FIELDS) {
    const b = asList(baseline.cost?.[field]);
    const c = asList(candidate.cost?.[field]);
    if (b === null || c === null) continue;
    const r = logRatio(b, c, alpha);
    const geometric = (values: number[]): number =>
      values.length === 1
        ? (values[0] as number)
        : Math.exp(values.reduce((s, v) => s + Math.log(v), 0) / values.length);
    // parameters and memoryMb are single figures, exact as given: any change is a change. A timing
    // measured once per run has unknown noise.
    const single = !Array.isArray(candidate.cost?.[field]);
    let call: CostChange['call'];
    if (r.p !== null) call = r.p < alpha ? (r.ratio > 1 ? 'up' : 'down') : 'flat';
    else if (single) call = r.ratio > 1 ? 'up' : r.ratio < 1 ? 'down' : 'flat';
    else call = 'undetermined';
    out[field] = {
      baseline: geometric(b),
      candidate: geometric(c),
      ratio: r.ratio,
      ci: r.ci,
      p: r.p,
      call,
    };
  }
  return out;
}
