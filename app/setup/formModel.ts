/**
 * The set-up form as plain data: one text and unit per preset parameter, per-wall edits on top of the built case,
 * and where the case currently comes from (the form, or JSON typed or opened by the user). No engine imports: the
 * engine's functions arrive as an argument (the lazily loaded set-up API).
 */
import type { SetupApi } from '../engine/loadEngine';
import type { PresetParameter } from '../../engine/case/presets';
import type { SideName } from '../../engine/case/schema';

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
}
export type WallEdits = Readonly<Partial<Record<SideName, WallEdit>>>;

/** 'form': the case is built from the preset form; 'json': the user's own JSON (edited, opened or dropped). */
export type CaseSource = { readonly kind: 'form' } | { readonly kind: 'json'; readonly label: string };

export interface FormState {
  readonly presetName: string;
  readonly params: ParamEntries;
  readonly walls: WallEdits;
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

export function unitChoices(kind: string, api: SetupApi): readonly string[] {
  if (kind === 'count' || kind === 'choice' || kind === 'dimensionless') return [];
  const all = api.unitsOf(kind as Parameters<SetupApi['unitsOf']>[0]);
  const preferred = (PREFERRED_UNITS[kind] ?? []).filter((u) => all.includes(u));
  return preferred.length ? preferred : all;
}

/** A number as form text: six significant digits, no trailing zeros. */
export function numberText(x: number): string {
  return String(Number(x.toPrecision(6)));
}

const NUMBER_THEN_UNIT = /^\s*([+\-\u2212]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*?)\s*$/;

/** The entry a parameter starts with: its default in its shown unit, or `given` text such as "2 µm". */
export function entryFor(p: PresetParameter, api: SetupApi, given?: string): ParamEntry {
  const units = unitChoices(p.kind, api);
  const shown = units.includes(p.unitShown) ? p.unitShown : (units[0] ?? '');
  if (given !== undefined) {
    const m = NUMBER_THEN_UNIT.exec(given);
    if (units.length && m && units.includes(m[2])) return { text: m[1], unit: m[2] };
    if (units.length && m && m[2] === '') return { text: numberText(api.convertFromSI(Number(m[1]), shown)), unit: shown };
    return { text: given.trim(), unit: units.length ? shown : '' };
  }
  if (p.default === null) return { text: '', unit: shown };
  if (typeof p.default === 'string') return { text: p.default, unit: '' };
  return { text: units.length ? numberText(api.convertFromSI(p.default, shown)) : String(p.default), unit: shown };
}

/** Entries of every parameter of a preset; `given` (e.g. an example's parameters) overrides defaults by name. */
export function entriesFor(presetName: string, api: SetupApi, given: Readonly<Record<string, string>> = {}): ParamEntries {
  const preset = (api.PRESETS as Readonly<Record<string, { parameters: readonly PresetParameter[] }>>)[presetName];
  const out: Record<string, ParamEntry> = {};
  for (const p of preset?.parameters ?? []) out[p.name] = entryFor(p, api, given[p.name]);
  return out;
}

/** The same physical value in another unit (the text is converted, not kept), or the text unchanged if unparsable. */
export function convertEntry(entry: ParamEntry, toUnit: string, api: SetupApi): ParamEntry {
  const v = Number(entry.text.replace('\u2212', '-'));
  if (entry.text.trim() === '' || !Number.isFinite(v) || !entry.unit) return { text: entry.text, unit: toUnit };
  // convertFromSI is affine for °C: use two points to stay exact for offsets.
  const offset = api.convertFromSI(0, entry.unit);
  const scale = api.convertFromSI(1, entry.unit) - offset;
  const valueSI = (v - offset) / scale;
  return { text: numberText(api.convertFromSI(valueSI, toUnit)), unit: toUnit };
}
