/**
 * Result exports as strings: summary.json and three CSV tables (profiles, cell fields, wall bins). Pure, so the
 * command line writes them to disk and the browser offers them as downloads from the same code.
 *
 * CSV dialect: RFC 4180 except for the line end, which is LF ("\n") rather than CRLF — every spreadsheet and CSV
 * library reads both, and LF keeps files diff-friendly in git. A field is quoted when it holds a comma, a double
 * quote, CR or LF (quotes doubled inside). Numbers are written as JavaScript's shortest round-trip decimal
 * (String(x): parsing the text gives back the same double), never quoted or escaped; a value that is not finite
 * (NaN: no information, e.g. an empty cell or fewer than two batches for a ci95) is an empty field. Text fields that
 * a spreadsheet would evaluate as a formula (starting with = + - @, tab or CR) get a leading apostrophe (OWASP,
 * "CSV Injection"; common practice). Headers carry the SI unit in brackets: `temperature [K]`,
 * `temperature ci95 [K]`.
 *
 * With a continuum comparison (engine/continuum/comparison.ts) summary.json gains `continuum` (each model's integral
 * quantities), `verdict` (per quantity: best model, deviation, text and the numbers behind it) and
 * `continuumModels` (what each model is); a case no model applies to gets `continuumNote` (why). profiles.csv gains
 * one column per model after each DSMC quantity a model predicts: `velocityX noSlip [m/s]`.
 */
import type { Plan } from '../plan/plan';
import { continuumComparisonOf, type ContinuumComparisonResult } from '../continuum/comparison';
import type { QuantityVerdict } from '../continuum/verdict';
import { FLOW_QUANTITIES, flowQuantityUnits, type FlowResult } from './flowQuantities';
import { flowCsv } from './flowCsv';
import type { SimulationResult, FieldTable, IntegralEstimate } from './summarize';
import { WALL_QUANTITIES, WALL_QUANTITY_UNITS, type WallQuantityName } from './wallQuantities';
import type { ReferenceState } from '../plan/referenceState';

export const CSV_LINE_END = '\n';
export const SUMMARY_FORMAT = 'tenuis-summary';
export const SUMMARY_FORMAT_VERSION = 1;

type Numerics = SimulationResult['numerics'];
interface ExportName {
  readonly name: string;
  readonly unit: string;
}

/**
 * What summary.json calls each field of the reference state and numerics, with its SI unit. Typed over every key, so
 * a new field in ReferenceState or SimulationResult['numerics'] fails to compile until someone names it here.
 */
const REFERENCE_EXPORT: { readonly [K in keyof ReferenceState]: ExportName } = {
  pressurePa: { name: 'pressure', unit: 'Pa' },
  temperatureK: { name: 'temperature', unit: 'K' },
  numberDensityPerM3: { name: 'numberDensity', unit: '1/m^3' },
  massDensityKgPerM3: { name: 'massDensity', unit: 'kg/m^3' },
  viscosityPaS: { name: 'viscosity', unit: 'Pa s' },
  mostProbableSpeedMPerS: { name: 'mostProbableSpeed', unit: 'm/s' },
  meanFreePathM: { name: 'meanFreePath', unit: 'm' },
  knudsen: { name: 'knudsen', unit: '1' },
  rarefaction: { name: 'rarefaction', unit: '1' },
  lengthScaleM: { name: 'lengthScale', unit: 'm' },
  meanCollisionTimeS: { name: 'meanCollisionTime', unit: 's' },
};

const NUMERICS_EXPORT: { readonly [K in keyof Numerics]: ExportName } = {
  cellsX: { name: 'cellsX', unit: '1' },
  cellsY: { name: 'cellsY', unit: '1' },
  cells: { name: 'cells', unit: '1' },
  particles: { name: 'particles', unit: '1' },
  moleculesPerParticle: { name: 'moleculesPerParticle', unit: '1' },
  timeStep: { name: 'timeStep', unit: 's' },
  steps: { name: 'steps', unit: 'step' },
  transientSteps: { name: 'transientSteps', unit: 'step' },
  sampleSteps: { name: 'sampleSteps', unit: 'step' },
  batchSteps: { name: 'batchSteps', unit: 'step' },
  seed: { name: 'seed', unit: '1' },
  replicas: { name: 'replicas', unit: '1' },
  cellSizeOverMeanFreePath: { name: 'cellSizeOverMeanFreePath', unit: '1' },
  timeStepOverCollisionTime: { name: 'timeStepOverCollisionTime', unit: '1' },
  timeStepOverCellTransitTime: { name: 'timeStepOverCellTransitTime', unit: '1' },
  particlesPerCell: { name: 'particlesPerCell', unit: '1' },
  collisionSeparationOverMeanFreePath: { name: 'collisionSeparationOverMeanFreePath', unit: '1' },
  collisionsPerParticlePerStep: { name: 'collisionsPerParticlePerStep', unit: '1/step' },
};

export interface Performance {
  /** Wall-clock time of the run, s. */
  readonly wallSeconds: number;
  /** Particle moves done (particles × steps, summed over steps). */
  readonly particleSteps: number;
  readonly particleStepsPerSecond: number;
}

const PERFORMANCE_UNITS: { readonly [K in keyof Performance]: string } = {
  wallSeconds: 's',
  particleSteps: '1',
  particleStepsPerSecond: '1/s',
};

/** JSON has no NaN or Infinity: a value that is not finite is written as null ("not available"). */
export type JsonNumber = number | null;

export interface WallEstimateJson {
  mean: JsonNumber;
  ci95: JsonNumber;
  effectiveSamples: JsonNumber;
  correlationTimeSteps: JsonNumber;
  /** False when the blocking analysis found no plateau: ci95 is then a lower bound. */
  plateauFound: boolean;
}

export interface SummaryJson {
  format: typeof SUMMARY_FORMAT;
  formatVersion: typeof SUMMARY_FORMAT_VERSION;
  caseName: string;
  reference: Record<string, JsonNumber>;
  numerics: Record<string, JsonNumber>;
  walls: Partial<Record<string, Record<WallQuantityName, WallEstimateJson>>>;
  /**
   * Flow numbers of cases with flow sections: the section they come from, each section's mass flow rate, and each
   * flow quantity as {mean, ci95} (results/flowQuantities.ts; units in `units`).
   */
  flow?: FlowJson;
  /** Integral quantities each continuum model predicts: {MODEL: {`walls.bottom.shearStress`: value, …}}. */
  continuum?: Record<string, Record<string, JsonNumber>>;
  /** Per compared quantity or profile: which model is good enough, and the numbers behind it (continuum/verdict.ts). */
  verdict?: Record<string, VerdictJson>;
  /** The analytic problem recognised and what each model means. */
  continuumModels?: {
    problem: string;
    description: string;
    meanFreePath: { kind: string; value: JsonNumber };
    knudsen: JsonNumber;
    models: Record<string, string>;
  };
  /** Why no continuum model is compared, when none applies. */
  continuumNote?: string;
  /** SI unit of every quantity named in this file; a wall estimate's mean and ci95 share its quantity's unit. */
  units: Record<string, string>;
  warnings: string[];
  performance: Record<keyof Performance, JsonNumber>;
}

export interface VerdictJson {
  bestModel: string | null;
  /** The best model's relative deviation from DSMC (profiles: RMS over the points). */
  deviation: JsonNumber;
  text: string;
  category: QuantityVerdict['category'];
  kind: QuantityVerdict['kind'];
  /** DSMC 95 % half-width over the scale, the threshold for "adequate", and the scale (in the quantity's unit). */
  relativeHalfWidth: JsonNumber;
  threshold: JsonNumber;
  scale: JsonNumber;
  models: Record<
    string,
    { deviation: JsonNumber; maxDeviation: JsonNumber; normalizedDeviation: JsonNumber; adequate: boolean }
  >;
}

/** What summaryJson and resultFiles take besides the result; `comparison` adds the continuum sections. */
export interface SummaryExtra {
  performance: Performance;
  caseName: string;
  comparison?: ContinuumComparisonResult;
}

function verdictJson(v: QuantityVerdict): VerdictJson {
  return {
    bestModel: v.bestModel,
    deviation: jsonNumber(v.deviation),
    text: v.text,
    category: v.category,
    kind: v.kind,
    relativeHalfWidth: jsonNumber(v.relativeHalfWidth),
    threshold: jsonNumber(v.threshold),
    scale: jsonNumber(v.scale),
    models: Object.fromEntries(
      v.models.map((d) => [
        d.model,
        {
          deviation: jsonNumber(d.deviation),
          maxDeviation: jsonNumber(d.maxDeviation),
          normalizedDeviation: jsonNumber(d.normalizedDeviation),
          adequate: d.adequate,
        },
      ]),
    ),
  };
}

/** The continuum sections of summary.json (see the file header); units of their quantities go into `units`. */
function continuumJson(
  c: ContinuumComparisonResult,
  units: Record<string, string>,
): Pick<SummaryJson, 'continuum' | 'verdict' | 'continuumModels' | 'continuumNote'> {
  if (!c.recognised) return { continuumNote: c.reason };
  const continuum: Record<string, Record<string, JsonNumber>> = {};
  for (const [model, values] of Object.entries(c.continuum))
    continuum[model] = Object.fromEntries(Object.entries(values!).map(([k, x]) => [k, jsonNumber(x)]));
  Object.assign(units, c.units);
  units.deviation = '1';
  const p = c.predictions;
  return {
    continuum,
    verdict: Object.fromEntries(Object.entries(c.verdict).map(([k, v]) => [k, verdictJson(v)])),
    continuumModels: {
      problem: p.problem,
      description: p.description,
      meanFreePath: { kind: p.meanFreePath.kind, value: jsonNumber(p.meanFreePath.valueM) },
      knudsen: jsonNumber(p.knudsen),
      models: { ...p.models } as Record<string, string>,
    },
  };
}

export interface FlowJson {
  section: string;
  sections: Record<string, { massFlowRate: WallEstimateJson }>;
  upstreamPressure: JsonNumber;
  downstreamPressure: JsonNumber;
  temperature: JsonNumber;
  [quantity: string]: unknown;
}

function flowJson(flow: FlowResult, units: Record<string, string>, planar: boolean): FlowJson {
  const out: FlowJson = {
    section: flow.section,
    sections: Object.fromEntries(
      Object.entries(flow.sections).map(([name, e]) => [name, { massFlowRate: wallEstimateJson(e) }]),
    ),
    upstreamPressure: jsonNumber(flow.upstreamPressurePa),
    downstreamPressure: jsonNumber(flow.downstreamPressurePa),
    temperature: jsonNumber(flow.temperatureK),
  };
  const flowUnits = flowQuantityUnits(planar);
  for (const q of FLOW_QUANTITIES) {
    const e = flow.values[q];
    if (e) out[q] = { mean: jsonNumber(e.mean), ci95: jsonNumber(e.ci95) };
    units[q] = flowUnits[q];
  }
  units.upstreamPressure = 'Pa';
  units.downstreamPressure = 'Pa';
  return out;
}

function jsonNumber(x: number): JsonNumber {
  return Number.isFinite(x) ? x : null;
}

function wallEstimateJson(e: IntegralEstimate): WallEstimateJson {
  return {
    mean: jsonNumber(e.mean),
    ci95: jsonNumber(e.ci95),
    effectiveSamples: jsonNumber(e.effectiveSamples),
    correlationTimeSteps: jsonNumber(e.correlationTimeSteps),
    plateauFound: e.plateauFound,
  };
}

/** The summary of a run as a JSON-ready object (no NaN anywhere: see JsonNumber). */
export function summaryJson(result: SimulationResult, extra: SummaryExtra): SummaryJson {
  const units: Record<string, string> = {};
  const reference: Record<string, JsonNumber> = {};
  for (const key of Object.keys(REFERENCE_EXPORT) as (keyof ReferenceState)[]) {
    const { name, unit } = REFERENCE_EXPORT[key];
    reference[name] = jsonNumber(result.reference[key]);
    units[name] = unit;
  }
  const numerics: Record<string, JsonNumber> = {};
  for (const key of Object.keys(NUMERICS_EXPORT) as (keyof Numerics)[]) {
    const { name, unit } = NUMERICS_EXPORT[key];
    numerics[name] = jsonNumber(result.numerics[key]);
    units[name] = unit;
  }
  const walls: SummaryJson['walls'] = {};
  for (const [side, estimates] of Object.entries(result.walls) as [
    string,
    Record<WallQuantityName, IntegralEstimate>,
  ][]) {
    const entry = {} as Record<WallQuantityName, WallEstimateJson>;
    for (const q of WALL_QUANTITIES) entry[q] = wallEstimateJson(estimates[q]);
    walls[side] = entry;
  }
  for (const q of WALL_QUANTITIES) units[q] = WALL_QUANTITY_UNITS[q];
  units.effectiveSamples = '1';
  units.correlationTimeSteps = 'step';
  const performance = {} as Record<keyof Performance, JsonNumber>;
  for (const key of Object.keys(PERFORMANCE_UNITS) as (keyof Performance)[]) {
    performance[key] = jsonNumber(extra.performance[key]);
    units[key] = PERFORMANCE_UNITS[key];
  }
  const flow = result.flow ? flowJson(result.flow, units, !result.axisymmetric) : undefined;
  const continuum = extra.comparison ? continuumJson(extra.comparison, units) : {};
  return {
    format: SUMMARY_FORMAT,
    formatVersion: SUMMARY_FORMAT_VERSION,
    caseName: extra.caseName,
    reference,
    numerics,
    walls,
    ...(flow ? { flow } : {}),
    ...continuum,
    units,
    warnings: [...result.warnings],
    performance,
  };
}

/** summary.json's text: two-space indented, LF line ends, a final newline. */
export function summaryJsonText(result: SimulationResult, extra: SummaryExtra): string {
  return `${JSON.stringify(summaryJson(result, extra), null, 2)}\n`;
}

// ─── CSV ─────────────────────────────────────────────────────────────────────────────────────────────────────────

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

/** One CSV field: numbers as shortest round-trip text (empty if not finite); text escaped and quoted as needed. */
export function csvField(value: number | string): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A whole CSV document: header row, data rows, LF after every row. */
export function csvDocument(header: readonly string[], rows: readonly (readonly (number | string)[])[]): string {
  const lines = [header, ...rows].map((r) => r.map(csvField).join(','));
  return lines.join(CSV_LINE_END) + CSV_LINE_END;
}

/** `name [unit]` and `name ci95 [unit]` for each field of a table. */
function fieldHeaders(t: FieldTable): string[] {
  return t.names.flatMap((name, f) => [`${name} [${t.units[f]}]`, `${name} ci95 [${t.units[f]}]`]);
}

/** Row `r` of a table as mean, ci95 pairs in column order. */
function fieldValues(t: FieldTable, r: number): number[] {
  const width = t.names.length;
  const out: number[] = [];
  for (let f = 0; f < width; f++) out.push(t.mean[r * width + f], t.ci95[r * width + f]);
  return out;
}

/**
 * profiles.csv: one row per row of cells (the profile across the gap), at result.profileY. With a comparison, each
 * DSMC quantity's mean and ci95 columns are followed by one column per model that predicts its row profile
 * (`velocityX firstOrder [m/s]`).
 */
export function profilesCsv(result: SimulationResult, comparison?: ContinuumComparisonResult): string {
  const t = result.profile;
  const width = t.names.length;
  const models: [string, Float64Array][][] = t.names.map((name) => {
    if (!comparison?.recognised) return [];
    const key = `profile.${name}`;
    return Object.entries(comparison.profiles)
      .filter(([, p]) => p?.[key]?.length === t.rows)
      .map(([model, p]) => [model, p![key]] as [string, Float64Array]);
  });
  const header = ['y [m]'];
  t.names.forEach((name, f) =>
    header.push(
      `${name} [${t.units[f]}]`,
      `${name} ci95 [${t.units[f]}]`,
      ...models[f].map(([m]) => `${name} ${m} [${t.units[f]}]`),
    ),
  );
  const rows: (number | string)[][] = [];
  for (let r = 0; r < t.rows; r++) {
    const row: number[] = [result.profileY[r]];
    for (let f = 0; f < width; f++)
      row.push(t.mean[r * width + f], t.ci95[r * width + f], ...models[f].map(([, v]) => v[r]));
    rows.push(row);
  }
  return csvDocument(header, rows);
}

/** fields.csv: one row per cell (cell index ix + cellsX·iy, so x varies fastest), at the cell centre. */
export function fieldsCsv(result: SimulationResult): string {
  const t = result.cells;
  const rows: (number | string)[][] = [];
  for (let c = 0; c < t.rows; c++) rows.push([result.cellX[c], result.cellY[c], ...fieldValues(t, c)]);
  return csvDocument(['x [m]', 'y [m]', ...fieldHeaders(t)], rows);
}

/**
 * surfaces.csv: one row per wall bin. `position [m]` is the bin centre's coordinate along the wall: x for walls
 * normal to y (bottom, top, block bottom and top faces), y (the radius when axisymmetric) for walls normal to x.
 */
export function surfacesCsv(result: SimulationResult): string {
  let header: string[] | undefined;
  const rows: (number | string)[][] = [];
  for (const [wall, bins] of Object.entries(result.wallBins) as [
    string,
    { position: Float64Array; table: FieldTable },
  ][]) {
    header ??= ['wall', 'position [m]', ...fieldHeaders(bins.table)];
    for (let b = 0; b < bins.table.rows; b++) rows.push([wall, bins.position[b], ...fieldValues(bins.table, b)]);
  }
  header ??= [
    'wall',
    'position [m]',
    ...WALL_QUANTITIES.flatMap((q) => [`${q} [${WALL_QUANTITY_UNITS[q]}]`, `${q} ci95 [${WALL_QUANTITY_UNITS[q]}]`]),
  ];
  return csvDocument(header, rows);
}

/**
 * The four result files of a run by file name, in the order they are written. Given the run's plan (or a comparison
 * already made), summary.json and profiles.csv carry the continuum comparison.
 */
export function resultFiles(result: SimulationResult, extra: SummaryExtra & { plan?: Plan }): Record<string, string> {
  const comparison = extra.comparison ?? (extra.plan ? continuumComparisonOf(extra.plan, result) : undefined);
  const summaryExtra = {
    performance: extra.performance,
    caseName: extra.caseName,
    ...(comparison ? { comparison } : {}),
  };
  return {
    'summary.json': summaryJsonText(result, summaryExtra),
    'profiles.csv': profilesCsv(result, comparison),
    'fields.csv': fieldsCsv(result),
    'surfaces.csv': surfacesCsv(result),
    ...(result.flow ? { 'flow.csv': flowCsv(result.flow, !result.axisymmetric) } : {}),
  };
}
