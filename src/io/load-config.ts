/**
 * Reads and validates the YAML config file. Adapter (file I/O); throws `InputError`.
 */
import { readFile } from 'node:fs/promises';
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import { parseDocument } from 'yaml';
import schema from '../../schema/fitgap-config.schema.json' with { type: 'json' };
import { InputError, quote, type Issue } from '../model/errors.js';
import type { HyperparameterRolesConfig } from '../model/hyperparameter-roles.js';
import { configRoleConflicts } from '../analysis/levers/resolve-knob.js';
import { ajvIssues } from '../validate/ajv-issues.js';
import { FAIL_ON_VALUES, isFailOn } from '../model/settings.js';
import type { ConfigFile } from '../model/config.js';

let compiled: ValidateFunction<ConfigFile> | undefined;
function validator(): ValidateFunction<ConfigFile> {
  compiled ??= new Ajv2020({ allErrors: true, strict: true }).compile<ConfigFile>(schema);
  return compiled;
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

/** Config names that match the same knob (`C` and `c`): only one of them could take effect. */
function roleConflictIssues(map: HyperparameterRolesConfig | undefined, file: string): Issue[] {
  if (map === undefined) return [];
  return configRoleConflicts(map).map((group) => ({
    file,
    pointer: `/hyperparameters/${escapePointer(group[group.length - 1] ?? '')}`,
    expected: `one entry per hyperparameter name (names match up to case, '-' and '_')`,
    got: group.map(quote).join(', '),
    hint: 'Keep one of these entries.',
  }));
}

function escapePointer(key: string): string {
  return key.replace(/~/g, '~0').replace(/\//g, '~1');
}

/** Parses and validates config text. */
export function parseConfig(text: string, file: string): ConfigFile {
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
  const issues = [
    ...failOnIssues(data['fail-on'] ?? [], file, '/fail-on'),
    ...roleConflictIssues(data.hyperparameters, file),
  ];
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
  return { config: parseConfig(text, file), text };
}
