import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import {
  HYPERPARAMETER_ROLES,
  HYPERPARAMETER_ROLES_SCHEMA,
  MAX_CONFIG_ROLES,
  type HyperparameterRolesConfig,
} from '../../../src/model/hyperparameter-roles.js';

const schema = JSON.parse(
  readFileSync(new URL('../../../schema/fitgap-config.schema.json', import.meta.url), 'utf8'),
) as { properties: Record<string, unknown> };

// Compiled as load-config compiles the config schema: JSON Schema 2020-12, strict.
const validate = new Ajv2020({ allErrors: true, strict: true }).compile(schema);

describe('config schema: hyperparameters', () => {
  it('holds the same fragment as the code', () => {
    expect(schema.properties.hyperparameters).toEqual(
      JSON.parse(JSON.stringify(HYPERPARAMETER_ROLES_SCHEMA)),
    );
    expect(HYPERPARAMETER_ROLES_SCHEMA.additionalProperties.properties.role.enum).toEqual([
      ...HYPERPARAMETER_ROLES,
    ]);
  });

  it('accepts the documented example and every role', () => {
    const example: HyperparameterRolesConfig = {
      my_penalty: { role: 'regularization', inverse: false },
      'model.C': { role: 'regularization', inverse: true, scale: 'log' },
      max_bin: { role: 'capacity', integer: true },
    };
    expect(validate({ hyperparameters: example })).toBe(true);
    for (const role of HYPERPARAMETER_ROLES)
      expect(validate({ hyperparameters: { knob: { role } } }), role).toBe(true);
  });

  it.each([
    ['an unknown role', { k: { role: 'strength' } }],
    ['a missing role', { k: { inverse: true } }],
    ['an unknown member', { k: { role: 'capacity', direction: 'up' } }],
    ['a null inverse', { k: { role: 'capacity', inverse: null } }],
    ['a text inverse', { k: { role: 'capacity', inverse: 'yes' } }],
    ['an unknown scale', { k: { role: 'capacity', scale: 'sqrt' } }],
    ['an empty name', { '': { role: 'capacity' } }],
    ['a role given as text only', { k: 'regularization' }],
    [
      'more names than allowed',
      Object.fromEntries(
        Array.from({ length: MAX_CONFIG_ROLES + 1 }, (_, i) => [`k${i}`, { role: 'capacity' }]),
      ),
    ],
  ])('rejects %s', (_what, hyperparameters) => {
    expect(validate({ hyperparameters })).toBe(false);
  });
});
