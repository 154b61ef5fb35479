/**
 * Free flight for one time step, boundary interactions, and the sub-cell key and occupancy count of every particle.
 *
 * Hot path. The main loop moves every particle in a straight line and only wraps periodic sides in x inline;
 * particles that end outside the domain, end in a cell next to a block, or move more than a cell (they could jump a
 * thin block) are put on a short list and flown exactly afterwards (kernel/flight.ts), so a particle may hit several
 * surfaces in one step. Counting occupancy inside the move loop saves the index step one pass (performance guide,
 * item 4). After the loop, kernel/boundaryPass.ts flies the listed particles, applies radial weighting, lets
 * reservoir molecules in and removes the particles that left: advance() calls the two as phases of their own
 * (moveFreely, then boundaryPass); moveParticles is both, for callers that move without the rest of a step.
 *
 * A body acceleration a along x is applied as two half kicks around the drift (v += a Δt/2; x += v Δt; v += a Δt/2),
 * second-order accurate in free flight; a wall met during the flight sees the velocity after the first half kick,
 * an error of order a Δt, far below thermal speeds in the linear regime where force-driven flow is used.
 */
import type { SimState } from './state';
import { boundaryPass } from './boundaryPass';

/** Moves all particles by dt (s), boundaries included; fills st.key and st.keyCount. */
export function moveParticles(st: SimState, dt: number): void {
  kickAlongZ(st, dt);
  boundaryPass(st, dt, moveFreely(st, dt));
  kickAlongZ(st, dt);
}

/**
 * Half of a step's kick of the body acceleration along z (out of the plane), given before and after the move. No
 * position depends on v_z, so the two halves are exact in free flight; a molecule a wall re-emits during the step
 * loses the first half to the wall and gets the second, on average the a·(Δt − t_hit) it should have (t_hit uniform
 * over the step), so the mean flow is unbiased.
 */
export function kickAlongZ(st: SimState, dt: number): void {
  const dv = 0.5 * st.bodyAccelerationZ * dt;
  if (dv === 0) return;
  const vz = st.vz;
  for (let i = 0, n = st.count; i < n; i++) vz[i] += dv;
}

/**
 * The move loop: straight flights of every particle by dt (s), keys and counts of those that stayed clear of every
 * surface. Returns the number of particles put on st.boundaryList for the boundary pass.
 */
export function moveFreely(st: SimState, dt: number): number {
  st.keyCount.fill(0);
  const listed = st.axisymmetric ? moveAxisymmetric(st, dt) : movePlanar(st, dt);
  st.particleSteps += st.count;
  return listed;
}

/** Planar main loop; returns the number of particles put on st.boundaryList. */
function movePlanar(st: SimState, dt: number): number {
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
  const near = st.nearSolid;
  const solids = st.blockCount > 0;
  const cx = st.cellSizeX;
  const cy = st.cellSizeY;
  const sec = st.sectionTable;
  // Sections are counted only while sampling (their sums belong to the open batch).
  const sections = st.sampling ? st.sectionCount : 0;
  const sectionSums = st.sectionSums;
  const periodicX = st.periodicX;
  // A float64 copy of the argument: used directly, V8 re-checks the parameter's representation every iteration.
  const h = dt * 1;
  const halfKick = 0.5 * st.bodyAccelerationX * dt;
  let listed = 0;
  for (let i = 0; i < n; i++) {
    const u = vx[i] + halfKick;
    const xo = x[i];
    const yo = y[i];
    const dx = u * h;
    const dy = vy[i] * h;
    let xi = xo + dx;
    const yi = yo + dy;
    if (yi < 0 || yi >= ly) {
      vx[i] = u;
      list[listed++] = i;
      continue;
    }
    // The shift a periodic wrap adds to x (0 without one).
    let shift = 0;
    if (xi < 0 || xi >= lx) {
      if (!periodicX) {
        vx[i] = u;
        list[listed++] = i;
        continue;
      }
      shift = xi < 0 ? lx : -lx;
      xi += shift;
      if (xi >= lx || xi < 0) {
        vx[i] = u;
        list[listed++] = i; // crossed the periodic pair more than once: fly it exactly
        continue;
      }
    }
    // 0 <= xi < lx, so the truncation is a floor and at most lands on the tables' extra last entry.
    const k = (columnKey[(xi * perX) | 0] + rowKey[(yi * perY) | 0]) | 0;
    if (solids && (near[k] === 1 || Math.abs(dx) > cx || Math.abs(dy) > cy)) {
      vx[i] = u;
      list[listed++] = i;
      continue;
    }
    // Crossings of the unwrapped path xo → xo + dx: of each section, and after a wrap of its periodic image.
    for (let s = 0; s < sections; s++) {
      for (let image = 0; image < (shift === 0 ? 1 : 2); image++) {
        const xs = sec[3 * s] - image * shift;
        if (xo < xs !== xo + dx < xs) {
          const yc = yo + (dy * (xs - xo)) / dx;
          if (yc >= sec[3 * s + 1] && yc <= sec[3 * s + 2]) sectionSums[s] += dx > 0 ? 1 : -1;
        }
      }
    }
    x[i] = xi;
    y[i] = yi;
    vx[i] = u + halfKick;
    key[i] = k;
    count[k] = (count[k] + 1) | 0;
  }
  return listed;
}

/**
 * Axisymmetric main loop: x is the axis and y the radius r ≥ 0. Each particle flies in 3D from (x, r, 0); the new
 * radius is |(r + v_r Δt, v_θ Δt)| and the velocity is turned into the meridional plane through the new position
 * (Bird 1994, §15.1). A particle that changes row is listed for radial weighting (boundaryPass.ts). Since r² is convex
 * along the line, a flight that starts and ends inside r < R stays inside.
 */
function moveAxisymmetric(st: SimState, dt: number): number {
  const n = st.count;
  const x = st.x;
  const y = st.y;
  const vx = st.vx;
  const vy = st.vy;
  const vz = st.vz;
  const key = st.key;
  const count = st.keyCount;
  const list = st.boundaryList;
  const weightList = st.weightList;
  const weightFrom = st.weightFromRow;
  const rowWeight = st.rowWeight;
  const columnKey = st.columnKey;
  const rowKey = st.rowKey;
  const perX = st.subcolumnsPerM;
  const perY = st.subrowsPerM;
  const rowsPerM = st.cellsY / st.lengthY;
  const lastRow = st.cellsY - 1;
  const lx = st.lengthX;
  const ly2 = st.lengthY * st.lengthY;
  const near = st.nearSolid;
  const solids = st.blockCount > 0;
  const cx = st.cellSizeX;
  const cy2 = st.cellSizeY * st.cellSizeY;
  const sec = st.sectionTable;
  const sections = st.sampling ? st.sectionCount : 0;
  const sectionSums = st.sectionSums;
  const periodicX = st.periodicX;
  const h = dt * 1;
  const halfKick = 0.5 * st.bodyAccelerationX * dt;
  let listed = 0;
  let reweighted = st.weightCount;
  for (let i = 0; i < n; i++) {
    const u = vx[i] + halfKick;
    const v = vy[i];
    const w = vz[i];
    const xo = x[i];
    const ro = y[i];
    const dx = u * h;
    let xi = xo + dx;
    const yy = ro + v * h;
    const zz = w * h;
    const r2 = yy * yy + zz * zz;
    if (r2 >= ly2) {
      vx[i] = u;
      list[listed++] = i;
      continue;
    }
    let shift = 0;
    if (xi < 0 || xi >= lx) {
      if (!periodicX) {
        vx[i] = u;
        list[listed++] = i;
        continue;
      }
      shift = xi < 0 ? lx : -lx;
      xi += shift;
      if (xi >= lx || xi < 0) {
        vx[i] = u;
        list[listed++] = i;
        continue;
      }
    }
    const r = Math.sqrt(r2);
    const k = (columnKey[(xi * perX) | 0] + rowKey[(r * perY) | 0]) | 0;
    if (solids && (near[k] === 1 || Math.abs(dx) > cx || (v * v + w * w) * h * h > cy2)) {
      vx[i] = u;
      list[listed++] = i;
      continue;
    }
    let rowOld = (ro * rowsPerM) | 0;
    if (rowOld > lastRow) rowOld = lastRow;
    for (let s = 0; s < sections; s++) {
      for (let image = 0; image < (shift === 0 ? 1 : 2); image++) {
        const xs = sec[3 * s] - image * shift;
        if (xo < xs !== xo + dx < xs) {
          const tc = (h * (xs - xo)) / dx;
          const a = ro + v * tc;
          const b = w * tc;
          const rc = Math.sqrt(a * a + b * b);
          if (rc >= sec[3 * s + 1] && rc <= sec[3 * s + 2])
            sectionSums[s] += dx > 0 ? rowWeight[rowOld] : -rowWeight[rowOld];
        }
      }
    }
    if (r > 0) {
      vy[i] = (v * yy + w * zz) / r;
      vz[i] = (w * yy - v * zz) / r;
    }
    x[i] = xi;
    y[i] = r;
    vx[i] = u + halfKick;
    key[i] = k;
    count[k] = (count[k] + 1) | 0;
    let rowNew = (r * rowsPerM) | 0;
    if (rowNew > lastRow) rowNew = lastRow;
    if (rowNew !== rowOld) {
      weightList[reweighted] = i;
      weightFrom[reweighted] = rowOld;
      reweighted++;
    }
  }
  st.weightCount = reweighted;
  return listed;
}
