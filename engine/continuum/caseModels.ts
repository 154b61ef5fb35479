/**
 * caseModelsOf(plan): which analytic continuum problem a DSMC case is, and what each continuum model predicts for
 * it — for the same gas, geometry, wall temperatures, wall speeds and accommodation, at the DSMC profile positions,
 * in the DSMC field names and SI units (caseModelTypes.ts). Pure.
 *
 * Recognised (first match wins; the recognisers are in caseRecognisers.ts):
 * - pressure-driven channel or tube between vessels: flowReport.duct 'channel' or 'tube' with lengthM, the two
 *   vessel pressures known (caseModelsDuct.ts);
 * - force-driven channel (planar) or tube (axisymmetric, the top side the tube wall): periodic in x, body
 *   acceleration ≠ 0, walls at rest at one temperature (caseModelsForceDriven.ts);
 * - Couette: planar, periodic in x, bottom and top walls at one temperature moving along x at different speeds;
 * - Fourier: planar, periodic in x, bottom and top walls at rest at different temperatures (caseModelsGap.ts);
 * - the cross-section of a rectangular duct driven along it: planar, walls at rest on all four sides at one
 *   temperature, body acceleration along z, no blocks (caseModelsCrossSection.ts; the preset `rectangularDuct`);
 * - lid-driven cavity: planar square with walls on all four sides at one temperature, only the top side moving,
 *   along x (caseModelsCavity.ts; the preset `cavity`).
 * Walls must be diffuse or Maxwell walls with the same accommodation σ everywhere (σ is the tangential momentum and
 * the thermal accommodation of a Maxwell wall); anything else gets a reason instead of predictions.
 *
 * The gas state is the plan's reference state (initial pressure and temperature; μ from the molecular model, κ from
 * Eucken's relation, gasState.ts), whose mean free path is the viscosity-based λ of every Knudsen number in Tenuis;
 * each slip coefficient is converted from the mean free path it is quoted in (slipCoefficients.ts).
 */
import type { Plan } from '../plan/plan';
import { gasStateFromModel } from './gasState';
import { forceDrivenApplicability } from './caseApplicability';
import { meanFreePathOfKind } from './meanFreePath';
import {
  HADJICONSTANTINOU_SECOND_ORDER,
  KINETIC_BGK_SLIP,
  type FirstOrderSlipCoefficient,
  type SecondOrderSlipCoefficients,
} from './slipCoefficients';
import type { SlipChoice } from './caseModelsGap';
import { forceDrivenTubePredictions } from './caseModelsForceDriven';
import { crossSectionPredictions } from './caseModelsCrossSection';
import { isCrossSectionFlow } from '../results/flowQuantities';
import {
  atRest,
  cavityCaseModels,
  commonAccommodation,
  ductCaseModels,
  fastestNoSlip,
  gapCaseModels,
  isWall,
  unrecognised,
  type RecogniserContext,
} from './caseRecognisers';
import type { CaseModelsResult, ContinuumModelName } from './caseModelTypes';

export interface CaseModelOptions {
  /**
   * Coefficient of the first-order slip model, with Maxwell's accommodation factor (2 − σ)/σ; default the kinetic
   * (linearized BGK) σ_P = 1.0162 ℓ = 1.1466 λ. Maxwell's own coefficient (MAXWELL_SLIP, slip length λ = 0.886 ℓ) is
   * 13 % shorter than the kinetic one and 10 % shorter than the hard-sphere value (about 0.99 ℓ, reference notes §2):
   * it puts the force-driven channel flow rate 6 % low at Kn = 0.1 (measured against DSMC,
   * tests/validation/verdict.test.ts), which would make "first-order slip" look worse than the slip model is.
   */
  readonly firstOrder?: FirstOrderSlipCoefficient;
  /**
   * Coefficient set of the second-order slip model; default Hadjiconstantinou 2003 (derived for hard spheres, the
   * molecules closest to the DSMC collision models).
   */
  readonly secondOrder?: SecondOrderSlipCoefficients;
}

function describeSecondOrder(set: SecondOrderSlipCoefficients): string {
  return `second-order slip, ${set.id} coefficients C1 = ${set.c1}, C2 = ${set.c2} in the ${set.meanFreePath} mean free path (${set.source}), with the Smoluchowski jump`;
}

/** What the continuum models predict for a planned case, or why none applies (see the file header). */
export function caseModelsOf(plan: Plan, options: CaseModelOptions = {}): CaseModelsResult {
  const slip: SlipChoice = {
    firstOrder: options.firstOrder ?? KINETIC_BGK_SLIP,
    secondOrder: options.secondOrder ?? HADJICONSTANTINOU_SECOND_ORDER,
  };
  const first = slip.firstOrder;
  const c = plan.caseData;
  const ref = plan.reference;
  const models: Partial<Record<ContinuumModelName, string>> = {
    noSlip: 'Navier–Stokes with no slip and no temperature jump',
    firstOrder: `first-order slip, Maxwell's condition with slip length ((2 − σ)/σ)·${first.value} ${first.meanFreePath} mean free paths (${first.id}: ${first.source}), with the Smoluchowski temperature jump`,
    secondOrder: describeSecondOrder(slip.secondOrder),
    unified: 'Beskok & Karniadakis 1999 unified flow-rate model (unifiedFlowModel.ts)',
    freeMolecular: 'free-molecular limit (collisionless gas between the same walls)',
  };
  const x: RecogniserContext = {
    plan,
    gas: gasStateFromModel(plan.gas.model, ref.pressurePa, ref.temperatureK),
    slip,
    models,
    result: (problem, description, p, present, applicability) => ({
      recognised: true,
      problem,
      description,
      meanFreePath: { kind: 'viscosity', valueM: meanFreePathOfKind('viscosity', ref.meanFreePathM) },
      knudsen: ref.knudsen,
      models: Object.fromEntries(present.map((m) => [m, models[m] ?? m])) as Partial<
        Record<ContinuumModelName, string>
      >,
      quantities: p.quantities,
      profiles: p.profiles,
      ...applicability,
    }),
  };
  if (isCrossSectionFlow(plan)) return crossSectionCaseModels(x);
  const report = c.flowReport;
  if (
    report &&
    (report.duct === 'channel' || report.duct === 'tube') &&
    report.lengthM !== undefined &&
    c.bodyAccelerationXMPerS2 === 0
  ) {
    return ductCaseModels(x, { ...report, lengthM: report.lengthM });
  }
  if (c.blocks.length > 0)
    return unrecognised(
      'the case has solid blocks and is not a long duct with flowReport.lengthM: no analytic continuum solution applies',
    );
  const { left, right, bottom, top } = plan.boundaries;
  const periodicX = left.type === 'periodic' && right.type === 'periodic';
  if (plan.grid.axisymmetric) {
    if (!(periodicX && c.bodyAccelerationXMPerS2 !== 0 && isWall(top) && atRest(top)))
      return unrecognised(
        'axisymmetric cases are compared only as a force-driven tube: periodic in x, body acceleration ≠ 0, the top side a wall at rest',
      );
    const sigma = commonAccommodation([[top, 'top']]);
    if (typeof sigma === 'string') return unrecognised(sigma);
    const p = forceDrivenTubePredictions(plan, x.gas, top.temperatureK, sigma, slip);
    const present: ContinuumModelName[] = ['noSlip', 'firstOrder', 'secondOrder', 'unified', 'freeMolecular'];
    return x.result(
      'forceDrivenTube',
      'force-driven Poiseuille flow in a round tube (linearized, fully developed)',
      p,
      present,
      forceDrivenApplicability(x.gas, fastestNoSlip(p.profiles), present),
    );
  }
  if (periodicX) return gapCaseModels(x);
  if (isWall(left) && isWall(right) && isWall(bottom) && isWall(top) && c.bodyAccelerationXMPerS2 === 0)
    return cavityCaseModels(x, left, right, bottom, top);
  return unrecognised(
    'not one of the analytic problems (Couette, Fourier, force-driven channel or tube, long pressure-driven channel or tube, lid-driven cavity)',
  );
}

/** The cross-section of a rectangular duct driven along it (see the file header). */
function crossSectionCaseModels(x: RecogniserContext): CaseModelsResult {
  const { plan } = x;
  const c = plan.caseData;
  if (c.blocks.length > 0)
    return unrecognised('the cross-section has solid blocks: no series solution applies to its shape (DSMC only)');
  const b = plan.boundaries;
  const sides = [
    [b.left, 'left'],
    [b.right, 'right'],
    [b.bottom, 'bottom'],
    [b.top, 'top'],
  ] as const;
  const walls = sides.filter(([s]) => isWall(s));
  if (walls.length !== 4 || !walls.every(([s]) => isWall(s) && atRest(s)))
    return unrecognised('a cross-section is compared as a rectangular duct only with walls at rest on all four sides');
  const wallSpecs = walls.map(([s, n]) => [s, n] as [Extract<typeof s, { type: 'wall' }>, string]);
  if (new Set(wallSpecs.map(([s]) => s.temperatureK)).size > 1)
    return unrecognised('the walls of the cross-section are at different temperatures: no isothermal series applies');
  const sigma = commonAccommodation(wallSpecs);
  if (typeof sigma === 'string') return unrecognised(sigma);
  const p = crossSectionPredictions(plan, x.gas, sigma, x.slip);
  const present: ContinuumModelName[] =
    sigma === 1 ? ['noSlip', 'firstOrder', 'freeMolecular'] : ['noSlip', 'firstOrder'];
  return x.result(
    'rectangularDuct',
    'fully developed flow along a rectangular duct, driven by a uniform axial acceleration (linearized)',
    p,
    present,
    forceDrivenApplicability(x.gas, p.noSlipCentreSpeedMPerS, present),
  );
}
