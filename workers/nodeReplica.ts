/**
 * Node replicas on worker_threads (used by the command line). The worker entry is the built
 * dist-cli/replica.node.mjs next to the bundle that imports this module (Node 20 cannot run .ts in a worker).
 */
import { Worker } from 'node:worker_threads';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { wrap } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import type { ReplicaApi } from './protocol';
import type { ReplicaFactory, ReplicaHandle } from './replicaPool';

/**
 * The built worker entry: next to this module when the bundler inlined it into an entry file, one folder up when it
 * went into a shared chunk (dist-cli/chunks/).
 */
function defaultWorkerUrl(): URL {
  const candidates = [new URL('./replica.node.mjs', import.meta.url), new URL('../replica.node.mjs', import.meta.url)];
  return candidates.find((u) => existsSync(fileURLToPath(u))) ?? candidates[0];
}

export function nodeReplicaFactory(
  workerUrl: URL = defaultWorkerUrl(),
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
