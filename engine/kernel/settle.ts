/**
 * What happens to a particle after an exact flight: removal when it left through a reservoir, radial weighting when
 * it changed row in an axisymmetric domain, and its sub-cell key and count for the index step. Rare work (a few per
 * cent of particles per step), so it may call helpers.
 */
import type { SimState } from './state';
import { flyParticle, FLIGHT_LEFT_DOMAIN } from './flight';
import { keyOf } from './subcellKey';
import { addParticle, copyParticle } from './particleStore';

/** Row of the cell holding radius/height y (clamped onto the grid). */
export function rowOf(st: SimState, y: number): number {
  const row = Math.floor((y * st.cellsY) / st.lengthY);
  return row < 0 ? 0 : row >= st.cellsY ? st.cellsY - 1 : row;
}

function index(st: SimState, i: number): void {
  const k = keyOf(st, st.x[i], st.y[i]);
  st.key[i] = k;
  st.keyCount[k]++;
}

/**
 * Radial weighting (Bird 1994, §15.2): a particle moving from a row of weight w_from to one of weight w_to stands for
 * r = w_from / w_to particles there. Bird draws the number kept at random (deleted with probability 1 − r, or
 * floor(r − 1 + U) clones); in a closed domain that makes the real mass a random walk — a closed tube lost 12 % of its
 * gas in 800 steps in our tests. Here each row carries the fraction not yet made whole (error diffusion): the copies
 * kept are floor(carry + r), and the rest stays in the row's carry, so the real mass of every row is kept to within one
 * particle and no drift can build up. Which particle is kept or deleted does not depend on its velocity, so the
 * velocity distribution is not biased. `indexed` says whether particle i is already counted in the index (then its
 * deletion un-counts it and clones are counted).
 */
export function reweight(st: SimState, i: number, fromRow: number, toRow: number, indexed: boolean): void {
  const carry = st.weightCarry[toRow] + st.rowWeight[fromRow] / st.rowWeight[toRow];
  const kept = Math.floor(carry);
  st.weightCarry[toRow] = carry - kept;
  if (kept === 0) {
    if (indexed) st.keyCount[st.key[i]]--;
    st.removeList[st.removeCount++] = i;
    return;
  }
  for (let c = 1; c < kept; c++) {
    const j = addParticle(st);
    copyParticle(st, i, j);
    if (indexed) st.keyCount[st.key[j]]++;
  }
}

/**
 * Flies particle i exactly for time t (kernel/flight.ts), gives it the second half kick of a body acceleration,
 * then removes, reweights and indexes it as needed. The particle weight is that of the row it starts in.
 */
export function flyAndSettle(st: SimState, i: number, t: number, halfKick: number): void {
  const fromRow = st.axisymmetric ? rowOf(st, st.y[i]) : 0;
  const gone = flyParticle(st, i, t, st.rowWeight[fromRow]) === FLIGHT_LEFT_DOMAIN;
  if (gone) {
    st.removeList[st.removeCount++] = i;
    return;
  }
  st.vx[i] += halfKick;
  if (st.axisymmetric) {
    const toRow = rowOf(st, st.y[i]);
    if (toRow !== fromRow) {
      const removed = st.removeCount;
      const first = st.count;
      reweight(st, i, fromRow, toRow, false);
      if (st.removeCount > removed) return;
      for (let j = first; j < st.count; j++) index(st, j);
    }
  }
  index(st, i);
}
