/**
 * Validates the fake server's responses against GitHub's published OpenAPI description
 * (`@octokit/openapi`, api.github.com, OpenAPI 3.0.3), so the fake cannot drift from the real API.
 * The part the fake uses is read from `api-subset.json` (120 KB, kept current by a test); an
 * operation outside it loads the full 13 MB description, slowly but correctly.
 *
 * OpenAPI 3.0 schemas are not quite JSON Schema; they are converted once before ajv sees them:
 * - `nullable: true` becomes `type: [T, "null"]` (and `null` joins an `enum`); without a `type`
 *   (a nullable `allOf`/`oneOf`/`anyOf`) the schema is wrapped as `anyOf: [schema, {type: null}]`.
 * - keywords beside a `$ref` are dropped (3.0 ignores them);
 * - annotations ajv does not know (`example`, `discriminator`, `x-*`, `deprecated`…) are ignored
 *   through `strict: false`; unknown formats (`int64`) are accepted as any value.
 * `$ref`s point into one registered document holding `components.schemas`, so each operation's
 * validator is compiled once, on first use, from the referenced parts only.
 */
import { Ajv } from 'ajv';
import type { ValidateFunction } from 'ajv';
import addFormats from 'ajv-formats';
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';

type Json = Record<string, unknown>;

const DOC_ID = 'https://openapi.invalid/api.github.com.json';
const require = createRequire(import.meta.url);

type Description = {
  paths: Record<string, Record<string, Json>>;
  components: Record<string, Record<string, Json>>;
};

interface Loaded {
  spec: Description;
  ajv: Ajv;
  compiled: Map<string, ValidateFunction | null>;
}

let small: Loaded | null = null;
let full: Loaded | null = null;

function prepare(spec: Description): Loaded {
  const ajv = new Ajv({ strict: false, allErrors: true, validateFormats: true });
  addFormats.default(ajv);
  ajv.addFormat('int64', true);
  ajv.addFormat('int32', true);
  const schemas: Json = {};
  for (const [name, schema] of Object.entries(spec.components['schemas'] ?? {}))
    schemas[name] = convert(schema);
  ajv.addSchema({ $id: DOC_ID, components: { schemas } });
  return { spec, ajv, compiled: new Map() };
}

function read(file: string): Description {
  return JSON.parse(readFileSync(file, 'utf8')) as Description;
}

/** The subset, or the full description when the subset lacks the operation (or the example). */
function load(need?: { operation?: string; example?: string }): Loaded {
  small ??= prepare(read(fileURLToPath(new URL('./api-subset.json', import.meta.url))));
  const has = (l: Loaded) => {
    if (need?.example !== undefined)
      return l.spec.components['examples']?.[need.example] !== undefined;
    if (need?.operation === undefined) return true;
    const [method = '', path = ''] = need.operation.split(' ');
    return l.spec.paths[path]?.[method.toLowerCase()] !== undefined;
  };
  if (has(small)) return small;
  full ??= prepare(read(require.resolve('@octokit/openapi/generated/api.github.com.json')));
  return full;
}

/** OpenAPI 3.0 schema object → JSON Schema (draft 7) that ajv understands. */
export function convert(schema: unknown): Json {
  if (typeof schema !== 'object' || schema === null) return schema as Json;
  const s = schema as Json;
  if (typeof s['$ref'] === 'string') {
    const ref = s['$ref'];
    return { $ref: ref.startsWith('#/') ? `${DOC_ID}${ref}` : ref };
  }
  const out: Json = {};
  for (const [key, value] of Object.entries(s)) {
    if (key === 'nullable' || key === 'example' || key === 'examples' || key.startsWith('x-'))
      continue;
    if (key === 'properties' || key === 'patternProperties') {
      out[key] = Object.fromEntries(Object.entries(value as Json).map(([k, v]) => [k, convert(v)]));
    } else if (
      key === 'items' ||
      key === 'not' ||
      (key === 'additionalProperties' && typeof value === 'object')
    ) {
      out[key] = convert(value);
    } else if (key === 'allOf' || key === 'oneOf' || key === 'anyOf') {
      out[key] = (value as unknown[]).map(convert);
    } else {
      out[key] = value;
    }
  }
  if (s['nullable'] !== true) return out;
  if (typeof out['type'] === 'string') {
    out['type'] = [out['type'], 'null'];
    if (Array.isArray(out['enum']) && !out['enum'].includes(null))
      out['enum'] = [...out['enum'], null];
    return out;
  }
  return { anyOf: [out, { type: 'null' }] };
}

function resolveResponse(doc: Description, responses: Json, status: number): Json | null {
  let response = (responses[String(status)] ?? null) as Json | null;
  if (response !== null && typeof response['$ref'] === 'string') {
    const name = response['$ref'].split('/').pop() ?? '';
    response = (doc.components['responses']?.[name] ?? null) as Json | null;
  }
  return response;
}

/**
 * The validator for a response of one operation (`GET /repos/{owner}/{repo}/pulls/{pull_number}`),
 * or null when the operation declares that status without a JSON body (204, 302).
 * Statuses the description does not list for the operation (a 502 from a proxy, a 403 secondary
 * rate limit) are checked against GitHub's generic `basic-error`.
 */
export function responseValidator(operation: string, status: number): ValidateFunction | null {
  const key = `${operation} ${status}`;
  const { spec: doc, ajv: validator, compiled } = load({ operation });
  if (compiled.has(key)) return compiled.get(key) ?? null;
  const [method = '', path = ''] = operation.split(' ');
  const op = doc.paths[path]?.[method.toLowerCase()];
  if (op === undefined)
    throw new Error(`no operation ${operation} in GitHub's OpenAPI description`);
  const response = resolveResponse(doc, op['responses'] as Json, status);
  let schema: unknown;
  if (response === null)
    schema = status >= 400 ? { $ref: '#/components/schemas/basic-error' } : undefined;
  else
    schema = (response['content'] as Record<string, Json> | undefined)?.['application/json']?.[
      'schema'
    ];
  if (response === null && status < 400) {
    throw new Error(`${operation} does not answer ${status} in GitHub's OpenAPI description`);
  }
  const fn = schema === undefined ? null : validator.compile(convert(schema));
  compiled.set(key, fn);
  return fn;
}

/** Problems of a response body, as `instancePath message` lines; empty when it conforms. */
export function checkResponse(operation: string, status: number, body: unknown): string[] {
  const validate = responseValidator(operation, status);
  if (validate === null)
    return body === undefined || body === null ? [] : [`${operation} ${status} must have no body`];
  if (validate(body)) return [];
  return (validate.errors ?? [])
    .slice(0, 10)
    .map((e) => `${operation} ${status}: ${e.instancePath || '/'} ${e.message ?? ''}`);
}

/** A response example from the description (`components.examples[name].value`), deep-copied. */
export function example<T = Json>(name: string): T {
  const value = load({ example: name }).spec.components['examples']?.[name]?.['value'];
  if (value === undefined) throw new Error(`no example ${name} in GitHub's OpenAPI description`);
  return structuredClone(value) as T;
}
