/**
 * `tenuis duct --set shape=tube --set radius=20mm --set length=1m … --coefficients FILE [--out DIR]`: a long duct of
 * any length between two pressures (or with a given mass flow), from a coefficient table (tenuis coefficients), by the
 * long-duct solver of engine/longDuct/ in milliseconds. Parameters take engineering units and are converted here;
 * the engine sees SI only. Prints the results; with --out writes summary.json and duct.csv.
 */
import { readFileSync } from 'node:fs';
import { parseQuantity, formatQuantity, type QuantityKind } from '../../engine/units/engineeringUnits';
import { modelFromSpecies } from '../../engine/gas/molecularModel';
import { SPECIES_IDS, type SpeciesId } from '../../engine/gas/species';
import { speciesIdOf } from '../../engine/case/gasSchema';
import { tableProblem, type CoefficientTable } from '../../engine/longDuct/coefficientTable';
import type { DuctGeometry } from '../../engine/longDuct/isothermalDuct';
import { builtinTableFor } from '../../engine/longDuct/builtinTables';
import {
  conductanceCurveCsv,
  longDuctAnswer,
  longDuctConductanceCurve,
  longDuctProfile,
  longDuctProfileCsv,
  pressureRange,
  type LongDuctRequest,
} from '../../engine/report/longDuctReport';
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
  {
    name: 'shape',
    kind: 'choice',
    unitShown: '',
    choices: ['tube', 'channel', 'rectangle'],
    description: 'duct cross-section (a rectangle needs a table of its aspect ratio)',
  },
  { name: 'radius', kind: 'length', unitShown: 'mm', description: 'tube radius R' },
  { name: 'gap', kind: 'length', unitShown: 'µm', description: 'channel gap H' },
  { name: 'height', kind: 'length', unitShown: 'µm', description: 'rectangle height H (its smaller side)' },
  {
    name: 'width',
    kind: 'length',
    unitShown: 'mm',
    description: 'channel width w (default 1 m: per metre of width), or rectangle width W',
  },
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
  --coefficients FILE   the coefficient table (JSON, from tenuis coefficients); without it the built-in table of
                        the shape (hard-sphere argon, diffuse walls) is used, and the output says so
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
    const wantedShape = (v.shape as 'tube' | 'channel' | 'rectangle' | undefined) ?? 'tube';
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
        : shape === 'rectangle'
          ? { shape: 'rectangle', heightM: need('height'), widthM: need('width'), lengthM: need('length') }
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
    const species = speciesOf(v);
    const request: LongDuctRequest = {
      geometry,
      species,
      table,
      upstreamTemperatureK: tUp,
      downstreamTemperatureK: tDown,
      upstreamPressurePa: v.upstreamPressure as number | undefined,
      downstreamPressurePa: v.downstreamPressure as number | undefined,
      massFlowRateKgPerS: v.massFlowRate as number | undefined,
    };
    if (v.pumpSpeed !== undefined || v.gasLoad !== undefined) {
      if (typeof v.pumpSpeed !== 'number' || typeof v.gasLoad !== 'number')
        throw usage('a pumped duct needs both --set pumpSpeed=… and --set gasLoad=…');
      const pumpSpeed = v.pumpSpeed;
      const gasLoad = v.gasLoad;
      const answer = solved(() =>
        longDuctAnswer({ ...request, pump: { speedM3PerS: pumpSpeed, gasLoadPaM3PerS: gasLoad } }),
      );
      if (answer.kind !== 'pumped') throw new Error('a pumped request gives a pumped answer');
      const pumped = answer.result;
      const e = (x: { mean: number; ci95: number }, unit: string) =>
        `${formatQuantity(x.mean, unit, 4)} ± ${formatQuantity(x.ci95, unit, 2)}`;
      io.stdout.write(
        [
          `pump of ${formatQuantity(pumpSpeed, 'L/s', 4)} at the outlet of a long ${geometry.shape}, gas load ${formatQuantity(gasLoad, 'mbar·L/s', 4)}; coefficients: ${table.source}`,
          `  pump inlet pressure       ${formatQuantity(pumped.pumpInletPressurePa, 'Pa', 4)}`,
          `  chamber pressure          ${e(pumped.chamberPressurePa, 'Pa')}`,
          `  effective pumping speed   ${e(pumped.effectiveSpeedM3PerS, 'L/s')}`,
          `  duct conductance          ${formatQuantity(pumped.ductConductanceM3PerS, 'L/s', 4)} (at the pressures it has)`,
          ...pumped.warnings.map((w) => `warning: ${w}`),
          ...(builtinNote ? [`note: ${builtinNote}`] : []),
          'Results are model estimates; defer to local codes, standards and licensed engineering practice.',
        ].join('\n') + '\n',
      );
      if (o.out) {
        checkOutputDir(o.out);
        writeResultsAtomically(o.out, { 'summary.json': `${prettyJson(answer.summary)}\n` });
      }
      return EXIT_OK;
    }
    if (o.sweep !== undefined) {
      writeConductanceCurve(o, v, { geometry, species, table, tUp, tDown });
      io.stdout.write(`conductance curve written to ${o.out}/conductance.csv\n`);
      return EXIT_OK;
    }
    const answer = solved(() => longDuctAnswer(request));
    if (answer.kind !== 'flow') throw new Error('a request with pressures gives a flow answer');
    const result = answer.result;
    const summary = answer.summary;
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
        'duct.csv': longDuctProfileCsv(longDuctProfile(request, result)),
      });
    }
    return EXIT_OK;
  },
});

/** The solver's messages name the input that is wrong; on the command line they are errors, not crashes. */
function solved<T>(f: () => T): T {
  try {
    return f();
  } catch (e) {
    throw new CliError(`duct: ${(e as Error).message}`);
  }
}

interface CurveContext {
  readonly geometry: DuctGeometry;
  readonly species: SpeciesId;
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
  const pressures = pressureRange(from, to, n, o.log === true);
  let curve;
  try {
    curve = longDuctConductanceCurve({
      geometry: c.geometry,
      species: c.species,
      temperatureK: c.tUp,
      table: c.table,
      upstreamPressuresPa: pressures,
      ratio: down / up,
    });
  } catch (e) {
    throw new CliError(`duct --sweep: ${(e as Error).message}`);
  }
  checkOutputDir(o.out);
  const csv = conductanceCurveCsv(curve);
  writeResultsAtomically(o.out, { 'conductance.csv': csv });
}
