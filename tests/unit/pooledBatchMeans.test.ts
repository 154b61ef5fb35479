import { describe, expect, it } from 'vitest';
import { pooledBatchHalfWidths, MIN_POOLED_PAIRS } from '../../engine/stats/pooledBatchMeans';
import { tQuantile975 } from '../../engine/stats/studentT';

/** mulberry32 (Tommy Ettinger's 32-bit generator; common practice, no source) with Box–Muller normals. */
function normalSource(seed: number): () => number {
  let a = seed | 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
}

/** rows × batches of stationary AR(1) batch means (unit variance, mean 0), batch-major as the tables derive them. */
function ar1Table(rows: number, batches: number, phi: number, normal: () => number): Float64Array {
  const v = new Float64Array(rows * batches);
  for (let r = 0; r < rows; r++) {
    let x = normal();
    for (let b = 0; b < batches; b++) {
      if (b > 0) x = phi * x + Math.sqrt(1 - phi * phi) * normal();
      v[b * rows + r] = x;
    }
  }
  return v;
}

const halfWidths = (v: Float64Array, rows: number, batches: number, segments = [batches]) =>
  pooledBatchHalfWidths(batches, rows, 1, segments, (b, out) => out.set(v.subarray(b * rows, (b + 1) * rows)));

describe('pooledBatchHalfWidths()', () => {
  it('is the plain t·s/sqrt(n) interval when the table has too few lag pairs to measure r', () => {
    const batches = 31;
    const rows = Math.floor((MIN_POOLED_PAIRS - 1) / (batches - 1));
    const v = ar1Table(rows, batches, 0.5, normalSource(3));
    const { ci95, lag1Correlation } = halfWidths(v, rows, batches);
    expect(Number.isNaN(lag1Correlation[0])).toBe(true);
    for (let r = 0; r < rows; r++) {
      const x = Array.from({ length: batches }, (_, b) => v[b * rows + r]);
      const m = x.reduce((a, y) => a + y, 0) / batches;
      const s2 = x.reduce((a, y) => a + (y - m) ** 2, 0) / (batches - 1);
      expect(ci95[r]).toBeCloseTo(tQuantile975(batches - 1) * Math.sqrt(s2 / batches), 12);
    }
  });

  it('covers the mean of AR(1) batch means (φ = 0.3, 20 rows × 31 batches) 92–98 % of 2000 times', () => {
    // The plain interval covers about 0.87 here (var(mean) of AR(1) is (1+φ)/(1−φ) = 1.86× the naive one; computed).
    // 2000 intervals in 100 tables: binomial SD 0.005 (rows of one table share r̂), so [0.92, 0.98] is generous.
    const normal = normalSource(11);
    let covered = 0;
    let total = 0;
    for (let t = 0; t < 100; t++) {
      const v = ar1Table(20, 31, 0.3, normal);
      const { ci95 } = halfWidths(v, 20, 31);
      for (let r = 0; r < 20; r++) {
        let m = 0;
        for (let b = 0; b < 31; b++) m += v[b * 20 + r] / 31;
        if (Math.abs(m) <= ci95[r]) covered++;
        total++;
      }
    }
    expect(covered / total).toBeGreaterThanOrEqual(0.92);
    expect(covered / total).toBeLessThanOrEqual(0.98);
  });

  it('never pairs batches of two replicas (segments)', () => {
    // White noise, except that the last batch of replica 1 and the first of replica 2 are both +3 in every row: only
    // the pair across the boundary is correlated, so leaving it out lowers r by about 20·9/(20·(32 + 16)) ≈ 0.19.
    const rows = 20;
    const normal = normalSource(5);
    const v = new Float64Array(rows * 32);
    for (let b = 0; b < 32; b++) for (let r = 0; r < rows; r++) v[b * rows + r] = b === 15 || b === 16 ? 3 : normal();
    const joined = halfWidths(v, rows, 32).lag1Correlation[0];
    const split = halfWidths(v, rows, 32, [16, 16]).lag1Correlation[0];
    expect(joined - split).toBeGreaterThan(0.12);
    expect(joined - split).toBeLessThan(0.26);
  });
});
