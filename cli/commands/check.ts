/** `tenuis check CASE.json`: validate and plan a case; print the plan; exit 0 only when it can run. */
import { parseArgs } from 'node:util';
import { UsageError, EXIT_OK } from '../errors';
import { CHECK_USAGE } from '../usage';
import { loadCase } from '../readCase';
import { planReport } from '../report';
import type { CommandIO } from './io';

export function checkCommand(args: string[], io: CommandIO): number {
  let parsed;
  try {
    parsed = parseArgs({ args, allowPositionals: true, options: { help: { type: 'boolean', short: 'h' } } });
  } catch (e) {
    throw new UsageError((e as Error).message, CHECK_USAGE);
  }
  if (parsed.values.help) {
    io.stdout.write(`${CHECK_USAGE}\n`);
    return EXIT_OK;
  }
  if (parsed.positionals.length !== 1) throw new UsageError('check needs exactly one case file', CHECK_USAGE);
  const { plan } = loadCase(parsed.positionals[0]);
  io.stdout.write(`${planReport(plan)}\n`);
  if (plan.warnings.length) io.stdout.write(`warnings:\n${plan.warnings.map((w) => `  ${w}`).join('\n')}\n`);
  else io.stdout.write('warnings: none\n');
  return EXIT_OK;
}
