/** `tenuis help [COMMAND]` and `tenuis --help`. */
import { UsageError, EXIT_OK } from '../errors';
import { MAIN_USAGE, COMMAND_USAGE } from '../usage';
import type { CommandIO } from './io';

export function helpCommand(args: string[], io: CommandIO): number {
  if (args.length === 0) {
    io.stdout.write(`${MAIN_USAGE}\n`);
    return EXIT_OK;
  }
  const text = Object.hasOwn(COMMAND_USAGE, args[0]) ? COMMAND_USAGE[args[0]] : undefined;
  if (!text) throw new UsageError(`no command "${args[0]}"`, MAIN_USAGE);
  io.stdout.write(`${text}\n`);
  return EXIT_OK;
}
