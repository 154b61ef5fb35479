/**
 * summary.json: a run's reference state, numerics, wall estimates, flow numbers and performance, each under the name
 * and with the SI unit summary.json gives it, as a JSON-ready object and as the file's text. Pure, so the command
 * line writes it to disk and the browser offers it as a download from the same code. With a continuum comparison
 * (comparison.ts) it gains the continuum sections of continuumJson.ts.
 */
import type { ReferenceState } from '../plan/referenceState';
import type { SimulationResult } from '../results/summarize';
import type { IntegralEstimate } from '../stats/estimate';
import { WALL_QUANTITIES, WALL_QUANTITY_UNITS, type WallQuantityName } from '../results/wallQuantities';
import type { ContinuumComparisonResult } from './comparison';
import { continuumJson, type ContinuumSections } from './continuumJson';
import { jsonNumber, wallEstimateJson, type JsonNumber, type WallEstimateJson } from './estimateJson';
import { flowJson, type FlowJson } from './flowJson';

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

export interface SummaryJson extends ContinuumSections {
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
  /** SI unit of every quantity named in this file; a wall estimate's mean and ci95 share its quantity's unit. */
  units: Record<string, string>;
  warnings: string[];
  performance: Record<keyof Performance, JsonNumber>;
}

/** What summaryJson and resultFiles take besides the result; `comparison` adds the continuum sections. */
export interface SummaryExtra {
  performance: Performance;
  caseName: string;
  comparison?: ContinuumComparisonResult;
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
  const flow = result.flow ? flowJson(result.flow, units, result.flow.perDepth ?? !result.axisymmetric) : undefined;
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
