/**
 * Which continuum model is good enough: for each quantity a DSMC run measured and the models predicted
 * (continuum/caseModels.ts), the deviation of every model from DSMC and a verdict by an equivalence test
 * (equivalence.ts: two one-sided tests on the DSMC 95 % interval, Schuirmann 1987), in words and numbers. Pure. The
 * rules (also in README.md, "Which model is good enough"):
 *
 * - Relative deviation of a model: (model − DSMC)/scale. Integral quantities: scale = |DSMC mean|. Profiles: the
 *   profile's scale (continuum/caseModelTypes.ts ProfileScale: e.g. the wall speed difference of Couette flow, the
 *   centre speed of a channel, the lid speed of a cavity) — a point-wise ratio would blow up where the profile
 *   crosses 0. Profiles use the RMS over the N points where DSMC and every model have a value; the DSMC error is the
 *   RMS of the point half-widths h_i/scale.
 * - Per model, with tolerance ε (2 % by default): adequate when the whole 95 % interval of the deviation lies inside
 *   ±ε, not adequate when it lies wholly outside, undecided otherwise (equivalence.ts). A model the case lies outside
 *   of (caseApplicability.ts) is "not applicable here", with the reason, and is not judged.
 * - Per quantity: adequate when some model is adequate — the best model is then the simplest adequate one in the
 *   order no-slip, first-order, second-order, unified, free-molecular (the cheapest that will do); not adequate when
 *   every applicable model is not adequate (only the kinetic, DSMC, result holds); undecided otherwise; not
 *   applicable when no model applies. Noise never reads as agreement: a wide DSMC interval gives "undecided".
 * - Undecided (and "adequate" with a simpler model still undecided): the relative half-width that would decide the
 *   undecided models that matter (the smallest of theirs) and the factor on the sampling so far, (h/h_needed)²
 *   (error ∝ 1/√samples).
 */
import { CONTINUUM_MODELS, MODEL_LABELS, type ContinuumModelName } from '../continuum/caseModelTypes';
import { integralEquivalence, profileEquivalence, type EquivalenceStatus } from './equivalence';

/** The default tolerance: 2 % of the quantity's scale. */
export const DEFAULT_TOLERANCE = 0.02;

export interface VerdictOptions {
  /** Relative deviation a model may have and still be adequate; default DEFAULT_TOLERANCE. */
  readonly tolerance?: number;
}

export type ModelStatus = EquivalenceStatus | 'notApplicable';
export type QuantityStatus = EquivalenceStatus | 'notApplicable' | 'noData';

export interface ModelDeviation {
  readonly model: ContinuumModelName;
  /** (model − DSMC)/scale for an integral quantity (signed); for a profile the RMS over its points (≥ 0). */
  readonly deviation: number;
  /** Profiles: the largest point-wise |deviation|; integrals: |deviation|. */
  readonly maxDeviation: number;
  /** (model − DSMC)/half-width; profiles: the RMS over the points. NaN without a half-width. */
  readonly normalizedDeviation: number;
  /** The 95 % interval of |deviation| (profiles: of the RMS deviation). */
  readonly lowerAbs: number;
  readonly upperAbs: number;
  readonly status: ModelStatus;
  /** Relative half-width that would decide this model (0 when decided; Infinity when none can). */
  readonly halfWidthToDecide: number;
  /** Why the model does not apply here (status notApplicable). */
  readonly reason?: string;
}

export interface QuantityVerdict {
  readonly quantity: string;
  readonly kind: 'integral' | 'profile';
  readonly unit: string;
  /** The scale deviations are divided by, in `unit`. */
  readonly scale: number;
  /** DSMC 95 % half-width over the scale (profiles: RMS over the points); NaN when DSMC gave none. */
  readonly relativeHalfWidth: number;
  readonly tolerance: number;
  /** Profile points compared. */
  readonly points: number;
  readonly models: readonly ModelDeviation[];
  readonly status: QuantityStatus;
  /** The simplest adequate model; null when none is adequate. */
  readonly bestModel: ContinuumModelName | null;
  /** The best model's deviation (NaN without one). */
  readonly deviation: number;
  /** Relative half-width that would settle the verdict (0 when settled; Infinity when no precision can). */
  readonly halfWidthToDecide: number;
  /** Factor on the sampling so far that reaches halfWidthToDecide (1 when settled; Infinity when none can). */
  readonly samplingFactor: number;
  readonly text: string;
}

export const percent = (x: number): string => {
  const p = Math.abs(100 * x);
  return `${p < 9.95 ? p.toFixed(1) : p.toFixed(0)} %`;
};

function ordered<T>(values: Partial<Record<ContinuumModelName, T>>): [ContinuumModelName, T][] {
  return CONTINUUM_MODELS.filter((m) => values[m] !== undefined).map((m) => [m, values[m] as T]);
}

const label = (m: ContinuumModelName) => MODEL_LABELS[m];

function joinWords(words: string[]): string {
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/** "no-slip and first-order slip (reason); unified model (other reason)": models sharing a reason named once. */
export function groupedReasons(models: readonly ModelDeviation[]): string {
  const by = new Map<string, string[]>();
  for (const d of models) by.set(d.reason ?? '', [...(by.get(d.reason ?? '') ?? []), label(d.model)]);
  return [...by].map(([reason, names]) => `${joinWords(names)} (${reason})`).join('; ');
}

/** "about 4× the sampling so far", or that no precision decides. */
export function samplingText(factor: number): string {
  if (!Number.isFinite(factor)) return 'no precision decides (a deviation sits on the tolerance)';
  return `about ${factor < 10 ? factor.toFixed(1) : String(Math.round(factor))} times the sampling so far`;
}

/** Status, best model, what would decide and the text, from the per-model results (rules in the file header). */
function decide(
  base: Omit<QuantityVerdict, 'status' | 'bestModel' | 'deviation' | 'halfWidthToDecide' | 'samplingFactor' | 'text'>,
  difference: (a: ContinuumModelName, b: ContinuumModelName) => number,
): QuantityVerdict {
  const { models, relativeHalfWidth: h, tolerance } = base;
  const nothing = { bestModel: null, deviation: NaN, halfWidthToDecide: 0, samplingFactor: 1 };
  if (models.length === 0)
    return { ...base, ...nothing, status: 'noData', text: 'no comparison: DSMC or the models give no value here' };
  const rms = base.kind === 'profile' ? ' RMS' : '';
  const error = Number.isFinite(h) ? `DSMC ±${percent(h)}${rms}` : 'DSMC error not available';
  const tol = `±${percent(tolerance)}`;
  const off = (d: ModelDeviation) => `${label(d.model)} off by ${percent(d.deviation)}${rms}`;
  const inapplicable = models.filter((d) => d.status === 'notApplicable');
  const na = inapplicable.length ? `; not applicable here: ${groupedReasons(inapplicable)}` : '';
  const applicable = models.filter((d) => d.status !== 'notApplicable');
  if (applicable.length === 0)
    return {
      ...base,
      ...nothing,
      status: 'notApplicable',
      text: `no model applies here: ${groupedReasons(inapplicable)}; only the kinetic (DSMC) result holds`,
    };
  const best = applicable.find((d) => d.status === 'adequate');
  const simpler = best ? applicable.slice(0, applicable.indexOf(best)) : applicable;
  const open = simpler.filter((d) => d.status === 'undecided');
  const needed = open.reduce((a, d) => Math.min(a, d.halfWidthToDecide), Infinity);
  const toDecide = open.length === 0 ? 0 : needed;
  const samplingFactor =
    toDecide === 0 ? 1 : Number.isFinite(toDecide) && Number.isFinite(h) ? Math.max(1, (h / toDecide) ** 2) : Infinity;
  const decideText =
    open.length === 0
      ? ''
      : Number.isFinite(toDecide)
        ? `; DSMC ±${percent(toDecide)}${rms} would decide (${samplingText(samplingFactor)})`
        : `; ${samplingText(Infinity)}`;
  // "Cannot tell A from B" only when A and B differ by more than the tolerance, so that telling them apart matters.
  const cannotTell = (): string => {
    const gap = open.length >= 2 ? difference(open[0].model, open[1].model) : 0;
    if (gap > tolerance)
      return `${error} cannot tell ${label(open[0].model)} from ${label(open[1].model)}, which differ by ${percent(gap)}${rms}`;
    return `${error} cannot tell whether ${label(open[0].model)} (off by ${percent(open[0].deviation)}${rms}) is within ${tol}`;
  };
  const decided = { halfWidthToDecide: toDecide, samplingFactor };
  const failedSimpler = simpler.filter((d) => d.status === 'notAdequate');
  const failedText = failedSimpler.length ? `; not adequate: ${failedSimpler.map(off).join(', ')}` : '';
  if (best) {
    const head = `${label(best.model)} adequate (within ${tol}: deviation ${percent(best.deviation)}${rms}, ${error})`;
    const not = failedText;
    const still = open.length ? `; whether a simpler model would do is undecided: ${cannotTell()}${decideText}` : '';
    return {
      ...base,
      ...decided,
      status: 'adequate',
      bestModel: best.model,
      deviation: best.deviation,
      text: `${head}${not}${still}${na}`,
    };
  }
  if (open.length > 0)
    return {
      ...base,
      ...decided,
      bestModel: null,
      deviation: NaN,
      status: 'undecided',
      text: `undecided: ${cannotTell()} (tolerance ${tol})${decideText}${failedText}${na}`,
    };
  const closest = applicable.reduce((a, d) => (Math.abs(d.deviation) < Math.abs(a.deviation) ? d : a));
  return {
    ...base,
    ...decided,
    bestModel: null,
    deviation: NaN,
    status: 'notAdequate',
    text: `not adequate: every model applicable here is off by more than ${tol} (closest: ${off(closest)}; ${error}); only the kinetic (DSMC) result holds${na}`,
  };
}

/** Models that do not apply here (continuum/caseApplicability.ts), each with its reason. */
export type NotApplicable = Partial<Record<ContinuumModelName, string>>;

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
  notApplicable: NotApplicable = {},
): QuantityVerdict {
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const scale = Math.abs(dsmc.mean);
  const relativeHalfWidth = dsmc.ci95 / scale;
  const models: ModelDeviation[] = [];
  if (Number.isFinite(dsmc.mean) && scale > 0) {
    for (const [model, value] of ordered(predictions)) {
      if (!Number.isFinite(value)) continue;
      const deviation = (value - dsmc.mean) / scale;
      const e = integralEquivalence(deviation, relativeHalfWidth, tolerance);
      const reason = notApplicable[model];
      models.push({
        model,
        deviation,
        maxDeviation: Math.abs(deviation),
        normalizedDeviation: (value - dsmc.mean) / dsmc.ci95,
        lowerAbs: e.lowerAbs,
        upperAbs: e.upperAbs,
        status: reason ? 'notApplicable' : e.status,
        halfWidthToDecide: reason ? 0 : e.halfWidthToDecide,
        ...(reason ? { reason } : {}),
      });
    }
  }
  const difference = (a: ContinuumModelName, b: ContinuumModelName) =>
    Math.abs(predictions[a]! - predictions[b]!) / scale;
  const base = { quantity, kind: 'integral' as const, unit, scale, relativeHalfWidth, tolerance, points: 1, models };
  return decide(base, difference);
}

/**
 * Verdict on one profile: DSMC means and 95 % half-widths at the profile's points against each model's values at the
 * same points, all in `unit`; `scale` (> 0, same unit) divides the deviations.
 */
export function profileVerdict(
  quantity: string,
  unit: string,
  dsmcMean: ArrayLike<number>,
  dsmcCi95: ArrayLike<number>,
  scale: number,
  predictions: Partial<Record<ContinuumModelName, ArrayLike<number>>>,
  options: VerdictOptions = {},
  notApplicable: NotApplicable = {},
): QuantityVerdict {
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  const entries = ordered(predictions);
  // Points every model and DSMC have a value at, so all models are judged on the same points.
  const at: number[] = [];
  for (let i = 0; i < dsmcMean.length; i++) {
    if (Number.isFinite(dsmcMean[i]) && entries.every(([, v]) => Number.isFinite(v[i]))) at.push(i);
  }
  const n = at.length;
  const halfWidths = at.map((i) => dsmcCi95[i] / scale);
  const known = halfWidths.every((x) => Number.isFinite(x) && x > 0);
  const relativeHalfWidth = known && n > 0 ? Math.sqrt(halfWidths.reduce((a, x) => a + x * x, 0) / n) : NaN;
  const models: ModelDeviation[] = [];
  if (n >= 2 && scale > 0 && Number.isFinite(scale)) {
    for (const [model, values] of entries) {
      const d = at.map((i) => (values[i] - dsmcMean[i]) / scale);
      const e = profileEquivalence(d, known ? halfWidths : d.map(() => NaN), tolerance);
      const reason = notApplicable[model];
      let z2 = 0;
      for (const i of at) z2 += ((values[i] - dsmcMean[i]) / dsmcCi95[i]) ** 2;
      models.push({
        model,
        deviation: Math.sqrt(d.reduce((a, x) => a + x * x, 0) / n),
        maxDeviation: d.reduce((a, x) => Math.max(a, Math.abs(x)), 0),
        normalizedDeviation: Math.sqrt(z2 / n),
        lowerAbs: e.lowerAbs,
        upperAbs: e.upperAbs,
        status: reason ? 'notApplicable' : e.status,
        halfWidthToDecide: reason ? 0 : e.halfWidthToDecide,
        ...(reason ? { reason } : {}),
      });
    }
  }
  const difference = (a: ContinuumModelName, b: ContinuumModelName) => {
    const va = predictions[a]!;
    const vb = predictions[b]!;
    return Math.sqrt(at.reduce((s, i) => s + ((va[i] - vb[i]) / scale) ** 2, 0) / n);
  };
  const base = {
    quantity,
    kind: 'profile' as const,
    unit,
    scale,
    relativeHalfWidth,
    tolerance,
    points: models.length ? n : 0,
    models,
  };
  return decide(base, difference);
}
