/**
 * Sweeps kept in this browser's IndexedDB, outside React: each sweep is saved as it starts and again as each point
 * ends (so a reload keeps the finished points), listed, shown again at start-up, reopened, renamed and deleted.
 */
import { loadRunApi } from '../bridge/loadEngine';
import { deleteSweep, getSweep, listSweeps, patchSweep, putSweep } from '../io/db';
import { sweepMetaOf, type SavedSweepMeta, type SavedSweepRecord } from './savedSweep';
import { shownSweepOf } from './sweepRecord';
import { initialSweepRun, sweepStore, SWEEP_BUSY as BUSY } from './sweepStore';

let counter = 0;

export function newSweepId(): string {
  counter += 1;
  return `sweep-${Date.now().toString(36)}-${counter}`;
}

function notice(text: string): void {
  const st = sweepStore.getState();
  if (!st.notices.includes(text)) st.setRun({ notices: [...st.notices, text] });
}

export async function refreshSavedSweeps(): Promise<void> {
  sweepStore.getState().setSaved(await listSweeps());
}

/**
 * Puts one sweep's new meta into the list in place (the list stays ordered by start time), without reading every
 * saved sweep back with all its rows after each point.
 */
function showMeta(meta: SavedSweepMeta | undefined): void {
  if (!meta) return;
  const st = sweepStore.getState();
  const others = st.saved.filter((m) => m.id !== meta.id);
  st.setSaved([...others, meta].sort((a, b) => b.startedAt.localeCompare(a.startedAt)));
}

export interface SweepKeeper {
  /** Saves these fields of the sweep's record (in the order given: a later point never lands before an earlier one). */
  update(patch: Partial<Omit<SavedSweepRecord, 'id'>>): void;
  /** Resolves when every write asked for so far has ended. */
  settled(): Promise<void>;
}

/** Saves a starting sweep and then each change to it; the list in the store follows every write. */
export function keepSweep(record: SavedSweepRecord): SweepKeeper {
  let warned = false;
  const failed = (e: unknown) => {
    if (warned) return;
    warned = true;
    notice(`The sweep could not be saved in this browser: ${(e as Error).message}`);
  };
  let chain = putSweep(record)
    .then(() => showMeta(sweepMetaOf(record)))
    .catch(failed);
  return {
    update(patch) {
      chain = chain
        .then(() => patchSweep(record.id, patch))
        .then(showMeta)
        .catch(failed);
    },
    settled: () => chain,
  };
}

/** Shows a saved sweep in the view (form texts included), unless a sweep has started meanwhile. */
async function show(id: string): Promise<boolean> {
  const record = await getSweep(id);
  if (!record) return false;
  // The plot names the continuum models with the run chunk's labels: load it before the plot is drawn.
  await loadRunApi().catch(() => undefined);
  const st = sweepStore.getState();
  if (BUSY.includes(st.status)) return true;
  const { form, run } = shownSweepOf(record);
  st.setForm(form);
  st.setRun(run);
  return true;
}

let restored: Promise<void> | null = null;

/** At start-up (once a page): lists the saved sweeps and shows the latest again, if the view shows nothing yet. */
export function restoreLastSweep(): Promise<void> {
  restored ??= (async () => {
    const saved = await listSweeps();
    sweepStore.getState().setSaved(saved);
    const st = sweepStore.getState();
    if (saved.length === 0 || st.status !== 'idle' || st.rows.length > 0) return;
    await show(saved[0].id);
  })().catch((e: Error) => notice(`Saved sweeps could not be read from this browser: ${e.message}`));
  return restored;
}

export async function reopenSavedSweep(id: string): Promise<void> {
  if (BUSY.includes(sweepStore.getState().status)) return;
  if (!(await show(id))) {
    notice(`Saved sweep ${id} is no longer in this browser.`);
    await refreshSavedSweeps();
  }
}

export async function renameSavedSweep(id: string, name: string): Promise<void> {
  const trimmed = name.trim();
  if (!trimmed) return;
  showMeta(await patchSweep(id, { name: trimmed }));
}

/** Deletes a saved sweep that is not running; the view stops showing it if it did. */
export async function deleteSavedSweep(id: string): Promise<void> {
  const st = sweepStore.getState();
  const shown = st.savedId === id;
  if (shown && BUSY.includes(st.status)) return;
  await deleteSweep(id);
  if (shown) sweepStore.getState().setRun(initialSweepRun);
  await refreshSavedSweeps();
}
