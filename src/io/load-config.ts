/**
 * Reads and validates the YAML config file. Adapter (file I/O); throws `InputError`.
 * The text is untrusted: it is opened under the checks of `open-untrusted.ts`, its nesting is
 * bounded before the YAML parser sees it (deep nesting exhausts the parser's stack), and aliases
 * are bounded while it is turned into data (an alias bomb).
 */
import type { ErrorObject } from 'ajv';
import type * as Yaml from 'yaml';
import { InputError, quote, type Issue } from '../model/errors.js';
import type { HyperparameterRolesConfig } from '../model/hyperparameter-roles.js';
import { configRoleConflicts } from '../analysis/levers/resolve-knob.js';
import { ajvIssues } from '../validate/ajv-issues.js';
import {
  failOnIssues,
  numberSettingIssues,
  parseFailOn,
  type NumberSettingName,
} from '../model/settings.js';
import type { ConfigFile } from '../model/config.js';
import {
  MissingFileError,
  decodeUtf8,
  readChecked,
  type CheckedFile,
  type FileLimits,
} from './open-untrusted.js';

type ConfigValidator = { (data: unknown): data is RawConfig; errors?: ErrorObject[] | null };

/**
 * The config schema's validator, generated at build time (scripts/gen-validators.mjs). Loaded on
 * first use, like the YAML parser: a review without a config file needs neither.
 */
async function validator(): Promise<ConfigValidator> {
  return (await import('../validate/generated/config-schema.js')).default as ConfigValidator;
}

/** Deepest flow nesting (`[`, `{`) and block prefix (indentation and `- `) a config may use. */
const MAX_FLOW_DEPTH = 16;
const MAX_BLOCK_PREFIX = 64;
/** Aliases resolved at most while building the data (the yaml library's default, made explicit). */
const MAX_ALIASES = 100;

/** Where a config nests deeper than any real one, or null. Quotes and comments are skipped. */
export function yamlNestingProblem(text: string): { line: number; what: string } | null {
  const lines = text.split('\n');
  let depth = 0;
  for (let n = 0; n < lines.length; n++) {
    const line = lines[n] ?? '';
    const prefix = /^[\s-]*/.exec(line)?.[0].length ?? 0;
    if (prefix > MAX_BLOCK_PREFIX)
      return {
        line: n + 1,
        what: `indentation or "- " nesting over ${MAX_BLOCK_PREFIX} characters`,
      };
    let quoteChar = '';
    for (let i = 0; i < line.length; i++) {
      const c = line[i];
      if (quoteChar !== '') {
        if (c === quoteChar) quoteChar = '';
        continue;
      }
      if (c === '"' || c === "'") quoteChar = c;
      else if (c === '#' && (i === 0 || /\s/.test(line[i - 1] ?? ''))) break;
      else if (c === '[' || c === '{') {
        depth++;
        if (depth > MAX_FLOW_DEPTH)
          return { line: n + 1, what: `brackets nested more than ${MAX_FLOW_DEPTH} deep` };
      } else if (c === ']' || c === '}') depth = Math.max(0, depth - 1);
    }
  }
  return null;
}

function lineOf(text: string, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset && i < text.length; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
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
export async function parseConfig(text: string, file: string): Promise<ConfigFile> {
  // Imported here: a review without a config file does not load the YAML parser at all.
  const [{ parseDocument }, validate] = await Promise.all([
    import('./yaml-parser.js'),
    validator(),
  ]);
  const config = checkSettings(parseRaw(parseDocument, validate, text, file), file);
  const conflicts = roleConflictIssues(config.hyperparameters, file);
  if (conflicts.length > 0) throw new InputError(conflicts);
  return config;
}

const NUMBER_KEYS: NumberSettingName[] = ['alpha', 'min-effect', 'gap-tolerance', 'reference'];
/** Keys the settings source checks, so its messages are the same for a flag, an input and a config. */
const SETTING_KEYS = new Set<string>([...NUMBER_KEYS, 'fail-on']);

/** The settings keys, checked by `model/settings.ts`; one text of `fail-on` (`a, b`) becomes a list. */
function checkSettings(data: RawConfig, file: string): ConfigFile {
  const { 'fail-on': failOn, ...rest } = data;
  const issues: Issue[] = [];
  for (const key of NUMBER_KEYS) {
    const value: unknown = rest[key];
    if (value === undefined) continue;
    const source = { file, pointer: `/${key}` };
    if (typeof value !== 'number') {
      issues.push({ ...source, expected: 'must be a number', got: quote(value) });
    } else issues.push(...numberSettingIssues(key, value, source));
  }
  if (issues.length > 0) throw new InputError(issues);
  if (failOn === undefined) return rest as ConfigFile;
  const source = { file, pointer: '/fail-on' };
  if (typeof failOn === 'string') {
    const parsed = parseFailOn(failOn, source);
    if ('issues' in parsed) throw new InputError(parsed.issues);
    return { ...(rest as ConfigFile), 'fail-on': parsed.value };
  }
  if (!Array.isArray(failOn) || failOn.some((v) => typeof v !== 'string')) {
    throw new InputError([
      {
        ...source,
        expected: 'must be a list of outcomes, or one text with outcomes separated by commas',
        got: quote(failOn),
      },
    ]);
  }
  const failOnProblems = failOnIssues(failOn as string[], source);
  if (failOnProblems.length > 0) throw new InputError(failOnProblems);
  return { ...(rest as ConfigFile), 'fail-on': failOn as string[] };
}

/** The config before the settings keys are checked. */
type RawConfig = Record<string, unknown>;

function parseRaw(
  parseDocument: typeof Yaml.parseDocument,
  validate: ConfigValidator,
  text: string,
  file: string,
): RawConfig {
  const nesting = yamlNestingProblem(text);
  if (nesting !== null) {
    throw new InputError([
      {
        file,
        pointer: `line ${nesting.line}`,
        expected: 'must not nest deeper than a config needs',
        got: nesting.what,
      },
    ]);
  }
  // prettyErrors off: on hostile text its context building is itself slow; lines are found here.
  const document = parseDocument(text, { prettyErrors: false, uniqueKeys: true });
  if (document.errors.length > 0) {
    throw new InputError(
      document.errors.slice(0, 10).map((error) => ({
        file,
        pointer: `line ${lineOf(text, error.pos[0])}`,
        expected: 'is not valid YAML',
        got: quote(
          /call stack/i.test(error.message)
            ? 'nesting too deep'
            : (error.message.split('\n')[0] ?? ''),
        ),
      })),
    );
  }
  let data: unknown;
  try {
    data = document.toJS({ maxAliasCount: MAX_ALIASES }) ?? {};
  } catch (error) {
    throw new InputError([
      {
        file,
        pointer: '',
        expected: `must not expand aliases more than ${MAX_ALIASES} times`,
        got: quote(error instanceof Error ? error.message.split('\n')[0] : String(error)),
        hint: 'Write the values out; a config needs no anchors (&) or aliases (*).',
      },
    ]);
  }
  // The settings keys are checked in `checkSettings`; the schema describes them for editors.
  const rest =
    data !== null && typeof data === 'object' && !Array.isArray(data)
      ? Object.fromEntries(Object.entries(data).filter(([key]) => !SETTING_KEYS.has(key)))
      : data;
  if (!validate(rest)) {
    throw new InputError(
      ajvIssues(validate.errors ?? [], file, rest).map((issue) => ({
        ...issue,
        hint:
          issue.hint?.replace(
            'schema/fitgap-run-1.schema.json',
            'schema/fitgap-config.schema.json',
          ) ?? 'See schema/fitgap-config.schema.json.',
      })),
    );
  }
  return data as RawConfig;
}

export interface LoadedConfig {
  config: ConfigFile;
  text: string;
  checked: Pick<CheckedFile, 'realPath' | 'id'>;
}

/** Reads a config file; `required` false means a missing file is an empty config. */
export async function loadConfig(
  path: string,
  file: string,
  required: boolean,
  limits: FileLimits,
): Promise<LoadedConfig | null> {
  let read: Awaited<ReturnType<typeof readChecked>>;
  try {
    read = await readChecked({
      path,
      file,
      what: 'a config file (YAML)',
      limit: 'configBytes',
      limits,
    });
  } catch (error) {
    if (!(error instanceof MissingFileError)) throw error;
    if (!required) return null;
    throw new InputError(
      error.issues.map((i): Issue => ({ ...i, hint: 'Check the config path.' })),
    );
  }
  const text = decodeUtf8(read.bytes, file, 'a config file');
  return {
    config: await parseConfig(text, file),
    text,
    checked: { realPath: read.file.realPath, id: read.file.id },
  };
}
