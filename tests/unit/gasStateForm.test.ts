/**
 * The set-up form's gas state (issue 12): the user gives the Knudsen number or pressures, the form switches between
 * them carrying the state over, and the derivation shows the other one. Tolerances: the form writes six significant
 * digits (formModel.ts numberText), so a state carried over agrees to a relative 1e-5 (common practice, no source).
 */
import { describe, expect, it } from 'vitest';
import * as setup from '../../app/bridge/setupApi';
import { createAppStore } from '../../app/store/store';
import { gasStateModeOf, gasStateModes, gasStateSwitch, type GasStateMode } from '../../app/setup/formModel';
import type { SetupApi } from '../../app/bridge/types';
import type { CaseInput } from '../../engine/case/schema';

const api = setup as SetupApi;
const newStore = (preset: string) => {
  const store = createAppStore({ setup: () => api }, 2);
  store.getState().selectPreset(preset);
  return store;
};
type Store = ReturnType<typeof newStore>;
const caseOf = (store: Store) => store.getState().derived!.caseInput as CaseInput;

/** What the radio does (GeometryForm.tsx): empty the other way's entries, then fill the chosen way's. */
function choose(store: Store, mode: GasStateMode): void {
  const st = store.getState();
  const preset = (api.PRESETS as Readonly<Record<string, (typeof api.PRESETS)['tube']>>)[st.presetName];
  const names = new Set(preset.parameters.map((p) => p.name));
  const texts = Object.entries(
    gasStateSwitch(mode, gasStateModes(preset.parameters), st.params, st.derived!.gasState, api),
  ).filter(([n]) => names.has(n));
  for (const [n, t] of texts) if (t === '') store.getState().setParamText(n, t);
  for (const [n, t] of texts) if (t !== '') store.getState().setParamText(n, t);
}

const close = (a: number, b: number) => Math.abs(a / b - 1) < 1e-5;

describe('set-up form: Knudsen number or pressures', () => {
  it('offers the three ways between vessels and two for a gap; starts with the Knudsen number', () => {
    expect(gasStateModes(api.PRESETS.tube.parameters)).toEqual(['knudsen', 'meanPressure', 'vesselPressures']);
    expect(gasStateModes(api.PRESETS.couette.parameters)).toEqual(['knudsen', 'pressure']);
    expect(gasStateModes(api.PRESETS.cavity.parameters)).toEqual(['knudsen', 'pressure']);
    expect(gasStateModeOf(newStore('tube').getState().params)).toBe('knudsen');
  });

  it('tube: switching to the vessel pressures in mbar keeps the case; the Knudsen number is shown derived', () => {
    const store = newStore('tube');
    const byKn = caseOf(store);
    const before = store.getState().derived!.gasState!;
    expect(before.upstreamPressurePa).toBeCloseTo((byKn.boundaries.left as { pressurePa: number }).pressurePa, 12);
    store.getState().setParamUnit('upstreamPressure', 'mbar');
    store.getState().setParamUnit('downstreamPressure', 'mbar');
    choose(store, 'vesselPressures');
    const st = store.getState();
    expect(gasStateModeOf(st.params)).toBe('vesselPressures');
    expect(st.params.knudsen.text).toBe('');
    expect(st.params.pressureRatio.text).toBe('');
    expect(st.params.upstreamPressure.unit).toBe('mbar');
    expect(Number(st.params.upstreamPressure.text) * 100).toBeCloseTo(before.upstreamPressurePa!, 3);
    const c = caseOf(store);
    expect(st.derived!.fieldErrors).toEqual({});
    expect(close((c.boundaries.left as { pressurePa: number }).pressurePa, before.upstreamPressurePa!)).toBe(true);
    expect(close(st.derived!.gasState!.knudsen, 0.5)).toBe(true);
    // And back: the Knudsen number and ratio carried over.
    choose(store, 'knudsen');
    expect(gasStateModeOf(store.getState().params)).toBe('knudsen');
    expect(Number(store.getState().params.knudsen.text)).toBeCloseTo(0.5, 5);
    expect(Number(store.getState().params.pressureRatio.text)).toBeCloseTo(2, 5);
  });

  it('couette: a pressure typed in Torr gives the case and the derived Knudsen number', () => {
    const store = newStore('couette');
    choose(store, 'pressure');
    store.getState().setParamUnit('pressure', 'Torr');
    store.getState().setParamText('pressure', '0.1');
    const c = caseOf(store);
    expect(c.initial.pressurePa).toBeCloseTo(101325 / 7600, 9);
    expect(store.getState().derived!.gasState!.pressurePa).toBeCloseTo(101325 / 7600, 9);
    expect(api.buildPreset('couette', { pressure: '0.1 Torr' })).toEqual(c);
  });

  it('both ways typed: the message names both parameters', () => {
    const store = newStore('tube');
    store.getState().setParamText('meanPressure', '2');
    expect(store.getState().derived!.caseInput).toBeNull();
    expect(store.getState().derived!.caseErrors.join('\n')).toMatch(/knudsen and meanPressure were both given/);
  });
});
