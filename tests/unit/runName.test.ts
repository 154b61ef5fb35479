/**
 * Saved runs are named for the case actually run (app/saved/runName.ts): geometry, gas, size with its unit, Kn and
 * the vessel pressures, so an example edited before its run is not listed under the example's title.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { runNameOf } from '../../app/saved/runName';
import type { CaseInput } from '../../engine/case/schema';

describe('runNameOf()', () => {
  it('a tube between vessels: duct, gas, radius and length with units, Kn, upstream → downstream pressure', () => {
    const c = buildPreset('tube', {
      gas: 'N2',
      radius: '2mm',
      knudsen: '0.5',
      pressureRatio: '2',
      lengthToRadius: '5',
      temperature: '295K',
    }) as CaseInput;
    const name = runNameOf(c, 0.5, 'tube');
    expect(name).toMatch(/^tube, N2, R 2 mm, L 10 mm, Kn 0\.5, [0-9.]+ Pa → [0-9.]+ Pa$/);
  });
  it('changes with the inputs: another radius and gas give another name', () => {
    const a = buildPreset('tube', { gas: 'N2', radius: '2mm', knudsen: '0.5' }) as CaseInput;
    const b = buildPreset('tube', { gas: 'Ar', radius: '50µm', knudsen: '0.5' }) as CaseInput;
    expect(runNameOf(a, 0.5)).not.toBe(runNameOf(b, 0.5));
    expect(runNameOf(b, 0.5)).toContain('Ar, R 50 µm');
  });
  it('a case without a duct is named by its preset and characteristic length', () => {
    const c = buildPreset('couette', { gas: 'N2', gap: '2 µm', knudsen: '0.5' }) as CaseInput;
    expect(runNameOf(c, 0.5, 'couette')).toMatch(/^couette, N2, L 2 µm, Kn 0\.5/);
  });
});
