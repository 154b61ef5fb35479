/**
 * Continuum predictions for the lid-driven cavity (caseModels.ts, preset engine/case/cavityPreset.ts): the
 * incompressible Navier–Stokes solution of cavity/solveCavity.ts, no-slip and first-order Maxwell slip, at the
 * Reynolds number Re = ρUL/μ and Knudsen number λ/L of the DSMC reference state (plan.reference: ρ, μ and the
 * viscosity-based λ at the initial pressure and temperature), U the lid speed and L the side.
 *
 * Compared along the two centrelines, as Ghia, Ghia & Shin (1982) tabulate them: u along the vertical centreline
 * x = L/2 and v along the horizontal centreline y = L/2, at the DSMC cell centres (the solver's centreline
 * interpolated linearly; cavity/centerlines.ts). Both are divided by the lid speed for the relative deviation.
 * A lid moving towards −x is the mirror image x → L − x of one moving towards +x: u on x = L/2 keeps the lid's
 * sign, v(x) = |U|·ṽ(1 − x/L).
 */
import type { Plan } from '../plan/plan';
import { solveCavity, type CavityResult } from './cavity/solveCavity';
import { interpolateLine } from './cavity/centerlines';
import type { ContinuumModelName, PredictedProfile } from './caseModelTypes';

/**
 * Grid of the continuum solution: 65 points per side up to Re = 400, 129 above (the solver's Ghia comparison is
 * within 0.01 of the lid speed on 129² at Re = 100, and its error falls with the grid; tests/validation/cavity.test.ts).
 */
function gridFor(reynolds: number): number {
  return reynolds <= 400 ? 65 : 129;
}

export interface CavityPredictions {
  readonly profiles: PredictedProfile[];
  readonly reynolds: number;
  /** Models whose solution did not converge are left out, with a note. */
  readonly notes: string[];
}

/**
 * Centreline predictions for a square cavity of side L with the lid (top side) moving along x at lidSpeed (m/s);
 * σ the accommodation of all walls, slipPerViscosityPath the first-order slip coefficient in viscosity λ.
 */
export function cavityPredictions(
  plan: Plan,
  lidSpeedMPerS: number,
  sigma: number,
  slipPerViscosityPath: number,
): CavityPredictions {
  const ref = plan.reference;
  const side = plan.grid.lengthXM;
  const u = Math.abs(lidSpeedMPerS);
  const reynolds = (ref.massDensityKgPerM3 * u * side) / ref.viscosityPaS;
  // The solver's slip length is ((2 − σ)/σ)·Kn sides (Maxwell's coefficient 1 in λ): another first-order coefficient
  // C (in λ) enters as the Knudsen number C·Kn.
  const knudsen = (slipPerViscosityPath * ref.meanFreePathM) / side;
  const grid = gridFor(reynolds);
  const solutions: [ContinuumModelName, CavityResult][] = [
    ['noSlip', solveCavity({ reynolds, grid })],
    ['firstOrder', solveCavity({ reynolds, grid, slip: 'first', knudsen, accommodation: sigma })],
  ];
  const ys = Float64Array.from({ length: plan.grid.cellsY }, (_, r) => (r + 0.5) * plan.grid.cellSizeYM);
  const xs = Float64Array.from({ length: plan.grid.cellsX }, (_, c) => (c + 0.5) * plan.grid.cellSizeXM);
  const uLine: PredictedProfile['values'] = {};
  const vLine: PredictedProfile['values'] = {};
  const notes: string[] = [];
  const sign = Math.sign(lidSpeedMPerS);
  for (const [name, s] of solutions) {
    if (!s.converged) {
      notes.push(
        `${name}: the cavity solution did not converge (residual ${s.residual.toExponential(1)} after ${s.iterations} steps); left out`,
      );
      continue;
    }
    const c = s.centerline;
    uLine[name] = ys.map((y) => lidSpeedMPerS * interpolateLine(c.position, c.u, y / plan.grid.lengthYM));
    vLine[name] = xs.map((x) => u * interpolateLine(c.position, c.v, sign > 0 ? x / side : 1 - x / side));
  }
  const scale = { kind: 'fixed' as const, value: u, what: 'lid speed |U|' };
  return {
    reynolds,
    notes,
    profiles: [
      {
        key: 'centerline.x.velocityX',
        field: 'velocityX',
        unit: 'm/s',
        line: { kind: 'column', atM: side / 2 },
        positionsM: ys,
        values: uLine,
        scale,
      },
      {
        key: 'centerline.y.velocityY',
        field: 'velocityY',
        unit: 'm/s',
        line: { kind: 'row', atM: plan.grid.lengthYM / 2 },
        positionsM: xs,
        values: vLine,
        scale,
      },
    ],
  };
}
