/**
 * One quantity of a sweep read out of its rows (each point's summary.json object) and the continuum curves, in the
 * shape the plot and the values table use. Pure; SI throughout (the views convert the swept value for display).
 */
import type { SummaryJson } from '../../engine/report/summaryJson';
import type { SweepContinuumCurves } from '../../engine/report/sweepCurves';
import type { SweepRow } from '../../engine/report/sweepRow';

export interface SweepPointValue {
  readonly point: number;
  /** Swept value, SI. */
  readonly value: number;
  readonly status: SweepRow['status'];
  readonly knudsen: number;
  /** DSMC mean and 95 % half-width of the quantity (NaN when not available). */
  readonly mean: number;
  readonly ci95: number;
  /** Each continuum model's prediction at this point, from its summary.continuum. */
  readonly predictions: Readonly<Record<string, number>>;
}

const finite = (x: unknown): number => (typeof x === 'number' && Number.isFinite(x) ? x : NaN);

/** {mean, ci95} of `flow.NAME` or `walls.WALL.QUANTITY` in a summary. */
export function estimateIn(s: SummaryJson | null, key: string): { mean: number; ci95: number } {
  const parts = key.split('.');
  let e: unknown;
  if (s && parts[0] === 'flow' && parts.length === 2) e = s.flow?.[parts[1]];
  else if (s && parts[0] === 'walls' && parts.length >= 3)
    e = (s.walls[parts.slice(1, -1).join('.')] as Record<string, unknown> | undefined)?.[parts[parts.length - 1]];
  const o = (e ?? {}) as { mean?: unknown; ci95?: unknown };
  return { mean: finite(o.mean), ci95: finite(o.ci95) };
}

export function sweepSeries(rows: readonly SweepRow[], key: string): SweepPointValue[] {
  return rows.map((r) => {
    const predictions: Record<string, number> = {};
    for (const [model, values] of Object.entries(r.summary?.continuum ?? {})) {
      const v = finite(values[key]);
      if (Number.isFinite(v)) predictions[model] = v;
    }
    return {
      point: r.point,
      value: r.value,
      status: r.status,
      knudsen: finite(r.summary?.reference.knudsen),
      ...estimateIn(r.summary, key),
      predictions,
    };
  });
}

/** The models to draw as lines and their values: the fine curves when there are any for `key`, else the points' own predictions. */
export function modelLines(
  points: readonly SweepPointValue[],
  curves: SweepContinuumCurves | { reason: string } | null,
  key: string,
): { model: string; x: number[]; y: number[] }[] {
  if (curves && !('reason' in curves) && curves.curves[key]) {
    const x = [...curves.values];
    return Object.entries(curves.curves[key]).map(([model, y]) => ({ model, x, y: y! }));
  }
  const models = [...new Set(points.flatMap((p) => Object.keys(p.predictions)))];
  return models.map((model) => {
    const at = points.filter((p) => Number.isFinite(p.predictions[model]));
    return { model, x: at.map((p) => p.value), y: at.map((p) => p.predictions[model]) };
  });
}

/** Whether every finite value is above 0 (then the y axis can be logarithmic). */
export function allPositive(values: readonly number[]): boolean {
  const f = values.filter(Number.isFinite);
  return f.length > 0 && f.every((v) => v > 0);
}
