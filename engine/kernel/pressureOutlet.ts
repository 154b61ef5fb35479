/**
 * A pressure outlet: the end of a long duct held at pressure p_b when the domain leaves the downstream vessel out.
 * Molecules leave freely; molecules enter with the Maxwellian influx of a boundary state found each step from the gas
 * in the cell next to the end by the characteristic relations for subsonic outflow (Wang & Li 2004, Int. J. Heat
 * Mass Transfer 47:2711; from memory), with e the averaged state of that cell and a_e = sqrt(γ k T_e / m):
 *   ρ_b = ρ_e + (p_b − p_e) / a_e²,   u_b = u_e + (p_e − p_b) / (ρ_e a_e),   T_b = p_b / (n_b k),
 * u the velocity along the outward normal; the tangential velocity is the cell's.
 *
 * Limits (documented in DEVELOPERS.md): subsonic outflow only (the relations assume one characteristic enters);
 * the cell state is an exponential running average over about 1/RELAXATION steps, so the condition lags the flow
 * by that much and a run needs a transient longer than it; it holds the mean pressure at the end, not the local
 * pressure of a kinetic boundary layer, so it is meant for the exit of ducts several mean free paths long, not for
 * an opening into a vessel (use a reservoir side and a vessel region there).
 */
import type { Plan } from '../plan/plan';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { SimState } from './state';
import { maxwellianInfluxPerM2S } from './inflowTable';
import {
  SIDE_STRIDE,
  SIDE_TYPE,
  SIDE_INWARD,
  SIDE_PRESSURE,
  BOUNDARY_PRESSURE_OUTLET,
  INFLOW_STRIDE,
  INFLOW_SURFACE,
  INFLOW_PER_STEP,
  INFLOW_SPEED_RATIO,
  INFLOW_WEIGHT,
  INFLOW_TEMPERATURE,
  INFLOW_DRIFT_X,
  INFLOW_DRIFT_Y,
  INFLOW_DRIFT_Z,
  INFLOW_CELL,
  INFLOW_CELL_VOLUME,
  INFLOW_AREA,
} from './layout';

/** Weight of the newest step in the running average of the outlet cells (memory of about 50 steps). */
const RELAXATION = 0.02;
/** Moments per segment: weighted particle count, Σv_x, Σv_y, Σv_z, Σ|v|². */
const MOMENTS = 5;

/** Running averages started from the initial gas, so the first steps let in the initial state. */
export function initialOutletMoments(plan: Plan, table: Float64Array): Float64Array {
  const segments = table.length / INFLOW_STRIDE;
  const out = new Float64Array(segments * MOMENTS);
  const init = plan.caseData.initial;
  const [u, v, w] = init.velocityMPerS;
  const c2 = (3 * K_B * init.temperatureK) / plan.gas.model.massKg;
  for (let g = 0; g < segments; g++) {
    const o = g * INFLOW_STRIDE;
    const n =
      ((init.pressurePa / (K_B * init.temperatureK)) * table[o + INFLOW_CELL_VOLUME]) /
      (plan.moleculesPerParticle * table[o + INFLOW_WEIGHT]);
    out.set([n, n * u, n * v, n * w, n * (u * u + v * v + w * w + c2)], g * MOMENTS);
  }
  return out;
}

/** Updates every pressure-outlet segment's entry state from its cell (needs this step's index). */
export function updatePressureOutlets(st: SimState): void {
  const table = st.inflowTable;
  const moments = st.outletMoments;
  const tab = st.sideTable;
  const m = st.massKg;
  const gamma = (5 + st.rotationalDof) / (3 + st.rotationalDof);
  const segments = table.length / INFLOW_STRIDE;
  for (let g = 0; g < segments; g++) {
    const o = g * INFLOW_STRIDE;
    const row = table[o + INFLOW_SURFACE] * SIDE_STRIDE;
    if (tab[row + SIDE_TYPE] !== BOUNDARY_PRESSURE_OUTLET) continue;
    const c = table[o + INFLOW_CELL];
    let n = 0,
      sx = 0,
      sy = 0,
      sz = 0,
      s2 = 0;
    for (let k = st.keyStart[c * st.subcellsPerCell]; k < st.keyStart[(c + 1) * st.subcellsPerCell]; k++) {
      const i = st.order[k];
      const vx = st.vx[i],
        vy = st.vy[i],
        vz = st.vz[i];
      n++;
      sx += vx;
      sy += vy;
      sz += vz;
      s2 += vx * vx + vy * vy + vz * vz;
    }
    const mo = g * MOMENTS;
    // Exponential running averages, written out: the step allocates nothing.
    moments[mo] += RELAXATION * (n - moments[mo]);
    moments[mo + 1] += RELAXATION * (sx - moments[mo + 1]);
    moments[mo + 2] += RELAXATION * (sy - moments[mo + 2]);
    moments[mo + 3] += RELAXATION * (sz - moments[mo + 3]);
    moments[mo + 4] += RELAXATION * (s2 - moments[mo + 4]);
    const count = moments[mo];
    if (!(count > 0)) continue;
    const ux = moments[mo + 1] / count;
    const uy = moments[mo + 2] / count;
    const uz = moments[mo + 3] / count;
    const te = (m * (moments[mo + 4] / count - ux * ux - uy * uy - uz * uz)) / (3 * K_B);
    const ne = (count * st.moleculesPerParticle * table[o + INFLOW_WEIGHT]) / table[o + INFLOW_CELL_VOLUME];
    const pe = ne * K_B * te;
    const rhoE = ne * m;
    const ae = Math.sqrt((gamma * K_B * te) / m);
    const pb = tab[row + SIDE_PRESSURE];
    const outward = -tab[row + SIDE_INWARD];
    const rhoB = rhoE + (pb - pe) / (ae * ae);
    const uOut = ux * outward + (pe - pb) / (rhoE * ae);
    const nb = rhoB / m;
    const tb = pb / (nb * K_B);
    // Early in a run the cell can be far from any state the relations hold for: keep the last good entry state.
    if (!(nb > 0 && tb > 0 && Number.isFinite(uOut))) continue;
    const vmp = Math.sqrt((2 * K_B * tb) / m);
    const s = -uOut / vmp;
    table[o + INFLOW_TEMPERATURE] = tb;
    table[o + INFLOW_DRIFT_X] = uOut * outward;
    table[o + INFLOW_DRIFT_Y] = uy;
    table[o + INFLOW_DRIFT_Z] = uz;
    table[o + INFLOW_SPEED_RATIO] = s;
    table[o + INFLOW_PER_STEP] =
      (maxwellianInfluxPerM2S(nb, vmp, s) * table[o + INFLOW_AREA] * st.timeStep) /
      (st.moleculesPerParticle * table[o + INFLOW_WEIGHT]);
  }
}
