/**
 * The run side of the engine on the main thread, loaded by dynamic import into its own chunk: replicas in Web Workers
 * (workers/replicaPool.ts), live and final summaries, sample files for saved runs, and the exports the command line
 * writes (engine/results/exports.ts), so a CSV from the page and one from `tenuis run` hold the same numbers.
 */
import { runReplicaPool, type PoolProgress, type ReplicaReport } from '../../workers/replicaPool';
import { defaultReplicaCount } from '../../workers/browserReplica';
import { observedFactory, startLiveViews, type LiveReplicas } from './liveViews';
import { planFromInput } from '../../engine/case/plan';
import { summarizeSamples, type SimulationResult } from '../../engine/results/summarize';
import { decodeSampleSet } from '../../engine/io/sampleFile';
import type { Performance } from '../../engine/results/exports';
import type { TenuisTestHooks } from '../testing/testHooks';
import { continuumComparisonOf, type ContinuumComparisonResult } from '../../engine/continuum/comparison';
import type { ResultGeometry } from '../results/resultGeometry';

export { profilesCsv, fieldsCsv, surfacesCsv, summaryJsonText } from '../../engine/results/exports';
export { defaultReplicaCount };
export { flowQuantityUnits } from '../../engine/results/flowQuantities';
export { MODEL_LABELS } from '../../engine/continuum/caseModelTypes';
export { cutProfileCsv } from '../../engine/results/cutProfileCsv';

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
}

export interface RunRequest {
  readonly caseInput: unknown;
  readonly replicas: number;
  /** Interval of the live views (merged snapshots of every replica), ms. */
  readonly liveEveryMs: number;
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
  readonly cancelled: boolean;
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
  if (!planned.ok) return { done: Promise.resolve({ ok: false, message: planned.errors.join('\n') }), pause() {}, resume() {}, cancel() {} };
  const plannedSampleSteps = planned.plan.sampleSteps;
  const t0 = performance.now();
  let pausedAt: number | null = null;
  let pausedMs = 0;
  let cancelled = false;
  const lostReasons = new Map<number, string>();
  const running = () => (performance.now() - t0 - pausedMs - (pausedAt === null ? 0 : performance.now() - pausedAt)) / 1000;

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
        replicas.push({ stream: k, state: 'lost', stepsDone: r?.stepsDone ?? 0, totalSteps: r?.totalSteps ?? 0, reason: lostReasons.get(k) });
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
    return {
      stepsDone, totalSteps, sampledSteps: sampled, plannedSampleSteps, fraction, elapsedSeconds: elapsed,
      remainingSeconds: stepsDone > 0 ? (elapsed * (totalSteps - stepsDone)) / stepsDone : NaN,
      inTransient, replicas,
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
    createReplica: observedFactory((stream, reason) => {
      lostReasons.set(stream, reason);
      callbacks.onReplicaLost(stream, reason);
    }, kills, liveReplicas),
    // Safety snapshots for lost workers; no stopping check, so the pool merges nothing on this thread meanwhile.
    snapshotEveryMs: Math.max(1000, request.liveEveryMs),
    onProgress: (p) => {
      maybeForceFailure(p);
      callbacks.onProgress(progressView(p));
    },
  });
  const liveViews = startLiveViews(liveReplicas, request.liveEveryMs, callbacks.onLive);

  const done = pool.done.then(async (outcome): Promise<RunEnd> => {
    liveViews.stop();
    const wallSeconds = (performance.now() - t0) / 1000;
    if (!outcome.merged) {
      liveViews.close();
      return { ok: false, message: `no replica sampled anything: ${outcome.replicas.map((r) => `replica ${r.stream} ${r.status}${r.reason ? ` (${r.reason})` : ''}`).join('; ')}` };
    }
    // Summarised and encoded off this thread (the merged set crosses as a structured clone).
    let finished: { result: SimulationResult; samples: ArrayBuffer; comparison: ContinuumComparisonResult };
    try {
      finished = await liveViews.summary.finish(outcome.merged);
    } finally {
      liveViews.close();
    }
    const { result, samples, comparison } = finished;
    const runWarnings: string[] = [];
    for (const r of outcome.replicas) {
      if (r.status === 'lost') {
        runWarnings.push(`replica ${r.stream} was lost (${r.reason}); ${r.samples ? `its ${r.samples.counters.sampledSteps} sampled steps up to its last snapshot are included` : 'it had sampled nothing that could be kept'}`);
      }
    }
    if (cancelled) runWarnings.push(`stopped by the user: the result holds the ${outcome.merged.counters.sampledSteps} steps sampled until then`);
    result.warnings.push(...runWarnings);
    const particleSteps = outcome.replicas.reduce((s, r) => s + r.particleSteps, 0);
    return {
      ok: true,
      run: {
        result,
        samples,
        comparison,
        replicas: outcome.replicas.map((r) => ({ stream: r.stream, status: r.status, reason: r.reason, stepsDone: r.stepsDone, sampledSteps: r.samples?.counters.sampledSteps ?? 0 })),
        performance: { wallSeconds, particleSteps, particleStepsPerSecond: wallSeconds > 0 ? particleSteps / wallSeconds : NaN },
        runWarnings,
        cancelled,
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

/** A saved run's result again from its sample file: the same estimates (and comparison) as when it finished. */
export function resultFromSamples(samples: ArrayBuffer, runWarnings: readonly string[]): { result: SimulationResult; comparison: ContinuumComparisonResult } {
  const set = decodeSampleSet(samples.slice(0));
  const result = summarizeSamples(set);
  const comparison = continuumComparisonOf(set.plan, result);
  result.warnings.push(...runWarnings);
  return { result, comparison };
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
    return g.axisymmetric ? Math.PI * g.cellSizeYM * g.cellSizeYM * (2 * iy + 1) * g.cellSizeXM : g.cellSizeXM * g.cellSizeYM;
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
    walls: p.surfaces.flatMap((s, k) => (s.block < 0 && s.spec.type === 'wall' ? [{ name: s.name, side: sides[k], normalIsX: s.normalIsX, planeM: s.planeM, fromM: s.fromM, toM: s.toM }] : [])),
    blocks: p.caseData.blocks.map((b) => ({ name: b.name, x0: b.xMinM, x1: b.xMaxM, y0: b.yMinM, y1: b.yMaxM })),
    solidCells,
    gas: { massKg: p.gas.model.massKg, rotationalDof: zeta, heatCapacityRatio: (5 + zeta) / (3 + zeta) },
  };
}
