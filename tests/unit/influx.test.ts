/**
 * The reservoir influx: the normal-speed sampler draws from the flux-weighted drifting Maxwellian
 * f(z) ∝ z exp(−(z − s)²), z = c_n/v_mp > 0, and the number flux is its normalisation.
 *
 * Moments of f, from the Gaussian integrals ∫ wᵏ e^{−w²} over (−s, ∞) (integral tables; derived by hand here):
 *   I1 = ½ e^{−s²} + (√π/2) s (1 + erf s)
 *   I2 = (s/2) e^{−s²} + (√π/4)(1 + 2s²)(1 + erf s)
 *   I3 = ((1 + s²)/2) e^{−s²} + (√π/4)(3s + 2s³)(1 + erf s)
 * so E[z] = I2/I1 and E[z²] = I3/I1; the one-way flux is Γ = n v_mp I1 / √π (Bird 1994, eq. 4.22).
 */
import { describe, expect, it } from 'vitest';
import jStat from 'jstat';
import { fluxNormalSpeed } from '../../engine/kernel/inflow';
import { maxwellianInfluxPerM2S } from '../../engine/kernel/inflowTable';
import { createRng } from '../../engine/particles/rng';

const erfc1 = (s: number) => 1 + jStat.erf(s);
const I1 = (s: number) => 0.5 * Math.exp(-s * s) + (Math.sqrt(Math.PI) / 2) * s * erfc1(s);
const I2 = (s: number) => (s / 2) * Math.exp(-s * s) + (Math.sqrt(Math.PI) / 4) * (1 + 2 * s * s) * erfc1(s);
const I3 = (s: number) =>
  ((1 + s * s) / 2) * Math.exp(-s * s) + (Math.sqrt(Math.PI) / 4) * (3 * s + 2 * s ** 3) * erfc1(s);

describe('fluxNormalSpeed()', () => {
  for (const s of [-1.5, -0.3, 0, 0.4, 2]) {
    it(`draws normal speeds with the mean and mean square of the flux-weighted Maxwellian for s = ${s}`, () => {
      const rng = createRng(7, 0);
      const n = 200_000;
      let sum = 0;
      let sum2 = 0;
      let sum4 = 0;
      let smallest = Infinity;
      for (let k = 0; k < n; k++) {
        const z = fluxNormalSpeed(rng, s);
        smallest = Math.min(smallest, z);
        sum += z;
        sum2 += z * z;
        sum4 += z ** 4;
      }
      expect(smallest).toBeGreaterThan(0);
      const mean = I2(s) / I1(s);
      const meanSquare = I3(s) / I1(s);
      const sd = Math.sqrt(meanSquare - mean * mean);
      const sdSquare = Math.sqrt(sum4 / n - (sum2 / n) ** 2);
      // 4 standard errors: a false alarm about once in 16 000 runs; the seed is fixed anyway.
      expect(Math.abs(sum / n - mean)).toBeLessThan((4 * sd) / Math.sqrt(n));
      expect(Math.abs(sum2 / n - meanSquare)).toBeLessThan((4 * sdSquare) / Math.sqrt(n));
    });
  }
});

describe('maxwellianInfluxPerM2S()', () => {
  it('is n c̄/4 for a gas at rest (kinetic theory, common practice) and n v_mp I1(s)/√π with drift', () => {
    const n = 1e20;
    const vmp = 350;
    const meanSpeed = (2 / Math.sqrt(Math.PI)) * vmp;
    expect(maxwellianInfluxPerM2S(n, vmp, 0)).toBeCloseTo((n * meanSpeed) / 4, -10);
    for (const s of [-2, -0.5, 0.7, 3])
      expect(maxwellianInfluxPerM2S(n, vmp, s) / ((n * vmp * I1(s)) / Math.sqrt(Math.PI))).toBeCloseTo(1, 12);
    // A strong outflow lets almost nothing in; a strong inflow carries n u.
    expect(maxwellianInfluxPerM2S(n, vmp, 6) / (n * 6 * vmp)).toBeCloseTo(1, 3);
  });
});
