/**
 * VSS deflection of a colliding pair's relative velocity, called by the collision loop (kernel/collide.ts) only for
 * VSS gases; isotropic scattering is written out in the loop itself. Writes into a shared three-number buffer so a
 * call allocates nothing.
 */

/** Output of deflectVss (three numbers without an allocation). */
export const DEFLECTED = new Float64Array(3);

/**
 * VSS deflection: writes to out the new relative velocity (m/s), of magnitude crNew (differs from |c_r| = crOld
 * after a Larsen–Borgnakke exchange), turned from the old direction (crx, cry, crz) by the deflection angle χ at
 * azimuth eps (rad) (Bird 1994 eq. 2.22).
 */
export function deflectVss(
  out: Float64Array,
  crx: number,
  cry: number,
  crz: number,
  crOld: number,
  crNew: number,
  cosChi: number,
  eps: number,
): void {
  const sinChi = Math.sqrt(1 - cosChi * cosChi);
  const cosEps = Math.cos(eps);
  const sinEps = Math.sin(eps);
  // Scale the old relative velocity to the new speed first, then turn it.
  const scale = crOld > 0 ? crNew / crOld : 0;
  const ax = crx * scale;
  const ay = cry * scale;
  const az = crz * scale;
  const perp = Math.sqrt(ay * ay + az * az);
  if (perp > 1e-12 * crNew) {
    out[0] = cosChi * ax + sinChi * sinEps * perp;
    out[1] = cosChi * ay + (sinChi * (crNew * az * cosEps - ax * ay * sinEps)) / perp;
    out[2] = cosChi * az - (sinChi * (crNew * ay * cosEps + ax * az * sinEps)) / perp;
  } else {
    // Relative velocity along x: any perpendicular basis will do.
    out[0] = cosChi * ax;
    out[1] = crNew * sinChi * cosEps;
    out[2] = crNew * sinChi * sinEps;
  }
}
