/**
 * `tenuis run CASE.json --out DIR`: validate and plan (refusing bad input before anything starts or is created),
 * run the transient and sampling steps with a progress line, then summarise and write all result files at once.
 */
import { parseArgs } from 'node:util';
import { readFileSync } from 'node:fs';
import { createSimulation, stepsRemaining, type Simulation } from '../../engine/run/simulation';
import { encodeCheckpoint, decodeCheckpoint } from '../../engine/io/checkpoint';
import { summarizeSamples } from '../../engine/results/summarize';
import type { SampleSet } from '../../engine/results/sampleSet';
import { encodeSampleSet } from '../../engine/io/sampleFile';
import { runReplicas, replicaReportJson, type StoppingOptions } from '../runReplicas';
import { parseTarget } from '../../engine/stats/stopping';
import type { Plan } from '../../engine/plan/plan';
import { targetPathsOf } from '../../engine/results/targetQuantities';
import { writeBinaryAtomically } from '../writeResults';
import { CliError } from '../errors';
import { resultFiles } from '../../engine/report/resultFiles';
import type { Performance } from '../../engine/report/summaryJson';
import { UsageError, EXIT_OK, EXIT_INTERRUPTED } from '../errors';
import { RUN_USAGE } from '../usage';
import { loadCase, parseSeedOption } from '../readCase';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { createProgress } from '../progress';
import { advanceInChunks } from '../advanceInChunks';
import { runSummary } from '../report';
import { prettyJson } from '../prettyJson';
import type { CommandIO } from './io';
import { sampleSetOf } from '../../engine/run/simulationSamples';

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

/** --target, --max-steps, --max-seconds → the pool's stopping options (undefined when none is given). */
function stoppingOptions(
  values: { target?: string; 'max-steps'?: string; 'max-seconds'?: string },
  plan: Plan,
): StoppingOptions | undefined {
  if (values.target === undefined && values['max-steps'] === undefined && values['max-seconds'] === undefined)
    return undefined;
  const knownPaths = targetPathsOf(plan);
  let target;
  try {
    target = values.target === undefined ? undefined : parseTarget(values.target, knownPaths);
  } catch (e) {
    throw new UsageError(`--target: ${(e as Error).message}`, RUN_USAGE);
  }
  const positive = (name: string, text: string | undefined, integer: boolean): number | undefined => {
    if (text === undefined) return undefined;
    const v = Number(text);
    if (!Number.isFinite(v) || v <= 0 || (integer && !Number.isInteger(v)))
      throw new UsageError(`--${name} ${text}: give a ${integer ? 'whole ' : ''}number above 0`, RUN_USAGE);
    return v;
  };
  const maxSteps = positive('max-steps', values['max-steps'], true);
  // With a target and no step budget, allow up to 50 times the planned sampling (a safety cap, documented in --help).
  const maxSampleSteps = maxSteps ?? (target ? 50 * plan.sampleSteps : undefined);
  return { target, maxSeconds: positive('max-seconds', values['max-seconds'], false), maxSampleSteps };
}

function parseCheckpointEvery(text: string): number {
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1)
    throw new UsageError(`--checkpoint-every ${text}: give a whole number of steps, at least 1`, RUN_USAGE);
  return n;
}

function readCheckpoint(path: string): { sim: Simulation } {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch (e) {
    throw new CliError(
      `--resume ${path}: cannot read it (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`,
    );
  }
  try {
    return decodeCheckpoint(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
  } catch (e) {
    throw new CliError(`--resume ${path}: ${(e as Error).message}`);
  }
}

function parseReplicasOption(text: string): number {
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1 || n > 256)
    throw new UsageError(
      `--replicas ${text}: give a whole number from 1 to 256 (one per core is the useful maximum)`,
      RUN_USAGE,
    );
  return n;
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
        replicas: { type: 'string', short: 'r' },
        'save-samples': { type: 'string' },
        target: { type: 'string' },
        'max-steps': { type: 'string' },
        'max-seconds': { type: 'string' },
        checkpoint: { type: 'string' },
        'checkpoint-every': { type: 'string' },
        resume: { type: 'string' },
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
  const resumed = values.resume === undefined ? undefined : readCheckpoint(values.resume);
  if (resumed ? positionals.length > 1 : positionals.length !== 1)
    throw new UsageError('run needs exactly one case file (none with --resume)', RUN_USAGE);
  if (!values.out) throw new UsageError('run needs an output folder: --out DIR', RUN_USAGE);
  const outDir = values.out;
  const quiet = values.quiet === true;
  if (resumed && values.seed !== undefined)
    throw new UsageError('--seed cannot change a resumed run: its random stream is in the checkpoint', RUN_USAGE);

  const seed = values.seed === undefined ? undefined : parseSeedOption(values.seed);
  const { caseData, plan } = resumed
    ? { caseData: resumed.sim.plan.caseData, plan: resumed.sim.plan }
    : loadCase(positionals[0], { seed });
  checkOutputDir(outDir);
  for (const w of plan.warnings) io.stderr.write(`warning: ${w}\n`);

  const replicas = values.replicas === undefined ? 1 : parseReplicasOption(values.replicas);
  const stopping = stoppingOptions(values, plan);
  const checkpointPath = values.checkpoint;
  if ((checkpointPath || resumed) && (replicas > 1 || stopping)) {
    throw new UsageError(
      "--checkpoint and --resume work with a single replica and the case's own step count (no --replicas, --target, --max-steps or --max-seconds)",
      RUN_USAGE,
    );
  }
  const checkpointEvery =
    values['checkpoint-every'] === undefined ? undefined : parseCheckpointEvery(values['checkpoint-every']);
  const savePath = values['save-samples'];
  const progress = quiet
    ? undefined
    : createProgress({
        stream: io.stderr,
        totalSteps: plan.transientSteps + (stopping?.maxSampleSteps ?? plan.sampleSteps),
        transientSteps: plan.transientSteps,
      });
  const interrupt = watchInterrupt();
  let samples: SampleSet | null;
  let wallSeconds: number;
  let particleSteps: number;
  let interrupted: boolean;
  const extraFiles: Record<string, string> = {};
  const lostWarnings: string[] = [];
  let stopNote: string | null = null;
  try {
    if (replicas === 1 && !stopping) {
      const sim = resumed ? resumed.sim : createSimulation(plan);
      const total = plan.transientSteps + plan.sampleSteps;
      // Default interval: about every twentieth of the run.
      const every = checkpointEvery ?? Math.max(1, Math.ceil(total / 20));
      let nextCheckpoint = sim.state.step + every;
      const saveCheckpoint = () => writeBinaryAtomically(checkpointPath!, encodeCheckpoint(sim, 0));
      const outcome = await advanceInChunks(sim, {
        onProgress: (d) => {
          progress?.setTotals(
            sim.state.step + stepsRemaining(sim),
            Number.isFinite(sim.transientEndStep) ? sim.transientEndStep : Infinity,
          );
          progress?.update(d);
          if (checkpointPath && d >= nextCheckpoint && d < total) {
            saveCheckpoint();
            nextCheckpoint = d + every;
          }
        },
        shouldStop: () => interrupt.interrupted,
        breakEvery: checkpointPath ? every : undefined,
      });
      if (!outcome.completed) {
        progress?.clear();
        if (checkpointPath) {
          saveCheckpoint();
          io.stderr.write(
            `checkpoint written to ${checkpointPath}; continue with tenuis run --resume ${checkpointPath} --out ${outDir}\n`,
          );
        }
        if (sim.sampledSteps === 0) {
          io.stderr.write(
            `interrupted at step ${outcome.stepsDone}, still in the transient: nothing was sampled, nothing was written\n`,
          );
          return EXIT_INTERRUPTED;
        }
        io.stderr.write(
          `interrupted at step ${outcome.stepsDone}: writing the ${sim.sampledSteps} steps sampled so far\n`,
        );
      } else progress?.finish(outcome.stepsDone);
      samples = sampleSetOf(sim);
      wallSeconds = outcome.wallSeconds;
      particleSteps = sim.state.particleSteps;
      interrupted = !outcome.completed;
    } else {
      const outcome = await runReplicas(caseData, replicas, {
        progress,
        isInterrupted: () => interrupt.interrupted,
        stopping,
      });
      progress?.finish(Math.round(outcome.replicas.reduce((sum, r) => sum + r.stepsDone, 0) / outcome.replicas.length));
      samples = outcome.merged;
      wallSeconds = outcome.wallSeconds;
      particleSteps = outcome.particleSteps;
      interrupted = outcome.cancelled;
      if (outcome.stoppedBy) stopNote = `stopped: ${outcome.stoppedBy}`;
      extraFiles['replicas.json'] =
        `${prettyJson({ replicas: outcome.replicas.map((r) => replicaReportJson(r, caseData.name)) })}\n`;
      for (const r of outcome.replicas) {
        if (r.status === 'lost') {
          lostWarnings.push(
            `replica ${r.stream} was lost (${r.reason}); ${r.samples ? `its ${r.samples.counters.sampledSteps} sampled steps up to its last snapshot are included` : 'it had sampled nothing that could be kept'}`,
          );
        }
      }
      if (!samples)
        throw new CliError(
          `no replica sampled anything:\n${outcome.replicas.map((r) => `  replica ${r.stream}: ${r.status}${r.reason ? ` (${r.reason})` : ''}`).join('\n')}`,
        );
    }
  } finally {
    interrupt.dispose();
  }

  const result = summarizeSamples(samples);
  result.warnings.push(...lostWarnings);
  if (interrupted)
    result.warnings.push(
      `interrupted by the user: the result holds the ${samples.counters.sampledSteps} steps sampled until then`,
    );
  const performance: Performance = {
    wallSeconds,
    particleSteps,
    particleStepsPerSecond: wallSeconds > 0 ? particleSteps / wallSeconds : NaN,
  };
  const files = {
    ...resultFiles(result, { performance, caseName: caseData.name, plan: samples.plan }),
    'case.json': `${prettyJson(caseData)}\n`,
    ...extraFiles,
  };
  writeResultsAtomically(outDir, files);
  if (savePath) writeBinaryAtomically(savePath, encodeSampleSet(samples));
  for (const w of result.warnings) if (!plan.warnings.includes(w)) io.stderr.write(`warning: ${w}\n`);
  if (stopNote && !quiet) io.stderr.write(`${stopNote}\n`);
  if (!quiet) io.stderr.write(`${runSummary(result, performance, outDir)}\n`);
  if (interrupted) return EXIT_INTERRUPTED;
  return EXIT_OK;
}
