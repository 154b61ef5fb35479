/**
 * Steady incompressible Navier–Stokes flow in the lid-driven unit square cavity (lid y = 1 moving in +x at speed 1),
 * in stream function–vorticity form on a uniform n × n grid, all quantities dimensionless (lengths in sides,
 * velocities in lid speeds, Reynolds number Re = U·L/ν):
 *
 *     −∇²ψ = ω,   (1/Re)∇²ω − u ∂ω/∂x − v ∂ω/∂y = 0,   u = ∂ψ/∂y, v = −∂ψ/∂x,   ψ = 0 on the walls.
 *
 * Why stream function–vorticity and not a projection method: in two dimensions it has two scalar unknowns instead
 * of three, satisfies continuity exactly, needs no pressure boundary condition, and the steady equations can be
 * relaxed in pseudo-time with large implicit steps (a projection method is tied to a time-accurate march with its
 * viscous and convective step limits, thousands of pressure solves at Re = 1000). The price is the wall vorticity,
 * which has no boundary condition of its own: it comes from ψ by Jensen's formula (wallVorticity.ts), lagged by one
 * step and under-relaxed.
 *
 * Each pseudo-time step: velocities from ψ and ω → one factorized implicit vorticity step (vorticityAdi.ts) → one
 * multigrid V-cycle for ψ (poissonMultigrid.ts) → wall vorticity from the new ψ. The converged answer solves the
 * fourth-order compact equations on the 3 × 3 stencil (compactVorticity.ts, compactStream.ts) with the second-order
 * wall vorticity; the implicit upwind operator and the 5-point multigrid only shape the path (deferred correction).
 * Why not second-order central differences, which this solver used first: they converge at second order, but at
 * Re = 1000 on 129² their centreline extrema are 3.3 % weak (u_min −0.3756 against −0.38857 of Botella & Peyret
 * 1998); the compact scheme gives −0.3883 there and converges at about fourth order (tests/validation/cavity.test.ts).
 *
 * Residual (documented, reported): every ten steps, the larger of
 *   max |R(ω)|·Re·h²/4   and   max |R(ψ)|·h²/4   over interior points,
 * with R(ω), R(ψ) the residuals of the compact vorticity and stream-function equations (R(ψ) in lid speeds per side),
 * i.e. about the largest change one point-Jacobi update of the discrete steady equations would still make, to ω (lid
 * speeds per side) and to ψ (lid speed × side). It is scaled so that the round-off floor stays below 1e-13 on fine
 * grids (1e-13 reached at Re = 1, 100 and 1000 on 129², 1e-14 not; measured); the default tolerance is 1e-10. If it
 * grows a thousandfold over the best value seen (or stops being finite), the run backs up to the state of that best
 * value and halves the pseudo-time step, at most six times.
 *
 * Range (measured): converges from Re = 0.01 to 1000 on 9² to 129² (also on 257² at Re = 100 and 1000, and with
 * slip at Re = 1000 on 129²) and at Re = 2000 on 129²; Re = 1000 on 129² takes about 1600 steps, 5–10 s on one core.
 */
import { resolveCavityOptions, type CavityOptions, type CavitySlipModel } from './cavityOptions';
import { createPoissonMultigrid, vCycle } from './poissonMultigrid';
import { adiStep, createAdiScratch } from './vorticityAdi';
import { compactVelocities, compactVorticityResidual } from './compactVorticity';
import { compactStreamResidualMax, compactStreamRhs } from './compactStream';
import { setWallVelocities, setWallVorticity, slipLength } from './wallVorticity';
import { extractCenterlines, type CavityCenterlines } from './centerlines';

/** Weight of the new wall vorticity per step: 0.2 was stable from Re = 1 to 1000 on 17² to 129² (measured). */
const WALL_RELAXATION = 0.2;
/** Pseudo-time steps between residual checks (a check costs about one grid sweep). */
const CHECK_EVERY = 10;
/** Growth of the residual over its best value that counts as divergence. */
const DIVERGENCE_FACTOR = 1e3;
const MAX_HALVINGS = 6;

export interface CavityResult {
  readonly reynolds: number;
  /** points per side */
  readonly grid: number;
  /** wall condition; slipLength = ((2 − σ)/σ)·Kn in sides (0 for no-slip) */
  readonly slip: {
    readonly model: CavitySlipModel;
    readonly knudsen: number;
    readonly accommodation: number;
    readonly slipLength: number;
  };
  /** n × n fields, index i + n·j (x = i/(n−1), y = j/(n−1)): velocity (lid speeds), ψ (lid speed × side), ω (lid speed/side) */
  readonly u: Float64Array;
  readonly v: Float64Array;
  readonly psi: Float64Array;
  readonly omega: Float64Array;
  /** pseudo-time steps taken, including any that were backed out of after a divergence */
  readonly iterations: number;
  /** the residual defined above, at the returned state */
  readonly residual: number;
  readonly converged: boolean;
  /** the pseudo-time step in use at the end (lid-passage times); smaller than requested after a back-up */
  readonly pseudoTimeStep: number;
  readonly centerline: CavityCenterlines;
}

/**
 * Solves the steady cavity flow for `options` (see CavityOptions for units and ranges; invalid options throw a
 * RangeError naming them). Starts from rest with the lid impulsively moving; deterministic.
 */
export function solveCavity(options: CavityOptions): CavityResult {
  const o = resolveCavityOptions(options);
  const n = o.grid;
  const re = o.reynolds;
  const slip = slipLength(o.knudsen, o.accommodation);
  const size = n * n;
  const psi = new Float64Array(size);
  const omega = new Float64Array(size);
  const u = new Float64Array(size);
  const v = new Float64Array(size);
  // State at the best residual so far, restored when a run diverges.
  const savedPsi = new Float64Array(size);
  const savedOmega = new Float64Array(size);
  const mg = createPoissonMultigrid(n);
  const adi = createAdiScratch(n);
  const rhs = new Float64Array(size);

  let dt = o.pseudoTimeStep;
  setWallVorticity(n, psi, omega, slip, 1);
  let residual = steadyResidual(n, re, psi, omega, u, v);
  let best = residual;
  savedPsi.set(psi);
  savedOmega.set(omega);
  let iterations = 0;
  let halvings = 0;
  while (residual > o.tolerance && iterations < o.maxIterations) {
    compactVelocities(n, psi, omega, u, v);
    compactVorticityResidual(n, re, omega, psi, u, v, dt, adi.delta);
    adiStep(n, re, dt, omega, u, v, adi);
    compactStreamRhs(n, psi, omega, rhs);
    vCycle(mg, psi, rhs);
    setWallVorticity(n, psi, omega, slip, WALL_RELAXATION);
    iterations++;
    if (iterations % CHECK_EVERY !== 0 && iterations !== o.maxIterations) continue;
    residual = steadyResidual(n, re, psi, omega, u, v);
    if (residual <= best) {
      // Only a new best is kept: a state saved while the residual climbs may already carry a growing mode.
      best = residual;
      savedPsi.set(psi);
      savedOmega.set(omega);
    }
    if (residual <= DIVERGENCE_FACTOR * best) continue;
    psi.set(savedPsi);
    omega.set(savedOmega);
    residual = steadyResidual(n, re, psi, omega, u, v);
    if (halvings === MAX_HALVINGS) break;
    halvings++;
    dt *= 0.5;
  }

  compactVelocities(n, psi, omega, u, v);
  setWallVelocities(n, omega, u, v, slip);
  return {
    reynolds: re,
    grid: n,
    slip: { model: o.slip, knudsen: o.knudsen, accommodation: o.accommodation, slipLength: slip },
    u,
    v,
    psi,
    omega,
    iterations,
    residual,
    converged: residual <= o.tolerance,
    pseudoTimeStep: dt,
    centerline: extractCenterlines(n, u, v),
  };
}

/** The residual defined in the header, for the current ψ and ω (fills interior u, v as a side effect). */
function steadyResidual(
  n: number,
  re: number,
  psi: Float64Array,
  omega: Float64Array,
  u: Float64Array,
  v: Float64Array,
): number {
  const h2 = 1 / ((n - 1) * (n - 1));
  compactVelocities(n, psi, omega, u, v);
  const rOmega = compactVorticityResidual(n, re, omega, psi, u, v, 0, null) * re * h2 * 0.25;
  const rPsi = compactStreamResidualMax(n, psi, omega) * h2 * 0.25;
  // NaN compares false everywhere: report it as NaN so callers see a broken state.
  return rOmega >= rPsi ? rOmega : rPsi >= rOmega ? rPsi : NaN;
}
