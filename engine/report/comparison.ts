/**
 * continuumComparisonOf(plan, result): the continuum predictions of continuum/caseModels.ts set beside a finished
 * DSMC result, with a verdict per quantity (verdict.ts). What summary.json (`continuum`, `verdict`) and profiles.csv
 * (one column per model) are written from (summaryJson.ts, continuumJson.ts, resultCsv.ts). Pure. In report/, the
 * top layer, because it reads both the results and the continuum models.
 */
import type { Plan } from '../plan/plan';
import type { FieldTable, SimulationResult } from '../results/summarize';
import type { Estimate } from '../stats/estimate';
import { caseModelsOf, type CaseModelOptions } from '../continuum/caseModels';
import type { CaseModels, ContinuumModelName, PredictedProfile, ProfileLine } from '../continuum/caseModelTypes';
import { integralVerdict, profileVerdict, type QuantityVerdict, type VerdictOptions } from './verdict';

export interface ContinuumComparison {
  readonly recognised: true;
  /** The predictions themselves (problem, model descriptions, mean free path, quantities, profiles). */
  readonly predictions: CaseModels;
  /** Integral quantities per model: {MODEL: {`walls.bottom.shearStress`: value, …}}, units in `units`. */
  readonly continuum: Partial<Record<ContinuumModelName, Record<string, number>>>;
  /** SI unit of every quantity and profile key. */
  readonly units: Record<string, string>;
  /** One verdict per quantity and profile that DSMC measured, keyed as in `continuum` and `profiles`. */
  readonly verdict: Record<string, QuantityVerdict>;
  /** Profiles per model: {MODEL: {`profile.velocityX`: values at the DSMC positions, …}}. */
  readonly profiles: Partial<Record<ContinuumModelName, Record<string, Float64Array>>>;
}

export type ContinuumComparisonResult = ContinuumComparison | { readonly recognised: false; readonly reason: string };

export interface ComparisonOptions extends CaseModelOptions, VerdictOptions {}

/** The DSMC {mean, ci95} of `walls.SIDE.QUANTITY` or `flow.QUANTITY`; undefined if the result has none. */
export function dsmcIntegral(result: SimulationResult, key: string): Estimate | undefined {
  const parts = key.split('.');
  if (parts[0] === 'walls' && parts.length === 3) {
    const e = (result.walls[parts[1]] as Record<string, Estimate> | undefined)?.[parts[2]];
    return e ? { mean: e.mean, ci95: e.ci95 } : undefined;
  }
  if (parts[0] === 'flow' && parts.length === 2) {
    const e = (result.flow?.values as Record<string, Estimate> | undefined)?.[parts[1]];
    return e ? { mean: e.mean, ci95: e.ci95 } : undefined;
  }
  return undefined;
}

function column(t: FieldTable, field: string, row: number): { mean: number; ci95: number } {
  const k = t.names.indexOf(field);
  const w = t.names.length;
  return k < 0 ? { mean: NaN, ci95: NaN } : { mean: t.mean[row * w + k], ci95: t.ci95[row * w + k] };
}

/**
 * The DSMC values of `field` along a profile line (caseModelTypes.ts ProfileLine). A centreline on a cell boundary
 * is the mean of the two cells beside it, with the mean of their half-widths: the bound for perfectly correlated
 * neighbours, larger than for independent ones (neighbouring cells are positively correlated).
 */
export function dsmcProfile(
  result: SimulationResult,
  line: ProfileLine,
  field: string,
): { mean: Float64Array; ci95: Float64Array } {
  const { cellsX, cellsY } = result.numerics;
  if (line.kind === 'rows') {
    const mean = new Float64Array(result.profile.rows);
    const ci95 = new Float64Array(result.profile.rows);
    for (let r = 0; r < result.profile.rows; r++) ({ mean: mean[r], ci95: ci95[r] } = column(result.profile, field, r));
    return { mean, ci95 };
  }
  const alongY = line.kind === 'column';
  const n = alongY ? cellsY : cellsX;
  const across = alongY ? cellsX : cellsY;
  const size = (alongY ? result.cellX[1] - result.cellX[0] : result.cellY[cellsX] - result.cellY[0]) || 0;
  // Fractional index of the line among the cell centres across it (centre k at (k + 0.5)·size).
  const s = size > 0 ? line.atM / size - 0.5 : 0;
  const lo = Math.max(0, Math.min(across - 1, Math.floor(s + 1e-9)));
  const hi = Math.abs(s - Math.round(s)) < 1e-6 ? lo : Math.min(across - 1, lo + 1);
  const cell = (along: number, k: number) => (alongY ? k + cellsX * along : along + cellsX * k);
  const mean = new Float64Array(n);
  const ci95 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const a = column(result.cells, field, cell(i, lo));
    const b = column(result.cells, field, cell(i, hi));
    mean[i] = (a.mean + b.mean) / 2;
    ci95[i] = (a.ci95 + b.ci95) / 2;
  }
  return { mean, ci95 };
}

/** The scale of a profile's deviations (caseModelTypes.ts ProfileScale) for the DSMC values at hand. */
function scaleOf(p: PredictedProfile, dsmc: Float64Array): number {
  if (p.scale.kind === 'fixed') return p.scale.value;
  let s = 0;
  for (const d of dsmc) if (Number.isFinite(d)) s = Math.max(s, Math.abs(d - p.scale.base));
  return s;
}

/** Continuum predictions beside a DSMC result of the same plan, with verdicts; or why there are none. */
export function continuumComparisonOf(
  plan: Plan,
  result: SimulationResult,
  options: ComparisonOptions = {},
): ContinuumComparisonResult {
  const predictions = caseModelsOf(plan, options);
  if (!predictions.recognised) return predictions;
  // The case's own tolerance (comparison.tolerance) unless the caller gives one.
  options = { ...options, tolerance: options.tolerance ?? plan.caseData.comparison?.tolerance };
  const continuum: ContinuumComparison['continuum'] = {};
  const profiles: ContinuumComparison['profiles'] = {};
  const units: Record<string, string> = {};
  const verdict: Record<string, QuantityVerdict> = {};
  for (const q of predictions.quantities) {
    units[q.key] = q.unit;
    for (const [model, value] of Object.entries(q.values) as [ContinuumModelName, number][])
      (continuum[model] ??= {})[q.key] = value;
    const dsmc = dsmcIntegral(result, q.key);
    if (dsmc) verdict[q.key] = integralVerdict(q.key, q.unit, dsmc, q.values, options, predictions.notApplicable);
  }
  for (const p of predictions.profiles) {
    units[p.key] = p.unit;
    for (const [model, values] of Object.entries(p.values) as [ContinuumModelName, Float64Array][])
      (profiles[model] ??= {})[p.key] = values;
    const dsmc = dsmcProfile(result, p.line, p.field);
    if (dsmc.mean.length !== p.positionsM.length) continue;
    verdict[p.key] = profileVerdict(
      p.key,
      p.unit,
      dsmc.mean,
      dsmc.ci95,
      scaleOf(p, dsmc.mean),
      p.values,
      options,
      predictions.notApplicable,
    );
  }
  return { recognised: true, predictions, continuum, units, verdict, profiles };
}
