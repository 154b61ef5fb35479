/**
 * xoshiro128** pseudo-random generator (Blackman & Vigna 2018, "Scrambled linear pseudorandom number generators"),
 * state in a Uint32Array(4) so that kernels can keep it in a typed array (no boxing) and checkpoints can copy it.
 *
 * Streams: each (seed, stream) pair is expanded by splitmix32 into a full 128-bit state. With a period of 2^128 − 1,
 * the chance that two such streams overlap within a simulation's draws is negligible (common practice for
 * hash-seeded parallel streams, no source).
 */

export type RngState = Uint32Array;

const TWO_POW_MINUS_32 = 2.3283064365386963e-10;

/** splitmix32 step (Steele, Lea & Flood 2014 finaliser, 32-bit variant); returns [next seed, output]. */
function splitmix32(seed: number): [number, number] {
  const next = (seed + 0x9e3779b9) | 0;
  let z = next;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  z ^= z >>> 16;
  return [next, z >>> 0];
}

/** A generator state for stream `stream` of master seed `seed` (both non-negative integers below 2^32). */
export function createRng(seed: number, stream = 0): RngState {
  const s = new Uint32Array(4);
  let h = (seed ^ Math.imul(stream + 1, 0x27d4eb2f)) | 0;
  // Mix the stream number in twice so that neighbouring seeds and streams give unrelated states.
  [h] = splitmix32(h ^ Math.imul(stream, 0x165667b1));
  for (let k = 0; k < 4; k++) {
    const [nh, out] = splitmix32(h);
    h = nh;
    s[k] = out;
  }
  if ((s[0] | s[1] | s[2] | s[3]) === 0) s[0] = 1; // the all-zero state is the one fixed point
  return s;
}

/** Next 32-bit unsigned integer. */
export function nextU32(s: RngState): number {
  const s0 = s[0];
  const s1 = s[1];
  const m = Math.imul(s1, 5);
  const result = Math.imul((m << 7) | (m >>> 25), 9) >>> 0;
  const t = s1 << 9;
  const n2 = s[2] ^ s0;
  const n3 = s[3] ^ s1;
  s[1] = s1 ^ n2;
  s[0] = s0 ^ n3;
  s[2] = n2 ^ t;
  s[3] = (n3 << 11) | (n3 >>> 21);
  return result;
}

/** Uniform deviate on the open interval (0, 1): never 0, so log() of it is always finite. */
export function uniform(s: RngState): number {
  return nextU32(s) * TWO_POW_MINUS_32 + TWO_POW_MINUS_32 * 0.5;
}

/** Standard normal deviate (Box–Muller; one of the pair is discarded to keep the state a plain array). */
export function standardNormal(s: RngState): number {
  const r = Math.sqrt(-2 * Math.log(uniform(s)));
  return r * Math.cos(2 * Math.PI * uniform(s));
}

/**
 * Gamma(shape, 1) deviate, shape > 0 (Marsaglia & Tsang 2000, ACM TOMS 26:363; shape < 1 by the boost
 * Gamma(a) = Gamma(a+1)·U^(1/a)). Used for rotational energies and the Larsen–Borgnakke partition.
 */
export function gammaDeviate(s: RngState, shape: number): number {
  if (shape < 1) return gammaDeviate(s, shape + 1) * Math.pow(uniform(s), 1 / shape);
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    let x: number;
    let v: number;
    do {
      x = standardNormal(s);
      v = 1 + c * x;
    } while (v <= 0);
    v = v * v * v;
    const u = uniform(s);
    if (u < 1 - 0.0331 * x * x * x * x) return d * v;
    if (Math.log(u) < 0.5 * x * x + d * (1 - v + Math.log(v))) return d * v;
  }
}

/** Beta(a, b) deviate as a ratio of gamma deviates; the special case b = 1 (diatomic rotation) is exact and cheap. */
export function betaDeviate(s: RngState, a: number, b: number): number {
  if (b === 1) return Math.pow(uniform(s), 1 / a);
  const x = gammaDeviate(s, a);
  return x / (x + gammaDeviate(s, b));
}

/**
 * Equilibrium rotational energy (J) of one molecule with `dof` rotational degrees of freedom at temperatureK,
 * in units of kT: a Gamma(dof/2) deviate (dof = 2: exponential).
 */
export function rotationalEnergyOverKT(s: RngState, dof: number): number {
  if (dof === 0) return 0;
  if (dof === 2) return -Math.log(uniform(s));
  return gammaDeviate(s, dof / 2);
}
