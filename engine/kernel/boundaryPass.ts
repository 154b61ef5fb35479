/**
 * The rest of the move after the main loop: exact flights of the listed particles, radial weighting of those that
 * changed row, this step's reservoir molecules, and the removal of every particle that left or was deleted.
 * Removal swaps the last particle into each freed slot, in descending slot order, so no slot is visited twice.
 */
import type { SimState } from './state';
import { flyAndSettle, reweight, rowOf } from './settle';
import { injectReservoirMolecules } from './inflow';
import { copyParticle } from './particleStore';

/** The boundary pass after moveFreely: `listed` is the number of particles it put on st.boundaryList. */
export function boundaryPass(st: SimState, dt: number, listed: number): void {
  const halfKick = 0.5 * st.bodyAccelerationX * dt;
  const list = st.boundaryList;
  for (let k = 0; k < listed; k++) flyAndSettle(st, list[k], dt, halfKick);
  if (st.weightCount > 0) {
    // Particles of the main loop that changed row: already indexed.
    for (let k = 0; k < st.weightCount; k++) {
      const i = st.weightList[k];
      reweight(st, i, st.weightFromRow[k], rowOf(st, st.y[i]), true);
    }
    st.weightCount = 0;
  }
  if (st.inflowRemainder.length > 0) injectReservoirMolecules(st, dt);
  if (st.removeCount > 0) removeParticles(st);
}

function removeParticles(st: SimState): void {
  const doomed = st.removeList.subarray(0, st.removeCount).sort();
  for (let k = doomed.length - 1; k >= 0; k--) {
    const i = doomed[k];
    const last = st.count - 1;
    if (i !== last) copyParticle(st, last, i);
    st.count--;
  }
  st.removeCount = 0;
}
