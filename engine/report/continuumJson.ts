/**
 * The continuum sections of summary.json, from a continuum comparison (comparison.ts): `continuum` (each model's
 * integral quantities), `verdict` (per quantity: best model, deviation, text and the numbers behind it) and
 * `continuumModels` (what each model is); a case no model applies to gets `continuumNote` (why).
 */
import type { ContinuumComparisonResult } from './comparison';
import type { QuantityVerdict } from './verdict';
import { jsonNumber, type JsonNumber } from './estimateJson';

export interface VerdictJson {
  bestModel: string | null;
  /** The best model's relative deviation from DSMC (profiles: RMS over the points). */
  deviation: JsonNumber;
  text: string;
  category: QuantityVerdict['category'];
  kind: QuantityVerdict['kind'];
  /** DSMC 95 % half-width over the scale, the threshold for "adequate", and the scale (in the quantity's unit). */
  relativeHalfWidth: JsonNumber;
  threshold: JsonNumber;
  scale: JsonNumber;
  models: Record<
    string,
    { deviation: JsonNumber; maxDeviation: JsonNumber; normalizedDeviation: JsonNumber; adequate: boolean }
  >;
}

export interface ContinuumSections {
  /** Integral quantities each continuum model predicts: {MODEL: {`walls.bottom.shearStress`: value, …}}. */
  continuum?: Record<string, Record<string, JsonNumber>>;
  /** Per compared quantity or profile: which model is good enough, and the numbers behind it (report/verdict.ts). */
  verdict?: Record<string, VerdictJson>;
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
    bestModel: v.bestModel,
    deviation: jsonNumber(v.deviation),
    text: v.text,
    category: v.category,
    kind: v.kind,
    relativeHalfWidth: jsonNumber(v.relativeHalfWidth),
    threshold: jsonNumber(v.threshold),
    scale: jsonNumber(v.scale),
    models: Object.fromEntries(
      v.models.map((d) => [
        d.model,
        {
          deviation: jsonNumber(d.deviation),
          maxDeviation: jsonNumber(d.maxDeviation),
          normalizedDeviation: jsonNumber(d.normalizedDeviation),
          adequate: d.adequate,
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
  return {
    continuum,
    verdict: Object.fromEntries(Object.entries(c.verdict).map(([k, v]) => [k, verdictJson(v)])),
    continuumModels: {
      problem: p.problem,
      description: p.description,
      meanFreePath: { kind: p.meanFreePath.kind, value: jsonNumber(p.meanFreePath.valueM) },
      knudsen: jsonNumber(p.knudsen),
      models: { ...p.models } as Record<string, string>,
    },
  };
}
