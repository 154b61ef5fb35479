/**
 * The set-up forms on top of a preset's case: wall temperature and speed with their units, a custom gas, and the
 * block table (typed, drawn, taken over from the preset), each reaching the case or giving a message at its field.
 */
import { describe, expect, it } from 'vitest';
import * as setup from '../../app/bridge/setupApi';
import { createAppStore } from '../../app/store/store';
import { formOf } from '../../app/store/caseSlice';
import { convertEntry, type CustomGasEdit, type GasEdit } from '../../app/setup/formModel';
import {
  addBlockRow,
  blockTableFrom,
  convertBlockTable,
  removeBlockRow,
  snapToGrid,
  updateBlockRow,
} from '../../app/setup/blockEdits';
import type { SetupApi } from '../../app/bridge/types';
import type { CaseInput } from '../../engine/case/schema';

const api = setup as SetupApi;
const newStore = (preset: string) => {
  const store = createAppStore({ setup: () => api }, 2);
  store.getState().selectPreset(preset);
  return store;
};
const caseOf = (store: ReturnType<typeof newStore>) => store.getState().derived!.caseInput as CaseInput;

/** Argon's data typed as a custom gas (Bird's VHS row: 39.948 g/mol ≈ 66.3e-27 kg, d = 4.17e-10 m, ω = 0.81). */
const argonLike: GasEdit & { custom: CustomGasEdit } = {
  source: 'custom',
  custom: {
    name: 'myArgon',
    mass: { text: String(66.3e-27 * 6.02214076e23 * 1e3), unit: 'g/mol' },
    diameter: { text: '0.417', unit: 'nm' },
    referenceTemperature: { text: '273', unit: 'K' },
    viscosityIndex: '0.81',
    scatteringExponent: '1',
    rotationalDof: '0',
  },
};

/** Blocks equal to 12 significant digits (the table shows six; a coordinate on the domain's edge stays on it). */
function expectSameBlocks(actual: NonNullable<CaseInput['blocks']>, expected: NonNullable<CaseInput['blocks']>): void {
  expect(actual.map((b) => b.name)).toEqual(expected.map((b) => b.name));
  for (const [i, b] of expected.entries()) {
    for (const k of ['xMinM', 'xMaxM', 'yMinM', 'yMaxM'] as const) expect(actual[i][k]).toBeCloseTo(b[k], 17);
    expect(actual[i].wall).toEqual(b.wall);
  }
}

describe('wall temperature and speed', () => {
  it('a wall temperature in °C reaches the case in kelvin (26.85 °C → 300 K), one in K as typed', () => {
    const store = newStore('couette');
    store.getState().setWall('top', { temperature: { text: '26.85', unit: '°C' } });
    store.getState().setWall('bottom', { temperature: { text: '250', unit: 'K' } });
    const c = caseOf(store);
    expect(c.boundaries.top).toMatchObject({ type: 'wall', temperatureK: 300 });
    expect(c.boundaries.bottom).toMatchObject({ type: 'wall', temperatureK: 250 });
    // The gas and the other preset values are untouched.
    expect(c.initial.temperatureK).toBe(273);
  });

  it('a wall speed goes along the wall: x for top and bottom, y for left and right', () => {
    const store = newStore('couette');
    store.getState().setWall('top', { speed: { text: '-20', unit: 'm/s' } });
    expect((caseOf(store).boundaries.top as { velocityMPerS: number[] }).velocityMPerS).toEqual([-20, 0, 0]);
    const cavity = newStore('cavity');
    cavity.getState().setWall('left', { speed: { text: '5', unit: 'm/s' } });
    expect((caseOf(cavity).boundaries.left as { velocityMPerS: number[] }).velocityMPerS).toEqual([0, 5, 0]);
  });

  it('a temperature below absolute zero and a non-number are marked at their wall fields, and there is no case', () => {
    const store = newStore('couette');
    store.getState().setWall('top', { temperature: { text: '-300', unit: '°C' } });
    expect(store.getState().derived!.fieldErrors['wall:top:temperatureK']).toMatch(/greater than zero/);
    expect(store.getState().derived!.caseInput).toBeNull();
    store.getState().setWall('top', { temperature: { text: '20', unit: '°C' }, speed: { text: 'fast', unit: 'm/s' } });
    expect(store.getState().derived!.fieldErrors['wall:top:velocityMPerS']).toMatch(/"fast" is not a number/);
    expect(store.getState().derived!.fieldErrors['wall:top:temperatureK']).toBeUndefined();
  });

  it('converting a unit keeps the value: 300 K ↔ 26.85 °C, 39.948 g/mol ↔ 6.6335e-26 kg', () => {
    expect(convertEntry({ text: '300', unit: 'K' }, '°C', api)).toEqual({ text: '26.85', unit: '°C' });
    expect(convertEntry({ text: '26.85', unit: '°C' }, 'K', api)).toEqual({ text: '300', unit: 'K' });
    const kg = convertEntry({ text: '39.948', unit: 'g/mol' }, 'kg', api);
    expect(Number(kg.text)).toBeCloseTo(39.948e-3 / 6.02214076e23, 30);
    expect(convertEntry(kg, 'g/mol', api)).toEqual({ text: '39.948', unit: 'g/mol' });
  });
});

describe('gas panel', () => {
  it('a custom gas reaches gas.custom in SI and keeps the preset’s Knudsen number', () => {
    const store = newStore('channel');
    const tableCase = caseOf(store);
    store.getState().setGas(argonLike);
    const c = caseOf(store);
    expect(c.gas.species).toBeUndefined();
    expect(c.gas.custom).toMatchObject({
      name: 'myArgon',
      referenceDiameterM: 4.17e-10,
      referenceTemperatureK: 273,
      viscosityIndex: 0.81,
      rotationalDof: 0,
    });
    expect(c.gas.custom!.massKg).toBeCloseTo(66.3e-27, 35);
    expect(c.name).toMatch(/myArgon/);
    // The same molecules as the table's argon: the same pressures (the rescaling factor is 1).
    expect(c.initial.pressurePa).toBeCloseTo(tableCase.initial.pressurePa, 6);
    // Smaller molecules: at fixed Kn, p ∝ μ/sqrt(m) ∝ 1/d² for VHS (the mass cancels), and the plan's Knudsen number
    // is still the preset's.
    store.getState().setGas({
      ...argonLike,
      custom: { ...argonLike.custom, diameter: { text: '0.3', unit: 'nm' }, mass: { text: '4.0026', unit: 'g/mol' } },
    });
    const light = caseOf(store);
    expect(light.initial.pressurePa / tableCase.initial.pressurePa).toBeCloseTo((0.417 / 0.3) ** 2, 10);
    const left = light.boundaries.left as { pressurePa: number };
    const right = light.boundaries.right as { pressurePa: number };
    expect(left.pressurePa / right.pressurePa).toBeCloseTo(2, 10);
    expect(store.getState().plan!.reference.knudsen).toBeCloseTo(0.5, 10);
  });

  it('invalid custom fields are marked at their gas fields with what is allowed', () => {
    const store = newStore('couette');
    store.getState().setGas({
      ...argonLike,
      custom: { ...argonLike.custom, viscosityIndex: '1.4', diameter: { text: 'wide', unit: 'nm' }, name: '' },
    });
    const errors = store.getState().derived!.fieldErrors;
    expect(errors['gas:viscosityIndex']).toMatch(/between 0.5 .* and 1/);
    expect(errors['gas:referenceDiameterM']).toMatch(/"wide" is not a number/);
    expect(errors['gas:name']).toMatch(/name/);
    expect(store.getState().derived!.caseInput).toBeNull();
  });

  it('a table gas stays the preset’s gas parameter; VSS for a custom gas uses its α', () => {
    const store = newStore('couette');
    store.getState().setParamText('gas', 'N2');
    store.getState().setGas({ ...argonLike, source: 'table' });
    expect(caseOf(store).gas).toMatchObject({ species: 'N2', model: 'VHS' });
    store.getState().setParamText('model', 'VSS');
    store.getState().setGas({ ...argonLike, custom: { ...argonLike.custom, scatteringExponent: '1.4' } });
    expect(caseOf(store).gas).toMatchObject({ model: 'VSS', custom: { scatteringExponent: 1.4 } });
  });
});

describe('block table', () => {
  it('takes over the preset’s blocks in a unit that suits the domain, and a typed block reaches case.blocks in metres', () => {
    const store = newStore('channel');
    const built = caseOf(store);
    const table = blockTableFrom(built, api);
    expect(table.lengthUnit).toBe('µm');
    expect(table.rows.map((r) => r.name)).toEqual(['lowerWall', 'upperWall']);
    store.getState().setBlocks(table);
    expectSameBlocks(caseOf(store).blocks!, built.blocks!);
    const added = addBlockRow(table, { xMinM: 1e-6, xMaxM: 1.5e-6, yMinM: 1.2e-6, yMaxM: 1.8e-6 }, 300, api);
    expect(added.rows[2]).toMatchObject({
      name: 'block1',
      xMin: '1',
      xMax: '1.5',
      yMin: '1.2',
      yMax: '1.8',
      temperature: '300',
      model: 'diffuse',
    });
    store.getState().setBlocks(updateBlockRow(added, 2, { xMax: '1.75' }));
    const block = caseOf(store).blocks![2];
    expect(block).toMatchObject({
      name: 'block1',
      xMinM: 1e-6,
      xMaxM: 1.75e-6,
      yMinM: 1.2e-6,
      yMaxM: 1.8e-6,
      wall: { type: 'wall', model: 'diffuse', temperatureK: 300 },
    });
    store.getState().setBlocks(removeBlockRow(added, 0));
    expect(caseOf(store).blocks!.map((b) => b.name)).toEqual(['upperWall', 'block1']);
  });

  it('a block outside the domain gets its message at its row, in the table’s unit; a non-number at its field', () => {
    const store = newStore('channel');
    const table = addBlockRow(
      blockTableFrom(caseOf(store), api),
      { xMinM: 1e-6, xMaxM: 2e-6, yMinM: 0, yMaxM: 1e-6 },
      300,
      api,
    );
    store.getState().setBlocks(updateBlockRow(table, 2, { xMax: '500' }));
    const errors = store.getState().derived!.fieldErrors;
    expect(errors['block:2:xMaxM']).toMatch(/outside the domain/);
    expect(errors['block:2:xMaxM']).toMatch(/xMaxM \(500 µm\) lies outside the domain \(lengthXM = 9 µm\)/);
    expect(Object.keys(errors).filter((k) => k.startsWith('block:'))).toEqual(['block:2:xMaxM']);
    expect(store.getState().derived!.caseInput).toBeNull();
    // A row with an unreadable number is left out of the case; messages of the rows after it still find their row.
    store.getState().setBlocks(updateBlockRow(updateBlockRow(table, 0, { yMin: 'low' }), 2, { xMax: '500' }));
    const e2 = store.getState().derived!.fieldErrors;
    expect(e2['block:0:yMinM']).toMatch(/"low" is not a number/);
    expect(e2['block:2:xMaxM']).toMatch(/outside the domain/);
  });

  it('converting the table’s units keeps every value; drawn corners snap to cell edges', () => {
    const store = newStore('channel');
    const table = blockTableFrom(caseOf(store), api);
    const mm = convertBlockTable(table, { lengthUnit: 'mm', temperatureUnit: '°C' }, api);
    expect(mm.rows[1]).toMatchObject({ xMin: '0.002', yMax: '0.003', temperature: '26.85' });
    const before = caseOf(store).blocks!;
    store.getState().setBlocks(mm);
    expectSameBlocks(caseOf(store).blocks!, before);
    expect(snapToGrid(0.26e-6, 1e-6, 10)).toBeCloseTo(0.3e-6, 18);
    expect(snapToGrid(-1, 1e-6, 10)).toBe(0);
    expect(snapToGrid(2e-6, 1e-6, 10)).toBe(1e-6);
  });

  it('setBlocks(null) brings back the preset’s blocks; a new preset drops the gas and block edits', () => {
    const store = newStore('channel');
    store.getState().setBlocks({ lengthUnit: 'µm', temperatureUnit: 'K', rows: [] });
    expect(caseOf(store).blocks).toEqual([]);
    store.getState().setBlocks(null);
    expect(caseOf(store).blocks!.length).toBe(2);
    store.getState().setGas(argonLike);
    store.getState().selectPreset('slit');
    expect(store.getState().gas).toBeUndefined();
    expect(store.getState().blocks).toBeNull();
    expect(caseOf(store).gas.species).toBe('Ar');
  });
});

describe('saved set-ups and JSON mode', () => {
  it('a set-up with gas and block edits survives a save and restore (structured clone, as IndexedDB stores it)', () => {
    const store = newStore('channel');
    store.getState().setGas(argonLike);
    store.getState().setWall('top', { temperature: { text: '30', unit: '°C' } });
    store
      .getState()
      .setBlocks(
        addBlockRow(
          blockTableFrom(caseOf(store), api),
          { xMinM: 0.5e-6, xMaxM: 1e-6, yMinM: 2e-6, yMaxM: 2.5e-6 },
          300,
          api,
        ),
      );
    const saved = structuredClone(formOf(store.getState()));
    const text = store.getState().caseText;
    const other = newStore('couette');
    other.getState().restoreForm(saved);
    expect(other.getState().caseText).toBe(text);
    expect(caseOf(other).blocks!.map((b) => b.name)).toEqual(['lowerWall', 'upperWall', 'block1']);
  });

  it('a set-up saved before the gas and block edits existed restores with the preset’s gas and blocks', () => {
    const store = newStore('channel');
    store.getState().setGas(argonLike);
    const legacy = { presetName: 'slit', params: {}, walls: {}, source: { kind: 'form' as const }, caseText: '' };
    store.getState().restoreForm(legacy);
    expect(store.getState().gas).toBeUndefined();
    expect(caseOf(store).gas.species).toBe('Ar');
    expect(caseOf(store).blocks!.map((b) => b.name)).toEqual(['lowerPlate', 'upperPlate']);
  });

  it('going back to the table gas keeps the custom data typed, and uses the table gas', () => {
    const store = newStore('couette');
    store.getState().setGas(argonLike);
    store.getState().setGas({ ...argonLike, source: 'table' });
    expect(caseOf(store).gas).toEqual({ species: 'Ar', model: 'VHS' });
    expect(store.getState().gas!.custom!.name).toBe('myArgon');
  });

  it('in JSON mode the form edits are not applied and block messages go to the case problems', () => {
    const store = newStore('channel');
    const c = JSON.parse(store.getState().caseText);
    c.blocks[0].xMaxM = 1;
    store.getState().editCaseText(JSON.stringify(c));
    store.getState().setBlocks({ lengthUnit: 'µm', temperatureUnit: 'K', rows: [] });
    store.getState().setGas(argonLike);
    const d = store.getState().derived!;
    expect(d.draft!.blocks![0].xMaxM).toBe(1);
    expect(d.draft!.gas.species).toBe('Ar');
    expect(d.caseErrors.join('\n')).toMatch(/blocks\.0\.xMaxM: .*outside the domain/);
    expect(Object.keys(d.fieldErrors)).toEqual([]);
  });
});
