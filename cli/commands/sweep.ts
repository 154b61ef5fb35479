/**
 * `tenuis sweep CASE.json --param knudsen --from A --to B --points N [--log] --out DIR`: the case over a range of
 * Knudsen numbers or pressures (engine/case/sweep.ts says what a point is). Every option is checked and every point
 * planned before anything runs or is written; then the points run one after the other, each written into
 * DIR/points/NNN/ as `tenuis run` writes its folder, and at the end DIR/sweep.csv and DIR/sweep.json. Ctrl-C stops
 * the running point, keeps what it sampled (as `tenuis run` does), writes the table of the points so far with that
 * point marked interrupted, and exits with 130.
 */
import { parseArgs } from 'node:util';
import { join } from 'node:path';
import { parseCase } from '../../engine/case/schema';
import type { Plan } from '../../engine/plan/plan';
import {
  SWEEP_PARAMETERS,
  SWEEP_PARAMETER_UNITS,
  sweepValues,
  sweepPointFolder,
  type SweepParameter,
  type SweepSpacing,
} from '../../engine/case/sweep';
import { caseValueOf, planSweepPoints, type PlannedSweepPoint } from '../../engine/plan/sweepPoints';
import { sweepCsv, sweepJson } from '../../engine/report/sweepTable';
import { sweepRowOf, type SweepRow } from '../../engine/report/sweepRow';
import { parseQuantity } from '../../engine/units/engineeringUnits';
import { createSimulation, stepsRemaining } from '../../engine/run/simulation';
import type { SampleSet } from '../../engine/results/sampleSet';
import { summarizeSamples } from '../../engine/results/summarize';
import { resultFiles } from '../../engine/report/resultFiles';
import type { Performance } from '../../engine/report/summaryJson';
import { continuumComparisonOf } from '../../engine/report/comparison';
import { CliError, UsageError, EXIT_OK, EXIT_INTERRUPTED } from '../errors';
import { SWEEP_USAGE } from '../usage';
import { readJsonFile, parseSeedOption } from '../readCase';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { runReplicas, replicaReportJson } from '../runReplicas';
import { advanceInChunks } from '../advanceInChunks';
import { createProgress, type Progress } from '../progress';
import { sig, duration } from '../format';
import { prettyJson } from '../prettyJson';
import type { CommandIO } from './io';
import { sampleSetOf } from '../../engine/run/simulationSamples';

interface SweepOptions {
  readonly casePath: string;
  readonly parameter: SweepParameter;
  readonly from: number;
  readonly to: number;
  readonly points: number;
  readonly spacing: SweepSpacing;
  readonly outDir: string;
  readonly replicas: number;
  readonly seed: number | undefined;
  readonly quiet: boolean;
}

type PlannedPoint = PlannedSweepPoint;

/** What one point's run gave: its samples (null if nothing was sampled) and what goes with them. */
interface PointRun {
  readonly samples: SampleSet | null;
  readonly interrupted: boolean;
  readonly performance: Performance;
  readonly extraFiles: Record<string, string>;
  readonly warnings: string[];
}

const usage = (message: string) => new UsageError(message, SWEEP_USAGE);

/** --from / --to: a positive number, with a unit for pressures (10Pa, 0.1mbar). */
function parseEnd(option: string, text: string | undefined, parameter: SweepParameter): number {
  if (text === undefined)
    throw usage(`sweep needs --${option}: the ${option === 'from' ? 'first' : 'last'} ${parameter} of the range`);
  const { kind, unit } = SWEEP_PARAMETER_UNITS[parameter];
  let value: number;
  try {
    value = parseQuantity(text, kind);
  } catch (e) {
    throw usage(`--${option} ${text}: ${(e as Error).message}`);
  }
  if (!(value > 0))
    throw usage(
      `--${option} ${text}: give a ${parameter} above 0${unit === '1' ? '' : ` (${unit}, or with a unit such as 10Pa or 0.1mbar)`}`,
    );
  return value;
}

function parseSweepArgs(args: string[]): SweepOptions | 'help' {
  let parsed;
  try {
    parsed = parseArgs({
      args,
      allowPositionals: true,
      options: {
        param: { type: 'string' },
        from: { type: 'string' },
        to: { type: 'string' },
        points: { type: 'string' },
        log: { type: 'boolean' },
        out: { type: 'string', short: 'o' },
        replicas: { type: 'string', short: 'r' },
        seed: { type: 'string' },
        quiet: { type: 'boolean', short: 'q' },
        help: { type: 'boolean', short: 'h' },
      },
    });
  } catch (e) {
    throw usage((e as Error).message);
  }
  const { values: v, positionals } = parsed;
  if (v.help) return 'help';
  if (positionals.length !== 1)
    throw usage(`sweep needs exactly one case file${positionals.length ? `, not ${positionals.length}` : ''}`);
  if (v.param === undefined) throw usage(`sweep needs --param: one of ${SWEEP_PARAMETERS.join(', ')}`);
  if (!(SWEEP_PARAMETERS as readonly string[]).includes(v.param))
    throw usage(`--param ${v.param}: give one of ${SWEEP_PARAMETERS.join(', ')}`);
  const parameter = v.param as SweepParameter;
  const from = parseEnd('from', v.from, parameter);
  const to = parseEnd('to', v.to, parameter);
  if (v.points === undefined) throw usage('sweep needs --points: how many points from --from to --to');
  const points = Number(v.points);
  if (!/^\s*\d+\s*$/.test(v.points) || points < 1 || points > 999)
    throw usage(`--points ${v.points}: give a whole number from 1 to 999`);
  if (points > 1 && from === to)
    throw usage(`--from and --to are both ${v.from}: give two different ends, or --points 1`);
  if (!v.out) throw usage('sweep needs an output folder: --out DIR');
  let replicas = 1;
  if (v.replicas !== undefined) {
    replicas = Number(v.replicas);
    if (!Number.isInteger(replicas) || replicas < 1 || replicas > 256)
      throw usage(`--replicas ${v.replicas}: give a whole number from 1 to 256 (one per core is the useful maximum)`);
  }
  const seed = v.seed === undefined ? undefined : parseSeedOption(v.seed);
  return {
    casePath: positionals[0],
    parameter,
    from,
    to,
    points,
    spacing: v.log ? 'log' : 'linear',
    outDir: v.out,
    replicas,
    seed,
    quiet: v.quiet === true,
  };
}

/** The value as people read it: 6 significant digits and the unit. */
function shown(parameter: SweepParameter, value: number): string {
  const unit = SWEEP_PARAMETER_UNITS[parameter].unit;
  return `${sig(value, 6)}${unit === '1' ? '' : ` ${unit}`}`;
}

/** Reads and validates the case (--seed applied), then plans every point; refuses the first point that cannot run. */
function planPoints(o: SweepOptions): { caseName: string; points: PlannedPoint[] } {
  const raw = readJsonFile(o.casePath);
  const input =
    o.seed !== undefined && raw !== null && typeof raw === 'object' && !Array.isArray(raw)
      ? { ...raw, seed: o.seed }
      : raw;
  const parsed = parseCase(input);
  if (!parsed.ok)
    throw new CliError(`${o.casePath} is not a valid case:\n${parsed.errors.map((m) => `  ${m}`).join('\n')}`);
  try {
    caseValueOf(parsed.value, o.parameter);
  } catch (e) {
    throw new CliError(`${o.casePath} cannot run as set up:\n  gas: ${(e as Error).message}`);
  }
  const planned = planSweepPoints(parsed.value, o.parameter, sweepValues(o.from, o.to, o.points, o.spacing));
  if (!planned.ok) {
    throw new CliError(
      `point ${planned.point} of ${o.points} (${o.parameter} = ${shown(o.parameter, planned.value)}) cannot run as set up:\n${planned.errors.map((m) => `  ${m}`).join('\n')}`,
    );
  }
  const { points } = planned;
  return { caseName: parsed.value.name, points };
}

/** Runs one point to its end or until interrupted(): in this thread for one replica, on worker threads for more. */
async function runPoint(
  p: PlannedPoint,
  replicas: number,
  interrupted: () => boolean,
  progress: Progress | undefined,
): Promise<PointRun> {
  const warnings: string[] = [];
  if (replicas === 1) {
    const sim = createSimulation(p.plan);
    const outcome = await advanceInChunks(sim, {
      onProgress: (d) => {
        progress?.setTotals(
          sim.state.step + stepsRemaining(sim),
          Number.isFinite(sim.transientEndStep) ? sim.transientEndStep : Infinity,
        );
        progress?.update(d);
      },
      shouldStop: interrupted,
    });
    if (outcome.completed) progress?.finish(outcome.stepsDone);
    else progress?.clear();
    const particleSteps = sim.state.particleSteps;
    return {
      samples: sim.sampledSteps > 0 ? sampleSetOf(sim) : null,
      interrupted: !outcome.completed,
      performance: {
        wallSeconds: outcome.wallSeconds,
        particleSteps,
        particleStepsPerSecond: outcome.wallSeconds > 0 ? particleSteps / outcome.wallSeconds : NaN,
      },
      extraFiles: {},
      warnings,
    };
  }
  const outcome = await runReplicas(p.caseData, replicas, { progress, isInterrupted: interrupted });
  progress?.finish(Math.round(outcome.replicas.reduce((sum, r) => sum + r.stepsDone, 0) / outcome.replicas.length));
  for (const r of outcome.replicas) {
    if (r.status === 'lost')
      warnings.push(
        `replica ${r.stream} was lost (${r.reason}); ${r.samples ? `its ${r.samples.counters.sampledSteps} sampled steps up to its last snapshot are included` : 'it had sampled nothing that could be kept'}`,
      );
  }
  if (!outcome.merged && !outcome.cancelled) {
    throw new CliError(
      `point ${p.point}: no replica sampled anything:\n${outcome.replicas.map((r) => `  replica ${r.stream}: ${r.status}${r.reason ? ` (${r.reason})` : ''}`).join('\n')}`,
    );
  }
  const { wallSeconds, particleSteps } = outcome;
  return {
    samples: outcome.merged,
    interrupted: outcome.cancelled,
    performance: {
      wallSeconds,
      particleSteps,
      particleStepsPerSecond: wallSeconds > 0 ? particleSteps / wallSeconds : NaN,
    },
    extraFiles: {
      'replicas.json': `${prettyJson({ replicas: outcome.replicas.map((r) => replicaReportJson(r, p.caseData.name)) })}\n`,
    },
    warnings,
  };
}

/**
 * Summarises a point's samples, writes its folder as `tenuis run` would and returns its row of the table (the
 * engine's sweepRowOf, which the browser's sweep uses too).
 */
function writePoint(
  outDir: string,
  p: PlannedPoint,
  run: PointRun & { samples: SampleSet },
): { row: SweepRow; warnings: string[] } {
  const result = summarizeSamples(run.samples);
  result.warnings.push(...run.warnings);
  if (run.interrupted)
    result.warnings.push(
      `interrupted by the user: the result holds the ${run.samples.counters.sampledSteps} steps sampled until then`,
    );
  const comparison = continuumComparisonOf(run.samples.plan, result);
  const files = resultFiles(result, { performance: run.performance, caseName: p.caseData.name, comparison });
  writeResultsAtomically(join(outDir, sweepPointFolder(p.point)), {
    ...files,
    'case.json': `${prettyJson(p.caseData)}\n`,
    ...run.extraFiles,
  });
  // The row's summary is summary.json's very text parsed back (sweepPointSummary), so the table cannot differ from it.
  const row = sweepRowOf(p.point, p.value, {
    kind: 'sampled',
    result,
    comparison,
    performance: run.performance,
    caseName: p.caseData.name,
    interrupted: run.interrupted,
  });
  return { row, warnings: result.warnings.filter((w) => !p.plan.warnings.includes(w)) };
}

/** Sets a flag on the first Ctrl-C; a second Ctrl-C ends the process at once (the default action). */
function watchInterrupt(): { readonly interrupted: () => boolean; dispose(): void } {
  let flag = false;
  const onSigint = () => {
    flag = true;
  };
  process.once('SIGINT', onSigint);
  return { interrupted: () => flag, dispose: () => process.removeListener('SIGINT', onSigint) };
}

/** Planned work of a point (particles × steps), to share the sweep's remaining time out among the points left. */
const plannedWork = (p: Plan) => p.initialParticles * (p.transientSteps + p.sampleSteps);

export async function sweepCommand(args: string[], io: CommandIO): Promise<number> {
  const o = parseSweepArgs(args);
  if (o === 'help') {
    io.stdout.write(`${SWEEP_USAGE}\n`);
    return EXIT_OK;
  }
  const { caseName, points } = planPoints(o);
  checkOutputDir(o.outDir);
  const base = points[0].caseData;
  const table = {
    parameter: o.parameter,
    planar: base.domain.geometry !== 'axisymmetric',
    hasFlow: base.flowSections.length > 0,
  };
  const rows: SweepRow[] = [];
  const writeTable = (interrupted: boolean) =>
    writeResultsAtomically(o.outDir, {
      'sweep.csv': sweepCsv(rows, table),
      'sweep.json': `${prettyJson(sweepJson(rows, { caseName, parameter: o.parameter, from: o.from, to: o.to, points: o.points, spacing: o.spacing, interrupted }))}\n`,
    });

  const start = performance.now();
  const totalWork = points.reduce((s, p) => s + plannedWork(p.plan), 0);
  let workDone = 0;
  const interrupt = watchInterrupt();
  try {
    for (const p of points) {
      const label = `point ${p.point}/${o.points}`;
      const other =
        o.parameter === 'knudsen'
          ? `pressure ${sig(p.plan.reference.pressurePa, 4)} Pa`
          : `knudsen ${sig(p.plan.reference.knudsen, 4)}`;
      if (!o.quiet)
        io.stderr.write(
          `${label}: ${o.parameter} = ${shown(o.parameter, p.value)} (${other}, ${p.plan.grid.cellsX} × ${p.plan.grid.cellsY} cells, ${p.plan.initialParticles} particles)\n`,
        );
      for (const w of p.plan.warnings) io.stderr.write(`${label}: warning: ${w}\n`);
      const progress = o.quiet
        ? undefined
        : createProgress({
            stream: io.stderr,
            totalSteps: p.plan.transientSteps + p.plan.sampleSteps,
            transientSteps: p.plan.transientSteps,
          });
      progress?.setNote(label);
      let run: PointRun;
      try {
        run = await runPoint(p, o.replicas, interrupt.interrupted, progress);
      } catch (e) {
        // Keep the table of the points already written; the failed one is marked as such.
        if (rows.some((r) => r.summary)) {
          rows.push(sweepRowOf(p.point, p.value, { kind: 'failed' }));
          writeTable(false);
        }
        throw e;
      }
      if (!run.samples) {
        io.stderr.write(`${label}: interrupted in the transient, nothing was sampled\n`);
        rows.push(sweepRowOf(p.point, p.value, { kind: 'nothingSampled' }));
      } else {
        const written = writePoint(o.outDir, p, { ...run, samples: run.samples });
        for (const w of written.warnings) io.stderr.write(`${label}: warning: ${w}\n`);
        rows.push(written.row);
      }
      if (run.interrupted) {
        const kept = rows.filter((r) => r.summary).length;
        if (kept === 0) {
          io.stderr.write('sweep interrupted before anything was sampled: nothing was written\n');
          return EXIT_INTERRUPTED;
        }
        writeTable(true);
        io.stderr.write(
          `sweep interrupted at ${label}: ${o.outDir}/sweep.csv holds the ${rows.length} point(s) run so far, the last one marked interrupted\n`,
        );
        return EXIT_INTERRUPTED;
      }
      workDone += plannedWork(p.plan);
      const elapsed = (performance.now() - start) / 1000;
      if (!o.quiet)
        io.stderr.write(
          `${label} done in ${duration(run.performance.wallSeconds)}; sweep elapsed ${duration(elapsed)}, remaining ~${duration((elapsed * (totalWork - workDone)) / workDone)}\n`,
        );
    }
  } finally {
    interrupt.dispose();
  }
  writeTable(false);
  if (!o.quiet)
    io.stderr.write(
      `sweep of ${o.points} point(s) finished in ${duration((performance.now() - start) / 1000)}: ${o.outDir}/sweep.csv, sweep.json and points/\n`,
    );
  return EXIT_OK;
}
