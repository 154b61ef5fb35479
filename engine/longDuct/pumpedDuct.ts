/**
 * A pump at the far end of a long duct: for a gas load Q (pV throughput, Pa·m³/s) entering the chamber at the duct's
 * inlet, the pump holds its inlet at p_pump with p_pump·S_pump(p_pump) = Q, and the duct, carrying ṁ = Q·m/(kT),
 * sets the chamber pressure p_chamber (solved backward from the pump along the duct: ductFlow.ts). The effective
 * pumping speed at the chamber is S_eff = Q/p_chamber. Self-consistent by construction, because the duct's
 * conductance is taken at the pressures it actually has; in the molecular limit, where the conductance C does not
 * depend on pressure, it is the familiar 1/S_eff = 1/S_pump + 1/C (common practice, no source).
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { MolecularModel } from '../gas/molecularModel';
import type { CoefficientTable } from './coefficientTable';
import { solveDuctFlow } from './ductFlow';
import type { DuctGeometry, Estimate } from './isothermalDuct';

/** A constant speed (m³/s), or speed against inlet pressure (ascending pressures, Pa; interpolated in log–log). */
export type PumpSpeed = number | { readonly pressurePa: readonly number[]; readonly speedM3PerS: readonly number[] };

export interface PumpedDuctInput {
  readonly geometry: DuctGeometry;
  readonly gas: MolecularModel;
  readonly temperatureK: number;
  readonly table: CoefficientTable;
  readonly pumpSpeed: PumpSpeed;
  readonly gasLoadPaM3PerS: number;
}

export interface PumpedDuctResult {
  readonly pumpInletPressurePa: number;
  readonly chamberPressurePa: Estimate;
  readonly effectiveSpeedM3PerS: Estimate;
  /** Q/(p_chamber − p_pump): the duct's conductance at the pressures it has. */
  readonly ductConductanceM3PerS: number;
  readonly warnings: readonly string[];
}

function speedAt(s: PumpSpeed, p: number): number {
  if (typeof s === 'number') return s;
  const { pressurePa: x, speedM3PerS: y } = s;
  if (p <= x[0]) return y[0];
  if (p >= x[x.length - 1]) return y[y.length - 1];
  let k = 0;
  while (k < x.length - 2 && p > x[k + 1]) k++;
  const f = Math.log(p / x[k]) / Math.log(x[k + 1] / x[k]);
  return Math.exp(Math.log(y[k]) + f * (Math.log(y[k + 1]) - Math.log(y[k])));
}

function checkPump(s: PumpSpeed): void {
  if (typeof s === 'number') {
    if (!(Number.isFinite(s) && s > 0)) throw new Error(`pump speed = ${s} m³/s: must be a number above 0`);
    return;
  }
  if (s.pressurePa.length < 2 || s.pressurePa.length !== s.speedM3PerS.length)
    throw new Error('pump speed table: give at least two pressures and as many speeds');
  s.pressurePa.forEach((p, k) => {
    if (!(p > 0) || (k > 0 && !(p > s.pressurePa[k - 1])))
      throw new Error(`pump speed table: pressures must be above 0 and rise (point ${k + 1}: ${p} Pa)`);
    if (!(s.speedM3PerS[k] > 0)) throw new Error(`pump speed table: speed at point ${k + 1} must be above 0`);
  });
}

/** The pump's inlet pressure for the gas load: p·S(p) = Q, by bisection in ln p (S positive and continuous). */
function pumpInletPressure(s: PumpSpeed, q: number): number {
  if (typeof s === 'number') return q / s;
  let lo = 1e-20;
  let hi = 1e12;
  for (let k = 0; k < 200; k++) {
    const mid = Math.sqrt(lo * hi);
    if (mid * speedAt(s, mid) < q) lo = mid;
    else hi = mid;
    if (hi / lo < 1 + 1e-13) break;
  }
  return Math.sqrt(lo * hi);
}

export function solvePumpedDuct(input: PumpedDuctInput): PumpedDuctResult {
  const q = input.gasLoadPaM3PerS;
  if (!(Number.isFinite(q) && q > 0)) throw new Error(`gas load = ${q} Pa·m³/s: must be a number above 0`);
  checkPump(input.pumpSpeed);
  const t = input.temperatureK;
  const pumpInlet = pumpInletPressure(input.pumpSpeed, q);
  const flow = (q * input.gas.massKg) / (K_B * t);
  const r = solveDuctFlow({
    geometry: input.geometry,
    gas: input.gas,
    table: input.table,
    upstreamTemperatureK: t,
    downstreamTemperatureK: t,
    downstreamPressurePa: pumpInlet,
    massFlowRateKgPerS: flow,
  });
  const chamber = r.upstreamPressurePa;
  // S_eff = Q/p: its half-width follows the chamber pressure's (relative, first order).
  const speed = q / chamber.mean;
  return {
    pumpInletPressurePa: pumpInlet,
    chamberPressurePa: chamber,
    effectiveSpeedM3PerS: { mean: speed, ci95: (speed * chamber.ci95) / chamber.mean },
    ductConductanceM3PerS: q / (chamber.mean - pumpInlet),
    warnings: r.warnings,
  };
}
