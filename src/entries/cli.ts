#!/usr/bin/env node
/** CLI entry: gathers the outside world into `CliIo`, runs the command, sets the exit code. */
import { writeFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { runCli } from './cli/main.js';
import pkg from '../../package.json' with { type: 'json' };

const version: string = pkg.version;
runCli(process.argv.slice(2), {
  stdout: (text) => process.stdout.write(text),
  stderr: (text) => process.stderr.write(text),
  color: process.stdout.isTTY === true && process.env['NO_COLOR'] === undefined,
  cwd: process.cwd(),
  writeFile: (path, text) => writeFile(path, text, 'utf8'),
  demoDir: fileURLToPath(new URL('../demo/', import.meta.url)),
  version,
  stderrStream: process.stderr,
  env: { GITHUB_TOKEN: process.env['GITHUB_TOKEN'], GITHUB_API_URL: process.env['GITHUB_API_URL'] },
}).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(
      `fitgap: internal error (a bug; please report it):\n${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`,
    );
    process.exitCode = 3;
  },
);
