/**
 * The statistical error a DSMC run will have before it runs, and the sampling it needs for a target error.
 *
 * Relative errors of cell averages in an (near-)equilibrium dilute gas, Hadjiconstantinou, Garcia, Bazant & He 2003
 * (J. Comput. Phys. 187:274; from memory), with N simulated particles per cell and M independent samples:
 *   velocity     E_u = σ_u/u = 1/(Ac·sqrt(γ N M)),  Ac = u/c, c = sqrt(γkT/m)
 *   density      E_ρ = σ_ρ/ρ = 1/sqrt(N M)                     (Poisson number fluctuations of a dilute gas)
 *   temperature  E_T = σ_T/T = sqrt(k/(c_v N M)),   c_v the heat capacity per molecule at constant volume.
 * The velocity error in absolute terms, E_u·u = sqrt(kT/(m N M)), does not depend on u: a slow flow needs many more
 * samples for the same relative error (samples ∝ Ac⁻²; Hadjiconstantinou & Garcia 2002, published per Tenuis's
 * reference notes §8). Tenuis reports the translational temperature, whose c_v is 3k/2 for any gas (three
 * translational degrees of freedom), so E_T = sqrt(2/(3 N M)) is the default here; pass (3+ζ)/2 for a temperature
 * over all ζ rotational degrees of freedom too.
 *
 * These are estimates for planning: they hold for cells near equilibrium with M truly independent samples.
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { Plan } from '../plan/plan';

export type NoiseQuantity = 'velocity' | 'density' | 'temperature';
export const NOISE_QUANTITIES: readonly NoiseQuantity[] = ['velocity', 'density', 'temperature'];

/** c_v/k of translation alone: 3/2 (equipartition over three translational degrees of freedom; textbook). */
export const TRANSLATIONAL_HEAT_CAPACITY_OVER_K = 1.5;

function requirePositive(value: number, what: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new Error(`${what} = ${value}: must be a finite number above 0`);
}

/**
 * Ratio of specific heats γ = c_p/c_v = (5+ζ)/(3+ζ) of an ideal gas with ζ rotational degrees of freedom (0, 2 or 3;
 * equipartition, textbook kinetic theory; common practice). 5/3 monatomic, 7/5 linear molecules, 4/3 non-linear.
 */
export function heatCapacityRatio(rotationalDof: number): number {
  if (!(Number.isFinite(rotationalDof) && rotationalDof >= 0)) {
    throw new Error(
      `rotational degrees of freedom = ${rotationalDof}: must be a finite number ≥ 0 (0, 2 or 3 for table gases)`,
    );
  }
  return (5 + rotationalDof) / (3 + rotationalDof);
}

/** Speed of sound c = sqrt(γkT/m) of an ideal gas, m/s; massKg in kg, temperatureK in K (textbook; common practice). */
export function speedOfSoundMPerS(massKg: number, temperatureK: number, rotationalDof: number): number {
  requirePositive(massKg, 'molecular mass (kg)');
  requirePositive(temperatureK, 'temperature (K)');
  return Math.sqrt((heatCapacityRatio(rotationalDof) * K_B * temperatureK) / massKg);
}

/**
 * E_u = 1/(Ac·sqrt(γ N M)): relative error of a cell's mean flow speed (Hadjiconstantinou et al. 2003; from memory).
 * acousticNumber Ac = u/c, gamma = c_p/c_v, particlesPerCell N, independentSamples M; all dimensionless.
 */
export function velocityRelativeError(
  acousticNumber: number,
  gamma: number,
  particlesPerCell: number,
  independentSamples: number,
): number {
  requirePositive(acousticNumber, 'acoustic number u/c');
  requirePositive(gamma, 'heat capacity ratio γ');
  requirePositive(particlesPerCell, 'particles per cell');
  requirePositive(independentSamples, 'independent samples');
  return 1 / (acousticNumber * Math.sqrt(gamma * particlesPerCell * independentSamples));
}

/**
 * Absolute standard error of a cell's mean velocity component, m/s: E_u·u = sqrt(kT/(m N M)), independent of the flow
 * speed (follows from E_u above with c = sqrt(γkT/m)). massKg in kg, temperatureK in K.
 */
export function velocityStandardErrorMPerS(
  massKg: number,
  temperatureK: number,
  particlesPerCell: number,
  independentSamples: number,
): number {
  requirePositive(massKg, 'molecular mass (kg)');
  requirePositive(temperatureK, 'temperature (K)');
  requirePositive(particlesPerCell, 'particles per cell');
  requirePositive(independentSamples, 'independent samples');
  return Math.sqrt((K_B * temperatureK) / (massKg * particlesPerCell * independentSamples));
}

/** E_ρ = 1/sqrt(N M): relative error of a cell's density (Hadjiconstantinou et al. 2003, dilute gas; from memory). */
export function densityRelativeError(particlesPerCell: number, independentSamples: number): number {
  requirePositive(particlesPerCell, 'particles per cell');
  requirePositive(independentSamples, 'independent samples');
  return 1 / Math.sqrt(particlesPerCell * independentSamples);
}

/**
 * E_T = sqrt(k/(c_v N M)): relative error of a cell's temperature (Hadjiconstantinou et al. 2003; from memory).
 * heatCapacityOverK = c_v/k per molecule; 3/2 (default) for the translational temperature Tenuis reports.
 */
export function temperatureRelativeError(
  particlesPerCell: number,
  independentSamples: number,
  heatCapacityOverK: number = TRANSLATIONAL_HEAT_CAPACITY_OVER_K,
): number {
  requirePositive(particlesPerCell, 'particles per cell');
  requirePositive(independentSamples, 'independent samples');
  requirePositive(heatCapacityOverK, 'heat capacity per molecule c_v/k');
  return Math.sqrt(1 / (heatCapacityOverK * particlesPerCell * independentSamples));
}

/** What the error formulas need besides M. acousticNumber and gamma only for 'velocity'. */
export interface NoiseInputs {
  readonly particlesPerCell: number;
  readonly acousticNumber?: number;
  readonly gamma?: number;
  /** c_v/k per molecule for 'temperature'; 3/2 (translational temperature) by default. */
  readonly heatCapacityOverK?: number;
}

/** Relative error of `quantity` after M independent samples (dispatches to the three formulas above). */
export function expectedRelativeError(
  quantity: NoiseQuantity,
  inputs: NoiseInputs,
  independentSamples: number,
): number {
  switch (quantity) {
    case 'velocity':
      return velocityRelativeError(
        velocityAcoustic(inputs),
        velocityGamma(inputs),
        inputs.particlesPerCell,
        independentSamples,
      );
    case 'density':
      return densityRelativeError(inputs.particlesPerCell, independentSamples);
    case 'temperature':
      return temperatureRelativeError(inputs.particlesPerCell, independentSamples, inputs.heatCapacityOverK);
  }
}

function velocityAcoustic(inputs: NoiseInputs): number {
  if (inputs.acousticNumber === undefined) throw new Error('velocity error: give the acoustic number u/c of the flow');
  return inputs.acousticNumber;
}

function velocityGamma(inputs: NoiseInputs): number {
  if (inputs.gamma === undefined) throw new Error('velocity error: give the heat capacity ratio γ of the gas');
  return inputs.gamma;
}

/**
 * Independent samples M for a target relative error E, the inverse of the formulas above, rounded up to a whole
 * sample (at least 1): velocity M = 1/(E² Ac² γ N), density M = 1/(E² N), temperature M = k/(c_v E² N).
 */
export function independentSamplesForRelativeError(
  quantity: NoiseQuantity,
  inputs: NoiseInputs,
  targetRelativeError: number,
): number {
  requirePositive(targetRelativeError, 'target relative error');
  // E ∝ 1/sqrt(M): the error with one sample, squared, over E² is M.
  const errorWithOneSample = expectedRelativeError(quantity, inputs, 1);
  const samples = (errorWithOneSample / targetRelativeError) ** 2;
  // Guard against 4.000000001 → 5 from round-off in the square.
  return Math.max(1, Math.ceil(samples * (1 - 1e-12)));
}

/**
 * Effective number of independent samples in sampleSteps sampled steps when samples decorrelate after
 * stepsBetweenIndependentSamples steps: M = sampleSteps / stepsBetween, not rounded (the error formulas are continuous
 * in M), and at least 1 once anything was sampled — a single snapshot is one sample however short the run
 * (common practice, no source). Returns 0 for sampleSteps = 0.
 */
export function independentSamples(sampleSteps: number, stepsBetweenIndependentSamples: number): number {
  if (!(Number.isFinite(sampleSteps) && sampleSteps >= 0)) {
    throw new Error(`sample steps = ${sampleSteps}: must be a finite number ≥ 0`);
  }
  requirePositive(stepsBetweenIndependentSamples, 'steps between independent samples');
  if (sampleSteps === 0) return 0;
  return Math.max(1, sampleSteps / stepsBetweenIndependentSamples);
}

export interface RunPlanRequest {
  /** Target relative error of one cell's average, e.g. 0.01 for 1 %. */
  readonly targetRelativeError: number;
  readonly quantity: NoiseQuantity;
  /** Flow speed u against which the velocity error is relative, m/s; required for 'velocity'. */
  readonly flowSpeedMPerS?: number;
  /** Measured speed of this machine (e.g. from `npm run bench`), particle-steps per second. */
  readonly particleStepsPerSecond: number;
}

export interface RunPlanEstimate {
  readonly independentSamplesNeeded: number;
  /** Steps after which samples are taken as independent: one mean collision time, at least 1 step. */
  readonly stepsBetweenIndependentSamples: number;
  /** Sampled steps: independentSamplesNeeded × stepsBetweenIndependentSamples. */
  readonly sampleStepsNeeded: number;
  /** The plan's transient steps plus sampleStepsNeeded. */
  readonly stepsNeeded: number;
  /** stepsNeeded × the plan's initial particle count / particleStepsPerSecond, s. */
  readonly estimatedSeconds: number;
}

/**
 * How long a planned case must sample for a target relative error in one cell of `quantity`: a planning estimate.
 *
 * N is the plan's particles per cell; T, m and ζ from its reference state and gas; for velocity Ac = u/c with
 * c = sqrt(γkT/m) at the reference temperature. Assumption (common practice, no source): samples taken one mean
 * collision time apart are independent, so M = sampled steps / ceil(τ_c/Δt). In a cell that is small against the
 * mean free path this is usually pessimistic for velocity and temperature (particles leave the cell sooner) and can
 * be optimistic for slow hydrodynamic modes (shear or heat diffusion across a large domain), whose correlation time
 * the blocking analysis of the run itself measures. The cost assumes the particle count stays at its initial value.
 */
export function expectedRunPlan(plan: Plan, request: RunPlanRequest): RunPlanEstimate {
  const { quantity, targetRelativeError, flowSpeedMPerS, particleStepsPerSecond } = request;
  if (!NOISE_QUANTITIES.includes(quantity)) {
    throw new Error(`quantity = ${String(quantity)}: must be one of ${NOISE_QUANTITIES.join(', ')}`);
  }
  requirePositive(particleStepsPerSecond, 'particle-steps per second');
  const model = plan.gas.model;
  const temperatureK = plan.reference.temperatureK;
  const gamma = heatCapacityRatio(model.rotationalDof);
  let acousticNumber: number | undefined;
  if (quantity === 'velocity') {
    if (flowSpeedMPerS === undefined) {
      throw new Error('flowSpeedMPerS: a velocity error is relative to a flow speed; give it in m/s');
    }
    requirePositive(flowSpeedMPerS, 'flowSpeedMPerS');
    acousticNumber = flowSpeedMPerS / speedOfSoundMPerS(model.massKg, temperatureK, model.rotationalDof);
  }
  const samples = independentSamplesForRelativeError(
    quantity,
    { particlesPerCell: plan.particlesPerCell, acousticNumber, gamma },
    targetRelativeError,
  );
  const stepsBetween = Math.max(1, Math.ceil(plan.reference.meanCollisionTimeS / plan.timeStepS));
  const sampleStepsNeeded = samples * stepsBetween;
  const stepsNeeded = plan.transientSteps + sampleStepsNeeded;
  return {
    independentSamplesNeeded: samples,
    stepsBetweenIndependentSamples: stepsBetween,
    sampleStepsNeeded,
    stepsNeeded,
    estimatedSeconds: (stepsNeeded * plan.initialParticles) / particleStepsPerSecond,
  };
}
