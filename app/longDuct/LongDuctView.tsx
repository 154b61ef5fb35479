/**
 * The Long duct view: a tube or channel of any length between two pressures (or with a given mass flow, or a pump at
 * its outlet), solved in milliseconds by the long-duct model from a coefficient table of Tenuis's own DSMC — the
 * answer `tenuis duct` gives, made by the same engine functions. The form and the tables the user loads are kept in
 * IndexedDB; every edit solves again, so there is nothing to run or cancel.
 */
import { useEffect, useMemo, useState } from 'react';
import { loadLongDuctApi, setupApi } from '../bridge/loadEngine';
import type { LongDuctApi } from '../bridge/types';
import type { CoefficientTable } from '../../engine/longDuct/coefficientTable';
import type { SpeciesId } from '../../engine/gas/species';
import { QuantityField } from '../fields/QuantityField';
import { loadCoefficientTables, loadLongDuctForm, saveCoefficientTables, saveLongDuctForm } from '../io/db';
import {
  DEFAULT_LONG_DUCT_FORM,
  readLongDuctForm,
  type Entry,
  type LongDuctField,
  type LongDuctFormState,
  type LongDuctMode,
} from './longDuctForm';
import { LongDuctResults } from './LongDuctResults';

const MODES: readonly { id: LongDuctMode; label: string }[] = [
  { id: 'pressures', label: 'both end pressures' },
  { id: 'upstreamAndFlow', label: 'upstream pressure and mass flow' },
  { id: 'pump', label: 'a pump at the outlet and a gas load' },
];

function useLongDuctApi(): { api: LongDuctApi | null; failure: string | null } {
  const [api, setApi] = useState<LongDuctApi | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  useEffect(() => {
    let cancelled = false;
    loadLongDuctApi().then(
      (a) => !cancelled && setApi(a),
      (e: Error) => !cancelled && setFailure(e.message),
    );
    return () => {
      cancelled = true;
    };
  }, []);
  return { api, failure };
}

/** The form, the user's tables and their persistence; the form is saved a moment after each edit. */
function usePersistedState() {
  const [form, setForm] = useState<LongDuctFormState>(DEFAULT_LONG_DUCT_FORM);
  const [userTables, setUserTables] = useState<CoefficientTable[]>([]);
  const [restored, setRestored] = useState(false);
  useEffect(() => {
    let cancelled = false;
    Promise.all([loadLongDuctForm(), loadCoefficientTables()])
      .then(([f, t]) => {
        if (cancelled) return;
        if (f) setForm({ ...DEFAULT_LONG_DUCT_FORM, ...f });
        setUserTables(t);
      })
      .catch(() => {
        // No IndexedDB (private window): the view works, it only forgets on reload.
      })
      .finally(() => !cancelled && setRestored(true));
    return () => {
      cancelled = true;
    };
  }, []);
  useEffect(() => {
    if (!restored) return;
    const t = setTimeout(() => void saveLongDuctForm(form).catch(() => undefined), 300);
    return () => clearTimeout(t);
  }, [form, restored]);
  const changeTables = (tables: CoefficientTable[]) => {
    setUserTables(tables);
    void saveCoefficientTables(tables).catch(() => undefined);
  };
  return { form, setForm, userTables, changeTables, restored };
}

export function LongDuctView() {
  const { api, failure } = useLongDuctApi();
  const { form, setForm, userTables, changeTables } = usePersistedState();
  const [tableMessage, setTableMessage] = useState<string | null>(null);
  const setup = setupApi();
  const tables = useMemo(() => [...(api?.BUILTIN_TABLES ?? []), ...userTables], [api, userTables]);
  const shapeTables = tables.filter((t) => t.shape === form.shape);
  const table = shapeTables.find((t) => t.source === form.tableSource) ?? shapeTables[0] ?? null;
  const molecularMassKg = setup.SPECIES[form.gas].massKg;
  const read = useMemo(
    () => readLongDuctForm(form, table, (v, unit, ctx) => setup.convertToSI(v, unit, ctx), molecularMassKg),
    [form, table, setup, molecularMassKg],
  );
  const errors: Partial<Record<LongDuctField, string>> = read.ok ? read.curveErrors : read.errors;
  const edit = (patch: Partial<LongDuctFormState>) => setForm((f) => ({ ...f, ...patch }));
  const entry = (
    field: keyof LongDuctFormState & LongDuctField,
    label: string,
    kind: Parameters<typeof setup.unitsOf>[0],
    description?: string,
  ) => {
    const e = form[field] as Entry;
    return (
      <QuantityField
        id={`long-duct-${field}`}
        label={label}
        description={description}
        text={e.text}
        unit={e.unit}
        units={setup.unitsOf(kind)}
        error={errors[field]}
        onText={(text) => edit({ [field]: { ...e, text } })}
        onUnit={(unit) => edit({ [field]: { ...e, unit } })}
      />
    );
  };

  const loadTableFile = async (file: File) => {
    setTableMessage(null);
    let t: CoefficientTable;
    try {
      t = JSON.parse(await file.text()) as CoefficientTable;
    } catch (e) {
      setTableMessage(`${file.name}: not JSON (${(e as Error).message})`);
      return;
    }
    const shapeOk =
      t &&
      typeof t === 'object' &&
      (t.shape === 'tube' || t.shape === 'channel' || t.shape === 'rectangle') &&
      Array.isArray(t.points);
    const problem = shapeOk
      ? api?.tableProblem(t)
      : `${file.name}: not a coefficient table (it needs shape tube, channel or rectangle, source, gasAndWall and points); make one with tenuis coefficients`;
    if (problem) {
      setTableMessage(problem);
      return;
    }
    if (typeof t.source !== 'string' || !t.source) t = { ...t, source: file.name };
    if (typeof t.gasAndWall !== 'string') t = { ...t, gasAndWall: 'not stated' };
    changeTables([...userTables.filter((u) => u.source !== t.source), t]);
    edit({ shape: t.shape, tableSource: t.source });
    setTableMessage(`loaded ${t.points.length} points for a ${t.shape} (${t.gasAndWall})`);
  };

  if (failure)
    return (
      <p className="message message-error" role="alert">
        The long-duct part could not be loaded: {failure}
      </p>
    );
  return (
    <div className="columns">
      <div className="column">
        <section className="panel" aria-labelledby="long-duct-form-title">
          <h2 id="long-duct-form-title">Long duct</h2>
          <p className="hint">
            A tube, channel or rectangular duct much longer than its radius or gap, at any pressure ratio, from a table
            of its kinetic coefficients G_P(δ) computed by Tenuis&apos;s own DSMC (Sharipov &amp; Seleznev 1998 method).
            Shorter than about 20 radii or gaps: run the DSMC tube or channel preset instead. Results are model
            estimates; defer to local codes, standards and licensed engineering practice for vacuum vessels and
            pressurised parts.
          </p>
          <div className="field">
            <label htmlFor="long-duct-shape">shape</label>
            <div className="field-input">
              <select
                id="long-duct-shape"
                value={form.shape}
                onChange={(e) => edit({ shape: e.target.value as LongDuctFormState['shape'], tableSource: '' })}
              >
                <option value="channel">planar channel (gap H, width w)</option>
                <option value="tube">round tube (radius R)</option>
                <option value="rectangle">rectangle (height H, width W; a table of its H/W)</option>
              </select>
            </div>
          </div>
          {entry(
            'size',
            form.shape === 'tube'
              ? 'Tube radius R'
              : form.shape === 'rectangle'
                ? 'Height H (smaller side)'
                : 'Channel gap H',
            'length',
          )}
          {form.shape === 'channel' && entry('width', 'Channel width w', 'length', 'blank: per metre of width')}
          {form.shape === 'rectangle' && entry('width', 'Width W', 'length')}
          {entry('length', 'Duct length L', 'length')}
          <div className="field">
            <label htmlFor="long-duct-gas">gas</label>
            <div className="field-input">
              <select id="long-duct-gas" value={form.gas} onChange={(e) => edit({ gas: e.target.value as SpeciesId })}>
                {setup.SPECIES_IDS.map((id) => (
                  <option key={id} value={id}>
                    {setup.SPECIES[id].name} ({id})
                  </option>
                ))}
              </select>
            </div>
          </div>
          {entry('upstreamTemperature', 'Temperature (upstream end)', 'temperature')}
          {form.mode !== 'pump' &&
            entry(
              'downstreamTemperature',
              'Downstream end temperature',
              'temperature',
              'blank: the same; a different one needs G_T in the table (thermal creep)',
            )}
          <fieldset className="field">
            <legend>given</legend>
            {MODES.map((m) => (
              <label key={m.id} className="radio">
                <input
                  type="radio"
                  name="long-duct-mode"
                  value={m.id}
                  checked={form.mode === m.id}
                  onChange={() => edit({ mode: m.id })}
                />{' '}
                {m.label}
              </label>
            ))}
          </fieldset>
          {form.mode !== 'pump' && entry('upstreamPressure', 'Upstream pressure', 'pressure')}
          {form.mode === 'pressures' && entry('downstreamPressure', 'Downstream pressure', 'pressure')}
          {form.mode === 'upstreamAndFlow' &&
            entry('massFlow', 'Mass flow', 'massFlow', 'positive from the inlet to the outlet')}
          {form.mode === 'pump' && entry('pumpSpeed', 'Pump speed', 'conductance', 'at the duct outlet')}
          {form.mode === 'pump' && entry('gasLoad', 'Gas load', 'throughput', 'into the chamber at the inlet')}
        </section>
        <section className="panel" aria-labelledby="long-duct-table-title">
          <h2 id="long-duct-table-title">Coefficient table</h2>
          <div className={`field${errors.table ? ' field-invalid' : ''}`}>
            <label htmlFor="long-duct-table">table in use</label>
            <div className="field-input">
              <select
                id="long-duct-table"
                value={table?.source ?? ''}
                onChange={(e) => edit({ tableSource: e.target.value })}
              >
                {shapeTables.length === 0 && <option value="">no {form.shape} table yet</option>}
                {shapeTables.map((t) => (
                  <option key={t.source} value={t.source}>
                    {(api?.BUILTIN_TABLES ?? []).includes(t) ? 'built-in: ' : ''}
                    {t.gasAndWall}
                    {t.aspectRatio !== undefined ? `, H/W ${t.aspectRatio}` : ''} — {t.points.length} points
                  </option>
                ))}
              </select>
            </div>
            {errors.table && (
              <p className="field-error" role="alert">
                {errors.table}
              </p>
            )}
          </div>
          {table && (
            <p className="hint" data-testid="long-duct-table-source">
              {table.source}; δ {table.points[0].rarefaction.toPrecision(3)}–
              {table.points[table.points.length - 1].rarefaction.toPrecision(3)}
              {table.points.some((p) => p.thermalCreep !== undefined) ? ', with G_T' : ', G_P only'}.
              {table.gasAndWall && !table.gasAndWall.startsWith(form.gas) && (
                <>
                  {' '}
                  The table is for {table.gasAndWall}, not {form.gas}: in the transition regime G_P differs by a few per
                  cent between gases and walls. For the exact one, compute a table with <code>tenuis coefficients</code>{' '}
                  on a force-driven case of this gas and wall and load it here.
                </>
              )}
            </p>
          )}
          <label className="button-like">
            Load a table… (JSON from tenuis coefficients)
            <input
              type="file"
              accept=".json,application/json"
              className="visually-hidden"
              data-testid="long-duct-table-file"
              onChange={(e) => {
                const f = e.target.files?.[0];
                if (f) void loadTableFile(f);
                e.target.value = '';
              }}
            />
          </label>
          {table && userTables.includes(table) && (
            <button type="button" onClick={() => changeTables(userTables.filter((u) => u !== table))}>
              Remove this table
            </button>
          )}
          {tableMessage && (
            <p className="message" role="status" data-testid="long-duct-table-message">
              {tableMessage}
            </p>
          )}
          <p className="hint">
            To compute a table for your gas and wall: <code>npx tenuis preset poiseuille --set gas=…</code> (or{' '}
            <code>forceDrivenTube</code>), then{' '}
            <code>npx tenuis coefficients case.json --from 0.01 --to 10 --points 7 --out table.json</code>; or sweep
            that preset over the Knudsen number in the Sweep view.
          </p>
        </section>
        <section className="panel" aria-labelledby="long-duct-curve-title">
          <h2 id="long-duct-curve-title">Conductance curve</h2>
          <p className="hint">Upstream pressures over a range, at the pressure ratio of the two end pressures.</p>
          {entry('curveFrom', 'From upstream pressure', 'pressure')}
          {entry('curveTo', 'To upstream pressure', 'pressure')}
          <div className={`field${errors.curvePoints ? ' field-invalid' : ''}`}>
            <label htmlFor="long-duct-curvePoints">points (equal ratios)</label>
            <div className="field-input">
              <input
                id="long-duct-curvePoints"
                inputMode="numeric"
                value={form.curvePoints}
                onChange={(e) => edit({ curvePoints: e.target.value })}
              />
            </div>
            {errors.curvePoints && (
              <p className="field-error" role="alert">
                {errors.curvePoints}
              </p>
            )}
          </div>
        </section>
      </div>
      <div className="column">
        {!api ? (
          <p className="message" role="status">
            Loading the long-duct solver…
          </p>
        ) : read.ok ? (
          <LongDuctResults
            api={api}
            request={read.request}
            curve={form.mode === 'pressures' ? read.curve : null}
            form={form}
          />
        ) : (
          <section className="panel" aria-labelledby="long-duct-waiting-title">
            <h2 id="long-duct-waiting-title">Results</h2>
            <ul className="message message-error" role="alert" data-testid="long-duct-errors">
              {Object.values(read.errors).map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          </section>
        )}
      </div>
    </div>
  );
}
