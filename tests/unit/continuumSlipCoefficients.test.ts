import { describe, expect, it } from 'vitest';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { modelFromSpecies } from '../../engine/gas/molecularModel';
import { SPECIES } from '../../engine/gas/species';
import { pathPerViscosityPath } from '../../engine/continuum/meanFreePath';
import {
  CERCIGNANI_SECOND_ORDER,
  DEISSLER_SECOND_ORDER,
  HADJICONSTANTINOU_SECOND_ORDER,
  KINETIC_BGK_SLIP,
  KINETIC_S_MODEL_JUMP,
  MAXWELL_SLIP,
  SECOND_ORDER_SLIP_SETS,
  SMOLUCHOWSKI_JUMP,
  slipLengthCoefficients,
  temperatureJumpDistanceM,
} from '../../engine/continuum/slipCoefficients';
import {
  euckenConductivityWPerMK,
  monatomicConductivityWPerMK,
  prandtlNumber,
} from '../../engine/continuum/thermalConductivity';
import {
  checkedGasState,
  densityKgPerM3,
  gasStateFromModel,
  prandtlNumberOf,
  viscosityPathOf,
} from '../../engine/continuum/gasState';

describe('slip coefficient data', () => {
  it('every coefficient names its source, its flag and the mean free path it is quoted in', () => {
    for (const c of [
      MAXWELL_SLIP,
      KINETIC_BGK_SLIP,
      SMOLUCHOWSKI_JUMP,
      KINETIC_S_MODEL_JUMP,
      ...SECOND_ORDER_SLIP_SETS,
    ]) {
      expect(c.source.length).toBeGreaterThan(10);
      expect(['published', 'computed', 'from memory', 'common practice']).toContain(c.flag);
      expect(['viscosity', 'equivalent', 'hardSphere']).toContain(c.meanFreePath);
    }
  });

  it("Cercignani's C1 = 1.1466 λ is the BGK slip coefficient σ_P = 1.0162 ℓ (reference notes §6 and §2, two sources)", () => {
    const inEll = CERCIGNANI_SECOND_ORDER.c1 / pathPerViscosityPath('equivalent');
    // Both are given to five figures: they may differ by the rounding of each (±5e-5 + ±4.4e-5).
    expect(Math.abs(inEll - KINETIC_BGK_SLIP.value)).toBeLessThan(1e-4);
  });

  it("Hadjiconstantinou's C1 = 1.11 λ_HS is about 0.99 ℓ, the hard-sphere value of Ohwada, Sone & Aoki 1989 (from memory)", () => {
    const c1InEll =
      (HADJICONSTANTINOU_SECOND_ORDER.c1 * pathPerViscosityPath('hardSphere')) / pathPerViscosityPath('equivalent');
    expect(Math.abs(c1InEll - 0.99)).toBeLessThan(0.005);
  });

  it('slipLengthCoefficients() converts to λ and applies (2 − σ)/σ to the first-order term only', () => {
    expect(slipLengthCoefficients({ kind: 'noSlip' }, 1)).toEqual({ first: 0, second: 0 });
    // Maxwell: (2 − 0.8)/0.8 = 1.5 (Maxwell 1879; from memory).
    expect(slipLengthCoefficients({ kind: 'firstOrder' }, 0.8).first).toBeCloseTo(1.5, 14);
    expect(slipLengthCoefficients({ kind: 'firstOrder', coefficient: KINETIC_BGK_SLIP }, 1).first).toBeCloseTo(
      (1.0162 * 2) / Math.sqrt(Math.PI),
      14,
    );
    const d = slipLengthCoefficients({ kind: 'secondOrder', coefficients: DEISSLER_SECOND_ORDER }, 0.5);
    expect(d.first).toBeCloseTo(3, 14);
    expect(d.second).toBeCloseTo(9 / 8, 14);
    const h = slipLengthCoefficients({ kind: 'secondOrder', coefficients: HADJICONSTANTINOU_SECOND_ORDER }, 1);
    expect(h.second).toBeCloseTo(0.61 * pathPerViscosityPath('hardSphere') ** 2, 14);
    expect(() => slipLengthCoefficients({ kind: 'noSlip' }, 0)).toThrow(
      /velocity accommodation = 0: must be in \(0, 1\]/,
    );
  });
});

describe('conductivity, Prandtl number and gas state', () => {
  it('monatomic κ = (15/4)(k/m)μ gives Pr = 2/3 (Chapman–Enskog; from memory)', () => {
    const m = SPECIES.Ar.massKg;
    const kappa = monatomicConductivityWPerMK(2e-5, m);
    expect(kappa).toBeCloseTo((15 / 4) * (K_B / m) * 2e-5, 15);
    expect(prandtlNumber(2e-5, kappa, m, 0)).toBeCloseTo(2 / 3, 14);
    expect(euckenConductivityWPerMK(2e-5, m, 0)).toBe(kappa);
  });

  it("Eucken's Pr = 4γ/(9γ − 5): 14/19 for diatomics, 16/21 for ζ = 3 (Eucken 1913; from memory)", () => {
    const m = SPECIES.N2.massKg;
    for (const [zeta, gamma] of [
      [2, 7 / 5],
      [3, 4 / 3],
    ] as const) {
      const pr = prandtlNumber(1.7e-5, euckenConductivityWPerMK(1.7e-5, m, zeta), m, zeta);
      expect(pr).toBeCloseTo((4 * gamma) / (9 * gamma - 5), 14);
    }
  });

  it('gasStateFromModel(argon VHS, 273 K): κ within 2 % of 0.0164 W/(m·K) (handbook near 0 °C; from memory)', () => {
    const s = gasStateFromModel(modelFromSpecies('Ar', 'VHS'), 100, 273);
    expect(Math.abs(s.conductivityWPerMK / 0.0164 - 1)).toBeLessThan(0.02);
    expect(densityKgPerM3(s)).toBeCloseTo((100 * SPECIES.Ar.massKg) / (K_B * 273), 18);
    expect(() => checkedGasState({ ...s, pressurePa: -1 })).toThrow(/gas pressure \(Pa\) = -1/);
  });

  it('Smoluchowski jump distance is (15/8)λ for a monatomic gas and diffuse walls (γ = 5/3, Pr = 2/3 in the formula)', () => {
    const s = gasStateFromModel(modelFromSpecies('Ar', 'HS'), 10, 300);
    expect(prandtlNumberOf(s)).toBeCloseTo(2 / 3, 14);
    expect(temperatureJumpDistanceM(SMOLUCHOWSKI_JUMP, s, 1) / viscosityPathOf(s)).toBeCloseTo(15 / 8, 13);
    // (2 − 0.5)/0.5 = 3 times as long for σ_T = 0.5.
    expect(temperatureJumpDistanceM(SMOLUCHOWSKI_JUMP, s, 0.5) / viscosityPathOf(s)).toBeCloseTo(45 / 8, 13);
  });

  it('the S-model jump 1.954 ℓ is 1.7317 λ (reference notes §2; λ = ℓ√π/2)', () => {
    const s = gasStateFromModel(modelFromSpecies('Ar', 'HS'), 10, 300);
    expect(temperatureJumpDistanceM(KINETIC_S_MODEL_JUMP, s, 1) / viscosityPathOf(s)).toBeCloseTo(
      (1.954 * 2) / Math.sqrt(Math.PI),
      13,
    );
  });
});
