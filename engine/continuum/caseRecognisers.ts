/**
 * The recognisers behind caseModelsOf (caseModels.ts): each checks that a case is its analytic problem (long duct
 * between vessels, periodic gap, lid-driven cavity) and returns the models' predictions for it, or the reason it is
 * not; and the wall tests they share (one accommodation σ for all walls, walls at rest, at one temperature).
 */
import type { BoundarySpec, FlowReportSpec, WallSpec } from '../case/schema';
import type { Plan } from '../plan/plan';
import { flowReferenceOf } from '../results/flowQuantities';
import { viscosityPaS } from '../gas/molecularModel';
import type { GasState } from './gasState';
import { pathPerViscosityPath } from './meanFreePath';
import { couettePredictions, fourierPredictions, type SlipChoice } from './caseModelsGap';
import { forceDrivenChannelPredictions } from './caseModelsForceDriven';
import { pressureDrivenPredictions } from './caseModelsDuct';
import { cavityPredictions } from './caseModelsCavity';
import {
  couetteApplicability,
  cavityApplicability,
  ductApplicability,
  forceDrivenApplicability,
  fourierApplicability,
  type Applicability,
} from './caseApplicability';
import type {
  CaseModels,
  CaseModelsResult,
  CaseProblem,
  ContinuumModelName,
  PredictedProfile,
  PredictedQuantity,
} from './caseModelTypes';

export const unrecognised = (reason: string): CaseModelsResult => ({ recognised: false, reason });

/** σ of a wall: 1 diffuse, the accommodation of a Maxwell wall; a reason for other wall models. */
function accommodationOf(w: WallSpec, where: string): number | string {
  if (w.model === 'diffuse') return 1;
  if (w.model === 'maxwell' && w.accommodation !== undefined && w.accommodation > 0) return w.accommodation;
  if (w.model === 'maxwell') return `${where}: a Maxwell wall with accommodation 0 is specular; no slip model applies`;
  return `${where}: ${w.model} walls have no counterpart in the slip models (diffuse and Maxwell walls only)`;
}

/** The one σ shared by all the walls, or a reason. */
export function commonAccommodation(walls: readonly [WallSpec, string][]): number | string {
  let sigma: number | undefined;
  for (const [w, where] of walls) {
    const s = accommodationOf(w, where);
    if (typeof s === 'string') return s;
    if (sigma !== undefined && Math.abs(s - sigma) > 1e-12)
      return `the walls have different accommodation coefficients (${sigma} and ${s}); the slip models assume one`;
    sigma = s;
  }
  return sigma ?? 1;
}

export const isWall = (b: BoundarySpec): b is WallSpec => b.type === 'wall';
export const atRest = (w: WallSpec) => w.velocityMPerS.every((v) => v === 0);
const sameTemperature = (a: WallSpec, b: WallSpec) =>
  Math.abs(a.temperatureK - b.temperatureK) <= 1e-9 * a.temperatureK;

/** What every recogniser needs: the plan, the gas state, the slip coefficients and the result builder. */
export interface RecogniserContext {
  readonly plan: Plan;
  readonly gas: GasState;
  readonly slip: SlipChoice;
  /** Descriptions of the models; a recogniser may reword them for its problem before building the result. */
  readonly models: Partial<Record<ContinuumModelName, string>>;
  readonly result: (
    problem: CaseProblem,
    description: string,
    p: { quantities: PredictedQuantity[]; profiles: PredictedProfile[] },
    present: ContinuumModelName[],
    applicability: Applicability,
  ) => CaseModels;
}

/** The largest |speed| of the no-slip velocity profile (for the Mach number of a force-driven flow). */
export function fastestNoSlip(profiles: readonly PredictedProfile[]): number {
  const u = profiles.find((p) => p.field === 'velocityX')?.values.noSlip;
  let max = 0;
  if (u) for (const v of u) max = Math.max(max, Math.abs(v));
  return max;
}

/** Long pressure-driven channel or tube between vessels (flowReport with lengthM). */
export function ductCaseModels(x: RecogniserContext, report: FlowReportSpec & { lengthM: number }): CaseModelsResult {
  const { plan } = x;
  const c = plan.caseData;
  const walls: [WallSpec, string][] = [];
  for (const k of c.blocks) {
    walls.push([k.wall, `block ${k.name}`]);
    for (const f of ['left', 'right', 'bottom', 'top'] as const)
      if (k.faces?.[f]) walls.push([k.faces[f]!, `block ${k.name}.${f}`]);
  }
  for (const side of ['bottom', 'top'] as const) {
    const w = plan.boundaries[side];
    if (isWall(w)) walls.push([w, side]);
  }
  const sigma = commonAccommodation(walls);
  if (typeof sigma === 'string') return unrecognised(sigma);
  const { up, down, temperatureK } = flowReferenceOf(plan);
  if (!(up > down && down > 0))
    return unrecognised(
      `pressure-driven ${report.duct}: the long-duct models need an upstream pressure above a downstream pressure above 0 (have ${up} Pa and ${down} Pa)`,
    );
  const state = {
    viscosityPaS: viscosityPaS(plan.gas.model, temperatureK),
    massKg: plan.gas.model.massKg,
    temperatureK,
    upstreamPressurePa: up,
    downstreamPressurePa: down,
  };
  const quantities = pressureDrivenPredictions(plan, report, state, sigma, x.slip);
  const tube = report.duct === 'tube';
  const present: ContinuumModelName[] = tube
    ? ['noSlip', 'firstOrder', 'secondOrder', 'unified', 'freeMolecular']
    : ['noSlip', 'firstOrder', 'secondOrder', 'unified'];
  return x.result(
    tube ? 'pressureDrivenTube' : 'pressureDrivenChannel',
    `long pressure-driven ${report.duct} (isothermal, locally fully developed; entrance effects of a short duct are not modelled), p_in/p_out = ${(up / down).toPrecision(4)}`,
    { quantities, profiles: [] },
    present,
    ductApplicability(report.duct === 'tube' ? 'tube' : 'channel', report.lengthM, report.sizeM, present),
  );
}

/** Planar and periodic in x: force-driven channel, Couette or Fourier between the bottom and top walls. */
export function gapCaseModels(x: RecogniserContext): CaseModelsResult {
  const { plan, gas, slip } = x;
  const { bottom, top } = plan.boundaries;
  if (!isWall(bottom) || !isWall(top))
    return unrecognised('periodic in x, but the bottom and top sides are not both walls: no gap problem to compare');
  if (bottom.velocityMPerS.some((v, i) => i > 0 && v !== 0) || top.velocityMPerS.some((v, i) => i > 0 && v !== 0))
    return unrecognised('a wall moves along z: the gap models are for motion along x');
  const sigma = commonAccommodation([
    [bottom, 'bottom'],
    [top, 'top'],
  ]);
  if (typeof sigma === 'string') return unrecognised(sigma);
  const same = sameTemperature(bottom, top);
  if (plan.bodyAccelerationXMPerS2 !== 0) {
    if (!(atRest(bottom) && atRest(top) && same))
      return unrecognised('a body-force-driven channel is compared only with both walls at rest at one temperature');
    const p = forceDrivenChannelPredictions(plan, gas, bottom.temperatureK, sigma, slip);
    const present: ContinuumModelName[] = ['noSlip', 'firstOrder', 'secondOrder', 'unified'];
    return x.result(
      'forceDrivenChannel',
      'force-driven Poiseuille flow in a planar channel (linearized, fully developed)',
      p,
      present,
      forceDrivenApplicability(gas, fastestNoSlip(p.profiles), present),
    );
  }
  const du = top.velocityMPerS[0] - bottom.velocityMPerS[0];
  if (du !== 0 && same) {
    return x.result(
      'couette',
      'planar Couette flow (linearized: constant μ and κ; viscous heating to first order)',
      couettePredictions(plan, gas, bottom, top, sigma, slip),
      ['noSlip', 'firstOrder', 'secondOrder', 'freeMolecular'],
      couetteApplicability(gas, du),
    );
  }
  if (du === 0 && atRest(bottom) && atRest(top) && !same) {
    x.models.noSlip = 'Fourier conduction with no temperature jump';
    x.models.firstOrder = 'Fourier conduction with the Smoluchowski temperature jump (Smoluchowski 1898)';
    return x.result(
      'fourier',
      'planar Fourier heat conduction (linearized: constant κ)',
      fourierPredictions(plan, gas, bottom, top, sigma),
      ['noSlip', 'firstOrder', 'freeMolecular'],
      fourierApplicability(bottom.temperatureK, top.temperatureK, plan.reference.temperatureK),
    );
  }
  if (du === 0 && same)
    return unrecognised(
      'both walls move together at one temperature: the gas is in equilibrium, there is nothing to compare',
    );
  return unrecognised(
    'the walls both move and have different temperatures: the gap models treat shear and heat conduction one at a time',
  );
}

/** Walls on all four sides: the lid-driven square cavity, lid the top side moving along x. */
export function cavityCaseModels(
  x: RecogniserContext,
  left: WallSpec,
  right: WallSpec,
  bottom: WallSpec,
  top: WallSpec,
): CaseModelsResult {
  const { plan } = x;
  const square = Math.abs(plan.grid.lengthXM - plan.grid.lengthYM) <= 1e-9 * plan.grid.lengthYM;
  const lid = top.velocityMPerS[0];
  const lidOnly =
    atRest(left) &&
    atRest(right) &&
    atRest(bottom) &&
    lid !== 0 &&
    top.velocityMPerS[1] === 0 &&
    top.velocityMPerS[2] === 0;
  const oneTemperature = [left, right, bottom].every((w) => sameTemperature(w, top));
  if (!(square && lidOnly && oneTemperature))
    return unrecognised(
      'walls on all four sides, but not a lid-driven square cavity (square domain, only the top wall moving along x, one wall temperature)',
    );
  const sigma = commonAccommodation([
    [left, 'left'],
    [right, 'right'],
    [bottom, 'bottom'],
    [top, 'top'],
  ]);
  if (typeof sigma === 'string') return unrecognised(sigma);
  const first = x.slip.firstOrder;
  const perLambda = first.value * pathPerViscosityPath(first.meanFreePath);
  const p = cavityPredictions(plan, lid, sigma, perLambda);
  x.models.noSlip = `incompressible Navier–Stokes (stream function–vorticity, cavity/solveCavity.ts) at Re = ρUL/μ = ${p.reynolds.toPrecision(4)}, no slip`;
  x.models.firstOrder = `the same with first-order slip on all walls (slip length ((2 − σ)/σ)·${perLambda.toPrecision(5)}·Kn sides, Kn = ${plan.reference.knudsen.toPrecision(4)})${p.notes.length ? `; ${p.notes.join('; ')}` : ''}`;
  return x.result(
    'cavity',
    `lid-driven square cavity (incompressible, Re = ${p.reynolds.toPrecision(4)}; centreline profiles)`,
    { quantities: [], profiles: p.profiles },
    ['noSlip', 'firstOrder'],
    cavityApplicability(p.reynolds),
  );
}
