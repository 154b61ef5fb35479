/**
 * The sweep's own small store (zustand, vanilla core like the app's): the form's texts, what the sweep is doing,
 * the finished points' rows (each a point's summary.json object: plain numbers, no typed arrays) and the continuum
 * curves over the range (a few hundred numbers), and the list of sweeps saved in this browser. Kept apart from the
 * app store so a sweep never changes the state of single runs.
 */
import { createStore } from 'zustand/vanilla';
import { useStore } from 'zustand';
import type { RunProgressView } from '../bridge/types';
import type { SweepRequest } from '../bridge/types';
import type { SavedSweepMeta, SweepPlanOutline } from './savedSweep';
import type { SweepContinuumCurves, SweepParameter, SweepRow, SweepSpacing } from '../../engine/case/sweep';

/** `interrupted`: a saved sweep this page did not finish (a reload or a closed tab ended it), shown with its finished points. */
export type SweepStatus = 'idle' | 'planning' | 'running' | 'stopping' | 'finished' | 'stopped' | 'interrupted';

/** While a sweep is in one of these, no other sweep starts and no saved one replaces it in the view. */
export const SWEEP_BUSY: readonly string[] = ['planning', 'running', 'stopping'];

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
  readonly planned: SweepPlanOutline | null;
  /** Id of the record in IndexedDB the sweep shown is kept as (null before it is saved or after it is deleted). */
  readonly savedId: string | null;
  readonly request: SweepRequest | null;
  /** The set-up's case the sweep started from (exported as case.json for `tenuis sweep`). */
  readonly baseCase: unknown;
  readonly rows: readonly SweepRow[];
  /** Why a failed point failed, by point number. */
  readonly failures: Readonly<Record<number, string>>;
  readonly current: {
    readonly index: number;
    readonly count: number;
    readonly progress: RunProgressView | null;
  } | null;
  readonly curves: SweepContinuumCurves | { readonly reason: string } | null;
  readonly error: string | null;
  readonly notices: readonly string[];
}

export interface SweepState extends SweepFormState, SweepRunState {
  /** Sweeps saved in this browser, the latest started first. */
  readonly saved: readonly SavedSweepMeta[];
  setForm(patch: Partial<SweepFormState>): void;
  setRun(patch: Partial<SweepRunState>): void;
  setSaved(saved: readonly SavedSweepMeta[]): void;
}

const initialRun: SweepRunState = {
  status: 'idle',
  planned: null,
  savedId: null,
  request: null,
  baseCase: null,
  rows: [],
  failures: {},
  current: null,
  curves: null,
  error: null,
  notices: [],
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
    saved: [],
    setForm: (patch) => set(patch),
    setRun: (patch) => set(patch),
    setSaved: (saved) => set({ saved }),
  }));
}

export type SweepStore = ReturnType<typeof createSweepStore>;

export const sweepStore = createSweepStore();

export function useSweep<T>(selector: (s: SweepState) => T): T {
  return useStore(sweepStore, selector);
}

export { initialRun as initialSweepRun };
