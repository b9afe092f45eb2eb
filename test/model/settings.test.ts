/**
 * One settings source: the config schema states the same ranges and outcomes as
 * src/model/settings.ts, and a CLI flag, an action input and a config key given the same text end
 * in the same value or the same complaint.
 */
import { readFileSync } from 'node:fs';
import { afterEach, describe, expect, it } from 'vitest';
import { parseOverrides } from '../../src/entries/cli/args.js';
import { readSettings } from '../../src/entries/action/settings.js';
import { parseConfig } from '../../src/io/load-config.js';
import { LIMIT_NAMES, LIMIT_RANGES_MB } from '../../src/io/open-untrusted.js';
import { InputError } from '../../src/model/errors.js';
import {
  COST_RATIO_OUTCOME,
  FAIL_ON_VALUES,
  NUMBER_SETTINGS,
  parseDecimal,
  type NumberSettingName,
} from '../../src/model/settings.js';

const schema = JSON.parse(readFileSync('schema/fitgap-config.schema.json', 'utf8')) as {
  properties: Record<string, Record<string, unknown>>;
};

describe('the config schema agrees with the settings source', () => {
  it.each(Object.entries(NUMBER_SETTINGS))('%s: same inclusive range', (name, range) => {
    const property = schema.properties[name];
    expect(property).toMatchObject({ type: 'number', minimum: range.min, maximum: range.max });
    expect(property).not.toHaveProperty('exclusiveMinimum');
    expect(property).not.toHaveProperty('exclusiveMaximum');
  });

  it('fail-on: the same outcomes, never an empty list', () => {
    const [text, list] = schema.properties['fail-on']?.['oneOf'] as Record<string, unknown>[];
    expect(text).toEqual({ type: 'string', minLength: 1 });
    expect(list).toEqual({
      type: 'array',
      minItems: 1,
      items: {
        type: 'string',
        anyOf: [{ enum: [...FAIL_ON_VALUES] }, { pattern: COST_RATIO_OUTCOME.source }],
      },
    });
  });

  it('limits: the same keys and ranges as the file opening', () => {
    const limits = schema.properties['limits']?.['properties'] as Record<string, unknown>;
    const expected: Record<string, unknown> = {};
    for (const [key, names] of Object.entries(LIMIT_NAMES)) {
      if (names.config === null) continue;
      const range = LIMIT_RANGES_MB[key as keyof typeof LIMIT_NAMES];
      expected[names.config] = expect.objectContaining({
        type: 'number',
        minimum: range.min,
        maximum: range.max,
      });
    }
    expect(limits).toEqual(expected);
  });
});

const inputKeys: string[] = [];
afterEach(() => {
  for (const key of inputKeys.splice(0)) delete process.env[key];
});
function withInputs(inputs: Record<string, string>) {
  for (const [name, value] of Object.entries({
    mode: 'review',
    candidate: 'c.json',
    baseline: 'b.json',
    'github-token': 't',
    comment: 'off',
    'status-check': 'auto',
    ...inputs,
  })) {
    const key = `INPUT_${name.toUpperCase()}`;
    process.env[key] = value;
    inputKeys.push(key);
  }
}

/** The value, or the complaint without its source, for each of the three ways in. */
async function threeWays(name: NumberSettingName | 'fail-on', text: string) {
  const fromFlag = () => parseOverrides({ [name]: text });
  const fromInput = () => {
    withInputs({ [name]: text });
    return readSettings({}).overrides;
  };
  const yamlValue = name === 'fail-on' ? JSON.stringify(text) : text === '' ? '""' : text;
  const fromConfig = () => parseConfig(`${name}: ${yamlValue}\n`, 'fitgap.yml');
  const outcome = async (fn: () => unknown) => {
    try {
      const value = (await fn()) as Record<string, unknown>;
      const key =
        name === 'fail-on'
          ? value['failOn'] !== undefined
            ? 'failOn'
            : 'fail-on'
          : name === 'min-effect'
            ? value['minEffect'] !== undefined
              ? 'minEffect'
              : 'min-effect'
            : name === 'gap-tolerance'
              ? value['gapTolerance'] !== undefined
                ? 'gapTolerance'
                : 'gap-tolerance'
              : name;
      return { value: value[key] };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      return { problem: error.issues.map((i) => `${i.expected} (got ${i.got})`).join('; ') };
    }
  };
  return Promise.all([outcome(fromFlag), outcome(fromInput), outcome(fromConfig)]);
}

describe('a flag, an input and a config key agree', () => {
  it.each([
    ['alpha', '0.5', { value: 0.5 }],
    ['alpha', '0.000001', { value: 0.000001 }],
    ['alpha', '0.7', { problem: 'must be a number from 0.000001 to 0.5 (got 0.7)' }],
    ['alpha', '1e-9', { problem: 'must be a number from 0.000001 to 0.5 (got 1e-9)' }],
    ['min-effect', '0.002', { value: 0.002 }],
    ['min-effect', '-1', { problem: 'must be a number from 0 to 1e15 (got -1)' }],
    ['gap-tolerance', '1', { value: 1 }],
    ['gap-tolerance', '1.5', { problem: 'must be a number from 0 to 1 (got 1.5)' }],
    ['reference', '-0.5', { value: -0.5 }],
    [
      'reference',
      '2e15',
      { problem: 'must be a number from -1e15 to 1e15 (got 2000000000000000)' },
    ],
  ] as const)('%s %s', async (name, text, expected) => {
    const [flag, input, config] = await threeWays(name, text);
    expect(flag).toEqual(expected);
    expect(input).toEqual(expected);
    expect(config).toEqual(expected);
  });

  it.each([
    ['worse-validation, slice-regression', { value: ['worse-validation', 'slice-regression'] }],
    ['worse-validation\nslice-regression', { value: ['worse-validation', 'slice-regression'] }],
    [
      'worse-validation slice-regression',
      { problem: expect.stringContaining('must be one of worse-validation') },
    ],
    ['none', { value: ['none'] }],
    [
      'worse-validation, train-seconds-ratio>1.5',
      { value: ['worse-validation', 'train-seconds-ratio>1.5'] },
    ],
    ['train-seconds-ratio>x', { problem: expect.stringContaining('or FIELD-ratio>X') }],
    [',', { problem: 'must name at least one outcome (got an empty list)' }],
  ])('fail-on %j', async (text, expected) => {
    const [flag, input, config] = await threeWays('fail-on', text);
    expect(flag).toEqual(expected);
    expect(config).toEqual(expected);
    expect(input).toEqual(expected);
  });

  it('an empty fail-on input keeps the default; an empty --fail-on is refused', async () => {
    withInputs({ 'fail-on': '' });
    expect(readSettings({}).overrides.failOn).toBeUndefined();
    expect(() => parseOverrides({ 'fail-on': '' })).toThrow(
      '--fail-on must name at least one outcome',
    );
    await expect(parseConfig('fail-on: []\n', 'c.yml')).rejects.toThrow(
      'c.yml: /fail-on must name at least one outcome',
    );
  });
});

describe('parseDecimal', () => {
  it.each([
    ['0.05', 0.05],
    ['-1', -1],
    ['+2', 2],
    ['.5', 0.5],
    ['1e-3', 0.001],
    [' 3 ', 3],
  ])('reads %j', (text, value) => expect(parseDecimal(text)).toBe(value));

  it.each(['', ' ', '0x1', '1_000', 'Infinity', 'NaN', '1e999', '--1', '1.2.3', '0b1'])(
    'refuses %j',
    (text) => expect(parseDecimal(text)).toBeNull(),
  );
});
