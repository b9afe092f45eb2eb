/**
 * Reads and validates the YAML config file. Adapter (file I/O); throws `InputError`.
 */
import { readFile } from 'node:fs/promises';
import type { ErrorObject } from 'ajv';
import validateConfigSchema from '../artifact/generated/config-schema.js';
import { InputError, quote, type Issue } from '../errors.js';
import { ajvIssues } from '../artifact/ajv-issues.js';
import { FAIL_ON_VALUES, isFailOn } from './policy.js';
import type { ConfigFile } from './types.js';

/** The config schema's validator, generated at build time (scripts/gen-validators.mjs). */
function validator(): { (data: unknown): data is ConfigFile; errors?: ErrorObject[] | null } {
  return validateConfigSchema as {
    (data: unknown): data is ConfigFile;
    errors?: ErrorObject[] | null;
  };
}

/** Checks a list of `fail-on` names; `where` names the file or flag in messages. */
export function failOnIssues(values: readonly string[], file: string, pointer: string): Issue[] {
  return values.flatMap((value, i) =>
    isFailOn(value)
      ? []
      : [
          {
            file,
            pointer: pointer === '' ? '' : `${pointer}/${i}`,
            expected: `must be one of ${FAIL_ON_VALUES.join(', ')}`,
            got: quote(value),
          },
        ],
  );
}

/** Parses and validates config text. */
export async function parseConfig(text: string, file: string): Promise<ConfigFile> {
  // Imported here: a review without a config file does not load the YAML parser at all.
  const { parseDocument } = await import('yaml');
  const document = parseDocument(text, { prettyErrors: true });
  if (document.errors.length > 0) {
    throw new InputError(
      document.errors.slice(0, 10).map((error) => ({
        file,
        pointer: error.linePos?.[0] ? `line ${error.linePos[0].line}` : '',
        expected: 'is not valid YAML',
        got: quote(error.message.split('\n')[0] ?? ''),
      })),
    );
  }
  const data: unknown = document.toJS() ?? {};
  const validate = validator();
  if (!validate(data)) {
    throw new InputError(
      ajvIssues(validate.errors ?? [], file, data).map((issue) => ({
        ...issue,
        hint:
          issue.hint?.replace(
            'schema/fitgap-run-1.schema.json',
            'schema/fitgap-config.schema.json',
          ) ?? 'See schema/fitgap-config.schema.json.',
      })),
    );
  }
  const issues = failOnIssues(data['fail-on'] ?? [], file, '/fail-on');
  if (issues.length > 0) throw new InputError(issues);
  return data;
}

/** Reads a config file; `required` false means a missing file is an empty config. */
export async function loadConfig(
  path: string,
  file: string,
  required: boolean,
): Promise<{ config: ConfigFile; text: string } | null> {
  let text: string;
  try {
    text = await readFile(path, 'utf8');
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (!required && code === 'ENOENT') return null;
    throw new InputError([
      {
        file,
        pointer: '',
        expected: 'could not be read',
        got: code ?? String(error),
        hint: 'Check the --config path.',
      },
    ]);
  }
  return { config: await parseConfig(text, file), text };
}
