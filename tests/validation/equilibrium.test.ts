/**
 * The collision kernel in a closed, homogeneous gas: rate, conservation, relaxation to the Maxwellian, and
 * Larsen–Borgnakke rotational relaxation. Fixed seeds; tolerances from the stated statistical error.
 */
import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { createSimulation, advance } from '../../engine/run/simulation';
import { moveParticles } from '../../engine/kernel/move';
import { indexParticles } from '../../engine/kernel/indexCells';
import { collideParticles } from '../../engine/kernel/collide';
import { equilibriumCollisionRatePerParticle } from '../../engine/gas/molecularModel';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { createRng, uniform } from '../../engine/particles/rng';
import type { SimState } from '../../engine/kernel/state';
import { boxPlan, type BoxOptions } from './boxCase';

function totals(st: SimState) {
  let px = 0,
    py = 0,
    pz = 0,
    e = 0;
  for (let i = 0; i < st.count; i++) {
    px += st.vx[i];
    py += st.vy[i];
    pz += st.vz[i];
    e += 0.5 * st.massKg * (st.vx[i] ** 2 + st.vy[i] ** 2 + st.vz[i] ** 2) + st.erot[i];
  }
  return { px: px * st.massKg, py: py * st.massKg, pz: pz * st.massKg, e };
}

describe('collision rate in an equilibrium gas', () => {
  // Theory: ν = 4 d_ref² n sqrt(πkT_ref/m)(T/T_ref)^(1−ω) (Bird 1994, eq. 4.64; for HS it is the textbook
  // √2 π d² n c̄, published). The issue asks for agreement within 2 %; the count below has a Poisson error of
  // about 0.1 %, so 2 % is the model tolerance, not a widened one.
  const cases: [string, BoxOptions][] = [
    ['hard-sphere argon', { species: 'Ar', model: 'HS', cellsPerSide: 20, particlesPerCell: 40 }],
    ['VHS argon (ω = 0.81)', { species: 'Ar', model: 'VHS', cellsPerSide: 20, particlesPerCell: 40 }],
    ['VSS nitrogen with rotation', { species: 'N2', model: 'VSS', cellsPerSide: 20, particlesPerCell: 40 }],
  ];
  for (const [label, opts] of cases) {
    it(`${label}: collisions per particle per second match theory within 2 %`, () => {
      const plan = boxPlan(opts);
      const sim = createSimulation(plan);
      advance(sim, 20); // let (σc)max settle from its initial guess
      const st = sim.state;
      st.collisionCount = 0;
      const steps = 400;
      advance(sim, steps);
      const measured = (2 * st.collisionCount) / (st.count * steps * st.timeStep);
      const n = plan.reference.numberDensityPerM3;
      const theory = equilibriumCollisionRatePerParticle(plan.gas.model, n, plan.reference.temperatureK);
      const poissonRelative = 1 / Math.sqrt(st.collisionCount);
      expect(poissonRelative).toBeLessThan(0.005);
      expect(Math.abs(measured / theory - 1)).toBeLessThan(0.02);
    });
  }
});

describe('collideParticles() conserves momentum and energy', () => {
  for (const opts of [
    { species: 'Ar', model: 'HS' },
    { species: 'Ar', model: 'VSS' },
    { species: 'N2', model: 'VSS' },
    { species: 'CH4', model: 'VHS' },
  ] as const) {
    it(`${opts.species} ${opts.model}: totals unchanged to 1e-12 relative (round-off)`, () => {
      const sim = createSimulation(boxPlan({ ...opts, cellsPerSide: 10, particlesPerCell: 50 }));
      const st = sim.state;
      moveParticles(st, st.timeStep);
      indexParticles(st);
      for (let k = 0; k < 20; k++) {
        const before = totals(st);
        const collisions = st.collisionCount;
        collideParticles(st);
        expect(st.collisionCount).toBeGreaterThan(collisions);
        const after = totals(st);
        const momentumScale = st.massKg * Math.sqrt(before.e / (st.massKg * st.count)) * st.count;
        expect(Math.abs(after.px - before.px) / momentumScale).toBeLessThan(1e-12);
        expect(Math.abs(after.py - before.py) / momentumScale).toBeLessThan(1e-12);
        expect(Math.abs(after.pz - before.pz) / momentumScale).toBeLessThan(1e-12);
        expect(Math.abs(after.e - before.e) / before.e).toBeLessThan(1e-12);
      }
    });
  }
});

describe('relaxation to the Maxwellian', () => {
  it('velocities that start at one speed relax to a Maxwellian (chi-square goodness of fit, jstat)', () => {
    const plan = boxPlan({ species: 'Ar', model: 'VHS', cellsPerSide: 20, particlesPerCell: 50, seed: 11 });
    const sim = createSimulation(plan);
    const st = sim.state;
    // Start far from equilibrium: every particle at the same speed sqrt(3kT/m), isotropic directions.
    const t = plan.reference.temperatureK;
    const speed = Math.sqrt((3 * K_B * t) / st.massKg);
    const rng = createRng(99);
    for (let i = 0; i < st.count; i++) {
      const cz = 2 * uniform(rng) - 1;
      const phi = 2 * Math.PI * uniform(rng);
      const s = Math.sqrt(1 - cz * cz);
      st.vx[i] = speed * s * Math.cos(phi);
      st.vy[i] = speed * s * Math.sin(phi);
      st.vz[i] = speed * cz;
    }
    const stepsPerCollisionTime = Math.round(plan.reference.meanCollisionTimeS / st.timeStep);
    advance(sim, 30 * stepsPerCollisionTime);
    // Ten snapshots five collision times apart, so samples of one particle are nearly independent.
    const sd = Math.sqrt((K_B * t) / st.massKg);
    const bins = 40;
    const edges = Array.from({ length: bins - 1 }, (_, k) => jStat.normal.inv((k + 1) / bins, 0, 1));
    const observed = new Array<number>(bins).fill(0);
    let samples = 0;
    for (let snap = 0; snap < 10; snap++) {
      advance(sim, 5 * stepsPerCollisionTime);
      let mean = 0;
      for (let i = 0; i < st.count; i++) mean += st.vx[i];
      mean /= st.count;
      for (let i = 0; i < st.count; i++) {
        const z = (st.vx[i] - mean) / sd;
        let b = 0;
        while (b < bins - 1 && z > edges[b]) b++;
        observed[b]++;
        samples++;
      }
    }
    const expected = samples / bins;
    const chi2 = observed.reduce((s, o) => s + (o - expected) ** 2 / expected, 0);
    // Equiprobable bins, known variance kT/m (energy is conserved exactly), mean estimated: dof = bins − 2.
    const pValue = 1 - jStat.chisquare.cdf(chi2, bins - 2);
    expect(pValue).toBeGreaterThan(0.001);
  });
});

describe('Larsen–Borgnakke rotational relaxation of nitrogen', () => {
  it('rotational temperature follows the rate implied by Z_rot = 5', () => {
    // Expected rate for this implementation (each partner relaxed with probability 1/Z, serially; VHS):
    //   dT_rot/dt = (ν(T_tr)/Z) · a/(a+b) · (1 − b/(2Z(a+b))) · (T_tr − T_rot),  a = 5/2 − ω, b = ζ/2.
    // a/(a+b) is the Larsen–Borgnakke equilibrium partition of the pooled energy (Bird 1994 §5.3; the factor
    // relating the DSMC and continuum collision numbers, Haas et al. 1994, Phys. Fluids 6:2191, from memory);
    // the last factor accounts for the second partner seeing a pool already changed by the first (derived in
    // DEVELOPERS.md). Energy is conserved: 3 T_tr + ζ T_rot is constant.
    const z = 5;
    const plan = boxPlan({
      species: 'N2',
      model: 'VHS',
      cellsPerSide: 20,
      particlesPerCell: 100,
      temperatureK: 400,
      rotationalCollisionNumber: z,
      seed: 5,
    });
    const sim = createSimulation(plan);
    const st = sim.state;
    st.erot.fill(0);
    const m = st.massKg;
    const zeta = st.rotationalDof;
    const omega = st.viscosityIndex;
    const a = 2.5 - omega;
    const b = zeta / 2;
    const temps = () => {
      let e = 0,
        c2 = 0,
        ux = 0,
        uy = 0,
        uz = 0;
      for (let i = 0; i < st.count; i++) {
        ux += st.vx[i];
        uy += st.vy[i];
        uz += st.vz[i];
        c2 += st.vx[i] ** 2 + st.vy[i] ** 2 + st.vz[i] ** 2;
        e += st.erot[i];
      }
      const n = st.count;
      const ttr = (m * (c2 / n - (ux * ux + uy * uy + uz * uz) / (n * n))) / (3 * K_B);
      return { ttr, trot: (2 * e) / (n * zeta * K_B) };
    };
    const t0 = temps();
    const invariant = 3 * t0.ttr + zeta * t0.trot;
    const n = plan.reference.numberDensityPerM3;
    // Integrate the rate equation with the same time step (RK4 per step; the step is 1/20 of a collision time).
    let trot = t0.trot;
    const rate = (tr: number) => {
      const ttr = (invariant - zeta * tr) / 3;
      const nu = equilibriumCollisionRatePerParticle(plan.gas.model, n, ttr);
      return (nu / z) * (a / (a + b)) * (1 - b / (2 * z * (a + b))) * (ttr - tr);
    };
    const dt = st.timeStep;
    const gap0 = t0.ttr - t0.trot;
    const checks: { step: number; dsmc: number; model: number }[] = [];
    const stepsPerCollision = plan.reference.meanCollisionTimeS / dt;
    const checkAt = [1, 2, 4, 8].map((c) => Math.round(c * z * stepsPerCollision * 0.5));
    for (let s = 1; s <= checkAt[checkAt.length - 1]; s++) {
      advance(sim, 1);
      const k1 = rate(trot);
      const k2 = rate(trot + 0.5 * dt * k1);
      const k3 = rate(trot + 0.5 * dt * k2);
      const k4 = rate(trot + dt * k3);
      trot += (dt / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      if (checkAt.includes(s)) checks.push({ step: s, dsmc: temps().trot, model: trot });
    }
    // Energy conservation to round-off over the whole run (periodic box, no walls).
    const t1 = temps();
    expect(Math.abs(3 * t1.ttr + zeta * t1.trot - invariant) / invariant).toBeLessThan(1e-9);
    // Statistical error of a whole-box T_rot with N particles: T·sqrt(2/(ζN)) (equilibrium fluctuation, from the
    // Gamma(ζ/2) energy distribution); tolerance = 3 of those plus 1.5 % of the initial gap for the assumption that
    // translation stays Maxwellian while it relaxes (stated model error, not fitted).
    const noise = 3 * 400 * Math.sqrt(2 / (zeta * st.count));
    for (const c of checks) expect(Math.abs(c.dsmc - c.model)).toBeLessThan(noise + 0.015 * gap0);
  });
});
