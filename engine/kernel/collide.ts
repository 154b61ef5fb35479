/**
 * Binary collisions by Bird's no-time-counter (NTC) scheme with sub-cell partner selection.
 *
 * Per cell and step, N_sel = ½ N (N−1) F_N (σ_T c_r)_max Δt / V_c candidate pairs (Bird 1994, eq. 11.3 in its
 * N(N−1) form, from memory); a pair collides with probability σ_T c_r / (σ_T c_r)_max. The fractional part of N_sel is
 * carried to the next step so the mean rate is exact. The first particle is drawn from the whole cell, the second
 * from its sub-cell when that holds another particle (else from the cell), which keeps the mean collision
 * separation a small fraction of the cell size (Bird 1994, §11.1); the separation is summed for the report.
 *
 * Cross-section: σ_T c_r = C · c_r^(2−2ω) (VHS/VSS; C from sigmaCrCoefficient). Scattering: isotropic for HS and
 * VHS; VSS deflection cos χ = 2 R^(1/α) − 1 (Koura & Matsumoto 1991, Phys. Fluids A 3:2459; Bird 1994 eq. 2.22 for
 * the post-collision relative velocity). Rotational energy: Larsen–Borgnakke (Borgnakke & Larsen 1975, J. Comput.
 * Phys. 18:405) applied to each partner with probability 1/Z_rot; the share of the pooled energy E_c that stays in
 * relative translation is a Beta(5/2 − ω, ζ/2) deviate (Bird 1994, §5.3, VHS form).
 */
import { uniform, betaDeviate } from '../particles/rng';
import type { SimState } from './state';

export function collideParticles(st: SimState): void {
  const order = st.order;
  const start = st.keyStart;
  const key = st.key;
  const x = st.x;
  const y = st.y;
  const vx = st.vx;
  const vy = st.vy;
  const vz = st.vz;
  const erot = st.erot;
  const maxArr = st.sigmaCrMax;
  const rem = st.collisionRemainder;
  const rng = st.rng;
  const subcells = st.subcellsPerCell;
  const cells = st.cells;
  const coefSel = (0.5 * st.moleculesPerParticle * st.timeStep) / st.cellVolume;
  const coefSigma = st.sigmaCrCoefficient;
  const omega = st.viscosityIndex;
  const hardSphereLike = omega === 0.5;
  const crExponentHalf = 1 - omega; // σc = C (c_r²)^(1−ω)
  const alpha = st.scatteringExponent;
  const isotropic = alpha === 1;
  const invAlpha = 1 / alpha;
  const rotational = st.rotationalDof > 0;
  const relaxProbability = 1 / st.rotationalCollisionNumber;
  const lbTranslational = 2.5 - omega;
  const lbRotational = 0.5 * st.rotationalDof;
  const quarterMass = 0.25 * st.massKg;
  let collisions = 0;
  let candidates = 0;
  let separation = 0;

  for (let c = 0; c < cells; c++) {
    const first = start[c * subcells];
    const nCell = start[(c + 1) * subcells] - first;
    if (nCell < 2) continue;
    let sigmaCrMax = maxArr[c];
    const selected = coefSel * nCell * (nCell - 1) * sigmaCrMax + rem[c];
    const pairs = Math.floor(selected);
    rem[c] = selected - pairs;
    candidates += pairs;
    for (let p = 0; p < pairs; p++) {
      const pi = first + ((uniform(rng) * nCell) | 0);
      const i = order[pi];
      const ki = key[i];
      const s0 = start[ki];
      const nSub = start[ki + 1] - s0;
      let pj: number;
      if (nSub > 1) {
        pj = s0 + ((uniform(rng) * (nSub - 1)) | 0);
      } else {
        pj = first + ((uniform(rng) * (nCell - 1)) | 0);
      }
      if (pj >= pi) pj++;
      const j = order[pj];
      let crx = vx[i] - vx[j];
      let cry = vy[i] - vy[j];
      let crz = vz[i] - vz[j];
      const cr2 = crx * crx + cry * cry + crz * crz;
      const sigmaCr = hardSphereLike ? coefSigma * Math.sqrt(cr2) : coefSigma * Math.pow(cr2, crExponentHalf);
      if (sigmaCr > sigmaCrMax) {
        sigmaCrMax = sigmaCr;
        maxArr[c] = sigmaCr;
      }
      if (uniform(rng) * sigmaCrMax >= sigmaCr) continue;

      collisions++;
      const sepX = x[i] - x[j];
      const sepY = y[i] - y[j];
      separation += Math.sqrt(sepX * sepX + sepY * sepY);
      const cmx = 0.5 * (vx[i] + vx[j]);
      const cmy = 0.5 * (vy[i] + vy[j]);
      const cmz = 0.5 * (vz[i] + vz[j]);
      let cr = Math.sqrt(cr2);

      if (rotational) {
        // Relative translational energy ½ m_r c_r² with m_r = m/2.
        let etr = quarterMass * cr2;
        let changed = false;
        if (uniform(rng) < relaxProbability) {
          const pool = etr + erot[i];
          etr = pool * betaDeviate(rng, lbTranslational, lbRotational);
          erot[i] = pool - etr;
          changed = true;
        }
        if (uniform(rng) < relaxProbability) {
          const pool = etr + erot[j];
          etr = pool * betaDeviate(rng, lbTranslational, lbRotational);
          erot[j] = pool - etr;
          changed = true;
        }
        if (changed) {
          const crNew = Math.sqrt(etr / quarterMass);
          const scale = cr > 0 ? crNew / cr : 0;
          crx *= scale;
          cry *= scale;
          crz *= scale;
          cr = crNew;
        }
      }

      let nx: number;
      let ny: number;
      let nz: number;
      if (isotropic) {
        const cosChi = 2 * uniform(rng) - 1;
        const sinChi = Math.sqrt(1 - cosChi * cosChi);
        const eps = 2 * Math.PI * uniform(rng);
        nx = cr * cosChi;
        ny = cr * sinChi * Math.cos(eps);
        nz = cr * sinChi * Math.sin(eps);
      } else {
        const cosChi = 2 * Math.pow(uniform(rng), invAlpha) - 1;
        const sinChi = Math.sqrt(1 - cosChi * cosChi);
        const eps = 2 * Math.PI * uniform(rng);
        const cosEps = Math.cos(eps);
        const sinEps = Math.sin(eps);
        const perp = Math.sqrt(cry * cry + crz * crz);
        if (perp > 1e-12 * cr) {
          nx = cosChi * crx + sinChi * sinEps * perp;
          ny = cosChi * cry + (sinChi * (cr * crz * cosEps - crx * cry * sinEps)) / perp;
          nz = cosChi * crz - (sinChi * (cr * cry * cosEps + crx * crz * sinEps)) / perp;
        } else {
          // Relative velocity along x: any perpendicular basis will do.
          nx = cosChi * crx;
          ny = cr * sinChi * cosEps;
          nz = cr * sinChi * sinEps;
        }
      }
      vx[i] = cmx + 0.5 * nx;
      vy[i] = cmy + 0.5 * ny;
      vz[i] = cmz + 0.5 * nz;
      vx[j] = cmx - 0.5 * nx;
      vy[j] = cmy - 0.5 * ny;
      vz[j] = cmz - 0.5 * nz;
    }
  }
  st.collisionCount += collisions;
  st.candidateCount += candidates;
  st.separationSum += separation;
}
