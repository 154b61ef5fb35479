/** The page's store instance and the hook components select from (narrowest slice each). */
import { useStore } from 'zustand';
import { setupApi } from '../bridge/loadEngine';
import { createAppStore } from './store';
import type { AppState } from './types';

export const appStore = createAppStore(
  { setup: setupApi },
  typeof navigator !== 'undefined' ? navigator.hardwareConcurrency || 1 : 1,
);

export function useApp<T>(selector: (s: AppState) => T): T {
  return useStore(appStore, selector);
}
