/**
 * The sweep side of the run chunk (re-exported by runApi.ts, so it loads with it): the set-up's case planned over a
 * range, the continuum curves over that range, and the engine's own sweep table (sweepRowOf, sweepCsv, sweepJson),
 * so a sweep.csv from the page and one from `tenuis sweep` are made by the same functions.
 */
import { parseCase, type Case } from '../../engine/case/schema';
import { wallNamesOf } from '../../engine/kernel/sideTable';
import {
  FLOW_QUANTITIES,
  flowQuantityUnits,
  flowQuantityDefined,
  flowPerDepth,
  hasFlowResult,
} from '../../engine/results/flowQuantities';
import { WALL_QUANTITY_UNITS } from '../../engine/results/wallQuantities';
import { planSweepPoints } from '../../engine/plan/sweepPoints';
import { sweepContinuumCurves, type SweepContinuumCurves } from '../../engine/report/sweepCurves';
import { sweepValues, type SweepParameter, type SweepSpacing } from '../../engine/case/sweep';
import type { ContinuumModelName } from '../../engine/continuum/caseModelTypes';
import type { Plan } from '../../engine/plan/plan';

export { sweepCsv, sweepJson } from '../../engine/report/sweepTable';
export { sweepRowOf } from '../../engine/report/sweepRow';
export { SWEEP_PARAMETER_UNITS } from '../../engine/case/sweep';
export { convertToSI } from '../../engine/units/engineeringUnits';

export interface SweepRequest {
  readonly parameter: SweepParameter;
  /** Ends of the range, SI (pressure in Pa). */
  readonly from: number;
  readonly to: number;
  readonly points: number;
  readonly spacing: SweepSpacing;
}

/** One point as the page needs it: the case to run (parsed, SI) and a few numbers of its plan to show. */
export interface SweepPointView {
  readonly point: number;
  readonly value: number;
  readonly caseInput: unknown;
  /** Its plan, made with the sweep's: the point's run starts from it rather than validating the case again. */
  readonly plan: Plan;
  readonly caseName: string;
  readonly cellsX: number;
  readonly cellsY: number;
  readonly particles: number;
  readonly knudsen: number;
  readonly pressurePa: number;
  readonly warnings: readonly string[];
}

export interface SweepQuantity {
  /** `flow.NAME` or `walls.WALL.QUANTITY`, the keys of summary.json and of the continuum predictions. */
  readonly key: string;
  readonly label: string;
  readonly unit: string;
}

export type SweepPlanView =
  | {
      readonly ok: true;
      /** The set-up's case as validated here: what the continuum curves start from (not validated again). */
      readonly caseData: Case;
      readonly caseName: string;
      readonly points: readonly SweepPointView[];
      /** For the table: planar cases give flow numbers per metre; cases without flow sections get wall columns. */
      readonly planar: boolean;
      readonly hasFlow: boolean;
      /** What can be plotted, as sweep.csv has it: each flow quantity, or each wall's shear stress and heat flux (SI units). */
      readonly quantities: readonly SweepQuantity[];
    }
  | { readonly ok: false; readonly message: string };

/** Points of the continuum curves: fine enough to look smooth on a log axis, few enough to plan in a few ms each. */
const CURVE_POINTS = 41;

/** Every point planned (as `tenuis sweep` does before it runs anything); the first that cannot run refuses the sweep. */
export function planSweep(caseInput: unknown, r: SweepRequest): SweepPlanView {
  const parsed = parseCase(caseInput);
  if (!parsed.ok) return { ok: false, message: `the set-up's case is not valid: ${parsed.errors.join('; ')}` };
  const c = parsed.value;
  const planned = planSweepPoints(c, r.parameter, sweepValues(r.from, r.to, r.points, r.spacing));
  if (!planned.ok)
    return {
      ok: false,
      message: `point ${planned.point} of ${r.points} (${r.parameter} = ${Number(planned.value.toPrecision(6))}) cannot run as set up: ${planned.errors.join('; ')}`,
    };
  const planar = flowPerDepth(planned.points[0].plan);
  const hasFlow = hasFlowResult(planned.points[0].plan);
  const flowUnits = flowQuantityUnits(planar);
  const quantities: SweepQuantity[] = hasFlow
    ? FLOW_QUANTITIES.filter((q) => flowQuantityDefined(planned.points[0].plan, q)).map((q) => ({
        key: `flow.${q}`,
        label: q,
        unit: flowUnits[q],
      }))
    : wallNamesOf(planned.points[0].plan).flatMap((w) =>
        (['shearStress', 'heatFlux'] as const).map((q) => ({
          key: `walls.${w}.${q}`,
          label: `${w} ${q}`,
          unit: WALL_QUANTITY_UNITS[q],
        })),
      );
  return {
    ok: true,
    caseData: c,
    caseName: c.name,
    planar,
    hasFlow,
    quantities,
    points: planned.points.map((p) => ({
      point: p.point,
      value: p.value,
      caseInput: p.caseData,
      plan: p.plan,
      caseName: p.caseData.name,
      cellsX: p.plan.grid.cellsX,
      cellsY: p.plan.grid.cellsY,
      particles: p.plan.initialParticles,
      knudsen: p.plan.reference.knudsen,
      pressurePa: p.plan.reference.pressurePa,
      warnings: p.plan.warnings,
    })),
  };
}

/** Values evaluated per macrotask: each plans the case and runs the case models (a few ms), so no task grows long. */
const CURVE_VALUES_PER_TASK = 4;
const nextTask = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/**
 * The continuum models' integral predictions over the sweep's range, on the smallest grid of its points: a log-spaced
 * grid of CURVE_POINTS values, or just the points' own values for the cavity (each value solves Navier–Stokes).
 * Evaluated a few values per macrotask, so the page stays responsive meanwhile. `caseData` is planSweep's validated
 * case.
 */
export async function sweepCurves(
  caseData: Case,
  r: SweepRequest,
  points: readonly SweepPointView[],
): Promise<SweepContinuumCurves | { readonly reason: string }> {
  if (points.length === 0) return { reason: 'no valid case' };
  const smallest = points.reduce((a, b) => (b.cellsX * b.cellsY < a.cellsX * a.cellsY ? b : a));
  const cells = { cellsX: smallest.cellsX, cellsY: smallest.cellsY };
  const first = sweepContinuumCurves(caseData, r.parameter, [points[0].value], cells);
  if ('reason' in first) return first;
  const lo = Math.min(r.from, r.to);
  const hi = Math.max(r.from, r.to);
  const values =
    first.problem === 'cavity' || lo === hi ? points.map((p) => p.value) : sweepValues(lo, hi, CURVE_POINTS, 'log');
  const curves: Record<string, Partial<Record<ContinuumModelName, number[]>>> = {};
  const units: Record<string, string> = {};
  for (let start = 0; start < values.length; start += CURVE_VALUES_PER_TASK) {
    await nextTask();
    const part = sweepContinuumCurves(caseData, r.parameter, values.slice(start, start + CURVE_VALUES_PER_TASK), cells);
    if ('reason' in part) continue;
    Object.assign(units, part.units);
    for (const [key, byModel] of Object.entries(part.curves)) {
      for (const [model, ys] of Object.entries(byModel) as [ContinuumModelName, number[]][]) {
        const all = ((curves[key] ??= {})[model] ??= values.map(() => NaN));
        ys.forEach((y, k) => (all[start + k] = y));
      }
    }
  }
  return { problem: first.problem, values, curves, units };
}
