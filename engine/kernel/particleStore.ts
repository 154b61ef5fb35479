/**
 * The particle arrays of a SimState: their allocation, appending a particle (growing the arrays by doubling), copying
 * one into another slot. Used by createState, the boundary pass (clones, inflow, removal) and checkpoints; not in
 * the move or collide loops, which touch the arrays directly.
 */
import type { SimState } from './state';

/** The six particle arrays the periodic reorder gathers into (SimState.spare). */
export function spareArrays(capacity: number) {
  return {
    x: new Float64Array(capacity),
    y: new Float64Array(capacity),
    vx: new Float64Array(capacity),
    vy: new Float64Array(capacity),
    vz: new Float64Array(capacity),
    erot: new Float64Array(capacity),
  };
}

/** The particle arrays of a new state: the six of spareArrays and the sub-cell keys. */
export function particleArrays(capacity: number) {
  return { ...spareArrays(capacity), key: new Int32Array(capacity) };
}

/** Copies particle `from` (position, velocity, rotational energy, sub-cell key) into slot `to`. */
export function copyParticle(st: SimState, from: number, to: number): void {
  st.x[to] = st.x[from];
  st.y[to] = st.y[from];
  st.vx[to] = st.vx[from];
  st.vy[to] = st.vy[from];
  st.vz[to] = st.vz[from];
  st.erot[to] = st.erot[from];
  st.key[to] = st.key[from];
}

/** Appends one particle slot (growing the arrays by doubling when full) and returns its index. */
export function addParticle(st: SimState): number {
  if (st.count === st.capacity) growParticles(st, st.capacity * 2);
  return st.count++;
}

/** Grows every per-particle array to `capacity`, keeping particles and the boundary pass's lists. */
export function growParticles(st: SimState, capacity: number): void {
  const grow = <T extends Float64Array | Int32Array>(a: T, make: (n: number) => T): T => {
    const b = make(capacity);
    b.set(a as never);
    return b;
  };
  const f64 = (n: number) => new Float64Array(n);
  const i32 = (n: number) => new Int32Array(n);
  st.x = grow(st.x, f64);
  st.y = grow(st.y, f64);
  st.vx = grow(st.vx, f64);
  st.vy = grow(st.vy, f64);
  st.vz = grow(st.vz, f64);
  st.erot = grow(st.erot, f64);
  st.key = grow(st.key, i32);
  st.spare = spareArrays(capacity);
  st.order = new Int32Array(capacity);
  // The lists may be in use when a clone or an inflow particle needs room: keep their contents.
  st.boundaryList = grow(st.boundaryList, i32);
  st.removeList = grow(st.removeList, i32);
  st.weightList = grow(st.weightList, i32);
  st.weightFromRow = grow(st.weightFromRow, i32);
  st.capacity = capacity;
}
