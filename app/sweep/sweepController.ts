/**
 * Runs the points of a sweep one after the other, each as an ordinary run (the run API's startRun, and so the run
 * pipeline of workers/runCase.ts: a sweep is a loop over it), and turns each end into the point's row with the engine's sweepRowOf. A failed point gets a row marked
 * failed and the next one starts; stop() ends the running point, keeps what it sampled (its row marked
 * interrupted) and runs no more. The run API and the row function are injected: the page passes the lazily loaded
 * run chunk's, the unit tests a fake pool. Single runs (runController.ts) are untouched by it.
 */
import type { RunCallbacks, RunHandle, RunProgressView, RunRequest } from '../bridge/runApi';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SweepPointRun } from '../../engine/report/sweepRow';
import type { Plan } from '../../engine/plan/plan';

export interface SweepRunDeps {
  startRun(request: RunRequest, callbacks: RunCallbacks): RunHandle;
  rowOf(point: number, value: number, run: SweepPointRun): SweepRow;
}

export interface SweepPointInput {
  readonly point: number;
  readonly value: number;
  readonly caseInput: unknown;
  /** The point's plan, when the sweep made it: the run then starts from it (no second validation). */
  readonly plan?: Plan;
  readonly caseName: string;
}

export interface SweepEvents {
  /** Point `index` (from 0) of `count` starts. */
  onPointStart(index: number, count: number): void;
  onPointProgress(p: RunProgressView): void;
  /** A point's row, as soon as the point ended; `failure` says why a failed point failed. */
  onRow(row: SweepRow, failure?: string): void;
  onNotice(text: string): void;
}

export interface SweepOptions {
  readonly replicas: number;
  readonly liveEveryMs: number;
  readonly hooks?: RunRequest['hooks'];
}

export interface SweepHandle {
  /** Resolves when the last point ended or the sweep was stopped; never rejects. */
  readonly done: Promise<{ readonly stopped: boolean; readonly rows: readonly SweepRow[] }>;
  stop(): void;
}

export function runSweepPoints(
  points: readonly SweepPointInput[],
  options: SweepOptions,
  deps: SweepRunDeps,
  events: SweepEvents,
): SweepHandle {
  let stopped = false;
  let current: RunHandle | null = null;
  const rows: SweepRow[] = [];
  const push = (row: SweepRow, failure?: string) => {
    rows.push(row);
    events.onRow(row, failure);
  };

  const runOne = async (p: SweepPointInput): Promise<void> => {
    let handle: RunHandle;
    try {
      handle = deps.startRun(
        {
          caseInput: p.caseInput,
          plan: p.plan,
          replicas: options.replicas,
          liveEveryMs: options.liveEveryMs,
          hooks: options.hooks,
          // The sweep as a whole keeps to one run's time cap: each point sizes itself within its share.
          capShare: 1 / points.length,
        },
        {
          onProgress: (v) => events.onPointProgress(v),
          // The sweep shows each point when it ends; live views of a point are not kept.
          onLive: () => undefined,
          onReplicaLost: (stream, reason) => events.onNotice(`point ${p.point}: replica ${stream} stopped: ${reason}`),
        },
      );
    } catch (e) {
      push(deps.rowOf(p.point, p.value, { kind: 'failed' }), (e as Error).message);
      return;
    }
    current = handle;
    if (stopped) handle.cancel();
    try {
      const end = await handle.done;
      if (end.ok) {
        const { result, comparison, performance, cancelled } = end.run;
        push(
          deps.rowOf(p.point, p.value, {
            kind: 'sampled',
            result,
            comparison,
            performance,
            caseName: p.caseName,
            interrupted: cancelled,
          }),
        );
      } else if (stopped) {
        // Stopped before any replica sampled: an interrupted point with nothing to show, as `tenuis sweep` writes it.
        push(deps.rowOf(p.point, p.value, { kind: 'nothingSampled' }));
      } else {
        push(deps.rowOf(p.point, p.value, { kind: 'failed' }), end.message);
      }
    } catch (e) {
      push(deps.rowOf(p.point, p.value, { kind: 'failed' }), (e as Error).message);
    } finally {
      current = null;
    }
  };

  const done = (async () => {
    for (let k = 0; k < points.length && !stopped; k++) {
      events.onPointStart(k, points.length);
      await runOne(points[k]);
    }
    return { stopped, rows };
  })();

  return {
    done,
    stop: () => {
      stopped = true;
      current?.cancel();
    },
  };
}
