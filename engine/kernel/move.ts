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
  const lx = st.lengthX;
  const ly = st.lengthY;
  const periodicX = st.periodicX;
  const nx = st.cellsX;
  const ny = st.cellsY;
  const s = st.subcellsPerSide;
  const subcells = st.subcellsPerCell;
  const invDx = nx / lx;
  const invDy = ny / ly;
  const dx = lx / nx;
  const dy = ly / ny;
  const invSubDx = (nx * s) / lx;
  const invSubDy = (ny * s) / ly;
  count.fill(0);
  let listed = 0;
  for (let i = 0; i < n; i++) {
    let xi = x[i] + vx[i] * dt;
    const yi = y[i] + vy[i] * dt;
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
    let ix = (xi * invDx) | 0;
    if (ix >= nx) ix = nx - 1;
    let iy = (yi * invDy) | 0;
    if (iy >= ny) iy = ny - 1;
    let sx = ((xi - ix * dx) * invSubDx) | 0;
    if (sx >= s) sx = s - 1;
    else if (sx < 0) sx = 0;
    let sy = ((yi - iy * dy) * invSubDy) | 0;
    if (sy >= s) sy = s - 1;
    else if (sy < 0) sy = 0;
    const k = (iy * nx + ix) * subcells + sy * s + sx;
    key[i] = k;
    count[k]++;
  }
  for (let k = 0; k < listed; k++) flyWithBoundaries(st, list[k], dt);
  st.particleSteps += n;
}

/** Sub-cell key of a position inside the domain (clamped so round-off on a side never leaves the grid). */
export function keyOf(st: SimState, xi: number, yi: number): number {
  const nx = st.cellsX;
  const ny = st.cellsY;
  const s = st.subcellsPerSide;
  let ix = Math.floor((xi * nx) / st.lengthX);
  ix = ix < 0 ? 0 : ix >= nx ? nx - 1 : ix;
  let iy = Math.floor((yi * ny) / st.lengthY);
  iy = iy < 0 ? 0 : iy >= ny ? ny - 1 : iy;
  let sx = Math.floor(((xi - (ix * st.lengthX) / nx) * nx * s) / st.lengthX);
  sx = sx < 0 ? 0 : sx >= s ? s - 1 : sx;
  let sy = Math.floor(((yi - (iy * st.lengthY) / ny) * ny * s) / st.lengthY);
  sy = sy < 0 ? 0 : sy >= s ? s - 1 : sy;
  return (iy * nx + ix) * st.subcellsPerCell + sy * s + sx;
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
