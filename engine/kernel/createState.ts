/**
 * createState: a SimState from a plan — the sampling geometry, the kernel's tables (side, block, section, inflow,
 * sub-cell keys, near-solid flags), empty sums and scratch, and the initial gas. Runs once per replica, so clarity
 * wins over speed here.
 */
import type { Plan } from '../plan/plan';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { createRng, uniform, standardNormal, rotationalEnergyOverKT } from '../particles/rng';
import { sigmaCrCoefficient } from '../gas/molecularModel';
import { insideBlock, type BlockRectangle } from '../geometry/cellGeometry';
import type { SimState } from './state';
import { geometryOf, wallBinTotalOf } from './samplingGeometry';
import { inflowTableOf } from './inflowTable';
import { initialOutletMoments } from './pressureOutlet';
import { addParticle, particleArrays, spareArrays } from './particleStore';
import { INFLOW_STRIDE, RAW_CELL_SUMS, SUMS_PER_WALL_BIN } from './layout';

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
    bodyAccelerationZ: plan.bodyAccelerationZMPerS2,
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
