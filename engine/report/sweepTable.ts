/**
 * A finished sweep's tables: sweep.csv (one row per point, the DSMC numbers beside each continuum model's) and
 * sweep.json (what was asked for, and every point's summary.json), both built from the points' rows (sweepRow.ts).
 */
import { SWEEP_PARAMETER_UNITS, sweepPointFolder, type SweepParameter, type SweepSpacing } from '../case/sweep';
import { FLOW_QUANTITIES, flowQuantityUnits } from '../results/flowQuantities';
import { WALL_QUANTITY_UNITS } from '../results/wallQuantities';
import { csvDocument } from './csv';
import type { JsonNumber } from './estimateJson';
import type { SummaryJson } from './summaryJson';
import type { SweepRow } from './sweepRow';

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
