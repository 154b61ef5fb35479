// The long-duct solver (engine/longDuct/): coefficient interpolation and the isothermal integral, against closed
// forms and tables from outside the project (sources beside each check).
import { describe, expect, it } from 'vitest';
import { modelFromSpecies, mostProbableSpeedMPerS, viscosityPaS } from '../../engine/gas/molecularModel';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import {
  FREE_MOLECULAR_TUBE_GP,
  reducedFlowRateAt,
  thermalCreepInterpolator,
  type CoefficientTable,
} from '../../engine/longDuct/coefficientTable';
import { solveIsothermalDuct } from '../../engine/longDuct/isothermalDuct';
import { conductanceCurve } from '../../engine/longDuct/conductanceCurve';

const N2 = modelFromSpecies('N2', 'VHS');
const T = 293.15;

/** A table of G_P = f(δ) at half-decades over 10^from…10^to (default 1e-4…1e4), exact values, no error. */
function tableOf(
  shape: 'tube' | 'channel',
  f: (delta: number) => number,
  ci = 0,
  [from, to] = [-4, 4],
): CoefficientTable {
  const points = [];
  for (let e = from; e <= to; e += 0.5) {
    const rarefaction = 10 ** e;
    points.push({ rarefaction, reducedFlowRate: f(rarefaction), reducedFlowRateCi95: ci });
  }
  return { shape, source: 'test function', gasAndWall: 'test', points };
}

// Linearized BGK plane Poiseuille G_P, diffuse walls (the project's reference notes §2, computed with a discrete-
// velocity solver converged to 2e-6; the minimum 1.538 near δ ≈ 1.07 agrees with Cercignani & Daneri 1963).
const BGK_CHANNEL: CoefficientTable = {
  shape: 'channel',
  source: 'linearized BGK (reference notes §2)',
  gasAndWall: 'BGK model, diffuse walls',
  points: [
    { rarefaction: 0.01, reducedFlowRate: 3.04965, reducedFlowRateCi95: 0 },
    { rarefaction: 0.1, reducedFlowRate: 2.03271, reducedFlowRateCi95: 0 },
    { rarefaction: 1, reducedFlowRate: 1.53868, reducedFlowRateCi95: 0 },
    { rarefaction: 10, reducedFlowRate: 2.76864, reducedFlowRateCi95: 0 },
    { rarefaction: 100, reducedFlowRate: 17.6933, reducedFlowRateCi95: 0 },
  ],
};

describe('coefficient interpolation', () => {
  it('returns the table at its points and keeps the slip asymptote beyond it', () => {
    for (const p of BGK_CHANNEL.points)
      expect(reducedFlowRateAt(BGK_CHANNEL, p.rarefaction).value).toBeCloseTo(p.reducedFlowRate, 10);
    // Beyond δ = 100: δ/6 + (G_P(100) − 100/6), the slip line with the table's own intercept.
    const far = reducedFlowRateAt(BGK_CHANNEL, 1000);
    expect(far.value).toBeCloseTo(1000 / 6 + 17.6933 - 100 / 6, 9);
    expect(far.extrapolatedBy).toBeCloseTo(10, 12);
  });

  it('shows the Knudsen minimum of the channel between δ = 0.5 and 2, near G_P = 1.538 (Cercignani & Daneri 1963)', () => {
    let best = { delta: NaN, value: Infinity };
    for (let e = -1; e <= 1; e += 0.001) {
      const v = reducedFlowRateAt(BGK_CHANNEL, 10 ** e).value;
      if (v < best.value) best = { delta: 10 ** e, value: v };
    }
    expect(best.delta).toBeGreaterThan(0.5);
    expect(best.delta).toBeLessThan(2);
    // Interpolating between the decades δ = 0.1, 1, 10 the minimum sits at or just below the node value 1.53868.
    expect(Math.abs(best.value / 1.538 - 1)).toBeLessThan(0.005);
  });

  it('thermal creep G_T on log–log axes: its limits (constant, ∝ 1/δ) are reproduced between and beyond the points', () => {
    const points = [0.001, 0.1, 10, 1000].map((d) => ({
      rarefaction: d,
      reducedFlowRate: 1,
      reducedFlowRateCi95: 0,
      thermalCreep: 0.7 / d,
    }));
    const creep = thermalCreepInterpolator({ shape: 'tube', source: 'power law', gasAndWall: 'test', points })!;
    for (const d of [0.003, 0.5, 42, 5000]) expect(creep(d).value / (0.7 / d)).toBeCloseTo(1, 12);
    expect(thermalCreepInterpolator(BGK_CHANNEL)).toBeNull();
  });

  it('refuses a malformed table, naming the point', () => {
    const bad = { ...BGK_CHANNEL, points: [BGK_CHANNEL.points[1], BGK_CHANNEL.points[0]] };
    expect(() => reducedFlowRateAt(bad, 1)).toThrow(/rarefactions must rise from point to point \(point 2/);
  });
});

describe('isothermal long duct', () => {
  it('planar slip regime: with G_P = δ/6 + σ_P the result is the first-order slip formula of Arkilic et al. (1997) to 1e-6', () => {
    const sigmaP = 1.0162; // kinetic slip coefficient in ℓ = μv0/p units (reference notes §2)
    const table = tableOf('channel', (d) => d / 6 + sigmaP);
    const h = 1.33e-6;
    const w = 52.25e-6;
    const l = 7500e-6;
    const pIn = 2.0e5;
    const pOut = 1.0e5;
    const r = solveIsothermalDuct({
      geometry: { shape: 'channel', gapM: h, widthM: w, lengthM: l },
      gas: N2,
      temperatureK: T,
      upstreamPressurePa: pIn,
      downstreamPressurePa: pOut,
      table,
    });
    // Arkilic, Schmidt & Breuer 1997 (J. MEMS 6:167; formula from memory, reference notes §7):
    // ṁ = (H³ W p_o²/(24 μ R T L))·[(Π² − 1) + 12 s Kn_o (Π − 1)], Kn_o = λ_o/H, λ = (μ/p)·sqrt(πRT/2), with the slip
    // coefficient s in λ units: s = 2σ_P/√π (λ = (√π/2)·ℓ).
    const mu = viscosityPaS(N2, T);
    const rs = K_B / N2.massKg;
    const lambdaOut = (mu / pOut) * Math.sqrt((Math.PI * rs * T) / 2);
    const knOut = lambdaOut / h;
    const s = (2 * sigmaP) / Math.sqrt(Math.PI);
    const ratio = pIn / pOut;
    const arkilic =
      ((h ** 3 * w * pOut ** 2) / (24 * mu * rs * T * l)) * (ratio ** 2 - 1 + 12 * s * knOut * (ratio - 1));
    expect(Math.abs(r.massFlowRateKgPerS.mean / arkilic - 1)).toBeLessThan(1e-6);
  });

  it('no-slip pressure along the channel is the classical p(x) = sqrt(p1² − (p1² − p2²)·x/L)', () => {
    const table = tableOf('channel', (d) => d / 6);
    const r = solveIsothermalDuct({
      geometry: { shape: 'channel', gapM: 10e-6, widthM: 1, lengthM: 0.01 },
      gas: N2,
      temperatureK: T,
      upstreamPressurePa: 3e5,
      downstreamPressurePa: 1e5,
      table,
    });
    const { xM, pressurePa } = r.profile;
    for (let i = 0; i < xM.length; i++) {
      const exact = Math.sqrt(9e10 - (9e10 - 1e10) * (xM[i] / 0.01));
      expect(Math.abs(pressurePa[i] / exact - 1)).toBeLessThan(1e-4);
    }
  });

  it('free-molecular long tube: W = 8R/(3L) (Knudsen 1909); with the end correction Clausing at L/R = 20 and 100 within 2 %', () => {
    // Constant G_P over δ = 1e-7…1e-1 (the cases below have δ ≈ 1e-4…1e-3). The interpolant of G_P − δ/4 in ln δ
    // misses the δ/4 part between half-decade points by a few per cent of it: a few parts in 10⁶ of G_P here.
    const table = tableOf('tube', () => FREE_MOLECULAR_TUBE_GP, 0, [-7, -1]);
    // Clausing factors from the integral equation (reference notes §1, computed; Cole 1976 tables): 0.1093, 0.0253.
    for (const [ratio, clausing] of [
      [20, 0.1093],
      [100, 0.0253],
    ]) {
      const geometry = { shape: 'tube' as const, radiusM: 0.01, lengthM: 0.01 * ratio };
      const input = { geometry, gas: N2, temperatureK: T, upstreamPressurePa: 1e-3, downstreamPressurePa: 1e-4, table };
      const long = solveIsothermalDuct(input);
      expect(Math.abs(long.transmissionProbability.mean / (8 / (3 * ratio)) - 1)).toBeLessThan(1e-5);
      const corrected = solveIsothermalDuct({ ...input, endCorrection: true });
      expect(Math.abs(corrected.transmissionProbability.mean / clausing - 1)).toBeLessThan(0.02);
      expect(corrected.endCorrectionFraction).toBeGreaterThan(0);
    }
  });

  it('a small pressure difference gives back G_P at the mean rarefaction (the linear limit)', () => {
    const geometry = { shape: 'channel' as const, gapM: 1e-6, widthM: 1, lengthM: 1e-3 };
    const mu = viscosityPaS(N2, T);
    const v0 = mostProbableSpeedMPerS(N2.massKg, T);
    for (const delta of [0.05, 1, 30]) {
      const p = (delta * mu * v0) / 1e-6;
      const r = solveIsothermalDuct({
        geometry,
        gas: N2,
        temperatureK: T,
        upstreamPressurePa: p * 1.0005,
        downstreamPressurePa: p * 0.9995,
        table: BGK_CHANNEL,
      });
      // ṁ = (H²w/v0)·G_P·Δp/L
      const gp = (r.massFlowRateKgPerS.mean * v0 * 1e-3) / (1e-12 * (p * 0.001));
      expect(gp / reducedFlowRateAt(BGK_CHANNEL, delta).value - 1).toBeCloseTo(0, 6);
    }
  });

  it("carries the table's half-widths into ṁ: a constant ci95 c gives (Aμ/L)·c·(δ_up − δ_down)", () => {
    const table = tableOf('tube', (d) => d / 4 + 1, 0.02);
    const geometry = { shape: 'tube' as const, radiusM: 1e-3, lengthM: 1 };
    const r = solveIsothermalDuct({
      geometry,
      gas: N2,
      temperatureK: T,
      upstreamPressurePa: 10,
      downstreamPressurePa: 1,
      table,
    });
    const mu = viscosityPaS(N2, T);
    const span = r.upstreamRarefaction - r.downstreamRarefaction;
    expect(r.massFlowRateKgPerS.ci95).toBeCloseTo((Math.PI * 1e-6 * mu * 0.02 * span) / 1, 18);
  });

  it('warns of a short duct and refuses pressures that drive no flow, naming them', () => {
    const table = tableOf('tube', () => FREE_MOLECULAR_TUBE_GP);
    const base = {
      geometry: { shape: 'tube' as const, radiusM: 0.01, lengthM: 0.1 },
      gas: N2,
      temperatureK: T,
      upstreamPressurePa: 1e-2,
      downstreamPressurePa: 1e-3,
      table,
    };
    expect(solveIsothermalDuct(base).warnings.join('\n')).toMatch(/10\.0 radii long, less than about 20/);
    expect(() => solveIsothermalDuct({ ...base, downstreamPressurePa: 1e-2 })).toThrow(/downstream pressure/);
    expect(() => solveIsothermalDuct({ ...base, table: { ...table, shape: 'channel' } })).toThrow(/not a tube/);
  });
});

describe('conductance over the pressure range', () => {
  it('tube: the no-slip line is πR⁴p̄/(8μL) (Poiseuille); a free-molecular table meets the 8R/(3L) line', () => {
    const geometry = { shape: 'tube' as const, radiusM: 0.01, lengthM: 1 };
    const table = tableOf('tube', () => FREE_MOLECULAR_TUBE_GP, 0, [-7, -1]);
    const curve = conductanceCurve({
      geometry,
      gas: N2,
      temperatureK: T,
      table,
      upstreamPressuresPa: [1e-3, 1e-2],
      ratio: 0.5,
    });
    const mu = viscosityPaS(N2, T);
    for (const p of curve) {
      expect(p.noSlipM3PerS / ((Math.PI * 1e-8 * p.meanPressurePa) / (8 * mu * 1)) - 1).toBeCloseTo(0, 9);
      expect(Math.abs(p.conductanceM3PerS.mean / p.freeMolecularM3PerS - 1)).toBeLessThan(1e-5);
      expect(p.firstOrderSlipM3PerS).toBeGreaterThan(p.noSlipM3PerS);
    }
  });

  it('channel: the BGK table gives the Knudsen minimum inside the range, the slip lines do not', () => {
    const mu = viscosityPaS(N2, T);
    const v0 = mostProbableSpeedMPerS(N2.massKg, T);
    const gap = 1e-6;
    // Mean rarefaction from about 0.02 to 50 (ratio 0.9, so the curve follows G_P at the mean δ).
    const pressures = Array.from({ length: 40 }, (_, k) => ((0.02 * 2500 ** (k / 39) * mu * v0) / gap) * (2 / 1.9));
    const curve = conductanceCurve({
      geometry: { shape: 'channel', gapM: gap, widthM: 1, lengthM: 1e-3 },
      gas: N2,
      temperatureK: T,
      table: BGK_CHANNEL,
      upstreamPressuresPa: pressures,
      ratio: 0.9,
    });
    const c = curve.map((p) => p.conductanceM3PerS.mean);
    const k = c.indexOf(Math.min(...c));
    expect(k).toBeGreaterThan(3);
    expect(k).toBeLessThan(36);
    const slip = curve.map((p) => p.firstOrderSlipM3PerS);
    for (let i = 1; i < slip.length; i++) expect(slip[i]).toBeGreaterThan(slip[i - 1]);
    expect(curve.every((p) => Number.isNaN(p.freeMolecularM3PerS))).toBe(true);
  });
});
