/**
 * Browser replicas on Web Workers (module workers bundled by Vite). Load this module lazily (dynamic import): it
 * brings the pool, and so the merge code of the engine, into a chunk of its own rather than the page's main bundle.
 */
import { wrap } from 'comlink';
import type { ReplicaApi } from './protocol';
import type { ReplicaFactory, ReplicaHandle } from './replicaPool';

/** One replica per logical core by default, at least one. */
export function defaultReplicaCount(): number {
  return Math.max(1, navigator.hardwareConcurrency || 1);
}

export function browserReplicaFactory(): ReplicaFactory {
  return (): ReplicaHandle => {
    const worker = new Worker(new URL('./replica.worker.ts', import.meta.url), {
      type: 'module',
      name: 'tenuis-replica',
    });
    const listeners: ((reason: string) => void)[] = [];
    let done = false;
    const fail = (reason: string) => {
      if (done) return;
      done = true;
      for (const l of listeners) l(reason);
    };
    worker.addEventListener('error', (e) => fail(`worker error: ${e.message || 'the worker script failed'}`));
    worker.addEventListener('messageerror', () => fail('worker message could not be read'));
    return {
      api: wrap<ReplicaApi>(worker),
      onFailure: (l) => listeners.push(l),
      terminate: () => {
        done = true;
        worker.terminate();
      },
    };
  };
}
