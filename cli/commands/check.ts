/** `tenuis check CASE.json`: validate and plan a case; print the plan; exit 0 only when it can run. */
import { EXIT_OK } from '../errors';
import { loadCase } from '../readCase';
import { planReport } from '../report';
import { defineCommand } from '../command';
import { printable } from '../printable';

export const CHECK_USAGE = `Usage:
  tenuis check CASE.json

Validates the case and plans it: prints the reference state, grid, time step, particles and the advisor's ratios.
Exit code 0 when the case is valid and can run, 1 otherwise.`;

export const checkCommand = defineCommand({
  name: 'check',
  summary: '  tenuis check CASE.json                     validate a case and show its plan',
  usage: CHECK_USAGE,
  options: {},
  run({ positionals }, { io, usageError }) {
    if (positionals.length !== 1) throw usageError('check needs exactly one case file');
    const { plan } = loadCase(positionals[0]);
    io.stdout.write(`${planReport(plan)}\n`);
    if (plan.warnings.length)
      io.stdout.write(`warnings:\n${plan.warnings.map((w) => `  ${printable(w)}`).join('\n')}\n`);
    else io.stdout.write('warnings: none\n');
    return EXIT_OK;
  },
});
