/**
 * How numbers and estimates are written into the JSON files (summary.json, sweep.json): JSON has no NaN or Infinity,
 * so a value that is not finite becomes null ("not available"). Shared by the summary's sections, hence a module of
 * its own below them.
 */
import type { IntegralEstimate } from '../stats/estimate';

/** JSON has no NaN or Infinity: a value that is not finite is written as null ("not available"). */
export type JsonNumber = number | null;

export interface WallEstimateJson {
  mean: JsonNumber;
  ci95: JsonNumber;
  effectiveSamples: JsonNumber;
  correlationTimeSteps: JsonNumber;
  /** False when the blocking analysis found no plateau: ci95 is then a lower bound. */
  plateauFound: boolean;
}

export function jsonNumber(x: number): JsonNumber {
  return Number.isFinite(x) ? x : null;
}

export function wallEstimateJson(e: IntegralEstimate): WallEstimateJson {
  return {
    mean: jsonNumber(e.mean),
    ci95: jsonNumber(e.ci95),
    effectiveSamples: jsonNumber(e.effectiveSamples),
    correlationTimeSteps: jsonNumber(e.correlationTimeSteps),
    plateauFound: e.plateauFound,
  };
}
