/**
 * Molecular collision models (hard sphere HS, variable hard sphere VHS, variable soft sphere VSS) for a single
 * species, and the kinetic-theory quantities derived from them: viscosity, speeds, mean free path, rarefaction,
 * total cross-section and equilibrium collision rate.
 *
 * Conventions (Bird 1994, "Molecular Gas Dynamics and the Direct Simulation of Gas Flows", ch. 3–4, from memory):
 * HS is VHS with ω = 1/2; VHS and VSS share the total cross-section law σ_T(c_r), and VSS differs only by its
 * anisotropic deflection (exponent α), which raises the viscosity cross-section's effect by (α+1)(α+2)/(6α).
 * Viscosities of VHS and VSS gases are Bird's first Chapman–Enskog approximation, the law the tabulated d_ref were
 * fitted with; the HS viscosity includes the higher-approximation factor (see viscosityPaS).
 *
 * Mean free path: Tenuis uses one definition throughout, the viscosity-based λ = (μ/p)·sqrt(πkT/(2m))
 * (viscosityMeanFreePathM), so Kn = λ/L = sqrt(π)/(2δ) with δ = pL/(μ v0) (Sharipov & Seleznev 1998,
 * J. Phys. Chem. Ref. Data 27:657, notation; published).
 */
import jStat from 'jstat';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { SPECIES, type SpeciesId } from './species';

export type CollisionModelKind = 'HS' | 'VHS' | 'VSS';

export interface MolecularModel {
  readonly kind: CollisionModelKind;
  readonly name: string;
  /** Mass of one molecule, kg. */
  readonly massKg: number;
  /** d_ref at referenceTemperatureK, m. */
  readonly referenceDiameterM: number;
  readonly referenceTemperatureK: number;
  /** ω: μ ∝ T^ω (0.5 for HS). */
  readonly viscosityIndex: number;
  /** α: 1 for HS and VHS (isotropic), the VSS value otherwise. */
  readonly scatteringExponent: number;
  /** 0, 2 or 3. */
  readonly rotationalDof: number;
}

/**
 * Ratio of the converged Chapman–Enskog viscosity of hard spheres to its first approximation
 * (Chapman & Cowling, "The Mathematical Theory of Non-Uniform Gases", rigid elastic spheres, higher approximations;
 * published — the value as copied in Tenuis's reference notes §5, section number not checked).
 */
export const HARD_SPHERE_VISCOSITY_CORRECTION = 1.016034;

/** First Chapman–Enskog viscosity of VHS molecules at T_ref, Pa·s (Bird 1994 eq. 4.62; from memory). */
function vhsFirstApproximationViscosityPaS(
  massKg: number,
  diameterM: number,
  referenceTemperatureK: number,
  viscosityIndex: number,
): number {
  const w = viscosityIndex;
  return (
    (15 * Math.sqrt(Math.PI * massKg * K_B * referenceTemperatureK)) /
    (2 * (5 - 2 * w) * (7 - 2 * w) * Math.PI * diameterM * diameterM)
  );
}

/**
 * The collision model of a table gas (engine/gas/species.ts).
 *
 * VHS: the species' VHS diameter and ω. VSS: the VSS diameter, ω and α; throws if the table has no VSS data (air).
 * HS: ω = 1/2, α = 1 and d such that the first-approximation hard-sphere viscosity (5/16)·sqrt(πmkT_ref)/(πd²)
 * equals the species' μ_ref at T_ref (Bird 1994 ch. 4 convention, HS = VHS with ω = 1/2; from memory). The DSMC HS
 * gas then has viscosity 1.016034·μ_ref at T_ref (see viscosityPaS).
 */
export function modelFromSpecies(id: SpeciesId, kind: CollisionModelKind): MolecularModel {
  const s = SPECIES[id];
  const common = {
    kind,
    massKg: s.massKg,
    referenceTemperatureK: s.referenceTemperatureK,
    rotationalDof: s.rotationalDof,
  };
  switch (kind) {
    case 'VHS':
      return Object.freeze({
        ...common,
        name: `${s.name} (VHS)`,
        referenceDiameterM: s.vhsDiameterM,
        viscosityIndex: s.viscosityIndex,
        scatteringExponent: 1,
      });
    case 'VSS': {
      if (s.vssDiameterM === null || s.vssScatteringExponent === null) {
        throw new Error(
          `no VSS data for ${s.name} (${id}) in the species table: use the VHS or HS model, or give a custom gas`,
        );
      }
      return Object.freeze({
        ...common,
        name: `${s.name} (VSS)`,
        referenceDiameterM: s.vssDiameterM,
        viscosityIndex: s.viscosityIndex,
        scatteringExponent: s.vssScatteringExponent,
      });
    }
    case 'HS': {
      // Solve (5/16)·sqrt(πmkT_ref)/(πd²) = μ_ref for d.
      const d2 =
        ((5 / 16) * Math.sqrt(Math.PI * s.massKg * K_B * s.referenceTemperatureK)) /
        (Math.PI * s.referenceViscosityPaS);
      return Object.freeze({
        ...common,
        name: `${s.name} (HS)`,
        referenceDiameterM: Math.sqrt(d2),
        viscosityIndex: 0.5,
        scatteringExponent: 1,
      });
    }
  }
}

/**
 * Viscosity of the model gas at temperatureK (K), Pa·s.
 *
 * VHS: μ = 15·sqrt(πmkT_ref)·(T/T_ref)^ω / (2(5−2ω)(7−2ω)·π·d_ref²) (Bird 1994 eq. 4.62; from memory), the first
 * Chapman–Enskog approximation. VSS: the same times (α+1)(α+2)/(6α) (Bird 1994 ch. 3–4, VSS model; from memory,
 * equation number not checked).
 * HS: μ = 1.016034·(5/16)·sqrt(πmkT)/(πd²) (Chapman & Cowling; published). The factor 1.016034 is the converged
 * Chapman–Enskog value over the first approximation; a DSMC hard-sphere gas solves the Boltzmann equation, so it
 * shows the converged value, and that is what Tenuis reports for HS. For VHS/VSS the DSMC gas likewise sits slightly
 * above the first approximation (the factor falls to 1 as ω → 1, Maxwell molecules), but Bird's first-approximation
 * law is kept because the tabulated diameters were fitted with it.
 */
export function viscosityPaS(model: MolecularModel, temperatureK: number): number {
  const { massKg, referenceDiameterM, referenceTemperatureK, viscosityIndex } = model;
  const atRef = vhsFirstApproximationViscosityPaS(massKg, referenceDiameterM, referenceTemperatureK, viscosityIndex);
  const first = atRef * Math.pow(temperatureK / referenceTemperatureK, viscosityIndex);
  switch (model.kind) {
    case 'HS':
      return HARD_SPHERE_VISCOSITY_CORRECTION * first;
    case 'VHS':
      return first;
    case 'VSS': {
      const a = model.scatteringExponent;
      return (first * (a + 1) * (a + 2)) / (6 * a);
    }
  }
}

/** Most probable molecular speed v0 = sqrt(2kT/m), m/s; massKg in kg, temperatureK in K (Maxwell distribution). */
export function mostProbableSpeedMPerS(massKg: number, temperatureK: number): number {
  return Math.sqrt((2 * K_B * temperatureK) / massKg);
}

/** Mean molecular speed c̄ = sqrt(8kT/(πm)), m/s; massKg in kg, temperatureK in K (Maxwell distribution). */
export function meanSpeedMPerS(massKg: number, temperatureK: number): number {
  return Math.sqrt((8 * K_B * temperatureK) / (Math.PI * massKg));
}

/**
 * Viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m)), m — the λ behind every Knudsen number in Tenuis.
 * viscosityPaS in Pa·s, pressurePa in Pa, temperatureK in K, massKg in kg. Equals (√π/2)·ℓ with Sharipov's
 * equivalent free path ℓ = μ v0/p (Sharipov & Seleznev 1998; published).
 */
export function viscosityMeanFreePathM(
  viscosityPaS: number,
  pressurePa: number,
  temperatureK: number,
  massKg: number,
): number {
  return (viscosityPaS / pressurePa) * Math.sqrt((Math.PI * K_B * temperatureK) / (2 * massKg));
}

/**
 * Rarefaction parameter δ = pH/(μ v0), dimensionless; pressurePa in Pa, lengthM (gap H or radius R) in m,
 * viscosityPaS in Pa·s, mostProbableSpeed v0 in m/s (Sharipov & Seleznev 1998; published).
 */
export function rarefactionParameter(
  pressurePa: number,
  lengthM: number,
  viscosityPaS: number,
  mostProbableSpeed: number,
): number {
  return (pressurePa * lengthM) / (viscosityPaS * mostProbableSpeed);
}

/** Kn = λ/L = sqrt(π)/(2δ) for the viscosity-based λ (follows from the two definitions above). */
export function knudsenFromRarefaction(rarefaction: number): number {
  return Math.sqrt(Math.PI) / (2 * rarefaction);
}

/** δ = sqrt(π)/(2 Kn), the inverse of knudsenFromRarefaction. */
export function rarefactionFromKnudsen(knudsen: number): number {
  return Math.sqrt(Math.PI) / (2 * knudsen);
}

/**
 * C in σ_T·c_r = C·c_r^(2−2ω), SI units (m² · (m/s)^(2ω−1)), for a single species (reduced mass m_r = m/2).
 * From σ_T = π d_ref² (2kT_ref/(m_r c_r²))^(ω−1/2) / Γ(5/2−ω) (Bird 1994 eq. 4.63; from memory):
 * C = π d_ref² (2kT_ref/m_r)^(ω−1/2) / Γ(5/2−ω). For HS (ω = 1/2) C = π d² and σ_T·c_r = C·c_r, so the
 * collision kernel can skip Math.pow.
 */
export function sigmaCrCoefficient(model: MolecularModel): number {
  const { massKg, referenceDiameterM: d, referenceTemperatureK, viscosityIndex: w } = model;
  const reducedMassKg = massKg / 2;
  return (
    (Math.PI * d * d * Math.pow((2 * K_B * referenceTemperatureK) / reducedMassKg, w - 0.5)) / jStat.gammafn(2.5 - w)
  );
}

/**
 * Total collision cross-section σ_T at relative speed relativeSpeed (m/s), m²:
 * σ_T = π d_ref² (2kT_ref/(m_r c_r²))^(ω−1/2) / Γ(5/2−ω), m_r = m/2 (Bird 1994 eq. 4.63; from memory).
 * The same law holds for VSS with its own d_ref.
 */
export function collisionCrossSectionM2(model: MolecularModel, relativeSpeed: number): number {
  return sigmaCrCoefficient(model) * Math.pow(relativeSpeed, 1 - 2 * model.viscosityIndex);
}

/**
 * Equilibrium collision rate of one molecule, ν = n⟨σ_T c_r⟩, 1/s, at number density numberDensityPerM3 (1/m³) and
 * temperatureK (K): ν = 4 d_ref² n sqrt(πkT_ref/m) (T/T_ref)^(1−ω) (Bird 1994 eq. 4.64; from memory). For HS this is
 * √2 π d² n c̄ (standard kinetic theory; published). VSS uses its own d_ref (same σ_T law).
 */
export function equilibriumCollisionRatePerParticle(
  model: MolecularModel,
  numberDensityPerM3: number,
  temperatureK: number,
): number {
  const { massKg, referenceDiameterM: d, referenceTemperatureK, viscosityIndex: w } = model;
  return (
    4 *
    d *
    d *
    numberDensityPerM3 *
    Math.sqrt((Math.PI * K_B * referenceTemperatureK) / massKg) *
    Math.pow(temperatureK / referenceTemperatureK, 1 - w)
  );
}

/** Mean collision time 1/ν, s (see equilibriumCollisionRatePerParticle for units and source). */
export function meanCollisionTimeS(model: MolecularModel, numberDensityPerM3: number, temperatureK: number): number {
  return 1 / equilibriumCollisionRatePerParticle(model, numberDensityPerM3, temperatureK);
}
