/**
 * The one place where the run pipeline reads back a sample file a replica sent (the replica pool's snapshots and
 * final samples, and the browser's summary worker): one call site, so the plan the pipeline already holds can be
 * handed to the decoder in one edit, instead of the decoder validating and planning the case again for each buffer.
 */
import { decodeSampleSet } from '../engine/io/sampleFile';
import type { Plan } from '../engine/plan/plan';
import type { SampleSet } from '../engine/results/sampleSet';

/**
 * A replica's sample file as a SampleSet. `plan` is the validated plan of the case the replica ran (undefined when
 * the caller has none at hand).
 */
export function decodeReplicaFile(file: ArrayBuffer, plan: Plan | undefined): SampleSet {
  // With the plan at hand the decoder compares the file's case with it instead of validating and planning it again;
  // every check of the bytes themselves (magic, version, sizes, finite values, geometry) still runs.
  return plan ? decodeSampleSet(file, { plan }) : decodeSampleSet(file);
}
