/**
 * Parameter sweeps (`tenuis sweep`): what a point of a sweep is, and the table of a finished sweep. Pure: no DOM, no
 * Node, so the browser can offer the same sweeps later.
 *
 * A point changes only the pressures of the case. With the viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m))
 * (engine/gas/molecularModel.ts) μ depends on T alone, so at fixed temperature and geometry Kn = λ/L ∝ 1/p exactly:
 * multiplying every pressure by f gives Kn/f and δ·f, and keeps every pressure ratio. Hence
 * - `knudsen` K: every pressure × Kn_case / K, Kn_case being the case's own reference Knudsen number;
 * - `pressure` P (Pa): every pressure × P / p_case, p_case the reference (initial) pressure.
 * The pressures are initial.pressurePa, every reservoir side's pressurePa and flowReport's upstream and downstream
 * pressures when set. Nothing else changes: numerics the case fixes (cells, time step, steps) stay fixed, and the
 * planner re-derives those it leaves open for each point; a body acceleration is kept as it is.
 */
import type { Case } from './schema';
import { SIDE_NAMES } from './schema';
import { plan, type Plan } from '../plan/plan';
import type { QuantityKind } from '../units/engineeringUnits';
import { csvDocument, summaryJsonText, type SummaryJson, type JsonNumber, type Performance } from '../results/exports';
import type { SimulationResult } from '../results/summarize';
import type { ContinuumComparisonResult } from '../continuum/comparison';
import { caseModelsOf } from '../continuum/caseModels';
import type { CaseProblem, ContinuumModelName } from '../continuum/caseModelTypes';
import { FLOW_QUANTITIES, flowQuantityUnits } from '../results/flowQuantities';
import { WALL_QUANTITY_UNITS } from '../results/wallQuantities';
import { gasModelOf, referenceStateOf } from '../plan/referenceState';

export const SWEEP_PARAMETERS = ['knudsen', 'pressure'] as const;
export type SweepParameter = (typeof SWEEP_PARAMETERS)[number];

/** How each parameter is read on the command line (unit kind for parseQuantity) and its SI unit in exports. */
export const SWEEP_PARAMETER_UNITS: Readonly<
  Record<SweepParameter, { readonly kind: QuantityKind; readonly unit: string }>
> = {
  knudsen: { kind: 'dimensionless', unit: '1' },
  pressure: { kind: 'pressure', unit: 'Pa' },
};

export type SweepSpacing = 'linear' | 'log';

/**
 * `points` values from `from` to `to`, both included: equal steps ('linear') or equal ratios ('log', geometric:
 * from · (to/from)^(k/(points−1)), which needs from and to of the same sign). One point is just `from`. The ends are
 * exactly `from` and `to`; points between are rounded to 15 significant digits (a relative change below 1e-15), so
 * that round numbers come out round (0.5 to 4 on a log scale: 1 and 2, not 0.9999999999999999 and 1.9999999999999996).
 */
export function sweepValues(from: number, to: number, points: number, spacing: SweepSpacing): number[] {
  if (points === 1) return [from];
  const out: number[] = [];
  const logFrom = Math.log(from);
  const logTo = Math.log(to);
  for (let k = 0; k < points; k++) {
    const t = k / (points - 1);
    const value = spacing === 'log' ? Math.exp(logFrom + t * (logTo - logFrom)) : from + t * (to - from);
    out.push(Number(value.toPrecision(15)));
  }
  out[0] = from;
  out[points - 1] = to;
  return out;
}

/** The case's own value of the swept parameter: its reference Knudsen number (as plan() gives it) or pressure (Pa). */
export function caseValueOf(c: Case, parameter: SweepParameter): number {
  const reference = referenceStateOf(c, gasModelOf(c).model);
  return parameter === 'knudsen' ? reference.knudsen : reference.pressurePa;
}

/** The case with every pressure multiplied by `factor` (> 0): initial, reservoirs, flowReport's pressures. */
export function scalePressures(c: Case, factor: number): Case {
  const boundaries = { ...c.boundaries };
  for (const side of SIDE_NAMES) {
    const b = boundaries[side];
    if (b.type === 'reservoir') boundaries[side] = { ...b, pressurePa: b.pressurePa * factor };
  }
  const r = c.flowReport;
  const flowReport = r && {
    ...r,
    ...(r.upstreamPressurePa !== undefined ? { upstreamPressurePa: r.upstreamPressurePa * factor } : {}),
    ...(r.downstreamPressurePa !== undefined ? { downstreamPressurePa: r.downstreamPressurePa * factor } : {}),
  };
  return {
    ...c,
    initial: { ...c.initial, pressurePa: c.initial.pressurePa * factor },
    boundaries,
    ...(flowReport ? { flowReport } : {}),
  };
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

/** Folder of point k (from 1) inside the sweep's output folder: points/001, points/002 … */
export function sweepPointFolder(point: number): string {
  return `points/${String(point).padStart(3, '0')}`;
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

// ─── The sweep's table ─────────────────────────────────────────────────────────────────────────────────────────

/** complete: ran to the end; interrupted: stopped by the user (summary of what was sampled, or null); failed: null. */
export type SweepPointStatus = 'complete' | 'interrupted' | 'failed';

export interface SweepRow {
  /** Point number, from 1. */
  readonly point: number;
  /** The swept value as requested (SI). */
  readonly value: number;
  readonly status: SweepPointStatus;
  /** The point's summary.json, or null when nothing was sampled. */
  readonly summary: SummaryJson | null;
}

/**
 * What one point's run gave, as the row needs it: its result with the continuum comparison of the same plan
 * (engine/continuum/comparison.ts), or nothing, because it was stopped before sampling began or it failed.
 */
export type SweepPointRun =
  | {
      readonly kind: 'sampled';
      readonly result: SimulationResult;
      readonly comparison: ContinuumComparisonResult;
      readonly performance: Performance;
      /** The point's case name (caseAtSweepPoint names it after the point). */
      readonly caseName: string;
      /** Stopped by the user: the result holds what was sampled until then. */
      readonly interrupted: boolean;
    }
  | { readonly kind: 'nothingSampled' }
  | { readonly kind: 'failed' };

/**
 * The point's summary.json as an object: parsed back from the very text `tenuis run` writes (summaryJsonText), so
 * the table holds exactly the numbers of the point's summary.json (JSON has no NaN: they are null there too).
 */
export function sweepPointSummary(run: Extract<SweepPointRun, { kind: 'sampled' }>): SummaryJson {
  return JSON.parse(
    summaryJsonText(run.result, { performance: run.performance, caseName: run.caseName, comparison: run.comparison }),
  ) as SummaryJson;
}

/**
 * The row of one point: the one way from a point's run to sweep.csv and sweep.json, shared by `tenuis sweep` and
 * the browser's sweep, so both tables hold the same numbers for the same case, seed and replicas.
 */
export function sweepRowOf(point: number, value: number, run: SweepPointRun): SweepRow {
  if (run.kind === 'failed') return { point, value, status: 'failed', summary: null };
  if (run.kind === 'nothingSampled') return { point, value, status: 'interrupted', summary: null };
  return { point, value, status: run.interrupted ? 'interrupted' : 'complete', summary: sweepPointSummary(run) };
}

export interface SweepTableOptions {
  readonly parameter: SweepParameter;
  /** Planar cases give flow numbers per metre of depth (flowQuantityUnits). */
  readonly planar: boolean;
  /** Cases with flow sections get the flow columns, the others every wall's shear stress and heat flux. */
  readonly hasFlow: boolean;
}

const REFERENCE_COLUMNS = [
  ['knudsen', '1'],
  ['rarefaction', '1'],
  ['pressure', 'Pa'],
] as const;
const WALL_COLUMNS = ['shearStress', 'heatFlux'] as const;

const estimateOf = (x: unknown): { mean: JsonNumber; ci95: JsonNumber } | undefined =>
  x !== null && typeof x === 'object' && 'mean' in x && 'ci95' in x
    ? (x as { mean: JsonNumber; ci95: JsonNumber })
    : undefined;
const num = (x: JsonNumber | undefined): number => (typeof x === 'number' ? x : NaN);
/** summary.continuum: model → quantity key → predicted value (absent for cases no continuum model fits). */
const continuumOf = (s: SummaryJson | null): Record<string, Record<string, unknown>> =>
  (s as { continuum?: Record<string, Record<string, unknown>> } | null)?.continuum ?? {};

/**
 * sweep.csv: one row per point — point, swept value, status, the point's reference Knudsen number, rarefaction δ and
 * pressure, then each flow quantity (or each wall's shear stress and heat flux) with its 95 % half-width, then the
 * same quantities as each continuum model predicts them (no-slip, first- and second-order slip, free-molecular,
 * unified …), all taken from the point's summary.json. Units in every header; a number that is not available is an
 * empty field.
 */
export function sweepCsv(rows: readonly SweepRow[], o: SweepTableOptions): string {
  const header: string[] = ['point [1]', `${o.parameter} [${SWEEP_PARAMETER_UNITS[o.parameter].unit}]`, 'status'];
  for (const [name, unit] of REFERENCE_COLUMNS) header.push(`reference ${name} [${unit}]`);
  const pairs: { label: string; unit: string; key: string; pick: (s: SummaryJson) => unknown }[] = [];
  if (o.hasFlow) {
    const units = flowQuantityUnits(o.planar);
    for (const q of FLOW_QUANTITIES)
      pairs.push({ label: q, unit: units[q], key: `flow.${q}`, pick: (s) => s.flow?.[q] });
  } else {
    const walls: string[] = [];
    for (const r of rows) for (const w of Object.keys(r.summary?.walls ?? {})) if (!walls.includes(w)) walls.push(w);
    for (const w of walls)
      for (const q of WALL_COLUMNS)
        pairs.push({
          label: `${w} ${q}`,
          unit: WALL_QUANTITY_UNITS[q],
          key: `walls.${w}.${q}`,
          pick: (s) => s.walls[w]?.[q],
        });
  }
  // Continuum and free-molecular predictions next to the DSMC numbers (summary.continuum), for every model any point has.
  const models: string[] = [];
  for (const r of rows) for (const m of Object.keys(continuumOf(r.summary))) if (!models.includes(m)) models.push(m);
  const predicted = pairs.filter((p) =>
    rows.some((r) => models.some((m) => typeof continuumOf(r.summary)[m]?.[p.key] === 'number')),
  );
  for (const p of pairs) header.push(`${p.label} [${p.unit}]`, `${p.label} ci95 [${p.unit}]`);
  for (const p of predicted) for (const m of models) header.push(`${p.label} ${m} [${p.unit}]`);
  const body = rows.map((r) => {
    const s = r.summary;
    const cells: (number | string)[] = [r.point, r.value, r.status];
    for (const [name] of REFERENCE_COLUMNS) cells.push(num(s?.reference[name] ?? null));
    for (const p of pairs) {
      const e = s ? estimateOf(p.pick(s)) : undefined;
      cells.push(num(e?.mean), num(e?.ci95));
    }
    for (const p of predicted)
      for (const m of models) {
        const v = continuumOf(s)[m]?.[p.key];
        cells.push(typeof v === 'number' ? v : NaN);
      }
    return cells;
  });
  return csvDocument(header, body);
}

export const SWEEP_FORMAT = 'tenuis-sweep';
export const SWEEP_FORMAT_VERSION = 1;

/** sweep.json: what was asked for, whether it was interrupted, and every point's summary.json in one array. */
export function sweepJson(
  rows: readonly SweepRow[],
  o: {
    caseName: string;
    parameter: SweepParameter;
    from: number;
    to: number;
    points: number;
    spacing: SweepSpacing;
    interrupted: boolean;
  },
) {
  return {
    format: SWEEP_FORMAT,
    formatVersion: SWEEP_FORMAT_VERSION,
    caseName: o.caseName,
    parameter: o.parameter,
    unit: SWEEP_PARAMETER_UNITS[o.parameter].unit,
    from: o.from,
    to: o.to,
    pointsRequested: o.points,
    spacing: o.spacing,
    interrupted: o.interrupted,
    points: rows.map((r) => ({
      point: r.point,
      value: r.value,
      status: r.status,
      folder: r.summary ? sweepPointFolder(r.point) : null,
      summary: r.summary,
    })),
  };
}

// ─── Continuum curves over the swept range ─────────────────────────────────────────────────────────────────────

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
