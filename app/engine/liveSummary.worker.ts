/**
 * Live views off the main thread: merges the replicas' latest snapshots (sample files) and summarises them, so the
 * page's thread only passes buffers along while a run goes on. One such worker per run (engine/runApi.ts).
 */
import { expose, transfer } from 'comlink';
import { decodeSampleSet, encodeSampleSet } from '../../engine/io/sampleFile';
import type { SampleSet } from '../../engine/results/sampleSet';
import { continuumComparisonOf, type ContinuumComparisonResult } from '../../engine/continuum/comparison';
import { mergeSampleSets } from '../../engine/results/mergeSamples';
import { summarizeSamples, type SimulationResult } from '../../engine/results/summarize';

/** The typed arrays' buffers of a result, to transfer rather than copy it back. */
function buffersOf(r: SimulationResult): ArrayBuffer[] {
  const arrays: Float64Array[] = [r.cellX, r.cellY, r.profileY, r.cells.mean, r.cells.ci95, r.profile.mean, r.profile.ci95];
  for (const bins of Object.values(r.wallBins)) if (bins) arrays.push(bins.position, bins.table.mean, bins.table.ci95);
  return [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
}

const api = {
  /** The summary of the merged snapshots that have sampled anything, or null if none has. */
  summarize(snapshots: ArrayBuffer[]): SimulationResult | null {
    const sets = snapshots.map((b) => decodeSampleSet(b)).filter((s) => s.counters.sampledSteps > 0);
    if (!sets.length) return null;
    const result = summarizeSamples(sets.length === 1 ? sets[0] : mergeSampleSets(sets));
    return transfer(result, buffersOf(result));
  },
};

const finalApi = {
  /**
   * A finished run's merged samples (a structured-cloned SampleSet): its summary, and the same samples as a sample
   * file for saving. Done here so the page's thread neither encodes nor summarises.
   */
  finish(merged: SampleSet): { result: SimulationResult; samples: ArrayBuffer; comparison: ContinuumComparisonResult } {
    const result = summarizeSamples(merged);
    const samples = encodeSampleSet(merged);
    const comparison = continuumComparisonOf(merged.plan, result);
    return transfer({ result, samples, comparison }, [...buffersOf(result), samples]);
  },
};
Object.assign(api, finalApi);

export type LiveSummaryApi = typeof api & typeof finalApi;
expose(api);
