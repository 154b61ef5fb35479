/**
 * The continuum models' predictions over a sweep's range, on a grid as fine as asked for, to draw beside the swept
 * DSMC points. Plans each value (plan/sweepPoints.ts) and evaluates the case models (continuum/caseModels.ts).
 */
import type { Case } from '../case/schema';
import { plan } from '../plan/plan';
import { caseAtSweepPoint } from '../plan/sweepPoints';
import type { SweepParameter } from '../case/sweep';
import { caseModelsOf } from '../continuum/caseModels';
import type { CaseProblem, ContinuumModelName } from '../continuum/caseModelTypes';

export interface SweepContinuumCurves {
  readonly problem: CaseProblem;
  /** The swept values (SI) the curves are evaluated at. */
  readonly values: readonly number[];
  /** Integral quantity key (`flow.massFlowRate`, `walls.bottom.shearStress` …) → model → value at each of `values` (NaN where that point could not be planned). */
  readonly curves: Readonly<Record<string, Partial<Record<ContinuumModelName, number[]>>>>;
  /** SI unit of each key. */
  readonly units: Readonly<Record<string, string>>;
}

/**
 * What each continuum model predicts for the integral quantities of `c` at each swept value: the same case models
 * (engine/continuum/caseModels.ts) the points' summaries compare with, on a grid as fine as asked for. The integral
 * predictions depend on the gas, geometry, walls and pressures only, not on the DSMC grid, so every value is planned
 * on the fixed grid `cells` (e.g. the smallest grid of the sweep's points): cheap, and never refused for too many
 * particles. One plan and one caseModelsOf per value; the cavity's predictions solve Navier–Stokes twice each, so
 * give it few values. Returns the reason when no continuum model fits the case.
 */
export function sweepContinuumCurves(
  c: Case,
  parameter: SweepParameter,
  values: readonly number[],
  cells: { readonly cellsX: number; readonly cellsY: number },
): SweepContinuumCurves | { readonly reason: string } {
  const onGrid: Case = { ...c, numerics: { ...c.numerics, cellsX: cells.cellsX, cellsY: cells.cellsY } };
  const curves: Record<string, Partial<Record<ContinuumModelName, number[]>>> = {};
  const units: Record<string, string> = {};
  let problem: CaseProblem | undefined;
  let reason = 'no point of the range could be planned';
  values.forEach((value, k) => {
    const planned = plan(caseAtSweepPoint(onGrid, parameter, value));
    if (!planned.ok) return;
    const models = caseModelsOf(planned.plan);
    if (!models.recognised) {
      reason = models.reason;
      return;
    }
    problem = models.problem;
    for (const q of models.quantities) {
      units[q.key] = q.unit;
      const byModel = (curves[q.key] ??= {});
      for (const [model, v] of Object.entries(q.values) as [ContinuumModelName, number][])
        (byModel[model] ??= values.map(() => NaN))[k] = v;
    }
  });
  return problem ? { problem, values: [...values], curves, units } : { reason };
}
