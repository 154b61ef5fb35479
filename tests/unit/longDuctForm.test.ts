/**
 * The Long duct view's form read into a request (app/longDuct/longDuctForm.ts): engineering units to SI with the
 * engine's conversions (exact factors: 1 bar = 1e5 Pa, 1 mbar·L/s = 0.1 Pa·m³/s; SI definitions, common practice),
 * and a message per wrong field that names it and says what to give.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_LONG_DUCT_FORM, readLongDuctForm } from '../../app/longDuct/longDuctForm';
import { convertToSI } from '../../engine/units/engineeringUnits';
import { builtinTableFor } from '../../engine/longDuct/builtinTables';
import { SPECIES } from '../../engine/gas/species';

const channel = builtinTableFor('channel')!;
const mass = SPECIES.He.massKg;

describe('the Long duct form', () => {
  it('reads the example into SI units', () => {
    const r = readLongDuctForm(DEFAULT_LONG_DUCT_FORM, channel, convertToSI, mass);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const g = r.request.geometry;
    expect(g.shape).toBe('channel');
    if (g.shape !== 'channel') return;
    expect(g.gapM).toBeCloseTo(1.33e-6, 18);
    expect(g.widthM).toBeCloseTo(52.25e-6, 18);
    expect(g.lengthM).toBeCloseTo(7.5e-3, 15);
    expect(r.request.upstreamPressurePa).toBeCloseTo(2.5e5, 6);
    expect(r.request.downstreamPressurePa).toBeCloseTo(1e5, 6);
    expect(r.request.upstreamTemperatureK).toBe(300);
    expect(r.request.downstreamTemperatureK).toBe(300);
    expect(r.curve).toEqual({ fromPa: 1e3, toPa: 1e6, points: 40 });
  });

  it('names each wrong field and what to give', () => {
    const r = readLongDuctForm(
      {
        ...DEFAULT_LONG_DUCT_FORM,
        size: { text: 'abc', unit: 'µm' },
        upstreamTemperature: { text: '-300', unit: '°C' },
        downstreamPressure: { text: '', unit: 'bar' },
      },
      channel,
      convertToSI,
      mass,
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.size).toBe('channel gap: give a length above 0, not “abc” (in µm)');
    expect(r.errors.upstreamTemperature).toMatch(/^upstream temperature: give a temperature above 0 K, not “-300”/);
    expect(r.errors.downstreamPressure).toBe('downstream pressure: give a pressure above 0 (in bar)');
  });

  it('reads a pump and gas load, and refuses a temperature difference with it', () => {
    const pumped = { ...DEFAULT_LONG_DUCT_FORM, mode: 'pump' as const };
    const r = readLongDuctForm(
      { ...pumped, pumpSpeed: { text: '100', unit: 'L/s' }, gasLoad: { text: '1', unit: 'mbar·L/s' } },
      channel,
      convertToSI,
      mass,
    );
    expect(r.ok && r.request.pump).toEqual({ speedM3PerS: 0.1, gasLoadPaM3PerS: 0.1 });
    const hot = readLongDuctForm(
      {
        ...pumped,
        pumpSpeed: { text: '100', unit: 'L/s' },
        gasLoad: { text: '1', unit: 'mbar·L/s' },
        downstreamTemperature: { text: '400', unit: 'K' },
      },
      channel,
      convertToSI,
      mass,
    );
    expect(!hot.ok && hot.errors.downstreamTemperature).toMatch(/one temperature/);
  });

  it('asks for a table of the duct’s shape', () => {
    const r = readLongDuctForm({ ...DEFAULT_LONG_DUCT_FORM, shape: 'tube' }, channel, convertToSI, mass);
    expect(!r.ok && r.errors.table).toMatch(/is for a channel; choose a tube table/);
    const none = readLongDuctForm({ ...DEFAULT_LONG_DUCT_FORM, shape: 'tube' }, null, convertToSI, mass);
    expect(!none.ok && none.errors.table).toMatch(/load a table made by tenuis coefficients/);
  });
});
