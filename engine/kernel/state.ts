/**
 * SimState: the whole mutable state of one replica, as typed arrays and scalars with a fixed shape.
 *
 * Particles are stored structure-of-arrays. `key` is the particle's sub-cell key, laid out so that the sub-cells of
 * one cell are contiguous: key = cell·S + local sub-cell (S = sub-cells per cell). One counting sort by key therefore
 * gives both the cell index used by sampling and the sub-cell index used to pick near collision partners.
 *
 * Side table: one row of SIDE_STRIDE numbers per side (left, right, bottom, top), so the boundary code reads
 * numbers, not objects. Wall sums: per wall bin, SUMS_PER_WALL_BIN running sums of the current batch.
 */
import type { Plan } from '../case/plan';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { createRng, uniform, standardNormal, rotationalEnergyOverKT, type RngState } from '../particles/rng';
import { sigmaCrCoefficient } from '../gas/molecularModel';
import { buildSideTable } from './sideTable';
import type { SamplingGeometry } from '../results/samplingGeometry';

export const SIDE_LEFT = 0;
export const SIDE_RIGHT = 1;
export const SIDE_BOTTOM = 2;
export const SIDE_TOP = 3;

export const BOUNDARY_PERIODIC = 0;
export const BOUNDARY_SPECULAR = 1; // symmetry planes and specular walls
export const BOUNDARY_WALL = 2;

export const WALL_DIFFUSE = 0;
export const WALL_SPECULAR = 1;
export const WALL_MAXWELL = 2;
export const WALL_CERCIGNANI_LAMPIS = 3;

/** Side table columns. */
export const SIDE_TYPE = 0;
export const SIDE_MODEL = 1;
export const SIDE_TEMPERATURE = 2;
export const SIDE_UX = 3;
export const SIDE_UY = 4;
export const SIDE_UZ = 5;
/** Maxwell: accommodation; Cercignani–Lampis: normal energy accommodation α_n. */
export const SIDE_ACCOMMODATION = 6;
/** Cercignani–Lampis tangential energy accommodation α_t = σ_t(2 − σ_t). */
export const SIDE_TANGENTIAL_ENERGY_ACCOMMODATION = 7;
export const SIDE_BIN_OFFSET = 8;
export const SIDE_BIN_COUNT = 9;
/** Thermal speed sqrt(kT_w/m) of the wall (m/s). */
export const SIDE_THERMAL_SPEED = 10;
export const SIDE_STRIDE = 11;

/** Per wall bin: incident count, momentum given to the wall (x, y, z), energy given to the wall in its own frame. */
export const WALL_HITS = 0;
export const WALL_PX = 1;
export const WALL_PY = 2;
export const WALL_PZ = 3;
export const WALL_ENERGY = 4;
export const SUMS_PER_WALL_BIN = 5;

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

export const RAW_CELL_SUMS = 15;

/** Creates the state and fills the domain with the initial equilibrium gas, particlesPerCell per cell on average. */
export function createState(plan: Plan, stream = 0): SimState {
  const g = plan.grid;
  const cells = g.cellsX * g.cellsY;
  const subcellsPerCell = g.subcellsPerCellSide * g.subcellsPerCellSide;
  const capacity = Math.max(16, Math.ceil(plan.initialParticles * 1.25));
  const main = particleArrays(capacity);
  const rng = createRng(plan.seed, stream);

  const { sideTable, wallBinTotal } = buildSideTable(plan);

  const m = plan.gas.model;
  const st: SimState = {
    count: 0,
    capacity,
    ...main,
    spare: spareArrays(capacity),
    order: new Int32Array(capacity),
    keyStart: new Int32Array(cells * subcellsPerCell + 1),
    keyCount: new Int32Array(cells * subcellsPerCell),
    boundaryList: new Int32Array(capacity),
    cellsX: g.cellsX,
    cellsY: g.cellsY,
    cells,
    subcellsPerSide: g.subcellsPerCellSide,
    subcellsPerCell,
    subcolumnsPerM: (g.cellsX * g.subcellsPerCellSide) / g.lengthXM,
    subrowsPerM: (g.cellsY * g.subcellsPerCellSide) / g.lengthYM,
    ...keyTables(g.cellsX, g.cellsY, g.subcellsPerCellSide),
    lengthX: g.lengthXM,
    lengthY: g.lengthYM,
    cellVolume: g.cellVolumeM3,
    timeStep: plan.timeStepS,
    massKg: m.massKg,
    moleculesPerParticle: plan.moleculesPerParticle,
    rotationalDof: m.rotationalDof,
    rotationalCollisionNumber: plan.gas.rotationalCollisionNumber,
    viscosityIndex: m.viscosityIndex,
    scatteringExponent: m.scatteringExponent,
    sigmaCrCoefficient: sigmaCrCoefficient(m),
    sideTable,
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

function fillInitialGas(st: SimState, plan: Plan): void {
  const { rng } = st;
  const t = plan.caseData.initial.temperatureK;
  const [u, v, w] = plan.caseData.initial.velocityMPerS;
  const sd = Math.sqrt((K_B * t) / st.massKg);
  const dx = st.lengthX / st.cellsX;
  const dy = st.lengthY / st.cellsY;
  // sigmaCrMax starts at a few times the equilibrium mean so the first steps select enough pairs (Bird 1994 practice).
  const initialSigmaCr = st.sigmaCrCoefficient * Math.pow(3 * sd, 2 - 2 * st.viscosityIndex);
  st.sigmaCrMax.fill(initialSigmaCr);
  const ppc = plan.particlesPerCell;
  for (let iy = 0; iy < st.cellsY; iy++) {
    for (let ix = 0; ix < st.cellsX; ix++) {
      const n = Math.floor(ppc + uniform(rng));
      for (let k = 0; k < n; k++) {
        const i = addParticle(st);
        st.x[i] = (ix + uniform(rng)) * dx;
        st.y[i] = (iy + uniform(rng)) * dy;
        st.vx[i] = u + sd * standardNormal(rng);
        st.vy[i] = v + sd * standardNormal(rng);
        st.vz[i] = w + sd * standardNormal(rng);
        st.erot[i] = K_B * t * rotationalEnergyOverKT(rng, st.rotationalDof);
      }
    }
  }
}

/** Appends one particle slot (growing the arrays by doubling when full) and returns its index. */
export function addParticle(st: SimState): number {
  if (st.count === st.capacity) growParticles(st, st.capacity * 2);
  return st.count++;
}

export function growParticles(st: SimState, capacity: number): void {
  const grow = <T extends Float64Array | Int32Array>(a: T, make: (n: number) => T): T => {
    const b = make(capacity);
    b.set(a.subarray(0, st.count) as never);
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
  st.boundaryList = new Int32Array(capacity);
  st.capacity = capacity;
}
