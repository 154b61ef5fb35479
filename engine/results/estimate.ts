/**
 * Estimate: how every number leaves the engine, a mean with its 95 % confidence half-width. A leaf module, so that
 * the modules producing estimates (integralEstimate.ts, flowQuantities.ts, summarize.ts) share the type without
 * importing each other.
 */
export interface Estimate {
  mean: number;
  /** 95 % confidence half-width; NaN when there were too few batches to say. */
  ci95: number;
}
