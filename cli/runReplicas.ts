/**
 * `tenuis run --replicas N`: N replicas of the case on worker threads (one per core is the useful maximum), merged
 * into one result. Ctrl-C cancels every replica after its current chunk and keeps all samples; a replica whose worker
 * dies is reported, and its samples up to its last safety snapshot are kept.
 */
import type { Case } from '../engine/case/schema';
import type { SampleSet } from '../engine/results/sampleSet';
import { runReplicaPool, type ReplicaReport } from '../workers/replicaPool';
import { summarizeSamples, type SimulationResult } from '../engine/results/summarize';
import { summaryJson } from '../engine/report/summaryJson';
import { evaluateStop, relativeHalfWidthOf, estimateRemaining, type PrecisionTarget } from '../engine/stats/stopping';
import { duration } from './format';
import { estimateAt } from '../engine/results/targetQuantities';
import { nodeReplicaFactory } from '../workers/nodeReplica';
import type { Progress } from './progress';

export interface ReplicaRunOutcome {
  readonly merged: SampleSet | null;
  readonly replicas: readonly ReplicaReport[];
  readonly cancelled: boolean;
  /** The stopping rule that ended the run early, or null. */
  readonly stoppedBy: string | null;
  readonly wallSeconds: number;
  readonly particleSteps: number;
}

export async function runReplicas(
  caseData: Case,
  replicas: number,
  o: { progress?: Progress; isInterrupted: () => boolean; workerUrl?: URL; stopping?: StoppingOptions },
): Promise<ReplicaRunOutcome> {
  const t0 = performance.now();
  const stopping = o.stopping;
  const pool = runReplicaPool({
    caseInput: caseData,
    replicas,
    createReplica: nodeReplicaFactory(o.workerUrl),
    sampleSteps: stopping?.maxSampleSteps,
    snapshotEveryMs: stopping && (stopping.target || stopping.maxSeconds !== undefined) ? 2000 : 5000,
    check: stopping ? (merged, elapsed) => checkStop(merged, elapsed, stopping, o.progress) : undefined,
    onProgress: (p) => {
      const live = p.replicas.filter((r, k) => r && !p.lost.includes(k));
      if (!live.length) return;
      const mean = (f: (r: NonNullable<(typeof live)[number]>) => number) =>
        Math.round(live.reduce((s, r) => s + f(r!), 0) / live.length);
      o.progress?.setTotals(
        mean((r) => r.totalSteps),
        live.some((r) => r!.phase === 'transient') ? Infinity : 0,
      );
      o.progress?.update(mean((r) => r.stepsDone));
    },
  });
  let cancelled = false;
  const watch = setInterval(() => {
    if (!cancelled && o.isInterrupted()) {
      cancelled = true;
      pool.cancel();
    }
  }, 100);
  try {
    const outcome = await pool.done;
    return {
      merged: outcome.merged,
      replicas: outcome.replicas,
      cancelled,
      stoppedBy: outcome.stoppedBy,
      wallSeconds: (performance.now() - t0) / 1000,
      particleSteps: outcome.replicas.reduce((s, r) => s + r.particleSteps, 0),
    };
  } finally {
    clearInterval(watch);
  }
}

export interface StoppingOptions {
  readonly target?: PrecisionTarget;
  readonly maxSeconds?: number;
  /** Sampling steps per replica (the step budget). */
  readonly maxSampleSteps?: number;
}

function checkStop(merged: SampleSet, elapsedSeconds: number, s: StoppingOptions, progress?: Progress): string | null {
  const estimate = s.target ? estimateAt(summarizeSamples(merged), s.target.path) : undefined;
  const decision = evaluateStop({ stepsDone: 0, elapsedSeconds, maxSeconds: s.maxSeconds, target: s.target, estimate });
  if (s.target && estimate && Number.isFinite(estimate.ci95)) {
    const rel = relativeHalfWidthOf(estimate);
    let note = `${s.target.path} ±${(100 * rel).toPrecision(2)} % (target ${(100 * s.target.relativeHalfWidth).toPrecision(2)} %)`;
    if (Number.isFinite(rel) && rel > s.target.relativeHalfWidth && merged.counters.sampledSteps > 0) {
      const left = estimateRemaining(rel, s.target.relativeHalfWidth, merged.counters.sampledSteps, elapsedSeconds);
      if (left.additionalSeconds !== undefined) note += `, ~${duration(left.additionalSeconds)} to go`;
    }
    progress?.setNote(note);
  }
  return decision.stop ? decision.reason : null;
}

/** What replicas.json says of each replica: its status and, when it sampled, its own wall estimates. */
export function replicaReportJson(r: ReplicaReport, caseName: string) {
  const own =
    r.samples && r.samples.counters.sampledSteps > 0
      ? summaryJson(summarizeSamples(r.samples), {
          caseName,
          performance: {
            wallSeconds: r.wallSeconds,
            particleSteps: r.particleSteps,
            particleStepsPerSecond: r.wallSeconds > 0 ? r.particleSteps / r.wallSeconds : NaN,
          },
        })
      : null;
  return {
    stream: r.stream,
    status: r.status,
    ...(r.reason ? { reason: r.reason } : {}),
    stepsDone: r.stepsDone,
    sampledSteps: r.samples?.counters.sampledSteps ?? 0,
    particleSteps: r.particleSteps,
    wallSeconds: r.wallSeconds,
    walls: own?.walls ?? null,
  };
}
