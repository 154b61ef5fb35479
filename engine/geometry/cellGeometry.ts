/**
 * Cell volumes and particle weights of a uniform grid, planar or axisymmetric, with solid blocks cut out.
 *
 * Planar cells have unit depth (volumes in m³ per metre of depth). Axisymmetric cells are rings: the cell of row j
 * between radii r_j and r_{j+1} has volume π (r_{j+1}² − r_j²) Δx. So that cells near the axis keep as many
 * simulated particles as the outer ones, each row has its own particle weight, proportional to its ring volume:
 * w_j = 2j + 1 (radial weighting, Bird 1994 §15.2); a particle that moves to another row is cloned or deleted with
 * the weight ratio as probability (kernel/move.ts). Cells that blocks cover in part keep only their gas volume, so
 * number densities and collision rates stay right where block edges do not fall on cell edges.
 */

/** A block as the kernels see it: the rectangle [x0, x1] × [y0, y1], m. */
export interface BlockRectangle {
  readonly x0: number;
  readonly x1: number;
  readonly y0: number;
  readonly y1: number;
}

export interface CellGeometry {
  /** Gas volume of each cell (m³, per metre of depth when planar), row-major (cell = row · cellsX + column). */
  readonly gasVolumesM3: Float64Array;
  /** Particle weight of each cell relative to moleculesPerParticle (1 in planar domains). */
  readonly weights: Float64Array;
  /** Particle weight of each row (axisymmetric: 2j + 1; planar: 1). */
  readonly rowWeights: Float64Array;
  /** Volume of a whole cell of weight 1 (m³): the one particlesPerCell refers to. */
  readonly referenceVolumeM3: number;
  /** Σ gas volume / whole-cell volume: the number of cells' worth of gas (particles = this × particlesPerCell). */
  readonly gasCellEquivalent: number;
}

/** True when (x, y) lies strictly inside one of the blocks (their faces belong to the gas). */
export function insideBlock(blocks: readonly BlockRectangle[], x: number, y: number): boolean {
  for (const b of blocks) if (x > b.x0 && x < b.x1 && y > b.y0 && y < b.y1) return true;
  return false;
}

/** Volume of the box [x0, x1] × [y0, y1]: planar per metre of depth, axisymmetric as a ring around the x axis. */
export function boxVolumeM3(x0: number, x1: number, y0: number, y1: number, axisymmetric: boolean): number {
  return axisymmetric ? Math.PI * (y1 * y1 - y0 * y0) * (x1 - x0) : (x1 - x0) * (y1 - y0);
}

/**
 * Gas volume of a box with the blocks removed, exact for any overlap of blocks: the box is cut along every block
 * edge inside it, and each piece is gas or solid as a whole.
 */
export function gasVolumeOfBoxM3(
  x0: number,
  x1: number,
  y0: number,
  y1: number,
  blocks: readonly BlockRectangle[],
  axisymmetric: boolean,
): number {
  const touching = blocks.filter((b) => b.x0 < x1 && b.x1 > x0 && b.y0 < y1 && b.y1 > y0);
  if (touching.length === 0) return boxVolumeM3(x0, x1, y0, y1, axisymmetric);
  const cuts = (lo: number, hi: number, edges: number[]) =>
    [...new Set([lo, hi, ...edges.filter((e) => e > lo && e < hi)])].sort((a, b) => a - b);
  const xs = cuts(
    x0,
    x1,
    touching.flatMap((b) => [b.x0, b.x1]),
  );
  const ys = cuts(
    y0,
    y1,
    touching.flatMap((b) => [b.y0, b.y1]),
  );
  let volume = 0;
  for (let i = 0; i + 1 < xs.length; i++) {
    for (let j = 0; j + 1 < ys.length; j++) {
      if (!insideBlock(touching, 0.5 * (xs[i] + xs[i + 1]), 0.5 * (ys[j] + ys[j + 1]))) {
        volume += boxVolumeM3(xs[i], xs[i + 1], ys[j], ys[j + 1], axisymmetric);
      }
    }
  }
  return volume;
}

export function cellGeometryOf(
  cellsX: number,
  cellsY: number,
  lengthXM: number,
  lengthYM: number,
  blocks: readonly BlockRectangle[],
  axisymmetric: boolean,
): CellGeometry {
  const dx = lengthXM / cellsX;
  const dy = lengthYM / cellsY;
  const cells = cellsX * cellsY;
  const gasVolumesM3 = new Float64Array(cells);
  const weights = new Float64Array(cells);
  const rowWeights = Float64Array.from({ length: cellsY }, (_, j) => (axisymmetric ? 2 * j + 1 : 1));
  const referenceVolumeM3 = boxVolumeM3(0, dx, 0, dy, axisymmetric);
  let gasCellEquivalent = 0;
  for (let j = 0; j < cellsY; j++) {
    for (let i = 0; i < cellsX; i++) {
      const c = j * cellsX + i;
      // Cell edges from indices, so the last edge is exactly the domain length.
      const x0 = (i * lengthXM) / cellsX;
      const x1 = ((i + 1) * lengthXM) / cellsX;
      const y0 = (j * lengthYM) / cellsY;
      const y1 = ((j + 1) * lengthYM) / cellsY;
      gasVolumesM3[c] = gasVolumeOfBoxM3(x0, x1, y0, y1, blocks, axisymmetric);
      weights[c] = rowWeights[j];
      gasCellEquivalent += gasVolumesM3[c] / boxVolumeM3(x0, x1, y0, y1, axisymmetric);
    }
  }
  return { gasVolumesM3, weights, rowWeights, referenceVolumeM3, gasCellEquivalent };
}
