/**
 * Profiles along a cut through the cell grid, read from a result's cell table (or its row averages):
 * - 'average': the row averages over all columns (SimulationResult.profile), along y — the profile across a gap;
 * - 'vertical': the cells of one column ix, along y (a cut across y at x = cellX[ix]);
 * - 'horizontal': the cells of one row iy, along x (a cut along x at y = cellY[iy]).
 * Cells with no gas (wholly inside a block: zero gas volume) and cells that never saw a particle carry no
 * information and become gaps (NaN in every quantity), never zeros: the engine reports their number density as 0.
 */
import type { FieldTable } from '../../engine/results/summarize';

export type CutKind = 'average' | 'vertical' | 'horizontal';

export const GAP_SOLID = 1;
export const GAP_EMPTY = 2;

export interface CutSpec {
  readonly kind: CutKind;
  /** Column (vertical) or row (horizontal) index; ignored for the average. */
  readonly index: number;
}

/** What a cut needs of a result (SimulationResult fits, and a hand-built table in tests). */
export interface CutSource {
  readonly numerics: { readonly cellsX: number; readonly cellsY: number };
  readonly cellX: ArrayLike<number>;
  readonly cellY: ArrayLike<number>;
  readonly cells: FieldTable;
  readonly profileY: ArrayLike<number>;
  readonly profile: FieldTable;
}

export interface ProfileCut {
  readonly kind: CutKind;
  /** The coordinate the profile runs along. */
  readonly along: 'x' | 'y';
  /** Positions along the cut, m (cell centres). */
  readonly positionsM: Float64Array;
  /** The fixed coordinate of the cut (x of a vertical, y of a horizontal cut), m; NaN for the average. */
  readonly atM: number;
  readonly names: readonly string[];
  readonly units: readonly string[];
  /** Row-major: positions × names. */
  readonly mean: Float64Array;
  readonly ci95: Float64Array;
  /** Gaps: GAP_SOLID where the point lies inside a block, GAP_EMPTY where it saw no molecule, else 0. */
  readonly gap: Uint8Array;
}

/** Centres of the columns (along x) or rows (along y) of the grid, m. */
export function cellCentres(src: CutSource, axis: 'x' | 'y'): Float64Array {
  const { cellsX, cellsY } = src.numerics;
  return axis === 'x'
    ? Float64Array.from({ length: cellsX }, (_, ix) => src.cellX[ix])
    : Float64Array.from({ length: cellsY }, (_, iy) => src.cellY[iy * cellsX]);
}

/** Cell size along x and y, m, from the centres (a uniform grid; a single cell spans twice its centre). */
export function cellSizeOf(src: Pick<CutSource, 'numerics' | 'cellX' | 'cellY'>): {
  readonly x: number;
  readonly y: number;
} {
  const { cellsX, cellsY } = src.numerics;
  return {
    x: cellsX > 1 ? src.cellX[1] - src.cellX[0] : 2 * src.cellX[0],
    y: cellsY > 1 ? src.cellY[cellsX] - src.cellY[0] : 2 * src.cellY[0],
  };
}

/** Index of the centre nearest to positionM (the cut snaps to cell centres). */
export function nearestCentre(centres: ArrayLike<number>, positionM: number): number {
  let best = 0;
  for (let k = 1; k < centres.length; k++)
    if (Math.abs(centres[k] - positionM) < Math.abs(centres[best] - positionM)) best = k;
  return best;
}

/** True when a row of a table has no information: nothing finite besides the (zero) densities. */
function emptyRow(t: FieldTable, r: number): boolean {
  const w = t.names.length;
  for (let f = 0; f < w; f++) {
    const name = t.names[f];
    if (name === 'numberDensity' || name === 'massDensity') continue;
    if (Number.isFinite(t.mean[r * w + f])) return false;
  }
  return true;
}

/**
 * The cut `spec` of `src`. `solidCells` (1 = no gas) marks block cells when the geometry is known; without it, cells
 * with no samples are still gaps. A row of the average is a gap when every cell of it is solid or empty.
 */
export function extractCut(src: CutSource, spec: CutSpec, solidCells?: ArrayLike<number>): ProfileCut {
  const { cellsX, cellsY } = src.numerics;
  const table = spec.kind === 'average' ? src.profile : src.cells;
  const w = table.names.length;
  const n = spec.kind === 'horizontal' ? cellsX : cellsY;
  const index = Math.max(0, Math.min((spec.kind === 'vertical' ? cellsX : cellsY) - 1, Math.round(spec.index)));
  const rowOf = (k: number): number =>
    spec.kind === 'average' ? k : spec.kind === 'vertical' ? index + cellsX * k : k + cellsX * index;
  const solid = (k: number): boolean => {
    if (!solidCells) return false;
    if (spec.kind !== 'average') return solidCells[rowOf(k)] === 1;
    for (let ix = 0; ix < cellsX; ix++) if (solidCells[ix + cellsX * k] !== 1) return false;
    return true;
  };
  const mean = new Float64Array(n * w);
  const ci95 = new Float64Array(n * w);
  const gap = new Uint8Array(n);
  for (let k = 0; k < n; k++) {
    const r = rowOf(k);
    const isSolid = solid(k);
    if (isSolid || emptyRow(table, r)) {
      gap[k] = isSolid ? GAP_SOLID : GAP_EMPTY;
      mean.fill(NaN, k * w, k * w + w);
      ci95.fill(NaN, k * w, k * w + w);
      continue;
    }
    mean.set(table.mean.subarray(r * w, r * w + w), k * w);
    ci95.set(table.ci95.subarray(r * w, r * w + w), k * w);
  }
  const positionsM =
    spec.kind === 'average' ? Float64Array.from(src.profileY) : cellCentres(src, spec.kind === 'vertical' ? 'y' : 'x');
  const atM = spec.kind === 'average' ? NaN : spec.kind === 'vertical' ? src.cellX[index] : src.cellY[index * cellsX];
  return {
    kind: spec.kind,
    along: spec.kind === 'horizontal' ? 'x' : 'y',
    positionsM,
    atM,
    names: table.names,
    units: table.units,
    mean,
    ci95,
    gap,
  };
}

/** Mean and ci95 of quantity `name` along the cut (NaN at gaps); empty arrays when the cut lacks it. */
export function cutColumn(cut: ProfileCut, name: string): { mean: number[]; ci95: number[] } {
  const f = cut.names.indexOf(name);
  const w = cut.names.length;
  const n = cut.positionsM.length;
  if (f < 0) return { mean: [], ci95: [] };
  return {
    mean: Array.from({ length: n }, (_, k) => cut.mean[k * w + f]),
    ci95: Array.from({ length: n }, (_, k) => cut.ci95[k * w + f]),
  };
}

/** What the default cut needs of the case: its blocks (the walls of a duct or the plates of a slit or orifice). */
export interface CutDefaultsInput {
  readonly columnsM: ArrayLike<number>;
  readonly rowsM: ArrayLike<number>;
  readonly blocks: readonly { readonly x0: number; readonly x1: number }[];
  /** 1 = no gas, cell ix + cellsX·iy (ResultGeometry's solidCells), if known. */
  readonly solidCells?: ArrayLike<number>;
  readonly axisymmetric: boolean;
  /** A flow between vessels through a duct or an opening (the result has flow numbers). */
  readonly ductFlow: boolean;
}

/** The column at mid-length of the duct: the middle of the x range its blocks span (null without blocks). */
function ductMidColumn(d: CutDefaultsInput): number | null {
  if (!d.ductFlow || d.blocks.length === 0) return null;
  const x0 = Math.min(...d.blocks.map((b) => b.x0));
  const x1 = Math.max(...d.blocks.map((b) => b.x1));
  return nearestCentre(d.columnsM, (x0 + x1) / 2);
}

/**
 * Where a cut of `kind` starts. Across a duct (vertical): at mid-length of the duct, where the flow is developed and
 * neither vessel enters; else the middle column. Along x (horizontal): the axis in an axisymmetric case, else the
 * middle of the gas rows of the duct's mid column (a slit's opening, not a plate); else the middle row.
 */
export function defaultCutIndex(kind: CutKind, d: CutDefaultsInput): number {
  if (kind === 'average') return 0;
  const mid = ductMidColumn(d);
  if (kind === 'vertical') return mid ?? Math.floor(d.columnsM.length / 2);
  if (d.axisymmetric) return 0;
  if (mid !== null && d.solidCells) {
    const cellsX = d.columnsM.length;
    const gasRows: number[] = [];
    for (let iy = 0; iy < d.rowsM.length; iy++) if (d.solidCells[mid + cellsX * iy] !== 1) gasRows.push(iy);
    if (gasRows.length) return gasRows[Math.floor((gasRows.length - 1) / 2)];
  }
  return Math.floor(d.rowsM.length / 2);
}

/**
 * The cut shown first: across the middle of the duct for a flow between vessels (the row average would mix the
 * vessels with the duct), the row average otherwise (a gap between plates: uniform along x).
 */
export function defaultCut(d: CutDefaultsInput): CutSpec {
  return ductMidColumn(d) !== null
    ? { kind: 'vertical', index: defaultCutIndex('vertical', d) }
    : { kind: 'average', index: 0 };
}
