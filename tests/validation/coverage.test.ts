/**
 * Are the 95 % half-widths honest? In a closed equilibrium gas the true density, velocity and temperature of every
 * cell are known, so the fraction of cell intervals that contain them must be close to 0.95. Samples are taken every
 * step, far more often than the gas decorrelates: intervals that treated steps as independent would fail this.
 */
import { describe, expect, it } from 'vitest';
import { createSimulation, advance } from '../../engine/run/simulation';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { boxPlan } from './boxCase';
import { summarize } from '../../engine/run/simulationSamples';

describe('confidence intervals of cell fields', () => {
  it('cover the true density, velocity and temperature of an equilibrium gas 92–98 % of the time', () => {
    const plan = boxPlan({ species: 'Ar', model: 'HS', cellsPerSide: 20, particlesPerCell: 20, seed: 17 });
    const sim = createSimulation({ ...plan, transientSteps: 0, sampleSteps: 6000, batchSteps: 10 });
    const st = sim.state;
    // Remove the initial random drift so the true velocity is exactly zero; the box conserves momentum and energy,
    // so the true temperature is the kinetic temperature of the whole box.
    const n = st.count;
    let mx = 0,
      my = 0,
      mz = 0;
    for (let i = 0; i < n; i++) {
      mx += st.vx[i];
      my += st.vy[i];
      mz += st.vz[i];
    }
    mx /= n;
    my /= n;
    mz /= n;
    let c2 = 0;
    for (let i = 0; i < n; i++) {
      st.vx[i] -= mx;
      st.vy[i] -= my;
      st.vz[i] -= mz;
      c2 += st.vx[i] ** 2 + st.vy[i] ** 2 + st.vz[i] ** 2;
    }
    const trueT = (st.massKg * c2) / (3 * n * K_B);
    const trueN = (n * st.moleculesPerParticle) / (st.lengthX * st.lengthY);
    // The collision time is about 1/0.06 steps here; a step-to-step correlation that naive intervals would ignore.
    expect(plan.ratios.timeStepOverCollisionTime).toBeLessThan(0.25);
    advance(sim, 6000);
    const r = summarize(sim);
    const truth: Record<string, number> = {
      numberDensity: trueN,
      velocityX: 0,
      velocityY: 0,
      velocityZ: 0,
      translationalTemperature: trueT,
    };
    const f = r.cells.names.length;
    // 400 cells: a binomial fraction with p = 0.95 has a standard deviation of 0.011, so [0.92, 0.98] is about ±3σ
    // (the range; cells of one closed box are very nearly independent).
    for (const [name, value] of Object.entries(truth)) {
      const k = r.cells.names.indexOf(name);
      let inside = 0;
      for (let c = 0; c < r.cells.rows; c++) {
        const mean = r.cells.mean[c * f + k];
        const ci = r.cells.ci95[c * f + k];
        expect(Number.isFinite(ci)).toBe(true);
        if (Math.abs(mean - value) <= ci) inside++;
      }
      const coverage = inside / r.cells.rows;
      expect(coverage, `${name} coverage`).toBeGreaterThanOrEqual(0.92);
      expect(coverage, `${name} coverage`).toBeLessThanOrEqual(0.98);
    }
  });
});
