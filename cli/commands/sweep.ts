/**
 * `tenuis sweep CASE.json --param knudsen --from A --to B --points N [--log] --out DIR`: the case over a range of
 * Knudsen numbers or pressures (engine/case/sweep.ts says what a point is). Every option is checked and every point
 * planned before anything runs or is written; then the points run one after the other, each written into
 * DIR/points/NNN/ as `tenuis run` writes its folder, and at the end DIR/sweep.csv and DIR/sweep.json. Ctrl-C stops
 * the running point, keeps what it sampled (as `tenuis run` does), writes the table of the points so far with that
 * point marked interrupted, and exits with 130. Each point runs through the run pipeline (cli/runOnCommandLine.ts →
 * workers/runCase.ts), as `tenuis run` does: a sweep is a loop over it.
 */
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
import { sweepRowOf } from '../../engine/report/sweepRow';
import { sweepJson } from '../../engine/report/sweepTable';
import { sweepCsv } from '../../engine/report/sweepTable';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { PlannedSweepPoint } from '../../engine/plan/sweepPoints';
import { planSweepPoints } from '../../engine/plan/sweepPoints';
import { flowPerDepth, hasFlowResult } from '../../engine/results/flowQuantities';
import { caseValueOf } from '../../engine/plan/sweepPoints';
import { parseQuantity } from '../../engine/units/engineeringUnits';
import type { SampleSet } from '../../engine/results/sampleSet';
import { summarizeSamples } from '../../engine/results/summarize';
import type { Performance } from '../../engine/report/summaryJson';
import { resultFiles } from '../../engine/report/resultFiles';
import { continuumComparisonOf } from '../../engine/report/comparison';
import { CliError, UsageError, EXIT_OK, EXIT_INTERRUPTED } from '../errors';
import type { CommandIO } from './io';
import { readJsonFile, parseSeedOption } from '../readCase';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { runOnCommandLine, replicaReportJson, replicaStatusLines } from '../runOnCommandLine';
import { createProgress, type Progress } from '../progress';
import { sig, duration } from '../format';
import { prettyJson } from '../prettyJson';
import { defineCommand, type Interrupt, type ParsedArgs } from '../command';
import { parseTimeCap, sizedRunOf } from '../sizedRun';

export const SWEEP_USAGE = `Usage:
  tenuis sweep CASE.json --param knudsen|pressure --from A --to B --points N [--log] --out DIR
               [--replicas R] [--seed S] [--time-cap S] [--quiet]

Runs the case at N values of a parameter from A to B and writes DIR/sweep.csv (per point: the swept value, the
reference Knudsen number, rarefaction δ and pressure, and every flow quantity with its 95 % half-width — or, for
cases without flow sections, each wall's shear stress and heat flux; units in every header), DIR/sweep.json (every
point's summary) and each point's full result in DIR/points/NNN/ (as tenuis run writes it). A point changes only the
pressures: all of them are scaled by the same factor (Kn ∝ 1/p at fixed temperature and geometry), so pressure
ratios are kept. Cells and time step the case leaves unset are planned again for each point; those it fixes are kept
(the planner's warnings then say when cells grow beyond the mean free path). Every point is planned before anything
runs; Ctrl-C stops the running point, keeps what it sampled and writes the table so far, marked interrupted (exit 130).
  --param knudsen|pressure  knudsen: the case's reference Knudsen number; pressure: its reference (initial) pressure
  --from A, --to B          the ends of the range, above 0; pressures may carry a unit (10Pa, 0.1mbar, 1Torr)
  --points N                a whole number from 1 to 999 (1: just A)
  --log                     geometric spacing (equal ratios) instead of equal steps
  --out, -o DIR             output folder (created if needed; files of the same names in it are replaced)
  --replicas, -r R          R replicas per point on R worker threads, merged (as tenuis run --replicas)
  --seed S                  random seed of every point, overriding the case's
  --time-cap S              wall-clock cap of the whole sweep's sizing, seconds (default 300), shared equally by
                            the points: a case that leaves sampling.sampleSteps unset is sized point by point for
                            ±1 % on its headline quantity within its share (as tenuis run sizes one run)
  --quiet, -q               no progress lines (warnings and errors are still printed)`;

const SWEEP_OPTIONS = {
  param: { type: 'string' },
  from: { type: 'string' },
  to: { type: 'string' },
  points: { type: 'string' },
  log: { type: 'boolean' },
  out: { type: 'string', short: 'o' },
  replicas: { type: 'string', short: 'r' },
  seed: { type: 'string' },
  'time-cap': { type: 'string' },
  quiet: { type: 'boolean', short: 'q' },
} as const;

export interface SweepOptions {
  readonly casePath: string;
  readonly parameter: SweepParameter;
  readonly from: number;
  readonly to: number;
  readonly points: number;
  readonly spacing: SweepSpacing;
  readonly outDir: string;
  readonly replicas: number;
  readonly seed: number | undefined;
  readonly capSeconds: number;
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

function sweepOptionsOf(parsed: ParsedArgs<typeof SWEEP_OPTIONS>): SweepOptions {
  const { values: v, positionals } = parsed;
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
    capSeconds: parseTimeCap(v['time-cap'], usage),
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
  // Each point sized for its headline within an equal share of the sweep's cap (cli/sizedRun.ts).
  const capSeconds = o.capSeconds / planned.points.length;
  const points = planned.points.map((p) => {
    const sized = sizedRunOf(p.caseData, p.plan, { replicas: o.replicas, capSeconds, apply: true });
    return { ...p, caseData: sized.caseData, plan: sized.plan };
  });
  return { caseName: parsed.value.name, points };
}

/** Runs one point through the run pipeline to its end or until Ctrl-C: in this thread for one replica, on worker threads for more. */
async function runPoint(
  p: PlannedPoint,
  replicas: number,
  interrupt: Interrupt,
  progress: Progress | undefined,
): Promise<PointRun> {
  const run = await runOnCommandLine(p.plan, { replicas, progress, interrupt });
  if (!run.onThisThread && !run.merged && !run.cancelled)
    throw new CliError(`point ${p.point}: no replica sampled anything:\n${replicaStatusLines(run.replicas)}`);
  const { wallSeconds, particleSteps } = run;
  return {
    samples: run.merged,
    interrupted: run.cancelled,
    performance: {
      wallSeconds,
      particleSteps,
      particleStepsPerSecond: wallSeconds > 0 ? particleSteps / wallSeconds : NaN,
    },
    extraFiles: run.onThisThread
      ? {}
      : {
          'replicas.json': `${prettyJson({ replicas: run.replicas.map((r) => replicaReportJson(r, p.caseData.name)) })}\n`,
        },
    warnings: [...run.lostWarnings],
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

/** Planned work of a point (particles × steps), to share the sweep's remaining time out among the points left. */
const plannedWork = (p: Plan) => p.initialParticles * (p.transientSteps + p.sampleSteps);

/** Runs a sweep and writes its folder (see SWEEP_USAGE); also the engine of `tenuis coefficients`. */
export async function sweep(o: SweepOptions, io: CommandIO, interruptWatch: () => Interrupt): Promise<number> {
  const { caseName, points } = planPoints(o);
  checkOutputDir(o.outDir);
  const table = {
    parameter: o.parameter,
    planar: flowPerDepth(points[0].plan),
    hasFlow: hasFlowResult(points[0].plan),
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
  const interrupt = interruptWatch();
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
        run = await runPoint(p, o.replicas, interrupt, progress);
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

export const sweepCommand = defineCommand({
  name: 'sweep',
  summary: `  tenuis sweep CASE.json --param knudsen --from A --to B --points N [--log] --out DIR
                                             run a case over a range of Knudsen numbers or pressures`,
  usage: SWEEP_USAGE,
  options: SWEEP_OPTIONS,
  run: (parsed, { io, watchInterrupt }) => sweep(sweepOptionsOf(parsed), io, watchInterrupt),
});
