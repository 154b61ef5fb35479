/**
 * Multigrid V-cycles for the stream function of the cavity: −∇²ψ = f on the unit square with ψ = 0 on all four
 * sides (every wall is a streamline, with or without slip), second-order 5-point Laplacian on a uniform n × n grid.
 * The fourth-order compact stream-function equation is reached through f (compactStream.ts: deferred correction).
 *
 * Why multigrid: the vorticity iteration (vorticityAdi.ts) needs a fresh ψ every pseudo-time step; one V-cycle,
 * warm-started from the previous ψ, costs about ten grid sweeps and cuts the error by roughly a factor of ten
 * whatever the grid size, where a tuned SOR sweep gains only O(h) per sweep (Briggs, Henson & McCormick 2000,
 * "A Multigrid Tutorial", ch. 3–4: red–black Gauss–Seidel smoothing, full-weighting restriction, bilinear
 * prolongation — the standard components used here).
 *
 * Levels halve the number of intervals while it is even; the coarsest level is solved by red–black SOR with the
 * optimal factor 2/(1 + sin πh) (Young 1954), exactly when it has a single interior point. Grids with n − 1 a power
 * of two (17, 33, 65, 129, 257) coarsen down to 3 × 3 and run fastest; other sizes still work, with more SOR sweeps.
 *
 * Layout of every array: index i + n·j, i along x (fastest), j along y; boundary entries are kept at zero.
 */

/** One grid level: solution (or correction) u, right-hand side f, residual r, all n × n. */
interface Level {
  readonly n: number;
  /** grid spacing, in units of the cavity side */
  readonly h: number;
  readonly u: Float64Array;
  readonly f: Float64Array;
  readonly r: Float64Array;
}

/** Scratch for V-cycles on an n × n grid; allocated once per solve (no allocation inside a cycle). */
export interface PoissonMultigrid {
  readonly levels: readonly Level[];
}

const PRE_SMOOTH = 2;
const POST_SMOOTH = 2;

/** Builds the level hierarchy for an n × n grid (n ≥ 3 points per side). */
export function createPoissonMultigrid(n: number): PoissonMultigrid {
  const levels: Level[] = [];
  let m = n;
  for (;;) {
    // Level 0 works on the caller's psi and rhs (vCycle), so it needs only a residual array.
    const own = levels.length === 0 ? 0 : m * m;
    levels.push({
      n: m,
      h: 1 / (m - 1),
      u: new Float64Array(own),
      f: new Float64Array(own),
      r: new Float64Array(m * m),
    });
    if ((m - 1) % 2 !== 0 || m <= 3) break;
    m = (m - 1) / 2 + 1;
  }
  return { levels };
}

/**
 * One V-cycle for −∇²ψ = rhs, improving `psi` in place (dimensionless: ψ in lid speed × side, rhs like ω in lid speed
 * per side). Boundary values of psi must be zero and stay so. Returns nothing; compactStream.ts measures the residual of the equation solved.
 */
export function vCycle(mg: PoissonMultigrid, psi: Float64Array, rhs: Float64Array): void {
  cycle(mg.levels, 0, psi, rhs);
}

function cycle(levels: readonly Level[], l: number, u: Float64Array, f: Float64Array): void {
  const level = levels[l];
  if (l === levels.length - 1) {
    solveCoarsest(level.n, level.h, u, f);
    return;
  }
  for (let s = 0; s < PRE_SMOOTH; s++) redBlackSweep(level.n, level.h, u, f, 1);
  residual(level.n, level.h, u, f, level.r);
  const coarse = levels[l + 1];
  restrict(level.n, level.r, coarse.n, coarse.f);
  coarse.u.fill(0);
  cycle(levels, l + 1, coarse.u, coarse.f);
  prolongAdd(coarse.n, coarse.u, level.n, u);
  for (let s = 0; s < POST_SMOOTH; s++) redBlackSweep(level.n, level.h, u, f, 1);
}

/** Red then black Gauss–Seidel points, over-relaxed by `relax` (1 = plain Gauss–Seidel, the smoother). */
function redBlackSweep(n: number, h: number, u: Float64Array, f: Float64Array, relax: number): void {
  const h2 = h * h;
  for (let colour = 0; colour < 2; colour++) {
    for (let j = 1; j < n - 1; j++) {
      const row = j * n;
      for (let i = 1 + ((j + colour + 1) & 1); i < n - 1; i += 2) {
        const k = row + i;
        const gs = 0.25 * (u[k - 1] + u[k + 1] + u[k - n] + u[k + n] + h2 * f[k]);
        u[k] += relax * (gs - u[k]);
      }
    }
  }
}

function solveCoarsest(n: number, h: number, u: Float64Array, f: Float64Array): void {
  if (n === 3) {
    u[4] = 0.25 * h * h * f[4];
    return;
  }
  // Optimal SOR: the error falls by about (1 − 2πh) per sweep, so 2n sweeps gain roughly five decades.
  const relax = 2 / (1 + Math.sin(Math.PI * h));
  for (let s = 0; s < 2 * n; s++) redBlackSweep(n, h, u, f, relax);
}

/** r = f − (−∇²u) at interior points. */
function residual(n: number, h: number, u: Float64Array, f: Float64Array, r: Float64Array): void {
  const inv = 1 / (h * h);
  for (let j = 1; j < n - 1; j++) {
    const row = j * n;
    for (let i = 1; i < n - 1; i++) {
      const k = row + i;
      r[k] = f[k] - (4 * u[k] - u[k - 1] - u[k + 1] - u[k - n] - u[k + n]) * inv;
    }
  }
}

/** Full weighting (1 2 1; 2 4 2; 1 2 1)/16 of fine interior residuals onto coarse interior points. */
function restrict(nf: number, r: Float64Array, nc: number, fc: Float64Array): void {
  for (let J = 1; J < nc - 1; J++) {
    for (let I = 1; I < nc - 1; I++) {
      const k = 2 * J * nf + 2 * I;
      fc[J * nc + I] =
        (4 * r[k] +
          2 * (r[k - 1] + r[k + 1] + r[k - nf] + r[k + nf]) +
          r[k - nf - 1] +
          r[k - nf + 1] +
          r[k + nf - 1] +
          r[k + nf + 1]) /
        16;
    }
  }
}

/** Bilinear interpolation of the coarse correction, added to the fine solution at interior points. */
function prolongAdd(nc: number, uc: Float64Array, nf: number, uf: Float64Array): void {
  for (let j = 1; j < nf - 1; j++) {
    const J = j >> 1;
    const oddJ = j & 1;
    for (let i = 1; i < nf - 1; i++) {
      const I = i >> 1;
      const c = J * nc + I;
      let v: number;
      if (i & 1) v = oddJ ? 0.25 * (uc[c] + uc[c + 1] + uc[c + nc] + uc[c + nc + 1]) : 0.5 * (uc[c] + uc[c + 1]);
      else v = oddJ ? 0.5 * (uc[c] + uc[c + nc]) : uc[c];
      uf[j * nf + i] += v;
    }
  }
}
