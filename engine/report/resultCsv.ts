/**
 * The result tables of a run as CSV text (csv.ts's dialect): profiles.csv (row-averaged profiles, with one column per
 * continuum model after each DSMC quantity a model predicts: `velocityX noSlip [m/s]`), fields.csv (every cell) and
 * surfaces.csv (every wall bin).
 */
import type { SimulationResult, FieldTable } from '../results/summarize';
import { WALL_QUANTITIES, WALL_QUANTITY_UNITS } from '../results/wallQuantities';
import type { ContinuumComparisonResult } from './comparison';
import { csvDocument, estimateHeaders, unitHeader } from './csv';

/** `name [unit]` and `name ci95 [unit]` for each field of a table. */
function fieldHeaders(t: FieldTable): string[] {
  return t.names.flatMap((name, f) => estimateHeaders(name, t.units[f]));
}

/** Row `r` of a table as mean, ci95 pairs in column order. */
function fieldValues(t: FieldTable, r: number): number[] {
  const width = t.names.length;
  const out: number[] = [];
  for (let f = 0; f < width; f++) out.push(t.mean[r * width + f], t.ci95[r * width + f]);
  return out;
}

/**
 * profiles.csv: one row per row of cells (the profile across the gap), at result.profileY. With a comparison, each
 * DSMC quantity's mean and ci95 columns are followed by one column per model that predicts its row profile
 * (`velocityX firstOrder [m/s]`).
 */
export function profilesCsv(result: SimulationResult, comparison?: ContinuumComparisonResult): string {
  const t = result.profile;
  const width = t.names.length;
  const models: [string, Float64Array][][] = t.names.map((name) => {
    if (!comparison?.recognised) return [];
    const key = `profile.${name}`;
    return Object.entries(comparison.profiles)
      .filter(([, p]) => p?.[key]?.length === t.rows)
      .map(([model, p]) => [model, p![key]] as [string, Float64Array]);
  });
  // The profile runs across the gap (y) or, in an axisymmetric case, along the radius.
  const header = [result.axisymmetric ? 'r [m]' : 'y [m]'];
  t.names.forEach((name, f) =>
    header.push(
      ...estimateHeaders(name, t.units[f]),
      ...models[f].map(([m]) => unitHeader(`${name} ${m}`, t.units[f])),
    ),
  );
  const rows: (number | string)[][] = [];
  for (let r = 0; r < t.rows; r++) {
    const row: number[] = [result.profileY[r]];
    for (let f = 0; f < width; f++)
      row.push(t.mean[r * width + f], t.ci95[r * width + f], ...models[f].map(([, v]) => v[r]));
    rows.push(row);
  }
  return csvDocument(header, rows);
}

/** fields.csv: one row per cell (cell index ix + cellsX·iy, so x varies fastest), at the cell centre. */
export function fieldsCsv(result: SimulationResult): string {
  const t = result.cells;
  const rows: (number | string)[][] = [];
  for (let c = 0; c < t.rows; c++) rows.push([result.cellX[c], result.cellY[c], ...fieldValues(t, c)]);
  return csvDocument(['x [m]', 'y [m]', ...fieldHeaders(t)], rows);
}

/**
 * surfaces.csv: one row per wall bin. `position [m]` is the bin centre's coordinate along the wall: x for walls
 * normal to y (bottom, top, block bottom and top faces), y (the radius when axisymmetric) for walls normal to x.
 */
export function surfacesCsv(result: SimulationResult): string {
  let header: string[] | undefined;
  const rows: (number | string)[][] = [];
  for (const [wall, bins] of Object.entries(result.wallBins) as [
    string,
    { position: Float64Array; table: FieldTable },
  ][]) {
    header ??= ['wall', 'position [m]', ...fieldHeaders(bins.table)];
    for (let b = 0; b < bins.table.rows; b++) rows.push([wall, bins.position[b], ...fieldValues(bins.table, b)]);
  }
  header ??= ['wall', 'position [m]', ...WALL_QUANTITIES.flatMap((q) => estimateHeaders(q, WALL_QUANTITY_UNITS[q]))];
  return csvDocument(header, rows);
}
