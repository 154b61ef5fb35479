/**
 * Force-driven planar Poiseuille flow (periodic channel, uniform body acceleration a, diffuse walls, hard-sphere
 * argon): the reduced flow rate G_P = ṁ v0 / (H² ρ a) (Sharipov & Seleznev 1998, J. Phys. Chem. Ref. Data 27:657)
 * from the mass flow counted at a cross-section, across the Knudsen range.
 *
 * Reference (REFERENCES.md §2, "computed": linearized BGK, discrete velocities, converged to 2e-6):
 *   δ = 0.01: 3.04965, 0.1: 2.03271, 1: 1.53868, 10: 2.76864; slip limit δ/6 + σ_P with σ_P = 1.0162.
 * Hard spheres differ from the BGK model by about 3–4 % in the transition regime (REFERENCES.md §2, Ohwada, Sone &
 * Aoki 1989, from memory), so the table checks at intermediate δ (1 and 10) allow the run's 95 % half-width plus 4 %.
 * Towards free-molecular flow the planar flow rate grows without bound (like ln(1/δ)), carried by molecules flying
 * nearly parallel to the walls until they collide, so its level there depends on how the collision rate varies with
 * molecular speed — constant for BGK, growing with speed for hard spheres; with matched viscosity hard spheres run
 * 7 % below BGK at δ = 0.1 and 11 % below at δ = 0.01 here (measured, not asserted: no hard-sphere table to hand).
 * There the test checks the growth. The flow is driven to a mean speed of about 0.1 v0 (Mach ≈ 0.1): nonlinear
 * corrections are of order Ma² ≈ 1 %, inside the allowance.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { runToEnd } from '../support/planOrThrow';
import { knudsenOf } from './runGapPreset';
import { summarize } from '../../engine/run/simulationSamples';

const BGK_G_P: Record<number, number> = { 0.01: 3.04965, 0.1: 2.03271, 1: 1.53868, 10: 2.76864 };
const SLIP_COEFFICIENT = 1.0162; // σ_P, BGK half-space value in units of ℓ (REFERENCES.md §2)
const MODEL_DIFFERENCE = 0.04;

/** Argon at 300 K (species table, Bird 1994 App. A, from memory). */
const V0 = Math.sqrt((2 * 1.380649e-23 * 300) / 66.3e-27);
const GAP = 1e-6;

function reducedFlowRate(delta: number, sampleSteps: number): { mean: number; ci95: number } {
  // ṁ ≈ H² ρ a G_P / v0, so the mean speed ṁ/(ρH) = H a G_P / v0; aim it at 0.1 v0 with the BGK G_P.
  const acceleration = (0.1 * V0 * V0) / (GAP * BGK_G_P[delta]);
  const c = buildPreset('poiseuille', {
    gas: 'Ar',
    model: 'HS',
    knudsen: String(knudsenOf(delta)),
    gap: '1um',
    temperature: '300K',
    acceleration: String(acceleration),
    particlesPerCell: '100',
    sampleSteps: String(sampleSteps),
    seed: '3',
  });
  const g = summarize(runToEnd(c)).flow!.values.reducedFlowRate!;
  return { mean: g.mean, ci95: g.ci95 };
}

describe('force-driven Poiseuille flow: reduced flow rate G_P across the Knudsen range', () => {
  const results = new Map<number, { mean: number; ci95: number }>();
  for (const delta of [1, 10]) {
    it(`δ = ${delta}: G_P within its half-width + 4 % of linearized BGK ${BGK_G_P[delta]}`, () => {
      const g = reducedFlowRate(delta, 60_000);
      results.set(delta, g);
      expect(g.ci95 / g.mean).toBeLessThan(0.03);
      expect(Math.abs(g.mean - BGK_G_P[delta])).toBeLessThan(g.ci95 + MODEL_DIFFERENCE * BGK_G_P[delta]);
    });
  }
  for (const delta of [0.01, 0.1]) {
    it(`δ = ${delta}: G_P measured to 5 % (for the growth check below)`, () => {
      const g = reducedFlowRate(delta, 30_000);
      results.set(delta, g);
      expect(g.ci95 / g.mean).toBeLessThan(0.05);
    });
  }

  it('has the Knudsen minimum near δ = 1 and grows as δ → 0 (each step beyond the combined half-widths)', () => {
    const [g001, g01, g1, g10] = [0.01, 0.1, 1, 10].map((d) => results.get(d)!);
    const apart = (a: { mean: number; ci95: number }, b: { mean: number; ci95: number }) =>
      a.mean - b.mean - Math.hypot(a.ci95, b.ci95);
    expect(apart(g01, g1)).toBeGreaterThan(0);
    expect(apart(g10, g1)).toBeGreaterThan(0);
    expect(apart(g001, g01)).toBeGreaterThan(0);
  });

  it('approaches the slip limit δ/6 + σ_P at δ = 10 from above (second-order terms are positive)', () => {
    const g10 = results.get(10)!;
    const slip = 10 / 6 + SLIP_COEFFICIENT;
    expect(Math.abs(g10.mean - slip) / slip).toBeLessThan(0.05 + g10.ci95 / slip);
  });
});
