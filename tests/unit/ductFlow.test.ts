// The long-duct solver with thermal creep (engine/longDuct/ductFlow.ts): the isothermal integral, any two of the
// three end conditions, and thermal transpiration in the free-molecular limit (Knudsen's law).
import { describe, expect, it } from 'vitest';
import { meanSpeedMPerS, modelFromSpecies, viscosityPaS } from '../../engine/gas/molecularModel';
import {
  FREE_MOLECULAR_TUBE_GP,
  FREE_MOLECULAR_TUBE_GT,
  type CoefficientTable,
} from '../../engine/longDuct/coefficientTable';
import { solveIsothermalDuct } from '../../engine/longDuct/isothermalDuct';
import { solveDuctFlow } from '../../engine/longDuct/ductFlow';
import { solvePumpedDuct } from '../../engine/longDuct/pumpedDuct';

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
  points: [-7, -6.5, -6, -5.5, -5, -4.5, -4, -3.5, -3, -2.5, -2, -1.5, -1].map((e) => ({
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

describe('a pump at the end of a long duct', () => {
  it('molecular limit: 1/S_eff = 1/S_pump + 1/C with C = (8R/3L)·πR²·c̄/4 (Knudsen 1909)', () => {
    const geometry = { shape: 'tube' as const, radiusM: 0.02, lengthM: 1 };
    const r = solvePumpedDuct({
      geometry,
      gas: N2,
      temperatureK: 293.15,
      table: FM_TUBE,
      pumpSpeed: 0.1,
      gasLoadPaM3PerS: 1e-6,
    });
    const c = ((8 * 0.02) / 3) * Math.PI * 0.02 ** 2 * (meanSpeedMPerS(N2.massKg, 293.15) / 4);
    expect(r.effectiveSpeedM3PerS.mean * (1 / 0.1 + 1 / c) - 1).toBeCloseTo(0, 5);
    expect(r.pumpInletPressurePa).toBeCloseTo(1e-5, 15);
  });

  it('viscous limit: p_chamber² = p_pump² + 16μLQ/(πR⁴) (Poiseuille, no slip)', () => {
    const table: CoefficientTable = {
      shape: 'tube',
      source: 'no slip',
      gasAndWall: 'continuum',
      points: [1, 10, 100, 1000, 10000, 100000].map((d) => ({
        rarefaction: d,
        reducedFlowRate: d / 4,
        reducedFlowRateCi95: 0,
      })),
    };
    const q = 10; // Pa·m³/s
    const r = solvePumpedDuct({
      geometry: { shape: 'tube', radiusM: 0.02, lengthM: 2 },
      gas: N2,
      temperatureK: 293.15,
      table,
      pumpSpeed: { pressurePa: [10, 1000, 100000], speedM3PerS: [0.01, 0.02, 0.02] },
      gasLoadPaM3PerS: q,
    });
    const mu = viscosityPaS(N2, 293.15);
    const exact = Math.sqrt(r.pumpInletPressurePa ** 2 + (16 * mu * 2 * q) / (Math.PI * 0.02 ** 4));
    expect(r.chamberPressurePa.mean / exact - 1).toBeCloseTo(0, 6);
    // The pump table, interpolated on log–log axes between 10 Pa (0.01 m³/s) and 1000 Pa (0.02 m³/s): p·S(p) = Q.
    const p = r.pumpInletPressurePa;
    const s = 0.01 * (p / 10) ** (Math.log(2) / Math.log(100));
    expect((p * s) / q - 1).toBeCloseTo(0, 9);
  });
});
