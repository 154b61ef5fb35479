/**
 * Field tables: sampled cell and wall-bin sums reduced to fields per group of cells (each cell, each row, a region)
 * and per wall bin, each value with its 95 % half-width from the complete batches (serial correlation of the batch
 * means pooled over the table's rows: stats/pooledBatchMeans.ts). summarizeSamples builds its
 * cells, profile and wall-bin tables here; averageSamplesOverCells gives one region's fields on their own.
 */
import { totalOf, batchView, batchSteps, storedSteps, type BatchSums } from '../stats/doublingBatches';
import { pooledBatchHalfWidths } from '../stats/pooledBatchMeans';
import type { BatchList } from '../stats/batchList';
import type { SampleSet } from './sampleSet';
import { CELL_FIELDS, CELL_FIELD_COUNT, deriveCellFields, type CellFieldConstants } from './cellFields';
import {
  WALL_QUANTITIES,
  WALL_QUANTITY_UNITS,
  wallQuantitiesFromSums,
  sideIndex,
  wallLengthM,
  wallBinAreaM2,
} from './wallQuantities';
import {
  RAW_CELL_SUMS,
  SUMS_PER_WALL_BIN,
  SIDE_STRIDE,
  SIDE_BIN_OFFSET,
  SIDE_BIN_COUNT,
  SIDE_FROM,
} from '../kernel/layout';

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

function fieldConstants(set: SampleSet): CellFieldConstants {
  const g = set.geometry;
  return { massKg: g.massKg, moleculesPerParticle: g.moleculesPerParticle, rotationalDof: g.rotationalDof };
}

/**
 * Groups cells (group g = sum of member cells' raw sums) and derives fields per group: the mean from all samples
 * (including the still-open batch), the half-width from the complete batches.
 */
export function groupedFields(set: SampleSet, groupOf: Int32Array, groups: number, volumes: Float64Array): FieldTable {
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
  const ci95 = batchHalfWidths(store, groups, CELL_FIELD_COUNT, (b, out) => {
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

/** 95 % half-widths of `rows` × `quantities` values produced by `derive` for each complete batch of the store. */
function batchHalfWidths(
  store: BatchSums,
  rows: number,
  quantities: number,
  derive: (batch: number, out: Float64Array) => void,
): Float64Array {
  const segments = 'segments' in store ? (store as BatchList).segments : [store.batches];
  return pooledBatchHalfWidths(store.batches, rows, quantities, segments, derive).ci95;
}

export function wallBinTable(set: SampleSet, name: string): { position: Float64Array; table: FieldTable } {
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
  const ci95 = batchHalfWidths(store, bins, nq, (b, out) => fill(batchView(store, b), batchSteps(store), out));
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
