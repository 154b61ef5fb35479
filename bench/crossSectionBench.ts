/**
 * The cross-section mode against the planar engine on a case of the same size: the rectangularDuct preset (square,
 * Kn 0.1 on H: 30 × 30 cells, 30 particles a cell, hard-sphere argon) driven along z, and the same box with no drive.
 * Median particle-steps per second of the full step over three runs each, one thread, after a warm-up round of both.
 */
import { buildPreset } from '../engine/case/presets';
import { planFromInput } from '../engine/plan/plan';
import { advance, createSimulation } from '../engine/run/simulation';

export interface CrossSectionBench {
  readonly particles: number;
  readonly crossSectionMParticleStepsPerS: number;
  readonly planarMParticleStepsPerS: number;
}

function rate(driven: boolean): { particles: number; mps: number } {
  const c = buildPreset('rectangularDuct', { gas: 'Ar', model: 'HS', knudsen: '0.1', transientSteps: '0' });
  const p = planFromInput(driven ? c : { ...c, bodyAccelerationZMPerS2: 0 });
  if (!p.ok) throw new Error(p.errors.join('; '));
  const sim = createSimulation(p.plan);
  advance(sim, 30);
  const rates: number[] = [];
  for (let r = 0; r < 3; r++) {
    const before = sim.state.particleSteps;
    const t0 = performance.now();
    advance(sim, 150);
    rates.push((sim.state.particleSteps - before) / (performance.now() - t0) / 1e3);
  }
  rates.sort((a, b) => a - b);
  return { particles: sim.state.count, mps: rates[1] };
}

export function measureCrossSection(): CrossSectionBench {
  // One round of each first: the first case measured otherwise pays the JIT's warm-up of the 2D paths (measured:
  // 15.8 against 19.6 M p-steps/s in the first round, 21.2 against 19.9 in the second).
  rate(true);
  rate(false);
  const planar = rate(false);
  const section = rate(true);
  return {
    particles: section.particles,
    crossSectionMParticleStepsPerS: section.mps,
    planarMParticleStepsPerS: planar.mps,
  };
}
