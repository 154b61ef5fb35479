/**
 * The points of a sweep as cases and plans: the case's own value of the swept parameter (from its reference state, so
 * it needs the planner), the pressure factor that puts it at a point's value (case/sweep.ts explains why scaling
 * every pressure does), and every point planned before any runs.
 */
import type { Case } from '../case/schema';
import { SWEEP_PARAMETER_UNITS, scalePressures, type SweepParameter } from '../case/sweep';
import { plan, type Plan } from './plan';
import { referenceStateOf } from './referenceState';
import { gasModelOf } from './referenceState';

/** The case's own value of the swept parameter: its reference Knudsen number (as plan() gives it) or pressure (Pa). */
export function caseValueOf(c: Case, parameter: SweepParameter): number {
  const reference = referenceStateOf(c, gasModelOf(c).model);
  return parameter === 'knudsen' ? reference.knudsen : reference.pressurePa;
}

/** The factor every pressure of `c` is multiplied by to put `parameter` at `value`. */
export function pressureFactorFor(c: Case, parameter: SweepParameter, value: number): number {
  const own = caseValueOf(c, parameter);
  return parameter === 'knudsen' ? own / value : value / own;
}

/**
 * The case of one sweep point: `c` with its pressures scaled to put `parameter` at `value` (SI), named after the
 * point so its summary says which point it is. A pressure sweep sets the initial pressure to `value` exactly.
 */
export function caseAtSweepPoint(c: Case, parameter: SweepParameter, value: number): Case {
  const scaled = scalePressures(c, pressureFactorFor(c, parameter, value));
  const unit = SWEEP_PARAMETER_UNITS[parameter].unit;
  return {
    ...scaled,
    name: `${c.name}, ${parameter} ${Number(value.toPrecision(6))}${unit === '1' ? '' : ` ${unit}`}`,
    ...(parameter === 'pressure' ? { initial: { ...scaled.initial, pressurePa: value } } : {}),
  };
}

/** One point of a sweep, planned: its number (from 1), the swept value (SI), its case and plan. */
export interface PlannedSweepPoint {
  readonly point: number;
  readonly value: number;
  readonly caseData: Case;
  readonly plan: Plan;
}

export type SweepPlanResult =
  | { readonly ok: true; readonly points: PlannedSweepPoint[] }
  /** The first point that cannot run: its number, value and the planner's errors. */
  | { readonly ok: false; readonly point: number; readonly value: number; readonly errors: readonly string[] };

/**
 * Every point of a sweep planned before any runs (the command line and the browser alike), so a sweep never stops
 * half-way at a point that could not have run. `c` must have a usable gas (caseValueOf throws otherwise).
 */
export function planSweepPoints(c: Case, parameter: SweepParameter, values: readonly number[]): SweepPlanResult {
  const points: PlannedSweepPoint[] = [];
  for (let k = 0; k < values.length; k++) {
    const caseData = caseAtSweepPoint(c, parameter, values[k]);
    const planned = plan(caseData);
    if (!planned.ok) return { ok: false, point: k + 1, value: values[k], errors: planned.errors };
    points.push({ point: k + 1, value: values[k], caseData, plan: planned.plan });
  }
  return { ok: true, points };
}
