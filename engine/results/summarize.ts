/**
 * Reduces sampled sums (a SampleSet: one replica, or several merged) to estimates with 95 % confidence half-widths:
 * - integral quantities (whole-wall stresses and fluxes): blocking analysis of each replica's per-batch series,
 *   replicas combined with Welch–Satterthwaite degrees of freedom (stats/replicaBlocking.ts);
 * - cell fields, row-averaged profiles and wall bins: batch-level values over the complete batches of every replica
 *   (batch-level ratios for ratio quantities), t interval with batches − 1 degrees of freedom.
 * Means use every sampled step, including those not yet in a complete batch.
 */
import type { Plan, ReferenceState } from '../plan/plan';
import type { Simulation } from '../run/simulation';
import { totalOf, batchView, batchSteps, storedSteps, type BatchSums } from '../stats/doublingBatches';
import { tQuantile975 } from '../stats/studentT';
import { sampleSetOf, type SampleSet } from './sampleSet';
import { flowResultOf, type FlowResult } from './flowQuantities';
import { sectionSeriesKey } from './seriesKeys';
import { replicaIntegralEstimate, type IntegralEstimate } from './integralEstimate';
import { CELL_FIELDS, CELL_FIELD_COUNT, deriveCellFields, type CellFieldConstants } from './cellFields';
import {
  WALL_QUANTITIES,
  WALL_QUANTITY_UNITS,
  wallQuantitiesFromSums,
  sideIndex,
  wallLengthM,
  wallBinAreaM2,
  type WallQuantityName,
} from './wallQuantities';
import {
  RAW_CELL_SUMS,
  SUMS_PER_WALL_BIN,
  SIDE_STRIDE,
  SIDE_BIN_OFFSET,
  SIDE_BIN_COUNT,
  SIDE_FROM,
} from '../kernel/layout';

export type { IntegralEstimate };

export interface Estimate {
  mean: number;
  /** 95 % confidence half-width; NaN when there were too few batches to say. */
  ci95: number;
}

/** Values for `rows` items × names.length quantities, row-major. */
export interface FieldTable {
  readonly names: readonly string[];
  readonly units: readonly string[];
  readonly rows: number;
  readonly mean: Float64Array;
  readonly ci95: Float64Array;
  readonly batches: number;
  readonly batchLengthSteps: number;
}

export interface SimulationResult {
  reference: ReferenceState;
  /** x the axis and y the radius: flow numbers are totals, not per metre of depth. */
  axisymmetric: boolean;
  /** Counts (particles, steps, sampleSteps …) are summed over replicas; seed is NaN if replicas had different seeds. */
  numerics: {
    cellsX: number;
    cellsY: number;
    cells: number;
    particles: number;
    moleculesPerParticle: number;
    timeStep: number;
    steps: number;
    transientSteps: number;
    sampleSteps: number;
    batchSteps: number;
    seed: number;
    /** Independent replicas whose samples the estimates combine (1 for a single run). */
    replicas: number;
    cellSizeOverMeanFreePath: number;
    timeStepOverCollisionTime: number;
    timeStepOverCellTransitTime: number;
    particlesPerCell: number;
    collisionSeparationOverMeanFreePath: number;
    collisionsPerParticlePerStep: number;
  };
  walls: Partial<Record<string, Record<WallQuantityName, IntegralEstimate>>>;
  /** Cell centres (m), cell index = ix + cellsX·iy. */
  cellX: Float64Array;
  cellY: Float64Array;
  cells: FieldTable;
  /** Averages over each row of cells (constant y): the profile across a gap. */
  profileY: Float64Array;
  profile: FieldTable;
  wallBins: Partial<Record<string, { position: Float64Array; table: FieldTable }>>;
  /** Flow numbers of cases with flow sections (results/flowQuantities.ts). */
  flow?: FlowResult;
  warnings: string[];
}

function fieldConstants(set: SampleSet): CellFieldConstants {
  const g = set.geometry;
  return { massKg: g.massKg, moleculesPerParticle: g.moleculesPerParticle, rotationalDof: g.rotationalDof };
}

/**
 * Groups cells (group g = sum of member cells' raw sums) and derives fields per group: the mean from all samples
 * (including the still-open batch), the half-width from the complete batches.
 */
function groupedFields(set: SampleSet, groupOf: Int32Array, groups: number, volumes: Float64Array): FieldTable {
  const st = set.geometry;
  const store = set.cellStore;
  const k = fieldConstants(set);
  const group = (raw: Float64Array): Float64Array => {
    const g = new Float64Array(groups * RAW_CELL_SUMS);
    for (let c = 0; c < st.cells; c++) {
      const o = groupOf[c] * RAW_CELL_SUMS;
      for (let q = 0; q < RAW_CELL_SUMS; q++) g[o + q] += raw[c * RAW_CELL_SUMS + q];
    }
    return g;
  };
  const total = totalOf(store);
  for (let q = 0; q < total.length; q++) total[q] += set.pendingCellSums[q];
  const totalSteps = storedSteps(store) + set.pendingSteps;
  const mean = new Float64Array(groups * CELL_FIELD_COUNT);
  const gt = group(total);
  for (let g = 0; g < groups; g++)
    deriveCellFields(gt, g * RAW_CELL_SUMS, totalSteps, volumes[g], k, mean, g * CELL_FIELD_COUNT);
  const ci95 = batchHalfWidths(store, groups * CELL_FIELD_COUNT, (b, out) => {
    const gb = group(batchView(store, b));
    for (let g = 0; g < groups; g++)
      deriveCellFields(gb, g * RAW_CELL_SUMS, batchSteps(store), volumes[g], k, out, g * CELL_FIELD_COUNT);
  });
  return {
    names: CELL_FIELDS.map((f) => f.name),
    units: CELL_FIELDS.map((f) => f.unit),
    rows: groups,
    mean,
    ci95,
    batches: store.batches,
    batchLengthSteps: batchSteps(store),
  };
}

/** 95 % half-widths over the store's complete batches of values produced by `derive` for each batch. */
function batchHalfWidths(
  store: BatchSums,
  width: number,
  derive: (batch: number, out: Float64Array) => void,
): Float64Array {
  const nb = store.batches;
  const ci = new Float64Array(width).fill(NaN);
  if (nb < 2) return ci;
  const mean = new Float64Array(width);
  const m2 = new Float64Array(width);
  const values = new Float64Array(width);
  const count = new Float64Array(width);
  for (let b = 0; b < nb; b++) {
    derive(b, values);
    for (let q = 0; q < width; q++) {
      const v = values[q];
      if (!Number.isFinite(v)) continue;
      const c = ++count[q];
      const d = v - mean[q];
      mean[q] += d / c;
      m2[q] += d * (v - mean[q]);
    }
  }
  for (let q = 0; q < width; q++) {
    const c = count[q];
    if (c >= 2) ci[q] = tQuantile975(c - 1) * Math.sqrt(m2[q] / (c - 1) / c);
  }
  return ci;
}

function wallBinTable(set: SampleSet, name: string): { position: Float64Array; table: FieldTable } {
  const st = set.geometry;
  const store = set.wallStore;
  const side = sideIndex(st, name);
  const row = side * SIDE_STRIDE;
  const first = st.sideTable[row + SIDE_BIN_OFFSET];
  const bins = st.sideTable[row + SIDE_BIN_COUNT];
  const length = wallLengthM(st, side);
  const binLength = length / bins;
  const binAreas = Float64Array.from({ length: bins }, (_, b) => wallBinAreaM2(st, side, b, bins));
  const dt = st.timeStep;
  const nq = WALL_QUANTITIES.length;
  const scratch = new Float64Array(nq);
  const fill = (sums: Float64Array, steps: number, out: Float64Array) => {
    for (let b = 0; b < bins; b++) {
      wallQuantitiesFromSums(st, side, sums, (first + b) * SUMS_PER_WALL_BIN, binAreas[b], steps * dt, scratch);
      out.set(scratch, b * nq);
    }
  };
  const total = totalOf(store);
  for (let q = 0; q < total.length; q++) total[q] += set.pendingWallSums[q];
  const totalSteps = storedSteps(store) + set.pendingSteps;
  const mean = new Float64Array(bins * nq);
  if (totalSteps > 0) fill(total, totalSteps, mean);
  const ci95 = batchHalfWidths(store, bins * nq, (b, out) => fill(batchView(store, b), batchSteps(store), out));
  const position = Float64Array.from({ length: bins }, (_, b) => st.sideTable[row + SIDE_FROM] + (b + 0.5) * binLength);
  return {
    position,
    table: {
      names: [...WALL_QUANTITIES],
      units: WALL_QUANTITIES.map((q) => WALL_QUANTITY_UNITS[q]),
      rows: bins,
      mean,
      ci95,
      batches: store.batches,
      batchLengthSteps: batchSteps(store),
    },
  };
}

/**
 * Fields averaged over a set of cells (e.g. the whole gap: in steady planar Couette and Fourier flow the shear stress
 * and heat flux are uniform across it, and averaging every particle gives a far less noisy estimate than wall hits).
 */
export function averageSamplesOverCells(set: SampleSet, cellIndices: ArrayLike<number>): FieldTable {
  const st = set.geometry;
  const groupOf = new Int32Array(st.cells).fill(1);
  for (let k = 0; k < cellIndices.length; k++) groupOf[cellIndices[k]] = 0;
  let inside = 0;
  let total = 0;
  for (let c = 0; c < st.cells; c++) total += st.cellVolumes[c];
  for (let k = 0; k < cellIndices.length; k++) inside += st.cellVolumes[cellIndices[k]];
  const table = groupedFields(set, groupOf, 2, Float64Array.of(inside, total - inside));
  const f = CELL_FIELD_COUNT;
  return { ...table, rows: 1, mean: table.mean.slice(0, f), ci95: table.ci95.slice(0, f) };
}

/** averageSamplesOverCells of a live simulation's samples so far. */
export function averageOverCells(sim: Simulation, cellIndices: ArrayLike<number>): FieldTable {
  return averageSamplesOverCells(sampleSetOf(sim), cellIndices);
}

/** The result of a live simulation's samples so far (it can go on running). */
export function summarize(sim: Simulation): SimulationResult {
  return summarizeSamples(sampleSetOf(sim));
}

/** Estimates with 95 % half-widths from a set of samples (one replica or several merged). */
export function summarizeSamples(set: SampleSet): SimulationResult {
  const st = set.geometry;
  const counters = set.counters;
  const plan: Plan = set.plan;
  const warnings = [...plan.warnings];
  const walls: SimulationResult['walls'] = {};
  let longestCorrelationSteps = 0;
  let leftOutReplicas = 0;
  for (const name of set.wallNames) {
    const entry = {} as Record<WallQuantityName, IntegralEstimate>;
    for (const q of WALL_QUANTITIES) {
      const { estimate: e, leftOut } = replicaIntegralEstimate(set.series.get(`${name}.${q}`) ?? [], plan.batchSteps);
      leftOutReplicas = Math.max(leftOutReplicas, leftOut);
      entry[q] = e;
      if (Number.isFinite(e.correlationTimeSteps))
        longestCorrelationSteps = Math.max(longestCorrelationSteps, e.correlationTimeSteps);
      if (q === 'shearStress' || q === 'heatFlux') {
        if (!e.plateauFound && counters.sampledSteps > 0)
          warnings.push(
            `walls.${name}.${q}: no plateau in the blocking analysis; its error bar may be too small — sample longer`,
          );
      }
    }
    walls[name] = entry;
  }
  if (leftOutReplicas > 0) {
    warnings.push(
      `${leftOutReplicas} of ${set.replicas} replicas sampled fewer than 2 base batches and are left out of the wall quantities (their cell samples are kept)`,
    );
  }

  const cellX = new Float64Array(st.cells);
  const cellY = new Float64Array(st.cells);
  const dx = st.lengthX / st.cellsX;
  const dy = st.lengthY / st.cellsY;
  const identity = new Int32Array(st.cells);
  const rowOf = new Int32Array(st.cells);
  for (let c = 0; c < st.cells; c++) {
    cellX[c] = ((c % st.cellsX) + 0.5) * dx;
    cellY[c] = (Math.floor(c / st.cellsX) + 0.5) * dy;
    identity[c] = c;
    rowOf[c] = Math.floor(c / st.cellsX);
  }
  const rowVolumes = new Float64Array(st.cellsY);
  for (let c = 0; c < st.cells; c++) rowVolumes[rowOf[c]] += st.cellVolumes[c];
  const cells = groupedFields(set, identity, st.cells, st.cellVolumes);
  const profile = groupedFields(set, rowOf, st.cellsY, rowVolumes);
  const profileY = Float64Array.from({ length: st.cellsY }, (_, r) => (r + 0.5) * dy);

  const wallBins: SimulationResult['wallBins'] = {};
  for (const name of set.wallNames) wallBins[name] = wallBinTable(set, name);

  const sections: Record<string, IntegralEstimate> = {};
  for (const name of st.sectionNames) {
    const { estimate } = replicaIntegralEstimate(set.series.get(sectionSeriesKey(name)) ?? [], plan.batchSteps);
    sections[name] = estimate;
    if (!estimate.plateauFound && counters.sampledSteps > 0)
      warnings.push(
        `flow.sections.${name}.massFlowRate: no plateau in the blocking analysis; its error bar may be too small — sample longer`,
      );
  }
  const flow = flowResultOf(plan, sections);

  if (cells.batches > 0 && longestCorrelationSteps > 0 && cells.batchLengthSteps < 10 * longestCorrelationSteps) {
    warnings.push(
      `field batches are ${cells.batchLengthSteps} steps long but wall quantities stay correlated for about ${longestCorrelationSteps.toFixed(0)} steps; profile error bars may be too small — sample at least ${Math.ceil((10 * longestCorrelationSteps * 16) / 1000) * 1000} steps`,
    );
  }
  if (cells.batches < 2 && counters.sampledSteps > 0)
    warnings.push('fewer than 2 complete batches: profile error bars are not available — sample longer');

  const lambda = plan.reference.meanFreePathM;
  const separation = counters.collisionCount > 0 ? counters.separationSum / counters.collisionCount : NaN;
  const mcsRatio = separation / lambda;
  if (mcsRatio > 0.2)
    warnings.push(
      `mean collision separation is ${mcsRatio.toFixed(2)} mean free paths; keep it below about 0.2 (more particles per cell or smaller cells)`,
    );

  return {
    reference: plan.reference,
    axisymmetric: st.axisymmetric,
    numerics: {
      cellsX: st.cellsX,
      cellsY: st.cellsY,
      cells: st.cells,
      particles: counters.particles,
      moleculesPerParticle: st.moleculesPerParticle,
      timeStep: st.timeStep,
      steps: counters.steps,
      // Steps before sampling began, summed over replicas (for one run: min(steps, plan.transientSteps)).
      transientSteps: counters.steps - counters.sampledSteps,
      sampleSteps: counters.sampledSteps,
      batchSteps: plan.batchSteps,
      seed: set.seeds.every((s) => s === set.seeds[0]) ? set.seeds[0] : NaN,
      replicas: set.replicas,
      ...plan.ratios,
      collisionSeparationOverMeanFreePath: mcsRatio,
      collisionsPerParticlePerStep:
        counters.particleSteps > 0 ? (2 * counters.collisionCount) / counters.particleSteps : 0,
    },
    walls,
    cellX,
    cellY,
    cells,
    profileY,
    profile,
    wallBins,
    ...(flow ? { flow } : {}),
    warnings,
  };
}
