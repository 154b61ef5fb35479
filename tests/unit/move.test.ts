/**
 * Property tests of free flight with boundaries (fast-check): whatever the sides, speeds and time step, no particle
 * ends outside the domain, keys stay on the grid, and specular sides and periodic pairs conserve kinetic energy.
 */
import { describe, it } from 'vitest';
import fc from 'fast-check';
import { planOrThrow } from '../support/planOrThrow';
import { createSimulation } from '../../engine/run/simulation';
import { moveParticles } from '../../engine/kernel/move';

type Side =
  | { type: 'periodic' }
  | { type: 'symmetry' }
  | { type: 'wall'; temperatureK: number; model: 'diffuse' | 'specular' | 'maxwell'; accommodation?: number };

function buildSim(
  lx: number,
  ly: number,
  xSides: 'periodic' | 'symmetry' | 'wall',
  ySides: 'periodic' | 'symmetry' | 'wall',
  seed: number,
) {
  const side = (t: string): Side =>
    t === 'periodic'
      ? { type: 'periodic' }
      : t === 'symmetry'
        ? { type: 'symmetry' }
        : { type: 'wall', temperatureK: 300, model: 'maxwell', accommodation: 0.5 };
  return createSimulation(
    planOrThrow({
      schemaVersion: 1,
      name: 'flight test',
      gas: { species: 'Ar', model: 'HS' },
      initial: { pressurePa: 1, temperatureK: 300 },
      domain: { lengthXM: lx, lengthYM: ly },
      boundaries: { left: side(xSides), right: side(xSides), bottom: side(ySides), top: side(ySides) },
      numerics: { cellsX: 3, cellsY: 4, particlesPerCell: 10 },
      sampling: { transientSteps: 0, sampleSteps: 1 },
      seed,
    }),
  );
}

const sideType = fc.constantFrom('periodic' as const, 'symmetry' as const, 'wall' as const);

describe('moveParticles()', () => {
  it('never lets a particle leave the domain, even when it crosses it several times in one step', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        fc.double({ min: 1e-6, max: 1, noNaN: true }),
        sideType,
        sideType,
        fc.double({ min: 1e-3, max: 30, noNaN: true }),
        fc.nat(1000),
        (lx, ly, xs, ys, crossings, seed) => {
          const sim = buildSim(lx, ly, xs, ys, seed);
          const st = sim.state;
          // A time step in which a typical particle flies `crossings` domain lengths.
          const dt = (crossings * Math.max(lx, ly)) / 400;
          for (let step = 0; step < 3; step++) {
            moveParticles(st, dt);
            for (let i = 0; i < st.count; i++) {
              if (!(st.x[i] >= 0 && st.x[i] <= lx && st.y[i] >= 0 && st.y[i] <= ly)) return false;
              if (st.key[i] < 0 || st.key[i] >= st.keyCount.length) return false;
            }
          }
          return true;
        },
      ),
      { numRuns: 60 },
    );
  });

  it('specular and periodic sides conserve kinetic energy to round-off', () => {
    const nonWall = fc.constantFrom('periodic' as const, 'symmetry' as const);
    fc.assert(
      fc.property(
        nonWall,
        nonWall,
        fc.double({ min: 1e-2, max: 10, noNaN: true }),
        fc.nat(1000),
        (xs, ys, crossings, seed) => {
          const sim = buildSim(1e-3, 2e-3, xs, ys, seed);
          const st = sim.state;
          const energy = () => {
            let e = 0;
            for (let i = 0; i < st.count; i++) e += st.vx[i] ** 2 + st.vy[i] ** 2 + st.vz[i] ** 2;
            return e;
          };
          const e0 = energy();
          moveParticles(st, (crossings * 2e-3) / 400);
          return Math.abs(energy() - e0) <= 1e-12 * e0;
        },
      ),
      { numRuns: 40 },
    );
  });
});
