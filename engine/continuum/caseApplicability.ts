/**
 * Where each continuum model holds, per recognised problem (caseModels.ts): the limits are stated here, in one place,
 * so the verdict (report/verdict.ts) can say "not applicable here" with the reason instead of blaming kinetics for
 * what is a model's own assumption (a short duct's entrance losses, a fast wall's compressibility). A model outside
 * its range still gets its prediction (the plot shows it); the verdict just does not judge it.
 *
 * Limits (stated here; each says where it comes from):
 * - Long-duct models (pressure-driven channel or tube between vessels): L/R (tube) or L/H (channel) at least
 *   LONG_DUCT_MIN_LENGTH_RATIO = 50. Below it the entrance and exit losses are more than a few per cent of the flow
 *   rate: in creeping flow Sampson's orifice resistance 3μ/R³ beside Poiseuille's 8μL/(πR⁴) is 3πR/(8L) of it, 2.4 %
 *   at L/R = 50 (the sum is accurate to about 1 %, Dagan, Weinbaum & Pfeffer 1982, J. Fluid Mech. 115:505); in
 *   free-molecular flow the long-tube transmission 8R/(3L) is off by about 1/(1 + 3L/(8R)) against Clausing's, 5 %
 *   at L/R = 50. No end correction is applied: none is published, to our knowledge, across the slip and transition
 *   regimes for both geometries, so a shorter duct is left to DSMC.
 * - Couette (linear theory: constant μ and κ): wall Mach number |ΔU|/c ≤ COUETTE_MACH_LIMIT = 0.5, c = √(γkT/m).
 *   Derived here: the viscous heating raises the gap's mean temperature by about Pr(γ − 1)Ma²T/12 (the parabola
 *   μΔU²/(8κ) at the centre, two thirds of it on average), which changes μ ∝ T^ω by ω times that: at most 0.9 % of
 *   the shear at Ma = 0.5 (ω ≤ 1, Pr = 2/3, γ = 5/3), under half the default 2 % tolerance.
 * - Fourier (linear theory: constant κ): |ΔT|/T_mean ≤ 0.1 and the reference temperature within 5 % of T_mean, so
 *   κ(T_ref) stands for the mean κ — common practice, no source (κ ∝ T^ω changes by ω·10 % across the gap at the limit).
 * - Force-driven channel or tube: centre speed of the no-slip solution at most Mach LINEAR_MACH_LIMIT = 0.3 (common
 *   practice, no source: the flow stays incompressible and its heating small).
 * - Cavity (incompressible, steady): Re ≤ 1000, the largest Reynolds number the solver is checked at (Botella & Peyret
 *   1998, tests/validation/cavity.test.ts). The lid Mach number is not limited here: the preset's lid (100 m/s in argon
 *   at 300 K, Ma 0.31) sits at the usual incompressible limit of 0.3 and its effect on the centreline profiles is not
 *   quantified; the verdict's comparison with DSMC is what shows it.
 * The free-molecular limit has no such limit here: the verdict on it is the comparison itself.
 */
import { BOLTZMANN_J_PER_K } from '../physics/constants';
import { heatCapacityRatioOf, type GasState } from './gasState';
import type { ContinuumModelName } from './caseModelTypes';

export const LONG_DUCT_MIN_LENGTH_RATIO = 50;
export const LINEAR_MACH_LIMIT = 0.3;
export const COUETTE_MACH_LIMIT = 0.5;
export const FOURIER_TEMPERATURE_RATIO_LIMIT = 0.1;
export const CAVITY_MAX_REYNOLDS = 1000;

export interface Applicability {
  readonly headline: string;
  readonly validity: Partial<Record<ContinuumModelName, string>>;
  readonly notApplicable: Partial<Record<ContinuumModelName, string>>;
}

const CONTINUUM: ContinuumModelName[] = ['noSlip', 'firstOrder', 'secondOrder', 'unified'];

function each(models: ContinuumModelName[], text: string): Partial<Record<ContinuumModelName, string>> {
  return Object.fromEntries(models.map((m) => [m, text]));
}

function soundSpeedMPerS(gas: GasState): number {
  return Math.sqrt((heatCapacityRatioOf(gas) * BOLTZMANN_J_PER_K * gas.temperatureK) / gas.massKg);
}

const fmt = (x: number) => x.toPrecision(3);

/** Long pressure-driven duct of length L and size (radius or gap) between vessels. */
export function ductApplicability(
  duct: 'channel' | 'tube',
  lengthM: number,
  sizeM: number,
  present: ContinuumModelName[],
): Applicability {
  const ratio = lengthM / sizeM;
  const name = duct === 'tube' ? 'L/R' : 'L/H';
  const validity = each(present, `long duct, ${name} ≥ ${LONG_DUCT_MIN_LENGTH_RATIO} (no entrance or exit losses)`);
  const notApplicable =
    ratio < LONG_DUCT_MIN_LENGTH_RATIO
      ? each(
          present,
          `a long-duct model, and this ${duct} is short (${name} = ${fmt(ratio)} < ${LONG_DUCT_MIN_LENGTH_RATIO}): its entrance and exit losses are not modelled`,
        )
      : {};
  return { headline: 'flow.massFlowRate', validity, notApplicable };
}

/** Couette flow with wall speed difference ΔU. */
export function couetteApplicability(gas: GasState, speedDifferenceMPerS: number): Applicability {
  const mach = Math.abs(speedDifferenceMPerS) / soundSpeedMPerS(gas);
  const models: ContinuumModelName[] = ['noSlip', 'firstOrder', 'secondOrder'];
  return {
    headline: 'walls.bottom.shearStress',
    validity: each(models, `linear Couette flow, wall Mach number |ΔU|/c ≤ ${COUETTE_MACH_LIMIT}`),
    notApplicable:
      mach > COUETTE_MACH_LIMIT
        ? each(
            models,
            `linear theory, and the wall Mach number |ΔU|/c here is ${fmt(mach)} > ${COUETTE_MACH_LIMIT} (viscous heating changes μ across the gap)`,
          )
        : {},
  };
}

/** Fourier conduction between walls at T_bottom and T_top, reference state at T_ref. */
export function fourierApplicability(bottomK: number, topK: number, referenceK: number): Applicability {
  const mean = (bottomK + topK) / 2;
  const ratio = Math.abs(topK - bottomK) / mean;
  const offset = Math.abs(referenceK - mean) / mean;
  const models: ContinuumModelName[] = ['noSlip', 'firstOrder'];
  const reasons: string[] = [];
  if (ratio > FOURIER_TEMPERATURE_RATIO_LIMIT)
    reasons.push(`|ΔT|/T_mean = ${fmt(ratio)} > ${FOURIER_TEMPERATURE_RATIO_LIMIT}`);
  if (offset > 0.05) reasons.push(`the reference temperature is ${fmt(100 * offset)} % from the mean wall temperature`);
  return {
    headline: 'walls.bottom.heatFlux',
    validity: each(
      models,
      `linear conduction (constant κ), |ΔT|/T_mean ≤ ${FOURIER_TEMPERATURE_RATIO_LIMIT}, reference temperature within 5 % of T_mean`,
    ),
    notApplicable: reasons.length ? each(models, `linear theory (constant κ), and ${reasons.join(' and ')}`) : {},
  };
}

/** Force-driven channel or tube: Mach number of the fastest no-slip speed. */
export function forceDrivenApplicability(
  gas: GasState,
  noSlipCentreSpeedMPerS: number,
  present: ContinuumModelName[],
): Applicability {
  const mach = Math.abs(noSlipCentreSpeedMPerS) / soundSpeedMPerS(gas);
  const models = present.filter((m) => CONTINUUM.includes(m));
  return {
    headline: 'flow.massFlowRate',
    validity: each(models, `linearized, fully developed flow, centre Mach number ≤ ${LINEAR_MACH_LIMIT}`),
    notApplicable:
      mach > LINEAR_MACH_LIMIT
        ? each(models, `linear theory, and the no-slip centre Mach number here is ${fmt(mach)} > ${LINEAR_MACH_LIMIT}`)
        : {},
  };
}

/** Lid-driven cavity at Reynolds number Re. */
export function cavityApplicability(reynolds: number): Applicability {
  const models: ContinuumModelName[] = ['noSlip', 'firstOrder'];
  return {
    headline: 'centerline.x.velocityX',
    validity: each(models, `incompressible steady cavity flow, Re ≤ ${CAVITY_MAX_REYNOLDS}`),
    notApplicable:
      reynolds > CAVITY_MAX_REYNOLDS
        ? each(
            models,
            `incompressible Navier–Stokes, and Re = ${fmt(reynolds)} is above ${CAVITY_MAX_REYNOLDS}, the largest Reynolds number the cavity solver is checked at`,
          )
        : {},
  };
}
