/**
 * Derives and plans the set-up off the page's thread (bridge/setup.worker.ts), so that typing a large case never
 * holds the page: changes within DEBOUNCE_MS of each other are planned once, for the last one; a change that comes
 * while a plan is still being worked out ends that worker (a plan of millions of cells can take a minute, and its
 * answer would be stale) and starts a fresh one. Each call resolves with its answer, or null when a later change
 * superseded it.
 */
import { wrap, type Remote } from 'comlink';
import type { SetupWorkerApi } from '../bridge/setup.worker';
import type { Derived, DeriveSettings } from '../store/caseSlice';
import type { FormState } from './formModel';

/** Quiet time after a keystroke before planning starts, ms: below what a typist notices, above a key repeat. */
export const DEBOUNCE_MS = 150;
/** A plan still being worked out after this long (ms) is ended when a newer change comes: it may take a minute. */
const REPLACE_AFTER_MS = 1000;

interface Pending {
  readonly form: FormState;
  readonly settings: DeriveSettings;
  readonly resolve: (d: Derived | null) => void;
  readonly reject: (e: Error) => void;
}

export function createWorkerPlanner(): (form: FormState, settings: DeriveSettings) => Promise<Derived | null> {
  let worker: Worker | null = null;
  let remote: Remote<SetupWorkerApi> | null = null;
  let busy = false;
  let busySinceMs = 0;
  let waiting: Pending | null = null;
  let timer: ReturnType<typeof setTimeout> | null = null;

  const start = () => {
    worker = new Worker(new URL('../bridge/setup.worker.ts', import.meta.url), { type: 'module', name: 'set-up' });
    remote = wrap<SetupWorkerApi>(worker);
  };
  const stop = () => {
    worker?.terminate();
    worker = null;
    remote = null;
    busy = false;
  };
  const run = () => {
    timer = null;
    const job = waiting;
    waiting = null;
    if (!job) return;
    if (busy && performance.now() - busySinceMs < REPLACE_AFTER_MS) {
      // A young plan is let finish (a fresh worker costs loading the set-up chunk again); this job follows it.
      waiting = job;
      timer = setTimeout(run, DEBOUNCE_MS);
      return;
    }
    if (busy) stop();
    if (!remote) start();
    busy = true;
    busySinceMs = performance.now();
    const mine = worker;
    remote!.derive(job.form, job.settings).then(
      (d) => {
        if (worker !== mine) return; // superseded: the worker was replaced and this answer is stale
        busy = false;
        job.resolve(waiting ? null : d);
      },
      (e: Error) => {
        if (worker !== mine) return;
        busy = false;
        if (waiting) job.resolve(null);
        else job.reject(e);
      },
    );
  };
  return (form, settings) =>
    new Promise<Derived | null>((resolve, reject) => {
      waiting?.resolve(null);
      waiting = { form, settings, resolve, reject };
      if (timer) clearTimeout(timer);
      timer = setTimeout(run, DEBOUNCE_MS);
    });
}
