/**
 * The sweep's own small store (zustand, vanilla core like the app's): the form's texts, what the sweep is doing,
 * the finished points' rows (each a point's summary.json object: plain numbers, no typed arrays) and the continuum
 * curves over the range (a few hundred numbers). Kept apart from the app store so a sweep never changes the state
 * of single runs.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import type { RunProgressView } from '../engine/runApi';
import type { SweepPlanView, SweepRequest } from '../engine/sweepApi';
import type { SweepContinuumCurves, SweepParameter, SweepRow, SweepSpacing } from '../../engine/case/sweep';

export type SweepStatus = 'idle' | 'planning' | 'running' | 'stopping' | 'finished' | 'stopped';

/** What the user typed: texts, parsed by sweepForm.ts. */
export interface SweepFormState {
  readonly parameter: SweepParameter;
  readonly fromText: string;
  readonly toText: string;
  /** Unit of from/to when the parameter is the pressure (Pa, mbar, Torr). */
  readonly pressureUnit: string;
  readonly pointsText: string;
  readonly spacing: SweepSpacing;
  /** The quantity plotted: `flow.NAME` or `walls.WALL.QUANTITY`. */
  readonly quantity: string;
}

export interface SweepRunState {
  readonly status: SweepStatus;
  /** The planned sweep being run or last run (for the table options and the export). */
  readonly planned: Extract<SweepPlanView, { ok: true }> | null;
  readonly request: SweepRequest | null;
  /** The set-up's case the sweep started from (exported as case.json for `tenuis sweep`). */
  readonly baseCase: unknown;
  readonly rows: readonly SweepRow[];
  /** Why a failed point failed, by point number. */
  readonly failures: Readonly<Record<number, string>>;
  readonly current: { readonly index: number; readonly count: number; readonly progress: RunProgressView | null } | null;
  readonly curves: SweepContinuumCurves | { readonly reason: string } | null;
  readonly error: string | null;
  readonly notices: readonly string[];
}

export interface SweepState extends SweepFormState, SweepRunState {
  setForm(patch: Partial<SweepFormState>): void;
  setRun(patch: Partial<SweepRunState>): void;
}

const initialRun: SweepRunState = {
  status: 'idle', planned: null, request: null, baseCase: null, rows: [], failures: {}, current: null, curves: null, error: null, notices: [],
};

export function createSweepStore() {
  return createStore<SweepState>()((set) => ({
    parameter: 'knudsen',
    fromText: '0.1',
    toText: '10',
    pressureUnit: 'Pa',
    pointsText: '5',
    spacing: 'log',
    quantity: 'flow.massFlowRate',
    ...initialRun,
    setForm: (patch) => set(patch),
    setRun: (patch) => set(patch),
  }));
}

export type SweepStore = ReturnType<typeof createSweepStore>;

export const sweepStore = createSweepStore();

export function useSweep<T>(selector: (s: SweepState) => T): T {
  return useStore(sweepStore, selector);
}

export { initialRun as initialSweepRun };
