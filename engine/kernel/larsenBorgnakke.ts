/**
 * Larsen–Borgnakke exchange of rotational and translational energy (Borgnakke & Larsen 1975, J. Comput. Phys. 18:405;
 * Bird 1994, §5.3), called by the collision loop (kernel/collide.ts) for gases with rotational modes. Rare enough
 * per collision (probability 1/Z_rot per partner) that it draws through rng.ts rather than an inlined generator.
 */
import { uniform, betaDeviate } from '../particles/rng';

/**
 * Larsen–Borgnakke exchange for a colliding pair: each partner, with probability 1/Z_rot, pools its rotational
 * energy with the relative translational energy etr (J) and keeps the Beta(5/2 − ω, ζ/2) share in translation.
 * Returns the new relative speed (m/s), or −1 when neither partner relaxed. Draws from rng.
 */
export function relaxRotation(
  rng: Uint32Array,
  erot: Float64Array,
  i: number,
  j: number,
  etr: number,
  quarterMass: number,
  relaxProbability: number,
  lbTranslational: number,
  lbRotational: number,
): number {
  let changed = false;
  if (uniform(rng) < relaxProbability) {
    const pool = etr + erot[i];
    etr = pool * betaDeviate(rng, lbTranslational, lbRotational);
    erot[i] = pool - etr;
    changed = true;
  }
  if (uniform(rng) < relaxProbability) {
    const pool = etr + erot[j];
    etr = pool * betaDeviate(rng, lbTranslational, lbRotational);
    erot[j] = pool - etr;
    changed = true;
  }
  return changed ? Math.sqrt(etr / quarterMass) : -1;
}
