/**
 * The extremes of the states a case holds its gas at — initial fill, walls, reservoirs, block faces: the fastest
 * flow, the hottest surface and the densest state. They bound the cell size and time step the planner chooses.
 */
import type { Case } from '../case/schema';
import { SIDE_NAMES } from '../case/caseConstants';

/** Every wall and reservoir state of the case: sides and block faces. */
function boundaryStates(c: Case): { temperatureK: number; velocityMPerS: readonly number[] }[] {
  const out: { temperatureK: number; velocityMPerS: readonly number[] }[] = [];
  for (const side of SIDE_NAMES) {
    const b = c.boundaries[side];
    if (b.type === 'wall' || b.type === 'reservoir') out.push(b);
  }
  for (const k of c.blocks)
    for (const w of [k.wall, k.faces?.left, k.faces?.right, k.faces?.bottom, k.faces?.top]) if (w) out.push(w);
  return out;
}

export function fastestFlowSpeed(c: Case): number {
  let u = Math.hypot(...c.initial.velocityMPerS);
  for (const b of boundaryStates(c)) u = Math.max(u, Math.hypot(...b.velocityMPerS));
  return u;
}

export function hottestTemperature(c: Case): number {
  let t = c.initial.temperatureK;
  for (const b of boundaryStates(c)) t = Math.max(t, b.temperatureK);
  return t;
}

/** The densest state the gas is held at (initial fill or a reservoir): it sets the cell size and time step. */
export function densestState(c: Case): { pressurePa: number; temperatureK: number } {
  let best = { pressurePa: c.initial.pressurePa, temperatureK: c.initial.temperatureK };
  for (const side of SIDE_NAMES) {
    const b = c.boundaries[side];
    if (b.type === 'reservoir' && b.pressurePa / b.temperatureK > best.pressurePa / best.temperatureK) best = b;
  }
  return best;
}

/**
 * The highest number density (m⁻³) the gas can reach anywhere in the domain: the initial fill, every reservoir, and
 * every pressure outlet (at the coldest temperature of the case, the densest it can be held at). The particle
 * weight and the memory check are sized from it, so that a domain started nearly empty next to a full vessel cannot
 * flood memory as it fills (issue 12).
 */
export function highestNumberDensityPerM3(
  c: Case,
  boltzmannJPerK: number,
): { numberDensityPerM3: number; where: string } {
  let best = { numberDensityPerM3: c.initial.pressurePa / (boltzmannJPerK * c.initial.temperatureK), where: 'initial' };
  const coldest = coldestTemperature(c);
  for (const side of SIDE_NAMES) {
    const b = c.boundaries[side];
    const n =
      b.type === 'reservoir'
        ? b.pressurePa / (boltzmannJPerK * b.temperatureK)
        : b.type === 'pressureOutlet'
          ? b.pressurePa / (boltzmannJPerK * coldest)
          : 0;
    if (n > best.numberDensityPerM3) best = { numberDensityPerM3: n, where: `boundaries.${side}` };
  }
  return best;
}

function coldestTemperature(c: Case): number {
  let t = c.initial.temperatureK;
  for (const b of boundaryStates(c)) t = Math.min(t, b.temperatureK);
  return t;
}
