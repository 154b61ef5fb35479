/**
 * `tenuis coefficients CASE.json --from D1 --to D2 --points N --out FILE`: a long duct's reduced flow rate G_P(δ) from
 * Tenuis's own DSMC, as a coefficient table for the long-duct solver (engine/longDuct/coefficientTable.ts). The case
 * is a force-driven channel or tube (a body acceleration along a periodic duct, e.g. the poiseuille preset); it is
 * swept over the rarefaction δ = √π/(2 Kn) from D1 to D2 in equal ratios (tenuis sweep with --param knudsen --log,
 * each point sized within its share of the time cap), and every point's G_P with its 95 % half-width goes into FILE
 * with the case, gas, wall and version that made it. The sweep's own folder (every point's full result) is kept
 * beside FILE, in FILE.points/.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { basename } from 'node:path';
import { parseCase, type Case } from '../../engine/case/schema';
import type { CoefficientPoint, CoefficientTable, DuctShapeKind } from '../../engine/longDuct/coefficientTable';
import { tableProblem } from '../../engine/longDuct/coefficientTable';
import { CliError, EXIT_OK, UsageError } from '../errors';
import { readJsonFile } from '../readCase';
import { prettyJson } from '../prettyJson';
import { defineCommand } from '../command';
import { parseTimeCap } from '../sizedRun';
import { sweep } from './sweep';

export const COEFFICIENTS_USAGE = `Usage:
  tenuis coefficients CASE.json --from D1 --to D2 --points N --out FILE [--replicas R] [--time-cap S] [--quiet]

Computes a long duct's reduced flow rate G_P(δ) by DSMC and writes it as a coefficient table (JSON) for tenuis
duct --coefficients FILE. CASE is a force-driven channel or tube (body acceleration along a periodic duct, e.g.
tenuis preset poiseuille or forceDrivenTube, with its gas, collision model and wall accommodation), or a rectangular
cross-section driven along the duct (tenuis preset rectangularDuct: a table of its aspect ratio, G_P only); it is
swept over the rarefaction
δ = √π/(2 Kn) from D1 to D2 with equal ratios. Every point's full result stays in FILE.points/ (as tenuis sweep
writes it). G_T (thermal creep) comes from each point's axial heat flow by Onsager reciprocity, where that run is
linear in its drive and resolves it; elsewhere the point has G_P only (the run's warnings say why).
  --from D1, --to D2   the rarefaction range, above 0 (e.g. 0.01 and 50)
  --points N           how many rarefactions, at least 2
  --out FILE           the table to write (JSON)
  --replicas, -r R     replicas per point (as tenuis run --replicas)
  --time-cap S         wall-clock cap of the whole table, seconds (default 300), shared by the points
  --quiet, -q          no progress lines`;

const usage = (m: string) => new UsageError(m, COEFFICIENTS_USAGE);

function positiveOption(name: string, text: string | undefined): number {
  if (text === undefined) throw usage(`coefficients needs --${name}`);
  const v = Number(text);
  if (!(Number.isFinite(v) && v > 0)) throw usage(`--${name} ${text}: give a number above 0`);
  return v;
}

interface PointSummary {
  readonly reference?: { readonly rarefaction?: number };
  readonly flow?: {
    readonly reducedFlowRate?: { readonly mean: number; readonly ci95: number };
    readonly thermalCreepFlowRate?: { readonly mean: number; readonly ci95: number };
  };
  readonly warnings?: readonly string[];
}

export const coefficientsCommand = defineCommand({
  name: 'coefficients',
  summary: `  tenuis coefficients CASE.json --from D1 --to D2 --points N --out FILE
                                             a long duct's G_P(δ) by DSMC, as a coefficient table`,
  usage: COEFFICIENTS_USAGE,
  options: {
    from: { type: 'string' },
    to: { type: 'string' },
    points: { type: 'string' },
    out: { type: 'string', short: 'o' },
    replicas: { type: 'string', short: 'r' },
    'time-cap': { type: 'string' },
    quiet: { type: 'boolean', short: 'q' },
  },
  async run({ values, positionals }, { io, watchInterrupt }) {
    if (positionals.length !== 1) throw usage('coefficients needs exactly one case file');
    const from = positiveOption('from', values.from);
    const to = positiveOption('to', values.to);
    const points = Number(values.points);
    if (!Number.isInteger(points) || points < 2 || points > 200)
      throw usage(`--points ${values.points}: give a whole number from 2 to 200`);
    if (from === to) throw usage('--from and --to are the same: give a range of rarefactions');
    if (!values.out) throw usage('coefficients needs --out FILE');
    const replicas = values.replicas === undefined ? 1 : Number(values.replicas);
    if (!Number.isInteger(replicas) || replicas < 1 || replicas > 256)
      throw usage(`--replicas ${values.replicas}: give a whole number from 1 to 256`);
    const parsed = parseCase(readJsonFile(positionals[0]));
    if (!parsed.ok)
      throw new CliError(`${positionals[0]} is not a valid case:\n${parsed.errors.map((m) => `  ${m}`).join('\n')}`);
    const c = parsed.value;
    const duct = c.flowReport?.duct;
    const crossSection = c.domain.geometry !== 'axisymmetric' && (c.bodyAccelerationZMPerS2 ?? 0) !== 0;
    if (!crossSection && (c.bodyAccelerationXMPerS2 === 0 || (duct !== 'channel' && duct !== 'tube')))
      throw new CliError(
        `${positionals[0]}: a coefficient table comes from a force-driven channel or tube (a body acceleration along a periodic duct with flowReport.duct channel or tube, e.g. tenuis preset poiseuille or forceDrivenTube) or a rectangular cross-section driven along the duct (tenuis preset rectangularDuct)`,
      );
    const shape: DuctShapeKind = crossSection ? 'rectangle' : (duct as 'channel' | 'tube');
    const aspectRatio = crossSection
      ? Math.min(c.domain.lengthXM, c.domain.lengthYM) / Math.max(c.domain.lengthXM, c.domain.lengthYM)
      : undefined;
    // Knudsen ↔ rarefaction: δ = √π/(2 Kn) (viscosity-based mean free path; Sharipov & Seleznev 1998).
    const knudsenOf = (delta: number) => Math.sqrt(Math.PI) / (2 * delta);
    const dir = `${values.out}.points`;
    const code = await sweep(
      {
        casePath: positionals[0],
        parameter: 'knudsen',
        from: knudsenOf(Math.max(from, to)),
        to: knudsenOf(Math.min(from, to)),
        points,
        spacing: 'log',
        outDir: dir,
        replicas,
        seed: undefined,
        capSeconds: parseTimeCap(values['time-cap'], usage),
        quiet: values.quiet === true,
      },
      io,
      watchInterrupt,
    );
    if (code !== EXIT_OK) return code;
    const { table, thermalCreepLeftOut } = tableFromSweep(dir, c.name, shape, aspectRatio, gasAndWallOf(c));
    const problem = tableProblem(table);
    if (problem) throw new CliError(problem);
    writeFileSync(values.out, `${prettyJson(table)}\n`);
    if (values.quiet !== true) {
      io.stderr.write(`coefficient table of ${table.points.length} points written to ${values.out}\n`);
      if (thermalCreepLeftOut.length)
        io.stderr.write(
          `G_T left out at δ = ${thermalCreepLeftOut.map((d) => d.toPrecision(3)).join(', ')}: there the heat flow was not linear in the drive, or its half-width as large as its value (see each point's warnings in ${dir}/)\n`,
        );
    }
    return EXIT_OK;
  },
});

function gasAndWallOf(c: Case): string {
  const walls = [c.boundaries.bottom, c.boundaries.top, c.boundaries.left, c.boundaries.right].filter(
    (b) => b.type === 'wall',
  );
  const accommodation = walls
    .map((w) => ('accommodation' in w ? (w as { accommodation?: number }).accommodation : undefined))
    .find((a) => a !== undefined);
  const wallModel = walls.length ? (walls[0] as { model: string }).model : 'unknown';
  return `${c.gas.species ?? 'custom gas'} (${c.gas.model}), ${wallModel} walls${accommodation !== undefined ? `, accommodation ${accommodation}` : ''}`;
}

/** The table from a finished sweep folder: each point's rarefaction and G_P from its summary.json. */
function tableFromSweep(
  dir: string,
  caseName: string,
  shape: DuctShapeKind,
  aspectRatio: number | undefined,
  gasAndWall: string,
): { table: CoefficientTable; thermalCreepLeftOut: number[] } {
  const sweepJson = JSON.parse(readFileSync(`${dir}/sweep.json`, 'utf8')) as {
    points: { point: number; summary?: PointSummary }[];
  };
  const points: CoefficientPoint[] = [];
  const thermalCreepLeftOut: number[] = [];
  for (const p of sweepJson.points) {
    const delta = p.summary?.reference?.rarefaction;
    const gp = p.summary?.flow?.reducedFlowRate;
    if (delta === undefined || gp === undefined) continue;
    // G_T from the heat flow by reciprocity, kept only where the run says it is linear and it is resolved.
    const gt = p.summary?.flow?.thermalCreepFlowRate;
    const nonlinear = (p.summary?.warnings ?? []).some((w) => w.startsWith('flow.thermalCreepFlowRate'));
    const usable = gt !== undefined && !nonlinear && gt.mean > 0 && gt.ci95 < gt.mean;
    if (!usable) thermalCreepLeftOut.push(delta);
    points.push({
      rarefaction: delta,
      reducedFlowRate: gp.mean,
      reducedFlowRateCi95: gp.ci95,
      ...(usable ? { thermalCreep: gt.mean, thermalCreepCi95: gt.ci95 } : {}),
    });
  }
  points.sort((a, b) => a.rarefaction - b.rarefaction);
  thermalCreepLeftOut.sort((a, b) => a - b);
  const table: CoefficientTable = {
    shape,
    ...(aspectRatio !== undefined ? { aspectRatio } : {}),
    source: `Tenuis ${packageVersion()} DSMC, tenuis coefficients on case "${caseName}" (every point in ${basename(dir)}/)`,
    gasAndWall,
    points,
  };
  return { table, thermalCreepLeftOut };
}

/** Tenuis's version, from the package.json above the command line's bundle (dist-cli/ or dist-cli/chunks/). */
function packageVersion(): string {
  for (const up of ['../package.json', '../../package.json']) {
    try {
      const pkg = JSON.parse(readFileSync(new URL(up, import.meta.url), 'utf8')) as { name?: string; version?: string };
      if (pkg.name === 'tenuis' && pkg.version) return pkg.version;
    } catch {
      // not there: try the next folder up
    }
  }
  return 'unknown version';
}
