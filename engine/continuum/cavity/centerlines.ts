/**
 * Centreline profiles of the cavity and their extrema, the quantities published for the lid-driven cavity
 * (Ghia, Ghia & Shin 1982, J. Comput. Phys. 48:387, Tables I and II): u along the vertical centreline x = 1/2 and
 * v along the horizontal centreline y = 1/2. Positions in cavity sides, velocities in lid speeds.
 */

/** An extremum of a centreline profile: its value (lid speeds) and where it lies along the line (sides). */
export interface Extremum {
  readonly value: number;
  readonly position: number;
}

export interface CavityCenterlines {
  /** grid positions along either centreline, j·h for j = 0 … n − 1 (sides) */
  readonly position: Float64Array;
  /** u(x = 1/2, y = position[j]) (lid speeds) */
  readonly u: Float64Array;
  /** v(x = position[i], y = 1/2) (lid speeds) */
  readonly v: Float64Array;
  /** the most negative u on x = 1/2 and its height y */
  readonly uMin: { readonly value: number; readonly y: number };
  /** the largest and the most negative v on y = 1/2 and their abscissae x */
  readonly vMax: { readonly value: number; readonly x: number };
  readonly vMin: { readonly value: number; readonly x: number };
}

/**
 * Profiles along both centrelines of n × n fields u, v (index i + n·j). When n is even the centreline falls between
 * two grid lines and is interpolated linearly between them (exact at the mid-plane for odd n).
 */
export function extractCenterlines(n: number, u: Float64Array, v: Float64Array): CavityCenterlines {
  const mid = 0.5 * (n - 1);
  const i0 = Math.floor(mid);
  const w = mid - i0;
  const i1 = w > 0 ? i0 + 1 : i0;
  const position = new Float64Array(n);
  const uLine = new Float64Array(n);
  const vLine = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    position[k] = k / (n - 1);
    uLine[k] = (1 - w) * u[k * n + i0] + w * u[k * n + i1];
    vLine[k] = (1 - w) * v[i0 * n + k] + w * v[i1 * n + k];
  }
  const uMin = parabolicExtremum(position, uLine, -1);
  const vMax = parabolicExtremum(position, vLine, 1);
  const vMin = parabolicExtremum(position, vLine, -1);
  return {
    position,
    u: uLine,
    v: vLine,
    uMin: { value: uMin.value, y: uMin.position },
    vMax: { value: vMax.value, x: vMax.position },
    vMin: { value: vMin.value, x: vMin.position },
  };
}

/**
 * The interior extremum (sign +1: maximum, −1: minimum) of samples f at equally spaced positions p, refined by the
 * parabola through the extreme sample and its two neighbours (vertex at offset δ = (f₋ − f₊)/(2(f₋ − 2f₀ + f₊))
 * spacings, value f₀ − (f₋ − f₊)·δ/4). Positions in the unit of p, values in the unit of f.
 */
export function parabolicExtremum(p: Float64Array, f: Float64Array, sign: 1 | -1): Extremum {
  const n = f.length;
  let best = 1;
  for (let k = 2; k < n - 1; k++) if (sign * f[k] > sign * f[best]) best = k;
  const fm = f[best - 1];
  const f0 = f[best];
  const fp = f[best + 1];
  const curvature = fm - 2 * f0 + fp;
  // A flat triple (curvature 0) has no vertex: keep the sample itself.
  const delta = curvature === 0 ? 0 : (fm - fp) / (2 * curvature);
  const spacing = p[1] - p[0];
  return { value: f0 - 0.25 * (fm - fp) * delta, position: p[best] + delta * spacing };
}

/**
 * Linear interpolation of samples f at equally spaced positions p (sides) at position x in [p₀, p_last], e.g. to
 * compare a profile with tabulated points that are not grid points.
 */
export function interpolateLine(p: Float64Array, f: Float64Array, x: number): number {
  const n = f.length;
  const s = ((x - p[0]) / (p[n - 1] - p[0])) * (n - 1);
  const k = Math.min(n - 2, Math.max(0, Math.floor(s)));
  const w = s - k;
  return (1 - w) * f[k] + w * f[k + 1];
}
