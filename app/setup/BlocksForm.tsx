/**
 * Solid blocks: the domain preview (draw a block by dragging) and the table of blocks (typed, with a length and a
 * temperature unit for the whole table). The table starts as the preset's blocks; the first edit takes them over
 * into the form, and from then on the table replaces them (until "use the preset's blocks again").
 */
import { useRef } from 'react';
import { setupApi } from '../bridge/loadEngine';
import {
  addBlockRow,
  blockTableFrom,
  convertBlockTable,
  removeBlockRow,
  rowRectSI,
  snapToGrid,
  updateBlockRow,
  type RectSI,
} from './blockEdits';
import type { BlockEdit, BlockTable } from './formModel';
import { appStore, useApp } from '../store/appStore';
import { DomainPreview } from './DomainPreview';

const LENGTH_UNITS = ['nm', 'µm', 'mm', 'm'] as const;
const TEMPERATURE_UNITS = ['K', '°C'] as const;
const COORDINATES = [
  ['xMin', 'xMinM', 'x min'],
  ['xMax', 'xMaxM', 'x max'],
  ['yMin', 'yMinM', 'y min'],
  ['yMax', 'yMaxM', 'y max'],
] as const;
const COEFFICIENTS: Readonly<Record<string, readonly (readonly [keyof BlockEdit & string, string])[]>> = {
  maxwell: [['accommodation', 'accommodation']],
  cercignaniLampis: [
    ['normalAccommodation', 'normal'],
    ['tangentialAccommodation', 'tangential'],
  ],
};

function BlockRow({
  table,
  index,
  errors,
  disabled,
}: {
  table: BlockTable;
  index: number;
  errors: Readonly<Record<string, string>>;
  disabled: boolean;
}) {
  const row = table.rows[index];
  const st = appStore.getState();
  const set = (patch: Partial<BlockEdit>) => st.setBlocks(updateBlockRow(table, index, patch));
  const prefix = `block:${index}:`;
  const messages = Object.entries(errors).filter(([k]) => k.startsWith(prefix));
  const bad = (field: string) => (errors[prefix + field] ? true : undefined);
  const radial = useApp((s) => s.derived?.draft?.domain.geometry === 'axisymmetric');
  const input = (key: keyof BlockEdit & string, field: string, label: string) => (
    <input
      id={`block-${index}-${key}`}
      aria-label={`block ${index + 1} ${label}`}
      inputMode="decimal"
      className="cell-input"
      value={String(row[key] ?? '')}
      aria-invalid={bad(field)}
      onChange={(e) => set({ [key]: e.target.value })}
    />
  );
  return (
    <>
      <tr data-testid={`block-row-${index}`} className={messages.length ? 'row-invalid' : undefined}>
        <td>
          <input
            id={`block-${index}-name`}
            aria-label={`block ${index + 1} name`}
            className="cell-name"
            value={row.name}
            aria-invalid={bad('name')}
            onChange={(e) => set({ name: e.target.value })}
          />
        </td>
        {COORDINATES.map(([key, field, label]) => (
          <td key={key}>{input(key, field, `${radial ? label.replace('y', 'r') : label} [${table.lengthUnit}]`)}</td>
        ))}
        <td>{input('temperature', 'temperatureK', `wall temperature [${table.temperatureUnit}]`)}</td>
        <td>
          <select
            id={`block-${index}-model`}
            aria-label={`block ${index + 1} wall model`}
            value={row.model}
            onChange={(e) => set({ model: e.target.value })}
          >
            {setupApi().WALL_MODELS.map((m) => (
              <option key={m} value={m}>
                {m}
              </option>
            ))}
          </select>
        </td>
        <td>
          {(COEFFICIENTS[row.model] ?? []).map(([key, label]) => (
            <span key={key} className="cell-pair" title={label}>
              {input(key, key, `${label} [1]`)}
            </span>
          ))}
          {!COEFFICIENTS[row.model] && '—'}
        </td>
        <td>
          <button
            type="button"
            disabled={disabled}
            aria-label={`delete block ${row.name || index + 1}`}
            onClick={() => st.setBlocks(removeBlockRow(table, index))}
          >
            Delete
          </button>
        </td>
      </tr>
      {messages.length > 0 && (
        <tr className="row-errors" data-testid={`block-errors-${index}`}>
          <td colSpan={9}>
            {messages.map(([k, m]) => (
              <p key={k} className="field-error" role="alert">
                {row.name || `block ${index + 1}`}, {fieldName(k.slice(prefix.length))}: {m}
              </p>
            ))}
          </td>
        </tr>
      )}
    </>
  );
}

function fieldName(field: string): string {
  const c = COORDINATES.find(([, f]) => f === field);
  if (c) return c[2];
  return field === 'temperatureK' ? 'wall temperature' : field === 'other' ? 'faces' : field;
}

export function BlocksForm() {
  const draft = useApp((s) => s.derived?.draft);
  const source = useApp((s) => s.source);
  const edited = useApp((s) => s.blocks ?? null);
  const plan = useApp((s) => s.plan);
  const errors = useApp((s) => s.derived?.fieldErrors) ?? {};
  // The planned grid does not depend on the blocks: keep the last one while an edit makes the case invalid.
  const lastGrid = useRef<{ cellsX: number; cellsY: number } | null>(null);
  if (plan) lastGrid.current = { cellsX: plan.cellsX, cellsY: plan.cellsY };
  if (!draft) return null;
  const api = setupApi();
  const fromJson = source.kind === 'json';
  // JSON typed by the user may lack any field the preview reads: show it only for a case that parses.
  const parsed = fromJson ? api.parseCase(draft) : null;
  if (parsed && !parsed.ok) {
    return (
      <section className="panel" aria-labelledby="blocks-title" data-testid="blocks-form">
        <h2 id="blocks-title">Domain and solid blocks</h2>
        <p className="hint">The domain is shown once the case JSON is valid (see its problems below).</p>
      </section>
    );
  }
  const table = (!fromJson && edited) || blockTableFrom(draft, api);
  const grid = lastGrid.current;
  const st = appStore.getState();
  const temperatureK = draft.initial.temperatureK;
  const add = (rect: RectSI) => st.setBlocks(addBlockRow(table, rect, temperatureK, api));
  const { lengthXM: lx, lengthYM: ly } = draft.domain;
  const middle = (length: number, cells: number | undefined, a: number) =>
    snapToGrid(a * length, length, cells ?? null);
  const preview = table.rows.map((r, i) => ({
    name: r.name,
    rect: rowRectSI(r, table.lengthUnit, api),
    invalid: Object.keys(errors).some((k) => k.startsWith(`block:${i}:`)),
  }));
  return (
    <section className="panel" aria-labelledby="blocks-title" data-testid="blocks-form">
      <h2 id="blocks-title">Domain and solid blocks</h2>
      <DomainPreview
        domain={draft.domain}
        boundaries={draft.boundaries}
        blocks={preview}
        grid={grid}
        lengthUnit={table.lengthUnit}
        onDraw={fromJson ? undefined : add}
      />
      <fieldset disabled={fromJson} className="blocks-form-fields">
        <legend>
          Solid blocks
          {edited && !fromJson
            ? ' (edited; the preset’s blocks are replaced)'
            : ' (as the starting geometry builds them)'}
        </legend>
        <div className="actions">
          <label className="field-inline">
            lengths in
            <select
              aria-label="block length unit"
              value={table.lengthUnit}
              onChange={(e) => st.setBlocks(convertBlockTable(table, { lengthUnit: e.target.value }, api))}
            >
              {LENGTH_UNITS.map((u) => (
                <option key={u} value={u}>
                  {u}
                </option>
              ))}
            </select>
          </label>
          <label className="field-inline">
            temperatures in
            <select
              aria-label="block temperature unit"
              value={table.temperatureUnit}
              onChange={(e) => st.setBlocks(convertBlockTable(table, { temperatureUnit: e.target.value }, api))}
            >
              {TEMPERATURE_UNITS.map((u) => (
                <option key={u} value={u}>
                  {u}
                </option>
              ))}
            </select>
          </label>
          <button
            type="button"
            onClick={() =>
              add({
                xMinM: middle(lx, grid?.cellsX, 0.4),
                xMaxM: middle(lx, grid?.cellsX, 0.6),
                yMinM: middle(ly, grid?.cellsY, 0.4),
                yMaxM: middle(ly, grid?.cellsY, 0.6),
              })
            }
          >
            Add a block
          </button>
          {edited && (
            <button type="button" onClick={() => st.setBlocks(null)}>
              Use the preset’s blocks again
            </button>
          )}
        </div>
        {table.rows.length === 0 ? (
          <p className="hint" data-testid="no-blocks">
            No solid blocks: the gas fills the whole domain.
          </p>
        ) : (
          <div className="table-scroll">
            <table className="grid blocks-table" aria-label="solid blocks">
              <thead>
                <tr>
                  <th>name</th>
                  {COORDINATES.map(([key, , label]) => (
                    <th key={key}>
                      {draft.domain.geometry === 'axisymmetric' ? label.replace('y', 'r') : label} [{table.lengthUnit}]
                    </th>
                  ))}
                  <th>wall temperature [{table.temperatureUnit}]</th>
                  <th>wall model</th>
                  <th>accommodation [1]</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {table.rows.map((_, i) => (
                  <BlockRow key={i} table={table} index={i} errors={errors} disabled={fromJson} />
                ))}
              </tbody>
            </table>
          </div>
        )}
        <p className="hint">
          Blocks lie inside the domain (x from 0 to {api.formatQuantity(lx, table.lengthUnit)}, y from 0 to{' '}
          {api.formatQuantity(ly, table.lengthUnit)}) and may overlap; each face is a wall at the block’s temperature.
        </p>
      </fieldset>
    </section>
  );
}
