import { describe, expect, it } from 'vitest';
import { replicaBlockingAnalysis } from '../../engine/stats/replicaBlocking';
import { blockingAnalysis } from '../../engine/stats/blocking';
import { tQuantile975 } from '../../engine/stats/studentT';
import { createRng, standardNormal } from '../../engine/particles/rng';

/** Stationary AR(1) with mean `mean`, standard deviation `sd` and lag-1 correlation φ (started in equilibrium). */
function ar1(rng: Uint32Array, n: number, phi: number, mean: number, sd: number): Float64Array {
  const x = new Float64Array(n);
  let z = standardNormal(rng);
  const innovation = Math.sqrt(1 - phi * phi);
  for (let t = 0; t < n; t++) {
    if (t > 0) z = phi * z + innovation * standardNormal(rng);
    x[t] = mean + sd * z;
  }
  return x;
}

describe('replicaBlockingAnalysis', () => {
  it("of one replica is that replica's blocking analysis", () => {
    const x = ar1(createRng(1), 1000, 0.5, 3, 2);
    const one = replicaBlockingAnalysis([x]);
    const b = blockingAnalysis(x);
    expect(one.mean).toBe(b.mean);
    expect(one.standardError).toBeCloseTo(b.standardError, 14);
    expect(one.dof).toBe(b.dof);
    expect(one.ci95).toBeCloseTo(b.ci95, 14);
  });

  it('weights means by length, adds w² SE², and gives Welch–Satterthwaite degrees of freedom', () => {
    const rng = createRng(2);
    const series = [ar1(rng, 300, 0.3, 1, 1), ar1(rng, 900, 0.3, 1, 3)];
    const r = replicaBlockingAnalysis(series);
    const [a, b] = series.map((s) => blockingAnalysis(s));
    const [wa, wb] = [0.25, 0.75];
    expect(r.mean).toBeCloseTo(wa * a.mean + wb * b.mean, 14);
    const va = (wa * a.standardError) ** 2;
    const vb = (wb * b.standardError) ** 2;
    expect(r.standardError).toBeCloseTo(Math.sqrt(va + vb), 14);
    const dof = (va + vb) ** 2 / (va ** 2 / a.dof + vb ** 2 / b.dof); // Satterthwaite 1946 (from memory)
    expect(r.dof).toBeCloseTo(dof, 10);
    expect(r.dof).toBeGreaterThanOrEqual(Math.min(a.dof, b.dof));
    expect(r.ci95).toBeCloseTo(tQuantile975(dof) * r.standardError, 12);
    expect(r.effectiveSamples).toBeCloseTo(a.effectiveSamples + b.effectiveSamples, 10);
    expect(r.correlationTime).toBeCloseTo(wa * a.correlationTime + wb * b.correlationTime, 14);
  });

  it('95 % intervals cover the true mean 93–97 % of the time for correlated replicas of unequal length and noise', () => {
    // 1500 trials of three AR(1) replicas (φ = 0.6; lengths 256, 512, 1024; sd 1, 2, 0.5). With p = 0.95 the
    // binomial standard deviation of the coverage is 0.56 %, so the band is about ±3.5 σ (common practice, no source).
    const rng = createRng(3);
    const trials = 1500;
    let covered = 0;
    for (let t = 0; t < trials; t++) {
      const r = replicaBlockingAnalysis([
        ar1(rng, 256, 0.6, 5, 1),
        ar1(rng, 512, 0.6, 5, 2),
        ar1(rng, 1024, 0.6, 5, 0.5),
      ]);
      if (Math.abs(r.mean - 5) <= r.ci95) covered++;
    }
    const coverage = covered / trials;
    expect(coverage).toBeGreaterThan(0.93);
    expect(coverage).toBeLessThan(0.97);
  });

  it('refuses replicas with fewer than 2 values', () => {
    expect(() => replicaBlockingAnalysis([Float64Array.of(1, 2), Float64Array.of(3)])).toThrow(
      /replica 1 has 1 values/,
    );
    expect(() => replicaBlockingAnalysis([])).toThrow(/no series/);
  });
});
