/** Node worker_threads entry (built to dist-cli/replica.node.mjs): one replica behind comlink's Node adapter. */
import { parentPort } from 'node:worker_threads';
import { expose } from 'comlink';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import { createReplicaApi } from './replicaCore';

if (!parentPort) throw new Error('replica.node.mjs must run as a worker thread');
expose(createReplicaApi(), nodeEndpoint(parentPort));
