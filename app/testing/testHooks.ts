/**
 * The one narrow, typed test hook of the workbench: browser tests may set `window.__tenuisTestHooks` before the page
 * loads (playwright's addInitScript) to force a replica's worker to fail. It reaches into nothing: the run reads it
 * once when it starts, and without it the app behaves exactly as for a user.
 */
export interface TenuisTestHooks {
  /** Terminates replica `stream`'s worker `afterMs` milliseconds after it first reports sampling, as if it had crashed. */
  readonly failReplica?: { readonly stream: number; readonly afterMs: number };
}

declare global {
  interface Window {
    __tenuisTestHooks?: TenuisTestHooks;
  }
}

export function readTestHooks(): TenuisTestHooks {
  return typeof window !== 'undefined' && window.__tenuisTestHooks ? window.__tenuisTestHooks : {};
}
