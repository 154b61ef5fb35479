/**
 * `tenuis`: the headless sibling of the browser app. Node only; the engine it drives is the same pure code the
 * Web Workers run. Each command lives in cli/commands/; this file only dispatches and turns errors into messages
 * and exit codes (cli/errors.ts).
 */
import { CliError, UsageError, EXIT_BAD_INPUT, EXIT_USAGE } from './errors';
import { MAIN_USAGE } from './usage';
import type { CommandIO } from './commands/io';
import { presetCommand } from './commands/preset';
import { runCommand } from './commands/run';
import { mergeCommand } from './commands/merge';
import { sweepCommand } from './commands/sweep';
import { checkCommand } from './commands/check';
import { schemaCommand } from './commands/schema';
import { helpCommand } from './commands/help';
import { continuumCommand } from './commands/continuum';

type Command = (args: string[], io: CommandIO) => number | Promise<number>;

const COMMANDS: Readonly<Record<string, Command>> = {
  preset: presetCommand,
  run: runCommand,
  merge: mergeCommand,
  sweep: sweepCommand,
  check: checkCommand,
  schema: schemaCommand,
  continuum: continuumCommand,
  help: helpCommand,
};

export async function main(argv: string[], io: CommandIO): Promise<number> {
  const [name, ...rest] = argv;
  if (name === '--help' || name === '-h') return helpCommand([], io);
  const command = name !== undefined && Object.hasOwn(COMMANDS, name) ? COMMANDS[name] : undefined;
  try {
    if (!command) {
      throw new UsageError(name === undefined ? 'no command given' : `unknown command "${name}"`, MAIN_USAGE);
    }
    return await command(rest, io);
  } catch (e) {
    if (e instanceof UsageError) {
      io.stderr.write(`tenuis: ${e.message}\n\n${e.usage}\n`);
      return EXIT_USAGE;
    }
    if (e instanceof CliError) {
      io.stderr.write(`tenuis: ${e.message}\n`);
      return e.exitCode;
    }
    io.stderr.write(`tenuis: internal error (please report it): ${(e as Error)?.stack ?? e}\n`);
    return EXIT_BAD_INPUT;
  }
}

// Exit through process.exitCode, not process.exit(), so buffered stdout (a long case or schema in a pipe) is flushed.
process.exitCode = await main(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr });
