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

/**
 * First-order slip flow in the rectangle: −∇²φ = 1 on [0, W/H] × [0, 1] (lengths in H, φ = u·μ/(H²·(−dp/dx))) with
 * the Maxwell slip condition φ = s·∂φ/∂n on every wall, s the slip length over H. Solved on one quarter (symmetric
 * about both centrelines) by second-order finite differences on cell centres (a ghost cell carries the slip
 * condition: φ_ghost = φ_0·(s/Δ − 1/2)/(s/Δ + 1/2)), by conjugate gradients (the operator is symmetric positive
 * definite), on two grids combined by Richardson extrapolation. Returns 12⟨φ⟩, the factor of δ/6 in G_P: the
 * no-slip bracket of rectangleFlowFactor when s = 0, and 1 + 6s for the planar channel.
 */
export function rectangleSlipFlowFactor(heightOverWidth: number, slipOverHeight: number, cellsAcrossHalf = 16): number {
  if (!(heightOverWidth > 0 && heightOverWidth <= 1))
    throw new Error(`aspect ratio H/W = ${heightOverWidth}: must be above 0 and at most 1 (H the smaller side)`);
  if (!(slipOverHeight >= 0 && Number.isFinite(slipOverHeight)))
    throw new Error(`slip length / H = ${slipOverHeight}: must be a finite number of 0 or more`);
  const coarse = quarterMean(heightOverWidth, slipOverHeight, cellsAcrossHalf);
  const fine = quarterMean(heightOverWidth, slipOverHeight, 2 * cellsAcrossHalf);
  return 12 * ((4 * fine - coarse) / 3);
}

/**
 * Half the width beyond which the side walls are not felt: their effect decays like e^{−πx/H} (the first mode
 * across the height), below 4e-6 of itself at 4 H. Past it φ is the planar channel's, whose mean is 1/12 + s/2.
 */
const SIDE_WALL_REACH = 4;

/** ⟨φ⟩ over the quarter [0, W/(2H)] × [0, 1/2] with ny cells across its height (square cells). */
function quarterMean(aspect: number, s: number, ny: number): number {
  const halfWidth = 0.5 / aspect;
  if (halfWidth > SIDE_WALL_REACH) {
    const near = quarterMeanOver(SIDE_WALL_REACH, s, ny);
    return (near * SIDE_WALL_REACH + (1 / 12 + s / 2) * (halfWidth - SIDE_WALL_REACH)) / halfWidth;
  }
  return quarterMeanOver(halfWidth, s, ny);
}

/** ⟨φ⟩ over [0, halfWidth] × [0, 1/2]: a wall at x = 0 and y = 0, symmetry at the far sides. */
function quarterMeanOver(halfWidth: number, s: number, ny: number): number {
  const dy = 0.5 / ny;
  const nx = Math.max(1, Math.round(halfWidth / dy));
  const dx = halfWidth / nx;
  const n = nx * ny;
  // Ghost factors: a wall at index −1 (x = 0, y = 0), a symmetry plane beyond the last cell.
  const wallX = s > 0 ? (s / dx - 0.5) / (s / dx + 0.5) : -1;
  const wallY = s > 0 ? (s / dy - 0.5) / (s / dy + 0.5) : -1;
  const ax = 1 / (dx * dx);
  const ay = 1 / (dy * dy);
  const diag = new Float64Array(n);
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) {
      let d = 2 * ax + 2 * ay;
      if (i === 0) d -= ax * wallX;
      if (i === nx - 1) d -= ax; // symmetry: ghost = φ
      if (j === 0) d -= ay * wallY;
      if (j === ny - 1) d -= ay;
      diag[j * nx + i] = d;
    }
  const apply = (v: Float64Array, out: Float64Array) => {
    for (let j = 0; j < ny; j++)
      for (let i = 0; i < nx; i++) {
        const k = j * nx + i;
        let r = diag[k] * v[k];
        if (i > 0) r -= ax * v[k - 1];
        if (i < nx - 1) r -= ax * v[k + 1];
        if (j > 0) r -= ay * v[k - nx];
        if (j < ny - 1) r -= ay * v[k + nx];
        out[k] = r;
      }
  };
  const x = new Float64Array(n);
  const r = new Float64Array(n).fill(1);
  const z = new Float64Array(n);
  const p = new Float64Array(n);
  const q = new Float64Array(n);
  // Jacobi-preconditioned conjugate gradients.
  for (let k = 0; k < n; k++) z[k] = r[k] / diag[k];
  p.set(z);
  let rz = 0;
  for (let k = 0; k < n; k++) rz += r[k] * z[k];
  const r0 = Math.sqrt(n);
  for (let it = 0; it < 20 * (nx + ny) + 200; it++) {
    apply(p, q);
    let pq = 0;
    for (let k = 0; k < n; k++) pq += p[k] * q[k];
    const alpha = rz / pq;
    let rr = 0;
    for (let k = 0; k < n; k++) {
      x[k] += alpha * p[k];
      r[k] -= alpha * q[k];
      rr += r[k] * r[k];
    }
    if (Math.sqrt(rr) < 1e-12 * r0) break;
    let rzNew = 0;
    for (let k = 0; k < n; k++) {
      z[k] = r[k] / diag[k];
      rzNew += r[k] * z[k];
    }
    const beta = rzNew / rz;
    rz = rzNew;
    for (let k = 0; k < n; k++) p[k] = z[k] + beta * p[k];
  }
  let sum = 0;
  for (let k = 0; k < n; k++) sum += x[k];
  return sum / n;
}

/**
 * First-order slip reduced flow rate of the rectangle, G_P = (δ/6)·rectangleSlipFlowFactor(H/W, σ/δ): the slip
 * length is σ·ℓ with ℓ = μ v0/p = H/δ, σ the slip coefficient in ℓ units (continuum/slipCoefficients.ts).
 */
export function rectangleSlipReducedFlowRate(
  rarefaction: number,
  heightOverWidth: number,
  slipCoefficient: number,
): number {
  return (rarefaction / 6) * rectangleSlipFlowFactor(heightOverWidth, slipCoefficient / rarefaction);
}

/**
 * Free-molecular reduced flow rate of a long rectangular duct with diffuse walls, in the normalisation above. In the
 * collisionless gas a molecule at a point, moving across the duct in direction θ, left the wall a distance ℓ(θ) back,
 * and the axial velocity it gained there gives u = (g / (2√π v0))·∫₀^{2π} ℓ(θ) dθ (g the axial acceleration; the
 * linearized free-molecular solution, as in Sharipov 1999, J. Vac. Sci. Technol. A 17:3062), so
 * G_P = ⟨∫ℓ dθ⟩ / (2√π H), ⟨·⟩ the mean over the cross-section. Summing over the chords instead of the points
 * (each chord of length c holds ∫₀^c (s + c − s) ds = c² of it, a Crofton-type identity), with a chord's length
 * a trapezoid in its offset: ∫∫∫ ℓ dθ dA = 2 ∫₀^{π/2} c_max(φ)² (2r(φ)/3 + f(φ)) dφ, where along direction φ the
 * chords rise over r = min(W sin φ, H cos φ), stay at c_max = min(W / cos φ, H / sin φ) over f = |W sin φ − H cos φ|.
 * Checked: the same identity gives a round tube's 8/(3√π).
 */
export function rectangleFreeMolecularReducedFlowRate(heightOverWidth: number): number {
  if (!(heightOverWidth > 0 && heightOverWidth <= 1))
    throw new Error(`aspect ratio H/W = ${heightOverWidth}: must be above 0 and at most 1 (H the smaller side)`);
  const h = 1;
  const w = 1 / heightOverWidth;
  const integrand = (phi: number) => {
    const sin = Math.sin(phi);
    const cos = Math.cos(phi);
    const cMax = Math.min(cos > 0 ? w / cos : Infinity, sin > 0 ? h / sin : Infinity);
    const rise = Math.min(w * sin, h * cos);
    const flat = Math.abs(w * sin - h * cos);
    return cMax * cMax * ((2 * rise) / 3 + flat);
  };
  // The integrand has a kink where c_max changes side (tan φ = H/W): Simpson on each side of it.
  const corner = Math.atan(h / w);
  const simpson = (a: number, b: number, n: number) => {
    const step = (b - a) / n;
    let s = integrand(a) + integrand(b);
    for (let k = 1; k < n; k++) s += (k % 2 ? 4 : 2) * integrand(a + k * step);
    return (s * step) / 3;
  };
  const total = 2 * (simpson(0, corner, 4000) + simpson(corner, Math.PI / 2, 4000));
  return total / (w * h) / (2 * Math.sqrt(Math.PI) * h);
}
