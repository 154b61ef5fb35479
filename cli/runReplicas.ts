/**
 * `tenuis run --replicas N`: N replicas of the case on worker threads (one per core is the useful maximum), merged
 * into one result. Ctrl-C cancels every replica after its current chunk and keeps all samples; a replica whose worker
 * dies is reported, and its samples up to its last safety snapshot are kept.
 */
import type { Case } from '../engine/case/schema';
import type { SampleSet } from '../engine/results/sampleSet';
import { runReplicaPool, type ReplicaReport } from '../workers/replicaPool';
import { nodeReplicaFactory } from '../workers/nodeReplica';
import type { Progress } from './progress';

export interface ReplicaRunOutcome {
  readonly merged: SampleSet | null;
  readonly replicas: readonly ReplicaReport[];
  readonly cancelled: boolean;
  readonly wallSeconds: number;
  readonly particleSteps: number;
}

export async function runReplicas(
  caseData: Case,
  replicas: number,
  o: { progress?: Progress; isInterrupted: () => boolean; workerUrl?: URL },
): Promise<ReplicaRunOutcome> {
  const t0 = performance.now();
  const pool = runReplicaPool({
    caseInput: caseData,
    replicas,
    createReplica: nodeReplicaFactory(o.workerUrl),
    onProgress: (p) => {
      const live = p.replicas.filter((r, k) => r && !p.lost.includes(k));
      if (live.length) o.progress?.update(Math.round(live.reduce((s, r) => s + r!.stepsDone, 0) / live.length));
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
      wallSeconds: (performance.now() - t0) / 1000,
      particleSteps: outcome.replicas.reduce((s, r) => s + r.particleSteps, 0),
    };
  } finally {
    clearInterval(watch);
  }
}

/** What replicas.json says of each replica. */
export function replicaReportJson(r: ReplicaReport) {
  return {
    stream: r.stream,
    status: r.status,
    ...(r.reason ? { reason: r.reason } : {}),
    stepsDone: r.stepsDone,
    sampledSteps: r.samples?.counters.sampledSteps ?? 0,
    particleSteps: r.particleSteps,
    wallSeconds: r.wallSeconds,
  };
}
