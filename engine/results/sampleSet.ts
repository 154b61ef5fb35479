/**
 * SampleSet: everything summarizeSamples needs, detached from particles — the plan, the sampling geometry, the batch
 * sums of cells and wall bins, the integral-quantity series of each replica, the sums not yet closed into a batch and
 * the run's counters. One replica's set comes from a live simulation (sampleSetOf, run/simulationSamples.ts); sets of replicas of one case
 * merge into one (mergeSamples.ts); a set is saved and read back as a sample file (io/sampleFile.ts).
 */
import type { Plan } from '../plan/plan';
import type { BatchList } from '../stats/batchList';
import type { SamplingGeometry } from '../kernel/samplingGeometry';

/** Counts over a run, summed over replicas when sets merge. */
export interface SampleCounters {
  /** Time steps done, transient included. */
  readonly steps: number;
  /** Time steps sampled (after the transient). */
  readonly sampledSteps: number;
  /** Simulated particles at the end. */
  readonly particles: number;
  /** Particle moves done (particles × steps, summed over steps). */
  readonly particleSteps: number;
  readonly collisionCount: number;
  /** Summed separation of collision pairs, m. */
  readonly separationSum: number;
}

export interface SampleSet {
  /** The plan of the case (of the first replica when merged: replicas differ only in seed or stream). */
  readonly plan: Plan;
  readonly geometry: SamplingGeometry;
  /** Surfaces that are walls (sides, then block faces), in side-table order. */
  readonly wallNames: readonly string[];
  /** Complete batches of the raw cell sums (RAW_CELL_SUMS per cell) and wall-bin sums (SUMS_PER_WALL_BIN per bin). */
  readonly cellStore: BatchList;
  readonly wallStore: BatchList;
  /** Integral quantities (keys from results/seriesKeys.ts): one series (a value per base batch) per replica. */
  readonly series: ReadonlyMap<string, readonly Float64Array[]>;
  /** Sums of steps sampled but not yet closed into a base batch, and how many steps they hold. */
  readonly pendingCellSums: Float64Array;
  readonly pendingWallSums: Float64Array;
  readonly pendingSteps: number;
  readonly counters: SampleCounters;
  readonly replicas: number;
  /** The case seed of each replica (replicas of one seed differ in their random stream instead). */
  readonly seeds: readonly number[];
}
