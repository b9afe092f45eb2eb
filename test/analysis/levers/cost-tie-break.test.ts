/**
 * Cost decides only between levers the evidence ranks alike (issue: guardrails and cost): the one
 * that trains for less comes first and says so; a higher score always wins over a lower cost.
 * The cost class of each lever is common practice (fewer features, a smaller model and earlier
 * stopping train for less; more data, a bigger model and more epochs train for more).
 */
import { describe, expect, it } from 'vitest';
import { cheaperFirst, markCheaperTies } from '../../../src/analysis/levers/cost-tie-break.js';
import { resolveLevers } from '../../../src/analysis/levers/resolve.js';
import type { Lever, LeverId } from '../../../src/model/review.js';

const lever = (id: LeverId, score: number): Lever => ({
  id,
  score,
  evidence: [{ kind: 'diagnosis', component: 'variance', value: 0.02, errorLevel: 0.09 }],
});

describe('cost as the tie-break between levers', () => {
  it('puts the cheaper of two equally ranked levers first and names the other', () => {
    const ranked = markCheaperTies(
      resolveLevers([lever('more-data', 3), lever('fewer-features', 3)], new Set(), cheaperFirst),
    );
    expect(ranked.map((l) => l.id)).toEqual(['fewer-features', 'more-data']);
    expect(ranked[0]?.evidence.at(-1)).toEqual({
      kind: 'cheaper-than',
      over: 'more-data',
      training: 'less',
    });
    expect(ranked[1]?.evidence.some((e) => e.kind === 'cheaper-than')).toBe(false);
  });

  it('never lets cost beat a higher score, and says nothing when costs are alike', () => {
    const ranked = markCheaperTies(
      resolveLevers(
        [lever('fewer-features', 2), lever('more-data', 3), lever('smaller-model', 2)],
        new Set(),
        cheaperFirst,
      ),
    );
    expect(ranked.map((l) => l.id)).toEqual(['more-data', 'fewer-features', 'smaller-model']);
    expect(ranked.flatMap((l) => l.evidence).some((e) => e.kind === 'cheaper-than')).toBe(false);
  });

  it('a regularization lever (same cost) goes before more data (more) at the same score', () => {
    const ranked = markCheaperTies(
      resolveLevers(
        [lever('more-data', 1), lever('stronger-regularization', 1)],
        new Set(),
        cheaperFirst,
      ),
    );
    expect(ranked[0]?.id).toBe('stronger-regularization');
    expect(ranked[0]?.evidence.at(-1)).toEqual({
      kind: 'cheaper-than',
      over: 'more-data',
      training: 'same',
    });
  });
});
