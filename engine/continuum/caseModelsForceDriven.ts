/**
 * Continuum predictions for force-driven Poiseuille flow (caseModels.ts): a planar channel of gap H (walls at y = 0
 * and H) or a round tube of radius R (the top side of an axisymmetric domain), gas pushed along x by a body
 * acceleration a, at the DSMC profile positions in the DSMC field names and SI units.
 *
 * Velocity and flow rate come from poiseuille.ts and unifiedFlowModel.ts. Derived here, linear theory (constant μ,
 * κ of the reference state), g = ρa/μ:
 * - viscous heating κ∇²T = −μ|∇u|². Channel: u′ = (g/2)(H − 2y), so κT″ = −μg²s² (s = y − H/2) and
 *   T = T_c − μg²s⁴/(12κ); the conductive wall flux is μg²H³/24. Tube: u′ = −gr/2, (rT′)′ = −μg²r³/(4κ),
 *   T = T_c − μg²r⁴/(64κ); the wall flux is μg²R³/16. The Smoluchowski jump T_gas − T_w = j ∂T/∂n adds j times the
 *   wall gradient at the wall. The temperature profile does not depend on the slip model (u′ does not).
 * - momentum balance: the wall shear stress is ρaH/2 on each channel wall and ρaR/2 on the tube wall, along +x
 *   (the gas drags the walls downstream), for every model;
 * - energy balance: the body force does work a·ṁ per unit length (per metre of depth for the channel), all of it
 *   reaching the walls as heat (in their frame, slip dissipation included): a·ṁ′/2 per area on each channel wall,
 *   a·ṁ/(2πR) on the tube wall — so the heat flux follows each model's flow rate.
 */
import type { Plan } from '../plan/plan';
import { forceDrivenChannelFlow, forceDrivenTubeFlow } from './poiseuille';
import { unifiedFlow } from './unifiedFlowModel';
import type { GasState } from './gasState';
import { densityKgPerM3 } from './gasState';
import type { PredictedProfile, PredictedQuantity } from './caseModelTypes';
import { jumpDistanceFor, rowPositionsM, velocityModels, type GapPredictions, type SlipChoice } from './caseModelsGap';

/** Force-driven planar channel between the bottom and top walls (temperature T_w, accommodation σ). */
export function forceDrivenChannelPredictions(
  plan: Plan,
  gas: GasState,
  wallTemperatureK: number,
  sigma: number,
  slipChoice: SlipChoice,
): GapPredictions {
  const h = plan.grid.lengthYM;
  const a = plan.bodyAccelerationXMPerS2;
  const rho = densityKgPerM3(gas);
  const y = rowPositionsM(plan);
  const q = (key: string, unit: string): PredictedQuantity => ({ key, unit, values: {} });
  const [mdot, gp, shearBottom, shearTop, heatBottom, heatTop] = [
    q('flow.massFlowRate', 'kg/(s m)'),
    q('flow.reducedFlowRate', '1'),
    q('walls.bottom.shearStress', 'Pa'),
    q('walls.top.shearStress', 'Pa'),
    q('walls.bottom.heatFlux', 'W/m^2'),
    q('walls.top.heatFlux', 'W/m^2'),
  ];
  const velocity: PredictedProfile['values'] = {};
  const temperature: PredictedProfile['values'] = {};
  const g = (rho * a) / gas.viscosityPaS;
  const heating = (gas.viscosityPaS * g * g) / (12 * gas.conductivityWPerMK);
  for (const [name, slip] of velocityModels(slipChoice)) {
    // The channel has no free-molecular limit (poiseuille.ts).
    if (slip.kind === 'freeMolecular') continue;
    const s = forceDrivenChannelFlow({ gas, gapM: h, accelerationMPerS2: a, slip, accommodation: sigma });
    mdot.values[name] = s.massFlowRateKgPerSM;
    gp.values[name] = s.reducedFlowRate;
    shearBottom.values[name] = (rho * a * h) / 2;
    shearTop.values[name] = (rho * a * h) / 2;
    heatBottom.values[name] = (a * s.massFlowRateKgPerSM) / 2;
    heatTop.values[name] = (a * s.massFlowRateKgPerSM) / 2;
    velocity[name] = y.map((yy) => s.velocityMPerS(yy));
    // T = T_w + j·(wall gradient μg²H³/(24κ)) + μg²(H⁴/16 − s⁴)/(12κ) (file header).
    const atWall = wallTemperatureK + jumpDistanceFor(name, gas, sigma) * 4 * heating * (h / 2) ** 3;
    temperature[name] = y.map((yy) => atWall + heating * ((h / 2) ** 4 - (yy - h / 2) ** 4));
  }
  const u = unifiedFlow({
    gas,
    geometry: { kind: 'channel', heightM: h },
    pressureGradientPaPerM: rho * a,
    accommodation: sigma,
  });
  if (u.kind === 'channel') {
    mdot.values.unified = u.massFlowRateKgPerSM;
    gp.values.unified = u.reducedFlowRate;
    heatBottom.values.unified = (a * u.massFlowRateKgPerSM) / 2;
    heatTop.values.unified = (a * u.massFlowRateKgPerSM) / 2;
  }
  return {
    quantities: [mdot, gp, shearBottom, shearTop, heatBottom, heatTop],
    profiles: [
      {
        key: 'profile.velocityX',
        field: 'velocityX',
        unit: 'm/s',
        line: { kind: 'rows' },
        positionsM: y,
        values: velocity,
        scale: { kind: 'dsmcRange', base: 0, what: 'largest DSMC speed (centre of the channel)' },
      },
      {
        key: 'profile.temperature',
        field: 'temperature',
        unit: 'K',
        line: { kind: 'rows' },
        positionsM: y,
        values: temperature,
        scale: {
          kind: 'dsmcRange',
          base: wallTemperatureK,
          what: 'largest DSMC |T − T_wall| (the viscous heating and jump)',
        },
      },
    ],
  };
}

/** Force-driven tube, wall the top side of an axisymmetric domain (temperature T_w, accommodation σ). */
export function forceDrivenTubePredictions(
  plan: Plan,
  gas: GasState,
  wallTemperatureK: number,
  sigma: number,
  slipChoice: SlipChoice,
): GapPredictions {
  const r = plan.grid.lengthYM;
  const a = plan.bodyAccelerationXMPerS2;
  const rho = densityKgPerM3(gas);
  const radial = rowPositionsM(plan);
  const q = (key: string, unit: string): PredictedQuantity => ({ key, unit, values: {} });
  const [mdot, gp, shear, heat] = [
    q('flow.massFlowRate', 'kg/s'),
    q('flow.reducedFlowRate', '1'),
    q('walls.top.shearStress', 'Pa'),
    q('walls.top.heatFlux', 'W/m^2'),
  ];
  const velocity: PredictedProfile['values'] = {};
  const temperature: PredictedProfile['values'] = {};
  const g = (rho * a) / gas.viscosityPaS;
  const heating = (gas.viscosityPaS * g * g) / (64 * gas.conductivityWPerMK);
  for (const [name, slip] of velocityModels(slipChoice)) {
    const s = forceDrivenTubeFlow({ gas, radiusM: r, accelerationMPerS2: a, slip, accommodation: sigma });
    mdot.values[name] = s.massFlowRateKgPerS;
    gp.values[name] = s.reducedFlowRate;
    heat.values[name] = (a * s.massFlowRateKgPerS) / (2 * Math.PI * r);
    const profile = s.velocityMPerS;
    if (!profile) continue;
    shear.values[name] = (rho * a * r) / 2;
    velocity[name] = radial.map((rr) => profile(rr));
    // T = T_w + j·(wall gradient μg²R³/(16κ)) + μg²(R⁴ − r⁴)/(64κ) (file header).
    const atWall = wallTemperatureK + jumpDistanceFor(name, gas, sigma) * 4 * heating * r ** 3;
    temperature[name] = radial.map((rr) => atWall + heating * (r ** 4 - rr ** 4));
  }
  const u = unifiedFlow({
    gas,
    geometry: { kind: 'tube', radiusM: r },
    pressureGradientPaPerM: rho * a,
    accommodation: sigma,
  });
  if (u.kind === 'tube') {
    mdot.values.unified = u.massFlowRateKgPerS;
    gp.values.unified = u.reducedFlowRate;
    heat.values.unified = (a * u.massFlowRateKgPerS) / (2 * Math.PI * r);
  }
  return {
    quantities: [mdot, gp, shear, heat],
    profiles: [
      {
        key: 'profile.velocityX',
        field: 'velocityX',
        unit: 'm/s',
        line: { kind: 'rows' },
        positionsM: radial,
        values: velocity,
        scale: { kind: 'dsmcRange', base: 0, what: 'largest DSMC speed (on the axis)' },
      },
      {
        key: 'profile.temperature',
        field: 'temperature',
        unit: 'K',
        line: { kind: 'rows' },
        positionsM: radial,
        values: temperature,
        scale: {
          kind: 'dsmcRange',
          base: wallTemperatureK,
          what: 'largest DSMC |T − T_wall| (the viscous heating and jump)',
        },
      },
    ],
  };
}
