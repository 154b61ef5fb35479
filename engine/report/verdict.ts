/**
 * Which continuum model is good enough: for each quantity a DSMC run measured and the models predicted
 * (continuum/caseModels.ts), the deviation of every model from DSMC and a plain-language verdict with the numbers
 * behind it. Pure; in report/ beside the comparison that applies it. The thresholds (also in README.md, "Which model is good enough"):
 *
 * - Relative deviation of a model: (model − DSMC)/scale. Integral quantities: scale = |DSMC mean|. Profiles: the
 *   profile's scale (continuum/caseModelTypes.ts ProfileScale: e.g. the wall speed difference of Couette flow, the
 *   centre speed of a channel, the lid speed of a cavity) — a point-wise ratio would blow up where the profile
 *   crosses 0.
 * - DSMC error: the 95 % half-width over the same scale. Profiles use profile-wide measures over the N points where
 *   both DSMC and the model have a value:
 *     deviation = RMS_i of (m_i − d_i)/scale,   max = max_i |m_i − d_i|/scale,
 *     DSMC error = RMS_i of h_i/scale,          normalized = RMS_i of (m_i − d_i)/h_i,
 *   h_i the local 95 % half-width. A model exact but for DSMC noise has an RMS deviation near RMS_i h_i/(1.96·scale),
 *   below the DSMC error, so the rule below does not reject a correct model because of noise.
 * - Adequate: |deviation| ≤ max(DSMC error, tolerance); tolerance 2 % by default (the issue's "user tolerance").
 *   "Within DSMC error": |deviation| ≤ DSMC error.
 * - Best model: the simplest adequate one in the order no-slip, first-order, second-order, unified, free-molecular
 *   (an engineer wants the cheapest model that will do); when none is adequate, the one with the smallest |deviation|.
 * - Kinetic: no model adequate and every continuum model (all but the free-molecular limit) off by more than 10 %:
 *   "continuum models off by more than 10 %: kinetic effects dominate".
 * - Otherwise, no model adequate: "no model within tolerance", naming the closest.
 */
import { CONTINUUM_MODELS, MODEL_LABELS, type ContinuumModelName } from '../continuum/caseModelTypes';

/** The default tolerance: 2 % of the quantity's scale. */
export const DEFAULT_TOLERANCE = 0.02;
/** Continuum models all off by more than this (relative) means kinetic effects dominate. */
export const KINETIC_THRESHOLD = 0.1;

export interface VerdictOptions {
  /** Relative deviation accepted even when the DSMC error bar is smaller; default DEFAULT_TOLERANCE. */
  readonly tolerance?: number;
}

export interface ModelDeviation {
  readonly model: ContinuumModelName;
  /** (model − DSMC)/scale for an integral quantity (signed); for a profile the RMS over its points (≥ 0). */
  readonly deviation: number;
  /** Profiles: the largest point-wise |deviation|; integrals: |deviation|. */
  readonly maxDeviation: number;
  /** (model − DSMC)/half-width; profiles: the RMS over the points. NaN without a half-width. */
  readonly normalizedDeviation: number;
  readonly adequate: boolean;
}

export type VerdictCategory = 'withinError' | 'adequate' | 'noneAdequate' | 'kinetic' | 'noData';

export interface QuantityVerdict {
  readonly quantity: string;
  readonly kind: 'integral' | 'profile';
  readonly unit: string;
  /** The scale deviations are divided by, in `unit`. */
  readonly scale: number;
  /** DSMC 95 % half-width over the scale (profiles: RMS over the points); NaN when DSMC gave none. */
  readonly relativeHalfWidth: number;
  /** max(relativeHalfWidth, tolerance): the largest |deviation| that is adequate. */
  readonly threshold: number;
  /** Profile points compared. */
  readonly points: number;
  readonly models: readonly ModelDeviation[];
  readonly bestModel: ContinuumModelName | null;
  /** The best model's deviation (NaN without one). */
  readonly deviation: number;
  readonly category: VerdictCategory;
  readonly text: string;
}

const percent = (x: number): string => {
  const p = Math.abs(100 * x);
  return `${p < 9.95 ? p.toFixed(1) : p.toFixed(0)} %`;
};

function ordered<T>(values: Partial<Record<ContinuumModelName, T>>): [ContinuumModelName, T][] {
  return CONTINUUM_MODELS.filter((m) => values[m] !== undefined).map((m) => [m, values[m] as T]);
}

function joinWords(words: string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/** Category, best model and text from the per-model deviations (rules in the file header). */
function decide(
  quantity: string,
  kind: 'integral' | 'profile',
  unit: string,
  scale: number,
  relativeHalfWidth: number,
  tolerance: number,
  points: number,
  models: ModelDeviation[],
): QuantityVerdict {
  const threshold = Number.isFinite(relativeHalfWidth) ? Math.max(relativeHalfWidth, tolerance) : tolerance;
  const base = { quantity, kind, unit, scale, relativeHalfWidth, threshold, points, models };
  if (models.length === 0) {
    return {
      ...base,
      bestModel: null,
      deviation: NaN,
      category: 'noData',
      text: 'no comparison: DSMC or the models give no value here',
    };
  }
  const rms = kind === 'profile' ? ' RMS' : '';
  const error = Number.isFinite(relativeHalfWidth)
    ? `DSMC ±${percent(relativeHalfWidth)}${rms}`
    : 'DSMC error not available';
  const off = (d: ModelDeviation) =>
    `${MODEL_LABELS[d.model]} off by ${percent(d.deviation)}${rms}${kind === 'profile' ? `, max ${percent(d.maxDeviation)}` : ''}`;
  const best = models.find((d) => d.adequate);
  if (best) {
    const simpler = models.slice(0, models.indexOf(best));
    const label = MODEL_LABELS[best.model];
    let text: string;
    let category: VerdictCategory = 'adequate';
    if (simpler.length === 0) {
      const inside = Number.isFinite(relativeHalfWidth) && Math.abs(best.deviation) <= relativeHalfWidth;
      category = inside ? 'withinError' : 'adequate';
      text = inside
        ? `${label} within DSMC error (deviation ${percent(best.deviation)}${rms}, ${error})`
        : `${label} adequate (deviation ${percent(best.deviation)}${rms}, within the ${percent(tolerance)} tolerance; ${error})`;
    } else {
      const failed = [...simpler].reverse();
      text = `${label} adequate, ${joinWords(failed.map((d) => MODEL_LABELS[d.model]))} not (${failed.map(off).join('; ')}; ${label} ${percent(best.deviation)}${rms}, ${error})`;
    }
    return { ...base, bestModel: best.model, deviation: best.deviation, category, text };
  }
  const closest = models.reduce((a, d) => (Math.abs(d.deviation) < Math.abs(a.deviation) ? d : a));
  const continuum = models.filter((d) => d.model !== 'freeMolecular');
  if (continuum.length > 0 && continuum.every((d) => Math.abs(d.deviation) > KINETIC_THRESHOLD)) {
    return {
      ...base,
      bestModel: closest.model,
      deviation: closest.deviation,
      category: 'kinetic',
      text: `continuum models off by more than ${percent(KINETIC_THRESHOLD)}: kinetic effects dominate (closest: ${off(closest)}; ${error})`,
    };
  }
  return {
    ...base,
    bestModel: closest.model,
    deviation: closest.deviation,
    category: 'noneAdequate',
    text: `no model within tolerance: closest is ${off(closest)} (tolerance ${percent(tolerance)}, ${error})`,
  };
}

/**
 * Verdict on one integral quantity: DSMC {mean, ci95} (ci95 the 95 % half-width, NaN if unknown) against each model's
 * value, all in `unit`. Scale |DSMC mean|.
 */
export function integralVerdict(
  quantity: string,
  unit: string,
  dsmc: { readonly mean: number; readonly ci95: number },
  predictions: Partial<Record<ContinuumModelName, number>>,
  options: VerdictOptions = {},
): QuantityVerdict {
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const scale = Math.abs(dsmc.mean);
  const relativeHalfWidth = dsmc.ci95 / scale;
  const threshold = Number.isFinite(relativeHalfWidth) ? Math.max(relativeHalfWidth, tolerance) : tolerance;
  const usable = Number.isFinite(dsmc.mean) && scale > 0;
  const models: ModelDeviation[] = [];
  if (usable) {
    for (const [model, value] of ordered(predictions)) {
      if (!Number.isFinite(value)) continue;
      const deviation = (value - dsmc.mean) / scale;
      models.push({
        model,
        deviation,
        maxDeviation: Math.abs(deviation),
        normalizedDeviation: (value - dsmc.mean) / dsmc.ci95,
        adequate: Math.abs(deviation) <= threshold,
      });
    }
  }
  return decide(quantity, 'integral', unit, scale, relativeHalfWidth, tolerance, 1, models);
}

/**
 * Verdict on one profile: DSMC means and 95 % half-widths at the profile's points against each model's values at the
 * same points, all in `unit`; `scale` (> 0, same unit) divides the deviations. Profile-wide measures in the file header.
 */
export function profileVerdict(
  quantity: string,
  unit: string,
  dsmcMean: ArrayLike<number>,
  dsmcCi95: ArrayLike<number>,
  scale: number,
  predictions: Partial<Record<ContinuumModelName, ArrayLike<number>>>,
  options: VerdictOptions = {},
): QuantityVerdict {
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const entries = ordered(predictions);
  // Points every model and DSMC have a value at, so all models are judged on the same points.
  const at: number[] = [];
  for (let i = 0; i < dsmcMean.length; i++) {
    if (Number.isFinite(dsmcMean[i]) && entries.every(([, v]) => Number.isFinite(v[i]))) at.push(i);
  }
  const n = at.length;
  let hw2 = 0;
  let hwKnown = 0;
  for (const i of at)
    if (Number.isFinite(dsmcCi95[i]) && dsmcCi95[i] > 0) {
      hw2 += (dsmcCi95[i] / scale) ** 2;
      hwKnown++;
    }
  const relativeHalfWidth = hwKnown === n && n > 0 ? Math.sqrt(hw2 / n) : NaN;
  const threshold = Number.isFinite(relativeHalfWidth) ? Math.max(relativeHalfWidth, tolerance) : tolerance;
  const models: ModelDeviation[] = [];
  if (n >= 2 && scale > 0 && Number.isFinite(scale)) {
    for (const [model, values] of entries) {
      let sum2 = 0;
      let max = 0;
      let z2 = 0;
      for (const i of at) {
        const d = (values[i] - dsmcMean[i]) / scale;
        sum2 += d * d;
        max = Math.max(max, Math.abs(d));
        z2 += ((values[i] - dsmcMean[i]) / dsmcCi95[i]) ** 2;
      }
      const deviation = Math.sqrt(sum2 / n);
      models.push({
        model,
        deviation,
        maxDeviation: max,
        normalizedDeviation: Math.sqrt(z2 / n),
        adequate: deviation <= threshold,
      });
    }
  }
  return decide(quantity, 'profile', unit, scale, relativeHalfWidth, tolerance, models.length ? n : 0, models);
}
