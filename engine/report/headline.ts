/**
 * One answer first: the sentence that opens a run's results (summary.json `verdict.headline`, the command line's run
 * summary, the top of the browser's results). It names the simplest adequate model for the case's headline quantity
 * (continuum/caseModelTypes.ts CaseModels.headline), or says the run cannot decide yet and what would decide it, or
 * that only the kinetic (DSMC) result holds. Built from the quantity's verdict (verdict.ts) alone, so the sentence is
 * reproducible for a fixed seed; the wall-clock time to decide (which is not) is a separate phrase, extraTimeText,
 * added where the run's sampled wall time is known.
 */
import { MODEL_LABELS } from '../continuum/caseModelTypes';
import type { ContinuumComparison } from './comparison';
import { extraSamplingToReach } from './equivalence';
import { groupedReasons, percent, samplingText, type QuantityVerdict } from './verdict';

/** Plain names of the headline quantities (continuum/caseApplicability.ts). */
const QUANTITY_NAMES: Readonly<Record<string, string>> = {
  'flow.massFlowRate': 'the mass flow rate',
  'walls.bottom.shearStress': 'the wall shear stress',
  'walls.bottom.heatFlux': 'the wall heat flux',
  'centerline.x.velocityX': 'the velocity along the vertical centreline',
};

export interface Headline {
  /** The verdict key the sentence is about. */
  readonly quantity: string;
  readonly text: string;
  /** As in the quantity's verdict: what would settle it (0 and 1 when settled). */
  readonly halfWidthToDecide: number;
  readonly samplingFactor: number;
  /** The quantity's DSMC relative half-width now (NaN without a verdict). */
  readonly relativeHalfWidth: number;
}

export function quantityName(key: string): string {
  return QUANTITY_NAMES[key] ?? key;
}

/** The headline of a comparison (see the file header). */
export function verdictHeadline(c: ContinuumComparison): Headline {
  const key = c.predictions.headline;
  const name = quantityName(key);
  const v: QuantityVerdict | undefined = c.verdict[key];
  const settled = {
    quantity: key,
    halfWidthToDecide: 0,
    samplingFactor: 1,
    relativeHalfWidth: v?.relativeHalfWidth ?? NaN,
  };
  if (!v || v.status === 'noData')
    return { ...settled, text: `No verdict on ${name}: the run gave no DSMC value of it to compare.` };
  const tol = `±${percent(v.tolerance)}`;
  const error = Number.isFinite(v.relativeHalfWidth) ? `DSMC ±${percent(v.relativeHalfWidth)}` : 'DSMC error unknown';
  const open = v.models.filter((d) => d.status === 'undecided');
  const needed = Number.isFinite(v.halfWidthToDecide)
    ? `DSMC ±${percent(v.halfWidthToDecide)} would decide (${samplingText(v.samplingFactor)})`
    : samplingText(Infinity);
  const what = {
    quantity: key,
    halfWidthToDecide: v.halfWidthToDecide,
    samplingFactor: v.samplingFactor,
    relativeHalfWidth: v.relativeHalfWidth,
  };
  if (v.status === 'adequate' && v.bestModel) {
    const best = MODEL_LABELS[v.bestModel];
    const simplerOpen = open.filter((d) => v.models.indexOf(d) < v.models.findIndex((m) => m.model === v.bestModel));
    const tail = simplerOpen.length
      ? `; whether ${simplerOpen.map((d) => MODEL_LABELS[d.model]).join(' or ')} would do too is undecided: ${needed}.`
      : '.';
    return {
      ...what,
      text: `For ${name}, ${best} is the simplest adequate model: within ${tol} of DSMC (deviation ${percent(v.deviation)}, ${error})${tail}`,
    };
  }
  if (v.status === 'undecided')
    return {
      ...what,
      text: `This run cannot decide yet which model is adequate for ${name}: ${v.text.replace(/^undecided: /, '')}.`,
    };
  const inapplicable = v.models.filter((d) => d.status === 'notApplicable');
  const na = inapplicable.length ? ` Not applicable here: ${groupedReasons(inapplicable)}.` : '';
  if (v.status === 'notApplicable')
    return {
      ...settled,
      text: `Only the kinetic (DSMC) result holds for ${name}: no continuum model applies here.${na}`,
    };
  return {
    ...settled,
    text: `Only the kinetic (DSMC) result holds for ${name}: every model applicable here is off by more than ${tol} (${error}).${na}`,
  };
}

/**
 * The expected extra wall time to reach the headline's decision, from the run's own error scaling: (factor − 1) times
 * the sampled wall time (error ∝ 1/√samples, equivalence.ts extraSamplingToReach); '' when nothing is left to decide.
 */
export function extraTimeText(h: Headline, sampledSeconds: number): string {
  if (h.samplingFactor <= 1 || !Number.isFinite(h.samplingFactor) || !(sampledSeconds > 0)) return '';
  const s = extraSamplingToReach(h.relativeHalfWidth, h.halfWidthToDecide, sampledSeconds).extraSeconds;
  if (!Number.isFinite(s)) return '';
  const t =
    s < 120 ? `${s.toPrecision(2)} s` : s < 7200 ? `${(s / 60).toPrecision(2)} min` : `${(s / 3600).toPrecision(2)} h`;
  return `Expected time to decide: about ${t} more sampling at this run's speed.`;
}

/** The sampled part of a run's wall time: wall time × sampled steps / all steps (the transient's share left out). */
export function sampledWallSeconds(wallSeconds: number, sampleSteps: number, steps: number): number {
  return steps > 0 ? (wallSeconds * sampleSteps) / steps : NaN;
}
