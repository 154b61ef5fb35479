/**
 * The gas as the continuum models see it: transport properties at one reference state (pressure, temperature).
 *
 * The analytic solutions are linear (constant μ and κ across the gap), so one state describes the gas; the caller
 * evaluates it at the mean temperature and pressure of the problem. It can be given directly (measured μ and κ) or
 * built from a Tenuis molecular model (gasStateFromModel), which reuses engine/gas/molecularModel.ts.
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { mostProbableSpeedMPerS, viscosityPaS, type MolecularModel } from '../gas/molecularModel';
import { heatCapacityRatio } from '../stats/expectedNoise';
import { euckenConductivityWPerMK, prandtlNumber } from './thermalConductivity';
import {
  equivalentFreePath,
  viscosityMeanFreePath,
  type EquivalentFreePath,
  type ViscosityMeanFreePath,
} from './meanFreePath';

export interface GasState {
  /** μ, Pa·s. */
  readonly viscosityPaS: number;
  /** κ, W/(m·K). */
  readonly conductivityWPerMK: number;
  /** Mass of one molecule, kg. */
  readonly massKg: number;
  /** ζ: 0 monatomic, 2 linear, 3 non-linear molecules (sets γ and c_p). */
  readonly rotationalDof: number;
  readonly pressurePa: number;
  readonly temperatureK: number;
}

function requirePositive(value: number, what: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new Error(`${what} = ${value}: must be a finite number > 0`);
}

/** Checks every field of a GasState given by hand; throws naming the field and value. */
export function checkedGasState(state: GasState): GasState {
  requirePositive(state.viscosityPaS, 'gas viscosity (Pa·s)');
  requirePositive(state.conductivityWPerMK, 'gas thermal conductivity (W/(m·K))');
  requirePositive(state.massKg, 'molecular mass (kg)');
  requirePositive(state.pressurePa, 'gas pressure (Pa)');
  requirePositive(state.temperatureK, 'gas temperature (K)');
  if (!(Number.isFinite(state.rotationalDof) && state.rotationalDof >= 0)) {
    throw new Error(`rotational degrees of freedom = ${state.rotationalDof}: must be a finite number ≥ 0`);
  }
  return state;
}

/**
 * Gas state of a Tenuis molecular model at pressurePa (Pa) and temperatureK (K): μ from viscosityPaS (Bird 1994 VHS/VSS
 * law, converged Chapman–Enskog for HS; see engine/gas/molecularModel.ts) and κ from Eucken's relation
 * (thermalConductivity.ts; monatomic (15/4)(k/m)μ when ζ = 0).
 */
export function gasStateFromModel(model: MolecularModel, pressurePa: number, temperatureK: number): GasState {
  requirePositive(pressurePa, 'gas pressure (Pa)');
  requirePositive(temperatureK, 'gas temperature (K)');
  const mu = viscosityPaS(model, temperatureK);
  return {
    viscosityPaS: mu,
    conductivityWPerMK: euckenConductivityWPerMK(mu, model.massKg, model.rotationalDof),
    massKg: model.massKg,
    rotationalDof: model.rotationalDof,
    pressurePa,
    temperatureK,
  };
}

/** ρ = pm/(kT), kg/m³ (ideal gas). */
export function densityKgPerM3(state: GasState): number {
  return (state.pressurePa * state.massKg) / (K_B * state.temperatureK);
}

/** v0 = sqrt(2kT/m), m/s (Maxwell distribution). */
export function mostProbableSpeedOf(state: GasState): number {
  return mostProbableSpeedMPerS(state.massKg, state.temperatureK);
}

/** λ = (μ/p)·sqrt(πkT/(2m)), m (see meanFreePath.ts). */
export function viscosityPathOf(state: GasState): ViscosityMeanFreePath {
  return viscosityMeanFreePath(state.viscosityPaS, state.pressurePa, state.temperatureK, state.massKg);
}

/** ℓ = μ v0/p, m (Sharipov & Seleznev 1998; see meanFreePath.ts). */
export function equivalentPathOf(state: GasState): EquivalentFreePath {
  return equivalentFreePath(state.viscosityPaS, state.pressurePa, state.temperatureK, state.massKg);
}

/** γ = (5 + ζ)/(3 + ζ) (ideal gas, frozen vibration; engine/stats/expectedNoise.ts). */
export function heatCapacityRatioOf(state: GasState): number {
  return heatCapacityRatio(state.rotationalDof);
}

/** Pr = c_p μ/κ of the state (definition; thermalConductivity.ts). */
export function prandtlNumberOf(state: GasState): number {
  return prandtlNumber(state.viscosityPaS, state.conductivityWPerMK, state.massKg, state.rotationalDof);
}

/** Specific gas constant R = k/m, J/(kg·K). */
export function specificGasConstantOf(state: GasState): number {
  return K_B / state.massKg;
}
