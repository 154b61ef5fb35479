/**
 * Force-driven Poiseuille flow at Kn = 0.1: the temperature profile has a local minimum at the centre, which the
 * Navier–Stokes equations do not predict (Zheng, Garcia & Alder 2002, J. Stat. Phys. 109:495; Aoki, Takata &
 * Nakanishi 2002, Phys. Rev. E 65:026315; both from memory). Navier–Stokes with constant transport coefficients gives
 * T = T_s + A (1 − η⁴), η = 2y/H − 1: a maximum at the centre and no η² term (common practice, no source).
 *
 * Check: a weighted least-squares fit T = c0 + c2 η² + c4 η⁴ to the DSMC profile away from the Knudsen layers
 * (|η| < 0.75), weights from each row's 95 % half-width (rows taken as independent). The dip is c2 > 0: its 95 %
 * lower bound must be above zero. The maxima of the fit, at η* = ±sqrt(−c2/(2 c4)), must lie off the centre and
 * inside the bulk (0.15 < η* < 0.75). The dip is a second-order effect in the force, as is the heating itself, so
 * the flow is driven hard (centre speed ≈ 0.65 v0) to make it stand out of the noise.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { runToEnd } from '../support/planOrThrow';
import { field } from './runGapPreset';
import { summarize } from '../../engine/run/simulationSamples';

const V0 = Math.sqrt((2 * 1.380649e-23 * 300) / 66.3e-27); // argon at 300 K (species table, from memory)
const KNUDSEN = 0.1;
const GAP = 1e-6;

/** Solves the 3 × 3 normal equations; returns the coefficients and their variances. */
function fitEvenQuartic(eta: number[], t: number[], sd: number[]): { c: number[]; variance: number[] } {
  const a = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  const b = [0, 0, 0];
  eta.forEach((e, k) => {
    const basis = [1, e * e, e ** 4];
    const w = 1 / (sd[k] * sd[k]);
    for (let i = 0; i < 3; i++) {
      b[i] += w * basis[i] * t[k];
      for (let j = 0; j < 3; j++) a[i][j] += w * basis[i] * basis[j];
    }
  });
  // Inverse of the symmetric 3 × 3 matrix by cofactors.
  const [[p, q, r], [, s, u], [, , v]] = a;
  const det = p * (s * v - u * u) - q * (q * v - u * r) + r * (q * u - s * r);
  const inv = [
    [s * v - u * u, r * u - q * v, q * u - r * s],
    [r * u - q * v, p * v - r * r, q * r - p * u],
    [q * u - r * s, q * r - p * u, p * s - q * q],
  ].map((row) => row.map((x) => x / det));
  const c = inv.map((row) => row[0] * b[0] + row[1] * b[1] + row[2] * b[2]);
  return { c, variance: [inv[0][0], inv[1][1], inv[2][2]] };
}

describe('force-driven Poiseuille flow at Kn = 0.1: the central temperature dip', () => {
  it('has a local temperature minimum at the centre (c2 > 0 beyond its 95 % interval) with maxima off the centre', () => {
    const delta = Math.sqrt(Math.PI) / (2 * KNUDSEN);
    const acceleration = (0.6 * V0 * V0) / (GAP * (delta / 6 + 1.5));
    const c = buildPreset('poiseuille', {
      gas: 'Ar',
      model: 'HS',
      knudsen: String(KNUDSEN),
      gap: '1um',
      temperature: '300K',
      acceleration: String(acceleration),
      particlesPerCell: '100',
      sampleSteps: '250000',
      seed: '9',
    });
    const result = summarize(runToEnd(c));
    const rows = result.profile.rows;
    const eta: number[] = [];
    const t: number[] = [];
    const sd: number[] = [];
    for (let r = 0; r < rows; r++) {
      const e = (2 * (r + 0.5)) / rows - 1;
      if (Math.abs(e) >= 0.75) continue;
      const f = field(result.profile, 'temperature', r);
      eta.push(e);
      t.push(f.mean);
      sd.push(f.ci95 / 1.96);
    }
    const { c: coefficients, variance } = fitEvenQuartic(eta, t, sd);
    const [, c2, c4] = coefficients;
    expect(c2 - 1.96 * Math.sqrt(variance[1])).toBeGreaterThan(0);
    expect(c4).toBeLessThan(0);
    const peak = Math.sqrt(-c2 / (2 * c4));
    expect(peak).toBeGreaterThan(0.15);
    expect(peak).toBeLessThan(0.75);
  });
});
