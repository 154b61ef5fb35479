/**
 * The command table of `tenuis`: every command, in the order `tenuis --help` lists them. A new command is one file in
 * this folder declaring itself with defineCommand (cli/command.ts) and one line here.
 */
import type { Command } from '../command';
import { presetCommand } from './preset';
import { checkCommand } from './check';
import { runCommand } from './run';
import { mergeCommand } from './merge';
import { sweepCommand } from './sweep';
import { schemaCommand } from './schema';
import { continuumCommand } from './continuum';
import { coefficientsCommand } from './coefficients';
import { ductCommand } from './duct';
import { helpCommandOf, mainUsageOf } from './help';

const LISTED: readonly Command[] = [
  presetCommand,
  checkCommand,
  runCommand,
  mergeCommand,
  sweepCommand,
  schemaCommand,
  continuumCommand,
  coefficientsCommand,
  ductCommand,
];

export const helpCommand = helpCommandOf(LISTED);
export const COMMANDS: readonly Command[] = [...LISTED, helpCommand];
export const MAIN_USAGE = mainUsageOf(LISTED);
