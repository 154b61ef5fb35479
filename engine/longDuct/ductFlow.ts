/**
 * The long-duct solver with a temperature along the wall (linear from the upstream to the downstream end), which adds
 * thermal creep: at each cross-section (Sharipov & Seleznev 1998, J. Phys. Chem. Ref. Data 27:657)
 *   ṁ = (A·a/v0(T))·[G_P(δ)·(−dp/dx) + G_T(δ)·(p/T)·dT/dx],   δ = p·a/(μ(T)·v0(T)),
 * an ordinary differential equation for p(x) with ṁ constant along the duct, integrated by the classical fourth-order
 * Runge–Kutta method. Given any two of (upstream pressure, downstream pressure, mass flow) it finds the third: the
 * flow between two pressures by root-finding on the outlet pressure (Illinois method, a safeguarded secant); with
 * ṁ = 0 and different end temperatures it gives the thermal-transpiration pressure ratio (Knudsen's √(T1/T2) in the
 * free-molecular limit). Pure functions; SI units. The table's half-widths carry into the answer by solving again
 * with G_P and with G_T raised by theirs (added in quadrature: a linear propagation).
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { mostProbableSpeedMPerS, viscosityPaS, type MolecularModel } from '../gas/molecularModel';
import { speedOfSoundMPerS } from '../stats/expectedNoise';
import { interpolator, thermalCreepInterpolator, type CoefficientTable } from './coefficientTable';
import { checkTableFits, dimensionsOf, type DuctDimensions, type DuctGeometry, type Estimate } from './isothermalDuct';

export interface DuctFlowInput {
  readonly geometry: DuctGeometry;
  readonly gas: MolecularModel;
  readonly table: CoefficientTable;
  readonly upstreamTemperatureK: number;
  readonly downstreamTemperatureK: number;
  /** Exactly two of the three. ṁ in kg/s (per width as the geometry's width says), positive from up- to downstream. */
  readonly upstreamPressurePa?: number;
  readonly downstreamPressurePa?: number;
  readonly massFlowRateKgPerS?: number;
  /** Runge–Kutta steps along the duct; default 2000. */
  readonly steps?: number;
}

export interface DuctFlowResult {
  readonly upstreamPressurePa: Estimate;
  readonly downstreamPressurePa: Estimate;
  readonly massFlowRateKgPerS: Estimate;
  readonly profile: {
    readonly xM: Float64Array;
    readonly pressurePa: Float64Array;
    readonly temperatureK: Float64Array;
    readonly rarefaction: Float64Array;
  };
  readonly warnings: readonly string[];
}

type Coefficient = (delta: number) => number;

interface Model {
  readonly d: DuctDimensions;
  readonly gas: MolecularModel;
  readonly tUp: number;
  readonly tDown: number;
  readonly gp: Coefficient;
  readonly gt: Coefficient;
}

const temperatureAt = (m: Model, x: number) => m.tUp + ((m.tDown - m.tUp) * x) / m.d.lengthM;

function slope(m: Model, x: number, p: number, flow: number): number {
  const t = temperatureAt(m, x);
  const mu = viscosityPaS(m.gas, t);
  const v0 = mostProbableSpeedMPerS(m.gas.massKg, t);
  const delta = (p * m.d.scaleM) / (mu * v0);
  const dTdx = (m.tDown - m.tUp) / m.d.lengthM;
  return (m.gt(delta) * (p / t) * dTdx - (flow * v0) / (m.d.areaM2 * m.d.scaleM)) / m.gp(delta);
}

/** p along the duct from one end (forward from x = 0, or backward from x = L); null where p falls to zero. */
function integrate(m: Model, flow: number, start: number, forward: boolean, steps: number): Float64Array | null {
  const h = (forward ? 1 : -1) * (m.d.lengthM / steps);
  const p = new Float64Array(steps + 1);
  let x = forward ? 0 : m.d.lengthM;
  let y = start;
  p[forward ? 0 : steps] = y;
  for (let k = 1; k <= steps; k++) {
    const k1 = slope(m, x, y, flow);
    const y2 = y + (h / 2) * k1;
    if (!(y2 > 0)) return null;
    const k2 = slope(m, x + h / 2, y2, flow);
    const y3 = y + (h / 2) * k2;
    if (!(y3 > 0)) return null;
    const k3 = slope(m, x + h / 2, y3, flow);
    const y4 = y + h * k3;
    if (!(y4 > 0)) return null;
    const k4 = slope(m, x + h, y4, flow);
    y += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
    x += h;
    if (!(y > 0) || !Number.isFinite(y)) return null;
    p[forward ? k : steps - k] = y;
  }
  return p;
}

/** The flow that brings p from `up` at the inlet to `down` at the outlet (Illinois root-finding on the outlet). */
function flowBetween(m: Model, up: number, down: number, steps: number): number {
  // Outlet pressure minus the target, for a flow; a flow so large that p falls to zero counts as far below.
  const miss = (flow: number) => {
    const p = integrate(m, flow, up, true, steps);
    return p === null ? -up : p[steps] - down;
  };
  // Scale: the isothermal flow at the mean temperature with G_P at the mean rarefaction.
  const t = (m.tUp + m.tDown) / 2;
  const mu = viscosityPaS(m.gas, t);
  const v0 = mostProbableSpeedMPerS(m.gas.massKg, t);
  const mean = (up + down) / 2;
  const scale =
    Math.abs((m.d.areaM2 * m.d.scaleM * m.gp((mean * m.d.scaleM) / (mu * v0)) * (up - down)) / (v0 * m.d.lengthM)) ||
    (m.d.areaM2 * m.d.scaleM * m.gp((mean * m.d.scaleM) / (mu * v0)) * up) / (v0 * m.d.lengthM);
  const at0 = miss(0);
  if (at0 === 0) return 0;
  // A positive miss at zero flow needs a forward flow to lower the outlet; a negative one a backward flow.
  const sign = at0 > 0 ? 1 : -1;
  let a = 0;
  let fa = at0;
  let b = sign * scale;
  let fb = miss(b);
  for (let k = 0; k < 60 && Math.sign(fb) === Math.sign(fa); k++) {
    a = b;
    fa = fb;
    b *= 2;
    fb = miss(b);
  }
  if (Math.sign(fb) === Math.sign(fa)) throw new Error('long duct: no flow between these pressures could be found');
  let side = 0;
  for (let k = 0; k < 200; k++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const fc = miss(c);
    if (Math.abs(fc) <= 1e-12 * down || Math.abs(b - a) <= 1e-14 * Math.abs(c)) return c;
    if (Math.sign(fc) === Math.sign(fb)) {
      b = c;
      fb = fc;
      if (side === -1) fa /= 2;
      side = -1;
    } else {
      a = c;
      fa = fc;
      if (side === 1) fb /= 2;
      side = 1;
    }
  }
  return (a + b) / 2;
}

interface Solved {
  readonly up: number;
  readonly down: number;
  readonly flow: number;
  readonly p: Float64Array;
}

function solveWith(m: Model, input: DuctFlowInput, steps: number): Solved {
  const { upstreamPressurePa: up, downstreamPressurePa: down, massFlowRateKgPerS: flow } = input;
  if (up !== undefined && down !== undefined) {
    const f = flowBetween(m, up, down, steps);
    return { up, down, flow: f, p: integrate(m, f, up, true, steps)! };
  }
  if (up !== undefined && flow !== undefined) {
    const p = integrate(m, flow, up, true, steps);
    if (!p)
      throw new Error(
        `mass flow rate ${flow} kg/s: more than the duct carries from ${up} Pa (the pressure falls to zero before the outlet)`,
      );
    return { up, down: p[steps], flow, p };
  }
  const p = integrate(m, flow!, down!, false, steps);
  if (!p)
    throw new Error(`mass flow rate ${flow} kg/s: the pressure would fall to zero going upstream from ${down} Pa`);
  return { up: p[0], down: down!, flow: flow!, p };
}

/** The long-duct flow with thermal creep (see the file header). */
export function solveDuctFlow(input: DuctFlowInput): DuctFlowResult {
  const given = [input.upstreamPressurePa, input.downstreamPressurePa, input.massFlowRateKgPerS].filter(
    (v) => v !== undefined,
  ).length;
  if (given !== 2)
    throw new Error(
      `long duct: give exactly two of upstreamPressure, downstreamPressure and massFlowRate (${given} given); the third is solved for`,
    );
  for (const [v, what] of [
    [input.upstreamPressurePa, 'upstream pressure (Pa)'],
    [input.downstreamPressurePa, 'downstream pressure (Pa)'],
  ] as const)
    if (v !== undefined && !(Number.isFinite(v) && v > 0)) throw new Error(`${what} = ${v}: must be a number above 0`);
  if (input.massFlowRateKgPerS !== undefined && !Number.isFinite(input.massFlowRateKgPerS))
    throw new Error(`mass flow rate = ${input.massFlowRateKgPerS} kg/s: must be a finite number`);
  for (const [v, what] of [
    [input.upstreamTemperatureK, 'upstream temperature (K)'],
    [input.downstreamTemperatureK, 'downstream temperature (K)'],
  ] as const)
    if (!(Number.isFinite(v) && v > 0)) throw new Error(`${what} = ${v}: must be a number above 0`);
  const d = dimensionsOf(input.geometry);
  checkTableFits(input.table, input.geometry);
  const gpOf = interpolator(input.table);
  const gtOf = thermalCreepInterpolator(input.table);
  const isothermal = input.upstreamTemperatureK === input.downstreamTemperatureK;
  if (!gtOf && !isothermal)
    throw new Error(
      `coefficient table "${input.table.source}" has no thermal-creep coefficient G_T: give equal end temperatures, or a table with G_T`,
    );
  const steps = Math.max(10, Math.round(input.steps ?? 2000));
  const base = { d, gas: input.gas, tUp: input.upstreamTemperatureK, tDown: input.downstreamTemperatureK };
  const gp: Coefficient = (delta) => gpOf(delta).value;
  const gt: Coefficient = gtOf ? (delta) => gtOf(delta).value : () => 0;
  const solved = solveWith({ ...base, gp, gt }, input, steps);
  // Half-widths: solve again with G_P, then G_T, raised by their 95 % half-widths; add the shifts in quadrature.
  const raisedP = solveWith({ ...base, gp: (x) => gpOf(x).value + gpOf(x).ci95, gt }, input, steps);
  const raisedT =
    gtOf && !isothermal ? solveWith({ ...base, gp, gt: (x) => gtOf(x).value + gtOf(x).ci95 }, input, steps) : solved;
  const ci = (pick: (s: Solved) => number) => Math.hypot(pick(raisedP) - pick(solved), pick(raisedT) - pick(solved));

  const n = steps + 1;
  const xM = new Float64Array(n);
  const temperatureK = new Float64Array(n);
  const rarefaction = new Float64Array(n);
  const m: Model = { ...base, gp, gt };
  for (let k = 0; k < n; k++) {
    xM[k] = (k * d.lengthM) / steps;
    temperatureK[k] = temperatureAt(m, xM[k]);
    const mu = viscosityPaS(input.gas, temperatureK[k]);
    rarefaction[k] = (solved.p[k] * d.scaleM) / (mu * mostProbableSpeedMPerS(input.gas.massKg, temperatureK[k]));
  }
  const warnings: string[] = [];
  const ratio = d.lengthM / d.scaleM;
  if (ratio < 20)
    warnings.push(
      `the duct is ${ratio.toPrecision(3)} ${d.shape === 'tube' ? 'radii' : d.shape === 'rectangle' ? 'heights' : 'gaps'} long, less than about 20: the long-duct result neglects the ends; run the full DSMC ${d.shape} preset instead`,
    );
  const lo = input.table.points[0].rarefaction;
  const hi = input.table.points[input.table.points.length - 1].rarefaction;
  const dMin = Math.min(...rarefaction);
  const dMax = Math.max(...rarefaction);
  if (dMin < lo || dMax > hi)
    warnings.push(
      `rarefaction ${dMin.toPrecision(3)}–${dMax.toPrecision(3)} reaches beyond the table's ${lo.toPrecision(3)}–${hi.toPrecision(3)}: its limits are used there`,
    );
  const withGt = input.table.points.filter((p) => p.thermalCreep !== undefined);
  if (gtOf && !isothermal && withGt.length) {
    const gLo = withGt[0].rarefaction;
    const gHi = withGt[withGt.length - 1].rarefaction;
    if (dMin < gLo || dMax > gHi)
      warnings.push(
        `rarefaction ${dMin.toPrecision(3)}–${dMax.toPrecision(3)} reaches beyond the table's G_T points ${gLo.toPrecision(3)}–${gHi.toPrecision(3)}: G_T is extrapolated there (held below, ∝ 1/δ above)`,
      );
  }
  // Mach number of the mean speed at the outlet, where the gas is thinnest.
  const kt = K_B * input.downstreamTemperatureK;
  const rho = (solved.down * input.gas.massKg) / kt;
  const sound = speedOfSoundMPerS(input.gas.massKg, input.downstreamTemperatureK, input.gas.rotationalDof);
  const mach = Math.abs(solved.flow) / (rho * d.areaM2) / sound;
  if (mach > 0.3)
    warnings.push(
      `the mean speed reaches Mach ${mach.toPrecision(2)} at the outlet: the locally fully developed (linear) flow assumed here fails above about 0.3`,
    );
  return {
    upstreamPressurePa: { mean: solved.up, ci95: ci((s) => s.up) },
    downstreamPressurePa: { mean: solved.down, ci95: ci((s) => s.down) },
    massFlowRateKgPerS: { mean: solved.flow, ci95: ci((s) => s.flow) },
    profile: { xM, pressurePa: solved.p, temperatureK, rarefaction },
    warnings,
  };
}
