/**
 * Parses JSON text strictly: a syntax error names the line and column; nesting deeper than
 * MAX_JSON_DEPTH is refused before parsing (so no later walk can exhaust the stack); a key that
 * appears twice in one object is refused (JSON.parse keeps the last one silently, hiding typos
 * and edits).
 */
import { InputError, quote, type Issue } from '../model/errors.js';
import { MAX_JSON_DEPTH } from '../model/limits.js';
import { escapePointerToken } from '../validate/ajv-issues.js';

function lineAndColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let last = -1;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      last = i;
    }
  }
  return { line, column: offset - last };
}

/** Where JSON.parse failed: its "position N", or (Node 20) the quoted context of the bad token. */
function errorOffset(text: string, message: string): number | null {
  const position = /position (\d+)/.exec(message);
  if (position?.[1] !== undefined) return Number(position[1]);
  if (/Unexpected end of JSON input/.test(message)) return text.length;
  const context =
    /Unexpected token '(.)', (?:\.\.\.)?"([\s\S]*?)"(?:\.\.\.)? is not valid JSON/.exec(message);
  if (context?.[1] !== undefined && context[2] !== undefined) {
    const at = text.indexOf(context[2]);
    if (at >= 0) return at + Math.max(0, context[2].indexOf(context[1]));
  }
  return null;
}

interface Frame {
  object: boolean;
  /** Keys seen so far (objects). */
  keys: Set<string>;
  /** Key or index of the value being read, for pointers. */
  at: string;
  index: number;
  expectKey: boolean;
}

interface Structure {
  /** Offset where nesting first went past the limit, or -1. */
  tooDeep: number;
  duplicates: { pointer: string; key: string }[];
}

const QUOTE = 34;
const BACKSLASH = 92;

function decodeKey(raw: string): string | null {
  if (!raw.includes('\\')) return raw;
  try {
    return JSON.parse(`"${raw}"`) as string;
  } catch {
    return null; // an invalid escape: JSON.parse reports it
  }
}

/**
 * One linear pass over the text: nesting depth and duplicate keys. Tolerates invalid JSON (it only
 * looks at brackets, commas and strings); JSON.parse judges the syntax.
 */
export function scanStructure(text: string, maxDepth = MAX_JSON_DEPTH): Structure {
  const stack: Frame[] = [];
  const duplicates: Structure['duplicates'] = [];
  const pointer = () =>
    stack
      .slice(0, -1)
      .map((f) => `/${f.object ? escapePointerToken(f.at) : String(f.index)}`)
      .join('');
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === QUOTE) {
      const start = i + 1;
      i++;
      while (i < text.length && text.charCodeAt(i) !== QUOTE) {
        if (text.charCodeAt(i) === BACKSLASH) i++;
        i++;
      }
      const top = stack[stack.length - 1];
      if (top?.object === true && top.expectKey) {
        const key = decodeKey(text.slice(start, i));
        top.expectKey = false;
        if (key !== null) {
          top.at = key;
          if (top.keys.has(key) && duplicates.length < 10) {
            duplicates.push({ pointer: `${pointer()}/${escapePointerToken(key)}`, key });
          }
          top.keys.add(key);
        }
      }
      continue;
    }
    if (c === 123 /* { */ || c === 91 /* [ */) {
      if (stack.length >= maxDepth) return { tooDeep: i, duplicates };
      stack.push({ object: c === 123, keys: new Set(), at: '', index: 0, expectKey: c === 123 });
    } else if (c === 125 /* } */ || c === 93 /* ] */) {
      stack.pop();
    } else if (c === 44 /* , */) {
      const top = stack[stack.length - 1];
      if (top !== undefined) {
        if (top.object) top.expectKey = true;
        else top.index++;
      }
    }
  }
  return { tooDeep: -1, duplicates };
}

export function parseJson(text: string, file: string): unknown {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const structure = scanStructure(body);
  if (structure.tooDeep >= 0) {
    const where = lineAndColumn(body, structure.tooDeep);
    throw new InputError([
      {
        file,
        pointer: `line ${where.line}, column ${where.column}`,
        expected: `must not nest arrays and objects more than ${MAX_JSON_DEPTH} levels deep`,
        hint: 'A run artifact nests about five levels; flatten deep hyperparameter values.',
      },
    ]);
  }
  let doc: unknown;
  try {
    doc = JSON.parse(body);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const offset = errorOffset(body, message);
    const where = offset === null ? undefined : lineAndColumn(body, offset);
    throw new InputError([
      {
        file,
        pointer: where === undefined ? '' : `line ${where.line}, column ${where.column}`,
        expected: 'is not valid JSON',
        got: (message.split(',')[0] ?? message)
          .replace(/ in JSON at position \d+.*$/, '')
          .slice(0, 80),
        hint: 'Fix the syntax (a missing comma or quote is the usual cause); `fitgap validate FILE` re-checks it.',
      },
    ]);
  }
  if (structure.duplicates.length > 0) {
    throw new InputError(
      structure.duplicates.map(({ pointer, key }): Issue => ({
        file,
        pointer,
        expected: 'must appear once in its object',
        got: `the key ${quote(key)} again`,
        hint: 'JSON keeps only the last of duplicate keys; remove the one you did not mean.',
      })),
    );
  }
  return doc;
}
