import { describe, expect, it } from 'vitest';
import * as continuum from '../../engine/continuum/index';
import * as meanFreePath from '../../engine/continuum/meanFreePath';
import * as thermalConductivity from '../../engine/continuum/thermalConductivity';
import * as gasState from '../../engine/continuum/gasState';
import * as slipCoefficients from '../../engine/continuum/slipCoefficients';
import * as profileSampling from '../../engine/continuum/profileSampling';
import * as couette from '../../engine/continuum/couette';
import * as fourier from '../../engine/continuum/fourier';
import * as poiseuille from '../../engine/continuum/poiseuille';
import * as pressureDrivenDuct from '../../engine/continuum/pressureDrivenDuct';
import * as unifiedFlowModel from '../../engine/continuum/unifiedFlowModel';

describe('engine/continuum/index.ts', () => {
  it('re-exports every value each continuum module exports', () => {
    const modules = {
      meanFreePath,
      thermalConductivity,
      gasState,
      slipCoefficients,
      profileSampling,
      couette,
      fourier,
      poiseuille,
      pressureDrivenDuct,
      unifiedFlowModel,
    };
    const missing: string[] = [];
    for (const [name, mod] of Object.entries(modules)) {
      for (const [key, value] of Object.entries(mod)) {
        if ((continuum as Record<string, unknown>)[key] !== value) missing.push(`${name}.${key}`);
      }
    }
    expect(missing).toEqual([]);
  });
});
