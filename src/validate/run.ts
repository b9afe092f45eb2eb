/**
 * Validates a parsed run artifact: the JSON Schema (a validator generated at build time by
 * scripts/gen-validators.mjs), then the checks a schema cannot express. Returns the typed run or
 * throws `InputError` with every issue found.
 */
import type { ErrorObject } from 'ajv';
import validateRunSchema from './generated/run-schema.js';
import { InputError, quote, type Issue } from '../model/errors.js';
import { ajvIssues, outOfRangeNumbers } from './ajv-issues.js';
import { guardrailIssues } from './guardrails.js';
import { MAX_MAGNITUDE, formatLimit, maxCurvePoints } from '../model/limits.js';
import { CURVE_NAMES, SPLIT_NAMES, type CurvePoint, type RunArtifact } from '../model/run.js';

function validator(): { (doc: unknown): doc is RunArtifact; errors?: ErrorObject[] | null } {
  return validateRunSchema as { (doc: unknown): doc is RunArtifact; errors?: ErrorObject[] | null };
}

/** Checks the schema cannot express. `file` names the artifact in messages. */
export function semanticIssues(run: RunArtifact, file: string): Issue[] {
  const issues: Issue[] = [];
  const proportion = run.metric.kind === 'proportion';

  const inUnit = (value: number, pointer: string): void => {
    if (proportion && (value < 0 || value > 1)) {
      issues.push({
        file,
        pointer,
        expected: 'must be within [0, 1] for a proportion metric',
        got: quote(value),
        hint: 'Write rates as fractions (0.07, not 7), or declare metric.kind "continuous".',
      });
    }
  };

  const repeats = run.splits.train.values.length;
  for (const name of SPLIT_NAMES) {
    const split = run.splits[name];
    if (split === undefined) continue;
    split.values.forEach((v, i) => inUnit(v, `/splits/${name}/values/${i}`));
    if (split.values.length !== repeats) {
      issues.push({
        file,
        pointer: `/splits/${name}/values`,
        expected: `must have one value per repeat, as many as /splits/train/values (${repeats})`,
        got: `${split.values.length} values`,
        hint: 'Position i in every split is the same trained model; give every split the same repeats.',
      });
    }
  }
  if (run.reference !== undefined) inUnit(run.reference, '/reference');

  for (const name of CURVE_NAMES) {
    const curve = run.curves?.[name];
    if (curve === undefined) continue;
    const most = maxCurvePoints(name);
    if (curve.length > most) {
      issues.push({
        file,
        pointer: `/curves/${name}`,
        expected: `must have at most ${most} points`,
        got: `${curve.length} points`,
        hint: 'Log the curve less often, or keep every n-th point before writing the artifact.',
      });
      continue;
    }
    // A plain loop, and a pointer written only for a point with a problem: a curve may hold a
    // million points.
    const pointer = (i: number): string => `/curves/${name}/${i}`;
    for (let i = 0; i < curve.length; i++) {
      const point = curve[i] as CurvePoint;
      if (proportion && (point.validation < 0 || point.validation > 1))
        inUnit(point.validation, `${pointer(i)}/validation`);
      if (proportion && point.train !== undefined && (point.train < 0 || point.train > 1))
        inUnit(point.train, `${pointer(i)}/train`);
      if (name === 'regularization' && point.x <= 0) {
        issues.push({
          file,
          pointer: `${pointer(i)}/x`,
          expected: 'must be > 0 (the regularization curve is read on a log axis)',
          got: quote(point.x),
          hint: 'Leave out the unregularized point or give it a tiny positive strength.',
        });
      }
      if (name === 'training_examples' && point.x <= 0) {
        issues.push({
          file,
          pointer: `${pointer(i)}/x`,
          expected: 'must be > 0 (a count of training examples)',
          got: quote(point.x),
        });
      }
      const previous = curve[i - 1];
      if (previous !== undefined && !(point.x > previous.x)) {
        issues.push({
          file,
          pointer: `${pointer(i)}/x`,
          expected: `must be greater than the previous point's x (${previous.x}); curve x must strictly increase`,
          got: quote(point.x),
          hint: 'Sort the points by x and drop duplicates.',
        });
      }
    }
  }

  run.slices?.forEach((slice, i) => {
    inUnit(slice.validation, `/slices/${i}/validation`);
    if (slice.train !== undefined) inUnit(slice.train, `/slices/${i}/train`);
  });
  const names = new Map<string, number>();
  run.slices?.forEach((slice, i) => {
    const first = names.get(slice.name);
    if (first !== undefined) {
      issues.push({
        file,
        pointer: `/slices/${i}/name`,
        expected: `must be unique (also at /slices/${first}/name)`,
        got: quote(slice.name),
      });
    } else names.set(slice.name, i);
  });

  if (run.predictions !== undefined) {
    const p = run.predictions.path;
    if (p.startsWith('/') || /^[A-Za-z]:[\\/]/.test(p) || p.split(/[\\/]/).includes('..')) {
      issues.push({
        file,
        pointer: '/predictions/path',
        expected: "must be a relative path inside the artifact's folder",
        got: quote(p),
        hint: 'Put the CSV next to the artifact and name it without "..", a leading "/" or a drive.',
      });
    }
  }
  issues.push(...guardrailIssues(run, file));
  return issues;
}

/** Validate a parsed JSON document as a `fitgap-run/1` artifact. */
export function validateRun(doc: unknown, file: string): RunArtifact {
  const numbers = outOfRangeNumbers(doc, MAX_MAGNITUDE);
  if (numbers.length > 0) {
    throw new InputError(
      numbers.map(({ pointer, value }) =>
        Number.isFinite(value)
          ? {
              file,
              pointer,
              expected: `must be within ±${formatLimit(MAX_MAGNITUDE)}`,
              got: quote(value),
              hint: pointer.startsWith('/hyperparameters/')
                ? 'Write large identifiers (seeds, hashes) as strings.'
                : 'Rescale the metric (thousands instead of units); larger values overflow in the statistics.',
            }
          : {
              file,
              pointer,
              expected: 'must be a finite number',
              got: 'a number too large to represent (Infinity)',
              hint: 'Write the measured value; JSON numbers such as 1e999 overflow.',
            },
      ),
    );
  }
  const validate = validator();
  if (!validate(doc)) {
    throw new InputError(ajvIssues(validate.errors ?? [], file, doc));
  }
  const issues = semanticIssues(doc, file);
  if (issues.length > 0) throw new InputError(issues);
  return doc;
}
