/** The page's store instance and the hook components select from (narrowest slice each). */
import { useStore } from 'zustand';
import { setupApi } from '../bridge/loadEngine';
import { createAppStore } from './store';
import { createWorkerPlanner } from '../setup/planInWorker';
import type { AppState } from './types';

export const appStore = createAppStore(
  // Planning a case can take seconds (it lays out every cell): in a worker, so typing never holds the page.
  { setup: setupApi, ...(typeof Worker !== 'undefined' ? { deriveAsync: createWorkerPlanner() } : {}) },
  typeof navigator !== 'undefined' ? navigator.hardwareConcurrency || 1 : 1,
);

export function useApp<T>(selector: (s: AppState) => T): T {
  return useStore(appStore, selector);
}
