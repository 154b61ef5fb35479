/**
 * Estimates of integral quantities (whole-wall stresses and fluxes) from their per-batch series: blocking analysis of
 * one replica's series (stats/blocking.ts), or of each replica's, combined (stats/replicaBlocking.ts).
 */
import { blockingAnalysis } from '../stats/blocking';
import { replicaBlockingAnalysis } from '../stats/replicaBlocking';
import type { Estimate } from './estimate';

export interface IntegralEstimate extends Estimate {
  standardError: number;
  effectiveSamples: number;
  correlationTimeSteps: number;
  /** False when the blocking analysis found no plateau: the error bar is then a lower bound. */
  plateauFound: boolean;
}

/** A blocking result (one replica or combined) as the estimate reported, with its correlation time in steps. */
function fromBlocking(
  b: {
    mean: number;
    ci95: number;
    standardError: number;
    effectiveSamples: number;
    correlationTime: number;
    plateauFound: boolean;
  },
  batchSteps: number,
): IntegralEstimate {
  return {
    mean: b.mean,
    ci95: b.ci95,
    standardError: b.standardError,
    effectiveSamples: b.effectiveSamples,
    correlationTimeSteps: b.correlationTime * batchSteps,
    plateauFound: b.plateauFound,
  };
}

function integralEstimate(values: Float64Array, batchSteps: number): IntegralEstimate {
  if (values.length < 2)
    return {
      mean: values.length ? values[0] : NaN,
      ci95: NaN,
      standardError: NaN,
      effectiveSamples: values.length,
      correlationTimeSteps: NaN,
      plateauFound: false,
    };
  return fromBlocking(blockingAnalysis(values), batchSteps);
}

/**
 * One replica: blocking analysis of its series. Several: each replica's blocking analysis, combined (mean weighted by
 * series length, Welch–Satterthwaite degrees of freedom; stats/replicaBlocking.ts). A replica with fewer than 2 values
 * (e.g. one stopped just after its transient) has no error bar of its own: it is left out, and counted in `leftOut` so
 * the result can say so — unless no replica has 2 values, when the pooled mean comes without a half-width.
 */
export function replicaIntegralEstimate(
  series: readonly Float64Array[],
  batchSteps: number,
): { estimate: IntegralEstimate; leftOut: number } {
  const filled = series.filter((s) => s.length > 0);
  const usable = filled.filter((s) => s.length >= 2);
  if (usable.length === 0 && filled.length > 1) {
    const n = filled.length;
    const mean = filled.reduce((sum, s) => sum + s[0], 0) / n;
    return {
      estimate: {
        mean,
        ci95: NaN,
        standardError: NaN,
        effectiveSamples: n,
        correlationTimeSteps: NaN,
        plateauFound: false,
      },
      leftOut: 0,
    };
  }
  const leftOut = filled.length - usable.length;
  if (usable.length <= 1)
    return { estimate: integralEstimate(usable[0] ?? filled[0] ?? new Float64Array(0), batchSteps), leftOut };
  return { estimate: fromBlocking(replicaBlockingAnalysis(usable), batchSteps), leftOut };
}
