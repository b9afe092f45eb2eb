/**
 * The prose parts of a review as lists of lines: method notes, curve evidence and provenance.
 * Artifact text goes through the renderer's `esc`.
 */
import type { Delta, Review, RunSummary } from '../model/review.js';
import type { CurveSkipped } from '../model/curves.js';
import type { CurveName } from '../model/run.js';
import type { TestName } from '../stats/types.js';
import type { Escape, Table } from './tables.js';
import { count, num, numberFormatFor, short } from './format.js';
import { SPLIT_WORD, TEST_WHY, levelPercent } from './words.js';

export interface ProvenanceFile {
  label: string;
  path: string;
  sha256: string;
}

export function methodNotes(review: Review, esc: Escape): string[] {
  const s = review.settings;
  const lines: string[] = [
    `alpha = ${short(s.alpha)}: a change counts as up or down only when it is significant at this level and at least min-effect in size; intervals are ${levelPercent(review)}%.`,
    `min-effect = ${short(s.minEffect)} (${review.metric.kind === 'proportion' ? 'proportion' : 'metric units'}): smaller changes are called flat however significant.`,
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
  for (const split of review.splits) use(`${SPLIT_WORD[split.split]} split`, split.delta);
  if (review.slices.length > 0) {
    const tests = [...new Set(review.slices.map((x) => x.delta.test))];
    for (const t of tests) uses.set(t, [...(uses.get(t) ?? []), 'slices']);
  }
  for (const [test, what] of uses) {
    lines.push(`${[...new Set(what)].join(', ')}: ${TEST_WHY[test]}`);
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
    const r = review[run];
    lines.push(referenceLine(run, r, review));
    for (const w of r.warnings) lines.push(`${run}: ${esc(w, 300)}`);
  }
  for (const n of review.notes) lines.push(esc(n, 300));
  for (const n of review.nonLevers) lines.push(esc(n, 300));
  return lines;
}

function referenceLine(run: string, r: RunSummary, review: Review): string {
  const f = numberFormatFor(review);
  if (r.reference === null) {
    return `${run}: no reference level, so avoidable bias is unknown; set \`reference\` in the artifact or the config.`;
  }
  const source = {
    artifact: 'from the artifact',
    config: 'from the config',
    default: 'the default for a minimized proportion',
    unknown: 'source unknown',
  }[r.referenceSource];
  return `${run}: reference level ${num(r.reference, f)} (${source}).`;
}

const CURVE_WORD: Record<CurveName, string> = {
  epochs: 'Epoch curve',
  training_examples: 'Learning curve',
  regularization: 'Regularization curve',
};

function skipped(e: object): e is CurveSkipped {
  return 'skipped' in e;
}

export function curveEvidence(review: Review, esc: Escape): string[] {
  const f = numberFormatFor(review);
  const lines: string[] = [];
  for (const run of ['baseline', 'candidate'] as const) {
    const curves = review[run].curves;
    const e = curves.epochs;
    if (e !== undefined) {
      lines.push(
        skipped(e)
          ? `${run}, ${CURVE_WORD.epochs}: not analysed (${esc(e.skipped, 200)}).`
          : `${run}, ${CURVE_WORD.epochs}: lowest validation ${num(e.bestValidation, f)} at epoch ${short(e.bestX)}; final ${num(e.finalValidation, f)} at epoch ${short(e.finalX)}; ${e.gl === null ? 'generalization loss undefined (best validation is 0)' : `generalization loss ${e.gl.toFixed(1)}%`}${e.pq === null ? '' : `, progress quotient ${e.pq.toFixed(2)}`}${e.stoppedLate ? '; trained past the minimum' : ''}${e.stoppedEarly ? '; still improving at the end' : ''}.`,
      );
    }
    const l = curves.training_examples;
    if (l !== undefined) {
      const lp = skipped(l)
        ? ''
        : l.projections
            .map(
              (p) =>
                `${short(p.x)} examples → ${num(p.validation, f)} [${num(p.ci[0], f)}, ${num(p.ci[1], f)}]`,
            )
            .join('; ');
      lines.push(
        skipped(l)
          ? `${run}, ${CURVE_WORD.training_examples}: not analysed (${esc(l.skipped, 200)}).`
          : `${run}, ${CURVE_WORD.training_examples}: power-law fit R² ${l.r2.toFixed(3)}, residual sd ${num(l.residual, f)}; projected validation: ${lp || 'none'}; train/validation gap ${l.gapTrend}.`,
      );
    }
    const g = curves.regularization;
    if (g !== undefined) {
      lines.push(
        skipped(g)
          ? `${run}, ${CURVE_WORD.regularization}: not analysed (${esc(g.skipped, 200)}).`
          : `${run}, ${CURVE_WORD.regularization}: lowest validation ${num(g.bestValidation, f)} at strength ${short(g.bestX)}; the run's own strength is ${g.side === 'at' ? 'at' : g.side === 'unknown' ? 'at an unknown place relative to' : g.side} the best; suggested ${short(g.suggestedX)}${g.atEdge === null ? '' : `; the minimum is at the ${g.atEdge} end of the sweep, so extend it`}.`,
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
