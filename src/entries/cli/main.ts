/** Dispatches a CLI invocation to its command and maps errors to exit codes. */
import { EXIT, InputError, UsageError } from '../../model/errors.js';
import { auditCommand } from './audit.js';
import { demoCommand, reviewCommand, validateCommand } from './commands.js';
import { curvesCommand } from './curves-import.js';
import { MAIN_HELP } from './help.js';
import type { CliIo } from './io.js';

export async function runCli(argv: string[], io: CliIo): Promise<number> {
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case 'review':
        return await reviewCommand(rest, io);
      case 'validate':
        return await validateCommand(rest, io);
      case 'demo':
        return await demoCommand(rest, io);
      case 'curves':
        return await curvesCommand(rest, io);
      case 'audit':
        return await auditCommand(rest, io);
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
