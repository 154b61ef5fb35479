/**
 * The command line's side of the run pipeline (workers/runCase.ts), shared by `tenuis run` and every point of
 * `tenuis sweep`: where the replicas run (this thread for one replica without stopping rules — it can keep
 * checkpoints —, worker threads otherwise), the progress line and its precision note, Ctrl-C, and what
 * replicas.json and the warnings say of each replica. Ctrl-C cancels every replica after its current chunk and keeps
 * all samples; a replica whose worker dies is reported, and its samples up to its last safety snapshot are kept.
 */
import type { Plan } from '../engine/plan/plan';
import type { Simulation } from '../engine/run/simulation';
import { summarizeSamples } from '../engine/results/summarize';
import { summaryJson } from '../engine/report/summaryJson';
import {
  runCase,
  lostReplicaWarning,
  type CheckpointRule,
  type RunCaseOutcome,
  type StoppingRules,
  type TargetState,
} from '../workers/runCase';
import type { ReplicaReport } from '../workers/replicaPool';
import { nodeReplicaFactory } from '../workers/nodeReplica';
import { duration } from './format';
import type { Progress } from './progress';
import type { Interrupt } from './command';

export interface CommandLineRunOptions {
  readonly replicas: number;
  readonly stopping?: StoppingRules;
  /** A simulation to continue (from --resume); one replica on this thread. */
  readonly resumed?: Simulation;
  readonly checkpoint?: CheckpointRule;
  readonly progress?: Progress;
  readonly interrupt: Interrupt;
  readonly workerUrl?: URL;
}

export interface CommandLineRun extends RunCaseOutcome {
  /** The run had one replica on this thread (no replicas.json then). */
  readonly onThisThread: boolean;
  /** What the result's warnings say of lost replicas. */
  readonly lostWarnings: readonly string[];
}

export async function runOnCommandLine(plan: Plan, o: CommandLineRunOptions): Promise<CommandLineRun> {
  const onThisThread = o.replicas === 1 && !o.stopping;
  const progress = o.progress;
  const stopping = o.stopping;
  const handle = runCase(
    { plan, resumed: o.resumed },
    {
      replicas: o.replicas,
      place: onThisThread
        ? { kind: 'thisThread', checkpoint: o.checkpoint }
        : { kind: 'workers', createReplica: nodeReplicaFactory(o.workerUrl) },
      stopping,
      snapshotEveryMs: stopping && (stopping.target || stopping.maxSeconds !== undefined) ? 2000 : 5000,
    },
    {
      onProgress: (p) => {
        const live = p.replicas.filter((r, k) => r && !p.lost.includes(k));
        if (!live.length) return;
        const mean = (f: (r: NonNullable<(typeof live)[number]>) => number) =>
          Math.round(live.reduce((s, r) => s + f(r!), 0) / live.length);
        progress?.setTotals(
          mean((r) => r.totalSteps),
          live.some((r) => r!.phase === 'transient') ? Infinity : 0,
        );
        progress?.update(mean((r) => r.stepsDone));
      },
      onTarget: (t) => {
        const note = targetNote(t);
        if (note) progress?.setNote(note);
      },
    },
  );
  const unwatch = o.interrupt.onInterrupt(() => handle.cancel());
  const outcome = await handle.done.finally(unwatch);
  const meanSteps = Math.round(outcome.replicas.reduce((sum, r) => sum + r.stepsDone, 0) / outcome.replicas.length);
  // One replica here ends its line only when it completed; otherwise a message follows on a line of its own.
  if (!onThisThread || !outcome.cancelled) progress?.finish(meanSteps);
  else progress?.clear();
  const lostWarnings = outcome.replicas
    .filter((r) => r.status === 'lost')
    .map((r) => lostReplicaWarning(r, r.samples ? r.samples.counters.sampledSteps : null));
  return { ...outcome, onThisThread, lostWarnings };
}

/** The progress line's note on the target: the precision reached and, while short of it, the time to go. */
function targetNote(t: TargetState): string | null {
  if (!t.estimate || !Number.isFinite(t.estimate.ci95)) return null;
  let note = `${t.path} ±${(100 * t.current).toPrecision(2)} % (target ${(100 * t.goal).toPrecision(2)} %)`;
  if (!t.reached && Number.isFinite(t.remainingSeconds)) note += `, ~${duration(t.remainingSeconds)} to go`;
  return note;
}

/** Every replica's status, for a run in which none sampled anything. */
export function replicaStatusLines(replicas: readonly ReplicaReport[]): string {
  return replicas.map((r) => `  replica ${r.stream}: ${r.status}${r.reason ? ` (${r.reason})` : ''}`).join('\n');
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
