/**
 * The mean of a quantity sampled by several independent replicas (same case, different random streams), each a
 * correlated series, with a 95 % interval: blocking analysis of each replica's series, then the replicas combined.
 *
 * With n_r values in replica r, weights w_r = n_r / Σn, replica means x̄_r and standard errors SE_r (blocking):
 *   mean = Σ w_r x̄_r                 (the mean of all values pooled)
 *   SE²  = Σ w_r² SE_r²              (the replicas are independent)
 *   ν    = (Σ w_r² SE_r²)² / Σ ((w_r² SE_r²)² / ν_r)
 * — the Welch–Satterthwaite degrees of freedom of a linear combination of independent variance estimates
 * (Satterthwaite 1946, Biometrics Bulletin 2:110; Welch 1947, Biometrika 34:28; formula from memory), with ν_r the
 * degrees of freedom of replica r's blocking level (blocks − 1). ν is at least the smallest ν_r and at most their sum.
 * The half-width is t_{0.975, ν} SE. Effective samples add up; the correlation time is the weighted mean Σ w_r τ_r.
 */
import { blockingAnalysis, type BlockingResult } from './blocking';
import { tQuantile975 } from './studentT';

export interface ReplicaBlockingResult {
  readonly mean: number;
  readonly standardError: number;
  /** t_{0.975, dof} × standardError. */
  readonly ci95: number;
  /** Welch–Satterthwaite degrees of freedom (not necessarily whole). */
  readonly dof: number;
  /** Σ w_r τ_r, in samples (see BlockingResult.correlationTime). */
  readonly correlationTime: number;
  /** Σ over replicas of n_r/(2 τ_r). */
  readonly effectiveSamples: number;
  /** True only if every replica's blocking analysis found its plateau. */
  readonly plateauFound: boolean;
  /** Each replica's own analysis, in the order given. */
  readonly replicas: readonly BlockingResult[];
}

/** Combines independent replicas' series as described above. Throws if a series has fewer than 2 values. */
export function replicaBlockingAnalysis(series: readonly ArrayLike<number>[]): ReplicaBlockingResult {
  if (series.length === 0) throw new Error('replica blocking analysis: no series given');
  const results = series.map((s, r) => {
    if (s.length < 2)
      throw new Error(`replica blocking analysis: replica ${r} has ${s.length} values; each needs at least 2`);
    return blockingAnalysis(s);
  });
  const total = series.reduce((sum, s) => sum + s.length, 0);
  const weights = series.map((s) => s.length / total);
  const parts = results.map((b, r) => weights[r] * weights[r] * b.standardError * b.standardError);
  const variance = parts.reduce((sum, a) => sum + a, 0);
  let mean = 0;
  let correlationTime = 0;
  let effectiveSamples = 0;
  let sumDof = 0;
  let inverseDof = 0;
  results.forEach((b, r) => {
    mean += weights[r] * b.mean;
    correlationTime += weights[r] * b.correlationTime;
    effectiveSamples += b.effectiveSamples;
    sumDof += b.dof;
    // ν = V² / Σ (a_r² / ν_r), written with a_r / V so that large quantities (number fluxes ~1e24) cannot overflow.
    if (variance > 0) inverseDof += (parts[r] / variance) ** 2 / b.dof;
  });
  // Every replica constant (SE = 0): no spread to weigh, so the dof are simply pooled (the interval is 0 anyway).
  const dof = inverseDof > 0 ? Math.min(sumDof, 1 / inverseDof) : sumDof;
  const standardError = Math.sqrt(variance);
  return {
    mean,
    standardError,
    ci95: tQuantile975(dof) * standardError,
    dof,
    correlationTime,
    effectiveSamples,
    plateauFound: results.every((b) => b.plateauFound),
    replicas: results,
  };
}
