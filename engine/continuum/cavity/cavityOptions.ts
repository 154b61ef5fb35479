/**
 * Options of the lid-driven cavity solver, their defaults and their allowed ranges. Checked once here, so the
 * command line and any other caller report the same limits; the numerical kernels trust what passes.
 */

/** Wall condition on all four walls: no-slip, or first-order Maxwell slip. */
export const CAVITY_SLIP_MODELS = ['none', 'first'] as const;
export type CavitySlipModel = (typeof CAVITY_SLIP_MODELS)[number];

/** Fewest points per side: below 9 the multigrid hierarchy and the centreline extrema have too little to work on. */
export const CAVITY_MIN_GRID = 9;

export interface CavityOptions {
  /** Reynolds number U·L/ν with U the lid speed and L the side (dimensionless), > 0 */
  readonly reynolds: number;
  /** grid points per side, including both walls (whole number ≥ 9; 2^k + 1 runs fastest: 33, 65, 129, 257) */
  readonly grid: number;
  /** wall condition; default 'none' (no-slip) */
  readonly slip?: CavitySlipModel;
  /** Knudsen number λ/L with the viscosity-based mean free path λ = (μ/p)·sqrt(πkT/(2m)); ≥ 0; slip 'first' only */
  readonly knudsen?: number;
  /** tangential momentum accommodation σ of all walls, in (0, 1]; default 1 (diffuse); slip 'first' only */
  readonly accommodation?: number;
  /** stop when the residual (see solveCavity) is at most this; default 1e-10 */
  readonly tolerance?: number;
  /** pseudo-time steps at most; default 20 000 */
  readonly maxIterations?: number;
  /** pseudo-time step in lid-passage times L/U; default min(Re·h/8, 25h), h = 1/(grid − 1) */
  readonly pseudoTimeStep?: number;
}

/** Options with every default filled in. */
export interface ResolvedCavityOptions {
  readonly reynolds: number;
  readonly grid: number;
  readonly slip: CavitySlipModel;
  readonly knudsen: number;
  readonly accommodation: number;
  readonly tolerance: number;
  readonly maxIterations: number;
  readonly pseudoTimeStep: number;
}

/** One invalid option: its name and what is allowed (for messages such as `--grid 5: …` or `grid = 5: …`). */
export interface CavityOptionProblem {
  readonly field: keyof CavityOptions;
  readonly allowed: string;
}

const isPositive = (x: unknown): boolean => typeof x === 'number' && Number.isFinite(x) && x > 0;

/** Every invalid option of `o`, in declaration order; empty when all are valid. */
export function cavityOptionProblems(o: CavityOptions): CavityOptionProblem[] {
  const problems: CavityOptionProblem[] = [];
  if (!isPositive(o.reynolds)) problems.push({ field: 'reynolds', allowed: 'give a number above 0' });
  if (!Number.isInteger(o.grid) || o.grid < CAVITY_MIN_GRID) {
    problems.push({ field: 'grid', allowed: `give a whole number of points per side, at least ${CAVITY_MIN_GRID}` });
  }
  if (o.slip !== undefined && !CAVITY_SLIP_MODELS.includes(o.slip)) {
    problems.push({ field: 'slip', allowed: `give one of ${CAVITY_SLIP_MODELS.join(', ')}` });
  }
  const slip = o.slip ?? 'none';
  if (o.knudsen !== undefined) {
    if (slip !== 'first') problems.push({ field: 'knudsen', allowed: 'only with slip "first"' });
    else if (!(typeof o.knudsen === 'number' && Number.isFinite(o.knudsen) && o.knudsen >= 0)) {
      problems.push({ field: 'knudsen', allowed: 'give a number of at least 0' });
    }
  } else if (slip === 'first') {
    problems.push({ field: 'knudsen', allowed: 'required with slip "first": give a number of at least 0' });
  }
  if (o.accommodation !== undefined) {
    if (slip !== 'first') problems.push({ field: 'accommodation', allowed: 'only with slip "first"' });
    else if (!(typeof o.accommodation === 'number' && o.accommodation > 0 && o.accommodation <= 1)) {
      problems.push({ field: 'accommodation', allowed: 'give a number above 0 and at most 1' });
    }
  }
  if (o.tolerance !== undefined && !isPositive(o.tolerance))
    problems.push({ field: 'tolerance', allowed: 'give a number above 0' });
  if (o.maxIterations !== undefined && !(Number.isInteger(o.maxIterations) && o.maxIterations >= 1)) {
    problems.push({ field: 'maxIterations', allowed: 'give a whole number of at least 1' });
  }
  if (o.pseudoTimeStep !== undefined && !isPositive(o.pseudoTimeStep)) {
    problems.push({ field: 'pseudoTimeStep', allowed: 'give a number above 0' });
  }
  return problems;
}

/**
 * Fills in defaults; throws a RangeError naming every invalid option. The default pseudo-time step is
 * min(Re·h/8, 25h): Re·h/8 is close to the optimal single alternating-direction parameter for the diffusion
 * operator (1/(ν·sqrt(λ_min λ_max)) = Re·h/(4π) for the 5-point Laplacian; Peaceman & Rachford 1955, from
 * memory), and 25h caps the
 * convective Courant number at 25, beyond which the lagged wall vorticity made runs at Re = 400–1000 diverge
 * (measured on 33² to 129²; the solver halves the step and backs up if a run diverges anyway).
 */
export function resolveCavityOptions(o: CavityOptions): ResolvedCavityOptions {
  const problems = cavityOptionProblems(o);
  if (problems.length > 0) {
    const text = problems.map((p) => `${p.field} = ${String(o[p.field])}: ${p.allowed}`).join('; ');
    throw new RangeError(`cavity options: ${text}`);
  }
  const h = 1 / (o.grid - 1);
  const slip = o.slip ?? 'none';
  return {
    reynolds: o.reynolds,
    grid: o.grid,
    slip,
    knudsen: slip === 'first' ? (o.knudsen as number) : 0,
    accommodation: slip === 'first' ? (o.accommodation ?? 1) : 1,
    tolerance: o.tolerance ?? 1e-10,
    maxIterations: o.maxIterations ?? 20_000,
    pseudoTimeStep: o.pseudoTimeStep ?? Math.min((o.reynolds * h) / 8, 25 * h),
  };
}
