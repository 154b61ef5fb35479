/** `tenuis schema`: the case file's JSON Schema on stdout. */
import { caseJsonSchema } from '../../engine/case/schema';
import { UsageError, EXIT_OK } from '../errors';
import { SCHEMA_USAGE } from '../usage';
import type { CommandIO } from './io';

export function schemaCommand(args: string[], io: CommandIO): number {
  if (args.includes('--help') || args.includes('-h')) {
    io.stdout.write(`${SCHEMA_USAGE}\n`);
    return EXIT_OK;
  }
  if (args.length > 0) throw new UsageError(`schema takes no arguments, got ${args.join(' ')}`, SCHEMA_USAGE);
  io.stdout.write(`${JSON.stringify(caseJsonSchema(), null, 2)}\n`);
  return EXIT_OK;
}
