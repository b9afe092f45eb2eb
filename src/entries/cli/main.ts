/** Dispatches a CLI invocation to its command and maps errors to exit codes. */
import { EXIT, InputError, UsageError } from '../../model/errors.js';
import { MAIN_HELP } from './help.js';
import type { CliIo } from './io.js';

export async function runCli(argv: string[], io: CliIo): Promise<number> {
  const [command, ...rest] = argv;
  try {
    switch (command) {
      // Each command is loaded when it runs, so start-up parses only what the command needs
      // (the bundle is split per command).
      case 'review':
        return await (await import('./commands.js')).reviewCommand(rest, io);
      case 'validate':
        return await (await import('./commands.js')).validateCommand(rest, io);
      case 'demo':
        return await (await import('./commands.js')).demoCommand(rest, io);
      case 'curves':
        return await (await import('./curves-import.js')).curvesCommand(rest, io);
      case 'audit':
        return await (await import('./audit.js')).auditCommand(rest, io);
      case '--version':
      case '-v':
        io.stdout(`${io.version}\n`);
        return EXIT.ok;
      case undefined:
      case '--help':
      case '-h':
      case 'help':
        io.stdout(MAIN_HELP);
        return command === undefined ? EXIT.badInput : EXIT.ok;
      default:
        throw new UsageError(
          `fitgap: unknown command ${JSON.stringify(command)}. Run 'fitgap --help'.`,
        );
    }
  } catch (error) {
    if (error instanceof InputError || error instanceof UsageError) {
      io.stderr(`${error.message}\n`);
      return EXIT.badInput;
    }
    throw error;
  }
}
