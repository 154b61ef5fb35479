/**
 * Fourth-order compact ("Mehrstellen") stream-function equation of the cavity on the 3 × 3 stencil,
 *
 *     −(δxx + δyy)ψ − (h²/6) δxx δyy ψ = ω + (h²/12)(δxx + δyy)ω,
 *
 * from δxx ψ = ψ_xx + (h²/12) ψ_xxxx and ψ_xxxx + ψ_yyyy = −∇²ω − 2ψ_xxyy (Collatz 1960, from memory). Why it is
 * split this way: the multigrid of poissonMultigrid.ts keeps solving the 5-point equation −(δxx + δyy)ψ = rhs, and
 * the rest goes to the right-hand side from the current ψ (deferred correction), so the fourth-order equation needs
 * no new solver. Dimensionless (ψ in lid speed × side, ω in lid speeds per side); arrays n × n, index i + n·j.
 */

/**
 * Right-hand side for one multigrid cycle on −(δxx + δyy)ψ = rhs that converges to the compact stream-function
 * equation: rhs = ω + (h²/12)(δxx + δyy)ω + (h²/6) δxx δyy ψ, the last term from the current ψ (deferred: its operator is at
 * most a third of the 5-point Laplacian on every Fourier mode, so the fixed point contracts).
 */
export function compactStreamRhs(n: number, psi: Float64Array, omega: Float64Array, rhs: Float64Array): void {
  const ih2 = (n - 1) * (n - 1);
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    for (let i = 1; i < n - 1; i++) {
      const k = row + i;
      const lapW = omega[k + 1] + omega[k - 1] + omega[k + n] + omega[k - n] - 4 * omega[k];
      const crossP =
        psi[k + n + 1] +
        psi[k + n - 1] +
        psi[k - n + 1] +
        psi[k - n - 1] -
        2 * (psi[k + 1] + psi[k - 1] + psi[k + n] + psi[k - n]) +
        4 * psi[k];
      rhs[k] = omega[k] + lapW / 12 + (crossP * ih2) / 6;
    }
  }
}

/** max |residual| of the compact stream-function equation over interior points (lid speed per side). */
export function compactStreamResidualMax(n: number, psi: Float64Array, omega: Float64Array): number {
  const ih2 = (n - 1) * (n - 1);
  let max = 0;
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    for (let i = 1; i < n - 1; i++) {
      const k = row + i;
      const sum4 = psi[k + 1] + psi[k - 1] + psi[k + n] + psi[k - n];
      const lapP = (sum4 - 4 * psi[k]) * ih2;
      const crossP = (psi[k + n + 1] + psi[k + n - 1] + psi[k - n + 1] + psi[k - n - 1] - 2 * sum4 + 4 * psi[k]) * ih2;
      const lapW = omega[k + 1] + omega[k - 1] + omega[k + n] + omega[k - n] - 4 * omega[k];
      const r = Math.abs(-lapP - crossP / 6 - omega[k] - lapW / 12);
      // NaN must not read as 0: once a NaN is met it is kept (NaN > x and NaN <= x are both false).
      if (r > max || r !== r) max = r;
    }
  }
  return max;
}
