import { describe, expect, it } from 'vitest';
import { parseCase, type Case } from '../../engine/case/schema';
import { plan, type Plan } from '../../engine/plan/plan';
import { SPECIES_IDS } from '../../engine/gas/species';
import { buildPreset, defaultNumerics, presetHelp, presetNames, PRESETS } from '../../engine/case/presets';

function planned(overrides: Record<string, string>, name = 'couette'): { c: Case; p: Plan } {
  const parsed = parseCase(buildPreset(name, overrides));
  if (!parsed.ok) throw new Error(parsed.errors.join('\n'));
  const r = plan(parsed.value);
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return { c: parsed.value, p: r.plan };
}

describe('presets', () => {
  it('buildPreset("couette") sets the pressure so that plan() finds the requested Kn = λ/H, for every table gas and model', () => {
    for (const gas of SPECIES_IDS) {
      for (const model of ['HS', 'VHS', 'VSS']) {
        if (gas === 'air' && model === 'VSS') continue; // no VSS data for air
        for (const knudsen of ['0.01', '0.3', '5']) {
          const { p } = planned({ gas, model, knudsen, gap: '0.5 mm', temperature: '300 K' });
          expect(p.reference.knudsen, `${gas} ${model} Kn ${knudsen}`).toBeCloseTo(Number(knudsen), 12);
          expect(p.reference.lengthScaleM).toBe(5e-4);
        }
      }
    }
  });

  it('buildPreset("couette") builds the 1D gap: square cells, periodic x, walls at ∓U/2 at the gas temperature', () => {
    const { c, p } = planned({ knudsen: '0.05', wallSpeed: '300 m/s', temperature: '20 °C' });
    const cellsY = defaultNumerics(0.05).cellsY;
    expect(cellsY).toBe(60);
    expect(c.numerics.cellsX).toBe(1);
    expect(c.numerics.cellsY).toBe(60);
    expect(c.domain.lengthXM).toBeCloseTo(1e-3 / 60, 18);
    expect(p.grid.cellSizeXM).toBeCloseTo(p.grid.cellSizeYM, 18);
    expect(c.boundaries.left.type).toBe('periodic');
    expect(c.boundaries.bottom).toMatchObject({ type: 'wall', model: 'diffuse', velocityMPerS: [-150, 0, 0] });
    expect(c.boundaries.top).toMatchObject({ type: 'wall', model: 'diffuse', velocityMPerS: [150, 0, 0] });
    const top = c.boundaries.top as { temperatureK: number };
    expect(top.temperatureK).toBeCloseTo(293.15, 12);
    expect(c.initial.temperatureK).toBeCloseTo(293.15, 12);
  });

  it('defaultNumerics() gives at least 20 cells and cells of at most λ/3; the sampling is left to the run sizing', () => {
    expect(defaultNumerics(1)).toEqual({ cellsY: 20, particlesPerCell: 100 });
    expect(buildPreset('couette', { knudsen: '0.1' }).sampling?.sampleSteps).toBeUndefined();
    expect(buildPreset('couette', { knudsen: '0.1', sampleSteps: '5000' }).sampling?.sampleSteps).toBe(5000);
    expect(buildPreset('poiseuille', { knudsen: '0.1' }).sampling?.sampleSteps).toBeUndefined();
    expect(defaultNumerics(0.1).cellsY).toBe(30);
    expect(defaultNumerics(0.01).cellsY).toBe(300);
  });

  it('buildPreset("fourier") puts the hot wall on top, the cold one at the bottom, and the gas at their mean', () => {
    const { c, p } = planned({ hotTemperature: '400K', coldTemperature: '200K', knudsen: '0.2' }, 'fourier');
    expect(c.boundaries.top).toMatchObject({ temperatureK: 400, velocityMPerS: [0, 0, 0] });
    expect(c.boundaries.bottom).toMatchObject({ temperatureK: 200, velocityMPerS: [0, 0, 0] });
    expect(c.initial.temperatureK).toBe(300);
    expect(p.reference.temperatureK).toBe(300);
    expect(p.reference.knudsen).toBeCloseTo(0.2, 12);
  });

  it('buildPreset() numerics overrides reach the case', () => {
    const { c } = planned({
      cellsY: '12',
      particlesPerCell: '50',
      sampleSteps: '1000',
      transientSteps: '7',
      seed: '99',
    });
    expect(c.numerics).toMatchObject({ cellsY: 12, particlesPerCell: 50 });
    expect(c.sampling).toMatchObject({ sampleSteps: 1000, transientSteps: 7 });
    expect(c.seed).toBe(99);
  });

  it('buildPreset() errors name what is valid', () => {
    expect(() => buildPreset('nope')).toThrow(/available presets: couette, fourier/);
    expect(() => buildPreset('couette', { gapp: '1mm' })).toThrow(/its parameters are gas, model, knudsen, gap/);
    expect(() => buildPreset('couette', { gas: 'Ar2' })).toThrow(/choose one of H2, He, Ne, Ar/);
    expect(() => buildPreset('couette', { knudsen: '0' })).toThrow(/knudsen.*greater than 0/);
    expect(() => buildPreset('couette', { gap: '-1 mm' })).toThrow(/gap.*greater than 0 mm/);
    expect(() => buildPreset('couette', { cellsY: '2.5' })).toThrow(/cellsY.*whole number/);
    expect(() => buildPreset('couette', { gas: 'air', model: 'VSS' })).toThrow(/no VSS data for air/);
  });

  it('presetHelp() lists every parameter with its default and units', () => {
    for (const name of presetNames()) {
      const text = presetHelp(name);
      for (const p of PRESETS[name].parameters) expect(text).toContain(`${p.name}=`);
    }
    expect(presetHelp('couette')).toMatch(/temperature=273 K .*K, °C/);
  });
});
