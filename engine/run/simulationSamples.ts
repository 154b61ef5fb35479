/**
 * The samples and the summary of a live simulation: a SampleSet copied out of it, and the results reductions
 * (summarizeSamples, averageSamplesOverCells) applied to that copy. Here in run/, the layer that knows Simulation,
 * so that results/ reduces sample sets without depending on the simulation that produced them.
 */
import type { Simulation } from './simulation';
import { batchListOf } from '../stats/batchList';
import { seriesView } from '../stats/series';
import { copyGeometry } from '../kernel/samplingGeometry';
import type { SampleSet } from '../results/sampleSet';
import { summarizeSamples, type SimulationResult } from '../results/summarize';
import { averageSamplesOverCells, type FieldTable } from '../results/fieldTables';

/**
 * One replica's samples, copied out of a live simulation (so it can go on running, and the set stays as it was).
 * Cost: a copy of the batch stores, about (FIELD_BATCH_CAPACITY + 2) × (cells × 15 + wall bins × 5) numbers.
 */
export function sampleSetOf(sim: Simulation): SampleSet {
  const st = sim.state;
  const series = new Map<string, Float64Array[]>();
  for (const [key, s] of sim.series) series.set(key, [seriesView(s).slice()]);
  // A run stopped early carries the reason as one more warning of its plan, so every summary of it says so.
  const plan = sim.stopReason === null ? sim.plan : { ...sim.plan, warnings: [...sim.plan.warnings, sim.stopReason] };
  return {
    plan,
    geometry: copyGeometry(st),
    wallNames: [...sim.wallNames],
    cellStore: batchListOf(sim.cellStore),
    wallStore: batchListOf(sim.wallStore),
    series,
    pendingCellSums: Float64Array.from(st.cellSums),
    pendingWallSums: Float64Array.from(st.wallSums),
    pendingSteps: sim.batchStepsDone,
    counters: {
      steps: st.step,
      sampledSteps: sim.sampledSteps,
      particles: st.count,
      particleSteps: st.particleSteps,
      collisionCount: st.collisionCount,
      separationSum: st.separationSum,
    },
    replicas: 1,
    seeds: [sim.plan.seed],
  };
}

/** The result of a live simulation's samples so far (it can go on running). */
export function summarize(sim: Simulation): SimulationResult {
  return summarizeSamples(sampleSetOf(sim));
}

/** averageSamplesOverCells of a live simulation's samples so far. */
export function averageOverCells(sim: Simulation, cellIndices: ArrayLike<number>): FieldTable {
  return averageSamplesOverCells(sampleSetOf(sim), cellIndices);
}
