import { describe, expect, it } from 'vitest';
import {
  densityRelativeError,
  expectedRelativeError,
  expectedRunPlan,
  heatCapacityRatio,
  independentSamples,
  independentSamplesForRelativeError,
  speedOfSoundMPerS,
  temperatureRelativeError,
  velocityRelativeError,
  velocityStandardErrorMPerS,
  type NoiseQuantity,
} from '../../engine/stats/expectedNoise';
import { SPECIES } from '../../engine/gas/species';
import { boxPlan } from '../validation/boxCase';

// Formulas: Hadjiconstantinou, Garcia, Bazant & He 2003 (J. Comput. Phys. 187:274; from memory, copied from Tenuis's
// reference notes §8): E_u = 1/(Ac sqrt(γNM)), E_ρ = 1/sqrt(NM), E_T = sqrt(k/(c_v NM)) = sqrt(2/(3NM)) monatomic.
// The expected numbers below are those formulas evaluated by hand.

describe('heatCapacityRatio() and speedOfSoundMPerS()', () => {
  it('heatCapacityRatio(ζ) is 5/3, 7/5, 4/3 for 0, 2, 3 rotational degrees of freedom (textbook; from memory)', () => {
    expect(heatCapacityRatio(0)).toBeCloseTo(5 / 3, 15);
    expect(heatCapacityRatio(2)).toBeCloseTo(7 / 5, 15);
    expect(heatCapacityRatio(3)).toBeCloseTo(4 / 3, 15);
    expect(() => heatCapacityRatio(-1)).toThrow(/rotational degrees of freedom = -1/);
  });

  it('speedOfSoundMPerS() of argon at 20 °C is 319 m/s (handbook value, from memory; sqrt(γkT/m) gives 318.97)', () => {
    expect(speedOfSoundMPerS(SPECIES.Ar.massKg, 293.15, 0)).toBeCloseTo(319, 0);
    expect(() => speedOfSoundMPerS(SPECIES.Ar.massKg, 0, 0)).toThrow(/temperature \(K\) = 0/);
  });
});

describe('relative errors', () => {
  it('densityRelativeError(100, 100) = 1/sqrt(10^4) = 0.01', () => {
    expect(densityRelativeError(100, 100)).toBeCloseTo(0.01, 15);
  });

  it('temperatureRelativeError(100, 150) = sqrt(2/45000) = 1/150 for the translational temperature', () => {
    expect(temperatureRelativeError(100, 150)).toBeCloseTo(1 / 150, 15);
    // With c_v = 5k/2 (translation and two rotational degrees of freedom): sqrt(1/(2.5 × 100 × 150)).
    expect(temperatureRelativeError(100, 150, 2.5)).toBeCloseTo(Math.sqrt(1 / 37500), 15);
  });

  it('velocityRelativeError(0.1, 5/3, 60, 1000) = 1/(0.1 × sqrt(10^5)) = 0.0316228', () => {
    expect(velocityRelativeError(0.1, 5 / 3, 60, 1000)).toBeCloseTo(1 / (0.1 * Math.sqrt(1e5)), 14);
  });

  it('velocityStandardErrorMPerS() = E_u·u for any flow speed u (c = sqrt(γkT/m) cancels)', () => {
    const m = SPECIES.N2.massKg;
    const c = speedOfSoundMPerS(m, 300, 2);
    for (const u of [0.5, 10, 300]) {
      const eu = velocityRelativeError(u / c, heatCapacityRatio(2), 40, 250);
      expect((eu * u) / velocityStandardErrorMPerS(m, 300, 40, 250)).toBeCloseTo(1, 13);
    }
  });

  it('refuses non-positive inputs, naming them', () => {
    expect(() => densityRelativeError(0, 10)).toThrow(/particles per cell = 0: must be a finite number above 0/);
    expect(() => velocityRelativeError(0.1, 5 / 3, 10, Number.NaN)).toThrow(/independent samples = NaN/);
    expect(() => expectedRelativeError('velocity', { particlesPerCell: 10, gamma: 1.4 }, 1)).toThrow(/acoustic number/);
  });
});

describe('independentSamplesForRelativeError()', () => {
  it('inverts the formulas: 100 samples for 1 % density at N = 100, 150 for 1/150 temperature, 10^4 for 1 % velocity at Ac = 0.1', () => {
    expect(independentSamplesForRelativeError('density', { particlesPerCell: 100 }, 0.01)).toBe(100);
    expect(independentSamplesForRelativeError('temperature', { particlesPerCell: 100 }, 1 / 150)).toBe(150);
    // M = 1/(E² Ac² γ N) = 1/(10^-4 × 10^-2 × 5/3 × 60) = 10^4.
    expect(
      independentSamplesForRelativeError('velocity', { particlesPerCell: 60, acousticNumber: 0.1, gamma: 5 / 3 }, 0.01),
    ).toBe(1e4);
  });

  it('rounds up, to at least one sample, and the rounded count meets the target', () => {
    const inputs = { particlesPerCell: 37, acousticNumber: 0.03, gamma: 1.4 };
    for (const q of ['velocity', 'density', 'temperature'] as NoiseQuantity[]) {
      const m = independentSamplesForRelativeError(q, inputs, 0.013);
      expect(expectedRelativeError(q, inputs, m)).toBeLessThanOrEqual(0.013);
      expect(expectedRelativeError(q, inputs, m - 1)).toBeGreaterThan(0.013);
    }
    expect(independentSamplesForRelativeError('density', { particlesPerCell: 100 }, 0.5)).toBe(1);
  });

  it('samples needed grow like Ac⁻² (Hadjiconstantinou & Garcia 2002, published per the reference notes §8)', () => {
    const at = (ac: number) =>
      independentSamplesForRelativeError('velocity', { particlesPerCell: 50, acousticNumber: ac, gamma: 5 / 3 }, 0.01);
    expect(at(0.01) / at(0.1)).toBeCloseTo(100, 1);
  });
});

describe('independentSamples()', () => {
  it('independentSamples(1000, 25) = 40; a short run is one sample; nothing sampled is zero', () => {
    expect(independentSamples(1000, 25)).toBe(40);
    expect(independentSamples(30, 25)).toBe(1.2);
    expect(independentSamples(10, 25)).toBe(1);
    expect(independentSamples(0, 25)).toBe(0);
    expect(() => independentSamples(-1, 25)).toThrow(/sample steps = -1/);
    expect(() => independentSamples(100, 0)).toThrow(/steps between independent samples = 0/);
  });
});

describe('expectedRunPlan()', () => {
  const plan = boxPlan({ species: 'Ar', model: 'HS', cellsPerSide: 20, particlesPerCell: 40 });

  it('takes samples one mean collision time apart and prices steps at the plan’s particle count', () => {
    const r = expectedRunPlan(plan, {
      targetRelativeError: 0.01,
      quantity: 'velocity',
      flowSpeedMPerS: 30,
      particleStepsPerSecond: 2e7,
    });
    const between = Math.ceil(plan.reference.meanCollisionTimeS / plan.timeStepS);
    const ac = 30 / speedOfSoundMPerS(plan.gas.model.massKg, plan.reference.temperatureK, 0);
    const m = independentSamplesForRelativeError(
      'velocity',
      { particlesPerCell: 40, acousticNumber: ac, gamma: 5 / 3 },
      0.01,
    );
    expect(r).toEqual({
      independentSamplesNeeded: m,
      stepsBetweenIndependentSamples: between,
      sampleStepsNeeded: m * between,
      stepsNeeded: plan.transientSteps + m * between,
      estimatedSeconds: ((plan.transientSteps + m * between) * plan.initialParticles) / 2e7,
    });
    // 1 % of 30 m/s in argon at 273 K (c ≈ 308 m/s, Ac ≈ 0.0975) with N = 40: M = 1/(10^-4 Ac² γ N) ≈ 15 800
    // (formula evaluated by hand).
    expect(m).toBeGreaterThan(15_500);
    expect(m).toBeLessThan(16_100);
  });

  it('density and temperature need no flow speed; velocity does', () => {
    expect(
      expectedRunPlan(plan, { targetRelativeError: 0.01, quantity: 'density', particleStepsPerSecond: 1e7 })
        .independentSamplesNeeded,
    ).toBe(250);
    expect(() =>
      expectedRunPlan(plan, { targetRelativeError: 0.01, quantity: 'velocity', particleStepsPerSecond: 1e7 }),
    ).toThrow(/flowSpeedMPerS/);
    expect(() =>
      expectedRunPlan(plan, {
        targetRelativeError: 0.01,
        quantity: 'pressure' as NoiseQuantity,
        particleStepsPerSecond: 1e7,
      }),
    ).toThrow(/quantity = pressure: must be one of velocity, density, temperature/);
    expect(() =>
      expectedRunPlan(plan, { targetRelativeError: 0, quantity: 'density', particleStepsPerSecond: 1e7 }),
    ).toThrow(/target relative error = 0/);
  });
});
