/**
 * Engineering units at the edges: parse "2 mm", "0.1 mbar", "25 °C" into SI, and convert SI results into the units
 * people quote (sccm, mbar·L/s, L/s …). The engine itself only ever sees SI; this module is the one place where
 * other units are known.
 *
 * Every unit is one row of UNITS: value_SI = factor · value + offset (offset only for °C). Sources of the factors:
 * - SI prefixes, °C ↔ K (T/K = t/°C + 273.15) and the litre (1 L = 1 dm³ = 1e-3 m³): BIPM, The International System
 *   of Units, 9th ed. (2019) — exact by definition.
 * - bar (1e5 Pa), standard atmosphere (101 325 Pa), torr (101 325/760 Pa), psi (pound-force per square inch):
 *   NIST SP 811 (2008 ed.), Appendix B.8/B.9 — published. psi is formed from the exact definitions behind NIST's
 *   rounded 6.894 757 E+03: 1 lbf = 0.453 592 37 kg × 9.806 65 m/s², 1 in = 0.0254 m.
 * - sccm: one cubic centimetre per minute of gas at SCCM_REFERENCE_TEMPERATURE_K and SCCM_REFERENCE_PRESSURE_PA
 *   (engine/physics/constants.ts: 273.15 K, 101 325 Pa; common practice — state the reference when comparing).
 */
import {
  BOLTZMANN_J_PER_K as K_B,
  SCCM_REFERENCE_PRESSURE_PA,
  SCCM_REFERENCE_TEMPERATURE_K,
} from '../physics/constants';

export const QUANTITY_KINDS = [
  'dimensionless',
  'length',
  'pressure',
  'temperature',
  'speed',
  'acceleration',
  'massFlow',
  'throughput',
  'conductance',
] as const;
export type QuantityKind = (typeof QUANTITY_KINDS)[number];

/** Extra data a conversion may need: sccm ↔ kg/s needs the mass of one molecule. */
export interface ConversionContext {
  readonly molecularMassKg?: number;
}

interface UnitRow {
  readonly kind: QuantityKind;
  /** Spelling used when formatting. */
  readonly symbol: string;
  /** Other accepted spellings (compared after normalizeUnitText). */
  readonly aliases: readonly string[];
  /** value_SI = factor · value + offset. For sccm the factor is per molecule and is multiplied by the mass. */
  readonly factor: number;
  readonly offset?: number;
  readonly perMolecule?: boolean;
}

/** 1 Torr = 101 325/760 Pa (NIST SP 811, B.8: "torr (Torr) = 1.333 224 E+02 Pa", defined from the atmosphere). */
export const PA_PER_TORR = 101325 / 760;
/** 1 psi = 0.45359237 kg · 9.80665 m/s² / (0.0254 m)² (NIST SP 811, B.8: 6.894 757 E+03 Pa). */
export const PA_PER_PSI = (0.45359237 * 9.80665) / (0.0254 * 0.0254);
/** 1 atm = 101 325 Pa exactly (NIST SP 811, B.8). */
export const PA_PER_ATM = 101325;
/** 1 bar = 1e5 Pa exactly (NIST SP 811, B.8). */
export const PA_PER_BAR = 1e5;
/** 1 L = 1e-3 m³ exactly (SI brochure, 9th ed., Table 8; NIST SP 811, B.8). */
export const M3_PER_LITRE = 1e-3;
/** Molecules per second in 1 sccm: p₀ · 1 cm³ / (k T₀) / 60 s (ideal gas at the sccm reference state). */
export const MOLECULES_PER_S_PER_SCCM = (SCCM_REFERENCE_PRESSURE_PA * 1e-6) / (K_B * SCCM_REFERENCE_TEMPERATURE_K) / 60;
/** 1 h = 3600 s exactly (SI brochure, 9th ed., Table 8: non-SI units accepted for use with the SI). */
export const SECONDS_PER_HOUR = 3600;
/** T/K = t/°C + 273.15 exactly (SI brochure, 9th ed.). */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

const UNITS: readonly UnitRow[] = [
  { kind: 'dimensionless', symbol: '1', aliases: ['-'], factor: 1 },
  { kind: 'length', symbol: 'm', aliases: [], factor: 1 },
  { kind: 'length', symbol: 'cm', aliases: [], factor: 1e-2 },
  { kind: 'length', symbol: 'mm', aliases: [], factor: 1e-3 },
  { kind: 'length', symbol: 'µm', aliases: ['μm', 'um', 'micron'], factor: 1e-6 },
  { kind: 'length', symbol: 'nm', aliases: [], factor: 1e-9 },
  { kind: 'pressure', symbol: 'Pa', aliases: [], factor: 1 },
  { kind: 'pressure', symbol: 'kPa', aliases: [], factor: 1e3 },
  { kind: 'pressure', symbol: 'mbar', aliases: [], factor: PA_PER_BAR * 1e-3 },
  { kind: 'pressure', symbol: 'bar', aliases: [], factor: PA_PER_BAR },
  { kind: 'pressure', symbol: 'Torr', aliases: [], factor: PA_PER_TORR },
  { kind: 'pressure', symbol: 'mTorr', aliases: [], factor: PA_PER_TORR * 1e-3 },
  { kind: 'pressure', symbol: 'atm', aliases: [], factor: PA_PER_ATM },
  { kind: 'pressure', symbol: 'psi', aliases: [], factor: PA_PER_PSI },
  { kind: 'temperature', symbol: 'K', aliases: [], factor: 1 },
  { kind: 'temperature', symbol: '°C', aliases: ['C', 'degC', 'ºC'], factor: 1, offset: KELVIN_AT_ZERO_CELSIUS },
  { kind: 'speed', symbol: 'm/s', aliases: [], factor: 1 },
  { kind: 'acceleration', symbol: 'm/s²', aliases: ['m/s^2', 'm/s2'], factor: 1 },
  { kind: 'massFlow', symbol: 'kg/s', aliases: [], factor: 1 },
  { kind: 'massFlow', symbol: 'mg/s', aliases: [], factor: 1e-6 },
  { kind: 'massFlow', symbol: 'g/h', aliases: [], factor: 1e-3 / SECONDS_PER_HOUR },
  { kind: 'massFlow', symbol: 'sccm', aliases: [], factor: MOLECULES_PER_S_PER_SCCM, perMolecule: true },
  { kind: 'throughput', symbol: 'Pa·m³/s', aliases: [], factor: 1 },
  { kind: 'throughput', symbol: 'mbar·L/s', aliases: [], factor: PA_PER_BAR * 1e-3 * M3_PER_LITRE },
  { kind: 'throughput', symbol: 'Torr·L/s', aliases: [], factor: PA_PER_TORR * M3_PER_LITRE },
  { kind: 'throughput', symbol: 'Pa·L/s', aliases: [], factor: M3_PER_LITRE },
  { kind: 'conductance', symbol: 'm³/s', aliases: [], factor: 1 },
  { kind: 'conductance', symbol: 'L/s', aliases: [], factor: M3_PER_LITRE },
  { kind: 'conductance', symbol: 'm³/h', aliases: [], factor: 1 / SECONDS_PER_HOUR },
];

/** The SI unit of each kind, as written in exports. */
export const SI_UNIT: Readonly<Record<QuantityKind, string>> = {
  dimensionless: '1',
  length: 'm',
  pressure: 'Pa',
  temperature: 'K',
  speed: 'm/s',
  acceleration: 'm/s²',
  massFlow: 'kg/s',
  throughput: 'Pa·m³/s',
  conductance: 'm³/s',
};

/**
 * Folds the spellings people type into one form: spaces, '*' and '.' between units become '·', '^2'/'^3' and a
 * bare trailing 2/3 after a unit letter become '²'/'³', the micro sign and Greek mu become 'µ'.
 */
function normalizeUnitText(text: string): string {
  return text
    .trim()
    .replace(/[μ]/g, 'µ')
    .replace(/\s*[*.\s]\s*/g, '·')
    .replace(/\^?2(?![0-9])/g, '²')
    .replace(/\^?3(?![0-9])/g, '³');
}

const byKind = new Map<QuantityKind, { row: UnitRow; spellings: string[] }[]>();
for (const row of UNITS) {
  const list = byKind.get(row.kind) ?? [];
  list.push({ row, spellings: [row.symbol, ...row.aliases].map(normalizeUnitText) });
  byKind.set(row.kind, list);
}

/** Units accepted for a kind, formatting spelling first, e.g. ['Pa', 'kPa', 'mbar', …]. */
export function unitsOf(kind: QuantityKind): string[] {
  return UNITS.filter((u) => u.kind === kind).map((u) => u.symbol);
}

function acceptedText(kind: QuantityKind): string {
  const rows = UNITS.filter((u) => u.kind === kind);
  const names = rows.map((u) => (u.aliases.length ? `${u.symbol} (or ${u.aliases.join(', ')})` : u.symbol));
  return kind === 'dimensionless' ? 'a plain number' : `${names.join(', ')}; a plain number means ${SI_UNIT[kind]}`;
}

/**
 * Finds a unit of the given kind: exact spelling first, then ignoring case (unambiguous within each kind: no two
 * units of one kind differ only by case).
 */
function findUnit(unitText: string, kind: QuantityKind): UnitRow | undefined {
  const wanted = normalizeUnitText(unitText);
  const rows = byKind.get(kind) ?? [];
  const exact = rows.find((r) => r.spellings.includes(wanted));
  if (exact) return exact.row;
  const lower = wanted.toLowerCase();
  const loose = rows.filter((r) => r.spellings.some((s) => s.toLowerCase() === lower));
  return loose.length === 1 ? loose[0].row : undefined;
}

function findAnyUnit(unitText: string): UnitRow | undefined {
  for (const kind of QUANTITY_KINDS) {
    const row = findUnit(unitText, kind);
    if (row) return row;
  }
  return undefined;
}

function factorOf(row: UnitRow, context: ConversionContext | undefined): number {
  if (!row.perMolecule) return row.factor;
  const m = context?.molecularMassKg;
  if (m === undefined || !(m > 0) || !Number.isFinite(m)) {
    throw new Error(`converting ${row.symbol} needs the mass of one molecule (kg): give molecularMassKg`);
  }
  return row.factor * m;
}

const NUMBER_THEN_UNIT = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;

/**
 * Parses "2mm", "1.5 µm", "0.1 mbar", "25 °C", "300" (plain number = SI) into the SI value of `kind`.
 * Throws an Error naming the accepted units when the text is not a number or the unit is not one of `kind`.
 */
export function parseQuantity(text: string, kind: QuantityKind, context?: ConversionContext): number {
  const cleaned = text.trim().replace(/\u2212/g, '-'); // U+2212 minus sign, as pasted from documents
  const m = NUMBER_THEN_UNIT.exec(cleaned);
  if (!m) throw new Error(`"${text}" is not a number; expected a number with a unit: ${acceptedText(kind)}`);
  const value = Number(m[1]);
  const unitText = m[2].trim();
  if (!Number.isFinite(value)) throw new Error(`"${text}" is out of range; expected a finite number`);
  if (unitText === '') return value;
  const row = findUnit(unitText, kind);
  if (!row) {
    const other = findAnyUnit(unitText);
    const hint = other ? ` (${other.symbol} is a ${other.kind} unit)` : '';
    throw new Error(`unknown ${kind} unit "${unitText}" in "${text}"${hint}; accepted: ${acceptedText(kind)}`);
  }
  return value * factorOf(row, context) + (row.offset ?? 0);
}

/** Converts valueSI (SI unit of the unit's kind) into `unit`; throws for an unknown unit. */
export function convertFromSI(valueSI: number, unit: string, context?: ConversionContext): number {
  const row = findAnyUnit(unit);
  if (!row) throw new Error(`unknown unit "${unit}"; accepted: ${UNITS.map((u) => u.symbol).join(', ')}`);
  return (valueSI - (row.offset ?? 0)) / factorOf(row, context);
}

/** Converts a value given in `unit` into SI (the inverse of convertFromSI). */
export function convertToSI(value: number, unit: string, context?: ConversionContext): number {
  const row = findAnyUnit(unit);
  if (!row) throw new Error(`unknown unit "${unit}"; accepted: ${UNITS.map((u) => u.symbol).join(', ')}`);
  return value * factorOf(row, context) + (row.offset ?? 0);
}

/** The kind of a unit spelling, or undefined when unknown. */
export function kindOfUnit(unit: string): QuantityKind | undefined {
  return findAnyUnit(unit)?.kind;
}

/**
 * Formats valueSI in `unit` with `significantDigits` significant digits (default 6, trailing zeros dropped),
 * e.g. formatQuantity(0.001, 'mm') → "1 mm". Dimensionless values get no unit.
 */
export function formatQuantity(
  valueSI: number,
  unit: string,
  significantDigits = 6,
  context?: ConversionContext,
): string {
  const row = findAnyUnit(unit);
  const v = convertFromSI(valueSI, unit, context);
  const text = Number.isFinite(v) ? String(Number(v.toPrecision(significantDigits))) : String(v);
  if (!row || row.kind === 'dimensionless') return text;
  return `${text} ${row.symbol}`;
}
