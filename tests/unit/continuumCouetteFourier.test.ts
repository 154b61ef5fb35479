import { describe, expect, it } from 'vitest';
import { modelFromSpecies, viscosityMeanFreePathM, mostProbableSpeedMPerS } from '../../engine/gas/molecularModel';
import { couetteFlow, freeMolecularCouetteReducedShear, type CouetteInput } from '../../engine/continuum/couette';
import { fourierFlow, type FourierInput } from '../../engine/continuum/fourier';
import { equivalentPathOf, gasStateFromModel } from '../../engine/continuum/gasState';
import {
  CERCIGNANI_SECOND_ORDER,
  KINETIC_BGK_SLIP,
  KINETIC_S_MODEL_JUMP,
} from '../../engine/continuum/slipCoefficients';
import { sampleProfile } from '../../engine/continuum/profileSampling';

const relativeError = (actual: number, expected: number) => Math.abs(actual / expected - 1);

// Argon as hard spheres at 300 K and 10 Pa: monatomic, so κ = (15/4)(k/m)μ exactly (Eucken with ζ = 0).
const gas = gasStateFromModel(modelFromSpecies('Ar', 'HS'), 10, 300);
const ell = equivalentPathOf(gas);
const lambda = viscosityMeanFreePathM(gas.viscosityPaS, gas.pressurePa, gas.temperatureK, gas.massKg);
const v0 = mostProbableSpeedMPerS(gas.massKg, gas.temperatureK);

function couette(delta: number, slip: CouetteInput['slip'], accommodation = 1) {
  return couetteFlow({ gas, gapM: delta * ell, bottomWallSpeedMPerS: -5, topWallSpeedMPerS: 5, slip, accommodation });
}

function fourier(delta: number, jump: FourierInput['jump'], thermalAccommodation = 1) {
  return fourierFlow({
    gas,
    gapM: delta * ell,
    bottomWallTemperatureK: 310,
    topWallTemperatureK: 290,
    jump,
    thermalAccommodation,
  });
}

/** Composite Simpson rule on n (even) intervals. */
function simpson(f: (x: number) => number, a: number, b: number, n = 200): number {
  const h = (b - a) / n;
  let s = f(a) + f(b);
  for (let i = 1; i < n; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe('couetteFlow()', () => {
  it('no slip: τ = μU/H (Newtonian viscosity, definition)', () => {
    const h = 1e-2;
    const s = couetteFlow({ gas, gapM: h, bottomWallSpeedMPerS: 0, topWallSpeedMPerS: 10, slip: { kind: 'noSlip' } });
    expect(s.shearStressPa).toBeCloseTo((gas.viscosityPaS * 10) / h, 15);
    expect(s.velocityMPerS(0)).toBe(0);
    expect(s.velocityMPerS(h)).toBeCloseTo(10, 12);
  });

  it('first-order Maxwell slip: τ = μU/(H + 2ζ), ζ = ((2 − σ)/σ)λ (Maxwell 1879; from memory)', () => {
    const h = 20 * lambda;
    const sigma = 0.85;
    const s = couetteFlow({
      gas,
      gapM: h,
      bottomWallSpeedMPerS: 0,
      topWallSpeedMPerS: 10,
      slip: { kind: 'firstOrder' },
      accommodation: sigma,
    });
    const zeta = ((2 - sigma) / sigma) * lambda;
    expect(relativeError(s.shearStressPa, (gas.viscosityPaS * 10) / (h + 2 * zeta))).toBeLessThan(1e-13);
    expect(relativeError(s.slipLengthM!, zeta)).toBeLessThan(1e-13);
  });

  it('kinetic slip Π = 1/(δ + 2σ_P) meets the linearized BGK table at δ = 10 and 100 within 0.1 % (reference notes §2, computed)', () => {
    const slip = { kind: 'firstOrder', coefficient: KINETIC_BGK_SLIP } as const;
    expect(relativeError(couette(10, slip).reducedShearStress, 0.08311)).toBeLessThan(1e-3);
    expect(relativeError(couette(100, slip).reducedShearStress, 0.0098)).toBeLessThan(1e-3);
    expect(relativeError(couette(10, slip).reducedShearStress, 1 / (10 + 2 * 1.0162))).toBeLessThan(1e-12);
  });

  it('Π is the shear in Sharipov normalization: τ v0/(p ΔU)', () => {
    const s = couette(3, { kind: 'firstOrder' });
    expect(relativeError(s.reducedShearStress, (s.shearStressPa * v0) / (gas.pressurePa * 10))).toBeLessThan(1e-13);
  });

  it('second order reduces to first order with the set’s C1 (u″ = 0): Cercignani gives τ = μU/(H + 2·1.1466λ)', () => {
    const s = couette(2, { kind: 'secondOrder', coefficients: CERCIGNANI_SECOND_ORDER });
    expect(relativeError(s.shearStressPa, (gas.viscosityPaS * 10) / (2 * ell + 2 * 1.1466 * lambda))).toBeLessThan(
      1e-13,
    );
  });

  it('free-molecular Π = 1/√π = 0.56419 for diffuse walls and σ/((2 − σ)√π) for σ = 0.5 (reference notes §2)', () => {
    expect(couette(1, { kind: 'freeMolecular' }).reducedShearStress).toBeCloseTo(0.56419, 5);
    expect(freeMolecularCouetteReducedShear(0.5)).toBeCloseTo(0.5 / (1.5 * Math.sqrt(Math.PI)), 15);
    // The BGK solution at δ = 0.01 (0.55934, reference notes §2, computed) is within 1 % of the limit.
    expect(relativeError(couette(0.01, { kind: 'freeMolecular' }).reducedShearStress, 0.55934)).toBeLessThan(0.01);
    const fm = couette(0.01, { kind: 'freeMolecular' });
    expect(fm.shearStressPa).toBeCloseTo((fm.reducedShearStress * gas.pressurePa * 10) / v0, 12);
    expect(fm.velocityMPerS(0.3 * 0.01 * ell)).toBe(0);
  });

  it('slip tends to no slip as Kn → 0: τ_slip/τ_noslip = 1 − 2ζ/H to 1e-11 at Kn = 1e-6', () => {
    const delta = Math.sqrt(Math.PI) / (2 * 1e-6);
    const ratio =
      couette(delta, { kind: 'firstOrder' }).shearStressPa / couette(delta, { kind: 'noSlip' }).shearStressPa;
    expect(Math.abs(ratio - 1)).toBeLessThan(2.1e-6);
    expect(Math.abs(ratio - (1 - 2e-6))).toBeLessThan(1e-11);
  });

  it('the profile meets the slip condition at both walls and integrates to the returned mass flow rate', () => {
    const s = couette(1.5, { kind: 'firstOrder', coefficient: KINETIC_BGK_SLIP }, 0.7);
    const h = 1.5 * ell;
    const dudy = (s.velocityMPerS(h) - s.velocityMPerS(0)) / h;
    expect(s.velocityMPerS(0) - -5).toBeCloseTo(s.slipLengthM! * dudy, 10);
    expect(5 - s.velocityMPerS(h)).toBeCloseTo(s.slipLengthM! * dudy, 10);
    expect(s.slipAtBottomMPerS).toBeCloseTo(s.velocityMPerS(0) + 5, 12);
    const rho = (gas.pressurePa * gas.massKg) / (1.380649e-23 * gas.temperatureK);
    const integral = rho * simpson(s.velocityMPerS, 0, h);
    expect(Math.abs(integral - s.massFlowRateKgPerSM)).toBeLessThan(1e-12 * rho * 5 * h);
  });

  it('refuses a non-positive gap and an accommodation outside (0, 1]', () => {
    expect(() =>
      couetteFlow({ gas, gapM: 0, bottomWallSpeedMPerS: 0, topWallSpeedMPerS: 1, slip: { kind: 'noSlip' } }),
    ).toThrow(/Couette gap \(m\) = 0/);
    expect(() => couette(1, { kind: 'firstOrder' }, 1.2)).toThrow(/velocity accommodation = 1.2/);
    expect(() =>
      couetteFlow({
        gas: { ...gas, viscosityPaS: 0 },
        gapM: 1,
        bottomWallSpeedMPerS: 0,
        topWallSpeedMPerS: 1,
        slip: { kind: 'noSlip' },
      }),
    ).toThrow(/gas viscosity \(Pa·s\) = 0/);
  });
});

describe('fourierFlow()', () => {
  it('no jump: q = κΔT/H with κ = (15/4)(k/m)μ (Fourier’s law; Chapman–Enskog, from memory)', () => {
    const h = 1e-2;
    const s = fourierFlow({
      gas,
      gapM: h,
      bottomWallTemperatureK: 310,
      topWallTemperatureK: 290,
      jump: { kind: 'noJump' },
    });
    const kappa = (15 / 4) * (1.380649e-23 / gas.massKg) * gas.viscosityPaS;
    expect(relativeError(s.heatFluxWPerM2, (kappa * 20) / h)).toBeLessThan(1e-13);
    expect(s.temperatureK(0)).toBe(310);
  });

  it('kinetic jump q* = (15√π/8)/(δ + 2ζ_T) meets the S-model table at δ = 10 and 100 within 0.1 % (reference notes §2)', () => {
    const jump = { kind: 'firstOrder', coefficient: KINETIC_S_MODEL_JUMP } as const;
    expect(relativeError(fourier(10, jump).reducedHeatFlux, 0.239)).toBeLessThan(1e-3);
    expect(relativeError(fourier(100, jump).reducedHeatFlux, 0.03198)).toBeLessThan(1e-3);
    expect(
      relativeError(fourier(10, jump).reducedHeatFlux, (15 * Math.sqrt(Math.PI)) / 8 / (10 + 2 * 1.954)),
    ).toBeLessThan(1e-12);
  });

  it('Smoluchowski jump: q = κΔT/(H + 2j), j = ((2 − σ_T)/σ_T)(15/8)λ for a monatomic gas (Smoluchowski 1898; from memory)', () => {
    const s = fourier(5, { kind: 'firstOrder' }, 0.6);
    const j = ((2 - 0.6) / 0.6) * (15 / 8) * lambda;
    expect(relativeError(s.heatFluxWPerM2, (gas.conductivityWPerMK * 20) / (5 * ell + 2 * j))).toBeLessThan(1e-13);
    // The profile meets the jump condition at both walls.
    const dTdy = (s.temperatureK(5 * ell) - s.temperatureK(0)) / (5 * ell);
    expect(s.temperatureK(0) - 310).toBeCloseTo(j * dTdy, 9);
    expect(290 - s.temperatureK(5 * ell)).toBeCloseTo(j * dTdy, 9);
  });

  it('free-molecular q* = 1 for a monatomic gas and diffuse walls; the S-model at δ = 0.01 is within 1 % (reference notes §2)', () => {
    const fm = fourier(0.01, { kind: 'freeMolecular' });
    expect(fm.reducedHeatFlux).toBe(1);
    expect(relativeError(fm.reducedHeatFlux, 0.99397)).toBeLessThan(0.01);
    expect(relativeError(fm.heatFluxWPerM2, (gas.pressurePa * v0 * 20) / (Math.sqrt(Math.PI) * 300))).toBeLessThan(
      1e-13,
    );
  });

  it('jump tends to no jump as δ → ∞ and sampleProfile() reproduces the wall values', () => {
    const ratio = fourier(1e7, { kind: 'firstOrder' }).heatFluxWPerM2 / fourier(1e7, { kind: 'noJump' }).heatFluxWPerM2;
    expect(Math.abs(ratio - 1)).toBeLessThan(1e-6);
    const s = fourier(1, { kind: 'noJump' });
    const sampled = sampleProfile(s.temperatureK, 0, ell, 11);
    expect(sampled.values[0]).toBe(310);
    expect(sampled.values[10]).toBeCloseTo(290, 10);
    expect(sampled.positionsM[10]).toBe(ell);
  });
});
