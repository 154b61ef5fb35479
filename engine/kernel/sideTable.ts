/**
 * The side table: one row of SIDE_STRIDE numbers per side (left, right, bottom, top, in SIDE_NAMES order), so the
 * boundary code reads numbers, not objects; column meanings are the SIDE_* constants in state.ts.
 *
 * Built from the plan alone (no particles), so sampled sums can be reduced to wall quantities without a live state
 * (results/samplingGeometry.ts). state.ts imports this module and this one reads state.ts's constants: the cycle is
 * harmless because neither uses the other's bindings while it loads, only when a function is called.
 */
import type { Plan } from '../case/plan';
import { SIDE_NAMES } from '../case/schema';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import {
  SIDE_STRIDE, SIDE_TYPE, SIDE_MODEL, SIDE_TEMPERATURE, SIDE_UX, SIDE_UY, SIDE_UZ, SIDE_ACCOMMODATION,
  SIDE_TANGENTIAL_ENERGY_ACCOMMODATION, SIDE_BIN_OFFSET, SIDE_BIN_COUNT, SIDE_THERMAL_SPEED,
  BOUNDARY_PERIODIC, BOUNDARY_SPECULAR, BOUNDARY_WALL, WALL_DIFFUSE, WALL_SPECULAR, WALL_MAXWELL, WALL_CERCIGNANI_LAMPIS,
} from './state';

function sideRow(plan: Plan, side: (typeof SIDE_NAMES)[number], binOffset: number, bins: number): number[] {
  const b = plan.boundaries[side];
  const row = new Array<number>(SIDE_STRIDE).fill(0);
  row[SIDE_BIN_OFFSET] = binOffset;
  row[SIDE_BIN_COUNT] = bins;
  if (b.type === 'periodic') {
    row[SIDE_TYPE] = BOUNDARY_PERIODIC;
    return row;
  }
  if (b.type === 'symmetry') {
    row[SIDE_TYPE] = BOUNDARY_SPECULAR;
    return row;
  }
  row[SIDE_TYPE] = BOUNDARY_WALL;
  row[SIDE_MODEL] = { diffuse: WALL_DIFFUSE, specular: WALL_SPECULAR, maxwell: WALL_MAXWELL, cercignaniLampis: WALL_CERCIGNANI_LAMPIS }[b.model];
  row[SIDE_TEMPERATURE] = b.temperatureK;
  row[SIDE_UX] = b.velocityMPerS[0];
  row[SIDE_UY] = b.velocityMPerS[1];
  row[SIDE_UZ] = b.velocityMPerS[2];
  if (b.model === 'maxwell') row[SIDE_ACCOMMODATION] = b.accommodation ?? 1;
  if (b.model === 'cercignaniLampis') {
    row[SIDE_ACCOMMODATION] = b.normalAccommodation ?? 1;
    const sigmaT = b.tangentialAccommodation ?? 1;
    row[SIDE_TANGENTIAL_ENERGY_ACCOMMODATION] = sigmaT * (2 - sigmaT);
  }
  row[SIDE_THERMAL_SPEED] = Math.sqrt((K_B * b.temperatureK) / plan.gas.model.massKg);
  return row;
}

/** The side table of a plan, and the number of wall bins over all sides (the bins of side k follow those of k − 1). */
export function buildSideTable(plan: Plan): { sideTable: Float64Array; wallBinTotal: number } {
  const table: number[] = [];
  let offset = 0;
  for (const side of SIDE_NAMES) {
    const bins = plan.wallBins[side];
    table.push(...sideRow(plan, side, offset, bins));
    offset += bins;
  }
  return { sideTable: Float64Array.from(table), wallBinTotal: offset };
}
