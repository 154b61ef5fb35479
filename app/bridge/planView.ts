/**
 * What the set-up shows before a run, as plain data: reference state, the numerics advisor's ratios with a pass/warn
 * mark, particle count, memory, expected statistical error of the planned sampling and a run-time estimate.
 * Part of the lazily loaded set-up chunk (it calls the planner); components import its types only.
 */
import { planFromInput, type Plan } from '../../engine/plan/plan';
import type { ReferenceState } from '../../engine/plan/referenceState';
import { caseModelsOf } from '../../engine/continuum/caseModels';
import {
  DEFAULT_CAP_SECONDS,
  sizedPlanOf,
  sizingLines,
  type NotSized,
  type RunSizing,
} from '../../engine/sizing/runSizing';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { SIDE_NAMES } from '../../engine/case/caseConstants';
import { targetPathsOf } from '../../engine/results/targetQuantities';
import {
  densityRelativeError,
  independentSamples,
  speedOfSoundMPerS,
  temperatureRelativeError,
  velocityStandardErrorMPerS,
} from '../../engine/stats/expectedNoise';

export interface AdvisorRow {
  readonly label: string;
  readonly value: number;
  /** The advised bound, and whether the value has to stay below it ('max') or above it ('min'). */
  readonly limit: number;
  readonly bound: 'max' | 'min';
  readonly pass: boolean;
}

export interface PlanView {
  readonly reference: ReferenceState;
  readonly advisor: readonly AdvisorRow[];
  readonly cellsX: number;
  readonly cellsY: number;
  readonly particles: number;
  readonly memoryBytes: number;
  readonly timeStepS: number;
  readonly transientSteps: number;
  readonly transientMode: 'auto' | 'fixed';
  readonly sampleSteps: number;
  /**
   * The flow's speed, m/s: the largest wall or initial flow speed, or the estimated mean speed of a pressure- or
   * force-driven flow when larger (flowSpeedSource says which); the Mach and Reynolds numbers are formed with it,
   * Re on the length scale L.
   */
  readonly flowSpeedMPerS: number;
  /** Where flowSpeedMPerS comes from, in words: 'fastest wall or initial flow', or the estimate used and its formula. */
  readonly flowSpeedSource: string;
  /** The mean-speed estimate of a driven flow (absent when the case is not one). */
  readonly flowEstimate?: FlowEstimate;
  readonly machNumber: number;
  readonly reynoldsNumber: number;
  readonly expected: {
    /** Independent samples per cell over all replicas: sampled steps / steps per mean collision time (common practice). */
    readonly independentSamples: number;
    readonly densityRelative: number;
    readonly temperatureRelative: number;
    /** Standard error of a cell's mean velocity component, m/s (independent of the flow speed). */
    readonly velocityStandardErrorMPerS: number;
  };
  /** Estimated wall time of the run, s, at particleStepsPerSecond per replica. */
  readonly estimatedSeconds: number;
  readonly warnings: readonly string[];
  /** Quantities a precision target may name (paths as in summary.json, e.g. flow.massFlowRate). */
  readonly targetPaths: readonly string[];
  /** The run sizing in lines (engine/sizing/runSizing.ts sizingLines), and whether it set the sampling shown. */
  readonly sizing: readonly string[];
  readonly sizingApplied: boolean;
}

/** A driven flow's mean speed through its duct, estimated before the run from a continuum or free-molecular model. */
export interface FlowEstimate {
  /** Mass flow rate, kg/s (per metre of depth in a planar case). */
  readonly massFlowRateKgPerS: number;
  /** ṁ / (ρ A) at the reference density, A the duct's cross-section (πR², or H per metre of depth). */
  readonly meanSpeedMPerS: number;
  readonly source: string;
}

/**
 * Transmission probability of a round tube of length L and radius R in free-molecular flow, Santeler's fit to
 * Clausing's values: 1/W = 1 + (3L/8R)·(1 + 1/(3(1 + L/7R))) (D. J. Santeler, J. Vac. Sci. Technol. A 4, 338 (1986);
 * within about 1 % of Clausing's table, e.g. W = 0.309 against Clausing's 0.311 at L/R = 5).
 */
export function tubeTransmission(lengthOverRadius: number): number {
  const l = lengthOverRadius;
  return 1 / (1 + ((3 * l) / 8) * (1 + 1 / (3 * (1 + l / 7))));
}

/**
 * Transmission probability of a planar slot of length L and gap H, the same resistances-in-series form,
 * W ≈ 1/(1 + L/(2H)): right at L = 0, and for L/H of a few within some 10 % of the long-slot values (a rough estimate,
 * common practice, no source: enough for the Mach and Reynolds numbers of a check panel, not for a result).
 */
export function slotTransmission(lengthOverGap: number): number {
  return 1 / (1 + lengthOverGap / 2);
}

/** The duct's length: flowReport's, or the plate's thickness for an opening (the widest block along x). */
function ductLengthM(p: Plan): number {
  const report = p.caseData.flowReport!;
  if (report.lengthM !== undefined) return report.lengthM;
  return Math.max(0, ...p.caseData.blocks.map((b) => b.xMaxM - b.xMinM));
}

const sig3 = (x: number) => String(Number(x.toPrecision(3)));

/**
 * The mean speed of a driven flow: between two reservoirs with a flowReport (channel, tube, slit, orifice), the
 * second-order slip long-duct mass flow (engine/continuum) when Kn < 1 and the case is a long channel or tube, else
 * the free-molecular ṁ = W·A·(p1 − p2)·sqrt(m/(2πkT)) with the transmission probability W; a force-driven channel
 * or tube, the unified flow-rate model (valid at every Kn). Null for any other case.
 */
export function flowEstimateOf(p: Plan): FlowEstimate | null {
  const c = p.caseData;
  const ref = p.reference;
  const { left, right } = p.boundaries;
  const report = c.flowReport;
  const planar = !p.grid.axisymmetric;
  const massFlowOf = (model: 'secondOrder' | 'unified'): number | undefined => {
    const models = caseModelsOf(p);
    if (!models.recognised) return undefined;
    const v = models.quantities.find((q) => q.key === 'flow.massFlowRate')?.values[model];
    return v !== undefined && Number.isFinite(v) ? v : undefined;
  };
  const estimate = (mdot: number, sizeM: number, source: string): FlowEstimate => {
    const area = planar ? sizeM : Math.PI * sizeM * sizeM;
    return { massFlowRateKgPerS: mdot, meanSpeedMPerS: Math.abs(mdot) / (ref.massDensityKgPerM3 * area), source };
  };
  if (c.bodyAccelerationXMPerS2 !== 0 && left.type === 'periodic') {
    const mdot = massFlowOf('unified');
    const size = report?.sizeM ?? p.grid.lengthYM;
    return mdot === undefined
      ? null
      : estimate(
          mdot,
          size,
          `mean speed estimated from the unified flow-rate model (force-driven, Kn = ${sig3(ref.knudsen)})`,
        );
  }
  if (!report || left.type !== 'reservoir' || right.type !== 'reservoir') return null;
  const dp = left.pressurePa - right.pressurePa;
  if (!(Math.abs(dp) > 0)) return null;
  const long = report.lengthM !== undefined && (report.duct === 'channel' || report.duct === 'tube');
  if (ref.knudsen < 1 && long) {
    const mdot = massFlowOf('secondOrder');
    if (mdot !== undefined)
      return estimate(
        mdot,
        report.sizeM,
        `mean speed estimated from the continuum prediction (second-order slip, long-duct formula; Kn = ${sig3(ref.knudsen)} < 1)`,
      );
  }
  const lengthOverSize = ductLengthM(p) / report.sizeM;
  const w = planar ? slotTransmission(lengthOverSize) : tubeTransmission(lengthOverSize);
  const area = planar ? report.sizeM : Math.PI * report.sizeM ** 2;
  const mdot = w * area * dp * Math.sqrt(p.gas.model.massKg / (2 * Math.PI * K_B * ref.temperatureK));
  return estimate(
    mdot,
    report.sizeM,
    `mean speed estimated from the free-molecular flow ṁ = W·A·Δp·sqrt(m/(2πkT)), transmission probability W = ${sig3(w)}${ref.knudsen < 1 ? ` (Kn = ${sig3(ref.knudsen)}: likely below the flow's speed, there being no continuum formula for this geometry here)` : ` (Kn = ${sig3(ref.knudsen)} ≥ 1)`}`,
  );
}

export interface PlanOptions {
  readonly replicas: number;
  /** Speed of one replica worker, particle-steps per second (measured in this browser, or a default). */
  readonly particleStepsPerSecond: number;
  /** Logical cores: more replicas than cores share them. */
  readonly cores: number;
}

export type PlanViewResult = { ok: true; view: PlanView } | { ok: false; errors: string[] };

export function describePlan(caseInput: unknown, o: PlanOptions): PlanViewResult {
  const first = planFromInput(caseInput);
  if (!first.ok) return { ok: false, errors: first.errors };
  // The plan shown is the one the run will take: sized to decide where the case leaves its sampling open.
  const { plan: p, sizing } = sizedPlanFor(first.plan, o.replicas);
  const r = p.ratios;
  const row = (label: string, value: number, limit: number, bound: 'max' | 'min'): AdvisorRow => ({
    label,
    value,
    limit,
    bound,
    pass: bound === 'max' ? value <= limit + 1e-9 : value >= limit - 1e-9,
  });
  let flowSpeed = Math.hypot(...p.caseData.initial.velocityMPerS);
  for (const side of SIDE_NAMES) {
    const b = p.boundaries[side];
    if (b.type === 'wall') flowSpeed = Math.max(flowSpeed, Math.hypot(...b.velocityMPerS));
  }
  const ref = p.reference;
  const model = p.gas.model;
  const flowEstimate = flowEstimateOf(p);
  const driven = flowEstimate !== null && flowEstimate.meanSpeedMPerS > flowSpeed;
  if (driven) flowSpeed = flowEstimate.meanSpeedMPerS;
  const sound = speedOfSoundMPerS(model.massKg, ref.temperatureK, model.rotationalDof);
  const stepsBetween = Math.max(1, Math.ceil(ref.meanCollisionTimeS / p.timeStepS));
  const samples = independentSamples(p.sampleSteps * o.replicas, stepsBetween);
  const share = Math.min(1, o.cores / Math.max(1, o.replicas));
  const steps = p.transientSteps + p.sampleSteps;
  return {
    ok: true,
    view: {
      reference: ref,
      advisor: [
        row('cell size / mean free path', r.cellSizeOverMeanFreePath, 1 / 3, 'max'),
        row('time step / mean collision time', r.timeStepOverCollisionTime, 0.25, 'max'),
        row('time step / cell transit time', r.timeStepOverCellTransitTime, 0.25, 'max'),
        row('particles per cell', r.particlesPerCell, 20, 'min'),
      ],
      cellsX: p.grid.cellsX,
      cellsY: p.grid.cellsY,
      particles: p.initialParticles,
      memoryBytes: p.memoryBytesEstimate,
      timeStepS: p.timeStepS,
      transientSteps: p.transientSteps,
      transientMode: p.transientMode,
      sampleSteps: p.sampleSteps,
      flowSpeedMPerS: flowSpeed,
      flowSpeedSource: driven ? flowEstimate.source : 'fastest wall or initial flow',
      ...(flowEstimate ? { flowEstimate } : {}),
      machNumber: flowSpeed / sound,
      reynoldsNumber: (ref.massDensityKgPerM3 * flowSpeed * ref.lengthScaleM) / ref.viscosityPaS,
      expected: {
        independentSamples: samples,
        densityRelative: densityRelativeError(p.particlesPerCell, samples),
        temperatureRelative: temperatureRelativeError(p.particlesPerCell, samples),
        velocityStandardErrorMPerS: velocityStandardErrorMPerS(
          model.massKg,
          ref.temperatureK,
          p.particlesPerCell,
          samples,
        ),
      },
      estimatedSeconds: (steps * p.initialParticles) / (o.particleStepsPerSecond * share),
      warnings: p.warnings,
      targetPaths: targetPathsOf(p),
      sizing: sizingLines(sizing),
      sizingApplied: sizing.sized && sizing.applied,
    },
  };
}

/** The plan a page run will take (engine/sizing/runSizing.ts sizedPlanOf); capShare: its share of the default cap. */
export function sizedPlanFor(plan: Plan, replicas: number, capShare = 1): { plan: Plan; sizing: RunSizing | NotSized } {
  return sizedPlanOf(plan, { replicas, capSeconds: DEFAULT_CAP_SECONDS * capShare });
}
