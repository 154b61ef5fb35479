/**
 * SimState: the whole mutable state of one replica, as typed arrays and scalars with a fixed shape.
 *
 * Particles are stored structure-of-arrays. `key` is the particle's sub-cell key, laid out so that the sub-cells of
 * one cell are contiguous: key = cell·S + local sub-cell (S = sub-cells per cell). One counting sort by key therefore
 * gives both the cell index used by sampling and the sub-cell index used to pick near collision partners.
 *
 * Side table: one row of SIDE_STRIDE numbers per side (left, right, bottom, top), so the boundary code reads
 * numbers, not objects. Wall sums: per wall bin, SUMS_PER_WALL_BIN running sums of the current batch. Every table's
 * columns are in kernel/layout.ts.
 *
 * The type only: createState.ts builds a state from a plan, particleStore.ts grows and edits its particle arrays, so
 * that every kernel can import the type without importing the code that fills it.
 */
import type { RngState } from '../particles/rng';
import type { SamplingGeometry } from './samplingGeometry';

/** The sampling geometry (cells, lengths, time step, weights, side table) plus the particles and kernel scratch. */
export interface SimState extends SamplingGeometry {
  count: number;
  capacity: number;
  x: Float64Array;
  y: Float64Array;
  vx: Float64Array;
  vy: Float64Array;
  vz: Float64Array;
  erot: Float64Array;
  /** Sub-cell keys, written by move and read by index; the reorder does not carry them, so they are stale after it. */
  key: Int32Array;
  /** Second set of particle arrays, the target of the periodic reorder into cell order. */
  spare: { x: Float64Array; y: Float64Array; vx: Float64Array; vy: Float64Array; vz: Float64Array; erot: Float64Array };
  /** Particle indices sorted by key (filled by the index step; the identity right after a reorder). */
  order: Int32Array;
  /** keyStart[k] .. keyStart[k+1] is key k's range in `order`; length keys + 1. */
  keyStart: Int32Array;
  keyCount: Int32Array;
  /** Particles whose straight move crossed a non-periodic side (or a periodic one in y): handled after the move loop. */
  boundaryList: Int32Array;
  /** Particles to remove at the end of the move (left through a reservoir, or deleted by radial weighting). */
  removeList: Int32Array;
  removeCount: number;
  /** Axisymmetric: particles that changed row in the move, and the row each came from (radial weighting). */
  weightList: Int32Array;
  weightFromRow: Int32Array;
  weightCount: number;
  /** Per row: the fraction of a particle owed to or by the row under radial weighting (kernel/settle.ts). */
  weightCarry: Float64Array;

  /** Axisymmetric domain: x the axis, y the radius; flights in 3D, projected back onto (x, r). */
  readonly axisymmetric: boolean;
  readonly cellSizeX: number;
  readonly cellSizeY: number;
  /** Particle weight of each row (2j + 1 when axisymmetric, else 1). */
  readonly rowWeight: Float64Array;
  /** Per cell: ½ F_N w_c Δt / V_c of the NTC selection (0 for cells without gas). */
  readonly selectionFactor: Float64Array;
  /** Solid blocks, BLOCK_STRIDE numbers each; their faces are side-table rows DOMAIN_SIDES + 4·b + face. */
  readonly blockTable: Float64Array;
  readonly blockCount: number;
  /**
   * Per sub-cell key: 1 when the cell or one of its eight neighbours touches a block. A straight move of at most one
   * cell in each direction that ends in an unflagged cell cannot have met a block (it stays in the 3 × 3 cells around
   * its end), so only flagged ends and longer moves are flown exactly.
   */
  readonly nearSolid: Uint8Array;
  readonly sectionTable: Float64Array;
  readonly sectionCount: number;
  /** Per flow section: weighted particles crossing it towards +x minus those crossing towards −x, pending batch. */
  sectionSums: Float64Array;
  /**
   * Inflow segments (INFLOW_* columns of kernel/layout.ts) and the fractional particles carried between steps. Reservoir rows
   * are fixed; pressure-outlet rows are updated every step from outletMoments (kernel/pressureOutlet.ts).
   */
  readonly inflowTable: Float64Array;
  inflowRemainder: Float64Array;
  /** Per inflow segment: running averages of the weighted moments N, Σv_x, Σv_y, Σv_z, Σ|v|² in its cell. */
  outletMoments: Float64Array;
  readonly hasPressureOutlets: boolean;
  /** Uniform body acceleration along x, m/s². */
  readonly bodyAccelerationX: number;
  /** Uniform body acceleration along z (out of the plane), m/s². */
  readonly bodyAccelerationZ: number;
  /** Particles found inside a solid after a flight (must stay 0; reported so a test can hold it to that). */
  leaks: number;

  readonly subcellsPerSide: number;
  readonly subcellsPerCell: number;
  /**
   * Sub-cell columns and rows per metre, (cells·S)/L: floor(x · subcolumnsPerM) is the global sub-cell column.
   * columnKey[gx] + rowKey[gy] is the key of that sub-cell, so the move loop needs two truncations and two reads
   * of small, always-cached tables instead of four truncations and four clamps. Each table has one extra entry
   * (a copy of the last) for a position that rounds up onto the far side.
   */
  readonly subcolumnsPerM: number;
  readonly subrowsPerM: number;
  readonly columnKey: Int32Array;
  readonly rowKey: Int32Array;
  readonly rotationalCollisionNumber: number;
  readonly viscosityIndex: number;
  readonly scatteringExponent: number;
  /** σ_T·c_r = sigmaCrCoefficient · c_r^(2−2ω). */
  readonly sigmaCrCoefficient: number;
  readonly periodicX: boolean;
  readonly periodicY: boolean;

  sigmaCrMax: Float64Array;
  collisionRemainder: Float64Array;
  rng: RngState;

  step: number;
  sampling: boolean;
  /** Collisions, candidate pairs and summed pair separation (m) since the last reset: for rates and the MCS ratio. */
  collisionCount: number;
  candidateCount: number;
  separationSum: number;
  particleSteps: number;

  /** Per-cell raw sums of the pending batch (RAW_CELL_SUMS per cell), written by sampleCells. */
  cellSums: Float64Array;
  cellSumSteps: number;
  wallSums: Float64Array;
  readonly wallBinTotal: number;
}
