/**
 * One long-duct answer for the command line (`tenuis duct`) and the page's Long duct view: a request in SI units
 * (geometry, gas, end temperatures, two of the end pressures and the mass flow, or a pump with its gas load, and a
 * coefficient table) solved by engine/longDuct/, and the files made from it — summary.json, duct.csv along the
 * duct, conductance.csv over a range of pressures. Both interfaces call these functions, so the page's export and
 * the command's files are the same bytes for the same request.
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { MOLECULES_PER_S_PER_SCCM } from '../units/engineeringUnits';
import { SPECIES } from '../gas/species';
import type { SpeciesId } from '../gas/species';
import { modelFromSpecies, mostProbableSpeedMPerS, viscosityPaS, type MolecularModel } from '../gas/molecularModel';
import { speedOfSoundMPerS } from '../stats/expectedNoise';
import type { CoefficientTable } from '../longDuct/coefficientTable';
import { solveDuctFlow, type DuctFlowResult } from '../longDuct/ductFlow';
import { dimensionsOf, type DuctGeometry, type Estimate } from '../longDuct/isothermalDuct';
import { solvePumpedDuct, type PumpedDuctResult } from '../longDuct/pumpedDuct';
import { conductanceCurve, type ConductancePoint } from '../longDuct/conductanceCurve';
import { csvDocument } from './csv';

export interface LongDuctRequest {
  readonly geometry: DuctGeometry;
  readonly species: SpeciesId;
  readonly table: CoefficientTable;
  readonly upstreamTemperatureK: number;
  readonly downstreamTemperatureK: number;
  /** Two of the three (Pa, Pa, kg/s), unless a pump is given. */
  readonly upstreamPressurePa?: number;
  readonly downstreamPressurePa?: number;
  readonly massFlowRateKgPerS?: number;
  /** A pump at the outlet (m³/s) and the gas load into the chamber at the inlet (Pa·m³/s), instead of pressures. */
  readonly pump?: { readonly speedM3PerS: number; readonly gasLoadPaM3PerS: number };
}

export interface EndState {
  readonly pressure: number;
  readonly temperature: number;
  readonly rarefaction: number;
  readonly knudsen: number;
}

/** summary.json of a long duct: SI units, every flow number as {mean, ci95} from the table's half-widths. */
export interface LongDuctSummary {
  readonly format: 'tenuis long duct';
  readonly gas: string;
  readonly shape: DuctGeometry['shape'];
  readonly reference: {
    readonly temperature: number;
    readonly viscosity: number;
    readonly mostProbableSpeed: number;
    readonly lengthScale: number;
  };
  readonly upstream: EndState;
  readonly downstream: EndState;
  readonly flow: {
    readonly massFlowRate: Estimate;
    readonly throughput: Estimate;
    readonly molarFlow: Estimate;
    readonly conductance?: Estimate;
    readonly transmissionProbability?: Estimate;
    readonly effectivePumpingSpeed?: Estimate;
  };
  readonly coefficients: { readonly source: string; readonly gasAndWall: string; readonly points: number };
  readonly units: Readonly<Record<string, string>>;
  readonly warnings: readonly string[];
}

export type LongDuctAnswer =
  | { readonly kind: 'flow'; readonly result: DuctFlowResult; readonly summary: LongDuctSummary }
  | { readonly kind: 'pumped'; readonly result: PumpedDuctResult; readonly summary: LongDuctSummary };

/** Knudsen number from the rarefaction, λ/a = √π/(2δ) (viscosity-based mean free path; Sharipov & Seleznev 1998). */
export const knudsenOfRarefaction = (delta: number): number => Math.sqrt(Math.PI) / (2 * delta);

function endState(gas: MolecularModel, a: number, p: number, t: number): EndState {
  const delta = (p * a) / (viscosityPaS(gas, t) * mostProbableSpeedMPerS(gas.massKg, t));
  return { pressure: p, temperature: t, rarefaction: delta, knudsen: knudsenOfRarefaction(delta) };
}

interface Flows {
  readonly up: number;
  readonly down: number;
  readonly flow: Estimate;
  readonly pumpingSpeed?: Estimate;
  readonly warnings: readonly string[];
}

function summaryOf(r: LongDuctRequest, gas: MolecularModel, f: Flows): LongDuctSummary {
  const m = gas.massKg;
  const tUp = r.upstreamTemperatureK;
  const ktUp = K_B * tUp;
  const d = dimensionsOf(r.geometry);
  const scale = (k: number): Estimate => ({ mean: f.flow.mean * k, ci95: f.flow.ci95 * Math.abs(k) });
  const dp = f.up - f.down;
  return {
    format: 'tenuis long duct',
    gas: r.species,
    shape: r.geometry.shape,
    reference: {
      temperature: tUp,
      viscosity: viscosityPaS(gas, tUp),
      mostProbableSpeed: mostProbableSpeedMPerS(m, tUp),
      lengthScale: d.scaleM,
    },
    upstream: endState(gas, d.scaleM, f.up, tUp),
    downstream: endState(gas, d.scaleM, f.down, r.downstreamTemperatureK),
    flow: {
      massFlowRate: f.flow,
      throughput: scale(ktUp / m),
      molarFlow: scale(1 / (m * MOLECULES_PER_S_PER_SCCM)),
      ...(dp > 0
        ? {
            conductance: scale(ktUp / (m * dp)),
            transmissionProbability: scale(1 / (d.areaM2 * dp * Math.sqrt(m / (2 * Math.PI * ktUp)))),
          }
        : {}),
      ...(f.pumpingSpeed ? { effectivePumpingSpeed: f.pumpingSpeed } : {}),
    },
    coefficients: { source: r.table.source, gasAndWall: r.table.gasAndWall, points: r.table.points.length },
    units: {
      pressure: 'Pa',
      temperature: 'K',
      massFlowRate: 'kg/s',
      throughput: 'Pa m^3/s',
      molarFlow: 'sccm',
      conductance: 'm^3/s',
      effectivePumpingSpeed: 'm^3/s',
    },
    warnings: f.warnings,
  };
}

/** Solves a long-duct request (throws an Error that says which input is wrong and how to mend it). */
export function longDuctAnswer(r: LongDuctRequest): LongDuctAnswer {
  if (!(r.species in SPECIES)) throw new Error(`gas "${r.species}": not in the species table`);
  const gas = modelFromSpecies(r.species, 'VHS');
  if (r.pump) {
    if (r.upstreamTemperatureK !== r.downstreamTemperatureK)
      throw new Error('a pumped duct is solved at one temperature along the duct: give equal end temperatures');
    const result = solvePumpedDuct({
      geometry: r.geometry,
      gas,
      temperatureK: r.upstreamTemperatureK,
      table: r.table,
      pumpSpeed: r.pump.speedM3PerS,
      gasLoadPaM3PerS: r.pump.gasLoadPaM3PerS,
    });
    const flow = (r.pump.gasLoadPaM3PerS * gas.massKg) / (K_B * r.upstreamTemperatureK);
    const summary = summaryOf(r, gas, {
      up: result.chamberPressurePa.mean,
      down: result.pumpInletPressurePa,
      flow: { mean: flow, ci95: 0 },
      pumpingSpeed: result.effectiveSpeedM3PerS,
      warnings: result.warnings,
    });
    return { kind: 'pumped', result, summary };
  }
  const result = solveDuctFlow({
    geometry: r.geometry,
    gas,
    table: r.table,
    upstreamTemperatureK: r.upstreamTemperatureK,
    downstreamTemperatureK: r.downstreamTemperatureK,
    upstreamPressurePa: r.upstreamPressurePa,
    downstreamPressurePa: r.downstreamPressurePa,
    massFlowRateKgPerS: r.massFlowRateKgPerS,
  });
  const summary = summaryOf(r, gas, {
    up: result.upstreamPressurePa.mean,
    down: result.downstreamPressurePa.mean,
    flow: result.massFlowRateKgPerS,
    warnings: result.warnings,
  });
  return { kind: 'flow', result, summary };
}

/** Along the duct: position, pressure, temperature, rarefaction, Knudsen number, mean speed and Mach number. */
export interface LongDuctProfileRows {
  readonly xM: number[];
  readonly pressurePa: number[];
  readonly temperatureK: number[];
  readonly rarefaction: number[];
  readonly knudsen: number[];
  readonly meanSpeedMPerS: number[];
  readonly mach: number[];
}

/** About `points` rows of the solved profile (every k-th of the solver's steps, and always the outlet). */
export function longDuctProfile(r: LongDuctRequest, result: DuctFlowResult, points = 201): LongDuctProfileRows {
  const gas = modelFromSpecies(r.species, 'VHS');
  const area = dimensionsOf(r.geometry).areaM2;
  const p = result.profile;
  const flow = result.massFlowRateKgPerS.mean;
  const rows: LongDuctProfileRows = {
    xM: [],
    pressurePa: [],
    temperatureK: [],
    rarefaction: [],
    knudsen: [],
    meanSpeedMPerS: [],
    mach: [],
  };
  const n = p.xM.length;
  const stride = Math.max(1, Math.floor((n - 1) / Math.max(1, points - 1)));
  const picks: number[] = [];
  for (let k = 0; k < n - 1; k += stride) picks.push(k);
  picks.push(n - 1);
  for (const k of picks) {
    const t = p.temperatureK[k];
    const rho = (p.pressurePa[k] * gas.massKg) / (K_B * t);
    const u = flow / (rho * area);
    rows.xM.push(p.xM[k]);
    rows.pressurePa.push(p.pressurePa[k]);
    rows.temperatureK.push(t);
    rows.rarefaction.push(p.rarefaction[k]);
    rows.knudsen.push(knudsenOfRarefaction(p.rarefaction[k]));
    rows.meanSpeedMPerS.push(u);
    rows.mach.push(Math.abs(u) / speedOfSoundMPerS(gas.massKg, t, gas.rotationalDof));
  }
  return rows;
}

/** duct.csv: the profile along the duct with units in every header. */
export function longDuctProfileCsv(rows: LongDuctProfileRows): string {
  return csvDocument(
    [
      'x (m)',
      'pressure (Pa)',
      'temperature (K)',
      'rarefaction δ (1)',
      'Knudsen number (1)',
      'mean speed (m/s)',
      'Mach number (1)',
    ],
    rows.xM.map((x, k) => [
      x,
      rows.pressurePa[k],
      rows.temperatureK[k],
      rows.rarefaction[k],
      rows.knudsen[k],
      rows.meanSpeedMPerS[k],
      rows.mach[k],
    ]),
  );
}

export interface ConductanceCurveRequest {
  readonly geometry: DuctGeometry;
  readonly species: SpeciesId;
  readonly table: CoefficientTable;
  readonly temperatureK: number;
  /** Upstream pressures, Pa; the downstream one is ratio × upstream. */
  readonly upstreamPressuresPa: readonly number[];
  readonly ratio: number;
}

/** The conductance over a range of upstream pressures at a fixed pressure ratio, with the continuum lines. */
export function longDuctConductanceCurve(r: ConductanceCurveRequest): ConductancePoint[] {
  if (!(r.ratio > 0 && r.ratio < 1))
    throw new Error(`pressure ratio down/up = ${r.ratio}: give a downstream pressure below the upstream one`);
  return conductanceCurve({
    geometry: r.geometry,
    gas: modelFromSpecies(r.species, 'VHS'),
    temperatureK: r.temperatureK,
    table: r.table,
    upstreamPressuresPa: r.upstreamPressuresPa,
    ratio: r.ratio,
  });
}

/** Upstream pressures from A to B, n of them, in equal steps or equal ratios. */
export function pressureRange(fromPa: number, toPa: number, n: number, log: boolean): number[] {
  return Array.from({ length: n }, (_, k) =>
    log ? fromPa * (toPa / fromPa) ** (k / (n - 1)) : fromPa + ((toPa - fromPa) * k) / (n - 1),
  );
}

/** conductance.csv: the table's conductance with its half-width beside the continuum and free-molecular lines. */
export function conductanceCurveCsv(curve: readonly ConductancePoint[]): string {
  return csvDocument(
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
}
