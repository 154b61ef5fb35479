// app/sweep/sweepController.ts driven by a fake run API: points run one after the other, a failed point is marked
// failed and the rest go on, stop() keeps the running point's samples and runs no more.
import { describe, expect, it } from 'vitest';
import { runSweepPoints, type SweepPointInput, type SweepRunDeps } from '../../app/sweep/sweepController';
import type { FinishedRun, RunCallbacks, RunEnd, RunHandle, RunRequest } from '../../app/bridge/types';
import type { SweepRow } from '../../engine/report/sweepRow';
import type { SweepPointRun } from '../../engine/report/sweepRow';

/** A run that ends when told to: ok with a result that names its case, or refused. */
interface FakeRun {
  readonly request: RunRequest;
  readonly callbacks: RunCallbacks;
  cancelled: boolean;
  finish(end: 'ok' | 'cancelled' | { fail: string }): void;
}

function fakePool(onStart: (run: FakeRun) => void = () => undefined) {
  const runs: FakeRun[] = [];
  const rowRuns: SweepPointRun[] = [];
  const deps: SweepRunDeps = {
    startRun(request, callbacks): RunHandle {
      let resolve!: (e: RunEnd) => void;
      const done = new Promise<RunEnd>((r) => (resolve = r));
      const run: FakeRun = {
        request,
        callbacks,
        cancelled: false,
        finish(end) {
          if (typeof end === 'object') return resolve({ ok: false, message: end.fail });
          const name = (request.caseInput as { name: string }).name;
          const finished = {
            result: { name } as never,
            comparison: { recognised: false, reason: 'fake' },
            performance: { wallSeconds: 1, particleSteps: 1, particleStepsPerSecond: 1 },
            cancelled: end === 'cancelled',
          } as unknown as FinishedRun;
          resolve({ ok: true, run: finished });
        },
      };
      runs.push(run);
      onStart(run);
      return {
        done,
        pause() {},
        resume() {},
        cancel() {
          run.cancelled = true;
        },
      };
    },
    // The row as the engine makes it, with the result's case name standing in for the summary.
    rowOf(point, value, run): SweepRow {
      rowRuns.push(run);
      if (run.kind !== 'sampled')
        return { point, value, status: run.kind === 'failed' ? 'failed' : 'interrupted', summary: null };
      return {
        point,
        value,
        status: run.interrupted ? 'interrupted' : 'complete',
        summary: { caseName: (run.result as unknown as { name: string }).name } as never,
      };
    },
  };
  return { runs, rowRuns, deps };
}

const points: SweepPointInput[] = [1, 2, 3].map((k) => ({
  point: k,
  value: 0.1 * 10 ** (k - 1),
  caseInput: { name: `case ${k}` },
  caseName: `case ${k}`,
}));
const tick = () => new Promise((r) => setTimeout(r, 0));

function recorder() {
  const events: string[] = [];
  const failures: Record<number, string> = {};
  return {
    events,
    failures,
    listener: {
      onPointStart: (i: number, n: number) => events.push(`start ${i + 1}/${n}`),
      onPointProgress: () => events.push('progress'),
      onRow: (r: SweepRow, failure?: string) => {
        events.push(`row ${r.point} ${r.status}`);
        if (failure) failures[r.point] = failure;
      },
      onNotice: (t: string) => events.push(`notice ${t}`),
    },
  };
}

describe('runSweepPoints()', () => {
  it("runs the points one after the other, each with its own case and the sweep's replicas, and makes each row with rowOf", async () => {
    const pool = fakePool((run) => setTimeout(() => run.finish('ok'), 0));
    const rec = recorder();
    const h = runSweepPoints(points, { replicas: 3, liveEveryMs: 5000 }, pool.deps, rec.listener);
    const end = await h.done;
    expect(pool.runs.map((r) => [(r.request.caseInput as { name: string }).name, r.request.replicas])).toEqual([
      ['case 1', 3],
      ['case 2', 3],
      ['case 3', 3],
    ]);
    expect(rec.events).toEqual([
      'start 1/3',
      'row 1 complete',
      'start 2/3',
      'row 2 complete',
      'start 3/3',
      'row 3 complete',
    ]);
    expect(end.stopped).toBe(false);
    expect(end.rows.map((r) => [r.point, r.value, r.summary?.caseName])).toEqual([
      [1, 0.1, 'case 1'],
      [2, 1, 'case 2'],
      [3, 10, 'case 3'],
    ]);
    expect(pool.rowRuns.every((r) => r.kind === 'sampled' && !r.interrupted && r.caseName.startsWith('case '))).toBe(
      true,
    );
  });

  it('starts a point only when the one before has ended', async () => {
    const pool = fakePool();
    const h = runSweepPoints(points, { replicas: 1, liveEveryMs: 5000 }, pool.deps, recorder().listener);
    await tick();
    expect(pool.runs).toHaveLength(1);
    pool.runs[0].finish('ok');
    await tick();
    expect(pool.runs).toHaveLength(2);
    pool.runs[1].finish('ok');
    await tick();
    pool.runs[2].finish('ok');
    expect((await h.done).rows).toHaveLength(3);
  });

  it('a point that fails (refused, or throwing) is marked failed with its reason and the next points still run', async () => {
    let started = 0;
    const pool = fakePool((run) => {
      started++;
      setTimeout(() => run.finish(started === 2 ? { fail: 'no replica sampled anything: replica 0 lost' } : 'ok'), 0);
    });
    const rec = recorder();
    const end = await runSweepPoints(points, { replicas: 1, liveEveryMs: 5000 }, pool.deps, rec.listener).done;
    expect(end.rows.map((r) => r.status)).toEqual(['complete', 'failed', 'complete']);
    expect(end.rows[1].summary).toBeNull();
    expect(rec.failures).toEqual({ 2: 'no replica sampled anything: replica 0 lost' });

    const throwing = fakePool((run) => setTimeout(() => run.finish('ok'), 0));
    const start = throwing.deps.startRun;
    let calls = 0;
    throwing.deps.startRun = (req, cb) => {
      if (++calls === 1) throw new Error('worker could not start');
      return start(req, cb);
    };
    const rec2 = recorder();
    const end2 = await runSweepPoints(points, { replicas: 1, liveEveryMs: 5000 }, throwing.deps, rec2.listener).done;
    expect(end2.rows.map((r) => r.status)).toEqual(['failed', 'complete', 'complete']);
    expect(rec2.failures[1]).toBe('worker could not start');
  });

  it('stop() cancels the running point, keeps its samples as an interrupted row and runs no further point', async () => {
    const pool = fakePool();
    const rec = recorder();
    const h = runSweepPoints(points, { replicas: 1, liveEveryMs: 5000 }, pool.deps, rec.listener);
    await tick();
    pool.runs[0].finish('ok');
    await tick();
    pool.runs[1].callbacks.onProgress({ fraction: 0.5 } as never);
    h.stop();
    expect(pool.runs[1].cancelled).toBe(true);
    pool.runs[1].finish('cancelled'); // the pool merges what was sampled and reports the run as cancelled
    const end = await h.done;
    expect(end.stopped).toBe(true);
    expect(pool.runs).toHaveLength(2);
    expect(end.rows.map((r) => [r.point, r.status, r.summary?.caseName])).toEqual([
      [1, 'complete', 'case 1'],
      [2, 'interrupted', 'case 2'],
    ]);
    expect(rec.events).toEqual(['start 1/3', 'row 1 complete', 'start 2/3', 'progress', 'row 2 interrupted']);
  });

  it('a point stopped before anything was sampled gets an interrupted row without a summary (as tenuis sweep writes it)', async () => {
    const pool = fakePool();
    const h = runSweepPoints(points, { replicas: 1, liveEveryMs: 5000 }, pool.deps, recorder().listener);
    await tick();
    h.stop();
    pool.runs[0].finish({ fail: 'no replica sampled anything' });
    const end = await h.done;
    expect(end.rows).toEqual([{ point: 1, value: 0.1, status: 'interrupted', summary: null }]);
    expect(pool.rowRuns).toEqual([{ kind: 'nothingSampled' }]);
  });
});
