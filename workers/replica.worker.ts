/** Browser Web Worker entry: one replica behind comlink. */
import { expose } from 'comlink';
import { createReplicaApi } from './replicaCore';

expose(createReplicaApi());
