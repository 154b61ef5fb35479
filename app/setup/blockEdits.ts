/**
 * The solid-block table of the set-up form as plain data: taken over from the case a preset builds the first time
 * the user edits a block, then changed row by row (typed, drawn on the domain preview, deleted). Coordinates stay
 * text in the table's length unit so that what the user typed is kept as typed; conversions go through the engine's
 * unit table (the `api` argument).
 */
import type { CaseInput } from '../../engine/case/schema';
import { entryOfSI, numberOf, numberText, toSI, type BlockEdit, type BlockTable, type UnitApi } from './formModel';

type BlockInput = NonNullable<CaseInput['blocks']>[number];

const LENGTH_UNITS = ['nm', 'µm', 'mm', 'm'] as const;
const RESERVED_NAMES = new Set(['left', 'right', 'bottom', 'top']);

/** The unit in which a length reads as a number from 1 to 1000 (µm for a 10 µm channel, mm for a 5 mm tube). */
export function lengthUnitFor(sizeM: number, api: UnitApi): string {
  for (const u of [...LENGTH_UNITS].reverse()) if (api.convertFromSI(sizeM, u) >= 1) return u;
  return LENGTH_UNITS[0];
}

function text(valueSI: number, unit: string, api: UnitApi): string {
  return entryOfSI(valueSI, unit, api).text;
}

function rowOf(b: BlockInput, lengthUnit: string, temperatureUnit: string, api: UnitApi): BlockEdit {
  const w = b.wall;
  const row: BlockEdit = {
    name: b.name,
    xMin: text(b.xMinM, lengthUnit, api),
    xMax: text(b.xMaxM, lengthUnit, api),
    yMin: text(b.yMinM, lengthUnit, api),
    yMax: text(b.yMaxM, lengthUnit, api),
    temperature: text(w.temperatureK, temperatureUnit, api),
    model: w.model ?? 'diffuse',
    ...(w.accommodation !== undefined ? { accommodation: String(w.accommodation) } : {}),
    ...(w.normalAccommodation !== undefined ? { normalAccommodation: String(w.normalAccommodation) } : {}),
    ...(w.tangentialAccommodation !== undefined ? { tangentialAccommodation: String(w.tangentialAccommodation) } : {}),
    ...(b.faces !== undefined ? { faces: b.faces } : {}),
  };
  return row;
}

/** The table holding a built case's blocks, in a length unit that suits the domain and in kelvin. */
export function blockTableFrom(c: Pick<CaseInput, 'blocks' | 'domain'>, api: UnitApi): BlockTable {
  const lengthUnit = lengthUnitFor(Math.max(c.domain.lengthXM, c.domain.lengthYM), api);
  return { lengthUnit, temperatureUnit: 'K', rows: (c.blocks ?? []).map((b) => rowOf(b, lengthUnit, 'K', api)) };
}

/** A name not yet used by a side or a row: block1, block2 … */
export function freeBlockName(table: BlockTable): string {
  const used = new Set(table.rows.map((r) => r.name));
  for (let n = 1; ; n++) if (!used.has(`block${n}`) && !RESERVED_NAMES.has(`block${n}`)) return `block${n}`;
}

export interface RectSI {
  readonly xMinM: number;
  readonly xMaxM: number;
  readonly yMinM: number;
  readonly yMaxM: number;
}

/** Adds a diffuse block over `rect` at `temperatureK`. */
export function addBlockRow(table: BlockTable, rect: RectSI, temperatureK: number, api: UnitApi): BlockTable {
  const u = table.lengthUnit;
  const row: BlockEdit = {
    name: freeBlockName(table),
    xMin: text(rect.xMinM, u, api),
    xMax: text(rect.xMaxM, u, api),
    yMin: text(rect.yMinM, u, api),
    yMax: text(rect.yMaxM, u, api),
    temperature: text(temperatureK, table.temperatureUnit, api),
    model: 'diffuse',
  };
  return { ...table, rows: [...table.rows, row] };
}

export function updateBlockRow(table: BlockTable, index: number, patch: Partial<BlockEdit>): BlockTable {
  return { ...table, rows: table.rows.map((r, i) => (i === index ? { ...r, ...patch } : r)) };
}

export function removeBlockRow(table: BlockTable, index: number): BlockTable {
  return { ...table, rows: table.rows.filter((_, i) => i !== index) };
}

const COORDINATES = ['xMin', 'xMax', 'yMin', 'yMax'] as const;

function convertText(t: string, from: string, to: string, api: UnitApi): string {
  const v = numberOf(t);
  return v === null || !Number.isFinite(v) ? t : text(toSI(v, from, api), to, api);
}

/** The same blocks with their coordinates (or temperatures) in another unit: the values are converted, not kept. */
export function convertBlockTable(
  table: BlockTable,
  units: { lengthUnit?: string; temperatureUnit?: string },
  api: UnitApi,
): BlockTable {
  const lengthUnit = units.lengthUnit ?? table.lengthUnit;
  const temperatureUnit = units.temperatureUnit ?? table.temperatureUnit;
  const rows = table.rows.map((r) => {
    const out: Record<string, unknown> = {
      ...r,
      temperature: convertText(r.temperature, table.temperatureUnit, temperatureUnit, api),
    };
    for (const k of COORDINATES) out[k] = convertText(r[k], table.lengthUnit, lengthUnit, api);
    return out as unknown as BlockEdit;
  });
  return { lengthUnit, temperatureUnit, rows };
}

/** A row's rectangle in metres, or null while a coordinate is missing or not a number (the preview leaves it out). */
export function rowRectSI(row: BlockEdit, lengthUnit: string, api: UnitApi): RectSI | null {
  const v = COORDINATES.map((k) => numberOf(row[k]));
  if (v.some((x) => x === null || !Number.isFinite(x))) return null;
  const [xMinM, xMaxM, yMinM, yMaxM] = v.map((x) => toSI(x!, lengthUnit, api));
  return { xMinM, xMaxM, yMinM, yMaxM };
}

/** The nearest edge of a grid of `cells` cells over [0, length], or the value itself (clamped) without a grid. */
export function snapToGrid(valueM: number, lengthM: number, cells: number | null): number {
  const clamped = Math.min(lengthM, Math.max(0, valueM));
  if (!cells || cells < 1) return clamped;
  const size = lengthM / cells;
  return Math.min(lengthM, Math.round(clamped / size) * size);
}

/** Short text of a length for labels: "12.5 µm". */
export function lengthLabel(valueM: number, unit: string, api: UnitApi): string {
  return `${numberText(api.convertFromSI(valueM, unit))} ${unit}`;
}
