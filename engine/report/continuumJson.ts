/**
 * The continuum sections of summary.json, from a continuum comparison (comparison.ts): `continuum` (each model's
 * integral quantities), `verdict` (the headline sentence of headline.ts, then per quantity its status — adequate,
 * notAdequate, undecided, notApplicable — the best model, each model's status and the numbers behind them) and
 * `continuumModels` (what each model is); a case no model applies to gets `continuumNote` (why).
 */
import type { ContinuumComparisonResult } from './comparison';
import type { ModelStatus, QuantityStatus, QuantityVerdict } from './verdict';
import { verdictHeadline } from './headline';
import { jsonNumber, type JsonNumber } from './estimateJson';

export interface ModelVerdictJson {
  status: ModelStatus;
  deviation: JsonNumber;
  maxDeviation: JsonNumber;
  normalizedDeviation: JsonNumber;
  /** The 95 % interval of |deviation|. */
  deviationLower: JsonNumber;
  deviationUpper: JsonNumber;
  /** Relative half-width that would decide this model (0 decided, null when none can). */
  halfWidthToDecide: JsonNumber;
  /** Why the model does not apply here (status notApplicable). */
  reason?: string;
}

export interface VerdictJson {
  /** adequate | notAdequate | undecided | notApplicable | noData (report/verdict.ts). */
  status: QuantityStatus;
  /** The simplest adequate model, or null. */
  bestModel: string | null;
  /** The best model's relative deviation from DSMC (profiles: RMS over the points). */
  deviation: JsonNumber;
  text: string;
  kind: QuantityVerdict['kind'];
  /** DSMC 95 % half-width over the scale, the tolerance, and the scale (in the quantity's unit). */
  relativeHalfWidth: JsonNumber;
  tolerance: JsonNumber;
  scale: JsonNumber;
  /** What would settle an undecided verdict: the relative half-width and the factor on the sampling so far. */
  halfWidthToDecide: JsonNumber;
  samplingFactor: JsonNumber;
  models: Record<string, ModelVerdictJson>;
}

/** `verdict` of summary.json: the headline sentence first, then one entry per compared quantity or profile. */
export type VerdictSectionJson = { headline: string; headlineQuantity: string } & {
  [quantity: string]: VerdictJson | string;
};

export interface ContinuumSections {
  /** Integral quantities each continuum model predicts: {MODEL: {`walls.bottom.shearStress`: value, …}}. */
  continuum?: Record<string, Record<string, JsonNumber>>;
  /** Per compared quantity or profile: which model is good enough, and the numbers behind it (report/verdict.ts). */
  verdict?: VerdictSectionJson;
  /** The analytic problem recognised and what each model means. */
  continuumModels?: {
    problem: string;
    description: string;
    meanFreePath: { kind: string; value: JsonNumber };
    knudsen: JsonNumber;
    models: Record<string, string>;
  };
  /** Why no continuum model is compared, when none applies. */
  continuumNote?: string;
}

function verdictJson(v: QuantityVerdict): VerdictJson {
  return {
    status: v.status,
    bestModel: v.bestModel,
    deviation: jsonNumber(v.deviation),
    text: v.text,
    kind: v.kind,
    relativeHalfWidth: jsonNumber(v.relativeHalfWidth),
    tolerance: jsonNumber(v.tolerance),
    scale: jsonNumber(v.scale),
    halfWidthToDecide: jsonNumber(v.halfWidthToDecide),
    samplingFactor: jsonNumber(v.samplingFactor),
    models: Object.fromEntries(
      v.models.map((d) => [
        d.model,
        {
          status: d.status,
          deviation: jsonNumber(d.deviation),
          maxDeviation: jsonNumber(d.maxDeviation),
          normalizedDeviation: jsonNumber(d.normalizedDeviation),
          deviationLower: jsonNumber(d.lowerAbs),
          deviationUpper: jsonNumber(d.upperAbs),
          halfWidthToDecide: jsonNumber(d.halfWidthToDecide),
          ...(d.reason ? { reason: d.reason } : {}),
        },
      ]),
    ),
  };
}

/** The continuum sections of summary.json; units of their quantities go into `units`. */
export function continuumJson(c: ContinuumComparisonResult, units: Record<string, string>): ContinuumSections {
  if (!c.recognised) return { continuumNote: c.reason };
  const continuum: Record<string, Record<string, JsonNumber>> = {};
  for (const [model, values] of Object.entries(c.continuum))
    continuum[model] = Object.fromEntries(Object.entries(values!).map(([k, x]) => [k, jsonNumber(x)]));
  Object.assign(units, c.units);
  units.deviation = '1';
  const p = c.predictions;
  const headline = verdictHeadline(c);
  return {
    continuum,
    verdict: {
      headline: headline.text,
      headlineQuantity: headline.quantity,
      ...Object.fromEntries(Object.entries(c.verdict).map(([k, v]) => [k, verdictJson(v)])),
    },
    continuumModels: {
      problem: p.problem,
      description: p.description,
      meanFreePath: { kind: p.meanFreePath.kind, value: jsonNumber(p.meanFreePath.valueM) },
      knudsen: jsonNumber(p.knudsen),
      models: { ...p.models } as Record<string, string>,
    },
  };
}
