/**
 * Replicas where they really run: worker threads executing the built dist-cli/replica.node.mjs (made by the vitest
 * global setup), talking comlink over real MessagePorts.
 */
import { describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { runReplicaPool } from '../../workers/replicaPool';
import { nodeReplicaFactory } from '../../workers/nodeReplica';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { createSimulation, advance } from '../../engine/run/simulation';
import { mergeSampleSets } from '../../engine/results/mergeSamples';
import { summarizeSamples } from '../../engine/results/summarize';
import { parseCase } from '../../engine/case/schema';
import { decodeSampleSet } from '../../engine/io/sampleFile';
import { sampleSetOf } from '../../engine/run/simulationSamples';

const workerUrl = pathToFileURL(join(__dirname, '..', '..', 'dist-cli', 'replica.node.mjs'));
const smallCouette = (sampleSteps: number) => {
  const parsed = parseCase(
    buildPreset('couette', {
      knudsen: '0.5',
      cellsY: '10',
      particlesPerCell: '30',
      transientSteps: '200',
      sampleSteps: String(sampleSteps),
      seed: '9',
    }),
  );
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  return parsed.value;
};

describe('replica pool on worker threads', () => {
  it('two replicas in workers give exactly the merged result of the same two streams run in this thread', async () => {
    const caseData = smallCouette(3000);
    const pool = runReplicaPool({ caseInput: caseData, replicas: 2, createReplica: nodeReplicaFactory(workerUrl) });
    const outcome = await pool.done;
    expect(outcome.replicas.map((r) => r.status)).toEqual(['completed', 'completed']);
    const plan = planOrThrow(caseData);
    const local = [0, 1].map((stream) => {
      const sim = createSimulation(plan, { stream });
      advance(sim, plan.transientSteps + plan.sampleSteps);
      return sampleSetOf(sim);
    });
    const expected = summarizeSamples(mergeSampleSets(local));
    const got = summarizeSamples(outcome.merged!);
    expect(got.numerics.replicas).toBe(2);
    expect(got.walls.bottom!.shearStress).toEqual(expected.walls.bottom!.shearStress);
    expect(Array.from(got.profile.mean)).toEqual(Array.from(expected.profile.mean));
    expect(Array.from(got.profile.ci95)).toEqual(Array.from(expected.profile.ci95));
  });

  it('a worker killed mid-run is reported as lost with its reason; the others finish and its snapshot is kept', async () => {
    const workers: { terminate(): Promise<number> }[] = [];
    let samplingSince: number | undefined;
    const pool = runReplicaPool({
      // Long enough that replica 0 is still running when the test cancels it (the run is cancelled, so length is free).
      caseInput: smallCouette(5_000_000),
      replicas: 2,
      snapshotEveryMs: 200,
      chunkMilliseconds: 20,
      createReplica: nodeReplicaFactory(workerUrl, (w) => workers.push(w)),
      onProgress: (p) => {
        // Kill replica 1 once it has sampled for ten snapshot intervals (so a safety snapshot holds samples even on
        // a loaded machine), then stop the other soon after.
        const r1 = p.replicas[1];
        if (r1 && r1.phase === 'sampling' && samplingSince === undefined) samplingSince = Date.now();
        if (r1 && samplingSince !== undefined && Date.now() - samplingSince > 2000 && workers[1]) {
          void workers[1].terminate();
          workers[1] = undefined as never;
          setTimeout(() => pool.cancel(), 1500);
        }
      },
    });
    const outcome = await pool.done;
    const [r0, r1] = outcome.replicas;
    expect(r0.status).toBe('cancelled');
    expect(r1.status).toBe('lost');
    expect(r1.reason).toMatch(/exited/);
    expect(r1.samples?.counters.sampledSteps ?? 0).toBeGreaterThan(0);
    // Both replicas' samples are in the merged result: nothing sampled was dropped silently.
    expect(outcome.merged!.replicas).toBe(2);
    expect(outcome.merged!.counters.sampledSteps).toBe(
      r0.samples!.counters.sampledSteps + r1.samples!.counters.sampledSteps,
    );
  });
  it("asked not to decode, the pool hands back each replica's sample file untouched and merges nothing", async () => {
    const caseData = smallCouette(1000);
    const pool = runReplicaPool({
      caseInput: caseData,
      replicas: 2,
      createReplica: nodeReplicaFactory(workerUrl),
      decodeOnThisThread: false,
    });
    const outcome = await pool.done;
    expect(outcome.merged).toBeNull();
    expect(outcome.replicas.map((r) => r.samples)).toEqual([null, null]);
    // The files are whole: decoded elsewhere (the browser's summary worker) they give the same as decoding here.
    const sets = outcome.replicas.map((r) => decodeSampleSet(r.samplesFile!));
    expect(sets.map((x) => x.counters.sampledSteps)).toEqual([1000, 1000]);
    const direct = runReplicaPool({ caseInput: caseData, replicas: 2, createReplica: nodeReplicaFactory(workerUrl) });
    const decodedHere = await direct.done;
    expect(summarizeSamples(mergeSampleSets(sets)).walls.top!.shearStress).toEqual(
      summarizeSamples(decodedHere.merged!).walls.top!.shearStress,
    );
  });
});
