/**
 * The engineering flow numbers of a run, from the mass flow rate counted at the flow sections:
 * - massFlowRate ṁ (kg/s; planar cases per metre of depth, kg/(s·m));
 * - throughput Q = ṁ k T / m (Pa·m³/s; planar Pa·m²/s), the pV flow at the upstream temperature T;
 * - molarFlow in sccm: molecules per second over those of one standard cubic centimetre per minute
 *   (units/engineeringUnits.ts states the standard state);
 * - conductance C = Q / (p_up − p_down) (m³/s; planar m²/s);
 * - transmissionProbability W = ṁ / ṁ_fm, ṁ_fm = A (p_up − p_down) sqrt(m / (2π k T)) the free-molecular flow through
 *   the entrance area A (H per metre of depth for a channel or slit, π R² for a tube or orifice): the quantity that
 *   Clausing factors tabulate;
 * - reducedFlowRate G_P of long channels and tubes (Sharipov & Seleznev 1998, J. Phys. Chem. Ref. Data 27:657):
 *   ṁ = (H² / v0)(−dp/dx) G_P per metre of depth for a channel of gap H, ṁ = (π R³ / v0)(−dp/dx) G_P for a tube of
 *   radius R, with −dp/dx = Δp / L between vessels, or ρ a for a force-driven duct (body acceleration a).
 * Every number is a fixed multiple of ṁ, so each carries ṁ's 95 % half-width scaled alike.
 */
import type { Plan } from '../plan/plan';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { MOLECULES_PER_S_PER_SCCM } from '../units/engineeringUnits';
import type { Estimate, IntegralEstimate } from '../stats/estimate';

export const FLOW_QUANTITIES = [
  'massFlowRate',
  'throughput',
  'molarFlow',
  'conductance',
  'transmissionProbability',
  'reducedFlowRate',
] as const;
export type FlowQuantityName = (typeof FLOW_QUANTITIES)[number];

/** SI units (and sccm) of the flow numbers, for three-dimensional (axisymmetric) and planar (per metre) cases. */
export function flowQuantityUnits(planar: boolean): Record<FlowQuantityName, string> {
  return planar
    ? {
        massFlowRate: 'kg/(s m)',
        throughput: 'Pa m^2/s',
        molarFlow: 'sccm/m',
        conductance: 'm^2/s',
        transmissionProbability: '1',
        reducedFlowRate: '1',
      }
    : {
        massFlowRate: 'kg/s',
        throughput: 'Pa m^3/s',
        molarFlow: 'sccm',
        conductance: 'm^3/s',
        transmissionProbability: '1',
        reducedFlowRate: '1',
      };
}

export interface FlowResult {
  /** The section the flow numbers come from. */
  readonly section: string;
  /** Mass flow rate through every section (positive towards +x); in steady flow they agree within their error bars. */
  readonly sections: Readonly<Record<string, IntegralEstimate>>;
  /** Numbers a case cannot define (no pressure difference, no duct length …) are left out. */
  readonly values: Partial<Record<FlowQuantityName, Estimate>>;
  /** Pressures and temperature the numbers refer to (Pa, K). */
  readonly upstreamPressurePa: number;
  readonly downstreamPressurePa: number;
  readonly temperatureK: number;
}

/** The pressures and temperature the flow numbers are based on: flowReport's, else the left and right reservoirs'. */
export function flowReferenceOf(plan: Plan): { up: number; down: number; temperatureK: number } {
  const c = plan.caseData;
  const left = c.boundaries.left;
  const right = c.boundaries.right;
  const up = c.flowReport?.upstreamPressurePa ?? (left.type === 'reservoir' ? left.pressurePa : NaN);
  const down = c.flowReport?.downstreamPressurePa ?? (right.type === 'reservoir' ? right.pressurePa : NaN);
  const temperatureK = left.type === 'reservoir' ? left.temperatureK : c.initial.temperatureK;
  return { up, down, temperatureK };
}

/** The duct's opening A (m²; per metre of depth for a channel or slit): πR² for a tube or orifice, H otherwise. */
export function openingAreaM2(r: { readonly duct: string; readonly sizeM: number }): number {
  return r.duct === 'tube' || r.duct === 'orifice' ? Math.PI * r.sizeM * r.sizeM : r.sizeM;
}

/** Flow numbers from the mass flow rate estimate of each section; undefined when the case has no sections. */
export function flowResultOf(plan: Plan, sections: Record<string, IntegralEstimate>): FlowResult | undefined {
  const c = plan.caseData;
  if (c.flowSections.length === 0) return undefined;
  const section = c.flowReport?.section ?? c.flowSections[0].name;
  const mdot = sections[section];
  const m = plan.gas.model.massKg;
  const { up, down, temperatureK: t } = flowReferenceOf(plan);
  const dp = up - down;
  const scaled = (factor: number): Estimate => ({ mean: mdot.mean * factor, ci95: mdot.ci95 * Math.abs(factor) });
  const values: Partial<Record<FlowQuantityName, Estimate>> = {
    massFlowRate: { mean: mdot.mean, ci95: mdot.ci95 },
    throughput: scaled((K_B * t) / m),
    molarFlow: scaled(1 / (m * MOLECULES_PER_S_PER_SCCM)),
  };
  if (dp > 0) values.conductance = scaled((K_B * t) / (m * dp));
  const r = c.flowReport;
  if (r && dp > 0) {
    const area = openingAreaM2(r);
    values.transmissionProbability = scaled(1 / (area * dp * Math.sqrt(m / (2 * Math.PI * K_B * t))));
  }
  if (r && (r.duct === 'channel' || r.duct === 'tube')) {
    const v0 = Math.sqrt((2 * K_B * t) / m);
    const a = c.bodyAccelerationXMPerS2;
    // −dp/dx: the body force per volume of a force-driven duct, else the mean gradient between the vessels.
    const gradient =
      a !== 0 ? plan.reference.massDensityKgPerM3 * a : r.lengthM !== undefined && dp > 0 ? dp / r.lengthM : NaN;
    const scale = r.duct === 'channel' ? r.sizeM * r.sizeM : Math.PI * r.sizeM ** 3;
    if (Number.isFinite(gradient) && gradient !== 0) values.reducedFlowRate = scaled(v0 / (scale * gradient));
  }
  return { section, sections, values, upstreamPressurePa: up, downstreamPressurePa: down, temperatureK: t };
}
