/**
 * Continuum predictions for a long pressure-driven channel or tube between two vessels (caseModels.ts): the mass
 * flow rate and the reduced flow rate G_P, in the units of engine/results/flowQuantities.ts.
 *
 * No slip, first and second order: pressureDrivenDuctFlow (Arkilic, Schmidt & Breuer 1997 and its tube analogue;
 * pressureDrivenDuct.ts), per metre of depth for the planar channel (W = 1 m).
 * Unified (Beskok & Karniadakis 1999): the local rate ṁ = (S/v0)(−dp/dx) G_P(δ(p)), S = H² or πR³, with δ = pD/(μv0)
 * proportional to p at fixed T, is the same at every x, so ṁ L = (S/v0) ∫ G_P(δ(p)) dp from p_out to p_in (derived
 * here; Simpson's rule on 64 intervals, far below the model's own error).
 * Free-molecular tube: G_P = ((2 − σ)/σ)·8/(3√π) at every p (poiseuille.ts), so ṁ = (πR³/v0)(Δp/L) G_P.
 * The DSMC reduced flow rate is ṁ v0 L/(S Δp) (flowQuantities.ts); the predictions are scaled the same way.
 */
import type { Plan } from '../plan/plan';
import type { FlowReportSpec } from '../case/schema';
import { flowQuantityUnits } from '../results/flowQuantities';
import { mostProbableSpeedMPerS } from '../gas/molecularModel';
import { pressureDrivenDuctFlow, type DuctGeometry } from './pressureDrivenDuct';
import { tubeReducedFlowRate } from './poiseuille';
import { unifiedReducedFlowRate } from './unifiedFlowModel';
import type { ContinuumSlipModel } from './slipCoefficients';
import type { SlipChoice } from './caseModelsGap';
import type { ContinuumModelName, PredictedQuantity } from './caseModelTypes';

const SIMPSON_INTERVALS = 64;

export interface DuctState {
  readonly viscosityPaS: number;
  readonly massKg: number;
  readonly temperatureK: number;
  readonly upstreamPressurePa: number;
  readonly downstreamPressurePa: number;
}

/** ∫ f from a to b by Simpson's rule on SIMPSON_INTERVALS intervals. */
function simpson(f: (x: number) => number, a: number, b: number): number {
  const n = SIMPSON_INTERVALS;
  const h = (b - a) / n;
  let sum = f(a) + f(b);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (sum * h) / 3;
}

/** Mass flow rate and G_P of a long channel or tube (flowReport's duct, size and length) for each model. */
export function pressureDrivenPredictions(
  plan: Plan,
  report: FlowReportSpec & { lengthM: number },
  state: DuctState,
  sigma: number,
  slipChoice: SlipChoice,
): PredictedQuantity[] {
  const planar = !plan.grid.axisymmetric;
  const units = flowQuantityUnits(planar);
  const size = report.sizeM;
  const length = report.lengthM;
  const geometry: DuctGeometry =
    report.duct === 'channel'
      ? { kind: 'channel', heightM: size, widthM: 1, lengthM: length }
      : { kind: 'tube', radiusM: size, lengthM: length };
  const { upstreamPressurePa: pin, downstreamPressurePa: pout } = state;
  const v0 = mostProbableSpeedMPerS(state.massKg, state.temperatureK);
  const scale = report.duct === 'channel' ? size * size : Math.PI * size ** 3;
  // G_P = ṁ v0 L/(S Δp), as flowQuantities.ts reduces the DSMC rate.
  const reduced = (mdot: number) => (mdot * v0 * length) / (scale * (pin - pout));
  const mdot: PredictedQuantity = { key: 'flow.massFlowRate', unit: units.massFlowRate, values: {} };
  const gp: PredictedQuantity = { key: 'flow.reducedFlowRate', unit: units.reducedFlowRate, values: {} };
  const set = (name: ContinuumModelName, value: number) => {
    mdot.values[name] = value;
    gp.values[name] = reduced(value);
  };
  const slips: [ContinuumModelName, ContinuumSlipModel][] = [
    ['noSlip', { kind: 'noSlip' }],
    ['firstOrder', { kind: 'firstOrder', coefficient: slipChoice.firstOrder }],
    ['secondOrder', { kind: 'secondOrder', coefficients: slipChoice.secondOrder }],
  ];
  const gas = { viscosityPaS: state.viscosityPaS, massKg: state.massKg, temperatureK: state.temperatureK };
  for (const [name, slip] of slips) {
    set(
      name,
      pressureDrivenDuctFlow({
        gas,
        geometry,
        inletPressurePa: pin,
        outletPressurePa: pout,
        slip,
        accommodation: sigma,
      }).massFlowRateKgPerS,
    );
  }
  // δ(p) = p·size/(μ v0): ℓ = μ v0/p.
  const deltaOf = (p: number) => (p * size) / (state.viscosityPaS * v0);
  const kind = report.duct === 'channel' ? 'channel' : 'tube';
  set('unified', ((scale / v0) * simpson((p) => unifiedReducedFlowRate(kind, deltaOf(p), sigma), pout, pin)) / length);
  if (kind === 'tube')
    set(
      'freeMolecular',
      (scale / v0) * ((pin - pout) / length) * tubeReducedFlowRate(1, { kind: 'freeMolecular' }, sigma),
    );
  return [mdot, gp];
}
