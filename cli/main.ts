/**
 * `tenuis`: the headless sibling of the browser app. Node only; the engine it drives is the same pure code the
 * Web Workers run. Each command lives in cli/commands/ (the table: cli/commands/index.ts); this file only dispatches
 * and turns errors into messages and exit codes (cli/errors.ts).
 */
import { CliError, UsageError, EXIT_BAD_INPUT, EXIT_USAGE } from './errors';
import type { CommandIO } from './commands/io';
import { COMMANDS, MAIN_USAGE, helpCommand } from './commands';
import { printable } from './printable';

export async function main(argv: string[], io: CommandIO): Promise<number> {
  const [name, ...rest] = argv;
  if (name === '--help' || name === '-h') return helpCommand.execute([], io);
  const command = COMMANDS.find((c) => c.name === name);
  try {
    if (!command) {
      throw new UsageError(name === undefined ? 'no command given' : `unknown command "${name}"`, MAIN_USAGE);
    }
    return await command.execute(rest, io);
  } catch (e) {
    if (e instanceof UsageError) {
      io.stderr.write(`tenuis: ${e.message}\n\n${e.usage}\n`);
      return EXIT_USAGE;
    }
    if (e instanceof CliError) {
      // Messages quote user text (names, file contents): print it safely.
      io.stderr.write(`tenuis: ${printable(e.message)}\n`);
      return e.exitCode;
    }
    io.stderr.write(`tenuis: internal error (please report it): ${(e as Error)?.stack ?? e}\n`);
    return EXIT_BAD_INPUT;
  }
}

// Exit through process.exitCode, not process.exit(), so buffered stdout (a long case or schema in a pipe) is flushed.
process.exitCode = await main(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr });
