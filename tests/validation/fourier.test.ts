/**
 * Planar Fourier problem: hard-sphere argon between diffuse walls at 260 K and 286 K (ΔT/T0 = 0.095, linear regime),
 * against linearized kinetic theory across the rarefaction range.
 *
 * Normalised heat flux q* = q √π T0/(p v0 ΔT). Reference values (REFERENCES.md §2, "computed": linearized S-model,
 * Shakhov 1968, Pr = 2/3, discrete velocities converged to 2e-6); limits q* → 1 (free-molecular, published
 * q = p v0 ΔT/(√π T)) and q* → (15√π/8)/(δ + 2ζ_T) with ζ_T = 1.954 (Fourier's law with temperature jump).
 */
import { describe, expect, it } from 'vitest';
import { runGapPreset, knudsenOf, field } from './runGapPreset';

const Q_SMODEL: Record<number, number> = { 0.01: 0.99397, 1: 0.70923, 10: 0.239 };
const JUMP_COEFFICIENT = 1.954;
const COLD = 260;
const HOT = 286;
const T0 = (COLD + HOT) / 2;

/**
 * Allowed difference beyond the 95 % half-width: the hard-sphere gas is not the S-model (Prandtl number 0.661 vs 2/3,
 * conductivity factor 1.025 vs viscosity factor 1.016); REFERENCES.md §2 expects agreement within about 2 %.
 */
const MODEL_DIFFERENCE = 0.02;

function fourier(delta: number, numerics: Record<string, string>) {
  const run = runGapPreset('fourier', {
    gas: 'Ar',
    model: 'HS',
    knudsen: String(knudsenOf(delta)),
    gap: '1mm',
    coldTemperature: `${COLD}K`,
    hotTemperature: `${HOT}K`,
    seed: '2026',
    ...numerics,
  });
  const ref = run.result.reference;
  const toQ = (q: number) =>
    (q * Math.sqrt(Math.PI) * T0) / (ref.pressurePa * ref.mostProbableSpeedMPerS * (HOT - COLD));
  return { run, ref, toQ };
}

describe('Fourier problem: heat flux against linearized kinetic theory', () => {
  it('δ = 0.01 (free-molecular end): wall heat flux matches 0.99397 and the free-molecular limit', () => {
    const { run, ref, toQ } = fourier(0.01, { particlesPerCell: '100', sampleSteps: '250000' });
    expect(ref.temperatureK).toBe(T0);
    const cold = run.result.walls.bottom!.heatFlux; // the cold wall receives heat from the gas: positive
    const hot = run.result.walls.top!.heatFlux; // the hot wall gives heat to the gas: negative
    expect(cold.mean).toBeGreaterThan(0);
    expect(hot.mean).toBeLessThan(0);
    for (const w of [cold, { mean: -hot.mean, ci95: hot.ci95 }]) {
      expect(Math.abs(toQ(w.mean) - Q_SMODEL[0.01])).toBeLessThan(toQ(w.ci95) + MODEL_DIFFERENCE * Q_SMODEL[0.01]);
      expect(Math.abs(toQ(w.mean) - 1)).toBeLessThan(toQ(w.ci95) + 0.01 + MODEL_DIFFERENCE);
    }
    expect(toQ(cold.ci95)).toBeLessThan(0.03);
  });

  it('δ = 1 (transition): wall heat flux matches 0.70923', () => {
    const { run, toQ } = fourier(1, { particlesPerCell: '100', sampleSteps: '250000' });
    const cold = run.result.walls.bottom!.heatFlux;
    expect(Math.abs(toQ(cold.mean) - Q_SMODEL[1])).toBeLessThan(toQ(cold.ci95) + MODEL_DIFFERENCE * Q_SMODEL[1]);
    expect(toQ(cold.ci95) / Q_SMODEL[1]).toBeLessThan(0.03);
  });

  it('δ = 10 (near continuum): gap-averaged heat flux matches 0.239 and Fourier’s law with temperature jump', () => {
    const delta = 10;
    const { run, toQ } = fourier(delta, { particlesPerCell: '100', sampleSteps: '150000' });
    const expected = Q_SMODEL[10];
    const jumpLaw = (15 * Math.sqrt(Math.PI)) / 8 / (delta + 2 * JUMP_COEFFICIENT);
    expect(Math.abs(jumpLaw - expected) / expected).toBeLessThan(0.002);
    // Heat flows from the hot top wall down to the cold bottom one: q_y < 0 everywhere in the gap.
    const gap = field(run.gapAverage, 'heatFluxY');
    expect(gap.mean).toBeLessThan(0);
    expect(Math.abs(toQ(-gap.mean) - expected)).toBeLessThan(toQ(gap.ci95) + MODEL_DIFFERENCE * expected);
    // Near continuum the heat flux is a small difference of large molecular energy fluxes: 5 % at this cost.
    expect(toQ(gap.ci95) / expected).toBeLessThan(0.05);
    const cold = run.result.walls.bottom!.heatFlux;
    expect(Math.abs(toQ(cold.mean) - expected)).toBeLessThan(toQ(cold.ci95) + MODEL_DIFFERENCE * expected);
  });
});
