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
 * but a walk should not depend on that); stops after `max` finds. The path is kept as a stack of
 * containers and written out as a pointer only for a bad number: a large document must not cost
 * a string per number.
 */
export function outOfRangeNumbers(
  doc: unknown,
  maxMagnitude: number,
  max = 10,
): { pointer: string; value: number }[] {
  const found: { pointer: string; value: number }[] = [];
  const bad = (value: number): boolean => !Number.isFinite(value) || Math.abs(value) > maxMagnitude;
  if (typeof doc === 'number') {
    if (bad(doc)) found.push({ pointer: '', value: doc });
    return found;
  }
  /** A container being walked: its keys (null for an array) and the position of the next child. */
  interface Frame {
    node: unknown;
    keys: string[] | null;
    at: number;
  }
  const frame = (node: object): Frame => ({
    node,
    keys: Array.isArray(node) ? null : Object.keys(node),
    at: 0,
  });
  const pointerOf = (frames: readonly Frame[]): string =>
    frames
      .map((f) => `/${f.keys === null ? f.at - 1 : escapePointerToken(f.keys[f.at - 1] ?? '')}`)
      .join('');
  if (doc === null || typeof doc !== 'object') return found;
  const frames: Frame[] = [frame(doc)];
  while (frames.length > 0 && found.length < max) {
    const f = frames[frames.length - 1] as Frame;
    const size = f.keys === null ? (f.node as unknown[]).length : f.keys.length;
    if (f.at >= size) {
      frames.pop();
      continue;
    }
    const i = f.at++;
    const child: unknown =
      f.keys === null
        ? (f.node as unknown[])[i]
        : (f.node as Record<string, unknown>)[f.keys[i] as string];
    if (typeof child === 'number') {
      if (bad(child)) found.push({ pointer: pointerOf(frames), value: child });
    } else if (child !== null && typeof child === 'object' && !fineLeaf(child, bad))
      frames.push(frame(child));
  }
  return found;
}

/**
 * An object that holds no container and only good numbers (a curve point) needs no frame: checked
 * in place, without allocating. Anything else is walked with frames, which write the pointers.
 */
function fineLeaf(node: object, bad: (value: number) => boolean): boolean {
  if (Array.isArray(node)) return false;
  for (const key in node) {
    const value: unknown = (node as Record<string, unknown>)[key];
    if (typeof value === 'number') {
      if (bad(value)) return false;
    } else if (value !== null && typeof value === 'object') return false;
  }
  return true;
}
