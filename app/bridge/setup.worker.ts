/**
 * The set-up's planning off the page's thread: deriving the case from the form and planning it (both plan the whole
 * grid: a tube 50 000 radii long took 8 s and more per keystroke on the page's thread) run here, and the page keeps
 * answering while the user types. The set-up chunk is loaded by dynamic import, as the page loads it, so this file
 * holds no engine code of its own; app/setup/planInWorker.ts starts, feeds and replaces this worker.
 */
import { expose } from 'comlink';
import type { FormState } from '../setup/formModel';
import type { SetupApi } from './types';
import { derive, type DeriveSettings } from '../store/caseSlice';

const setup: Promise<SetupApi> = import('./setupApi');

const api = {
  async derive(form: FormState, settings: DeriveSettings) {
    return derive(await setup, form, settings);
  },
};

export type SetupWorkerApi = typeof api;

expose(api);
