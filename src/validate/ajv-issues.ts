/**
 * Turns ajv's validation errors (data, with JSON pointers) into fitgap `Issue`s with a plain
 * expectation and a fix. Shared by the run-artifact and config validators.
 */
import type { ErrorObject } from 'ajv';
import { quote, type Issue } from '../model/errors.js';

/** Value at a JSON pointer (RFC 6901), or undefined. */
export function valueAt(doc: unknown, pointer: string): unknown {
  if (pointer === '') return doc;
  let node: unknown = doc;
  for (const raw of pointer.slice(1).split('/')) {
    const key = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    if (node === null || typeof node !== 'object') return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  return node;
}

export function escapePointerToken(token: string): string {
  return token.replace(/~/g, '~0').replace(/\//g, '~1');
}

function typeName(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  if (typeof value === 'object') return 'an object';
  return `${typeof value} ${quote(value)}`;
}

function oneIssue(error: ErrorObject, file: string, doc: unknown): Issue {
  const pointer = error.instancePath;
  const value = valueAt(doc, pointer);
  const params = error.params as Record<string, unknown>;
  switch (error.keyword) {
    case 'required':
      return {
        file,
        pointer: pointer === '' ? '/' : pointer,
        expected: `must have the key "${String(params['missingProperty'])}"`,
        hint: 'Add it; see schema/fitgap-run-1.schema.json for the format.',
      };
    case 'additionalProperties': {
      const key = String(params['additionalProperty']);
      return {
        file,
        pointer: `${pointer}/${escapePointerToken(key)}`,
        expected: 'is not a known key',
        hint: 'Check the spelling; unknown keys are rejected so that a typo cannot pass silently.',
      };
    }
    case 'type':
      return {
        file,
        pointer,
        expected: `must be ${String(params['type']) === 'integer' ? 'an integer' : `of type ${String(params['type'])}`}`,
        got: typeName(value),
        ...(params['type'] === 'number' && typeof value === 'string'
          ? { hint: 'Write numbers without quotes.' }
          : {}),
      };
    case 'enum':
      return {
        file,
        pointer,
        expected: `must be one of ${(params['allowedValues'] as unknown[]).map((v) => quote(v)).join(', ')}`,
        got: quote(value),
      };
    case 'const':
      return {
        file,
        pointer,
        expected: `must be ${quote(params['allowedValue'])}`,
        got: quote(value),
      };
    case 'format':
      return {
        file,
        pointer,
        expected: `must be a ${String(params['format'])} string`,
        got: quote(value),
        ...(params['format'] === 'date-time'
          ? { hint: 'Use RFC 3339, e.g. "2026-11-30T10:00:00Z".' }
          : {}),
      };
    default:
      return {
        file,
        pointer,
        expected: error.message ?? `fails ${error.keyword}`,
        got: quote(value),
      };
  }
}

/** Issues for ajv errors, most specific first, without duplicates. */
export function ajvIssues(errors: readonly ErrorObject[], file: string, doc: unknown): Issue[] {
  const seen = new Set<string>();
  const issues: Issue[] = [];
  for (const error of errors) {
    const issue = oneIssue(error, file, doc);
    const key = `${issue.pointer}|${issue.expected}`;
    if (seen.has(key)) continue;
    seen.add(key);
    issues.push(issue);
  }
  return issues;
}

/**
 * Numbers of a document that fitgap cannot compute with: not finite (JSON `1e999` parses to
 * Infinity) or beyond ±`maxMagnitude`. Walks without recursion (the depth is bounded by the parser,
 * but a walk should not depend on that); stops after `max` finds.
 */
export function outOfRangeNumbers(
  doc: unknown,
  maxMagnitude: number,
  max = 10,
): { pointer: string; value: number }[] {
  const found: { pointer: string; value: number }[] = [];
  const stack: [unknown, string][] = [[doc, '']];
  while (stack.length > 0 && found.length < max) {
    const [node, pointer] = stack.pop() as [unknown, string];
    if (typeof node === 'number') {
      if (!Number.isFinite(node) || Math.abs(node) > maxMagnitude)
        found.push({ pointer, value: node });
    } else if (Array.isArray(node)) {
      for (let i = node.length - 1; i >= 0; i--) stack.push([node[i], `${pointer}/${i}`]);
    } else if (node !== null && typeof node === 'object') {
      const entries = Object.entries(node);
      for (let i = entries.length - 1; i >= 0; i--) {
        const [k, v] = entries[i] as [string, unknown];
        stack.push([v, `${pointer}/${escapePointerToken(k)}`]);
      }
    }
  }
  return found;
}
