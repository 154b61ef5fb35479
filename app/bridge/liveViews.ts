/**
 * Pieces of a run in the browser that sit around the worker pool (part of the lazily loaded run chunk):
 * a replica factory that reports lost workers at once and lets the test hook fail one, and the live views, which
 * take snapshots of the replicas and have a worker of their own merge and summarise them.
 */
import { transfer, wrap, type Remote } from 'comlink';
import type { ReplicaFactory } from '../../workers/replicaPool';
import type { ReplicaApi } from '../../workers/protocol';
import { browserReplicaFactory } from '../../workers/browserReplica';
import type { SimulationResult } from '../../engine/results/summarize';
import type { LiveSummaryApi } from '../../workers/liveSummary.worker';

/** Replicas whose workers are up, for the live snapshots: stream → its remote API. */
export type LiveReplicas = Map<number, Remote<ReplicaApi>>;

/**
 * Wraps the browser factory: lists running replicas for the live views (a lost one leaves the list at once), and
 * applies the test hook that fails one on purpose. The loss itself reaches the page through the run pipeline.
 */
export function observedFactory(kills: Map<number, () => void>, live: LiveReplicas): ReplicaFactory {
  const base = browserReplicaFactory();
  return (stream) => {
    const handle = base(stream);
    live.set(stream, handle.api);
    const listeners: ((reason: string) => void)[] = [];
    let failed = false;
    const fail = (reason: string) => {
      if (failed) return;
      failed = true;
      live.delete(stream);
      for (const l of listeners) l(reason);
    };
    handle.onFailure(fail);
    kills.set(stream, () => {
      handle.terminate();
      fail('its worker was stopped by the test hook failReplica');
    });
    return {
      api: handle.api,
      onFailure: (l) => void listeners.push(l),
      terminate: () => {
        live.delete(stream);
        handle.terminate();
      },
    };
  };
}

/** Longest wait for one replica's snapshot (ms): a worker that ends meanwhile never answers. */
const SNAPSHOT_TIMEOUT_MS = 3000;

/** A summary worker (decoding, merging and summarising samples off the page's thread) and how to end it. */
export function openSummaryWorker(name: string): { summary: Remote<LiveSummaryApi>; close(): void } {
  const worker = new Worker(new URL('../../workers/liveSummary.worker.ts', import.meta.url), { type: 'module', name });
  return { summary: wrap<LiveSummaryApi>(worker), close: () => worker.terminate() };
}

/** A run's live views, and the summary worker behind them (which then summarises the finished run too). */
export interface LiveViews {
  stop(): void;
  readonly summary: Remote<LiveSummaryApi>;
  close(): void;
}

/**
 * Every `everyMs`, takes a snapshot of each running replica and has a worker of its own merge and summarise them
 * (liveSummary.worker.ts); a replica that has ended keeps contributing its last snapshot. The run pipeline
 * (workers/runCase.ts) judges its stopping rule on each of them.
 */
export function startLiveViews(
  replicas: LiveReplicas,
  everyMs: number,
  onLive: (r: SimulationResult) => void,
): LiveViews {
  const { summary, close } = openSummaryWorker('tenuis-live-summary');
  let kept = 0;
  let stopped = false;
  let busy = false;
  const within = <T>(p: Promise<T>): Promise<T | null> =>
    Promise.race([p, new Promise<null>((resolve) => setTimeout(() => resolve(null), SNAPSHOT_TIMEOUT_MS))]);
  const round = async () => {
    if (busy || stopped) return;
    busy = true;
    try {
      await Promise.all(
        [...replicas].map(async ([stream, api]) => {
          const b = await within(api.snapshot()).catch(() => null);
          if (!b || stopped) return;
          // Passed on, not copied: the summary worker keeps each replica's latest snapshot itself.
          await summary.keep(stream, transfer(b, [b]));
          kept++;
        }),
      );
      if (stopped || !kept) return;
      const result = await summary.summarizeKept();
      if (result && !stopped) onLive(result);
    } catch {
      // A live view is a convenience: a failed round is simply skipped.
    } finally {
      busy = false;
    }
  };
  const timer = setInterval(() => void round(), everyMs);
  return {
    stop: () => {
      stopped = true;
      clearInterval(timer);
    },
    summary,
    close,
  };
}
