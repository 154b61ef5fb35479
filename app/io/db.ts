/**
 * Work kept in the browser's IndexedDB (through idb): the set-up as last edited, finished and stopped runs, and the
 * measured speed of a replica worker. A reload restores all of it.
 */
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { FormState } from '../setup/formModel';
import { metaOf, type SavedRunMeta, type SavedRunRecord } from './savedRun';

interface TenuisDb extends DBSchema {
  runs: { key: string; value: SavedRunRecord };
  settings: { key: string; value: unknown };
}

const DB_NAME = 'tenuis-workbench';
const DB_VERSION = 1;
let dbPromise: Promise<IDBPDatabase<TenuisDb>> | null = null;

function db(): Promise<IDBPDatabase<TenuisDb>> {
  dbPromise ??= openDB<TenuisDb>(DB_NAME, DB_VERSION, {
    upgrade(d) {
      d.createObjectStore('runs', { keyPath: 'id' });
      d.createObjectStore('settings');
    },
  });
  return dbPromise;
}

export async function saveForm(form: FormState): Promise<void> {
  await (await db()).put('settings', form, 'form');
}

export async function loadForm(): Promise<FormState | undefined> {
  return (await (await db()).get('settings', 'form')) as FormState | undefined;
}

export async function saveSpeed(particleStepsPerSecond: number): Promise<void> {
  await (await db()).put('settings', particleStepsPerSecond, 'speed');
}

export async function loadSpeed(): Promise<number | undefined> {
  const v = await (await db()).get('settings', 'speed');
  return typeof v === 'number' ? v : undefined;
}

export async function putRun(record: SavedRunRecord): Promise<void> {
  await (await db()).put('runs', record);
}

export async function getRun(id: string): Promise<SavedRunRecord | undefined> {
  return (await db()).get('runs', id);
}

/** All saved runs, newest first. */
export async function listRuns(): Promise<SavedRunMeta[]> {
  const all = await (await db()).getAll('runs');
  return all.map(metaOf).sort((a, b) => b.finishedAt.localeCompare(a.finishedAt));
}

export async function renameRun(id: string, name: string): Promise<void> {
  const d = await db();
  const tx = d.transaction('runs', 'readwrite');
  const r = await tx.store.get(id);
  if (r) await tx.store.put({ ...r, name });
  await tx.done;
}

export async function deleteRun(id: string): Promise<void> {
  await (await db()).delete('runs', id);
}
