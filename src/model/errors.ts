/**
 * Errors fitgap can raise. `InputError` is the user's to fix (bad file, bad flag): it is printed as
 * its message only and exits 2. Anything else is a bug and is printed with its stack.
 */

/** One problem in an input, as data; formatted only at the edge. */
export interface Issue {
  /** File the problem is in (as the user named it), or a flag such as `--alpha`. */
  file: string;
  /** JSON pointer (`/splits/validation/values/0`) or `line 7` for CSV/YAML; '' for the whole file. */
  pointer: string;
  /** What was expected, e.g. "must be a number". */
  expected: string;
  /** The offending value, already quoted for display, when there is one. */
  got?: string;
  /** How to fix it. */
  hint?: string;
}

export const EXIT = {
  /** Review done and gate passed. */
  ok: 0,
  /** Review done, gate failed. */
  gateFailed: 1,
  /** Bad input or usage. */
  badInput: 2,
} as const;

export function formatIssue(issue: Issue): string {
  const where = issue.pointer === '' ? issue.file : `${issue.file}: ${issue.pointer}`;
  let text = `${where} ${issue.expected}`;
  if (issue.got !== undefined) text += ` (got ${issue.got})`;
  text += '.';
  if (issue.hint !== undefined) text += ` ${issue.hint}`;
  return text;
}

/** Quote a value for an error message, cut to a readable length. */
export function quote(value: unknown): string {
  let text: string;
  if (typeof value === 'string') text = JSON.stringify(value);
  else if (typeof value === 'number' && !Number.isFinite(value)) text = String(value);
  else {
    try {
      text = JSON.stringify(value) ?? String(value);
    } catch {
      text = String(value);
    }
  }
  return text.length > 60 ? `${text.slice(0, 57)}...` : text;
}

/** Bad input the user can fix. Carries every issue found (at most 10 are shown). */
export class InputError extends Error {
  readonly issues: Issue[];
  constructor(issues: Issue[]) {
    const shown = issues.slice(0, 10).map(formatIssue);
    const more = issues.length > 10 ? [`…and ${issues.length - 10} more problems.`] : [];
    super([...shown, ...more].join('\n'));
    this.name = 'InputError';
    this.issues = issues;
  }
}

/** Wrong command-line usage. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}
