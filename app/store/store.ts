/** The one store of the workbench (zustand, vanilla core so non-React code can use it; React reads it via useApp). */
import { createStore, type StoreApi } from 'zustand/vanilla';
import { createCaseSlice, type StoreDeps } from './caseSlice';
import { createResultsSlice, createRunSlice, createUiSlice } from './otherSlices';
import { createSweepSlice } from './sweepSlice';
import type { AppState } from './types';

export type AppStore = StoreApi<AppState>;

export function createAppStore(deps: StoreDeps, cores: number): AppStore {
  return createStore<AppState>()((...a) => ({
    ...createCaseSlice(deps)(...a),
    ...createRunSlice(deps, cores)(...a),
    ...createResultsSlice(...a),
    ...createUiSlice(...a),
    ...createSweepSlice(...a),
  }));
}
