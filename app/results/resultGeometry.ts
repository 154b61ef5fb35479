/**
 * What the results view needs of a case's geometry and gas to draw and derive: the domain, its blocks, the sides that
 * are walls, which cells hold no gas, and the gas constants for the speed of sound. Made from the case's plan by
 * the run API (app/bridge/runApi.ts resultGeometryOf), so the engine stays out of the main chunk; types only here.
 */

export interface DomainWall {
  /** The wall's name as results report it (its own `name`, or the side). */
  readonly name: string;
  readonly side: 'left' | 'right' | 'bottom' | 'top';
  /** The side's line: x = planeM when normalIsX, else y = planeM; from fromM to toM along it (m). */
  readonly normalIsX: boolean;
  readonly planeM: number;
  readonly fromM: number;
  readonly toM: number;
}

export interface BlockOutline {
  readonly name: string;
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
}

export interface GasConstants {
  /** Mass of one molecule, kg. */
  readonly massKg: number;
  /** Rotational degrees of freedom ζ (0, 2 or 3). */
  readonly rotationalDof: number;
  /** γ = c_p / c_v = (5 + ζ) / (3 + ζ): translation and fully excited rotation, no vibration (as the engine models). */
  readonly heatCapacityRatio: number;
}

export interface ResultGeometry {
  readonly lengthXM: number;
  readonly lengthYM: number;
  /** The planned grid (the result's own when the case is the one that ran). */
  readonly cellsX: number;
  readonly cellsY: number;
  /** x the axis, y the radius. */
  readonly axisymmetric: boolean;
  readonly walls: readonly DomainWall[];
  readonly blocks: readonly BlockOutline[];
  /** 1 for cells with no gas volume (wholly inside blocks), cell index ix + cellsX·iy. */
  readonly solidCells: Uint8Array;
  readonly gas: GasConstants;
}

/** The geometry's no-gas cells, if its grid is the result's (else null: a case edited since would mislabel cells). */
export function solidCellsFor(
  g: ResultGeometry | null,
  grid: { readonly cellsX: number; readonly cellsY: number },
): Uint8Array | null {
  return g && g.cellsX === grid.cellsX && g.cellsY === grid.cellsY ? g.solidCells : null;
}
