/**
 * One pseudo-time step of the steady vorticity transport equation
 *
 *     R(ω) = (1/Re) ∇²ω − u ∂ω/∂x − v ∂ω/∂y = 0,   u = ∂ψ/∂y, v = −∂ψ/∂x
 *
 * (dimensionless: lengths in cavity sides, velocities in lid speeds), by approximate factorization in delta form
 * (Beam & Warming 1978; the alternating-direction idea of Peaceman & Rachford 1955):
 *
 *     (I − Δt Lx)(I − Δt Ly) δω = Δt R(ω),   ω ← ω + δω.
 *
 * R is the fourth-order compact residual (compactVorticity.ts); Lx, Ly are the same operators with first-order
 * upwind convection and, along each line, the diffusion 1/Re + Re·u²h²/12 (x) or 1/Re + Re·v²h²/12 (y). Why this
 * mix (deferred correction, Khosla & Rubin 1974): the upwind implicit operator gives diagonally dominant tridiagonal
 * systems at any cell Reynolds number (Re·h = 7.8 at Re = 1000 on 129², where central implicit operators are not),
 * so large pseudo-time steps are stable; at the steady state δω = 0 and only R remains, so the converged solution
 * has R's accuracy and does not depend on Δt. The extra diffusion Re·u²h²/12 is the largest term the compact scheme
 * adds (from −2u ω_xxx with ω_xxx ≈ Re·u ω_xx); without it in the implicit operator the iteration diverged at
 * Re = 1000 on 33² (cell Reynolds number 31; measured), with it that case converges.
 *
 * Arrays are n × n, index i + n·j (i along x). Only interior ω changes; wall ω is set by wallVorticity.ts.
 */

/** Scratch for adiStep, allocated once per solve. */
export interface AdiScratch {
  /** right-hand side, then δω after both sweeps (n × n) */
  readonly delta: Float64Array;
  /** Thomas algorithm: modified upper coefficients and right-hand sides of one line (n) */
  readonly cp: Float64Array;
  readonly dp: Float64Array;
}

/** Scratch for an n × n grid (n: points per side, including the walls). */
export function createAdiScratch(n: number): AdiScratch {
  return { delta: new Float64Array(n * n), cp: new Float64Array(n), dp: new Float64Array(n) };
}

/**
 * One factorized pseudo-time step of size dt (lid-passage times), updating interior ω in place. On entry s.delta
 * holds Δt·R(ω) at interior points (compactVorticityResidual with this dt); u and v the interior velocities of the
 * current ψ (lid speeds). s.delta is overwritten.
 */
export function adiStep(
  n: number,
  reynolds: number,
  dt: number,
  omega: Float64Array,
  u: Float64Array,
  v: Float64Array,
  s: AdiScratch,
): void {
  const d = s.delta;
  const invH = n - 1;
  const diffusion = (dt * invH * invH) / reynolds; // Δt/(Re h²)
  const compact = (dt * reynolds) / 12; // Δt·(Re h²/12)/h² per unit speed²
  const cp = s.cp;
  const dp = s.dp;
  // x sweep: one tridiagonal system per interior row, δ = 0 at the walls.
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    let cPrev = 0;
    let dPrev = 0;
    for (let i = 1; i < n - 1; i++) {
      const k = row + i;
      const speed = u[k];
      const c = dt * invH * speed;
      const dk = diffusion + compact * speed * speed;
      const lower = -(dk + (c > 0 ? c : 0));
      const upper = -(dk + (c < 0 ? -c : 0));
      const diag = 1 + 2 * dk + (c > 0 ? c : -c);
      const m = 1 / (diag - lower * cPrev);
      cPrev = upper * m;
      dPrev = (d[k] - lower * dPrev) * m;
      cp[i] = cPrev;
      dp[i] = dPrev;
    }
    let next = 0;
    for (let i = n - 2; i >= 1; i--) {
      next = dp[i] - cp[i] * next;
      d[row + i] = next;
    }
  }
  // y sweep: one system per interior column, then the update.
  for (let i = 1; i < n - 1; i++) {
    let cPrev = 0;
    let dPrev = 0;
    for (let j = 1; j < n - 1; j++) {
      const k = j * n + i;
      const speed = v[k];
      const c = dt * invH * speed;
      const dk = diffusion + compact * speed * speed;
      const lower = -(dk + (c > 0 ? c : 0));
      const upper = -(dk + (c < 0 ? -c : 0));
      const diag = 1 + 2 * dk + (c > 0 ? c : -c);
      const m = 1 / (diag - lower * cPrev);
      cPrev = upper * m;
      dPrev = (d[k] - lower * dPrev) * m;
      cp[j] = cPrev;
      dp[j] = dPrev;
    }
    let next = 0;
    for (let j = n - 2; j >= 1; j--) {
      next = dp[j] - cp[j] * next;
      omega[j * n + i] += next;
    }
  }
}
