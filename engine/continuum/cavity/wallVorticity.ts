/**
 * Wall conditions of the cavity in stream function–vorticity form: wall vorticity and wall velocities, for no-slip
 * walls or first-order Maxwell slip on all four walls.
 *
 * Every wall is a streamline, ψ = 0. Along a wall ψ is constant, so ω_w = −∂²ψ/∂η² there (η: distance into the
 * fluid). Taylor expansions to the first two interior points, ψ_k = k h ψ_η + (k h)²/2 ψ_ηη + (k h)³/6 ψ_ηηη + …,
 * give 8ψ₁ − ψ₂ = 6h ψ_η + 2h² ψ_ηη + O(h⁴): Jensen's second-order formula (Jensen 1959; Roache 1976,
 * "Computational Fluid Dynamics", §3-C; from memory). Why not Thom's one-point formula ω_w = −2(ψ₁ − h ψ_η)/h²:
 * it is first-order in ω_w, and with the fourth-order interior (compactVorticity.ts) it left the centreline extrema
 * at Re = 1000 on 129² 0.5–0.6 % weak where Jensen's leaves 0.06–0.15 % (measured against Botella & Peyret 1998).
 * Briley's third-order formula diverged at Re = 400 on 129² (measured, before the implicit operator carried the
 * compact scheme's diffusion; vorticityAdi.ts) and is not used.
 *
 * Slip (Maxwell 1879, first order): u_s − u_wall = ℓ ∂u_t/∂η with slip length ℓ = ((2−σ)/σ) Kn (cavity sides), Kn
 * the viscosity-based mean free path over the side and σ the tangential momentum accommodation. At a straight wall
 * the normal velocity vanishes along it, so ∂u_t/∂η is ±ω_w, and on each of the four walls ψ_η = −U_wall − ℓ ω_w
 * (signs worked out wall by wall in the comments below). Jensen's formula then closes as
 *
 *     ω_w = −(8ψ₁ − ψ₂ + 6h·U_wall) / (2h (h + 3ℓ)),   U_wall = 1 on the lid, 0 elsewhere,
 *
 * which is the no-slip formula exactly when ℓ = 0. Arrays are n × n, index i + n·j (i along x, j along y).
 */

/**
 * Slip length ℓ = ((2 − σ)/σ) Kn in cavity sides; 0 for no-slip. knudsen: λ/side (viscosity-based λ), ≥ 0;
 * accommodation σ: tangential momentum accommodation, in (0, 1] (σ = 1 diffuse walls).
 */
export function slipLength(knudsen: number, accommodation: number): number {
  return ((2 - accommodation) / accommodation) * knudsen;
}

/**
 * Sets wall vorticity from the current ψ (lid speed per side), blending the new value with weight `relax` in (0, 1]
 * into the old one (under-relaxation damps the lag between wall and interior updates). slip: ℓ in sides.
 * Corner values (never used by the 5-point interior stencils) are the mean of their two wall neighbours.
 */
export function setWallVorticity(n: number, psi: Float64Array, omega: Float64Array, slip: number, relax: number): void {
  const h = 1 / (n - 1);
  const scale = -1 / (2 * h * (h + 3 * slip));
  const lid = 6 * h;
  const top = (n - 1) * n;
  for (let i = 1; i < n - 1; i++) {
    // Bottom, η = y: ψ_η = u_s = ℓ ∂u/∂y = −ℓ ω_w.
    omega[i] += relax * (scale * (8 * psi[n + i] - psi[2 * n + i]) - omega[i]);
    // Lid, η = 1 − y: ψ_η = −u_s with u_s = 1 − ℓ ∂u/∂y = 1 + ℓ ω_w.
    omega[top + i] += relax * (scale * (8 * psi[top - n + i] - psi[top - 2 * n + i] + lid) - omega[top + i]);
  }
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    // Left, η = x: ψ_η = −v_s with v_s = ℓ ∂v/∂x = ℓ ω_w.
    omega[row] += relax * (scale * (8 * psi[row + 1] - psi[row + 2]) - omega[row]);
    // Right, η = 1 − x: ψ_η = v_s with v_s = −ℓ ∂v/∂x = −ℓ ω_w.
    omega[row + n - 1] += relax * (scale * (8 * psi[row + n - 2] - psi[row + n - 3]) - omega[row + n - 1]);
  }
  omega[0] = 0.5 * (omega[1] + omega[n]);
  omega[n - 1] = 0.5 * (omega[n - 2] + omega[2 * n - 1]);
  omega[top] = 0.5 * (omega[top + 1] + omega[top - n]);
  omega[top + n - 1] = 0.5 * (omega[top + n - 2] + omega[top - 1]);
}

/**
 * Wall velocities (lid speeds) from the wall vorticity: tangential slip velocity as derived above, zero normal
 * velocity. The two lid corners, where lid and side walls meet and the velocity is singular, carry the lid speed
 * (the convention of Ghia, Ghia & Shin 1982, whose tables start with u = 1 at y = 1); the bottom corners are at rest.
 */
export function setWallVelocities(
  n: number,
  omega: Float64Array,
  u: Float64Array,
  v: Float64Array,
  slip: number,
): void {
  const top = (n - 1) * n;
  for (let i = 0; i < n; i++) {
    u[i] = -slip * omega[i];
    v[i] = 0;
    u[top + i] = 1 + slip * omega[top + i];
    v[top + i] = 0;
  }
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    u[row] = 0;
    v[row] = slip * omega[row];
    u[row + n - 1] = 0;
    v[row + n - 1] = -slip * omega[row + n - 1];
  }
  u[0] = 0;
  u[n - 1] = 0;
  u[top] = 1;
  u[top + n - 1] = 1;
}
