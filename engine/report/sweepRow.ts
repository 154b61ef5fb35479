/**
 * The row of one point of a finished sweep: its status and its summary.json as an object, the one way from a point's
 * run to sweep.csv and sweep.json, shared by `tenuis sweep` and the browser's sweep.
 */
import type { SimulationResult } from '../results/summarize';
import type { ContinuumComparisonResult } from './comparison';
import { summaryJsonText, type Performance, type SummaryJson } from './summaryJson';

/** complete: ran to the end; interrupted: stopped by the user (summary of what was sampled, or null); failed: null. */
export type SweepPointStatus = 'complete' | 'interrupted' | 'failed';

export interface SweepRow {
  /** Point number, from 1. */
  readonly point: number;
  /** The swept value as requested (SI). */
  readonly value: number;
  readonly status: SweepPointStatus;
  /** The point's summary.json, or null when nothing was sampled. */
  readonly summary: SummaryJson | null;
}

/**
 * What one point's run gave, as the row needs it: its result with the continuum comparison of the same plan
 * (engine/report/comparison.ts), or nothing, because it was stopped before sampling began or it failed.
 */
export type SweepPointRun =
  | {
      readonly kind: 'sampled';
      readonly result: SimulationResult;
      readonly comparison: ContinuumComparisonResult;
      readonly performance: Performance;
      /** The point's case name (caseAtSweepPoint names it after the point). */
      readonly caseName: string;
      /** Stopped by the user: the result holds what was sampled until then. */
      readonly interrupted: boolean;
    }
  | { readonly kind: 'nothingSampled' }
  | { readonly kind: 'failed' };

/**
 * The point's summary.json as an object: parsed back from the very text `tenuis run` writes (summaryJsonText), so
 * the table holds exactly the numbers of the point's summary.json (JSON has no NaN: they are null there too).
 */
export function sweepPointSummary(run: Extract<SweepPointRun, { kind: 'sampled' }>): SummaryJson {
  return JSON.parse(
    summaryJsonText(run.result, { performance: run.performance, caseName: run.caseName, comparison: run.comparison }),
  ) as SummaryJson;
}

/**
 * The row of one point: the one way from a point's run to sweep.csv and sweep.json, shared by `tenuis sweep` and
 * the browser's sweep, so both tables hold the same numbers for the same case, seed and replicas.
 */
export function sweepRowOf(point: number, value: number, run: SweepPointRun): SweepRow {
  if (run.kind === 'failed') return { point, value, status: 'failed', summary: null };
  if (run.kind === 'nothingSampled') return { point, value, status: 'interrupted', summary: null };
  return { point, value, status: run.interrupted ? 'interrupted' : 'complete', summary: sweepPointSummary(run) };
}
