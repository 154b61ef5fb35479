/**
 * The Long duct view's form: what the user typed (texts and units, kept in IndexedDB) read into a long-duct request in
 * SI units, or one message per field saying what is wrong and what to give instead — the rules `tenuis duct` applies.
 * Pure; the unit conversion and the gas's molecular mass (for sccm) are passed in.
 */
import type { SpeciesId } from '../../engine/gas/species';
import type { LongDuctRequest } from '../../engine/report/longDuctReport';
import type { CoefficientTable } from '../../engine/longDuct/coefficientTable';
import type { DuctGeometry } from '../../engine/longDuct/isothermalDuct';

/** Which two things are given: both end pressures, the upstream pressure and the mass flow, or a pump and gas load. */
export type LongDuctMode = 'pressures' | 'upstreamAndFlow' | 'pump';

export interface Entry {
  readonly text: string;
  readonly unit: string;
}

export interface LongDuctFormState {
  readonly shape: 'tube' | 'channel' | 'rectangle';
  /** Tube radius R, channel gap H or rectangle height H (its smaller side). */
  readonly size: Entry;
  /** Channel width (blank: per metre of width) or rectangle width (needed). */
  readonly width: Entry;
  readonly length: Entry;
  readonly gas: SpeciesId;
  readonly upstreamTemperature: Entry;
  /** Blank: the upstream temperature along the whole duct. */
  readonly downstreamTemperature: Entry;
  readonly mode: LongDuctMode;
  readonly upstreamPressure: Entry;
  readonly downstreamPressure: Entry;
  readonly massFlow: Entry;
  readonly pumpSpeed: Entry;
  readonly gasLoad: Entry;
  /** The coefficient table chosen: a table's source text (built-in or the user's). */
  readonly tableSource: string;
  /** The conductance curve: upstream pressures from … to …, points, at the pressure ratio of the two ends. */
  readonly curveFrom: Entry;
  readonly curveTo: Entry;
  readonly curvePoints: string;
}

export type LongDuctField =
  | 'size'
  | 'width'
  | 'length'
  | 'upstreamTemperature'
  | 'downstreamTemperature'
  | 'upstreamPressure'
  | 'downstreamPressure'
  | 'massFlow'
  | 'pumpSpeed'
  | 'gasLoad'
  | 'table'
  | 'curveFrom'
  | 'curveTo'
  | 'curvePoints';

export type LongDuctFormResult =
  | {
      readonly ok: true;
      readonly request: LongDuctRequest;
      /** The curve's upstream pressures (Pa) and points, or null when its fields are blank or wrong. */
      readonly curve: { readonly fromPa: number; readonly toPa: number; readonly points: number } | null;
      readonly curveErrors: Readonly<Partial<Record<LongDuctField, string>>>;
    }
  | { readonly ok: false; readonly errors: Readonly<Partial<Record<LongDuctField, string>>> };

/**
 * The workbench's own example: a MEMS microchannel of the published geometry of Arkilic, Schmidt & Breuer (1997,
 * J. MEMS 6:167: 1.33 µm × 52.25 µm × 7.5 mm, helium), between 2.5 bar and 1 bar at 300 K, on the built-in table.
 */
export const DEFAULT_LONG_DUCT_FORM: LongDuctFormState = {
  shape: 'channel',
  size: { text: '1.33', unit: 'µm' },
  width: { text: '52.25', unit: 'µm' },
  length: { text: '7.5', unit: 'mm' },
  gas: 'He',
  upstreamTemperature: { text: '300', unit: 'K' },
  downstreamTemperature: { text: '', unit: 'K' },
  mode: 'pressures',
  upstreamPressure: { text: '2.5', unit: 'bar' },
  downstreamPressure: { text: '1', unit: 'bar' },
  massFlow: { text: '', unit: 'kg/s' },
  pumpSpeed: { text: '', unit: 'L/s' },
  gasLoad: { text: '', unit: 'mbar·L/s' },
  tableSource: '',
  curveFrom: { text: '0.01', unit: 'bar' },
  curveTo: { text: '10', unit: 'bar' },
  curvePoints: '40',
};

const NUMBER = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

/** Field labels as the form shows them, for the messages. */
export const FIELD_LABELS: Readonly<Record<LongDuctField, string>> = {
  size: 'size',
  width: 'width',
  length: 'length',
  upstreamTemperature: 'upstream temperature',
  downstreamTemperature: 'downstream temperature',
  upstreamPressure: 'upstream pressure',
  downstreamPressure: 'downstream pressure',
  massFlow: 'mass flow',
  pumpSpeed: 'pump speed',
  gasLoad: 'gas load',
  table: 'coefficient table',
  curveFrom: 'curve from',
  curveTo: 'curve to',
  curvePoints: 'curve points',
};

type ToSI = (value: number, unit: string, context?: { molecularMassKg?: number }) => number;

/** Reads the form against the chosen table (null: none chosen or found). */
export function readLongDuctForm(
  f: LongDuctFormState,
  table: CoefficientTable | null,
  toSI: ToSI,
  molecularMassKg: number,
): LongDuctFormResult {
  const errors: Partial<Record<LongDuctField, string>> = {};
  const label = (field: LongDuctField) =>
    field === 'size'
      ? f.shape === 'tube'
        ? 'tube radius'
        : f.shape === 'rectangle'
          ? 'rectangle height'
          : 'channel gap'
      : FIELD_LABELS[field];
  /** A value above 0 (or any finite value when `signed`), in SI; NaN and a message when it is not. */
  const read = (field: LongDuctField, e: Entry, what: string, signed = false): number => {
    const v = Number(e.text);
    if (!NUMBER.test(e.text) || !(signed ? Number.isFinite(v) : v > 0)) {
      errors[field] = `${label(field)}: give ${what}${e.text.trim() ? `, not “${e.text.trim()}”` : ''} (in ${e.unit})`;
      return NaN;
    }
    const si = toSI(v, e.unit, { molecularMassKg });
    if (!(signed ? Number.isFinite(si) : si > 0))
      errors[field] = `${label(field)}: ${e.text} ${e.unit} is ${si.toPrecision(4)} in SI units; give a value above 0`;
    return si;
  };
  const size = read('size', f.size, 'a length above 0');
  const width =
    f.shape === 'rectangle'
      ? read('width', f.width, 'a length above 0, at least the height')
      : f.shape === 'channel' && f.width.text.trim()
        ? read('width', f.width, 'a length above 0, or leave it blank for 1 m')
        : 1;
  if (f.shape === 'rectangle' && width < size && !errors.width)
    errors.width = 'width: the height is the smaller side; give a width at least the height (or swap them)';
  const length = read('length', f.length, 'a length above 0');
  const tUp = read('upstreamTemperature', f.upstreamTemperature, 'a temperature above 0 K');
  const tDown = f.downstreamTemperature.text.trim()
    ? read('downstreamTemperature', f.downstreamTemperature, 'a temperature above 0 K, or leave it blank')
    : tUp;
  type Given = Pick<LongDuctRequest, 'upstreamPressurePa' | 'downstreamPressurePa' | 'massFlowRateKgPerS' | 'pump'>;
  const given = (): Given => {
    if (f.mode === 'pump') {
      const speed = read('pumpSpeed', f.pumpSpeed, 'a pumping speed above 0');
      const load = read('gasLoad', f.gasLoad, 'a gas load above 0');
      if (tDown !== tUp && !errors.downstreamTemperature)
        errors.downstreamTemperature =
          'downstream temperature: a pumped duct is solved at one temperature; leave it blank';
      return { pump: { speedM3PerS: speed, gasLoadPaM3PerS: load } };
    }
    const up = read('upstreamPressure', f.upstreamPressure, 'a pressure above 0');
    if (f.mode === 'pressures')
      return {
        upstreamPressurePa: up,
        downstreamPressurePa: read('downstreamPressure', f.downstreamPressure, 'a pressure above 0'),
      };
    const flow = read('massFlow', f.massFlow, 'a mass flow (negative: towards the inlet)', true);
    return { upstreamPressurePa: up, massFlowRateKgPerS: flow };
  };
  const pressures = given();
  if (!table) errors.table = 'coefficient table: choose one, or load a table made by tenuis coefficients';
  else if (table.shape !== f.shape)
    errors.table = `coefficient table: “${table.source}” is for a ${table.shape}; choose a ${f.shape} table`;
  if (Object.keys(errors).length || !table) return { ok: false, errors };
  const geometry: DuctGeometry =
    f.shape === 'tube'
      ? { shape: 'tube', radiusM: size, lengthM: length }
      : f.shape === 'rectangle'
        ? { shape: 'rectangle', heightM: size, widthM: width, lengthM: length }
        : { shape: 'channel', gapM: size, widthM: width, lengthM: length };
  const request: LongDuctRequest = {
    geometry,
    species: f.gas,
    table,
    upstreamTemperatureK: tUp,
    downstreamTemperatureK: tDown,
    ...pressures,
  };
  // The curve is optional: its messages do not stop the answer.
  const curveErrors: Partial<Record<LongDuctField, string>> = {};
  let curve: { fromPa: number; toPa: number; points: number } | null = null;
  if (f.curveFrom.text.trim() || f.curveTo.text.trim()) {
    const before = Object.keys(errors).length;
    const from = read('curveFrom', f.curveFrom, 'a pressure above 0');
    const to = read('curveTo', f.curveTo, 'a pressure above 0');
    const n = Number(f.curvePoints);
    if (!/^\s*\d+\s*$/.test(f.curvePoints) || n < 2 || n > 500)
      errors.curvePoints = `curve points: give a whole number from 2 to 500${f.curvePoints.trim() ? `, not “${f.curvePoints.trim()}”` : ''}`;
    else if (from === to && Number.isFinite(from))
      errors.curveTo = 'curve to: the same as from; give two different ends';
    for (const k of Object.keys(errors).slice(before) as LongDuctField[]) curveErrors[k] = errors[k];
    if (!Object.keys(curveErrors).length) curve = { fromPa: from, toPa: to, points: n };
  }
  return { ok: true, request, curve, curveErrors };
}
