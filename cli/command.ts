/**
 * How a `tenuis` command is declared: its name, its lines in `tenuis --help`, its usage text beside its option specs,
 * and a run function. Written once here, for every command: argument parsing (node:util parseArgs), a usage error
 * for what the parser refuses, `--help`/`-h`, and Ctrl-C (the first sets a flag the command's run watches; a second
 * ends the process at once, the default action). The table of commands is cli/commands/index.ts.
 */
import { parseArgs, type ParseArgsConfig } from 'node:util';
import { UsageError, EXIT_OK } from './errors';
import type { CommandIO } from './commands/io';

type OptionSpecs = NonNullable<ParseArgsConfig['options']>;
const HELP_OPTION = { help: { type: 'boolean', short: 'h' } } as const;
type WithHelp<O extends OptionSpecs> = O & typeof HELP_OPTION;

/** What parseArgs gives for these options (and --help), positionals allowed. */
export type ParsedArgs<O extends OptionSpecs> = ReturnType<
  typeof parseArgs<{ args: string[]; options: WithHelp<O>; allowPositionals: true; strict: true }>
>;

/** Ctrl-C while a command runs. */
export interface Interrupt {
  readonly interrupted: boolean;
  /** Calls `f` on the first Ctrl-C (at once if it came already); returns a function that unregisters it. */
  onInterrupt(f: () => void): () => void;
  /** Gives Ctrl-C its default action back (ending the process). */
  dispose(): void;
}

export interface CommandContext {
  readonly io: CommandIO;
  /** The arguments after the command's name, as given. */
  readonly args: readonly string[];
  /** A usage error of this command: the message, then its usage text (exit code 2). */
  usageError(message: string): UsageError;
  /** From now on the first Ctrl-C only sets a flag (until dispose(), at the latest when the command returns). */
  watchInterrupt(): Interrupt;
}

export interface CommandSpec<O extends OptionSpecs> {
  readonly name: string;
  /** Its entry in `tenuis --help`, verbatim (synopsis and one-line summary, aligned as printed). */
  readonly summary: string;
  /** `tenuis COMMAND --help` and the text after a usage error. */
  readonly usage: string;
  readonly options: O;
  /** Rewrites the arguments before they are parsed (e.g. `--knudsen -1` as `--knudsen=-1`). */
  readonly prepareArgs?: (args: readonly string[]) => string[];
  /** Unknown options are kept instead of refused (the command checks its arguments itself). Default true. */
  readonly strict?: boolean;
  /** The command answers --help itself (e.g. `preset NAME --help`). */
  readonly ownHelp?: boolean;
  run(parsed: ParsedArgs<O>, context: CommandContext): number | Promise<number>;
}

export interface Command {
  readonly name: string;
  readonly summary: string;
  readonly usage: string;
  execute(args: string[], io: CommandIO): Promise<number>;
}

function watchInterrupt(): Interrupt {
  let interrupted = false;
  let listening = true;
  const listeners = new Set<() => void>();
  const onSigint = () => {
    interrupted = true;
    for (const f of [...listeners]) f();
  };
  process.once('SIGINT', onSigint);
  return {
    get interrupted() {
      return interrupted;
    },
    onInterrupt(f) {
      if (interrupted) f();
      else listeners.add(f);
      return () => void listeners.delete(f);
    },
    dispose() {
      if (!listening) return;
      listening = false;
      listeners.clear();
      process.removeListener('SIGINT', onSigint);
    },
  };
}

export function defineCommand<O extends OptionSpecs>(spec: CommandSpec<O>): Command {
  return {
    name: spec.name,
    summary: spec.summary,
    usage: spec.usage,
    async execute(args, io) {
      let parsed: ParsedArgs<O>;
      try {
        parsed = parseArgs({
          args: spec.prepareArgs ? spec.prepareArgs(args) : args,
          allowPositionals: true,
          strict: spec.strict ?? true,
          options: { ...spec.options, ...HELP_OPTION },
        }) as ParsedArgs<O>;
      } catch (e) {
        throw new UsageError((e as Error).message, spec.usage);
      }
      if ((parsed.values as { help?: boolean }).help && !spec.ownHelp) {
        io.stdout.write(`${spec.usage}\n`);
        return EXIT_OK;
      }
      const watches: Interrupt[] = [];
      try {
        return await spec.run(parsed, {
          io,
          args,
          usageError: (message) => new UsageError(message, spec.usage),
          watchInterrupt: () => {
            const w = watchInterrupt();
            watches.push(w);
            return w;
          },
        });
      } finally {
        for (const w of watches) w.dispose();
      }
    },
  };
}
