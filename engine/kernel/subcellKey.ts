/**
 * The sub-cell key of a position, for the rare paths (exact flights, inflow) that cannot use the move loop's inline
 * form of it. A module of its own so that the move loop and the boundary pass, which both need a key, do not have
 * to import each other.
 */
import type { SimState } from './state';

/** Sub-cell key of a position inside the domain (clamped so round-off on a side never leaves the grid). */
export function keyOf(st: SimState, xi: number, yi: number): number {
  let gx = Math.floor(xi * st.subcolumnsPerM);
  gx = gx < 0 ? 0 : gx >= st.columnKey.length ? st.columnKey.length - 1 : gx;
  let gy = Math.floor(yi * st.subrowsPerM);
  gy = gy < 0 ? 0 : gy >= st.rowKey.length ? st.rowKey.length - 1 : gy;
  return st.columnKey[gx] + st.rowKey[gy];
}
