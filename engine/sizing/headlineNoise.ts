/**
 * How noisy a case's headline quantity will be, before the run: its expected value and the variance of its DSMC
 * estimate per second of sampled (simulated) time, so that the run sizing (runSizing.ts) can choose the sampling
 * steps that bring its 95 % half-width to a target.
 *
 * The estimators count molecules at a surface: a section's mass flow is the net number crossing it, a wall's shear
 * and heat flux the momentum and energy the hits carry. Treating the crossings and hits as independent events
 * (Poisson counts) at the one-way equilibrium flux j = n·c̄/4 (c̄ = sqrt(8kT/(πm)), textbook kinetic theory) gives,
 * for a sampled time t and W molecules per simulated particle:
 *   section mass flow   σ²·t = 2·m²·W·j·A                      (both directions cross A; A = πR² or H × 1 m)
 *   wall shear          σ²·t = 2·m·k·T·W·j / A_w               (tangential momentum in and out, kT/m each)
 *   wall heat flux      σ²·t = (4 + ζ)·(kT)²·W·j / A_w          (flux-weighted energy in and out, (2 + ζ/2)(kT)² each)
 * The derivation is Tenuis's own (common practice, no source). The crossings are not independent in a real run
 * (radially weighted particles in axisymmetric cases, molecules that hit a wall again after a collision, slow
 * modes of the flow), so each estimate is multiplied by a correlation factor measured on the presets
 * (sizing/noiseCalibration.ts states the runs); the run itself reports the half-width it reached.
 *
 * The expected value is the continuum model's where one applies, the simplest estimate of the flow through a duct
 * between vessels otherwise: the long-duct model's flow and the free-molecular flow through the entrance combined as
 * conductances in series (1/ṁ = 1/ṁ_long + 1/ṁ_entrance; for a free-molecular tube this is 1/(1 + 3L/(8R)), the
 * simplest approximation of Clausing's factor; common practice, no source). It only sizes the run.
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { Plan } from '../plan/plan';
import { meanSpeedMPerS } from '../gas/molecularModel';
import { surfaceAreaM2 } from '../geometry/surfaces';
import { flowReferenceOf, isCrossSectionFlow, openingAreaM2 } from '../results/flowQuantities';
import type { CaseModelsResult, ContinuumModelName } from '../continuum/caseModelTypes';
import { NOISE_CORRELATION_FACTOR, forceDrivenTubeFactor, wallFactor, type NoiseKind } from './noiseCalibration';

export type { NoiseKind };

export interface HeadlineNoise {
  readonly sized: true;
  /** The summary.json path of the quantity (a precision target's path). */
  readonly path: string;
  readonly kind: NoiseKind;
  /** Expected value of the quantity, its SI unit, and where it comes from. */
  readonly expectedMean: number;
  readonly expectedFrom: string;
  /** Variance of the estimate × sampled seconds (simulated time), SI units squared × s, correlation included. */
  readonly varianceTimesSeconds: number;
}

export interface UnsizedHeadline {
  readonly sized: false;
  readonly reason: string;
}

/** Models whose value stands for the expected one, most general first. */
const EXPECTED_FROM: readonly ContinuumModelName[] = [
  'unified',
  'firstOrder',
  'secondOrder',
  'noSlip',
  'freeMolecular',
];

function oneWayFluxPerM2S(plan: Plan): number {
  const { numberDensityPerM3: n, temperatureK: t } = plan.reference;
  return (n * meanSpeedMPerS(plan.gas.model.massKg, t)) / 4;
}

/** Area of a wall (m², per metre of depth in planar cases), as the wall quantities divide by it. */
function wallAreaM2(plan: Plan, wall: string): number {
  const s = plan.surfaces.find((f) => f.name === wall);
  return s ? surfaceAreaM2(s.normalIsX, s.planeM, s.fromM, s.toM, plan.grid.axisymmetric) : NaN;
}

/**
 * The gas area of a flow section (m²; per metre of depth when planar): its span across y (the whole domain unless it
 * sets yMinM/yMaxM) less the blocks it crosses, as a strip or (axisymmetric) rings.
 */
export function sectionAreaM2(plan: Plan, name: string): number {
  const c = plan.caseData;
  const s = c.flowSections.find((f) => f.name === name);
  if (!s) return NaN;
  let pieces: [number, number][] = [[s.yMinM ?? 0, s.yMaxM ?? c.domain.lengthYM]];
  for (const b of c.blocks) {
    if (!(s.xM >= b.xMinM && s.xM <= b.xMaxM)) continue;
    pieces = pieces.flatMap(([a, z]): [number, number][] => {
      const out: [number, number][] = [];
      if (b.yMinM > a) out.push([a, Math.min(z, b.yMinM)]);
      if (b.yMaxM < z) out.push([Math.max(a, b.yMaxM), z]);
      return out.filter(([p, q]) => q > p);
    });
  }
  return pieces.reduce((sum, [a, z]) => sum + (plan.grid.axisymmetric ? Math.PI * (z * z - a * a) : z - a), 0);
}

/** The free-molecular flow through a duct's entrance, kg/s (per metre in planar cases). */
function entranceFlowKgS(plan: Plan, up: number, down: number): number {
  const r = plan.caseData.flowReport;
  if (!r) return NaN;
  const m = plan.gas.model.massKg;
  return openingAreaM2(r) * (up - down) * Math.sqrt(m / (2 * Math.PI * K_B * plan.reference.temperatureK));
}

function modelValue(models: CaseModelsResult, key: string): { value: number; model: ContinuumModelName } | null {
  if (!models.recognised) return null;
  const q = models.quantities.find((p) => p.key === key);
  if (!q) return null;
  for (const model of EXPECTED_FROM) {
    const v = q.values[model];
    if (v !== undefined && Number.isFinite(v) && v !== 0) return { value: v, model };
  }
  return null;
}

/** The headline quantity's path: the continuum models' headline, else a duct's mass flow rate. */
export function headlinePathOf(plan: Plan, models: CaseModelsResult): string | null {
  if (models.recognised) return models.headline;
  return plan.caseData.flowSections.length && plan.caseData.flowReport ? 'flow.massFlowRate' : null;
}

/** The headline's expected value and noise (see the file header), or why the run cannot be sized by it. */
export function headlineNoiseOf(plan: Plan, models: CaseModelsResult): HeadlineNoise | UnsizedHeadline {
  const path = headlinePathOf(plan, models);
  if (path === null)
    return {
      sized: false,
      reason: 'the case has no headline quantity (no continuum model recognises it and no flow section)',
    };
  const m = plan.gas.model.massKg;
  const w = plan.moleculesPerParticle;
  const j = oneWayFluxPerM2S(plan);
  const kt = K_B * plan.reference.temperatureK;
  const model = modelValue(models, path);
  const parts = path.split('.');
  if (parts[0] === 'flow' && parts[1] === 'massFlowRate') {
    if (isCrossSectionFlow(plan))
      return {
        sized: false,
        reason: 'the flow along a cross-section (bodyAccelerationZMPerS2) has no noise calibration yet',
      };
    const r = plan.caseData.flowReport;
    if (!r) return { sized: false, reason: 'the flow rate has no flowReport to give the section size' };
    const c = plan.caseData;
    // The section the flow numbers are read at (flowResultOf): its own gas area, which may be a vessel's.
    const area = sectionAreaM2(plan, r.section ?? c.flowSections[0]?.name ?? '');
    if (!(area > 0)) return { sized: false, reason: 'the flow section has no gas area to size by' };
    const { up, down } = flowReferenceOf(plan);
    const entrance = entranceFlowKgS(plan, up, down);
    let expectedMean: number;
    let expectedFrom: string;
    if (c.bodyAccelerationXMPerS2 !== 0) {
      if (!model) return { sized: false, reason: 'no continuum model gives the force-driven flow rate to size by' };
      expectedMean = model.value;
      expectedFrom = `the ${model.model} model`;
    } else if (Number.isFinite(entrance) && entrance > 0) {
      expectedMean = model ? 1 / (1 / Math.abs(model.value) + 1 / entrance) : entrance;
      expectedFrom = model
        ? `the ${model.model} long-duct model in series with the free-molecular entrance flow`
        : 'the free-molecular flow through the opening';
    } else return { sized: false, reason: 'no pressure difference between the vessels to drive a flow' };
    // A section across a vessel (wider than the duct's opening) is noisier in axisymmetric cases (noiseCalibration.ts).
    const opening = openingAreaM2(r);
    const kind: NoiseKind =
      c.bodyAccelerationXMPerS2 !== 0
        ? plan.grid.axisymmetric
          ? 'forceDrivenAxisymmetric'
          : 'forceDriven'
        : plan.grid.axisymmetric
          ? area > 1.5 * opening
            ? 'vesselSectionAxisymmetric'
            : 'sectionAxisymmetric'
          : 'section';
    return {
      sized: true,
      path,
      kind,
      expectedMean,
      expectedFrom,
      varianceTimesSeconds:
        (kind === 'forceDrivenAxisymmetric'
          ? forceDrivenTubeFactor(plan.grid.cellsY, plan.reference.rarefaction)
          : NOISE_CORRELATION_FACTOR[kind]) *
        2 *
        m *
        m *
        w *
        j *
        area,
    };
  }
  if (parts[0] === 'walls' && parts.length === 3 && (parts[2] === 'shearStress' || parts[2] === 'heatFlux')) {
    if (!model) return { sized: false, reason: `no continuum model gives ${path} to size by` };
    const area = wallAreaM2(plan, parts[1]);
    if (!(area > 0)) return { sized: false, reason: `no wall ${parts[1]} to size by` };
    const shear = parts[2] === 'shearStress';
    const kind: NoiseKind = shear ? 'wallShear' : 'wallHeatFlux';
    const perHit = shear ? 2 * m * kt : (4 + plan.gas.model.rotationalDof) * kt * kt;
    return {
      sized: true,
      path,
      kind,
      expectedMean: model.value,
      expectedFrom: `the ${model.model} model`,
      varianceTimesSeconds: (wallFactor(kind, plan.reference.knudsen) * perHit * w * j) / area,
    };
  }
  return { sized: false, reason: `${path} is a profile: the run keeps the planned sampling` };
}

/** The expected 95 % relative half-width after `sampledSeconds` of simulated time (1.96 σ / |mean|). */
export function expectedRelativeHalfWidth(noise: HeadlineNoise, sampledSeconds: number): number {
  return (1.96 * Math.sqrt(noise.varianceTimesSeconds / sampledSeconds)) / Math.abs(noise.expectedMean);
}

/** The simulated sampling time (s) for a 95 % relative half-width of `target`. */
export function sampledSecondsFor(noise: HeadlineNoise, target: number): number {
  return (1.96 * 1.96 * noise.varianceTimesSeconds) / (target * target * noise.expectedMean * noise.expectedMean);
}
