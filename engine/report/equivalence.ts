/**
 * Is a model good enough, given a DSMC estimate with its 95 % interval? An equivalence test, not a closeness test:
 * two one-sided tests (Schuirmann 1987, J. Pharmacokinet. Biopharm. 15:657) on the relative deviation
 * d = (model − DSMC)/scale with the user's tolerance ε.
 *
 *   adequate      the whole interval of d lies inside [−ε, ε]        (both one-sided tests reject |d| ≥ ε)
 *   notAdequate   the whole interval lies outside [−ε, ε]             (|d| > ε is established)
 *   undecided     otherwise: the run cannot tell, and says how much precision would tell
 *
 * The interval of d is the DSMC 95 % two-sided interval divided by the scale (the model has no error bar), so each
 * one-sided test runs at the 2.5 % level: stricter than the textbook TOST at 5 % with a 90 % interval, on purpose,
 * since a verdict read as "adequate" sends an engineer to the cheaper model.
 *
 * Profiles: d_i at each point with its own half-width h_i. The profile-wide deviation is the RMS over the points; its
 * interval is bounded by the RMS of the points' nearest and farthest ends, RMS(max(0, |d_i| − h_i)) and
 * RMS(|d_i| + h_i). So a profile is adequate only when its noise, too, is below the tolerance.
 *
 * Pure; no knowledge of cases or models.
 */

export type EquivalenceStatus = 'adequate' | 'notAdequate' | 'undecided';

export const EQUIVALENCE_STATUSES: readonly EquivalenceStatus[] = ['adequate', 'notAdequate', 'undecided'];

/** Interval of a relative deviation, and what it says against a tolerance. */
export interface EquivalenceResult {
  readonly status: EquivalenceStatus;
  /** Bounds of |d| (profiles: of the RMS deviation): the nearest and the farthest it can be from 0. */
  readonly lowerAbs: number;
  readonly upperAbs: number;
  /**
   * The relative 95 % half-width at which the same deviation would be decided (adequate or not), or 0 when it is
   * decided already; Infinity when |d| sits exactly on the tolerance and no precision can decide.
   */
  readonly halfWidthToDecide: number;
}

/**
 * Status from the bounds of |d| against tolerance ε (> 0). Exactly on the edge counts as inside: [−ε, ε] is closed,
 * so an interval touching ±ε from inside is adequate and one touching it from outside is undecided.
 */
export function statusOfBounds(lowerAbs: number, upperAbs: number, tolerance: number): EquivalenceStatus {
  if (!(tolerance > 0) || !Number.isFinite(lowerAbs) || !Number.isFinite(upperAbs)) return 'undecided';
  if (upperAbs <= tolerance) return 'adequate';
  if (lowerAbs > tolerance) return 'notAdequate';
  return 'undecided';
}

/**
 * Equivalence of one integral quantity: relative deviation d (signed) with relative 95 % half-width h (≥ 0; NaN when
 * DSMC gave none, which is undecided).
 */
export function integralEquivalence(deviation: number, halfWidth: number, tolerance: number): EquivalenceResult {
  const d = Math.abs(deviation);
  const h = Number.isFinite(halfWidth) && halfWidth >= 0 ? halfWidth : NaN;
  const lowerAbs = Math.max(0, d - h);
  const upperAbs = d + h;
  const status = statusOfBounds(lowerAbs, upperAbs, tolerance);
  return { status, lowerAbs, upperAbs, halfWidthToDecide: status === 'undecided' ? neededHalfWidth(d, tolerance) : 0 };
}

/**
 * Equivalence of a profile: point-wise relative deviations d_i and relative half-widths h_i (same length, finite).
 * Bounds of the RMS deviation as in the file header.
 */
export function profileEquivalence(
  deviations: ArrayLike<number>,
  halfWidths: ArrayLike<number>,
  tolerance: number,
): EquivalenceResult {
  const n = deviations.length;
  if (n === 0) return { status: 'undecided', lowerAbs: NaN, upperAbs: NaN, halfWidthToDecide: Infinity };
  let low2 = 0;
  let high2 = 0;
  let dev2 = 0;
  let h2 = 0;
  for (let i = 0; i < n; i++) {
    const d = Math.abs(deviations[i]);
    const h = halfWidths[i];
    low2 += Math.max(0, d - h) ** 2;
    high2 += (d + h) ** 2;
    dev2 += d * d;
    h2 += h * h;
  }
  const lowerAbs = Math.sqrt(low2 / n);
  const upperAbs = Math.sqrt(high2 / n);
  const status = statusOfBounds(lowerAbs, upperAbs, tolerance);
  // For the precision needed, the profile's points shrink together: scale every h_i by one factor k (the RMS
  // half-width then is k·RMS(h)) and find the largest k that decides, by bisection (the bounds are monotone in k).
  let halfWidthToDecide = 0;
  if (status === 'undecided') {
    const rmsH = Math.sqrt(h2 / n);
    const rmsD = Math.sqrt(dev2 / n);
    if (!(rmsH > 0) || Math.abs(rmsD - tolerance) < 1e-15) halfWidthToDecide = Infinity;
    else {
      const decides = (k: number): boolean => {
        let lo = 0;
        let hi = 0;
        for (let i = 0; i < n; i++) {
          const d = Math.abs(deviations[i]);
          const h = k * halfWidths[i];
          lo += Math.max(0, d - h) ** 2;
          hi += (d + h) ** 2;
        }
        return statusOfBounds(Math.sqrt(lo / n), Math.sqrt(hi / n), tolerance) !== 'undecided';
      };
      let a = 0;
      let b = 1;
      if (!decides(1e-9)) halfWidthToDecide = Infinity;
      else {
        for (let it = 0; it < 60; it++) {
          const k = 0.5 * (a + b);
          if (decides(k)) a = k;
          else b = k;
        }
        halfWidthToDecide = a * rmsH;
      }
    }
  }
  return { status, lowerAbs, upperAbs, halfWidthToDecide };
}

/** Largest relative half-width that decides a deviation |d| against ε: |ε − |d||, Infinity when |d| = ε. */
export function neededHalfWidth(absDeviation: number, tolerance: number): number {
  const gap = Math.abs(tolerance - absDeviation);
  return gap > 0 ? gap : Infinity;
}

/**
 * How much longer to sample so that a half-width h shrinks to `target` (error ∝ 1/√samples, Hadjiconstantinou et
 * al. 2003, J. Comput. Phys. 187:274, for uncorrelated batches; common practice for DSMC averages): the factor on the
 * samples taken so far, (h/target)², and the extra time at the run's own rate. Infinity when no precision decides.
 */
export function extraSamplingToReach(
  halfWidth: number,
  target: number,
  sampledSeconds: number,
): { readonly factor: number; readonly extraSeconds: number } {
  if (!(target > 0) || !Number.isFinite(target)) return { factor: Infinity, extraSeconds: Infinity };
  const factor = Math.max(1, (halfWidth / target) ** 2);
  return { factor, extraSeconds: (factor - 1) * sampledSeconds };
}
