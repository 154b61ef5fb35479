/**
 * Exact flights for the few particles the move loop puts aside: those that reach a side of the domain, may meet a
 * block, or cross a periodic pair while flow sections are counted. Each is flown from its stored position for the
 * time left, meeting the surfaces in time order (several per step if need be: corners, thin gaps), and counted at
 * every flow section a straight piece of its path crosses. Positions are snapped onto each surface hit, so round-off
 * cannot carry a particle through a wall.
 *
 * Planar flights are straight lines. Axisymmetric flights are straight lines in 3D from (x, r, 0): the radius
 * r(t)² = (r + v_r t)² + (v_θ t)² is quadratic in t, so cylinders r = R are met at a root of a quadratic; after each
 * hit (and at the end) the velocity is turned into the meridional plane through the new position (Bird 1994, §15.1).
 *
 * Blocks: a face is met from the gas side only (block interiors are open sets: a particle on a face is in the gas),
 * which keeps a particle that has just left a face from meeting it again at t = 0.
 */
import type { SimState } from './state';
import { reflectAtWall } from './wallReflection';
import {
  SIDE_STRIDE,
  SIDE_TYPE,
  SIDE_LEFT,
  SIDE_RIGHT,
  SIDE_BOTTOM,
  SIDE_TOP,
  DOMAIN_SIDES,
  BOUNDARY_PERIODIC,
  BOUNDARY_SPECULAR,
  BOUNDARY_WALL,
  BOUNDARY_RESERVOIR,
  BOUNDARY_PRESSURE_OUTLET,
  BLOCK_STRIDE,
  BLOCK_X0,
  BLOCK_X1,
  BLOCK_Y0,
  BLOCK_Y1,
  SECTION_STRIDE,
  SECTION_X,
  SECTION_Y0,
  SECTION_Y1,
} from './layout';

/** A flight ends with the particle in the gas, or gone through a reservoir side. */
export const FLIGHT_STAYS = 0;
export const FLIGHT_LEFT_DOMAIN = 1;

/** Bound on surface hits per step; only guards against a particle trapped with zero speed. */
const MAX_HITS = 64;

/**
 * Counts the crossings of flow sections by the straight piece from (x0, y0) to (x1, y1) — in axisymmetric domains
 * the radius at a crossing comes from the 3D line (r0 at the start, radial and azimuthal speeds vr, vt, time t) —
 * with the particle's weight, +1 towards +x. Only while sampling (the sums belong to the open batch).
 */
function countSections(
  st: SimState,
  x0: number,
  y0: number,
  x1: number,
  y1: number,
  vr: number,
  vt: number,
  t: number,
  weight: number,
): void {
  if (!st.sampling) return;
  const sec = st.sectionTable;
  for (let s = 0; s < st.sectionCount; s++) {
    const xs = sec[s * SECTION_STRIDE + SECTION_X];
    if (x0 < xs === x1 < xs) continue;
    const f = (xs - x0) / (x1 - x0);
    let yc: number;
    if (st.axisymmetric) {
      const tc = f * t;
      const a = y0 + vr * tc;
      const b = vt * tc;
      yc = Math.sqrt(a * a + b * b);
    } else {
      yc = y0 + f * (y1 - y0);
    }
    if (yc >= sec[s * SECTION_STRIDE + SECTION_Y0] && yc <= sec[s * SECTION_STRIDE + SECTION_Y1])
      st.sectionSums[s] += x1 >= xs ? weight : -weight;
  }
}

/**
 * Time at which r(t)² = p² + 2 p v t + a t² rises through R² (the later root), or Infinity if it never does from
 * now on. r² is convex in t, so the line crosses the cylinder outward at most once — also when it starts outside it
 * (p > R), dips inside and comes back out, which is how a molecule can meet the inner face of a ring from below.
 */
function timeToCylinderOutward(p: number, v: number, a: number, radius: number): number {
  if (a <= 0) return Infinity;
  const disc = p * p * v * v - a * (p * p - radius * radius);
  if (disc < 0) return Infinity;
  const t = (-p * v + Math.sqrt(disc)) / a;
  return t >= 0 ? t : Infinity;
}

/** First positive time at which r(t) falls to R from outside (p ≥ R), or Infinity when the path passes outside. */
function timeToCylinderFromOutside(p: number, v: number, a: number, radius: number): number {
  if (a <= 0 || v >= 0) return Infinity;
  const disc = p * p * v * v - a * (p * p - radius * radius);
  return disc < 0 ? Infinity : Math.max(0, (-p * v - Math.sqrt(disc)) / a);
}

/** Radius at time t of the 3D line from (r = p, 0) with radial speed v and azimuthal speed w. */
function radiusAt(p: number, v: number, w: number, t: number): number {
  const a = p + v * t;
  const b = w * t;
  return Math.sqrt(a * a + b * b);
}

/**
 * Flies particle i for time dt from its stored position through every surface it meets, with particle weight
 * `weight` for the wall and section sums. Leaves the new position and velocity in the state; the caller indexes it.
 * Returns FLIGHT_LEFT_DOMAIN when it left through a reservoir side (the caller removes it).
 */
export function flyParticle(st: SimState, i: number, dt: number, weight: number): number {
  const lx = st.lengthX;
  const ly = st.lengthY;
  const tab = st.sideTable;
  const blocks = st.blockTable;
  const nb = st.blockCount;
  const axi = st.axisymmetric;
  let px = st.x[i];
  let py = st.y[i];
  let remaining = dt;
  let left = false;
  for (let hits = 0; hits < MAX_HITS; hits++) {
    const vxi = st.vx[i];
    const vyi = st.vy[i];
    const vzi = st.vz[i];
    // Radial speed² of the 3D line (axisymmetric); unused in planar flights.
    const a = vyi * vyi + vzi * vzi;
    let tHit = remaining;
    let row = -1;
    if (vxi > 0) {
      const t = (lx - px) / vxi;
      if (t < tHit) {
        tHit = t;
        row = SIDE_RIGHT;
      }
    } else if (vxi < 0) {
      const t = -px / vxi;
      if (t < tHit) {
        tHit = t;
        row = SIDE_LEFT;
      }
    }
    if (axi) {
      // On (or, by rounding, just beyond) r = R and not moving inward: out through the outer side now. The root
      // below can round to a tiny negative time there (√(p²v²) < p·v), which read as "never", and a molecule that
      // had just reflected off a block face on r = R flew on outside the domain (issue 12, fuzz case 02).
      const t = py >= ly && vyi >= 0 && a > 0 ? 0 : timeToCylinderOutward(py, vyi, a, ly);
      if (t < tHit) {
        tHit = t;
        row = SIDE_TOP;
      }
    } else if (vyi > 0) {
      const t = (ly - py) / vyi;
      if (t < tHit) {
        tHit = t;
        row = SIDE_TOP;
      }
    } else if (vyi < 0) {
      const t = -py / vyi;
      if (t < tHit) {
        tHit = t;
        row = SIDE_BOTTOM;
      }
    }
    for (let b = 0; b < nb; b++) {
      const o = b * BLOCK_STRIDE;
      const x0 = blocks[o + BLOCK_X0];
      const x1 = blocks[o + BLOCK_X1];
      const y0 = blocks[o + BLOCK_Y0];
      const y1 = blocks[o + BLOCK_Y1];
      const base = DOMAIN_SIDES + 4 * b;
      if (vxi > 0 && px <= x0) {
        const t = (x0 - px) / vxi;
        if (t < tHit) {
          const yh = axi ? radiusAt(py, vyi, vzi, t) : py + vyi * t;
          if (yh >= y0 && yh <= y1) {
            tHit = t;
            row = base;
          }
        }
      } else if (vxi < 0 && px >= x1) {
        const t = (x1 - px) / vxi;
        if (t < tHit) {
          const yh = axi ? radiusAt(py, vyi, vzi, t) : py + vyi * t;
          if (yh >= y0 && yh <= y1) {
            tHit = t;
            row = base + 1;
          }
        }
      }
      // The bottom face: met from below. In axisymmetric domains a block on the axis (y0 = 0) has no such face, and a
      // molecule that starts above it may dip below and meet it on the way out.
      if (axi ? y0 > 0 : py <= y0 && vyi > 0) {
        const t = axi ? timeToCylinderOutward(py, vyi, a, y0) : (y0 - py) / vyi;
        if (t < tHit) {
          const xh = px + vxi * t;
          if (xh >= x0 && xh <= x1) {
            tHit = t;
            row = base + 2;
          }
        }
      }
      if (py >= y1 && (axi || vyi < 0)) {
        const t = axi ? timeToCylinderFromOutside(py, vyi, a, y1) : (y1 - py) / vyi;
        if (t < tHit) {
          const xh = px + vxi * t;
          if (xh >= x0 && xh <= x1) {
            tHit = t;
            row = base + 3;
          }
        }
      }
    }
    if (tHit < 0) tHit = 0;
    // Advance to the hit (or the end of the step), counting sections on the way, then turn into the new meridian.
    const nx = px + vxi * tHit;
    let ny: number;
    if (axi) {
      const yy = py + vyi * tHit;
      const zz = vzi * tHit;
      ny = Math.sqrt(yy * yy + zz * zz);
      if (ny > 0) {
        st.vy[i] = (vyi * yy + vzi * zz) / ny;
        st.vz[i] = (vzi * yy - vyi * zz) / ny;
      }
    } else {
      ny = py + vyi * tHit;
    }
    if (st.sectionCount > 0) countSections(st, px, py, nx, ny, vyi, vzi, tHit, weight);
    px = nx;
    py = ny;
    remaining -= tHit;
    if (row < 0) break;
    const r = row * SIDE_STRIDE;
    const along =
      row === SIDE_LEFT || row === SIDE_RIGHT || (row >= DOMAIN_SIDES && (row - DOMAIN_SIDES) % 4 < 2) ? py : px;
    // Snap onto the surface met.
    if (row < DOMAIN_SIDES) {
      if (row === SIDE_LEFT) px = 0;
      else if (row === SIDE_RIGHT) px = lx;
      else if (row === SIDE_BOTTOM) py = 0;
      else py = ly;
    } else {
      const o = ((row - DOMAIN_SIDES) >> 2) * BLOCK_STRIDE;
      const face = (row - DOMAIN_SIDES) & 3;
      if (face === 0) px = blocks[o + BLOCK_X0];
      else if (face === 1) px = blocks[o + BLOCK_X1];
      else if (face === 2) py = blocks[o + BLOCK_Y0];
      else py = blocks[o + BLOCK_Y1];
    }
    const type = tab[r + SIDE_TYPE];
    if (type === BOUNDARY_PERIODIC) {
      if (row === SIDE_LEFT) px = lx;
      else if (row === SIDE_RIGHT) px = 0;
      else if (row === SIDE_BOTTOM) py = ly;
      else py = 0;
    } else if (type === BOUNDARY_SPECULAR) {
      if (row === SIDE_LEFT || row === SIDE_RIGHT) st.vx[i] = -st.vx[i];
      else st.vy[i] = -st.vy[i];
    } else if (type === BOUNDARY_WALL) {
      reflectAtWall(st, i, row, along, weight);
    } else if (type === BOUNDARY_RESERVOIR || type === BOUNDARY_PRESSURE_OUTLET) {
      left = true;
      break;
    }
  }
  // Keep the particle inside [0, L): a particle resting exactly on the far side is moved onto the near one only for
  // periodic sides; on walls it stays on the side, and the key lookup clamps its cell.
  if (px >= lx && st.periodicX) px -= lx;
  if (py >= ly && st.periodicY) py -= ly;
  st.x[i] = px;
  st.y[i] = py;
  if (left) return FLIGHT_LEFT_DOMAIN;
  if (nb > 0 && insideAnyBlock(st, px, py)) st.leaks++;
  return FLIGHT_STAYS;
}

/** True when (x, y) is strictly inside a block: a particle there has leaked (counted in st.leaks, must not happen). */
export function insideAnyBlock(st: SimState, x: number, y: number): boolean {
  const blocks = st.blockTable;
  for (let b = 0; b < st.blockCount; b++) {
    const o = b * BLOCK_STRIDE;
    if (x > blocks[o + BLOCK_X0] && x < blocks[o + BLOCK_X1] && y > blocks[o + BLOCK_Y0] && y < blocks[o + BLOCK_Y1])
      return true;
  }
  return false;
}
