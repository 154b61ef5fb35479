/** `tenuis check CASE.json`: validate and plan a case; print the plan; exit 0 only when it can run. */
import { EXIT_OK } from '../errors';
import { loadCase } from '../readCase';
import { planReport } from '../report';
import { defineCommand } from '../command';
import { printable } from '../printable';
import { parseTimeCap, sizedRunOf } from '../sizedRun';
import { sizingLines } from '../../engine/sizing/runSizing';

export const CHECK_USAGE = `Usage:
  tenuis check CASE.json [--replicas N] [--time-cap S]

Validates the case and plans it: prints the reference state, grid, time step, particles and the advisor's ratios,
and the run sizing: the sampling steps that bring the headline quantity (a duct's flow rate, a wall's shear or heat
flux) to ±1 % (95 %) within the time cap, the half-width and wall time to expect, and whether the cap allows it.
The plan shown is the sized one when the case leaves sampling.sampleSteps unset, as tenuis run will run it.
  --replicas, -r N   replicas the run will use (they share the sampling)
  --time-cap S       wall-clock cap of the sizing, seconds (default 300)
Exit code 0 when the case is valid and can run, 1 otherwise.`;

export const checkCommand = defineCommand({
  name: 'check',
  summary: '  tenuis check CASE.json                     validate a case and show its plan',
  usage: CHECK_USAGE,
  options: { replicas: { type: 'string', short: 'r' }, 'time-cap': { type: 'string' } },
  run({ positionals, values }, { io, usageError }) {
    if (positionals.length !== 1) throw usageError('check needs exactly one case file');
    const loaded = loadCase(positionals[0]);
    const replicas = values.replicas === undefined ? 1 : Number(values.replicas);
    if (!Number.isInteger(replicas) || replicas < 1 || replicas > 256)
      throw usageError(`--replicas ${values.replicas}: give a whole number from 1 to 256`);
    const capSeconds = parseTimeCap(values['time-cap'], usageError);
    const { plan, sizing } = sizedRunOf(loaded.caseData, loaded.plan, { replicas, capSeconds, apply: true });
    io.stdout.write(`${planReport(plan)}\n`);
    io.stdout.write(
      `run sizing:\n${sizingLines(sizing)
        .map((l) => `  ${l}`)
        .join('\n')}\n`,
    );
    if (plan.warnings.length)
      io.stdout.write(`warnings:\n${plan.warnings.map((w) => `  ${printable(w)}`).join('\n')}\n`);
    else io.stdout.write('warnings: none\n');
    return EXIT_OK;
  },
});
