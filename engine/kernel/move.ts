/**
 * Free flight for one time step, boundary interactions, and the sub-cell key and occupancy count of every particle.
 *
 * Hot path. The main loop moves every particle in a straight line and only wraps periodic sides in x inline;
 * particles that end outside the domain otherwise are put on a short list and re-flown afterwards from their old
 * position with exact times of flight, so a particle may hit several sides in one step (corners, thin domains).
 * Counting occupancy inside the move loop saves the index step one pass (performance guide, item 4).
 */
import {
  type SimState,
  SIDE_STRIDE,
  SIDE_TYPE,
  SIDE_LEFT,
  SIDE_RIGHT,
  SIDE_BOTTOM,
  SIDE_TOP,
  BOUNDARY_PERIODIC,
  BOUNDARY_SPECULAR,
} from './state';
import { reflectAtWall } from './wallReflection';

/** Moves all particles by dt (s); fills st.key and st.keyCount. */
export function moveParticles(st: SimState, dt: number): void {
  const n = st.count;
  const x = st.x;
  const y = st.y;
  const vx = st.vx;
  const vy = st.vy;
  const key = st.key;
  const count = st.keyCount;
  const list = st.boundaryList;
  const columnKey = st.columnKey;
  const rowKey = st.rowKey;
  const perX = st.subcolumnsPerM;
  const perY = st.subrowsPerM;
  const lx = st.lengthX;
  const ly = st.lengthY;
  const periodicX = st.periodicX;
  // A float64 copy of the argument: used directly, V8 re-checks the parameter's representation every iteration.
  const h = dt * 1;
  count.fill(0);
  let listed = 0;
  for (let i = 0; i < n; i++) {
    let xi = x[i] + vx[i] * h;
    const yi = y[i] + vy[i] * h;
    if (yi < 0 || yi >= ly) {
      list[listed++] = i;
      continue;
    }
    if (xi < 0 || xi >= lx) {
      if (!periodicX) {
        list[listed++] = i;
        continue;
      }
      xi = xi < 0 ? xi + lx : xi - lx;
      if (xi >= lx || xi < 0) {
        list[listed++] = i; // crossed the periodic pair more than once: fly it exactly
        continue;
      }
    }
    x[i] = xi;
    y[i] = yi;
    // 0 <= xi < lx, so the truncation is a floor and at most lands on the tables' extra last entry.
    const k = (columnKey[(xi * perX) | 0] + rowKey[(yi * perY) | 0]) | 0;
    key[i] = k;
    count[k] = (count[k] + 1) | 0;
  }
  for (let k = 0; k < listed; k++) flyWithBoundaries(st, list[k], dt);
  st.particleSteps += n;
}

/** Sub-cell key of a position inside the domain (clamped so round-off on a side never leaves the grid). */
export function keyOf(st: SimState, xi: number, yi: number): number {
  let gx = Math.floor(xi * st.subcolumnsPerM);
  gx = gx < 0 ? 0 : gx >= st.columnKey.length ? st.columnKey.length - 1 : gx;
  let gy = Math.floor(yi * st.subrowsPerM);
  gy = gy < 0 ? 0 : gy >= st.rowKey.length ? st.rowKey.length - 1 : gy;
  return st.columnKey[gx] + st.rowKey[gy];
}

/**
 * Flies particle i for dt from its stored (pre-move) position, interacting with every side it reaches in time
 * order. Positions are snapped onto the side at each hit so round-off can never leak a particle out.
 */
function flyWithBoundaries(st: SimState, i: number, dt: number): void {
  const lx = st.lengthX;
  const ly = st.lengthY;
  const tab = st.sideTable;
  let px = st.x[i];
  let py = st.y[i];
  let remaining = dt;
  // A particle hits at most a handful of sides per step; the bound only guards against a zero-speed trap.
  for (let hits = 0; hits < 64; hits++) {
    const vxi = st.vx[i];
    const vyi = st.vy[i];
    let tHit = remaining;
    let side = -1;
    if (vxi > 0) {
      const t = (lx - px) / vxi;
      if (t < tHit) { tHit = t; side = SIDE_RIGHT; }
    } else if (vxi < 0) {
      const t = -px / vxi;
      if (t < tHit) { tHit = t; side = SIDE_LEFT; }
    }
    if (vyi > 0) {
      const t = (ly - py) / vyi;
      if (t < tHit) { tHit = t; side = SIDE_TOP; }
    } else if (vyi < 0) {
      const t = -py / vyi;
      if (t < tHit) { tHit = t; side = SIDE_BOTTOM; }
    }
    if (side < 0) {
      px += vxi * remaining;
      py += vyi * remaining;
      break;
    }
    if (tHit < 0) tHit = 0;
    px += vxi * tHit;
    py += vyi * tHit;
    remaining -= tHit;
    if (side === SIDE_LEFT) px = 0;
    else if (side === SIDE_RIGHT) px = lx;
    else if (side === SIDE_BOTTOM) py = 0;
    else py = ly;
    const type = tab[side * SIDE_STRIDE + SIDE_TYPE];
    if (type === BOUNDARY_PERIODIC) {
      if (side === SIDE_LEFT) px = lx;
      else if (side === SIDE_RIGHT) px = 0;
      else if (side === SIDE_BOTTOM) py = ly;
      else py = 0;
    } else if (type === BOUNDARY_SPECULAR) {
      if (side === SIDE_LEFT || side === SIDE_RIGHT) st.vx[i] = -vxi;
      else st.vy[i] = -vyi;
    } else {
      reflectAtWall(st, i, side, side === SIDE_LEFT || side === SIDE_RIGHT ? py : px);
    }
  }
  // Keep the particle inside [0, L): a particle resting exactly on the far side is moved onto the near one only for
  // periodic sides; on walls it stays on the side, and keyOf clamps its cell.
  if (px >= lx && st.periodicX) px -= lx;
  if (py >= ly && st.periodicY) py -= ly;
  st.x[i] = px;
  st.y[i] = py;
  const k = keyOf(st, px, py);
  st.key[i] = k;
  st.keyCount[k]++;
}
