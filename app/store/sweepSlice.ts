/**
 * The sweep slice: the Sweep view's form texts, the sweep being run or shown, and the sweeps saved in this browser,
 * all under AppState.sweep (store/types.ts says why it is one field). Plain state with setters, each changing the
 * sweep field only; the work is done by sweep/sweepActions.ts and sweep/savedSweeps.ts through sweep/sweepStore.ts.
 */
import type { StateCreator } from 'zustand/vanilla';
import type { AppState, SweepRunState, SweepSlice } from './types';

/** A sweep's state before it starts (and after the one shown is deleted). */
export const initialSweepRun: SweepRunState = {
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

export const createSweepSlice: StateCreator<AppState, [], [], SweepSlice> = (set) => {
  const patchSweep = (patch: Partial<AppState['sweep']>) => set((s) => ({ sweep: { ...s.sweep, ...patch } }));
  return {
    sweep: {
      parameter: 'knudsen',
      fromText: '0.1',
      toText: '10',
      pressureUnit: 'Pa',
      pointsText: '5',
      spacing: 'log',
      quantity: 'flow.massFlowRate',
      ...initialSweepRun,
      saved: [],
      setForm: patchSweep,
      setRun: patchSweep,
      setSaved: (saved) => patchSweep({ saved }),
    },
  };
};
