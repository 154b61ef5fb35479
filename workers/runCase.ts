/**
 * The run pipeline: one case, run as R replicas, watched by its stopping rules, merged into one result. The browser's
 * run and Sweep view (app/engine/runApi.ts) and the command line's `tenuis run` and `tenuis sweep`
 * (cli/runOnCommandLine.ts) all run cases through runCase(); a sweep is a loop over it.
 *
 * Environment-neutral: where replicas run is injected — worker threads or Web Workers through a ReplicaFactory
 * (nodeReplica.ts, browserReplica.ts), or the calling thread for a single replica (the command line's default, which
 * can keep checkpoints and resume from one). So are the live summaries of the merged snapshots: the page has a worker
 * of its own summarise them, the command line summarises the pool's safety snapshots on its thread.
 *
 * The stop rule is evaluated here and nowhere else (judge()): on each live summary, against the precision target,
 * the time budget and (through the replicas' own step count) the step budget. The case arrives validated and
 * planned; it crosses to the replicas as plain data and is not validated again on the way.
 */
import { runReplicaPool, type PoolProgress, type ReplicaFactory, type ReplicaReport } from './replicaPool';
import { advanceInChunks } from './advanceInChunks';
import type { Plan } from '../engine/plan/plan';
import { createSimulation, isSampling, stepsRemaining, type Simulation } from '../engine/run/simulation';
import { encodeCheckpoint } from '../engine/io/checkpoint';
import type { SampleSet } from '../engine/results/sampleSet';
import { sampleSetOf } from '../engine/run/simulationSamples';
import { summarizeSamples, type SimulationResult } from '../engine/results/summarize';
import { estimateAt } from '../engine/results/targetQuantities';
import { evaluateStop, estimateRemaining, relativeHalfWidthOf, type PrecisionTarget } from '../engine/stats/stopping';

/** What to run: the validated case's plan (plan.caseData is the parsed case each replica receives). */
export interface CaseToRun {
  readonly plan: Plan;
  /** A simulation to continue (decoded from a checkpoint where it was read); on the calling thread only. */
  readonly resumed?: Simulation;
}

export interface StoppingRules {
  readonly target?: PrecisionTarget;
  /** false: the target is followed (hooks.onTarget) but does not end the run. Default true. */
  readonly stopAtTarget?: boolean;
  /** Wall-clock budget, seconds of running (pauses excluded). */
  readonly maxSeconds?: number;
  /** Sampling steps per replica (the step budget), overriding the plan's. */
  readonly maxSampleSteps?: number;
  /**
   * Stop "when decided": called on each live summary, returns the reason to stop (e.g. every verdict of the
   * headline quantity is adequate or not adequate) or null to go on.
   */
  readonly decided?: (result: SimulationResult) => string | null;
}

/** A checkpoint of the calling thread's replica every `everySteps` steps and when the run is cancelled. */
export interface CheckpointRule {
  /** Default: about every twentieth of the run. */
  readonly everySteps?: number;
  write(checkpoint: ArrayBuffer): void;
}

export type ReplicaPlace =
  | {
      readonly kind: 'workers';
      readonly createReplica: ReplicaFactory;
      /**
       * false: the final samples stay sample files (ReplicaReport.samplesFile) for the caller to decode elsewhere
       * (the page's summary worker), and outcome.merged is null. Default true.
       */
      readonly decodeOnThisThread?: boolean;
    }
  | { readonly kind: 'thisThread'; readonly checkpoint?: CheckpointRule };

/** Starts summaries of the replicas' merged snapshots, each handed to `deliver`, until stop(). */
export type LiveSummarySource = (deliver: (result: SimulationResult) => void) => { stop(): void };

export interface RunCaseOptions {
  /** 1 for the calling thread. */
  readonly replicas: number;
  readonly place: ReplicaPlace;
  readonly stopping?: StoppingRules;
  /** Interval of the pool's safety snapshots (ms); on the command line also of the stopping checks. */
  readonly snapshotEveryMs?: number;
  readonly chunkMilliseconds?: number;
  /**
   * Where the live summaries come from. Default: the pool's safety snapshots merged and summarised on this thread,
   * and only when a precision target needs them.
   */
  readonly liveSummaries?: LiveSummarySource;
}

/** The precision target's state on the latest live summary. */
export interface TargetState {
  readonly path: string;
  readonly goal: number;
  readonly estimate: { readonly mean: number; readonly ci95: number } | undefined;
  /** 95 % half-width over |mean|; NaN without an estimate, Infinity while it cannot say. */
  readonly current: number;
  readonly reached: boolean;
  /** Seconds of sampling still needed at the present rate (half-width ∝ 1/√samples); 0 once reached, NaN unknown. */
  readonly remainingSeconds: number;
}

export interface RunCaseProgress extends PoolProgress {
  /** Running time so far, pauses excluded. */
  readonly elapsedSeconds: number;
  /** Sampling steps each replica is to run (the plan's, or the step budget). */
  readonly sampleStepsPerReplica: number;
}

export interface RunCaseHooks {
  readonly onProgress?: (p: RunCaseProgress) => void;
  /** Each live summary of the merged snapshots, after the stopping rules have seen it. */
  readonly onLive?: (result: SimulationResult) => void;
  readonly onTarget?: (t: TargetState) => void;
  readonly onReplicaLost?: (stream: number, reason: string) => void;
}

export interface RunCaseOutcome {
  /** All replicas' samples merged; null when nothing was sampled or the samples were left as files. */
  readonly merged: SampleSet | null;
  readonly replicas: readonly ReplicaReport[];
  /** Cancelled by the caller (not by a stopping rule). */
  readonly cancelled: boolean;
  /** Why a stopping rule ended the run before its budget, or null. */
  readonly stoppedBy: string | null;
  readonly wallSeconds: number;
  readonly particleSteps: number;
}

export interface RunCaseHandle {
  readonly done: Promise<RunCaseOutcome>;
  pause(): void;
  resume(): void;
  cancel(): void;
}

/**
 * The warning a lost replica leaves in the result, the same on the page and on the command line; keptSampledSteps
 * is null when nothing of it was kept.
 */
export function lostReplicaWarning(r: ReplicaReport, keptSampledSteps: number | null): string {
  return `replica ${r.stream} was lost (${r.reason}); ${keptSampledSteps !== null ? `its ${keptSampledSteps} sampled steps up to its last snapshot are included` : 'it had sampled nothing that could be kept'}`;
}

const now = () => performance.now();

export function runCase(input: CaseToRun, options: RunCaseOptions, hooks: RunCaseHooks = {}): RunCaseHandle {
  const { plan } = input;
  const stopping = options.stopping;
  const target = stopping?.target;
  const stopAtTarget = stopping?.stopAtTarget !== false;
  const sampleStepsPerReplica = stopping?.maxSampleSteps ?? plan.sampleSteps;
  const t0 = now();
  let pausedAt: number | null = null;
  let pausedMs = 0;
  const running = () => (now() - t0 - pausedMs - (pausedAt === null ? 0 : now() - pausedAt)) / 1000;
  let samplingSince: number | null = null;
  let cancelled = false;
  let stoppedBy: string | null = null;
  let stopAll: () => void = () => undefined;
  let handleCancel: () => void = () => undefined;

  /** The stop rule, on one live summary (null when no summary was needed): the reason to stop, or null. */
  const judge = (result: SimulationResult | null, elapsedSeconds: number): string | null => {
    const estimate = target && result ? estimateAt(result, target.path) : undefined;
    const decision = evaluateStop({
      stepsDone: 0,
      elapsedSeconds,
      maxSeconds: stopping?.maxSeconds,
      target,
      estimate,
    });
    if (target) {
      const current = estimate ? relativeHalfWidthOf(estimate) : NaN;
      const reached = decision.rule === 'target';
      const sampledSteps = result?.numerics.sampleSteps ?? 0;
      const samplingSeconds = samplingSince === null ? 0 : running() - samplingSince;
      const remainingSeconds = reached
        ? 0
        : Number.isFinite(current) && current > 0 && sampledSteps > 0
          ? (estimateRemaining(current, target.relativeHalfWidth, sampledSteps, samplingSeconds).additionalSeconds ??
            NaN)
          : NaN;
      hooks.onTarget?.({
        path: target.path,
        goal: target.relativeHalfWidth,
        estimate,
        current,
        reached,
        remainingSeconds,
      });
    }
    const stops = decision.stop && (decision.rule !== 'target' || stopAtTarget);
    if (stops) return decision.reason;
    return result && stopping?.decided ? stopping.decided(result) : null;
  };
  const stopFor = (reason: string | null) => {
    if (reason === null || stoppedBy !== null || cancelled) return;
    stoppedBy = reason;
    stopAll();
  };
  const progressed = (p: PoolProgress) => {
    if (samplingSince === null && p.replicas.some((r, k) => r?.phase === 'sampling' && !p.lost.includes(k)))
      samplingSince = running();
    hooks.onProgress?.({ ...p, elapsedSeconds: running(), sampleStepsPerReplica });
  };
  const live = options.liveSummaries?.((result) => {
    stopFor(judge(result, running()));
    hooks.onLive?.(result);
  });

  let pause: () => void;
  let resume: () => void;
  let ended: Promise<{ merged: SampleSet | null; replicas: readonly ReplicaReport[] }>;
  if (options.place.kind === 'thisThread') {
    if (options.replicas !== 1 || stopping)
      throw new Error('a run on the calling thread is one replica with the plan’s own step count');
    const run = runHere(input, options.place.checkpoint, progressed, () => cancelled);
    ended = run;
    pause = resume = () => undefined;
  } else {
    const { createReplica, decodeOnThisThread } = options.place;
    const needsSummaries = !options.liveSummaries && stopping !== undefined;
    const pool = runReplicaPool({
      caseInput: plan.caseData,
      plan,
      replicas: options.replicas,
      createReplica,
      sampleSteps: stopping?.maxSampleSteps,
      snapshotEveryMs: options.snapshotEveryMs,
      chunkMilliseconds: options.chunkMilliseconds,
      decodeOnThisThread,
      // Summarised only for a target or a decision: a time budget alone needs no summary of the samples.
      check: needsSummaries
        ? (merged, elapsed) => {
            const result = target || stopping?.decided ? summarizeSamples(merged) : null;
            const reason = judge(result, elapsed);
            if (result) hooks.onLive?.(result);
            return reason;
          }
        : undefined,
      onLost: hooks.onReplicaLost,
      onProgress: progressed,
    });
    stopAll = handleCancel = () => pool.cancel();
    pause = () => pool.pause();
    resume = () => pool.resume();
    ended = pool.done.then((o) => {
      // A stop the pool decided itself (its check) is a stopping rule's, as one decided on a live summary.
      if (o.stoppedBy !== null && stoppedBy === null && !cancelled) stoppedBy = o.stoppedBy;
      return o;
    });
  }

  const done = ended
    .then((o): RunCaseOutcome => ({
      merged: o.merged,
      replicas: o.replicas,
      cancelled,
      stoppedBy: cancelled ? null : stoppedBy,
      wallSeconds: (now() - t0) / 1000,
      particleSteps: o.replicas.reduce((s, r) => s + r.particleSteps, 0),
    }))
    .finally(() => live?.stop());
  return {
    done,
    pause: () => {
      if (pausedAt === null) pausedAt = now();
      pause();
    },
    resume: () => {
      if (pausedAt !== null) pausedMs += now() - pausedAt;
      pausedAt = null;
      resume();
    },
    cancel: () => {
      cancelled = true;
      if (pausedAt !== null) resume();
      handleCancel();
    },
  };
}

/**
 * One replica on the calling thread (stream 0, as the first worker replica): chunks of steps between which the
 * event loop runs (progress, Ctrl-C), and the checkpoints, which need the simulation itself at hand.
 */
async function runHere(
  input: CaseToRun,
  checkpoint: CheckpointRule | undefined,
  onProgress: (p: PoolProgress) => void,
  isCancelled: () => boolean,
): Promise<{ merged: SampleSet | null; replicas: readonly ReplicaReport[] }> {
  const sim = input.resumed ?? createSimulation(input.plan);
  const plan = sim.plan;
  const total = plan.transientSteps + plan.sampleSteps;
  const every = checkpoint?.everySteps ?? Math.max(1, Math.ceil(total / 20));
  let nextCheckpoint = sim.state.step + every;
  const save = () => checkpoint?.write(encodeCheckpoint(sim, 0));
  const t0 = now();
  const report = () =>
    onProgress({
      replicas: [
        {
          stream: 0,
          phase: isSampling(sim) ? 'sampling' : 'transient',
          stepsDone: sim.state.step,
          totalSteps: sim.state.step + stepsRemaining(sim),
          particleSteps: sim.state.particleSteps,
          elapsedSeconds: (now() - t0) / 1000,
        },
      ],
      lost: [],
      particleSteps: sim.state.particleSteps,
    });
  const outcome = await advanceInChunks(sim, {
    onProgress: (d) => {
      report();
      if (checkpoint && d >= nextCheckpoint && d < total) {
        save();
        nextCheckpoint = d + every;
      }
    },
    shouldStop: isCancelled,
    breakEvery: checkpoint ? every : undefined,
  });
  if (!outcome.completed) save();
  const samples = sim.sampledSteps > 0 ? sampleSetOf(sim) : null;
  return {
    merged: samples,
    replicas: [
      {
        stream: 0,
        status: outcome.completed ? 'completed' : 'cancelled',
        stepsDone: outcome.stepsDone,
        particleSteps: sim.state.particleSteps,
        wallSeconds: outcome.wallSeconds,
        samples,
        samplesFile: null,
      },
    ],
  };
}
