/**
 * Profiles of the analytic solutions are functions of position; this turns one into arrays for a plot or a CSV.
 */

export interface SampledProfile {
  /** Positions, m, evenly spaced from `from` to `to` inclusive. */
  readonly positionsM: Float64Array;
  /** The profile at each position, in the profile's unit (m/s, K …). */
  readonly values: Float64Array;
}

/**
 * Samples profile at points evenly spaced positions from fromM to toM (m, both ends included; points ≥ 2).
 */
export function sampleProfile(
  profile: (positionM: number) => number,
  fromM: number,
  toM: number,
  points: number,
): SampledProfile {
  if (!(Number.isInteger(points) && points >= 2)) {
    throw new Error(`profile points = ${points}: must be an integer ≥ 2`);
  }
  const positionsM = new Float64Array(points);
  const values = new Float64Array(points);
  for (let i = 0; i < points; i++) {
    // The last point is set exactly so the far wall is not missed by rounding.
    const x = i === points - 1 ? toM : fromM + ((toM - fromM) * i) / (points - 1);
    positionsM[i] = x;
    values[i] = profile(x);
  }
  return { positionsM, values };
}
