/**
 * Kinetic coefficients of a long duct, as a table against the rarefaction δ = p·a/(μ·v0) (a the radius of a tube or
 * the gap of a channel, v0 = sqrt(2kT/m)): the reduced flow rate G_P of the Poiseuille (pressure-driven) flow and,
 * where known, the thermal-creep coefficient G_T, each with its 95 % half-width. Normalisation of Sharipov &
 * Seleznev 1998 (J. Phys. Chem. Ref. Data 27:657): ṁ = (A·a/v0)·[G_P·(−dp/dx) + G_T·(p/T)·dT/dx].
 *
 * Interpolation keeps the known limits by interpolating the difference from the slip asymptote, r(δ) = G_P − δ/4
 * (tube) or G_P − δ/6 (channel), in ln δ with a monotone piecewise cubic (Fritsch & Carlson 1980, SIAM J. Numer.
 * Anal. 17:238): r tends to σ_P (the slip coefficient) as δ → ∞ and to the free-molecular value as δ → 0. Outside the
 * table r is held at its end value, except that a channel's r grows like ln(1/δ)/√π below the table (its
 * free-molecular flow rate diverges logarithmically; Cercignani 1963). How far outside the table a value lies is
 * reported with it (extrapolatedBy).
 */

import { rectangleFlowFactor } from '../continuum/rectangularDuct';

export type DuctShapeKind = 'tube' | 'channel' | 'rectangle';

export interface CoefficientPoint {
  readonly rarefaction: number;
  readonly reducedFlowRate: number;
  /** 95 % half-width of G_P; 0 for a deterministic (kinetic-equation) table. */
  readonly reducedFlowRateCi95: number;
  readonly thermalCreep?: number;
  readonly thermalCreepCi95?: number;
}

export interface CoefficientTable {
  readonly shape: DuctShapeKind;
  /** Where the numbers come from, in words (a publication, or the case and version that computed them). */
  readonly source: string;
  /** The gas model and wall the table holds for, in words (e.g. "hard spheres, diffuse walls"). */
  readonly gasAndWall: string;
  /** A rectangle's height over width H/W in (0, 1] (δ and G_P on the height H, ṁ = (H² W / v0)(−dp/dx) G_P). */
  readonly aspectRatio?: number;
  /** Rarefaction ascending, at least two points. */
  readonly points: readonly CoefficientPoint[];
}

/**
 * Slope of G_P against δ in the slip regime (no-slip Poiseuille flow): 1/4 for a tube, 1/6 for a channel, and 1/6
 * times the no-slip series' bracket for a rectangle of aspect ratio H/W (continuum/rectangularDuct.ts).
 */
export function slipSlope(shape: DuctShapeKind, aspectRatio?: number): number {
  if (shape === 'rectangle') return rectangleFlowFactor(aspectRatio ?? 1) / 6;
  return shape === 'tube' ? 1 / 4 : 1 / 6;
}

/** Free-molecular G_P of a long tube, 8/(3√π) (Knudsen 1909; Sharipov & Seleznev 1998). */
export const FREE_MOLECULAR_TUBE_GP = 8 / (3 * Math.sqrt(Math.PI));
/** Free-molecular G_T of a long tube, 4/(3√π) = G_P/2 (Sharipov & Seleznev 1998): Knudsen's √(T1/T2) at zero flow. */
export const FREE_MOLECULAR_TUBE_GT = 4 / (3 * Math.sqrt(Math.PI));

export interface InterpolatedCoefficient {
  readonly value: number;
  readonly ci95: number;
  /** 0 inside the table; else the factor by which δ lies beyond its nearer end (e.g. 10 for δ = δ_max·10). */
  readonly extrapolatedBy: number;
}

/** Checks a table (ascending, finite, positive δ; at least two points) and says what is wrong, or null. */
export function tableProblem(t: CoefficientTable): string | null {
  if (t.shape !== 'tube' && t.shape !== 'channel' && t.shape !== 'rectangle')
    return `coefficient table "${t.source}": shape ${String(t.shape)}; it must be tube, channel or rectangle`;
  if (t.shape === 'rectangle' && !(typeof t.aspectRatio === 'number' && t.aspectRatio > 0 && t.aspectRatio <= 1))
    return `coefficient table "${t.source}": a rectangle's table needs its aspectRatio H/W, above 0 and at most 1`;
  if (t.points.length < 2) return `coefficient table "${t.source}": needs at least two points, has ${t.points.length}`;
  for (let k = 0; k < t.points.length; k++) {
    const p = t.points[k];
    if (!(p.rarefaction > 0 && Number.isFinite(p.rarefaction)))
      return `coefficient table "${t.source}": point ${k + 1} has rarefaction ${p.rarefaction}; it must be a number above 0`;
    if (!(Number.isFinite(p.reducedFlowRate) && p.reducedFlowRate > 0))
      return `coefficient table "${t.source}": point ${k + 1} has G_P = ${p.reducedFlowRate}; it must be a number above 0`;
    if (!(Number.isFinite(p.reducedFlowRateCi95) && p.reducedFlowRateCi95 >= 0))
      return `coefficient table "${t.source}": point ${k + 1} has a G_P half-width of ${p.reducedFlowRateCi95}; it must be 0 or more`;
    if (k > 0 && !(p.rarefaction > t.points[k - 1].rarefaction))
      return `coefficient table "${t.source}": rarefactions must rise from point to point (point ${k + 1}: ${p.rarefaction} after ${t.points[k - 1].rarefaction})`;
  }
  return null;
}

/** Monotone cubic Hermite slopes (Fritsch–Carlson) of y over x. */
function monotoneSlopes(x: readonly number[], y: readonly number[]): number[] {
  const n = x.length;
  const d = new Array<number>(n - 1);
  for (let k = 0; k < n - 1; k++) d[k] = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
  const m = new Array<number>(n);
  m[0] = d[0];
  m[n - 1] = d[n - 2];
  for (let k = 1; k < n - 1; k++) {
    if (d[k - 1] * d[k] <= 0) m[k] = 0;
    else {
      // Weighted harmonic mean (Fritsch & Butland 1984), which keeps each interval monotone.
      const w1 = 2 * (x[k + 1] - x[k]) + (x[k] - x[k - 1]);
      const w2 = x[k + 1] - x[k] + 2 * (x[k] - x[k - 1]);
      m[k] = (w1 + w2) / (w1 / d[k - 1] + w2 / d[k]);
    }
  }
  return m;
}

function hermite(x: readonly number[], y: readonly number[], m: readonly number[], at: number): number {
  let k = 0;
  while (k < x.length - 2 && at > x[k + 1]) k++;
  const h = x[k + 1] - x[k];
  const t = (at - x[k]) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (
    (2 * t3 - 3 * t2 + 1) * y[k] +
    (t3 - 2 * t2 + t) * h * m[k] +
    (-2 * t3 + 3 * t2) * y[k + 1] +
    (t3 - t2) * h * m[k + 1]
  );
}

/** G_P of a table at rarefaction δ, with its half-width (interpolated linearly in ln δ) — see the file header. */
export function reducedFlowRateAt(t: CoefficientTable, rarefaction: number): InterpolatedCoefficient {
  return interpolator(t)(rarefaction);
}

/**
 * The interpolating function of a table, built once (the slopes) for the many evaluations of an integral.
 * Throws when the table is malformed.
 */
export function interpolator(t: CoefficientTable): (rarefaction: number) => InterpolatedCoefficient {
  const problem = tableProblem(t);
  if (problem) throw new Error(problem);
  const slope = slipSlope(t.shape, t.aspectRatio);
  const x = t.points.map((p) => Math.log(p.rarefaction));
  const r = t.points.map((p) => p.reducedFlowRate - slope * p.rarefaction);
  const ci = t.points.map((p) => p.reducedFlowRateCi95);
  const m = monotoneSlopes(x, r);
  const lo = t.points[0].rarefaction;
  const hi = t.points[t.points.length - 1].rarefaction;
  const n = t.points.length;
  return (delta: number) => {
    if (!(delta > 0 && Number.isFinite(delta)))
      throw new Error(`rarefaction ${delta}: must be a finite number above 0`);
    if (delta < lo) {
      // Below the table: the tube's r is at its free-molecular plateau; a channel's keeps growing as ln(1/δ)/√π.
      const grow = t.shape === 'channel' ? Math.log(lo / delta) / Math.sqrt(Math.PI) : 0;
      return { value: slope * delta + r[0] + grow, ci95: ci[0], extrapolatedBy: lo / delta };
    }
    if (delta > hi) return { value: slope * delta + r[n - 1], ci95: ci[n - 1], extrapolatedBy: delta / hi };
    const at = Math.log(delta);
    let k = 0;
    while (k < n - 2 && at > x[k + 1]) k++;
    const f = (at - x[k]) / (x[k + 1] - x[k]);
    return { value: slope * delta + hermite(x, r, m, at), ci95: ci[k] + f * (ci[k + 1] - ci[k]), extrapolatedBy: 0 };
  };
}

/**
 * G_T of a table at rarefaction δ, or null when the table has no thermal-creep column. Interpolated on log–log axes
 * (ln G_T against ln δ, monotone cubic), where both limits are straight lines: G_T tends to a constant in the
 * free-molecular limit and falls like 1/δ in the slip regime (thermal creep; Sharipov & Seleznev 1998). Outside the
 * table G_T ∝ 1/δ above it, and G_T is held below it (a channel's G_T grows like ln(1/δ)/(2√π) there, half its
 * G_P's growth). G_T must be above 0 at every point that has it; points without it are skipped, and with fewer than
 * two such points the table has no G_T column.
 */
export function thermalCreepInterpolator(
  t: CoefficientTable,
): ((rarefaction: number) => InterpolatedCoefficient) | null {
  const problem = tableProblem(t);
  if (problem) throw new Error(problem);
  // Points without G_T (a DSMC point whose heat flow was not linear in its drive) are left out of this column.
  const points = t.points.filter((p) => p.thermalCreep !== undefined);
  if (points.length < 2) return null;
  const bad = points.findIndex((p) => !(Number.isFinite(p.thermalCreep) && p.thermalCreep! > 0));
  if (bad >= 0)
    throw new Error(
      `coefficient table "${t.source}": the point at δ = ${points[bad].rarefaction} has G_T = ${points[bad].thermalCreep}; it must be a number above 0`,
    );
  const x = points.map((p) => Math.log(p.rarefaction));
  const y = points.map((p) => Math.log(p.thermalCreep!));
  const ci = points.map((p) => p.thermalCreepCi95 ?? 0);
  const m = monotoneSlopes(x, y);
  const n = points.length;
  const lo = points[0];
  const hi = points[n - 1];
  return (delta: number) => {
    if (!(delta > 0 && Number.isFinite(delta)))
      throw new Error(`rarefaction ${delta}: must be a finite number above 0`);
    if (delta < lo.rarefaction) {
      const grow = t.shape === 'channel' ? Math.log(lo.rarefaction / delta) / (2 * Math.sqrt(Math.PI)) : 0;
      return { value: lo.thermalCreep! + grow, ci95: ci[0], extrapolatedBy: lo.rarefaction / delta };
    }
    if (delta > hi.rarefaction)
      return {
        value: (hi.rarefaction * hi.thermalCreep!) / delta,
        ci95: (ci[n - 1] * hi.rarefaction) / delta,
        extrapolatedBy: delta / hi.rarefaction,
      };
    const at = Math.log(delta);
    let k = 0;
    while (k < n - 2 && at > x[k + 1]) k++;
    const f = (at - x[k]) / (x[k + 1] - x[k]);
    return { value: Math.exp(hermite(x, y, m, at)), ci95: ci[k] + f * (ci[k + 1] - ci[k]), extrapolatedBy: 0 };
  };
}
