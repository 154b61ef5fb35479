/**
 * Drives a simulation through its transient and sampling steps in chunks of about `targetChunkMs` of work, yielding
 * to the event loop between chunks so that Ctrl-C (SIGINT) and progress output are handled while it runs. Used by the
 * run pipeline (runCase.ts) for a replica run on the calling thread (the command line's single replica, which can
 * keep checkpoints); environment-neutral, so it lives beside the worker code rather than in cli/.
 */
import { advance, isFinished, nextChunk, type Simulation } from '../engine/run/simulation';

export interface ChunkOptions {
  /** Wall-clock work per chunk, ms (default 250). */
  readonly targetChunkMs?: number;
  readonly now?: () => number;
  readonly onProgress?: (stepsDone: number) => void;
  /** Chunks also end at every multiple of this many steps (e.g. so a checkpoint is due exactly there). */
  readonly breakEvery?: number;
  /** Checked between chunks; true stops the run early. */
  readonly shouldStop?: () => boolean;
}

export interface ChunkOutcome {
  readonly completed: boolean;
  readonly stepsDone: number;
  readonly wallSeconds: number;
}

// setImmediate where there is one (Node: no 1 ms timer clamp between chunks), a zero timeout elsewhere.
const yieldToEventLoop = () =>
  new Promise<void>((resolve) => (typeof setImmediate === 'function' ? setImmediate(resolve) : setTimeout(resolve, 0)));

/** Advances `sim` through its transient and sampling steps (isFinished), or until shouldStop() says so. */
export async function advanceInChunks(sim: Simulation, o: ChunkOptions = {}): Promise<ChunkOutcome> {
  const now = o.now ?? (() => performance.now());
  const target = o.targetChunkMs ?? 250;
  const start = now();
  let done = sim.state.step; // a resumed simulation continues where it stopped
  let chunk = 1; // grows to about `target` ms of work after the first few chunks
  while (!isFinished(sim)) {
    if (o.shouldStop?.()) return { completed: false, stepsDone: done, wallSeconds: (now() - start) / 1000 };
    let n = nextChunk(sim, chunk);
    if (o.breakEvery) n = Math.min(n, (Math.floor(done / o.breakEvery) + 1) * o.breakEvery - done);
    const t0 = now();
    advance(sim, n);
    const ms = now() - t0;
    done += n;
    // Aim for `target` ms per chunk; grow by at most 4× per chunk so one slow estimate cannot overshoot far.
    chunk = Math.max(1, Math.min(4 * n, Math.round((n * target) / Math.max(ms, 0.01))));
    o.onProgress?.(done);
    await yieldToEventLoop();
  }
  return { completed: true, stepsDone: done, wallSeconds: (now() - start) / 1000 };
}
