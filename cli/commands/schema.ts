/**
 * `tenuis schema`: the case file's JSON Schema on stdout. It takes no arguments, so it parses loosely and refuses any
 * it is given by naming them (rather than with the parser's message about an unknown option).
 */
import { caseJsonSchema } from '../../engine/case/schema';
import { EXIT_OK } from '../errors';
import { defineCommand } from '../command';

export const SCHEMA_USAGE = `Usage:
  tenuis schema

Prints the JSON Schema (draft 2020-12) of the case file.`;

export const schemaCommand = defineCommand({
  name: 'schema',
  summary: "  tenuis schema                              print the case file's JSON Schema",
  usage: SCHEMA_USAGE,
  options: {},
  strict: false,
  run(_parsed, { io, args, usageError }) {
    if (args.length > 0) throw usageError(`schema takes no arguments, got ${args.join(' ')}`);
    io.stdout.write(`${JSON.stringify(caseJsonSchema(), null, 2)}\n`);
    return EXIT_OK;
  },
});
