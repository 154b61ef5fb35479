/**
 * Mean free paths with their definition in the type.
 *
 * Three definitions are in common use and differ by up to 13 %, so a slip coefficient quoted "in mean free paths"
 * means nothing until the definition is known; mixing them is the classic error in comparing slip models. Each
 * definition here is its own branded number type (metres at run time, incompatible at compile time), and every
 * conversion says which gas it holds for.
 *
 * - ViscosityMeanFreePath λ = (μ/p)·sqrt(πkT/(2m)): the one behind every Knudsen number in Tenuis
 *   (engine/gas/molecularModel.ts, viscosityMeanFreePathM).
 * - EquivalentFreePath ℓ = μ v0/p with v0 = sqrt(2kT/m) (Sharipov & Seleznev 1998, J. Phys. Chem. Ref. Data 27:657;
 *   published). δ = L/ℓ is the rarefaction parameter. λ = ℓ·√π/2 for any gas, since both are built from μ.
 * - HardSphereMeanFreePath λ_HS = 1/(√2 π d² n) (standard kinetic theory; published). It is a property of the
 *   molecular diameter, not of the viscosity, so its ratio to λ depends on the gas; the conversions here assume a
 *   hard-sphere gas (the only gas for which coefficients quoted in λ_HS were derived).
 */
import {
  viscosityMeanFreePathM,
  mostProbableSpeedMPerS,
  HARD_SPHERE_VISCOSITY_CORRECTION,
} from '../gas/molecularModel';

export type MeanFreePathKind = 'viscosity' | 'equivalent' | 'hardSphere';

/** Every kind, for tables and loops. */
export const MEAN_FREE_PATH_KINDS: readonly MeanFreePathKind[] = ['viscosity', 'equivalent', 'hardSphere'];

declare const meanFreePathKind: unique symbol;

/** A length in metres known to be a mean free path of definition K. */
export type MeanFreePath<K extends MeanFreePathKind> = number & { readonly [meanFreePathKind]: K };

/** λ = (μ/p)·sqrt(πkT/(2m)), m. */
export type ViscosityMeanFreePath = MeanFreePath<'viscosity'>;
/** ℓ = μ v0/p, v0 = sqrt(2kT/m), m. */
export type EquivalentFreePath = MeanFreePath<'equivalent'>;
/** λ_HS = 1/(√2 π d² n), m. */
export type HardSphereMeanFreePath = MeanFreePath<'hardSphere'>;

/**
 * λ/λ_HS for a hard-sphere gas: (5π/16)·1.016034 = 0.99749.
 * Derivation: the converged Chapman–Enskog hard-sphere viscosity μ = 1.016034·(5/16)·sqrt(πmkT)/(πd²)
 * (Chapman & Cowling; published, as in engine/gas/molecularModel.ts) put into λ = (μ/p)·sqrt(πkT/(2m)) with
 * p = nkT gives λ = 1.016034·(5π/16)/(√2 π d² n). Equivalently μ = 0.499 ρ c̄ λ_HS (Chapman & Cowling's form; from
 * memory) against μ = 0.5 ρ c̄ λ.
 */
export const VISCOSITY_PER_HARD_SPHERE_PATH = ((5 * Math.PI) / 16) * HARD_SPHERE_VISCOSITY_CORRECTION;

/** λ/ℓ = √π/2 (from the two definitions: sqrt(πkT/(2m)) = (√π/2)·v0). */
export const VISCOSITY_PER_EQUIVALENT_PATH = Math.sqrt(Math.PI) / 2;

/**
 * Marks lengthM (m) as a mean free path of the given kind, for a value known from elsewhere (a paper, a table).
 * No conversion: the caller vouches for the definition.
 */
export function meanFreePathOfKind<K extends MeanFreePathKind>(kind: K, lengthM: number): MeanFreePath<K> {
  if (!(Number.isFinite(lengthM) && lengthM > 0)) {
    throw new Error(`${kind} mean free path (m) = ${lengthM}: must be a finite number > 0`);
  }
  return lengthM as MeanFreePath<K>;
}

/**
 * λ = (μ/p)·sqrt(πkT/(2m)), m; viscosityPaS in Pa·s, pressurePa in Pa, temperatureK in K, massKg (one molecule) in kg.
 * Delegates to engine/gas/molecularModel.ts so Tenuis has one formula for it.
 */
export function viscosityMeanFreePath(
  viscosityPaS: number,
  pressurePa: number,
  temperatureK: number,
  massKg: number,
): ViscosityMeanFreePath {
  return meanFreePathOfKind('viscosity', viscosityMeanFreePathM(viscosityPaS, pressurePa, temperatureK, massKg));
}

/**
 * ℓ = μ v0/p with v0 = sqrt(2kT/m), m (Sharipov & Seleznev 1998; published); same units as viscosityMeanFreePath.
 */
export function equivalentFreePath(
  viscosityPaS: number,
  pressurePa: number,
  temperatureK: number,
  massKg: number,
): EquivalentFreePath {
  return meanFreePathOfKind('equivalent', (viscosityPaS * mostProbableSpeedMPerS(massKg, temperatureK)) / pressurePa);
}

/** λ_HS = 1/(√2 π d² n), m; diameterM in m, numberDensityPerM3 in 1/m³ (standard kinetic theory; published). */
export function hardSphereMeanFreePath(diameterM: number, numberDensityPerM3: number): HardSphereMeanFreePath {
  return meanFreePathOfKind('hardSphere', 1 / (Math.SQRT2 * Math.PI * diameterM * diameterM * numberDensityPerM3));
}

/**
 * λ_K/λ for the same gas state: 1 (viscosity), 2/√π (equivalent), 1/0.99749 (hard sphere, for a hard-sphere gas;
 * see VISCOSITY_PER_HARD_SPHERE_PATH). A coefficient C quoted in λ_K is C·(λ_K/λ) in λ.
 */
export function pathPerViscosityPath(kind: MeanFreePathKind): number {
  switch (kind) {
    case 'viscosity':
      return 1;
    case 'equivalent':
      return 1 / VISCOSITY_PER_EQUIVALENT_PATH;
    case 'hardSphere':
      return 1 / VISCOSITY_PER_HARD_SPHERE_PATH;
  }
}

/**
 * Converts a mean free path (m) from one definition to another for the same gas state. `from` must name the
 * definition `path` carries (NoInfer keeps the brand from widening to fit a wrong `from`). Conversions involving
 * 'hardSphere' hold for a hard-sphere gas; for other gases they are the conventional reading of λ_HS through the
 * hard-sphere viscosity relation, which is how coefficients given in λ_HS are applied to them.
 */
export function convertMeanFreePath<F extends MeanFreePathKind, T extends MeanFreePathKind>(
  path: MeanFreePath<NoInfer<F>>,
  from: F,
  to: T,
): MeanFreePath<T> {
  return meanFreePathOfKind(to, (path * pathPerViscosityPath(to)) / pathPerViscosityPath(from));
}

/** ℓ = 2λ/√π, m (λ in m; exact for any gas). */
export function equivalentFromViscosityPath(path: ViscosityMeanFreePath): EquivalentFreePath {
  return convertMeanFreePath(path, 'viscosity', 'equivalent');
}

/** λ = ℓ·√π/2, m (ℓ in m; exact for any gas). */
export function viscosityFromEquivalentPath(path: EquivalentFreePath): ViscosityMeanFreePath {
  return convertMeanFreePath(path, 'equivalent', 'viscosity');
}

/** λ_HS = λ/0.99749, m (λ in m; hard-sphere gas, see VISCOSITY_PER_HARD_SPHERE_PATH). */
export function hardSphereFromViscosityPath(path: ViscosityMeanFreePath): HardSphereMeanFreePath {
  return convertMeanFreePath(path, 'viscosity', 'hardSphere');
}

/** λ = 0.99749·λ_HS, m (λ_HS in m; hard-sphere gas, see VISCOSITY_PER_HARD_SPHERE_PATH). */
export function viscosityFromHardSpherePath(path: HardSphereMeanFreePath): ViscosityMeanFreePath {
  return convertMeanFreePath(path, 'hardSphere', 'viscosity');
}

/** Kn = λ/L, dimensionless; λ in m, lengthM (gap or radius) in m. Tenuis's Knudsen number is always on λ. */
export function knudsenNumber(path: ViscosityMeanFreePath, lengthM: number): number {
  return path / lengthM;
}

/** δ = L/ℓ, dimensionless; ℓ in m, lengthM (gap H or radius R) in m (Sharipov & Seleznev 1998; published). */
export function rarefactionOf(path: EquivalentFreePath, lengthM: number): number {
  return lengthM / path;
}
