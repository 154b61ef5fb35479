/**
 * The run side of the engine on the main thread, loaded by dynamic import into its own chunk: the page's runs go
 * through the run pipeline (workers/runCase.ts, as `tenuis run` does) with replicas in Web Workers, live views and the
 * final summary in a summary worker of their own, sample files for saved runs, and the exports the command line
 * writes (engine/results/exports.ts), so a CSV from the page and one from `tenuis run` hold the same numbers. This
 * file only turns the pipeline's progress into the page's views and its end into a saved run.
 */
import {
  runCase,
  lostReplicaWarning,
  type RunCaseOutcome,
  type RunCaseProgress,
  type TargetState,
} from '../../workers/runCase';
import { defaultReplicaCount } from '../../workers/browserReplica';
import { observedFactory, openSummaryWorker, startLiveViews, type LiveReplicas, type LiveViews } from './liveViews';
import type { FinishedSummary } from '../../workers/liveSummary.worker';
import { transfer } from 'comlink';
import { planFromInput, type Plan } from '../../engine/plan/plan';
import { sizedPlanFor } from './planView';
import { headlineDecision } from '../../engine/report/decision';
import type { SimulationResult } from '../../engine/results/summarize';
import type { TenuisTestHooks } from '../testing/testHooks';
import type { ContinuumComparisonResult } from '../../engine/report/comparison';
import type { ResultGeometry } from '../results/resultGeometry';
import { progressViewOf, targetViewOf, type RunEnd, type RunProgressView, type TargetView } from './runViews';

export type { ReplicaView, RunProgressView, TargetView, ReplicaEnd, FinishedRun, RunEnd } from './runViews';

export { profilesCsv, fieldsCsv, surfacesCsv } from '../../engine/report/resultCsv';
export { summaryJsonText } from '../../engine/report/summaryJson';
export { verdictCsv } from '../../engine/report/verdictCsv';
export { verdictHeadline, extraTimeText, sampledWallSeconds } from '../../engine/report/headline';
export { defaultReplicaCount };
export { flowQuantityUnits } from '../../engine/results/flowQuantities';
export { FLOW_UNIT_CHOICES } from '../../engine/units/flowUnits';
export { flowCsv } from '../../engine/report/flowCsv';
export { MODEL_LABELS } from '../../engine/continuum/caseModelTypes';
export * from './sweepApi';
export { cutProfileCsv } from '../../engine/report/cutProfileCsv';

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

/** With a target that stops the run: the sampling budget as a multiple of the planned sampling (as on the command line). */
export const TARGET_SAMPLE_CAP = 50;

export interface RunRequest {
  readonly caseInput: unknown;
  /**
   * The case's plan when the caller has it already (a sweep point, planned with the sweep): then caseInput is not
   * validated and planned again here.
   */
  readonly plan?: Plan;
  readonly replicas: number;
  /** Interval of the live views (merged snapshots of every replica), ms. */
  readonly liveEveryMs: number;
  readonly target?: TargetRequest;
  readonly hooks?: TenuisTestHooks;
  /** Share of the run sizing's default time cap this run may take (a sweep point: 1/points); default 1. */
  readonly capShare?: number;
  /** End the run as soon as no model's verdict on the headline quantity is undecided (report/decision.ts). */
  readonly stopWhenDecided?: boolean;
}

export interface RunCallbacks {
  onProgress(p: RunProgressView): void;
  onLive(result: SimulationResult): void;
  onReplicaLost(stream: number, reason: string): void;
}

export interface RunHandle {
  readonly done: Promise<RunEnd>;
  pause(): void;
  resume(): void;
  cancel(): void;
}

export function startRun(request: RunRequest, callbacks: RunCallbacks): RunHandle {
  // The page's case enters the run here: validated and planned once, then handed along as data and plan.
  const first = request.plan ? { ok: true as const, plan: request.plan } : planFromInput(request.caseInput);
  // Sized to decide where the case leaves its sampling open and the run has no target of its own (planView.ts).
  const planned =
    first.ok && request.target?.stopWhenReached !== true
      ? { ok: true as const, plan: sizedPlanFor(first.plan, request.replicas, request.capShare).plan }
      : first;
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
  const onTarget = (t: TargetState) => void (targetView = targetView && targetViewOf(targetView, t));
  const lostReasons = new Map<number, string>();

  const progressView = (p: RunCaseProgress) =>
    progressViewOf(p, {
      replicas: request.replicas,
      plannedSampleSteps,
      stopsAtTarget,
      lostReasons,
      target: targetView,
    });

  const liveReplicas: LiveReplicas = new Map();
  const kills = new Map<number, () => void>();
  // The test hook: fail one replica's worker afterMs after it first reported sampling (so always mid-run).
  const forced = request.hooks?.failReplica;
  let forcedTimer: ReturnType<typeof setTimeout> | null = null;
  const maybeForceFailure = (p: RunCaseProgress) => {
    if (!forced || forcedTimer !== null || p.replicas[forced.stream]?.phase !== 'sampling') return;
    forcedTimer = setTimeout(() => kills.get(forced.stream)?.(), forced.afterMs);
  };
  let views: LiveViews | null = null;
  const run = runCase(
    { plan: planned.plan },
    {
      replicas: request.replicas,
      // The final samples stay sample files: the summary worker decodes and merges them, not the page's thread.
      place: { kind: 'workers', createReplica: observedFactory(kills, liveReplicas), decodeOnThisThread: false },
      stopping:
        target || request.stopWhenDecided
          ? {
              ...(target ? { target, stopAtTarget: stopsAtTarget } : {}),
              ...(stopsAtTarget ? { maxSampleSteps: plannedSampleSteps } : {}),
              ...(request.stopWhenDecided
                ? { decided: (result: SimulationResult) => headlineDecision(planned.plan, result) }
                : {}),
            }
          : undefined,
      // Safety snapshots for lost workers; the stopping rule is judged on the live views, summarised off this thread.
      snapshotEveryMs: Math.max(1000, request.liveEveryMs),
      liveSummaries: (deliver) => (views = startLiveViews(liveReplicas, request.liveEveryMs, deliver)),
    },
    {
      onProgress: (p) => {
        maybeForceFailure(p);
        callbacks.onProgress(progressView(p));
      },
      onLive: (result) => callbacks.onLive(result),
      onTarget,
      onReplicaLost: (stream, reason) => {
        lostReasons.set(stream, reason);
        callbacks.onReplicaLost(stream, reason);
      },
    },
  );

  const done = run.done.then(async (outcome): Promise<RunEnd> => {
    const summary = views!;
    // Decoded, merged, summarised and encoded off this thread; the files are transferred, not copied.
    const files = outcome.replicas.map((r) => r.samplesFile);
    let finished: FinishedSummary | null;
    try {
      finished = await summary.summary.finishFiles(
        transfer(files, [...new Set(files.filter((b): b is ArrayBuffer => b !== null))]),
      );
    } finally {
      summary.close();
    }
    return finishedRunOf(outcome, finished, planned.plan.timeStepS);
  });
  return { done, pause: run.pause, resume: run.resume, cancel: run.cancel };
}

/** A run's end as the page keeps it: the summary worker's result with the run's own warnings, or why there is none. */
export function finishedRunOf(outcome: RunCaseOutcome, finished: FinishedSummary | null, timeStepS = NaN): RunEnd {
  if (!finished && outcome.cancelled && outcome.replicas.every((r) => r.status !== 'lost')) {
    const stepsDone = Math.max(0, ...outcome.replicas.map((r) => r.stepsDone));
    return {
      ok: false,
      message: 'stopped before sampling',
      stoppedBeforeSampling: { stepsDone, simulatedTimeS: stepsDone * timeStepS },
    };
  }
  if (!finished) {
    return {
      ok: false,
      message: `no replica sampled anything: ${outcome.replicas.map((r) => `replica ${r.stream} ${r.status}${r.reason ? ` (${r.reason})` : ''}`).join('; ')}`,
    };
  }
  const { result, samples, comparison, sampledSteps } = finished;
  const { cancelled, stoppedBy, wallSeconds, particleSteps } = outcome;
  const runWarnings: string[] = [];
  outcome.replicas.forEach((r, k) => {
    if (r.status === 'lost') runWarnings.push(lostReplicaWarning(r, sampledSteps[k] > 0 ? sampledSteps[k] : null));
  });
  const totalSampled = sampledSteps.reduce((a, b) => a + b, 0);
  if (stoppedBy !== null) runWarnings.push(`stopped early: ${stoppedBy}`);
  if (cancelled) runWarnings.push(`stopped by the user: the result holds the ${totalSampled} steps sampled until then`);
  result.warnings.push(...runWarnings);
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
      stoppedBy,
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
