/**
 * Runs R replicas of one case side by side, one per worker, and merges what they sampled.
 *
 * Independent of the thread API: a ReplicaFactory makes one worker-backed replica (Web Worker in the browser,
 * worker_threads in Node). Faults: if a worker dies or throws, the others carry on; the lost replica is reported
 * with its reason, and whatever it had sampled up to its last periodic snapshot is kept and merged — nothing
 * sampled is dropped silently. Cancelling stops every replica after its current chunk and keeps all samples.
 */
import { proxy, type Remote } from 'comlink';
import type { ReplicaApi, ReplicaProgress } from './protocol';
import { decodeReplicaFile } from './decodeReplicaFile';
import { mergeSampleSets } from '../engine/results/mergeSamples';
import type { SampleSet } from '../engine/results/sampleSet';
import type { Case } from '../engine/case/schema';
import type { Plan } from '../engine/plan/plan';

export interface ReplicaHandle {
  readonly api: Remote<ReplicaApi>;
  /** Registers a listener called once if the worker dies or fails outside a call. */
  onFailure(listener: (reason: string) => void): void;
  terminate(): void;
}

export type ReplicaFactory = (stream: number) => ReplicaHandle;

export interface PoolProgress {
  /** Latest report of each replica (undefined before its first report). */
  readonly replicas: readonly (ReplicaProgress | undefined)[];
  readonly lost: readonly number[];
  readonly particleSteps: number;
}

export type ReplicaStatus = 'completed' | 'cancelled' | 'lost';

export interface ReplicaReport {
  readonly stream: number;
  readonly status: ReplicaStatus;
  /** Why a replica was lost, or why it failed to start. */
  readonly reason?: string;
  readonly stepsDone: number;
  readonly particleSteps: number;
  readonly wallSeconds: number;
  /**
   * Its samples: final ones, or for a lost replica its last snapshot (null if it never took one). Null as well when
   * the pool was asked not to decode (`decodeOnThisThread: false`): then only samplesFile holds them.
   */
  readonly samples: SampleSet | null;
  /** The same samples as the sample file the worker sent (engine/io/sampleFile.ts), or null; samples may view it. */
  readonly samplesFile: ArrayBuffer | null;
}

export interface PoolOutcome {
  readonly replicas: readonly ReplicaReport[];
  /** Why the pool stopped the replicas early (a stopping rule), or null. */
  readonly stoppedBy: string | null;
  /** All replicas' samples merged; null when no replica sampled anything, or when asked not to decode. */
  readonly merged: SampleSet | null;
}

export interface PoolOptions {
  /** The validated case, sent to every replica as plain data (each plans it, none validates it again). */
  readonly caseInput: Case;
  /** Its plan, when the caller holds it: for reading the replicas' sample files back (decodeReplicaFile.ts). */
  readonly plan?: Plan;
  readonly replicas: number;
  readonly createReplica: ReplicaFactory;
  readonly onProgress?: (p: PoolProgress) => void;
  /** Called once for each replica lost (its worker died, failed to start or threw), before the progress that lists it. */
  readonly onLost?: (stream: number, reason: string) => void;
  /** Interval of the snapshots taken from every replica (ms): for fault safety and for `check`. */
  readonly snapshotEveryMs?: number;
  readonly chunkMilliseconds?: number;
  /** Sampling steps per replica, overriding the plan's. */
  readonly sampleSteps?: number;
  /**
   * Called with all replicas' samples merged after each round of snapshots; returning a reason stops every
   * replica (keeping all samples), e.g. when a precision target is met.
   */
  readonly check?: (merged: SampleSet, elapsedSeconds: number) => string | null;
  /**
   * false: the pool neither decodes nor merges the final samples, and leaves them as sample files (samplesFile) for
   * the caller to hand to another worker — decoding and merging a large grid is a long task a page's thread must
   * not run. Default true (the command line).
   */
  readonly decodeOnThisThread?: boolean;
}

export interface ReplicaPoolRun {
  readonly done: Promise<PoolOutcome>;
  pause(): void;
  resume(): void;
  cancel(): void;
}

export function runReplicaPool(options: PoolOptions): ReplicaPoolRun {
  if (!Number.isInteger(options.replicas) || options.replicas < 1)
    throw new Error(`replicas must be a whole number of at least 1, got ${options.replicas}`);
  const handles: ReplicaHandle[] = [];
  const latest: (ReplicaProgress | undefined)[] = new Array(options.replicas).fill(undefined);
  const lost: number[] = [];
  const lastSnapshot: (ArrayBuffer | null)[] = new Array(options.replicas).fill(null);
  const finished: boolean[] = new Array(options.replicas).fill(false);
  const t0 = Date.now();
  const decode = options.decodeOnThisThread !== false;
  const decoded = (file: ArrayBuffer | null): SampleSet | null =>
    decode && file ? decodeReplicaFile(file, options.plan) : null;
  let stoppedBy: string | null = null;
  let checking = false;
  // One round of snapshots from every running replica: kept for fault safety, merged for the stopping check.
  const snapshotRound = async () => {
    if (checking || stoppedBy) return;
    checking = true;
    try {
      await Promise.all(
        handles.map((h, k) =>
          h && !finished[k]
            ? h.api.snapshot().then(
                (b) => void (lastSnapshot[k] = b),
                () => undefined,
              )
            : undefined,
        ),
      );
      if (!options.check) return;
      const sets = lastSnapshot
        .filter((b): b is ArrayBuffer => b !== null)
        .map((b) => decodeReplicaFile(b.slice(0), options.plan));
      const sampled = sets.filter((x) => x.counters.sampledSteps > 0);
      if (!sampled.length) return;
      const reason = options.check(mergeSampleSets(sampled), (Date.now() - t0) / 1000);
      if (reason && !stoppedBy) {
        stoppedBy = reason;
        handles.forEach((h) => h && h.api.cancel().catch(() => undefined));
      }
    } finally {
      checking = false;
    }
  };
  const snapshotTimer = setInterval(() => void snapshotRound(), options.snapshotEveryMs ?? 5000);
  let settled = false;
  const emit = () => {
    // Progress messages cross the thread boundary on their own and may arrive after a replica's result: once the
    // pool has settled, they are stale and are not passed on.
    if (settled) return;
    const particleSteps = latest.reduce((s, p) => s + (p?.particleSteps ?? 0), 0);
    options.onProgress?.({ replicas: latest, lost, particleSteps });
  };

  const runOne = async (stream: number): Promise<ReplicaReport> => {
    let handle: ReplicaHandle;
    try {
      handle = options.createReplica(stream);
    } catch (e) {
      lost.push(stream);
      options.onLost?.(stream, `could not start a worker: ${(e as Error).message}`);
      return {
        stream,
        status: 'lost',
        reason: `could not start a worker: ${(e as Error).message}`,
        stepsDone: 0,
        particleSteps: 0,
        wallSeconds: 0,
        samples: null,
        samplesFile: null,
      };
    }
    handles[stream] = handle;
    const failure = new Promise<string>((resolve) => handle.onFailure(resolve));
    try {
      const started = handle.api.start(
        {
          caseData: options.caseInput,
          stream,
          chunkMilliseconds: options.chunkMilliseconds,
          sampleSteps: options.sampleSteps,
        },
        proxy((p: ReplicaProgress) => {
          latest[stream] = p;
          emit();
        }),
      );
      const result = await Promise.race([
        started.then((o) => ({ ok: true as const, o })),
        failure.then((reason) => ({ ok: false as const, reason })),
      ]);
      if (result.ok) {
        const o = result.o;
        return {
          stream,
          status: o.end,
          stepsDone: o.stepsDone,
          particleSteps: o.particleSteps,
          wallSeconds: o.wallSeconds,
          samples: decoded(o.samples),
          samplesFile: o.samples,
        };
      }
      return lostReport(stream, result.reason);
    } catch (e) {
      return lostReport(stream, (e as Error).message ?? String(e));
    } finally {
      finished[stream] = true;
      handle.terminate();
    }
  };

  const lostReport = (stream: number, reason: string): ReplicaReport => {
    lost.push(stream);
    options.onLost?.(stream, reason);
    emit();
    const p = latest[stream];
    const snap = lastSnapshot[stream];
    return {
      stream,
      status: 'lost',
      reason,
      stepsDone: p?.stepsDone ?? 0,
      particleSteps: p?.particleSteps ?? 0,
      wallSeconds: p?.elapsedSeconds ?? 0,
      samples: decoded(snap),
      samplesFile: snap,
    };
  };

  const done = Promise.all(Array.from({ length: options.replicas }, (_, k) => runOne(k))).then((replicas) => {
    clearInterval(snapshotTimer);
    settled = true;
    const sets = replicas
      .map((r) => r.samples)
      .filter((s): s is SampleSet => s !== null && s.counters.sampledSteps > 0);
    return { replicas, merged: sets.length ? mergeSampleSets(sets) : null, stoppedBy };
  });
  const each = (f: (api: Remote<ReplicaApi>) => Promise<void>) =>
    handles.forEach((h) => h && f(h.api).catch(() => undefined));
  return {
    done,
    pause: () => each((a) => a.pause()),
    resume: () => each((a) => a.resume()),
    cancel: () => each((a) => a.cancel()),
  };
}
