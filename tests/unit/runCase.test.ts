/**
 * The run pipeline (workers/runCase.ts) on this thread: replicas made by a factory that runs the replica core here
 * (no worker threads, so the test needs no build), the calling-thread replica, and the stop rule judged on injected
 * live summaries — the way the page feeds it its summary worker's results.
 */
import { describe, expect, it } from 'vitest';
import { runCase } from '../../workers/runCase';
import { createReplicaApi } from '../../workers/replicaCore';
import type { ReplicaFactory } from '../../workers/replicaPool';
import type { ReplicaApi } from '../../workers/protocol';
import type { Remote } from 'comlink';
import { buildPreset } from '../../engine/case/presets';
import { createSimulation, advance } from '../../engine/run/simulation';
import { sampleSetOf } from '../../engine/run/simulationSamples';
import { mergeSampleSets } from '../../engine/results/mergeSamples';
import { summarizeSamples, type SimulationResult } from '../../engine/results/summarize';
import { planOrThrow } from '../support/planOrThrow';
import { headlineDecision } from '../../engine/report/decision';

const couette = (sampleSteps: number) =>
  planOrThrow(
    buildPreset('couette', {
      knudsen: '0.5',
      cellsY: '8',
      particlesPerCell: '20',
      transientSteps: '100',
      sampleSteps: String(sampleSteps),
      seed: '5',
    }),
  );

/** Replicas on this thread behind the same narrow facade a worker exposes. */
const hereFactory: ReplicaFactory = () => {
  const core = createReplicaApi();
  const api = {
    start: (request, onProgress) => core.start(request, onProgress),
    pause: async () => core.pause(),
    resume: async () => core.resume(),
    cancel: async () => core.cancel(),
    snapshot: () => core.snapshot(),
  } as Remote<ReplicaApi>;
  return { api, onFailure: () => undefined, terminate: () => undefined };
};

function localResult(sampleSteps: number, streams: number[]): SimulationResult {
  const plan = couette(sampleSteps);
  const sets = streams.map((stream) => {
    const sim = createSimulation(plan, { stream });
    advance(sim, plan.transientSteps + plan.sampleSteps);
    return sampleSetOf(sim);
  });
  return summarizeSamples(sets.length === 1 ? sets[0] : mergeSampleSets(sets));
}

describe('runCase', () => {
  it('on the calling thread gives the result of the simulation run directly', async () => {
    const outcome = await runCase({ plan: couette(400) }, { replicas: 1, place: { kind: 'thisThread' } }).done;
    expect(outcome.replicas.map((r) => r.status)).toEqual(['completed']);
    expect(outcome.cancelled).toBe(false);
    const got = summarizeSamples(outcome.merged!);
    expect(Array.from(got.profile.mean)).toEqual(Array.from(localResult(400, [0]).profile.mean));
  });

  it('two replicas from a factory merge into the result of their two streams', async () => {
    const progress: number[] = [];
    const outcome = await runCase(
      { plan: couette(400) },
      { replicas: 2, place: { kind: 'workers', createReplica: hereFactory } },
      { onProgress: (p) => progress.push(p.sampleStepsPerReplica) },
    ).done;
    expect(outcome.replicas.map((r) => r.status)).toEqual(['completed', 'completed']);
    expect(progress.length).toBeGreaterThan(0);
    expect(new Set(progress)).toEqual(new Set([400]));
    expect(summarizeSamples(outcome.merged!).walls.top!.shearStress).toEqual(
      localResult(400, [0, 1]).walls.top!.shearStress,
    );
  });

  it('stops every replica once a live summary meets the precision target, and says why', async () => {
    const summary = localResult(2000, [0]);
    const targets: boolean[] = [];
    const handle = runCase(
      { plan: couette(400) },
      {
        replicas: 2,
        // Long enough that only the target can end it.
        place: { kind: 'workers', createReplica: hereFactory },
        stopping: { target: { path: 'walls.top.shearStress', relativeHalfWidth: 1 }, maxSampleSteps: 5_000_000 },
        liveSummaries: (deliver) => {
          const timer = setTimeout(() => deliver(summary), 300);
          return { stop: () => clearTimeout(timer) };
        },
      },
      { onTarget: (t) => targets.push(t.reached) },
    );
    const outcome = await handle.done;
    expect(outcome.stoppedBy).toMatch(/walls\.top\.shearStress reached its target/);
    expect(outcome.cancelled).toBe(false);
    expect(outcome.replicas.map((r) => r.status)).toEqual(['cancelled', 'cancelled']);
    expect(targets).toEqual([true]);
  });

  it('stops when decided: the headline verdict of a live summary ends the run with its sentence', async () => {
    // A short Couette run leaves models undecided (no decision). Couette at Kn 1 with a verdict tolerance of 50 %:
    // no-slip is off by about +200 % and the slip models within a few per cent, so 4000 steps decide every model.
    const plan = planOrThrow(
      buildPreset('couette', {
        knudsen: '1',
        cellsY: '8',
        particlesPerCell: '20',
        transientSteps: '100',
        sampleSteps: '4000',
        seed: '5',
        verdictTolerance: '0.5',
      }),
    );
    const short = localResult(400, [0]);
    expect(headlineDecision(couette(400), short)).toBeNull();
    const long = (() => {
      const sim = createSimulation(plan, { stream: 0 });
      advance(sim, plan.transientSteps + plan.sampleSteps);
      return summarizeSamples(sampleSetOf(sim));
    })();
    const reason = headlineDecision(plan, long);
    expect(reason).toMatch(/^decided: /);
    const handle = runCase(
      { plan },
      {
        replicas: 1,
        place: { kind: 'workers', createReplica: hereFactory },
        stopping: { decided: (r) => headlineDecision(plan, r), maxSampleSteps: 5_000_000 },
        liveSummaries: (deliver) => {
          const timer = setTimeout(() => deliver(long), 300);
          return { stop: () => clearTimeout(timer) };
        },
      },
    );
    const outcome = await handle.done;
    expect(outcome.stoppedBy).toBe(reason);
    expect(outcome.replicas.map((r) => r.status)).toEqual(['cancelled']);
  });

  it('a target that does not stop the run is followed but the run goes to its end; cancel() is the caller’s', async () => {
    const summary = localResult(2000, [0]);
    const reached: boolean[] = [];
    const outcome = await runCase(
      { plan: couette(600) },
      {
        replicas: 1,
        place: { kind: 'workers', createReplica: hereFactory },
        stopping: { target: { path: 'walls.top.shearStress', relativeHalfWidth: 1 }, stopAtTarget: false },
        liveSummaries: (deliver) => {
          deliver(summary);
          return { stop: () => undefined };
        },
      },
      { onTarget: (t) => reached.push(t.reached) },
    ).done;
    expect(reached).toEqual([true]);
    expect(outcome.stoppedBy).toBeNull();
    expect(outcome.replicas[0].status).toBe('completed');

    const cancelled = runCase({ plan: couette(5_000_000) }, { replicas: 1, place: { kind: 'thisThread' } });
    setTimeout(() => cancelled.cancel(), 200);
    const end = await cancelled.done;
    expect(end.cancelled).toBe(true);
    expect(end.stoppedBy).toBeNull();
    expect(end.replicas[0].status).toBe('cancelled');
  });
});
