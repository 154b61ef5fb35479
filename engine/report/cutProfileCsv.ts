/**
 * A profile along one cut through the cell grid as CSV, in the dialect of csv.ts (RFC 4180 fields, LF line ends,
 * numbers as shortest round-trip text, non-finite values as empty fields, formula-like text escaped, SI units in
 * brackets in every header). Columns: the position along the cut, the cut's fixed coordinate (vertical cut: x,
 * horizontal cut: y; absent for the row average), then each quantity's mean and ci95 followed by the continuum
 * predictions given for it (`velocityX no-slip [m/s]`). Points with no gas (inside a block) are empty fields.
 */
import { csvDocument, estimateHeaders, unitHeader } from './csv';

export interface CutProfileTable {
  /** The coordinate the profile runs along. */
  readonly along: 'x' | 'y';
  /** The other coordinate, fixed along the cut (m); NaN for the row average (averaged over x). */
  readonly atM: number;
  readonly positionsM: ArrayLike<number>;
  readonly names: readonly string[];
  readonly units: readonly string[];
  /** Row-major: positions × names. */
  readonly mean: ArrayLike<number>;
  readonly ci95: ArrayLike<number>;
}

/** A model's prediction of one quantity at the cut's positions. */
export interface CutPrediction {
  readonly quantity: string;
  readonly model: string;
  readonly values: ArrayLike<number>;
}

export function cutProfileCsv(cut: CutProfileTable, predictions: readonly CutPrediction[] = []): string {
  const n = cut.positionsM.length;
  const w = cut.names.length;
  const fixed = Number.isFinite(cut.atM);
  const other = cut.along === 'x' ? 'y' : 'x';
  const models = cut.names.map((name) => predictions.filter((p) => p.quantity === name && p.values.length === n));
  const header = [`${cut.along} [m]`, ...(fixed ? [`${other} [m]`] : [])];
  cut.names.forEach((name, f) =>
    header.push(
      ...estimateHeaders(name, cut.units[f]),
      ...models[f].map((p) => unitHeader(`${name} ${p.model}`, cut.units[f])),
    ),
  );
  const rows: number[][] = [];
  for (let k = 0; k < n; k++) {
    const row = [cut.positionsM[k], ...(fixed ? [cut.atM] : [])];
    for (let f = 0; f < w; f++)
      row.push(cut.mean[k * w + f], cut.ci95[k * w + f], ...models[f].map((p) => p.values[k]));
    rows.push(row);
  }
  return csvDocument(header, rows);
}
