/**
 * Planar Couette flow: gas between walls at y = 0 and y = H moving along x at U_bottom and U_top, linearized
 * (constant μ, no viscous heating), in the continuum, slip and free-molecular limits.
 *
 * Continuum with slip: the momentum equation gives u″ = 0, so u = A + By. With slip length ζ at both walls,
 * u(0) − U_b = ζ u′(0) and U_t − u(H) = ζ u′(H) (the normal into the gas is −y at the top), hence
 * B = (U_t − U_b)/(H + 2ζ) and τ = μB (derived here from the slip condition). Second-order slip adds −C2 λ² u″ = 0, so it is first-order slip with the set's C1.
 * In Sharipov's normalization Π = −P_xy v0/(p ΔU) = τ v0/(p ΔU) = ℓ/(H + 2ζ): with the kinetic ζ = σ_P ℓ this is
 * 1/(δ + 2σ_P), the large-δ limit of the linearized BGK solution (reference notes §2).
 * Free-molecular: Π = σ/((2 − σ)√π) for Maxwell walls of accommodation σ (reference notes §2; 1/√π for diffuse walls).
 */
import {
  checkedGasState,
  densityKgPerM3,
  equivalentPathOf,
  mostProbableSpeedOf,
  viscosityPathOf,
  type GasState,
} from './gasState';
import { rarefactionOf } from './meanFreePath';
import {
  checkedAccommodation,
  slipLengthCoefficients,
  type VelocitySlipKind,
  type VelocitySlipModel,
} from './slipCoefficients';

export interface CouetteInput {
  /** Gas at the wall temperature and the mean pressure (gasState.ts). */
  readonly gas: GasState;
  /** H, m. */
  readonly gapM: number;
  /** U_bottom, wall at y = 0, m/s along x. */
  readonly bottomWallSpeedMPerS: number;
  /** U_top, wall at y = H, m/s along x. */
  readonly topWallSpeedMPerS: number;
  readonly slip: VelocitySlipModel;
  /** Maxwell tangential-momentum accommodation σ of both walls, (0, 1]; default 1 (diffuse). */
  readonly accommodation?: number;
}

export interface CouetteSolution {
  readonly slip: VelocitySlipKind;
  /**
   * τ_xy = μ du/dy, Pa (−P_xy in kinetic terms). The gas pushes the top wall along x with −τ_xy per unit area and the
   * bottom wall with +τ_xy.
   */
  readonly shearStressPa: number;
  /** Π = τ_xy v0/(p (U_top − U_bottom)), dimensionless; independent of the wall speeds in this linear theory. */
  readonly reducedShearStress: number;
  /** δ = H/ℓ. */
  readonly rarefactionParameter: number;
  /** Slip length ζ, m (0 for no slip); null free-molecular, where there is no continuum profile to slip. */
  readonly slipLengthM: number | null;
  /** u(y), m/s, y in m from the bottom wall. Free-molecular: the uniform mean velocity of the gas. */
  readonly velocityMPerS: (yM: number) => number;
  /** u_gas − u_wall at y = 0 and y = H, m/s. */
  readonly slipAtBottomMPerS: number;
  readonly slipAtTopMPerS: number;
  /** Mass flow rate along x per metre of depth, kg/(s·m): ρ ∫ u dy. */
  readonly massFlowRateKgPerSM: number;
}

/** Π = σ/((2 − σ)√π), free-molecular Couette flow between Maxwell walls (reference notes §2; accommodation in (0, 1]). */
export function freeMolecularCouetteReducedShear(accommodation: number): number {
  const sigma = checkedAccommodation(accommodation, 'velocity accommodation');
  return sigma / ((2 - sigma) * Math.sqrt(Math.PI));
}

/**
 * Couette flow for the given gas (μ, p, T, m), gap H (m), wall speeds (m/s), slip model and accommodation (see
 * CouetteInput). Source of each limit in the file header.
 */
export function couetteFlow(input: CouetteInput): CouetteSolution {
  const { gapM: h, bottomWallSpeedMPerS: ub, topWallSpeedMPerS: ut, slip } = input;
  const gas = checkedGasState(input.gas);
  if (!(Number.isFinite(h) && h > 0)) throw new Error(`Couette gap (m) = ${h}: must be a finite number > 0`);
  if (!(Number.isFinite(ub) && Number.isFinite(ut))) {
    throw new Error(`Couette wall speeds (m/s) = ${ub}, ${ut}: must be finite`);
  }
  const sigma = checkedAccommodation(input.accommodation ?? 1, 'velocity accommodation');
  const ell = equivalentPathOf(gas);
  const v0 = mostProbableSpeedOf(gas);
  const du = ut - ub;
  const rho = densityKgPerM3(gas);
  const delta = rarefactionOf(ell, h);

  if (slip.kind === 'freeMolecular') {
    const pi = freeMolecularCouetteReducedShear(sigma);
    // Equal accommodation at both walls: by symmetry the gas moves with the mean wall speed.
    const mean = (ub + ut) / 2;
    return {
      slip: slip.kind,
      shearStressPa: (pi * gas.pressurePa * du) / v0,
      reducedShearStress: pi,
      rarefactionParameter: delta,
      slipLengthM: null,
      velocityMPerS: () => mean,
      slipAtBottomMPerS: mean - ub,
      slipAtTopMPerS: mean - ut,
      massFlowRateKgPerSM: rho * mean * h,
    };
  }

  // u″ = 0: the second-order coefficient drops out, only the first-order slip length matters.
  const zeta = slipLengthCoefficients(slip, sigma).first * viscosityPathOf(gas);
  const gradient = du / (h + 2 * zeta);
  const atBottom = ub + zeta * gradient;
  return {
    slip: slip.kind,
    shearStressPa: gas.viscosityPaS * gradient,
    reducedShearStress: ell / (h + 2 * zeta),
    rarefactionParameter: delta,
    slipLengthM: zeta,
    velocityMPerS: (y) => atBottom + gradient * y,
    slipAtBottomMPerS: zeta * gradient,
    slipAtTopMPerS: -zeta * gradient,
    massFlowRateKgPerSM: (rho * h * (ub + ut)) / 2,
  };
}
