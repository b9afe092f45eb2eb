/**
 * The sentences the report builds from the model's codes and numbers, with literal expected text:
 * the number formatter, lever evidence, notes, the gate, and word look-ups on untrusted codes.
 */
import { describe, expect, it } from 'vitest';
import type { Lever, Movement, Note, Review } from '../../src/model/review.js';
import { escapeInline, plainText } from '../../src/report/escape.js';
import {
  amount,
  change,
  changeInterval,
  intervalCell,
  numberFormatFor,
  pCell,
  pText,
  short,
  value,
  type NumberFormat,
} from '../../src/report/format.js';
import { gateReasonLines, gateSentence } from '../../src/report/gate.js';
import { leverText } from '../../src/report/levers.js';
import { noteSentence, unavailableNotes } from '../../src/report/notes.js';
import { MOVEMENT_TITLE, say } from '../../src/report/words.js';
import { bakeryReview } from '../fixtures/report/bakery.js';
import { deliveryReview } from '../fixtures/report/delivery.js';
import { minimalReview } from '../fixtures/report/minimal.js';
import { shortfall } from '../fixtures/report/build.js';

const proportion: NumberFormat = { kind: 'proportion', decimals: 3 };
const continuous: NumberFormat = { kind: 'continuous', decimals: 3 };

describe('one number formatter', () => {
  it('writes a proportion in percent and its changes in percentage points', () => {
    expect(value(0.089, proportion)).toBe('8.9%');
    expect(change(-0.008, proportion)).toBe('−0.8 pts');
    expect(change(0.0123, proportion)).toBe('+1.2 pts');
    expect(amount(-0.008, proportion)).toBe('0.8 pts');
    expect(changeInterval([-0.012, 0.004], proportion)).toBe('[−1.2, +0.4] pts');
    expect(intervalCell([-0.012, 0.004], proportion)).toBe('[−1.2, +0.4]');
  });

  it('writes a continuous metric in its own units with the same decimals everywhere', () => {
    expect(value(6.05, continuous)).toBe('6.050');
    expect(change(0.33, continuous)).toBe('+0.330');
    expect(change(-0.0001, continuous)).toBe('0.000');
    expect(value(-2.5, continuous)).toBe('−2.500');
  });

  it('chooses decimals for four significant digits of the largest split mean', () => {
    expect(numberFormatFor(bakeryReview())).toEqual({ kind: 'continuous', decimals: 3 });
    expect(numberFormatFor(deliveryReview())).toEqual({ kind: 'proportion', decimals: 4 });
  });

  it('writes p-values one way in cells and in sentences', () => {
    expect([pCell(0.0004), pCell(0.0312), pCell(null)]).toEqual(['< 0.001', '0.031', 'n/a']);
    expect([pText(0.0004), pText(0.0312), pText(null)]).toEqual([
      'p < 0.001',
      'p = 0.031',
      'p n/a',
    ]);
    expect(short(-0.00001)).toBe('−1.00e−5');
  });
});

describe('lever sentences', () => {
  const review = bakeryReview();
  const f = numberFormatFor(review);
  const text = (lever: Lever): string[] => leverText(lever, review, f, escapeInline).sentences;

  it('says why the cheaper of two equally ranked levers comes first', () => {
    expect(
      text({
        id: 'fewer-features',
        score: 3,
        evidence: [{ kind: 'cheaper-than', over: 'more-data', training: 'less' }],
      }),
    ).toEqual(['Ranked alike with add training data; first because it trains for less.']);
  });

  it('reverses an own change that overshot, with a value between old and new', () => {
    expect(
      text({
        id: 'weaker-regularization',
        score: 100,
        suggestion: { hyperparameter: 'lambda', value: 0.55, basis: 'between-old-and-new' },
        evidence: [
          {
            kind: 'pr-change',
            hyperparameter: 'lambda',
            from: 0.1,
            to: 3,
            direction: 'raised',
            role: 'regularization',
            effect: 'more-regularization',
          },
          {
            kind: 'component-change',
            component: 'bias',
            delta: shortfall(0.0167, [0.0135, 0.0198], 0.0001, 'welch-t', 'up'),
          },
        ],
      }),
    ).toEqual([
      'This PR raised lambda 0.1 → 3: stronger regularization.',
      'Avoidable bias rose (+0.017, p < 0.001): the model moved toward underfitting.',
      'Try lambda ≈ 0.55, between the old and new values.',
    ]);
  });

  it('names an inverse knob by its effect, "no limit" and total units', () => {
    expect(
      text({
        id: 'weaker-regularization',
        score: 100,
        suggestion: { hyperparameter: 'C', value: 0.032, basis: 'between-old-and-new' },
        evidence: [
          {
            kind: 'pr-change',
            hyperparameter: 'C',
            from: 1,
            to: 0.001,
            direction: 'lowered',
            role: 'regularization',
            effect: 'more-regularization',
          },
        ],
      }),
    ).toEqual([
      'This PR lowered C 1 → 0.001: stronger regularization.',
      'Try C ≈ 0.032, between the old and new values.',
    ]);
    expect(
      text({
        id: 'smaller-model',
        score: 90,
        suggestion: { hyperparameter: 'max_depth', value: 16, basis: 'finite-limit' },
        evidence: [
          {
            kind: 'pr-change',
            hyperparameter: 'max_depth',
            from: 8,
            to: null,
            direction: 'raised',
            role: 'capacity',
            effect: 'more-capacity',
          },
        ],
      }),
    ).toEqual([
      'This PR raised max\\_depth 8 → no limit: a bigger model.',
      'Try max\\_depth ≈ 16, a finite limit instead of none.',
    ]);
    expect(
      text({
        id: 'smaller-model',
        score: 90,
        suggestion: {
          hyperparameter: 'hidden_layer_sizes',
          value: 560,
          basis: 'between-old-and-new',
          totalUnits: true,
        },
        evidence: [],
      }),
    ).toEqual([
      'Try hidden\\_layer\\_sizes ≈ 560 hidden units in total, between the old and new values.',
    ]);
  });

  it('says when more data is unlikely to help measurably', () => {
    const [sentence] = text({
      id: 'more-data',
      score: 40,
      evidence: [
        {
          kind: 'learning-curve',
          fromX: 1000,
          atX: 2000,
          current: 0.022,
          projected: 0.02,
          ci: [0.002, 0.037],
          r2: 0.9,
          includesToday: true,
        },
      ],
    });
    expect(sentence).toMatch(/^More data is unlikely to help measurably: /);
  });

  it('says what the curves say', () => {
    expect(
      text({
        id: 'early-stopping',
        score: 47,
        evidence: [
          { kind: 'epoch-minimum', epoch: 31, of: 80, saves: 0.348, gl: 5.8 },
          { kind: 'epoch-curve-silent', curve: false },
        ],
      }),
    ).toEqual([
      'Validation was best at epoch 31 of 80; stopping there saves 0.348 (generalization loss 5.8%).',
      'No epoch curve to confirm it.',
    ]);
    expect(
      text({
        id: 'weaker-regularization',
        score: 40,
        evidence: [
          {
            kind: 'sweep-minimum',
            hyperparameter: null,
            bestX: 0.0003,
            bestValidation: 6.02,
            current: 0.0001,
            suggestedX: 0.0003,
            side: 'below',
            supports: false,
            atEdge: 'low',
          },
        ],
      }),
    ).toEqual([
      "The sweep's validation minimum (λ ≈ 0.0003) lies on the other side of the candidate's strength. The minimum is at the low end of the sweep: extend it.",
    ]);
  });

  it('escapes hyperparameter names from the artifact', () => {
    const [sentence] = text({
      id: 'fewer-features',
      score: 90,
      evidence: [
        {
          kind: 'pr-change',
          hyperparameter: 'a|b @team',
          from: 1,
          to: 2,
          direction: 'raised',
          role: 'capacity',
          effect: 'more-capacity',
        },
      ],
    });
    expect(sentence).toBe('This PR raised a\\|b @\u200Dteam 1 → 2: a bigger model.');
  });
});

describe('note sentences', () => {
  const review = deliveryReview();
  const f = numberFormatFor(review);
  const say1 = (note: Note): string => noteSentence(note, review, f, escapeInline);

  it('lists slice names, escaped, and says when there were more', () => {
    expect(say1({ code: 'unpaired-slices', count: 7, names: ['Depot 9', '<b>x</b>'] })).toBe(
      '7 slices appear in one run only and were not compared: Depot 9, &lt;b&gt;x&lt;/b&gt;, ….',
    );
  });

  it('says cannot tell when the noise is unknown, whatever min-effect', () => {
    expect(say1({ code: 'noise-unknown' })).toMatch(/^Cannot tell: run-to-run noise is unknown/);
    expect(say1({ code: 'reference-from-one-run', from: 'baseline', value: 0.02 })).toBe(
      'Only the baseline states a reference (2.00%): it is used for both runs, since the reference is a property of the task.',
    );
  });

  it('names splits one way in prose', () => {
    expect(
      say1({ code: 'predictions-split-mismatch', baseline: 'train_dev', candidate: 'validation' }),
    ).toBe(
      'The predictions are for different splits (train-dev in the baseline, validation in the candidate): no paired test.',
    );
  });

  it('explains components that could not be computed', () => {
    expect(unavailableNotes(minimalReview(), plainText)).toEqual([
      'Avoidable bias: no reference level: give `reference` in the artifact or the config (human-level error, a prior system, or an estimated Bayes error).',
      'Data mismatch: needs a train-dev split (held-out data from the training distribution).',
      'Validation overfit: needs a test split.',
    ]);
  });
});

describe('gate sentences', () => {
  it('writes one line per outcome that fired', () => {
    const review: Review = {
      ...bakeryReview(),
      gate: {
        pass: false,
        reasons: [{ outcome: 'worse-validation' }, { outcome: 'slice-regression', slices: 2 }],
        failOn: ['worse-validation', 'slice-regression'],
      },
    };
    expect(gateReasonLines(review, plainText)).toEqual([
      'worse-validation: validation got significantly worse',
      'slice-regression: 2 slices regressed significantly',
    ]);
    expect(gateSentence(deliveryReview(), plainText)).toBe(
      'none of fail-on (worse-on-both) applies.',
    );
  });
});

describe('word look-ups on untrusted codes', () => {
  it('finds only real entries and escapes anything else', () => {
    for (const code of ['constructor', '__proto__', 'toString', 'hasOwnProperty']) {
      expect(say(MOVEMENT_TITLE, code as Movement, escapeInline)).toBe(code.replace(/_/g, '\\_'));
    }
    expect(say(MOVEMENT_TITLE, '<img src=x>' as Movement, escapeInline)).toBe('&lt;img src=x&gt;');
    expect(say(MOVEMENT_TITLE, 'toward-overfitting', escapeInline)).toBe('toward overfitting');
  });
});
