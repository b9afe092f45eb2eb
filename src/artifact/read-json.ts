/** Parses JSON text, turning a syntax error into an `InputError` that names the line and column. */
import { InputError } from '../model/errors.js';

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

export function parseJson(text: string, file: string): unknown {
  try {
    return JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const offset = errorOffset(text, message);
    const where = offset === null ? undefined : lineAndColumn(text, offset);
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
}
