/**
 * Free-molecular transmission probability of a round tube (axisymmetric) and of a planar slit of finite length
 * (a channel between parallel plates), diffuse walls, one end open to a vessel, the other to vacuum, against
 * Clausing factors.
 *
 * Reference values (../shared/reference REFERENCES.md §1, flagged "computed"): Clausing's integral equation (Clausing
 * 1932, Ann. Phys. 12:961) solved by Nyström to 1e-6; published tables: Cole 1976 (Rarefied Gas Dynamics 10),
 * Li et al. 2013 (Vacuum 97:60); Berman's closed formula (1965, J. Appl. Phys. 36:3356) agrees within 0.07 %.
 * The issue asks for agreement within 1.5 %. DSMC here is exact free flight (Kn = 1000 on the radius or gap: one
 * molecule in about 1000 collides before leaving), so the only error is statistical: each check allows the run's
 * 95 % half-width plus 0.2 % for the rare collisions, and requires that half-width to be below 1 %.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { runToEnd } from '../support/planOrThrow';
import type { CaseInput } from '../../engine/case/schema';
import { summarize } from '../../engine/run/simulationSamples';

const CLAUSING_TUBE: Record<number, number> = { 1: 0.67198, 2: 0.51423, 10: 0.19094 };
const CLAUSING_SLIT: Record<number, number> = { 1: 0.68438, 2: 0.54206, 10: 0.24056 };

/** Argon at 300 K: most probable speed sqrt(2kT/m), m from the species table (Bird 1994 App. A, from memory). */
const V_MP = Math.sqrt((2 * 1.380649e-23 * 300) / 66.3e-27);

function freeMolecularDuct(kind: 'tube' | 'channel', lengthToSize: number): CaseInput {
  const common = {
    knudsen: '1000',
    temperature: '300K',
    cellsY: '4',
    particlesPerCell: '60',
    seed: '5',
    // Long ducts fill slowly (diffusion along the duct: time ∝ (L/R)²) and have fewer molecules coming through.
    transientSteps: String(Math.round(40 + 8 * lengthToSize ** 2)),
    sampleSteps: lengthToSize >= 10 ? '16000' : '8000',
  };
  const c =
    kind === 'tube'
      ? buildPreset('tube', {
          ...common,
          radius: '1mm',
          lengthToRadius: String(lengthToSize),
          vesselLengthToRadius: '0',
        })
      : buildPreset('channel', { ...common, gap: '1mm', lengthToGap: String(lengthToSize), vesselLengthToGap: '0' });
  // Downstream vacuum; the free-molecular transmission probability does not depend on the pressures.
  const right = c.boundaries.right;
  if (right.type !== 'reservoir') throw new Error('the duct presets end in reservoirs');
  right.pressurePa = 0;
  // Collisions hardly matter, so the time step need not resolve them: a quarter of the size per v_mp.
  c.numerics = { ...c.numerics, timeStepS: 0.25e-3 / V_MP };
  // The outlet section counts only molecules that made it through: the least noisy of the three.
  c.flowReport = { ...c.flowReport!, section: 'outlet' };
  return c;
}

describe('free-molecular transmission probability against Clausing factors', () => {
  for (const [kind, table, name] of [
    ['tube', CLAUSING_TUBE, 'round tube, L/R'],
    ['channel', CLAUSING_SLIT, 'planar slit, L/h'],
  ] as const) {
    for (const ratio of [1, 2, 10]) {
      it(`${name} = ${ratio}: W within 1.5 % of ${table[ratio]} and within its 95 % half-width`, () => {
        const sim = runToEnd(freeMolecularDuct(kind, ratio));
        const w = summarize(sim).flow!.values.transmissionProbability!;
        const expected = table[ratio];
        expect(w.ci95 / expected).toBeLessThan(0.01);
        expect(Math.abs(w.mean - expected)).toBeLessThan(w.ci95 + 0.002 * expected);
        expect(Math.abs(w.mean - expected) / expected).toBeLessThan(0.015);
        expect(sim.state.leaks).toBe(0);
      });
    }
  }
});
