/** Parses JSON text, turning a syntax error into an `InputError` that names the line and column. */
import { InputError } from '../errors.js';

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

export function parseJson(text: string, file: string): unknown {
  try {
    return JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const position = /position (\d+)/.exec(message);
    const where =
      position?.[1] !== undefined ? lineAndColumn(text, Number(position[1])) : undefined;
    throw new InputError([
      {
        file,
        pointer: where === undefined ? '' : `line ${where.line}, column ${where.column}`,
        expected: 'is not valid JSON',
        got: message.replace(/ in JSON at position \d+.*$/, '').slice(0, 80),
        hint: 'Fix the syntax (a missing comma or quote is the usual cause); `fitgap validate FILE` re-checks it.',
      },
    ]);
  }
}
