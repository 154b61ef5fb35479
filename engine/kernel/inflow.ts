/**
 * Molecules entering through reservoir sides and pressure outlets, each step: per segment (kernel/inflowTable.ts) the mean number of
 * simulated particles of the Maxwellian influx, the fractional part carried to the next step so the mean is exact.
 * Each enters at a uniform point of its segment (uniform in area: in r² on an axisymmetric end), with the velocity
 * distribution of molecules crossing a plane — the normal component flux-weighted, f(c_n) ∝ c_n exp(−(c_n − u_n)²/v_mp²),
 * the tangential ones Maxwellian about the drift — and flies a uniform fraction of the step (Bird 1994, §12.5).
 */
import { uniform, standardNormal, rotationalEnergyOverKT, type RngState } from '../particles/rng';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { SimState } from './state';
import { flyAndSettle } from './settle';
import {
  SIDE_STRIDE,
  SIDE_NORMAL_IS_X,
  SIDE_INWARD,
  SIDE_PLANE,
  INFLOW_STRIDE,
  INFLOW_SURFACE,
  INFLOW_FROM,
  INFLOW_TO,
  INFLOW_PER_STEP,
  INFLOW_SPEED_RATIO,
  INFLOW_TEMPERATURE,
  INFLOW_DRIFT_X,
  INFLOW_DRIFT_Y,
  INFLOW_DRIFT_Z,
} from './layout';
import { addParticle } from './particleStore';

const SQRT_PI = Math.sqrt(Math.PI);

/**
 * A normal speed z = c_n / v_mp > 0 with density ∝ z exp(−(z − s)²), s = u_n / v_mp (u_n the drift along the inward
 * normal). Exact rejection sampling, our own construction:
 * - s = 0: z = sqrt(−ln U), directly;
 * - s < 0: propose z e^{−z²} (z = sqrt(−ln U)), accept with probability e^{2zs} ≤ 1;
 * - s > 0: with w = z − s the target is (w + s) e^{−w²} on w > −s; propose (|w| + s) e^{−w²} on all w — a mixture
 *   of |w| e^{−w²} (weight 1: a Rayleigh deviate with a random sign) and s e^{−w²} (weight s√π: a normal deviate of
 *   variance 1/2) — and accept with probability (w + s)/(|w| + s), rejecting w ≤ −s.
 */
export function fluxNormalSpeed(rng: RngState, s: number): number {
  if (s === 0) return Math.sqrt(-Math.log(uniform(rng)));
  if (s < 0) {
    for (;;) {
      const z = Math.sqrt(-Math.log(uniform(rng)));
      if (uniform(rng) < Math.exp(2 * z * s)) return z;
    }
  }
  for (;;) {
    let w: number;
    if (uniform(rng) * (1 + s * SQRT_PI) < 1) {
      w = Math.sqrt(-Math.log(uniform(rng)));
      if (uniform(rng) < 0.5) w = -w;
    } else {
      w = standardNormal(rng) * Math.SQRT1_2;
    }
    const z = s + w;
    if (z <= 0) continue;
    if (uniform(rng) * (Math.abs(w) + s) <= z) return z;
  }
}

/**
 * Appends this step's reservoir molecules, each placed on its side with its entry velocity, and flies it for the
 * fraction of the step it has been in the domain (flyAndSettle: flight, weighting, index).
 */
export function injectReservoirMolecules(st: SimState, dt: number): void {
  const table = st.inflowTable;
  const remainder = st.inflowRemainder;
  const tab = st.sideTable;
  const rng = st.rng;
  const segments = remainder.length;
  for (let g = 0; g < segments; g++) {
    const o = g * INFLOW_STRIDE;
    const expected = table[o + INFLOW_PER_STEP] + remainder[g];
    const n = Math.floor(expected);
    remainder[g] = expected - n;
    if (n === 0) continue;
    const row = table[o + INFLOW_SURFACE] * SIDE_STRIDE;
    const normalIsX = tab[row + SIDE_NORMAL_IS_X] === 1;
    const inward = tab[row + SIDE_INWARD];
    const plane = tab[row + SIDE_PLANE];
    const kT = K_B * table[o + INFLOW_TEMPERATURE];
    const sd = Math.sqrt(kT / st.massKg);
    const vmp = Math.SQRT2 * sd;
    const ux = table[o + INFLOW_DRIFT_X];
    const uy = table[o + INFLOW_DRIFT_Y];
    const uz = table[o + INFLOW_DRIFT_Z];
    const s = table[o + INFLOW_SPEED_RATIO];
    const a = table[o + INFLOW_FROM];
    const b = table[o + INFLOW_TO];
    const ringEnd = st.axisymmetric && normalIsX;
    for (let p = 0; p < n; p++) {
      const i = addParticle(st);
      const along = ringEnd ? Math.sqrt(a * a + uniform(rng) * (b * b - a * a)) : a + uniform(rng) * (b - a);
      const cn = inward * vmp * fluxNormalSpeed(rng, s);
      if (normalIsX) {
        st.x[i] = plane;
        st.y[i] = along;
        st.vx[i] = cn;
        st.vy[i] = uy + sd * standardNormal(rng);
      } else {
        st.x[i] = along;
        st.y[i] = plane;
        st.vx[i] = ux + sd * standardNormal(rng);
        st.vy[i] = cn;
      }
      st.vz[i] = uz + sd * standardNormal(rng);
      st.erot[i] = kT * rotationalEnergyOverKT(rng, st.rotationalDof);
      flyAndSettle(st, i, uniform(rng) * dt, 0);
    }
  }
}
