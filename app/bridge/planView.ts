/**
 * What the set-up shows before a run, as plain data: reference state, the numerics advisor's ratios with a pass/warn
 * mark, particle count, memory, expected statistical error of the planned sampling and a run-time estimate.
 * Part of the lazily loaded set-up chunk (it calls the planner); components import its types only.
 */
import { planFromInput } from '../../engine/plan/plan';
import type { ReferenceState } from '../../engine/plan/referenceState';
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
  /** Largest wall or initial flow speed, m/s, and the Mach and Reynolds numbers formed with it and the length scale. */
  readonly flowSpeedMPerS: number;
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
  const planned = planFromInput(caseInput);
  if (!planned.ok) return { ok: false, errors: planned.errors };
  const p = planned.plan;
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
    },
  };
}
