/**
 * Velocity-slip and temperature-jump boundary conditions, as data: each coefficient carries its value, the mean free
 * path definition it is quoted in (meanFreePath.ts), its source and how sure we are of it.
 *
 * Convention, n the wall normal pointing into the gas, λ the viscosity mean free path:
 *   u_gas − u_wall = a1·λ·∂u/∂n − a2·λ²·∂²u/∂n²,   T_gas − T_wall = j·∂T/∂n,
 * where a1, a2 (dimensionless) and j (m) come from slipLengthCoefficients and temperatureJumpDistanceM below.
 *
 * Accommodation: every coefficient here was derived for diffuse walls. Maxwell's factor (2 − σ)/σ, which comes from
 * the share σ of molecules re-emitted diffusely, is applied to the first-order term only (Maxwell 1879; from memory);
 * the second-order coefficients are kinetic diffuse-wall results and are used unchanged, since no set below gives
 * their dependence on σ (our choice; exact for σ = 1).
 */
import { pathPerViscosityPath, type MeanFreePathKind } from './meanFreePath';
import { heatCapacityRatioOf, prandtlNumberOf, viscosityPathOf, type GasState } from './gasState';

/** How a value is known, as in the project's reference notes: read, solved from a published equation, or recalled. */
export type ReferenceFlag = 'published' | 'computed' | 'from memory' | 'common practice';

export interface FirstOrderSlipCoefficient {
  readonly id: 'maxwell' | 'kineticBgk';
  /** Slip length over the mean free path of kind meanFreePath, diffuse walls. */
  readonly value: number;
  readonly meanFreePath: MeanFreePathKind;
  readonly source: string;
  readonly flag: ReferenceFlag;
}

/** Maxwell's first-order slip: slip length λ·(2 − σ)/σ, applied with the viscosity λ (common practice). */
export const MAXWELL_SLIP: FirstOrderSlipCoefficient = Object.freeze({
  id: 'maxwell',
  value: 1,
  meanFreePath: 'viscosity',
  source: 'Maxwell 1879, Phil. Trans. R. Soc. 170:231; used with the viscosity mean free path (common practice)',
  flag: 'from memory',
});

/**
 * Kinetic (linearized BGK, diffuse walls) slip coefficient σ_P = 1.0162 in ℓ units, i.e. 1.1466 in λ units
 * (Cercignani). Tenuis's reference notes §2 (computed: our BGK solver reproduces it) and §6 (classical value, from memory).
 */
export const KINETIC_BGK_SLIP: FirstOrderSlipCoefficient = Object.freeze({
  id: 'kineticBgk',
  value: 1.0162,
  meanFreePath: 'equivalent',
  source: 'linearized BGK half-space problem, diffuse walls (classical value, e.g. Cercignani; reference notes §2, §6)',
  flag: 'computed',
});

export interface SecondOrderSlipCoefficients {
  readonly id: 'cercignani' | 'deissler' | 'hadjiconstantinou';
  /** C1 in u_s = C1 λ_K u′ − C2 λ_K² u″, λ_K the mean free path of kind meanFreePath. */
  readonly c1: number;
  readonly c2: number;
  readonly meanFreePath: MeanFreePathKind;
  readonly source: string;
  readonly flag: ReferenceFlag;
}

/** Cercignani, BGK: C1 = 1.1466, C2 = 0.9756 in the viscosity λ (reference notes §6; from memory). */
export const CERCIGNANI_SECOND_ORDER: SecondOrderSlipCoefficients = Object.freeze({
  id: 'cercignani',
  c1: 1.1466,
  c2: 0.9756,
  meanFreePath: 'viscosity',
  source: 'Cercignani (linearized BGK, diffuse walls), as quoted in reference notes §6',
  flag: 'from memory',
});

/**
 * Deissler 1964 (Int. J. Heat Mass Transfer 7:681): C1 = 1, C2 = 9/8, from a mean-free-path argument
 * (reference notes §6; from memory). Applied with the viscosity λ: the definition Deissler used was not re-read.
 */
export const DEISSLER_SECOND_ORDER: SecondOrderSlipCoefficients = Object.freeze({
  id: 'deissler',
  c1: 1,
  c2: 9 / 8,
  meanFreePath: 'viscosity',
  source: 'Deissler 1964, Int. J. Heat Mass Transfer 7:681 (λ definition not re-read; viscosity λ assumed)',
  flag: 'from memory',
});

/**
 * Hadjiconstantinou 2003 (Phys. Fluids 15:2352): C1 = 1.11, C2 = 0.61 in the hard-sphere λ_HS, fitted to the flow
 * rate of hard-sphere Poiseuille flow (Knudsen layers included in effect) (reference notes §6; from memory).
 */
export const HADJICONSTANTINOU_SECOND_ORDER: SecondOrderSlipCoefficients = Object.freeze({
  id: 'hadjiconstantinou',
  c1: 1.11,
  c2: 0.61,
  meanFreePath: 'hardSphere',
  source: 'Hadjiconstantinou 2003, Phys. Fluids 15:2352 (hard spheres, for the flow rate)',
  flag: 'from memory',
});

export const SECOND_ORDER_SLIP_SETS: readonly SecondOrderSlipCoefficients[] = [
  CERCIGNANI_SECOND_ORDER,
  DEISSLER_SECOND_ORDER,
  HADJICONSTANTINOU_SECOND_ORDER,
];

/** The velocity boundary condition of a solution. firstOrder defaults to MAXWELL_SLIP. */
export type VelocitySlipModel =
  | { readonly kind: 'noSlip' }
  | { readonly kind: 'firstOrder'; readonly coefficient?: FirstOrderSlipCoefficient }
  | { readonly kind: 'secondOrder'; readonly coefficients: SecondOrderSlipCoefficients }
  | { readonly kind: 'freeMolecular' };

/** The velocity models that are boundary conditions on the Navier–Stokes equations. */
export type ContinuumSlipModel = Exclude<VelocitySlipModel, { readonly kind: 'freeMolecular' }>;

export type VelocitySlipKind = VelocitySlipModel['kind'];

/** Checks a Maxwell accommodation coefficient σ (0 < σ ≤ 1) and returns it; what names it in the message. */
export function checkedAccommodation(sigma: number, what: string): number {
  if (!(Number.isFinite(sigma) && sigma > 0 && sigma <= 1)) {
    throw new Error(`${what} = ${sigma}: must be in (0, 1] (1 = diffuse walls)`);
  }
  return sigma;
}

/** (2 − σ)/σ, Maxwell's accommodation factor (Maxwell 1879; from memory). */
export function maxwellFactor(accommodation: number): number {
  return (2 - accommodation) / accommodation;
}

/**
 * a1, a2 of u_s − u_w = a1 λ ∂u/∂n − a2 λ² ∂²u/∂n² for the viscosity λ (dimensionless): the model's coefficients
 * converted from the mean free path they are quoted in (C·λ_K = C·(λ_K/λ)·λ, so a1 = C1·r and a2 = C2·r² with
 * r = λ_K/λ), a1 times (2 − σ)/σ. accommodation σ dimensionless in (0, 1].
 */
export function slipLengthCoefficients(
  model: ContinuumSlipModel,
  accommodation: number,
): { readonly first: number; readonly second: number } {
  const factor = maxwellFactor(checkedAccommodation(accommodation, 'velocity accommodation'));
  switch (model.kind) {
    case 'noSlip':
      return { first: 0, second: 0 };
    case 'firstOrder': {
      const c = model.coefficient ?? MAXWELL_SLIP;
      return { first: factor * c.value * pathPerViscosityPath(c.meanFreePath), second: 0 };
    }
    case 'secondOrder': {
      const { c1, c2, meanFreePath } = model.coefficients;
      const r = pathPerViscosityPath(meanFreePath);
      return { first: factor * c1 * r, second: c2 * r * r };
    }
  }
}

export interface TemperatureJumpCoefficient {
  readonly id: 'smoluchowski' | 'kineticSModel';
  /**
   * smoluchowski: unused (the jump distance is a formula in γ and Pr, 1 here); kineticSModel: ζ_T, jump distance over
   * the mean free path of kind meanFreePath, diffuse walls.
   */
  readonly value: number;
  readonly meanFreePath: MeanFreePathKind;
  readonly source: string;
  readonly flag: ReferenceFlag;
}

/** Smoluchowski's jump distance ((2 − σ_T)/σ_T)(2γ/(γ + 1))(λ/Pr) (reference notes §6; from memory). */
export const SMOLUCHOWSKI_JUMP: TemperatureJumpCoefficient = Object.freeze({
  id: 'smoluchowski',
  value: 1,
  meanFreePath: 'viscosity',
  source: 'Smoluchowski 1898, Ann. Phys. 64:101; jump distance ((2−σ_T)/σ_T)(2γ/(γ+1))(λ/Pr)',
  flag: 'from memory',
});

/**
 * Kinetic temperature-jump coefficient ζ_T = 1.954 in ℓ units (linearized S-model, Pr = 2/3, diffuse walls; reference
 * notes §2 computed, §6 from memory). Monatomic gases only.
 */
export const KINETIC_S_MODEL_JUMP: TemperatureJumpCoefficient = Object.freeze({
  id: 'kineticSModel',
  value: 1.954,
  meanFreePath: 'equivalent',
  source: 'linearized S-model (Shakhov 1968) half-space problem, diffuse walls, monatomic (reference notes §2, §6)',
  flag: 'computed',
});

/**
 * Temperature-jump distance j, m, in T_gas − T_wall = j ∂T/∂n, for the gas state (μ, κ, p, T, ζ; see gasState.ts)
 * and thermal accommodation σ_T in (0, 1].
 * smoluchowski: j = ((2 − σ_T)/σ_T)(2γ/(γ + 1))(λ/Pr) (Smoluchowski 1898; from memory), γ and Pr of the state.
 * kineticSModel: j = ((2 − σ_T)/σ_T)·ζ_T·ℓ; the factor (2 − σ_T)/σ_T is Smoluchowski's, carried over (our choice).
 */
export function temperatureJumpDistanceM(
  coefficient: TemperatureJumpCoefficient,
  state: GasState,
  thermalAccommodation: number,
): number {
  const factor = maxwellFactor(checkedAccommodation(thermalAccommodation, 'thermal accommodation'));
  switch (coefficient.id) {
    case 'smoluchowski': {
      const gamma = heatCapacityRatioOf(state);
      return factor * ((2 * gamma) / (gamma + 1)) * (viscosityPathOf(state) / prandtlNumberOf(state));
    }
    case 'kineticSModel':
      return factor * coefficient.value * pathPerViscosityPath(coefficient.meanFreePath) * viscosityPathOf(state);
  }
}
