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
 *   radius R, with −dp/dx = Δp / L between vessels, or ρ a for a force-driven duct (body acceleration a);
 * - thermalCreepFlowRate G_T of a force-driven channel or tube, by Onsager reciprocity from the axial heat flow the
 *   force drives (the mechanocaloric effect; Sharipov 1996, and the 1998 review): with the thermodynamic fluxes ṁ and
 *   the heat flow Q = ∫ q_x dA conjugate to −(1/(ρT)) dp/dx and −(1/T²) dT/dx, the cross coefficients are equal, and
 *   ṁ = (A·a/v0)[G_P (−dp/dx) + G_T (p/T) dT/dx] gives Q = −(A·a/v0) G_T p g for a body acceleration g, so
 *   G_T = −v0 ⟨q_x⟩ / (a p g) with ⟨q_x⟩ the cross-section mean of the axial heat flux (thermalCreepFromHeatFlux).
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
  'thermalCreepFlowRate',
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
        thermalCreepFlowRate: '1',
      }
    : {
        massFlowRate: 'kg/s',
        throughput: 'Pa m^3/s',
        molarFlow: 'sccm',
        conductance: 'm^3/s',
        transmissionProbability: '1',
        reducedFlowRate: '1',
        thermalCreepFlowRate: '1',
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
  /** Per metre of depth (a planar case whose flow crosses its sections); false for a tube or a cross-section. */
  readonly perDepth: boolean;
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

/** A periodic channel or tube driven by a body acceleration: the case a long duct's coefficients come from. */
export function isForceDrivenDuct(plan: Plan): boolean {
  const r = plan.caseData.flowReport;
  return plan.caseData.bodyAccelerationXMPerS2 !== 0 && r !== undefined && (r.duct === 'channel' || r.duct === 'tube');
}

/** Whether the case defines a flow number (a case with flow sections always has the mass flow and its multiples). */
export function flowQuantityDefined(plan: Plan, q: FlowQuantityName): boolean {
  const c = plan.caseData;
  if (isCrossSectionFlow(plan))
    return q !== 'conductance' && q !== 'transmissionProbability' && q !== 'thermalCreepFlowRate';
  const { up, down } = flowReferenceOf(plan);
  const dp = up - down;
  const r = c.flowReport;
  if (q === 'conductance') return dp > 0;
  if (q === 'transmissionProbability') return r !== undefined && dp > 0;
  if (q === 'reducedFlowRate')
    return (
      r !== undefined &&
      (r.duct === 'channel' || r.duct === 'tube') &&
      (c.bodyAccelerationXMPerS2 !== 0 || (r.lengthM !== undefined && dp > 0))
    );
  if (q === 'thermalCreepFlowRate') return isForceDrivenDuct(plan);
  return true;
}

/**
 * G_T of a force-driven duct from the cross-section mean of its axial heat flux (W/m², with its half-width), by
 * Onsager reciprocity (file header): G_T = −v0 ⟨q_x⟩ / (a p g), a the gap or radius, p and T the reference state.
 */
export function thermalCreepFromHeatFlux(plan: Plan, meanHeatFluxX: Estimate): Estimate {
  const c = plan.caseData;
  const g = c.bodyAccelerationXMPerS2;
  const a = c.flowReport!.sizeM;
  const { temperatureK: t } = flowReferenceOf(plan);
  const v0 = Math.sqrt((2 * K_B * t) / plan.gas.model.massKg);
  const factor = -v0 / (a * plan.reference.pressurePa * g);
  return { mean: meanHeatFluxX.mean * factor, ci95: meanHeatFluxX.ci95 * Math.abs(factor) };
}

/**
 * How far the axial heat flow of a force-driven duct is from its linear response, as a fraction (about the relative
 * bias of G_T from the heat flow). The mass flow is linear in the drive for every molecule, but the heat flow has a
 * cubic part from molecules that fly long between collisions with a small velocity across the duct and are
 * accelerated far beyond v0 on the way: ε = (g a/v0²)² · Kn for a tube and (g a/v0²)² · Kn² for a channel (whose
 * grazing flights are longer), with Kn taken as at least 1. Measured here (Ar, hard spheres, 5–10 % of v0): tube
 * δ = 0.01, ε = 0.41: G_T 51 % below the free-molecular 4/(3√π); channel δ = 0.01, ε = 8.4: G_T of the wrong sign;
 * channel δ = 1.77, ε = 2e-4: G_T at the preset's drive and at half of it agree within their half-widths.
 */
export function thermalCreepNonlinearity(plan: Plan): number {
  const c = plan.caseData;
  const a = c.flowReport!.sizeM;
  const { temperatureK: t } = flowReferenceOf(plan);
  const v0sq = (2 * K_B * t) / plan.gas.model.massKg;
  const kn = Math.max(1, plan.reference.meanFreePathM / a);
  const drive = (c.bodyAccelerationXMPerS2 * a) / v0sq;
  return drive * drive * (c.flowReport!.duct === 'tube' ? kn : kn * kn);
}

/** A planar case driven along z (out of the plane): its domain is a duct's cross-section, the flow along the duct. */
export function isCrossSectionFlow(plan: Plan): boolean {
  return !plan.grid.axisymmetric && plan.bodyAccelerationZMPerS2 !== 0;
}

/** Whether a run of the case reports flow numbers: through its flow sections, or along the duct of a cross-section. */
export function hasFlowResult(plan: Plan): boolean {
  return plan.caseData.flowSections.length > 0 || isCrossSectionFlow(plan);
}

/** Whether the case's flow numbers are per metre of depth (planar flow through sections). */
export function flowPerDepth(plan: Plan): boolean {
  return !plan.grid.axisymmetric && !isCrossSectionFlow(plan);
}

/** The side H of a cross-section that G_P and δ are based on: the case's length scale (domain.characteristicLengthM). */
export function crossSectionScaleM(plan: Plan): number {
  return plan.reference.lengthScaleM;
}

/**
 * The flow along a duct whose cross-section is the domain (the cross-section mode), from the cross-section's mean
 * density ρ̄ and mean axial velocity ū_z (every particle of every cell, with their half-widths): ṁ = ρ̄ ū_z A through
 * the gas area A (m²), and G_P in the normalisation of a rectangle of height H and width W = A/H,
 * ṁ = (H² W / v0)(−dp/dx) G_P with −dp/dx = ρ a (a the body acceleration along z), so that W → ∞ gives the planar
 * channel's G_P per width. No sections are crossed, so `sections` is empty.
 */
export function crossSectionFlowOf(
  plan: Plan,
  meanDensity: Estimate,
  meanVelocityZ: Estimate,
  areaM2: number,
): FlowResult {
  const m = plan.gas.model.massKg;
  const t = plan.reference.temperatureK;
  const mean = meanDensity.mean * meanVelocityZ.mean * areaM2;
  // The axial velocity's scatter dominates; the density's (a few particles' worth) is added in quadrature.
  const ci95 =
    Math.abs(mean) * Math.hypot(meanVelocityZ.ci95 / meanVelocityZ.mean, meanDensity.ci95 / meanDensity.mean);
  const scaled = (factor: number): Estimate => ({ mean: mean * factor, ci95: ci95 * Math.abs(factor) });
  const h = crossSectionScaleM(plan);
  const v0 = Math.sqrt((2 * K_B * t) / m);
  const gradient = plan.reference.massDensityKgPerM3 * plan.bodyAccelerationZMPerS2;
  return {
    section: 'crossSection',
    sections: {},
    values: {
      massFlowRate: { mean, ci95 },
      throughput: scaled((K_B * t) / m),
      molarFlow: scaled(1 / (m * MOLECULES_PER_S_PER_SCCM)),
      reducedFlowRate: scaled(v0 / (h * areaM2 * gradient)),
    },
    upstreamPressurePa: NaN,
    downstreamPressurePa: NaN,
    temperatureK: t,
    perDepth: false,
  };
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
  return {
    section,
    sections,
    values,
    upstreamPressurePa: up,
    downstreamPressurePa: down,
    temperatureK: t,
    perDepth: !plan.grid.axisymmetric,
  };
}
