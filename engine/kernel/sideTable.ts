/**
 * The side table: one row of SIDE_STRIDE numbers per surface (the domain's four sides, then four faces per block, in
 * plan.surfaces order), so the boundary code reads numbers, not objects; column meanings and codes are the SIDE_*,
 * BOUNDARY_* and WALL_* constants of kernel/layout.ts.
 *
 * Built from the plan alone (no particles), so sampled sums can be reduced to wall quantities without a live state
 * (kernel/samplingGeometry.ts).
 */
import type { Plan } from '../plan/plan';
import type { SurfacePlan } from '../geometry/surfaces';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import {
  SIDE_STRIDE,
  SIDE_TYPE,
  SIDE_MODEL,
  SIDE_TEMPERATURE,
  SIDE_UX,
  SIDE_UY,
  SIDE_UZ,
  SIDE_ACCOMMODATION,
  SIDE_TANGENTIAL_ENERGY_ACCOMMODATION,
  SIDE_BIN_OFFSET,
  SIDE_BIN_COUNT,
  SIDE_THERMAL_SPEED,
  SIDE_NORMAL_IS_X,
  SIDE_INWARD,
  SIDE_PLANE,
  SIDE_FROM,
  SIDE_TO,
  SIDE_NUMBER_DENSITY,
  SIDE_PRESSURE,
  BOUNDARY_PERIODIC,
  BOUNDARY_SPECULAR,
  BOUNDARY_WALL,
  BOUNDARY_RESERVOIR,
  BOUNDARY_AXIS,
  BOUNDARY_PRESSURE_OUTLET,
  WALL_DIFFUSE,
  WALL_SPECULAR,
  WALL_MAXWELL,
  WALL_CERCIGNANI_LAMPIS,
} from './layout';

function surfaceRow(plan: Plan, f: SurfacePlan, binOffset: number): number[] {
  const b = f.spec;
  const row = new Array<number>(SIDE_STRIDE).fill(0);
  row[SIDE_BIN_OFFSET] = binOffset;
  row[SIDE_BIN_COUNT] = f.bins;
  row[SIDE_NORMAL_IS_X] = f.normalIsX ? 1 : 0;
  row[SIDE_INWARD] = f.inward;
  row[SIDE_PLANE] = f.planeM;
  row[SIDE_FROM] = f.fromM;
  row[SIDE_TO] = f.toM;
  if (b.type === 'periodic') {
    row[SIDE_TYPE] = BOUNDARY_PERIODIC;
    return row;
  }
  if (b.type === 'symmetry') {
    row[SIDE_TYPE] = BOUNDARY_SPECULAR;
    return row;
  }
  if (b.type === 'axis') {
    row[SIDE_TYPE] = BOUNDARY_AXIS;
    return row;
  }
  if (b.type === 'pressureOutlet') {
    row[SIDE_TYPE] = BOUNDARY_PRESSURE_OUTLET;
    row[SIDE_PRESSURE] = b.pressurePa;
    return row;
  }
  row[SIDE_TEMPERATURE] = b.temperatureK;
  row[SIDE_UX] = b.velocityMPerS[0];
  row[SIDE_UY] = b.velocityMPerS[1];
  row[SIDE_UZ] = b.velocityMPerS[2];
  row[SIDE_THERMAL_SPEED] = Math.sqrt((K_B * b.temperatureK) / plan.gas.model.massKg);
  if (b.type === 'reservoir') {
    row[SIDE_TYPE] = BOUNDARY_RESERVOIR;
    row[SIDE_NUMBER_DENSITY] = b.pressurePa / (K_B * b.temperatureK);
    return row;
  }
  row[SIDE_TYPE] = BOUNDARY_WALL;
  row[SIDE_MODEL] = {
    diffuse: WALL_DIFFUSE,
    specular: WALL_SPECULAR,
    maxwell: WALL_MAXWELL,
    cercignaniLampis: WALL_CERCIGNANI_LAMPIS,
  }[b.model];
  if (b.model === 'maxwell') row[SIDE_ACCOMMODATION] = b.accommodation ?? 1;
  if (b.model === 'cercignaniLampis') {
    row[SIDE_ACCOMMODATION] = b.normalAccommodation ?? 1;
    const sigmaT = b.tangentialAccommodation ?? 1;
    row[SIDE_TANGENTIAL_ENERGY_ACCOMMODATION] = sigmaT * (2 - sigmaT);
  }
  return row;
}

/** The side table of a plan, and the number of wall bins over all surfaces (those of row k follow those of k − 1). */
export function buildSideTable(plan: Plan): { sideTable: Float64Array; wallBinTotal: number } {
  const table: number[] = [];
  let offset = 0;
  for (const f of plan.surfaces) {
    table.push(...surfaceRow(plan, f, offset));
    offset += f.bins;
  }
  return { sideTable: Float64Array.from(table), wallBinTotal: offset };
}

/**
 * Names of the surfaces that are walls, in row order: what `walls.NAME` in the results lists. A block face that lies
 * on the domain's boundary can never be reached by a molecule and is left out.
 */
export function wallNamesOf(plan: Plan): string[] {
  const { lengthXM: lx, lengthYM: ly } = plan.caseData.domain;
  const onBoundary = (f: SurfacePlan) => f.block >= 0 && (f.planeM === 0 || f.planeM === (f.normalIsX ? lx : ly));
  return plan.surfaces.filter((f) => f.spec.type === 'wall' && !onBoundary(f)).map((f) => f.name);
}
