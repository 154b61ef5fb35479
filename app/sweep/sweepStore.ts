/**
 * The sweep's handle on its slice of the one store (AppState.sweep, store/sweepSlice.ts): `sweepStore.getState()`
 * is the slice's state with its setters, as code outside React (sweepActions.ts, savedSweeps.ts, the run
 * controller's one-pool-at-a-time check) reads it, and `useSweep` selects from it in components. Everything of the
 * sweep reaches its state through here, so none of it depends on where in the store the slice sits.
 */
import { appStore, useApp } from '../store/appStore';
import type { SweepState } from '../store/types';

export { initialSweepRun } from '../store/sweepSlice';

/** While a sweep is in one of these, no other sweep (or single run) starts and no saved one replaces it in the view. */
export const SWEEP_BUSY: readonly string[] = ['planning', 'running', 'stopping'];

export const sweepStore = {
  getState: (): SweepState => appStore.getState().sweep,
};

export function useSweep<T>(selector: (s: SweepState) => T): T {
  return useApp((s) => selector(s.sweep));
}
