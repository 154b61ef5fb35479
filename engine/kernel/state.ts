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
 */
import type { Plan } from '../plan/plan';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { createRng, uniform, standardNormal, rotationalEnergyOverKT, type RngState } from '../particles/rng';
import { sigmaCrCoefficient } from '../gas/molecularModel';
import { geometryOf, wallBinTotalOf, type SamplingGeometry } from './samplingGeometry';
import { insideBlock, type BlockRectangle } from '../geometry/cellGeometry';
import { inflowTableOf } from './inflowTable';
import { initialOutletMoments } from './pressureOutlet';
import { INFLOW_STRIDE, RAW_CELL_SUMS, SUMS_PER_WALL_BIN } from './layout';

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

/**
 * Key tables (see SimState.columnKey): column gx of nx·s lies in cell column floor(gx/s), sub-column gx mod s;
 * row gy likewise, with the cell row weighted by nx·S and the sub-row by s.
 */
function keyTables(nx: number, ny: number, s: number): { columnKey: Int32Array; rowKey: Int32Array } {
  const subcells = s * s;
  const columnKey = new Int32Array(nx * s + 1);
  const rowKey = new Int32Array(ny * s + 1);
  for (let g = 0; g <= nx * s; g++) {
    const gx = Math.min(g, nx * s - 1);
    columnKey[g] = Math.floor(gx / s) * subcells + (gx % s);
  }
  for (let g = 0; g <= ny * s; g++) {
    const gy = Math.min(g, ny * s - 1);
    rowKey[g] = Math.floor(gy / s) * nx * subcells + (gy % s) * s;
  }
  return { columnKey, rowKey };
}

function spareArrays(capacity: number) {
  return {
    x: new Float64Array(capacity),
    y: new Float64Array(capacity),
    vx: new Float64Array(capacity),
    vy: new Float64Array(capacity),
    vz: new Float64Array(capacity),
    erot: new Float64Array(capacity),
  };
}

function particleArrays(capacity: number) {
  return { ...spareArrays(capacity), key: new Int32Array(capacity) };
}

/** Creates the state and fills the domain with the initial equilibrium gas, particlesPerCell per cell on average. */
export function createState(plan: Plan, stream = 0): SimState {
  const g = plan.grid;
  const cells = g.cellsX * g.cellsY;
  const subcellsPerCell = g.subcellsPerCellSide * g.subcellsPerCellSide;
  const capacity = Math.max(16, Math.ceil(plan.initialParticles * 1.25));
  const main = particleArrays(capacity);
  const rng = createRng(plan.seed, stream);

  // The sampling geometry (grid, weights, side table, names) is the plan's, as kernel/samplingGeometry.ts derives it.
  const geometry = geometryOf(plan);
  const wallBinTotal = wallBinTotalOf(geometry);
  const cg = g.cells;
  const inflowTable = inflowTableOf(plan);
  const sections = plan.caseData.flowSections;

  const m = plan.gas.model;
  const st: SimState = {
    ...geometry,
    count: 0,
    capacity,
    ...main,
    spare: spareArrays(capacity),
    order: new Int32Array(capacity),
    keyStart: new Int32Array(cells * subcellsPerCell + 1),
    keyCount: new Int32Array(cells * subcellsPerCell),
    boundaryList: new Int32Array(capacity),
    removeList: new Int32Array(capacity),
    removeCount: 0,
    weightList: new Int32Array(capacity),
    weightFromRow: new Int32Array(capacity),
    weightCount: 0,
    weightCarry: new Float64Array(g.cellsY),
    cellSizeX: g.cellSizeXM,
    cellSizeY: g.cellSizeYM,
    rowWeight: cg.rowWeights,
    selectionFactor: cg.gasVolumesM3.map((v, c) =>
      v > 0 ? (0.5 * plan.moleculesPerParticle * cg.weights[c] * plan.timeStepS) / v : 0,
    ),
    blockTable: Float64Array.from(g.blocks.flatMap((b) => [b.x0, b.x1, b.y0, b.y1])),
    blockCount: g.blocks.length,
    nearSolid: nearSolidTable(g.cellsX, g.cellsY, g.cellSizeXM, g.cellSizeYM, g.subcellsPerCellSide, g.blocks),
    sectionTable: Float64Array.from(sections.flatMap((x) => [x.xM, x.yMinM ?? 0, x.yMaxM ?? g.lengthYM])),
    sectionCount: sections.length,
    sectionSums: new Float64Array(sections.length),
    inflowTable,
    inflowRemainder: new Float64Array(inflowTable.length / INFLOW_STRIDE),
    outletMoments: initialOutletMoments(plan, inflowTable),
    hasPressureOutlets: plan.surfaces.some((f) => f.spec.type === 'pressureOutlet'),
    bodyAccelerationX: plan.bodyAccelerationXMPerS2,
    leaks: 0,
    subcellsPerSide: g.subcellsPerCellSide,
    subcellsPerCell,
    subcolumnsPerM: (g.cellsX * g.subcellsPerCellSide) / g.lengthXM,
    subrowsPerM: (g.cellsY * g.subcellsPerCellSide) / g.lengthYM,
    ...keyTables(g.cellsX, g.cellsY, g.subcellsPerCellSide),
    rotationalCollisionNumber: plan.gas.rotationalCollisionNumber,
    viscosityIndex: m.viscosityIndex,
    scatteringExponent: m.scatteringExponent,
    sigmaCrCoefficient: sigmaCrCoefficient(m),
    periodicX: plan.boundaries.left.type === 'periodic',
    periodicY: plan.boundaries.bottom.type === 'periodic',
    sigmaCrMax: new Float64Array(cells),
    collisionRemainder: new Float64Array(cells),
    rng,
    step: 0,
    sampling: false,
    collisionCount: 0,
    candidateCount: 0,
    separationSum: 0,
    particleSteps: 0,
    cellSums: new Float64Array(cells * RAW_CELL_SUMS),
    cellSumSteps: 0,
    wallSums: new Float64Array(wallBinTotal * SUMS_PER_WALL_BIN),
    wallBinTotal,
  };
  fillInitialGas(st, plan);
  return st;
}

/**
 * Flags (per sub-cell key) the cells that touch a block or neighbour one that does: see SimState.nearSolid. A cell is
 * flagged when its closed rectangle grown by one cell on every side meets a block's closed rectangle.
 */
function nearSolidTable(
  nx: number,
  ny: number,
  dx: number,
  dy: number,
  s: number,
  blocks: readonly BlockRectangle[],
): Uint8Array {
  const subcells = s * s;
  const flags = new Uint8Array(nx * ny * subcells);
  for (let j = 0; j < ny; j++) {
    for (let i = 0; i < nx; i++) {
      const x0 = (i - 1) * dx;
      const x1 = (i + 2) * dx;
      const y0 = (j - 1) * dy;
      const y1 = (j + 2) * dy;
      if (blocks.some((b) => b.x0 <= x1 && b.x1 >= x0 && b.y0 <= y1 && b.y1 >= y0))
        flags.fill(1, (j * nx + i) * subcells, (j * nx + i + 1) * subcells);
    }
  }
  return flags;
}

/**
 * The initial gas: particlesPerCell × (gas volume / whole-cell volume) particles per cell on average, uniform in the
 * gas part of the cell (uniform in r² within an axisymmetric cell, so uniform in volume), Maxwellian at the initial
 * state.
 */
function fillInitialGas(st: SimState, plan: Plan): void {
  const { rng } = st;
  const t = plan.caseData.initial.temperatureK;
  const [u, v, w] = plan.caseData.initial.velocityMPerS;
  const sd = Math.sqrt((K_B * t) / st.massKg);
  const dx = st.lengthX / st.cellsX;
  const dy = st.lengthY / st.cellsY;
  const blocks = plan.grid.blocks;
  // sigmaCrMax starts at a few times the equilibrium mean so the first steps select enough pairs (Bird 1994 practice).
  const initialSigmaCr = st.sigmaCrCoefficient * Math.pow(3 * sd, 2 - 2 * st.viscosityIndex);
  st.sigmaCrMax.fill(initialSigmaCr);
  const ppc = plan.particlesPerCell;
  const cellVolumes = plan.grid.cells.gasVolumesM3;
  for (let iy = 0; iy < st.cellsY; iy++) {
    const wholeVolume = plan.grid.cellVolumeM3 * st.rowWeight[iy];
    for (let ix = 0; ix < st.cellsX; ix++) {
      const gasShare = cellVolumes[iy * st.cellsX + ix] / wholeVolume;
      if (gasShare <= 0) continue;
      const n = Math.floor(ppc * gasShare + uniform(rng));
      for (let k = 0; k < n; k++) {
        let px: number;
        let py: number;
        do {
          px = (ix + uniform(rng)) * dx;
          py = st.axisymmetric ? dy * Math.sqrt(iy * iy + uniform(rng) * (2 * iy + 1)) : (iy + uniform(rng)) * dy;
        } while (insideBlock(blocks, px, py));
        const i = addParticle(st);
        st.x[i] = px;
        st.y[i] = py;
        st.vx[i] = u + sd * standardNormal(rng);
        st.vy[i] = v + sd * standardNormal(rng);
        st.vz[i] = w + sd * standardNormal(rng);
        st.erot[i] = K_B * t * rotationalEnergyOverKT(rng, st.rotationalDof);
      }
    }
  }
}

/** Copies particle `from` (position, velocity, rotational energy, sub-cell key) into slot `to`. */
export function copyParticle(st: SimState, from: number, to: number): void {
  st.x[to] = st.x[from];
  st.y[to] = st.y[from];
  st.vx[to] = st.vx[from];
  st.vy[to] = st.vy[from];
  st.vz[to] = st.vz[from];
  st.erot[to] = st.erot[from];
  st.key[to] = st.key[from];
}

/** Appends one particle slot (growing the arrays by doubling when full) and returns its index. */
export function addParticle(st: SimState): number {
  if (st.count === st.capacity) growParticles(st, st.capacity * 2);
  return st.count++;
}

export function growParticles(st: SimState, capacity: number): void {
  const grow = <T extends Float64Array | Int32Array>(a: T, make: (n: number) => T): T => {
    const b = make(capacity);
    b.set(a as never);
    return b;
  };
  const f64 = (n: number) => new Float64Array(n);
  const i32 = (n: number) => new Int32Array(n);
  st.x = grow(st.x, f64);
  st.y = grow(st.y, f64);
  st.vx = grow(st.vx, f64);
  st.vy = grow(st.vy, f64);
  st.vz = grow(st.vz, f64);
  st.erot = grow(st.erot, f64);
  st.key = grow(st.key, i32);
  st.spare = spareArrays(capacity);
  st.order = new Int32Array(capacity);
  // The lists may be in use when a clone or an inflow particle needs room: keep their contents.
  st.boundaryList = grow(st.boundaryList, i32);
  st.removeList = grow(st.removeList, i32);
  st.weightList = grow(st.weightList, i32);
  st.weightFromRow = grow(st.weightFromRow, i32);
  st.capacity = capacity;
}
