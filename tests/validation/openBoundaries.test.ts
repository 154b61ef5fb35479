/**
 * Reservoir sides and axisymmetric domains hold an equilibrium gas as it is (kinetic theory: a Maxwellian gas at the
 * reservoirs' state, entering with the exact Maxwellian influx and leaving freely, stays that Maxwellian — common
 * practice, no source; Bird 1994 §12.5 for the influx).
 * - planar box open on two sides, gas at rest and drifting at 0.3 v_mp: density, velocity and temperature of the
 *   whole domain equal the reservoirs' within the run's 95 % half-width;
 * - closed round tube (axisymmetric, radial weighting, axis at the bottom): density and temperature uniform across the
 *   radius — the check — and equal to the initial state;
 * - axisymmetric box open on all three outer sides (ends and cylinder): the same, through ring and cylinder inflow.
 * Tolerances: each row's own 95 % half-width (and 1.5 of it for the row-by-row checks, so that about 1 row in 100
 * falls outside by chance: with 20 rows the chance that any does is ~13 %, hence the count bound below), and the
 * whole-domain averages within their half-width plus 0.3 % for the finite cell size.
 */
import { describe, expect, it } from 'vitest';
import { runToEnd } from '../support/planOrThrow';
import { field } from './runGapPreset';
import type { CaseInput } from '../../engine/case/schema';
import { averageOverCells, summarize } from '../../engine/run/simulationSamples';

const K_B = 1.380649e-23; // J/K (SI, exact)
const T = 300;
const P = 1.0; // Pa: argon mean free path ≈ 6.6 mm (viscosity based), Kn ≈ 1 on the 5 mm box
const MASS = 66.3e-27; // kg, argon (Bird 1994 App. A, from memory; the same row as engine/gas/species.ts)
const N = P / (K_B * T);
const VMP = Math.sqrt((2 * K_B * T) / MASS);

function openBox(drift: number, axisymmetric: boolean, openCylinder: boolean): CaseInput {
  const reservoir = {
    type: 'reservoir' as const,
    pressurePa: P,
    temperatureK: T,
    velocityMPerS: [drift, 0, 0] as [number, number, number],
  };
  return {
    schemaVersion: 1,
    name: 'open box',
    gas: { species: 'Ar', model: 'HS' },
    initial: { pressurePa: P, temperatureK: T, velocityMPerS: [drift, 0, 0] },
    domain: { lengthXM: 5e-3, lengthYM: 5e-3, geometry: axisymmetric ? 'axisymmetric' : 'planar' },
    boundaries: {
      left: reservoir,
      right: reservoir,
      bottom: axisymmetric ? { type: 'axis' } : { type: 'symmetry' },
      top: openCylinder ? reservoir : { type: 'symmetry' },
    },
    numerics: { cellsX: 10, cellsY: 10, particlesPerCell: 40 },
    sampling: { transientSteps: 400, sampleSteps: 6000 },
    seed: 11,
  };
}

function expectUniform(
  result: ReturnType<typeof summarize>,
  name: string,
  expected: number,
  relativeSlack: number,
): void {
  let outside = 0;
  for (let r = 0; r < result.profile.rows; r++) {
    const f = field(result.profile, name, r);
    if (Math.abs(f.mean - expected) > 1.5 * f.ci95 + relativeSlack * expected) outside++;
  }
  expect(outside).toBeLessThanOrEqual(1);
}

function expectDomainState(sim: ReturnType<typeof runToEnd>, drift: number): void {
  const all = averageOverCells(
    sim,
    Array.from({ length: sim.state.cells }, (_, c) => c),
  );
  const n = field(all, 'numberDensity');
  const t = field(all, 'temperature');
  const u = field(all, 'velocityX');
  expect(Math.abs(n.mean - N)).toBeLessThan(n.ci95 + 0.003 * N);
  expect(Math.abs(t.mean - T)).toBeLessThan(t.ci95 + 0.003 * T);
  expect(Math.abs(u.mean - drift)).toBeLessThan(u.ci95 + 0.003 * VMP);
}

describe('reservoir sides and axisymmetric domains keep an equilibrium gas in equilibrium', () => {
  it('planar box open at both ends, gas at rest and drifting at 0.3 v_mp', () => {
    for (const drift of [0, 0.3 * VMP]) {
      const sim = runToEnd(openBox(drift, false, false));
      expectDomainState(sim, drift);
      expect(sim.state.leaks).toBe(0);
    }
  });

  it('closed round tube: density and temperature uniform across the radius (radial weighting)', () => {
    const wall = { type: 'wall', temperatureK: T } as const;
    const sim = runToEnd({
      ...openBox(0, true, false),
      boundaries: { left: wall, right: wall, bottom: { type: 'axis' }, top: wall },
    });
    const result = summarize(sim);
    expectUniform(result, 'numberDensity', N, 0.003);
    expectUniform(result, 'temperature', T, 0.003);
    expectDomainState(sim, 0);
  });

  it('axisymmetric box open at both ends and on its cylinder: the same state throughout', () => {
    const sim = runToEnd(openBox(0, true, true));
    const result = summarize(sim);
    expectUniform(result, 'numberDensity', N, 0.003);
    expectUniform(result, 'temperature', T, 0.003);
    expectDomainState(sim, 0);
  });
});
