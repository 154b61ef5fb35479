/**
 * Starts and stops the browser's sweep, outside React: reads the form, loads the run chunk, plans every point (as
 * `tenuis sweep` does before running anything), runs them through sweepController.ts and feeds the sweep store
 * (progress at most five times a second). Starts from the set-up's current valid case and the replica count of
 * the Run panel; the app store's run state is left alone, so single runs go on as before. The sweep is saved in
 * IndexedDB as it starts and as each point ends (savedSweeps.ts), so a reload keeps its finished points.
 */
import { loadRunApi } from '../bridge/loadEngine';
import type { RunProgressView } from '../bridge/runApi';
import type { SweepContinuumCurves } from '../../engine/report/sweepCurves';
import { runSweepPoints, type SweepHandle } from './sweepController';
import { readTestHooks } from '../testing/testHooks';
import { appStore } from '../store/appStore';
import { initialSweepRun, sweepStore, SWEEP_BUSY } from './sweepStore';
import { readSweepForm } from './sweepForm';
import { keepSweep, newSweepId, type SweepKeeper } from './savedSweeps';
import { newSweepRecord, pointEndedPatch } from './sweepRecord';

const PROGRESS_EVERY_MS = 200;
/** Live views of a point are not shown; their snapshots still guard against a lost worker. */
const LIVE_EVERY_MS = 5_000;

let active: SweepHandle | null = null;

export { SWEEP_BUSY };

const now = () => new Date().toISOString();

/** Progress updates, at most one per PROGRESS_EVERY_MS, the last one always delivered. */
function throttled(apply: (p: RunProgressView) => void): { push(p: RunProgressView): void; cancel(): void } {
  let last = 0;
  let timer: ReturnType<typeof setTimeout> | null = null;
  let pending: RunProgressView | null = null;
  const flush = () => {
    timer = null;
    last = performance.now();
    if (pending) apply(pending);
    pending = null;
  };
  return {
    push: (p) => {
      pending = p;
      if (timer) return;
      const wait = PROGRESS_EVERY_MS - (performance.now() - last);
      if (wait <= 0) flush();
      else timer = setTimeout(flush, wait);
    },
    cancel: () => {
      if (timer) clearTimeout(timer);
      timer = null;
      pending = null;
    },
  };
}

export async function startSweep(): Promise<void> {
  const form = sweepStore.getState();
  const caseInput = appStore.getState().derived?.caseInput;
  if (!caseInput || active || SWEEP_BUSY.includes(form.status)) return;
  const set = form.setRun;
  set({ ...initialSweepRun, status: 'planning' });
  let keeper: SweepKeeper | null = null;
  try {
    const api = await loadRunApi();
    const read = readSweepForm(form, api.convertToSI);
    if (!read.ok) {
      set({ status: 'idle', error: Object.values(read.errors).join('; ') });
      return;
    }
    const request = read.request;
    const planned = api.planSweep(caseInput, request);
    if (!planned.ok) {
      set({ status: 'idle', error: planned.message });
      return;
    }
    const s = sweepStore.getState();
    if (!planned.quantities.some((q) => q.key === s.quantity))
      s.setForm({ quantity: planned.quantities[0]?.key ?? '' });
    const plan = {
      caseName: planned.caseName,
      planar: planned.planar,
      hasFlow: planned.hasFlow,
      quantities: planned.quantities,
      pointCount: planned.points.length,
    };
    const id = newSweepId();
    const replicas = appStore.getState().replicas;
    const kept = keepSweep(
      newSweepRecord({ id, now: now(), form: sweepStore.getState(), baseCase: caseInput, request, plan, replicas }),
    );
    keeper = kept;
    set({
      status: 'running',
      planned: plan,
      savedId: id,
      request,
      baseCase: caseInput,
      current: { index: 0, count: planned.points.length, progress: null },
    });
    // The curves are evaluated a few values per macrotask, beside the first point's run.
    const withCurves = (curves: SweepContinuumCurves | { reason: string }) => {
      kept.update({ curves });
      if (sweepStore.getState().request === request) set({ curves });
    };
    api
      .sweepCurves(planned.caseData, request, planned.points)
      .then(withCurves, (e: Error) => withCurves({ reason: e.message }));
    const progress = throttled((p) => {
      const c = sweepStore.getState().current;
      if (c) set({ current: { ...c, progress: p } });
    });
    const handle = runSweepPoints(
      planned.points,
      { replicas, liveEveryMs: LIVE_EVERY_MS, hooks: readTestHooks() },
      { startRun: api.startRun, rowOf: api.sweepRowOf },
      {
        onPointStart: (index, count) => {
          progress.cancel();
          set({ current: { index, count, progress: null } });
        },
        onPointProgress: progress.push,
        onRow: (row, failure) => {
          const st = sweepStore.getState();
          const rows = [...st.rows, row];
          const failures = failure ? { ...st.failures, [row.point]: failure } : st.failures;
          set({ rows, failures });
          kept.update(pointEndedPatch(rows, failures, now()));
        },
        onNotice: (text) => {
          const notices = [...sweepStore.getState().notices, text];
          set({ notices });
          kept.update({ notices });
        },
      },
    );
    active = handle;
    const end = await handle.done;
    progress.cancel();
    const status = end.stopped ? 'stopped' : 'finished';
    set({ status, current: null });
    kept.update({ status, updatedAt: now() });
  } catch (e) {
    set({ status: 'idle', current: null, error: (e as Error).message });
    // What ended so far stays saved, as after Stop.
    keeper?.update({ status: 'stopped', updatedAt: now() });
  } finally {
    active = null;
  }
}

/** Stops the running point (its samples are kept, its row marked interrupted) and runs no further point. */
export function stopSweep(): void {
  if (!active || sweepStore.getState().status !== 'running') return;
  active.stop();
  sweepStore.getState().setRun({ status: 'stopping' });
}
