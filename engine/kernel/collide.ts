/**
 * Binary collisions by Bird's no-time-counter (NTC) scheme with sub-cell partner selection.
 *
 * Per cell and step, N_sel = ½ N (N−1) F_N w_c (σ_T c_r)_max Δt / V_c candidate pairs (Bird 1994, eq. 11.3 in its
 * N(N−1) form, from memory; w_c the cell's particle weight, V_c its gas volume: st.selectionFactor); a pair
 * collides with probability σ_T c_r / (σ_T c_r)_max. The fractional part of N_sel is carried to the next step so the
 * mean rate is exact. The first particle is drawn from the whole cell, the second
 * from its sub-cell when that holds another particle (else from the cell), which keeps the mean collision
 * separation a small fraction of the cell size (Bird 1994, §11.1); the separation is summed for the report.
 *
 * Cross-section: σ_T c_r = C · c_r^(2−2ω) (VHS/VSS; C from sigmaCrCoefficient). Scattering: isotropic for HS and
 * VHS; VSS deflection cos χ = 2 R^(1/α) − 1 (Koura & Matsumoto 1991, Phys. Fluids A 3:2459; Bird 1994 eq. 2.22 for
 * the post-collision relative velocity). Rotational energy: Larsen–Borgnakke (Borgnakke & Larsen 1975, J. Comput.
 * Phys. 18:405) applied to each partner with probability 1/Z_rot; the share of the pooled energy E_c that stays in
 * relative translation is a Beta(5/2 − ω, ζ/2) deviate (Bird 1994, §5.3, VHS form).
 *
 * Hot path: collideParticles is one long function on purpose (the generator inlined at each draw, isotropic
 * scattering written out), about 200 lines; the rarer VSS deflection and Larsen–Borgnakke exchange are in
 * vssDeflection.ts and larsenBorgnakke.ts.
 */
import type { SimState } from './state';
import { sampleCell } from './sampleCells';
import { RAW_CELL_SUMS } from './layout';
import { deflectVss, DEFLECTED } from './vssDeflection';
import { relaxRotation } from './larsenBorgnakke';

/** 2^-32: scales a 32-bit unsigned draw to [0, 1). */
const U32 = 2.3283064365386963e-10;

/**
 * Scratch list of colliding pairs (i, j, i, j, …) whose separations are summed after the pass or when it is full.
 * Positions are not otherwise read by the collision pass, so in the loop each collision waited for two cold cache
 * lines (x and y); summed later in a loop that does nothing else, those misses overlap: 1–3 ns per particle-step
 * faster at 10^5 particles and 4–5 ns at 10^6 (benchmark case, measured alternately in one process). Shared by all
 * simulations of a thread, which is safe because a pass runs to its end without yielding. The additions are the
 * same, in the same order.
 */
const PAIR_LIST_LENGTH = 4096;
const PAIR_LIST = new Int32Array(PAIR_LIST_LENGTH);

/** sum + Σ |r_i − r_j| (m) over the first `length` / 2 pairs of the list, added one by one as the pairs collided. */
function addPairSeparations(sum: number, x: Float64Array, y: Float64Array, list: Int32Array, length: number): number {
  for (let k = 0; k < length; k += 2) {
    const i = list[k];
    const j = list[k + 1];
    const dx = x[i] - x[j];
    const dy = y[i] - y[j];
    sum += Math.sqrt(dx * dx + dy * dy);
  }
  return sum;
}

/**
 * Collides the particles of every cell once (one time step). Needs st.order and st.keyStart from indexParticles.
 * With `sample`, each cell's moment sums are added to st.cellSums right after its collisions (the same sums as
 * sampleCells; the cell's particles are then in cache and the sequential pass keeps the hardware prefetcher ahead
 * of the next cell: 10 % faster at 10^6 particles than a separate pass, no change at 10^5, measured).
 *
 * The xoshiro128** generator of rng.ts is inlined with its state in four int32 locals (performance guide, item 5):
 * in the Uint32Array every draw costs four checked loads and four stores, and a closure would box the state. Each
 * inlined draw is the recurrence of nextU32() and gives the value of uniform(), so the sequence is that of st.rng:
 * the state is handed back to st.rng before relaxRotation() (which draws from it), taken again after, and stored
 * at the end.
 */
export function collideParticles(st: SimState, sample = false): void {
  const order = st.order;
  const start = st.keyStart;
  const x = st.x;
  const y = st.y;
  const vx = st.vx;
  const vy = st.vy;
  const vz = st.vz;
  const erot = st.erot;
  const maxArr = st.sigmaCrMax;
  const rem = st.collisionRemainder;
  const sums = st.cellSums;
  const rng = st.rng;
  const subcells = st.subcellsPerCell;
  const cells = st.cells;
  const selection = st.selectionFactor;
  const weights = st.cellWeights;
  const coefSigma = st.sigmaCrCoefficient;
  const omega = st.viscosityIndex;
  const hardSphereLike = omega === 0.5;
  const crExponentHalf = 1 - omega; // σc = C (c_r²)^(1−ω)
  const invAlpha = 1 / st.scatteringExponent;
  const isotropic = st.scatteringExponent === 1;
  const rotational = st.rotationalDof > 0;
  const relaxProbability = 1 / st.rotationalCollisionNumber;
  const lbTranslational = 2.5 - omega;
  const lbRotational = 0.5 * st.rotationalDof;
  const quarterMass = 0.25 * st.massKg;
  const deflected = DEFLECTED;
  let collisions = 0;
  let candidates = 0;
  let separation = 0;
  const pairList = PAIR_LIST;
  let listed = 0;
  // Generator state. One draw, spelled out at each use (Blackman & Vigna 2018), its temporaries m and t numbered by
  // draw (const locals, so each is a fresh value, never carried across iterations):
  //   m = imul(s1, 5); u = (imul(rotl(m, 7), 9) >>> 0) · 2^-32 + 2^-33;
  //   t = s1 << 9; s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3; s2 ^= t; s3 = rotl(s3, 11).
  let s0 = rng[0] | 0;
  let s1 = rng[1] | 0;
  let s2 = rng[2] | 0;
  let s3 = rng[3] | 0;

  for (let c = 0; c < cells; c++) {
    const cellKey0 = c * subcells;
    const first = start[cellKey0];
    const nCell = start[cellKey0 + subcells] - first;
    let sigmaCrMax = maxArr[c];
    let pairs = 0;
    if (nCell > 1) {
      const selected = selection[c] * nCell * (nCell - 1) * sigmaCrMax + rem[c];
      pairs = Math.floor(selected);
      rem[c] = selected - pairs;
      candidates += pairs;
    }
    for (let p = 0; p < pairs; p++) {
      // First partner: anywhere in the cell.
      const m1 = Math.imul(s1, 5);
      const u1 = (Math.imul((m1 << 7) | (m1 >>> 25), 9) >>> 0) * U32 + 0.5 * U32;
      const t1 = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t1;
      s3 = (s3 << 11) | (s3 >>> 21);
      const pi = first + ((u1 * nCell) | 0);
      const i = order[pi];
      // Sub-cell of position pi: the last key of the cell whose range starts at or before pi. A binary search over
      // the cell's S² range starts (one or two cache lines) replaces a dependent read of key[i], and lets the
      // reorder leave the key array behind.
      let ki = cellKey0;
      for (let hi = cellKey0 + subcells; hi - ki > 1;) {
        const mid = (ki + hi) >> 1;
        if (start[mid] <= pi) ki = mid;
        else hi = mid;
      }
      const sub0 = start[ki];
      const nSub = start[ki + 1] - sub0;
      // Second partner: another particle of the same sub-cell if there is one, else of the cell.
      const m2 = Math.imul(s1, 5);
      const u2 = (Math.imul((m2 << 7) | (m2 >>> 25), 9) >>> 0) * U32 + 0.5 * U32;
      const t2 = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t2;
      s3 = (s3 << 11) | (s3 >>> 21);
      let pj = nSub > 1 ? sub0 + ((u2 * (nSub - 1)) | 0) : first + ((u2 * (nCell - 1)) | 0);
      if (pj >= pi) pj++;
      const j = order[pj];
      const crx = vx[i] - vx[j];
      const cry = vy[i] - vy[j];
      const crz = vz[i] - vz[j];
      const cr2 = crx * crx + cry * cry + crz * crz;
      const sigmaCr = hardSphereLike ? coefSigma * Math.sqrt(cr2) : coefSigma * Math.pow(cr2, crExponentHalf);
      if (sigmaCr > sigmaCrMax) {
        sigmaCrMax = sigmaCr;
        maxArr[c] = sigmaCr;
      }
      // Acceptance with probability σc / (σc)max.
      const m3 = Math.imul(s1, 5);
      const u3 = (Math.imul((m3 << 7) | (m3 >>> 25), 9) >>> 0) * U32 + 0.5 * U32;
      const t3 = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t3;
      s3 = (s3 << 11) | (s3 >>> 21);
      if (u3 * sigmaCrMax >= sigmaCr) continue;

      collisions++;
      if (listed === PAIR_LIST_LENGTH) {
        separation = addPairSeparations(separation, x, y, pairList, listed);
        listed = 0;
      }
      pairList[listed++] = i;
      pairList[listed++] = j;
      let cr = Math.sqrt(cr2);
      if (rotational) {
        rng[0] = s0;
        rng[1] = s1;
        rng[2] = s2;
        rng[3] = s3;
        const crNew = relaxRotation(
          rng,
          erot,
          i,
          j,
          quarterMass * cr2,
          quarterMass,
          relaxProbability,
          lbTranslational,
          lbRotational,
        );
        s0 = rng[0] | 0;
        s1 = rng[1] | 0;
        s2 = rng[2] | 0;
        s3 = rng[3] | 0;
        if (crNew >= 0) cr = crNew;
      }
      // Deflection: cos χ and the azimuth ε.
      const m4 = Math.imul(s1, 5);
      const u4 = (Math.imul((m4 << 7) | (m4 >>> 25), 9) >>> 0) * U32 + 0.5 * U32;
      const t4 = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t4;
      s3 = (s3 << 11) | (s3 >>> 21);
      const m5 = Math.imul(s1, 5);
      const u5 = (Math.imul((m5 << 7) | (m5 >>> 25), 9) >>> 0) * U32 + 0.5 * U32;
      const t5 = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t5;
      s3 = (s3 << 11) | (s3 >>> 21);
      // Post-collision velocities: centre-of-mass velocity kept, relative velocity of magnitude cr (differs from
      // |c_r| after a Larsen–Borgnakke exchange) in the new direction. Isotropic scattering (HS, VHS) is written
      // out here: as a call, each of its float arguments was boxed on the heap, every collision.
      let nx: number;
      let ny: number;
      let nz: number;
      if (isotropic) {
        const cosChi = 2 * u4 - 1;
        const sinChi = Math.sqrt(1 - cosChi * cosChi);
        const eps = 2 * Math.PI * u5;
        nx = cr * cosChi;
        ny = cr * sinChi * Math.cos(eps);
        nz = cr * sinChi * Math.sin(eps);
      } else {
        deflectVss(deflected, crx, cry, crz, Math.sqrt(cr2), cr, 2 * Math.pow(u4, invAlpha) - 1, 2 * Math.PI * u5);
        nx = deflected[0];
        ny = deflected[1];
        nz = deflected[2];
      }
      const cmx = 0.5 * (vx[i] + vx[j]);
      const cmy = 0.5 * (vy[i] + vy[j]);
      const cmz = 0.5 * (vz[i] + vz[j]);
      vx[i] = cmx + 0.5 * nx;
      vy[i] = cmy + 0.5 * ny;
      vz[i] = cmz + 0.5 * nz;
      vx[j] = cmx - 0.5 * nx;
      vy[j] = cmy - 0.5 * ny;
      vz[j] = cmz - 0.5 * nz;
    }
    if (sample)
      sampleCell(sums, c * RAW_CELL_SUMS, order, first, first + nCell, vx, vy, vz, erot, rotational, weights[c]);
  }
  rng[0] = s0;
  rng[1] = s1;
  rng[2] = s2;
  rng[3] = s3;
  if (sample) st.cellSumSteps++;
  st.collisionCount += collisions;
  st.candidateCount += candidates;
  st.separationSum += addPairSeparations(separation, x, y, pairList, listed);
}
