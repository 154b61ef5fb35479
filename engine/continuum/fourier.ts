/**
 * Planar heat conduction (Fourier flow): gas at rest between walls at y = 0 (temperature T1) and y = H (T2),
 * linearized (|T1 − T2| ≪ T, constant κ), in the continuum, temperature-jump and free-molecular limits.
 *
 * Continuum with jump distance j at both walls: T″ = 0, T(0) − T1 = j T′(0), T2 − T(H) = j T′(H), hence
 * T′ = (T2 − T1)/(H + 2j) and q = κ(T1 − T2)/(H + 2j) (derived here from the jump condition). In Sharipov's
 * normalization q* = q √π T0/(p v0 ΔT), ΔT = T1 − T2, a monatomic gas (κ = (15/4)(k/m)μ) with the kinetic jump
 * j = ζ_T ℓ gives q* = (15√π/8)/(δ + 2ζ_T), the large-δ limit of the linearized S-model solution (reference notes §2).
 *
 * There is no second-order variant: T″ = 0 here, so a second-order jump term would vanish, and no second-order jump
 * set is in slipCoefficients.ts.
 *
 * Free-molecular: each molecule leaving a wall carries 2kT_w of translational energy (flux-weighted) and (ζ/2)kT_w
 * of rotational energy, the one-way number flux being n v0/(2√π); for diffuse walls q = (1 + ζ/4) p v0 ΔT/(√π T0),
 * i.e. q* = 1 for a monatomic gas (reference notes §2). With thermal accommodation σ_T at both walls the exchange is
 * reduced to σ_T/(2 − σ_T) of it (Knudsen's series of partial accommodations; from memory), and q* = (1 + ζ/4)σ_T/(2 − σ_T).
 */
import { checkedGasState, equivalentPathOf, mostProbableSpeedOf, type GasState } from './gasState';
import { rarefactionOf } from './meanFreePath';
import {
  checkedAccommodation,
  SMOLUCHOWSKI_JUMP,
  temperatureJumpDistanceM,
  type TemperatureJumpCoefficient,
} from './slipCoefficients';

/** The temperature boundary condition of a heat-conduction solution. firstOrder defaults to SMOLUCHOWSKI_JUMP. */
export type TemperatureJumpModel =
  | { readonly kind: 'noJump' }
  | { readonly kind: 'firstOrder'; readonly coefficient?: TemperatureJumpCoefficient }
  | { readonly kind: 'freeMolecular' };

export type TemperatureJumpKind = TemperatureJumpModel['kind'];

export interface FourierInput {
  /** Gas at the mean wall temperature T0 and its pressure (gasState.ts); T0 and p normalize q*. */
  readonly gas: GasState;
  /** H, m. */
  readonly gapM: number;
  /** T1, wall at y = 0, K. */
  readonly bottomWallTemperatureK: number;
  /** T2, wall at y = H, K. */
  readonly topWallTemperatureK: number;
  readonly jump: TemperatureJumpModel;
  /** Thermal accommodation σ_T of both walls, (0, 1]; default 1 (diffuse). */
  readonly thermalAccommodation?: number;
}

export interface FourierSolution {
  readonly jump: TemperatureJumpKind;
  /** q_y, W/m²: positive from the bottom wall to the top wall (T1 > T2). */
  readonly heatFluxWPerM2: number;
  /** q* = q √π T0/(p v0 (T1 − T2)), dimensionless; independent of T1 − T2 in this linear theory. */
  readonly reducedHeatFlux: number;
  /** δ = H/ℓ. */
  readonly rarefactionParameter: number;
  /** Jump distance j, m (0 for no jump); null free-molecular. */
  readonly jumpDistanceM: number | null;
  /**
   * T(y), K, y in m from the bottom wall. Free-molecular: the uniform linearized gas temperature (T1 + T2)/2
   * (for diffuse walls the exact value is sqrt(T1 T2), the same to first order in T1 − T2).
   */
  readonly temperatureK: (yM: number) => number;
  /** T_gas − T_wall at y = 0 and y = H, K. */
  readonly jumpAtBottomK: number;
  readonly jumpAtTopK: number;
}

/**
 * q* = (1 + ζ/4)·σ_T/(2 − σ_T), free-molecular heat flux between parallel walls (see the file header; 1 for a
 * monatomic gas and diffuse walls, reference notes §2). rotationalDof ζ and σ_T dimensionless.
 */
export function freeMolecularReducedHeatFlux(thermalAccommodation: number, rotationalDof: number): number {
  const sigma = checkedAccommodation(thermalAccommodation, 'thermal accommodation');
  return (1 + rotationalDof / 4) * (sigma / (2 - sigma));
}

/** Heat conduction for the given gas (κ, μ, p, T0, m, ζ), gap (m), wall temperatures (K) and jump model. */
export function fourierFlow(input: FourierInput): FourierSolution {
  const { gapM: h, bottomWallTemperatureK: t1, topWallTemperatureK: t2, jump } = input;
  const gas = checkedGasState(input.gas);
  if (!(Number.isFinite(h) && h > 0)) throw new Error(`Fourier gap (m) = ${h}: must be a finite number > 0`);
  if (!(Number.isFinite(t1) && t1 > 0 && Number.isFinite(t2) && t2 > 0)) {
    throw new Error(`Fourier wall temperatures (K) = ${t1}, ${t2}: must be finite numbers > 0`);
  }
  const sigma = checkedAccommodation(input.thermalAccommodation ?? 1, 'thermal accommodation');
  // q = q* · p v0 ΔT/(√π T0): the scale of both limits.
  const fluxScale = (gas.pressurePa * mostProbableSpeedOf(gas)) / (Math.sqrt(Math.PI) * gas.temperatureK);
  const delta = rarefactionOf(equivalentPathOf(gas), h);

  if (jump.kind === 'freeMolecular') {
    const qStar = freeMolecularReducedHeatFlux(sigma, gas.rotationalDof);
    const mean = (t1 + t2) / 2;
    return {
      jump: jump.kind,
      heatFluxWPerM2: qStar * fluxScale * (t1 - t2),
      reducedHeatFlux: qStar,
      rarefactionParameter: delta,
      jumpDistanceM: null,
      temperatureK: () => mean,
      jumpAtBottomK: mean - t1,
      jumpAtTopK: mean - t2,
    };
  }

  const j = jump.kind === 'noJump' ? 0 : temperatureJumpDistanceM(jump.coefficient ?? SMOLUCHOWSKI_JUMP, gas, sigma);
  const gradient = (t2 - t1) / (h + 2 * j);
  const atBottom = t1 + j * gradient;
  return {
    jump: jump.kind,
    heatFluxWPerM2: -gas.conductivityWPerMK * gradient,
    reducedHeatFlux: gas.conductivityWPerMK / ((h + 2 * j) * fluxScale),
    rarefactionParameter: delta,
    jumpDistanceM: j,
    temperatureK: (y) => atBottom + gradient * y,
    jumpAtBottomK: j * gradient,
    jumpAtTopK: -j * gradient,
  };
}
