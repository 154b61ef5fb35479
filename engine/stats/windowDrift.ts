/**
 * The drift test of the steady-state detector (steadyState.ts, whose header states the method): the change of a
 * least-squares line through a window's batch means and its t bound, for one series. Apart from the detector's
 * bookkeeping because it is the statistics; O(W) per call.
 */

/** One series at the latest check. */
export interface SeriesDrift {
  readonly name: string;
  /** Change of the fitted line over the window, in the series' unit. */
  readonly drift: number;
  /** The statistical bound on |drift| (same unit). */
  readonly bound: number;
  readonly steady: boolean;
}

/**
 * Drift and bound of one series from its last W samples (ring buffer `ring`, the oldest at `start`): least-squares
 * line through the B batch means at batch positions 0 … B−1 (steadyState.ts states the method).
 */
export function windowDrift(
  ring: Float64Array,
  start: number,
  batches: number,
  tFactor: number,
  relativeDriftFloor: number,
): { drift: number; bound: number; steady: boolean } {
  const w = ring.length;
  const batchLength = w / batches;
  const centre = (batches - 1) / 2;
  let meanY = 0;
  let sxy = 0;
  let sxx = 0;
  const means = new Float64Array(batches);
  for (let j = 0; j < batches; j++) {
    let sum = 0;
    for (let i = j * batchLength; i < (j + 1) * batchLength; i++) sum += ring[(start + i) % w];
    means[j] = sum / batchLength;
    meanY += means[j] / batches;
  }
  for (let j = 0; j < batches; j++) {
    sxy += (j - centre) * (means[j] - meanY);
    sxx += (j - centre) ** 2;
  }
  const slope = sxy / sxx;
  let residuals = 0;
  for (let j = 0; j < batches; j++) residuals += (means[j] - meanY - slope * (j - centre)) ** 2;
  const slopeSE = Math.sqrt(residuals / (batches - 2) / sxx);
  const drift = slope * batches;
  const bound = tFactor * slopeSE * batches;
  const steady = Math.abs(drift) <= bound || Math.abs(drift) <= relativeDriftFloor * Math.abs(meanY);
  return { drift, bound, steady };
}

export function describeDrift(d: SeriesDrift, window: number): string {
  return `"${d.name}" drifts ${d.drift.toPrecision(3)} over the last ${window} samples (bound ±${d.bound.toPrecision(3)})`;
}
