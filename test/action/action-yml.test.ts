/** Pins the action's public surface: its inputs, outputs and runtime, and that the code matches them. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { ROOT, actionYml } from './harness.js';
import { NUMBER_SETTINGS } from '../../src/model/settings.js';
import { LIMIT_NAMES } from '../../src/io/open-untrusted.js';

const yml = actionYml();

test('inputs and their defaults', () => {
  const defaults = Object.fromEntries(
    Object.entries(yml.inputs).map(([name, spec]) => [name, spec.default ?? null]),
  );
  expect(defaults).toEqual({
    mode: 'review',
    candidate: null,
    baseline: null,
    'baseline-artifact': null,
    'baseline-ref': null,
    'baseline-workflow': null,
    config: null,
    'github-token': '${{ github.token }}',
    comment: 'update',
    'comment-key': 'default',
    'fail-on': null,
    alpha: null,
    'min-effect': null,
    'gap-tolerance': null,
    reference: null,
    'status-check': 'auto',
    'report-artifact': 'fitgap-report',
    'pull-request': null,
    'base-sha': null,
    'head-sha': null,
    'audit-comment': 'false',
    'archive-limit-mb': '50',
    'max-artifact-mb': null,
    'max-config-mb': null,
    'max-csv-mb': null,
  });
});

test('outputs', () => {
  expect(Object.keys(yml.outputs)).toEqual([
    'movement',
    'validation-change',
    'candidate-diagnosis',
    'gate',
    'report-path',
    'report-dir',
    'comment-url',
    'audit-record',
    'audit-record-path',
  ]);
});

test('runs the bundled entry on node24', () => {
  const runs = (yml as unknown as { runs: unknown }).runs;
  expect(runs).toEqual({ using: 'node24', main: 'dist/index.js' });
});

test('every input the settings reader asks for is declared, and every declared one is read', () => {
  const source = ['settings.ts', 'audit-settings.ts']
    .map((f) => readFileSync(join(ROOT, 'src/entries/action', f), 'utf8'))
    .join('\n');
  const read = new Set([
    ...[
      ...source.matchAll(/(?:optional|required|oneOf(?:<\w+>)?|number|getInput)\(\s*'([a-z-]+)'/g),
    ].map((m) => m[1]),
    // Read in loops over the one settings source and the file limits.
    ...Object.keys(NUMBER_SETTINGS),
    ...Object.values(LIMIT_NAMES).map((n) => n.option),
  ]);
  expect([...read].sort()).toEqual(Object.keys(yml.inputs).sort());
});

test('every output the action sets is declared', () => {
  const sources = ['publish-steps.ts', 'audit-mode.ts']
    .map((f) => readFileSync(join(ROOT, 'src/entries/action', f), 'utf8'))
    .join('\n');
  const set = new Set([...sources.matchAll(/setOutput\('([a-z-]+)'/g)].map((m) => m[1]));
  expect([...set].sort()).toEqual(Object.keys(yml.outputs).sort());
});

test('dist/licenses.txt carries the license of every runtime dependency and of copied code', () => {
  // Source: the MIT, ISC and Apache-2.0 licenses ask that their notice ship with every copy; the
  // bundle is minified without comments, so the build writes them to dist/licenses.txt.
  const text = readFileSync(join(ROOT, 'dist/licenses.txt'), 'utf8');
  const pkg = JSON.parse(readFileSync(join(ROOT, 'package.json'), 'utf8')) as {
    dependencies: Record<string, string>;
  };
  // Every runtime dependency (for ajv: its ucs2length, copied into the generated validators), and
  // jStat, whose functions are copied into src/stats/vendor/.
  for (const name of [...Object.keys(pkg.dependencies), 'jstat', 'ajv']) {
    expect(text, name).toMatch(new RegExp(`^${name.replace(/[/.]/g, '\\$&')}@\\d`, 'm'));
  }
  expect(text).toContain('Permission is hereby granted');
});
