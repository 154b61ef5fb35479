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
  // LEAD (issue 11): pass `plan` here once decodeSampleSet takes the already-validated plan (engine/io/sampleFile.ts),
  // e.g. `decodeSampleSet(file, plan)`; until then every decode validates and plans the file's case again.
  void plan;
  return decodeSampleSet(file);
}
