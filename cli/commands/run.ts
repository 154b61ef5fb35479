/**
 * `tenuis run CASE.json --out DIR`: validate and plan (refusing bad input before anything starts or is created),
 * run the transient and sampling steps with a progress line, then summarise and write all result files at once.
 */
import { parseArgs } from 'node:util';
import { createSimulation } from '../../engine/simulation';
import { summarize } from '../../engine/results/summarize';
import { resultFiles, type Performance } from '../../engine/results/exports';
import { UsageError, EXIT_OK, EXIT_INTERRUPTED } from '../errors';
import { RUN_USAGE } from '../usage';
import { loadCase, parseSeedOption } from '../readCase';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { createProgress } from '../progress';
import { advanceInChunks } from '../advanceInChunks';
import { runSummary } from '../report';
import { prettyJson } from '../prettyJson';
import type { CommandIO } from './io';

/** Sets a flag on the first Ctrl-C; a second Ctrl-C ends the process at once (the default action). */
function watchInterrupt(): { readonly interrupted: boolean; dispose(): void } {
  const state = { interrupted: false };
  const onSigint = () => {
    state.interrupted = true;
  };
  process.once('SIGINT', onSigint);
  return {
    get interrupted() {
      return state.interrupted;
    },
    dispose: () => process.removeListener('SIGINT', onSigint),
  };
}

export async function runCommand(args: string[], io: CommandIO): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({
      args,
      allowPositionals: true,
      options: {
        out: { type: 'string', short: 'o' },
        seed: { type: 'string' },
        quiet: { type: 'boolean', short: 'q' },
        help: { type: 'boolean', short: 'h' },
      },
    });
  } catch (e) {
    throw new UsageError((e as Error).message, RUN_USAGE);
  }
  const { values, positionals } = parsed;
  if (values.help) {
    io.stdout.write(`${RUN_USAGE}\n`);
    return EXIT_OK;
  }
  if (positionals.length !== 1) throw new UsageError('run needs exactly one case file', RUN_USAGE);
  if (!values.out) throw new UsageError('run needs an output folder: --out DIR', RUN_USAGE);
  const outDir = values.out;
  const quiet = values.quiet === true;

  const seed = values.seed === undefined ? undefined : parseSeedOption(values.seed);
  const { caseData, plan } = loadCase(positionals[0], { seed });
  checkOutputDir(outDir);
  for (const w of plan.warnings) io.stderr.write(`warning: ${w}\n`);

  const sim = createSimulation(plan);
  const progress = quiet
    ? undefined
    : createProgress({ stream: io.stderr, totalSteps: plan.transientSteps + plan.sampleSteps, transientSteps: plan.transientSteps });
  const interrupt = watchInterrupt();
  let outcome;
  try {
    outcome = await advanceInChunks(sim, { onProgress: (d) => progress?.update(d), shouldStop: () => interrupt.interrupted });
  } finally {
    interrupt.dispose();
  }
  if (!outcome.completed) {
    progress?.clear();
    io.stderr.write(`interrupted at step ${outcome.stepsDone}: nothing was written\n`);
    return EXIT_INTERRUPTED;
  }
  progress?.finish(outcome.stepsDone);

  const result = summarize(sim);
  const particleSteps = sim.state.particleSteps;
  const performance: Performance = {
    wallSeconds: outcome.wallSeconds,
    particleSteps,
    particleStepsPerSecond: outcome.wallSeconds > 0 ? particleSteps / outcome.wallSeconds : NaN,
  };
  const files = {
    ...resultFiles(result, { performance, caseName: caseData.name }),
    'case.json': `${prettyJson(caseData)}\n`,
  };
  writeResultsAtomically(outDir, files);
  for (const w of result.warnings) if (!plan.warnings.includes(w)) io.stderr.write(`warning: ${w}\n`);
  if (!quiet) io.stderr.write(`${runSummary(result, performance, outDir)}\n`);
  return EXIT_OK;
}
