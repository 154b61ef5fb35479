/**
 * The continuum models of a duct's cross-section driven along the duct (the cross-section mode: a planar domain, walls
 * on all four sides at rest, a body acceleration along z): fully developed flow in a rectangle of height H (the
 * smaller side) and width W — the no-slip series, first-order slip on every wall (a finite-difference solution) and
 * the free-molecular limit of diffuse walls (rectangularDuct.ts). Predicts the mass flow along the duct and G_P in the
 * DSMC result's normalisation (results/flowQuantities.ts, crossSectionFlowOf).
 */
import type { Plan } from '../plan/plan';
import { crossSectionScaleM } from '../results/flowQuantities';
import { densityKgPerM3, mostProbableSpeedOf, type GasState } from './gasState';
import { slipLengthCoefficients } from './slipCoefficients';
import type { SlipChoice } from './caseModelsGap';
import type { ContinuumModelName, PredictedQuantity } from './caseModelTypes';
import { rectangleFlowFactor, rectangleFreeMolecularReducedFlowRate, rectangleSlipFlowFactor } from './rectangularDuct';

export interface CrossSectionPredictions {
  readonly quantities: PredictedQuantity[];
  readonly profiles: [];
  /** The no-slip centre speed (m/s), for the linear-theory check. */
  readonly noSlipCentreSpeedMPerS: number;
}

/** Predictions for a rectangular cross-section with one accommodation σ on every wall. */
export function crossSectionPredictions(
  plan: Plan,
  gas: GasState,
  sigma: number,
  slip: SlipChoice,
): CrossSectionPredictions {
  const lx = plan.grid.lengthXM;
  const ly = plan.grid.lengthYM;
  const h = Math.min(lx, ly);
  const w = Math.max(lx, ly);
  const aspect = h / w;
  const rho = densityKgPerM3(gas);
  const g = plan.bodyAccelerationZMPerS2;
  const v0 = mostProbableSpeedOf(gas);
  // G_P on the smaller side: ṁ = (h² w / v0) ρ g G_P; then in the result's normalisation (its scale H, area A).
  const delta = (gas.pressurePa * h) / (gas.viscosityPaS * v0);
  const flowOf = (gp: number) => (h * h * w * rho * g * gp) / v0;
  const reported = (mdot: number) => (mdot * v0) / (crossSectionScaleM(plan) * lx * ly * rho * g);
  const gpOf: Partial<Record<ContinuumModelName, number>> = {
    noSlip: (delta / 6) * rectangleFlowFactor(aspect),
    firstOrder:
      (delta / 6) *
      rectangleSlipFlowFactor(
        aspect,
        (slipLengthCoefficients({ kind: 'firstOrder', coefficient: slip.firstOrder }, sigma).first *
          plan.reference.meanFreePathM) /
          h,
      ),
  };
  if (sigma === 1) gpOf.freeMolecular = rectangleFreeMolecularReducedFlowRate(aspect);
  const mdot: PredictedQuantity = { key: 'flow.massFlowRate', unit: 'kg/s', values: {} };
  const gp: PredictedQuantity = { key: 'flow.reducedFlowRate', unit: '1', values: {} };
  for (const [name, value] of Object.entries(gpOf) as [ContinuumModelName, number][]) {
    mdot.values[name] = flowOf(value);
    gp.values[name] = reported(flowOf(value));
  }
  // The no-slip centre speed is about 2.1 times the mean in a square (2.096), 1.5 in a wide slot: 2.1 bounds both.
  const meanSpeed = flowOf(gpOf.noSlip!) / (rho * lx * ly);
  return { quantities: [mdot, gp], profiles: [], noSlipCentreSpeedMPerS: 2.1 * meanSpeed };
}
