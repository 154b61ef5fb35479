/**
 * `tenuis duct --set shape=tube --set radius=20mm --set length=1m … --coefficients FILE [--out DIR]`: a long duct of
 * any length between two pressures (or with a given mass flow), from a coefficient table (tenuis coefficients), by the
 * long-duct solver of engine/longDuct/ in milliseconds. Parameters take engineering units and are converted here;
 * the engine sees SI only. Prints the results; with --out writes summary.json and duct.csv.
 */
import { readFileSync } from 'node:fs';
import { parseQuantity, formatQuantity, type QuantityKind } from '../../engine/units/engineeringUnits';
import { modelFromSpecies, viscosityPaS, mostProbableSpeedMPerS } from '../../engine/gas/molecularModel';
import { SPECIES_IDS } from '../../engine/gas/species';
import { speciesIdOf } from '../../engine/case/gasSchema';
import { tableProblem, type CoefficientTable } from '../../engine/longDuct/coefficientTable';
import { solveDuctFlow, type DuctFlowResult } from '../../engine/longDuct/ductFlow';
import type { DuctGeometry } from '../../engine/longDuct/isothermalDuct';
import { builtinTableFor } from '../../engine/longDuct/builtinTables';
import { conductanceCurve } from '../../engine/longDuct/conductanceCurve';
import { solvePumpedDuct } from '../../engine/longDuct/pumpedDuct';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { csvDocument } from '../../engine/report/csv';
import { CliError, EXIT_OK, UsageError } from '../errors';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { prettyJson } from '../prettyJson';
import { defineCommand } from '../command';

interface DuctParameter {
  readonly name: string;
  readonly kind: QuantityKind | 'choice';
  readonly unitShown: string;
  readonly description: string;
  readonly choices?: readonly string[];
}

const PARAMETERS: readonly DuctParameter[] = [
  { name: 'shape', kind: 'choice', unitShown: '', choices: ['tube', 'channel'], description: 'duct cross-section' },
  { name: 'radius', kind: 'length', unitShown: 'mm', description: 'tube radius R' },
  { name: 'gap', kind: 'length', unitShown: 'µm', description: 'channel gap H' },
  { name: 'width', kind: 'length', unitShown: 'mm', description: 'channel width w (default 1 m: per metre of width)' },
  { name: 'length', kind: 'length', unitShown: 'm', description: 'duct length L' },
  {
    name: 'gas',
    kind: 'choice',
    unitShown: '',
    choices: SPECIES_IDS,
    description: 'table gas (viscosity, mass; default N2)',
  },
  { name: 'temperature', kind: 'temperature', unitShown: 'K', description: 'gas and wall temperature along the duct' },
  { name: 'upstreamTemperature', kind: 'temperature', unitShown: 'K', description: 'wall temperature at the inlet' },
  { name: 'downstreamTemperature', kind: 'temperature', unitShown: 'K', description: 'wall temperature at the outlet' },
  { name: 'upstreamPressure', kind: 'pressure', unitShown: 'Pa', description: 'pressure at the inlet' },
  { name: 'downstreamPressure', kind: 'pressure', unitShown: 'Pa', description: 'pressure at the outlet' },
  {
    name: 'massFlowRate',
    kind: 'massFlow',
    unitShown: 'kg/s',
    description: 'mass flow (kg/s, sccm …), instead of one pressure',
  },
  {
    name: 'pumpSpeed',
    kind: 'conductance',
    unitShown: 'L/s',
    description: 'speed of a pump at the outlet (with gasLoad)',
  },
  {
    name: 'gasLoad',
    kind: 'throughput',
    unitShown: 'mbar·L/s',
    description: 'gas load into the chamber at the inlet (with pumpSpeed)',
  },
];

export const DUCT_USAGE = `Usage:
  tenuis duct --set shape=tube --set radius=20mm --set length=1m --set gas=N2 --set temperature=20C
              --set upstreamPressure=1Pa --set downstreamPressure=0.1Pa --coefficients FILE [--out DIR]

A long duct (length well above its radius or gap) at any pressure ratio, from a table of its reduced flow rate
G_P(δ) (and thermal-creep coefficient G_T, where the table has it), made by tenuis coefficients. Give two of
upstreamPressure, downstreamPressure and massFlowRate; the third is solved for. Or give pumpSpeed and gasLoad: a
pump at the outlet, the chamber at the inlet, and the chamber pressure and effective pumping speed are solved for. With different upstream and
downstream temperatures (a linear wall temperature between them) the table needs G_T. Prints the flow, throughput,
conductance and transmission probability with their 95 % half-widths from the table's; with --out writes
summary.json and duct.csv (pressure, temperature, rarefaction and Knudsen number along the duct).
Results are model estimates: defer to local codes, standards and licensed engineering practice for vacuum vessels
and pressurised parts.
  --set NAME=VALUE      a parameter (units accepted, e.g. radius=20mm, upstreamPressure=0.01mbar, temperature=20C)
  --coefficients FILE   the coefficient table (JSON, from tenuis coefficients); without it a channel uses the
                        built-in table (hard-sphere argon, diffuse walls) and says so; a tube needs one
  --out, -o DIR         output folder for summary.json and duct.csv
  --sweep upstreamPressure --from A --to B --points N [--log]
                        instead: the conductance over upstream pressures A to B at the pressure ratio the two set
                        pressures give, beside the no-slip, first-order slip and (tube) free-molecular lines, written
                        to DIR/conductance.csv

Parameters:
${PARAMETERS.map((p) => `  ${p.name.padEnd(22)}${p.description}${p.choices ? ` [one of ${p.choices.join(', ')}]` : ` [${p.kind}${p.unitShown ? `, shown in ${p.unitShown}` : ''}]`}`).join('\n')}`;

const usage = (m: string) => new UsageError(m, DUCT_USAGE);

type Values = Record<string, number | string>;

function parseSets(sets: readonly string[], molecularMassKg: (v: Values) => number | undefined): Values {
  const raw: Record<string, string> = {};
  for (const s of sets) {
    const eq = s.indexOf('=');
    if (eq < 1) throw usage(`--set ${s}: expected NAME=VALUE, e.g. radius=20mm`);
    const name = s.slice(0, eq).trim();
    if (!PARAMETERS.some((p) => p.name === name))
      throw usage(
        `--set ${s}: unknown parameter "${name}"; the parameters are ${PARAMETERS.map((p) => p.name).join(', ')}`,
      );
    raw[name] = s.slice(eq + 1).trim();
  }
  const values: Values = {};
  for (const p of PARAMETERS) if (p.kind === 'choice' && raw[p.name] !== undefined) values[p.name] = raw[p.name];
  const mass = molecularMassKg(values);
  for (const p of PARAMETERS) {
    const text = raw[p.name];
    if (text === undefined || p.kind === 'choice') continue;
    try {
      values[p.name] = parseQuantity(text, p.kind, { molecularMassKg: mass });
    } catch (e) {
      throw usage(`--set ${p.name}=${text}: ${(e as Error).message}`);
    }
  }
  for (const p of PARAMETERS)
    if (p.choices && values[p.name] !== undefined && !p.choices.includes(values[p.name] as string))
      throw usage(`--set ${p.name}=${values[p.name]}: give one of ${p.choices.join(', ')}`);
  return values;
}

function readTable(path: string): CoefficientTable {
  let table: CoefficientTable;
  try {
    table = JSON.parse(readFileSync(path, 'utf8')) as CoefficientTable;
  } catch (e) {
    throw new CliError(`--coefficients ${path}: cannot read it as JSON (${(e as Error).message})`);
  }
  if (table === null || typeof table !== 'object' || !Array.isArray(table.points))
    throw new CliError(`--coefficients ${path}: not a coefficient table (it needs shape, source and points)`);
  const problem = tableProblem(table);
  if (problem) throw new CliError(`--coefficients ${path}: ${problem}`);
  return table;
}

export const ductCommand = defineCommand({
  name: 'duct',
  summary: `  tenuis duct --set shape=tube --set radius=… --set length=… --coefficients FILE
                                             a long duct at any pressure ratio from a coefficient table`,
  usage: DUCT_USAGE,
  options: {
    set: { type: 'string', multiple: true },
    coefficients: { type: 'string' },
    out: { type: 'string', short: 'o' },
    sweep: { type: 'string' },
    from: { type: 'string' },
    to: { type: 'string' },
    points: { type: 'string' },
    log: { type: 'boolean' },
  },
  run({ values: o, positionals }, { io }) {
    if (positionals.length) throw usage(`duct takes no file argument (${positionals[0]}); give --set NAME=VALUE`);
    const speciesOf = (v: Values) => {
      const id = speciesIdOf(String(v.gas ?? 'N2'));
      if (!id) throw usage(`--set gas=${v.gas}: give one of ${SPECIES_IDS.join(', ')}`);
      return id;
    };
    const v = parseSets(o.set ?? [], (vals) => {
      try {
        return modelFromSpecies(speciesOf(vals), 'VHS').massKg;
      } catch {
        return undefined;
      }
    });
    const wantedShape = (v.shape as 'tube' | 'channel' | undefined) ?? 'tube';
    const builtin = o.coefficients ? null : builtinTableFor(wantedShape);
    if (!o.coefficients && !builtin)
      throw usage(
        `duct needs --coefficients FILE for a ${wantedShape}: Tenuis ships no ${wantedShape} table yet; make one with tenuis coefficients for this gas and wall`,
      );
    const table = builtin ?? readTable(o.coefficients!);
    const builtinNote = builtin
      ? `built-in table (${builtin.gasAndWall}); for another gas or wall G_P(δ) differs by a few per cent in the transition regime: give --coefficients FILE from tenuis coefficients for the exact one`
      : null;
    const shape = (v.shape as string | undefined) ?? table.shape;
    const need = (name: string): number => {
      const x = v[name];
      if (typeof x !== 'number')
        throw usage(`duct needs --set ${name}=… (${PARAMETERS.find((p) => p.name === name)!.description})`);
      return x;
    };
    const geometry: DuctGeometry =
      shape === 'tube'
        ? { shape: 'tube', radiusM: need('radius'), lengthM: need('length') }
        : {
            shape: 'channel',
            gapM: need('gap'),
            widthM: (v.width as number | undefined) ?? 1,
            lengthM: need('length'),
          };
    const gas = modelFromSpecies(speciesOf(v), 'VHS');
    const t = (v.temperature as number | undefined) ?? 293.15;
    const tUp = (v.upstreamTemperature as number | undefined) ?? t;
    const tDown = (v.downstreamTemperature as number | undefined) ?? t;
    if (v.pumpSpeed !== undefined || v.gasLoad !== undefined) {
      if (typeof v.pumpSpeed !== 'number' || typeof v.gasLoad !== 'number')
        throw usage('a pumped duct needs both --set pumpSpeed=… and --set gasLoad=…');
      let pumped;
      try {
        pumped = solvePumpedDuct({
          geometry,
          gas,
          temperatureK: tUp,
          table,
          pumpSpeed: v.pumpSpeed,
          gasLoadPaM3PerS: v.gasLoad,
        });
      } catch (e) {
        throw new CliError(`duct: ${(e as Error).message}`);
      }
      const e = (x: { mean: number; ci95: number }, unit: string) =>
        `${formatQuantity(x.mean, unit, 4)} ± ${formatQuantity(x.ci95, unit, 2)}`;
      io.stdout.write(
        [
          `pump of ${formatQuantity(v.pumpSpeed, 'L/s', 4)} at the outlet of a long ${geometry.shape}, gas load ${formatQuantity(v.gasLoad, 'mbar·L/s', 4)}; coefficients: ${table.source}`,
          `  pump inlet pressure       ${formatQuantity(pumped.pumpInletPressurePa, 'Pa', 4)}`,
          `  chamber pressure          ${e(pumped.chamberPressurePa, 'Pa')}`,
          `  effective pumping speed   ${e(pumped.effectiveSpeedM3PerS, 'L/s')}`,
          `  duct conductance          ${formatQuantity(pumped.ductConductanceM3PerS, 'L/s', 4)} (at the pressures it has)`,
          ...pumped.warnings.map((w) => `warning: ${w}`),
          ...(builtinNote ? [`note: ${builtinNote}`] : []),
          'Results are model estimates; defer to local codes, standards and licensed engineering practice.',
        ].join('\n') + '\n',
      );
      return EXIT_OK;
    }
    if (o.sweep !== undefined) {
      writeConductanceCurve(o, v, { geometry, gas, table, tUp, tDown });
      io.stdout.write(`conductance curve written to ${o.out}/conductance.csv\n`);
      return EXIT_OK;
    }
    let result: DuctFlowResult;
    try {
      result = solveDuctFlow({
        geometry,
        gas,
        table,
        upstreamTemperatureK: tUp,
        downstreamTemperatureK: tDown,
        upstreamPressurePa: v.upstreamPressure as number | undefined,
        downstreamPressurePa: v.downstreamPressure as number | undefined,
        massFlowRateKgPerS: v.massFlowRate as number | undefined,
      });
    } catch (e) {
      throw new CliError(`duct: ${(e as Error).message}`);
    }
    const summary = summaryOf(result, { geometry, gasName: String(v.gas ?? 'N2'), table, tUp, tDown, gas });
    const shown = (x: { mean: number; ci95: number }, unit: string) =>
      `${formatQuantity(x.mean, unit, 4, { molecularMassKg: gas.massKg })} ± ${formatQuantity(x.ci95, unit, 2, { molecularMassKg: gas.massKg })}`;
    const lines = [
      `long ${geometry.shape}, ${summary.gas} at ${tUp === tDown ? `${tUp} K` : `${tUp} K → ${tDown} K`}; coefficients: ${table.source}`,
      `  upstream pressure    ${shown(result.upstreamPressurePa, 'Pa')}`,
      `  downstream pressure  ${shown(result.downstreamPressurePa, 'Pa')}`,
      `  mass flow rate       ${shown(result.massFlowRateKgPerS, 'kg/s')}  (${shown(result.massFlowRateKgPerS, 'sccm')})`,
      ...(summary.flow.conductance && summary.flow.transmissionProbability
        ? [
            `  throughput           ${shown(summary.flow.throughput, 'mbar·L/s')}`,
            `  conductance          ${shown(summary.flow.conductance, 'L/s')}`,
            `  transmission prob.   ${summary.flow.transmissionProbability.mean.toPrecision(4)} ± ${summary.flow.transmissionProbability.ci95.toPrecision(2)}`,
          ]
        : []),
      ...result.warnings.map((w) => `warning: ${w}`),
      ...(builtinNote ? [`note: ${builtinNote}`] : []),
      'Results are model estimates; defer to local codes, standards and licensed engineering practice.',
    ];
    io.stdout.write(`${lines.join('\n')}\n`);
    if (o.out) {
      checkOutputDir(o.out);
      writeResultsAtomically(o.out, {
        'summary.json': `${prettyJson(summary)}\n`,
        'duct.csv': ductCsv(result),
      });
    }
    return EXIT_OK;
  },
});

interface SummaryContext {
  readonly geometry: DuctGeometry;
  readonly gasName: string;
  readonly table: CoefficientTable;
  readonly tUp: number;
  readonly tDown: number;
  readonly gas: ReturnType<typeof modelFromSpecies>;
}

function summaryOf(r: DuctFlowResult, c: SummaryContext) {
  const m = c.gas.massKg;
  const up = r.upstreamPressurePa.mean;
  const down = r.downstreamPressurePa.mean;
  const ktUp = K_B * c.tUp;
  const flow = r.massFlowRateKgPerS;
  const scale = (f: number) => ({ mean: flow.mean * f, ci95: flow.ci95 * Math.abs(f) });
  const a = c.geometry.shape === 'tube' ? c.geometry.radiusM : c.geometry.gapM;
  const area = c.geometry.shape === 'tube' ? Math.PI * a * a : c.geometry.gapM * c.geometry.widthM;
  const end = (p: number, t: number) => {
    const delta = (p * a) / (viscosityPaS(c.gas, t) * mostProbableSpeedMPerS(m, t));
    return { pressure: p, temperature: t, rarefaction: delta, knudsen: Math.sqrt(Math.PI) / (2 * delta) };
  };
  const dp = up - down;
  return {
    format: 'tenuis long duct',
    gas: c.gasName,
    reference: {
      temperature: c.tUp,
      viscosity: viscosityPaS(c.gas, c.tUp),
      mostProbableSpeed: mostProbableSpeedMPerS(m, c.tUp),
      lengthScale: a,
    },
    upstream: end(up, c.tUp),
    downstream: end(down, c.tDown),
    flow: {
      massFlowRate: flow,
      throughput: scale(ktUp / m),
      ...(dp > 0
        ? {
            conductance: scale(ktUp / (m * dp)),
            transmissionProbability: scale(1 / (area * dp * Math.sqrt(m / (2 * Math.PI * ktUp)))),
          }
        : {}),
    },
    coefficients: { source: c.table.source, gasAndWall: c.table.gasAndWall, points: c.table.points.length },
    units: { pressure: 'Pa', temperature: 'K', massFlowRate: 'kg/s', throughput: 'Pa m^3/s', conductance: 'm^3/s' },
    warnings: r.warnings,
  };
}

interface CurveContext {
  readonly geometry: DuctGeometry;
  readonly gas: ReturnType<typeof modelFromSpecies>;
  readonly table: CoefficientTable;
  readonly tUp: number;
  readonly tDown: number;
}

function writeConductanceCurve(
  o: { sweep?: string; from?: string; to?: string; points?: string; log?: boolean; out?: string },
  v: Values,
  c: CurveContext,
): void {
  if (o.sweep !== 'upstreamPressure') throw usage(`--sweep ${o.sweep}: only --sweep upstreamPressure is offered`);
  if (!o.out) throw usage('--sweep needs --out DIR for conductance.csv');
  if (c.tUp !== c.tDown) throw usage('--sweep: the conductance curve is for one temperature along the duct');
  const up = v.upstreamPressure;
  const down = v.downstreamPressure;
  if (typeof up !== 'number' || typeof down !== 'number' || !(down < up))
    throw usage('--sweep needs --set upstreamPressure and --set downstreamPressure (below it): they set the ratio');
  const pressure = (name: string, text: string | undefined) => {
    if (text === undefined) throw usage(`--sweep needs --${name}`);
    try {
      return parseQuantity(text, 'pressure');
    } catch (e) {
      throw usage(`--${name} ${text}: ${(e as Error).message}`);
    }
  };
  const from = pressure('from', o.from);
  const to = pressure('to', o.to);
  const n = Number(o.points);
  if (!Number.isInteger(n) || n < 2 || n > 1000)
    throw usage(`--points ${o.points}: give a whole number from 2 to 1000`);
  const pressures = Array.from({ length: n }, (_, k) =>
    o.log ? from * (to / from) ** (k / (n - 1)) : from + ((to - from) * k) / (n - 1),
  );
  let curve;
  try {
    curve = conductanceCurve({
      geometry: c.geometry,
      gas: c.gas,
      temperatureK: c.tUp,
      table: c.table,
      upstreamPressuresPa: pressures,
      ratio: down / up,
    });
  } catch (e) {
    throw new CliError(`duct --sweep: ${(e as Error).message}`);
  }
  checkOutputDir(o.out);
  const csv = csvDocument(
    [
      'upstream pressure (Pa)',
      'mean pressure (Pa)',
      'mean Knudsen number (1)',
      'conductance (m^3/s)',
      'conductance ci95 (m^3/s)',
      'no-slip (m^3/s)',
      'first-order slip (m^3/s)',
      'free-molecular (m^3/s)',
    ],
    curve.map((p) => [
      p.upstreamPressurePa,
      p.meanPressurePa,
      p.meanKnudsen,
      p.conductanceM3PerS.mean,
      p.conductanceM3PerS.ci95,
      p.noSlipM3PerS,
      p.firstOrderSlipM3PerS,
      Number.isFinite(p.freeMolecularM3PerS) ? p.freeMolecularM3PerS : '',
    ]),
  );
  writeResultsAtomically(o.out, { 'conductance.csv': csv });
}

function ductCsv(r: DuctFlowResult): string {
  const p = r.profile;
  const rows: (string | number)[][] = [];
  for (let k = 0; k < p.xM.length; k += Math.max(1, Math.floor(p.xM.length / 200)))
    rows.push([
      p.xM[k],
      p.pressurePa[k],
      p.temperatureK[k],
      p.rarefaction[k],
      Math.sqrt(Math.PI) / (2 * p.rarefaction[k]),
    ]);
  return csvDocument(['x (m)', 'pressure (Pa)', 'temperature (K)', 'rarefaction δ (1)', 'Knudsen number (1)'], rows);
}
