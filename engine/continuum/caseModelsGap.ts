/**
 * Continuum predictions for the planar gap problems of caseModels.ts — Couette and Fourier flow — at the DSMC
 * profile positions, in the DSMC field names and SI units.
 *
 * Beyond couette.ts and fourier.ts (which give u(y), τ, T(y) and q), two results are derived here:
 * - Couette viscous heating, linear theory: κT″ = −μB² with B = τ/μ uniform, so T = T_c − μB²s²/(2κ), s = y − H/2;
 *   the Smoluchowski jump at each wall T_gas − T_w = j ∂T/∂n gives T(0) = T_w + jμB²H/(2κ) and
 *   T_c = T(0) + μB²H²/(8κ). The walls (booked in their own frame, DEVELOPERS.md) each receive τΔU/2: the work the
 *   walls do, τΔU per area, is all dissipated, half reaching each wall by symmetry (conduction μB²H/2 plus the slip
 *   dissipation τ·u_s).
 * - Sign conventions of the DSMC wall quantities (engine/results/wallQuantities.ts): shearStress is the force per
 *   area of the gas on the wall along +x, so +τ on the bottom wall and −τ on the top; heatFlux is the energy per area
 *   from the gas into the wall, so −q_y at the bottom and +q_y at the top.
 */
import type { Plan } from '../plan/plan';
import type { WallSpec } from '../case/schema';
import { couetteFlow } from './couette';
import { fourierFlow, type TemperatureJumpModel } from './fourier';
import type { GasState } from './gasState';
import {
  SMOLUCHOWSKI_JUMP,
  temperatureJumpDistanceM,
  type FirstOrderSlipCoefficient,
  type SecondOrderSlipCoefficients,
  type VelocitySlipModel,
} from './slipCoefficients';
import type { ContinuumModelName, PredictedProfile, PredictedQuantity } from './caseModelTypes';

/** Centres of the rows of cells, m: the positions of the DSMC row-averaged profile (summarize.ts profileY). */
export function rowPositionsM(plan: Plan): Float64Array {
  return Float64Array.from({ length: plan.grid.cellsY }, (_, r) => (r + 0.5) * plan.grid.cellSizeYM);
}

/** The slip coefficients the comparison uses (caseModels.ts CaseModelOptions, defaults filled in). */
export interface SlipChoice {
  readonly firstOrder: FirstOrderSlipCoefficient;
  readonly secondOrder: SecondOrderSlipCoefficients;
}

/** The velocity models of the planar problems, in the order of CONTINUUM_MODELS. */
export function velocityModels(slip: SlipChoice): [ContinuumModelName, VelocitySlipModel][] {
  return [
    ['noSlip', { kind: 'noSlip' }],
    ['firstOrder', { kind: 'firstOrder', coefficient: slip.firstOrder }],
    ['secondOrder', { kind: 'secondOrder', coefficients: slip.secondOrder }],
    ['freeMolecular', { kind: 'freeMolecular' }],
  ];
}

/** Smoluchowski jump distance (m) that goes with a velocity model: none for no-slip, else first order. */
export function jumpDistanceFor(model: ContinuumModelName, gas: GasState, thermalAccommodation: number): number {
  return model === 'noSlip' ? 0 : temperatureJumpDistanceM(SMOLUCHOWSKI_JUMP, gas, thermalAccommodation);
}

export interface GapPredictions {
  readonly quantities: PredictedQuantity[];
  readonly profiles: PredictedProfile[];
}

/** Couette flow between the bottom and top walls (both at temperature T_w, speeds along x), σ both walls. */
export function couettePredictions(
  plan: Plan,
  gas: GasState,
  bottom: WallSpec,
  top: WallSpec,
  sigma: number,
  slipChoice: SlipChoice,
): GapPredictions {
  const h = plan.grid.lengthYM;
  const ub = bottom.velocityMPerS[0];
  const ut = top.velocityMPerS[0];
  const du = ut - ub;
  const tw = bottom.temperatureK;
  const y = rowPositionsM(plan);
  const shearBottom: PredictedQuantity = { key: 'walls.bottom.shearStress', unit: 'Pa', values: {} };
  const shearTop: PredictedQuantity = { key: 'walls.top.shearStress', unit: 'Pa', values: {} };
  const heatBottom: PredictedQuantity = { key: 'walls.bottom.heatFlux', unit: 'W/m^2', values: {} };
  const heatTop: PredictedQuantity = { key: 'walls.top.heatFlux', unit: 'W/m^2', values: {} };
  const velocity: PredictedProfile['values'] = {};
  const temperature: PredictedProfile['values'] = {};
  for (const [name, slip] of velocityModels(slipChoice)) {
    const s = couetteFlow({
      gas,
      gapM: h,
      bottomWallSpeedMPerS: ub,
      topWallSpeedMPerS: ut,
      slip,
      accommodation: sigma,
    });
    const tau = s.shearStressPa;
    shearBottom.values[name] = tau;
    shearTop.values[name] = -tau;
    heatBottom.values[name] = (tau * du) / 2;
    heatTop.values[name] = (tau * du) / 2;
    velocity[name] = y.map((yy) => s.velocityMPerS(yy));
    if (name === 'freeMolecular') continue;
    // Viscous heating with the jump (file header); κ and μ of the reference state.
    const b = tau / gas.viscosityPaS;
    const heating = (gas.viscosityPaS * b * b) / (2 * gas.conductivityWPerMK);
    const atWall = tw + jumpDistanceFor(name, gas, sigma) * heating * h;
    temperature[name] = y.map((yy) => atWall + heating * ((h * h) / 4 - (yy - h / 2) ** 2));
  }
  return {
    quantities: [shearBottom, shearTop, heatBottom, heatTop],
    profiles: [
      {
        key: 'profile.velocityX',
        field: 'velocityX',
        unit: 'm/s',
        line: { kind: 'rows' },
        positionsM: y,
        values: velocity,
        scale: { kind: 'fixed', value: Math.abs(du), what: 'wall speed difference |U_top − U_bottom|' },
      },
      {
        key: 'profile.temperature',
        field: 'temperature',
        unit: 'K',
        line: { kind: 'rows' },
        positionsM: y,
        values: temperature,
        scale: { kind: 'dsmcRange', base: tw, what: 'largest DSMC |T − T_wall| (the viscous heating and jump)' },
      },
    ],
  };
}

/** Fourier heat conduction between walls at rest at different temperatures, thermal accommodation σ both walls. */
export function fourierPredictions(
  plan: Plan,
  gas: GasState,
  bottom: WallSpec,
  top: WallSpec,
  sigma: number,
): GapPredictions {
  const h = plan.grid.lengthYM;
  const y = rowPositionsM(plan);
  const jumps: [ContinuumModelName, TemperatureJumpModel][] = [
    ['noSlip', { kind: 'noJump' }],
    ['firstOrder', { kind: 'firstOrder' }],
    ['freeMolecular', { kind: 'freeMolecular' }],
  ];
  const heatBottom: PredictedQuantity = { key: 'walls.bottom.heatFlux', unit: 'W/m^2', values: {} };
  const heatTop: PredictedQuantity = { key: 'walls.top.heatFlux', unit: 'W/m^2', values: {} };
  const temperature: PredictedProfile['values'] = {};
  for (const [name, jump] of jumps) {
    const s = fourierFlow({
      gas,
      gapM: h,
      bottomWallTemperatureK: bottom.temperatureK,
      topWallTemperatureK: top.temperatureK,
      jump,
      thermalAccommodation: sigma,
    });
    heatBottom.values[name] = -s.heatFluxWPerM2;
    heatTop.values[name] = s.heatFluxWPerM2;
    temperature[name] = y.map((yy) => s.temperatureK(yy));
  }
  const dt = Math.abs(top.temperatureK - bottom.temperatureK);
  return {
    quantities: [heatBottom, heatTop],
    profiles: [
      {
        key: 'profile.temperature',
        field: 'temperature',
        unit: 'K',
        line: { kind: 'rows' },
        positionsM: y,
        values: temperature,
        scale: { kind: 'fixed', value: dt, what: 'wall temperature difference |T_top − T_bottom|' },
      },
    ],
  };
}
