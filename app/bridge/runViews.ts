/**
 * What the page shows of a run, made from the run pipeline's reports (workers/runCase.ts): the progress view of every
 * replica and of the precision target, and the types of the finished run a saved run keeps. Pure functions of their
 * inputs and types only (no engine code), kept apart from runApi.ts so the run's wiring there stays short.
 */
import type { ReplicaReport } from '../../workers/replicaPool';
import type { RunCaseProgress, TargetState } from '../../workers/runCase';
import type { SimulationResult } from '../../engine/results/summarize';
import type { Performance } from '../../engine/report/summaryJson';
import type { ContinuumComparisonResult } from '../../engine/report/comparison';

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

/** Where a run stopped by the user before any replica sampled had got to (the most advanced replica). */
export interface StoppedBeforeSampling {
  readonly stepsDone: number;
  /** stepsDone × the time step, s (NaN when the time step is not known). */
  readonly simulatedTimeS: number;
}

/**
 * How a run ended: a result, or none — because the user stopped it in the transient (not a failure: nothing was
 * to be sampled yet), or because it failed.
 */
export type RunEnd =
  { ok: true; run: FinishedRun } | { ok: false; message: string; stoppedBeforeSampling?: StoppedBeforeSampling };

/** The target's view after a live summary. */
export function targetViewOf(view: TargetView, t: TargetState): TargetView {
  const { current, reached, remainingSeconds } = t;
  return { ...view, current, mean: t.estimate?.mean ?? NaN, ci95: t.estimate?.ci95 ?? NaN, reached, remainingSeconds };
}

export interface ProgressContext {
  readonly replicas: number;
  /** Sampling steps each replica is to run. */
  readonly plannedSampleSteps: number;
  readonly stopsAtTarget: boolean;
  /** Lost replicas and why, as reported so far. */
  readonly lostReasons: ReadonlyMap<number, string>;
  readonly target: TargetView | undefined;
}

/** The page's progress view of one report of the pipeline. */
export function progressViewOf(p: RunCaseProgress, o: ProgressContext): RunProgressView {
  const targetView = o.target;

  const replicas: ReplicaView[] = [];
  let steps = 0;
  let total = 0;
  let sampled = 0;
  let live = 0;
  let inTransient = false;
  for (let k = 0; k < o.replicas; k++) {
    const r = p.replicas[k];
    const lost = p.lost.includes(k) || o.lostReasons.has(k);
    if (lost) {
      replicas.push({
        stream: k,
        state: 'lost',
        stepsDone: r?.stepsDone ?? 0,
        totalSteps: r?.totalSteps ?? 0,
        reason: o.lostReasons.get(k),
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
    if (r.phase === 'sampling') sampled += Math.max(0, o.plannedSampleSteps - (r.totalSteps - r.stepsDone));
    else inTransient = true;
  }
  const stepsDone = live ? steps / live : 0;
  const totalSteps = live ? total / live : 0;
  const elapsed = p.elapsedSeconds;
  const fraction = totalSteps > 0 ? Math.min(1, stepsDone / totalSteps) : 0;
  let remainingSeconds = stepsDone > 0 ? (elapsed * (totalSteps - stepsDone)) / stepsDone : NaN;
  let shownFraction = fraction;
  // A run that ends at its target has a budget far beyond what it will use: the target's estimate says more.
  if (o.stopsAtTarget && targetView && !inTransient && Number.isFinite(targetView.remainingSeconds)) {
    remainingSeconds = Number.isFinite(remainingSeconds)
      ? Math.min(remainingSeconds, targetView.remainingSeconds)
      : targetView.remainingSeconds;
    shownFraction = Math.max(fraction, elapsed / (elapsed + remainingSeconds));
  }
  return {
    stepsDone,
    totalSteps,
    sampledSteps: sampled,
    plannedSampleSteps: o.plannedSampleSteps,
    fraction: shownFraction,
    elapsedSeconds: elapsed,
    remainingSeconds,
    inTransient,
    replicas,
    target: targetView,
  };
}
