/**
 * Fully developed no-slip Poiseuille flow in a rectangular duct of height H and width W ≥ H (the classic series
 * solution, e.g. White, Viscous Fluid Flow, §3-3; common closed form):
 *   Q = (H³ W/(12 μ))·(−dp/dx)·[1 − (192 H/(π⁵ W))·Σ_{k odd} tanh(kπW/(2H))/k⁵],
 * and its reduced flow rate in the normalisation of the cross-section issue, ṁ = (H² W/v0)(−dp/dx)·G_P with
 * δ = p H/(μ v0): G_P = (δ/6)·[1 − …], which tends to the planar channel's δ/6 as W/H → ∞.
 */

/** The bracket 1 − (192 H/(π⁵ W)) Σ_{k odd} tanh(kπW/(2H))/k⁵ for an aspect ratio H/W in (0, 1]. */
export function rectangleFlowFactor(heightOverWidth: number): number {
  if (!(heightOverWidth > 0 && heightOverWidth <= 1))
    throw new Error(`aspect ratio H/W = ${heightOverWidth}: must be above 0 and at most 1 (H the smaller side)`);
  let sum = 0;
  // Terms fall like 1/k⁵: 200 odd terms leave less than 1e-12 of the sum.
  for (let k = 1; k < 400; k += 2) sum += Math.tanh((k * Math.PI) / (2 * heightOverWidth)) / k ** 5;
  return 1 - ((192 * heightOverWidth) / Math.PI ** 5) * sum;
}

/** Volume flow per pressure gradient, Q/(−dp/dx), m⁴/(Pa·s): (H³W/(12μ))·factor. */
export function rectangleNoSlipFlowPerGradient(heightM: number, widthM: number, viscosityPaS: number): number {
  const h = Math.min(heightM, widthM);
  const w = Math.max(heightM, widthM);
  return ((h ** 3 * w) / (12 * viscosityPaS)) * rectangleFlowFactor(h / w);
}

/** No-slip reduced flow rate G_P = (δ/6)·factor, δ = pH/(μ v0) on the smaller side H. */
export function rectangleNoSlipReducedFlowRate(rarefaction: number, heightOverWidth: number): number {
  return (rarefaction / 6) * rectangleFlowFactor(heightOverWidth);
}
