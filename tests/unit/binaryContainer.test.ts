/**
 * The binary container shared by sample files and checkpoints: a checkpoint reader that refuses old and foreign files
 * with a message, and the sample-file reader's `trusted` plan, which skips re-planning but no other check.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { encodeSampleSet, decodeSampleSet } from '../../engine/io/sampleFile';
import { encodeCheckpoint, decodeCheckpoint, CHECKPOINT_VERSION } from '../../engine/io/checkpoint';
import { summarizeSamples } from '../../engine/results/summarize';
import type { SampleSet } from '../../engine/results/sampleSet';
import { couetteReplica, couetteSimulation, differingLeaves } from '../support/sampleSets';

let set: SampleSet;
beforeAll(() => {
  set = couetteReplica(51, 1000);
});

describe('checkpoint framing', () => {
  it('refuses a checkpoint of the older format, and a sample file, with messages starting "checkpoint:"', () => {
    const good = encodeCheckpoint(couetteSimulation(52, 100), 0);
    const old = good.slice(0);
    new DataView(old).setUint32(8, CHECKPOINT_VERSION - 1, true);
    expect(() => decodeCheckpoint(old)).toThrow(/^checkpoint: format version 1 is older than .*start the run again/);
    expect(() => decodeCheckpoint(encodeSampleSet(set))).toThrow(/^checkpoint: this is a sample file/);
  });
});

describe('decodeSampleSet with a trusted plan', () => {
  it('gives the same set as reading the file on its own', () => {
    const buffer = encodeSampleSet(set);
    const back = decodeSampleSet(buffer, { plan: set.plan });
    expect(back.plan).toBe(set.plan);
    expect(differingLeaves(summarizeSamples(back), summarizeSamples(decodeSampleSet(buffer)))).toEqual([]);
    expect(back.series).toEqual(set.series);
  });

  it('refuses a plan of another case, and keeps the other checks', () => {
    const other = couetteReplica(53, 100);
    expect(() => decodeSampleSet(encodeSampleSet(set), { plan: other.plan })).toThrow(
      /^sample file: its case is not the case of the plan given to read it \(they differ at seed\)/,
    );
    const nan = encodeSampleSet(set);
    new DataView(nan).setFloat64(nan.byteLength - 8, NaN, true);
    expect(() => decodeSampleSet(nan, { plan: set.plan })).toThrow(/holds NaN at index/);
    expect(() => decodeSampleSet(nan.slice(0, nan.byteLength - 1), { plan: set.plan })).toThrow(
      /sample file: truncated/,
    );
  });
});
