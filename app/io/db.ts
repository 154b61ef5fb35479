/**
 * Work kept in the browser's IndexedDB (through idb): the set-up as last edited, the units chosen for flow numbers, the
 * Long duct view's form and the coefficient tables loaded into it, finished and stopped runs, sweeps
 * (saved as each point ends), and the measured speed of a replica worker. A reload restores all of it. The stores
 * and the upgrade from older versions are in dbUpgrade.ts.
 */
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { FormState } from '../setup/formModel';
import type { LongDuctFormState } from '../longDuct/longDuctForm';
import type { CoefficientTable } from '../../engine/longDuct/coefficientTable';
import { metaOf, type SavedRunMeta, type SavedRunRecord } from '../saved/savedRun';
import { isSavedSweepRecord, sweepMetaOf, type SavedSweepMeta, type SavedSweepRecord } from '../sweep/savedSweep';
import { upgradeWorkbenchDb, WORKBENCH_DB_NAME, WORKBENCH_DB_VERSION } from './dbUpgrade';

interface TenuisDb extends DBSchema {
  runs: { key: string; value: SavedRunRecord };
  settings: { key: string; value: unknown };
  sweeps: { key: string; value: SavedSweepRecord };
}

let dbPromise: Promise<IDBPDatabase<TenuisDb>> | null = null;

function db(): Promise<IDBPDatabase<TenuisDb>> {
  dbPromise ??= openDB<TenuisDb>(WORKBENCH_DB_NAME, WORKBENCH_DB_VERSION, {
    upgrade(d, oldVersion) {
      upgradeWorkbenchDb(
        {
          hasStore: (name) => d.objectStoreNames.contains(name as 'runs'),
          createStore: (spec) =>
            void d.createObjectStore(spec.name, spec.keyPath ? { keyPath: spec.keyPath } : undefined),
        },
        oldVersion,
      );
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

/** The Long duct view's form as last edited (settings key 'longDuctForm'). */
export async function saveLongDuctForm(form: LongDuctFormState): Promise<void> {
  await (await db()).put('settings', form, 'longDuctForm');
}

export async function loadLongDuctForm(): Promise<LongDuctFormState | undefined> {
  return (await (await db()).get('settings', 'longDuctForm')) as LongDuctFormState | undefined;
}

/** Coefficient tables the user loaded (settings key 'coefficientTables'), reused on every visit. */
export async function saveCoefficientTables(tables: readonly CoefficientTable[]): Promise<void> {
  await (await db()).put('settings', [...tables], 'coefficientTables');
}

export async function loadCoefficientTables(): Promise<CoefficientTable[]> {
  const v = await (await db()).get('settings', 'coefficientTables');
  return Array.isArray(v) ? (v as CoefficientTable[]) : [];
}

/** The unit chosen for each flow number in the results card (settings key 'flowUnits'). */
export async function saveFlowUnits(units: Readonly<Record<string, string>>): Promise<void> {
  await (await db()).put('settings', { ...units }, 'flowUnits');
}

/** The saved flow units; anything but a record of strings (an older or damaged entry) counts as none. */
export async function loadFlowUnits(): Promise<Record<string, string>> {
  const v = await (await db()).get('settings', 'flowUnits');
  if (!v || typeof v !== 'object') return {};
  return Object.fromEntries(Object.entries(v).filter((e): e is [string, string] => typeof e[1] === 'string'));
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

export async function putSweep(record: SavedSweepRecord): Promise<void> {
  await (await db()).put('sweeps', record);
}

export async function getSweep(id: string): Promise<SavedSweepRecord | undefined> {
  const r = await (await db()).get('sweeps', id);
  return isSavedSweepRecord(r) ? r : undefined;
}

/**
 * Changes a saved sweep's fields in one transaction, keeping the others (a rename made while it runs survives the
 * next point's update); a sweep deleted meanwhile stays deleted (undefined). Returns what the list shows of it.
 */
export async function patchSweep(
  id: string,
  patch: Partial<Omit<SavedSweepRecord, 'id'>>,
): Promise<SavedSweepMeta | undefined> {
  const tx = (await db()).transaction('sweeps', 'readwrite');
  const r = await tx.store.get(id);
  const updated = r ? { ...r, ...patch, id } : undefined;
  if (updated) await tx.store.put(updated);
  await tx.done;
  return updated && sweepMetaOf(updated);
}

/** All saved sweeps, the latest started first. */
export async function listSweeps(): Promise<SavedSweepMeta[]> {
  const all = await (await db()).getAll('sweeps');
  return all
    .filter(isSavedSweepRecord)
    .map(sweepMetaOf)
    .sort((a, b) => b.startedAt.localeCompare(a.startedAt));
}

export async function deleteSweep(id: string): Promise<void> {
  await (await db()).delete('sweeps', id);
}
