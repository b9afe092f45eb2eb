#!/usr/bin/env node
/** CLI entry: gathers the outside world into `CliIo`, runs the command, sets the exit code. */
import { fileURLToPath } from 'node:url';
import { runCli } from './cli/main.js';
import { writeOutput } from '../io/write-output.js';
import pkg from '../../package.json' with { type: 'json' };

const version: string = pkg.version;

// A reader that goes away (`fitgap review … | head`) closes the pipe: stop writing, exit quietly
// with the command's own code. Never a stack trace, never mistaken for a failed gate.
let closed = false;
const quietOnClose = (error: NodeJS.ErrnoException) => {
  if (error.code === 'EPIPE') closed = true;
  else throw error;
};
process.stdout.on('error', quietOnClose);
process.stderr.on('error', quietOnClose);
const write = (stream: NodeJS.WriteStream) => (text: string) => {
  if (!closed) stream.write(text);
};

runCli(process.argv.slice(2), {
  stdout: write(process.stdout),
  stderr: write(process.stderr),
  color: process.stdout.isTTY === true && process.env['NO_COLOR'] === undefined,
  cwd: process.cwd(),
  writeFile: (path, text, { file, inputs }) => writeOutput(path, text, file, inputs),
  demoDir: fileURLToPath(new URL('../demo/', import.meta.url)),
  version,
  stderrStream: process.stderr,
  env: { GITHUB_TOKEN: process.env['GITHUB_TOKEN'], GITHUB_API_URL: process.env['GITHUB_API_URL'] },
}).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    if (!closed)
      process.stderr.write(
        `fitgap: internal error (a bug; please report it):\n${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`,
      );
    process.exitCode = 3;
  },
);
