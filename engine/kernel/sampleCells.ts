/**
 * Per-cell raw moment sums, added every sampling step through the cell index with local accumulators (performance
 * guide, item 3). Everything a cell reports — density, velocity, temperatures, pressure tensor, heat flux — is a
 * function of these 15 sums (see results/cellFields.ts). advance() adds them inside the collision pass, cell by cell
 * (collideParticles with sample = true, which calls sampleCell); sampleCells is the same thing as a pass of its own.
 */
import type { SimState } from './state';
import {
  RAW_CELL_SUMS,
  SUM_N,
  SUM_VX,
  SUM_VY,
  SUM_VZ,
  SUM_VXX,
  SUM_VYY,
  SUM_VZZ,
  SUM_VXY,
  SUM_VXZ,
  SUM_VYZ,
  SUM_V2VX,
  SUM_V2VY,
  SUM_EROT,
  SUM_EROT_VX,
  SUM_EROT_VY,
} from './layout';

/** Adds one sampling step of every cell's sums to st.cellSums. Needs st.order and st.keyStart from indexParticles. */
export function sampleCells(st: SimState): void {
  const start = st.keyStart;
  const subcells = st.subcellsPerCell;
  const cells = st.cells;
  const rotational = st.rotationalDof > 0;
  for (let c = 0; c < cells; c++) {
    sampleCell(
      st.cellSums,
      c * RAW_CELL_SUMS,
      st.order,
      start[c * subcells],
      start[(c + 1) * subcells],
      st.vx,
      st.vy,
      st.vz,
      st.erot,
      rotational,
      st.cellWeights[c],
    );
  }
  st.cellSumSteps++;
}

/**
 * Adds the sums of the particles order[first..last) (one cell), times the cell's particle weight w (1 in planar
 * domains), to sums[o..o+15), accumulating in locals and writing once per cell. Weighted sums make a group of cells
 * of different weights (an axisymmetric profile) add up to the right molecule counts and averages. Without rotational modes every erot is 0 (created 0, re-emitted 0 by walls, never touched by
 * collisions), so the three rotational sums would only add zeros: that loop leaves them out, which spares a
 * load and three accumulators per particle (about 2 ns per particle-step measured).
 */
export function sampleCell(
  sums: Float64Array,
  o: number,
  order: Int32Array,
  first: number,
  last: number,
  vxA: Float64Array,
  vyA: Float64Array,
  vzA: Float64Array,
  eA: Float64Array,
  rotational: boolean,
  w: number,
): void {
  if (first === last) return;
  let sx = 0,
    sy = 0,
    sz = 0,
    sxx = 0,
    syy = 0,
    szz = 0,
    sxy = 0,
    sxz = 0,
    syz = 0,
    s2x = 0,
    s2y = 0;
  let se = 0,
    sex = 0,
    sey = 0;
  if (rotational) {
    for (let k = first; k < last; k++) {
      const i = order[k];
      const vx = vxA[i],
        vy = vyA[i],
        vz = vzA[i],
        e = eA[i];
      const xx = vx * vx,
        yy = vy * vy,
        zz = vz * vz,
        v2 = xx + yy + zz;
      sx += vx;
      sy += vy;
      sz += vz;
      sxx += xx;
      syy += yy;
      szz += zz;
      sxy += vx * vy;
      sxz += vx * vz;
      syz += vy * vz;
      s2x += v2 * vx;
      s2y += v2 * vy;
      se += e;
      sex += e * vx;
      sey += e * vy;
    }
    sums[o + SUM_EROT] += w * se;
    sums[o + SUM_EROT_VX] += w * sex;
    sums[o + SUM_EROT_VY] += w * sey;
  } else {
    for (let k = first; k < last; k++) {
      const i = order[k];
      const vx = vxA[i],
        vy = vyA[i],
        vz = vzA[i];
      const xx = vx * vx,
        yy = vy * vy,
        zz = vz * vz,
        v2 = xx + yy + zz;
      sx += vx;
      sy += vy;
      sz += vz;
      sxx += xx;
      syy += yy;
      szz += zz;
      sxy += vx * vy;
      sxz += vx * vz;
      syz += vy * vz;
      s2x += v2 * vx;
      s2y += v2 * vy;
    }
  }
  sums[o + SUM_N] += w * (last - first);
  sums[o + SUM_VX] += w * sx;
  sums[o + SUM_VY] += w * sy;
  sums[o + SUM_VZ] += w * sz;
  sums[o + SUM_VXX] += w * sxx;
  sums[o + SUM_VYY] += w * syy;
  sums[o + SUM_VZZ] += w * szz;
  sums[o + SUM_VXY] += w * sxy;
  sums[o + SUM_VXZ] += w * sxz;
  sums[o + SUM_VYZ] += w * syz;
  sums[o + SUM_V2VX] += w * s2x;
  sums[o + SUM_V2VY] += w * s2y;
}
