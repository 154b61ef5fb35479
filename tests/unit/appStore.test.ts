/**
 * The workbench store's logic in Node (no DOM): the set-up form, what is derived from it on every change, messages
 * placed at their fields, case files that are refused without changing anything, and the sweep's slice.
 */
import { describe, expect, it } from 'vitest';
import * as setup from '../../app/bridge/setupApi';
import { createAppStore } from '../../app/store/store';
import { convertEntry, entriesFor } from '../../app/setup/formModel';
import type { SetupApi } from '../../app/bridge/types';

const api = setup as SetupApi;
const newStore = (cores = 2) => createAppStore({ setup: () => api }, cores);

describe('case slice', () => {
  it('selectPreset() fills every parameter of every engine preset and derives a case and a plan, or marks why not', () => {
    for (const name of api.presetNames()) {
      const store = newStore();
      store.getState().selectPreset(name);
      const s = store.getState();
      expect(Object.keys(s.params).sort()).toEqual(api.PRESETS[name].parameters.map((p) => p.name).sort());
      expect(s.derived).not.toBeNull();
      const problems = Object.keys(s.derived!.fieldErrors).length + s.derived!.caseErrors.length + s.planErrors.length;
      expect(s.plan !== null || problems > 0, name).toBe(true);
      expect(JSON.parse(s.caseText).schemaVersion).toBe(1);
    }
  });

  it('couette defaults build the same case as the engine preset with no overrides', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    expect(store.getState().derived!.caseInput).toEqual(api.buildPreset('couette'));
  });

  it('a negative gap is marked at the gap field with what is allowed, and there is no plan', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    store.getState().setParamText('gap', '-1');
    const s = store.getState();
    expect(s.derived!.fieldErrors['param:gap']).toMatch(/must be greater than 0/);
    expect(s.derived!.caseInput).toBeNull();
    expect(s.plan).toBeNull();
  });

  it('an accommodation of 1.5 on a Maxwell wall is marked at that wall field', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    store.getState().setWall('top', { model: 'maxwell', accommodation: '1.5' });
    const s = store.getState();
    expect(s.derived!.fieldErrors['wall:top:accommodation']).toMatch(/between 0 and 1/);
    expect(s.derived!.caseInput).toBeNull();
    store.getState().setWall('top', { accommodation: '0.7' });
    expect(store.getState().derived!.caseInput).not.toBeNull();
    expect((store.getState().derived!.caseInput!.boundaries.top as { accommodation?: number }).accommodation).toBe(0.7);
  });

  it('changing a unit converts the value (1 mm → 1000 µm, 273 K → −0.15 °C) and leaves the case unchanged', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    const before = store.getState().caseText;
    store.getState().setParamUnit('gap', 'µm');
    expect(store.getState().params.gap).toEqual({ text: '1000', unit: 'µm' });
    store.getState().setParamUnit('temperature', '°C');
    expect(store.getState().params.temperature).toEqual({ text: '-0.15', unit: '°C' });
    expect(store.getState().caseText).toBe(before);
    expect(convertEntry({ text: '25', unit: '°C' }, 'K', api)).toEqual({ text: '298.15', unit: 'K' });
  });

  it('openCaseText() refuses text that is not JSON or not a valid case, naming the field, and changes nothing', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    const before = store.getState().caseText;
    expect(store.getState().openCaseText('{"schemaVersion": 1, ', 'broken.json')).toBe(false);
    expect(store.getState().fileMessage?.kind).toBe('error');
    expect(store.getState().fileMessage?.details?.[0]).toMatch(/not valid JSON/);
    const bad = JSON.parse(before);
    bad.domain.lengthYM = -1;
    expect(store.getState().openCaseText(JSON.stringify(bad), 'negative.json')).toBe(false);
    expect(store.getState().fileMessage?.details?.join('\n')).toMatch(/domain\.lengthYM/);
    expect(store.getState().caseText).toBe(before);
    expect(store.getState().source).toEqual({ kind: 'form' });
  });

  it('openCaseText() of a valid case makes it the case, detached from the form, until rebuildFromForm()', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    const other = api.buildPreset('fourier', { knudsen: '2' });
    expect(store.getState().openCaseText(JSON.stringify(other), 'fourier.json')).toBe(true);
    expect(store.getState().source).toEqual({ kind: 'json', label: 'fourier.json' });
    expect(store.getState().derived!.caseInput).toEqual(other);
    expect(store.getState().plan!.reference.knudsen).toBeCloseTo(2, 10);
    store.getState().rebuildFromForm();
    expect(store.getState().derived!.caseInput).toEqual(api.buildPreset('couette'));
  });

  it('applyExample() starts the form from the example parameters with their units', () => {
    const store = newStore();
    store.getState().applyExample(
      {
        id: 'x',
        title: 'an example',
        scenario: '',
        file: 'x.json',
        preset: 'couette',
        parameters: { gap: '2 µm', knudsen: '0.5', temperature: '25 °C' },
      },
      null,
    );
    const s = store.getState();
    expect(s.params.gap).toEqual({ text: '2', unit: 'µm' });
    expect(s.params.temperature).toEqual({ text: '25', unit: '°C' });
    expect(s.derived!.caseInput).toEqual(
      api.buildPreset('couette', { gap: '2 µm', knudsen: '0.5', temperature: '25 °C' }),
    );
    expect(s.exampleTitle).toBe('an example');
  });
});

describe('run slice', () => {
  it('more replicas lower the expected error of a fixed sampling; the measured speed changes the time estimate', () => {
    const store = newStore(4);
    store.getState().selectPreset('couette');
    store.getState().setParamText('sampleSteps', '20000');
    store.getState().setReplicas(1);
    const one = store.getState().plan!;
    store.getState().setReplicas(4);
    const four = store.getState().plan!;
    expect(four.expected.densityRelative).toBeCloseTo(one.expected.densityRelative / 2, 12);
    expect(four.estimatedSeconds).toBeCloseTo(one.estimatedSeconds, 9);
    store.getState().setSpeed(2 * store.getState().speed.particleStepsPerSecond);
    expect(store.getState().plan!.estimatedSeconds).toBeCloseTo(four.estimatedSeconds / 2, 9);
    expect(store.getState().speed.measured).toBe(true);
  });

  it('a sized run shares its sampling among the replicas: each samples about a quarter with four', () => {
    const store = newStore(4);
    store.getState().selectPreset('couette');
    store.getState().setReplicas(1);
    const one = store.getState().plan!;
    store.getState().setReplicas(4);
    const four = store.getState().plan!;
    expect(one.sizingApplied && four.sizingApplied).toBe(true);
    expect(four.sampleSteps / one.sampleSteps).toBeGreaterThan(0.24);
    expect(four.sampleSteps / one.sampleSteps).toBeLessThan(0.26);
    expect(four.sizing.join(' ')).toMatch(/on 4 replicas/);
  });

  it('setReplicas() ignores values that are not whole numbers from 1 to 64', () => {
    const store = newStore(2);
    for (const bad of [0, -1, 1.5, NaN, 65]) store.getState().setReplicas(bad);
    expect(store.getState().replicas).toBe(2);
  });
});

describe('sweep slice', () => {
  it('keeps the sweep under `sweep`: its setters change nothing of the run slice, whose names it shares', () => {
    const store = newStore();
    store.getState().selectPreset('couette');
    const before = store.getState();
    before.sweep.setForm({ fromText: '0.5', parameter: 'pressure' });
    before.sweep.setRun({ status: 'running', notices: ['a sweep notice'], error: 'x' });
    before.sweep.setSaved([]);
    const s = store.getState();
    expect(s.sweep).toMatchObject({ fromText: '0.5', parameter: 'pressure', status: 'running', toText: '10' });
    expect(s.sweep.notices).toEqual(['a sweep notice']);
    expect([s.status, s.notices, s.runError]).toEqual([before.status, before.notices, before.runError]);
    expect(s.derived).toBe(before.derived);
    // The setters read the latest state, so ones taken from an earlier snapshot still patch the current one.
    before.sweep.setRun({ error: null });
    expect(store.getState().sweep).toMatchObject({ fromText: '0.5', status: 'running', error: null });
  });
});

describe('form model', () => {
  it('entriesFor() shows defaults in each parameter’s own unit', () => {
    const e = entriesFor('couette', api);
    expect(e.gap).toEqual({ text: '1', unit: 'mm' });
    expect(e.gas).toEqual({ text: 'Ar', unit: '' });
    expect(e.cellsY).toEqual({ text: '', unit: '' });
  });
});
