// The long-duct solver with thermal creep (engine/longDuct/ductFlow.ts): the isothermal integral, any two of the
// three end conditions, and thermal transpiration in the free-molecular limit (Knudsen's law).
import { describe, expect, it } from 'vitest';
import { modelFromSpecies } from '../../engine/gas/molecularModel';
import {
  FREE_MOLECULAR_TUBE_GP,
  FREE_MOLECULAR_TUBE_GT,
  type CoefficientTable,
} from '../../engine/longDuct/coefficientTable';
import { solveIsothermalDuct } from '../../engine/longDuct/isothermalDuct';
import { solveDuctFlow } from '../../engine/longDuct/ductFlow';

const N2 = modelFromSpecies('N2', 'VHS');

// Linearized BGK plane Poiseuille G_P, diffuse walls (the project's reference notes §2, computed).
const BGK_CHANNEL: CoefficientTable = {
  shape: 'channel',
  source: 'linearized BGK (reference notes §2)',
  gasAndWall: 'BGK model, diffuse walls',
  points: [
    { rarefaction: 0.01, reducedFlowRate: 3.04965, reducedFlowRateCi95: 0.01 },
    { rarefaction: 0.1, reducedFlowRate: 2.03271, reducedFlowRateCi95: 0.01 },
    { rarefaction: 1, reducedFlowRate: 1.53868, reducedFlowRateCi95: 0.01 },
    { rarefaction: 10, reducedFlowRate: 2.76864, reducedFlowRateCi95: 0.02 },
    { rarefaction: 100, reducedFlowRate: 17.6933, reducedFlowRateCi95: 0.05 },
  ],
};

/** Free-molecular tube: G_P = 8/(3√π), G_T = 4/(3√π) (Sharipov & Seleznev 1998) over δ = 1e-7…1e-1. */
const FM_TUBE: CoefficientTable = {
  shape: 'tube',
  source: 'free-molecular limit',
  gasAndWall: 'any gas, diffuse walls',
  points: [-7, -5, -3, -1].map((e) => ({
    rarefaction: 10 ** e,
    reducedFlowRate: FREE_MOLECULAR_TUBE_GP,
    reducedFlowRateCi95: 0,
    thermalCreep: FREE_MOLECULAR_TUBE_GT,
    thermalCreepCi95: 0,
  })),
};

const channel = { shape: 'channel' as const, gapM: 1.33e-6, widthM: 52.25e-6, lengthM: 7.5e-3 };

describe('long duct with thermal creep', () => {
  it('at one temperature it is the isothermal integral (to 1e-6), with the same half-width', () => {
    const iso = solveIsothermalDuct({
      geometry: channel,
      gas: N2,
      temperatureK: 300,
      upstreamPressurePa: 3e5,
      downstreamPressurePa: 1e5,
      table: BGK_CHANNEL,
    });
    const ode = solveDuctFlow({
      geometry: channel,
      gas: N2,
      table: BGK_CHANNEL,
      upstreamTemperatureK: 300,
      downstreamTemperatureK: 300,
      upstreamPressurePa: 3e5,
      downstreamPressurePa: 1e5,
    });
    expect(Math.abs(ode.massFlowRateKgPerS.mean / iso.massFlowRateKgPerS.mean - 1)).toBeLessThan(1e-6);
    // The ODE raises G_P by its half-width everywhere, the isothermal integral adds ∫ci95 dδ: the same bound.
    expect(Math.abs(ode.massFlowRateKgPerS.ci95 / iso.massFlowRateKgPerS.ci95 - 1)).toBeLessThan(1e-4);
  });

  it('solves for whichever of the three is not given', () => {
    const common = {
      geometry: channel,
      gas: N2,
      table: BGK_CHANNEL,
      upstreamTemperatureK: 300,
      downstreamTemperatureK: 300,
    };
    const flow = solveDuctFlow({ ...common, upstreamPressurePa: 3e5, downstreamPressurePa: 1e5 }).massFlowRateKgPerS
      .mean;
    const down = solveDuctFlow({ ...common, upstreamPressurePa: 3e5, massFlowRateKgPerS: flow });
    expect(down.downstreamPressurePa.mean / 1e5 - 1).toBeCloseTo(0, 7);
    const up = solveDuctFlow({ ...common, downstreamPressurePa: 1e5, massFlowRateKgPerS: flow });
    expect(up.upstreamPressurePa.mean / 3e5 - 1).toBeCloseTo(0, 7);
    expect(() => solveDuctFlow({ ...common, upstreamPressurePa: 3e5, massFlowRateKgPerS: 100 * flow })).toThrow(
      /more than the duct carries/,
    );
    expect(() => solveDuctFlow({ ...common, upstreamPressurePa: 3e5 })).toThrow(/exactly two of/);
  });

  it("free-molecular thermal transpiration: at zero flow p_cold/p_hot = √(T_cold/T_hot) within 0.5 % (Knudsen's law)", () => {
    const r = solveDuctFlow({
      geometry: { shape: 'tube', radiusM: 1e-3, lengthM: 0.1 },
      gas: N2,
      table: FM_TUBE,
      upstreamTemperatureK: 300,
      downstreamTemperatureK: 77,
      upstreamPressurePa: 1e-3,
      massFlowRateKgPerS: 0,
    });
    expect(Math.abs(r.downstreamPressurePa.mean / 1e-3 / Math.sqrt(77 / 300) - 1)).toBeLessThan(0.005);
  });

  it('near continuum the zero-flow pressure ratio tends to 1 (thermal creep G_T ∝ 1/δ, small against G_P)', () => {
    // Slip-regime forms (Sharipov & Seleznev 1998): G_P = δ/4 + σ_P, G_T ∝ 1/δ; the constant 0.6 is illustrative.
    const table: CoefficientTable = {
      shape: 'tube',
      source: 'slip-regime forms',
      gasAndWall: 'test',
      points: [1, 10, 100, 1000, 10000].map((d) => ({
        rarefaction: d,
        reducedFlowRate: d / 4 + 1,
        reducedFlowRateCi95: 0,
        thermalCreep: 0.6 / d,
      })),
    };
    const ratio = (p: number) =>
      solveDuctFlow({
        geometry: { shape: 'tube', radiusM: 1e-3, lengthM: 0.1 },
        gas: N2,
        table,
        upstreamTemperatureK: 300,
        downstreamTemperatureK: 400,
        upstreamPressurePa: p,
        massFlowRateKgPerS: 0,
      }).downstreamPressurePa.mean / p;
    const atHigh = ratio(1e5);
    const atLow = ratio(1e2);
    expect(Math.abs(atHigh - 1)).toBeLessThan(1e-4);
    expect(atLow - 1).toBeGreaterThan(atHigh - 1);
    expect(atLow).toBeLessThan(Math.sqrt(400 / 300));
  });

  it('refuses unequal temperatures without a thermal-creep column, naming G_T', () => {
    expect(() =>
      solveDuctFlow({
        geometry: channel,
        gas: N2,
        table: BGK_CHANNEL,
        upstreamTemperatureK: 300,
        downstreamTemperatureK: 350,
        upstreamPressurePa: 2e5,
        downstreamPressurePa: 1e5,
      }),
    ).toThrow(/no thermal-creep coefficient G_T/);
  });
});
