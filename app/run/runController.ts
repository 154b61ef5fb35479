/**
 * Starts, pauses, resumes and stops runs, outside React: loads the run chunk, feeds progress and live results into
 * the store (progress at most five times a second), and keeps every finished or stopped run in IndexedDB. A run
 * takes the user to its result only when they are watching it (the Run view); otherwise its end is a notice.
 */
import { loadRunApi } from '../bridge/loadEngine';
import type { RunHandle, FinishedRun } from '../bridge/runApi';
import { putResult } from '../results/resultCache';
import { readTestHooks } from '../testing/testHooks';
import { targetRequestOf } from './targetSetting';
import { sweepStore } from '../sweep/sweepStore';
import { putRun, listRuns, saveSpeed } from '../io/db';
import type { SavedRunRecord } from '../saved/savedRun';
import type { AppStore } from '../store/store';
import type { CaseInput } from '../../engine/case/schema';
import { countText } from '../format';
import { runNameOf } from '../saved/runName';

const PROGRESS_EVERY_MS = 200;

/** Live views: merged snapshots about twice a second, less often for big grids (each round decodes every snapshot). */
function liveIntervalMs(cells: number): number {
  return cells <= 5_000 ? 500 : cells <= 50_000 ? 2_000 : 5_000;
}

let active: RunHandle | null = null;
let counter = 0;

function newRunId(): string {
  counter += 1;
  return `run-${Date.now().toString(36)}-${counter}`;
}

export async function startRun(store: AppStore): Promise<void> {
  const s = store.getState();
  const caseInput = s.derived?.caseInput;
  if (
    !caseInput ||
    !s.plan ||
    s.planPending ||
    active ||
    ['starting', 'running', 'paused', 'stopping'].includes(s.status)
  )
    return;
  const target = targetRequestOf(s.target, s.plan.targetPaths);
  if (!target.ok || ['planning', 'running', 'stopping'].includes(sweepStore.getState().status)) return;
  const id = newRunId();
  const caseName = String((caseInput as CaseInput).name);
  s.setRunState({ status: 'starting', progress: null, notices: [], runError: null, endNotice: null });
  s.setView('run');
  const replicas = s.replicas;
  let lastProgress = 0;
  let pendingTimer: ReturnType<typeof setTimeout> | null = null;
  let finished = false;
  try {
    const api = await loadRunApi();
    const handle = api.startRun(
      {
        caseInput,
        replicas,
        liveEveryMs: liveIntervalMs(s.plan.cellsX * s.plan.cellsY),
        target: target.request,
        stopWhenDecided: s.stopWhenDecided,
        hooks: readTestHooks(),
      },
      {
        onProgress: (p) => {
          if (finished) return;
          const now = performance.now();
          const push = () => {
            pendingTimer = null;
            lastProgress = performance.now();
            if (!finished) store.getState().setRunState({ progress: p });
          };
          if (pendingTimer) clearTimeout(pendingTimer);
          if (now - lastProgress >= PROGRESS_EVERY_MS) push();
          else pendingTimer = setTimeout(push, PROGRESS_EVERY_MS - (now - lastProgress));
        },
        onLive: (result) => {
          if (finished) return;
          putResult(id, { result, caseInput, caseName });
          const st = store.getState();
          if (st.resultId === id) st.bumpResult();
          else st.showResult(id, true);
        },
        onReplicaLost: (stream, reason) => {
          const others = replicas - 1;
          store
            .getState()
            .addNotice(
              `Replica ${stream} stopped: ${reason}. ${others > 0 ? `The other ${others} go on; its samples up to its last snapshot are kept.` : ''}`.trim(),
            );
        },
      },
    );
    active = handle;
    store.getState().setRunState({ status: 'running' });
    const end = await handle.done;
    finished = true;
    // For measurements (the browser tests' long-task window ends here): the run's work on this thread is done.
    performance.mark('tenuis-run-end');
    if (pendingTimer) clearTimeout(pendingTimer);
    // Showing the result is a task of its own, after the run's (so the mark closes the run's work exactly).
    await new Promise((resolve) => setTimeout(resolve, 0));
    if (!end.ok && end.stoppedBeforeSampling) {
      // Stopped by the user in the transient: nothing to keep, and nothing went wrong.
      const { stepsDone, simulatedTimeS } = end.stoppedBeforeSampling;
      const time = Number.isFinite(simulatedTimeS) ? `, ${simulatedTimeS.toPrecision(3)} s of simulated time` : '';
      const text = `Stopped before sampling: the transient had reached ${countText(stepsDone)} steps${time}. Nothing was sampled, so no result is kept.`;
      store.getState().setRunState({ status: 'stopped', notices: [...store.getState().notices, text] });
      if (store.getState().view !== 'run') store.getState().setRunState({ endNotice: { text, resultId: null } });
      return;
    }
    if (!end.ok) {
      store.getState().setRunState({ status: 'failed', runError: end.message });
      if (store.getState().view !== 'run')
        store.getState().setRunState({ endNotice: { text: `The run failed: ${end.message}`, resultId: null } });
      return;
    }
    await keepRun(store, id, caseInput as CaseInput, caseName, end.run, replicas);
  } catch (e) {
    finished = true;
    store.getState().setRunState({ status: 'failed', runError: (e as Error).message });
  } finally {
    active = null;
  }
}

async function keepRun(
  store: AppStore,
  id: string,
  caseInput: CaseInput,
  caseName: string,
  run: FinishedRun,
  replicas: number,
): Promise<void> {
  putResult(id, {
    result: run.result,
    caseInput,
    caseName,
    performance: run.performance,
    samples: run.samples,
    comparison: run.comparison,
  });
  const st = store.getState();
  st.setRunState({ status: run.cancelled ? 'stopped' : 'finished' });
  st.showResult(id, false);
  // Only a user watching the run is taken to its result; one editing the set-up (or elsewhere) gets a notice.
  if (st.view === 'run') st.setView('results');
  else
    st.setRunState({
      endNotice: { text: `The run of ${caseName} ${run.cancelled ? 'was stopped' : 'finished'}.`, resultId: id },
    });
  const lost = run.replicas.filter((r) => r.status === 'lost').length;
  // Named for the case as run, not for the example it may have started from (it may have been edited since).
  const title = runNameOf(caseInput, run.result.reference.knudsen, st.source.kind === 'form' ? st.presetName : '');
  const record: SavedRunRecord = {
    id,
    name: `${title} — ${new Date().toLocaleString()}`,
    finishedAt: new Date().toISOString(),
    caseName,
    status: run.cancelled ? 'stopped' : 'finished',
    replicas,
    lostReplicas: lost,
    sampledSteps: run.result.numerics.sampleSteps,
    knudsen: run.result.reference.knudsen,
    caseInput,
    samples: run.samples,
    runWarnings: run.runWarnings,
    performance: run.performance,
    replicaEnds: run.replicas,
  };
  // Speed of one worker: particle-steps over the wall time and the cores the replicas shared.
  const perWorker = run.performance.particleSteps / (run.performance.wallSeconds * Math.min(replicas, st.cores));
  if (!run.cancelled && run.performance.wallSeconds > 1 && Number.isFinite(perWorker)) {
    st.setSpeed(perWorker);
    await saveSpeed(perWorker).catch(() => undefined);
  }
  try {
    await putRun(record);
    store.getState().setSavedRuns(await listRuns());
  } catch (e) {
    store.getState().addNotice(`The run could not be saved in this browser: ${(e as Error).message}`);
  }
}

export function pauseRun(store: AppStore): void {
  if (!active || store.getState().status !== 'running') return;
  active.pause();
  store.getState().setRunState({ status: 'paused' });
}

export function resumeRun(store: AppStore): void {
  if (!active || store.getState().status !== 'paused') return;
  active.resume();
  store.getState().setRunState({ status: 'running' });
}

export function stopRun(store: AppStore): void {
  if (!active) return;
  active.cancel();
  store.getState().setRunState({ status: 'stopping' });
}
