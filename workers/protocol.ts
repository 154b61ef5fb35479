/**
 * Wire types between the main thread (browser page or command line) and a replica worker. Types only: nothing here
 * runs, so the app can import it without pulling the engine into its bundle.
 *
 * A replica is one independent simulation of a case on its own random stream. Results cross the thread boundary as
 * one ArrayBuffer in the sample-file format (engine/io/sampleFile.ts), transferred, not copied.
 */

import type { Case } from '../engine/case/schema';

export interface ReplicaStartRequest {
  /**
   * The case as validated on the main thread (plain data, structured-cloned): the worker plans it again, since a
   * plan holds more than it is worth sending, but does not validate it again.
   */
  readonly caseData: Case;
  /** Replica number: selects the random stream, so replicas of one seed are independent. */
  readonly stream: number;
  /** Sampling steps to run, overriding the plan's (e.g. a step budget when a precision target decides the end). */
  readonly sampleSteps?: number;
  /** Target wall time of one uninterrupted chunk of steps (ms); controls how quickly pause and cancel act. */
  readonly chunkMilliseconds?: number;
  /** Minimum interval between progress reports (ms). */
  readonly progressMilliseconds?: number;
}

export type ReplicaPhase = 'transient' | 'sampling';

export interface ReplicaProgress {
  readonly stream: number;
  readonly phase: ReplicaPhase;
  readonly stepsDone: number;
  readonly totalSteps: number;
  readonly particleSteps: number;
  readonly elapsedSeconds: number;
}

export type ReplicaEnd = 'completed' | 'cancelled';

export interface ReplicaOutcome {
  readonly stream: number;
  readonly end: ReplicaEnd;
  readonly stepsDone: number;
  readonly wallSeconds: number;
  readonly particleSteps: number;
  /** Everything sampled, as a sample file (transferred). */
  readonly samples: ArrayBuffer;
}

/** The narrow facade a replica worker exposes. */
export interface ReplicaApi {
  start(request: ReplicaStartRequest, onProgress: (p: ReplicaProgress) => void): Promise<ReplicaOutcome>;
  pause(): void;
  resume(): void;
  /** Stops after the current chunk; start() then resolves with end = 'cancelled' and all samples so far. */
  cancel(): void;
  /** Everything sampled so far, without stopping (transferred). */
  snapshot(): Promise<ArrayBuffer>;
}
