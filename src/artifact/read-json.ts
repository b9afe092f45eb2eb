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

interface Structure {
  /** Offset where nesting first went past the limit, or -1. */
  tooDeep: number;
  duplicates: { pointer: string; key: string }[];
}

const QUOTE = 34;
const BACKSLASH = 92;
/** Keys an object may have before its duplicate check moves from pairwise comparison to a Set. */
const FEW_KEYS = 16;

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
 *
 * Nothing is allocated per container or per key (a curve of a million points is a million
 * objects): the open containers live in typed arrays indexed by depth, and a key is kept as its
 * offsets in the text, compared in place with the other keys of its object. A key is decoded (and
 * a pointer written) only for an escaped key, an object of more than FEW_KEYS keys (checked with a
 * Set from then on) or a duplicate.
 */
export function scanStructure(text: string, maxDepth = MAX_JSON_DEPTH): Structure {
  const duplicates: Structure['duplicates'] = [];
  const n = text.length;
  // Per open container, by depth: object or array, the array index or the current key's offsets.
  const object = new Uint8Array(maxDepth);
  const expectKey = new Uint8Array(maxDepth);
  const index = new Int32Array(maxDepth);
  const keyAt = new Int32Array(maxDepth);
  /** Where the keys of the object at each depth start in `keys`. */
  const firstKey = new Int32Array(maxDepth);
  const sets: (Set<string> | null)[] = new Array<Set<string> | null>(maxDepth).fill(null);
  // Keys of the open objects, three numbers each: start and end offset of the raw text, escaped.
  let keys = new Int32Array(3 * 256);
  let keyTop = 0;
  let depth = 0;
  /** The next backslash at or after the current string (n when none): found once per backslash. */
  let backslash = -1;

  const raw = (k: number): string => text.slice(keys[k] as number, keys[k + 1] as number);
  const decoded = (k: number): string => {
    const r = raw(k);
    return keys[k + 2] === 1 ? (decodeKey(r) ?? r) : r;
  };
  const same = (a: number, b: number): boolean => {
    const start = keys[a] as number;
    const other = keys[b] as number;
    const length = (keys[a + 1] as number) - start;
    if (length === (keys[b + 1] as number) - other) {
      let c = 0;
      while (c < length && text.charCodeAt(start + c) === text.charCodeAt(other + c)) c++;
      if (c === length) return true;
    }
    // Escapes spell one key in several ways ("a" and "\u0061").
    if (keys[a + 2] === 0 && keys[b + 2] === 0) return false;
    const x = decodeKey(raw(a));
    return x !== null && x === decodeKey(raw(b));
  };
  const pointer = (): string => {
    let out = '';
    for (let d = 0; d < depth - 1; d++) {
      out += `/${object[d] === 1 ? escapePointerToken(decoded(keyAt[d] as number)) : String(index[d])}`;
    }
    return out;
  };

  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === QUOTE) {
      const start = i + 1;
      if (backslash < start) {
        backslash = text.indexOf('\\', start);
        if (backslash < 0) backslash = n;
      }
      let escaped = 0;
      const close = text.indexOf('"', start);
      if (close < 0) i = n;
      else if (backslash > close) i = close;
      else {
        // A backslash inside the string: walk it character by character (escaped quotes).
        escaped = 1;
        i = start;
        while (i < n && text.charCodeAt(i) !== QUOTE) {
          if (text.charCodeAt(i) === BACKSLASH) i++;
          i++;
        }
        backslash = i < n ? text.indexOf('\\', i) : n;
        if (backslash < 0) backslash = n;
      }
      const top = depth - 1;
      if (top >= 0 && object[top] === 1 && expectKey[top] === 1) {
        expectKey[top] = 0;
        if (escaped === 1 && decodeKey(text.slice(start, i)) === null) continue;
        if (keyTop + 3 > keys.length) {
          const grown = new Int32Array(keys.length * 2);
          grown.set(keys);
          keys = grown;
        }
        const k = keyTop;
        keys[k] = start;
        keys[k + 1] = i;
        keys[k + 2] = escaped;
        keyAt[top] = k;
        let set = sets[top] ?? null;
        const count = (k - (firstKey[top] as number)) / 3;
        if (set === null && count >= FEW_KEYS) {
          set = new Set<string>();
          for (let j = firstKey[top] as number; j < k; j += 3) set.add(decoded(j));
          sets[top] = set;
        }
        let repeated = false;
        if (set !== null) {
          const key = decoded(k);
          repeated = set.has(key);
          set.add(key);
        } else {
          for (let j = firstKey[top] as number; j < k && !repeated; j += 3) repeated = same(j, k);
        }
        keyTop = k + 3;
        if (repeated && duplicates.length < 10) {
          const key = decoded(k);
          duplicates.push({ pointer: `${pointer()}/${escapePointerToken(key)}`, key });
        }
      }
      continue;
    }
    if (c === 123 /* { */ || c === 91 /* [ */) {
      if (depth >= maxDepth) return { tooDeep: i, duplicates };
      object[depth] = c === 123 ? 1 : 0;
      expectKey[depth] = c === 123 ? 1 : 0;
      index[depth] = 0;
      firstKey[depth] = keyTop;
      depth++;
    } else if (c === 125 /* } */ || c === 93 /* ] */) {
      if (depth > 0) {
        depth--;
        keyTop = firstKey[depth] as number;
        sets[depth] = null;
      }
    } else if (c === 44 /* , */) {
      const top = depth - 1;
      if (top >= 0) {
        if (object[top] === 1) expectKey[top] = 1;
        else index[top] = (index[top] as number) + 1;
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
