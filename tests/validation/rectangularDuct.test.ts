/**
 * The cross-section mode (a planar domain driven along z, out of the plane) on a rectangular duct: its continuum
 * models and its DSMC in the free-molecular limit.
 *
 * References:
 * - No-slip series (White, Viscous Fluid Flow, §3-3; common closed form): a square duct's ∫u dA = 0.035144 a⁴(−dp/dx)/μ,
 *   so 12⟨φ⟩ = 0.42173; the finite-difference slip solver with zero slip must reproduce the series.
 * - First-order slip, planar limit: a very wide slot has the channel's 12⟨φ⟩ = 1 + 6s (slip length s·H; the channel
 *   G_P = δ/6 + σ_P, reference notes §2), with the side walls' share of order H/W.
 * - Free-molecular limit: G_P of a long duct of diffuse walls is ⟨∫₀^{2π} ℓ(θ) dθ⟩/(2√π H), ℓ the distance back to the
 *   wall along the direction θ across the duct (the linearized collisionless solution; Sharipov 1999, J. Vac. Sci.
 *   Technol. A 17:3062). Evaluated here independently of the engine's chord formula, by direct quadrature over the
 *   points of the cross-section and the directions; the DSMC G_P at Kn = 1000 must agree within 1.5 % (the issue's
 *   tolerance), with its own half-width below 1 % so that the check means something.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { Simulation } from '../../engine/run/simulation';
import type { SimulationResult } from '../../engine/results/summarize';
import {
  rectangleFlowFactor,
  rectangleFreeMolecularReducedFlowRate,
  rectangleSlipFlowFactor,
} from '../../engine/continuum/rectangularDuct';
import { buildPreset } from '../../engine/case/presets';
import { runToEnd } from '../support/planOrThrow';
import { sampleSetOf, summarize } from '../../engine/run/simulationSamples';
import { averageSamplesOverCells } from '../../engine/results/fieldTables';
import { CELL_FIELDS } from '../../engine/results/cellFields';

/** ⟨∫ℓ dθ⟩ over a W × H rectangle by the midpoint rule in y, z and θ (n points a side, m directions). */
function directFreeMolecularMean(w: number, h: number, n: number, m: number): number {
  let sum = 0;
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) {
      const y = ((i + 0.5) / n) * w;
      const z = ((j + 0.5) / n) * h;
      let inner = 0;
      for (let k = 0; k < m; k++) {
        const t = ((k + 0.5) / m) * 2 * Math.PI;
        const c = Math.cos(t);
        const s = Math.sin(t);
        const lx = c > 0 ? (w - y) / c : c < 0 ? -y / c : Infinity;
        const lz = s > 0 ? (h - z) / s : s < 0 ? -z / s : Infinity;
        inner += Math.min(lx, lz);
      }
      sum += (inner * 2 * Math.PI) / m;
    }
  return sum / (n * n);
}

describe('rectangular duct, continuum and free-molecular models', () => {
  it('the slip solver with zero slip reproduces the no-slip series (square: 12 × 0.035144)', () => {
    expect(rectangleFlowFactor(1)).toBeCloseTo(12 * 0.035144, 5);
    for (const a of [1, 0.5, 0.25, 0.1])
      expect(rectangleSlipFlowFactor(a, 0) / rectangleFlowFactor(a) - 1).toBeLessThan(1e-5);
  });

  it('a very wide slot has the planar channel’s slip flow rate 1 + 6s', () => {
    for (const s of [0.01, 0.1, 0.5]) {
      const f = rectangleSlipFlowFactor(0.001, s);
      expect(Math.abs(f / (1 + 6 * s) - 1)).toBeLessThan(2e-3);
    }
  });

  it('the free-molecular G_P of the chord formula matches a direct quadrature over points and directions', () => {
    for (const a of [1, 0.25]) {
      const direct = directFreeMolecularMean(1 / a, 1, 160, 720) / (2 * Math.sqrt(Math.PI));
      expect(Math.abs(rectangleFreeMolecularReducedFlowRate(a) / direct - 1), `H/W = ${a}`).toBeLessThan(2e-3);
    }
  });
});

describe('rectangular duct cross-section by DSMC, free-molecular limit (Kn = 1000, square, hard-sphere argon)', () => {
  const base = buildPreset('rectangularDuct', {
    gas: 'Ar',
    model: 'HS',
    knudsen: '1000',
    // No collisions to resolve: 2 × 2 cells (one a quadrant) give a time step 6 times the 12 × 12 planner's, so the
    // same particles (4320) reach a given precision in a sixth of the steps.
    cellsY: '2',
    particlesPerCell: '1080',
    transientSteps: '400',
    sampleSteps: '35000',
    seed: '3',
  });
  // Twice the preset's drive (a mean speed of about 0.1 v0): without collisions every molecule's axial speed is its
  // Maxwellian one plus g times its flight time, so the mass flow is linear in g, and the relative noise falls as 1/g
  // (Hadjiconstantinou et al. 2003) — 4 times fewer steps for the same half-width. The rare collisions bound that
  // linearity: measured here, 4 times the drive put G_P 1.0 % and 1.4 % low (seeds 3, 4), twice it 0.7 % high ± 1.1 %.
  const c = { ...base, bodyAccelerationZMPerS2: 2 * base.bodyAccelerationZMPerS2! };
  let sim: Simulation;
  let result: SimulationResult;
  beforeAll(() => {
    sim = runToEnd(c);
    result = summarize(sim);
  }, 300_000);

  it('G_P within 1.5 % of the free-molecular quadrature, its half-width below 1 %', () => {
    const gp = result.flow!.values.reducedFlowRate!;
    const reference = directFreeMolecularMean(1, 1, 160, 720) / (2 * Math.sqrt(Math.PI));
    expect(gp.ci95 / gp.mean).toBeLessThan(0.01);
    expect(Math.abs(gp.mean / reference - 1)).toBeLessThan(0.015);
    expect(result.flow!.perDepth).toBe(false);
  });

  it('the four quadrants carry the same axial speed within their errors, and no particle left the cross-section', () => {
    const set = sampleSetOf(sim);
    const g = set.geometry;
    const f = CELL_FIELDS.findIndex((x) => x.name === 'velocityZ');
    const quadrant = (qx: number, qy: number) => {
      const cells: number[] = [];
      for (let c = 0; c < g.cells; c++) {
        const i = c % g.cellsX;
        const j = Math.floor(c / g.cellsX);
        if ((i < g.cellsX / 2 ? 0 : 1) === qx && (j < g.cellsY / 2 ? 0 : 1) === qy) cells.push(c);
      }
      const t = averageSamplesOverCells(set, cells);
      return { mean: t.mean[f], ci95: t.ci95[f] };
    };
    const q = [quadrant(0, 0), quadrant(1, 0), quadrant(0, 1), quadrant(1, 1)];
    for (let a = 0; a < 4; a++)
      for (let b = a + 1; b < 4; b++)
        expect(Math.abs(q[a].mean - q[b].mean), `quadrants ${a} and ${b}`).toBeLessThan(
          Math.hypot(q[a].ci95, q[b].ci95),
        );
    const st = sim.state;
    expect(st.leaks).toBe(0);
    for (let i = 0; i < st.count; i++) {
      expect(st.x[i] >= 0 && st.x[i] <= st.lengthX && st.y[i] >= 0 && st.y[i] <= st.lengthY, `particle ${i}`).toBe(
        true,
      );
    }
  });
});
