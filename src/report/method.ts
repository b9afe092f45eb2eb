/**
 * The method parts of a review as lists of lines: settings and tests, reference levels, the
 * review's notes, curve evidence and provenance. Artifact text goes through the renderer's `esc`.
 */
import type { CurveSkipped } from '../model/curves.js';
import type { Delta, Review, RunSummary } from '../model/review.js';
import type { TestName } from '../stats/types.js';
import type { Escape } from './escape.js';
import {
  amount,
  count,
  fixed,
  numberFormatFor,
  short,
  value,
  valueRange,
  type NumberFormat,
} from './format.js';
import { reviewNotes } from './notes.js';
import type { Table } from './tables.js';
import { REFERENCE_SOURCE, SPLIT_WORD, TEST_WHY, levelPercent, say } from './words.js';

export interface ProvenanceFile {
  label: string;
  path: string;
  sha256: string;
}

export function methodNotes(review: Review, esc: Escape): string[] {
  const f = numberFormatFor(review);
  const s = review.settings;
  const lines: string[] = [
    `alpha = ${short(s.alpha)}: a change counts as up or down only when it is significant at this level and at least min-effect in size; intervals are ${levelPercent(review)}%.`,
    `min-effect = ${amount(s.minEffect, f)}: smaller changes are called flat however significant.`,
    `gap tolerance = ${short(s.gapTolerance)}: a component is present when it is at least this share of the run's validation error level (and at least min-effect, and significantly above 0 where its noise is known).`,
    `fail-on = ${s.failOn.length === 0 ? '(empty: the gate always passes)' : s.failOn.map((p) => esc(p, 60)).join(', ')}.`,
  ];
  const uses = new Map<TestName, string[]>();
  const use = (what: string, delta: Delta | null): void => {
    if (delta === null) return;
    uses.set(delta.test, [...(uses.get(delta.test) ?? []), what]);
  };
  use('validation change', review.validation.delta);
  use('avoidable bias', review.bias.delta);
  use('variance', review.variance.delta);
  use('data mismatch', review.mismatch.delta);
  use('validation overfit', review.overfit.delta);
  for (const split of review.splits) use(`${say(SPLIT_WORD, split.split, esc)} split`, split.delta);
  for (const slice of review.slices) use('slices', slice.delta);
  for (const [test, what] of uses) {
    lines.push(`${[...new Set(what)].join(', ')}: ${say(TEST_WHY, test, esc)}`);
  }
  lines.push(
    "Noise of a split's mean over k repeats: the seed spread s² plus the evaluation set's sampling noise σ² (binomial p(1 − p)/N, or s²/N from per-example values). On fixed evaluation rows σ² is shared by every repeat and does not average out, so Var(mean) = s²/k + σ²; on rows drawn per repeat the spread holds it, so Var(mean) = s²/k, never below σ²/k (law of total variance; Bouthillier et al. 2021). Degrees of freedom: Welch–Satterthwaite. A zero spread is not zero noise; where σ² cannot be known either, the change is undetermined.",
  );
  if ((review.guardrails ?? []).some((g) => g.margin !== null)) {
    lines.push(
      `Guardrails: a guardrail is within its margin when the one-sided ${levelPercent(review)}% upper confidence bound of its worsening is below the margin, beyond it when the lower bound is above the margin, and undetermined otherwise (the confidence-interval approach to non-inferiority, ICH E9 §3.3.2 and E10; Wellek 2010). The one-sided p-values are Holm-adjusted across guardrails; the primary verdict is not adjusted by them. A margin from the config wins over the artifacts', the baseline's over the candidate's.`,
    );
  }
  if (review.cost !== undefined && Object.keys(review.cost).length > 0) {
    lines.push(
      "Cost ratios are candidate / baseline; with per-repeat values the interval comes from Welch's t-test on the logarithms (a ratio of geometric means). A single figure (parameters, memory) changes exactly as given; a timing taken once per run has unknown noise.",
    );
  }
  if (review.slices.length > 0) {
    lines.push(
      `Slice p-values are adjusted with the Holm–Bonferroni method over all ${count(review.slices.length)} slices, so a few bad slices among many are not flagged by chance.`,
    );
  }
  if (review.paired !== null) {
    const d = review.paired.discordant;
    lines.push(
      `Paired predictions: ${count(review.paired.rows)} examples scored by both runs${
        d === undefined
          ? ''
          : `; ${count(d.baselineOnly)} right only in the baseline, ${count(d.candidateOnly)} right only in the candidate`
      }.`,
    );
  }
  for (const run of ['baseline', 'candidate'] as const) {
    lines.push(referenceLine(run, review[run], f, esc));
  }
  lines.push(...reviewNotes(review, f, esc));
  return lines;
}

function referenceLine(run: string, r: RunSummary, f: NumberFormat, esc: Escape): string {
  if (r.reference === null) {
    return `${run}: no reference level, so avoidable bias is unknown; set \`reference\` in the artifact or the config.`;
  }
  return `${run}: reference level ${value(r.reference, f)} (${say(REFERENCE_SOURCE, r.referenceSource, esc)}).`;
}

function skippedText(e: CurveSkipped): string {
  return e.skipped === 'fit-failed'
    ? 'the power-law fit did not converge'
    : `needs at least ${count(e.needs)} points, has ${count(e.points)}`;
}

const SIDE_WORD = new Map([
  ['below', 'below'],
  ['above', 'above'],
  ['at', 'at'],
]);

function isSkipped(e: object): e is CurveSkipped {
  return 'skipped' in e;
}

export function curveEvidence(review: Review): string[] {
  const f = numberFormatFor(review);
  const lines: string[] = [];
  for (const run of ['baseline', 'candidate'] as const) {
    const curves = review[run].curves;
    const e = curves.epochs;
    if (e !== undefined) {
      lines.push(
        isSkipped(e)
          ? `${run}, epoch curve: not analysed (${skippedText(e)}).`
          : `${run}, epoch curve: lowest validation ${value(e.bestValidation, f)} at epoch ${short(e.bestX)}; final ${value(e.finalValidation, f)} at epoch ${short(e.finalX)}; ${e.gl === null ? 'generalization loss undefined (best validation is 0)' : `generalization loss ${fixed(e.gl, 1)}%`}${e.pq === null ? '' : `, progress quotient ${fixed(e.pq, 2)}`}${e.stoppedLate ? '; trained past the minimum' : ''}${e.stoppedEarly ? '; still improving at the end' : ''}.`,
      );
    }
    const l = curves.training_examples;
    if (l !== undefined) {
      if (isSkipped(l)) lines.push(`${run}, learning curve: not analysed (${skippedText(l)}).`);
      else {
        const projected = l.projections
          .map((p) => `${count(p.x)} examples → ${value(p.validation, f)} (${valueRange(p.ci, f)})`)
          .join('; ');
        lines.push(
          `${run}, learning curve: power-law fit R² ${fixed(l.r2, 3)}, residual sd ${amount(l.residual, f)}; projected validation: ${projected || 'none'}; train/validation gap ${l.gapTrend === 'closing' ? 'closing' : l.gapTrend === 'flat' ? 'flat' : 'unknown'}.`,
        );
      }
    }
    const g = curves.regularization;
    if (g !== undefined && isSkipped(g))
      lines.push(`${run}, regularization curve: not analysed (${skippedText(g)}).`);
    else if (g !== undefined) {
      const side = SIDE_WORD.get(g.side) ?? 'at an unknown place relative to';
      const edge =
        g.atEdge === null
          ? ''
          : `; the minimum is at the ${g.atEdge === 'low' ? 'low' : 'high'} end of the sweep, so extend it`;
      lines.push(
        `${run}, regularization curve: lowest validation ${value(g.bestValidation, f)} at strength ${short(g.bestX)}; the run's own strength is ${side} the best; suggested ${short(g.suggestedX)}${edge}.`,
      );
    }
  }
  return lines;
}

export function provenanceTables(review: Review, esc: Escape, files: ProvenanceFile[]): Table[] {
  const runs: Table = {
    header: ['Run', 'Name', 'Commit', 'Created'],
    align: ['l', 'l', 'l', 'l'],
    rows: (['baseline', 'candidate'] as const).map((run) => {
      const r = review[run];
      return [
        run,
        esc(r.name),
        r.commit === null ? 'n/a' : esc(r.commit, 64),
        r.createdAt === null ? 'n/a' : esc(r.createdAt, 40),
      ];
    }),
  };
  if (files.length === 0) return [runs];
  const fileTable: Table = {
    header: ['File', 'Path', 'sha256'],
    align: ['l', 'l', 'l'],
    rows: files.map((file) => [esc(file.label, 40), esc(file.path, 120), esc(file.sha256, 64)]),
  };
  return [runs, fileTable];
}
