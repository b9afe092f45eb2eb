/** `fitgap curves import` through the built CLI (dist/cli.js), as a user runs it. */
import { execFile } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { beforeAll, describe, expect, it } from 'vitest';
import { CURVES_IMPORT_HELP } from '../../src/entries/cli/curves-import.js';
import { eventFile } from '../artifact/curve-logs/tfevents-writer.js';

const run = promisify(execFile);
const cli = resolve('dist/cli.js');

async function fitgap(args: string[], cwd: string) {
  try {
    const { stdout, stderr } = await run(process.execPath, [cli, ...args], {
      env: { PATH: process.env['PATH'] ?? '' },
      cwd,
    });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const e = error as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

beforeAll(async () => {
  // Build only when dist/ is missing or predates this command.
  if (!existsSync(cli) || !readFileSync(cli, 'utf8').includes('fitgap curves import --from FORMAT'))
    await run('npm', ['run', '-s', 'build']);
});

describe('fitgap curves import (built)', () => {
  it('prints its help', async () => {
    expect((await fitgap(['curves', 'import', '--help'], '.')).stdout).toBe(CURVES_IMPORT_HELP);
  });

  it('imports a Keras TensorBoard log folder into curves.json', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fitgap-e2e-curves-'));
    for (const [run, offset] of [
      ['train', 0],
      ['validation', 0.0625],
    ] as const) {
      mkdirSync(join(dir, 'logs', run), { recursive: true });
      writeFileSync(
        join(dir, 'logs', run, `events.out.tfevents.170000000${offset === 0 ? 1 : 2}.host`),
        eventFile(
          [0, 1, 2].map((epoch) => ({
            step: epoch,
            values: [
              {
                tag: 'epoch_loss',
                tensor: { dtype: 'float' as const, value: 1 - epoch / 4 + offset },
              },
              {
                tag: 'epoch_accuracy',
                tensor: { dtype: 'float' as const, value: 0.5 + epoch / 8 - offset },
              },
            ],
          })),
        ),
      );
    }
    const result = await fitgap(
      [
        'curves',
        'import',
        '--from',
        'tensorboard',
        'logs',
        '--metric',
        'error',
        '--out',
        'curves.json',
      ],
      dir,
    );
    expect(result.stderr).toBe(
      [
        'fitgap: Picked train "train/epoch_accuracy" and validation "validation/epoch_accuracy" from logs/validation/events.out.tfevents.1700000002.host, logs/train/events.out.tfevents.1700000001.host (x: step); wrote 3 point(s) to curves.json. Others: "validation/epoch_loss".',
        'fitgap: Converted "validation/epoch_accuracy" to the units of "error" (1 − value).',
        '',
      ].join('\n'),
    );
    expect(result.code).toBe(0);
    const curves = JSON.parse(readFileSync(join(dir, 'curves.json'), 'utf8')) as unknown;
    expect(curves).toEqual({
      epochs: [
        { x: 0, train: 0.5, validation: 0.5625 },
        { x: 1, train: 0.375, validation: 0.4375 },
        { x: 2, train: 0.25, validation: 0.3125 },
      ],
    });
  });

  it('exits 2 with a message and no stack trace on a damaged log', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fitgap-e2e-curves-'));
    writeFileSync(
      join(dir, 'events.out.tfevents.1.bad'),
      Uint8Array.from([1, 0, 0, 0, 0, 0, 0, 0, 9, 9, 9, 9, 0, 0, 0, 0, 0]),
    );
    const result = await fitgap(
      ['curves', 'import', '--from', 'tensorboard', '.', '--out', 'c.json'],
      dir,
    );
    expect(result.code).toBe(2);
    expect(result.stderr).toBe(
      'events.out.tfevents.1.bad: record 1 (byte 0) must start with a record length whose checksum matches. The file is damaged or is not a TensorBoard event file (events.out.tfevents.*).\n',
    );
    expect(existsSync(join(dir, 'c.json'))).toBe(false);
  });
});
