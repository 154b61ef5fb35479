/**
 * Duct presets: each builds a case that parses and plans, at the Knudsen number asked for (λ viscosity-based, at the
 * mean vessel pressure, on the gap or radius), with the pressure ratio asked for, the documented names of walls and
 * sections, and blocks that leave exactly the duct open.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset, presetHelp, presetNames } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { wallNamesOf } from '../../engine/kernel/sideTable';

describe('duct presets', () => {
  it('are listed, with help for each', () => {
    for (const name of ['poiseuille', 'channel', 'tube', 'slit', 'orifice']) {
      expect(presetNames()).toContain(name);
      expect(presetHelp(name)).toMatch(/knudsen=/);
    }
  });

  it('channel: Kn at the mean pressure, the pressure ratio, walls lowerWall.top / upperWall.bottom, sections inlet/middle/outlet', () => {
    const p = planOrThrow(buildPreset('channel', { knudsen: '0.3', pressureRatio: '4', gap: '2um', lengthToGap: '5' }));
    const b = p.caseData.boundaries;
    if (b.left.type !== 'reservoir' || b.right.type !== 'reservoir') throw new Error('reservoir ends expected');
    expect(b.left.pressurePa / b.right.pressurePa).toBeCloseTo(4, 12);
    expect(p.reference.knudsen).toBeCloseTo(0.3, 12);
    expect(p.caseData.initial.pressurePa).toBeCloseTo((b.left.pressurePa + b.right.pressurePa) / 2, 6);
    expect(wallNamesOf(p)).toEqual(expect.arrayContaining(['lowerWall.top', 'upperWall.bottom']));
    expect(p.caseData.flowSections.map((s) => s.name)).toEqual(['inlet', 'middle', 'outlet']);
    // The gap between the blocks is the channel: H = 2 µm.
    const [lower, upper] = p.caseData.blocks;
    expect(upper.yMinM - lower.yMaxM).toBeCloseTo(2e-6, 15);
    expect(p.caseData.flowReport).toMatchObject({ duct: 'channel', sizeM: 2e-6 });
    expect(p.caseData.flowReport!.lengthM).toBeCloseTo(1e-5, 15);
  });

  it('tube: axisymmetric with the axis at the bottom, Kn on the radius, wall.bottom the tube wall', () => {
    const p = planOrThrow(buildPreset('tube', { knudsen: '2', radius: '3mm', lengthToRadius: '4' }));
    expect(p.grid.axisymmetric).toBe(true);
    expect(p.caseData.boundaries.bottom.type).toBe('axis');
    expect(p.reference.knudsen).toBeCloseTo(2, 12);
    expect(p.caseData.blocks[0]).toMatchObject({ name: 'wall', yMinM: 3e-3 });
    expect(wallNamesOf(p)).toContain('wall.bottom');
  });

  it('slit and orifice: a plate with the opening, sections upstream/opening/downstream', () => {
    for (const [name, size] of [
      ['slit', 'gap'],
      ['orifice', 'radius'],
    ] as const) {
      const p = planOrThrow(buildPreset(name, { knudsen: '1', [size]: '1mm' }));
      expect(p.caseData.flowSections.map((s) => s.name)).toEqual(['upstream', 'opening', 'downstream']);
      expect(p.caseData.flowReport?.duct).toBe(name);
      expect(p.reference.knudsen).toBeCloseTo(1, 12);
    }
  });

  it('poiseuille: periodic, driven along x, Kn on the gap, G_P defined (flowReport channel)', () => {
    const p = planOrThrow(buildPreset('poiseuille', { knudsen: '0.1', gap: '1um', acceleration: '1e9 m/s²' }));
    expect(p.caseData.boundaries.left.type).toBe('periodic');
    expect(p.bodyAccelerationXMPerS2).toBe(1e9);
    expect(p.reference.knudsen).toBeCloseTo(0.1, 12);
    expect(p.caseData.flowReport).toMatchObject({ duct: 'channel', sizeM: 1e-6 });
  });

  it('refuse values outside their range with a message naming the parameter', () => {
    expect(() => buildPreset('channel', { pressureRatio: '0.5' })).toThrow(/pressureRatio.*greater than 1/);
    expect(() => buildPreset('tube', { accommodation: '1.5' })).toThrow(/accommodation/);
  });
});
