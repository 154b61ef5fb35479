/**
 * `tenuis help [COMMAND]` and `tenuis --help`, and the overview they print, assembled from the command table (each
 * command's own entry): made from the table it is given, so it needs no import of the commands themselves.
 */
import { UsageError, EXIT_OK } from '../errors';
import { defineCommand, type Command } from '../command';

const MAIN_HEADER = 'tenuis: rarefied gas flows by direct simulation Monte Carlo, from the command line';
const MAIN_FOOTER = `Case files are JSON with SI units; the field names carry the unit (pressurePa, lengthYM).
Exit codes: 0 success, 1 bad input, 2 wrong usage, 130 interrupted.`;
const HELP_SUMMARY = "  tenuis help [COMMAND]                      this text, or a command's";

/** The overview: every command's entry, in the table's order, then help's own. */
export function mainUsageOf(commands: readonly Command[]): string {
  return `${MAIN_HEADER}\n\nUsage:\n${[...commands.map((c) => c.summary), HELP_SUMMARY].join('\n')}\n\n${MAIN_FOOTER}`;
}

export function helpCommandOf(commands: readonly Command[]): Command {
  const mainUsage = mainUsageOf(commands);
  return defineCommand({
    name: 'help',
    summary: HELP_SUMMARY,
    usage: mainUsage,
    options: {},
    // Its argument is a command's name, whatever it is spelt like: read as given, not as options.
    strict: false,
    ownHelp: true,
    run(_parsed, { io, args }) {
      if (args.length === 0) {
        io.stdout.write(`${mainUsage}\n`);
        return EXIT_OK;
      }
      const command = commands.find((c) => c.name === args[0]);
      if (!command) throw new UsageError(`no command "${args[0]}"`, mainUsage);
      io.stdout.write(`${command.usage}\n`);
      return EXIT_OK;
    },
  });
}
