/**
 * 95 % half-widths of field tables (rows × quantities) from per-batch values, with the serial correlation of the
 * batch means measured over the whole table rather than assumed away.
 *
 * Field tables rest on 16–32 batch means per row (stats/doublingBatches.ts). A run shorter than about 30 correlation
 * times of the slowest mode (momentum and heat diffusing across a near-continuum gap) leaves neighbouring batch means
 * positively correlated, and the plain s/sqrt(n) interval too narrow; a quantity whose time integral telescopes (the
 * wall-normal velocity in a closed gap: Σv_y over a cell is the change of the mass below it) has anti-correlated batch
 * means and a far too wide interval. One row's 31 batches cannot measure that correlation (its estimate has a standard
 * error of about 0.18), but every row of a table sees the same physics, so the lag-1 correlation r of each quantity is
 * pooled over the table's rows (Σ over rows of the lag-1 cross products over Σ of the squares), corrected for its
 * −1/n bias (Marriott & Pope 1954, Biometrika 41:390; from memory), and each row's variance of the mean is multiplied
 * by the AR(1) factor (1 + r)/(1 − r) (batch means of a process with exponential correlation are close to AR(1);
 * common practice). The pooled r is used only when it rests on at least MIN_POOLED_PAIRS lag pairs (standard error
 * ≤ 0.07); otherwise the factor is 1. Pairs never span two replicas (BatchList segments). The t interval keeps
 * batches − 1 degrees of freedom.
 */
import { tQuantile975 } from './studentT';

/** Lag pairs below which the pooled correlation is too noisy to use (SE of r ≈ 1/sqrt(pairs)). */
export const MIN_POOLED_PAIRS = 200;
/** r is clamped to this range: the AR(1) factor runs from 1/4 to 9. */
const R_MIN = -0.6;
const R_MAX = 0.8;

export interface PooledHalfWidths {
  /** rows × quantities half-widths, NaN where a row has fewer than 2 finite batch values. */
  readonly ci95: Float64Array;
  /** Per quantity: the pooled, bias-corrected lag-1 correlation of batch means (NaN when not used). */
  readonly lag1Correlation: Float64Array;
}

/**
 * Half-widths over `batches` batches of values produced by `derive(b, out)` (rows × quantities, row-major).
 * `segments` gives the batches of each replica in order (their sum is `batches`); lag pairs stay inside a segment.
 */
export function pooledBatchHalfWidths(
  batches: number,
  rows: number,
  quantities: number,
  segments: readonly number[],
  derive: (batch: number, out: Float64Array) => void,
): PooledHalfWidths {
  const width = rows * quantities;
  const ci = new Float64Array(width).fill(NaN);
  const lag1Correlation = new Float64Array(quantities).fill(NaN);
  if (batches < 2) return { ci95: ci, lag1Correlation };
  const startsSegment = new Uint8Array(batches);
  let at = 0;
  for (const n of segments) {
    if (at < batches) startsSegment[at] = 1;
    at += n;
  }
  startsSegment[0] = 1;
  // Values are shifted by each entry's first finite value so that large magnitudes (number densities ~1e21) keep
  // their small variations in the cross products.
  const shift = new Float64Array(width).fill(NaN);
  const mean = new Float64Array(width);
  const m2 = new Float64Array(width);
  const count = new Float64Array(width);
  const prev = new Float64Array(width).fill(NaN);
  const crossSum = new Float64Array(width);
  const pairSum = new Float64Array(width);
  const pairs = new Float64Array(width);
  const values = new Float64Array(width);
  for (let b = 0; b < batches; b++) {
    derive(b, values);
    const newSegment = startsSegment[b] === 1;
    for (let q = 0; q < width; q++) {
      const v = values[q];
      if (!Number.isFinite(v)) {
        prev[q] = NaN;
        continue;
      }
      if (Number.isNaN(shift[q])) shift[q] = v;
      const y = v - shift[q];
      const c = ++count[q];
      const d = y - mean[q];
      mean[q] += d / c;
      m2[q] += d * (y - mean[q]);
      const p = prev[q];
      if (!newSegment && !Number.isNaN(p)) {
        crossSum[q] += y * p;
        pairSum[q] += y + p;
        pairs[q]++;
      }
      prev[q] = y;
    }
  }
  const factor = new Float64Array(quantities).fill(1);
  for (let k = 0; k < quantities; k++) {
    let cross = 0;
    let squares = 0;
    let pairCount = 0;
    let weightedInverseN = 0;
    for (let row = 0; row < rows; row++) {
      const q = row * quantities + k;
      if (count[q] < 2 || pairs[q] === 0) continue;
      const m = mean[q];
      cross += crossSum[q] - m * pairSum[q] + pairs[q] * m * m;
      squares += m2[q];
      pairCount += pairs[q];
      weightedInverseN += pairs[q] / count[q];
    }
    if (pairCount < MIN_POOLED_PAIRS || !(squares > 0)) continue;
    const r = Math.min(R_MAX, Math.max(R_MIN, cross / squares + weightedInverseN / pairCount));
    lag1Correlation[k] = r;
    factor[k] = (1 + r) / (1 - r);
  }
  for (let q = 0; q < width; q++) {
    const c = count[q];
    if (c >= 2) ci[q] = tQuantile975(c - 1) * Math.sqrt((factor[q % quantities] * m2[q]) / (c - 1) / c);
  }
  return { ci95: ci, lag1Correlation };
}
