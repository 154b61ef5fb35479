/**
 * Wall quantities from the per-bin momentum and energy sums booked by reflectAtWall.
 *
 * Sign conventions (SI, per unit area of the wall):
 * - shearStress: tangential force per area exerted by the gas on the wall, along +x for surfaces normal to y (bottom
 *   and top sides, block bottom and top faces) and along +y (axisymmetric: outward radial) for surfaces normal to x;
 * - normalStress: normal force per area pushing the wall outward (the gas pressure on it, positive);
 * - heatFlux: energy per area per time from the gas into the wall, in the wall's own frame;
 * - numberFlux: molecules striking the wall per area per time.
 */
import type { SamplingGeometry } from '../kernel/samplingGeometry';
import { surfaceAreaM2 } from '../geometry/surfaces';
import {
  SIDE_STRIDE,
  SIDE_BIN_OFFSET,
  SIDE_BIN_COUNT,
  SIDE_NORMAL_IS_X,
  SIDE_INWARD,
  SIDE_PLANE,
  SIDE_FROM,
  SIDE_TO,
  SUMS_PER_WALL_BIN,
  WALL_HITS,
  WALL_PX,
  WALL_PY,
  WALL_ENERGY,
} from '../kernel/layout';

export const WALL_QUANTITIES = ['shearStress', 'normalStress', 'heatFlux', 'numberFlux'] as const;
export type WallQuantityName = (typeof WALL_QUANTITIES)[number];
export const WALL_QUANTITY_UNITS: Record<WallQuantityName, string> = {
  shearStress: 'Pa',
  normalStress: 'Pa',
  heatFlux: 'W/m^2',
  numberFlux: '1/(m^2 s)',
};

/** Side-table row of a surface by name (−1 if there is none). */
export function sideIndex(g: SamplingGeometry, name: string): number {
  return g.surfaceNames.indexOf(name);
}

/** Length of a surface along itself (m). */
export function wallLengthM(g: SamplingGeometry, side: number): number {
  const row = side * SIDE_STRIDE;
  return g.sideTable[row + SIDE_TO] - g.sideTable[row + SIDE_FROM];
}

/**
 * Area (m²; per metre of depth when planar) of bin `bin` of `bins` equal bins along a surface, or of the whole
 * surface with bin = 0, bins = 1. Axisymmetric surfaces are rings or cylinders (geometry/surfaces.ts).
 */
export function wallBinAreaM2(g: SamplingGeometry, side: number, bin: number, bins: number): number {
  const row = side * SIDE_STRIDE;
  const from = g.sideTable[row + SIDE_FROM];
  const length = g.sideTable[row + SIDE_TO] - from;
  return surfaceAreaM2(
    g.sideTable[row + SIDE_NORMAL_IS_X] === 1,
    g.sideTable[row + SIDE_PLANE],
    from + (bin * length) / bins,
    from + ((bin + 1) * length) / bins,
    g.axisymmetric,
  );
}

/**
 * The four wall quantities from the 5 sums at sums[o…], gathered over an area (m², unit depth) and a time (s),
 * written into out[0..3] in WALL_QUANTITIES order.
 */
export function wallQuantitiesFromSums(
  g: SamplingGeometry,
  side: number,
  sums: Float64Array,
  o: number,
  areaM2: number,
  timeS: number,
  out: Float64Array,
): void {
  const scale = g.moleculesPerParticle / (areaM2 * timeS);
  const normalIsX = g.sideTable[side * SIDE_STRIDE + SIDE_NORMAL_IS_X] === 1;
  const inward = g.sideTable[side * SIDE_STRIDE + SIDE_INWARD];
  const pNormal = normalIsX ? sums[o + WALL_PX] : sums[o + WALL_PY];
  const pTangential = normalIsX ? sums[o + WALL_PY] : sums[o + WALL_PX];
  out[0] = pTangential * scale;
  out[1] = -inward * pNormal * scale;
  out[2] = sums[o + WALL_ENERGY] * scale;
  out[3] = sums[o + WALL_HITS] * scale;
}

const scratch = new Float64Array(4);
const scratchSums = new Float64Array(SUMS_PER_WALL_BIN);

/**
 * Whole-wall totals of one batch of `steps` steps, keyed `${wall}.${quantity}`. `sim.state` is any SamplingGeometry
 * (a live SimState is one).
 */
export function wallTotalsOfBatch(
  sim: { state: SamplingGeometry; wallNames: readonly string[] },
  sums: Float64Array,
  steps: number,
): [string, number][] {
  const st = sim.state;
  const out: [string, number][] = [];
  for (const name of sim.wallNames) {
    const side = sideIndex(st, name);
    const row = side * SIDE_STRIDE;
    const first = st.sideTable[row + SIDE_BIN_OFFSET];
    const bins = st.sideTable[row + SIDE_BIN_COUNT];
    scratchSums.fill(0);
    for (let b = 0; b < bins; b++) {
      const o = (first + b) * SUMS_PER_WALL_BIN;
      for (let k = 0; k < SUMS_PER_WALL_BIN; k++) scratchSums[k] += sums[o + k];
    }
    wallQuantitiesFromSums(st, side, scratchSums, 0, wallBinAreaM2(st, side, 0, 1), steps * st.timeStep, scratch);
    WALL_QUANTITIES.forEach((q, k) => out.push([`${name}.${q}`, scratch[k]]));
  }
  return out;
}
