/**
 * Gas–surface interaction at a wall side: re-emits particle i and, while sampling, books the momentum and energy it
 * gave the wall. Called only from the boundary pass (a few per cent of particles per step), so clarity wins here.
 *
 * Velocities are handled in the wall's frame (c = v − u_w) and in a local basis: n = unit normal into the gas,
 * t1, t2 = the two tangential axes. Energies booked to the wall are in the wall's frame, so a moving wall's heat
 * flux excludes the work its motion does on the gas.
 */
import { uniform, standardNormal, rotationalEnergyOverKT } from '../particles/rng';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import type { SimState } from './state';
import {
  SIDE_STRIDE,
  SIDE_MODEL,
  SIDE_TEMPERATURE,
  SIDE_UX,
  SIDE_UY,
  SIDE_UZ,
  SIDE_ACCOMMODATION,
  SIDE_TANGENTIAL_ENERGY_ACCOMMODATION,
  SIDE_BIN_OFFSET,
  SIDE_BIN_COUNT,
  SIDE_THERMAL_SPEED,
  SIDE_NORMAL_IS_X,
  SIDE_INWARD,
  SIDE_FROM,
  SIDE_TO,
  WALL_DIFFUSE,
  WALL_SPECULAR,
  WALL_MAXWELL,
  SUMS_PER_WALL_BIN,
  WALL_HITS,
  WALL_PX,
  WALL_PY,
  WALL_PZ,
  WALL_ENERGY,
} from './layout';

/**
 * Re-emits particle i from surface `side` (a side-table row) at position `along` (m) measured along it (x for
 * surfaces normal to y, y for surfaces normal to x), and books its momentum and energy, times the particle weight
 * `weight` (1 in planar domains), to the wall bin there. In axisymmetric domains the velocity is already in the
 * meridional frame of the hit, where y is radial. Formulas:
 * - diffuse: flux-weighted half-Maxwellian at T_w: c_n = sqrt(−2 kT_w/m · ln R), tangential components Gaussian
 *   with variance kT_w/m; rotational energy from the equilibrium distribution at T_w (Bird 1994, §12.2);
 * - Maxwell: diffuse with probability α, specular otherwise (Maxwell 1879);
 * - Cercignani–Lampis, in Lord's form (Lord 1991, Phys. Fluids A 3:706; Bird 1994 §12.4): with speeds scaled by
 *   v_w = sqrt(2kT_w/m), the normal component c_n' = sqrt(r² + (1−α_n) c_n² + 2 r sqrt(1−α_n) c_n cos θ),
 *   r = sqrt(−α_n ln R1), θ = 2πR2; each tangential component c_t' = sqrt(1−α_t) c_t + sqrt(−α_t ln R3) cos(2πR4),
 *   α_t = σ_t(2 − σ_t). Rotational energy of linear molecules (2 degrees of freedom) uses the same kernel on its
 *   2-D "velocity" with α_n; for 3 rotational degrees of freedom it is re-drawn at T_w with probability α_n
 *   (a simplification, documented in DEVELOPERS.md).
 */
export function reflectAtWall(st: SimState, i: number, side: number, along: number, weight: number): void {
  const tab = st.sideTable;
  const row = side * SIDE_STRIDE;
  const model = tab[row + SIDE_MODEL];
  const uwx = tab[row + SIDE_UX];
  const uwy = tab[row + SIDE_UY];
  const uwz = tab[row + SIDE_UZ];
  const m = st.massKg;
  const rng = st.rng;

  // Local basis: component indices (0 = x, 1 = y) of the normal, and its sign pointing into the gas.
  const normalIsX = tab[row + SIDE_NORMAL_IS_X] === 1;
  const inward = tab[row + SIDE_INWARD];
  const vx0 = st.vx[i];
  const vy0 = st.vy[i];
  const vz0 = st.vz[i];
  const e0 = st.erot[i];
  // Wall-frame components: normal (positive into the gas), tangential t1 (x or y along the side), t2 = z.
  let cn = (normalIsX ? vx0 - uwx : vy0 - uwy) * inward; // negative: moving into the wall
  let ct1 = normalIsX ? vy0 - uwy : vx0 - uwx;
  let ct2 = vz0 - uwz;
  let erot = e0;
  const incidentEnergy = 0.5 * m * (cn * cn + ct1 * ct1 + ct2 * ct2) + e0;

  let mode = model;
  if (model === WALL_MAXWELL) mode = uniform(rng) < tab[row + SIDE_ACCOMMODATION] ? WALL_DIFFUSE : WALL_SPECULAR;

  if (mode === WALL_DIFFUSE) {
    const s = tab[row + SIDE_THERMAL_SPEED];
    cn = s * Math.sqrt(-2 * Math.log(uniform(rng)));
    ct1 = s * standardNormal(rng);
    ct2 = s * standardNormal(rng);
    erot = K_B * tab[row + SIDE_TEMPERATURE] * rotationalEnergyOverKT(rng, st.rotationalDof);
  } else if (mode === WALL_SPECULAR) {
    cn = -cn;
  } else {
    const vw = Math.SQRT2 * tab[row + SIDE_THERMAL_SPEED];
    const an = tab[row + SIDE_ACCOMMODATION];
    const at = tab[row + SIDE_TANGENTIAL_ENERGY_ACCOMMODATION];
    const un = -cn / vw;
    const r = Math.sqrt(-an * Math.log(uniform(rng)));
    const theta = 2 * Math.PI * uniform(rng);
    const sn = Math.sqrt(1 - an);
    cn = vw * Math.sqrt(r * r + sn * sn * un * un + 2 * r * sn * un * Math.cos(theta));
    const st1 = Math.sqrt(1 - at);
    ct1 = vw * (st1 * (ct1 / vw) + Math.sqrt(-at * Math.log(uniform(rng))) * Math.cos(2 * Math.PI * uniform(rng)));
    ct2 = vw * (st1 * (ct2 / vw) + Math.sqrt(-at * Math.log(uniform(rng))) * Math.cos(2 * Math.PI * uniform(rng)));
    const kTw = K_B * tab[row + SIDE_TEMPERATURE];
    if (st.rotationalDof === 2) {
      const a = sn * Math.sqrt(e0 / kTw);
      const rr = Math.sqrt(-an * Math.log(uniform(rng)));
      const phi = 2 * Math.PI * uniform(rng);
      const px = a + rr * Math.cos(phi);
      const py = rr * Math.sin(phi);
      erot = kTw * (px * px + py * py);
    } else if (st.rotationalDof > 0 && uniform(rng) < an) {
      erot = kTw * rotationalEnergyOverKT(rng, st.rotationalDof);
    }
  }

  const nv = cn * inward;
  const vx1 = (normalIsX ? nv : ct1) + uwx;
  const vy1 = (normalIsX ? ct1 : nv) + uwy;
  const vz1 = ct2 + uwz;
  st.vx[i] = vx1;
  st.vy[i] = vy1;
  st.vz[i] = vz1;
  st.erot[i] = erot;

  if (st.sampling) {
    const bins = tab[row + SIDE_BIN_COUNT];
    const from = tab[row + SIDE_FROM];
    let b = Math.floor(((along - from) / (tab[row + SIDE_TO] - from)) * bins);
    if (b < 0) b = 0;
    else if (b >= bins) b = bins - 1;
    const o = (tab[row + SIDE_BIN_OFFSET] + b) * SUMS_PER_WALL_BIN;
    const ws = st.wallSums;
    const wm = weight * m;
    ws[o + WALL_HITS] += weight;
    ws[o + WALL_PX] += wm * (vx0 - vx1);
    ws[o + WALL_PY] += wm * (vy0 - vy1);
    ws[o + WALL_PZ] += wm * (vz0 - vz1);
    ws[o + WALL_ENERGY] += weight * (incidentEnergy - (0.5 * m * (cn * cn + ct1 * ct1 + ct2 * ct2) + erot));
  }
}
