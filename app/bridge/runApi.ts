/**
 * The run side of the engine on the main thread, loaded by dynamic import into its own chunk: replicas in Web Workers
 * (workers/replicaPool.ts), live and final summaries, sample files for saved runs, and the exports the command line
 * writes (engine/results/exports.ts), so a CSV from the page and one from `tenuis run` hold the same numbers.
 */
import { runReplicaPool, type PoolProgress, type ReplicaReport } from '../../workers/replicaPool';
import { defaultReplicaCount } from '../../workers/browserReplica';
import { observedFactory, openSummaryWorker, startLiveViews, type LiveReplicas } from './liveViews';
import type { FinishedSummary } from '../../workers/liveSummary.worker';
import { transfer } from 'comlink';
import { estimateAt } from '../../engine/results/targetQuantities';
import { evaluateStop, estimateRemaining, relativeHalfWidthOf } from '../../engine/stats/stopping';
import { planFromInput } from '../../engine/plan/plan';
import type { SimulationResult } from '../../engine/results/summarize';
import type { Performance } from '../../engine/report/summaryJson';
import type { TenuisTestHooks } from '../testing/testHooks';
import type { ContinuumComparisonResult } from '../../engine/report/comparison';
import type { ResultGeometry } from '../results/resultGeometry';

export { profilesCsv, fieldsCsv, surfacesCsv } from '../../engine/report/resultCsv';
export { summaryJsonText } from '../../engine/report/summaryJson';
export { defaultReplicaCount };
export { flowQuantityUnits } from '../../engine/results/flowQuantities';
export { MODEL_LABELS } from '../../engine/continuum/caseModelTypes';
export * from './sweepApi';
export { cutProfileCsv } from '../../engine/report/cutProfileCsv';

export interface ReplicaView {
  readonly stream: number;
  readonly state: 'starting' | 'transient' | 'sampling' | 'lost';
  readonly stepsDone: number;
  readonly totalSteps: number;
  readonly reason?: string;
}

export interface RunProgressView {
  /** Means over the replicas still running. */
  readonly stepsDone: number;
  readonly totalSteps: number;
  /** Sampled steps, summed over replicas. */
  readonly sampledSteps: number;
  readonly plannedSampleSteps: number;
  readonly fraction: number;
  readonly elapsedSeconds: number;
  /** From the rate so far; NaN until there is a rate. An estimate while a transient of open length runs. */
  readonly remainingSeconds: number;
  readonly inTransient: boolean;
  readonly replicas: readonly ReplicaView[];
  /** The precision target's state, when the run has one. */
  readonly target?: TargetView;
}

/** A precision target on one reported quantity (engine/stats/stopping.ts; paths as in summary.json). */
export interface TargetRequest {
  readonly path: string;
  /** Goal for the 95 % half-width over |mean|, above 0 and at most 1. */
  readonly relativeHalfWidth: number;
  /**
   * Stop every replica once the goal is met; the sampling budget is then TARGET_SAMPLE_CAP × the planned sampling,
   * as for `tenuis run --target`.
   */
  readonly stopWhenReached: boolean;
}

export interface TargetView {
  readonly path: string;
  readonly goal: number;
  /** Current 95 % half-width over |mean| of the live estimate; NaN until it has one, Infinity while it cannot say. */
  readonly current: number;
  readonly mean: number;
  readonly ci95: number;
  readonly reached: boolean;
  /** Seconds of sampling still needed at the present rate (half-width ∝ 1/√samples); NaN when unknown, 0 once reached. */
  readonly remainingSeconds: number;
  readonly stopWhenReached: boolean;
}

/** With a target that stops the run: the sampling budget as a multiple of the planned sampling (as on the command line). */
export const TARGET_SAMPLE_CAP = 50;

export interface RunRequest {
  readonly caseInput: unknown;
  readonly replicas: number;
  /** Interval of the live views (merged snapshots of every replica), ms. */
  readonly liveEveryMs: number;
  readonly target?: TargetRequest;
  readonly hooks?: TenuisTestHooks;
}

export interface RunCallbacks {
  onProgress(p: RunProgressView): void;
  onLive(result: SimulationResult): void;
  onReplicaLost(stream: number, reason: string): void;
}

export interface ReplicaEnd {
  readonly stream: number;
  readonly status: ReplicaReport['status'];
  readonly reason?: string;
  readonly stepsDone: number;
  readonly sampledSteps: number;
}

export interface FinishedRun {
  readonly result: SimulationResult;
  /** The merged samples as a sample file (engine/io/sampleFile.ts): what a saved run keeps. */
  readonly samples: ArrayBuffer;
  readonly replicas: readonly ReplicaEnd[];
  readonly performance: Performance;
  /** Continuum predictions beside the result, with verdicts (engine/continuum/comparison.ts), or why there are none. */
  readonly comparison: ContinuumComparisonResult;
  /** Warnings about the run itself (lost replicas, stopped early), also inside result.warnings. */
  readonly runWarnings: readonly string[];
  /** Cancelled by the user (not by the precision target). */
  readonly cancelled: boolean;
  /** Why the run ended before its budget by a rule of its own (the precision target), or null. */
  readonly stoppedBy: string | null;
}

export type RunEnd = { ok: true; run: FinishedRun } | { ok: false; message: string };

export interface RunHandle {
  readonly done: Promise<RunEnd>;
  pause(): void;
  resume(): void;
  cancel(): void;
}

export function startRun(request: RunRequest, callbacks: RunCallbacks): RunHandle {
  const planned = planFromInput(request.caseInput);
  if (!planned.ok)
    return {
      done: Promise.resolve({ ok: false, message: planned.errors.join('\n') }),
      pause() {},
      resume() {},
      cancel() {},
    };
  const target = request.target;
  const stopsAtTarget = target?.stopWhenReached === true;
  const plannedSampleSteps = stopsAtTarget ? TARGET_SAMPLE_CAP * planned.plan.sampleSteps : planned.plan.sampleSteps;
  let stoppedBy: string | null = null;
  let targetView: TargetView | undefined = target && {
    path: target.path,
    goal: target.relativeHalfWidth,
    current: NaN,
    mean: NaN,
    ci95: NaN,
    reached: false,
    remainingSeconds: NaN,
    stopWhenReached: stopsAtTarget,
  };
  let samplingSince: number | null = null;
  const t0 = performance.now();
  let pausedAt: number | null = null;
  let pausedMs = 0;
  let cancelled = false;
  const lostReasons = new Map<number, string>();
  const running = () =>
    (performance.now() - t0 - pausedMs - (pausedAt === null ? 0 : performance.now() - pausedAt)) / 1000;

  const progressView = (p: PoolProgress): RunProgressView => {
    const replicas: ReplicaView[] = [];
    let steps = 0;
    let total = 0;
    let sampled = 0;
    let live = 0;
    let inTransient = false;
    for (let k = 0; k < request.replicas; k++) {
      const r = p.replicas[k];
      const lost = p.lost.includes(k) || lostReasons.has(k);
      if (lost) {
        replicas.push({
          stream: k,
          state: 'lost',
          stepsDone: r?.stepsDone ?? 0,
          totalSteps: r?.totalSteps ?? 0,
          reason: lostReasons.get(k),
        });
        continue;
      }
      if (!r) {
        replicas.push({ stream: k, state: 'starting', stepsDone: 0, totalSteps: 0 });
        inTransient = true;
        continue;
      }
      replicas.push({ stream: k, state: r.phase, stepsDone: r.stepsDone, totalSteps: r.totalSteps });
      live++;
      steps += r.stepsDone;
      total += r.totalSteps;
      if (r.phase === 'sampling') sampled += Math.max(0, plannedSampleSteps - (r.totalSteps - r.stepsDone));
      else inTransient = true;
    }
    const stepsDone = live ? steps / live : 0;
    const totalSteps = live ? total / live : 0;
    const elapsed = running();
    const fraction = totalSteps > 0 ? Math.min(1, stepsDone / totalSteps) : 0;
    if (samplingSince === null && sampled > 0) samplingSince = elapsed;
    let remainingSeconds = stepsDone > 0 ? (elapsed * (totalSteps - stepsDone)) / stepsDone : NaN;
    let shownFraction = fraction;
    // A run that ends at its target has a budget far beyond what it will use: the target's estimate says more.
    if (stopsAtTarget && targetView && !inTransient && Number.isFinite(targetView.remainingSeconds)) {
      remainingSeconds = Number.isFinite(remainingSeconds)
        ? Math.min(remainingSeconds, targetView.remainingSeconds)
        : targetView.remainingSeconds;
      shownFraction = Math.max(fraction, elapsed / (elapsed + remainingSeconds));
    }
    return {
      stepsDone,
      totalSteps,
      sampledSteps: sampled,
      plannedSampleSteps,
      fraction: shownFraction,
      elapsedSeconds: elapsed,
      remainingSeconds,
      inTransient,
      replicas,
      target: targetView,
    };
  };

  const liveReplicas: LiveReplicas = new Map();
  const kills = new Map<number, () => void>();
  // The test hook: fail one replica's worker afterMs after it first reported sampling (so always mid-run).
  const forced = request.hooks?.failReplica;
  let forcedTimer: ReturnType<typeof setTimeout> | null = null;
  const maybeForceFailure = (p: PoolProgress) => {
    if (!forced || forcedTimer !== null || p.replicas[forced.stream]?.phase !== 'sampling') return;
    forcedTimer = setTimeout(() => kills.get(forced.stream)?.(), forced.afterMs);
  };
  const pool = runReplicaPool({
    caseInput: request.caseInput,
    replicas: request.replicas,
    ...(stopsAtTarget ? { sampleSteps: plannedSampleSteps } : {}),
    createReplica: observedFactory(
      (stream, reason) => {
        lostReasons.set(stream, reason);
        callbacks.onReplicaLost(stream, reason);
      },
      kills,
      liveReplicas,
    ),
    // Safety snapshots for lost workers; no stopping check, so the pool merges nothing on this thread meanwhile.
    snapshotEveryMs: Math.max(1000, request.liveEveryMs),
    decodeOnThisThread: false,
    onProgress: (p) => {
      maybeForceFailure(p);
      callbacks.onProgress(progressView(p));
    },
  });
  // The target is judged on each live view (summarised off this thread): no merging here for the stopping rule.
  const onLive = (result: SimulationResult) => {
    if (target && targetView) {
      const estimate = estimateAt(result, target.path);
      const decision = evaluateStop({ stepsDone: 0, elapsedSeconds: 0, target, estimate });
      const current = estimate ? relativeHalfWidthOf(estimate) : NaN;
      const reached = decision.rule === 'target';
      const samplingSeconds = samplingSince === null ? 0 : running() - samplingSince;
      const remainingSeconds = reached
        ? 0
        : Number.isFinite(current) && current > 0 && result.numerics.sampleSteps > 0
          ? (estimateRemaining(current, target.relativeHalfWidth, result.numerics.sampleSteps, samplingSeconds)
              .additionalSeconds ?? NaN)
          : NaN;
      targetView = {
        ...targetView,
        current,
        mean: estimate?.mean ?? NaN,
        ci95: estimate?.ci95 ?? NaN,
        reached,
        remainingSeconds,
      };
      if (reached && stopsAtTarget && stoppedBy === null && !cancelled) {
        stoppedBy = decision.reason;
        pool.cancel();
      }
    }
    callbacks.onLive(result);
  };
  const liveViews = startLiveViews(liveReplicas, request.liveEveryMs, onLive);

  const done = pool.done.then(async (outcome): Promise<RunEnd> => {
    liveViews.stop();
    const wallSeconds = (performance.now() - t0) / 1000;
    // Decoded, merged, summarised and encoded off this thread; the files are transferred, not copied.
    const files = outcome.replicas.map((r) => r.samplesFile);
    let finished: FinishedSummary | null;
    try {
      finished = await liveViews.summary.finishFiles(
        transfer(files, [...new Set(files.filter((b): b is ArrayBuffer => b !== null))]),
      );
    } finally {
      liveViews.close();
    }
    if (!finished) {
      return {
        ok: false,
        message: `no replica sampled anything: ${outcome.replicas.map((r) => `replica ${r.stream} ${r.status}${r.reason ? ` (${r.reason})` : ''}`).join('; ')}`,
      };
    }
    const { result, samples, comparison, sampledSteps } = finished;
    const runWarnings: string[] = [];
    outcome.replicas.forEach((r, k) => {
      if (r.status === 'lost') {
        runWarnings.push(
          `replica ${r.stream} was lost (${r.reason}); ${sampledSteps[k] > 0 ? `its ${sampledSteps[k]} sampled steps up to its last snapshot are included` : 'it had sampled nothing that could be kept'}`,
        );
      }
    });
    const totalSampled = sampledSteps.reduce((a, b) => a + b, 0);
    if (stoppedBy !== null && !cancelled) runWarnings.push(`stopped early: ${stoppedBy}`);
    if (cancelled)
      runWarnings.push(`stopped by the user: the result holds the ${totalSampled} steps sampled until then`);
    result.warnings.push(...runWarnings);
    const particleSteps = outcome.replicas.reduce((s, r) => s + r.particleSteps, 0);
    return {
      ok: true,
      run: {
        result,
        samples,
        comparison,
        replicas: outcome.replicas.map((r, k) => ({
          stream: r.stream,
          status: r.status,
          reason: r.reason,
          stepsDone: r.stepsDone,
          sampledSteps: sampledSteps[k],
        })),
        performance: {
          wallSeconds,
          particleSteps,
          particleStepsPerSecond: wallSeconds > 0 ? particleSteps / wallSeconds : NaN,
        },
        runWarnings,
        cancelled,
        stoppedBy: cancelled ? null : stoppedBy,
      },
    };
  });
  return {
    done,
    pause: () => {
      if (pausedAt === null) pausedAt = performance.now();
      pool.pause();
    },
    resume: () => {
      if (pausedAt !== null) pausedMs += performance.now() - pausedAt;
      pausedAt = null;
      pool.resume();
    },
    cancel: () => {
      cancelled = true;
      if (pausedAt !== null) pool.resume();
      pool.cancel();
    },
  };
}

/**
 * A saved run's result again from its sample file: the same estimates (and comparison) as when it finished. Worked
 * out in a summary worker of its own: decoding re-plans the case, too long a task for the page's thread on big grids.
 */
export async function resultFromSamples(
  samples: ArrayBuffer,
  runWarnings: readonly string[],
): Promise<{ result: SimulationResult; comparison: ContinuumComparisonResult }> {
  const { summary, close } = openSummaryWorker('tenuis-saved-run');
  try {
    const copy = samples.slice(0);
    const { result, comparison } = await summary.summarizeFile(transfer(copy, [copy]));
    result.warnings.push(...runWarnings);
    return { result, comparison };
  } finally {
    close();
  }
}

/**
 * The geometry and gas the results view draws and derives from (app/results/resultGeometry.ts), from the case's
 * plan: the same cells, walls and blocks the run had. Null when the case does not plan (it then never ran here).
 */
export function resultGeometryOf(caseInput: unknown): ResultGeometry | null {
  const planned = planFromInput(caseInput);
  if (!planned.ok) return null;
  const p = planned.plan;
  const g = p.grid;
  const wholeCell = (c: number) => {
    const iy = Math.floor(c / g.cellsX);
    return g.axisymmetric
      ? Math.PI * g.cellSizeYM * g.cellSizeYM * (2 * iy + 1) * g.cellSizeXM
      : g.cellSizeXM * g.cellSizeYM;
  };
  // Relative to the whole cell, so round-off in the cut-out volume of a covered cell still counts as no gas.
  const solidCells = Uint8Array.from(g.cells.gasVolumesM3, (v, c) => (v <= 1e-9 * wholeCell(c) ? 1 : 0));
  const zeta = p.gas.model.rotationalDof;
  const sides = ['left', 'right', 'bottom', 'top'] as const;
  return {
    lengthXM: g.lengthXM,
    lengthYM: g.lengthYM,
    cellsX: g.cellsX,
    cellsY: g.cellsY,
    axisymmetric: g.axisymmetric,
    walls: p.surfaces.flatMap((s, k) =>
      s.block < 0 && s.spec.type === 'wall'
        ? [{ name: s.name, side: sides[k], normalIsX: s.normalIsX, planeM: s.planeM, fromM: s.fromM, toM: s.toM }]
        : [],
    ),
    blocks: p.caseData.blocks.map((b) => ({ name: b.name, x0: b.xMinM, x1: b.xMaxM, y0: b.yMinM, y1: b.yMaxM })),
    solidCells,
    gas: { massKg: p.gas.model.massKg, rotationalDof: zeta, heatCapacityRatio: (5 + zeta) / (3 + zeta) },
  };
}
