/**
 * The benchmark case: hard-sphere argon Couette flow between diffuse walls, 2D grid of square cells with periodic
 * x ends, about 20 particles per cell (the usual DSMC loading), wall Mach number about 0.16. Own scenario for speed
 * measurement only.
 */
import { parseCase, type Case } from '../engine/case/schema';
import { BOLTZMANN_J_PER_K } from '../engine/physics/constants';

export function couetteBenchCase(particles: number): Case {
  const particlesPerCell = 20;
  const cells = particles / particlesPerCell;
  // Square domain of square cells, 4 cells per mean free path (cell = λ/4 at Kn = 0.05 on the gap).
  const side = Math.round(Math.sqrt(cells));
  const gap = 1e-3;
  const massKg = 66.3e-27;
  const temperatureK = 273;
  const knudsen = 1 / (side / 4);
  // Hard-sphere argon viscosity at 273 K (engine's HS model, μ_ref = 2.117e-5 Pa·s × 1.016): p = μ sqrt(πkT/2m)/(Kn H).
  const mu = 2.117e-5 * 1.016034;
  const pressurePa = (mu * Math.sqrt((Math.PI * BOLTZMANN_J_PER_K * temperatureK) / (2 * massKg))) / (knudsen * gap);
  const wall = (u: number) => ({
    type: 'wall' as const,
    temperatureK,
    velocityMPerS: [u, 0, 0] as [number, number, number],
  });
  const r = parseCase({
    schemaVersion: 1,
    name: `benchmark couette ${particles}`,
    gas: { species: 'Ar', model: 'HS' },
    initial: { pressurePa, temperatureK },
    domain: { lengthXM: gap, lengthYM: gap },
    boundaries: { left: { type: 'periodic' }, right: { type: 'periodic' }, bottom: wall(-50), top: wall(50) },
    numerics: { cellsX: side, cellsY: side, particlesPerCell: particles / (side * side) },
    sampling: { transientSteps: 0, sampleSteps: 1000 },
  });
  if (!r.ok) throw new Error(r.errors.join('\n'));
  return r.value;
}
