/**
 * The sweep form's texts read into a request (SI), or a message per field saying what is allowed: the same rules as
 * `tenuis sweep` (ends above 0, 1 to 999 points, two different ends unless one point). Pure; the unit conversion
 * is passed in (the engine's, through the set-up API).
 */
import type { SweepParameter, SweepSpacing } from '../../engine/case/sweep';
import type { SweepRequest } from '../bridge/types';

/** What the user typed: texts, read by readSweepForm. Kept in the store's sweep slice and in each saved sweep. */
export interface SweepFormState {
  readonly parameter: SweepParameter;
  readonly fromText: string;
  readonly toText: string;
  /** Unit of from/to when the parameter is the pressure (Pa, mbar, Torr). */
  readonly pressureUnit: string;
  readonly pointsText: string;
  readonly spacing: SweepSpacing;
  /** The quantity plotted: `flow.NAME` or `walls.WALL.QUANTITY`. */
  readonly quantity: string;
}

export type SweepFormResult =
  | { readonly ok: true; readonly request: SweepRequest }
  | { readonly ok: false; readonly errors: Readonly<Partial<Record<'from' | 'to' | 'points', string>>> };

/** Pressure units offered for the ends of a pressure sweep. */
export const SWEEP_PRESSURE_UNITS = ['Pa', 'mbar', 'Torr'] as const;

const NUMBER = /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/;

/** `toSI(value, unit)`: a value in `unit` in SI (Pa for pressures). */
export function readSweepForm(f: SweepFormState, toSI: (value: number, unit: string) => number): SweepFormResult {
  const what = f.parameter === 'knudsen' ? 'Knudsen number' : `pressure in ${f.pressureUnit}`;
  const errors: Partial<Record<'from' | 'to' | 'points', string>> = {};
  const end = (field: 'from' | 'to', text: string): number => {
    if (!NUMBER.test(text) || !(Number(text) > 0)) {
      errors[field] = `${field}: give a ${what} above 0${text.trim() ? `, not “${text.trim()}”` : ''}`;
      return NaN;
    }
    return f.parameter === 'knudsen' ? Number(text) : toSI(Number(text), f.pressureUnit);
  };
  const from = end('from', f.fromText);
  const to = end('to', f.toText);
  const points = Number(f.pointsText);
  if (!/^\s*\d+\s*$/.test(f.pointsText) || points < 1 || points > 999)
    errors.points = `points: give a whole number from 1 to 999${f.pointsText.trim() ? `, not “${f.pointsText.trim()}”` : ''}`;
  else if (points > 1 && !errors.from && !errors.to && from === to)
    errors.to = 'to: the same as from; give two different ends, or 1 point';
  if (Object.keys(errors).length) return { ok: false, errors };
  return { ok: true, request: { parameter: f.parameter, from, to, points, spacing: f.spacing } };
}
