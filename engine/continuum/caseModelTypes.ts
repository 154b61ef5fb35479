/**
 * What the continuum models predict for a DSMC case (caseModels.ts): integral quantities and profiles per model,
 * in the field names and SI units of the DSMC results (engine/results/cellFields.ts, wallQuantities.ts,
 * flowQuantities.ts), so report/verdict.ts can set them side by side.
 */
import type { ViscosityMeanFreePath } from './meanFreePath';

/** The models compared with DSMC, simplest first (report/verdict.ts prefers the simplest adequate one). */
export const CONTINUUM_MODELS = ['noSlip', 'firstOrder', 'secondOrder', 'unified', 'freeMolecular'] as const;
export type ContinuumModelName = (typeof CONTINUUM_MODELS)[number];

/** Plain-language names of the models, for verdict texts. */
export const MODEL_LABELS: { readonly [M in ContinuumModelName]: string } = {
  noSlip: 'no-slip',
  firstOrder: 'first-order slip',
  secondOrder: 'second-order slip',
  unified: 'unified model',
  freeMolecular: 'free-molecular limit',
};

export type CaseProblem =
  | 'couette'
  | 'fourier'
  | 'forceDrivenChannel'
  | 'forceDrivenTube'
  | 'pressureDrivenChannel'
  | 'pressureDrivenTube'
  | 'rectangularDuct'
  | 'cavity';

/**
 * One integral quantity: `key` is its place in the DSMC result (`walls.SIDE.QUANTITY` or `flow.QUANTITY`), unit as
 * there; values per model (a model that does not predict it is absent).
 */
export interface PredictedQuantity {
  readonly key: string;
  readonly unit: string;
  readonly values: Partial<Record<ContinuumModelName, number>>;
}

/**
 * Where a profile's DSMC values are read:
 * - 'rows': the row-averaged profile (SimulationResult.profile at profileY), the profile across a gap or radius;
 * - 'column': the cells of the column(s) at x = atM (two columns averaged when x = atM is a cell boundary), along y;
 * - 'row': the cells of the row(s) at y = atM, along x.
 */
export type ProfileLine =
  | { readonly kind: 'rows' }
  | { readonly kind: 'column'; readonly atM: number }
  | { readonly kind: 'row'; readonly atM: number };

/**
 * The scale a profile's deviations are divided by: a fixed value of the problem (wall speed difference, wall
 * temperature difference, lid speed), or the largest |DSMC value − base| over the profile (e.g. the centre speed of
 * a channel, base 0; the heating of a channel, base the wall temperature).
 */
export type ProfileScale =
  | { readonly kind: 'fixed'; readonly value: number; readonly what: string }
  | { readonly kind: 'dsmcRange'; readonly base: number; readonly what: string };

export interface PredictedProfile {
  /** `profile.FIELD` for 'rows', `centerline.x.FIELD` (column, along y) or `centerline.y.FIELD` (row, along x). */
  readonly key: string;
  /** A CELL_FIELDS name (engine/results/cellFields.ts) and its unit. */
  readonly field: string;
  readonly unit: string;
  readonly line: ProfileLine;
  /** Positions along the line, m (cell centres of the DSMC grid). */
  readonly positionsM: Float64Array;
  readonly values: Partial<Record<ContinuumModelName, Float64Array>>;
  readonly scale: ProfileScale;
}

export interface CaseModels {
  readonly recognised: true;
  readonly problem: CaseProblem;
  readonly description: string;
  /** The reference state's mean free path (plan.reference, viscosity-based) and Knudsen number on lengthScaleM. */
  readonly meanFreePath: { readonly kind: 'viscosity'; readonly valueM: ViscosityMeanFreePath };
  readonly knudsen: number;
  /** What each model present means here (coefficients and their sources). */
  readonly models: Partial<Record<ContinuumModelName, string>>;
  readonly quantities: readonly PredictedQuantity[];
  readonly profiles: readonly PredictedProfile[];
  /**
   * The key (of `quantities` or `profiles`) of the quantity an engineer asks about first: the flow rate of a duct,
   * the wall shear of Couette flow, the heat flux of Fourier conduction, the vertical centreline of the cavity (its
   * no-slip lid force is infinite: the corner singularity, Taylor's scraper, makes the lid shear ∝ 1/r).
   */
  readonly headline: string;
  /** Where each model holds here, in words (caseApplicability.ts). */
  readonly validity: Partial<Record<ContinuumModelName, string>>;
  /** Models whose predictions are given but do not hold for this case, each with the reason (caseApplicability.ts). */
  readonly notApplicable: Partial<Record<ContinuumModelName, string>>;
}

export interface UnrecognisedCase {
  readonly recognised: false;
  /** Why no continuum model is compared, in words a user can act on. */
  readonly reason: string;
}

export type CaseModelsResult = CaseModels | UnrecognisedCase;
