/**
 * The workbench database's object stores by the version that added them, and the upgrade that brings an older
 * database to the current version. Pure over a minimal view of the database, so the upgrade path is unit-tested
 * without a browser: an upgrade only adds the stores of later versions; it never deletes or clears one, so runs
 * and settings saved by an older workbench are still there after it.
 */
export const WORKBENCH_DB_NAME = 'tenuis-workbench';

export interface StoreSpec {
  readonly name: 'runs' | 'settings' | 'sweeps';
  /** Records keyed by this property; without it the key is given on each put (settings). */
  readonly keyPath?: string;
}

/** Index k holds what version k + 1 added. Append a version; never change an entry that has shipped. */
export const STORES_BY_VERSION: readonly (readonly StoreSpec[])[] = [
  [{ name: 'runs', keyPath: 'id' }, { name: 'settings' }],
  [{ name: 'sweeps', keyPath: 'id' }],
];

export const WORKBENCH_DB_VERSION = STORES_BY_VERSION.length;

/** What the upgrade needs of the database: which stores it has and how to add one (nothing that removes data). */
export interface UpgradableDb {
  hasStore(name: string): boolean;
  createStore(spec: StoreSpec): void;
}

/** Adds the stores of every version after `oldVersion` (0 for a new database); returns their names. */
export function upgradeWorkbenchDb(db: UpgradableDb, oldVersion: number): string[] {
  const created: string[] = [];
  for (const spec of STORES_BY_VERSION.slice(Math.max(0, oldVersion)).flat()) {
    // Creating a store twice would throw and abort the whole upgrade.
    if (db.hasStore(spec.name)) continue;
    db.createStore(spec);
    created.push(spec.name);
  }
  return created;
}
