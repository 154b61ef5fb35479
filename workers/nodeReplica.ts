/**
 * Node replicas on worker_threads (used by the command line). The worker entry is the built
 * dist-cli/replica.node.mjs next to the bundle that imports this module (Node 20 cannot run .ts in a worker).
 */
import { Worker } from 'node:worker_threads';
import { wrap } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import type { ReplicaApi } from './protocol';
import type { ReplicaFactory, ReplicaHandle } from './replicaPool';

export function nodeReplicaFactory(
  workerUrl: URL = new URL('./replica.node.mjs', import.meta.url),
  /** Sees each worker as it starts (diagnostics, and the fault tests that kill one). */
  onWorker?: (worker: Worker, stream: number) => void,
): ReplicaFactory {
  return (stream: number): ReplicaHandle => {
    const worker = new Worker(workerUrl);
    onWorker?.(worker, stream);
    const listeners: ((reason: string) => void)[] = [];
    let failed = false;
    let terminating = false;
    const fail = (reason: string) => {
      if (failed || terminating) return;
      failed = true;
      for (const l of listeners) l(reason);
    };
    worker.on('error', (e) => fail(`worker error: ${e.message}`));
    worker.on('exit', (code) => fail(`worker exited with code ${code}`));
    return {
      api: wrap<ReplicaApi>(nodeEndpoint(worker)),
      onFailure: (l) => listeners.push(l),
      terminate: () => {
        terminating = true;
        void worker.terminate();
      },
    };
  };
}
