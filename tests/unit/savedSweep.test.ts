// Saved sweeps (app/sweep/savedSweep.ts, app/sweep/sweepRecord.ts) and the database upgrade (app/io/dbUpgrade.ts):
// the record a sweep is kept as, how a record reads back into the Sweep view, how an interrupted one is told, and
// an upgrade from the first database version that adds the sweeps store and keeps the saved runs.
import { describe, expect, it } from 'vitest';
import {
  STORES_BY_VERSION,
  upgradeWorkbenchDb,
  WORKBENCH_DB_VERSION,
  type StoreSpec,
  type UpgradableDb,
} from '../../app/io/dbUpgrade';
import {
  isSavedSweepRecord,
  sweepMetaOf,
  sweepStanding,
  sweepStandingText,
  type SweepPlanOutline,
} from '../../app/sweep/savedSweep';
import { defaultSweepName, newSweepRecord, pointEndedPatch, shownSweepOf } from '../../app/sweep/sweepRecord';
import type { SweepFormState } from '../../app/sweep/sweepForm';
import type { SweepRow } from '../../engine/report/sweepRow';

/** A database as the upgrade sees it: named stores, each with its records, and a log of what was created. */
function fakeDb(
  stores: Record<string, Record<string, unknown>>,
): UpgradableDb & { created: StoreSpec[]; stores: typeof stores } {
  const created: StoreSpec[] = [];
  return {
    created,
    stores,
    hasStore: (name) => Object.hasOwn(stores, name),
    createStore: (spec) => {
      if (Object.hasOwn(stores, spec.name)) throw new Error(`store ${spec.name} exists`);
      created.push(spec);
      stores[spec.name] = {};
    },
  };
}

describe('upgradeWorkbenchDb()', () => {
  it('is at version 2: version 1 had runs and settings, version 2 adds sweeps keyed by id', () => {
    expect(WORKBENCH_DB_VERSION).toBe(2);
    expect(STORES_BY_VERSION).toEqual([
      [{ name: 'runs', keyPath: 'id' }, { name: 'settings' }],
      [{ name: 'sweeps', keyPath: 'id' }],
    ]);
  });

  it('creates every store in a new database', () => {
    const db = fakeDb({});
    expect(upgradeWorkbenchDb(db, 0)).toEqual(['runs', 'settings', 'sweeps']);
    expect(db.created).toEqual([
      { name: 'runs', keyPath: 'id' },
      { name: 'settings' },
      { name: 'sweeps', keyPath: 'id' },
    ]);
  });

  it('from version 1 adds only the sweeps store; the saved run and the settings are untouched', () => {
    const run = { id: 'run-1', name: 'damping gap', samples: new ArrayBuffer(16) };
    const db = fakeDb({ runs: { 'run-1': run }, settings: { speed: 2.5e6 } });
    expect(upgradeWorkbenchDb(db, 1)).toEqual(['sweeps']);
    expect(db.stores.runs['run-1']).toBe(run);
    expect(db.stores.settings).toEqual({ speed: 2.5e6 });
    expect(Object.keys(db.stores).sort()).toEqual(['runs', 'settings', 'sweeps']);
  });

  it('never creates a store that is there already, and does nothing at the current version', () => {
    const db = fakeDb({ runs: {}, settings: {}, sweeps: { s: {} } });
    expect(upgradeWorkbenchDb(db, 1)).toEqual([]);
    expect(upgradeWorkbenchDb(fakeDb({ runs: {}, settings: {}, sweeps: {} }), WORKBENCH_DB_VERSION)).toEqual([]);
    expect(db.stores.sweeps).toEqual({ s: {} });
  });
});

const form: SweepFormState = {
  parameter: 'knudsen',
  fromText: '1',
  toText: ' 10',
  pressureUnit: 'Pa',
  pointsText: '3',
  spacing: 'log',
  quantity: 'flow.massFlowRate',
};
const plan: SweepPlanOutline = {
  caseName: 'tube',
  planar: false,
  hasFlow: true,
  pointCount: 3,
  quantities: [
    { key: 'flow.massFlowRate', label: 'massFlowRate', unit: 'kg/s' },
    { key: 'flow.conductance', label: 'conductance', unit: 'm^3/s' },
  ],
};
const request = { parameter: 'knudsen', from: 1, to: 10, points: 3, spacing: 'log' } as const;
const row = (point: number, status: SweepRow['status'], mean: number | null): SweepRow => ({
  point,
  value: 10 ** ((point - 1) / 2),
  status,
  summary:
    mean === null
      ? null
      : ({
          reference: { knudsen: point },
          flow: { massFlowRate: { mean, ci95: mean / 10 } },
          walls: {},
          continuum: { freeMolecular: { 'flow.massFlowRate': 2 * mean } },
        } as unknown as SweepRow['summary']),
});

function started() {
  // The store's state object is passed as the form: only the form's fields may be kept.
  const storeState = { ...form, rows: [], setForm: () => undefined } as unknown as SweepFormState;
  return newSweepRecord({
    id: 'sweep-1',
    now: '2026-12-02T08:00:00.000Z',
    form: storeState,
    baseCase: { name: 'tube', gas: { species: 'N2' } },
    request,
    plan,
    replicas: 2,
  });
}

describe('the saved sweep record', () => {
  it('starts running with no point ended, the request, the form texts alone, the plan outline and a descriptive name', () => {
    const r = started();
    expect(r).toEqual({
      id: 'sweep-1',
      name: 'tube: Kn 1–10, 3 points (log)',
      startedAt: '2026-12-02T08:00:00.000Z',
      updatedAt: '2026-12-02T08:00:00.000Z',
      caseName: 'tube',
      parameter: 'knudsen',
      status: 'running',
      pointsDone: 0,
      pointCount: 3,
      failedPoints: 0,
      replicas: 2,
      baseCase: { name: 'tube', gas: { species: 'N2' } },
      request,
      form,
      plan,
      rows: [],
      failures: {},
      curves: null,
      notices: [],
    });
    expect(isSavedSweepRecord(r)).toBe(true);
    expect(sweepMetaOf(r)).toEqual({
      id: 'sweep-1',
      name: r.name,
      startedAt: r.startedAt,
      updatedAt: r.updatedAt,
      caseName: 'tube',
      parameter: 'knudsen',
      status: 'running',
      pointsDone: 0,
      pointCount: 3,
      failedPoints: 0,
      replicas: 2,
    });
  });

  it('names pressure sweeps with their unit', () => {
    expect(
      defaultSweepName('channel', {
        ...form,
        parameter: 'pressure',
        fromText: '20',
        toText: '80',
        pressureUnit: 'mbar',
        pointsText: '1',
        spacing: 'linear',
      }),
    ).toBe('channel: pressure 20–80 mbar, 1 point (linear)');
  });

  it('holds plain data: a structured clone (what IndexedDB stores) is equal, NaN in the curves included', () => {
    const r = {
      ...started(),
      ...pointEndedPatch([row(1, 'complete', 3e-9)], {}, '2026-12-02T08:00:05.000Z'),
      curves: {
        problem: 'duct',
        values: [1, 10],
        curves: { 'flow.massFlowRate': { freeMolecular: [1e-9, NaN] } },
        units: { 'flow.massFlowRate': 'kg/s' },
      },
    } as const;
    const clone = structuredClone(r);
    expect(clone).toEqual(r);
    expect(Number.isNaN(clone.curves.curves['flow.massFlowRate'].freeMolecular[1])).toBe(true);
  });

  it('counts the ended and failed points from the rows as each point ends', () => {
    const rows = [row(1, 'complete', 3e-9), row(2, 'failed', null)];
    expect(pointEndedPatch(rows, { 2: 'worker lost' }, 't')).toEqual({
      rows,
      failures: { 2: 'worker lost' },
      pointsDone: 2,
      failedPoints: 1,
      updatedAt: 't',
    });
  });

  it('refuses what is not a saved sweep', () => {
    expect(isSavedSweepRecord(null)).toBe(false);
    expect(
      isSavedSweepRecord({
        id: 'x',
        name: 'x',
        startedAt: 't',
        status: 'paused',
        rows: [],
        request: {},
        plan: { quantities: [] },
        form: {},
      }),
    ).toBe(false);
    const { rows: _rows, ...noRows } = started();
    expect(isSavedSweepRecord(noRows)).toBe(false);
  });
});

describe('how a saved sweep stands', () => {
  const meta = (status: 'running' | 'finished' | 'stopped', pointsDone: number, failedPoints = 0) => ({
    ...sweepMetaOf(started()),
    status,
    pointsDone,
    failedPoints,
  });

  it('a running record is running only in the page that runs it; elsewhere it was interrupted at the point after its last row', () => {
    expect(sweepStanding(meta('running', 1), 'sweep-1')).toEqual({ kind: 'running' });
    expect(sweepStanding(meta('running', 1), null)).toEqual({ kind: 'interrupted', atPoint: 2 });
    expect(sweepStanding(meta('running', 0), 'sweep-other')).toEqual({ kind: 'interrupted', atPoint: 1 });
    // Every point ended, only the sweep's end was not written.
    expect(sweepStanding(meta('running', 3), null)).toEqual({ kind: 'finished' });
    expect(sweepStanding(meta('stopped', 1), null)).toEqual({ kind: 'stopped' });
  });

  it('is told in the list with the points done and failed', () => {
    expect(sweepStandingText(meta('running', 1), 'sweep-1')).toBe('running, 1 of 3 points done');
    expect(sweepStandingText(meta('running', 1), null)).toBe('interrupted at point 2 of 3 (1 finished point kept)');
    expect(sweepStandingText(meta('running', 2, 1), null)).toBe(
      'interrupted at point 3 of 3 (2 finished points kept, 1 failed)',
    );
    expect(sweepStandingText(meta('finished', 3, 1), null)).toBe('finished, 3 of 3 points, 1 failed');
    expect(sweepStandingText(meta('stopped', 2), null)).toBe('stopped after 2 of 3 points');
  });
});

describe('shownSweepOf()', () => {
  it('gives the view the same rows, failures, curves, request, case and form texts', () => {
    const rows = [row(1, 'complete', 3e-9), row(2, 'failed', null), row(3, 'complete', 5e-9)];
    const r = {
      ...started(),
      ...pointEndedPatch(rows, { 2: 'no replica sampled' }, 't'),
      status: 'finished' as const,
      curves: { reason: 'no model' },
      notices: ['point 2: replica 0 stopped'],
    };
    const shown = shownSweepOf(r);
    expect(shown.form).toEqual(form);
    expect(shown.run).toEqual({
      status: 'finished',
      planned: plan,
      savedId: 'sweep-1',
      request,
      baseCase: r.baseCase,
      rows,
      failures: { 2: 'no replica sampled' },
      current: null,
      curves: { reason: 'no model' },
      error: null,
      notices: ['point 2: replica 0 stopped'],
    });
    expect(shown.run.rows[0].summary).toBe(rows[0].summary);
  });

  it('shows a record left running as interrupted, and a stopped one as stopped', () => {
    const r = { ...started(), ...pointEndedPatch([row(1, 'complete', 3e-9)], {}, 't') };
    expect(shownSweepOf(r).run.status).toBe('interrupted');
    expect(shownSweepOf({ ...r, status: 'stopped' }).run.status).toBe('stopped');
    expect(
      shownSweepOf({
        ...r,
        ...pointEndedPatch([row(1, 'complete', 1), row(2, 'complete', 1), row(3, 'complete', 1)], {}, 't'),
      }).run.status,
    ).toBe('finished');
  });

  it('falls back to the first quantity of the plan when the saved one is not among them', () => {
    expect(shownSweepOf({ ...started(), form: { ...form, quantity: 'walls.top.shearStress' } }).form.quantity).toBe(
      'flow.massFlowRate',
    );
  });
});
