/**
 * Thermal conductivity and Prandtl number of a dilute gas from its viscosity.
 *
 * Monatomic: κ = (15/4)(k/m)μ, the first Chapman–Enskog approximation, exact to about 0.5 % at higher orders for
 * hard spheres (Chapman & Cowling, "The Mathematical Theory of Non-Uniform Gases"; from memory), so Pr = 2/3.
 * Polyatomic: Eucken's correction κ = μ(c_v + (9/4)(k/m)) (Eucken 1913, Phys. Z. 14:324; from memory): translation
 * carries (15/4)(k/m)μ as in a monatomic gas and the internal modes carry μ·c_v,int, i.e. internal energy diffuses
 * like momentum. It gives Pr = 4γ/(9γ − 5), 0.737 for diatomics (measured about 0.71–0.74 near room temperature).
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';

/** κ = (15/4)(k/m)μ, W/(m·K); viscosityPaS in Pa·s, massKg (one molecule) in kg (Chapman–Enskog; from memory). */
export function monatomicConductivityWPerMK(viscosityPaS: number, massKg: number): number {
  return (15 / 4) * (K_B / massKg) * viscosityPaS;
}

/**
 * Eucken's κ = μ(k/m)(15 + 2ζ)/4, W/(m·K): μ(c_v + 9k/(4m)) with c_v = ((3 + ζ)/2)(k/m). viscosityPaS in Pa·s,
 * massKg in kg, rotationalDof ζ (0, 2 or 3) dimensionless (Eucken 1913, Phys. Z. 14:324; from memory). Reduces to
 * monatomicConductivityWPerMK for ζ = 0.
 */
export function euckenConductivityWPerMK(viscosityPaS: number, massKg: number, rotationalDof: number): number {
  return ((15 + 2 * rotationalDof) / 4) * (K_B / massKg) * viscosityPaS;
}

/** Specific heat at constant pressure c_p = ((5 + ζ)/2)(k/m), J/(kg·K); massKg in kg (ideal gas, frozen vibration). */
export function specificHeatCpJPerKgK(massKg: number, rotationalDof: number): number {
  return ((5 + rotationalDof) / 2) * (K_B / massKg);
}

/** Pr = c_p μ/κ, dimensionless; viscosityPaS in Pa·s, conductivity in W/(m·K), massKg in kg (definition). */
export function prandtlNumber(
  viscosityPaS: number,
  conductivityWPerMK: number,
  massKg: number,
  rotationalDof: number,
): number {
  return (specificHeatCpJPerKgK(massKg, rotationalDof) * viscosityPaS) / conductivityWPerMK;
}
