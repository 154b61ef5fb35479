/**
 * `tenuis run CASE.json --out DIR`: validate and plan (refusing bad input before anything starts or is created),
 * run the case through the run pipeline (cli/runOnCommandLine.ts → workers/runCase.ts) with a progress line, then
 * summarise and write all result files at once. Its usage text sits beside its options, as for every command.
 */
import { readFileSync } from 'node:fs';
import type { Simulation } from '../../engine/run/simulation';
import { decodeCheckpoint } from '../../engine/io/checkpoint';
import { summarizeSamples } from '../../engine/results/summarize';
import { encodeSampleSet } from '../../engine/io/sampleFile';
import { runOnCommandLine, replicaReportJson, replicaStatusLines } from '../runOnCommandLine';
import type { StoppingRules } from '../../workers/runCase';
import { parseTarget } from '../../engine/stats/stopping';
import type { Plan } from '../../engine/plan/plan';
import { targetPathsOf } from '../../engine/results/targetQuantities';
import { writeBinaryAtomically } from '../writeResults';
import { CliError, EXIT_OK, EXIT_INTERRUPTED, type UsageError } from '../errors';
import type { Performance } from '../../engine/report/summaryJson';
import { resultFiles } from '../../engine/report/resultFiles';
import { continuumComparisonOf } from '../../engine/report/comparison';
import { loadCase, parseSeedOption } from '../readCase';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { createProgress } from '../progress';
import { runSummary } from '../report';
import { prettyJson } from '../prettyJson';
import { defineCommand } from '../command';
import { printable } from '../printable';
import { parseTimeCap, parseTolerance, sizedRunOf, withTolerance } from '../sizedRun';
import { sizingLines } from '../../engine/sizing/runSizing';
import { headlineDecision } from '../../engine/report/decision';
import type { SimulationResult } from '../../engine/results/summarize';

export const RUN_USAGE = `Usage:
  tenuis run CASE.json --out DIR [--seed N] [--replicas N] [--save-samples FILE]
             [--target Q=F | --target decide] [--max-steps N] [--max-seconds S] [--time-cap S]
             [--tolerance T] [--checkpoint FILE] [--quiet]
  tenuis run --resume FILE --out DIR [--checkpoint FILE] [--quiet]

Runs the case and writes summary.json, profiles.csv, fields.csv, surfaces.csv and case.json (the case as run,
complete and explicit) into DIR. The files appear only when the run has ended: an error leaves DIR as it was;
Ctrl-C stops the run and writes what was sampled so far (exit code 130).
A case that leaves sampling.sampleSteps unset is sized to decide: its sampling steps are chosen so that the
headline quantity (a duct's flow rate, a wall's shear or heat flux) reaches ±1 % (95 %) within the time cap, and
case.json records them (tenuis check shows the sizing first). --target Q=F, --max-steps and --max-seconds run
exactly what they say instead.
  --out, -o DIR         output folder (created if needed; files of the same names in it are replaced)
  --seed N              random seed, overriding the case's
  --replicas, -r N      N independent replicas on N worker threads (one per core), merged into one result;
                        replicas.json lists each replica's status and its own wall estimates.
  --save-samples FILE   also write the raw batch sums as a sample file, for tenuis merge
  --target Q=F          stop when quantity Q's 95 % half-width is within fraction F of its mean, e.g.
                        walls.top.shearStress=0.01 (or =1%); the progress line shows the precision reached and the
                        estimated time to the target. Without --max-steps, sampling may run to 50 × the case's
                        sampleSteps per replica.
  --target decide       stop when decided: when every model's verdict on the headline quantity is adequate or not
                        adequate (none undecided); at most the sized sampling and the time cap
  --time-cap S          wall-clock cap of the sizing, seconds (default 300)
  --tolerance T         relative deviation a continuum model may have and still be adequate in the verdict, e.g.
                        0.05 or 5% (default the case's comparison.tolerance, else 2 %)
  --max-steps N         sampling steps per replica (overrides the case's sampleSteps)
  --max-seconds S       stop sampling after S seconds of wall time
  --checkpoint FILE     keep a checkpoint of the whole run in FILE (every --checkpoint-every N steps, by default
                        every twentieth of the run, and on Ctrl-C); single replica only
  --resume FILE         continue a checkpointed run (no case file): the result is exactly that of an
                        uninterrupted run
  --quiet, -q           no progress line and no summary (warnings and errors are still printed)`;

const RUN_OPTIONS = {
  out: { type: 'string', short: 'o' },
  seed: { type: 'string' },
  replicas: { type: 'string', short: 'r' },
  'save-samples': { type: 'string' },
  target: { type: 'string' },
  'max-steps': { type: 'string' },
  'max-seconds': { type: 'string' },
  'time-cap': { type: 'string' },
  tolerance: { type: 'string' },
  checkpoint: { type: 'string' },
  'checkpoint-every': { type: 'string' },
  resume: { type: 'string' },
  quiet: { type: 'boolean', short: 'q' },
} as const;

type UsageErrorOf = (message: string) => UsageError;

/** --target, --max-steps, --max-seconds → the pipeline's stopping rules (undefined when none is given). */
function stoppingRules(
  values: { target?: string; 'max-steps'?: string; 'max-seconds'?: string },
  plan: Plan,
  usage: UsageErrorOf,
  decide: DecideRule | undefined,
): StoppingRules | undefined {
  if (values.target === undefined && values['max-steps'] === undefined && values['max-seconds'] === undefined)
    return undefined;
  const knownPaths = targetPathsOf(plan);
  let target;
  try {
    target =
      values.target === undefined || values.target === 'decide' ? undefined : parseTarget(values.target, knownPaths);
  } catch (e) {
    throw usage(`--target: ${(e as Error).message} (or --target decide)`);
  }
  const positive = (name: string, text: string | undefined, integer: boolean): number | undefined => {
    if (text === undefined) return undefined;
    const v = Number(text);
    if (!Number.isFinite(v) || v <= 0 || (integer && !Number.isInteger(v)))
      throw usage(`--${name} ${text}: give a ${integer ? 'whole ' : ''}number above 0`);
    return v;
  };
  const maxSteps = positive('max-steps', values['max-steps'], true);
  const maxSeconds = positive('max-seconds', values['max-seconds'], false);
  if (decide)
    return {
      decided: decide.decided,
      maxSampleSteps: maxSteps ?? decide.maxSampleSteps,
      maxSeconds: maxSeconds ?? decide.capSeconds,
    };
  // With a target and no step budget, allow up to 50 times the planned sampling (a safety cap, documented in --help).
  const maxSampleSteps = maxSteps ?? (target ? 50 * plan.sampleSteps : undefined);
  return { target, maxSeconds, maxSampleSteps };
}

interface DecideRule {
  readonly decided: (result: SimulationResult) => string | null;
  readonly maxSampleSteps: number;
  readonly capSeconds: number;
}

/** `--target decide`: stop once no model's verdict on the headline quantity is undecided (report/decision.ts). */
function decideRule(plan: Plan, maxSampleSteps: number, capSeconds: number): DecideRule {
  return { maxSampleSteps, capSeconds, decided: (result) => headlineDecision(plan, result) };
}

function parseCheckpointEvery(text: string, usage: UsageErrorOf): number {
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1)
    throw usage(`--checkpoint-every ${text}: give a whole number of steps, at least 1`);
  return n;
}

/** A checkpoint read from disk: validated here, where it enters, and not again. */
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

function parseReplicasOption(text: string, usage: UsageErrorOf): number {
  const n = Number(text);
  if (!Number.isInteger(n) || n < 1 || n > 256)
    throw usage(`--replicas ${text}: give a whole number from 1 to 256 (one per core is the useful maximum)`);
  return n;
}

export const runCommand = defineCommand({
  name: 'run',
  summary: `  tenuis run CASE.json --out DIR [--seed N] [--replicas N] [--save-samples FILE] [--quiet]
                                             run a case and write the results into DIR`,
  usage: RUN_USAGE,
  options: RUN_OPTIONS,
  async run({ values, positionals }, { io, usageError: usage, watchInterrupt }) {
    const resumed = values.resume === undefined ? undefined : readCheckpoint(values.resume);
    if (resumed ? positionals.length > 1 : positionals.length !== 1)
      throw usage('run needs exactly one case file (none with --resume)');
    if (!values.out) throw usage('run needs an output folder: --out DIR');
    const outDir = values.out;
    const quiet = values.quiet === true;
    if (resumed && values.seed !== undefined)
      throw usage('--seed cannot change a resumed run: its random stream is in the checkpoint');

    const seed = values.seed === undefined ? undefined : parseSeedOption(values.seed);
    const replicas = values.replicas === undefined ? 1 : parseReplicasOption(values.replicas, usage);
    const capSeconds = parseTimeCap(values['time-cap'], usage);
    if (resumed && values.tolerance !== undefined)
      throw usage('--tolerance cannot change a resumed run: its case is in the checkpoint');
    const read = resumed
      ? { caseData: resumed.sim.plan.caseData, plan: resumed.sim.plan }
      : loadCase(positionals[0], { seed });
    const loaded = values.tolerance === undefined ? read : withTolerance(read, parseTolerance(values.tolerance, usage));
    const decide = values.target === 'decide';
    const ownBudget =
      (values.target !== undefined && !decide) ||
      values['max-steps'] !== undefined ||
      values['max-seconds'] !== undefined;
    // A resumed run keeps the sampling its checkpoint holds; a run with a budget of its own runs exactly that.
    const { caseData, plan, sizing } = resumed
      ? { ...loaded, sizing: null }
      : sizedRunOf(loaded.caseData, loaded.plan, { replicas, capSeconds, apply: !ownBudget });
    checkOutputDir(outDir);
    for (const w of plan.warnings) io.stderr.write(`warning: ${printable(w)}\n`);
    if (sizing?.sized && sizing.applied && !quiet)
      io.stderr.write(
        `run sizing:\n${sizingLines(sizing)
          .map((l) => `  ${l}`)
          .join('\n')}\n`,
      );

    const stopping = stoppingRules(
      values,
      plan,
      usage,
      decide ? decideRule(plan, plan.sampleSteps, capSeconds) : undefined,
    );
    const checkpointPath = values.checkpoint;
    if ((checkpointPath || resumed) && (replicas > 1 || stopping)) {
      throw usage(
        "--checkpoint and --resume work with a single replica and the case's own step count (no --replicas, --target, --max-steps or --max-seconds)",
      );
    }
    const checkpointEvery =
      values['checkpoint-every'] === undefined ? undefined : parseCheckpointEvery(values['checkpoint-every'], usage);
    const savePath = values['save-samples'];
    const progress = quiet
      ? undefined
      : createProgress({
          stream: io.stderr,
          totalSteps: plan.transientSteps + (stopping?.maxSampleSteps ?? plan.sampleSteps),
          transientSteps: plan.transientSteps,
        });
    const interrupt = watchInterrupt();
    const extraFiles: Record<string, string> = {};
    let run;
    try {
      run = await runOnCommandLine(plan, {
        replicas,
        stopping,
        resumed: resumed?.sim,
        checkpoint: checkpointPath
          ? { everySteps: checkpointEvery, write: (bytes) => writeBinaryAtomically(checkpointPath, bytes) }
          : undefined,
        progress,
        interrupt,
      });
    } finally {
      interrupt.dispose();
    }
    const samples = run.merged;
    const interrupted = run.cancelled;
    if (run.onThisThread) {
      if (interrupted) {
        if (checkpointPath)
          io.stderr.write(
            `checkpoint written to ${checkpointPath}; continue with tenuis run --resume ${checkpointPath} --out ${outDir}\n`,
          );
        if (!samples) {
          io.stderr.write(
            `interrupted at step ${run.replicas[0].stepsDone}, still in the transient: nothing was sampled, nothing was written\n`,
          );
          return EXIT_INTERRUPTED;
        }
        io.stderr.write(
          `interrupted at step ${run.replicas[0].stepsDone}: writing the ${samples.counters.sampledSteps} steps sampled so far\n`,
        );
      }
    } else {
      extraFiles['replicas.json'] =
        `${prettyJson({ replicas: run.replicas.map((r) => replicaReportJson(r, caseData.name)) })}\n`;
    }
    if (!samples) throw new CliError(`no replica sampled anything:\n${replicaStatusLines(run.replicas)}`);
    const stopNote = run.stoppedBy ? `stopped: ${run.stoppedBy}` : null;

    const result = summarizeSamples(samples);
    result.warnings.push(...run.lostWarnings);
    if (interrupted)
      result.warnings.push(
        `interrupted by the user: the result holds the ${samples.counters.sampledSteps} steps sampled until then`,
      );
    const { wallSeconds, particleSteps } = run;
    const performance: Performance = {
      wallSeconds,
      particleSteps,
      particleStepsPerSecond: wallSeconds > 0 ? particleSteps / wallSeconds : NaN,
    };
    const comparison = continuumComparisonOf(samples.plan, result);
    const files = {
      ...resultFiles(result, { performance, caseName: caseData.name, comparison }),
      'case.json': `${prettyJson(caseData)}\n`,
      ...extraFiles,
    };
    writeResultsAtomically(outDir, files);
    if (savePath) writeBinaryAtomically(savePath, encodeSampleSet(samples));
    for (const w of result.warnings) if (!plan.warnings.includes(w)) io.stderr.write(`warning: ${printable(w)}\n`);
    if (stopNote && !quiet) io.stderr.write(`${stopNote}\n`);
    if (!quiet) io.stderr.write(`${runSummary(result, performance, outDir, comparison)}\n`);
    if (interrupted) return EXIT_INTERRUPTED;
    return EXIT_OK;
  },
});
