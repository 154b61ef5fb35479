/**
 * The replica worker's logic, independent of the thread API around it (Web Worker in the browser, worker_threads in
 * Node): plan the (already validated) case, run it in chunks of about chunkMilliseconds, report progress, honour pause/resume/cancel
 * between chunks, and hand back everything sampled as a transferable sample file.
 */
import { transfer } from 'comlink';
import { plan as planCase } from '../engine/plan/plan';
import {
  createSimulation,
  advance,
  isFinished,
  isSampling,
  nextChunk,
  stepsRemaining,
  type Simulation,
} from '../engine/run/simulation';
import { encodeSampleSet } from '../engine/io/sampleFile';
import type { ReplicaApi, ReplicaOutcome, ReplicaProgress, ReplicaStartRequest } from './protocol';
import { sampleSetOf } from '../engine/run/simulationSamples';

const DEFAULT_CHUNK_MS = 100;
const DEFAULT_PROGRESS_MS = 250;

/** Lets queued messages (pause, cancel, snapshot) run between chunks. */
const yieldToMessages = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

export function createReplicaApi(clock: () => number = Date.now): ReplicaApi {
  let sim: Simulation | null = null;
  let cancelled = false;
  let paused = false;
  let wake: (() => void) | null = null;

  const encode = (s: Simulation): ArrayBuffer => encodeSampleSet(sampleSetOf(s));

  return {
    async start(request: ReplicaStartRequest, onProgress: (p: ReplicaProgress) => void): Promise<ReplicaOutcome> {
      if (sim) throw new Error('this replica worker is already running a case; start a new worker for another');
      // Validated where it was read; planning it again here is deterministic, so every replica has the same plan.
      const planned = planCase(request.caseData);
      if (!planned.ok) throw new Error(`the case was refused:\n${planned.errors.join('\n')}`);
      const planned0 = planned.plan;
      const sampleSteps =
        request.sampleSteps === undefined
          ? planned0.sampleSteps
          : Math.ceil(request.sampleSteps / planned0.batchSteps) * planned0.batchSteps;
      const plan = { ...planned0, sampleSteps };
      const s = createSimulation(plan, { stream: request.stream });
      sim = s;
      const chunkMs = request.chunkMilliseconds ?? DEFAULT_CHUNK_MS;
      const progressMs = request.progressMilliseconds ?? DEFAULT_PROGRESS_MS;
      const t0 = clock();
      let stepsPerChunk = 1;
      let lastReport = -Infinity;
      const report = (now: number) => {
        lastReport = now;
        onProgress({
          stream: request.stream,
          phase: isSampling(s) ? 'sampling' : 'transient',
          stepsDone: s.state.step,
          totalSteps: s.state.step + stepsRemaining(s),
          particleSteps: s.state.particleSteps,
          elapsedSeconds: (now - t0) / 1000,
        });
      };
      while (!isFinished(s) && !cancelled) {
        const steps = nextChunk(s, stepsPerChunk);
        const c0 = clock();
        advance(s, steps);
        const took = clock() - c0;
        // Aim each chunk at chunkMs, growing at most fourfold at a time so a slow start never overshoots far.
        stepsPerChunk = Math.max(1, Math.min(stepsPerChunk * 4, Math.round((steps * chunkMs) / Math.max(took, 1))));
        const now = clock();
        if (now - lastReport >= progressMs) report(now);
        await yieldToMessages();
        while (paused && !cancelled) await new Promise<void>((resolve) => (wake = resolve));
      }
      const end = clock();
      report(end);
      const samples = encode(s);
      const outcome: ReplicaOutcome = {
        stream: request.stream,
        end: cancelled ? 'cancelled' : 'completed',
        stepsDone: s.state.step,
        wallSeconds: (end - t0) / 1000,
        particleSteps: s.state.particleSteps,
        samples,
      };
      return transfer(outcome, [samples]);
    },
    pause() {
      paused = true;
    },
    resume() {
      paused = false;
      wake?.();
      wake = null;
    },
    cancel() {
      cancelled = true;
      wake?.();
      wake = null;
    },
    async snapshot(): Promise<ArrayBuffer> {
      if (!sim) throw new Error('nothing to snapshot: the replica has not started');
      const buffer = encode(sim);
      return transfer(buffer, [buffer]);
    },
  };
}
