/**
 * The set-up form as plain data: one text and unit per preset parameter; edits applied on top of the case the preset
 * builds (per-wall model, accommodation, temperature and speed; a custom gas; the solid blocks); and where the case
 * currently comes from (the form, or JSON typed or opened by the user). No engine imports: the engine's functions
 * arrive as an argument (the lazily loaded set-up API).
 */
import type { PresetParameter } from '../../engine/case/presets';
import type { SideName } from '../../engine/case/caseConstants';
import type { QuantityKind } from '../../engine/units/engineeringUnits';

export interface ParamEntry {
  readonly text: string;
  /** Unit the text is in; '' for counts, choices and dimensionless numbers. */
  readonly unit: string;
}
export type ParamEntries = Readonly<Record<string, ParamEntry>>;

export interface WallEdit {
  readonly model?: string;
  readonly accommodation?: string;
  readonly normalAccommodation?: string;
  readonly tangentialAccommodation?: string;
  /** Wall temperature in K or °C; absent or empty text = as the preset builds it. */
  readonly temperature?: ParamEntry;
  /** Speed along the wall (x for the bottom and top walls, y for the left and right walls). */
  readonly speed?: ParamEntry;
}
export type WallEdits = Readonly<Partial<Record<SideName, WallEdit>>>;

/** 'form': the case is built from the preset form; 'json': the user's own JSON (edited, opened or dropped). */
export type CaseSource = { readonly kind: 'form' } | { readonly kind: 'json'; readonly label: string };

/** A gas of the user's own: the fields of the case file's gas.custom, each with its unit. */
export interface CustomGasEdit {
  readonly name: string;
  /** Mass of one molecule; unit g/mol (molar mass) or kg. */
  readonly mass: ParamEntry;
  readonly diameter: ParamEntry;
  readonly referenceTemperature: ParamEntry;
  readonly viscosityIndex: string;
  readonly scatteringExponent: string;
  /** '0', '2' or '3'. */
  readonly rotationalDof: string;
}

/**
 * The gas. The table gas and the collision model are the preset's own `gas` and `model` parameters (so the pressure
 * the preset derives from the Knudsen number is that gas's); 'custom' replaces the table gas by `custom`, keeping
 * the Knudsen number (every pressure is rescaled, see deriveCase.ts).
 */
export interface GasEdit {
  readonly source: 'table' | 'custom';
  /** Filled from the table gas when the user first picks 'custom', then kept (also while 'table' is picked again). */
  readonly custom?: CustomGasEdit;
  /** Z of gas.rotationalCollisionNumber; empty = the schema's default. */
  readonly rotationalCollisionNumber?: string;
}

/** One solid block as typed: coordinates in the table's length unit, its wall temperature in the table's unit. */
export interface BlockEdit {
  readonly name: string;
  readonly xMin: string;
  readonly xMax: string;
  readonly yMin: string;
  readonly yMax: string;
  readonly temperature: string;
  readonly model: string;
  readonly accommodation?: string;
  readonly normalAccommodation?: string;
  readonly tangentialAccommodation?: string;
  /** Per-face walls of a block the preset built, carried over unchanged (the form does not edit them). */
  readonly faces?: unknown;
}

export interface BlockTable {
  readonly lengthUnit: string;
  readonly temperatureUnit: string;
  readonly rows: readonly BlockEdit[];
}

export interface FormState {
  readonly presetName: string;
  readonly params: ParamEntries;
  readonly walls: WallEdits;
  /** Absent: the table gas of the preset's parameters. */
  readonly gas?: GasEdit;
  /** Absent or null: the blocks as the preset builds them; a table replaces them all. */
  readonly blocks?: BlockTable | null;
  readonly source: CaseSource;
  /** The case as JSON text: built from the form, or the user's own. */
  readonly caseText: string;
}

/** Units offered first for each kind (the ones people quote); other kinds get the engine's full list. */
const PREFERRED_UNITS: Readonly<Record<string, readonly string[]>> = {
  pressure: ['Pa', 'mbar', 'Torr', 'mTorr', 'kPa'],
  length: ['nm', 'µm', 'mm', 'm'],
  temperature: ['K', '°C'],
  speed: ['m/s'],
};

/** Units of the mass of one molecule: the molar mass people look up, or kilograms per molecule as the case file has it. */
export const MOLECULAR_MASS_UNITS = ['g/mol', 'kg'] as const;

/**
 * The part of the set-up API (app/bridge/types.ts) that unit conversions need, declared here rather than picked
 * from it: the set-up API's deriveCase takes this module's FormState, so the dependency runs one way only.
 */
export interface UnitApi {
  convertFromSI(valueSI: number, unit: string): number;
  unitsOf(kind: QuantityKind): readonly string[];
  readonly AVOGADRO_PER_MOL: number;
}

/** The unit conversions and the presets' parameters: what the entries a preset starts with are made from. */
export interface PresetApi extends UnitApi {
  readonly PRESETS: Readonly<Record<string, { readonly parameters: readonly PresetParameter[] }>>;
}

/** An SI value in `unit`, including the molecular-mass units the engine's unit table does not have. */
export function fromSI(valueSI: number, unit: string, api: UnitApi): number {
  if (unit === 'g/mol') return valueSI * api.AVOGADRO_PER_MOL * 1e3;
  if (unit === 'kg') return valueSI;
  return api.convertFromSI(valueSI, unit);
}

/**
 * The inverse of fromSI; the engine's conversions are affine (°C), so two points give it. Rounded to 15 significant
 * digits, which removes the last-bit noise of the division (1.8 µm is 1.8e-6 m, 26.85 °C is 300 K) and nothing a
 * typed value holds.
 */
export function toSI(value: number, unit: string, api: UnitApi): number {
  const offset = fromSI(0, unit, api);
  return Number(((value - offset) / (fromSI(1, unit, api) - offset)).toPrecision(15));
}

/** A form text as a number: null when empty, NaN when not a number (the minus sign U+2212 is accepted). */
export function numberOf(text: string | undefined): number | null {
  if (text === undefined || text.trim() === '') return null;
  const t = text.trim().replace('\u2212', '-');
  return /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/.test(t) ? Number(t) : Number.NaN;
}

/** An entry's value in SI: null when empty, NaN when the text is not a number. */
export function entrySI(entry: ParamEntry | undefined, api: UnitApi): number | null {
  const v = numberOf(entry?.text);
  if (v === null || Number.isNaN(v)) return v;
  return entry!.unit ? toSI(v, entry!.unit, api) : v;
}

/** An entry showing an SI value in `unit`. */
export function entryOfSI(valueSI: number, unit: string, api: UnitApi): ParamEntry {
  return { text: numberText(fromSI(valueSI, unit, api)), unit };
}

export function unitChoices(kind: string, api: Pick<UnitApi, 'unitsOf'>): readonly string[] {
  if (kind === 'count' || kind === 'choice' || kind === 'dimensionless') return [];
  const all = api.unitsOf(kind as QuantityKind);
  const preferred = (PREFERRED_UNITS[kind] ?? []).filter((u) => all.includes(u));
  return preferred.length ? preferred : all;
}

/** A number as form text: six significant digits, no trailing zeros. */
export function numberText(x: number): string {
  return String(Number(x.toPrecision(6)));
}

const NUMBER_THEN_UNIT = /^\s*([+\-\u2212]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$/;

/** The entry a parameter starts with: its default in its shown unit, or `given` text such as "2 µm". */
export function entryFor(p: PresetParameter, api: UnitApi, given?: string): ParamEntry {
  const units = unitChoices(p.kind, api);
  const shown = units.includes(p.unitShown) ? p.unitShown : (units[0] ?? '');
  if (given !== undefined) {
    const m = NUMBER_THEN_UNIT.exec(given);
    if (units.length && m && units.includes(m[2])) return { text: m[1], unit: m[2] };
    if (units.length && m && m[2] === '')
      return { text: numberText(api.convertFromSI(Number(m[1]), shown)), unit: shown };
    return { text: given.trim(), unit: units.length ? shown : '' };
  }
  if (p.default === null) return { text: '', unit: shown };
  if (typeof p.default === 'string') return { text: p.default, unit: '' };
  return { text: units.length ? numberText(api.convertFromSI(p.default, shown)) : String(p.default), unit: shown };
}

/** Entries of every parameter of a preset; `given` (e.g. an example's parameters) overrides defaults by name. */
export function entriesFor(
  presetName: string,
  api: PresetApi,
  given: Readonly<Record<string, string>> = {},
): ParamEntries {
  const preset = api.PRESETS[presetName];
  const out: Record<string, ParamEntry> = {};
  for (const p of preset?.parameters ?? []) out[p.name] = entryFor(p, api, given[p.name]);
  return out;
}

/** The same physical value in another unit (the text is converted, not kept), or the text unchanged if unparsable. */
export function convertEntry(entry: ParamEntry, toUnit: string, api: UnitApi): ParamEntry {
  const v = numberOf(entry.text);
  if (v === null || !Number.isFinite(v) || !entry.unit) return { text: entry.text, unit: toUnit };
  return entryOfSI(toSI(v, entry.unit, api), toUnit, api);
}

/**
 * How the form gives a preset's gas state (engine/case/pressurePresetParameters.ts): by the Knudsen number, by the
 * one gas pressure (gap presets), by the mean vessel pressure and the ratio, or by the two vessel pressures. Not
 * stored: read from which of the entries hold text, so a saved form or an example's parameters carry it as they are.
 */
export type GasStateMode = 'knudsen' | 'pressure' | 'meanPressure' | 'vesselPressures';

/** The parameters each mode gives (the others of its preset must be left empty). */
export const GAS_STATE_PARAMETERS: Readonly<Record<GasStateMode, readonly string[]>> = {
  knudsen: ['knudsen', 'pressureRatio'],
  pressure: ['pressure'],
  meanPressure: ['meanPressure', 'pressureRatio'],
  vesselPressures: ['upstreamPressure', 'downstreamPressure'],
};

/** The modes a preset offers, by its parameters: none, knudsen/pressure (gaps), or the three between vessels. */
export function gasStateModes(parameters: readonly { readonly name: string }[]): readonly GasStateMode[] {
  const has = (n: string) => parameters.some((p) => p.name === n);
  if (has('upstreamPressure')) return ['knudsen', 'meanPressure', 'vesselPressures'];
  if (has('pressure')) return ['knudsen', 'pressure'];
  return [];
}

const filled = (params: ParamEntries, name: string) => (params[name]?.text.trim() ?? '') !== '';

/** The mode the entries are in: the pressures' when any of them holds text and the Knudsen number does not. */
export function gasStateModeOf(params: ParamEntries): GasStateMode {
  if (filled(params, 'knudsen')) return 'knudsen';
  if (filled(params, 'upstreamPressure') || filled(params, 'downstreamPressure')) return 'vesselPressures';
  if (filled(params, 'meanPressure')) return 'meanPressure';
  if (filled(params, 'pressure')) return 'pressure';
  return 'knudsen';
}

/** The case's gas state both ways, as the set-up shows it derived (app/bridge/deriveCase.ts). */
export interface DerivedGasState {
  readonly knudsen: number;
  readonly pressurePa: number;
  readonly upstreamPressurePa?: number;
  readonly downstreamPressurePa?: number;
}

/**
 * The texts that switch the entries to `mode`, carrying the current state over: the new mode's entries get the
 * derived values in their own units, every other gas-state entry of the preset is emptied.
 */
export function gasStateSwitch(
  mode: GasStateMode,
  modes: readonly GasStateMode[],
  params: ParamEntries,
  state: DerivedGasState | null,
  api: UnitApi,
): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of modes) for (const name of GAS_STATE_PARAMETERS[m]) out[name] = '';
  const inUnit = (name: string, pa: number | undefined) =>
    pa === undefined ? '' : numberText(fromSI(pa, params[name]?.unit || 'Pa', api));
  const ratio =
    state?.upstreamPressurePa !== undefined && state.downstreamPressurePa
      ? numberText(state.upstreamPressurePa / state.downstreamPressurePa)
      : (params.pressureRatio?.text ?? '');
  if (mode === 'knudsen') {
    out.knudsen = state ? numberText(state.knudsen) : '';
    if (modes.includes('meanPressure')) out.pressureRatio = ratio;
  } else if (mode === 'pressure') out.pressure = inUnit('pressure', state?.pressurePa);
  else if (mode === 'meanPressure') {
    out.meanPressure = inUnit('meanPressure', state?.pressurePa);
    out.pressureRatio = ratio;
  } else {
    out.upstreamPressure = inUnit('upstreamPressure', state?.upstreamPressurePa);
    out.downstreamPressure = inUnit('downstreamPressure', state?.downstreamPressurePa);
  }
  return out;
}
