/**
 * Force-driven Poiseuille flow: a planar channel of gap H (walls at y = 0 and H) and a round tube of radius R, gas
 * pushed along x by a body acceleration a, fully developed and linearized (constant ρ, μ); continuum with no slip,
 * first- or second-order slip, and the free-molecular tube.
 *
 * Derivation (here), with g = ρa/μ, slip u_s = a1 λ ∂u/∂n − a2 λ² ∂²u/∂n² (slipCoefficients.ts), n into the gas:
 *   channel  μu″ = −ρa:  u = (g/2) y(H − y) + u_s;  at y = 0 ∂u/∂n = gH/2, ∂²u/∂n² = −g, so u_s = g(a1λH/2 + a2λ²);
 *            ṁ′ = ρ∫u dy = ρg(H³/12 + a1λH²/2 + a2λ²H)  per metre of depth;
 *   tube     (μ/r)(r u′)′ = −ρa:  u = (g/4)(R² − r²) + u_s;  at r = R ∂u/∂n = −u′ = gR/2 and ∂²u/∂n² = u″ = −g/2
 *            (the second normal derivative taken literally; curvature terms of curved-wall second-order theories are
 *            not included), so u_s = g(a1λR/2 + a2λ²/2);  ṁ = 2πρ∫u r dr = πρg(R⁴/8 + a1λR³/2 + a2λ²R²/2).
 * Sharipov & Seleznev's reduced flow rate (reference notes §2, §3), with −dp/dx ≡ ρa for a force-driven flow:
 *   channel ṁ′ = (H²/v0)(ρa) G_P, tube ṁ = (πR³/v0)(ρa) G_P, δ = H/ℓ or R/ℓ.
 * Since ρv0/μ = 2/ℓ and λ/ℓ = √π/2:
 *   channel G_P = δ/6 + (√π/2)a1 + (π/2)a2/δ,   tube G_P = δ/4 + (√π/2)a1 + (π/4)a2/δ.
 * No slip gives δ/6 and δ/4; the kinetic slip (√π/2)a1 = σ_P gives δ/6 + σ_P and δ/4 + σ_P (reference notes §2, §3).
 *
 * Free-molecular tube: G_P = 8/(3√π) for diffuse walls (Knudsen 1909; reference notes §3), times (2 − σ)/σ for
 * Maxwell walls (Smoluchowski 1910; from memory). The channel has no free-molecular limit (G_P grows like
 * (1/√π) ln(1/δ), reference notes §2), so its slip model excludes 'freeMolecular'.
 */
import {
  checkedGasState,
  densityKgPerM3,
  equivalentPathOf,
  mostProbableSpeedOf,
  viscosityPathOf,
  type GasState,
} from './gasState';
import { VISCOSITY_PER_EQUIVALENT_PATH, rarefactionOf } from './meanFreePath';
import {
  checkedAccommodation,
  maxwellFactor,
  slipLengthCoefficients,
  type ContinuumSlipModel,
  type VelocitySlipKind,
  type VelocitySlipModel,
} from './slipCoefficients';

/** G_P = 8/(3√π) = 1.50451, free-molecular long tube, diffuse walls (Knudsen 1909; reference notes §3). */
export const FREE_MOLECULAR_TUBE_REDUCED_FLOW_RATE = 8 / (3 * Math.sqrt(Math.PI));

interface ForceDrivenCommon {
  /** Gas at the channel's temperature and mean pressure (gasState.ts). */
  readonly gas: GasState;
  /** a, body acceleration along x, m/s² (equivalent to a pressure gradient −dp/dx = ρa). */
  readonly accelerationMPerS2: number;
  /** Maxwell tangential-momentum accommodation σ of the walls, (0, 1]; default 1 (diffuse). */
  readonly accommodation?: number;
}

export interface ForceDrivenChannelInput extends ForceDrivenCommon {
  /** H, m. */
  readonly gapM: number;
  readonly slip: ContinuumSlipModel;
}

export interface ForceDrivenTubeInput extends ForceDrivenCommon {
  /** R, m. */
  readonly radiusM: number;
  readonly slip: VelocitySlipModel;
}

interface ForceDrivenFlow {
  readonly slip: VelocitySlipKind;
  /** δ = H/ℓ (channel) or R/ℓ (tube). */
  readonly rarefactionParameter: number;
  /** G_P (Sharipov & Seleznev normalization; see the file header). */
  readonly reducedFlowRate: number;
  /** u_gas − u_wall at the wall, m/s; null free-molecular. */
  readonly slipVelocityMPerS: number | null;
}

export interface ForceDrivenChannelFlow extends ForceDrivenFlow {
  /** u(y), m/s, y in m from the wall at y = 0. */
  readonly velocityMPerS: (yM: number) => number;
  /** ṁ′, kg/(s·m): mass flow rate per metre of depth. */
  readonly massFlowRateKgPerSM: number;
}

export interface ForceDrivenTubeFlow extends ForceDrivenFlow {
  /** u(r), m/s, r in m from the axis; null free-molecular (no continuum profile). */
  readonly velocityMPerS: ((rM: number) => number) | null;
  /** ṁ, kg/s. */
  readonly massFlowRateKgPerS: number;
}

function requirePositive(value: number, what: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new Error(`${what} = ${value}: must be a finite number > 0`);
}

function requireFinite(value: number, what: string): void {
  if (!Number.isFinite(value)) throw new Error(`${what} = ${value}: must be a finite number`);
}

/**
 * G_P of the force-driven channel at rarefaction δ (dimensionless), slip model and accommodation σ in (0, 1]:
 * δ/6 + (√π/2)a1 + (π/2)a2/δ (derivation in the file header).
 */
export function channelReducedFlowRate(delta: number, slip: ContinuumSlipModel, accommodation = 1): number {
  requirePositive(delta, 'rarefaction parameter δ');
  const { first, second } = slipLengthCoefficients(slip, accommodation);
  const r = VISCOSITY_PER_EQUIVALENT_PATH;
  return delta / 6 + r * first + (2 * r * r * second) / delta;
}

/**
 * G_P of the force-driven tube at rarefaction δ = R/ℓ, slip model and accommodation σ in (0, 1]:
 * δ/4 + (√π/2)a1 + (π/4)a2/δ, or ((2 − σ)/σ)·8/(3√π) free-molecular (file header).
 */
export function tubeReducedFlowRate(delta: number, slip: VelocitySlipModel, accommodation = 1): number {
  requirePositive(delta, 'rarefaction parameter δ');
  if (slip.kind === 'freeMolecular') {
    return (
      maxwellFactor(checkedAccommodation(accommodation, 'velocity accommodation')) *
      FREE_MOLECULAR_TUBE_REDUCED_FLOW_RATE
    );
  }
  const { first, second } = slipLengthCoefficients(slip, accommodation);
  const r = VISCOSITY_PER_EQUIVALENT_PATH;
  return delta / 4 + r * first + (r * r * second) / delta;
}

/** Force-driven channel flow in SI (see ForceDrivenChannelInput for units; formulas in the file header). */
export function forceDrivenChannelFlow(input: ForceDrivenChannelInput): ForceDrivenChannelFlow {
  const { gapM: h, accelerationMPerS2: a, slip } = input;
  const gas = checkedGasState(input.gas);
  requirePositive(h, 'channel gap (m)');
  requireFinite(a, 'body acceleration (m/s²)');
  const { first, second } = slipLengthCoefficients(slip, input.accommodation ?? 1);
  const rho = densityKgPerM3(gas);
  const g = (rho * a) / gas.viscosityPaS;
  const lambda = viscosityPathOf(gas);
  const us = g * ((first * lambda * h) / 2 + second * lambda * lambda);
  const massFlow = rho * g * ((h * h * h) / 12 + (first * lambda * h * h) / 2 + second * lambda * lambda * h);
  return {
    slip: slip.kind,
    rarefactionParameter: rarefactionOf(equivalentPathOf(gas), h),
    // G_P = ṁ′ v0/(H² ρa); a = 0 leaves the linear ratio undefined, so it is taken from δ instead.
    reducedFlowRate:
      a !== 0
        ? (massFlow * mostProbableSpeedOf(gas)) / (h * h * rho * a)
        : channelReducedFlowRate(rarefactionOf(equivalentPathOf(gas), h), slip, input.accommodation ?? 1),
    slipVelocityMPerS: us,
    velocityMPerS: (y) => (g / 2) * y * (h - y) + us,
    massFlowRateKgPerSM: massFlow,
  };
}

/** Force-driven tube flow in SI (see ForceDrivenTubeInput for units; formulas in the file header). */
export function forceDrivenTubeFlow(input: ForceDrivenTubeInput): ForceDrivenTubeFlow {
  const { radiusM: r, accelerationMPerS2: a, slip } = input;
  const gas = checkedGasState(input.gas);
  requirePositive(r, 'tube radius (m)');
  requireFinite(a, 'body acceleration (m/s²)');
  const sigma = input.accommodation ?? 1;
  const rho = densityKgPerM3(gas);
  const v0 = mostProbableSpeedOf(gas);
  const delta = rarefactionOf(equivalentPathOf(gas), r);
  if (slip.kind === 'freeMolecular') {
    const gp = tubeReducedFlowRate(delta, slip, sigma);
    return {
      slip: slip.kind,
      rarefactionParameter: delta,
      reducedFlowRate: gp,
      slipVelocityMPerS: null,
      velocityMPerS: null,
      massFlowRateKgPerS: ((Math.PI * r * r * r) / v0) * rho * a * gp,
    };
  }
  const { first, second } = slipLengthCoefficients(slip, sigma);
  const g = (rho * a) / gas.viscosityPaS;
  const lambda = viscosityPathOf(gas);
  const us = g * ((first * lambda * r) / 2 + (second * lambda * lambda) / 2);
  const massFlow =
    Math.PI *
    rho *
    g *
    ((r * r * r * r) / 8 + (first * lambda * r * r * r) / 2 + (second * lambda * lambda * r * r) / 2);
  return {
    slip: slip.kind,
    rarefactionParameter: delta,
    reducedFlowRate:
      a !== 0 ? (massFlow * v0) / (Math.PI * r * r * r * rho * a) : tubeReducedFlowRate(delta, slip, sigma),
    slipVelocityMPerS: us,
    velocityMPerS: (radial) => (g / 4) * (r * r - radial * radial) + us,
    massFlowRateKgPerS: massFlow,
  };
}
