/**
 * What every reported number is: a mean with its 95 % confidence half-width, and for integral quantities the blocking
 * analysis behind it. A leaf module (it imports nothing), so the modules that make estimates (results/summarize.ts,
 * results/integralEstimate.ts, results/flowQuantities.ts) and those that read them can all name the type without
 * importing one another.
 */

export interface Estimate {
  mean: number;
  /** 95 % confidence half-width; NaN when there were too few batches to say. */
  ci95: number;
}

export interface IntegralEstimate extends Estimate {
  standardError: number;
  effectiveSamples: number;
  correlationTimeSteps: number;
  /** False when the blocking analysis found no plateau: the error bar is then a lower bound. */
  plateauFound: boolean;
}
