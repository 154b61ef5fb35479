/**
 * The conductance of a long duct over a range of pressures at a fixed pressure ratio, from viscous to molecular
 * flow: the table's (Tenuis's DSMC coefficients) beside the no-slip, first-order slip and (for a tube)
 * free-molecular lines, each the same long-duct integral with G_P of that model — δ/4 or δ/6 for no slip,
 * plus σ_P = 1.0162 (linearized BGK, diffuse walls; continuum/slipCoefficients.ts) for first-order slip; for a tube
 * also the free-molecular long-tube conductance (8R/(3L))·πR²·c̄/4 (Knudsen 1909), which does not depend on pressure
 * (a channel's free-molecular conductance grows without bound as ln(1/δ), so it has no line).
 * A channel's table curve shows the Knudsen minimum where it lies in the range.
 */
import { KINETIC_BGK_SLIP } from '../continuum/slipCoefficients';
import { meanSpeedMPerS, type MolecularModel } from '../gas/molecularModel';
import { slipSlope, type CoefficientTable, type DuctShapeKind } from './coefficientTable';
import { rectangleFreeMolecularReducedFlowRate, rectangleSlipFlowFactor } from '../continuum/rectangularDuct';
import { solveIsothermalDuct, type DuctGeometry, type Estimate } from './isothermalDuct';

export interface ConductancePoint {
  readonly upstreamPressurePa: number;
  readonly meanPressurePa: number;
  readonly meanKnudsen: number;
  readonly conductanceM3PerS: Estimate;
  readonly noSlipM3PerS: number;
  readonly firstOrderSlipM3PerS: number;
  /** NaN for a channel. */
  readonly freeMolecularM3PerS: number;
}

export interface ConductanceCurveInput {
  readonly geometry: DuctGeometry;
  readonly gas: MolecularModel;
  readonly temperatureK: number;
  readonly table: CoefficientTable;
  /** Upstream pressures, Pa; the downstream one is ratio × upstream (0 < ratio < 1). */
  readonly upstreamPressuresPa: readonly number[];
  readonly ratio: number;
}

/** A model's G_P as a table over a wide range of δ (exact for these forms up to the interpolation, see the tests). */
function lineTable(
  shape: DuctShapeKind,
  aspectRatio: number | undefined,
  gp: (delta: number) => number,
  what: string,
): CoefficientTable {
  const points = [];
  for (let e = -8; e <= 8; e += 0.25)
    points.push({ rarefaction: 10 ** e, reducedFlowRate: gp(10 ** e), reducedFlowRateCi95: 0 });
  return { shape, aspectRatio, source: what, gasAndWall: 'continuum model', points };
}

/**
 * The first-order slip offset of G_P − slope·δ at large δ: σ_P for a tube and a channel; for a rectangle (1/6)·f′(0)·σ_P,
 * f(s) the slip solution's flow factor (continuum/rectangularDuct.ts) differentiated at zero slip — its slip-regime
 * line, the linear part of first-order slip in σ_P/δ.
 */
function slipOffset(shape: DuctShapeKind, aspectRatio: number | undefined): number {
  if (shape !== 'rectangle') return KINETIC_BGK_SLIP.value;
  const a = aspectRatio ?? 1;
  const s = 1e-3;
  return ((rectangleSlipFlowFactor(a, s) - rectangleSlipFlowFactor(a, 0)) / s / 6) * KINETIC_BGK_SLIP.value;
}

export function conductanceCurve(input: ConductanceCurveInput): ConductancePoint[] {
  const { ratio } = input;
  if (!(ratio > 0 && ratio < 1))
    throw new Error(`pressure ratio downstream/upstream = ${ratio}: must be between 0 and 1`);
  const shape = input.geometry.shape;
  const g = input.geometry;
  const aspect = g.shape === 'rectangle' ? g.heightM / g.widthM : undefined;
  const slope = slipSlope(shape, aspect);
  const offset = slipOffset(shape, aspect);
  const noSlip = lineTable(shape, aspect, (d) => slope * d, 'no-slip Poiseuille');
  const firstOrder = lineTable(shape, aspect, (d) => slope * d + offset, 'first-order slip');
  const rectangleFm =
    aspect !== undefined
      ? lineTable(shape, aspect, () => rectangleFreeMolecularReducedFlowRate(aspect), 'free-molecular')
      : null;
  const fm =
    g.shape === 'tube'
      ? ((8 * g.radiusM) / (3 * g.lengthM)) *
        Math.PI *
        g.radiusM ** 2 *
        (meanSpeedMPerS(input.gas.massKg, input.temperatureK) / 4)
      : NaN;
  return input.upstreamPressuresPa.map((up) => {
    const base = {
      geometry: input.geometry,
      gas: input.gas,
      temperatureK: input.temperatureK,
      upstreamPressurePa: up,
      downstreamPressurePa: up * ratio,
      profilePoints: 2,
    };
    const r = solveIsothermalDuct({ ...base, table: input.table });
    const mean = (r.upstreamRarefaction + r.downstreamRarefaction) / 2;
    return {
      upstreamPressurePa: up,
      meanPressurePa: (up * (1 + ratio)) / 2,
      meanKnudsen: Math.sqrt(Math.PI) / (2 * mean),
      conductanceM3PerS: r.conductanceM3PerS,
      noSlipM3PerS: solveIsothermalDuct({ ...base, table: noSlip }).conductanceM3PerS.mean,
      firstOrderSlipM3PerS: solveIsothermalDuct({ ...base, table: firstOrder }).conductanceM3PerS.mean,
      freeMolecularM3PerS: rectangleFm
        ? solveIsothermalDuct({ ...base, table: rectangleFm }).conductanceM3PerS.mean
        : fm,
    };
  });
}
