// Steady lid-driven cavity (engine/continuum/cavity): published centreline velocities at Re = 100, convergence with
// the grid, and the first-order slip condition's limits. Deterministic solver: no statistics, fixed tolerances.
import { describe, expect, it } from 'vitest';
import { solveCavity, type CavityResult } from '../../engine/continuum/cavity/solveCavity';
import { interpolateLine } from '../../engine/continuum/cavity/centerlines';

/**
 * Ghia, Ghia & Shin 1982, J. Comput. Phys. 48:387, Re = 100 (published; copied from the project's reference notes,
 * which reproduce Table I and Table II): u on the vertical centreline x = 1/2 at height y, and v on the horizontal
 * centreline y = 1/2 at abscissa x; lid speed 1, side 1. Rows: [y, u, x, v].
 */
const GHIA_RE100: readonly (readonly [number, number, number, number])[] = [
  [1.0, 1.0, 1.0, 0.0],
  [0.9766, 0.84123, 0.9688, -0.05906],
  [0.9688, 0.78871, 0.9609, -0.07391],
  [0.9609, 0.73722, 0.9531, -0.08864],
  [0.9531, 0.68717, 0.9453, -0.10313],
  [0.8516, 0.23151, 0.9063, -0.16914],
  [0.7344, 0.00332, 0.8594, -0.22445],
  [0.6172, -0.13641, 0.8047, -0.24533],
  [0.5, -0.20581, 0.5, 0.05454],
  [0.4531, -0.2109, 0.2344, 0.17527],
  [0.2813, -0.15662, 0.2266, 0.17507],
  [0.1719, -0.1015, 0.1563, 0.16077],
  [0.1016, -0.06434, 0.0938, 0.12317],
  [0.0703, -0.04775, 0.0781, 0.1089],
  [0.0625, -0.04192, 0.0703, 0.10091],
  [0.0547, -0.03717, 0.0625, 0.09233],
  [0.0, 0.0, 0.0, 0.0],
];

/** Largest deviation from the Ghia table on each centreline (lid speeds), profiles interpolated linearly. */
function ghiaDeviation(r: CavityResult): { u: number; v: number } {
  const c = r.centerline;
  let u = 0;
  let v = 0;
  for (const [y, uRef, x, vRef] of GHIA_RE100) {
    u = Math.max(u, Math.abs(interpolateLine(c.position, c.u, y) - uRef));
    v = Math.max(v, Math.abs(interpolateLine(c.position, c.v, x) - vRef));
  }
  return { u, v };
}

// Solved once and shared: each 129² solve takes a second or two.
const solved = new Map<string, CavityResult>();
function cavity(grid: number, slip?: { knudsen: number; accommodation?: number }): CavityResult {
  const key = `${grid} ${slip?.knudsen} ${slip?.accommodation}`;
  let r = solved.get(key);
  if (!r) {
    r = solveCavity(slip ? { reynolds: 100, grid, slip: 'first', ...slip } : { reynolds: 100, grid });
    solved.set(key, r);
  }
  return r;
}

describe('solveCavity() at Re = 100 against Ghia, Ghia & Shin 1982', () => {
  it('converges on 129² and every tabulated centreline point is within 0.01 of the lid speed', () => {
    const r = cavity(129);
    expect(r.converged).toBe(true);
    expect(r.residual).toBeLessThanOrEqual(1e-10);
    const d = ghiaDeviation(r);
    // Measured: 0.0043 (u) and 0.0084 (v). Most of the v deviation is the table's own: its v minimum, −0.24533, lies
    // 0.008 above the grid-converged minimum −0.2538 (next test).
    expect(d.u).toBeLessThan(0.01);
    expect(d.v).toBeLessThan(0.01);
  });

  it('the deviation from the table falls as the grid is refined: 17² → 33² → 65²', () => {
    const worst = [17, 33, 65].map((n) => {
      const d = ghiaDeviation(cavity(n));
      return Math.max(d.u, d.v);
    });
    // Measured: 0.052, 0.0089, 0.0059. Beyond 65² the deviation stops falling: it approaches the table's own error.
    expect(worst[1]).toBeLessThan(worst[0]);
    expect(worst[2]).toBeLessThan(worst[1]);
  });

  it('the centreline extrema converge at second order, towards the published grid-converged values', () => {
    const [a, b, c] = [33, 65, 129].map((n) => cavity(n).centerline);
    type Line = typeof a;
    // Grid-converged extrema at Re = 100, Botella & Peyret 1998 (Comput. Fluids 27:421; from memory):
    // uMin −0.21404 at y = 0.4581, vMax 0.17957 at x = 0.2370, vMin −0.25380 at x = 0.8104.
    const checks: [(x: Line) => number, (x: Line) => number, number, number][] = [
      [(x) => x.uMin.value, (x) => x.uMin.y, -0.21404, 0.4581],
      [(x) => x.vMax.value, (x) => x.vMax.x, 0.17957, 0.237],
      [(x) => x.vMin.value, (x) => x.vMin.x, -0.2538, 0.8104],
    ];
    for (const [value, position, valueRef, positionRef] of checks) {
      // Second-order central differences with Thom's wall vorticity: the ratio of successive differences tends to
      // 4 (measured 4.08, 4.09, 4.08).
      const ratio = (value(b) - value(a)) / (value(c) - value(b));
      expect(ratio).toBeGreaterThan(3.5);
      expect(ratio).toBeLessThan(4.5);
      // Richardson extrapolation from 65² and 129² (measured within 2e-5 of the recalled values; 1e-3 allowed
      // because they are recalled, not re-read).
      expect(Math.abs(value(c) + (value(c) - value(b)) / 3 - valueRef)).toBeLessThan(1e-3);
      expect(Math.abs(position(c) + (position(c) - position(b)) / 3 - positionRef)).toBeLessThan(1e-3);
    }
  });
});

describe('solveCavity() pseudo-time stepping', () => {
  it('the converged answer does not depend on the pseudo-time step; a step too large is backed out of and halved', () => {
    const reference = cavity(33);
    // 5 lid-passage times per step diverges on 33² (measured): the solver backs up and halves it until it converges.
    const large = solveCavity({ reynolds: 100, grid: 33, pseudoTimeStep: 5 });
    expect(large.converged).toBe(true);
    expect(large.pseudoTimeStep).toBeLessThan(5);
    const small = solveCavity({ reynolds: 100, grid: 33, pseudoTimeStep: 0.1 });
    expect(small.converged).toBe(true);
    for (const r of [large, small]) {
      let d = 0;
      for (let k = 0; k < r.psi.length; k++) d = Math.max(d, Math.abs(r.psi[k] - reference.psi[k]));
      // Same discrete steady equations, same tolerance: only the iteration path differs (measured 3e-15 and 7e-11).
      expect(d).toBeLessThan(1e-9);
    }
  });
});

describe('solveCavity() with first-order Maxwell slip', () => {
  it('reproduces the no-slip fields as Kn → 0, the difference falling linearly with Kn', () => {
    const noSlip = cavity(33);
    const maxDifference = (knudsen: number): number => {
      const r = cavity(33, { knudsen });
      expect(r.converged).toBe(true);
      let d = 0;
      for (let k = 0; k < r.u.length; k++)
        d = Math.max(d, Math.abs(r.u[k] - noSlip.u[k]), Math.abs(r.v[k] - noSlip.v[k]));
      return d;
    };
    expect(maxDifference(1e-8)).toBeLessThan(1e-5);
    // First order in Kn: ten times the Knudsen number, ten times the change (measured ratio 0.105).
    const ratio = maxDifference(1e-4) / maxDifference(1e-3);
    expect(ratio).toBeGreaterThan(0.09);
    expect(ratio).toBeLessThan(0.12);
  });

  it('slip weakens the vortex: |uMin| falls as Kn grows and as the accommodation falls, and the gas lags the lid', () => {
    const uMin = (knudsen: number, accommodation?: number) =>
      cavity(33, { knudsen, accommodation }).centerline.uMin.value;
    const noSlip = cavity(33).centerline.uMin.value;
    expect(noSlip).toBeLessThan(0);
    expect(Math.abs(uMin(0.01))).toBeLessThan(Math.abs(noSlip));
    expect(Math.abs(uMin(0.05))).toBeLessThan(Math.abs(uMin(0.01)));
    // σ = 0.5 triples the slip length ((2 − σ)/σ = 3), so less momentum reaches the gas.
    expect(Math.abs(uMin(0.05, 0.5))).toBeLessThan(Math.abs(uMin(0.05)));
    // Tangential gas velocity at the lid on x = 1/2: below the lid speed with slip, equal to it without.
    const slipping = cavity(33, { knudsen: 0.05 }).centerline;
    expect(slipping.u[32]).toBeLessThan(1);
    expect(slipping.u[32]).toBeGreaterThan(0);
    expect(cavity(33).centerline.u[32]).toBe(1);
  });
});
