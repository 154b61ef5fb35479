/**
 * The long-duct solver, isothermal: a duct whose length is large against its radius or gap carries a locally fully
 * developed flow, so at each cross-section ṁ = (A·a/v0)·G_P(δ)·(−dp/dx) with δ = p·a/(μ·v0) (Sharipov & Seleznev
 * 1994, J. Vac. Sci. Technol. A 12:2933; 1998 review). With ṁ the same at every section and T fixed,
 * dδ = (a/(μ v0)) dp, so
 *   ṁ·L = A·μ·∫ G_P dδ   between the end rarefactions δ_down and δ_up,
 * and the pressure along the duct follows from the same integral taken from the inlet to x. A tube has A = πR², a = R;
 * a channel of gap H and width w (per metre of width when w = 1 m) A = H·w, a = H.
 *
 * The coefficients come from a table (coefficientTable.ts); its half-widths carry into ṁ as ∫ ci95(δ) dδ, an upper
 * bound (neighbouring table points taken as fully correlated). An optional end correction adds the entrance and exit
 * of a tube between vessels (endCorrection.ts). Pure functions over plain data; SI units.
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { mostProbableSpeedMPerS, viscosityPaS, type MolecularModel } from '../gas/molecularModel';
import { speedOfSoundMPerS } from '../stats/expectedNoise';
import { interpolator, type CoefficientTable, type DuctShapeKind } from './coefficientTable';
import { tubeEndConductanceM3PerS } from './endCorrection';

export type DuctGeometry =
  | { readonly shape: 'tube'; readonly radiusM: number; readonly lengthM: number }
  /** widthM: the channel's width; 1 m gives the flow per metre of width. */
  | { readonly shape: 'channel'; readonly gapM: number; readonly widthM: number; readonly lengthM: number }
  /** A rectangle of height H (the smaller side) and width W, with its own table (of its aspect ratio H/W). */
  | { readonly shape: 'rectangle'; readonly heightM: number; readonly widthM: number; readonly lengthM: number };

export interface IsothermalDuctInput {
  readonly geometry: DuctGeometry;
  readonly gas: MolecularModel;
  readonly temperatureK: number;
  readonly upstreamPressurePa: number;
  readonly downstreamPressurePa: number;
  readonly table: CoefficientTable;
  /** Add the tube's entrance and exit (endCorrection.ts); default false. */
  readonly endCorrection?: boolean;
  /** Points along the duct in the profile; default 41. */
  readonly profilePoints?: number;
}

export interface Estimate {
  readonly mean: number;
  readonly ci95: number;
}

export interface DuctProfile {
  readonly xM: Float64Array;
  readonly pressurePa: Float64Array;
  readonly rarefaction: Float64Array;
  readonly knudsen: Float64Array;
  /** ṁ/(ρ A), m/s, and its Mach number on the speed of sound of the gas. */
  readonly meanSpeedMPerS: Float64Array;
  readonly mach: Float64Array;
}

export interface IsothermalDuctResult {
  readonly massFlowRateKgPerS: Estimate;
  /** pV throughput ṁ kT/m, Pa·m³/s. */
  readonly throughputPaM3PerS: Estimate;
  /** Q / (p_up − p_down), m³/s. */
  readonly conductanceM3PerS: Estimate;
  /** ṁ over the free-molecular flow through the entrance area, A (p_up − p_down) sqrt(m/(2πkT)). */
  readonly transmissionProbability: Estimate;
  readonly upstreamRarefaction: number;
  readonly downstreamRarefaction: number;
  /** The end correction applied: the long-duct ṁ over the corrected one minus 1 (0 when none). */
  readonly endCorrectionFraction: number;
  readonly profile: DuctProfile;
  readonly warnings: readonly string[];
}

export interface DuctDimensions {
  readonly shape: DuctShapeKind;
  /** Cross-section A, m², and the length scale a (radius or gap), m. */
  readonly areaM2: number;
  readonly scaleM: number;
  readonly lengthM: number;
}

export function dimensionsOf(g: DuctGeometry): DuctDimensions {
  const positive = (v: number, what: string) => {
    if (!(Number.isFinite(v) && v > 0)) throw new Error(`${what} = ${v}: must be a number above 0 (m)`);
  };
  positive(g.lengthM, 'duct length');
  if (g.shape === 'tube') {
    positive(g.radiusM, 'tube radius');
    return { shape: 'tube', areaM2: Math.PI * g.radiusM ** 2, scaleM: g.radiusM, lengthM: g.lengthM };
  }
  if (g.shape === 'rectangle') {
    positive(g.heightM, 'rectangle height');
    positive(g.widthM, 'rectangle width');
    if (g.heightM > g.widthM)
      throw new Error(
        `rectangle height ${g.heightM} m is above its width ${g.widthM} m: H is the smaller side; swap them`,
      );
    return { shape: 'rectangle', areaM2: g.heightM * g.widthM, scaleM: g.heightM, lengthM: g.lengthM };
  }
  positive(g.gapM, 'channel gap');
  positive(g.widthM, 'channel width');
  return { shape: 'channel', areaM2: g.gapM * g.widthM, scaleM: g.gapM, lengthM: g.lengthM };
}

/**
 * Throws unless the table is for the duct's shape — and, for a rectangle, for its aspect ratio within 1 % (a table
 * holds for one aspect ratio; interpolating between tables of others is not offered).
 */
export function checkTableFits(table: CoefficientTable, g: DuctGeometry): void {
  if (table.shape !== g.shape)
    throw new Error(`coefficient table "${table.source}" is for a ${table.shape}, not a ${g.shape}`);
  if (g.shape === 'rectangle') {
    const aspect = g.heightM / g.widthM;
    if (!(table.aspectRatio !== undefined && Math.abs(table.aspectRatio / aspect - 1) <= 0.01))
      throw new Error(
        `coefficient table "${table.source}" is for a rectangle of H/W = ${table.aspectRatio}, the duct's is ${aspect.toPrecision(4)}: compute a table for this aspect ratio (tenuis coefficients on a rectangularDuct case)`,
      );
  }
}

/** Adaptive Simpson integration of f over [a, b] to a relative tolerance (Lyness 1969; common practice). */
export function integrate(f: (x: number) => number, a: number, b: number, tolerance = 1e-12): number {
  const fa = f(a);
  const fb = f(b);
  const m = (a + b) / 2;
  const fm = f(m);
  const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
  const scale = Math.max(Math.abs(whole), 1e-300);
  const step = (a0: number, b0: number, f0: number, f1: number, fmid: number, s: number, depth: number): number => {
    const mid = (a0 + b0) / 2;
    const l = (a0 + mid) / 2;
    const r = (mid + b0) / 2;
    const fl = f(l);
    const fr = f(r);
    const left = ((mid - a0) / 6) * (f0 + 4 * fl + fmid);
    const right = ((b0 - mid) / 6) * (fmid + 4 * fr + f1);
    if (depth <= 0 || Math.abs(left + right - s) <= 15 * tolerance * scale)
      return left + right + (left + right - s) / 15;
    return step(a0, mid, f0, fmid, fl, left, depth - 1) + step(mid, b0, fmid, f1, fr, right, depth - 1);
  };
  return step(a, b, fa, fb, fm, whole, 40);
}

/** The long-duct flow between two end pressures (see the file header). */
export function solveIsothermalDuct(input: IsothermalDuctInput): IsothermalDuctResult {
  const { gas, temperatureK: t, table } = input;
  const up = input.upstreamPressurePa;
  const down = input.downstreamPressurePa;
  if (!(Number.isFinite(t) && t > 0)) throw new Error(`temperature = ${t} K: must be a number above 0`);
  if (!(Number.isFinite(up) && up > 0)) throw new Error(`upstream pressure = ${up} Pa: must be a number above 0`);
  if (!(Number.isFinite(down) && down > 0 && down < up))
    throw new Error(
      `downstream pressure = ${down} Pa: must be above 0 and below the upstream pressure (${up} Pa); a duct at one pressure carries no flow`,
    );
  const d = dimensionsOf(input.geometry);
  checkTableFits(table, input.geometry);
  const mu = viscosityPaS(gas, t);
  const v0 = mostProbableSpeedMPerS(gas.massKg, t);
  const toDelta = (p: number) => (p * d.scaleM) / (mu * v0);
  const deltaUp = toDelta(up);
  const deltaDown = toDelta(down);
  const gp = interpolator(table);
  // In u = ln δ the integrand G_P(δ)·δ is smooth across decades of δ.
  const value = (u: number) => gp(Math.exp(u)).value * Math.exp(u);
  const halfWidth = (u: number) => gp(Math.exp(u)).ci95 * Math.exp(u);
  const uUp = Math.log(deltaUp);
  const uDown = Math.log(deltaDown);
  const integral = integrate(value, uDown, uUp);
  const integralCi = integrate(halfWidth, uDown, uUp, 1e-9);
  const longFlow = (d.areaM2 * mu * integral) / d.lengthM;
  const longCi = (d.areaM2 * mu * integralCi) / d.lengthM;

  const m = gas.massKg;
  const kt = K_B * t;
  // The tube's ends in series with its long part: 1/C = 1/C_long + 1/C_end (endCorrection.ts).
  let flow = longFlow;
  let flowCi = longCi;
  if (input.endCorrection) {
    if (input.geometry.shape !== 'tube')
      throw new Error('end correction: only a tube has one here; for a channel run the full DSMC channel preset');
    const cLong = (longFlow * kt) / (m * (up - down));
    const cEnd = tubeEndConductanceM3PerS(input.geometry, gas, t, (up + down) / 2);
    const factor = 1 / (1 + cLong / cEnd);
    flow = longFlow * factor;
    flowCi = longCi * factor;
  }

  const points = Math.max(2, Math.round(input.profilePoints ?? 41));
  const profile = profileOf(d, gp, { uUp, uDown, integral, points, mu, v0, kt, m, flow, gas, t });
  const warnings: string[] = [];
  const ratio = d.lengthM / d.scaleM;
  if (ratio < 20)
    warnings.push(
      `the duct is ${ratio.toPrecision(3)} ${d.shape === 'tube' ? 'radii' : d.shape === 'rectangle' ? 'heights' : 'gaps'} long, less than about 20: the long-duct result neglects the ends${input.endCorrection ? ' beyond the end correction' : ''}; run the full DSMC ${d.shape} preset instead`,
    );
  const maxMach = Math.max(...profile.mach);
  if (maxMach > 0.3)
    warnings.push(
      `the mean speed reaches Mach ${maxMach.toPrecision(2)} near the outlet: the locally fully developed (linear) flow assumed here fails above about 0.3`,
    );
  const lo = table.points[0].rarefaction;
  const hi = table.points[table.points.length - 1].rarefaction;
  if (deltaDown < lo || deltaUp > hi)
    warnings.push(
      `rarefaction ${deltaDown.toPrecision(3)}–${deltaUp.toPrecision(3)} reaches beyond the table's ${lo.toPrecision(3)}–${hi.toPrecision(3)}: its limits (slip or free-molecular) are used there`,
    );

  const entrance = d.areaM2 * (up - down) * Math.sqrt(m / (2 * Math.PI * kt));
  const scaled = (factor: number): Estimate => ({ mean: flow * factor, ci95: flowCi * factor });
  return {
    massFlowRateKgPerS: { mean: flow, ci95: flowCi },
    throughputPaM3PerS: scaled(kt / m),
    conductanceM3PerS: scaled(kt / (m * (up - down))),
    transmissionProbability: scaled(1 / entrance),
    upstreamRarefaction: deltaUp,
    downstreamRarefaction: deltaDown,
    endCorrectionFraction: longFlow / flow - 1,
    profile,
    warnings,
  };
}

interface ProfileInputs {
  readonly uUp: number;
  readonly uDown: number;
  readonly integral: number;
  readonly points: number;
  readonly mu: number;
  readonly v0: number;
  readonly kt: number;
  readonly m: number;
  readonly flow: number;
  readonly gas: MolecularModel;
  readonly t: number;
}

/**
 * p(x) from the cumulative integral: ∫_{δ(x)}^{δ_up} G_P dδ = (x/L)·∫_{δ_down}^{δ_up} G_P dδ (the long part's share of
 * the drop; with an end correction the ends take the rest, so the profile is that of the long part between its own
 * end pressures, scaled onto the vessels' — a first estimate near the ends).
 */
function profileOf(d: DuctDimensions, gp: (delta: number) => { value: number }, o: ProfileInputs): DuctProfile {
  // Cumulative integral on a fine grid in ln δ, then inverted by linear interpolation.
  const grid = 400;
  const us = new Float64Array(grid + 1);
  const cum = new Float64Array(grid + 1);
  for (let k = 0; k <= grid; k++) us[k] = o.uUp + ((o.uDown - o.uUp) * k) / grid;
  for (let k = 1; k <= grid; k++)
    cum[k] = cum[k - 1] + integrate((u) => gp(Math.exp(u)).value * Math.exp(u), us[k], us[k - 1], 1e-10);
  const n = o.points;
  const xM = new Float64Array(n);
  const pressurePa = new Float64Array(n);
  const rarefaction = new Float64Array(n);
  const knudsen = new Float64Array(n);
  const meanSpeedMPerS = new Float64Array(n);
  const mach = new Float64Array(n);
  const sound = speedOfSoundMPerS(o.m, o.t, o.gas.rotationalDof);
  let j = 0;
  for (let i = 0; i < n; i++) {
    const f = i / (n - 1);
    const target = f * cum[grid];
    while (j < grid - 1 && cum[j + 1] < target) j++;
    const w = cum[j + 1] > cum[j] ? (target - cum[j]) / (cum[j + 1] - cum[j]) : 0;
    const u = us[j] + w * (us[j + 1] - us[j]);
    const delta = Math.exp(u);
    const p = (delta * o.mu * o.v0) / d.scaleM;
    xM[i] = f * d.lengthM;
    pressurePa[i] = p;
    rarefaction[i] = delta;
    knudsen[i] = Math.sqrt(Math.PI) / (2 * delta);
    const rho = (p * o.m) / o.kt;
    meanSpeedMPerS[i] = o.flow / (rho * d.areaM2);
    mach[i] = meanSpeedMPerS[i] / sound;
  }
  return { xM, pressurePa, rarefaction, knudsen, meanSpeedMPerS, mach };
}
