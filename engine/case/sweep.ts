/**
 * Parameter sweeps (`tenuis sweep` and the browser's Sweep view): the parameters a sweep can vary, the values it
 * runs at, and how a point changes the case — what needs only the case schema. Planning the points is
 * plan/sweepPoints.ts; a finished sweep's rows, tables and continuum curves are report/sweepRow.ts, sweepTable.ts and
 * sweepCurves.ts.
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
import { SIDE_NAMES } from './caseConstants';
import type { QuantityKind } from '../units/engineeringUnits';

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

/** Folder of point k (from 1) inside the sweep's output folder: points/001, points/002 … */
export function sweepPointFolder(point: number): string {
  return `points/${String(point).padStart(3, '0')}`;
}
