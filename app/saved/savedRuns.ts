/** Reopening, comparing, renaming and deleting saved runs (IndexedDB), outside React. */
import { loadRunApi } from '../bridge/loadEngine';
import { deleteRun, getRun, listRuns, renameRun } from '../io/db';
import { dropResult, getResult, putResult } from '../results/resultCache';
import type { AppStore } from '../store/store';

/** Puts a saved run's result into the cache (recomputed from its samples), unless it is there already. */
async function ensureCached(id: string): Promise<boolean> {
  const cached = getResult(id);
  if (cached?.samples) return true;
  const record = await getRun(id);
  if (!record) return false;
  const api = await loadRunApi();
  const { result, comparison } = await api.resultFromSamples(record.samples, record.runWarnings);
  putResult(id, {
    result,
    comparison,
    caseInput: record.caseInput,
    caseName: record.caseName,
    performance: record.performance,
    samples: record.samples,
  });
  return true;
}

export async function openSavedRun(store: AppStore, id: string): Promise<void> {
  if (!(await ensureCached(id))) {
    store.getState().addNotice(`Saved run ${id} is no longer in this browser.`);
    return;
  }
  const st = store.getState();
  st.showResult(id, false);
  if (st.compareId === id) st.setCompare(null);
  st.setView('results');
}

export async function compareWithSavedRun(store: AppStore, id: string | null): Promise<void> {
  if (id !== null && !(await ensureCached(id))) return;
  store.getState().setCompare(id);
}

export async function renameSavedRun(store: AppStore, id: string, name: string): Promise<void> {
  const trimmed = name.trim();
  if (!trimmed) return;
  await renameRun(id, trimmed);
  store.getState().setSavedRuns(await listRuns());
}

export async function deleteSavedRun(store: AppStore, id: string): Promise<void> {
  await deleteRun(id);
  const st = store.getState();
  if (st.resultId !== id) dropResult(id);
  st.setSavedRuns(await listRuns());
}
