/** The case schema's geometry rules: each refusal names the field and says what is allowed. */
import { describe, expect, it } from 'vitest';
import { parseCase, type CaseInput } from '../../engine/case/schema';
import { buildPreset } from '../../engine/case/presets';

const base = (): CaseInput => buildPreset('channel', { knudsen: '1' });
const errorsOf = (c: unknown) => {
  const r = parseCase(c);
  return r.ok ? [] : r.errors;
};

describe('case schema: blocks, sections, open sides, axisymmetric rules, wall names', () => {
  it('accepts the presets as built', () => {
    for (const name of ['channel', 'tube', 'slit', 'orifice', 'poiseuille', 'cavity'])
      expect(errorsOf(buildPreset(name, {})), name).toEqual([]);
  });
  it('refuses a block outside the domain or turned inside out, naming the block and the field', () => {
    const c = base();
    c.blocks![0].xMaxM = c.domain.lengthXM * 2;
    c.blocks![1].yMinM = c.blocks![1].yMaxM;
    const e = errorsOf(c).join('\n');
    expect(e).toMatch(/blocks\.0\.xMaxM: block lowerWall: xMaxM .* lies outside the domain/);
    expect(e).toMatch(/blocks\.1\.yMaxM: block upperWall: yMaxM .* must be greater than yMinM/);
  });
  it('refuses names used twice, and a flow section outside the domain', () => {
    const c = base();
    c.blocks![1].name = 'lowerWall';
    c.flowSections![0].xM = -1;
    const e = errorsOf(c).join('\n');
    expect(e).toMatch(/blocks\.1\.name: block name "lowerWall" is used twice/);
    expect(e).toMatch(/flowSections\.0\.xM/);
  });
  it('the axis only at the bottom of an axisymmetric domain; a pressure outlet only at the left or right end', () => {
    const c = base();
    c.boundaries.top = { type: 'axis' };
    c.boundaries.bottom = { type: 'pressureOutlet', pressurePa: 10 };
    const e = errorsOf(c).join('\n');
    expect(e).toMatch(/boundaries\.top\.type: only the bottom side of an axisymmetric domain can be the axis/);
    expect(e).toMatch(/boundaries\.bottom\.type: a pressureOutlet ends a duct along x/);
    const tube = buildPreset('tube', {});
    tube.boundaries.bottom = { type: 'symmetry' };
    expect(errorsOf(tube).join('\n')).toMatch(
      /boundaries\.bottom\.type: in an axisymmetric domain the bottom side .* is the axis/,
    );
  });
  it('a wall may carry its own name (the cavity lid), unique among the walls', () => {
    const cavity = buildPreset('cavity', {});
    expect(cavity.boundaries.top).toMatchObject({ type: 'wall', name: 'lid' });
    const twice = {
      ...cavity,
      boundaries: { ...cavity.boundaries, bottom: { ...cavity.boundaries.bottom, name: 'lid' } },
    };
    expect(errorsOf(twice).join('\n')).toMatch(/boundaries\.(top|bottom)\.name: wall name "lid" is already used/);
  });
  it('a negative reservoir pressure is refused; 0 is a vacuum', () => {
    const c = base();
    const right = c.boundaries.right as { pressurePa: number };
    right.pressurePa = 0;
    expect(errorsOf(c)).toEqual([]);
    right.pressurePa = -1;
    expect(errorsOf(c).join('\n')).toMatch(
      /boundaries\.right\.pressurePa: reservoir pressure must be 0 \(vacuum\) or more/,
    );
  });
});
