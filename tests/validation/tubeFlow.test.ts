/**
 * Force-driven flow in a round tube near free-molecular conditions (axisymmetric, radial weighting, diffuse wall,
 * hard-sphere argon): the reduced flow rate G_P = ṁ v0 / (π R³ ρ a) (Sharipov & Seleznev 1998 normalisation).
 *
 * References: free-molecular limit 8/(3√π) = 1.50451 (Knudsen 1909; REFERENCES.md §3); linearized BGK
 * G_P = 1.4768 at δ = 0.01 and 1.4131 at δ = 0.08 (published: Karniadakis, Beskok & Aluru 2005, Microflows and
 * Nanoflows, Table 15.5, after Cercignani & Sernagiotto 1966, Phys. Fluids 9:40). The issue asks for agreement within
 * 2 %; each run's own 95 % half-width must be below 1.5 % so that the check means something. Driven to a mean speed
 * of 0.1 v0 (nonlinear effects of order Ma² ≈ 1 %).
 */
import { describe, expect, it } from 'vitest';
import { runToEnd } from '../support/planOrThrow';
import { modelFromSpecies } from '../../engine/gas/molecularModel';
import { pressureForKnudsenPa } from '../../engine/case/presets';
import type { CaseInput } from '../../engine/case/schema';
import { summarize } from '../../engine/run/simulationSamples';

const BGK_TUBE: Record<number, number> = { 0.01: 1.4768, 0.08: 1.4131 };
const FREE_MOLECULAR = 8 / (3 * Math.sqrt(Math.PI));
const R = 1e-3;
const T = 300;
const V0 = Math.sqrt((2 * 1.380649e-23 * T) / 66.3e-27); // argon (species table, from memory)

function forceDrivenTube(delta: number): CaseInput {
  const knudsen = Math.sqrt(Math.PI) / (2 * delta);
  return {
    schemaVersion: 1,
    name: `force-driven tube δ = ${delta}`,
    gas: { species: 'Ar', model: 'HS' },
    initial: { pressurePa: pressureForKnudsenPa(modelFromSpecies('Ar', 'HS'), T, knudsen, R), temperatureK: T },
    domain: { lengthXM: R / 10, lengthYM: R, geometry: 'axisymmetric', characteristicLengthM: R },
    boundaries: {
      left: { type: 'periodic' },
      right: { type: 'periodic' },
      bottom: { type: 'axis' },
      top: { type: 'wall', temperatureK: T },
    },
    // Mean speed R a G_P / v0 = 0.1 v0 with the BGK value.
    bodyAccelerationXMPerS2: (0.1 * V0 * V0) / (R * BGK_TUBE[delta]),
    flowSections: [{ name: 'middle', xM: R / 20 }],
    flowReport: { duct: 'tube', sizeM: R },
    numerics: { cellsX: 1, cellsY: 10, particlesPerCell: 300 },
    sampling: { sampleSteps: 200_000 },
    seed: 4,
  };
}

describe('force-driven round tube near free-molecular flow: G_P', () => {
  const g = new Map<number, { mean: number; ci95: number }>();
  for (const delta of [0.01, 0.08]) {
    it(`δ = ${delta}: within 2 % of linearized BGK ${BGK_TUBE[delta]}`, () => {
      const e = summarize(runToEnd(forceDrivenTube(delta))).flow!.values.reducedFlowRate!;
      g.set(delta, e);
      expect(e.ci95 / e.mean).toBeLessThan(0.015);
      expect(Math.abs(e.mean - BGK_TUBE[delta]) / BGK_TUBE[delta]).toBeLessThan(0.02);
    });
  }
  it('rises towards the free-molecular limit 8/(3√π) from below as δ falls', () => {
    const [a, b] = [g.get(0.01)!, g.get(0.08)!];
    expect(a.mean - b.mean).toBeGreaterThan(0);
    expect(a.mean + a.ci95).toBeLessThan(FREE_MOLECULAR + 0.005);
  });
});
