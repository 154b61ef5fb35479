/** The run, results and ui slices: plain state with setters; the work is done by run/runController.ts. */
import type { StateCreator } from 'zustand/vanilla';
import type { AppState, ResultsSlice, RunSlice, UiSlice } from './types';
import type { StoreDeps } from './caseSlice';
import { rederive } from './caseSlice';

/** Assumed speed of one replica worker before any run was measured, particle-steps/s (a cautious guess). */
export const DEFAULT_PARTICLE_STEPS_PER_SECOND = 1.5e7;

export function createRunSlice(deps: StoreDeps, cores: number): StateCreator<AppState, [], [], RunSlice> {
  return (set, get) => {
    const replan = () => {
      if (get().presetName || get().source.kind === 'json') rederive(deps, set, get, {});
    };
    return {
      replicas: Math.max(1, cores),
      cores: Math.max(1, cores),
      speed: { particleStepsPerSecond: DEFAULT_PARTICLE_STEPS_PER_SECOND, measured: false },
      status: 'idle',
      progress: null,
      notices: [],
      runError: null,
      endNotice: null,
      target: { path: '', goalPercent: '2', stopWhenReached: false },
      setTarget: (patch) => set({ target: { ...get().target, ...patch } }),
      stopWhenDecided: false,
      setStopWhenDecided: (on) => set({ stopWhenDecided: on }),
      setReplicas: (n) => {
        if (!Number.isInteger(n) || n < 1 || n > 64) return;
        set({ replicas: n });
        replan();
      },
      setSpeed: (v) => {
        if (!(Number.isFinite(v) && v > 0)) return;
        set({ speed: { particleStepsPerSecond: v, measured: true } });
        replan();
      },
      setRunState: (patch) => set(patch),
      addNotice: (text) => set({ notices: [...get().notices, text] }),
    };
  };
}

export const createResultsSlice: StateCreator<AppState, [], [], ResultsSlice> = (set, get) => ({
  resultId: null,
  resultVersion: 0,
  resultIsLive: false,
  savedRuns: [],
  compareId: null,
  showResult: (id, live) => set({ resultId: id, resultIsLive: live, resultVersion: get().resultVersion + 1 }),
  bumpResult: () => set({ resultVersion: get().resultVersion + 1 }),
  setSavedRuns: (runs) =>
    set({ savedRuns: runs, compareId: runs.some((r) => r.id === get().compareId) ? get().compareId : null }),
  setCompare: (id) => set({ compareId: id }),
});

export const createUiSlice: StateCreator<AppState, [], [], UiSlice> = (set, get) => ({
  view: 'setup',
  engineReady: false,
  profileQuantity: 'velocityX',
  fieldQuantity: 'numberDensity',
  wallQuantity: 'shearStress',
  flowUnits: {},
  setFlowUnit: (quantity, unit) => set({ flowUnits: { ...get().flowUnits, [quantity]: unit } }),
  restoreFlowUnits: (units) => set({ flowUnits: { ...units, ...get().flowUnits } }),
  setView: (view) => set({ view }),
  setEngineReady: (engineReady) => set({ engineReady }),
  select: (patch) => set(patch),
});
