/** Checks on `guardrails` and `cost` that the JSON Schema cannot express. Pure. */
import { quote, type Issue } from '../model/errors.js';
import type { RunArtifact } from '../model/run.js';

export function guardrailIssues(run: RunArtifact, file: string): Issue[] {
  const issues: Issue[] = [];
  const names = new Map<string, number>();
  run.guardrails?.forEach((guardrail, g) => {
    const at = `/guardrails/${g}`;
    const first = names.get(guardrail.metric.name);
    if (first !== undefined) {
      issues.push({
        file,
        pointer: `${at}/metric/name`,
        expected: `must be unique among the guardrails (also at /guardrails/${first}/metric/name)`,
        got: quote(guardrail.metric.name),
      });
    } else names.set(guardrail.metric.name, g);
    if (guardrail.metric.name === run.metric.name) {
      issues.push({
        file,
        pointer: `${at}/metric/name`,
        expected: 'must differ from the primary metric',
        got: quote(guardrail.metric.name),
        hint: 'The primary metric is reviewed already; a guardrail is another metric.',
      });
    }
    for (const [split, values] of Object.entries(guardrail.splits)) {
      values.values.forEach((v, i) => {
        if (guardrail.metric.kind === 'proportion' && (v < 0 || v > 1)) {
          issues.push({
            file,
            pointer: `${at}/splits/${split}/values/${i}`,
            expected: 'must be within [0, 1] for a proportion metric',
            got: quote(v),
            hint: 'Write rates as fractions (0.07, not 7), or declare metric.kind "continuous".',
          });
        }
      });
    }
  });
  return issues;
}
