/**
 * Fourth-order compact vorticity equation of the cavity on the 3 × 3 stencil: its residual and the velocities it
 * needs, for the deferred-correction iteration of solveCavity.ts (the implicit operator of vorticityAdi.ts stays
 * first-order upwind; only this residual decides the converged answer).
 *
 * Why: second-order central differences are second-order here (ratio of successive differences 3.9 at Re = 1000 on
 * 65², 129², 257², measured), but their error constant leaves the centreline extrema at Re = 1000 3.3 % weak on 129²
 * (cell Reynolds number 7.8). The compact scheme cancels the h² truncation terms using the equation itself: the
 * higher derivatives of ω are rewritten through the transport equation, so every difference fits the 3 × 3 stencil
 * and the points next to a wall need no special treatment (the approach of Spotz & Carey 1995, Int. J. Numer. Meth.
 * Eng. 38:3497, from memory; the terms are derived again here).
 *
 * With δx, δxx the central differences, δx ω = ω_x + (h²/6) ω_xxx and δxx ω = ω_xx + (h²/12) ω_xxxx, so with D = 1/Re
 *
 *     D(δxx + δyy)ω − u δx ω − v δy ω − (h²/12) T = O(h⁴),   T = D(ω_xxxx + ω_yyyy) − 2u ω_xxx − 2v ω_yyy,
 *
 * and T follows from g = D ω_xx − u ω_x = v ω_y − D ω_yy differentiated along x (and its mirror along y):
 * D ω_xxx = g_x + u ω_xx + u_x ω_x, T_x = g_xx − u ω_xxx + 2u_x ω_xx + u_xx ω_x. The velocities in the main terms must
 * be fourth-order too: u = δy ψ + (h²/6)(δy ω + δxx δy ψ), v = −δx ψ − (h²/6)(δx ω + δx δyy ψ), from
 * ψ_yyy = −ω_y − ψ_xxy and ψ_xxx = −ω_x − ψ_xyy. Dimensionless (sides, lid speeds); arrays n × n, index i + n·j.
 * Hot loops: scalars only, no allocation.
 */

/** Fourth-order interior velocities u = ∂ψ/∂y, v = −∂ψ/∂x (lid speeds) from ψ and ω; walls untouched. */
export function compactVelocities(
  n: number,
  psi: Float64Array,
  omega: Float64Array,
  u: Float64Array,
  v: Float64Array,
): void {
  const ih = n - 1;
  const h2 = 1 / (ih * ih);
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    for (let i = 1; i < n - 1; i++) {
      const k = row + i;
      const pN = psi[k + n];
      const pS = psi[k - n];
      const pE = psi[k + 1];
      const pW = psi[k - 1];
      const py = 0.5 * ih * (pN - pS);
      const px = 0.5 * ih * (pE - pW);
      const pxxy =
        0.5 * ih * ih * ih * (psi[k + n + 1] - 2 * pN + psi[k + n - 1] - (psi[k - n + 1] - 2 * pS + psi[k - n - 1]));
      const pxyy =
        0.5 * ih * ih * ih * (psi[k + n + 1] - 2 * pE + psi[k - n + 1] - (psi[k + n - 1] - 2 * pW + psi[k - n - 1]));
      const wy = 0.5 * ih * (omega[k + n] - omega[k - n]);
      const wx = 0.5 * ih * (omega[k + 1] - omega[k - 1]);
      u[k] = py + (h2 / 6) * (wy + pxxy);
      v[k] = -px - (h2 / 6) * (wx + pxyy);
    }
  }
}

/**
 * max |R(ω)| of the compact vorticity equation over interior points (lid speed² per side³), with u, v from
 * compactVelocities of the same ψ and ω. When `out` is given, dt·R is stored there (the factorized step's
 * right-hand side).
 */
export function compactVorticityResidual(
  n: number,
  reynolds: number,
  omega: Float64Array,
  psi: Float64Array,
  u: Float64Array,
  v: Float64Array,
  dt: number,
  out: Float64Array | null,
): number {
  const ih = n - 1;
  const ih2 = ih * ih;
  const ih3 = ih2 * ih;
  const h2over12 = 1 / (12 * ih2);
  const d = 1 / reynolds;
  let max = 0;
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    for (let i = 1; i < n - 1; i++) {
      const k = row + i;
      const wP = omega[k];
      const wE = omega[k + 1];
      const wW = omega[k - 1];
      const wN = omega[k + n];
      const wS = omega[k - n];
      const wNE = omega[k + n + 1];
      const wNW = omega[k + n - 1];
      const wSE = omega[k - n + 1];
      const wSW = omega[k - n - 1];
      const wx = 0.5 * ih * (wE - wW);
      const wy = 0.5 * ih * (wN - wS);
      const wxx = ih2 * (wE - 2 * wP + wW);
      const wyy = ih2 * (wN - 2 * wP + wS);
      const wxy = 0.25 * ih2 * (wNE - wNW - wSE + wSW);
      const wxxy = 0.5 * ih3 * (wNE - 2 * wN + wNW - (wSE - 2 * wS + wSW));
      const wxyy = 0.5 * ih3 * (wNE - 2 * wE + wSE - (wNW - 2 * wW + wSW));
      const wxxyy = ih2 * ih2 * (wNE + wNW + wSE + wSW - 2 * (wN + wS + wE + wW) + 4 * wP);
      const pP = psi[k];
      const pE = psi[k + 1];
      const pW = psi[k - 1];
      const pN = psi[k + n];
      const pS = psi[k - n];
      const pNE = psi[k + n + 1];
      const pNW = psi[k + n - 1];
      const pSE = psi[k - n + 1];
      const pSW = psi[k - n - 1];
      // Velocity derivatives, second order suffices (they enter T, which is multiplied by h²/12).
      const ux = 0.25 * ih2 * (pNE - pNW - pSE + pSW); // ψ_xy
      const uy = ih2 * (pN - 2 * pP + pS); // ψ_yy
      const uxx = 0.5 * ih3 * (pNE - 2 * pN + pNW - (pSE - 2 * pS + pSW)); // ψ_xxy
      const pxyy = 0.5 * ih3 * (pNE - 2 * pE + pSE - (pNW - 2 * pW + pSW));
      const uyy = -wy - uxx; // ψ_yyy = −ω_y − ψ_xxy
      const vx = -ih2 * (pE - 2 * pP + pW); // −ψ_xx
      const vy = -ux;
      const vxx = wx + pxyy; // −ψ_xxx = ω_x + ψ_xyy
      const vyy = -pxyy;
      const uk = u[k];
      const vk = v[k];
      // x part: g = D ω_xx − u ω_x = v ω_y − D ω_yy, differentiated along x.
      const gx = vx * wy + vk * wxy - d * wxyy;
      const gxx = vxx * wy + 2 * vx * wxy + vk * wxxy - d * wxxyy;
      const wxxx = reynolds * (gx + uk * wxx + ux * wx);
      const tx = gxx - uk * wxxx + 2 * ux * wxx + uxx * wx;
      // y part: q = D ω_yy − v ω_y = u ω_x − D ω_xx, differentiated along y.
      const qy = uy * wx + uk * wxy - d * wxxy;
      const qyy = uyy * wx + 2 * uy * wxy + uk * wxyy - d * wxxyy;
      const wyyy = reynolds * (qy + vk * wyy + vy * wy);
      const ty = qyy - vk * wyyy + 2 * vy * wyy + vyy * wy;
      const r = d * (wxx + wyy) - uk * wx - vk * wy - h2over12 * (tx + ty);
      if (out !== null) out[k] = dt * r;
      const a = Math.abs(r);
      // NaN must not read as 0: once a NaN is met it is kept (NaN > x and NaN <= x are both false).
      if (a > max || a !== a) max = a;
    }
  }
  return max;
}
