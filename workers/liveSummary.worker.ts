/**
 * Live views off the main thread: merges the replicas' latest snapshots (sample files) and summarises them, so the
 * page's thread only passes buffers along while a run goes on. One such worker per run (engine/runApi.ts).
 *
 * Every file of one run holds the same case: the first one read is validated and planned (decodeSampleSet), and its
 * plan is handed on to every later decode of the run through the pipeline's one decode call site
 * (workers/decodeReplicaFile.ts), so the case need not be validated again on each round. A saved run's file
 * (summarizeFile) comes from storage and is always read in full.
 */
import { expose, transfer } from 'comlink';
import { decodeSampleSet, encodeSampleSet } from '../engine/io/sampleFile';
import { decodeReplicaFile } from './decodeReplicaFile';
import type { Plan } from '../engine/plan/plan';
import type { SampleSet } from '../engine/results/sampleSet';
import { continuumComparisonOf, type ContinuumComparisonResult } from '../engine/report/comparison';
import { mergeSampleSets } from '../engine/results/mergeSamples';
import { summarizeSamples, type SimulationResult } from '../engine/results/summarize';

/** The typed arrays' buffers of a result, to transfer rather than copy it back. */
function buffersOf(r: SimulationResult): ArrayBuffer[] {
  const arrays: Float64Array[] = [
    r.cellX,
    r.cellY,
    r.profileY,
    r.cells.mean,
    r.cells.ci95,
    r.profile.mean,
    r.profile.ci95,
  ];
  for (const bins of Object.values(r.wallBins)) if (bins) arrays.push(bins.position, bins.table.mean, bins.table.ci95);
  return [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
}

/**
 * The latest snapshot of each replica, kept here rather than on the page: snapshots of long runs hold every step's
 * wall series and run to megabytes, and copying them across on each round was the page's longest task.
 */
const kept = new Map<number, ArrayBuffer>();

/** The plan of this run's case, from the first of its files decoded. */
let runPlan: Plan | undefined;
const decodeRunFile = (b: ArrayBuffer): SampleSet => {
  const set = decodeReplicaFile(b, runPlan);
  runPlan ??= set.plan;
  return set;
};

const api = {
  /** Keeps a replica's latest snapshot (transferred here), replacing its previous one. */
  keep(stream: number, snapshot: ArrayBuffer): void {
    kept.set(stream, snapshot);
  },
  /** The summary of the kept snapshots that have sampled anything, or null if none has. */
  summarizeKept(): SimulationResult | null {
    const sets = [...kept.values()].map(decodeRunFile).filter((s) => s.counters.sampledSteps > 0);
    if (!sets.length) return null;
    const result = summarizeSamples(sets.length === 1 ? sets[0] : mergeSampleSets(sets));
    return transfer(result, buffersOf(result));
  },
};

/** A finished run, summarised: the result, its samples as one sample file for saving, the comparison. */
export interface FinishedSummary {
  readonly result: SimulationResult;
  readonly samples: ArrayBuffer;
  readonly comparison: ContinuumComparisonResult;
  /** Sampled steps of each file given, in order (0 for null or empty ones). */
  readonly sampledSteps: readonly number[];
}

const finalApi = {
  /**
   * A finished run's sample files, one per replica (null for a replica that kept nothing): decoded, merged and
   * summarised here, and the merged samples encoded again for saving — all work the page's thread must not do
   * (merging a large grid takes long). Null when no replica sampled anything.
   */
  finishFiles(files: readonly (ArrayBuffer | null)[]): FinishedSummary | null {
    const sets = files.map((b) => (b ? decodeRunFile(b) : null));
    const sampledSteps = sets.map((s) => s?.counters.sampledSteps ?? 0);
    const sampled = sets.filter((s): s is SampleSet => s !== null && s.counters.sampledSteps > 0);
    if (!sampled.length) return null;
    // Merged like the replica pool merges on the command line, so both give the same numbers.
    const merged = mergeSampleSets(sampled);
    const result = summarizeSamples(merged);
    const samples = encodeSampleSet(merged);
    const comparison = continuumComparisonOf(merged.plan, result);
    return transfer({ result, samples, comparison, sampledSteps }, [...buffersOf(result), samples]);
  },
  /** A saved run's sample file: its result and comparison again, as when it finished (warnings added by the caller). */
  summarizeFile(file: ArrayBuffer): { result: SimulationResult; comparison: ContinuumComparisonResult } {
    const set = decodeSampleSet(file);
    const result = summarizeSamples(set);
    const comparison = continuumComparisonOf(set.plan, result);
    return transfer({ result, comparison }, buffersOf(result));
  },
};
Object.assign(api, finalApi);

export type LiveSummaryApi = typeof api & typeof finalApi;
expose(api);
