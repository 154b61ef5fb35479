/**
 * Per-cell raw moment sums, added every sampling step through the cell index with local accumulators (performance
 * guide, item 3). Everything a cell reports — density, velocity, temperatures, pressure tensor, heat flux — is a
 * function of these 15 sums (see results/cellFields.ts).
 */
import { type SimState, RAW_CELL_SUMS } from './state';

export const SUM_N = 0;
export const SUM_VX = 1;
export const SUM_VY = 2;
export const SUM_VZ = 3;
export const SUM_VXX = 4;
export const SUM_VYY = 5;
export const SUM_VZZ = 6;
export const SUM_VXY = 7;
export const SUM_VXZ = 8;
export const SUM_VYZ = 9;
/** Σ |v|² v_x and Σ |v|² v_y: translational energy flux moments. */
export const SUM_V2VX = 10;
export const SUM_V2VY = 11;
export const SUM_EROT = 12;
export const SUM_EROT_VX = 13;
export const SUM_EROT_VY = 14;

export function sampleCells(st: SimState): void {
  const order = st.order;
  const start = st.keyStart;
  const vxA = st.vx;
  const vyA = st.vy;
  const vzA = st.vz;
  const eA = st.erot;
  const sums = st.cellSums;
  const subcells = st.subcellsPerCell;
  const cells = st.cells;
  for (let c = 0; c < cells; c++) {
    const first = start[c * subcells];
    const last = start[(c + 1) * subcells];
    if (first === last) continue;
    let sx = 0, sy = 0, sz = 0, sxx = 0, syy = 0, szz = 0, sxy = 0, sxz = 0, syz = 0;
    let s2x = 0, s2y = 0, se = 0, sex = 0, sey = 0;
    for (let k = first; k < last; k++) {
      const i = order[k];
      const vx = vxA[i];
      const vy = vyA[i];
      const vz = vzA[i];
      const e = eA[i];
      const xx = vx * vx;
      const yy = vy * vy;
      const zz = vz * vz;
      const v2 = xx + yy + zz;
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
    const o = c * RAW_CELL_SUMS;
    sums[o] += last - first;
    sums[o + 1] += sx;
    sums[o + 2] += sy;
    sums[o + 3] += sz;
    sums[o + 4] += sxx;
    sums[o + 5] += syy;
    sums[o + 6] += szz;
    sums[o + 7] += sxy;
    sums[o + 8] += sxz;
    sums[o + 9] += syz;
    sums[o + 10] += s2x;
    sums[o + 11] += s2y;
    sums[o + 12] += se;
    sums[o + 13] += sex;
    sums[o + 14] += sey;
  }
  st.cellSumSteps++;
}
