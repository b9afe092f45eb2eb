/**
 * Escaping of artifact text (run, metric, slice and hyperparameter names and values) for the places
 * a report puts it: GFM inline text (table cells, list items), terminal text, and Mermaid labels.
 * Every string that came from an artifact goes through one of these before it is rendered.
 */

/** Default longest name, in characters, before it is cut with an ellipsis. */
export const DEFAULT_MAX_NAME = 80;

const ZWJ = '\u200D';

/**
 * Control and format characters that are removed: C0/C1 controls and DEL (`\p{Cc}`), format
 * characters (`\p{Cf}`: bidi embeddings, overrides and isolates U+202A–202E and U+2066–2069, marks
 * U+200E/U+200F/U+061C, zero-width characters, soft hyphen, BOM) and lone surrogates. Line and
 * paragraph separators become spaces.
 */
const REMOVED = /[\p{Cc}\p{Cf}\p{Cs}]/gu;
const BREAKS = /[\t\n\v\f\r\u0085\u2028\u2029]/g;

/**
 * Makes artifact text one plain line: controls, bidi and zero-width characters removed, runs of
 * white space (including newlines and tabs) collapsed to one space, trimmed, and cut to `maxChars`
 * code points with a trailing ellipsis.
 *
 * @example plainText('a\u202Eb\n c') === 'ab c'
 */
export function plainText(text: string, maxChars: number = DEFAULT_MAX_NAME): string {
  const cleaned = text.replace(BREAKS, ' ').replace(REMOVED, '').replace(/\s+/g, ' ').trim();
  return truncate(cleaned, maxChars);
}

/** Cuts to at most `maxChars` code points (never splits a surrogate pair), ending with `…`. */
export function truncate(text: string, maxChars: number): string {
  const points = Array.from(text);
  if (points.length <= maxChars) return text;
  return `${points
    .slice(0, Math.max(0, maxChars - 1))
    .join('')
    .trimEnd()}…`;
}

/**
 * Escapes artifact text for GFM inline content (a table cell, a list item, a sentence), after
 * `plainText`. The result cannot:
 * - break a table (`|` → `\|`) or a line (newlines are gone);
 * - open HTML or decode an entity (`&` `<` `>` become entities, so `&#8238;` stays literal);
 * - start emphasis, code, links, math or strikethrough (`\ ` * _ [ ] ~ $` are backslash-escaped);
 * - mention a user or team, or link an issue, commit range or URL: a zero-width joiner is put after
 *   `@`, `#` and `GH-` and inside `://` and `www.`, which GitHub's reference and autolink rules do
 *   not cross (custom autolink prefixes a repository configures are not covered).
 *
 * @example escapeInline('a|b @team #1') === 'a\\|b @\u200Dteam #\u200D1'
 */
export function escapeInline(text: string, maxChars: number = DEFAULT_MAX_NAME): string {
  const plain = plainText(text, maxChars);
  let out = '';
  for (const ch of plain) {
    out += escapeChar(ch);
  }
  return out
    .replace(/:\/\//g, `:${ZWJ}//`)
    .replace(/\b(www)\./gi, `$1${ZWJ}.`)
    .replace(/\b(GH)-(?=\d)/gi, `$1-${ZWJ}`);
}

function escapeChar(ch: string): string {
  switch (ch) {
    case '&':
      return '&amp;';
    case '<':
      return '&lt;';
    case '>':
      return '&gt;';
    case '@':
      return `@${ZWJ}`;
    case '#':
      return `\\#${ZWJ}`;
    default:
      return MARKDOWN_PUNCTUATION.has(ch) ? `\\${ch}` : ch;
  }
}

/** ASCII punctuation with a meaning somewhere in GFM inline syntax or at a line start. */
const MARKDOWN_PUNCTUATION = new Set(['\\', '`', '*', '_', '[', ']', '|', '~', '$']);

/**
 * A Mermaid label: only letters, digits, space and `. , - + ( ) / =` are kept (others become a
 * space), so no quote, bracket, colon, semicolon, `%%` comment, `#` entity or directive can appear;
 * cut to `maxChars`. The caller puts the result in double quotes.
 *
 * @example mermaidLabel('err"]; click x') === 'err click x'
 */
export function mermaidLabel(text: string, maxChars = 60): string {
  const kept = plainText(text, Number.MAX_SAFE_INTEGER)
    .replace(/[^\p{L}\p{N} .,\-+()/=]/gu, ' ')
    .replace(/ {2,}/g, ' ')
    .trim();
  return truncate(kept, maxChars);
}

/**
 * Artifact text for a terminal: `plainText` (which removes ESC and every other control character,
 * so no ANSI sequence or bidi override from an artifact reaches the terminal).
 */
export function terminalText(text: string, maxChars: number = DEFAULT_MAX_NAME): string {
  return plainText(text, maxChars);
}

/** A JSON-ish display of a hyperparameter value as one line of plain text (not yet escaped). */
export function displayValue(value: unknown): string {
  if (value === undefined) return '(absent)';
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) {
    return String(value);
  }
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}

/** The escaping a renderer applies to untrusted text (markdown or terminal). */
export type Escape = (text: string, maxChars?: number) => string;
